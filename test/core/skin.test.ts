import { describe, expect, it } from 'vitest';
import {
  skinDepth, wireAcResistanceRatio, wireInternalImpedance, SKIN_ASYMPTOTIC_SWITCH, DesignError,
} from '../../src/core';
import { internalImpedanceRatio } from '../../src/core/skin';

/**
 * Independent reference: J0(q), J1(q) by their power series with complex q
 * (Abramowitz & Stegun 9.1.10), good to ~1e-13 for |q| ≲ 15 in doubles.
 */
function besselSeries(n: 0 | 1, qr: number, qi: number): [number, number] {
  // (q/2)^2
  const hr = qr / 2, hi = qi / 2;
  const wr = hr * hr - hi * hi, wi = 2 * hr * hi;
  let tr = n === 0 ? 1 : hr, ti = n === 0 ? 0 : hi; // first term (q/2)^n / n!
  let sr = tr, si = ti;
  for (let k = 1; k < 400; k++) {
    // term *= −(q/2)² / (k (k + n))
    const f = -1 / (k * (k + n));
    const nr = (tr * wr - ti * wi) * f, ni = (tr * wi + ti * wr) * f;
    tr = nr; ti = ni;
    sr += tr; si += ti;
    if (Math.hypot(tr, ti) < 1e-22 * Math.hypot(sr, si)) break;
  }
  return [sr, si];
}

/** Reference ζ = (q/2) J0/J1 from the power series, q = (1 − j) s. */
function zetaBySeries(s: number): [number, number] {
  const [ar, ai] = besselSeries(0, s, -s);
  const [br, bi] = besselSeries(1, s, -s);
  const den = br * br + bi * bi;
  const rr = (ar * br + ai * bi) / den, ri = (ai * br - ar * bi) / den;
  // (q/2)(rr + j ri), q/2 = (s − j s)/2
  return [(s * rr + s * ri) / 2, (s * ri - s * rr) / 2];
}

/** Reference via Kelvin functions (real series): R/R0 = (x/2)(ber·bei' − bei·ber')/(ber'² + bei'²), x = √2 a/δ. */
function kelvinRatio(s: number): number {
  const x = Math.SQRT2 * s;
  let ber = 0, bei = 0, dber = 0, dbei = 0;
  for (let k = 0; k < 60; k++) {
    const fa = factorial(2 * k) ** 2, fb = factorial(2 * k + 1) ** 2;
    const sign = k % 2 === 0 ? 1 : -1;
    ber += (sign * (x / 2) ** (4 * k)) / fa;
    bei += (sign * (x / 2) ** (4 * k + 2)) / fb;
    if (k > 0) dber += (sign * 4 * k * (x / 2) ** (4 * k - 1)) / (2 * fa);
    dbei += (sign * (4 * k + 2) * (x / 2) ** (4 * k + 1)) / (2 * fb);
  }
  return ((x / 2) * (ber * dbei - bei * dber)) / (dber * dber + dbei * dbei);
}
function factorial(n: number): number {
  let f = 1;
  for (let i = 2; i <= n; i++) f *= i;
  return f;
}

describe('skin depth', () => {
  it('copper at 1 MHz is about 66.1 µm', () => {
    // δ = √(ρ/(π f μ0)) with IEC 60028 ρ = 1/58e6 Ω·m and CODATA 2018 μ0: 66.085 µm
    expect(skinDepth(1e6) * 1e6).toBeCloseTo(66.085, 2);
  });
  it('scales as 1/√f and 1/√μr', () => {
    // exact from the formula
    expect(skinDepth(4e6) / skinDepth(1e6)).toBeCloseTo(0.5, 14);
    expect(skinDepth(1e6, undefined, 100) / skinDepth(1e6)).toBeCloseTo(0.1, 14);
  });
  it('rejects zero frequency', () => {
    expect(() => skinDepth(0)).toThrow(DesignError);
  });
});

describe('exact R_ac/R_dc of a round wire', () => {
  it('agrees with the complex power series of J0, J1 to 1e-10 for a/δ ≤ 8', () => {
    // independent evaluation of the same exact expression (A&S 9.1.10)
    for (const s of [0.05, 0.3, 0.8, 1, 1.5, 2, 3, 4.5, 6, 8]) {
      const [re, im] = internalImpedanceRatio(s);
      const [rr, ri] = zetaBySeries(s);
      expect(Math.abs(re / rr - 1)).toBeLessThan(1e-10);
      expect(Math.abs(im / ri - 1)).toBeLessThan(1e-10);
    }
  });
  it('agrees with the Kelvin ber/bei form (confirms the sign convention)', () => {
    // Kelvin functions, Terman 1943 §2 / Ramo, Whinnery & Van Duzer
    for (const s of [0.5, 1, 2, 3, 5]) {
      expect(Math.abs(internalImpedanceRatio(s)[0] / kelvinRatio(s) - 1)).toBeLessThan(1e-9);
    }
  });
  it('low-frequency limit 1 + (a/δ)⁴/48 (Ramo, Whinnery & Van Duzer)', () => {
    for (const s of [0.01, 0.05, 0.1, 0.2]) {
      const r = internalImpedanceRatio(s)[0];
      // next term of the series is −(a/δ)^8 · 11/276480 (relative size ≪ 1e-6 here)
      expect(Math.abs(r - (1 + s ** 4 / 48))).toBeLessThan(1e-6 * s ** 4 + 1e-15);
    }
    // and the internal inductance tends to μ0/8π per metre: ratio 1 − (a/δ)⁴/96·… → 1
    expect(wireInternalImpedance(1e-3, 1).internalInductanceRatio).toBeCloseTo(1, 9);
  });
  it('high-frequency limit a/(2δ) + 1/4 + 3δ/(32 a) (Hankel expansion; Ramo, Whinnery & Van Duzer give the first two terms)', () => {
    for (const s of [20, 40, 100, 300]) {
      const r = internalImpedanceRatio(s)[0];
      // two-term limit: error ~3/(32 s)
      expect(Math.abs(r - (s / 2 + 0.25))).toBeLessThan(0.1 / s);
      // three-term: remaining error is O(1/s²); at s ≥ 20 below 1e-5 absolute
      expect(Math.abs(r - (s / 2 + 0.25 + 3 / (32 * s)))).toBeLessThan(1e-5);
    }
  });
  it('internal inductance tends to 2δ/a at high frequency', () => {
    // exact limit of Im(ζ)·4/s² with Im(ζ) → s/2 − 3/(32 s)
    const w = wireInternalImpedance(2e-3, 100e6);
    expect(w.internalInductanceRatio * w.radiusOverSkinDepth / 2).toBeCloseTo(1, 3);
  });
  it('is accurate to 1e-4 across DC … a/δ = 100 against the independent references', () => {
    // series reference up to s = 8, three-term Hankel from s = 20 (error < 1e-5)
    for (let s = 0.01; s <= 8; s *= 1.2) {
      expect(Math.abs(internalImpedanceRatio(s)[0] / zetaBySeries(s)[0] - 1)).toBeLessThan(1e-4);
    }
    for (let s = 20; s <= 100; s *= 1.2) {
      expect(Math.abs(internalImpedanceRatio(s)[0] / (s / 2 + 0.25 + 3 / (32 * s)) - 1)).toBeLessThan(1e-4);
    }
  });
  it('is continuous across the switch to the Hankel expansion (jump < 1e-6 relative)', () => {
    const s0 = SKIN_ASYMPTOTIC_SWITCH;
    const below = internalImpedanceRatio(s0); // continued fraction (s ≤ switch)
    const above = internalImpedanceRatio(s0 + 1e-13); // Hankel expansion; true change ~4e-15 relative
    expect(Math.abs(above[0] / below[0] - 1)).toBeLessThan(1e-6);
    expect(Math.abs(above[1] / below[1] - 1)).toBeLessThan(1e-6);
    // in fact they agree to ~1e-13
    expect(Math.abs(above[0] / below[0] - 1)).toBeLessThan(1e-12);
  });
  it('1 mm copper at 10 MHz', () => {
    // exact value of the ratio at a/δ = 0.5 mm / 20.898 µm = 23.93: about 12.22
    const r = wireAcResistanceRatio(1e-3, 10e6);
    const s = 0.5e-3 / skinDepth(10e6);
    expect(r).toBeCloseTo(s / 2 + 0.25 + 3 / (32 * s), 4);
    expect(r).toBeGreaterThan(12);
    expect(r).toBeLessThan(12.5);
  });
  it('is exactly 1 at DC and rejects a negative frequency', () => {
    expect(wireAcResistanceRatio(1e-3, 0)).toBe(1);
    expect(() => wireAcResistanceRatio(1e-3, -1)).toThrow(DesignError);
    expect(() => wireAcResistanceRatio(0, 1e6)).toThrow(DesignError);
  });
});

describe('hostile inputs', () => {
  it('refuses text and NaN, and stays finite at 1e±300', () => {
    expect(() => internalImpedanceRatio('5' as never)).toThrow(DesignError);
    expect(() => skinDepth(Number.NaN)).toThrow(DesignError);
    expect(() => wireAcResistanceRatio(null as never, 1e6)).toThrow(DesignError);
    for (const f of [1e-300, 1e300]) {
      const w = wireInternalImpedance(1e-3, f);
      for (const v of [w.resistanceRatio, w.internalInductanceRatio, w.radiusOverSkinDepth, w.skinDepth]) expect(Number.isFinite(v)).toBe(true);
    }
    // far below the low-frequency switch the ratios are exactly their DC values, never 0/0
    expect(wireInternalImpedance(1e-3, 1e-300).internalInductanceRatio).toBe(1);
    expect(wireInternalImpedance(1e-3, 1e-300).resistanceRatio).toBe(1);
  });
});
