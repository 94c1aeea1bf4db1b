/**
 * The tank a match works on, and what every matching option shares: the
 * tank resolved from the coil's geometry (or a bare inductance), the
 * resistance each side must present across the tank for a wanted loaded Q
 * or a match, the high-Q estimate of the figures, the tap placement, and the
 * tank's coil as coupled windings for the circuit.
 *
 * The tank: the coil (wound by `designCoil`) with the tank capacitance C
 * across its whole length (C is all the capacitance across the coil: the
 * capacitor, strays and the coil's own). Resonance f0 = 1/(2π√(L_f C)) with
 * L_f the coil's inductance at f0 (found by repeating designCoil at the
 * resonance twice; the skin effect's share of L changes by far less than a
 * part in a million after that). Unloaded Q: as given, or the coil's Q at f0
 * (designCoil) combined with the capacitor's, 1/Q_u = 1/Q_coil + 1/Q_C
 * (Pozar). Dynamic resistance R_D = Q_u ω0 L (Terman 1943).
 *
 * High-Q rules (Pozar, *Microwave Engineering*; Terman 1943): every
 * termination is seen across the top of the tank as a conductance G′; the
 * loaded Q is Q_L = 1/(ω0 L (G_D + ΣG′)) (1/Q_L = 1/Q_u + Σ 1/Q_e); the
 * bandwidth f0/Q_L; the source's reflection Γ = (G′_s − G_rest)/(G′_s + G_rest)
 * (an ideal transformer keeps Γ), mismatch loss −10 log10(1 − Γ²) and
 * transducer loss −10 log10(4 G′_s G′_load / G_T²).
 *
 * Goals (definitions of our own, stated here):
 * - a wanted loaded Q: the terminations together present G_T − G_D, with
 *   G_T = 1/(Q_L ω0 L); "equal" split: source and load each present half (the
 *   least transducer loss for that Q_L, −20 log10(1 − Q_L/Q_u): the
 *   insertion-loss rule of `qRules`); "matchSource": the source sees its own
 *   resistance (G′_s = G_D + G′_load), possible for Q_L < Q_u/2;
 * - a match (no loaded Q given): the source presents G′_s = G_D + G′_load,
 *   so it sees its own resistance (maximum power into the tank and load).
 */
import { TWO_PI } from './constants';
import { designCoil, type DesignCoilResult, type DesignCoilSpec } from './coil';
import { DesignError, isDesignError, requireObject, withinSpec } from './errors';
import { type MatchCircuit, type MatchPart } from './matchCircuit';
import { checkTap, runMutual, runOf, sectionsAt, tapNotes, type WoundSolenoid, woundSolenoid } from './mutual';
import { note, type DesignNote } from './notes';
import { combineQ } from './qRules';
import { resonantFrequency } from './resonance';
import { tankValue } from './tankModel';
import { sayNumber, sayQuantity } from './text';

/** The tank: a coil (its geometry, for taps and links) or a bare inductance, and the capacitance across it. SI units. */
export interface MatchTankSpec {
  /** The coil as on the Coil bench (taps and links need a single-layer solenoid). */
  coil?: DesignCoilSpec;
  /** The coil's inductance, henries, when no coil is given (then only a capacitive divider or an L-network can match). */
  inductance?: number;
  /** All the capacitance across the whole coil (capacitor, strays, the coil's own), farads. */
  capacitance: number;
  /** The tank's unloaded Q at resonance; omitted: the coil's Q (designCoil) combined with `capacitorQ`. */
  unloadedQ?: number;
  /** The capacitor's Q at resonance (used only when `unloadedQ` is omitted); omitted: a lossless capacitor. */
  capacitorQ?: number;
}

/** The tank as resolved. */
export interface MatchTank {
  /** Inductance at resonance L_f, henries. */
  inductance: number;
  /** Capacitance across the coil, farads. */
  capacitance: number;
  /** Resonance f0 = 1/(2π√(L_f C)), Hz. */
  frequency: number;
  /** ω0 L, ohms. */
  reactance: number;
  /** Q_u. */
  unloadedQ: number;
  /** R_D = Q_u ω0 L, ohms. */
  dynamicResistance: number;
  /** The coil as wound, at f0 (when a coil was given). */
  coil?: DesignCoilResult;
  notes: DesignNote[];
}

/** The tank and, for a single-layer coil, its winding. */
export interface TankForMatch {
  tank: MatchTank;
  wound?: WoundSolenoid;
}

/** Design frequencies a lumped match is worked out for, Hz. */
const FREQUENCY_RANGE = [1e3, 1e10] as const;

function frequencyOf(inductance: number, capacitance: number): number {
  const f = withinSpec('tank', () => resonantFrequency(inductance, capacitance));
  if (f < FREQUENCY_RANGE[0] || f > FREQUENCY_RANGE[1]) {
    throw new DesignError('capacitance', `With ${sayQuantity(inductance, 'H')} and ${sayQuantity(capacitance, 'F')} the tank resonates at ${sayQuantity(f, 'Hz')}, outside the ${sayQuantity(FREQUENCY_RANGE[0], 'Hz')} to ${sayQuantity(FREQUENCY_RANGE[1], 'Hz')} a lumped match is worked out for. Check the capacitance.`);
  }
  return f;
}

/**
 * Resolves the tank (module header): the coil wound at its resonance with
 * the capacitance, the unloaded Q and the dynamic resistance.
 * @throws DesignError naming the spec path at fault ('coil.diameter', 'capacitance', 'unloadedQ', …)
 */
export function resolveTankForMatch(spec: MatchTankSpec): TankForMatch {
  const s = requireObject<MatchTankSpec>('tank', spec, 'The tank');
  const capacitance = tankValue('capacitance', s.capacitance, 'The tank capacitance', 'F');
  const notes: DesignNote[] = [];
  let inductance: number;
  let coil: DesignCoilResult | undefined;
  let wound: WoundSolenoid | undefined;
  let f: number;
  if (s.coil !== undefined) {
    if (s.inductance !== undefined) throw new DesignError('inductance', 'Give the coil or its inductance, not both: the inductance comes from the coil.');
    const c = requireObject<DesignCoilSpec>('coil', s.coil, 'The coil');
    const wind = (frequency?: number): DesignCoilResult => {
      if (c.form === 'solenoid') {
        wound = woundSolenoid(c, frequency);
        return wound.coil;
      }
      return withinSpec('coil', () => designCoil({ ...c, sweepPoints: undefined, frequency } as DesignCoilSpec));
    };
    coil = wind();
    f = frequencyOf(coil.inductance, capacitance);
    for (let i = 0; i < 2; i++) {
      coil = wind(f);
      f = frequencyOf(coil.inductanceAtFrequency ?? coil.inductance, capacitance);
    }
    inductance = coil.inductanceAtFrequency ?? coil.inductance;
    notes.push(...coil.notes.filter((n) => n.level !== 'info').map((n) => note(n.level, n.message, n.field === undefined ? undefined : `coil.${n.field}`)));
    if (coil.selfResonantFrequency !== undefined && f > 0.5 * coil.selfResonantFrequency) {
      notes.push(note('validity', `The tank resonates at ${sayQuantity(f, 'Hz', 4)}, above half the coil's own self-resonance (${sayQuantity(coil.selfResonantFrequency, 'Hz', 4)}): the coil no longer acts as a plain inductance and its sections even less so. Use fewer turns and more capacitance.`, 'capacitance'));
    }
    if (coil.selfCapacitance !== undefined) {
      notes.push(note('info', `The capacitance across the coil is taken as the whole of it: include the coil's own ${sayQuantity(coil.selfCapacitance, 'F')} (Medhurst) and the strays in it.`, 'capacitance'));
    }
  } else {
    if (s.inductance === undefined) throw new DesignError('inductance', 'Give the coil (or at least its inductance).');
    inductance = tankValue('inductance', s.inductance, 'The inductance', 'H');
    f = frequencyOf(inductance, capacitance);
  }
  let unloadedQ: number;
  if (s.unloadedQ !== undefined) {
    unloadedQ = tankValue('unloadedQ', s.unloadedQ, 'The unloaded Q');
    if (s.capacitorQ !== undefined) notes.push(note('info', 'The unloaded Q given is the whole tank\'s: the capacitor\'s Q was not used.', 'capacitorQ'));
  } else {
    const qc = s.capacitorQ === undefined ? Infinity : tankValue('capacitorQ', s.capacitorQ, 'The capacitor\'s Q');
    if (coil?.q === undefined) {
      throw new DesignError('unloadedQ', coil === undefined
        ? 'Give the tank\'s unloaded Q: without the coil\'s geometry it cannot be worked out.'
        : `The ${coil.form} model gives no Q for this coil: give the tank's unloaded Q (measured or estimated).`);
    }
    unloadedQ = combineQ(coil.q, qc);
  }
  if (unloadedQ < 2) throw new DesignError('unloadedQ', `An unloaded Q of ${sayNumber(unloadedQ)} is hardly a tuned circuit: a match is worked out for tanks with a Q of 2 or more.`);
  const reactance = TWO_PI * f * inductance;
  return {
    tank: { inductance, capacitance, frequency: f, reactance, unloadedQ, dynamicResistance: unloadedQ * reactance, ...(coil ? { coil } : {}), notes },
    ...(wound ? { wound } : {}),
  };
}

/**
 * The tank a match works on: the coil wound at its resonance with the
 * capacitance, its inductance there, the unloaded Q and the dynamic
 * resistance R_D = Q_u ω0 L (module header).
 * @param spec the coil (or a bare inductance), the capacitance across it, Q figures
 * @throws DesignError naming the spec path at fault
 */
export function resolveMatchTank(spec: MatchTankSpec): MatchTank {
  return resolveTankForMatch(spec).tank;
}

// ---------------------------------------------------------------------------
// Goals and estimates

/** Checks a wanted loaded Q against the tank. */
export function checkLoadedQ(value: unknown, tank: MatchTank): number {
  const q = tankValue('loadedQ', value, 'The loaded Q');
  if (q < 0.5) throw new DesignError('loadedQ', `A loaded Q of ${sayNumber(q)} is no longer a tuned circuit: ask for 0.5 or more.`);
  if (!(q < tank.unloadedQ)) {
    throw new DesignError('loadedQ', `A loaded Q of ${sayNumber(q)} cannot be reached: the tank's own (unloaded) Q is only ${sayNumber(tank.unloadedQ)}, and connecting a source or a load can only lower it. Ask for a loaded Q below ${sayNumber(tank.unloadedQ)}, or use a better coil.`);
  }
  return q;
}

/** The figures of a match by the high-Q rules (module header). */
export interface MatchEstimate {
  /** Resistance the source is seen as across the top, ohms. */
  presentedResistance: number;
  /** Q_L = 1/(ω0 L G_T). */
  loadedQ: number;
  /** f0/Q_L, Hz. */
  bandwidth: number;
  /** Resistance the source looks into at resonance, R_s G′_s / G_rest (the rest of the tank, its own loss and the load, seen back through the step-up), ohms. */
  inputResistance: number;
  /** −10 log10(1 − Γ²) at the source, dB. */
  mismatchLoss: number;
  /** −10 log10(4 G′_s G′_load / G_T²), dB (with a load). */
  transducerLoss?: number;
}

const lossDb = (ratio: number) => Math.max(0, -10 * Math.log10(ratio));

/**
 * High-Q figures from the conductances the source (gs) and the rest (gRest,
 * other than the tank's own) present across the top; `gLoad` the load's share
 * of gRest, when there is a load.
 */
export function estimateFigures(tank: MatchTank, gs: number, gRest: number, gLoad: number | undefined, sourceResistance: number): MatchEstimate {
  const gt = 1 / tank.dynamicResistance + gs + gRest;
  const loadedQ = 1 / (tank.reactance * gt);
  const other = gt - gs;
  return {
    presentedResistance: 1 / gs,
    inputResistance: (sourceResistance * gs) / other,
    loadedQ,
    bandwidth: tank.frequency / loadedQ,
    mismatchLoss: lossDb(((4 * gs) / gt) * (other / gt)),
    ...(gLoad === undefined ? {} : { transducerLoss: lossDb(((4 * gs) / gt) * (gLoad / gt)) }),
  };
}

// ---------------------------------------------------------------------------
// Taps

/** Where a tap goes and what it gives. */
export interface TapPlacement {
  /** Turns from the cold end that present the resistance wanted exactly (real-valued). */
  tapTurns: number;
  /** The nearest half turn (at least ½, at most the whole coil): the tap to make. */
  practicalTapTurns: number;
  /** Step-up from the practical tap to the top, (L1 + L2 + 2M)/(L1 + M). */
  stepUp: number;
  /** The resistance at the tap seen across the top from the practical tap, stepUp² R, ohms. */
  presentedResistance: number;
  /** Sections at the practical tap, henries; k = M/√(L1 L2). */
  lowerInductance: number;
  upperInductance: number;
  mutualInductance: number;
  couplingCoefficient: number;
  /** (L1 L2 − M²)/L, henries: in series with the tap at resonance. */
  leakageInductance: number;
  /** The ideal-transformer guess, for comparison: the tap at N/√(R′/R) turns, and what the real sections give there. */
  turnsRatioGuess: { tapTurns: number; practicalTapTurns: number; stepUp: number; presentedResistance: number };
}

const halfTurn = (n: number, turns: number) => Math.min(turns, Math.max(0.5, Math.round(2 * n) / 2));

/** Step-up of the wound coil tapped at n turns. */
export function stepUpAt(w: WoundSolenoid, n: number): number {
  const s = sectionsAt(w, n);
  return s.upper === 0 ? 1 : s.whole / (s.lower + s.mutual);
}

/** The coil tapped at n turns: its sections as a placement (real tap given). */
function placementAt(w: WoundSolenoid, exact: number, practical: number, resistance: number, guess: TapPlacement['turnsRatioGuess']): TapPlacement {
  const s = sectionsAt(w, practical);
  const stepUp = stepUpAt(w, practical);
  return {
    tapTurns: exact,
    practicalTapTurns: practical,
    stepUp,
    presentedResistance: stepUp * stepUp * resistance,
    lowerInductance: s.lower,
    upperInductance: s.upper,
    mutualInductance: s.mutual,
    couplingCoefficient: s.upper === 0 ? 0 : s.mutual / Math.sqrt(s.lower * s.upper),
    leakageInductance: (s.lower * s.upper - s.mutual * s.mutual) / s.whole,
    turnsRatioGuess: guess,
  };
}

/** Needs the coil's geometry and at least two turns for a tap. */
export function tappable(r: TankForMatch, field: string): WoundSolenoid {
  if (!r.wound) throw new DesignError(field, 'A tap needs the coil\'s geometry: give the coil as a single-layer solenoid (not just its inductance).');
  if (r.wound.geometry.turns < 2) throw new DesignError('coil.turns', `A tapped coil needs at least two turns (this one has ${sayNumber(r.wound.geometry.turns)}).`);
  return r.wound;
}

/**
 * The tap that presents `resistance` (ohms, at the tap) as `wanted` (ohms,
 * across the top): solves (L/(L1 + M))² R = R′ for the tap n by bisection
 * (the step-up falls steadily from the cold end to the top), then the nearest
 * half turn. Needs R′ ≥ R (the caller checks).
 */
export function placeTap(w: WoundSolenoid, resistance: number, wanted: number): TapPlacement {
  const N = w.geometry.turns;
  const target = Math.sqrt(wanted / resistance);
  let lo = 0;
  let hi = N;
  for (let i = 0; i < 200 && hi - lo > 1e-13 * N; i++) {
    const mid = 0.5 * (lo + hi);
    if (stepUpAt(w, mid) > target) lo = mid;
    else hi = mid;
  }
  const exact = 0.5 * (lo + hi);
  const guessTurns = N / target;
  const guessPractical = halfTurn(guessTurns, N);
  const guessStep = stepUpAt(w, guessPractical);
  return placementAt(w, exact, halfTurn(exact, N), resistance, {
    tapTurns: guessTurns,
    practicalTapTurns: guessPractical,
    stepUp: guessStep,
    presentedResistance: guessStep * guessStep * resistance,
  });
}

/** A tap given by the technician (field names the input). */
export function givenTap(w: WoundSolenoid, field: string, tap: unknown, resistance: number): TapPlacement {
  const n = checkTap(field, tap, w.geometry.turns);
  const step = stepUpAt(w, n);
  if (!Number.isFinite(step * step * resistance)) throw new DesignError(field, 'The tap is too close to the cold end to present the resistance at all: move it up the coil.');
  return placementAt(w, n, n, resistance, { tapTurns: n, practicalTapTurns: n, stepUp: step, presentedResistance: step * step * resistance });
}

/** Notes on a placed tap: part turns, and a tap that wants to be closer to the cold end than half a turn. */
export function placementNotes(p: TapPlacement, turns: number, field: string, who: string): DesignNote[] {
  const notes = tapNotes(field, p.practicalTapTurns, turns);
  if (p.tapTurns < 0.25) {
    notes.push(note('validity', `The ${who} wants a tap ${sayNumber(p.tapTurns, 2)} turns from the cold end, closer than a tap can be made: half a turn is the nearest, which presents ${sayQuantity(p.presentedResistance, 'Ω')} instead. A link or a capacitive divider can go further.`, field));
  }
  return notes;
}

// ---------------------------------------------------------------------------
// The coil in the circuit

/**
 * The tank's coil as circuit parts, split at the given taps (turns from the
 * cold end, each with its node): runs of turns between the taps as coupled
 * windings (self-inductance of each run from the coil model, mutual from the
 * run identity, k = M/√(L_i L_j)); the coil's loss R = ω0 L/Q_u shared by the
 * runs in proportion to their turns (wire length). Without the coil's
 * geometry: one inductor with that loss. Node "0" is the cold end, `top` the
 * hot end; a tap at the whole coil is the top.
 */
export function coilParts(r: TankForMatch, taps: ReadonlyArray<{ turns: number; node: string }>, top = 'top'): { winding: Extract<MatchPart, { kind: 'windings' }> | Extract<MatchPart, { kind: 'inductor' }>; nodeOf: (turns: number) => string } {
  const { tank, wound } = r;
  const loss = tank.reactance / tank.unloadedQ;
  if (!wound) {
    return { winding: { kind: 'inductor', name: 'coil', from: top, to: '0', inductance: tank.inductance, resistance: loss }, nodeOf: () => top };
  }
  const N = wound.geometry.turns;
  const points = new Map<number, string>();
  for (const t of taps) if (t.turns > 0 && t.turns < N && !points.has(t.turns)) points.set(t.turns, t.node);
  const cuts = [0, ...[...points.keys()].sort((a, b) => a - b), N];
  const nodeOf = (x: number) => (x <= 0 ? '0' : x >= N ? top : (points.get(x) as string));
  const runs = cuts.slice(0, -1).map((a, i) => ({ a, b: cuts[i + 1] }));
  const f = (len: number) => runOf(wound, len);
  const windings = runs.map((run, i) => {
    const len = run.b - run.a;
    return { name: `coil${i + 1}`, from: nodeOf(run.a), to: nodeOf(run.b), inductance: f(len) - len * wound.skinLossPerTurn, resistance: (loss * len) / N };
  });
  const coupling = runs.map((p, i) => runs.map((q, j) => {
    if (i === j) return 1;
    const [x, y] = i < j ? [p, q] : [q, p];
    return runMutual(wound.geometry, x.a, x.b, y.a, y.b, f) / Math.sqrt(windings[i].inductance * windings[j].inductance);
  }));
  return { winding: { kind: 'windings', name: 'coil', windings, coupling }, nodeOf };
}

/** Runs a design step; a DesignError becomes the reason an option is not available. */
export function attempt<T>(fn: () => T): { ok: true; value: T } | { ok: false; reason: string; field: string } {
  try {
    return { ok: true, value: fn() };
  } catch (e) {
    if (isDesignError(e)) return { ok: false, reason: e.message, field: e.field };
    throw e;
  }
}

// ---------------------------------------------------------------------------
// One side on its own

/** One side of a match worked out on its own: the tank, the resistance to connect, the goal. */
export interface SideInput extends MatchTankSpec {
  /** The resistance to connect (a source's, or the next stage's input), ohms. */
  resistance: number;
  /** Wanted loaded Q with this side connected; omitted: match (this side sees its own resistance). */
  loadedQ?: number;
  /** A resistance already across the top of the tank (the other side, as it is seen there), ohms; omitted: none. */
  acrossResistance?: number;
}

/** The checked side: its resistance, what is across the top already, and the resistance it must be seen as there. */
export interface SideTarget {
  resistance: number;
  across?: number;
  /** Resistance this side must present across the top, ohms. */
  wanted: number;
  /** The loaded Q asked for (absent for a match). */
  loadedQ?: number;
}

/**
 * The resistance one side must present across the top (module header's
 * goals): G′ = 1/(Q_L ω0 L) − G_D − G_across for a loaded Q, or
 * G_D + G_across for a match.
 * @throws DesignError('loadedQ') when the tank (with what is across it) cannot reach the loaded Q
 */
export function sideTarget(t: MatchTank, input: SideInput): SideTarget {
  const resistance = tankValue('resistance', input.resistance, 'The resistance', 'Ω');
  const across = input.acrossResistance === undefined ? undefined : tankValue('acrossResistance', input.acrossResistance, 'The resistance across the top', 'Ω');
  const gx = across === undefined ? 0 : 1 / across;
  const gd = 1 / t.dynamicResistance;
  if (input.loadedQ === undefined) return { resistance, ...(across === undefined ? {} : { across }), wanted: 1 / (gd + gx) };
  const loadedQ = checkLoadedQ(input.loadedQ, t);
  const g = 1 / (loadedQ * t.reactance) - gd - gx;
  if (!(g > 0)) {
    const q = 1 / (t.reactance * (gd + gx));
    throw new DesignError('loadedQ', `With the ${sayQuantity(across as number, 'Ω')} already across it the tank's loaded Q is ${sayNumber(q)}, below the wanted ${sayNumber(loadedQ)}: nothing connected at a tap can raise it. Ask for a loaded Q below ${sayNumber(q)}.`);
  }
  return { resistance, ...(across === undefined ? {} : { across }), wanted: 1 / g, loadedQ };
}

/** The tank with one side connected at `node` and what is across the top, as a circuit. */
export function sideCircuit(r: TankForMatch, target: SideTarget, parts: MatchPart[], node: string): MatchCircuit {
  return {
    frequency: r.tank.frequency,
    sourceNode: node,
    sourceResistance: target.resistance,
    topNode: 'top',
    parts: [
      ...parts,
      { kind: 'capacitor', name: 'tank', from: 'top', to: '0', capacitance: r.tank.capacitance },
      ...(target.across === undefined ? [] : [{ kind: 'resistor' as const, name: 'across', from: 'top', to: '0', resistance: target.across }]),
    ],
  };
}
