/**
 * Image rejection of a superheterodyne's tuned front end: how much weaker the
 * tank passes a signal at the image frequency than one at the frequency it is
 * tuned to.
 *
 * A superhet mixes the signal f_s with an oscillator f_o = f_s ± IF; a signal
 * at the image f_i = f_s ± 2·IF (the same side as the oscillator) mixes to the
 * same IF and only the circuits ahead of the mixer can keep it out.
 *
 * Exact: the tank's terminated response (the one the Tank bench plots:
 * parallel, the tank voltage from a source through its resistance; series, the
 * loop current; see `sweepTank`) at f_s and at f_i, with every loss as the
 * resistance it is at f_s (a coil Q or capacitor Q given at f_s turns into a
 * fixed resistance, as in `resolveTank`). Rejection = response(f_s) −
 * response(f_i), in dB, positive when the image is weaker.
 *
 * Estimate beside it: one tuned circuit of loaded Q passes a frequency f
 * relative to its resonance f_s as 1/√(1 + Q²ξ²), ξ = f/f_s − f_s/f (the
 * universal resonance curve; Terman, *Radio Engineers' Handbook*, 1943; section
 * from memory), so the image ratio of one circuit is √(1 + Q_L²ξ²). It assumes
 * a Q that does not change with frequency; the exact figure does not.
 *
 * Validity: the lumped tank model of `tankModel` (f well below the coil's
 * self-resonance: an image far above f_s may sit near it, and the notes of
 * `analyzeTank` say so). One tuned circuit: stages in cascade add their
 * rejections in dB.
 */
import { DesignError, requireObject } from './errors';
import { analyzeTank } from './tank';
import { tankValue, type TankInput } from './tankModel';
import { sweepTank } from './tankSweep';
import { sayQuantity } from './text';

/** Which side of the signal the local oscillator runs. */
export type OscillatorSide = 'above' | 'below';

export interface ImageRejectionInput {
  /** The tank as tuned to the signal (see `TankInput`); its loss figures refer to the signal frequency. */
  tank: TankInput;
  /** Signal frequency the tank is tuned to, Hz (the response is taken here, not at the tank's own peak). */
  signalFrequency: number;
  /** Intermediate frequency, Hz. */
  intermediateFrequency: number;
  /** Oscillator above (default) or below the signal. */
  oscillatorSide?: OscillatorSide;
}

export interface ImageRejection {
  signalFrequency: number;
  /** f_s + 2·IF (oscillator above) or f_s − 2·IF (below), Hz. */
  imageFrequency: number;
  /** Response at the signal minus response at the image, dB (positive: the image is weaker). */
  rejection: number;
  /** The universal-resonance estimate 20 log₁₀ √(1 + Q_L²ξ²), dB. */
  estimate: number;
  /** Loaded Q of the tank (from `analyzeTank`). */
  loadedQ: number;
}

/**
 * The image of a signal: f_s + 2·IF with the oscillator above, f_s − 2·IF below.
 * @throws DesignError when the image would be at or below 0 Hz (oscillator below a signal under 2·IF)
 */
export function imageFrequency(signalFrequency: number, intermediateFrequency: number, oscillatorSide: OscillatorSide = 'above'): number {
  const fs = tankValue('signalFrequency', signalFrequency, 'Signal frequency', 'Hz');
  const fif = tankValue('intermediateFrequency', intermediateFrequency, 'Intermediate frequency', 'Hz');
  if (oscillatorSide !== 'above' && oscillatorSide !== 'below') {
    throw new DesignError('oscillatorSide', `The oscillator runs 'above' or 'below' the signal; got ${JSON.stringify(String(oscillatorSide)).slice(0, 40)}.`);
  }
  if (oscillatorSide === 'above') return fs + 2 * fif;
  const fi = fs - 2 * fif;
  if (!(fi > 0)) {
    throw new DesignError(
      'intermediateFrequency',
      `With the oscillator below a ${sayQuantity(fs, 'Hz')} signal, an IF of ${sayQuantity(fif, 'Hz')} puts the oscillator at or below 0 Hz; put the oscillator above, or use an IF under ${sayQuantity(fs / 2, 'Hz')}.`,
    );
  }
  return fi;
}

/**
 * Image rejection of one tuned circuit, exact from the tank's circuit and
 * estimated from its loaded Q.
 * @throws DesignError naming the input at fault (tank inputs as `tank.<name>`)
 */
export function imageRejection(input: ImageRejectionInput): ImageRejection {
  requireObject('input', input, 'The image-rejection input');
  const { tank, signalFrequency, intermediateFrequency, oscillatorSide = 'above' } = input;
  requireObject('tank', tank, 'The tank');
  const fi = imageFrequency(signalFrequency, intermediateFrequency, oscillatorSide);
  const fs = signalFrequency;
  // The tank's loss figures refer to the signal frequency unless the tank says otherwise.
  const tuned: TankInput = { ...tank, frequency: tank.frequency ?? fs };
  let response: Float64Array;
  let loadedQ: number;
  try {
    response = sweepTank(tuned, { start: Math.min(fs, fi), stop: Math.max(fs, fi), points: 2, spacing: 'linear' }).response;
    loadedQ = analyzeTank(tuned).loadedQ;
  } catch (e) {
    if (e instanceof DesignError && ['start', 'stop'].includes(e.field)) {
      throw new DesignError('intermediateFrequency', `The image at ${sayQuantity(fi, 'Hz')} is outside the range a tank can be computed over.`);
    }
    if (e instanceof DesignError) throw new DesignError(`tank.${e.field}`, e.message);
    throw e;
  }
  const [atSignal, atImage] = fs < fi ? [response[0], response[1]] : [response[1], response[0]];
  const xi = fi / fs - fs / fi;
  const estimate = Number.isFinite(loadedQ) ? 10 * Math.log10(1 + (loadedQ * xi) ** 2) : Infinity;
  return { signalFrequency: fs, imageFrequency: fi, rejection: atSignal - atImage, estimate, loadedQ };
}
