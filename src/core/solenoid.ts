/**
 * Single-layer solenoid (air core): inductance from geometry, and turns for a
 * wanted inductance.
 *
 * Model: the coil is first treated as a uniform current sheet of the winding's
 * mean diameter and length l = N·p, whose inductance is the long-solenoid value
 * times Nagaoka's coefficient K (Nagaoka 1909, exact from complete elliptic
 * integrals). Rosa's round-wire corrections then replace the sheet by N round
 * wires: L = L_sheet − μ0 r N (ks + km) (Rosa, Bull. Bureau of Standards 4,
 * 1907; Grover, *Inductance Calculations*, 1946, ch. 16 and Table 7).
 * Wheeler's short-coil formula (Proc. IRE 16, 1928) is returned beside it as a
 * check on the current-sheet value.
 *
 * Assumptions: a round wire with the current spread evenly across it (Rosa's ks
 * contains the wire's low-frequency internal inductance, ¼ μ0 r per turn; at
 * radio frequencies, where the skin depth is much smaller than the wire, that
 * part vanishes and the inductance is lower by `internalInductance`); turns are
 * circles (the helix's pitch angle and the leads are ignored); no nearby metal
 * or core; pitch small beside the coil radius.
 */
import { MU_0 } from './constants';
import { ellipticFromComplement } from './elliptic';
import { DesignError, requireFinite, requireNonNegative, requireObject, requirePositive } from './errors';
import { note, type DesignNote } from './notes';
import { sayMm, sayNumber, sayPercent, sayQuantity } from './text';

const FOUR_OVER_THREE_PI = 4 / (3 * Math.PI);
const METRES_PER_INCH = 0.0254;

/**
 * Nagaoka's coefficient K for a uniform current sheet (cylindrical, single layer):
 * L_sheet = K · μ0 π r² N² / l.
 *
 * Exact form (Nagaoka 1909; Grover 1946), with k² = d²/(d² + l²), k'² = l²/(d² + l²):
 *   K = 4/(3π k') · [ (k'²/k²)(K(k) − E(k)) + E(k) − k ]
 * which equals the often quoted 4/(3π k') [((1−k²)/k²) K − ((1−2k²)/k²) E − k].
 * Evaluated as k'²·D(m) + E − k with D = (K − E)/m from the AGM, so long coils
 * (k → 0) lose nothing to cancellation; for short coils (k'² ≤ 0.1) E − 1 comes
 * from its logarithmic series and 1 − k = k'²/(1 + k), so K is accurate to
 * about 1e-15 relative from l/d = 1e-10 to 1e10.
 *
 * @param diameter mean winding diameter d, metres (> 0)
 * @param length winding length l, metres (> 0)
 * @returns K, 0 < K < 1; K → 1 for long coils, K ≈ (2l/πd)(ln(4d/l) − ½) for short ones.
 */
export function nagaokaCoefficient(diameter: number, length: number): number {
  requirePositive('diameter', diameter, 'Coil diameter', 'm');
  requirePositive('length', length, 'Coil length', 'm');
  const h = Math.hypot(diameter, length);
  const k = diameter / h;
  const kc = length / h;
  const m = k * k;
  const mc = kc * kc;
  if (!(mc > 1e-300)) {
    // l/d below about 1e-150: only the leading short-coil term is left, computed in logarithms
    // (it underflows to 0 for l/d below about 1e-300).
    const lnX = Math.log(length) - Math.log(diameter);
    return (2 / Math.PI) * Math.exp(lnX) * (Math.log(4) - lnX - 0.5);
  }
  const { k: bigK, d, eMinusOneOverMc } = ellipticFromComplement(m, mc);
  if (mc <= 0.1) {
    // Short coil: bracket = k'² [D + (E − 1)/k'² + 1/(1 + k)], no cancellation.
    return FOUR_OVER_THREE_PI * kc * (d + eMinusOneOverMc + 1 / (1 + k));
  }
  const e = bigK - m * d;
  return (FOUR_OVER_THREE_PI / kc) * (mc * d + e - k);
}

// ---------------------------------------------------------------------------
// Rosa's corrections

/** ζ'(−1) = 1/12 − ln A (A Glaisher's constant). */
const ZETA_PRIME_MINUS_ONE = -0.16542114370045093;
const LN_TWO_PI = Math.log(2 * Math.PI);
/** Limit of km for N → ∞: ln(2π) − 3/2 (Grover 1946). */
export const ROSA_KM_LIMIT = LN_TWO_PI - 1.5;

/** ln Γ(x) for x ≥ 1, Stirling's series after shifting the argument past 15. */
function lnGamma(x: number): number {
  let shift = 0;
  while (x < 15) {
    shift += Math.log(x);
    x += 1;
  }
  const x2 = 1 / (x * x);
  const series =
    (1 / x) * (1 / 12 - x2 * (1 / 360 - x2 * (1 / 1260 - x2 * (1 / 1680 - x2 * (1 / 1188 - (x2 * 691) / 360360)))));
  return (x - 0.5) * Math.log(x) - x + 0.5 * LN_TWO_PI + series - shift;
}

/**
 * Grover's asymptotic series for km (large N), from the Barnes G-function's
 * asymptotic expansion:
 * km = ln 2π − 3/2 − ln N/(6N) + 2ζ'(−1)/N − 1/(120N³) + 1/(504N⁵) − 1/(720N⁷) + 1/(528N⁹) − 691/(163800 N¹¹).
 */
function kmAsymptotic(n: number): number {
  const u = 1 / (n * n);
  const tail = u * (-1 / 120 + u * (1 / 504 + u * (-1 / 720 + u * (1 / 528 - (u * 691) / 163800))));
  return ROSA_KM_LIMIT + (-Math.log(n) / 6 + 2 * ZETA_PRIME_MINUS_ONE + tail) / n;
}

/** Above this N the asymptotic series is used (its truncation error is below 1e-17 there). */
const KM_SERIES_FROM = 20;

/**
 * Rosa's mutual-inductance correction km(N).
 *
 * Definition (Rosa 1907; Grover 1946): the current sheet's mutual inductance
 * between two strips of width p whose centres are s·p apart exceeds that of two
 * filaments at the same distance by μ0 r ln(s·p / g_s), g_s the strips' geometric
 * mean distance, ln(g_s/p) = [(s+1)² ln(s+1) + (s−1)² ln(s−1)]/2 − s² ln s − 3/2.
 * Summing over all ordered pairs of turns,
 *   km = (2/N) Σ_{s=1}^{N−1} (N − s) [ln s − ln(g_s/p)],
 * and the sum has the closed form (the (N − s)-weighted second differences of
 * s² ln s / 2 telescope, and Σ (N − s) ln s = ln G(N + 1), G Barnes' function)
 *   km = (2/N) [ln G(N + 1) − (N²/2) ln N + 3N(N − 1)/4].
 * This reproduces Grover's Table 7 (km(2) = 0.1137, km(10) = 0.2664) and tends
 * to ln(2π) − 3/2 = 0.3379.
 *
 * Fractional N (half turns): km follows the analytic continuation of that closed
 * form, which passes through every integer value and rises smoothly between
 * them (km(1.5) = 0.0700). N ≤ 1 gives 0 (no pairs of turns).
 *
 * @param turns N, any real ≥ 0 (dimensionless)
 * @throws DesignError (field `turns`) for a negative, non-finite or non-number N
 */
export function rosaKm(turns: number): number {
  requireNonNegative('turns', turns, 'Number of turns');
  if (!(turns > 1)) return 0;
  if (turns >= KM_SERIES_FROM) return kmAsymptotic(turns);
  // ln G(N + 1) = ln G(N + 1 + n) − Σ_{j=1}^{n} ln Γ(N + j), with ln G at N + n from
  // the asymptotic form. Σ_{j=1}^{n} ln Γ(N + j) = n ln Γ(N + 1) + Σ_{i=1}^{n−1} (n − i) ln(N + i).
  const n = Math.ceil(KM_SERIES_FROM - turns);
  const big = turns + n;
  // (2/M)[ln G(M+1) − (M²/2) ln M + 3M(M−1)/4] = kmAsymptotic(M)  ⇒  ln G(M+1):
  const lnGBig = (big / 2) * kmAsymptotic(big) + ((big * big) / 2) * Math.log(big) - (3 * big * (big - 1)) / 4;
  let sum = n * lnGamma(turns + 1);
  for (let i = 1; i < n; i++) sum += (n - i) * Math.log(turns + i);
  const lnG = lnGBig - sum;
  const km = (2 / turns) * (lnG - ((turns * turns) / 2) * Math.log(turns) + (3 * turns * (turns - 1)) / 4);
  return km > 0 ? km : 0;
}

/**
 * Rosa's self-inductance correction ks = 5/4 − ln(2p/d) (Rosa 1907; Grover 1946),
 * the difference between a sheet strip of width p and a round wire of diameter d
 * (including the wire's low-frequency internal inductance, the ¼).
 * @param pitch p, metres (> 0)
 * @param wireDiameter bare wire diameter d, metres (> 0)
 * @throws DesignError for a pitch or wire diameter that is not a positive finite number
 */
export function rosaKs(pitch: number, wireDiameter: number): number {
  requirePositive('pitch', pitch, 'Pitch', 'm');
  requirePositive('wireDiameter', wireDiameter, 'Wire diameter', 'm');
  // ln(2p/d) as a difference of logarithms: p/d cannot overflow
  return 1.25 - Math.LN2 - Math.log(pitch) + Math.log(wireDiameter);
}

/**
 * Rosa's corrections for a single-layer coil of round wire:
 * ks = 5/4 − ln(2p/d) (self), km(N) from the mutual-inductance sum (see `rosaKm`).
 * L = L_sheet − μ0 r N (ks + km). Rosa 1907; Grover 1946, Table 7.
 * @param turns N (≥ 0, fractional allowed)
 * @param pitch p, metres, centre to centre of adjacent turns (> 0)
 * @param wireDiameter bare wire diameter d, metres (> 0)
 */
export function rosaCorrections(turns: number, pitch: number, wireDiameter: number): { ks: number; km: number } {
  const km = rosaKm(turns);
  return { ks: rosaKs(pitch, wireDiameter), km };
}

// ---------------------------------------------------------------------------
// Solenoid

export interface SolenoidInput {
  /** Mean winding diameter, wire centre to wire centre, metres. */
  diameter: number;
  /** Number of turns N (≥ 1; fractional allowed, e.g. 5.5). */
  turns: number;
  /** Pitch p, centre-to-centre distance of adjacent turns, metres (≥ wireDiameter). */
  pitch: number;
  /** Bare conductor diameter, metres. */
  wireDiameter: number;
}

export interface SolenoidResult {
  /** Low-frequency inductance with Rosa's corrections, henries. */
  inductance: number;
  /** Current-sheet inductance K μ0 π r² N² / l, henries. */
  currentSheetInductance: number;
  /** Wheeler's 1928 short-coil formula (current-sheet check), henries. */
  wheelerInductance: number;
  /** The wire's internal inductance included in `inductance` (¼ μ0 r N), henries; subtract it where the skin depth ≪ wire radius. */
  internalInductance: number;
  /** Winding length l = N·p, metres. */
  length: number;
  /** Nagaoka's coefficient K. */
  nagaoka: number;
  /** Rosa's self-inductance correction ks. */
  ks: number;
  /** Rosa's mutual-inductance correction km. */
  km: number;
  notes: DesignNote[];
}

function validateSolenoidGeometry(diameter: number, pitch: number, wireDiameter: number): void {
  requirePositive('diameter', diameter, 'Coil diameter', 'm');
  requirePositive('pitch', pitch, 'Pitch', 'm');
  requirePositive('wireDiameter', wireDiameter, 'Wire diameter', 'm');
  if (pitch < wireDiameter) {
    throw new DesignError(
      'pitch',
      `pitch ${sayMm(pitch)} is smaller than the wire's ${sayMm(wireDiameter)} diameter: turns would overlap.`,
    );
  }
  if (wireDiameter >= diameter) {
    throw new DesignError(
      'wireDiameter',
      `The wire's ${sayMm(wireDiameter)} diameter is not smaller than the ${sayMm(diameter)} winding diameter (measured wire centre to wire centre): the winding would cross the coil's axis.`,
    );
  }
}

function validateTurns(turns: number): void {
  requireFinite('turns', turns, 'Turns');
  if (turns < 1) {
    throw new DesignError('turns', `A solenoid needs at least one turn (got ${sayNumber(turns)}).`);
  }
}

/** Core of the calculation without input checks or notes (used by the root finder). */
function solenoidCore(diameter: number, turns: number, pitch: number, wireDiameter: number) {
  const r = diameter / 2;
  const length = turns * pitch;
  const nagaoka = nagaokaCoefficient(diameter, length);
  // K μ0 π r² N² / l, grouped as (r N)(r N / l) so that large coils do not overflow early
  const currentSheetInductance = nagaoka * MU_0 * Math.PI * (r * turns) * ((r * turns) / length);
  const ks = rosaKs(pitch, wireDiameter);
  const km = rosaKm(turns);
  const inductance = currentSheetInductance - MU_0 * r * turns * (ks + km);
  return { r, length, nagaoka, currentSheetInductance, ks, km, inductance };
}

/**
 * Refuses a computed inductance that is not a positive finite number: only
 * inputs far outside anything that can be wound (a coil kilometres wide, a
 * pitch a billionth of its diameter) get there.
 */
function checkInductance(inductance: number, diameter: number, turns: number): number {
  if (Number.isFinite(inductance) && inductance > 0) return inductance;
  const field = !Number.isFinite(inductance) ? (turns > diameter ? 'turns' : 'diameter') : 'pitch';
  throw new DesignError(field, 'The inductance is beyond what can be computed with these values: they are far outside anything that can be wound.');
}

// ---------------------------------------------------------------------------
// Maxwell's filament sum, for the size of Rosa's error at wide pitch

/**
 * Low-frequency inductance of N coaxial circular round-wire loops of radius r
 * spaced p apart (the turns of a solenoid taken as separate circles): the sum of
 * each loop's self-inductance μ0 r [(1 + ρ²/8r²) ln(8r/ρ) − 7/4 + ρ²/24r²]
 * (ρ the wire radius; Rosa 1907, Grover 1946) and Maxwell's mutual inductance
 * of every pair, M = μ0 r [(2/k − k) K(k²) − (2/k) E(k²)], k² = 4r²/(4r² + z²)
 * (Maxwell; Grover 1946). Loops more than 64 r apart are left out (their
 * share is below 1e-4 of the total). Used only to size the error of Rosa's
 * corrections where the pitch is wide; integer N ≥ 1.
 */
function filamentInductance(radius: number, turns: number, pitch: number, wireDiameter: number): number {
  const rho = wireDiameter / 2;
  const q = (rho * rho) / (radius * radius);
  const self = MU_0 * radius * ((1 + q / 8) * Math.log((8 * radius) / rho) - 1.75 + q / 24);
  let total = turns * self;
  const farthest = Math.min(turns - 1, Math.ceil((64 * radius) / pitch));
  for (let s = 1; s <= farthest; s++) {
    const z = s * pitch;
    const h = 4 * radius * radius + z * z;
    const m = (4 * radius * radius) / h;
    const k = Math.sqrt(m);
    const { k: bigK, d } = ellipticFromComplement(m, (z * z) / h);
    // (2/k − k)K − (2/k)E = (2/k)(K − E) − kK = k (2D − K), D = (K − E)/m
    total += 2 * (turns - s) * MU_0 * radius * k * (2 * d - bigK);
  }
  return total;
}

/**
 * Relative error of the Rosa-corrected inductance against the filament sum
 * above (for fractional N, interpolated between the neighbouring whole numbers).
 */
function rosaErrorAgainstFilaments(diameter: number, turns: number, pitch: number, wireDiameter: number): number {
  const errorAt = (n: number) =>
    solenoidCore(diameter, n, pitch, wireDiameter).inductance / filamentInductance(diameter / 2, n, pitch, wireDiameter) - 1;
  const lo = Math.floor(turns);
  if (lo === turns) return errorAt(lo);
  const t = turns - lo;
  return (1 - t) * errorAt(lo) + t * errorAt(lo + 1);
}

/**
 * Wheeler's short-coil formula (Wheeler 1928): L[µH] = r² N² / (9r + 10l), r and l
 * in inches; converted here to SI. Approximates the current-sheet inductance;
 * within about 1 % for l > 0.8 r (l > 0.4 d).
 * @param radius mean winding radius r, metres
 * @param length winding length l, metres
 * @param turns N
 * @returns henries
 */
export function wheelerSolenoidInductance(radius: number, length: number, turns: number): number {
  requirePositive('radius', radius, 'Coil radius', 'm');
  requireNonNegative('length', length, 'Coil length', 'm');
  requirePositive('turns', turns, 'Turns');
  // r_in² N² / (9 r_in + 10 l_in) µH with r_in = r/0.0254 ⇒ 1e-6 r² N² / (0.0254 (9r + 10l)) H,
  // grouped as r · (r/(9r + 10l)) · N² so that only a truly huge coil overflows
  const l = ((1e-6 / METRES_PER_INCH) * radius * (radius / (9 * radius + 10 * length))) * turns * turns;
  if (!Number.isFinite(l)) {
    throw new DesignError(turns > radius ? 'turns' : 'radius', "Wheeler's inductance is beyond what can be computed with these values: they are far outside anything that can be wound.");
  }
  return l;
}

/**
 * Inductance of a single-layer air-core solenoid of round wire.
 *
 * L = K μ0 π r² N² / l − μ0 r N (ks + km), l = N p, r = diameter/2
 * (Nagaoka 1909, Rosa 1907, Grover 1946). Low-frequency value; see
 * `internalInductance` for radio frequencies.
 *
 * Notes: 'validity' when Wheeler's check formula is outside its range
 * (l < 0.8 r), when N < 2 (a loop rather than a coil: leads and pitch angle
 * matter), when the pitch exceeds half the coil radius (Rosa's corrections
 * assume p ≪ r: against an exact sum of Maxwell's mutual inductances of
 * circular filaments they are within 0.7 % up to p = r/2, about 2 % at p = r
 * and 4–6 % at p = 2r; beyond that the error grows with pitch, to about
 * +18–23 % at p = 10 r and +68–73 % at p = 100 r for wire a twentieth of
 * the radius, more for thicker wire. The note states this coil's own figure
 * from that filament sum), and when the wire is thick beside the coil (d > r/5:
 * at radio frequencies the current crowds to the inside of the turns).
 * A large pitch-to-wire ratio by itself gets no note: ks then turns negative
 * (the wire's own inductance exceeds its sheet strip's) but the comparison
 * with the filament sum shows the error follows p/r, not p/d.
 *
 * @throws DesignError for non-positive or non-finite inputs, N < 1, pitch smaller
 *   than the wire (turns would overlap), wire not thinner than the coil.
 */
export function solenoidInductance(input: SolenoidInput): SolenoidResult {
  requireObject<SolenoidInput>('input', input, 'The coil');
  const { diameter, turns, pitch, wireDiameter } = input;
  validateTurns(turns);
  validateSolenoidGeometry(diameter, pitch, wireDiameter);
  const c = solenoidCore(diameter, turns, pitch, wireDiameter);
  checkInductance(c.inductance, diameter, turns);
  const notes: DesignNote[] = [];
  const wheelerInductance = wheelerSolenoidInductance(c.r, c.length, turns);
  if (c.length < 0.8 * c.r) {
    notes.push(
      note(
        'validity',
        `Wheeler's formula is within about 1 % only for coils longer than 0.8 × their radius; this one is ${sayNumber(c.length / c.r, 2)} × its radius, so its Wheeler figure is a rough check only (the main result uses Nagaoka's exact coefficient).`,
      ),
    );
  }
  if (turns < 2) {
    notes.push(
      note(
        'validity',
        'With fewer than two turns this is more a loop than a coil: the leads and the pitch angle of the turn, which the model ignores, change the inductance noticeably. Measure it.',
        'turns',
      ),
    );
  }
  if (pitch > 0.5 * c.r) {
    const error = rosaErrorAgainstFilaments(diameter, turns, pitch, wireDiameter);
    const thisCoil = `the result is ${sayPercent(Math.abs(error)).slice(1)} ${error >= 0 ? 'above' : 'below'} a sum of Maxwell's formula over its turns taken as separate circular loops`;
    notes.push(
      note(
        'validity',
        pitch > 2 * c.r
          ? `The pitch (${sayMm(pitch)}) is more than twice the coil radius (${sayMm(c.r)}): the turns act as separate loops and Rosa's corrections no longer hold. For this coil ${thisCoil}; the error grows with pitch (about +20 % at 10 × the radius and +70 % at 100 × for wire a twentieth of the radius, more for thicker wire), and at such a pitch the turns are no longer near circles either. Treat it as an estimate only.`
          : `The pitch (${sayMm(pitch)}) is more than half the coil radius (${sayMm(c.r)}): Rosa's corrections assume turns close together compared with the radius. For this coil ${thisCoil} (in general up to about +1 % at a pitch of half the radius, +2 % at the radius and +6 % at twice it).`,
        'pitch',
      ),
    );
  }
  if (wireDiameter > c.r / 5) {
    notes.push(
      note(
        'validity',
        `The wire (${sayMm(wireDiameter)}) is thick compared with the coil (radius ${sayMm(c.r)}): at radio frequencies the current crowds to the inside of the turns, so the working diameter is smaller and the inductance noticeably lower than this low-frequency value.`,
        'wireDiameter',
      ),
    );
  }
  return {
    inductance: c.inductance,
    currentSheetInductance: c.currentSheetInductance,
    wheelerInductance,
    internalInductance: 0.25 * MU_0 * c.r * turns,
    length: c.length,
    nagaoka: c.nagaoka,
    ks: c.ks,
    km: c.km,
    notes,
  };
}

// ---------------------------------------------------------------------------
// Turns for a wanted inductance

export interface TurnsForInductanceInput {
  /** Wanted inductance, henries. */
  inductance: number;
  /** Mean winding diameter, metres. */
  diameter: number;
  /** Pitch, metres; not needed when closeWound. */
  pitch?: number;
  /** Bare conductor diameter, metres. */
  wireDiameter: number;
  /** Turns touching: pitch = insulatedDiameter (or wireDiameter for bare wire). */
  closeWound?: boolean;
  /** Overall diameter over the insulation, metres (≥ wireDiameter); sets the pitch when close-wound. */
  insulatedDiameter?: number;
}

export interface TurnsForInductanceResult {
  /** Real-valued number of turns that gives exactly the wanted inductance. */
  turns: number;
  /** Winding length for `turns`, metres. */
  length: number;
  /** Inductance at `turns` (equals the wanted value to solver precision), henries. */
  inductance: number;
  /** Pitch used, metres. */
  pitch: number;
  /** `turns` rounded to the nearest half turn (ties upwards), at least 1. */
  practicalTurns: number;
  /** Inductance with `practicalTurns`, henries. */
  practicalInductance: number;
  /** Winding length with `practicalTurns`, metres. */
  practicalLength: number;
  /** Full result for the practical coil (its notes included). */
  practical: SolenoidResult;
  notes: DesignNote[];
}

/**
 * Turns N of a single-layer solenoid that give a wanted inductance, at fixed
 * diameter, pitch and wire: solves L(N) = target for real N ≥ 1 with the model
 * of `solenoidInductance` (L increases monotonically with N at fixed pitch).
 * Root finding: bracket by doubling, then the Illinois variant of regula falsi,
 * safeguarded by bisection, to 1e-12 relative.
 *
 * Practical turns: the nearest whole or half turn (round(2N)/2, ties upwards;
 * never below one turn) — half turns are what a coil with leads leaving on
 * opposite sides has.
 *
 * @param input.inductance wanted L, henries (> 0)
 * @param input.diameter mean winding diameter, metres
 * @param input.pitch turn spacing, metres (ignored when closeWound)
 * @param input.wireDiameter bare wire diameter, metres
 * @param input.closeWound true: pitch = insulatedDiameter ?? wireDiameter
 * @param input.insulatedDiameter diameter over insulation, metres
 * @throws DesignError('inductance') when even one turn has more inductance than wanted,
 *   or when more than ten million turns would be needed.
 */
export function turnsForInductance(input: TurnsForInductanceInput): TurnsForInductanceResult {
  requireObject<TurnsForInductanceInput>('input', input, 'The coil');
  const { inductance: target, diameter, wireDiameter, closeWound, insulatedDiameter } = input;
  requirePositive('inductance', target, 'Inductance', 'H');
  requirePositive('wireDiameter', wireDiameter, 'Wire diameter', 'm');
  if (closeWound !== undefined && typeof closeWound !== 'boolean') {
    throw new DesignError('closeWound', `Close-wound must be true or false (got ${typeof closeWound === 'string' ? `“${closeWound}”` : typeof closeWound}).`);
  }
  const notes: DesignNote[] = [];
  if (insulatedDiameter !== undefined) {
    requirePositive('insulatedDiameter', insulatedDiameter, 'Insulated wire diameter', 'm');
    if (insulatedDiameter < wireDiameter) {
      throw new DesignError(
        'insulatedDiameter',
        `The ${sayMm(insulatedDiameter)} diameter over the insulation is smaller than the ${sayMm(wireDiameter)} bare wire.`,
      );
    }
  }
  let pitch: number;
  if (closeWound) {
    pitch = insulatedDiameter ?? wireDiameter;
    if (input.pitch !== undefined && input.pitch !== pitch) {
      notes.push(note('info', `Close-wound: the pitch is the wire's overall diameter, ${sayMm(pitch)}; the pitch entered was not used.`, 'pitch'));
    }
  } else {
    if (input.pitch === undefined) {
      throw new DesignError('pitch', 'Give the pitch (turn spacing), or choose close-wound.');
    }
    pitch = requirePositive('pitch', input.pitch, 'Pitch', 'm');
    if (insulatedDiameter !== undefined && pitch < insulatedDiameter) {
      throw new DesignError(
        'pitch',
        `pitch ${sayMm(pitch)} is smaller than the wire's ${sayMm(insulatedDiameter)} diameter over its insulation: turns would overlap.`,
      );
    }
  }
  validateSolenoidGeometry(diameter, pitch, wireDiameter);

  const lOf = (n: number) => solenoidCore(diameter, n, pitch, wireDiameter).inductance;
  const l1 = checkInductance(lOf(1), diameter, 1);
  // (a target within rounding of one turn's inductance is one turn)
  if (target < l1 * (1 - 1e-12)) {
    throw new DesignError(
      'inductance',
      `${sayQuantity(target, 'H')} is less than a single turn of this diameter and wire gives (${sayQuantity(l1, 'H')}): use a smaller diameter or another kind of inductor.`,
    );
  }
  // Bracket by doubling.
  let lo = 1;
  let flo = Math.min(0, l1 - target);
  let hi = 2;
  let fhi = lOf(hi) - target;
  while (fhi < 0) {
    lo = hi;
    flo = fhi;
    hi *= 2;
    if (hi > 1e7) {
      throw new DesignError(
        'inductance',
        `${sayQuantity(target, 'H')} would need more than ten million turns on this diameter: use a larger diameter, a multilayer winding or a magnetic core.`,
      );
    }
    fhi = lOf(hi) - target;
  }
  const turns = solveMonotone(lOf, target, lo, flo, hi, fhi);
  const result = solenoidCore(diameter, turns, pitch, wireDiameter);
  const practicalTurns = Math.max(1, Math.floor(2 * turns + 0.5) / 2);
  const practical = solenoidInductance({ diameter, turns: practicalTurns, pitch, wireDiameter });
  return {
    turns,
    length: result.length,
    inductance: result.inductance,
    pitch,
    practicalTurns,
    practicalInductance: practical.inductance,
    practicalLength: practical.length,
    practical,
    notes: [...notes, ...practical.notes],
  };
}

/**
 * Root of f(n) = g(n) − target on [lo, hi] for increasing g: Illinois regula falsi
 * with a bisection safeguard, to 1e-12 relative in n.
 */
function solveMonotone(g: (n: number) => number, target: number, lo: number, flo: number, hi: number, fhi: number): number {
  if (flo === 0) return lo;
  if (fhi === 0) return hi;
  let side = 0;
  for (let i = 0; i < 200; i++) {
    let x = (lo * fhi - hi * flo) / (fhi - flo);
    if (!(x > lo && x < hi)) x = 0.5 * (lo + hi);
    const fx = g(x) - target;
    if (fx === 0) return x;
    if (fx < 0) {
      lo = x;
      flo = fx;
      if (side === -1) fhi /= 2;
      side = -1;
    } else {
      hi = x;
      fhi = fx;
      if (side === 1) flo /= 2;
      side = 1;
    }
    if (hi - lo <= 1e-12 * hi) break;
  }
  return (lo * fhi - hi * flo) / (fhi - flo);
}
