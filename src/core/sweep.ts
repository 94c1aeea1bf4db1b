/**
 * Frequency grids for sweeps and plots: one definition of "start, stop,
 * points, spacing" that every sweep in the core (the tank's |Z| and response,
 * the coil's Q and apparent inductance) uses, so plots of different benches
 * agree on what a sweep is.
 */
import { DesignError, requireObject, requirePositive } from './errors';
import { sayQuantity } from './text';

/** Frequency points of a sweep. */
export interface SweepOptions {
  /** First frequency, Hz (> 0). */
  start: number;
  /** Last frequency, Hz (> start). */
  stop: number;
  /** Number of points (integer ≥ 2). */
  points: number;
  /** 'log' (default) or 'linear' spacing. */
  spacing?: 'log' | 'linear';
}

/** Largest number of points a sweep takes. */
export const MAX_SWEEP_POINTS = 1_000_000;

/**
 * Checks sweep options and returns them complete (spacing defaulted).
 * @throws DesignError naming `start`, `stop`, `points` or `spacing`
 */
export function checkSweepOptions(options: SweepOptions): Required<SweepOptions> {
  requireObject<SweepOptions>('sweep', options, 'The sweep');
  const start = requirePositive('start', options.start, 'Sweep start', 'Hz');
  const stop = requirePositive('stop', options.stop, 'Sweep stop', 'Hz');
  if (!(stop > start)) {
    throw new DesignError('stop', `Sweep stop ${sayQuantity(stop, 'Hz')} must be above the start ${sayQuantity(start, 'Hz')}.`);
  }
  const n = options.points;
  if (typeof n !== 'number' || !Number.isInteger(n) || n < 2 || n > MAX_SWEEP_POINTS) {
    throw new DesignError('points', `Number of sweep points must be a whole number from 2 to 1,000,000 (got ${String(n)}).`);
  }
  const spacing = options.spacing ?? 'log';
  if (spacing !== 'log' && spacing !== 'linear') {
    throw new DesignError('spacing', `Sweep spacing must be "log" or "linear" (got ${typeof spacing === 'string' ? JSON.stringify(spacing) : String(spacing)}).`);
  }
  return { start, stop, points: n, spacing };
}

/**
 * The frequencies of a sweep: `points` values from `start` to `stop`
 * inclusive, evenly spaced on a log (default) or linear scale. The last point
 * is exactly `stop`, so a plot's axis can end where its data end.
 * @param options start and stop in Hz, points, spacing
 * @param into optional array of length `points` to fill instead of allocating
 */
export function frequencyGrid(options: SweepOptions, into?: Float64Array): Float64Array {
  const { start, stop, points: n, spacing } = checkSweepOptions(options);
  const out = into && into.length === n ? into : new Float64Array(n);
  const log = spacing === 'log';
  const a = log ? Math.log(start) : start;
  const step = ((log ? Math.log(stop) : stop) - a) / (n - 1);
  for (let i = 0; i < n; i++) {
    const x = a + i * step;
    out[i] = log ? Math.exp(x) : x;
  }
  out[0] = start;
  out[n - 1] = stop;
  return out;
}
