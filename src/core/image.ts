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
import { TWO_PI } from './constants';
import { DesignError, requireObject } from './errors';
import { evaluate, kernelOf, scratch } from './tankKernel';
import { qFigures, resolveTank, TANK_VALUE_RANGE, tankValue, type ResolvedTank, type TankInput } from './tankModel';
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
  /** Loaded Q of the tank (as `analyzeTank` gives it). */
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
  if (fi > TANK_VALUE_RANGE.max) throw new DesignError('intermediateFrequency', `The image at ${sayQuantity(fi, 'Hz')} is outside the range a tank can be computed over.`);
  // The tank's loss figures refer to the signal frequency unless the tank says otherwise.
  let t: ResolvedTank;
  try {
    t = resolveTank({ ...tank, frequency: tank.frequency ?? fs });
  } catch (e) {
    if (e instanceof DesignError) throw new DesignError(`tank.${e.field}`, e.message);
    throw e;
  }
  // The terminated response is proportional to 1/√(the kernel's objective) at each frequency (see sweepTank).
  const k = kernelOf(t);
  const objective = (f: number) => {
    const w = TWO_PI * f;
    evaluate(k, w, w / k.w0 - 1, scratch);
    return scratch[2];
  };
  const rejection = 10 * Math.log10(objective(fi) / objective(fs));
  const loadedQ = qFigures(t).loadedQ;
  const xi = fi / fs - fs / fi;
  const estimate = Number.isFinite(loadedQ) ? 10 * Math.log10(1 + (loadedQ * xi) ** 2) : Infinity;
  return { signalFrequency: fs, imageFrequency: fi, rejection, estimate, loadedQ };
}
