/**
 * One full band-plan recompute, as the band bench will run it on each
 * keystroke: design for the band, its coverage, the dial law (181 points,
 * 1° steps) and the selectivity across the band with the coil wound once
 * (designCoil at each of 41 points plus the low, middle and high ends, each
 * through analyzeTank). Budget: well under one animation frame (16 ms).
 * vitest bench reports the mean in ms; multiply by 1,000 for µs.
 */
import { bench, describe } from 'vitest';
import { bandCoverage, bandSelectivity, designForBand } from '../../src/core/band';
import { dialLaw } from '../../src/core/dial';
import { slugTuning } from '../../src/core/slug';

// Demo job (invented, the fictional Larkspur Lane workshop): 5.9–6.2 MHz with a 10–365 pF capacitor.
const band = { lowFrequency: 5.9e6, highFrequency: 6.2e6, minCapacitance: 10e-12, maxCapacitance: 365e-12, strayCapacitance: 12e-12, margin: 0.01 };
const coil = { form: 'solenoid' as const, diameter: 20e-3, pitch: 1e-3, wire: { diameter: 0.5e-3, insulatedDiameter: 0.55e-3 }, leadLength: 0.03 };
let k = 0;

/** The whole plan for one set of inputs. */
function plan(strays: number, points: number): void {
  const d = designForBand({ ...band, strayCapacitance: strays });
  bandCoverage(d);
  dialLaw({ ...d, plates: 'slc', points: 181 });
  dialLaw({ ...d, plates: 'slf', points: 181 });
  slugTuning({ ...d, inductance: d.inductance, adjustment: 0.1, lowFrequency: band.lowFrequency, highFrequency: band.highFrequency });
  bandSelectivity({ band: d, coil, capacitorQ: 1000, sourceResistance: 20e3, loadResistance: 50e3, points });
}

describe('band plan', () => {
  bench('full plan: design, coverage, two dial laws, slug, selectivity over 41 points', () => {
    // vary the strays a little so nothing is cached between runs
    plan(12e-12 + (k++ % 100) * 1e-15, 41);
  });
  bench('full plan with selectivity over 201 points', () => {
    plan(12e-12 + (k++ % 100) * 1e-15, 201);
  });
  bench('designForBand alone', () => {
    designForBand({ ...band, strayCapacitance: 12e-12 + (k++ % 100) * 1e-15 });
  });
  bench('selectivity with a fixed coil Q (analyzeTank only), 41 points', () => {
    bandSelectivity({ band: designForBand(band), coilQ: 150 + (k++ % 100), capacitorQ: 1000, sourceResistance: 20e3, loadResistance: 50e3, points: 41 });
  });
});
