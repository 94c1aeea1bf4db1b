/**
 * Superheterodyne tracking: the oscillator circuit that follows the signal
 * circuit across a band, one gang section driving each.
 *
 * Model. Both tanks are lossless lumped LC circuits (Thomson's formula). Each
 * has the same tank layout: the gang section C in parallel with a trimmer
 * C_t, that pair in series with a padder C_p, and a stray capacitance C_s
 * (wiring, the coil's self-capacitance, the next stage's input) across the
 * coil L:
 *
 *   C_tank(C) = C_s + C_p (C + C_t) / (C + C_t + C_p),   1/ω² = L · C_tank(C).
 *
 * For a given signal frequency the signal circuit fixes the gang setting C.
 * The oscillator must then resonate at f ± IF. Written as a function of the
 * gang setting, the oscillator's 1/ω² is a linear fractional (Möbius) map:
 *
 *   1/ω_o² = L_o (C_s + C_p) − L_o C_p² / (C + C_t + C_p) = A + B / (C + D).
 *
 * Three-point tracking (Terman, *Radio Engineers' Handbook*, 1943, the
 * section on superheterodyne tracking, section from memory; Langford-Smith,
 * *Radiotron Designer's Handbook*, 4th ed., 1953, the chapter on tracking,
 * ch. 25 from memory) asks for exact tracking at three signal frequencies
 * f₁ < f₂ < f₃. Three points fix a Möbius map uniquely, so the solution is in
 * closed form, no iteration: with C_i the gang settings and Q_i = 1/ω_oi²,
 *
 *   R = (Q₁−Q₂)(C₃−C₂) / ((Q₂−Q₃)(C₂−C₁)),   D = (C₃ − R C₁) / (R − 1),
 *   B = (Q₁−Q₂)(C₁+D)(C₂+D) / (C₂−C₁),       A = Q₁ − B / (C₁+D);
 *
 * then with r = −B/A and the oscillator's stray C_s given,
 *
 *   C_p = (r + √(r² + 4 r C_s)) / 2,   L_o = A / (C_s + C_p),   C_t = D − C_p.
 *
 * (Derived here from the tank formula above; the handbooks solve the same
 * three equations by charts and successive approximation.) A consequence:
 * the tracking error curve does not depend on the oscillator's stray at all
 * (the map through three points is unique); a larger stray only asks for a
 * smaller trimmer, down to zero.
 *
 * Tracking points. By default the band centre and ±(√3/2) of the half-band
 * from it: the zeros of the Chebyshev polynomial T₃ over the band. If the
 * error between three exact points behaves like a cubic in frequency, these
 * points make its largest value over the band the smallest possible
 * (Chebyshev's minimax property of the interpolation nodes; e.g. Burden &
 * Faires, *Numerical Analysis*, the section on Chebyshev polynomials). The
 * handbooks' rule of thumb is the same idea (from memory): points near, but
 * inside, both ends and one near the middle. The real error is lopsided (for
 * medium wave it is largest at the low end), so the placement is near the
 * best, not the best; the caller may give their own three points.
 *
 * Error curve. At each signal frequency f of the band the oscillator runs at
 * f_o(C(f)); the error is f_o minus the frequency that would give exactly the
 * IF (f + IF above, f − IF below). It is the amount by which the signal
 * circuit is off-tune from the station the set actually receives. It is zero
 * at the three tracking points, changes sign at each, and in practice has one
 * extreme between neighbouring points and grows beyond the outer points. The
 * largest error is the largest |error| of the samples, refined by a
 * golden-section search between the best sample's neighbours.
 *
 * Image. The image of signal f is f + 2·IF (oscillator above) or |f − 2·IF|
 * (oscillator below), for the tank model's image rejection.
 *
 * Validity: lumped, lossless tanks (loss shifts resonance by O(1/Q²));
 * identical gang sections; the gang's capacitance law does not matter
 * (everything is a function of the capacitance, not of the angle).
 */
import { partnerAt, thomson, totalCapacitance, variableFor, type BandCircuit, type Network } from './band';
import { TWO_PI } from './constants';
import { DesignError, requireNonNegative, requireObject, requirePositive } from './errors';
import { note, type DesignNote } from './notes';
import { MAX_SWEEP_POINTS } from './sweep';
import { sayNumber, sayQuantity } from './text';

/**
 * One tuned circuit: coil, gang section (the variable capacitor), trimmer
 * across it, padder in series, stray across the coil (SI). The same circuit
 * as the band module's `BandCircuit`.
 */
export type TrackingCircuit = BandCircuit;

/** What three-point tracking starts from. */
export interface TrackingInput {
  /** Low end of the signal band, Hz (> 0). */
  lowFrequency: number;
  /** High end of the signal band, Hz (> lowFrequency). */
  highFrequency: number;
  /** Intermediate frequency, Hz (> 0; below the band's low end when the oscillator is below). */
  intermediateFrequency: number;
  /** Oscillator above (default) or below the signal. */
  oscillatorSide?: 'above' | 'below';
  /** The signal circuit as designed; it must tune the whole band. */
  signal: TrackingCircuit;
  /** Stray across the oscillator coil, F (≥ 0; default: the signal circuit's stray). */
  oscillatorStrayCapacitance?: number;
  /** Three signal frequencies of exact tracking, ascending, Hz (default: `trackingPoints(low, high)`). */
  trackingFrequencies?: readonly number[];
  /** Points of the error curve, whole number 3 … 1,000,000 (default 101). */
  points?: number;
}

/** The error curve over the band, as columns of equal length. */
export interface TrackingCurve {
  /** Signal frequency, Hz, evenly spaced from the band's low end to its high end. */
  signalFrequency: number[];
  /** Gang section setting that tunes the signal circuit there, F. */
  capacitance: number[];
  /** Oscillator frequency at that setting, Hz. */
  oscillatorFrequency: number[];
  /** Oscillator frequency minus the one that gives exactly the IF, Hz. */
  error: number[];
  /** `error` as a fraction of the IF. */
  relativeError: number[];
  /** Image frequency of each signal frequency, Hz: f + 2·IF above, |f − 2·IF| below. */
  imageFrequency: number[];
}

/** The largest tracking error over the band. */
export interface TrackingExtreme {
  /** Signed error, Hz. */
  error: number;
  /** Signed error as a fraction of the IF. */
  relativeError: number;
  /** Signal frequency where it occurs, Hz. */
  signalFrequency: number;
}

/** Error curve of a given oscillator circuit against the signal circuit. */
export interface TrackingCurveInput extends TrackingInput {
  /** The oscillator circuit (as designed by `designTracking`, or with parts rounded to stock values). */
  oscillator: TrackingCircuit;
}

export interface TrackingErrorResult {
  curve: TrackingCurve;
  largestError: TrackingExtreme;
  notes: DesignNote[];
}

export interface TrackingDesign extends TrackingErrorResult {
  /** The three signal frequencies of exact tracking, Hz. */
  trackingFrequencies: [number, number, number];
  /** The oscillator circuit: coil, trimmer and padder found; gang and stray as given. */
  oscillator: Required<TrackingCircuit>;
  /** Oscillator frequencies at the gang's ends, Hz (plates in, plates out). */
  oscillatorLowFrequency: number;
  oscillatorHighFrequency: number;
}

const DEFAULT_POINTS = 101;
/** Largest relative residual at a tracking point the closed form may leave before we call the case ill-conditioned. */
const RESIDUAL_LIMIT = 1e-9;

// ---------------------------------------------------------------------------
// The tank: the band module's capacitor network with its coil.

/** A checked circuit: the band module's network (padder undefined for none) and the coil L, H. */
interface Circuit extends Network {
  L: number;
}

/** Resonant frequency of the circuit at gang setting c, Hz (Thomson). */
function circuitFrequency(k: Circuit, c: number): number {
  return thomson(k.L, totalCapacitance(k, c));
}

/** Gang setting that tunes the circuit to f (NaN when no positive setting does). */
function gangSetting(k: Circuit, f: number): number {
  const total = partnerAt(k.L, f);
  const y = total - k.stray; // series(c + C_t, C_p)
  if (!(y > 0) || (k.padder !== undefined && !(y < k.padder))) return Number.NaN;
  return variableFor(k, total);
}

// ---------------------------------------------------------------------------
// Input checks.

function checkCircuit(prefix: string, value: unknown, what: string): Circuit {
  const k = requireObject<TrackingCircuit>(prefix, value, what);
  const L = requirePositive(`${prefix}.inductance`, k.inductance, `The ${what}'s inductance`, 'H');
  const cMin = requirePositive(`${prefix}.minCapacitance`, k.minCapacitance, 'The gang section\'s minimum capacitance', 'F');
  const cMax = requirePositive(`${prefix}.maxCapacitance`, k.maxCapacitance, 'The gang section\'s maximum capacitance', 'F');
  if (!(cMax > cMin)) {
    throw new DesignError(`${prefix}.maxCapacitance`, `The gang section's maximum ${sayQuantity(cMax, 'F')} must be above its minimum ${sayQuantity(cMin, 'F')}.`);
  }
  const stray = requireNonNegative(`${prefix}.strayCapacitance`, k.strayCapacitance, `The stray capacitance across the ${what}'s coil`, 'F');
  const trim = k.trimmerCapacitance === undefined ? 0 : requireNonNegative(`${prefix}.trimmerCapacitance`, k.trimmerCapacitance, `The ${what}'s trimmer`, 'F');
  const padder = k.padderCapacitance === undefined ? undefined : requirePositive(`${prefix}.padderCapacitance`, k.padderCapacitance, `The ${what}'s padder`, 'F');
  return { L, min: cMin, max: cMax, stray, trimmer: trim, padder };
}

interface Checked {
  low: number;
  high: number;
  ifreq: number;
  /** +1 oscillator above, −1 below. */
  side: 1 | -1;
  signal: Circuit;
  points: number;
  given: unknown;
}

function checkInput(value: unknown): Checked {
  const input = requireObject<TrackingInput>('input', value, 'The tracking input');
  const low = requirePositive('lowFrequency', input.lowFrequency, 'The band\'s low end', 'Hz');
  const high = requirePositive('highFrequency', input.highFrequency, 'The band\'s high end', 'Hz');
  if (!(high > low)) {
    throw new DesignError('highFrequency', `The band's high end ${sayQuantity(high, 'Hz')} must be above its low end ${sayQuantity(low, 'Hz')}.`);
  }
  const ifreq = requirePositive('intermediateFrequency', input.intermediateFrequency, 'The intermediate frequency', 'Hz');
  const sideText = input.oscillatorSide ?? 'above';
  if (sideText !== 'above' && sideText !== 'below') {
    throw new DesignError('oscillatorSide', `The oscillator side must be "above" or "below" (got ${typeof sideText === 'string' ? JSON.stringify(sideText) : String(sideText)}).`);
  }
  const side = sideText === 'above' ? 1 : -1;
  if (side < 0 && !(ifreq < low)) {
    throw new DesignError('intermediateFrequency', `With the oscillator below the signal, the IF ${sayQuantity(ifreq, 'Hz')} must be below the band's low end ${sayQuantity(low, 'Hz')}: the oscillator would run at zero or a negative frequency.`);
  }
  const signal = checkCircuit('signal', input.signal, 'signal circuit');
  const n = input.points ?? DEFAULT_POINTS;
  if (typeof n !== 'number' || !Number.isInteger(n) || n < 3 || n > MAX_SWEEP_POINTS) {
    throw new DesignError('points', `The number of points of the error curve must be a whole number from 3 to 1,000,000 (got ${String(n)}).`);
  }
  // the signal circuit must tune the whole band
  const sigLow = circuitFrequency(signal, signal.max);
  const sigHigh = circuitFrequency(signal, signal.min);
  if (!Number.isFinite(sigLow) || !Number.isFinite(sigHigh) || !(sigLow > 0)) {
    throw new DesignError('signal.inductance', 'The signal circuit\'s values are far outside anything that can be built: its tuning range cannot be computed.');
  }
  const slack = 1e-9;
  const range = `The signal circuit tunes ${sayQuantity(sigLow, 'Hz', 4)} to ${sayQuantity(sigHigh, 'Hz', 4)}`;
  if (low < sigLow * (1 - slack)) {
    throw new DesignError('lowFrequency', `${range}: the band's low end ${sayQuantity(low, 'Hz', 4)} is below it. Design the signal circuit for the band first (more inductance or capacitance).`);
  }
  if (high > sigHigh * (1 + slack)) {
    throw new DesignError('highFrequency', `${range}: the band's high end ${sayQuantity(high, 'Hz', 4)} is above it. Design the signal circuit for the band first (less trimmer or stray capacitance).`);
  }
  return { low, high, ifreq, side, signal, points: n, given: input };
}

/** Gang setting for signal frequency f, clamped onto the gang's range (f may sit a hair outside by rounding). */
function settingFor(k: Circuit, f: number): number {
  return Math.min(k.max, Math.max(k.min, gangSetting(k, f)));
}

function checkTrackingFrequencies(value: unknown, c: Checked): [number, number, number] {
  if (value === undefined) return trackingPoints(c.low, c.high);
  if (!Array.isArray(value) || value.length !== 3) {
    throw new DesignError('trackingFrequencies', 'Give exactly three tracking frequencies, ascending.');
  }
  const f = value.map((x, i) => requirePositive('trackingFrequencies', x, `Tracking frequency ${i + 1}`, 'Hz')) as [number, number, number];
  if (!(f[0] < f[1] && f[1] < f[2])) {
    throw new DesignError('trackingFrequencies', `The tracking frequencies must be distinct and ascending (got ${f.map((x) => sayQuantity(x, 'Hz', 4)).join(', ')}).`);
  }
  const sigLow = circuitFrequency(c.signal, c.signal.max);
  const sigHigh = circuitFrequency(c.signal, c.signal.min);
  for (const x of f) {
    if (x < sigLow || x > sigHigh) {
      throw new DesignError('trackingFrequencies', `Tracking frequency ${sayQuantity(x, 'Hz', 4)} is outside the signal circuit's range, ${sayQuantity(sigLow, 'Hz', 4)} to ${sayQuantity(sigHigh, 'Hz', 4)}.`);
    }
    if (c.side < 0 && !(x > c.ifreq)) {
      throw new DesignError('trackingFrequencies', `Tracking frequency ${sayQuantity(x, 'Hz', 4)} must be above the IF when the oscillator is below the signal.`);
    }
  }
  return f;
}

// ---------------------------------------------------------------------------
// Exports.

/**
 * The three signal frequencies of exact tracking, placed the usual way: the
 * band centre and ±(√3/2) of the half-band from it (the zeros of the
 * Chebyshev polynomial T₃ over the band; see the module header).
 * @param lowFrequency band's low end, Hz (> 0)
 * @param highFrequency band's high end, Hz (> lowFrequency)
 * @returns [f₁, f₂, f₃] ascending, Hz
 */
export function trackingPoints(lowFrequency: number, highFrequency: number): [number, number, number] {
  const low = requirePositive('lowFrequency', lowFrequency, 'The band\'s low end', 'Hz');
  const high = requirePositive('highFrequency', highFrequency, 'The band\'s high end', 'Hz');
  if (!(high > low)) {
    throw new DesignError('highFrequency', `The band's high end ${sayQuantity(high, 'Hz')} must be above its low end ${sayQuantity(low, 'Hz')}.`);
  }
  const centre = low / 2 + high / 2;
  const half = high / 2 - low / 2;
  const k = Math.sqrt(3) / 2;
  return [centre - k * half, centre, centre + k * half];
}

/** Throws unless every number in the result is finite (extreme inputs can overflow the arithmetic). */
function requireClean(values: readonly number[], field: string): void {
  for (const v of values) {
    if (!Number.isFinite(v)) {
      throw new DesignError(field, 'These values are far outside anything that can be built: the tracking cannot be computed with them.');
    }
  }
}

function curveOf(c: Checked, osc: Circuit): TrackingErrorResult {
  const { low, high, ifreq, side, signal, points: n } = c;
  const curve: TrackingCurve = { signalFrequency: [], capacitance: [], oscillatorFrequency: [], error: [], relativeError: [], imageFrequency: [] };
  const errorAt = (f: number): number => circuitFrequency(osc, settingFor(signal, f)) - (f + side * ifreq);
  for (let i = 0; i < n; i++) {
    const f = i === n - 1 ? high : low + ((high - low) * i) / (n - 1);
    const setting = settingFor(signal, f);
    const fo = circuitFrequency(osc, setting);
    const e = fo - (f + side * ifreq);
    curve.signalFrequency.push(f);
    curve.capacitance.push(setting);
    curve.oscillatorFrequency.push(fo);
    curve.error.push(e);
    curve.relativeError.push(e / ifreq);
    curve.imageFrequency.push(Math.abs(f + 2 * side * ifreq));
  }
  for (const column of Object.values(curve)) requireClean(column, 'intermediateFrequency');
  // largest |error|: the best sample, refined by golden-section search between its neighbours
  let k = 0;
  for (let i = 1; i < n; i++) if (Math.abs(curve.error[i]) > Math.abs(curve.error[k])) k = i;
  let at = curve.signalFrequency[k];
  let worst = curve.error[k];
  if (k > 0 && k < n - 1) {
    let a = curve.signalFrequency[k - 1];
    let b = curve.signalFrequency[k + 1];
    const g = (Math.sqrt(5) - 1) / 2;
    for (let i = 0; i < 60 && b - a > 1e-9 * b; i++) {
      const x1 = b - g * (b - a);
      const x2 = a + g * (b - a);
      if (Math.abs(errorAt(x1)) > Math.abs(errorAt(x2))) b = x2;
      else a = x1;
    }
    const x = (a + b) / 2;
    const e = errorAt(x);
    if (Math.abs(e) > Math.abs(worst)) {
      at = x;
      worst = e;
    }
  }
  const notes: DesignNote[] = [];
  if (side > 0 && ifreq >= low && ifreq <= high) {
    notes.push(note('info', `The IF ${sayQuantity(ifreq, 'Hz', 4)} lies inside the band: the set cannot receive near it, and a strong signal there passes straight into the IF amplifier.`, 'intermediateFrequency'));
  }
  // images that fall inside the band itself
  const from = side > 0 ? low : Math.max(low, low + 2 * ifreq);
  const to = side > 0 ? Math.min(high, high - 2 * ifreq) : high;
  if (from < to) {
    notes.push(note('info', `Images of signals from ${sayQuantity(from, 'Hz', 4)} to ${sayQuantity(to, 'Hz', 4)} fall inside the band itself: only the signal circuit's selectivity rejects them.`, 'intermediateFrequency'));
  }
  return { curve, largestError: { error: worst, relativeError: worst / ifreq, signalFrequency: at }, notes };
}

/**
 * Tracking error of a given oscillator circuit against the signal circuit
 * across the band: at each signal frequency the gang setting from the signal
 * circuit, the oscillator's frequency there (Thomson's formula on the tank of
 * the module header), and its error against f ± IF; the largest error and
 * where; the image frequencies. Use it for parts rounded to stock values.
 * @param input band (Hz), IF (Hz), oscillator side, signal and oscillator circuits (H, F), points
 * @throws DesignError naming the input at fault ('signal.inductance', 'oscillator.padderCapacitance', 'lowFrequency', …)
 */
export function trackingError(input: TrackingCurveInput): TrackingErrorResult {
  const c = checkInput(input);
  const osc = checkCircuit('oscillator', (input as TrackingCurveInput).oscillator, 'oscillator');
  const same = (a: number, b: number): boolean => Math.abs(a - b) <= 1e-9 * Math.max(a, b);
  if (!same(osc.min, c.signal.min) || !same(osc.max, c.signal.max)) {
    throw new DesignError('oscillator.maxCapacitance', 'The oscillator\'s gang section must be the same as the signal circuit\'s (same minimum and maximum): both are sections of one gang.');
  }
  return curveOf(c, osc);
}

/**
 * Three-point tracking: the oscillator coil, trimmer (across the gang
 * section) and padder (in series) that make the oscillator run exactly at
 * f ± IF at three signal frequencies, in closed form (module header), and the
 * tracking error curve over the band with its largest error.
 * @param input band (Hz), IF (Hz), oscillator side, the signal circuit (H, F),
 *   the oscillator's stray (F), optional tracking frequencies (Hz), curve points
 * @throws DesignError when an input is invalid, when the signal circuit does
 *   not tune the band, or when no positive trimmer and padder can track (the
 *   sentence says what to change)
 */
export function designTracking(input: TrackingInput): TrackingDesign {
  const c = checkInput(input);
  const given = c.given as TrackingInput;
  const stray = given.oscillatorStrayCapacitance === undefined ? c.signal.stray : requireNonNegative('oscillatorStrayCapacitance', given.oscillatorStrayCapacitance, 'The stray capacitance across the oscillator coil', 'F');
  const f = checkTrackingFrequencies(given.trackingFrequencies, c);
  const C = f.map((x) => settingFor(c.signal, x));
  const target = f.map((x) => x + c.side * c.ifreq);
  const Q = target.map((x) => 1 / (TWO_PI * x) / (TWO_PI * x));
  const sideWord = c.side > 0 ? 'above' : 'below';
  const impossible = (): DesignError => {
    const oLow = c.low + c.side * c.ifreq;
    const oHigh = c.high + c.side * c.ifreq;
    return new DesignError(
      'oscillatorSide',
      `With the oscillator ${sideWord} the signal it must tune ${sayQuantity(oLow, 'Hz', 4)} to ${sayQuantity(oHigh, 'Hz', 4)} (ratio ${sayNumber(oHigh / oLow, 4)}) while the signal circuit tunes the band with ratio ${sayNumber(c.high / c.low, 4)}: no trimmer and padder on this gang section can track that, since they only narrow its swing. ${c.side < 0 ? 'Put the oscillator above the signal, or give the signal circuit more fixed capacitance (a larger trimmer or a padder).' : 'Check the IF and the band.'}`,
    );
  };
  const R = ((Q[0] - Q[1]) * (C[2] - C[1])) / ((Q[1] - Q[2]) * (C[1] - C[0]));
  const D = (C[2] - R * C[0]) / (R - 1);
  const B = ((Q[0] - Q[1]) * (C[0] + D) * (C[1] + D)) / (C[1] - C[0]);
  const A = Q[0] - B / (C[0] + D);
  requireClean([R, D, B, A], 'intermediateFrequency');
  if (!(B < 0 && A > 0 && D > 0)) throw impossible();
  const r = -B / A;
  // largest stray across the oscillator coil that still leaves a trimmer ≥ 0 (C_t = 0 ⇔ C_p = D)
  const strayLimit = (D * D) / r - D;
  if (!(strayLimit >= 0)) throw impossible();
  const padder = (r + Math.sqrt(r * r + 4 * r * stray)) / 2;
  const inductance = A / (stray + padder);
  let trimmer = D - padder;
  if (trimmer < 0 && trimmer > -1e-12 * D) trimmer = 0;
  if (trimmer < 0) {
    throw new DesignError(
      'oscillatorStrayCapacitance',
      `The stray across the oscillator coil, ${sayQuantity(stray, 'F')}, is more than this tracking allows (${sayQuantity(strayLimit, 'F')}): the trimmer would have to be ${sayQuantity(trimmer, 'F')}. Keep the oscillator's wiring short or use a coil with less self-capacitance (the tracking error does not depend on this stray; only the trimmer does).`,
    );
  }
  requireClean([padder, inductance, trimmer], 'intermediateFrequency');
  const oscillator: Required<TrackingCircuit> = {
    inductance,
    minCapacitance: c.signal.min,
    maxCapacitance: c.signal.max,
    strayCapacitance: stray,
    trimmerCapacitance: trimmer,
    padderCapacitance: padder,
  };
  const osc: Circuit = { L: inductance, min: c.signal.min, max: c.signal.max, stray, trimmer, padder };
  // the closed form must hit its three points; extreme inputs lose the digits it needs
  for (let i = 0; i < 3; i++) {
    const fo = circuitFrequency(osc, C[i]);
    if (!(Math.abs(fo / target[i] - 1) <= RESIDUAL_LIMIT)) {
      throw new DesignError('intermediateFrequency', `With an IF of ${sayQuantity(c.ifreq, 'Hz', 4)} against this band the three tracking equations cannot be solved to working precision: the values are far from any practical receiver.`);
    }
  }
  const result = curveOf(c, osc);
  const oscillatorLowFrequency = circuitFrequency(osc, osc.max);
  const oscillatorHighFrequency = circuitFrequency(osc, osc.min);
  requireClean([oscillatorLowFrequency, oscillatorHighFrequency], 'intermediateFrequency');
  const notes = [
    note('info', `Tracks exactly at ${f.map((x) => sayQuantity(x, 'Hz', 4)).join(', ')}${given.trackingFrequencies === undefined ? ' (band centre and ±0.866 of the half-band: the Chebyshev placement)' : ''}; largest error ${sayQuantity(result.largestError.error, 'Hz', 3)} at ${sayQuantity(result.largestError.signalFrequency, 'Hz', 4)}.`),
    ...result.notes,
  ];
  return { ...result, notes, trackingFrequencies: f, oscillator, oscillatorLowFrequency, oscillatorHighFrequency };
}
