/**
 * One bench recompute: analyse a tank and sweep 1,000 points (log spacing,
 * terminated response normalised to its peak). Budget: well under one
 * animation frame (16 ms). vitest bench reports the mean in ms; multiply by
 * 1,000 for µs.
 */
import { bench, describe } from 'vitest';
import { analyzeTank, sweepTank, type TankInput, type TankSweep } from '../../src/core';

// Demo tank (invented values): a 7 MHz front-end tank with its coil's self-capacitance.
const tank: TankInput = { inductance: 4.7e-6, capacitance: 100e-12, coilQ: 180, capacitorQ: 1500, coilSelfCapacitance: 3e-12, sourceResistance: 20e3, loadResistance: 20e3 };
const sweep = { start: 3e6, stop: 15e6, points: 1000, spacing: 'log' as const };
let reuse: TankSweep | undefined;
let k = 0;

describe('tank', () => {
  bench('analyzeTank + sweepTank 1,000 points', () => {
    // vary the load a little so nothing is cached between runs
    const t = { ...tank, loadResistance: 20e3 + (k++ % 100) };
    analyzeTank(t);
    sweepTank(t, sweep);
  });
  bench('analyzeTank + sweepTank 1,000 points, arrays reused', () => {
    const t = { ...tank, loadResistance: 20e3 + (k++ % 100) };
    analyzeTank(t);
    reuse = sweepTank(t, sweep, reuse);
  });
  bench('analyzeTank alone', () => {
    analyzeTank({ ...tank, loadResistance: 20e3 + (k++ % 100) });
  });
  bench('analyzeTank, ideal L and C loaded to Q ≈ 1e14 (longest searches)', () => {
    analyzeTank({ inductance: 4.7e-6, capacitance: 100e-12, loadResistance: 2.168e16 + (k++ % 100) * 1e12 });
  });
});
