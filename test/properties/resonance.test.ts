import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { resonantFrequency, inductanceForFrequency, capacitanceForFrequency, preferredNeighbours } from '../../src/core';

// Values across the whole range a tank can have: 1 nH..10 H, 0.1 pF..10 mF.
const inductance = fc.double({ min: 1e-9, max: 10, noNaN: true, noDefaultInfinity: true });
const capacitance = fc.double({ min: 1e-13, max: 1e-2, noNaN: true, noDefaultInfinity: true });

describe('resonance properties', () => {
  it('f → L → f and f → C → f round trips within 1e-12 relative', () => {
    fc.assert(fc.property(inductance, capacitance, (L, C) => {
      const f = resonantFrequency(L, C);
      expect(Math.abs(resonantFrequency(inductanceForFrequency(f, C), C) / f - 1)).toBeLessThan(1e-12);
      expect(Math.abs(resonantFrequency(L, capacitanceForFrequency(f, L)) / f - 1)).toBeLessThan(1e-12);
    }));
  });
  it('more inductance or more capacitance always lowers the frequency', () => {
    fc.assert(fc.property(inductance, capacitance, fc.double({ min: 1.0001, max: 100, noNaN: true }), (L, C, k) => {
      const f = resonantFrequency(L, C);
      expect(resonantFrequency(L * k, C)).toBeLessThan(f);
      expect(resonantFrequency(L, C * k)).toBeLessThan(f);
    }));
  });
  it('preferred neighbours bracket the value within one E12 step', () => {
    fc.assert(fc.property(capacitance, (C) => {
      const n = preferredNeighbours(C, 'E12');
      expect(n.below).toBeLessThanOrEqual(C * (1 + 1e-9));
      expect(n.above).toBeGreaterThanOrEqual(C * (1 - 1e-9));
      expect(n.above / n.below).toBeLessThanOrEqual(1.2501); // widest E12 step is 1.2 → 1.5
    }));
  });
});
