import { bench, describe } from 'vitest';
import { wireAcResistanceRatio, coilQ, medhurstCapacitance, apparentCoil, designCoil } from '../../src/core';

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

describe('designCoil', () => {
  // the Coil bench's whole recompute: a demo 40 m coil with its Q / L′ sweep
  const spec = {
    form: 'solenoid', inductance: 4.7e-6, diameter: 25.544e-3, closeWound: true,
    wire: { diameter: 0.5e-3, insulatedDiameter: 0.544e-3 }, frequency: 7.1e6, leadLength: 0.015,
  } as const;
  bench('designCoil, solenoid, no sweep', () => {
    designCoil(spec);
  });
  bench('designCoil, solenoid, 120-point sweep', () => {
    designCoil({ ...spec, sweepPoints: 120 });
  });
  bench('designCoil, solenoid, 1,000-point sweep', () => {
    designCoil({ ...spec, sweepPoints: 1000 });
  });
  bench('designCoil, toroid and multilayer', () => {
    designCoil({ form: 'toroid', turns: 20, outerDiameter: 12.7e-3, innerDiameter: 7.7e-3, height: 4.8e-3, relativePermeability: 10, muImag: 0.1, wire: spec.wire, frequency: 7e6 });
    designCoil({ form: 'multilayer', inductance: 100e-6, diameter: 12e-3, length: 6e-3, windingDepth: 4e-3, wire: { diameter: 0.1e-3 } });
  });
});
