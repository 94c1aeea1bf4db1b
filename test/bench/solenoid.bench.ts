import { bench, describe } from 'vitest';
import { solenoidInductance, turnsForInductance, nagaokaCoefficient } from '../../src/core';

// Representative coils (invented demo values): a broadcast-band tank coil, a short HF coil with
// spaced turns, a long fine-wire coil and a fractional-turn VHF coil.
const coils = [
  { diameter: 0.03, turns: 65, pitch: 0.32e-3, wireDiameter: 0.25e-3 },
  { diameter: 0.025, turns: 12, pitch: 2e-3, wireDiameter: 1e-3 },
  { diameter: 0.01, turns: 400, pitch: 0.2e-3, wireDiameter: 0.15e-3 },
  { diameter: 0.008, turns: 4.5, pitch: 1.5e-3, wireDiameter: 1e-3 },
];
const targets = [
  { inductance: 230e-6, diameter: 0.03, wireDiameter: 0.25e-3, insulatedDiameter: 0.29e-3, closeWound: true },
  { inductance: 1.2e-6, diameter: 0.025, pitch: 2e-3, wireDiameter: 1e-3 },
  { inductance: 50e-6, diameter: 0.01, pitch: 0.2e-3, wireDiameter: 0.15e-3 },
  { inductance: 80e-9, diameter: 0.008, pitch: 1.5e-3, wireDiameter: 1e-3 },
];

describe('solenoid', () => {
  bench('solenoidInductance (4 coils per iteration)', () => {
    for (const c of coils) solenoidInductance(c);
  });
  bench('turnsForInductance (4 targets per iteration)', () => {
    for (const t of targets) turnsForInductance(t);
  });
  bench('nagaokaCoefficient (short, medium, long)', () => {
    nagaokaCoefficient(1, 0.01);
    nagaokaCoefficient(1, 1);
    nagaokaCoefficient(1, 100);
  });
});
