/**
 * Resonance: Thomson's formula and the reactances, checked against the
 * radio handbooks' hand rule and against mathjs evaluating the same physics
 * with its own unit system (an independent general-purpose library).
 */
import { describe, expect, it } from 'vitest';
import { create, all } from 'mathjs';
import {
  resonantFrequency, inductanceForFrequency, capacitanceForFrequency,
  inductiveReactance, capacitiveReactance, characteristicImpedance, DesignError,
} from '../../src/core';

const math = create(all);

describe('resonantFrequency', () => {
  it('follows the hand rule L[µH]·C[pF] = 25 330 / f[MHz]²', () => {
    // common practice, no published source: the "25,330" rule printed in radio handbooks
    // (its constant is 10^6 / (2π)^2 = 25 330.295…)
    for (const [L_uH, C_pF] of [[4.7, 100], [250, 365], [1, 25.33], [0.1, 10], [2000, 500]]) {
      const fMHz = resonantFrequency(L_uH * 1e-6, C_pF * 1e-12) / 1e6;
      expect(L_uH * C_pF * fMHz ** 2).toBeCloseTo(25330.3, 1);
    }
  });

  it('agrees with mathjs evaluating 1/(2π√(LC)) in its own units', () => {
    // independent library: mathjs 15 unit arithmetic
    const cases = [['4.7 uH', '100 pF'], ['230 uH', '365 pF'], ['0.33 uH', '22 pF'], ['10 mH', '1 nF']];
    for (const [L, C] of cases) {
      const expected = math.evaluate(`1 / (2 pi sqrt(${L} * ${C}))`).toNumber('Hz');
      const got = resonantFrequency(math.unit(L).toNumber('H'), math.unit(C).toNumber('F'));
      expect(got / expected - 1).toBeLessThan(1e-12);
    }
  });

  it('1 µH with 1 µF gives 1/(2π·1 µs) = 159.155 kHz', () => {
    // exact: √(LC) = 1 µs
    expect(resonantFrequency(1e-6, 1e-6)).toBeCloseTo(1e6 / (2 * Math.PI), 6);
  });
});

describe('rearranged forms and reactances', () => {
  it('inductanceForFrequency and capacitanceForFrequency invert resonantFrequency', () => {
    // mediumwave tank, 1 MHz with 200 µH: C = 1/((2π·1e6)²·200e-6) = 126.65 pF (hand calculation)
    expect(capacitanceForFrequency(1e6, 200e-6)).toBeCloseTo(126.651e-12, 15);
    expect(inductanceForFrequency(1e6, 126.651e-12) / 200e-6 - 1).toBeLessThan(5e-6);
  });

  it('X_L equals X_C equals √(L/C) at resonance', () => {
    const L = 4.7e-6, C = 100e-12;
    const f = resonantFrequency(L, C);
    const xl = inductiveReactance(f, L);
    expect(xl / capacitiveReactance(f, C) - 1).toBeLessThan(1e-14);
    expect(xl / characteristicImpedance(L, C) - 1).toBeLessThan(1e-14);
    // √(4.7e-6 / 100e-12) = √47000 = 216.795 Ω (hand calculation)
    expect(characteristicImpedance(L, C)).toBeCloseTo(216.795, 3);
  });

  it('X_L = 2πfL: 1 µH at 1 MHz is 6.283 Ω; X_C = 1/(2πfC): 1 nF at 1 MHz is 159.15 Ω', () => {
    // exact, from the definitions
    expect(inductiveReactance(1e6, 1e-6)).toBeCloseTo(2 * Math.PI, 12);
    expect(capacitiveReactance(1e6, 1e-9)).toBeCloseTo(1000 / (2 * Math.PI), 9);
  });
});

describe('input checks', () => {
  const bad = [0, -1e-6, Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY];
  it.each(bad)('rejects inductance %s with a DesignError naming the field', (v) => {
    try {
      resonantFrequency(v, 100e-12);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(DesignError);
      expect((e as DesignError).field).toBe('inductance');
      expect((e as DesignError).message).toMatch(/Inductance/);
    }
  });
  it.each(bad)('rejects capacitance %s', (v) => {
    expect(() => capacitanceForFrequency(1e6, 1e-6) && resonantFrequency(1e-6, v)).toThrow(DesignError);
  });
  it.each(bad)('rejects frequency %s', (v) => {
    expect(() => inductanceForFrequency(v, 1e-12)).toThrow(/Frequency/);
    expect(() => inductiveReactance(v, 1e-6)).toThrow(DesignError);
    expect(() => capacitiveReactance(v, 1e-6)).toThrow(DesignError);
  });
});

describe('extreme values', () => {
  it('stay finite where the answer is representable, and name a field where it is not', () => {
    // exact: √(LC) = 1e-300 s, so f = 1/(2π·1e-300 s); the product LC itself would underflow to 0
    expect(resonantFrequency(1e-300, 1e-300) / (1 / (2 * Math.PI * 1e-300)) - 1).toBeLessThan(1e-14);
    expect(resonantFrequency(1e300, 1e300) * 2 * Math.PI * 1e300).toBeCloseTo(1, 12);
    expect(characteristicImpedance(1e300, 1e-300)).toBeCloseTo(1e300, -290);
    // 1/((2π·1e-300)²·1e-300) is about 1e+898: beyond double precision
    for (const fn of [() => inductanceForFrequency(1e-300, 1e-300), () => capacitanceForFrequency(1e-300, 1e-300), () => inductiveReactance(1e300, 1e300), () => capacitiveReactance(1e-300, 1e-300)]) {
      expect(fn).toThrow(DesignError);
    }
    try {
      inductanceForFrequency(1e-150, 1e-300); // 1/((2π·1e-150)²·1e-300) ≈ 2.5e598
      expect.unreachable();
    } catch (e) {
      expect((e as DesignError).field).toBe('capacitance'); // the input farther from 1
      expect((e as DesignError).message).toMatch(/1e-300 F/);
    }
  });

  it('refuse text and missing values with a DesignError, never a TypeError', () => {
    expect(() => resonantFrequency('4.7e-6' as unknown as number, 1e-10)).toThrow(DesignError);
    expect(() => characteristicImpedance(undefined as unknown as number, 1e-10)).toThrow(/missing/);
  });
});

