import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { coilAcResistance, coilQ, solenoidProximityFactor } from '../../src/core';

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
        expect(near.modelError).toBeGreaterThan(0);
        expect(near.modelError).toBeLessThan(0.6);
        // the band brackets the stated value, one-sided by the known bias
        expect(near.acResistanceLow).toBeLessThanOrEqual(near.acResistance);
        expect(near.acResistanceHigh).toBeGreaterThanOrEqual(near.acResistance);
        expect(near.acResistanceLow).toBeLessThanOrEqual((near.acResistance / (1 + near.modelError)) * (1 + 1e-12));
        expect(near.longCoilBias).toBeGreaterThanOrEqual(0);
      }),
      { numRuns: 300 },
    );
  });
});

describe('coil Q band properties', () => {
  it('qLow ≤ q ≤ qHigh, and the upper side is at least as wide as the lower one', () => {
    fc.assert(
      fc.property(wire, spacing, logFrequency, fc.integer({ min: 1, max: 500 }), (d, k, lf, n) => {
        const r = coilQ({ turns: n, diameter: 20 * d + 5e-3, wireDiameter: d, pitch: d * k, frequency: 10 ** lf, inductance: 1e-6 });
        expect(r.qLow).toBeLessThanOrEqual(r.q);
        expect(r.qHigh).toBeGreaterThanOrEqual(r.q);
        // upper: (1 + bias)(1 + u) − 1 ≥ lower: 1 − 1/(1 + u)
        expect(r.qUncertainty.above).toBeGreaterThanOrEqual(r.qUncertainty.below - 1e-12);
        if (n === 1) expect(r.proximityFactor).toBe(1);
      }),
      { numRuns: 300 },
    );
  });
});
