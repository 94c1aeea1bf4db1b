/**
 * Preferred numbers for resistors, capacitors and inductors: the IEC 60063
 * E-series.
 *
 * Source: IEC 60063:2015, *Preferred number series for resistors and
 * capacitors*. E3 to E24 are the standard's two-figure values (the older
 * values between 2.7 and 4.7 and 8.2 do not follow the geometric rounding;
 * the standard keeps them). E48, E96 and E192 are its three-figure values:
 * the E192 table is written out below as the standard gives it (it is
 * 10^(i/192) rounded to three figures except 9.20 where rounding gives 9.19);
 * E96 is every second E192 value and E48 every fourth, as in the standard's
 * table. A value is found as a mantissa in [1, 10) times a power of ten.
 *
 * Validity: any positive value from 1e−305 to 1e305 in its SI unit.
 */
import { DesignError, requirePositive } from './errors';
import { sayNumber } from './text';

export type ESeriesName = 'E3' | 'E6' | 'E12' | 'E24' | 'E48' | 'E96' | 'E192';

/** The series names, fewest values first. */
export const E_SERIES_NAMES: readonly ESeriesName[] = Object.freeze(['E3', 'E6', 'E12', 'E24', 'E48', 'E96', 'E192']);

const E24 = [1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1];

/** IEC 60063:2015, E192, in hundredths (1.00 … 9.88). */
const E192_HUNDREDTHS = [
  100, 101, 102, 104, 105, 106, 107, 109, 110, 111, 113, 114, 115, 117, 118, 120,
  121, 123, 124, 126, 127, 129, 130, 132, 133, 135, 137, 138, 140, 142, 143, 145,
  147, 149, 150, 152, 154, 156, 158, 160, 162, 164, 165, 167, 169, 172, 174, 176,
  178, 180, 182, 184, 187, 189, 191, 193, 196, 198, 200, 203, 205, 208, 210, 213,
  215, 218, 221, 223, 226, 229, 232, 234, 237, 240, 243, 246, 249, 252, 255, 258,
  261, 264, 267, 271, 274, 277, 280, 284, 287, 291, 294, 298, 301, 305, 309, 312,
  316, 320, 324, 328, 332, 336, 340, 344, 348, 352, 357, 361, 365, 370, 374, 379,
  383, 388, 392, 397, 402, 407, 412, 417, 422, 427, 432, 437, 442, 448, 453, 459,
  464, 470, 475, 481, 487, 493, 499, 505, 511, 517, 523, 530, 536, 542, 549, 556,
  562, 569, 576, 583, 590, 597, 604, 612, 619, 626, 634, 642, 649, 657, 665, 673,
  681, 690, 698, 706, 715, 723, 732, 741, 750, 759, 768, 777, 787, 796, 806, 816,
  825, 835, 845, 856, 866, 876, 887, 898, 909, 920, 931, 942, 953, 965, 976, 988,
];

const every = (values: readonly number[], step: number): number[] => values.filter((_, i) => i % step === 0);
const E192 = E192_HUNDREDTHS.map((h) => h / 100);

/** Mantissas of each series, one decade in [1, 10), ascending, IEC 60063:2015. */
export const E_SERIES: Readonly<Record<ESeriesName, readonly number[]>> = Object.freeze({
  E3: Object.freeze(every(E24, 8)),
  E6: Object.freeze(every(E24, 4)),
  E12: Object.freeze(every(E24, 2)),
  E24: Object.freeze(E24),
  E48: Object.freeze(every(E192, 4)),
  E96: Object.freeze(every(E192, 2)),
  E192: Object.freeze(E192),
});

/** Throws a DesignError unless `series` names an IEC 60063 series. */
export function requireSeries(field: string, series: unknown): ESeriesName {
  if (typeof series !== 'string' || !Object.hasOwn(E_SERIES, series)) {
    throw new DesignError(field, `Unknown series ${typeof series === 'string' ? `"${series.slice(0, 20)}"` : String(series)}: use ${E_SERIES_NAMES.join(', ')}.`);
  }
  return series as ESeriesName;
}

/**
 * One decade of an E-series: the mantissas in [1, 10), ascending (IEC 60063:2015).
 * Multiply by a power of ten for a part's value (4.7 → 4.7 µH as 4.7e-6 H).
 * @param series 'E3', 'E6', 'E12', 'E24' (two figures), 'E48', 'E96', 'E192' (three figures)
 */
export function eSeries(series: ESeriesName): readonly number[] {
  return E_SERIES[requireSeries('series', series)];
}

/** Rounds away binary noise from mantissa × 10^k (e.g. 4.7e-12 stays 4.7e-12). */
function tidyValue(x: number): number {
  return Number(x.toPrecision(12));
}

/**
 * The values of a series from `min` to `max` (both in the same SI unit), ascending.
 * @param min smallest value wanted (> 0)
 * @param max largest value wanted (≥ min); at most 60 decades apart
 */
export function seriesValuesBetween(series: ESeriesName, min: number, max: number): number[] {
  const mantissas = eSeries(series);
  const lo = requirePositive('min', min, 'The smallest value');
  const hi = requirePositive('max', max, 'The largest value');
  if (hi < lo) throw new DesignError('max', `The largest value ${sayNumber(hi)} is below the smallest ${sayNumber(lo)}.`);
  const first = Math.floor(Math.log10(lo));
  const last = Math.floor(Math.log10(hi));
  if (last - first > 60) throw new DesignError('max', 'Give a range of at most 60 decades.');
  const out: number[] = [];
  for (let k = first; k <= last; k++) {
    for (const m of mantissas) {
      const v = tidyValue(m * 10 ** k);
      if (v >= lo * (1 - 1e-12) && v <= hi * (1 + 1e-12)) out.push(v);
    }
  }
  return out;
}

export interface PreferredNeighbours {
  /** Largest preferred value ≤ the value asked for. */
  below: number;
  /** Smallest preferred value ≥ the value asked for. */
  above: number;
  /** Whichever of the two is closer on a ratio (logarithmic) scale. */
  nearest: number;
}

/**
 * The preferred values of a series either side of `value`; the nearest is
 * the closer on a ratio (logarithmic) scale, |ln(value/below)| against
 * |ln(above/value)| (a tie goes to the lower value).
 * @param value any positive quantity in SI units (farads, ohms, henries), 1e−305 to 1e305
 * @param series the E-series (default E12), IEC 60063:2015
 */
export function preferredNeighbours(value: number, series: ESeriesName = 'E12'): PreferredNeighbours {
  requirePositive('value', value, 'The value');
  const mantissas = E_SERIES[requireSeries('series', series)];
  if (value < 1e-305 || value > 1e305) {
    throw new DesignError('value', `The value ${sayNumber(value)} is far outside any part's: give one from 1e-305 to 1e305 in its SI unit.`);
  }
  const decade = Math.floor(Math.log10(value));
  // Candidates over three decades around the value, so edges (9.9 → 10) work.
  const candidates: number[] = [];
  for (let k = decade - 1; k <= decade + 1; k++) {
    for (const m of mantissas) candidates.push(tidyValue(m * 10 ** k));
  }
  const rel = 1e-9;
  let below = candidates[0];
  let above = candidates[candidates.length - 1];
  for (const c of candidates) {
    if (c <= value * (1 + rel)) below = c;
  }
  for (let i = candidates.length - 1; i >= 0; i--) {
    if (candidates[i] >= value * (1 - rel)) above = candidates[i];
  }
  const nearest = Math.abs(Math.log(value / below)) <= Math.abs(Math.log(above / value)) ? below : above;
  return { below, above, nearest };
}

/**
 * The preferred value of a series nearest to `value` on a ratio (logarithmic)
 * scale: 9.6 → 10 in E24 (10/9.6 < 9.6/9.1), 0.99 → 1.0 in E12.
 * @param value any positive quantity in SI units, 1e−305 to 1e305
 * @param series the E-series (default E12), IEC 60063:2015
 */
export function nearestPreferredValue(value: number, series: ESeriesName = 'E12'): number {
  return preferredNeighbours(value, series).nearest;
}
