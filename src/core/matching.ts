/**
 * Matching a receiver front end's source (an antenna of 50 or 75 Ω) and load
 * (the next stage, hundreds of ohms to kilohms) to a tank whose dynamic
 * resistance is tens of kilohms, at the loaded Q the designer wants:
 * `designTap` for one side at a tap on the coil, and `designMatch`, the one
 * entry point for a whole front end, which sets out the options side by side
 * (a tap, a capacitive divider, a link winding, an L-network in its low-pass
 * and high-pass forms), each with what to build, its loaded Q, bandwidth,
 * mismatch and transducer loss, and its circuit (for `matchNetlist` and the
 * return-loss plot of `sweepMatchCircuit`).
 *
 * Method, in two steps:
 * 1. Design by the high-Q rules (`matchTank.ts`): each termination is seen
 *    across the top of the tank as R′; the goal (a loaded Q, or a match) sets
 *    the R′ each side needs; each option then presents the source as that R′:
 *    a tap from the coil's real section inductances and Maxwell/Rosa mutual
 *    inductance (`mutual.ts`: step-up (L1 + L2 + 2M)/(L1 + M), with the
 *    ideal-transformer guess N/n beside it), a capacitive divider and an
 *    L-network from exact formulas (`matchNetworks.ts`), a link from
 *    Maxwell's formula summed over its turns and the coil's (`matchLink.ts`).
 *    Taps are rounded to the nearest half turn, links to whole turns.
 * 2. Check by the exact circuit (`matchCircuit.ts`): the option as built
 *    (rounded taps, coupled sections with their leakage, the coil's loss in
 *    its windings) is solved by nodal analysis; its loaded resonance,
 *    bandwidth, loaded Q, input impedance, mismatch and transducer loss come
 *    from the complex response. The high-Q estimate is returned beside it.
 *
 * Small-signal receiving use. For a transmitting tank the voltages at the top
 * can be dangerous: see the Tank bench's stress figures and the cautions.
 */
import { DesignError, requireObject } from './errors';
import { analyzeMatchCircuit, type MatchCircuit, type MatchPart, type MatchResponse } from './matchCircuit';
import { checkLink, linkModel, linkNotes, linkParts, placeLink, type LinkGeometry, type LinkPlacement, type LinkSpec } from './matchLink';
import { capacitiveDivider, lNetwork, type CapacitiveDivider } from './matchNetworks';
import {
  attempt, checkLoadedQ, coilParts, estimateFigures, givenTap, placeTap, placementNotes, resolveTankForMatch, sideCircuit, sideTarget, tappable,
  type MatchEstimate, type MatchTank, type MatchTankSpec, type SideInput, type SideTarget, type TankForMatch, type TapPlacement,
} from './matchTank';
import { note, type DesignNote } from './notes';
import { tankValue } from './tankModel';
import { sayNumber, sayQuantity } from './text';

// ---------------------------------------------------------------------------
// One side at a tap

/** What `designTap` takes: one side (a source, or the next stage), the tank with its coil, the goal. */
export interface TapInput extends SideInput {
  coil: NonNullable<SideInput['coil']>;
}

/** A tap designed for one side. */
export interface TapDesign {
  tank: MatchTank;
  /** Resistance this side must present across the top, ohms. */
  wantedResistance: number;
  tap: TapPlacement;
  /** High-Q figures with the practical tap. */
  estimate: MatchEstimate;
  /** High-Q figures with the tap where the ideal-transformer guess N/√(R′/R) puts it (to the nearest half turn). */
  turnsRatioEstimate: MatchEstimate;
  /** The exact circuit's figures with the practical tap (the resistance drives the tap). */
  response: MatchResponse;
  circuit: MatchCircuit;
  notes: DesignNote[];
}

/** A tap can only step up: the refusal when the side's resistance is above what it must present. */
function cannotStepDown(field: string, who: string, target: SideTarget, t: MatchTank): DesignError {
  const r = sayQuantity(target.resistance, 'Ω');
  if (target.loadedQ === undefined) {
    return new DesignError(field, `The ${r} ${who} is above the ${sayQuantity(target.wanted, 'Ω')} it must be seen as across the tank for a match (the tank's dynamic resistance${target.across === undefined ? '' : ' with what is across it'}): a tap or a capacitive divider only steps a resistance up, so neither can match it. Connect it across the top (it then loads the tank less than a match would), or lower its resistance.`);
  }
  const g = 1 / t.dynamicResistance + (target.across === undefined ? 0 : 1 / target.across) + 1 / target.resistance;
  const q = 1 / (t.reactance * g);
  return new DesignError(field, `Even across the top the ${r} ${who} loads the tank only to a loaded Q of ${sayNumber(q)}, above the wanted ${sayNumber(target.loadedQ)}: a tap can only lighten the load. Connect it across the top, or ask for a loaded Q of ${sayNumber(q)} or more.`);
}

/**
 * The tap for one side of a match: where on the coil (turns from the cold
 * end, real-valued and to the nearest half turn) a resistance must be
 * connected to present what the tank needs for the wanted loaded Q (or a
 * match), from the coil's real section inductances; the turns-ratio guess
 * beside it; and the loaded Q, bandwidth and mismatch loss the practical tap
 * gives, by the high-Q rules and in the exact circuit (module header).
 * For the load side, give the load's resistance and the source as it is seen
 * across the top (`acrossResistance`): by reciprocity the circuit drives the
 * tap through the load's resistance, and the mismatch is the one the load
 * sees looking back into the tank.
 * @throws DesignError naming the input at fault: 'resistance' when it is above what the
 *   tank needs (no step-down at a tap), 'loadedQ' when the loaded Q cannot be reached,
 *   'coil.…' and the tank's fields
 */
export function designTap(input: TapInput): TapDesign {
  const i = requireObject<TapInput>('input', input, 'The tap design');
  const r = resolveTankForMatch(i);
  const w = tappable(r, 'coil');
  const target = sideTarget(r.tank, i);
  if (target.wanted < target.resistance * (1 - 1e-9)) throw cannotStepDown('resistance', 'resistance', target, r.tank);
  const tap = placeTap(w, target.resistance, target.wanted);
  const { winding, nodeOf } = coilParts(r, [{ turns: tap.practicalTapTurns, node: 'tap' }]);
  const circuit = sideCircuit(r, target, [winding], nodeOf(tap.practicalTapTurns));
  const gx = target.across === undefined ? 0 : 1 / target.across;
  const estimate = estimateFigures(r.tank, 1 / tap.presentedResistance, gx, undefined, target.resistance);
  const response = analyzeMatchCircuit(circuit, { bandwidth: estimate.bandwidth });
  return {
    tank: r.tank,
    wantedResistance: target.wanted,
    tap,
    estimate,
    turnsRatioEstimate: estimateFigures(r.tank, 1 / tap.turnsRatioGuess.presentedResistance, gx, undefined, target.resistance),
    response,
    circuit,
    notes: [...r.tank.notes, ...placementNotes(tap, w.geometry.turns, 'resistance', 'resistance'), ...responseNotes(r.tank, estimate, response)],
  };
}

// ---------------------------------------------------------------------------
// The whole front end

/** The ways of matching the source that `designMatch` sets side by side. */
export type MatchOptionKind = 'tap' | 'capacitiveDivider' | 'link' | 'lowPassL' | 'highPassL';
export const MATCH_OPTION_KINDS: readonly MatchOptionKind[] = ['tap', 'capacitiveDivider', 'link', 'lowPassL', 'highPassL'];

/** A front end to match: the tank, the source, the load, the goal. SI units. */
export interface MatchSpec extends MatchTankSpec {
  /** Source resistance (the antenna), ohms. */
  sourceResistance: number;
  /** Load resistance (the next stage's input), ohms; omitted: no load. */
  loadResistance?: number;
  /** Where the load connects: at a tap on the coil (default when the coil's geometry is known) or across the top. */
  loadConnection?: 'tap' | 'top';
  /** The load's tap, turns from the cold end, when it is fixed; omitted: designed. */
  loadTapTurns?: number;
  /** Wanted loaded Q of the whole front end; omitted: match the source to the rest (maximum power). */
  loadedQ?: number;
  /** With the load's tap designed: 'equal' (default) source and load load the tank equally (least transducer loss); 'matchSource': the source sees its own resistance. */
  split?: 'equal' | 'matchSource';
  /** The link's geometry (defaults: the coil's wire, close-wound just over the cold end). */
  link?: LinkSpec;
  /** Which options to work out (default all). */
  options?: MatchOptionKind[];
}

/** Every spec path a DesignError from `designMatch` can name (besides 'coil.' followed by a coil spec path). */
export const MATCH_SPEC_FIELDS = [
  'coil', 'inductance', 'capacitance', 'unloadedQ', 'capacitorQ', 'sourceResistance', 'loadResistance', 'loadConnection', 'loadTapTurns',
  'loadedQ', 'split', 'link', 'link.diameter', 'link.position', 'link.wire', 'link.wire.diameter', 'link.wire.insulatedDiameter', 'link.pitch',
  'link.turns', 'options',
] as const;

/** Where the load sits, the same for every option. */
export interface LoadPlacement {
  connection: 'tap' | 'top';
  resistance: number;
  /** The load as it is seen across the top, ohms. */
  presentedResistance: number;
  /** Its tap (at a tap). */
  tap?: TapPlacement;
}

/** What every available option has. */
interface OptionCommon {
  available: true;
  /** The circuit as built (for `matchNetlist`, `sweepMatchCircuit`). */
  circuit: MatchCircuit;
  /** High-Q figures. */
  estimate: MatchEstimate;
  /** The exact circuit's figures at its loaded resonance: loadedQ, bandwidth, transducerLoss, mismatchLoss, inputImpedance … */
  response: MatchResponse;
  notes: DesignNote[];
}

export interface TapOption extends OptionCommon { kind: 'tap'; tap: TapPlacement }
export interface DividerOption extends OptionCommon { kind: 'capacitiveDivider'; divider: CapacitiveDivider }
export interface LinkOption extends OptionCommon { kind: 'link'; link: LinkPlacement }
/** Parts of an L-network option, henries and farads; `tankCapacitance` is the tank capacitor to fit with it. */
export interface LNetworkParts {
  networkQ: number;
  seriesInductance?: number;
  seriesCapacitance?: number;
  shuntCapacitance?: number;
  shuntInductance?: number;
  /** The one tank capacitor across the coil with the shunt part folded in (low-pass: C + C_shunt; high-pass: C − 1/(ω² L_shunt)), or C when the shunt inductor is kept. */
  tankCapacitance: number;
  /** High-pass only: true when the shunt inductor stays in the circuit (the series capacitor's share is more than the tank's capacitance). */
  shuntKept?: boolean;
}
export interface LNetworkOption extends OptionCommon { kind: 'lowPassL' | 'highPassL'; network: LNetworkParts }
/** An option that cannot be built here, and why (the message and the spec path it is about). */
export interface UnavailableOption { kind: MatchOptionKind; available: false; reason: string; field: string }
export type MatchOption = TapOption | DividerOption | LinkOption | LNetworkOption | UnavailableOption;

/** What `designMatch` returns. */
export interface MatchDesign {
  tank: MatchTank;
  /** The loaded Q asked for (absent for a match) and the split used. */
  goal: { loadedQ?: number; split: 'equal' | 'matchSource' };
  /** The resistance the source must be seen as across the top, ohms (every option aims at it). */
  sourceTarget: number;
  load?: LoadPlacement;
  /** High-Q figures with the source and load straight across the top (no matching): what the Tank bench shows. */
  direct: MatchEstimate;
  options: MatchOption[];
  notes: DesignNote[];
}

function choice<T extends string>(field: string, value: unknown, allowed: readonly T[], what: string): T {
  if (typeof value !== 'string' || !(allowed as readonly string[]).includes(value)) {
    throw new DesignError(field, `${what} must be ${allowed.map((a) => `"${a}"`).join(' or ')} (got ${typeof value === 'string' ? JSON.stringify(value.slice(0, 20)) : typeof value}).`);
  }
  return value as T;
}

/** The load's placement and the conductance it presents across the top. */
function placeLoad(r: TankForMatch, s: MatchSpec, loadedQ: number | undefined, split: 'equal' | 'matchSource'): LoadPlacement | undefined {
  const t = r.tank;
  if (s.loadResistance === undefined) {
    if (s.loadTapTurns !== undefined) throw new DesignError('loadResistance', 'Give the load\'s resistance as well as its tap.');
    return undefined;
  }
  const rl = tankValue('loadResistance', s.loadResistance, 'The load resistance', 'Ω');
  const connection = s.loadConnection === undefined ? (r.wound || s.loadTapTurns !== undefined ? 'tap' : 'top') : choice('loadConnection', s.loadConnection, ['tap', 'top'] as const, 'The load\'s connection');
  if (connection === 'top') {
    if (s.loadTapTurns !== undefined) throw new DesignError('loadTapTurns', 'A tap is given for the load, but the load is to go across the top: choose one.');
    return { connection, resistance: rl, presentedResistance: rl };
  }
  const w = tappable(r, 'loadConnection');
  if (s.loadTapTurns !== undefined) {
    const tap = givenTap(w, 'loadTapTurns', s.loadTapTurns, rl);
    return { connection, resistance: rl, presentedResistance: tap.presentedResistance, tap };
  }
  if (loadedQ === undefined) {
    throw new DesignError('loadedQ', 'Give the loaded Q wanted: with the source\'s and the load\'s taps both free, the most power would reach the load with the tank loaded to nothing. Or fix the load (its tap, or across the top) and the source is matched to the rest.');
  }
  const gd = 1 / t.dynamicResistance;
  const gt = 1 / (loadedQ * t.reactance);
  const gl = split === 'equal' ? (gt - gd) / 2 : gt / 2 - gd;
  if (!(gl > 0)) {
    throw new DesignError('loadedQ', `For the source to see its own resistance the loaded Q can be at most half the unloaded Q (${sayNumber(t.unloadedQ / 2)}); ${sayNumber(loadedQ)} is too high. Ask for less, or share the loading equally.`);
  }
  const wanted = 1 / gl;
  if (wanted < rl * (1 - 1e-9)) {
    throw new DesignError('loadResistance', `The ${sayQuantity(rl, 'Ω')} load is above the ${sayQuantity(wanted, 'Ω')} it should be seen as across the tank for a loaded Q of ${sayNumber(loadedQ)} (${split === 'equal' ? 'shared equally with the source' : 'with the source matched'}): a tap only steps a resistance up. Connect the load across the top and the source's match takes up the rest.`);
  }
  const tap = placeTap(w, rl, wanted);
  return { connection, resistance: rl, presentedResistance: tap.presentedResistance, tap };
}

/**
 * Matches a front end: the tank (from the coil's geometry, or a bare
 * inductance), the source, the load and the goal (a loaded Q with the split
 * between source and load, or a match) give the resistance the source must
 * be seen as across the top; each option (tap, capacitive divider, link,
 * L-network low-pass and high-pass) presents it its own way, with the load
 * placed the same way for all (at a designed or given tap, or across the
 * top). Each option returns what to build, its circuit, the high-Q estimate
 * and the exact circuit's loaded Q, bandwidth, transducer loss and mismatch
 * loss at its loaded resonance; an option that cannot be built says why.
 * Models and sources: module header and the modules it names.
 * @throws DesignError naming the spec path at fault: 'sourceResistance' when the source is
 *   above what the tank needs (no option steps down), 'loadedQ' when the loaded Q cannot be
 *   reached, 'loadResistance', 'loadTapTurns' (a tap beyond the coil), 'coil.…', 'link.…', …
 */
export function designMatch(spec: MatchSpec): MatchDesign {
  const s = requireObject<MatchSpec>('spec', spec, 'The match');
  const r = resolveTankForMatch(s);
  const t = r.tank;
  const rs = tankValue('sourceResistance', s.sourceResistance, 'The source resistance', 'Ω');
  const split = s.split === undefined ? 'equal' : choice('split', s.split, ['equal', 'matchSource'] as const, 'The split');
  const loadedQ = s.loadedQ === undefined ? undefined : checkLoadedQ(s.loadedQ, t);
  let kinds = MATCH_OPTION_KINDS;
  if (s.options !== undefined) {
    if (!Array.isArray(s.options) || s.options.length === 0) throw new DesignError('options', 'Name at least one option to work out.');
    kinds = s.options.map((k) => choice('options', k, MATCH_OPTION_KINDS, 'Each option'));
  }
  const load = placeLoad(r, s, loadedQ, split);
  const gd = 1 / t.dynamicResistance;
  const gl = load === undefined ? 0 : 1 / load.presentedResistance;
  let gs: number;
  if (loadedQ !== undefined && !(split === 'matchSource' && load?.tap !== undefined && s.loadTapTurns === undefined)) {
    gs = 1 / (loadedQ * t.reactance) - gd - gl;
    if (!(gs > 0)) {
      throw new DesignError('loadedQ', `The load as connected already loads the tank to a loaded Q of ${sayNumber(1 / (t.reactance * (gd + gl)))}, below the wanted ${sayNumber(loadedQ)}: tap the load lower (or give it a tap), or ask for less.`);
    }
  } else gs = gd + gl;
  const sourceTarget = 1 / gs;
  if (sourceTarget < rs * (1 - 1e-9)) {
    throw cannotStepDown('sourceResistance', 'source', { resistance: rs, wanted: sourceTarget, ...(load ? { across: load.presentedResistance } : {}), ...(loadedQ === undefined ? {} : { loadedQ }) }, t);
  }
  const linkGeometry = r.wound && kinds.includes('link') ? checkLink(s.link, r.wound) : undefined;
  const notes: DesignNote[] = [...t.notes];
  if (load?.tap && r.wound) notes.push(...placementNotes(load.tap, r.wound.geometry.turns, 'loadTapTurns', 'load'));
  const options = kinds.map((kind) => {
    const built = attempt(() => buildOption(kind, { r, rs, load, sourceTarget, linkGeometry }));
    return built.ok ? built.value : { kind, available: false as const, reason: built.reason, field: built.field };
  });
  return {
    tank: t,
    goal: { ...(loadedQ === undefined ? {} : { loadedQ }), split },
    sourceTarget,
    ...(load ? { load } : {}),
    direct: estimateFigures(t, 1 / rs, load ? 1 / load.resistance : 0, load ? 1 / load.resistance : undefined, rs),
    options,
    notes,
  };
}

/**
 * What the exact circuit says beyond the high-Q rules: a loaded Q more than
 * 10 % from the estimate, and a loaded resonance moved by more than a quarter
 * of the bandwidth (with the trim of the tank capacitor that puts it back,
 * ΔC ≈ 2C Δf/f0 from Thomson's formula).
 */
function responseNotes(t: MatchTank, e: MatchEstimate, r: MatchResponse): DesignNote[] {
  const notes: DesignNote[] = [];
  if (Math.abs(r.loadedQ / e.loadedQ - 1) > 0.1) {
    notes.push(note('info', `In the full circuit this option gives a loaded Q of ${sayNumber(r.loadedQ)}, not the ${sayNumber(e.loadedQ)} of the high-Q rules: its own parts (a network with a Q of its own, or the sections' leakage) change the selectivity. The circuit's figures are the ones to trust.`, 'loadedQ'));
  }
  const shift = r.frequency - t.frequency;
  if (Math.abs(shift) > 0.25 * r.bandwidth) {
    notes.push(note('info', `The loaded resonance sits at ${sayQuantity(r.frequency, 'Hz', 4)}, ${sayQuantity(Math.abs(shift), 'Hz', 3)} ${shift > 0 ? 'above' : 'below'} the tank's own: ${shift > 0 ? 'add' : 'take off'} about ${sayQuantity(2 * t.capacitance * Math.abs(shift) / t.frequency, 'F')} at the tank capacitor (trimmer) to bring it back.`, 'capacitance'));
  }
  return notes;
}

interface OptionContext {
  r: TankForMatch;
  rs: number;
  load?: LoadPlacement;
  sourceTarget: number;
  linkGeometry?: LinkGeometry;
}

/** One option: its parts, then the circuit, the estimate and the exact response. */
function buildOption(kind: MatchOptionKind, x: OptionContext): MatchOption {
  const { r, rs, load, sourceTarget } = x;
  const t = r.tank;
  const loadTaps = load?.tap ? [{ turns: load.tap.practicalTapTurns, node: 'ltap' }] : [];
  const gl = load === undefined ? 0 : 1 / load.presentedResistance;
  const finish = <T extends object>(extra: T, parts: MatchPart[], sourceNode: string, loadNode: string | undefined, presented: number, notes: DesignNote[]) => {
    const circuit: MatchCircuit = {
      frequency: t.frequency,
      sourceNode,
      sourceResistance: rs,
      topNode: 'top',
      ...(load && loadNode ? { loadNode, loadResistance: load.resistance } : {}),
      parts,
    };
    const estimate = estimateFigures(t, 1 / presented, gl, load ? gl : undefined, rs);
    const response = analyzeMatchCircuit(circuit, { bandwidth: estimate.bandwidth });
    return { ...extra, available: true as const, circuit, estimate, response, notes: [...notes, ...responseNotes(t, estimate, response)] };
  };
  const tankCap = (c: number): MatchPart => ({ kind: 'capacitor', name: 'tank', from: 'top', to: '0', capacitance: c });
  if (kind === 'tap') {
    const w = tappable(r, 'coil');
    const tap = placeTap(w, rs, sourceTarget);
    const { winding, nodeOf } = coilParts(r, [{ turns: tap.practicalTapTurns, node: 'tap' }, ...loadTaps]);
    const loadNode = load ? nodeOf(load.tap?.practicalTapTurns ?? w.geometry.turns) : undefined;
    return finish({ kind, tap }, [winding, tankCap(t.capacitance)], nodeOf(tap.practicalTapTurns), loadNode, tap.presentedResistance, placementNotes(tap, w.geometry.turns, 'sourceResistance', 'source'));
  }
  const { winding, nodeOf } = coilParts(r, loadTaps);
  const loadNode = load ? nodeOf(load.tap?.practicalTapTurns ?? Infinity) : undefined;
  if (kind === 'capacitiveDivider') {
    const divider = capacitiveDivider({ capacitance: t.capacitance, frequency: t.frequency, sourceResistance: rs, presentedResistance: sourceTarget, restResistance: 1 / (1 / t.dynamicResistance + gl) });
    const parts: MatchPart[] = [
      winding,
      { kind: 'capacitor', name: 'upper', from: 'top', to: 'mid', capacitance: divider.upperCapacitance },
      { kind: 'capacitor', name: 'lower', from: 'mid', to: '0', capacitance: divider.lowerCapacitance },
    ];
    return finish({ kind, divider }, parts, 'mid', loadNode, sourceTarget, divider.notes);
  }
  if (kind === 'link') {
    const w = tappable(r, 'coil');
    const m = linkModel(x.linkGeometry as LinkGeometry, w);
    const link = placeLink(m, t, rs, sourceTarget);
    const { part, nodeOf: linked } = linkParts(r, m, link.practicalTurns, loadTaps, 'lk');
    return finish({ kind, link }, [part, tankCap(t.capacitance)], 'lk', load ? linked(load.tap?.practicalTapTurns ?? Infinity) : undefined, link.presentedResistance, linkNotes(link, rs));
  }
  const net = lNetwork({ frequency: t.frequency, sourceResistance: rs, presentedResistance: sourceTarget, capacitance: t.capacitance });
  if (kind === 'lowPassL') {
    const c = net.lowPass.tankCapacitance as number;
    const parts: MatchPart[] = [winding, tankCap(c), { kind: 'inductor', name: 'series', from: 'src', to: 'top', inductance: net.lowPass.seriesInductance }];
    return finish({ kind, network: { networkQ: net.networkQ, seriesInductance: net.lowPass.seriesInductance, shuntCapacitance: net.lowPass.shuntCapacitance, tankCapacitance: c } }, parts, 'src', loadNode, sourceTarget, net.notes);
  }
  const folded = net.highPass.tankCapacitance;
  const parts: MatchPart[] = [
    winding, tankCap(folded ?? t.capacitance),
    { kind: 'capacitor', name: 'series', from: 'src', to: 'top', capacitance: net.highPass.seriesCapacitance },
    ...(folded === undefined ? [{ kind: 'inductor' as const, name: 'shunt', from: 'top', to: '0', inductance: net.highPass.shuntInductance }] : []),
  ];
  return finish({ kind, network: { networkQ: net.networkQ, seriesCapacitance: net.highPass.seriesCapacitance, shuntInductance: net.highPass.shuntInductance, tankCapacitance: folded ?? t.capacitance, shuntKept: folded === undefined } }, parts, 'src', loadNode, sourceTarget, net.notes);
}
