import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { apparentCoil, selfResonantFrequency, medhurstH } from '../../src/core';

const inductance = fc.double({ min: 1e-8, max: 1e-3, noNaN: true });
const capacitance = fc.double({ min: 0.1e-12, max: 50e-12, noNaN: true });

describe('apparent coil properties', () => {
  it('apparent L and R rise toward self-resonance and exceed the true values', () => {
    fc.assert(
      fc.property(
        inductance, capacitance,
        fc.double({ min: 0.01, max: 0.98, noNaN: true }), fc.double({ min: 0.001, max: 0.5, noNaN: true }),
        (L, C, frac, step) => {
          const fsr = selfResonantFrequency(L, C);
          const f1 = frac * fsr;
          const f2 = Math.min(frac + step, 0.99) * fsr;
          fc.pre(f2 > f1 * (1 + 1e-9));
          const a1 = apparentCoil({ inductance: L, resistance: 1, selfCapacitance: C, frequency: f1 });
          const a2 = apparentCoil({ inductance: L, resistance: 1, selfCapacitance: C, frequency: f2 });
          expect(a1.apparentInductance).toBeGreaterThan(L);
          expect(a2.apparentInductance).toBeGreaterThan(a1.apparentInductance);
          expect(a2.apparentResistance).toBeGreaterThan(a1.apparentResistance);
        },
      ),
      { numRuns: 300 },
    );
  });
  it("Medhurst's H is positive and finite for any l/D", () => {
    fc.assert(
      fc.property(fc.double({ min: -4, max: 4, noNaN: true }), (lx) => {
        const h = medhurstH(10 ** lx).h;
        expect(h).toBeGreaterThan(0);
        expect(Number.isFinite(h)).toBe(true);
      }),
    );
  });
});
