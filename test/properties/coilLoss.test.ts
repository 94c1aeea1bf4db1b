import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { coilAcResistance, solenoidProximityFactor } from '../../src/core';

const wire = fc.double({ min: 50e-6, max: 3e-3, noNaN: true });
const spacing = fc.double({ min: 1, max: 5, noNaN: true }); // pitch / wire diameter
const logFrequency = fc.double({ min: 2, max: 9.5, noNaN: true });

describe('coil loss properties', () => {
  it('proximity factor is ≥ 1, below its high-frequency limit, and rises with frequency', () => {
    fc.assert(
      fc.property(wire, spacing, logFrequency, fc.double({ min: 1e-4, max: 1, noNaN: true }), (d, k, lf, step) => {
        const p = d * k;
        const a = solenoidProximityFactor({ frequency: 10 ** lf, wireDiameter: d, pitch: p });
        const b = solenoidProximityFactor({ frequency: 10 ** lf * (1 + step), wireDiameter: d, pitch: p });
        expect(a.proximityFactor).toBeGreaterThanOrEqual(1);
        expect(a.proximityFactor).toBeLessThanOrEqual(1 + (Math.PI ** 2 / 2) / (k * k) + 1e-12);
        expect(b.proximityFactor).toBeGreaterThanOrEqual(a.proximityFactor);
      }),
      { numRuns: 400 },
    );
  });
  it('coil AC resistance ≥ DC resistance, and closer turns lose more', () => {
    fc.assert(
      fc.property(wire, spacing, logFrequency, (d, k, lf) => {
        const base = { turns: 10, diameter: 20 * d + 5e-3, wireDiameter: d, frequency: 10 ** lf };
        const wide = coilAcResistance({ ...base, pitch: d * k * 1.5 });
        const near = coilAcResistance({ ...base, pitch: d * k });
        expect(near.acResistance).toBeGreaterThanOrEqual(near.dcResistance);
        expect(near.proximityFactor).toBeGreaterThanOrEqual(wide.proximityFactor);
        expect(near.uncertainty).toBeGreaterThan(0);
        expect(near.uncertainty).toBeLessThan(0.6);
      }),
      { numRuns: 300 },
    );
  });
});
