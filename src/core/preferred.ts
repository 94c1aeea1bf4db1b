/**
 * Preferred numbers for resistors and capacitors: the IEC 60063 E-series.
 *
 * Source: IEC 60063:2015, *Preferred number series for resistors and
 * capacitors*, tables of the E3 to E24 series (two significant figures).
 * A value is found as a mantissa in [1, 10) times a power of ten.
 */
import { DesignError, requirePositive } from './errors';
import { sayNumber } from './text';

export type ESeriesName = 'E3' | 'E6' | 'E12' | 'E24';

/** Mantissas of each series, one decade, IEC 60063. */
export const E_SERIES: Readonly<Record<ESeriesName, readonly number[]>> = {
  E3: [1.0, 2.2, 4.7],
  E6: [1.0, 1.5, 2.2, 3.3, 4.7, 6.8],
  E12: [1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2],
  E24: [1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1],
};

/** Rounds away binary noise from mantissa × 10^k (e.g. 4.7e-12 stays 4.7e-12). */
function tidy(x: number): number {
  return Number(x.toPrecision(12));
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
 * The preferred values of a series either side of `value`.
 * @param value any positive quantity in SI units (farads, ohms, …), 1e−305 to 1e305
 * @param series the E-series (default E12)
 */
export function preferredNeighbours(value: number, series: ESeriesName = 'E12'): PreferredNeighbours {
  requirePositive('value', value, 'The value');
  if (typeof series !== 'string' || !Object.hasOwn(E_SERIES, series)) {
    throw new DesignError('series', `Unknown series ${typeof series === 'string' ? `"${series}"` : String(series)}: use E3, E6, E12 or E24.`);
  }
  if (value < 1e-305 || value > 1e305) {
    throw new DesignError('value', `The value ${sayNumber(value)} is far outside any part's: give one from 1e-305 to 1e305 in its SI unit.`);
  }
  const mantissas = E_SERIES[series];
  const decade = Math.floor(Math.log10(value));
  // Candidates over three decades around the value, so edges (9.9 → 10) work.
  const candidates: number[] = [];
  for (let k = decade - 1; k <= decade + 1; k++) {
    for (const m of mantissas) candidates.push(tidy(m * 10 ** k));
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
