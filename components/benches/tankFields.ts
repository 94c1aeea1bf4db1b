/**
 * The Tank bench as data: its field table (TANK_FIELDS), the spec the table
 * fills, what the core takes from it (tankOf, stressOf), the sweep span of the
 * plots, and the coil handed over from the Coil bench (the `coil` link key).
 *
 * No Solid and no DOM here: the link codec, a saved draft, a shop-sheet file
 * and the tests in Node all use this same table. The spec is the core's
 * `TankStressInput` by name (inductance, coilQ, capacitance, sourceResistance,
 * driveVoltage, …), so a DesignError's `field` is the path of the field that
 * shows it (routeDesignError in kit/fields.ts).
 */
import type { DesignNote } from '../../src/core/notes';
import type { TankInput, TankMode } from '../../src/core/tankModel';
import type { TankStressInput } from '../../src/core/tankStress';
import type { TankAnalysis } from '../../src/core/tank';
import {
  decodeLink, defaultChoices, defaultSnapshot, defineFields, encodeLink, NON_NEGATIVE, POSITIVE,
  type Choices, type FieldTable,
} from '../kit/fields';

/** Demo terminations: a parallel tank between high resistances, a series tank between low ones. */
const TERMINATION = (c: Choices) => (c.mode === 'series' ? '5 Ω' : '10 kΩ');
const parallel = (c: Choices) => c.mode !== 'series';

export const TANK_FIELDS = defineFields([
  { kind: 'choice', key: 'mode', path: 'mode', label: 'Tank', default: 'parallel', options: [['parallel', 'Parallel'], ['series', 'Series']] },
  // The coil.
  { kind: 'quantity', key: 'L', path: 'inductance', label: 'Inductance', symbol: 'L', unit: 'H', default: '4.7 µH', allowed: POSITIVE, hint: 'e.g. 4.7 µH, 4u7, 220n' },
  { kind: 'choice', key: 'coilLoss', label: 'Coil loss given as', default: 'Q', options: [['Q', 'Q'], ['R', 'Series resistance']] },
  {
    kind: 'number', key: 'coilQ', path: 'coilQ', label: 'Coil Q', symbol: 'Q', default: '150', rule: { min: 0, minExclusive: true },
    when: { coilLoss: 'Q' }, answers: ['coilResistance'], hint: 'plain number, e.g. 150',
  },
  {
    kind: 'quantity', key: 'Rcoil', path: 'coilResistance', label: 'Coil series resistance', symbol: 'R', unit: 'Ω', default: '1.4 Ω',
    allowed: POSITIVE, when: { coilLoss: 'R' }, hint: 'AC resistance at the working frequency, e.g. 1.4 Ω, 1R4',
  },
  {
    kind: 'quantity', key: 'Cself', path: 'coilSelfCapacitance', label: 'Self-capacitance (optional)', what: 'Self-capacitance', symbol: 'Cₛ',
    unit: 'F', default: '', optional: true, allowed: NON_NEGATIVE, hint: 'across the coil, e.g. 3 pF; blank or 0: neglected',
  },
  // The capacitor.
  { kind: 'quantity', key: 'C', path: 'capacitance', label: 'Capacitance', symbol: 'C', unit: 'F', default: '100 pF', allowed: POSITIVE, hint: 'e.g. 100 pF, 4n7, 2*47p' },
  { kind: 'choice', key: 'capLoss', label: 'Capacitor loss given as', default: 'Q', options: [['Q', 'Q'], ['ESR', 'ESR'], ['DF', 'tan δ']] },
  {
    kind: 'number', key: 'capQ', path: 'capacitorQ', label: 'Capacitor Q', symbol: 'Q', default: '1000', rule: { min: 0, minExclusive: true },
    when: { capLoss: 'Q' }, answers: ['capacitorEsr'], hint: 'plain number, e.g. 1000 (NP0/C0G ceramic, mica: 1000 and up)',
  },
  {
    kind: 'quantity', key: 'ESR', path: 'capacitorEsr', label: 'Equivalent series resistance', what: 'Capacitor ESR', unit: 'Ω', default: '20 mΩ',
    allowed: POSITIVE, when: { capLoss: 'ESR' }, hint: 'e.g. 20 mΩ, 0.02',
  },
  {
    kind: 'number', key: 'DF', path: 'dissipationFactor', label: 'Dissipation factor', symbol: 'tan δ', default: '0.001', rule: { min: 0, minExclusive: true },
    when: { capLoss: 'DF' }, answers: ['capacitorEsr'], hint: 'plain number, e.g. 0.001 (= 0.1 %)',
  },
  // What drives and loads it.
  {
    kind: 'quantity', key: 'Rs', path: 'sourceResistance', label: 'Source resistance (optional)', what: 'Source resistance', symbol: 'Rₛ',
    unit: 'Ω', default: TERMINATION, optional: true, allowed: POSITIVE,
    hint: (c) => (parallel(c) ? 'e.g. 10k, 50 (an antenna); blank: ideal current source' : 'e.g. 50 Ω; blank: ideal voltage source'),
  },
  {
    kind: 'quantity', key: 'Rload', path: 'loadResistance', label: 'Load resistance (optional)', what: 'Load resistance',
    unit: 'Ω', default: TERMINATION, optional: true, allowed: POSITIVE,
    hint: (c) => (parallel(c) ? 'e.g. 10k, 2k2 (the next stage); blank: no load' : 'e.g. 50 Ω; blank: no load'),
  },
  {
    kind: 'quantity', key: 'f', path: 'frequency', label: 'Frequency of the Q figures (optional)', what: 'Frequency of the Q figures', symbol: 'f',
    unit: 'Hz', default: '', optional: true, allowed: POSITIVE, hint: 'where the Q, ESR or tan δ were measured; blank: at resonance',
  },
  // Drive and ratings: blank unless someone drives the tank (receiver work has no drive).
  { kind: 'choice', key: 'drive', label: 'Drive given as', default: 'V', options: [['V', 'Voltage'], ['P', 'Power']] },
  {
    kind: 'quantity', key: 'V', path: 'driveVoltage', what: 'Drive voltage', symbol: 'V', unit: 'V', default: '', optional: true, allowed: POSITIVE,
    when: { drive: 'V' }, hint: 'e.g. 1 V, 250m; blank: no stress figures',
    label: (c) => (parallel(c) ? 'RMS voltage across the tank' : 'RMS voltage across the circuit'),
  },
  {
    kind: 'quantity', key: 'P', path: 'drivePower', label: 'RF power into tank and load', what: 'Drive power', symbol: 'P', unit: 'W', default: '',
    optional: true, allowed: POSITIVE, when: { drive: 'P' }, hint: 'e.g. 5 W, 100m; blank: no stress figures',
  },
  {
    kind: 'quantity', key: 'Vrating', path: 'capacitorVoltageRating', label: 'Capacitor voltage rating (optional)', what: 'Capacitor voltage rating',
    unit: 'V', default: '', optional: true, allowed: POSITIVE, hint: 'peak volts, derated for RF as the maker says',
  },
  {
    kind: 'quantity', key: 'Irating', path: 'wireCurrentRating', label: 'Wire current rating (optional)', what: 'Wire current rating',
    unit: 'A', default: '', optional: true, allowed: POSITIVE, hint: 'A RMS the coil’s wire carries at this frequency',
  },
] as const);

/** Keys of the drive and ratings section, collapsed until someone opens it or a link fills one. */
export const DRIVE_KEYS = ['V', 'P', 'Vrating', 'Irating'] as const;

/**
 * The spec the table fills (bench.spec()): the core's TankStressInput by
 * name, SI units. Only the paths of the fields in use are present.
 */
export interface TankSpec extends TankStressInput {
  mode: TankMode;
}

const DRIVE_PATHS = ['driveVoltage', 'drivePower', 'capacitorVoltageRating', 'wireCurrentRating'] as const;

/**
 * The tank as analyzeTank takes it: the spec without the drive and ratings. A
 * self-capacitance of 0 means "neglected", as a blank one does (the core
 * takes no zero: it asks to leave the value out).
 */
export function tankOf(spec: TankSpec): TankInput {
  const out: TankStressInput = { ...spec };
  for (const p of DRIVE_PATHS) delete out[p];
  if (out.coilSelfCapacitance === 0) delete out.coilSelfCapacitance;
  return out;
}

/** The driven tank as tankStress takes it, or null when no drive is given (no stress figures). */
export function stressOf(spec: TankSpec): TankStressInput | null {
  if (spec.driveVoltage === undefined && spec.drivePower === undefined) return null;
  const out: TankStressInput = { ...tankOf(spec) };
  for (const p of DRIVE_PATHS) if (spec[p] !== undefined) out[p] = spec[p];
  return out;
}

/**
 * Points in the plotted and downloadable sweep: odd, so that a log sweep
 * centred on the resonance has a point exactly there (the plot's table of
 * key points then reads the peak itself, not a value between two points).
 */
export const SWEEP_POINTS = 1001;

/** Sweep span around a resonance: about ± 6 bandwidths, at most a decade each way (log spaced; `centre` is their geometric mean). */
export function sweepSpan(centre: number, bandwidth: number): { start: number; stop: number } {
  const s = Math.min(1 + (6 * bandwidth) / centre, 10);
  return { start: centre / s, stop: centre * s };
}

/**
 * The note analyzeTank gives when the terminations collapse the tank (the
 * bench shows it on its own, above the detailed cards), or undefined. It is
 * the one note whose field is a termination: the one that loads the tank
 * most (see collapseNote in src/core/terminations.ts).
 */
export function collapseNoteOf(a: Pick<TankAnalysis, 'terminationsCollapse' | 'notes'>): DesignNote | undefined {
  if (!a.terminationsCollapse) return undefined;
  return a.notes.find((n) => n.field === 'sourceResistance' || n.field === 'loadResistance');
}

// ---------------------------------------------------------------------------
// A coil handed over from the Coil bench

/**
 * Link key of the Coil bench's own link query, carried by a coil handed
 * over so that "Back to the coil" restores its whole spec.
 */
export const COIL_LINK_KEY = 'coil';
/** Longest coil link accepted (a coil's query is a few hundred characters). */
export const MAX_COIL_LINK = 1000;

/** The Tank bench's link split into the coil's query (when given) and the rest, for the table. */
export function splitCoilLink(search: string): { rest: string; coil: string | undefined } {
  let params: URLSearchParams;
  try {
    params = new URLSearchParams(search);
  } catch {
    return { rest: search, coil: undefined };
  }
  const coil = params.get(COIL_LINK_KEY) ?? undefined;
  params.delete(COIL_LINK_KEY);
  return { rest: params.toString(), coil };
}

/** The Tank bench's query with the coil's query added (last), or as it is without one. */
export function withCoilLink(query: string, coil: string | undefined): string {
  if (coil === undefined) return query;
  const params = new URLSearchParams(query);
  params.set(COIL_LINK_KEY, coil);
  return params.toString();
}

/** What a `coil` link value gives: the coil's query as its bench writes it, or why it was refused. */
export type CoilLinkReading = { query: string } | { notice: string };

/**
 * Reads the coil's query carried in a Tank link with the Coil bench's own
 * table, as that bench would read its link. Anything it would ignore (an
 * unknown key, a hostile or out-of-range value) refuses the whole coil with
 * a notice, since a coil restored in part is a different coil. The query is
 * written again by the table (fields in use, as typed), never passed on as
 * it came.
 */
export function readCoilLink(coilTable: FieldTable, text: string): CoilLinkReading {
  const refuse = (why: string): CoilLinkReading => ({ notice: `Ignored the link’s coil from the Coil bench (no way back to it): ${why}` });
  if (text.length > MAX_COIL_LINK) return refuse(`longer than ${MAX_COIL_LINK} characters.`);
  if (text.trim() === '') return refuse('it is empty.');
  const d = decodeLink(coilTable, text);
  if (d.notices.length > 0) return refuse(d.notices.join(' '));
  if (d.given.length === 0) return refuse('it carries no coil settings.');
  const choices = { ...defaultChoices(coilTable), ...d.choices };
  const texts = { ...defaultSnapshot(coilTable, choices).texts, ...d.texts };
  return { query: encodeLink(coilTable, { choices, texts }) };
}

/**
 * The line that greets a coil handed over, from the texts its link gave the
 * Tank table (as typed by the Coil bench): what came, and what is the Tank
 * bench's own.
 */
export function handOffGreeting(texts: Readonly<Record<string, string>>): string {
  const parts: string[] = [];
  if (texts.L) parts.push(`L = ${texts.L}`);
  if (texts.coilQ) parts.push(`Q ${texts.coilQ}${texts.f ? ` at ${texts.f}` : ''}`);
  if (texts.Cself) parts.push(`self-capacitance ${texts.Cself}`);
  const coil = parts.length ? `: ${parts.join(', ')}` : '';
  const tuning = texts.C
    ? ` C = ${texts.C} tunes it to ${texts.f || 'its working frequency'}.`
    : ' Set the capacitor to tune it.';
  const own = texts.coilQ ? 'Source and load are' : 'The coil’s Q (not carried), source and load are';
  return `Coil from the Coil bench${coil}.${tuning} ${own} this bench’s own: set them for your circuit.`;
}
