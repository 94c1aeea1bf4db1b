/**
 * A tank's response over a band, for the Tank bench's plots: |Z| and phase of
 * the tank alone and the terminated response in dB relative to its peak, on
 * the frequency grid every sweep in the core shares (`frequencyGrid`).
 * The impedance is the exact circuit algebra of `tankKernel`.
 */
import { TWO_PI } from './constants';
import { checkSweepOptions, frequencyGrid, type SweepOptions } from './sweep';
import { evaluate, findExtremum, kernelOf, scratch } from './tankKernel';
import { dominantField, qFigures, resolveTank, tankValue, type TankInput } from './tankModel';
import { DesignError } from './errors';
import { sayNumber } from './text';

export type { SweepOptions } from './sweep';

/** What `sweepTank` returns: one entry per frequency point. */
export interface TankSweep {
  /** Hz. */
  frequency: Float64Array;
  /**
   * |Z| of the tank alone, Ω. Infinity only at a point that falls exactly on
   * the resonance of an ideal parallel tank (no coil or capacitor loss).
   */
  magnitude: Float64Array;
  /** Phase of Z of the tank alone, degrees. */
  phase: Float64Array;
  /**
   * Terminated response, dB relative to its peak (≤ 0): parallel, the tank
   * voltage from a source through its resistance; series, the loop current.
   */
  response: Float64Array;
  /** Frequency of the terminated response's peak, Hz. */
  peakFrequency: number;
}

/** A previous sweep of n points whose arrays can be filled again. */
function reusable(into: unknown, n: number): into is TankSweep {
  if (typeof into !== 'object' || into === null) return false;
  const s = into as Partial<TankSweep>;
  return [s.frequency, s.magnitude, s.phase, s.response].every((a) => a instanceof Float64Array && a.length === n);
}

/**
 * Sweep the tank: |Z| and phase of the tank alone, and the terminated
 * response in dB normalised to its (exact) peak. No allocation per point; pass
 * `into` (a previous result of the same length) to reuse its arrays (anything
 * else there is ignored).
 * @param tank inputs in SI units
 * @param options start and stop in Hz (within `TANK_VALUE_RANGE`), points, spacing (see `frequencyGrid`)
 * @throws DesignError naming the input at fault
 */
export function sweepTank(tank: TankInput, options: SweepOptions, into?: TankSweep): TankSweep {
  const t = resolveTank(tank);
  const k = kernelOf(t);
  const q = qFigures(t);
  const [vPeak, minObj] = findExtremum(k, true, q.loadedQ);
  if (!Number.isFinite(vPeak)) {
    throw new DesignError(dominantField(q.shares, true), `The total loss is so high (Q about ${sayNumber(q.loadedQ)}) that the tank hardly resonates: its response has no clear peak. Reduce the loss.`);
  }
  const { start, stop, points: n } = checkSweepOptions(options);
  tankValue('start', start, 'Sweep start', 'Hz');
  tankValue('stop', stop, 'Sweep stop', 'Hz');
  const out: TankSweep = reusable(into, n)
    ? into
    : { frequency: new Float64Array(n), magnitude: new Float64Array(n), phase: new Float64Array(n), response: new Float64Array(n), peakFrequency: 0 };
  const { frequency, magnitude, phase, response } = out;
  frequencyGrid(options, frequency);
  const deg = 180 / Math.PI;
  const s = scratch;
  for (let i = 0; i < n; i++) {
    const w = TWO_PI * frequency[i];
    evaluate(k, w, w / k.w0 - 1, s);
    if (k.series) {
      magnitude[i] = Math.hypot(s[0], s[1]);
      phase[i] = Math.atan2(s[1], s[0]) * deg;
    } else {
      // Z = 1/Y: |Z| = 1/|Y|, arg Z = −arg Y.
      magnitude[i] = 1 / Math.hypot(s[0], s[1]);
      phase[i] = Math.atan2(-s[1], s[0]) * deg;
    }
    response[i] = 10 * Math.log10(minObj / s[2]);
  }
  out.peakFrequency = t.naturalFrequency * Math.exp(vPeak);
  return out;
}
