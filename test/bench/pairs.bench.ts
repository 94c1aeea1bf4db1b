/**
 * The pairs picker: the search alone (candidate pairs per second: divide
 * `pairsSearched`, printed once below, by the mean time) and one full picker
 * run with the tolerance spread (worst case, 2,000 Monte-Carlo units and the
 * trimmer range for each of ten candidates). vitest bench reports the mean in ms.
 */
import { bench, describe } from 'vitest';
import { resonantPairs, toleranceSpread, type PairSearch } from '../../src/core/pairs';

// Demo job (invented values): a 7.1 MHz front-end tank with 12 pF of strays and two shop coils.
const shopCoils = [
  { name: 'bench 40 m slug coil', inductance: 4.2e-6, selfCapacitance: 2.5e-12 },
  { name: 'drawer 3, green former', inductance: 2.93e-6, selfCapacitance: 1.8e-12 },
];
const search: PairSearch = { frequency: 7.1e6, strayCapacitance: 12e-12, shopCoils, capacitorSeries: 'E192', inductorSeries: 'E12', count: 1, samples: 1 };
const full: PairSearch = { ...search, capacitorSeries: 'E24', count: 10, samples: 2000, strayTolerance: 0.25 };
let k = 0;

const searched = resonantPairs(search).pairsSearched;
const searchedE24 = resonantPairs(full).pairsSearched;
console.log(`pairs searched per run: ${searched} (E192 capacitors × E12 inductors and shop coils), ${searchedE24} (E24)`);

describe('pairs', () => {
  bench(`search alone: ${searched} pairs (E192 C × E12 L), 1 candidate, 1 unit`, () => {
    resonantPairs({ ...search, frequency: 7.1e6 + (k++ % 100) });
  });
  bench(`full picker: ${searchedE24} pairs (E24 C × E12 L), 10 candidates × 2,000 units with trimmer`, () => {
    resonantPairs({ ...full, frequency: 7.1e6 + (k++ % 100) });
  });
  bench('toleranceSpread: 10,000 units, normal', () => {
    toleranceSpread({ inductance: 4.7e-6, capacitance: 100e-12, strayCapacitance: 12e-12, inductanceTolerance: 0.05, capacitanceTolerance: 0.05, strayTolerance: 0.25, samples: 10_000, seed: k++ % 1000, distribution: 'normal' });
  });
});
