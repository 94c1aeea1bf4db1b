import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyzeTank, terminationsCollapse, DesignError, type TankInput } from '../../src/core';

/** Log-uniform double in [lo, hi]. */
const logUniform = (lo: number, hi: number) =>
  fc.double({ min: 0, max: 1, noNaN: true }).map((u) => lo * Math.pow(hi / lo, u));

/** Random lossy tanks from LF to VHF: coil and capacitor loss, optional self-capacitance. */
const tankArb = fc.record({
  mode: fc.constantFrom<'parallel' | 'series'>('parallel', 'series'),
  inductance: logUniform(1e-7, 1e-3),
  capacitance: logUniform(1e-12, 1e-8),
  coilQ: logUniform(5, 2000),
  capacitorQ: fc.option(logUniform(20, 1e4), { nil: undefined }),
  selfFraction: fc.option(logUniform(1e-3, 0.3), { nil: undefined }),
}).map(({ mode, inductance, capacitance, coilQ, capacitorQ, selfFraction }): TankInput => {
  const t: TankInput = { mode, inductance, capacitance, coilQ };
  if (capacitorQ !== undefined) t.capacitorQ = capacitorQ;
  if (selfFraction !== undefined) t.coilSelfCapacitance = selfFraction * capacitance;
  return t;
});

describe('tank properties', () => {
  it('adding load never raises the loaded Q nor narrows the band', () => {
    fc.assert(
      fc.property(tankArb, logUniform(1, 2000), logUniform(1, 2000), (tank, r1, r2) => {
        const x = Math.sqrt(tank.inductance / tank.capacitance);
        // "more load": a smaller resistance across a parallel tank, a larger one in series with a series
        // circuit. External Q stays ≥ 1 so that the tank still has a 3 dB peak to measure.
        const [lightQe, heavyQe] = r1 >= r2 ? [r1, r2] : [r2, r1];
        const light = tank.mode === 'series' ? x / lightQe : x * lightQe;
        const heavy = tank.mode === 'series' ? x / heavyQe : x * heavyQe;
        const none = analyzeTank(tank);
        const a = analyzeTank({ ...tank, loadResistance: light });
        const b = analyzeTank({ ...tank, loadResistance: heavy });
        // Pozar: 1/Q_L = 1/Q_u + 1/Q_e, and a heavier load lowers Q_e
        expect(a.loadedQ).toBeLessThanOrEqual(none.loadedQ);
        expect(b.loadedQ).toBeLessThanOrEqual(a.loadedQ);
        // the exact −3 dB width (from the impedance) widens too; 1e-9 allows for the root finder's last digits
        expect(a.bandwidth).toBeGreaterThanOrEqual(none.bandwidth * (1 - 1e-9));
        expect(b.bandwidth).toBeGreaterThanOrEqual(a.bandwidth * (1 - 1e-9));
      }),
      { numRuns: 300 },
    );
  });

  it('bandwidth × loaded Q ≈ resonant frequency for Q_L ≥ 10, within 1/Q_L²', () => {
    // Pozar: Q_L = f0 / BW for a single resonance. Tolerance: the −3 dB edges lie ±1/(2Q_L) either
    // side of resonance; the series-resistance losses vary with frequency to first order, but that
    // first-order part cancels between the two edges, leaving a relative error of order 1/Q_L²
    // (a 20,000-tank random search gave at most 0.27/Q_L²). 1/Q_L² is 1 % at Q_L = 10.
    // The peak of the terminated response is the frequency this bandwidth belongs to.
    fc.assert(
      fc.property(tankArb, fc.option(logUniform(1, 1000), { nil: undefined }), (tank, ratio) => {
        const x = Math.sqrt(tank.inductance / tank.capacitance);
        const t = ratio === undefined ? tank : { ...tank, loadResistance: tank.mode === 'series' ? x / ratio : x * ratio };
        const a = analyzeTank(t);
        fc.pre(a.loadedQ >= 10);
        expect(Math.abs((a.bandwidth * a.loadedQ) / a.loadedResonantFrequency - 1)).toBeLessThanOrEqual(1 / a.loadedQ ** 2);
      }),
      { numRuns: 300 },
    );
  });

  it('equal terminations: the insertion-loss rule equals the transducer loss within IL/Q_L² (Q_L ≥ 10)', () => {
    // The rule −20 log10(1 − Q_L/Q_u) is derived for equal terminations at f0 with the high-Q parallel
    // equivalents; what it neglects is of order 1/Q_L² (a 20,000-tank random search gave at most 0.3 IL/Q_L²).
    fc.assert(
      fc.property(tankArb.filter((t) => (t.coilQ ?? 0) >= 30 && (t.capacitorQ ?? Infinity) >= 60), logUniform(12, 1e4), (tank, qe) => {
        const x = Math.sqrt(tank.inductance / tank.capacitance);
        const r = tank.mode === 'series' ? x / qe / 2 : 2 * qe * x;
        const a = analyzeTank({ ...tank, sourceResistance: r, loadResistance: r });
        fc.pre(a.loadedQ >= 10);
        const il = a.insertionLoss as number;
        expect(Math.abs(il - (a.transducerLoss as number))).toBeLessThanOrEqual(il / a.loadedQ ** 2 + 1e-12);
      }),
      { numRuns: 300 },
    );
  });

  it('any terminations: transducer = mismatch + dissipative loss, none negative; the collapse flag follows the rule', () => {
    // Pozar: G_T = (1 − |Γ|²)·P_load/P_in ≤ 1 for a passive network; the rule is terminationsCollapse's
    fc.assert(
      fc.property(tankArb, logUniform(1e-2, 1e4), logUniform(1e-2, 1e4), (tank, qs, ql) => {
        const x = Math.sqrt(tank.inductance / tank.capacitance);
        const term = (q: number) => (tank.mode === 'series' ? x / q : x * q);
        let a;
        try {
          a = analyzeTank({ ...tank, sourceResistance: term(qs), loadResistance: term(ql) });
        } catch (e) {
          // no clear resonance with so heavy a load: refused with a DesignError
          expect(e).toBeInstanceOf(DesignError);
          expect(1 / (1 / qs + 1 / ql)).toBeLessThan(1);
          return;
        }
        const tl = a.transducerLoss as number;
        expect(a.mismatchLoss as number).toBeGreaterThanOrEqual(0);
        expect(a.dissipativeLoss as number).toBeGreaterThanOrEqual(0);
        expect(Math.abs((a.mismatchLoss as number) + (a.dissipativeLoss as number) - tl)).toBeLessThanOrEqual(1e-9 * Math.max(1, tl));
        expect(a.terminationsCollapse).toBe(terminationsCollapse(a.unloadedQ, a.externalQ));
        expect(a.notes.some((n) => /tap on the coil/.test(n.message))).toBe(a.terminationsCollapse);
      }),
      { numRuns: 300 },
    );
  });

  it('a resistor with ideal L and C keeps its exact bandwidth at any Q up to 1e15', () => {
    // exact circuit algebra: G∥L∥C has B = 1/(2πRC), series RLC has B = R/(2πL), whatever the Q
    fc.assert(
      fc.property(
        fc.constantFrom<'parallel' | 'series'>('parallel', 'series'),
        logUniform(1e-9, 1), logUniform(1e-13, 1e-3), logUniform(1, 1e15),
        (mode, inductance, capacitance, q) => {
          const x = Math.sqrt(inductance / capacitance);
          const r = mode === 'parallel' ? q * x : x / q;
          const a = analyzeTank({ mode, inductance, capacitance, loadResistance: r });
          const b = mode === 'parallel' ? 1 / (2 * Math.PI * r * capacitance) : r / (2 * Math.PI * inductance);
          expect(Math.abs(a.bandwidth / b - 1)).toBeLessThan(1e-9);
          expect(Math.abs(a.loadedImpedance / r - 1)).toBeLessThan(1e-9);
        },
      ),
      { numRuns: 300 },
    );
  });
});
