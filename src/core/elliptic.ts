/**
 * Complete elliptic integrals of the first and second kind.
 *
 * Model: Gauss's arithmetic–geometric mean (AGM). With a₀ = 1, b₀ = √(1 − m),
 * c₀ = √m and aₙ₊₁ = (aₙ + bₙ)/2, bₙ₊₁ = √(aₙ bₙ), cₙ₊₁ = cₙ² / (4 aₙ₊₁):
 *   K(m) = π / (2 a∞),   E(m) = K(m) · (1 − Σₙ 2ⁿ⁻¹ cₙ²).
 * Sources: Abramowitz & Stegun, *Handbook of Mathematical Functions* (1964),
 * 17.6; NIST DLMF 19.8.1 and 19.8.6; near m = 1 the logarithmic series
 * DLMF 19.12.1–19.12.2.
 *
 * CONVENTION: every function here takes the PARAMETER m = k² (k the modulus),
 * as A&S and the DLMF "m" notation do, and as @stdlib/math-base-special-ellipk
 * does. K(m) = ∫₀^{π/2} dθ / √(1 − m sin²θ). Valid for 0 ≤ m < 1 (K has a
 * logarithmic singularity at m = 1; E(1) = 1). Accuracy about 1e-15 relative.
 * Any other argument (m ≥ 1, negative, NaN, not a number) throws a DesignError
 * with field `m`.
 *
 * The cₙ recurrence cₙ₊₁ = cₙ² / (4 aₙ₊₁) (instead of (aₙ − bₙ)/2) keeps every
 * term relatively accurate, so the difference D(m) = (K − E)/m comes out of the
 * AGM without cancellation even for tiny m. Callers that know the complementary
 * parameter 1 − m more accurately than m itself (Nagaoka's coefficient for short
 * coils) use the `…FromComplement` forms.
 */

import { DesignError } from './errors';

const HALF_PI = Math.PI / 2;

interface AgmResult {
  /** K(m) */
  k: number;
  /** D(m) = (K − E)/m = ∫ sin²θ / √(1 − m sin²θ) dθ */
  d: number;
}

/**
 * AGM core. `m` the parameter, `mc` = 1 − m (both given so that neither is
 * formed by a cancelling subtraction). Returns K and D = (K − E)/m.
 */
function agm(m: number, mc: number): AgmResult {
  let a = 1;
  let b = Math.sqrt(mc);
  // q = cₙ² / m, accumulated as Σ 2ⁿ⁻¹ cₙ² / m; c₀² / m = 1.
  let q = 1;
  let weight = 0.5;
  let sum = 0.5;
  for (let i = 0; i < 60; i++) {
    const aNext = (a + b) / 2;
    const bNext = Math.sqrt(a * b);
    // cₙ₊₁² / m = (cₙ² / m)² · m / (16 aₙ₊₁²)
    q = (q * q * m) / (16 * aNext * aNext);
    weight *= 2;
    sum += weight * q;
    a = aNext;
    b = bNext;
    if (weight * q <= 1e-17 * sum && Math.abs(a - b) <= 4e-16 * a) break;
  }
  const k = HALF_PI / a;
  return { k, d: k * sum };
}

/** Throws a DesignError (field `m`) unless 0 ≤ m < 1. */
function checkParameter(m: unknown, name: string): asserts m is number {
  if (typeof m !== 'number' || !(m >= 0 && m < 1)) {
    throw new DesignError('m', `${name}: the parameter m = k² must be a number with 0 ≤ m < 1 (got ${typeof m === 'number' ? String(m) : typeof m}).`);
  }
}

/**
 * Logarithmic series for m near 1 in terms of the complementary parameter
 * mc = 1 − m = k'² (DLMF 19.12.1 and 19.12.2):
 *   K = Σ [(½)ⱼ / j!]² k'^{2j} [ln(1/k') + dⱼ],
 *   E − 1 = ½ Σ [(½)ⱼ (3/2)ⱼ / ((2)ⱼ j!)] k'^{2j+2} [ln(1/k') + dⱼ − 1/((2j+1)(2j+2))],
 *   d₀ = 2 ln 2, dⱼ₊₁ = dⱼ − 2/((2j+1)(2j+2)).
 * Returns K and (E − 1)/mc, both free of cancellation for small mc.
 * Converges like mc^j; used here for mc ≤ 0.1.
 */
function nearOneSeries(mc: number): { k: number; eMinusOneOverMc: number } {
  const lnInvKc = -0.5 * Math.log(mc);
  let dj = 2 * Math.LN2;
  let cK = 1; // [(½)ⱼ / j!]²
  let cE = 1; // (½)ⱼ (3/2)ⱼ / ((2)ⱼ j!)
  let p = 1; // mc^j
  let k = 0;
  let e = 0;
  for (let j = 0; j < 80; j++) {
    const r = 1 / ((2 * j + 1) * (2 * j + 2));
    const tK = cK * p * (lnInvKc + dj);
    const tE = cE * p * (lnInvKc + dj - r);
    k += tK;
    e += tE;
    if (Math.abs(tK) <= 1e-17 * Math.abs(k) && Math.abs(tE) <= 1e-17 * Math.abs(e)) break;
    dj -= 2 * r;
    const h = j + 0.5;
    cK *= (h / (j + 1)) * (h / (j + 1));
    cE *= (h * (j + 1.5)) / ((j + 2) * (j + 1));
    p *= mc;
  }
  return { k, eMinusOneOverMc: 0.5 * e };
}

/** Below this complementary parameter the logarithmic series is used for E. */
const SERIES_BELOW_MC = 0.1;

/**
 * Complete elliptic integral of the first kind, K(m) = ∫₀^{π/2} dθ / √(1 − m sin²θ).
 * @param m parameter m = k² (NOT the modulus k), 0 ≤ m < 1
 * Source: AGM, A&S 17.6 / DLMF 19.8.1. K(0) = π/2; K → ∞ as m → 1.
 */
export function ellipticK(m: number): number {
  checkParameter(m, 'ellipticK');
  return agm(m, 1 - m).k;
}

/**
 * Complete elliptic integral of the second kind, E(m) = ∫₀^{π/2} √(1 − m sin²θ) dθ.
 * @param m parameter m = k² (NOT the modulus k), 0 ≤ m < 1
 * Source: AGM, A&S 17.6 / DLMF 19.8.6; for 1 − m ≤ 0.1 the series DLMF 19.12.2.
 * E(0) = π/2; E → 1 as m → 1.
 */
export function ellipticE(m: number): number {
  checkParameter(m, 'ellipticE');
  const mc = 1 - m;
  if (mc <= SERIES_BELOW_MC) return 1 + mc * nearOneSeries(mc).eMinusOneOverMc;
  const { k, d } = agm(m, mc);
  return k - m * d;
}

/**
 * D(m) = (K(m) − E(m)) / m = ∫₀^{π/2} sin²θ / √(1 − m sin²θ) dθ, computed without
 * the cancellation of K − E at small m (D(0) = π/4).
 * @param m parameter m = k², 0 ≤ m < 1
 * Source: DLMF 19.2.6 (the "D" integral of Jahnke & Emde), evaluated by the AGM.
 */
export function ellipticD(m: number): number {
  checkParameter(m, 'ellipticD');
  return agm(m, 1 - m).d;
}

/**
 * K, E − 1 and D from the complementary parameter mc = 1 − m = k'² given
 * directly (for callers that know k' to full precision). Internal to the core.
 * @param m parameter m = k²
 * @param mc complementary parameter 1 − m (0 < mc ≤ 1)
 * @returns K(m), D(m) = (K − E)/m, and (E − 1)/mc (relatively accurate as mc → 0)
 */
export function ellipticFromComplement(m: number, mc: number): { k: number; d: number; eMinusOneOverMc: number } {
  // m may round to 1 when mc is tiny: only mc must stay above zero.
  if (typeof m !== 'number' || !(m >= 0 && m <= 1)) {
    throw new DesignError('m', `ellipticFromComplement: the parameter m = k² must satisfy 0 ≤ m ≤ 1 (got ${String(m)}).`);
  }
  if (typeof mc !== 'number' || !(mc > 0 && mc <= 1)) {
    throw new DesignError('mc', `ellipticFromComplement: the complementary parameter must satisfy 0 < 1 − m ≤ 1 (got ${String(mc)}).`);
  }
  if (mc <= SERIES_BELOW_MC) {
    const s = nearOneSeries(mc);
    const e = 1 + mc * s.eMinusOneOverMc;
    return { k: s.k, d: (s.k - e) / m, eMinusOneOverMc: s.eMinusOneOverMc };
  }
  const { k, d } = agm(m, mc);
  const e = k - m * d;
  return { k, d, eMinusOneOverMc: (e - 1) / mc };
}
