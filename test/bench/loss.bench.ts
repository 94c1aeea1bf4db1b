import { bench, describe } from 'vitest';
import { wireAcResistanceRatio, coilQ, medhurstCapacitance, apparentCoil } from '../../src/core';

// Figures, not pass/fail: a bench recompute must stay well under one frame (16 ms).
const freqs = Array.from({ length: 1000 }, (_, i) => 10 ** (3 + (6.5 * i) / 999)); // 1 kHz … 3 GHz

describe('loss and self-capacitance', () => {
  bench('wireAcResistanceRatio, 1,000-point sweep (1 mm copper, 1 kHz … 3 GHz)', () => {
    for (const f of freqs) wireAcResistanceRatio(1e-3, f);
  });
  bench('coilQ, 1,000-point sweep', () => {
    for (const f of freqs) {
      coilQ({ inductance: 1.8e-6, frequency: f, turns: 14, diameter: 25e-3, pitch: 2e-3, wireDiameter: 1e-3, leadLength: 0.02 });
    }
  });
  bench('medhurstCapacitance + apparentCoil, 1,000 points', () => {
    const c = medhurstCapacitance(25e-3, 28e-3);
    for (let i = 0; i < 1000; i++) {
      apparentCoil({ inductance: 1.8e-6, resistance: 0.5, selfCapacitance: c, frequency: 1e6 + i * 1e4 });
    }
  });
});
