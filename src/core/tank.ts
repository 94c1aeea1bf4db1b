/**
 * Lossy LC tank circuits: resonance, Q, bandwidth, dynamic resistance,
 * insertion loss, voltage and current stress.
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
 * Resistances are held fixed with frequency. That is exact for the circuit
 * analysed; a real coil's loss grows about as √f (skin effect) and a real
 * capacitor's tan δ is roughly constant, so Q values given at one frequency
 * are only carried over approximately to another.
 *
 * Exact results (resonance, −3 dB bandwidth, peak impedance) come from the
 * complex impedance itself. The Q figures come from the published rules:
 * - element Q values combine as 1/Q = Σ 1/Q_i, and loaded from unloaded and
 *   external Q as 1/Q_L = 1/Q_u + 1/Q_e (Pozar, *Microwave Engineering*);
 * - the dynamic resistance of a parallel tank is R_D = Q ω L = Q / (ω C)
 *   (Terman, *Radio Engineers' Handbook*, 1943);
 * - series and parallel equivalents of a loss at one frequency,
 *   R_p = R_s (1 + Q²) with Q = X / R_s (circuit algebra, exact);
 * - apparent resistance and inductance of a coil with self-capacitance,
 *   R/(1 − ω²LC_s)² and L/(1 − ω²LC_s) (Terman 1943), used with the stored
 *   energy to weigh each loss when C_s is given;
 * - insertion loss of a single resonator between equal terminations,
 *   IL = −20 log10(1 − Q_L/Q_u) dB (common practice; derived at
 *   `insertionLoss`).
 * The exact values agree with the rules to O(1/Q²); below Q ≈ 10 the notes
 * say so.
 */
import { TWO_PI } from './constants';
import { DesignError, requirePositive } from './errors';
import { note, type DesignNote } from './notes';
import { type Complex } from './complex';

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

/** What `analyzeTank` returns. Frequencies Hz, resistances Ω, bandwidths Hz, losses dB. */
export interface TankAnalysis {
  mode: TankMode;
  /** Lossless formula 1/(2π√(L(C + C_s))), Hz. */
  naturalFrequency: number;
  /** Where the tank's own |Z| peaks (parallel) or dips (series), Hz: found from the impedance. */
  resonantFrequency: number;
  /** Where the tank's own impedance is purely resistive nearest resonance, Hz (absent when there is none). */
  zeroPhaseFrequency?: number;
  /** Where the terminated tank's |Z| peaks (parallel) or dips (series), Hz. */
  loadedResonantFrequency: number;
  /** Coil Q = ω0 L / R_L at f0 (Infinity for an ideal coil). */
  coilQ: number;
  /** Capacitor Q = 1/(ω0 C ESR) at f0 (Infinity for an ideal capacitor). */
  capacitorQ: number;
  /** 1/Q_u = Σ 1/Q_i over coil and capacitor (capacitor weighted by C/(C + C_s) when C_s is given). */
  unloadedQ: number;
  /** Q set by the source and load resistances alone (Infinity when neither is given). */
  externalQ: number;
  /** 1/Q_L = 1/Q_u + 1/Q_e (Pozar). */
  loadedQ: number;
  /** −3 dB width of the terminated tank's impedance peak (parallel) or current peak (series), Hz; exact. */
  bandwidth: number;
  /** Lower and upper −3 dB frequencies of the terminated response, Hz; exact (bandwidth = upper − lower). */
  lowerFrequency: number;
  upperFrequency: number;
  /** −3 dB width of the tank's own impedance response, Hz; exact (0 for ideal parts). */
  unloadedBandwidth: number;
  /**
   * Parallel: the tank's own peak |Z| (Terman's R_D ≈ Q ω L; Infinity when coil and capacitor are ideal).
   * Series: its |Z| minimum (≈ X/Q; 0 when ideal). Ω.
   */
  dynamicResistance: number;
  /** |Z| at the loaded resonance including source and load resistances, Ω. */
  loadedImpedance: number;
  /** Coil loss resistance used, Ω (0 = ideal coil). */
  coilResistance: number;
  /** Capacitor ESR used, Ω (0 = ideal capacitor). */
  capacitorEsr: number;
  /** −20 log10(1 − Q_L/Q_u), dB, when both source and load resistances are given. */
  insertionLoss?: number;
  /** −10 log10(P_load / P_available) at the loaded resonance, dB, when both are given (includes mismatch). */
  transducerLoss?: number;
  notes: DesignNote[];
}

/** Extra-low-voltage limit for AC, V RMS (IEC 61140 / IEC 60364; 120 V is the ripple-free DC bound). */
export const EXTRA_LOW_VOLTAGE_AC_RMS = 50;

/** Relative disagreement allowed between two ways of giving the same loss. */
const AGREEMENT = 0.01;

// ---------------------------------------------------------------------------
// Small formatting for note sentences (the core cannot import quantity/).

const PREFIXES: ReadonlyArray<readonly [number, string]> = [
  [1e9, 'G'], [1e6, 'M'], [1e3, 'k'], [1, ''], [1e-3, 'm'], [1e-6, 'µ'], [1e-9, 'n'], [1e-12, 'p'],
];

function fmt(x: number, unit: string): string {
  if (!Number.isFinite(x)) return `${x} ${unit}`;
  const a = Math.abs(x);
  for (const [scale, prefix] of PREFIXES) {
    if (a >= scale * 0.9995) return `${Number((x / scale).toPrecision(4))} ${prefix}${unit}`;
  }
  return `${x.toExponential(3)} ${unit}`;
}

function fmtNum(x: number): string {
  return String(Number(x.toPrecision(4)));
}

// ---------------------------------------------------------------------------
// Validation

function optionalPositive(field: string, value: unknown, what: string, hint: string): number | undefined {
  if (value === undefined) return undefined;
  if (typeof value !== 'number') throw new DesignError(field, `${what} is not a number.`);
  if (value === 0) throw new DesignError(field, `${what} must be greater than zero; ${hint}`);
  return requirePositive(field, value, what);
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
 * agree within 1 %. Every given number must be finite and greater than zero;
 * omit a field for an ideal part.
 * @throws DesignError naming the input at fault
 */
export function resolveTank(tank: TankInput): ResolvedTank {
  if (typeof tank !== 'object' || tank === null) {
    throw new DesignError('tank', 'Describe the tank: at least its inductance and capacitance.');
  }
  const mode = tank.mode ?? 'parallel';
  if (mode !== 'parallel' && mode !== 'series') {
    throw new DesignError('mode', `Tank mode must be "parallel" or "series" (got ${JSON.stringify(mode)}).`);
  }
  const inductance = requirePositive('inductance', tank.inductance, 'Inductance');
  const capacitance = requirePositive('capacitance', tank.capacitance, 'Capacitance');
  const ideal = 'leave it out for an ideal part.';
  const selfC = optionalPositive('coilSelfCapacitance', tank.coilSelfCapacitance, 'Coil self-capacitance', 'leave it out to neglect it.') ?? 0;
  const coilR = optionalPositive('coilResistance', tank.coilResistance, 'Coil resistance', ideal);
  const coilQ = optionalPositive('coilQ', tank.coilQ, 'Coil Q', ideal);
  const esr = optionalPositive('capacitorEsr', tank.capacitorEsr, 'Capacitor ESR', ideal);
  const capQ = optionalPositive('capacitorQ', tank.capacitorQ, 'Capacitor Q', ideal);
  const df = optionalPositive('dissipationFactor', tank.dissipationFactor, 'Dissipation factor', ideal);
  const rs = optionalPositive('sourceResistance', tank.sourceResistance, 'Source resistance', 'leave it out for an ideal source.');
  const rl = optionalPositive('loadResistance', tank.loadResistance, 'Load resistance', 'leave it out for no load.');
  const freq = optionalPositive('frequency', tank.frequency, 'Frequency', 'leave it out to take Q values at resonance.');

  const naturalFrequency = 1 / (TWO_PI * Math.sqrt(inductance * (capacitance + selfC)));
  const qFrequency = freq ?? naturalFrequency;
  const wq = TWO_PI * qFrequency;

  // Coil loss.
  let coilResistance = coilR ?? 0;
  let coilField = 'coilResistance';
  if (coilQ !== undefined) {
    const fromQ = (wq * inductance) / coilQ;
    if (coilR !== undefined && disagree(coilR, fromQ)) {
      throw new DesignError('coilQ', `Coil Q ${fmtNum(coilQ)} at ${fmt(qFrequency, 'Hz')} means a coil resistance of ${fmt(fromQ, 'Ω')}, but the coil resistance is given as ${fmt(coilR, 'Ω')}: give one of them, or make them agree.`);
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
    throw new DesignError('dissipationFactor', `Dissipation factor ${fmtNum(df)} means a capacitor Q of ${fmtNum(1 / df)}, but the capacitor Q is given as ${fmtNum(capQ)}: give one of them, or make them agree.`);
  }
  const tanDelta = df ?? (capQ !== undefined ? 1 / capQ : undefined);
  if (tanDelta !== undefined) {
    const qField = df !== undefined ? 'dissipationFactor' : 'capacitorQ';
    const fromQ = tanDelta / (wq * capacitance);
    if (esr !== undefined && disagree(esr, fromQ)) {
      const given = df !== undefined ? `Dissipation factor ${fmtNum(df)}` : `Capacitor Q ${fmtNum(capQ as number)}`;
      throw new DesignError(qField, `${given} at ${fmt(qFrequency, 'Hz')} means an ESR of ${fmt(fromQ, 'Ω')}, but the capacitor ESR is given as ${fmt(esr, 'Ω')}: give one of them, or make them agree.`);
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

// ---------------------------------------------------------------------------
// Numerical kernel: no allocation per call.

interface Kernel {
  series: boolean;
  L: number;
  C: number;
  Cs: number;
  RL: number;
  Rc: number;
  /** Parallel: conductance of source and load across the tank, S. */
  gExt: number;
  /** Series: source plus load resistance, Ω. */
  rExt: number;
  /** Upper bound of the search in ln ω (series mode stops below the coil's self-resonance). */
  uMax: number;
}

function kernelOf(t: ResolvedTank): Kernel {
  const gExt = (t.sourceResistance ? 1 / t.sourceResistance : 0) + (t.loadResistance ? 1 / t.loadResistance : 0);
  const rExt = (t.sourceResistance ?? 0) + (t.loadResistance ?? 0);
  const series = t.mode === 'series';
  const uMax = series && t.coilSelfCapacitance > 0
    ? Math.log(1 / Math.sqrt(t.inductance * t.coilSelfCapacitance)) - 1e-9
    : Infinity;
  return {
    series, L: t.inductance, C: t.capacitance, Cs: t.coilSelfCapacitance,
    RL: t.coilResistance, Rc: t.capacitorEsr, gExt, rExt, uMax,
  };
}

/** Scratch output of `evaluate`: [Re Z tank, Im Z tank, loaded objective, unloaded objective]. */
const scratch = new Float64Array(4);

/**
 * Evaluate the network at angular frequency w. Writes into `out`:
 * out[0], out[1] = Re, Im of the tank's own impedance;
 * out[2] = objective of the terminated network, out[3] = of the tank alone;
 * the objective is |Y|² (parallel) or |Z|² (series), minimal at resonance.
 */
function evaluate(k: Kernel, w: number, out: Float64Array): void {
  const wl = w * k.L;
  const d1 = k.RL * k.RL + wl * wl;
  const g1 = k.RL / d1; // coil branch admittance
  const b1 = -wl / d1;
  if (!k.series) {
    const a = w * k.C * k.Rc;
    const e = 1 + a * a;
    const g = g1 + (k.Rc * w * k.C * w * k.C) / e;
    const b = b1 + (w * k.C) / e + w * k.Cs;
    const m = g * g + b * b;
    out[0] = g / m;
    out[1] = -b / m;
    const gl = g + k.gExt;
    out[2] = gl * gl + b * b;
    out[3] = m;
    return;
  }
  let zr: number;
  let zi: number;
  if (k.Cs > 0) {
    const bb = b1 + w * k.Cs;
    const m = g1 * g1 + bb * bb;
    zr = g1 / m;
    zi = -bb / m;
  } else {
    zr = k.RL;
    zi = wl;
  }
  zr += k.Rc;
  zi -= 1 / (w * k.C);
  out[0] = zr;
  out[1] = zi;
  const zl = zr + k.rExt;
  out[2] = zl * zl + zi * zi;
  out[3] = zr * zr + zi * zi;
}

function objective(k: Kernel, u: number, loaded: boolean): number {
  evaluate(k, Math.exp(u), scratch);
  return loaded ? scratch[2] : scratch[3];
}

const GRID = 96;
const SPAN = Math.log(8);
const GOLD = (Math.sqrt(5) - 1) / 2;

/**
 * Find the resonance (minimum of the objective) in ln ω near ln ω0.
 * Returns [u, objective] or [NaN, NaN] when the minimum sits at the search edge.
 */
function findExtremum(k: Kernel, u0: number, loaded: boolean): [number, number] {
  const lo = u0 - SPAN;
  const hi = Math.min(u0 + SPAN, k.uMax);
  const step = (hi - lo) / (GRID - 1);
  let best = 0;
  let bestVal = Infinity;
  for (let i = 0; i < GRID; i++) {
    const v = objective(k, lo + i * step, loaded);
    if (v < bestVal) {
      bestVal = v;
      best = i;
    }
  }
  if (best === 0 || best === GRID - 1) return [NaN, NaN];
  let a = lo + (best - 1) * step;
  let b = lo + (best + 1) * step;
  let c = b - GOLD * (b - a);
  let d = a + GOLD * (b - a);
  let fc = objective(k, c, loaded);
  let fd = objective(k, d, loaded);
  for (let i = 0; i < 200 && b - a > 1e-15 * Math.max(1, Math.abs(b)); i++) {
    if (fc < fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - GOLD * (b - a);
      fc = objective(k, c, loaded);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + GOLD * (b - a);
      fd = objective(k, d, loaded);
    }
  }
  const u = (a + b) / 2;
  return [u, objective(k, u, loaded)];
}

/**
 * Find where the objective reaches `target` (twice its minimum: the −3 dB
 * point) going from the resonance uPeak in direction dir (−1 below, +1 above).
 * Returns ln ω of the edge, or NaN when the response never falls that far.
 */
function findEdge(k: Kernel, uPeak: number, target: number, dir: -1 | 1, qEstimate: number, loaded: boolean): number {
  const limit = dir > 0 ? Math.min(uPeak + Math.log(1e4), k.uMax) : uPeak - Math.log(1e4);
  let s = Math.min(0.25 / Math.max(qEstimate, 1e-3), 0.5);
  let inner = uPeak;
  let outer = uPeak + dir * s;
  for (;;) {
    if (dir > 0 ? outer >= limit : outer <= limit) outer = limit;
    if (objective(k, outer, loaded) >= target) break;
    if (outer === limit) return NaN;
    inner = outer;
    s *= 2;
    outer = uPeak + dir * s;
  }
  for (let i = 0; i < 200 && Math.abs(outer - inner) > 4e-16 * Math.abs(outer); i++) {
    const mid = (inner + outer) / 2;
    if (objective(k, mid, loaded) >= target) outer = mid;
    else inner = mid;
  }
  return (inner + outer) / 2;
}

/** Where Im Z of the tank alone changes sign nearest resonance, ln ω; NaN if nowhere near. */
function findZeroPhase(k: Kernel, uPeak: number, qEstimate: number): number {
  evaluate(k, Math.exp(uPeak), scratch);
  const sign0 = Math.sign(scratch[1]);
  if (sign0 === 0) return uPeak;
  let s = Math.min(0.05 / Math.max(qEstimate, 1e-3), 0.05);
  let inner = 0;
  for (let n = 0; n < 60 && s < Math.log(1e3); n++, s *= 2) {
    for (const dir of [-1, 1]) {
      const u = uPeak + dir * s;
      if (u >= k.uMax) continue;
      evaluate(k, Math.exp(u), scratch);
      if (Math.sign(scratch[1]) !== sign0) {
        let a = uPeak + dir * inner;
        let b = u;
        for (let i = 0; i < 200 && Math.abs(b - a) > 4e-16 * Math.abs(b); i++) {
          const mid = (a + b) / 2;
          evaluate(k, Math.exp(mid), scratch);
          if (Math.sign(scratch[1]) === sign0) a = mid;
          else b = mid;
        }
        return (a + b) / 2;
      }
    }
    inner = s;
  }
  return NaN;
}

// ---------------------------------------------------------------------------
// Q rules

/**
 * Combine the Q values of the parts of one resonator: 1/Q = Σ 1/Q_i
 * (Pozar, *Microwave Engineering*). Infinity stands for a lossless part.
 * @param qs Q of each part (> 0, dimensionless)
 * @returns the resonator's Q (Infinity when every part is lossless)
 */
export function combineQ(...qs: number[]): number {
  if (qs.length === 0) throw new DesignError('q', 'Give at least one Q value to combine.');
  let inv = 0;
  for (const q of qs) {
    if (typeof q !== 'number' || Number.isNaN(q) || q <= 0) {
      throw new DesignError('q', `Every Q must be greater than zero (got ${q}); use Infinity for a lossless part.`);
    }
    inv += 1 / q;
  }
  return 1 / inv;
}

/**
 * Loaded Q from unloaded and external Q: 1/Q_L = 1/Q_u + 1/Q_e
 * (Pozar, *Microwave Engineering*).
 * @param unloadedQ Q_u of the resonator alone (> 0; Infinity for lossless)
 * @param externalQ Q_e set by the terminations alone (> 0; Infinity for none)
 */
export function combineLoadedQ(unloadedQ: number, externalQ: number): number {
  if (typeof unloadedQ !== 'number' || Number.isNaN(unloadedQ) || unloadedQ <= 0) {
    throw new DesignError('unloadedQ', `Unloaded Q must be greater than zero (got ${unloadedQ}).`);
  }
  if (typeof externalQ !== 'number' || Number.isNaN(externalQ) || externalQ <= 0) {
    throw new DesignError('externalQ', `External Q must be greater than zero (got ${externalQ}).`);
  }
  return 1 / (1 / unloadedQ + 1 / externalQ);
}

/**
 * Insertion loss of a single resonator between equal source and load
 * resistances: IL = −20 log10(1 − Q_L/Q_u) dB. Common practice, no single
 * published source named here. Derivation (parallel tank R_D between
 * terminations R, Q_u = R_D/X, Q_L = (R_D ∥ R/2)/X): the voltage gain at
 * resonance relative to a lossless resonator is R_D/(R_D + R/2) = 1 − Q_L/Q_u.
 * Valid near resonance for Q_L ≳ 5; unequal terminations add mismatch loss.
 * @param unloadedQ Q_u (> 0)
 * @param loadedQ Q_L (0 < Q_L < Q_u)
 * @returns loss in dB (≥ 0)
 */
export function insertionLoss(unloadedQ: number, loadedQ: number): number {
  if (typeof unloadedQ !== 'number' || Number.isNaN(unloadedQ) || unloadedQ <= 0) {
    throw new DesignError('unloadedQ', `Unloaded Q must be greater than zero (got ${unloadedQ}); use Infinity for a lossless resonator.`);
  }
  requirePositive('loadedQ', loadedQ, 'Loaded Q');
  if (!(loadedQ < unloadedQ)) {
    throw new DesignError('loadedQ', `Loaded Q ${fmtNum(loadedQ)} must be below the unloaded Q ${fmtNum(unloadedQ)}: loading a tank can only lower its Q.`);
  }
  return -20 * Math.log10(1 - loadedQ / unloadedQ) + 0; // + 0 turns −0 into 0
}

/**
 * Parallel equivalent of a series loss at one frequency:
 * R_p = R_s (1 + Q²), Q = X/R_s (exact circuit algebra: R_s + jX ≡ R_p ∥ jX_p
 * with X_p = X (1 + 1/Q²)).
 * @param seriesResistance R_s in ohms (> 0)
 * @param reactance |X| of the part in series with it, ohms (> 0)
 * @returns R_p in ohms
 */
export function seriesToParallelResistance(seriesResistance: number, reactance: number): number {
  requirePositive('seriesResistance', seriesResistance, 'Series resistance');
  requirePositive('reactance', reactance, 'Reactance');
  const q = reactance / seriesResistance;
  return seriesResistance * (1 + q * q);
}

/**
 * Series equivalent of a parallel loss at one frequency:
 * R_s = R_p / (1 + Q²), Q = R_p/X (exact circuit algebra).
 * @param parallelResistance R_p in ohms (> 0)
 * @param reactance |X| of the part it shunts, ohms (> 0)
 * @returns R_s in ohms
 */
export function parallelToSeriesResistance(parallelResistance: number, reactance: number): number {
  requirePositive('parallelResistance', parallelResistance, 'Parallel resistance');
  requirePositive('reactance', reactance, 'Reactance');
  const q = parallelResistance / reactance;
  return parallelResistance / (1 + q * q);
}

interface QFigures {
  coilQ: number;
  capacitorQ: number;
  unloadedQ: number;
  externalQ: number;
  loadedQ: number;
  /** 1/Q contributions by input field, for naming the dominant loss. */
  shares: Array<[string, number]>;
}

function qFigures(t: ResolvedTank): QFigures {
  const w0 = TWO_PI * t.naturalFrequency;
  const L = t.inductance;
  const C = t.capacitance;
  const ct = C + t.coilSelfCapacitance;
  const coilQ = t.coilResistance > 0 ? (w0 * L) / t.coilResistance : Infinity;
  const capacitorQ = t.capacitorEsr > 0 ? 1 / (w0 * C * t.capacitorEsr) : Infinity;
  // Share of the stored energy in the capacitor C (rather than C_s): k = C/(C + C_s).
  const k = C / ct;
  let invCoil: number;
  let invCap: number;
  let invSource: number;
  let invLoad: number;
  if (t.mode === 'parallel') {
    // C_s is a lossless part of the tank capacitance: the capacitor's loss weighs in by its energy share.
    invCoil = 1 / coilQ;
    invCap = k / capacitorQ;
    const x0 = w0 * L; // = 1/(ω0 (C + C_s))
    invSource = t.sourceResistance ? x0 / t.sourceResistance : 0;
    invLoad = t.loadResistance ? x0 / t.loadResistance : 0;
  } else {
    // Coil with C_s seen from its terminals: R/(1 − ω²LC_s)², L/(1 − ω²LC_s) (Terman 1943), with
    // 1 − ω0²LC_s = k. The loop current I flows in C and the terminations; the coil carries I/k, so
    // the stored energy is L I²/(2k²) and Q = ω0 W / P weighs every loss but the coil's by k.
    const x = 1 / (w0 * C); // = ω0 L / k, the reactance of either side at resonance
    invCoil = 1 / coilQ;
    invCap = k / capacitorQ;
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

function dominantField(shares: Array<[string, number]>, includeTerminations: boolean): string {
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

function noResonance(field: string, q: number, what: string): DesignError {
  return new DesignError(field, `The ${what} loss is so high (Q about ${fmtNum(q)}) that the tank hardly resonates: its response has no clear peak 3 dB above its sides. Reduce the loss.`);
}

interface Resonance {
  u: number;
  value: number;
  lower: number;
  upper: number;
}

function resonance(k: Kernel, u0: number, loaded: boolean, q: number, field: string, what: string): Resonance {
  const [u, value] = findExtremum(k, u0, loaded);
  if (!Number.isFinite(u)) throw noResonance(field, q, what);
  const lower = findEdge(k, u, 2 * value, -1, q, loaded);
  const upper = findEdge(k, u, 2 * value, 1, q, loaded);
  if (!Number.isFinite(lower) || !Number.isFinite(upper)) throw noResonance(field, q, what);
  return { u, value, lower, upper };
}

// ---------------------------------------------------------------------------
// Public analysis

/**
 * Analyse a lossy tank (see the module header for the model).
 *
 * - `resonantFrequency`: where the tank's own |Z| peaks (parallel) or dips
 *   (series), found from the impedance. For a coil with series resistance
 *   across an ideal capacitor the zero-phase frequency is f0 √(1 − 1/Q²) and
 *   the |Z| peak is at f0 √(√(1 + 2/Q²) − 1/Q²), much closer to f0; both
 *   differ from 1/(2π√(LC)) only as 1/Q² or 1/Q⁴.
 * - Q values: 1/Q_u = 1/Q_coil + 1/Q_cap, 1/Q_L = 1/Q_u + 1/Q_e (Pozar),
 *   evaluated at f0 as Q = ω0 W / P (stored energy over loss). With C_s
 *   given, the capacitor's and the terminations' terms are weighted by
 *   k = C/(C + C_s) in both modes (the coil's term is its own 1/Q_coil);
 *   without C_s every weight is 1.
 * - `bandwidth`: exact −3 dB width of the terminated response (≈ f/Q_L).
 * - `dynamicResistance`: parallel, the tank's peak |Z| (≈ Q_u ω L, Terman 1943);
 *   series, its |Z| at resonance (the minimum, ≈ X/Q_u).
 * - `insertionLoss`: −20 log10(1 − Q_L/Q_u) when both terminations are given.
 * Valid while the lumped model holds (f0 well below the coil's self-resonance)
 * and for Q above about 1 (below that there is no clear resonance).
 * @param tank inputs in SI units (H, F, Ω, Hz)
 * @throws DesignError naming the input at fault
 */
export function analyzeTank(tank: TankInput): TankAnalysis {
  const t = resolveTank(tank);
  const k = kernelOf(t);
  const q = qFigures(t);
  const notes: DesignNote[] = [];
  const f0 = t.naturalFrequency;
  const u0 = Math.log(TWO_PI * f0);
  const toHz = (u: number) => Math.exp(u) / TWO_PI;
  const hasTerminations = t.sourceResistance !== undefined || t.loadResistance !== undefined;
  const lossyParts = t.coilResistance > 0 || t.capacitorEsr > 0;

  // The tank alone.
  let resonantFrequency = f0;
  let zeroPhaseFrequency: number | undefined = f0;
  let dynamicResistance = t.mode === 'parallel' ? Infinity : 0;
  let unloadedBandwidth = 0;
  let unloaded: Resonance | undefined;
  if (lossyParts) {
    unloaded = resonance(k, u0, false, q.unloadedQ, dominantField(q.shares, false), 'coil and capacitor');
    resonantFrequency = toHz(unloaded.u);
    unloadedBandwidth = toHz(unloaded.upper) - toHz(unloaded.lower);
    evaluate(k, Math.exp(unloaded.u), scratch);
    dynamicResistance = Math.hypot(scratch[0], scratch[1]);
    const uz = findZeroPhase(k, unloaded.u, q.unloadedQ);
    zeroPhaseFrequency = Number.isFinite(uz) ? toHz(uz) : undefined;
  } else {
    notes.push(note('info', 'Coil and capacitor are ideal (no loss given): the Q comes from the source and load resistances alone.'));
  }

  // With source and load.
  let loaded = unloaded;
  if (hasTerminations || !unloaded) {
    loaded = resonance(k, u0, true, q.loadedQ, dominantField(q.shares, true), 'total');
  }
  const lr = loaded as Resonance;
  const loadedResonantFrequency = toHz(lr.u);
  const lowerFrequency = toHz(lr.lower);
  const upperFrequency = toHz(lr.upper);
  const bandwidth = upperFrequency - lowerFrequency;
  const loadedImpedance = t.mode === 'parallel' ? 1 / Math.sqrt(lr.value) : Math.sqrt(lr.value);

  // Insertion and transducer loss.
  let insertionLossDb: number | undefined;
  let transducerLossDb: number | undefined;
  if (t.sourceResistance !== undefined && t.loadResistance !== undefined) {
    insertionLossDb = insertionLoss(q.unloadedQ, q.loadedQ);
    const rs = t.sourceResistance;
    const rl = t.loadResistance;
    evaluate(k, Math.exp(lr.u), scratch);
    let gain: number;
    if (t.mode === 'parallel') {
      // V_out / V_s = Z_p / (R_s + Z_p) with Z_p = Z_tank ∥ R_load; G_T = 4 R_s |V_out|² / (R_load |V_s|²).
      const gr = scratch[0] / (scratch[0] * scratch[0] + scratch[1] * scratch[1]) + 1 / rl;
      const gi = -scratch[1] / (scratch[0] * scratch[0] + scratch[1] * scratch[1]);
      // Z_p = 1/(gr + j gi); V_out/V_s = 1 / (1 + R_s (gr + j gi)).
      const dr = 1 + rs * gr;
      const di = rs * gi;
      gain = (4 * rs) / rl / (dr * dr + di * di);
    } else {
      const zr = scratch[0] + rs + rl;
      const zi = scratch[1];
      gain = (4 * rs * rl) / (zr * zr + zi * zi);
    }
    transducerLossDb = -10 * Math.log10(gain);
    if (disagree(rs, rl)) {
      notes.push(note('info', `The insertion loss −20 log10(1 − Q_L/Q_u) = ${fmtNum(insertionLossDb)} dB assumes equal source and load resistances; with ${fmt(rs, 'Ω')} and ${fmt(rl, 'Ω')} the transducer loss (${fmtNum(transducerLossDb)} dB) includes the mismatch loss as well.`));
    }
  }

  // Notes on the frequency and on the validity of the rules.
  const shift = (resonantFrequency - f0) / f0;
  if (lossyParts && Math.abs(shift) > 1e-4) {
    const zp = zeroPhaseFrequency !== undefined
      ? `the impedance is purely resistive at ${fmt(zeroPhaseFrequency, 'Hz')}`
      : 'the impedance is never purely resistive near resonance';
    notes.push(note('info', `With losses this high the tank's |Z| ${t.mode === 'parallel' ? 'peaks' : 'dips'} at ${fmt(resonantFrequency, 'Hz')}, ${fmtNum(Math.abs(shift) * 100)} % ${shift < 0 ? 'below' : 'above'} the lossless 1/(2π√(LC)) = ${fmt(f0, 'Hz')}, and ${zp}. For a coil with series resistance the zero-phase frequency is f0·√(1 − 1/Q²) and the |Z| peak is at f0·√(√(1 + 2/Q²) − 1/Q²), closer to f0.`));
  }
  if (q.loadedQ < 10) {
    notes.push(note('validity', `Loaded Q is ${fmtNum(q.loadedQ)}, below 10: the rules bandwidth ≈ f/Q and R_D ≈ QωL are only approximate here; the bandwidth, resonance and impedance shown are computed from the impedance itself.`));
  }
  if (t.coilSelfCapacitance > 0) {
    const srf = 1 / (TWO_PI * Math.sqrt(t.inductance * t.coilSelfCapacitance));
    if (f0 > 0.5 * srf) {
      notes.push(note('validity', `The tank resonates at ${fmt(f0, 'Hz')}, more than half the coil's self-resonant frequency (${fmt(srf, 'Hz')}): the lumped coil model (inductance with its self-capacitance across it) is unreliable here.`, 'coilSelfCapacitance'));
    }
  }
  const qGiven = tank.coilQ !== undefined || tank.capacitorQ !== undefined || tank.dissipationFactor !== undefined;
  if (qGiven && tank.frequency !== undefined && Math.abs(Math.log(tank.frequency / f0)) > Math.log(1.1)) {
    notes.push(note('validity', `Q values were given at ${fmt(tank.frequency, 'Hz')} but the tank resonates near ${fmt(f0, 'Hz')}: they were carried over as fixed resistances, while a real coil's loss grows about as √f and a capacitor's tan δ stays roughly constant. Give the Q values at resonance for a better figure.`, 'frequency'));
  }

  const result: TankAnalysis = {
    mode: t.mode,
    naturalFrequency: f0,
    resonantFrequency,
    loadedResonantFrequency,
    coilQ: q.coilQ,
    capacitorQ: q.capacitorQ,
    unloadedQ: q.unloadedQ,
    externalQ: q.externalQ,
    loadedQ: q.loadedQ,
    bandwidth,
    lowerFrequency,
    upperFrequency,
    unloadedBandwidth,
    dynamicResistance,
    loadedImpedance,
    coilResistance: t.coilResistance,
    capacitorEsr: t.capacitorEsr,
    notes,
  };
  if (zeroPhaseFrequency !== undefined) result.zeroPhaseFrequency = zeroPhaseFrequency;
  if (insertionLossDb !== undefined) result.insertionLoss = insertionLossDb;
  if (transducerLossDb !== undefined) result.transducerLoss = transducerLossDb;
  return result;
}

/**
 * Complex impedance of the tank at one frequency.
 * Parallel: (R_L + jωL) ∥ 1/(jωC_s) ∥ (ESR + 1/(jωC)); series:
 * [(R_L + jωL) ∥ 1/(jωC_s)] + ESR + 1/(jωC). With `loaded`, the source and
 * load resistances are included (across the tank, or in series).
 * @param tank inputs in SI units
 * @param frequency f in hertz (> 0)
 * @returns Z in ohms
 */
export function tankImpedance(tank: TankInput, frequency: number, options: { loaded?: boolean } = {}): Complex {
  requirePositive('frequency', frequency, 'Frequency');
  const k = kernelOf(resolveTank(tank));
  evaluate(k, TWO_PI * frequency, scratch);
  if (!options.loaded) return { re: scratch[0], im: scratch[1] };
  if (k.series) return { re: scratch[0] + k.rExt, im: scratch[1] };
  const m = scratch[0] * scratch[0] + scratch[1] * scratch[1];
  const g = scratch[0] / m + k.gExt;
  const b = -scratch[1] / m;
  const n = g * g + b * b;
  return { re: g / n, im: -b / n };
}

/** Frequency points of a sweep. */
export interface SweepOptions {
  /** First frequency, Hz (> 0). */
  start: number;
  /** Last frequency, Hz (> start). */
  stop: number;
  /** Number of points (integer ≥ 2). */
  points: number;
  /** 'log' (default) or 'linear' spacing. */
  spacing?: 'log' | 'linear';
}

/** What `sweepTank` returns: one entry per frequency point. */
export interface TankSweep {
  /** Hz. */
  frequency: Float64Array;
  /** |Z| of the tank alone, Ω. */
  magnitude: Float64Array;
  /** Phase of Z of the tank alone, degrees. */
  phase: Float64Array;
  /**
   * Terminated response, dB relative to its peak (≤ 0): parallel, the tank
   * voltage from a source through its resistance; series, the loop current.
   */
  response: Float64Array;
  /** Frequency of the terminated response's peak, Hz. */
  peakFrequency: number;
}

/** Validate sweep options; returns the point count. */
function checkSweep(options: SweepOptions): number {
  if (typeof options !== 'object' || options === null) throw new DesignError('sweep', 'Give the sweep start, stop and number of points.');
  const start = requirePositive('start', options.start, 'Sweep start');
  const stop = requirePositive('stop', options.stop, 'Sweep stop');
  if (!(stop > start)) throw new DesignError('stop', `Sweep stop ${fmt(stop, 'Hz')} must be above the start ${fmt(start, 'Hz')}.`);
  const n = options.points;
  if (typeof n !== 'number' || !Number.isInteger(n) || n < 2 || n > 1_000_000) {
    throw new DesignError('points', `Number of sweep points must be a whole number from 2 to 1,000,000 (got ${n}).`);
  }
  const spacing = options.spacing ?? 'log';
  if (spacing !== 'log' && spacing !== 'linear') {
    throw new DesignError('spacing', `Sweep spacing must be "log" or "linear" (got ${JSON.stringify(spacing)}).`);
  }
  return n;
}

/**
 * Sweep the tank: |Z| and phase of the tank alone, and the terminated
 * response in dB normalised to its (exact) peak. No allocation per point; pass
 * `into` (a previous result of the same length) to reuse its arrays.
 * @param tank inputs in SI units
 * @param options start and stop in Hz, points, spacing
 */
export function sweepTank(tank: TankInput, options: SweepOptions, into?: TankSweep): TankSweep {
  const t = resolveTank(tank);
  const n = checkSweep(options);
  const k = kernelOf(t);
  const q = qFigures(t);
  const [uPeak, minObj] = findExtremum(k, Math.log(TWO_PI * t.naturalFrequency), true);
  if (!Number.isFinite(uPeak)) throw noResonance(dominantField(q.shares, true), q.loadedQ, 'total');
  const out: TankSweep = into && into.frequency.length === n
    ? into
    : { frequency: new Float64Array(n), magnitude: new Float64Array(n), phase: new Float64Array(n), response: new Float64Array(n), peakFrequency: 0 };
  const { frequency, magnitude, phase, response } = out;
  const log = (options.spacing ?? 'log') === 'log';
  const a = log ? Math.log(options.start) : options.start;
  const step = ((log ? Math.log(options.stop) : options.stop) - a) / (n - 1);
  const deg = 180 / Math.PI;
  const s = scratch;
  for (let i = 0; i < n; i++) {
    const x = a + i * step;
    const f = log ? Math.exp(x) : x;
    evaluate(k, TWO_PI * f, s);
    frequency[i] = f;
    magnitude[i] = Math.sqrt(s[0] * s[0] + s[1] * s[1]);
    phase[i] = Math.atan2(s[1], s[0]) * deg;
    response[i] = 10 * Math.log10(minObj / s[2]);
  }
  out.peakFrequency = Math.exp(uPeak) / TWO_PI;
  return out;
}

// ---------------------------------------------------------------------------
// Voltage and current stress

/** Inputs of `tankStress`: a tank plus the drive and the parts' ratings. */
export interface TankStressInput extends TankInput {
  /**
   * RF power delivered into the tank and its load at resonance, W (not the
   * source's internal loss). Give this or `driveVoltage`.
   */
  drivePower?: number;
  /**
   * RMS voltage at resonance, V: across the tank (parallel) or across the
   * series circuit of tank and load (series mode).
   */
  driveVoltage?: number;
  /** Capacitor voltage rating, V peak (compare a DC working voltage with the RF peak; derate for RF as the maker says). */
  capacitorVoltageRating?: number;
  /** Current the coil's wire can carry, A RMS at this frequency. */
  wireCurrentRating?: number;
}

/** What `tankStress` returns (RMS unless the name says peak). */
export interface TankStress {
  /** Loaded resonance where the stress is evaluated, Hz. */
  frequency: number;
  /** Power into tank and load, W. */
  power: number;
  /** Drive voltage, V RMS (across the tank, or across the series circuit). */
  driveVoltage: number;
  /** Current from the drive into tank and load, A RMS. */
  lineCurrent: number;
  /** Voltage across the capacitance itself, V RMS. */
  capacitorVoltage: number;
  /** √2 × capacitorVoltage, V. */
  capacitorVoltagePeak: number;
  /** Current through the capacitor, A RMS. */
  capacitorCurrent: number;
  /** Voltage across the coil's terminals, V RMS. */
  coilVoltage: number;
  /** Current in the coil's wire: the circulating current, A RMS (≈ Q_L × line current in a parallel tank). */
  circulatingCurrent: number;
  notes: DesignNote[];
}

/**
 * Voltages and currents in a driven tank at its loaded resonance, with
 * cautions. Parallel: V across the tank, I_C = V/|ESR + 1/(jωC)|,
 * I_L = V/|R_L + jωL| ≈ Q_L × I_line (I_line the current into tank and
 * load). Series: I = V/|Z + R_load|, V_C = I/(ωC) ≈ Q × V.
 * Cautions: capacitor peak voltage above `capacitorVoltageRating`; coil
 * current above `wireCurrentRating`; any tank voltage above 50 V AC RMS, the
 * extra-low-voltage limit of IEC 61140 / IEC 60364 (120 V ripple-free DC).
 * That limit is a mains-frequency touch criterion: RF burns happen at lower
 * voltages, and dielectric breakdown and arcing are separate hazards. The
 * notes defer to local codes and licensed practice; workbenches link each
 * caution to the Cautions page.
 * @param input tank (SI) plus drivePower (W) or driveVoltage (V RMS), ratings (V peak, A RMS)
 * @throws DesignError naming the input at fault
 */
export function tankStress(input: TankStressInput): TankStress {
  const t = resolveTank(input);
  const power = optionalPositive('drivePower', input.drivePower, 'Drive power', 'give the RF power into the tank.');
  const volts = optionalPositive('driveVoltage', input.driveVoltage, 'Drive voltage', 'give the RMS voltage across the tank.');
  const vRating = optionalPositive('capacitorVoltageRating', input.capacitorVoltageRating, 'Capacitor voltage rating', 'leave it out if unknown.');
  const iRating = optionalPositive('wireCurrentRating', input.wireCurrentRating, 'Wire current rating', 'leave it out if unknown.');
  if (power === undefined && volts === undefined) {
    throw new DesignError('drivePower', 'Give the drive: the RF power into the tank, or the RMS voltage across it.');
  }
  if (power !== undefined && volts !== undefined) {
    throw new DesignError('driveVoltage', 'Give either the drive power or the drive voltage, not both.');
  }
  const a = analyzeTank(input);
  const f = a.loadedResonantFrequency;
  const w = TWO_PI * f;
  const k = kernelOf(t);
  evaluate(k, w, scratch);
  const zr = scratch[0];
  const zi = scratch[1];
  const zCap = Math.hypot(t.capacitorEsr, 1 / (w * t.capacitance));
  const zCoil = Math.hypot(t.coilResistance, w * t.inductance);
  let drive: number;
  let line: number;
  let delivered: number;
  let vCap: number;
  let iCap: number;
  let vCoil: number;
  if (t.mode === 'parallel') {
    // Admittance of tank plus load (the source resistance belongs to the source).
    const m = zr * zr + zi * zi;
    const g = zr / m + (t.loadResistance ? 1 / t.loadResistance : 0);
    const b = -zi / m;
    if (power !== undefined && !(g > 0)) {
      throw new DesignError('drivePower', 'Nothing in this tank dissipates power (ideal parts, no load): give the drive voltage instead.');
    }
    drive = volts ?? Math.sqrt((power as number) / g);
    delivered = power ?? drive * drive * g;
    line = drive * Math.hypot(g, b);
    iCap = drive / zCap;
    vCap = iCap / (w * t.capacitance);
    vCoil = drive;
  } else {
    const rr = zr + (t.loadResistance ?? 0);
    const zAbs = Math.hypot(rr, zi);
    if (power !== undefined && !(rr > 0)) {
      throw new DesignError('drivePower', 'Nothing in this circuit dissipates power (ideal parts, no load): give the drive voltage instead.');
    }
    line = volts !== undefined ? volts / zAbs : Math.sqrt((power as number) / rr);
    drive = volts ?? line * zAbs;
    delivered = power ?? line * line * rr;
    iCap = line;
    vCap = line / (w * t.capacitance);
    // Voltage across the coil with its self-capacitance: I × |Z_coil ∥ C_s|.
    const wl = w * t.inductance;
    const d1 = t.coilResistance * t.coilResistance + wl * wl;
    const g1 = t.coilResistance / d1;
    const b1 = -wl / d1 + w * t.coilSelfCapacitance;
    vCoil = line / Math.hypot(g1, b1);
  }
  const iCoil = vCoil / zCoil;
  const vCapPeak = Math.SQRT2 * vCap;
  const notes: DesignNote[] = [...a.notes.filter((n) => n.level !== 'info')];
  const defer = 'Follow local codes and licensed practice.';
  if (vRating !== undefined) {
    if (vCapPeak > vRating) {
      notes.push(note('caution', `The capacitor sees ${fmt(vCapPeak, 'V')} peak, above its ${fmt(vRating, 'V')} rating: it may break down or overheat. Use a capacitor rated well above the peak RF voltage. ${defer}`, 'capacitorVoltageRating'));
    } else if (vCapPeak > 0.8 * vRating) {
      notes.push(note('info', `The capacitor sees ${fmt(vCapPeak, 'V')} peak, within 20 % of its ${fmt(vRating, 'V')} rating: little margin for RF derating.`, 'capacitorVoltageRating'));
    }
  }
  if (iRating !== undefined && iCoil > iRating) {
    notes.push(note('caution', `The coil carries ${fmt(iCoil, 'A')} RMS, above the wire's ${fmt(iRating, 'A')} rating: it will run hot, detune and may damage its insulation or former. Use heavier wire or tubing. ${defer}`, 'wireCurrentRating'));
  }
  const vMax = Math.max(vCap, vCoil, drive);
  if (vMax > EXTRA_LOW_VOLTAGE_AC_RMS) {
    notes.push(note('caution', `The tank carries ${fmt(vMax, 'V')} RMS (${fmt(Math.SQRT2 * vMax, 'V')} peak) at ${fmt(f, 'Hz')}, above ${EXTRA_LOW_VOLTAGE_AC_RMS} V AC RMS, the extra-low-voltage limit of IEC 61140 and IEC 60364. That limit is a mains-frequency touch criterion: RF can burn at lower voltages, often without a felt shock, and high RF voltage can break down capacitor dielectrics and arc across the coil. Keep hands off the live tank and switch off before touching. ${defer}`, power !== undefined ? 'drivePower' : 'driveVoltage'));
  }
  return {
    frequency: f,
    power: delivered,
    driveVoltage: drive,
    lineCurrent: line,
    capacitorVoltage: vCap,
    capacitorVoltagePeak: vCapPeak,
    capacitorCurrent: iCap,
    coilVoltage: vCoil,
    circulatingCurrent: iCoil,
    notes,
  };
}
