import { describe, expect, it } from 'vitest';
import { create, all, type Complex as MathComplex } from 'mathjs';
import {
  analyzeTank, tankImpedance, sweepTank, tankStress, tankNetlist, resolveTank,
  combineQ, combineLoadedQ, insertionLoss, seriesToParallelResistance, parallelToSeriesResistance,
  transducerLoss, mismatchLoss, terminationsCollapse,
  complex, cAdd, cDiv, cInv, cMul, cAbs, cArg, cParallel,
  DesignError, EXTRA_LOW_VOLTAGE_AC_RMS, TWO_PI, type TankInput,
} from '../../src/core';
import { fieldOf, rel } from '../helpers/asserts';

const math = create(all);

// A demo tank (invented values): 10 µH with 100 pF, f0 ≈ 5.033 MHz, X0 = √(L/C) = 316.2 Ω.
const L = 10e-6;
const C = 100e-12;
const W0 = 1 / Math.sqrt(L * C);
const F0 = W0 / TWO_PI;
const X0 = Math.sqrt(L / C);

describe('complex helpers', () => {
  it('do the arithmetic', () => {
    const a = complex(3, 4);
    const b = complex(1, -2);
    expect(cAbs(a)).toBe(5);
    expect(cArg(complex(0, 1))).toBeCloseTo(Math.PI / 2, 15);
    expect(cMul(a, b)).toEqual({ re: 11, im: -2 });
    const q = cDiv(a, b);
    expect(cMul(q, b).re).toBeCloseTo(3, 14);
    expect(cMul(q, b).im).toBeCloseTo(4, 14);
    expect(cMul(cInv(b), b).re).toBeCloseTo(1, 15);
    expect(cAdd(a, b)).toEqual({ re: 4, im: 2 });
    const p = cParallel(complex(2), complex(2));
    expect(p.re).toBeCloseTo(1, 15);
    expect(p.im).toBeCloseTo(0, 15);
  });
});

describe('Q rules', () => {
  it('element Q values combine as 1/Q = Σ 1/Q_i', () => {
    // Pozar, Microwave Engineering: 1/Q = Σ 1/Q_i
    expect(combineQ(100, 400)).toBeCloseTo(80, 12);
    expect(combineQ(200, Infinity)).toBe(200);
    const a = analyzeTank({ inductance: L, capacitance: C, coilQ: 100, capacitorQ: 400 });
    expect(a.coilQ).toBeCloseTo(100, 9);
    expect(a.capacitorQ).toBeCloseTo(400, 9);
    expect(a.unloadedQ).toBeCloseTo(80, 9);
  });

  it('loaded and unloaded Q: 1/Q_L = 1/Q_u + 1/Q_e', () => {
    // Pozar, Microwave Engineering: 1/Q_L = 1/Q_u + 1/Q_e
    expect(combineLoadedQ(200, 200)).toBeCloseTo(100, 12);
    // parallel tank: Q_e = R_ext / X0 with R_ext = R_source ∥ R_load
    const a = analyzeTank({ inductance: L, capacitance: C, coilQ: 150, sourceResistance: 30e3, loadResistance: 60e3 });
    const qe = 20e3 / X0;
    expect(a.externalQ).toBeCloseTo(qe, 9);
    expect(a.loadedQ).toBeCloseTo(1 / (1 / 150 + 1 / qe), 9);
  });

  it('series tank: Q = X0 / R, loaded with the terminations in series', () => {
    // series RLC: Q = X0/R (any circuit text); Pozar for the combination
    const a = analyzeTank({ mode: 'series', inductance: L, capacitance: C, coilResistance: 2, capacitorEsr: 0.5, sourceResistance: 5, loadResistance: 5 });
    expect(a.unloadedQ).toBeCloseTo(X0 / 2.5, 9);
    expect(a.externalQ).toBeCloseTo(X0 / 10, 9);
    expect(a.loadedQ).toBeCloseTo(X0 / 12.5, 9);
    // series RLC: the |Z| minimum is exactly at f0 and equals the total resistance (exact algebra)
    expect(rel(a.resonantFrequency, F0)).toBeLessThan(1e-8);
    expect(a.dynamicResistance).toBeCloseTo(2.5, 9);
    expect(a.loadedImpedance).toBeCloseTo(12.5, 9);
    // series RLC: the −3 dB width of the current is exactly R/(2πL) (exact algebra: ω2 − ω1 = R/L)
    expect(rel(a.bandwidth, 12.5 / (TWO_PI * L))).toBeLessThan(1e-9);
    expect(rel(a.unloadedBandwidth, 2.5 / (TWO_PI * L))).toBeLessThan(1e-9);
    expect(a.insertionLoss).toBeCloseTo(-20 * Math.log10(1 - 2.5 / 12.5), 9);
  });

  it('Q given at another frequency is carried over as a fixed resistance', () => {
    // coil Q = ωL/R: with R fixed, Q scales with f (definition)
    const a = analyzeTank({ inductance: L, capacitance: C, coilQ: 100, frequency: F0 / 2 });
    expect(a.coilQ).toBeCloseTo(200, 9);
    expect(a.coilResistance).toBeCloseTo((W0 / 2) * L / 100, 12);
    expect(a.notes.some((n) => n.level === 'validity' && n.field === 'frequency')).toBe(true);
    // tan δ = ω C ESR (definition)
    const b = analyzeTank({ inductance: L, capacitance: C, dissipationFactor: 0.002 });
    expect(b.capacitorEsr).toBeCloseTo(0.002 / (W0 * C), 12);
    expect(b.capacitorQ).toBeCloseTo(500, 9);
  });
});

describe('parallel tank: dynamic resistance and resonance', () => {
  it('peak impedance is Terman\'s R_D = Q ω L = Q/(ωC) to O(1/Q²)', () => {
    for (const q of [20, 100, 500]) {
      const a = analyzeTank({ inductance: L, capacitance: C, coilQ: q });
      // Terman 1943: R_D = Q ω L = Q / (ω C)
      expect(rel(a.dynamicResistance, q * W0 * L)).toBeLessThan(1 / q ** 2);
      expect(rel(a.dynamicResistance, q / (W0 * C))).toBeLessThan(1 / q ** 2);
    }
  });

  it('at the zero-phase frequency the impedance is exactly L/(CR)', () => {
    // Terman 1943: dynamic resistance of a coil with series resistance R across C is L/(CR)
    const R = 5;
    const a = analyzeTank({ inductance: L, capacitance: C, coilResistance: R });
    const z = tankImpedance({ inductance: L, capacitance: C, coilResistance: R }, a.zeroPhaseFrequency as number);
    expect(rel(z.re, L / (C * R))).toBeLessThan(1e-9);
    expect(Math.abs(z.im / z.re)).toBeLessThan(1e-9);
  });

  it('low Q: zero-phase frequency f0√(1 − 1/Q²) and |Z| peak f0√(√(1 + 2/Q²) − 1/Q²)', () => {
    for (const q of [1.5, 3, 10]) {
      const a = analyzeTank({ inductance: L, capacitance: C, coilQ: q });
      // exact algebra for (R + jωL) ∥ 1/(jωC), Q = ω0L/R: Im Z = 0 at ω0√(1 − 1/Q²)
      expect(rel(a.zeroPhaseFrequency as number, F0 * Math.sqrt(1 - 1 / q ** 2))).toBeLessThan(1e-9);
      // exact algebra, d|Z|²/dω = 0 for the same circuit (derived, no published source named)
      expect(rel(a.resonantFrequency, F0 * Math.sqrt(Math.sqrt(1 + 2 / q ** 2) - 1 / q ** 2))).toBeLessThan(1e-7);
      expect(a.naturalFrequency).toBeCloseTo(F0, 6);
    }
    const low = analyzeTank({ inductance: L, capacitance: C, coilQ: 3 });
    expect(low.notes.some((n) => n.level === 'validity' && /below 10/.test(n.message))).toBe(true);
    expect(low.notes.some((n) => n.level === 'info' && /zero-phase/.test(n.message))).toBe(true);
  });

  it('a plain G ∥ L ∥ C tank has bandwidth exactly 1/(2πRC)', () => {
    // exact algebra for a shunt resistance: ω2 − ω1 = G/C
    const a = analyzeTank({ inductance: L, capacitance: C, loadResistance: 20e3 });
    expect(rel(a.bandwidth, 1 / (TWO_PI * 20e3 * C))).toBeLessThan(1e-9);
    expect(rel(a.loadedImpedance, 20e3)).toBeLessThan(1e-9);
    expect(a.dynamicResistance).toBe(Infinity);
    expect(a.unloadedQ).toBe(Infinity);
  });

  it('bandwidth from the impedance agrees with f/Q_L', () => {
    // Pozar: Q_L = f0 / BW; exact within O(1/Q²)
    const a = analyzeTank({ inductance: L, capacitance: C, coilQ: 150, capacitorQ: 800, sourceResistance: 40e3, loadResistance: 40e3 });
    expect(rel(a.bandwidth, a.loadedResonantFrequency / a.loadedQ)).toBeLessThan(1 / a.loadedQ ** 2);
    expect(rel(a.unloadedBandwidth, a.resonantFrequency / a.unloadedQ)).toBeLessThan(1 / a.unloadedQ ** 2);
  });

  it('coil self-capacitance joins the tank capacitance', () => {
    // f0 = 1/(2π√(L(C + C_s))) (Terman 1943: self-capacitance in parallel with the coil)
    const a = analyzeTank({ inductance: L, capacitance: C, coilQ: 200, coilSelfCapacitance: 10e-12 });
    expect(a.naturalFrequency).toBeCloseTo(1 / (TWO_PI * Math.sqrt(L * 110e-12)), 3);
    expect(rel(a.resonantFrequency, a.naturalFrequency)).toBeLessThan(1e-4);
    expect(a.notes.some((n) => n.field === 'coilSelfCapacitance')).toBe(false);
    // C_s comparable to C: tank above half the coil's self-resonance, lumped model flagged
    const b = analyzeTank({ inductance: L, capacitance: 20e-12, coilQ: 200, coilSelfCapacitance: 10e-12 });
    expect(b.notes.some((n) => n.level === 'validity' && n.field === 'coilSelfCapacitance')).toBe(true);
  });
});

describe('series and parallel equivalents of a loss', () => {
  it('R_p = R_s (1 + Q²) and back', () => {
    // exact circuit algebra: R_s + jX ≡ R_p ∥ jX_p, R_p = R_s (1 + Q²), Q = X/R_s
    expect(seriesToParallelResistance(2, 300)).toBeCloseTo(2 * (1 + 150 ** 2), 9);
    expect(parallelToSeriesResistance(45002, 300 * (1 + 1 / 150 ** 2))).toBeCloseTo(2, 9);
    const y = cInv(complex(2, 300));
    expect(1 / y.re).toBeCloseTo(seriesToParallelResistance(2, 300), 6);
  });

  it('a coil\'s series resistance and its parallel equivalent give the same tank at resonance', () => {
    const rs = 2;
    const rp = seriesToParallelResistance(rs, X0);
    const seriesLoss = analyzeTank({ inductance: L, capacitance: C, coilResistance: rs });
    const shuntLoss = analyzeTank({ inductance: L, capacitance: C, loadResistance: rp });
    // exact at one frequency; across the band they differ by O(1/Q²) (Q = X0/rs ≈ 158)
    expect(rel(seriesLoss.dynamicResistance, shuntLoss.loadedImpedance)).toBeLessThan(1e-4);
    expect(rel(seriesLoss.unloadedQ, shuntLoss.loadedQ)).toBeLessThan(1e-4);
    expect(rel(seriesLoss.unloadedBandwidth, shuntLoss.bandwidth)).toBeLessThan(1e-4);
  });
});

describe('insertion loss', () => {
  it('IL = −20 log10(1 − Q_L/Q_u)', () => {
    // common practice, no published source named: single resonator between equal terminations
    expect(insertionLoss(100, 50)).toBeCloseTo(6.0206, 4);
    expect(insertionLoss(200, 20)).toBeCloseTo(0.9151, 4);
    expect(insertionLoss(Infinity, 20)).toBe(0);
    expect(fieldOf(() => insertionLoss(50, 60))).toBe('loadedQ');
  });

  it('the formula matches the circuit\'s transducer loss for equal terminations', () => {
    // circuit check: P_load / P_available from the impedance at resonance
    for (const mode of ['parallel', 'series'] as const) {
      const r = mode === 'parallel' ? 15e3 : 20;
      const a = analyzeTank({ mode, inductance: L, capacitance: C, coilQ: 120, capacitorQ: 1000, sourceResistance: r, loadResistance: r });
      expect(a.insertionLoss as number).toBeGreaterThan(0.1);
      expect(Math.abs((a.insertionLoss as number) - (a.transducerLoss as number))).toBeLessThan(0.005);
      expect(a.notes.some((n) => /mismatch/.test(n.message))).toBe(false);
    }
    const u = analyzeTank({ inductance: L, capacitance: C, coilQ: 120, sourceResistance: 5e3, loadResistance: 50e3 });
    expect(u.transducerLoss as number).toBeGreaterThan(u.insertionLoss as number);
    expect(u.notes.some((n) => n.level === 'info' && /mismatch/.test(n.message))).toBe(true);
    expect(analyzeTank({ inductance: L, capacitance: C, coilQ: 120 }).insertionLoss).toBeUndefined();
  });
});

describe('tankImpedance and sweepTank', () => {
  const tank: TankInput = { inductance: L, capacitance: C, coilResistance: 2, capacitorEsr: 0.3, coilSelfCapacitance: 3e-12, sourceResistance: 20e3, loadResistance: 30e3 };

  it('impedance is the parallel combination of the branches', () => {
    const f = 4.8e6;
    const w = TWO_PI * f;
    // circuit definition: (R_L + jωL) ∥ 1/(jωC_s) ∥ (ESR + 1/(jωC))
    const coil = complex(2, w * L);
    const self = complex(0, -1 / (w * 3e-12));
    const cap = complex(0.3, -1 / (w * C));
    const expected = cParallel(cParallel(coil, self), cap);
    const z = tankImpedance(tank, f);
    expect(rel(z.re, expected.re)).toBeLessThan(1e-12);
    expect(rel(z.im, expected.im)).toBeLessThan(1e-12);
    const zl = tankImpedance(tank, f, { loaded: true });
    const loaded = cParallel(cParallel(expected, complex(20e3)), complex(30e3));
    expect(rel(zl.re, loaded.re)).toBeLessThan(1e-12);
    expect(rel(zl.im, loaded.im)).toBeLessThan(1e-12);
    // series: [(R_L + jωL) ∥ 1/(jωC_s)] + ESR + 1/(jωC) (+ terminations when loaded)
    const zs = tankImpedance({ ...tank, mode: 'series' }, f, { loaded: true });
    expect(rel(zs.re, cParallel(coil, self).re + 0.3 + 50e3)).toBeLessThan(1e-12);
    expect(rel(zs.im, cParallel(coil, self).im - 1 / (w * C))).toBeLessThan(1e-12);
  });

  it('sweep: |Z| and phase match tankImpedance; response peaks at 0 dB and is −3 dB a bandwidth apart', () => {
    const a = analyzeTank(tank);
    const s = sweepTank(tank, { start: a.loadedResonantFrequency - 2 * a.bandwidth, stop: a.loadedResonantFrequency + 2 * a.bandwidth, points: 4001, spacing: 'linear' });
    expect(s.frequency.length).toBe(4001);
    expect(s.frequency).toBeInstanceOf(Float64Array);
    for (const i of [0, 1234, 4000]) {
      const z = tankImpedance(tank, s.frequency[i]);
      expect(rel(s.magnitude[i], cAbs(z))).toBeLessThan(1e-12);
      expect(s.phase[i]).toBeCloseTo((cArg(z) * 180) / Math.PI, 9);
    }
    expect(Math.max(...s.response)).toBeLessThanOrEqual(1e-12);
    expect(Math.max(...s.response)).toBeGreaterThan(-1e-4);
    expect(rel(s.peakFrequency, a.loadedResonantFrequency)).toBeLessThan(1e-9);
    // width of the region at or above −3.0103 dB (10 log10 ½) equals the bandwidth to one grid step
    const inside = s.frequency.filter((_, i) => s.response[i] >= 10 * Math.log10(0.5));
    const step = s.frequency[1] - s.frequency[0];
    expect(Math.abs(inside[inside.length - 1] - inside[0] - a.bandwidth)).toBeLessThanOrEqual(2 * step);
  });

  it('log sweep spacing and reuse of arrays', () => {
    const s = sweepTank(tank, { start: 1e6, stop: 1e8, points: 3, spacing: 'log' });
    expect(s.frequency[1]).toBeCloseTo(1e7, 3);
    const again = sweepTank({ ...tank, loadResistance: 10e3 }, { start: 1e6, stop: 1e8, points: 3 }, s);
    expect(again.frequency).toBe(s.frequency);
  });

  it('sweep options are checked', () => {
    expect(fieldOf(() => sweepTank(tank, { start: 2e6, stop: 1e6, points: 10 }))).toBe('stop');
    expect(fieldOf(() => sweepTank(tank, { start: 1e6, stop: 2e6, points: 1 }))).toBe('points');
    expect(fieldOf(() => sweepTank(tank, { start: 0, stop: 2e6, points: 10 }))).toBe('start');
    expect(fieldOf(() => sweepTank(tank, { start: 1e6, stop: 2e6, points: 10, spacing: 'octave' as 'log' }))).toBe('spacing');
  });
});

describe('voltage and current stress', () => {
  const tank: TankInput = { inductance: L, capacitance: C, coilQ: 200, loadResistance: 10e3 };

  it('parallel: V = √(P R), circulating current ≈ Q_L × line current', () => {
    const a = analyzeTank(tank);
    const s = tankStress({ ...tank, drivePower: 25 });
    const r = 1 / (1 / a.dynamicResistance + 1 / 10e3);
    // P = V²/R at resonance (definition of power in a resistance)
    expect(rel(s.driveVoltage, Math.sqrt(25 * r))).toBeLessThan(1e-3);
    expect(s.power).toBe(25);
    // circulating current = Q_L × line current for a parallel tank (Terman 1943), Q_L here with the load only
    expect(rel(s.circulatingCurrent / s.lineCurrent, a.loadedQ)).toBeLessThan(0.01);
    // I_C = V/X_C and V_C ≈ V (definition)
    expect(rel(s.capacitorCurrent, s.driveVoltage * W0 * C)).toBeLessThan(0.01);
    expect(s.capacitorVoltagePeak).toBeCloseTo(Math.SQRT2 * s.capacitorVoltage, 9);
  });

  it('series: the capacitor voltage is about Q times the drive voltage', () => {
    const t: TankInput = { mode: 'series', inductance: L, capacitance: C, coilResistance: 3.162 };
    const a = analyzeTank(t);
    const s = tankStress({ ...t, driveVoltage: 1 });
    // series resonance: V_C = Q V (any circuit text)
    expect(rel(s.capacitorVoltage, a.loadedQ)).toBeLessThan(0.01);
    expect(rel(s.lineCurrent, 1 / 3.162)).toBeLessThan(1e-6);
    expect(s.notes.some((n) => n.level === 'caution')).toBe(true); // ~100 V RMS on the capacitor
  });

  it('cautions: hazardous voltage, capacitor rating and wire current', () => {
    const s = tankStress({ ...tank, drivePower: 100, capacitorVoltageRating: 500, wireCurrentRating: 1 });
    expect(s.capacitorVoltage).toBeGreaterThan(EXTRA_LOW_VOLTAGE_AC_RMS);
    const cautions = s.notes.filter((n) => n.level === 'caution');
    expect(cautions.map((n) => n.field).sort()).toEqual(['capacitorVoltageRating', 'drivePower', 'wireCurrentRating']);
    const hazard = cautions.find((n) => n.field === 'drivePower');
    // IEC 61140 / IEC 60364: 50 V AC RMS extra-low-voltage limit
    expect(hazard?.message).toMatch(/50 V AC RMS/);
    expect(hazard?.message).toMatch(/IEC 61140/);
    expect(hazard?.message).toMatch(/burn/);
    expect(hazard?.message).toMatch(/local codes and licensed practice/);
    for (const n of cautions) expect(n.message).toMatch(/local codes/);
  });

  it('no caution at a few volts', () => {
    const s = tankStress({ ...tank, driveVoltage: 5, capacitorVoltageRating: 50, wireCurrentRating: 2 });
    expect(s.notes.filter((n) => n.level === 'caution')).toEqual([]);
    expect(s.capacitorVoltage).toBeCloseTo(5, 2);
  });

  it('drive must be given once', () => {
    expect(fieldOf(() => tankStress({ ...tank }))).toBe('drivePower');
    expect(fieldOf(() => tankStress({ ...tank, drivePower: 1, driveVoltage: 2 }))).toBe('driveVoltage');
    expect(fieldOf(() => tankStress({ ...tank, drivePower: -1 }))).toBe('drivePower');
    expect(fieldOf(() => tankStress({ ...tank, driveVoltage: 1, wireCurrentRating: 0 }))).toBe('wireCurrentRating');
    expect(fieldOf(() => tankStress({ inductance: L, capacitance: C, sourceResistance: 50, drivePower: 1 }))).toBe('drivePower');
  });
});

describe('DesignError cases', () => {
  const base: TankInput = { inductance: L, capacitance: C, coilQ: 100 };
  it('bad numbers name their field', () => {
    expect(fieldOf(() => analyzeTank({ ...base, inductance: -1e-6 }))).toBe('inductance');
    expect(fieldOf(() => analyzeTank({ ...base, capacitance: 0 }))).toBe('capacitance');
    expect(fieldOf(() => analyzeTank({ ...base, capacitance: Number.NaN }))).toBe('capacitance');
    expect(fieldOf(() => analyzeTank({ ...base, coilQ: Infinity }))).toBe('coilQ');
    expect(fieldOf(() => analyzeTank({ ...base, coilResistance: 0 }))).toBe('coilResistance');
    expect(fieldOf(() => analyzeTank({ ...base, capacitorEsr: -0.1 }))).toBe('capacitorEsr');
    expect(fieldOf(() => analyzeTank({ ...base, dissipationFactor: 0 }))).toBe('dissipationFactor');
    expect(fieldOf(() => analyzeTank({ ...base, sourceResistance: Infinity }))).toBe('sourceResistance');
    expect(fieldOf(() => analyzeTank({ ...base, loadResistance: -50 }))).toBe('loadResistance');
    expect(fieldOf(() => analyzeTank({ ...base, frequency: 0 }))).toBe('frequency');
    expect(fieldOf(() => analyzeTank({ ...base, coilSelfCapacitance: -1e-12 }))).toBe('coilSelfCapacitance');
    expect(fieldOf(() => analyzeTank({ ...base, mode: 'shunt' as 'series' }))).toBe('mode');
    expect(fieldOf(() => tankImpedance(base, -5))).toBe('frequency');
  });

  it('the same loss given twice must agree', () => {
    const r = (W0 * L) / 100; // the resistance coilQ 100 implies at f0
    expect(analyzeTank({ ...base, coilResistance: r * 1.005 }).coilResistance).toBeCloseTo(r * 1.005, 12);
    expect(fieldOf(() => analyzeTank({ ...base, coilResistance: r * 1.2 }))).toBe('coilQ');
    const esr = 1 / (W0 * C * 500);
    expect(fieldOf(() => analyzeTank({ ...base, capacitorEsr: esr * 2, capacitorQ: 500 }))).toBe('capacitorQ');
    expect(fieldOf(() => analyzeTank({ ...base, capacitorEsr: esr * 2, dissipationFactor: 0.002 }))).toBe('dissipationFactor');
    expect(fieldOf(() => analyzeTank({ ...base, capacitorQ: 500, dissipationFactor: 0.01 }))).toBe('dissipationFactor');
    expect(analyzeTank({ ...base, capacitorEsr: esr, capacitorQ: 500, dissipationFactor: 0.002 }).capacitorQ).toBeCloseTo(500, 6);
  });

  it('a tank without loss, or with too much, is refused', () => {
    expect(fieldOf(() => analyzeTank({ inductance: L, capacitance: C }))).toBe('coilResistance');
    // a resistance straight across ideal L and C still peaks at f0, however low the Q (exact algebra)
    const heavy = analyzeTank({ inductance: L, capacitance: C, loadResistance: 30 });
    expect(rel(heavy.loadedResonantFrequency, F0)).toBeLessThan(1e-6);
    expect(rel(heavy.bandwidth, 1 / (TWO_PI * 30 * C))).toBeLessThan(1e-6);
    expect(heavy.notes.some((n) => n.level === 'validity')).toBe(true);
    // coil Q 0.75: |Z| still has a peak (f0·√(√(1 + 2/Q²) − 1/Q²) is real) but never falls 3 dB below it towards DC
    expect(fieldOf(() => analyzeTank({ inductance: L, capacitance: C, coilQ: 0.75 }))).toBe('coilQ');
    expect(fieldOf(() => analyzeTank({ inductance: L, capacitance: C, coilResistance: 1e4, dissipationFactor: 0.001 }))).toBe('coilResistance');
  });
});

describe('tankNetlist', () => {
  it('writes standard element lines, a sweep, a control block and .end', () => {
    const text = tankNetlist({ inductance: L, capacitance: C, coilResistance: 2, capacitorEsr: 0.3, coilSelfCapacitance: 3e-12, sourceResistance: 20e3, loadResistance: 30e3 }, { sweep: { start: 4e6, stop: 6e6, points: 201, spacing: 'linear' }, dataFile: 'x.data' });
    const lines = text.trim().split('\n');
    expect(lines[0].startsWith('* ')).toBe(true);
    expect(lines).toContain('Idrive 0 hot DC 0 AC 1');
    expect(lines).toContain('Rcoil hot coil 2.00000000000e+0');
    expect(lines).toContain('Lcoil coil 0 1.00000000000e-5');
    expect(lines).toContain('Cself hot 0 3.00000000000e-12');
    expect(lines).toContain('Resr cap 0 3.00000000000e-1');
    expect(lines).toContain('Rload hot 0 3.00000000000e+4');
    expect(lines).toContain('.ac lin 201 4.00000000000e+6 6.00000000000e+6');
    expect(lines).toContain('wrdata x.data zin');
    expect(lines[lines.length - 1]).toBe('.end');
    // pure: the same input gives the same text
    expect(tankNetlist({ inductance: L, capacitance: C, coilQ: 100 })).toBe(tankNetlist({ inductance: L, capacitance: C, coilQ: 100 }));
  });

  it('series netlist and log sweep', () => {
    const text = tankNetlist({ mode: 'series', inductance: L, capacitance: C, coilQ: 100 }, { sweep: { start: 1e6, stop: 1e8, points: 201 } });
    expect(text).toMatch(/^Vdrive feed 0 DC 0 AC 1$/m);
    expect(text).toMatch(/^Ctank mid 0 /m);
    expect(text).toMatch(/^\.ac dec 100 /m);
    expect(text).not.toMatch(/^Rload/m);
    expect(fieldOf(() => tankNetlist({ inductance: L, capacitance: C, coilQ: 100 }, { dataFile: 'a b' }))).toBe('dataFile');
  });

  it('resolveTank reports which input set each loss', () => {
    const t = resolveTank({ inductance: L, capacitance: C, coilQ: 100, dissipationFactor: 0.001 });
    expect(t.fields).toEqual({ coil: 'coilQ', capacitor: 'dissipationFactor' });
    expect(t.sourceResistance).toBeUndefined();
  });
});

describe('−3 dB edge frequencies', () => {
  it('a resistor across ideal L and C: f₁,₂ = √(f0² + (B/2)²) ∓ B/2 with B = 1/(2πRC), and f₁f₂ = f0²', () => {
    // exact algebra of the parallel GLC admittance (common practice, no published source)
    const L = 10e-6, C = 220e-12, R = 5e3;
    const a = analyzeTank({ inductance: L, capacitance: C, loadResistance: R });
    const f0 = 1 / (2 * Math.PI * Math.sqrt(L * C));
    const B = 1 / (2 * Math.PI * R * C);
    expect(Math.abs(a.lowerFrequency / (Math.sqrt(f0 ** 2 + (B / 2) ** 2) - B / 2) - 1)).toBeLessThan(1e-9);
    expect(Math.abs(a.upperFrequency / (Math.sqrt(f0 ** 2 + (B / 2) ** 2) + B / 2) - 1)).toBeLessThan(1e-9);
    expect(Math.abs((a.lowerFrequency * a.upperFrequency) / f0 ** 2 - 1)).toBeLessThan(1e-9);
    expect(a.upperFrequency - a.lowerFrequency).toBeCloseTo(a.bandwidth, 6);
  });
});

describe('very high Q', () => {
  // A resistor across ideal L and C (parallel), or in series with them: the −3 dB width is exactly
  // B = 1/(2πRC) (parallel G∥L∥C) or R/(2πL) (series RLC), and the peak |Z| is exactly R, at any Q
  // (exact circuit algebra, common practice, no published source).
  const L = 4.7e-6, C = 100e-12, X = Math.sqrt(L / C);
  for (const q of [1e6, 1e9, 1e12, 1e14, 1e15]) {
    it(`loaded Q ${q}: bandwidth and peak impedance exact, the peak at f0`, () => {
      const f0 = 1 / (2 * Math.PI * Math.sqrt(L * C));
      const p = analyzeTank({ inductance: L, capacitance: C, loadResistance: q * X });
      expect(rel(p.bandwidth, 1 / (2 * Math.PI * q * X * C))).toBeLessThan(1e-9);
      expect(rel(p.loadedImpedance, q * X)).toBeLessThan(1e-9);
      expect(rel(p.loadedResonantFrequency, f0)).toBeLessThan(1e-14);
      expect(rel(p.loadedQ, q)).toBeLessThan(1e-12);
      const s = analyzeTank({ mode: 'series', inductance: L, capacitance: C, loadResistance: X / q });
      expect(rel(s.bandwidth, X / q / (2 * Math.PI * L))).toBeLessThan(1e-9);
      expect(rel(s.loadedImpedance, X / q)).toBeLessThan(1e-9);
    });
  }

  it('a lossy coil at Q 1e13: R_D = Q·X and bandwidth f0/Q to 1e-9', () => {
    // Terman 1943: R_D = Q ω L; Pozar: B = f0/Q; both exact to O(1/Q²) = 1e-26 here
    const a = analyzeTank({ inductance: L, capacitance: C, coilQ: 1e13 });
    expect(rel(a.dynamicResistance, 1e13 * X)).toBeLessThan(1e-9);
    expect(rel(a.bandwidth, a.naturalFrequency / 1e13)).toBeLessThan(1e-9);
  });
});

describe('losses from source to load', () => {
  // 4.7 µH with 100 pF (f0 = 7.341 MHz, X = √(L/C) = 216.8 Ω), coil Q 115, a 50 Ω source and a 2 kΩ load.
  const L = 4.7e-6, C = 100e-12, QU = 115, RS = 50, RLOAD = 2000;
  const tank: TankInput = { inductance: L, capacitance: C, coilQ: QU, sourceResistance: RS, loadResistance: RLOAD };

  /** Transducer gain 4 R_s |V_load/V_s|² / R_load of the circuit at f, with mathjs complex numbers. */
  function gainAt(f: number): number {
    const w = 2 * Math.PI * f;
    const r = (2 * Math.PI * 7.34127e6 * L) / QU; // coil Q 115 at f0 as a series resistance
    const par = (a: MathComplex | number, b: MathComplex | number) => math.divide(math.multiply(a, b), math.add(a, b)) as MathComplex;
    const coil = math.complex(r, w * L);
    const cap = math.complex(0, -1 / (w * C));
    const zp = par(par(coil, cap), RLOAD);
    const h = math.divide(zp, math.add(zp, RS)) as MathComplex;
    return (4 * RS * Number(math.abs(h)) ** 2) / RLOAD;
  }

  it('50 Ω and 2 kΩ: the insertion-loss rule reads 0.017 dB, the transducer loss is 10.2 dB', () => {
    // Hand calculation: Q_e = (R_s ∥ R_load)/X = 48.78/216.8 = 0.2250, Q_L = 1/(1/115 + 1/0.2250) = 0.2246,
    // IL = −20 log10(1 − Q_L/Q_u) = 0.0170 dB. At f0, R_D = Q_u X = 24.93 kΩ, R_p = R_D ∥ 2 kΩ = 1851 Ω,
    // V_load/V_s = R_p/(R_p + 50) = 0.9737, G_T = 4·50·0.9737²/2000 = 0.0948: 10.23 dB (Pozar, transducer gain).
    const a = analyzeTank(tank);
    expect(a.insertionLoss as number).toBeCloseTo(0.017, 3);
    expect(a.transducerLoss as number).toBeCloseTo(10.2, 1);
    const rp = 1 / (1 / (QU * Math.sqrt(L / C)) + 1 / RLOAD);
    expect(Math.abs((a.transducerLoss as number) - -10 * Math.log10((4 * RS * (rp / (rp + RS)) ** 2) / RLOAD))).toBeLessThan(0.01);
  });

  it('the transducer loss is the least loss of the circuit over frequency (mathjs circuit scan)', () => {
    // independent library: mathjs 15 complex arithmetic of the same circuit, scanned 2 to 30 MHz
    let best = 0;
    for (let i = 0; i <= 28000; i++) best = Math.max(best, gainAt(2e6 + i * 1e3));
    const a = analyzeTank(tank);
    expect(Math.abs((a.transducerLoss as number) - -10 * Math.log10(best))).toBeLessThan(1e-4);
    expect(Math.abs(gainAt(a.loadedResonantFrequency) - best) / best).toBeLessThan(1e-6);
  });

  it('transducer loss = mismatch loss + dissipative loss', () => {
    // exact: G_T = (1 − |Γ|²)·P_load/P_in for a source of real impedance (Pozar, ch. 2 and 11)
    for (const mode of ['parallel', 'series'] as const) {
      for (const [rs, rl] of [[50, 2000], [3e3, 10e3], [20, 20], [5, 1]]) {
        const a = analyzeTank({ mode, inductance: L, capacitance: C, coilQ: 150, capacitorQ: 900, coilSelfCapacitance: 4e-12, sourceResistance: rs, loadResistance: rl });
        expect(Math.abs((a.mismatchLoss as number) + (a.dissipativeLoss as number) - (a.transducerLoss as number))).toBeLessThan(1e-9);
        expect(a.transducerLoss as number).toBeGreaterThanOrEqual(a.dissipativeLoss as number);
      }
    }
  });

  it('transducerLoss and mismatchLoss by their definitions', () => {
    // Pozar: a matched source (Z_in = R_s) has no mismatch loss; Γ = 1/3 (Z_in = 2 R_s) gives −10 log10(8/9) = 0.5115 dB
    expect(mismatchLoss(50, complex(50, 0))).toBe(0);
    expect(mismatchLoss(50, complex(100, 0))).toBeCloseTo(0.51153, 5);
    // |Γ|² = |(50 + j50 − 50)/(50 + j50 + 50)|² = 2500/12500 = 0.2: 0.9691 dB
    expect(mismatchLoss(50, complex(50, 50))).toBeCloseTo(0.96910, 5);
    // a wire from R_s into an equal load: V_load = V_s/2, no loss
    expect(transducerLoss(50, 50, 0.5)).toBeCloseTo(0, 12);
    // 50 Ω straight into 2 kΩ: H = 2000/2050, G_T = 4·50·H²/2000 = 0.0952: 10.21 dB
    expect(transducerLoss(50, 2000, 2000 / 2050)).toBeCloseTo(-10 * Math.log10((200 * (2000 / 2050) ** 2) / 2000), 12);
    expect(fieldOf(() => transducerLoss(50, 50, 0.6))).toBe('voltageGain');
    expect(fieldOf(() => mismatchLoss(50, complex(0, 20)))).toBe('inputImpedance');
  });
});

describe('terminations that collapse the tank', () => {
  const L = 4.7e-6, C = 100e-12, X = Math.sqrt(L / C);

  it('the rule: Q_L < 2, or Q_e < Q_u/20 with Q_L < 10', () => {
    // the rule of terminations.ts (thresholds chosen there); Q_L from 1/Q_L = 1/Q_u + 1/Q_e (Pozar)
    expect(terminationsCollapse(115, 0.225)).toBe(true); // Q_L 0.22
    expect(terminationsCollapse(3, 3)).toBe(true); // Q_L 1.5, though Q_e = Q_u
    expect(terminationsCollapse(200, 9)).toBe(true); // Q_u/Q_e 22, Q_L 8.6
    expect(terminationsCollapse(200, 11)).toBe(false); // Q_u/Q_e 18
    expect(terminationsCollapse(1000, 40)).toBe(false); // Q_u/Q_e 25 but Q_L 38
    expect(terminationsCollapse(Infinity, 5)).toBe(true); // ideal parts, Q_L 5
    expect(terminationsCollapse(1.5, Infinity)).toBe(false); // no terminations at all
  });

  it('50 Ω across a 4.7 µH tank: a validity note with the figures, pointing to a tap or link', () => {
    const a = analyzeTank({ inductance: L, capacitance: C, coilQ: 115, sourceResistance: 50, loadResistance: 2000 });
    expect(a.terminationsCollapse).toBe(true);
    const n = a.notes.find((x) => /collapse/.test(x.message));
    expect(n?.level).toBe('validity');
    expect(n?.field).toBe('sourceResistance');
    expect(n?.message).toMatch(/loaded Q of 0\.225/);
    expect(n?.message).toMatch(/Q_u = 115/);
    expect(n?.message).toMatch(/50 Ω source takes 98 %/);
    expect(n?.message).toMatch(/tap on the coil, a link winding/);
    expect(n?.message).toMatch(/MHz/);
  });

  it('a load 20 times heavier than the tank\'s loss, Q_L 4.9: an info note; Q_L 19: none', () => {
    const heavy = analyzeTank({ inductance: L, capacitance: C, coilQ: 200, loadResistance: 5 * X });
    expect(heavy.loadedQ).toBeCloseTo(4.88, 2);
    expect(heavy.terminationsCollapse).toBe(true);
    const n = heavy.notes.find((x) => /set almost all/.test(x.message));
    expect(n?.level).toBe('info');
    expect(n?.field).toBe('loadResistance');
    const fine = analyzeTank({ inductance: L, capacitance: C, coilQ: 200, loadResistance: 20 * X });
    expect(fine.terminationsCollapse).toBe(false);
    expect(fine.notes.some((x) => /tap on the coil/.test(x.message))).toBe(false);
    expect(analyzeTank({ inductance: L, capacitance: C, coilQ: 200 }).terminationsCollapse).toBe(false);
  });

  it('series tank: large terminations collapse it, and the note asks for a lower resistance', () => {
    const a = analyzeTank({ mode: 'series', inductance: L, capacitance: C, coilQ: 150, sourceResistance: 200, loadResistance: 50 });
    expect(a.terminationsCollapse).toBe(true);
    const n = a.notes.find((x) => /collapse/.test(x.message));
    expect(n?.field).toBe('sourceResistance');
    expect(n?.message).toMatch(/lower resistance/);
  });
});

describe('hostile input to the tank', () => {
  const base: TankInput = { inductance: L, capacitance: C, coilQ: 100 };
  it('null or odd options give a DesignError, not a TypeError', () => {
    expect(fieldOf(() => tankImpedance(base, 1e6, null as unknown as { loaded: boolean }))).toBe('options');
    expect(fieldOf(() => tankImpedance(base, 1e6, { loaded: 'yes' as unknown as boolean }))).toBe('loaded');
    expect(fieldOf(() => tankNetlist(base, null as unknown as undefined))).toBe('options');
    expect(fieldOf(() => tankNetlist(base, { title: 5 as unknown as string }))).toBe('title');
    expect(fieldOf(() => analyzeTank(null as unknown as TankInput))).toBe('tank');
    expect(fieldOf(() => sweepTank(base, null as unknown as { start: number; stop: number; points: number }))).toBe('sweep');
    expect(tankImpedance(base, 1e6, undefined).re).toBeGreaterThan(0);
  });

  it('strings and extreme values name their field, in engineering notation', () => {
    expect(fieldOf(() => analyzeTank({ ...base, inductance: '4.7e-6' as unknown as number }))).toBe('inductance');
    const tiny = (() => { try { analyzeTank({ ...base, capacitance: 1e-300 }); } catch (e) { return e as DesignError; } })();
    expect(tiny?.field).toBe('capacitance');
    expect(tiny?.message).toMatch(/1e-300 F .* from 1e-24 F to 1e24 F/);
    expect(fieldOf(() => analyzeTank({ ...base, inductance: 1e300 }))).toBe('inductance');
    const neg = (() => { try { analyzeTank({ ...base, inductance: -4.7e-6 }); } catch (e) { return e as DesignError; } })();
    expect(neg?.message).toMatch(/-4\.7 µH/);
    expect(fieldOf(() => seriesToParallelResistance(1e-300, 1e300))).toBe('reactance');
    expect(fieldOf(() => combineQ('5' as unknown as number))).toBe('q');
  });
});
