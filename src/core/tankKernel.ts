/**
 * The tank's impedance, and where it peaks (parallel) or dips (series) and
 * falls 3 dB: the numerical kernel under `analyzeTank`, `sweepTank` and
 * `tankStress`, and the public `tankImpedance`.
 *
 * The impedance is the exact circuit algebra of the lumped model in
 * `tankModel` (no Q approximation). To keep it exact at any Q, it is written
 * in terms of the relative detuning x = ω/ω0 − 1 from the lossless resonance
 * ω0 = 1/√(L(C + C_s)): the reactances that cancel at resonance are combined
 * analytically, e.g. ω(C + C_s) − 1/(ωL) = x(2 + x)/(ωL), so no difference of
 * two nearly equal numbers is ever taken. Searches run in v = ln(ω/ω0), which
 * is near zero at resonance and so keeps full relative precision however
 * narrow the response: a tank of Q = 1e14 (bandwidth 1e−14 of f0) gives its
 * −3 dB edges and bandwidth to about 1e−9, where computing in ω itself would
 * leave the bandwidth tens of per cent wrong.
 *
 * The resonance is the minimum of |Y|² (parallel) or |Z|² (series) found on a
 * grid over ±3 octaves and refined by golden-section search; the −3 dB edges
 * are where that objective doubles, bracketed outward and bisected.
 */
import { TWO_PI } from './constants';
import { DesignError, requireObject } from './errors';
import { sayNumber } from './text';
import { resolveTank, tankValue, type ResolvedTank, type TankInput } from './tankModel';
import { type Complex } from './complex';

/** The resolved tank as plain numbers for the inner loops. */
export interface Kernel {
  series: boolean;
  /** Lossless resonance 1/√(L(C + C_s)), rad/s. */
  w0: number;
  L: number;
  C: number;
  Cs: number;
  RL: number;
  Rc: number;
  /** Parallel: conductance of source and load across the tank, S. */
  gExt: number;
  /** Series: source plus load resistance, Ω. */
  rExt: number;
  /** Upper bound of the search in v = ln(ω/ω0) (series mode stops below the coil's self-resonance). */
  vMax: number;
}

export function kernelOf(t: ResolvedTank): Kernel {
  const gExt = (t.sourceResistance ? 1 / t.sourceResistance : 0) + (t.loadResistance ? 1 / t.loadResistance : 0);
  const rExt = (t.sourceResistance ?? 0) + (t.loadResistance ?? 0);
  const series = t.mode === 'series';
  const ct = t.capacitance + t.coilSelfCapacitance;
  // ω_SRF/ω0 = √((C + C_s)/C_s)
  const vMax = series && t.coilSelfCapacitance > 0 ? 0.5 * Math.log(ct / t.coilSelfCapacitance) - 1e-9 : Infinity;
  return {
    series,
    w0: 1 / (Math.sqrt(t.inductance) * Math.sqrt(ct)),
    L: t.inductance, C: t.capacitance, Cs: t.coilSelfCapacitance,
    RL: t.coilResistance, Rc: t.capacitorEsr, gExt, rExt, vMax,
  };
}

/**
 * Scratch output of `evaluate`:
 * [0], [1]: the tank's own admittance G, B (parallel) or impedance R, X (series);
 * [2]: objective of the terminated network, [3]: of the tank alone.
 */
export const scratch = new Float64Array(4);

/**
 * Evaluate the network at angular frequency w = ω0 (1 + x); the caller gives
 * x accurately (from ln(ω/ω0) with expm1, or as f/f0 − 1). Writes into `out`
 * (see `scratch`); the objective is |Y|² (parallel) or |Z|² (series),
 * minimal at resonance. No allocation.
 */
export function evaluate(k: Kernel, w: number, x: number, out: Float64Array): void {
  const wl = w * k.L;
  const rl = k.RL;
  const d1 = rl * rl + wl * wl;
  const g1 = rl / d1; // coil branch conductance
  const detune = (x * (2 + x)) / wl; // ω(C + C_s) − 1/(ωL), exact given ω0²L(C + C_s) = 1
  const coilExtra = (rl * rl) / (wl * d1); // the coil's susceptance −ωL/d1 is −1/(ωL) + this
  const wc = w * k.C;
  if (!k.series) {
    // Capacitor branch 1/(ESR + 1/(jωC)) = (a ωC + jωC)/(1 + a²), a = ωC·ESR.
    const a = wc * k.Rc;
    const e = 1 + a * a;
    const g = g1 + (a * wc) / e;
    const b = detune + coilExtra - (wc * a * a) / e;
    out[0] = g;
    out[1] = b;
    const gl = g + k.gExt;
    out[2] = gl * gl + b * b;
    out[3] = g * g + b * b;
    return;
  }
  let zr: number;
  let zi: number;
  if (k.Cs > 0) {
    // Coil with C_s: admittance g1 + j bb; Im of the whole is −(bb (bb + ωC) + g1²) / ((g1² + bb²) ωC).
    const bb = -1 / wl + coilExtra + w * k.Cs;
    const m = g1 * g1 + bb * bb;
    zr = g1 / m;
    zi = -(bb * (detune + coilExtra) + g1 * g1) / (m * wc);
  } else {
    zr = rl;
    zi = (x * (2 + x)) / wc; // ωL − 1/(ωC), exact given ω0²LC = 1
  }
  zr += k.Rc;
  out[0] = zr;
  out[1] = zi;
  const zl = zr + k.rExt;
  out[2] = zl * zl + zi * zi;
  out[3] = zr * zr + zi * zi;
}

/** Evaluate at v = ln(ω/ω0). */
export function evaluateAt(k: Kernel, v: number, out: Float64Array): void {
  evaluate(k, k.w0 * Math.exp(v), Math.expm1(v), out);
}

function objective(k: Kernel, v: number, loaded: boolean): number {
  evaluateAt(k, v, scratch);
  return loaded ? scratch[2] : scratch[3];
}

const GRID = 96;
const SPAN = Math.log(8);
const GOLD = (Math.sqrt(5) - 1) / 2;

/**
 * Find the resonance (minimum of the objective) in v = ln(ω/ω0) within ±3
 * octaves. `q` (an estimate of the Q) sets the precision: the peak is located
 * to 1e−13 of its half-width. Returns [v, objective] or [NaN, NaN] when the
 * minimum sits at the search edge.
 */
export function findExtremum(k: Kernel, loaded: boolean, q: number): [number, number] {
  const lo = -SPAN;
  const hi = Math.min(SPAN, k.vMax);
  const step = (hi - lo) / (GRID - 1);
  let best = 0;
  let bestVal = Infinity;
  for (let i = 0; i < GRID; i++) {
    const val = objective(k, lo + i * step, loaded);
    if (val < bestVal) {
      bestVal = val;
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
  const tol = 1e-13 / Math.max(q, 1);
  for (let i = 0; i < 400 && b - a > tol + 1e-16 * Math.abs(b); i++) {
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
  const v = (a + b) / 2;
  return [v, objective(k, v, loaded)];
}

/**
 * Find where the objective reaches `target` (twice its minimum: the −3 dB
 * point) going from the resonance vPeak in direction dir (−1 below, +1 above).
 * Returns v of the edge, or NaN when the response never falls that far.
 */
function findEdge(k: Kernel, vPeak: number, target: number, dir: -1 | 1, qEstimate: number, loaded: boolean): number {
  const limit = dir > 0 ? Math.min(vPeak + Math.log(1e4), k.vMax) : vPeak - Math.log(1e4);
  let s = Math.min(0.25 / Math.max(qEstimate, 1e-3), 0.5);
  let inner = vPeak;
  let outer = vPeak + dir * s;
  for (;;) {
    if (dir > 0 ? outer >= limit : outer <= limit) outer = limit;
    if (objective(k, outer, loaded) >= target) break;
    if (outer === limit) return NaN;
    inner = outer;
    s *= 2;
    outer = vPeak + dir * s;
  }
  for (let i = 0; i < 400 && Math.abs(outer - inner) > 4e-16 * Math.abs(outer); i++) {
    const mid = (inner + outer) / 2;
    if (objective(k, mid, loaded) >= target) outer = mid;
    else inner = mid;
  }
  return (inner + outer) / 2;
}

/** Where the phase of the tank alone crosses zero nearest resonance, as v; NaN if nowhere near. */
export function findZeroPhase(k: Kernel, vPeak: number, qEstimate: number): number {
  // Im Z and Im Y have opposite signs: a sign change of either marks zero phase.
  evaluateAt(k, vPeak, scratch);
  const sign0 = Math.sign(scratch[1]);
  if (sign0 === 0) return vPeak;
  let s = Math.min(0.05 / Math.max(qEstimate, 1e-3), 0.05);
  let inner = 0;
  for (let n = 0; n < 200 && s < Math.log(1e3); n++, s *= 2) {
    for (const dir of [-1, 1]) {
      const v = vPeak + dir * s;
      if (v >= k.vMax) continue;
      evaluateAt(k, v, scratch);
      if (Math.sign(scratch[1]) !== sign0) {
        let a = vPeak + dir * inner;
        let b = v;
        for (let i = 0; i < 400 && Math.abs(b - a) > 4e-16 * Math.abs(b); i++) {
          const mid = (a + b) / 2;
          evaluateAt(k, mid, scratch);
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

/** A resonance found in the impedance: its v, objective there, and the −3 dB edges (as v). */
export interface Resonance {
  v: number;
  value: number;
  lower: number;
  upper: number;
}

function noResonance(field: string, q: number, what: string): DesignError {
  return new DesignError(field, `The ${what} loss is so high (Q about ${sayNumber(q)}) that the tank hardly resonates: its response has no clear peak 3 dB above its sides. Reduce the loss.`);
}

/**
 * The peak (parallel) or dip (series) of the tank alone (`loaded` false) or
 * with its terminations, and its −3 dB edges.
 * @param q estimate of the Q (sets the search precision and the error's figure)
 * @param field input to blame when there is no resonance
 * @throws DesignError when the response has no clear 3 dB peak
 */
export function findResonance(k: Kernel, loaded: boolean, q: number, field: string, what: string): Resonance {
  const [v, value] = findExtremum(k, loaded, q);
  if (!Number.isFinite(v)) throw noResonance(field, q, what);
  const lower = findEdge(k, v, 2 * value, -1, q, loaded);
  const upper = findEdge(k, v, 2 * value, 1, q, loaded);
  if (!Number.isFinite(lower) || !Number.isFinite(upper)) throw noResonance(field, q, what);
  return { v, value, lower, upper };
}

/** 1/(g + jb) without overflow or underflow (Smith's algorithm); Infinity when g = b = 0. */
export function invert(g: number, b: number): Complex {
  if (g === 0 && b === 0) return { re: Infinity, im: 0 };
  if (Math.abs(g) >= Math.abs(b)) {
    const r = b / g;
    const d = g + b * r;
    return { re: 1 / d, im: -r / d };
  }
  const r = g / b;
  const d = g * r + b;
  return { re: r / d, im: -1 / d };
}

/** Options of `tankImpedance`. */
export interface TankImpedanceOptions {
  /** Include the source and load resistances (across the tank, or in series). Default false. */
  loaded?: boolean;
}

/**
 * Complex impedance of the tank at one frequency.
 * Parallel: (R_L + jωL) ∥ 1/(jωC_s) ∥ (ESR + 1/(jωC)); series:
 * [(R_L + jωL) ∥ 1/(jωC_s)] + ESR + 1/(jωC). With `loaded`, the source and
 * load resistances are included (across the tank, or in series).
 * An ideal parallel tank alone, exactly at its resonance, has an infinite
 * impedance: the result is then { re: Infinity, im: 0 } (the only case).
 * @param tank inputs in SI units
 * @param frequency f in hertz (> 0)
 * @param options `loaded` (boolean)
 * @returns Z in ohms
 * @throws DesignError naming the input at fault
 */
export function tankImpedance(tank: TankInput, frequency: number, options?: TankImpedanceOptions): Complex {
  const opts = options === undefined ? {} : requireObject<TankImpedanceOptions>('options', options, 'The impedance options');
  if (opts.loaded !== undefined && typeof opts.loaded !== 'boolean') {
    throw new DesignError('loaded', '"loaded" must be true or false.');
  }
  const t = resolveTank(tank);
  const f = tankValue('frequency', frequency, 'Frequency', 'Hz');
  const k = kernelOf(t);
  const w = TWO_PI * f;
  evaluate(k, w, w / k.w0 - 1, scratch);
  const loaded = opts.loaded === true;
  if (k.series) return { re: scratch[0] + (loaded ? k.rExt : 0), im: scratch[1] };
  return invert(scratch[0] + (loaded ? k.gExt : 0), scratch[1]);
}
