/**
 * The Band bench's field table: the band to tune, the variable capacitor
 * (typed as a range, or one of a few common kinds), strays, margin, the
 * superheterodyne's IF and oscillator side, the coil's former and wire (the
 * Coil bench's own fields, filling `coil.…` paths), the losses and
 * terminations for the selectivity, and the series and tolerances of the
 * fixed pairs. No Solid, no DOM, no physics: the plan (bandPlan.ts), the
 * shop sheet and tests read it in Node.
 *
 * Spec paths are the core's names: `lowFrequency`/`highFrequency` and
 * `minCapacitance`/`maxCapacitance` (designForBand), `strayCapacitance`,
 * `intermediateFrequency`, `oscillatorStrayCapacitance` (designTracking),
 * `plates` (dialLaw's plate table), `slugAdjustmentPercent` (slugTuning's
 * `adjustment` as a percentage), `coilQ`, `capacitorQ`, `sourceResistance`,
 * `loadResistance` (bandSelectivity), `capacitorSeries`, `inductorSeries`
 * (resonantPairs), and `coil.<the Coil bench's path>` for the coil, as
 * bandSelectivity names the coil's errors. Percentages (margin, tolerances)
 * fill paths of their own (`marginPercent`) and answer for the core's
 * fraction (`margin`). A DesignError from the core then lands at the field
 * that fills or answers for its path (kit/fields.ts routeDesignError).
 */
import { COIL_FIELDS } from './coilFields';
import { defineFields, NON_NEGATIVE, POSITIVE, type Choices, type FieldDef, type FieldTable } from '../kit/fields';

/**
 * Common kinds of tuning capacitor, as min..max (typical figures for the
 * kind, rounded; measure the one you have). Generic descriptions only.
 */
export const CAPACITOR_KINDS: readonly (readonly [value: string, label: string, range: string])[] = [
  ['365', 'Single-gang broadcast, 10–365 pF', '10p..365p'],
  ['500', 'Older broadcast section, 15–500 pF', '15p..500p'],
  ['140', 'Short-wave, 6–140 pF', '6p..140p'],
  ['50', 'Band-spread, 4–50 pF', '4p..50p'],
  ['25', 'Small air trimmer-tuner, 3–25 pF', '3p..25p'],
];

/** The capacitor's ends as text for a kind (undefined for "own"). */
export function capacitorKindRange(kind: string): string | undefined {
  return CAPACITOR_KINDS.find(([v]) => v === kind)?.[2];
}

/** The Coil bench's fields the Band bench shows for the coil: former, winding and wire (not L, turns or frequency: the band sets those). */
export const COIL_KEYS = [
  'form', 'dia', 'D', 'wind', 'p', 'OD', 'ID', 'h', 'core', 'AL', 'mu', 'mu2', 'mD', 'mlen', 'depth',
  'wire', 'awg', 'swg', 'wd', 'enamel', 'wod', 'lead', 'T',
] as const;

/** Spec paths of the coil's fields sit under this prefix (bandSelectivity names the coil's errors so). */
export const COIL_PREFIX = 'coil';

/** A Coil bench field as the Band bench shows it: the same key, label, rules and `when`, its paths under `coil.`. */
function underCoil(f: FieldDef): FieldDef {
  const answers = f.answers?.map((a) => `${COIL_PREFIX}.${a}`);
  if (f.kind === 'range') return { ...f, low: `${COIL_PREFIX}.${f.low}`, high: `${COIL_PREFIX}.${f.high}`, answers };
  if (f.kind === 'choice') return { ...f, path: f.path === undefined ? undefined : `${COIL_PREFIX}.${f.path}`, answers };
  return { ...f, path: `${COIL_PREFIX}.${f.path}`, answers };
}

const coilFields = COIL_KEYS.map((key) => {
  const f = COIL_FIELDS.find((x) => x.key === key);
  if (!f) throw new Error(`band fields: the Coil bench has no field "${key}"`);
  return underCoil(f as FieldDef);
});

const superhet = (c: Choices) => c.osc === 'above' || c.osc === 'below';

export const BAND_FIELDS: FieldTable = defineFields([
  // — the band and the capacitor —
  {
    kind: 'range', key: 'band', unit: 'Hz', low: 'lowFrequency', high: 'highFrequency', label: 'Band to tune', what: 'Band',
    default: '5.9M..6.2M', allowed: POSITIVE, hint: 'low..high, e.g. 5.9M..6.2M or 5.9–6.2 MHz',
    // The coil is wound for the band, and the signal circuit tracked over it: their errors are the band's.
    answers: ['coil.inductance', 'coil.turns', 'coil.frequency', 'band.inductance', 'signal.inductance', 'inductance', 'frequency'],
  },
  {
    kind: 'range', key: 'C', unit: 'F', low: 'minCapacitance', high: 'maxCapacitance', label: 'Capacitor range, plates open..meshed',
    what: 'Capacitor range', default: '10p..365p', allowed: POSITIVE, when: { capType: 'own' },
    hint: 'min..max, e.g. 10p..365p or 10–365 pF', answers: ['band.minCapacitance', 'band.maxCapacitance'],
  },
  {
    kind: 'choice', key: 'capType', label: 'Variable capacitor', display: 'select', default: 'own',
    options: [['own', 'Your own (give its range)'], ...CAPACITOR_KINDS.map(([v, label]) => [v, label] as const)],
    // Declared after the range it replaces: while that is in use it shows these errors itself.
    answers: ['minCapacitance', 'maxCapacitance', 'band.minCapacitance', 'band.maxCapacitance'],
    hint: 'typical figures for the kind: measure yours if you can',
  },
  {
    kind: 'quantity', key: 'Cs', path: 'strayCapacitance', label: 'Strays across the coil', symbol: 'Cₛ', unit: 'F', default: '15 pF',
    allowed: NON_NEGATIVE, answers: ['band.strayCapacitance', 'oscillatorStrayCapacitance'],
    hint: 'wiring, the next stage’s input and the coil’s own capacitance, e.g. 15 pF',
  },
  {
    kind: 'number', key: 'margin', path: 'marginPercent', label: 'Margin at each end, %', what: 'Margin', default: '2',
    rule: { min: 0, max: 50, unit: '%' }, answers: ['margin'], hint: 'the band is widened by this at both ends; 0 for exact',
  },
  {
    kind: 'choice', key: 'arr', path: 'arrangement', label: 'Added capacitance', default: 'auto',
    options: [['auto', 'Padder if needed'], ['trimmer', 'Trimmer only']],
    answers: ['trimmerCapacitance', 'padderCapacitance', 'band.trimmerCapacitance', 'band.padderCapacitance'],
  },
  {
    kind: 'number', key: 'slug', path: 'slugAdjustmentPercent', label: 'Tuning slug, ±% of L (optional)', what: 'Slug adjustment', default: '',
    optional: true, rule: { min: 0, max: 90, minExclusive: true, unit: '%' }, answers: ['adjustment', 'minInductance', 'maxInductance'],
    hint: 'a slug in the former moves L this far either way; blank: no slug',
  },
  {
    kind: 'points', key: 'plates', path: 'plates', label: 'Your capacitor’s plates (optional)', what: 'Plate table', unit: 'F', xName: 'angle',
    xRule: { min: -3600, max: 3600, unit: '°' }, default: '', optional: true, allowed: POSITIVE,
    hint: 'capacitance at a few dial angles, e.g. 0: 365p; 90: 150p; 180: 10p; blank: the two standard shapes only',
  },

  // — superheterodyne —
  {
    kind: 'choice', key: 'osc', label: 'Oscillator', what: 'Superhet oscillator', default: 'above', answers: ['oscillatorSide'],
    options: [['none', 'None (TRF)'], ['above', 'Above the signal'], ['below', 'Below']],
  },
  {
    kind: 'quantity', key: 'IF', path: 'intermediateFrequency', label: 'Intermediate frequency', symbol: 'IF', unit: 'Hz', default: '455 kHz',
    allowed: POSITIVE, when: superhet, hint: 'e.g. 455k, 1.6 MHz, 10.7M', answers: ['trackingFrequencies', 'oscillator.inductance'],
  },
  {
    kind: 'quantity', key: 'Cso', path: 'oscillatorStrayCapacitance', label: 'Strays across the oscillator coil (optional)', what: 'Oscillator strays',
    symbol: 'Cₛₒ', unit: 'F', default: '', optional: true, allowed: NON_NEGATIVE, when: superhet,
    hint: 'blank: the same as the signal circuit’s',
  },

  // — the coil: the Coil bench's fields —
  ...coilFields,
  {
    kind: 'number', key: 'Qcoil', path: 'coilQ', label: 'Coil Q (optional)', what: 'Coil Q', symbol: 'Q', default: '', optional: true,
    rule: { min: 0, minExclusive: true }, hint: 'blank: from the coil’s loss model; give it for a multilayer coil or from a measurement',
  },

  // — losses and terminations —
  {
    kind: 'number', key: 'capQ', path: 'capacitorQ', label: 'Capacitor Q', symbol: 'Q', default: '1000', rule: { min: 0, minExclusive: true },
    answers: ['dissipationFactor'], hint: 'variable, trimmer and padder alike; air-spaced: 1000 and up',
  },
  {
    kind: 'quantity', key: 'Rs', path: 'sourceResistance', label: 'Source resistance across the tank (optional)', what: 'Source resistance', symbol: 'Rₛ',
    unit: 'Ω', default: '20 kΩ', optional: true, allowed: POSITIVE, hint: 'the aerial as the tank sees it through its coupling; blank: none',
  },
  {
    kind: 'quantity', key: 'Rload', path: 'loadResistance', label: 'Load resistance across the tank (optional)', what: 'Load resistance',
    unit: 'Ω', default: '50 kΩ', optional: true, allowed: POSITIVE, hint: 'the next stage’s input, e.g. 50k, 1M; blank: none',
  },

  // — fixed pairs —
  {
    kind: 'choice', key: 'capSeries', path: 'capacitorSeries', label: 'Fixed capacitors from', display: 'select', default: 'E12',
    options: [['E6', 'E6'], ['E12', 'E12'], ['E24', 'E24'], ['E48', 'E48'], ['E96', 'E96'], ['E192', 'E192']],
    hint: 'IEC 60063 preferred values',
  },
  {
    kind: 'choice', key: 'indSeries', path: 'inductorSeries', label: 'Fixed inductors from', default: 'E12',
    options: [['E6', 'E6'], ['E12', 'E12']],
  },
  {
    kind: 'number', key: 'tolC', path: 'capacitanceTolerancePercent', label: 'Capacitor tolerance ±% (optional)', what: 'Capacitor tolerance',
    default: '', optional: true, rule: { min: 0, max: 50, unit: '%' }, answers: ['capacitanceTolerance'],
    hint: 'blank: the series’ own (E12 ±10 %, E24 ±5 %, …)',
  },
  {
    kind: 'number', key: 'tolL', path: 'inductanceTolerancePercent', label: 'Inductor tolerance ±% (optional)', what: 'Inductor tolerance',
    default: '', optional: true, rule: { min: 0, max: 50, unit: '%' }, answers: ['inductanceTolerance'],
    hint: 'blank: the series’ own (E6 ±20 %, E12 ±10 %)',
  },
  {
    kind: 'number', key: 'seed', path: 'seed', label: 'Monte-Carlo seed', default: '1', rule: { min: 0, max: 4294967295, step: 1 },
    hint: 'whole number; the same seed gives the same units', answers: ['samples', 'distribution'],
  },
] as const);

/** Keys of the coil's fields in the Band bench's table (the same as the Coil bench's). */
export type BandCoilKey = (typeof COIL_KEYS)[number];
