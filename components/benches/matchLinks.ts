/**
 * The Match bench's link for a coil handed over by another bench (the Coil
 * bench's coil, the Band bench's, the Tank bench's "terminations collapse
 * the tank" note): written through the Match bench's own field table
 * (documents.ts specToSnapshot, fields.ts encodeLink), so the Match bench
 * reads it back with no notice. No physics beyond the wire tables: a bench
 * that offers the link ships only this and the table.
 */
import type { DesignCoilSpec } from '../../src/core/coil';
import { awgDiameter, enamelledDiameter, swgDiameter } from '../../src/core/wire';
import { specToSnapshot } from '../kit/documents';
import { defaultText, encodeLink, fieldsInUse, getPath, pathsOf, type SpecObject } from '../kit/fields';
import { AWG_RANGE, SWG_RANGE } from './coilFields';
import { MATCH_FIELDS } from './matchFields';

/** What another bench hands to the Match bench. SI units; everything but the coil (or its inductance) optional. */
export interface MatchHandOff {
  /**
   * The coil as designCoil takes it. A single-layer solenoid carries its
   * geometry (taps and links are worked out from it); any other form only its
   * inductance (`coil.inductance`, or `inductance` below).
   */
  coil?: DesignCoilSpec;
  /** The coil's inductance, H, when no single-layer coil is given (or the coil spec gives its turns only). */
  inductance?: number;
  /** All the capacitance across the coil, F: the capacitor, trimmer, strays and the coil's own self-capacitance together. */
  capacitance?: number;
  /** The frequency to tune the tank to, Hz, when the capacitance is not known (default: the coil spec's working frequency). */
  frequency?: number;
  /** The tank's unloaded Q, coil and capacitor together (1/Q_u = 1/Q_coil + 1/Q_C); omitted, a single-layer coil's Q comes from its loss model. Needed for any other coil (else the bench's 150 stands). */
  unloadedQ?: number;
  /** The capacitor's Q, used with a single-layer coil's own Q when `unloadedQ` is omitted. */
  capacitorQ?: number;
  /** Source (antenna) resistance, Ω. */
  sourceResistance?: number;
  /** Load (next stage) resistance, Ω. */
  loadResistance?: number;
}

/** Equal to 1e-9 relative: a diameter that is a gauge's or an enamel grade's own. */
const same = (a: number, b: number) => Math.abs(a - b) <= 1e-9 * Math.abs(b);

/** The gauge a bare diameter is, as the Coil bench's choices, or a metric diameter. */
function wireChoices(diameter: number): Record<string, string> {
  for (let n = AWG_RANGE[0]; n <= AWG_RANGE[1]; n++) if (same(diameter, awgDiameter(n))) return { wire: 'awg', awg: String(n) };
  for (let n = SWG_RANGE[0]; n <= SWG_RANGE[1]; n++) if (same(diameter, swgDiameter(n))) return { wire: 'swg', swg: String(n) };
  return { wire: 'mm' };
}

/** The enamel as the Coil bench's choice: none, a grade whose overall diameter it is, or measured. */
function enamelChoice(diameter: number, insulated: number | undefined): string {
  if (insulated === undefined) return 'bare';
  for (const grade of [1, 2] as const) if (same(insulated, enamelledDiameter(diameter, grade))) return String(grade);
  return 'measured';
}

/**
 * The Match bench's link ('/match/?…') for a coil and, when known, the tank's
 * capacitance (or its frequency), its Q, the source and the load. A
 * single-layer coil goes over as its geometry: the mean diameter (the spec's
 * own, so no former is added), close-wound or its pitch, the wire as its
 * gauge when it is one (AWG or SWG, enamel grade 1 or 2 when the overall
 * diameter is that grade's) or as measured diameters; its inductance or
 * turns as the spec gives them. Any other coil goes over as its inductance.
 * Values are written with 6 significant figures; what is not given keeps the
 * Match bench's default.
 */
export function matchLinkFor(h: MatchHandOff): string {
  const coil = h.coil;
  const choices: Record<string, string> = {};
  const spec: SpecObject = {};
  if (coil?.form === 'solenoid') {
    choices.coilBy = 'solenoid';
    choices.give = coil.inductance === undefined ? 'N' : 'L';
    choices.dia = 'mean';
    choices.wind = coil.closeWound ? 'close' : 'pitch';
    Object.assign(choices, wireChoices(coil.wire.diameter));
    choices.enamel = enamelChoice(coil.wire.diameter, coil.wire.insulatedDiameter);
    const c: SpecObject = { diameter: coil.diameter, wire: { diameter: coil.wire.diameter } };
    if (coil.wire.insulatedDiameter !== undefined) (c.wire as SpecObject).insulatedDiameter = coil.wire.insulatedDiameter;
    for (const key of ['inductance', 'turns', 'pitch'] as const) {
      const v = coil[key];
      if (typeof v === 'number') c[key] = v;
    }
    // designCoil's own defaults when the spec leaves them out: no leads, 20 °C
    c.leadLength = coil.leadLength ?? 0;
    c.temperature = coil.temperature ?? 20;
    spec.coil = c;
  } else {
    choices.coilBy = 'L';
    const l = h.inductance ?? coil?.inductance;
    if (l !== undefined) spec.inductance = l;
  }
  const frequency = h.frequency ?? coil?.frequency;
  if (h.capacitance !== undefined) {
    choices.tune = 'C';
    spec.capacitance = h.capacitance;
  } else if (frequency !== undefined) {
    choices.tune = 'f';
    spec.frequency = frequency;
  }
  for (const key of ['unloadedQ', 'capacitorQ', 'sourceResistance', 'loadResistance'] as const) {
    const v = h[key];
    if (v !== undefined) spec[key] = v;
  }
  const snapshot = specToSnapshot(MATCH_FIELDS, spec, choices, 6);
  // What is not handed over keeps the bench's default (specToSnapshot would leave an optional field blank: no load).
  for (const f of fieldsInUse(MATCH_FIELDS, snapshot.choices)) {
    if (f.kind !== 'choice' && pathsOf(f).every((p) => getPath(spec, p) === undefined)) snapshot.texts[f.key] = defaultText(f, snapshot.choices);
  }
  return `/match/?${encodeLink(MATCH_FIELDS, snapshot)}`;
}
