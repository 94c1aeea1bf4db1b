/**
 * The tank as a circuit: what a technician gives (inductance, capacitance,
 * each part's loss as a resistance, a Q or tan δ, source and load), checked
 * and turned into one lumped circuit with every loss as a resistance, and the
 * Q figures of that circuit by the published rules.
 *
 * Model (lumped, one frequency at a time):
 * - the coil is an inductance L in series with its loss resistance R_L, with
 *   its self-capacitance C_s across both (the usual lumped coil model, valid
 *   well below the coil's self-resonance, say f < 0.5 SRF);
 * - the capacitor is a capacitance C in series with its equivalent series
 *   resistance (ESR); a capacitor Q or dissipation factor tan δ = 1/Q_C is
 *   turned into that ESR at one frequency;
 * - parallel mode: coil and capacitor in parallel, the source resistance and
 *   the load resistance both across the tank (a Norton source);
 *   series mode: source, coil, capacitor and load all in series.
 *
 * Q rules (see `qRules`): 1/Q = Σ 1/Q_i and 1/Q_L = 1/Q_u + 1/Q_e (Pozar,
 * *Microwave Engineering*), evaluated at f0 as Q = ω0 W / P (stored energy over
 * loss); with C_s given, each loss is weighed by its share of the stored
 * energy using the apparent resistance and inductance of a coil with
 * self-capacitance, R/(1 − ω²LC_s)² and L/(1 − ω²LC_s) (Terman, *Radio
 * Engineers' Handbook*, 1943).
 */
import { TWO_PI } from './constants';
import { DesignError, requireObject, requirePositive } from './errors';
import { sayNumber, sayQuantity } from './text';

/** Parallel tank (source and load across it) or series RLC (source and load in series). */
export type TankMode = 'parallel' | 'series';

/** A tank as a technician describes it. SI units: H, F, Ω, Hz. */
export interface TankInput {
  /** Coil inductance L, H. */
  inductance: number;
  /** Tank capacitance C (the capacitor, not counting the coil's self-capacitance), F. */
  capacitance: number;
  /** Coil loss as a series resistance R_L, Ω. Omit for an ideal coil. */
  coilResistance?: number;
  /** Coil Q = ωL/R_L at `frequency` (else at the natural frequency). */
  coilQ?: number;
  /** Capacitor equivalent series resistance, Ω. Omit for an ideal capacitor. */
  capacitorEsr?: number;
  /** Capacitor Q = 1/(ωC·ESR) at `frequency` (else at the natural frequency). */
  capacitorQ?: number;
  /** Capacitor dissipation factor tan δ = 1/Q_C at `frequency` (else at the natural frequency). */
  dissipationFactor?: number;
  /** Source resistance, Ω: across the tank (parallel) or in series (series mode). Omit for an ideal source. */
  sourceResistance?: number;
  /** Load resistance, Ω: across the tank (parallel) or in series (series mode). Omit for no load. */
  loadResistance?: number;
  /** Frequency at which coilQ, capacitorQ and dissipationFactor were measured, Hz. */
  frequency?: number;
  /** 'parallel' (default) or 'series'. */
  mode?: TankMode;
  /** Coil self-capacitance C_s across the coil, F. */
  coilSelfCapacitance?: number;
}

/** A validated tank with every loss as a resistance (0 = ideal part). */
export interface ResolvedTank {
  mode: TankMode;
  inductance: number;
  capacitance: number;
  coilSelfCapacitance: number;
  coilResistance: number;
  capacitorEsr: number;
  /** Ω, or undefined for an ideal source. */
  sourceResistance: number | undefined;
  /** Ω, or undefined for no load. */
  loadResistance: number | undefined;
  /** Lossless resonance f0 = 1/(2π√(L(C + C_s))), Hz. */
  naturalFrequency: number;
  /** Frequency the Q / tan δ inputs refer to, Hz (`frequency`, else f0). */
  qFrequency: number;
  /** Input names that set each loss, for error and note fields. */
  fields: { coil: string; capacitor: string };
}

/**
 * Range of every number a tank takes, in its SI unit (H, F, Ω, Hz, or a
 * plain Q or tan δ): 1e−24 to 1e24. Far wider than anything built, and narrow
 * enough that the impedance arithmetic (products of up to a few of these)
 * stays within double precision, so no result overflows to Infinity.
 */
export const TANK_VALUE_RANGE = { min: 1e-24, max: 1e24 } as const;

/** Relative disagreement allowed between two ways of giving the same loss. */
const AGREEMENT = 0.01;

/** A tank value: finite, above zero and within TANK_VALUE_RANGE. */
export function tankValue(field: string, value: unknown, what: string, unit?: string): number {
  const v = requirePositive(field, value, what, unit);
  if (v < TANK_VALUE_RANGE.min || v > TANK_VALUE_RANGE.max) {
    // Plain powers of ten for values beyond the SI prefixes (sayQuantity stops at T and f).
    const say = (x: number) => (unit ? (x >= 1e-15 && x < 1e15 ? sayQuantity(x, unit) : `${sayNumber(x)} ${unit}`) : sayNumber(x));
    throw new DesignError(field, `${what} ${say(v)} is far outside anything a tank is built from: give a value from ${say(TANK_VALUE_RANGE.min)} to ${say(TANK_VALUE_RANGE.max)}.`);
  }
  return v;
}

/** An optional tank value: undefined when omitted; zero refused with a hint. */
export function optionalTankValue(field: string, value: unknown, what: string, hint: string, unit?: string): number | undefined {
  if (value === undefined) return undefined;
  if (value === 0) throw new DesignError(field, `${what} must be greater than zero; ${hint}`);
  return tankValue(field, value, what, unit);
}

function disagree(a: number, b: number): boolean {
  return Math.abs(a - b) > AGREEMENT * Math.max(Math.abs(a), Math.abs(b));
}

/**
 * Validate a tank and express every loss as a resistance.
 *
 * Q and tan δ inputs are converted at `frequency` if given, else at the
 * natural frequency f0 = 1/(2π√(L(C + C_s))): R_L = ωL/Q_L,
 * ESR = 1/(ωC·Q_C) = tan δ/(ωC). Inputs that give the same loss twice must
 * agree within 1 %. Every given number must be finite, greater than zero and
 * within `TANK_VALUE_RANGE`; omit a field for an ideal part.
 * @param tank inputs in SI units (H, F, Ω, Hz)
 * @throws DesignError naming the input at fault
 */
export function resolveTank(tank: TankInput): ResolvedTank {
  if (tank === undefined || tank === null) {
    throw new DesignError('tank', 'Describe the tank: at least its inductance and capacitance.');
  }
  requireObject<TankInput>('tank', tank, 'The tank');
  const mode = tank.mode ?? 'parallel';
  if (mode !== 'parallel' && mode !== 'series') {
    throw new DesignError('mode', `Tank mode must be "parallel" or "series" (got ${typeof mode === 'string' ? JSON.stringify(mode) : String(mode)}).`);
  }
  const inductance = tankValue('inductance', tank.inductance, 'Inductance', 'H');
  const capacitance = tankValue('capacitance', tank.capacitance, 'Capacitance', 'F');
  const ideal = 'leave it out for an ideal part.';
  const selfC = optionalTankValue('coilSelfCapacitance', tank.coilSelfCapacitance, 'Coil self-capacitance', 'leave it out to neglect it.', 'F') ?? 0;
  const coilR = optionalTankValue('coilResistance', tank.coilResistance, 'Coil resistance', ideal, 'Ω');
  const coilQ = optionalTankValue('coilQ', tank.coilQ, 'Coil Q', ideal);
  const esr = optionalTankValue('capacitorEsr', tank.capacitorEsr, 'Capacitor ESR', ideal, 'Ω');
  const capQ = optionalTankValue('capacitorQ', tank.capacitorQ, 'Capacitor Q', ideal);
  const df = optionalTankValue('dissipationFactor', tank.dissipationFactor, 'Dissipation factor', ideal);
  const rs = optionalTankValue('sourceResistance', tank.sourceResistance, 'Source resistance', 'leave it out for an ideal source.', 'Ω');
  const rl = optionalTankValue('loadResistance', tank.loadResistance, 'Load resistance', 'leave it out for no load.', 'Ω');
  const freq = optionalTankValue('frequency', tank.frequency, 'Frequency', 'leave it out to take Q values at resonance.', 'Hz');

  // √L·√C rather than √(LC): the product of two values near the range's ends would overflow.
  const naturalFrequency = 1 / (TWO_PI * Math.sqrt(inductance) * Math.sqrt(capacitance + selfC));
  const qFrequency = freq ?? naturalFrequency;
  const wq = TWO_PI * qFrequency;

  // Coil loss.
  let coilResistance = coilR ?? 0;
  let coilField = 'coilResistance';
  if (coilQ !== undefined) {
    const fromQ = (wq * inductance) / coilQ;
    if (coilR !== undefined && disagree(coilR, fromQ)) {
      throw new DesignError('coilQ', `Coil Q ${sayNumber(coilQ, 4)} at ${sayQuantity(qFrequency, 'Hz', 4)} means a coil resistance of ${sayQuantity(fromQ, 'Ω', 4)}, but the coil resistance is given as ${sayQuantity(coilR, 'Ω', 4)}: give one of them, or make them agree.`);
    }
    if (coilR === undefined) {
      coilResistance = fromQ;
      coilField = 'coilQ';
    }
  }

  // Capacitor loss.
  let capacitorEsr = esr ?? 0;
  let capField = 'capacitorEsr';
  if (capQ !== undefined && df !== undefined && disagree(1 / capQ, df)) {
    throw new DesignError('dissipationFactor', `Dissipation factor ${sayNumber(df, 4)} means a capacitor Q of ${sayNumber(1 / df, 4)}, but the capacitor Q is given as ${sayNumber(capQ, 4)}: give one of them, or make them agree.`);
  }
  const tanDelta = df ?? (capQ !== undefined ? 1 / capQ : undefined);
  if (tanDelta !== undefined) {
    const qField = df !== undefined ? 'dissipationFactor' : 'capacitorQ';
    const fromQ = tanDelta / (wq * capacitance);
    if (esr !== undefined && disagree(esr, fromQ)) {
      const given = df !== undefined ? `Dissipation factor ${sayNumber(df, 4)}` : `Capacitor Q ${sayNumber(capQ as number, 4)}`;
      throw new DesignError(qField, `${given} at ${sayQuantity(qFrequency, 'Hz', 4)} means an ESR of ${sayQuantity(fromQ, 'Ω', 4)}, but the capacitor ESR is given as ${sayQuantity(esr, 'Ω', 4)}: give one of them, or make them agree.`);
    }
    if (esr === undefined) {
      capacitorEsr = fromQ;
      capField = qField;
    }
  }

  if (coilResistance === 0 && capacitorEsr === 0 && rs === undefined && rl === undefined) {
    throw new DesignError(
      'coilResistance',
      mode === 'parallel'
        ? 'Give the coil resistance or Q (or the capacitor loss, or a source or load resistance): with no loss at all the tank\'s impedance at resonance is infinite.'
        : 'Give the coil resistance or Q (or the capacitor loss, or a source or load resistance): with no loss at all the series circuit\'s impedance at resonance is zero.',
    );
  }

  return {
    mode,
    inductance,
    capacitance,
    coilSelfCapacitance: selfC,
    coilResistance,
    capacitorEsr,
    sourceResistance: rs,
    loadResistance: rl,
    naturalFrequency,
    qFrequency,
    fields: { coil: coilField, capacitor: capField },
  };
}

/** The Q of a resolved tank by the rules, with each loss's share. */
export interface QFigures {
  coilQ: number;
  capacitorQ: number;
  unloadedQ: number;
  externalQ: number;
  loadedQ: number;
  /** 1/Q contributions by input field, for naming the dominant loss. */
  shares: Array<[string, number]>;
}

/**
 * Q figures of a resolved tank at f0 (Q = ω0 W / P). With C_s given, the
 * capacitor's and the terminations' terms are weighted by k = C/(C + C_s) in
 * both modes (the coil's term is its own 1/Q_coil); without C_s every weight is 1.
 */
export function qFigures(t: ResolvedTank): QFigures {
  const w0 = TWO_PI * t.naturalFrequency;
  const L = t.inductance;
  const C = t.capacitance;
  const ct = C + t.coilSelfCapacitance;
  const coilQ = t.coilResistance > 0 ? (w0 * L) / t.coilResistance : Infinity;
  const capacitorQ = t.capacitorEsr > 0 ? 1 / (w0 * C * t.capacitorEsr) : Infinity;
  // Share of the stored energy in the capacitor C (rather than C_s): k = C/(C + C_s).
  const k = C / ct;
  let invSource: number;
  let invLoad: number;
  const invCoil = 1 / coilQ;
  const invCap = k / capacitorQ;
  if (t.mode === 'parallel') {
    // C_s is a lossless part of the tank capacitance: the capacitor's loss weighs in by its energy share.
    const x0 = w0 * L; // = 1/(ω0 (C + C_s))
    invSource = t.sourceResistance ? x0 / t.sourceResistance : 0;
    invLoad = t.loadResistance ? x0 / t.loadResistance : 0;
  } else {
    // Coil with C_s seen from its terminals: R/(1 − ω²LC_s)², L/(1 − ω²LC_s) (Terman 1943), with
    // 1 − ω0²LC_s = k. The loop current I flows in C and the terminations; the coil carries I/k, so
    // the stored energy is L I²/(2k²) and Q = ω0 W / P weighs every loss but the coil's by k.
    const x = 1 / (w0 * C); // = ω0 L / k, the reactance of either side at resonance
    invSource = t.sourceResistance ? (k * t.sourceResistance) / x : 0;
    invLoad = t.loadResistance ? (k * t.loadResistance) / x : 0;
  }
  const invU = invCoil + invCap;
  const invE = invSource + invLoad;
  return {
    coilQ,
    capacitorQ,
    unloadedQ: 1 / invU,
    externalQ: 1 / invE,
    loadedQ: 1 / (invU + invE),
    shares: [
      [t.fields.coil, invCoil],
      [t.fields.capacitor, invCap],
      ['sourceResistance', invSource],
      ['loadResistance', invLoad],
    ],
  };
}

/** The input whose loss lowers the Q most (optionally leaving out the terminations). */
export function dominantField(shares: Array<[string, number]>, includeTerminations: boolean): string {
  let best = shares[0][0];
  let bestVal = -1;
  for (const [field, v] of shares) {
    if (!includeTerminations && (field === 'sourceResistance' || field === 'loadResistance')) continue;
    if (v > bestVal) {
      bestVal = v;
      best = field;
    }
  }
  return best;
}

/**
 * Check that every number in a result is finite (except the names in
 * `mayBeInfinite`, documented as Infinity in their interface): a last guard so
 * that extreme but accepted inputs give a DesignError naming `field`, never a
 * silent NaN or Infinity.
 */
export function requireFiniteFigures<T extends object>(result: T, field: string, mayBeInfinite: readonly string[] = []): T {
  for (const [name, value] of Object.entries(result)) {
    if (typeof value !== 'number' || Number.isFinite(value)) continue;
    if (value === Infinity && mayBeInfinite.includes(name)) continue;
    throw new DesignError(field, `These values take the tank beyond what can be computed (its ${name} comes out as ${String(value)}): they are far outside anything that can be built. Check the values and their units.`);
  }
  return result;
}
