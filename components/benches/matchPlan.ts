/**
 * The match plan: from the Match bench's values (its table's spec, SI, by
 * path) to designMatch's spec, and from there to what the bench shows: the
 * answer (the tank, the figures with source and load straight across the
 * top, and the recommended option) and every option side by side.
 *
 * The core's designMatch sets out all five options in one call; here each
 * option is designed by a call of its own (`options: [kind]`), kept for the
 * same spec, so the bench works out the answer first (usually one option: the
 * tap) and the other options each in a task of their own as the page wakes
 * (kit/Later). The tank, the goal, the load's placement and the straight-
 * across figures are the same in every call.
 *
 * The recommendation is a rule of our own, stated on the page: the options in
 * the order of the fewest extra parts (a tap, a link, a capacitive divider,
 * the high-pass and then the low-pass L-network), the first whose exact
 * circuit comes within 25 % of the loaded Q asked (for a match: a return loss
 * of at least 10 dB at its resonance); failing that, the one nearest the goal.
 *
 * Pure: no Solid, no DOM; tests call it in Node. Every DesignError keeps a
 * spec path the table routes to a field (`coil.…` for the coil, as
 * designMatch names the coil's errors; `frequency` for a tank tuned by its
 * frequency).
 */
import { designCoil, type DesignCoilSpec } from '../../src/core/coil';
import { DesignError, isDesignError, withinSpec } from '../../src/core/errors';
import { designMatch, MATCH_OPTION_KINDS, type MatchDesign, type MatchOption, type MatchOptionKind, type MatchSpec } from '../../src/core/matching';
import { formatNumber, formatQuantityCompact } from '../../src/quantity';
import { getPath, type Choices, type SpecObject } from '../kit/fields';
import { buildCoilSpec } from './coilFields';
import { COIL_PREFIX } from './matchFields';

export { matchLinkFor, type MatchHandOff } from './matchLinks';

/** An option that can be built, as designMatch returns it. */
export type BuiltOption = Extract<MatchOption, { available: true }>;

/** Options in the order of the fewest extra parts: the recommendation's order. */
export const PREFERENCE: readonly MatchOptionKind[] = ['tap', 'link', 'capacitiveDivider', 'highPassL', 'lowPassL'];
/** How far from the loaded Q asked an option's exact circuit may come and still be recommended (our own rule). */
export const Q_TOLERANCE = 0.25;
/** Least return loss at resonance, dB, for an option to be recommended for a match (our own rule: |Γ| ≤ 0.32). */
export const MATCH_RETURN_LOSS = 10;

/** Frequencies a tank is tuned to here, Hz (the core's range for a lumped match). */
const FREQUENCY_RANGE = [1e3, 1e10] as const;

/** A number at a path of the raw values, or undefined. */
function num(raw: unknown, path: string): number | undefined {
  const v = getPath(raw, path);
  return typeof v === 'number' ? v : undefined;
}

/** The single-layer coil's spec from the `coil.…` values (the Coil bench's paths), or undefined for a coil given by its inductance. */
export function matchCoilSpec(raw: SpecObject, choices: Choices): DesignCoilSpec | undefined {
  if (choices.coilBy === 'L') return undefined;
  const coilRaw = (getPath(raw, COIL_PREFIX) ?? {}) as SpecObject;
  return withinSpec(COIL_PREFIX, () => buildCoilSpec(coilRaw, { ...choices, form: 'solenoid' }));
}

/**
 * The capacitance that tunes the coil to f: C = 1/((2πf)² L_f), L_f the
 * coil's inductance at f (designCoil, skin effect included) or the inductance
 * given (Thomson's formula solved for C).
 * @throws DesignError('frequency') outside 1 kHz to 10 GHz; 'coil.…' for the coil
 */
export function tuningCapacitance(frequency: number, coil: DesignCoilSpec | undefined, inductance: number | undefined): number {
  if (!(frequency >= FREQUENCY_RANGE[0] && frequency <= FREQUENCY_RANGE[1])) {
    throw new DesignError('frequency', `A match is worked out for tanks from ${formatQuantityCompact(FREQUENCY_RANGE[0], 'Hz')} to ${formatQuantityCompact(FREQUENCY_RANGE[1], 'Hz')}; ${formatQuantityCompact(frequency, 'Hz', 4)} is outside.`);
  }
  let l = inductance;
  if (coil) {
    const wound = withinSpec(COIL_PREFIX, () => designCoil({ ...coil, sweepPoints: undefined, frequency } as DesignCoilSpec));
    l = wound.inductanceAtFrequency ?? wound.inductance;
  }
  if (l === undefined) throw new DesignError('inductance', 'Give the coil’s inductance.');
  const w = 2 * Math.PI * frequency;
  return 1 / (w * w * l);
}

/**
 * designMatch's spec for the bench's values (SI by path, as `bench.spec()`
 * or `snapshotToSpec(MATCH_FIELDS, …)` gives) and its choices: the coil (or
 * its inductance), the capacitance typed or the one that tunes it to the
 * frequency typed, the Q figures, source, load, goal and link as given.
 * @throws DesignError with a spec path the table routes
 */
export function matchSpecOf(raw: SpecObject, choices: Choices): MatchSpec {
  // The bench's computations all start from the same values object (its spec memo): build the spec once for them.
  if (lastSpec?.raw === raw && lastSpec.choices === choices) return lastSpec.spec;
  const spec = buildMatchSpec(raw, choices);
  lastSpec = { raw, choices, spec };
  return spec;
}

let lastSpec: { raw: SpecObject; choices: Choices; spec: MatchSpec } | undefined;

function buildMatchSpec(raw: SpecObject, choices: Choices): MatchSpec {
  const coil = matchCoilSpec(raw, choices);
  const inductance = coil ? undefined : num(raw, 'inductance');
  const frequency = choices.tune === 'f' ? num(raw, 'frequency') : undefined;
  const capacitance = frequency === undefined ? num(raw, 'capacitance') : tuningCapacitance(frequency, coil, inductance);
  const link = getPath(raw, 'link');
  const spec: MatchSpec = {
    ...(coil ? { coil } : { inductance }),
    capacitance: capacitance as number,
    sourceResistance: num(raw, 'sourceResistance') as number,
  };
  const optional: Array<[keyof MatchSpec, unknown]> = [
    ['unloadedQ', num(raw, 'unloadedQ')],
    ['capacitorQ', coil ? num(raw, 'capacitorQ') : undefined],
    ['loadResistance', num(raw, 'loadResistance')],
    ['loadConnection', coil ? getPath(raw, 'loadConnection') : undefined],
    ['loadTapTurns', coil ? num(raw, 'loadTapTurns') : undefined],
    ['loadedQ', choices.goal === 'match' ? undefined : num(raw, 'loadedQ')],
    ['split', getPath(raw, 'split')],
    ['link', coil && typeof link === 'object' && link !== null ? { ...link } : undefined],
  ];
  for (const [key, value] of optional) if (value !== undefined) (spec as unknown as Record<string, unknown>)[key] = value;
  return spec;
}

// ---------------------------------------------------------------------------
// Options, one design call each, kept for the same spec

let kept: { key: string; designs: Map<MatchOptionKind, MatchDesign> } | undefined;

/**
 * designMatch of the spec with one option; kept while the spec stays the
 * same (a bench reruns its computations on every choice, the netlist's too).
 * @throws DesignError with a spec path the table routes
 */
export function designOption(spec: MatchSpec, kind: MatchOptionKind): MatchDesign {
  const key = JSON.stringify(spec);
  if (kept?.key !== key) kept = { key, designs: new Map() };
  let d = kept.designs.get(kind);
  if (!d) {
    d = designMatch({ ...spec, options: [kind] });
    kept.designs.set(kind, d);
  }
  return d;
}

/**
 * One option for the bench's values: what designMatch makes of it. A link
 * the core refuses for its own geometry (cutting into the coil, too far off)
 * is thrown as the core throws it, so its field says why.
 * @throws DesignError with a spec path the table routes
 */
export function planOption(raw: SpecObject, choices: Choices, kind: MatchOptionKind): MatchOption {
  return designOption(matchSpecOf(raw, choices), kind).options[0];
}

/** How far an option is from the goal: |Q_L/Q_asked − 1|, or for a match how far its return loss falls short of 10 dB. */
export function shortfall(o: BuiltOption, goal: MatchDesign['goal']): number {
  if (goal.loadedQ !== undefined) return Math.abs(o.response.loadedQ / goal.loadedQ - 1);
  return Math.max(0, (MATCH_RETURN_LOSS - o.response.returnLoss) / MATCH_RETURN_LOSS);
}

/** True when an option meets the recommendation's rule (module header). */
export function meetsGoal(o: BuiltOption, goal: MatchDesign['goal']): boolean {
  return goal.loadedQ !== undefined ? shortfall(o, goal) <= Q_TOLERANCE : o.response.returnLoss >= MATCH_RETURN_LOSS;
}

/** The answer at the top of the bench. */
export interface MatchPlan {
  spec: MatchSpec;
  /** Tank, goal, the source's target across the top, the load's placement, the straight-across figures and notes (its `options` hold the one first designed). */
  design: MatchDesign;
  /** The capacitance that tunes the coil to the frequency typed (when tuned by frequency), F. */
  tuningCapacitance?: number;
  /** The option recommended (module header), undefined when none can be built. */
  recommended?: BuiltOption;
  /** True when the recommended option meets the goal; false when it is only the nearest. */
  meetsGoal: boolean;
  /** The options worked out on the way, by kind. */
  tried: Partial<Record<MatchOptionKind, MatchOption>>;
  /** When the loaded Q asked needs the antenna coupled more tightly than a match: the loaded Q a match would give here. */
  overcoupled?: { matchedQ: number };
}

/**
 * The loaded Q with the antenna matched to the rest of the tank (its own loss
 * and the load as placed): G′ₛ = G_D + G′_load, so
 * Q_L = 1/(ω₀L · 2 (G_D + G′_load)) by the high-Q rules (Pozar). A loaded Q
 * asked below it couples the antenna more tightly than a match: the antenna
 * then sees less than its own resistance and the mismatch costs loss.
 */
export function matchedLoadedQ(design: MatchDesign): number {
  const t = design.tank;
  const gl = design.load ? 1 / design.load.presentedResistance : 0;
  return 1 / (t.reactance * 2 * (1 / t.dynamicResistance + gl));
}

/**
 * The answer: the tank and the straight-across figures, and the recommended
 * option, found by designing the options in the order of PREFERENCE until one
 * meets the goal (usually the first). A link the core refuses for its
 * geometry counts as not available here (the link's row says why at its field).
 * @throws DesignError with a spec path the table routes
 */
export function planAnswer(raw: SpecObject, choices: Choices): MatchPlan {
  const spec = matchSpecOf(raw, choices);
  const tried: MatchPlan['tried'] = {};
  let design: MatchDesign | undefined;
  let best: BuiltOption | undefined;
  for (const kind of PREFERENCE) {
    let option: MatchOption;
    try {
      const d = designOption(spec, kind);
      design ??= d;
      option = d.options[0];
    } catch (e) {
      if (!(kind === 'link' && isDesignError(e) && e.field.startsWith('link'))) throw e;
      option = { kind, available: false, reason: e.message, field: e.field };
    }
    tried[kind] = option;
    if (!option.available) continue;
    if (meetsGoal(option, (design as MatchDesign).goal)) {
      best = option;
      break;
    }
    if (!best || shortfall(option, (design as MatchDesign).goal) < shortfall(best, (design as MatchDesign).goal)) best = option;
  }
  const d = design as MatchDesign;
  const tuned = choices.tune === 'f' ? spec.capacitance : undefined;
  const matchedQ = matchedLoadedQ(d);
  // (with the load's tap designed for an equal share the antenna is never more than matched)
  const overcoupled = d.goal.loadedQ !== undefined && d.goal.loadedQ < matchedQ * (1 - 1e-9);
  return {
    spec, design: d, ...(tuned === undefined ? {} : { tuningCapacitance: tuned }), ...(best ? { recommended: best } : {}),
    meetsGoal: !!best && meetsGoal(best, d.goal), tried, ...(overcoupled ? { overcoupled: { matchedQ } } : {}),
  };
}

/** The kinds in the order the core sets them out (the table's rows). */
export const OPTION_KINDS = MATCH_OPTION_KINDS;

// ---------------------------------------------------------------------------
// Words and numbers as the bench shows them

/** Turns as wound: "4", "3.5". */
export const sayTurns = (n: number) => String(Number(n.toFixed(1)));
/** Turns with their noun: "1 turn", "0.5 turns", "4 turns". */
export const turnsText = (n: number) => `${sayTurns(n)} turn${sayTurns(n) === '1' ? '' : 's'}`;
/** The significant figures a result row needs to show turns as sayTurns does ("4", "14.5"). */
export const turnFigures = (n: number | undefined) => (n === undefined ? 3 : sayTurns(n).replace('.', '').length);
/** A Q as people say it: whole numbers from 10 up, two figures below. */
export const sayQ = (q: number) => (q >= 10 ? String(Math.round(q)) : q.toPrecision(2));
/** Decibels, 2 decimals below 10 dB, else 3 figures. */
export const sayDb = (x: number) => `${x < 10 ? x.toFixed(2) : formatNumber(x, 3)} dB`;
/** A frequency, 4 figures, compact. */
export const hz = (f: number) => formatQuantityCompact(f, 'Hz', 4);
/** A capacitance, 4 figures, compact. */
export const pf = (c: number) => formatQuantityCompact(c, 'F', 4);
/** An inductance, 4 figures, compact. */
export const henry = (l: number) => formatQuantityCompact(l, 'H', 4);
/** A resistance, 3 figures, compact. */
export const ohm = (r: number) => formatQuantityCompact(r, 'Ω', 3);
/** A length in millimetres, 3 figures. */
export const mm = (x: number) => `${Number((x * 1e3).toPrecision(3))} mm`;

/** What to build for an option, in a line: where the tap goes, the capacitors, the link, the network's parts. */
export function buildText(o: BuiltOption): string {
  switch (o.kind) {
    case 'tap':
      return `tap ${turnsText(o.tap.practicalTapTurns)} from the cold end (exactly ${o.tap.tapTurns.toFixed(2)})`;
    case 'capacitiveDivider':
      return `C1 ${pf(o.divider.upperCapacitance)} (top to joint), C2 ${pf(o.divider.lowerCapacitance)} (joint to ground)`;
    case 'link':
      return `${turnsText(o.link.practicalTurns)}, ${mm(o.link.diameter)} across, ${o.link.position === 0 ? 'over the cold end' : `${mm(o.link.position)} from the cold end`}; k = ${o.link.couplingCoefficient.toFixed(2)}`;
    case 'lowPassL':
      return `series L ${henry(o.network.seriesInductance as number)}; tank capacitor ${pf(o.network.tankCapacitance)}`;
    case 'highPassL':
      return o.network.shuntKept
        ? `series C ${pf(o.network.seriesCapacitance as number)}, shunt L ${henry(o.network.shuntInductance as number)}; tank capacitor ${pf(o.network.tankCapacitance)}`
        : `series C ${pf(o.network.seriesCapacitance as number)}; tank capacitor ${pf(o.network.tankCapacitance)}`;
  }
}
