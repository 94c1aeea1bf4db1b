import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { designCoil, nagaokaCoefficient, solenoidInductance, turnsForInductance, MU_0 } from '../../src/core';

/** A coil inside the model's stated range: wire ≤ r/5, pitch from the wire to r/2 (no validity notes on pitch or wire). */
const coil = fc
  .record({
    diameter: fc.double({ min: 2e-3, max: 0.2, noNaN: true }),
    wireFraction: fc.double({ min: 0.002, max: 0.2, noNaN: true }), // wire ÷ radius
    pitchFraction: fc.double({ min: 0, max: 1, noNaN: true }), // where the pitch lies between the wire and r/2
  })
  .map(({ diameter, wireFraction, pitchFraction }) => {
    const r = diameter / 2;
    const wireDiameter = wireFraction * r;
    const pitch = wireDiameter + pitchFraction * Math.max(0, 0.5 * r - wireDiameter);
    return { diameter, wireDiameter, pitch };
  });

describe('solenoid properties', () => {
  it('more turns never lower the inductance at fixed pitch', () => {
    fc.assert(
      fc.property(coil, fc.double({ min: 1, max: 2000, noNaN: true }), fc.double({ min: 1e-6, max: 500, noNaN: true }), (g, n, extra) => {
        const l1 = solenoidInductance({ ...g, turns: n }).inductance;
        const l2 = solenoidInductance({ ...g, turns: n + extra }).inductance;
        expect(l1).toBeGreaterThan(0);
        expect(l2).toBeGreaterThanOrEqual(l1);
      }),
      { numRuns: 500 },
    );
  });

  it('stretching a coil (bigger pitch, same turns) lowers the inductance', () => {
    // N ≥ 2: a single turn has nothing to stretch (its inductance does not depend on pitch)
    fc.assert(
      fc.property(coil, fc.double({ min: 2, max: 2000, noNaN: true }), fc.double({ min: 1.001, max: 3, noNaN: true }), (g, n, stretch) => {
        const pitch2 = Math.min(g.pitch * stretch, g.diameter / 4);
        fc.pre(pitch2 > g.pitch * 1.0001);
        const tight = solenoidInductance({ ...g, turns: n }).inductance;
        const loose = solenoidInductance({ ...g, pitch: pitch2, turns: n }).inductance;
        expect(loose).toBeLessThan(tight);
      }),
      { numRuns: 500 },
    );
  });

  it("Nagaoka's coefficient lies in (0, 1] and rises as the coil gets longer (falls with d/l)", () => {
    const logRatio = fc.double({ min: -4, max: 4, noNaN: true });
    fc.assert(
      fc.property(logRatio, logRatio, (a, b) => {
        const [lo, hi] = a < b ? [a, b] : [b, a];
        fc.pre(hi - lo > 1e-9);
        const kShort = nagaokaCoefficient(1, 10 ** lo); // smaller l/d
        const kLong = nagaokaCoefficient(1, 10 ** hi);
        for (const k of [kShort, kLong]) {
          expect(k).toBeGreaterThan(0);
          expect(k).toBeLessThanOrEqual(1);
        }
        expect(kLong).toBeGreaterThan(kShort);
      }),
      { numRuns: 1000 },
    );
  });

  it('long-coil limit: at l/d = 100 the current-sheet value is μ0 N² A / l within 1 %', () => {
    // ideal long solenoid (any physics text; Grover 1946)
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 0.1, noNaN: true }), fc.integer({ min: 200, max: 100_000 }), (diameter, n) => {
        const pitch = (100 * diameter) / n;
        fc.pre(pitch < diameter / 2);
        const s = solenoidInductance({ diameter, turns: n, pitch, wireDiameter: pitch / 2 });
        const ideal = (MU_0 * n * n * Math.PI * (diameter / 2) ** 2) / s.length;
        expect(Math.abs(s.currentSheetInductance / ideal - 1)).toBeLessThan(0.01);
      }),
      { numRuns: 300 },
    );
  });

  it('turnsForInductance inverts solenoidInductance', () => {
    fc.assert(
      fc.property(coil, fc.double({ min: 1, max: 1000, noNaN: true }), (g, n) => {
        const target = solenoidInductance({ ...g, turns: n }).inductance;
        const t = turnsForInductance({ ...g, inductance: target });
        expect(Math.abs(t.turns / n - 1)).toBeLessThan(1e-9);
        expect(Math.abs(t.practicalTurns - t.turns)).toBeLessThanOrEqual(0.25 + 1e-12);
      }),
      { numRuns: 300 },
    );
  });
});

describe('designCoil properties (solenoid)', () => {
  it('turns as wound lie within a quarter turn of the exact turns; Q inside its band; L at f below the DC value', () => {
    fc.assert(
      fc.property(coil, fc.double({ min: 2, max: 300, noNaN: true }), fc.double({ min: 5, max: 8, noNaN: true }), (g, n, lf) => {
        const target = solenoidInductance({ ...g, turns: n }).inductance;
        let r;
        try {
          r = designCoil({ form: 'solenoid', inductance: target, diameter: g.diameter, pitch: g.pitch, wire: { diameter: g.wireDiameter }, frequency: 10 ** lf });
        } catch (e) {
          // only at or above self-resonance may a valid coil be refused, and then at the frequency
          expect((e as { field?: string }).field).toBe('frequency');
          return;
        }
        expect(Math.abs(r.turns - r.exactTurns!)).toBeLessThanOrEqual(0.25 + 1e-9);
        expect(r.qLow!).toBeLessThanOrEqual(r.q!);
        expect(r.qHigh!).toBeGreaterThanOrEqual(r.q!);
        expect(r.resistanceAc!).toBeGreaterThanOrEqual(r.resistanceDc);
        expect(r.inductanceAtFrequency!).toBeLessThanOrEqual(r.inductance);
        expect(r.apparentInductance!).toBeGreaterThan(r.inductanceAtFrequency!);
      }),
      { numRuns: 200 },
    );
  });
});
