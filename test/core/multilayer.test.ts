import { describe, expect, it } from 'vitest';
import { createRequire } from 'node:module';
import { multilayerCapacity, multilayerInductance, multilayerTurnsForInductance, DesignError, MU_0 } from '../../src/core';

const require = createRequire(import.meta.url);
const ellipk = require('@stdlib/math-base-special-ellipk') as (m: number) => number;
const ellipe = require('@stdlib/math-base-special-ellipe') as (m: number) => number;

/**
 * Reference: inductance per turn² of a rectangular winding with uniform current density,
 * by splitting the cross-section into n × n cells; Maxwell's formula for coaxial circles
 * between cell centres (Grover 1946) and each cell's self-inductance from the round-loop
 * formula with the rectangle's geometric mean distance 0.2235 (w + h) (Grover 1946).
 * About 0.1 % accurate for the shapes below at n = 20.
 */
function numerical(a: number, b: number, c: number, n = 20, nz = n): number {
  const dr = c / n;
  const dz = b / nz;
  const rs: number[] = [];
  const zs: number[] = [];
  for (let i = 0; i < n; i++) for (let j = 0; j < nz; j++) {
    rs.push(a - c / 2 + dr * (i + 0.5));
    zs.push(dz * (j + 0.5));
  }
  const g = 0.2235 * (dr + dz);
  let sum = 0;
  for (let p = 0; p < rs.length; p++) {
    sum += MU_0 * rs[p] * (Math.log((8 * rs[p]) / g) - 2);
    for (let q = p + 1; q < rs.length; q++) {
      const r1 = rs[p], r2 = rs[q], d = zs[p] - zs[q];
      const m = (4 * r1 * r2) / ((r1 + r2) ** 2 + d * d);
      const k = Math.sqrt(m);
      sum += 2 * MU_0 * Math.sqrt(r1 * r2) * ((2 / k - k) * ellipk(m) - (2 / k) * ellipe(m));
    }
  }
  return sum / (rs.length * rs.length);
}

describe("Wheeler's multilayer formula", () => {
  it('hand calculation in inches', () => {
    // Wheeler 1928: a = 0.5 in, b = 0.5 in, c = 0.25 in, N = 100:
    // 0.8 × 0.25 × 10 000 / (3 + 4.5 + 2.5) = 2000 / 10 = 200 µH
    const r = multilayerInductance({ turns: 100, diameter: 0.0254, length: 0.0127, windingDepth: 0.00635 });
    expect(r.inductance / 200e-6).toBeCloseTo(1, 12);
    expect(r.termRatio).toBeCloseTo(4.5 / 2.5, 12);
    expect(r.notes).toEqual([]);
  });

  it('within 1 % of a numerical integration when the three terms are equal', () => {
    // Wheeler 1928 (about 1 % with 6a ≈ 9b ≈ 10c); reference: Maxwell's formula integrated numerically
    const a = 0.01, b = (6 * a) / 9, c = (6 * a) / 10;
    const r = multilayerInductance({ turns: 1, diameter: 2 * a, length: b, windingDepth: c });
    expect(Math.abs(r.inductance / numerical(a, b, c) - 1)).toBeLessThan(0.01);
    expect(r.termRatio).toBeCloseTo(1, 12);
  });

  it('outside the range: a validity note, and the error really is larger', () => {
    // long thin winding: b = 4a, c = 0.1a → terms 6, 36, 1 (× a); our numerical check: about 8 % low
    const a = 0.01, b = 4 * a, c = 0.1 * a;
    const r = multilayerInductance({ turns: 1, diameter: 2 * a, length: b, windingDepth: c });
    expect(r.notes.some((n) => n.level === 'validity')).toBe(true);
    expect(Math.abs(r.inductance / numerical(a, b, c) - 1)).toBeGreaterThan(0.03);
  });

  it('the note states the size of the error, and the size holds against the numerical integration', () => {
    // shapes at term ratios 1.5 … 12 (b, c in units of a; cells about a/10 or finer, so the reference is
    // good to about 0.2 %); the last is a long deep winding, 17 % high: beyond the 12.7 % of the issue
    const shapes: Array<[number, number, number, number]> = [[1, 0.6, 8, 10], [0.67, 1.6, 16, 8], [0.2, 1.6, 16, 6], [4, 1.6, 16, 40], [8, 1.6, 12, 60]];
    const a = 0.01;
    let largest = 0;
    for (const [bf, cf, nr, nz] of shapes) {
      const r = multilayerInductance({ turns: 1, diameter: 2 * a, length: bf * a, windingDepth: cf * a });
      const err = r.inductance / numerical(a, bf * a, cf * a, nr, nz) - 1;
      expect(Math.abs(err), `b = ${bf}a, c = ${cf}a, ratio ${r.termRatio.toFixed(1)}`).toBeLessThanOrEqual(r.errorBound);
      largest = Math.max(largest, Math.abs(err));
      if (r.termRatio > 2) {
        expect(r.notes[0].message).toContain(`errors of up to about ${Math.round(r.errorBound * 100)} %`);
        expect(r.notes[0].message).not.toMatch(/several per cent/);
      }
    }
    expect(largest).toBeGreaterThan(0.15);
  });

  it('turns for an inductance, round trip', () => {
    const g = { diameter: 0.02, length: 0.01, windingDepth: 0.005 };
    const t = multilayerTurnsForInductance({ ...g, inductance: 470e-6 });
    expect(multilayerInductance({ ...g, turns: t.turns }).inductance / 470e-6).toBeCloseTo(1, 12);
    expect(t.practicalTurns).toBe(Math.round(t.turns));
    expect(t.practicalInductance).toBeCloseTo(multilayerInductance({ ...g, turns: t.practicalTurns }).inductance, 18);
  });

  it('rejects bad geometry naming the field', () => {
    const bad = (fn: () => unknown) => {
      try { fn(); } catch (e) { return e instanceof DesignError ? e.field : 'other'; }
      return 'none';
    };
    expect(bad(() => multilayerInductance({ turns: 10, diameter: 0.01, length: 0.01, windingDepth: 0.012 }))).toBe('windingDepth');
    expect(bad(() => multilayerInductance({ turns: 10, diameter: 0, length: 0.01, windingDepth: 0.002 }))).toBe('diameter');
    expect(bad(() => multilayerInductance({ turns: -1, diameter: 0.02, length: 0.01, windingDepth: 0.002 }))).toBe('turns');
    expect(bad(() => multilayerTurnsForInductance({ inductance: 0, diameter: 0.02, length: 0.01, windingDepth: 0.002 }))).toBe('inductance');
    expect(bad(() => multilayerTurnsForInductance({ inductance: 1e-6, diameter: 0.02, length: Number.NaN, windingDepth: 0.002 }))).toBe('length');
  });
});

describe('multilayerCapacity', () => {
  it('counts square-stacked turns in the winding section', () => {
    // hand calculation (common practice, no published source): 10 mm × 5 mm section, 0.3 mm wire
    // ⌊10/0.3⌋ × ⌊5/0.3⌋ = 33 × 16 = 528 turns
    expect(multilayerCapacity(10e-3, 5e-3, 0.3e-3)).toBe(528);
    expect(() => multilayerCapacity(10e-3, 0, 0.3e-3)).toThrow(DesignError);
    // the third argument is the wire's overall (insulated) diameter, named so
    try {
      multilayerCapacity(10e-3, 5e-3, -1);
    } catch (e) {
      expect((e as DesignError).field).toBe('insulatedDiameter');
    }
    expect(() => multilayerInductance(null as never)).toThrow(DesignError);
  });
});
