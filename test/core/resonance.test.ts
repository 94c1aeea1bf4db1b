import { describe, expect, it } from 'vitest';
import {
  resonantFrequency, inductanceForFrequency, capacitanceForFrequency,
  inductiveReactance, capacitiveReactance, characteristicImpedance, DesignError,
} from '../../src/core';

describe('resonance', () => {
  it('1 µH with 1 µF resonates at 159.155 kHz', () => {
    // exact: 1 / (2π · 1e-6 s) = 159 154.94 Hz
    expect(resonantFrequency(1e-6, 1e-6)).toBeCloseTo(159154.943, 2);
  });
  it('rejects zero', () => {
    expect(() => resonantFrequency(0, 1e-12)).toThrow(DesignError);
  });
  it('round trip', () => {
    const f = resonantFrequency(4.7e-6, 100e-12);
    expect(inductanceForFrequency(f, 100e-12)).toBeCloseTo(4.7e-6, 15);
    expect(capacitanceForFrequency(f, 4.7e-6)).toBeCloseTo(100e-12, 20);
    expect(inductiveReactance(f, 4.7e-6)).toBeCloseTo(capacitiveReactance(f, 100e-12), 9);
    expect(characteristicImpedance(4.7e-6, 100e-12)).toBeCloseTo(216.79, 2);
  });
});
