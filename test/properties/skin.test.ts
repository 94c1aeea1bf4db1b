import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { wireAcResistanceRatio, wireInternalImpedance, skinDepth } from '../../src/core';

// Wire diameters 20 µm … 10 mm, frequencies 1 Hz … 10 GHz (a/δ from ~1e-4 to ~2e4).
const diameter = fc.double({ min: 20e-6, max: 10e-3, noNaN: true });
const logFrequency = fc.double({ min: 0, max: 10, noNaN: true });

describe('skin effect properties', () => {
  it('R_ac/R_dc ≥ 1 and L_i,ac/L_i,dc in (0, 1]', () => {
    fc.assert(
      fc.property(diameter, logFrequency, (d, lf) => {
        const w = wireInternalImpedance(d, 10 ** lf);
        expect(w.resistanceRatio).toBeGreaterThanOrEqual(1);
        expect(w.internalInductanceRatio).toBeGreaterThan(0);
        expect(w.internalInductanceRatio).toBeLessThanOrEqual(1 + 1e-12);
      }),
      { numRuns: 500 },
    );
  });
  it('R_ac/R_dc increases with frequency', () => {
    fc.assert(
      fc.property(diameter, logFrequency, fc.double({ min: 1e-6, max: 1, noNaN: true }), (d, lf, step) => {
        const f1 = 10 ** lf;
        const f2 = f1 * (1 + step);
        // below a/δ ~ 1e-4 both ratios round to exactly 1 in doubles: allow equality there
        expect(wireAcResistanceRatio(d, f2)).toBeGreaterThanOrEqual(wireAcResistanceRatio(d, f1));
        if (d / 2 / skinDepth(f1) > 0.05) {
          expect(wireAcResistanceRatio(d, f2)).toBeGreaterThan(wireAcResistanceRatio(d, f1));
        }
      }),
      { numRuns: 500 },
    );
  });
  it('a fine sweep across the switch-over has no backward step', () => {
    // a/δ from 24.9 to 25.1 in 2001 steps
    let prev = 0;
    for (let i = 0; i <= 2000; i++) {
      const s = 24.9 + (0.2 * i) / 2000;
      const f = (s / 0.5e-3) ** 2 * (1 / 58e6) / (Math.PI * 1.25663706212e-6); // f giving a/δ = s for 1 mm copper
      const r = wireAcResistanceRatio(1e-3, f);
      expect(r).toBeGreaterThan(prev);
      prev = r;
    }
  });
});
