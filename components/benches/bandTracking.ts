/**
 * The Band bench's superheterodyne tracking, loaded when its section comes
 * near the screen: designTracking for the band asked (the signal circuit as
 * designForBand gives it, the IF, the oscillator's side) and the oscillator
 * coil wound on the same former and wire as the signal coil. Pure: no Solid,
 * no DOM. Errors keep the core's spec paths (intermediateFrequency,
 * oscillatorSide, …), which the Band table routes.
 */
import { designCoil, type DesignCoilResult, type DesignCoilSpec } from '../../src/core/coil';
import { isDesignError } from '../../src/core/errors';
import { note, type DesignNote } from '../../src/core/notes';
import { designTracking, type TrackingDesign } from '../../src/core/tracking';
import type { Choices, SpecObject } from '../kit/fields';
import { bandCoilSpec, bandDesign, num, superhetSide } from './bandPlan';

/** Points of the tracking error curve. */
export const TRACKING_POINTS = 101;

export interface BandTracking {
  tracking: TrackingDesign;
  /** The oscillator coil on the signal coil's former and wire; undefined when it cannot be wound there (a note says why). */
  oscillatorCoil?: DesignCoilResult;
  notes: DesignNote[];
}

/**
 * Three-point tracking over the band asked (not the margin), or null when
 * the bench is not a superhet.
 * @throws DesignError with a spec path the Band table routes
 */
export function trackBand(raw: SpecObject, choices: Choices): BandTracking | null {
  const side = superhetSide(choices);
  const ifreq = num(raw, 'intermediateFrequency');
  if (side === undefined || ifreq === undefined) return null;
  const design = bandDesign(raw, choices);
  const tracking = designTracking({
    lowFrequency: design.requestedLowFrequency,
    highFrequency: design.requestedHighFrequency,
    intermediateFrequency: ifreq,
    oscillatorSide: side,
    signal: design,
    oscillatorStrayCapacitance: num(raw, 'oscillatorStrayCapacitance'),
    points: TRACKING_POINTS,
  });
  const notes = [...tracking.notes];
  let oscillatorCoil: DesignCoilResult | undefined;
  const middle = 0.5 * (tracking.oscillatorLowFrequency + tracking.oscillatorHighFrequency);
  try {
    oscillatorCoil = designCoil({ ...bandCoilSpec(raw, choices), inductance: tracking.oscillator.inductance, frequency: middle } as DesignCoilSpec);
  } catch (e) {
    if (!isDesignError(e)) throw e;
    notes.push(note('info', `The oscillator coil cannot be wound on this former: ${e.message}`, 'intermediateFrequency'));
  }
  return { tracking, oscillatorCoil, notes };
}
