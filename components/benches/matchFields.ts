/**
 * The Match bench's field table: the coil (the Coil bench's own single-layer
 * fields, filling `coil.…` paths, or a bare inductance for a coil whose
 * geometry gives no tap), the tank's tuning (its capacitance, or the
 * frequency it must resonate at), its Q, the source (the antenna) and the
 * load (the next stage) with where the load connects, the goal (a loaded Q
 * and how source and load share it, or a match), the link winding's
 * geometry, and which option the netlist and the drawing show. No Solid, no
 * DOM, no physics: the plan (matchPlan.ts), the hand-offs and tests read it
 * in Node.
 *
 * Spec paths are designMatch's own names (src/core/matching.ts: MatchSpec,
 * MATCH_SPEC_FIELDS): `capacitance`, `inductance`, `unloadedQ`,
 * `capacitorQ`, `sourceResistance`, `loadResistance`, `loadConnection`,
 * `loadTapTurns`, `loadedQ`, `split`, `link.diameter`, `link.position`,
 * `link.turns`, and `coil.<the Coil bench's path>` for the coil, as the
 * core names the coil's errors. `frequency` is the bench's own (the plan
 * turns it into the capacitance that tunes the coil there) and answers for
 * `capacitance`. A DesignError from the core then lands at the field that
 * fills or answers for its path (kit/fields.ts routeDesignError).
 *
 * Why only a single-layer coil has geometry here: the core works out a tap's
 * sections and a link's coupling from a single-layer solenoid's turns
 * (Nagaoka and Rosa, Maxwell's formula); a toroid's or a multilayer coil's
 * flux is not shared turn by turn in a way those models describe. Such a
 * coil is given by its inductance (and the tank's Q), and the capacitive
 * divider and the L-network, which need no tap, are worked out for it.
 */
import { COIL_FIELDS } from './coilFields';
import { defineFields, POSITIVE, type Choices, type FieldDef, type FieldTable } from '../kit/fields';

/** Spec paths of the coil's fields sit under this prefix (designMatch names the coil's errors so). */
export const COIL_PREFIX = 'coil';

/** The Coil bench's fields the Match bench shows for a single-layer coil: how it is given, its former, winding and wire. */
export const COIL_KEYS = ['give', 'L', 'N', 'dia', 'D', 'wind', 'p', 'wire', 'awg', 'swg', 'wd', 'enamel', 'wod', 'lead', 'T'] as const;

/** The Match bench's own changes to a Coil bench field (a default for a front-end coil, wording where the Coil bench's depends on its form). */
const COIL_CHANGES: Partial<Record<(typeof COIL_KEYS)[number], Partial<FieldDef>>> = {
  L: { default: '4.7 µH', answers: ['coil.turns', 'coil.inductance'] },
  N: { hint: 'a plain number; half turns allowed (10.5)', answers: ['coil.inductance'] },
  // Close-wound, the pitch is the wire's: its errors are the winding's.
  wind: { answers: ['coil.pitch', 'coil.closeWound'] },
};

const solenoid = { coilBy: 'solenoid' } as const;

/**
 * A Coil bench field as the Match bench shows it: the same key, label and
 * rules, its paths under `coil.`, shown only for a single-layer coil (the
 * Coil bench's `form: 'solenoid'` becomes this bench's `coilBy: 'solenoid'`).
 */
function underCoil(f: FieldDef): FieldDef {
  const changed = { ...f, ...COIL_CHANGES[f.key as (typeof COIL_KEYS)[number]] } as FieldDef;
  const answers = changed.answers?.map((a) => (a.startsWith(`${COIL_PREFIX}.`) ? a : `${COIL_PREFIX}.${a}`));
  const pattern = changed.when === undefined || typeof changed.when === 'function' ? {} : changed.when;
  const { form: _form, ...rest } = pattern as Record<string, string | readonly string[]>;
  const when = { ...rest, ...solenoid };
  if (changed.kind === 'range' || changed.kind === 'points') throw new Error(`match fields: coil field "${f.key}" of an unexpected kind`);
  if (changed.kind === 'choice') return { ...changed, when, path: changed.path === undefined ? undefined : `${COIL_PREFIX}.${changed.path}`, answers };
  return { ...changed, when, path: `${COIL_PREFIX}.${changed.path}`, answers };
}

const coilFields = COIL_KEYS.map((key) => {
  const f = COIL_FIELDS.find((x) => x.key === key);
  if (!f) throw new Error(`match fields: the Coil bench has no field "${key}"`);
  return underCoil(f as FieldDef);
});

/** The options in the order the core sets them out, with the names the bench gives them. */
export const OPTION_NAMES = {
  tap: 'Tap on the coil',
  capacitiveDivider: 'Capacitive divider',
  link: 'Link winding',
  lowPassL: 'L-network, low-pass',
  highPassL: 'L-network, high-pass',
} as const;

/** True when the load's tap is designed here (a loaded Q is then shared between source and load). */
const loadTapDesigned = (c: Choices) => c.coilBy === 'solenoid' && c.loadAt === 'tap';

/** Every link path the core may name (the link's wire and pitch are the coil's, so their errors are the link's diameter's). */
const LINK_PATHS = ['link', 'link.wire', 'link.wire.diameter', 'link.wire.insulatedDiameter', 'link.pitch'];

export const MATCH_FIELDS: FieldTable = defineFields([
  // — the link winding (first in the table: it answers for the link's own paths before the coil's choice does) —
  {
    kind: 'quantity', key: 'lkD', path: 'link.diameter', label: 'Link mean diameter (optional)', what: 'Link diameter', unit: 'm', default: '',
    optional: true, allowed: POSITIVE, when: solenoid, answers: LINK_PATHS,
    hint: 'centre to centre of its wire; blank: wound just over the coil',
  },
  {
    kind: 'quantity', key: 'lkPos', path: 'link.position', label: 'Link position from the cold end (optional)', what: 'Link position', unit: 'm',
    default: '', optional: true, when: solenoid,
    hint: 'from the cold-end turn to the link’s first turn; 0 or blank: over the cold end, negative: beyond it',
  },
  {
    kind: 'number', key: 'lkN', path: 'link.turns', label: 'Link turns (optional)', what: 'Link turns', default: '', optional: true,
    rule: { min: 1, max: 50, step: 0.5 }, when: solenoid, hint: 'blank: the turns are designed; give them for a link already wound',
  },

  // — the coil —
  {
    kind: 'choice', key: 'coilBy', label: 'The coil', default: 'solenoid',
    options: [['solenoid', 'Single-layer: its geometry'], ['L', 'Any other: its inductance']],
    // A tap, the load's tap and a link need the geometry: their errors without it are this choice's.
    answers: ['coil', 'coil.form', 'inductance', 'loadConnection', 'loadTapTurns', ...LINK_PATHS, 'link.diameter', 'link.position', 'link.turns'],
  },
  ...coilFields,
  {
    kind: 'quantity', key: 'Lc', path: 'inductance', label: 'Coil inductance', symbol: 'L', unit: 'H', default: '4.7 µH', allowed: POSITIVE,
    when: { coilBy: 'L' }, hint: 'measured, or from the Coil bench; only a divider or an L-network can match a coil without its single-layer geometry',
  },

  // — the tank —
  { kind: 'choice', key: 'tune', label: 'Tank tuned by', default: 'C', options: [['C', 'its capacitance'], ['f', 'its frequency']] },
  {
    kind: 'quantity', key: 'C', path: 'capacitance', label: 'Capacitance across the coil', symbol: 'C', unit: 'F', default: '100 pF', allowed: POSITIVE,
    when: { tune: 'C' }, answers: ['tank', 'tank.capacitance', 'tank.inductance', 'coil.frequency', 'frequency'],
    hint: 'all of it: the capacitor, trimmer, strays and the coil’s own, e.g. 100p',
  },
  {
    kind: 'quantity', key: 'f', path: 'frequency', label: 'Resonant frequency', symbol: 'f₀', unit: 'Hz', default: '7.1 MHz', allowed: POSITIVE,
    when: { tune: 'f' }, answers: ['capacitance', 'tank', 'tank.capacitance', 'tank.inductance', 'coil.frequency'],
    hint: 'the capacitance that tunes the coil there is worked out, e.g. 7.1 MHz',
  },
  {
    kind: 'number', key: 'Qu', path: 'unloadedQ', symbol: 'Qᵤ', optional: true, rule: { min: 0, minExclusive: true }, answers: ['capacitorQ'],
    label: (c) => (c.coilBy === 'L' ? 'Unloaded Q of the tank' : 'Unloaded Q of the tank (optional)'), what: 'Unloaded Q',
    default: (c) => (c.coilBy === 'L' ? '150' : ''),
    hint: (c) => (c.coilBy === 'L' ? 'measured, or the coil’s Q with the capacitor’s' : 'blank: the coil’s Q from its loss model, with the capacitor’s'),
  },
  {
    kind: 'number', key: 'capQ', path: 'capacitorQ', label: 'Capacitor Q (optional)', what: 'Capacitor Q', symbol: 'Q', default: '1000', optional: true,
    rule: { min: 0, minExclusive: true }, when: solenoid, hint: 'used when the unloaded Q is left blank; air-spaced or NP0: 1000 and up',
  },

  // — source and load —
  {
    kind: 'quantity', key: 'Rs', path: 'sourceResistance', label: 'Source (antenna) resistance', what: 'Source resistance', symbol: 'Rₛ', unit: 'Ω',
    default: '50 Ω', allowed: POSITIVE, hint: 'the feed line or antenna: 50 or 75 Ω',
  },
  {
    kind: 'quantity', key: 'Rload', path: 'loadResistance', label: 'Load (next stage) resistance (optional)', what: 'Load resistance', unit: 'Ω',
    // Across the top (a coil without a tap) a kilohm would swamp the tank: a FET stage's 100k is the usual load there.
    default: (c) => (c.coilBy === 'L' ? '100 kΩ' : '1 kΩ'), optional: true, allowed: POSITIVE,
    hint: 'the next stage’s input, e.g. 1k for a bipolar stage, 100k for a FET; blank: none',
  },
  {
    kind: 'choice', key: 'loadAt', path: 'loadConnection', label: 'The load connects', default: 'tap', when: solenoid,
    options: [['tap', 'at a tap of its own'], ['top', 'across the top']], answers: ['loadTapTurns'],
  },
  {
    kind: 'number', key: 'loadTap', path: 'loadTapTurns', label: 'Load’s tap, turns from the cold end (optional)', what: 'Load tap', default: '',
    optional: true, rule: { min: 0, minExclusive: true }, when: { coilBy: 'solenoid', loadAt: 'tap' },
    hint: 'blank: the tap is designed; give it for a coil already tapped',
  },

  // — the goal —
  {
    kind: 'choice', key: 'goal', label: 'Aim for', default: 'Q', options: [['Q', 'a loaded Q'], ['match', 'the most power (a match)']],
    answers: ['loadedQ', 'split'],
  },
  {
    kind: 'number', key: 'QL', path: 'loadedQ', label: 'Loaded Q wanted', what: 'Loaded Q', default: '12', when: { goal: 'Q' },
    rule: { min: 0, minExclusive: true }, hint: 'the selectivity with antenna and next stage connected; bandwidth = f₀ / loaded Q',
  },
  {
    kind: 'choice', key: 'split', path: 'split', label: 'Antenna and load load it', default: 'equal',
    when: (c) => c.goal === 'Q' && loadTapDesigned(c),
    options: [['equal', 'equally (least loss)'], ['matchSource', 'antenna matched']],
  },

  // — what the netlist and the drawing show (no spec path: every option is worked out) —
  {
    kind: 'choice', key: 'build', label: 'Netlist and drawing of', display: 'select', default: 'best', answers: ['options'],
    options: [['best', 'the recommended option'], ...Object.entries(OPTION_NAMES).map(([k, v]) => [k, v] as const)],
  },
] as const);

/** The fields of each group, in the order the bench lays them out. */
export const MATCH_GROUPS = {
  coil: ['coilBy', 'Lc', ...COIL_KEYS.slice(0, COIL_KEYS.indexOf('wire'))],
  wire: COIL_KEYS.slice(COIL_KEYS.indexOf('wire')),
  tank: ['tune', 'C', 'f', 'Qu', 'capQ'],
  terminations: ['Rs', 'Rload', 'loadAt', 'loadTap'],
  goal: ['goal', 'QL', 'split'],
  link: ['lkD', 'lkPos', 'lkN'],
} as const;

