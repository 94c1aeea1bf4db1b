/**
 * Skin effect in an isolated straight round wire.
 *
 * Model: the exact solution for a solid round conductor carrying an AC
 * current (Maxwell; Rayleigh; Kelvin's ber/bei functions). With the time
 * factor e^{jωt}, the field inside obeys ∇²E = jωμσE, so E_z ∝ J0(k r) with
 * k = (1 − j)/δ, and the internal impedance per unit length, relative to the
 * DC resistance, is
 *
 *     Z / R_dc = (q/2) · J0(q) / J1(q),   q = k a = (1 − j) a/δ,
 *
 * a the wire radius and δ = √(ρ/(π f μ0 μr)) the skin depth. The real part is
 * R_ac/R_dc; the imaginary part is ωL_i/R_dc (positive: inductive), and
 * L_i/L_i,dc = Im(Z/R_dc) · 4 (δ/a)², L_i,dc = μ0 μr/(8π) per metre.
 * Limits: 1 + (a/δ)⁴/48 for a ≪ δ, and a/(2δ) + 1/4 + 3δ/(32 a) for a ≫ δ
 * (the first two terms: Ramo, Whinnery & Van Duzer, *Fields and Waves in
 * Communication Electronics*; Terman, *Radio Engineers' Handbook*, 1943, §2;
 * the third from Hankel's expansion below, DLMF 10.17.5).
 *
 * Numerics (no well-kept npm library computes Bessel functions of complex
 * argument, so this is done here):
 * - a/δ ≤ 25: the continued fraction of J0/J1 from the Bessel recurrence,
 *   q J0(q)/J1(q) = 2 − q²/(4 − q²/(6 − q²/(8 − …))), evaluated by the modified
 *   Lentz method (Numerical Recipes, 3rd ed., §5.2 and §6.5). It converges for
 *   every q; q² = −2j (a/δ)² is purely imaginary, so no cancellation occurs.
 * - a/δ > 25: Hankel's asymptotic expansion (DLMF 10.17.5), J0/J1 → H0⁽¹⁾/H1⁽¹⁾ =
 *   j · Σ jᵏ a_k(0) q⁻ᵏ / Σ jᵏ a_k(1) q⁻ᵏ; the neglected H⁽²⁾ part is of relative
 *   size e^{−2a/δ} < 1e−21 there, and the series is summed to 1e−17.
 * Both agree to about 1e−15 at the switch, far inside the 1e−6 tolerance.
 */
import { COPPER_RESISTIVITY_20C, MU_0 } from './constants';
import { DesignError, requireNonNegative, requirePositive } from './errors';
import { sayNumber } from './text';

/** a/δ above which the Hankel expansion replaces the continued fraction. */
export const SKIN_ASYMPTOTIC_SWITCH = 25;

/**
 * Skin depth δ = √(ρ / (π f μ0 μr)).
 * @param frequency f in hertz (> 0)
 * @param resistivity ρ in Ω·m (default annealed copper at 20 °C, IEC 60028)
 * @param relativePermeability μr of the conductor (default 1)
 * @returns δ in metres (copper at 1 MHz: about 66.1 µm)
 */
export function skinDepth(frequency: number, resistivity: number = COPPER_RESISTIVITY_20C, relativePermeability = 1): number {
  requirePositive('frequency', frequency, 'Frequency', 'Hz');
  requirePositive('resistivity', resistivity, 'Resistivity');
  requirePositive('relativePermeability', relativePermeability, 'Relative permeability');
  // √(ρ/π/μ0) · 1/√f · 1/√μr: each factor stays finite for any finite positive input
  const delta = (Math.sqrt(resistivity / (Math.PI * MU_0)) / Math.sqrt(frequency)) / Math.sqrt(relativePermeability);
  if (!(delta > 0 && Number.isFinite(delta))) {
    throw new DesignError('frequency', 'The skin depth is beyond what can be computed with these values: they are far outside anything physical.');
  }
  return delta;
}

/**
 * Below this a/δ the low-frequency series is used: ζ = 1 + (a/δ)⁴/48 + j (a/δ)²/4
 * (the neglected terms are below 1e-20 relative, so the real part is exactly 1
 * in doubles on both sides of the switch), so (a/δ)² never underflows.
 */
const SMALL_S = 1e-5;

/** A complex number as [re, im]. Local, tiny, allocation-light. */
type Cx = readonly [number, number];

function cdiv(a: Cx, b: Cx): Cx {
  // Smith's algorithm: no overflow for large |b|.
  if (Math.abs(b[0]) >= Math.abs(b[1])) {
    const r = b[1] / b[0];
    const den = b[0] + b[1] * r;
    return [(a[0] + a[1] * r) / den, (a[1] - a[0] * r) / den];
  }
  const r = b[0] / b[1];
  const den = b[0] * r + b[1];
  return [(a[0] * r + a[1]) / den, (a[1] * r - a[0]) / den];
}

function cmul(a: Cx, b: Cx): Cx {
  return [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
}

/**
 * ζ = Z/R_dc = (q/2) J0(q)/J1(q) for q = (1 − j) s, s = a/δ ≥ 0.
 * Exported for tests and for the coil-loss module; s is dimensionless.
 */
export function internalImpedanceRatio(s: number): Cx {
  if (typeof s !== 'number' || !(s >= 0) || !Number.isFinite(s)) {
    throw new DesignError('s', `The radius-to-skin-depth ratio must be a finite number ≥ 0 (got ${typeof s === 'number' ? sayNumber(s) : typeof s}).`);
  }
  if (s < SMALL_S) return [1 + (s * s * s * s) / 48, (s * s) / 4];
  if (s <= SKIN_ASYMPTOTIC_SWITCH) return continuedFraction(s);
  return hankel(s);
}

/** (q/2) J0/J1 = 1 − (w/2)/T, T = 4 − w/(6 − w/(8 − …)), w = q² = −2j s². Modified Lentz. */
function continuedFraction(s: number): Cx {
  const wIm = -2 * s * s; // w = (0, wIm)
  const a: Cx = [0, -wIm]; // every partial numerator is −w
  const tiny = 1e-300;
  let f: Cx = [4, 0];
  let C: Cx = f;
  let D: Cx = [0, 0];
  const maxIter = 100_000;
  for (let k = 1; k <= maxIter; k++) {
    const b: Cx = [4 + 2 * k, 0];
    // D = 1 / (b + a D)
    let den: Cx = [b[0] + (a[0] * D[0] - a[1] * D[1]), b[1] + (a[0] * D[1] + a[1] * D[0])];
    if (den[0] === 0 && den[1] === 0) den = [tiny, 0];
    D = cdiv([1, 0], den);
    // C = b + a / C
    const aOverC = cdiv(a, C);
    C = [b[0] + aOverC[0], b[1] + aOverC[1]];
    if (C[0] === 0 && C[1] === 0) C = [tiny, 0];
    const delta = cmul(C, D);
    f = cmul(f, delta);
    if (Math.abs(delta[0] - 1) + Math.abs(delta[1]) < 1e-16) break;
  }
  // 1 − (w/2)/T with w/2 = (0, wIm/2)
  const ratio = cdiv([0, wIm / 2], f);
  return [1 - ratio[0], -ratio[1]];
}

/** Hankel expansion: (q/2) · j · S0/S1, S_ν = Σ jᵏ a_k(ν) q⁻ᵏ. */
function hankel(s: number): Cx {
  const q: Cx = [s, -s];
  const invQ = cdiv([1, 0], q);
  let s0: Cx = [1, 0];
  let s1: Cx = [1, 0];
  let t0: Cx = [1, 0]; // current term of S0
  let t1: Cx = [1, 0];
  for (let k = 1; k <= 60; k++) {
    const m = (2 * k - 1) ** 2;
    const f0 = (0 - m) / (8 * k); // (4ν² − (2k−1)²)/(8k), ν = 0
    const f1 = (4 - m) / (8 * k); // ν = 1
    // term_k = term_{k−1} · f · j / q
    const jOverQ: Cx = [-invQ[1], invQ[0]];
    const n0 = cmul(t0, jOverQ);
    const n1 = cmul(t1, jOverQ);
    t0 = [n0[0] * f0, n0[1] * f0];
    t1 = [n1[0] * f1, n1[1] * f1];
    s0 = [s0[0] + t0[0], s0[1] + t0[1]];
    s1 = [s1[0] + t1[0], s1[1] + t1[1]];
    if (Math.hypot(t0[0], t0[1]) + Math.hypot(t1[0], t1[1]) < 1e-18) break;
  }
  // (q/2)·j = ((s + j·(−s))/2)·j = (s/2 + j s/2)
  const pref: Cx = [s / 2, s / 2];
  return cmul(pref, cdiv(s0, s1));
}

/**
 * L_i/L_i,dc from ζ at s = a/δ: ωL_i,dc/R_dc = s²/4, so the ratio is Im(ζ) · 4/s²
 * (exactly 1 below the low-frequency switch). For the coil-loss module.
 */
export function internalRatioFromZeta(s: number, zeta: Cx): number {
  return s < SMALL_S ? 1 : (zeta[1] * 4) / (s * s);
}

export interface WireInternalImpedance {
  /** R_ac / R_dc of the isolated straight wire (≥ 1). */
  resistanceRatio: number;
  /** L_i,ac / L_i,dc: internal inductance relative to its DC value μ0 μr/(8π) per metre (≤ 1). */
  internalInductanceRatio: number;
  /** Wire radius over skin depth, a/δ. */
  radiusOverSkinDepth: number;
  /** Skin depth in metres (Infinity at DC). */
  skinDepth: number;
}

/**
 * Exact internal impedance of an isolated straight round wire, from Bessel functions:
 * Z/R_dc = (q/2) J0(q)/J1(q), q = (1 − j) a/δ. See the module header.
 * @param wireDiameter bare diameter in metres (> 0)
 * @param frequency f in hertz (≥ 0; 0 gives the DC values 1 and 1)
 * @param resistivity ρ in Ω·m (default annealed copper at 20 °C)
 * @param relativePermeability μr of the conductor (default 1)
 * Valid at any frequency for a straight wire far from other conductors (no proximity effect).
 */
export function wireInternalImpedance(
  wireDiameter: number,
  frequency: number,
  resistivity: number = COPPER_RESISTIVITY_20C,
  relativePermeability = 1,
): WireInternalImpedance {
  requirePositive('wireDiameter', wireDiameter, 'Wire diameter', 'm');
  requireNonNegative('frequency', frequency, 'Frequency', 'Hz');
  requirePositive('resistivity', resistivity, 'Resistivity');
  requirePositive('relativePermeability', relativePermeability, 'Relative permeability');
  if (frequency === 0) {
    return { resistanceRatio: 1, internalInductanceRatio: 1, radiusOverSkinDepth: 0, skinDepth: Infinity };
  }
  const delta = skinDepth(frequency, resistivity, relativePermeability);
  const s = wireDiameter / 2 / delta;
  if (!Number.isFinite(s)) {
    throw new DesignError('frequency', 'The wire is beyond computing at this frequency: its radius is more than 1e308 skin depths.');
  }
  const z = internalImpedanceRatio(s);
  const internalInductanceRatio = internalRatioFromZeta(s, z);
  return { resistanceRatio: z[0], internalInductanceRatio, radiusOverSkinDepth: s, skinDepth: delta };
}

/**
 * R_ac / R_dc of an isolated straight round wire, exact (Bessel/Kelvin functions):
 * Re{(q/2) J0(q)/J1(q)}, q = (1 − j) a/δ. Accurate to about 1e−12 from DC to any a/δ.
 * @param wireDiameter bare diameter in metres (> 0)
 * @param frequency f in hertz (≥ 0)
 * @param resistivity ρ in Ω·m (default annealed copper at 20 °C, IEC 60028)
 * @param relativePermeability μr of the conductor (default 1)
 * @returns the ratio (≥ 1); limits 1 + (a/δ)⁴/48 and a/(2δ) + 1/4 (Ramo, Whinnery & Van Duzer)
 */
export function wireAcResistanceRatio(
  wireDiameter: number,
  frequency: number,
  resistivity: number = COPPER_RESISTIVITY_20C,
  relativePermeability = 1,
): number {
  return wireInternalImpedance(wireDiameter, frequency, resistivity, relativePermeability).resistanceRatio;
}
