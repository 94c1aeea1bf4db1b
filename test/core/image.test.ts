/**
 * Image rejection of one tuned circuit (src/core/image.ts), checked against
 * the circuit written out again here and evaluated with mathjs's complex
 * numbers (an independent general-purpose library), and against the
 * universal resonance curve √(1 + Q²ξ²) (Terman, Radio Engineers' Handbook,
 * 1943; section from memory). Tank values are demo values (invented): a
 * 6 MHz front-end tank of a fictional workshop, IF 455 kHz.
 */
import { describe, expect, it } from 'vitest';
import { complex, add, divide, multiply, abs, type Complex } from 'mathjs';
import { analyzeTank, DesignError } from '../../src/core';
import { imageFrequency, imageRejection } from '../../src/core/image';

const L = 7.26e-6;
const C = 96e-12;
const tank = { inductance: L, capacitance: C, coilResistance: 1.8, capacitorEsr: 0.05, coilSelfCapacitance: 2e-12, sourceResistance: 20e3, loadResistance: 50e3 };

/** 1/(1/a + 1/b + …), complex. */
const parallel = (...zs: (Complex | number)[]) => divide(1, zs.reduce<Complex>((s, z) => add(s, divide(1, z)) as Complex, complex(0, 0))) as Complex;

/** |Z| across a parallel tank with source and load (the tank voltage per source current), written out here. */
function parallelResponse(f: number): number {
  const w = 2 * Math.PI * f;
  const coil = parallel(complex(tank.coilResistance, w * L), complex(0, -1 / (w * tank.coilSelfCapacitance)));
  const cap = complex(tank.capacitorEsr, -1 / (w * C));
  return abs(parallel(coil, cap, tank.sourceResistance, tank.loadResistance)) as unknown as number;
}

/** 1/|Z_loop| of the series circuit (the loop current per source voltage), written out here. */
function seriesResponse(f: number, t: typeof tank): number {
  const w = 2 * Math.PI * f;
  const coil = parallel(complex(t.coilResistance, w * t.inductance), complex(0, -1 / (w * t.coilSelfCapacitance)));
  const loop = add(add(coil, complex(t.capacitorEsr, -1 / (w * t.capacitance))), t.sourceResistance + t.loadResistance) as Complex;
  return 1 / (abs(loop) as unknown as number);
}

const dB = (ratio: number) => 20 * Math.log10(ratio);

describe('imageFrequency', () => {
  it('is 2·IF above the signal with the oscillator above, 2·IF below with it below', () => {
    expect(imageFrequency(6.05e6, 455e3)).toBeCloseTo(6.96e6, 3);
    expect(imageFrequency(6.05e6, 455e3, 'below')).toBeCloseTo(5.14e6, 3);
  });

  it('refuses an oscillator below a signal under 2·IF, at the IF, saying what to change', () => {
    const e = (() => { try { imageFrequency(700e3, 455e3, 'below'); } catch (x) { return x; } })();
    expect(e).toBeInstanceOf(DesignError);
    expect((e as DesignError).field).toBe('intermediateFrequency');
    expect((e as DesignError).message).toMatch(/put the oscillator above, or use an IF under 350 kHz/);
  });
});

describe('imageRejection', () => {
  const fs = 1 / (2 * Math.PI * Math.sqrt(L * (C + tank.coilSelfCapacitance)));

  it('equals the ratio of the parallel tank’s response at the signal and at the image, circuit written out with mathjs', () => {
    for (const side of ['above', 'below'] as const) {
      const r = imageRejection({ tank, signalFrequency: fs, intermediateFrequency: 455e3, oscillatorSide: side });
      expect(r.imageFrequency).toBeCloseTo(fs + (side === 'above' ? 2 : -2) * 455e3, 3);
      expect(r.rejection).toBeCloseTo(dB(parallelResponse(fs) / parallelResponse(r.imageFrequency)), 9);
      expect(r.rejection).toBeGreaterThan(15);
    }
  });

  it('equals the ratio of the loop currents for a series tank', () => {
    const s = { ...tank, mode: 'series' as const, sourceResistance: 5, loadResistance: 10 };
    const r = imageRejection({ tank: s, signalFrequency: fs, intermediateFrequency: 455e3 });
    expect(r.rejection).toBeCloseTo(dB(seriesResponse(fs, s) / seriesResponse(r.imageFrequency, s)), 9);
  });

  it('agrees with the universal resonance curve √(1 + Q_L²ξ²) within 1 dB for this tank, and grows with the IF', () => {
    const loadedQ = analyzeTank({ ...tank, frequency: fs }).loadedQ;
    let last = 0;
    for (const fif of [455e3, 1.6e6, 10.7e6]) {
      const r = imageRejection({ tank, signalFrequency: fs, intermediateFrequency: fif });
      const fi = fs + 2 * fif;
      const xi = fi / fs - fs / fi;
      expect(r.loadedQ).toBeCloseTo(loadedQ, 9);
      expect(r.estimate).toBeCloseTo(10 * Math.log10(1 + (loadedQ * xi) ** 2), 9);
      expect(Math.abs(r.rejection - r.estimate)).toBeLessThan(1);
      expect(r.rejection).toBeGreaterThan(last);
      last = r.rejection;
    }
  });

  it('names the tank input at fault, and the IF when the image cannot be computed', () => {
    const bad = (() => { try { imageRejection({ tank: { ...tank, inductance: -1 }, signalFrequency: fs, intermediateFrequency: 455e3 }); } catch (x) { return x; } })();
    expect(bad).toBeInstanceOf(DesignError);
    expect((bad as DesignError).field).toBe('tank.inductance');
    expect(() => imageRejection({ tank, signalFrequency: Number.NaN, intermediateFrequency: 455e3 })).toThrow(DesignError);
    expect(() => imageRejection({ tank, signalFrequency: fs, intermediateFrequency: 455e3, oscillatorSide: 'left' as 'above' })).toThrow(/above' or 'below/);
  });
});
