/**
 * What the Band bench draws and its optional parts, loaded when their place
 * comes near (BandExtras.tsx), not with the answer: the dial laws (straight-line
 * capacitance and straight-line frequency plates, and the user's own plate
 * table), the selectivity and image-rejection curves across the band, and
 * tuning with a slug. Pure: no Solid, no DOM; tests call them in Node.
 *
 * The slug and the plate table are computations of their own on the bench,
 * so a bad table or slug is told at its field while the plan stands.
 */
import type { BandDesign } from '../../src/core/band';
import { dialLaw, type DialLaw, type PlatePoint } from '../../src/core/dial';
import { note } from '../../src/core/notes';
import { slugTuning, type SlugTuning } from '../../src/core/slug';
import type { BandSelectivity } from '../../src/core/band';
import { formatQuantityCompact } from '../../src/quantity';
import { getPath, type Choices, type SpecObject } from '../kit/fields';
import { bandDesign, num, type BandPlan } from './bandPlan';
import { imageAt } from './bandImage';

/** Points of the dial law curves. */
export const DIAL_POINTS = 61;
/** Points of the selectivity and image curves across the band. */
export const SELECTIVITY_POINTS = 21;

/** The curves the plots draw. */
export interface BandCurves {
  /** Frequency against rotation for straight-line-capacitance and straight-line-frequency plates. */
  dial: { slc: DialLaw; slf: DialLaw };
  /** Selectivity at SELECTIVITY_POINTS frequencies across the band. */
  selectivity: BandSelectivity['curve'];
  /** Image rejection, dB, at the same frequencies (superhet only). */
  image?: number[];
}

/** The designed circuit's coil and capacitor network, as dialLaw and slugTuning take it. */
function circuitOf(design: BandDesign) {
  return {
    inductance: design.inductance,
    strayCapacitance: design.strayCapacitance,
    trimmerCapacitance: design.trimmerCapacitance,
    padderCapacitance: design.padderCapacitance,
    minCapacitance: design.minCapacitance,
    maxCapacitance: design.maxCapacitance,
  };
}

const worked = new WeakMap<BandPlan, BandCurves>();

/** The dial laws, the selectivity curve and the image rejection along it, for a plan: worked out on first call and kept. */
export function curvesOf(plan: BandPlan): BandCurves {
  let c = worked.get(plan);
  if (!c) worked.set(plan, (c = bandCurves(plan)));
  return c;
}

function bandCurves(plan: BandPlan): BandCurves {
  const { design, superhet } = plan;
  const selectivity = plan.selectivityAt(SELECTIVITY_POINTS);
  const circuit = { ...circuitOf(design), points: DIAL_POINTS };
  const template = selectivity.middle.tank;
  const w = (f: number) => 2 * Math.PI * f;
  const image = superhet && selectivity.curve.frequency.map((f, i) => {
    // The tank tuned to f, as bandSelectivity builds it: the network that resonates L at f, the coil's Q there.
    const tank = { ...template, capacitance: 1 / (w(f) * w(f) * design.inductance) - design.strayCapacitance, coilQ: selectivity.curve.coilQ[i], frequency: f };
    return imageAt(tank, f, superhet).rejection;
  });
  return { dial: { slc: dialLaw({ ...circuit, plates: 'slc' }), slf: dialLaw({ ...circuit, plates: 'slf' }) }, selectivity: selectivity.curve, image };
}

/**
 * Slug tuning of the designed coil, ±the percentage typed, over the band
 * asked; undefined without a slug.
 * @throws DesignError (the band's, or the slug's `adjustment`)
 */
export function slugFor(raw: SpecObject, choices: Choices): SlugTuning | undefined {
  const percent = num(raw, 'slugAdjustmentPercent');
  if (percent === undefined) return undefined;
  const design = bandDesign(raw, choices);
  const { inductance, ...network } = circuitOf(design);
  return slugTuning({ ...network, inductance, adjustment: percent / 100, lowFrequency: design.requestedLowFrequency, highFrequency: design.requestedHighFrequency });
}

/**
 * The dial law of the user's plate table in the designed circuit; undefined
 * without one. A note when the table's ends are not the capacitor's range.
 * @throws DesignError (the band's, or `plates` for a table that does not rise or fall steadily)
 */
export function ownDialFor(raw: SpecObject, choices: Choices): DialLaw | undefined {
  const table = getPath(raw, 'plates');
  if (!Array.isArray(table)) return undefined;
  const design = bandDesign(raw, choices);
  const plates: PlatePoint[] = table.map((p: { x: number; y: number }) => ({ angle: p.x, capacitance: p.y }));
  const law = dialLaw({ ...circuitOf(design), plates, points: DIAL_POINTS });
  const ends = [plates[0].capacitance, plates[plates.length - 1].capacitance];
  const [lo, hi] = [Math.min(...ends), Math.max(...ends)];
  const off = Math.max(Math.abs(lo / design.minCapacitance - 1), Math.abs(hi / design.maxCapacitance - 1));
  if (off > 0.05) {
    const pf = (c: number) => formatQuantityCompact(c, 'F', 3);
    law.notes.push(note('info', `Your plate table runs ${pf(lo)} to ${pf(hi)}, not the ${pf(design.minCapacitance)} to ${pf(design.maxCapacitance)} the band was designed with: its tuning curve covers another band. Give the capacitor's range from the same measurement.`, 'plates'));
  }
  return law;
}
