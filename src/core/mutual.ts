/**
 * Mutual inductance: two coaxial circular loops (Maxwell's formula), two
 * coaxial windings as sums of loops, and the sections of a tapped
 * single-layer solenoid.
 *
 * Maxwell's formula for two coaxial circular filaments of radii a and b whose
 * planes are z apart (Maxwell, *A Treatise on Electricity and Magnetism*,
 * 1873, vol. 2, art. 701, article number from memory; Grover, *Inductance
 * Calculations*, 1946, chapter on circular filaments), in its usual form
 *   M = μ0 √(ab) [(2/k − k) K(k) − (2/k) E(k)],   k² = 4ab / ((a + b)² + z²),
 * is evaluated here in Maxwell's second (Landen-transformed) form
 *   M = μ0 (r1 + r2) [K(k1) − E(k1)],   k1 = (r1 − r2)/(r1 + r2),
 * r1 = √((a + b)² + z²) and r2 = √((a − b)² + z²) the greatest and least
 * distances between the circles. With K − E = k1² D(k1²) (D from the AGM,
 * `elliptic.ts`), k1 = 4ab/(r1 + r2)² and 1 − k1² = 4 r1 r2/(r1 + r2)², no
 * step subtracts nearly equal numbers: distant loops (k1 → 0, where the usual
 * form loses a digit per factor of ten in distance) and close loops
 * (k1 → 1) keep full precision.
 *
 * Tapped solenoid: the sections' inductances come from the same model the
 * core uses for a whole coil (`solenoid.ts`: Nagaoka's current sheet with
 * Rosa's round-wire corrections; Nagaoka 1909, Rosa 1907, Grover 1946). Any
 * contiguous run of turns of a uniform single-layer coil is itself such a
 * solenoid, so its self-inductance F(ℓ) depends only on its length ℓ in
 * turns, and the mutual inductance of two runs [a, b) and [c, d) follows from
 * the identity for a translation-invariant sum over pairs of turns
 *   M = [F(d − a) − F(c − a) − F(d − b) + F(c − b)] / 2,
 * which for a single tap (lower run [0, n), upper [n, N)) is the familiar
 * M = (L − L1 − L2)/2 (Grover 1946, on the inductance of coils in series).
 * So L1 + L2 + 2M equals the whole coil's inductance by construction. A run
 * shorter than one turn (a tap within the end turn) is taken as that share of
 * one turn, F(ℓ) = ℓ F(1) for ℓ < 1: the flux a part turn links is its share
 * of the whole turn's (circular turns), and its own inductance is taken in the
 * same proportion (an estimate; the part turn's leakage is small beside the
 * rest). Validity: that of `solenoidInductance` (close-wound or moderately
 * spaced turns, p ≲ r/2; no core or screen), and high-Q use: the tap draws
 * little current compared with the tank's circulating current.
 */
import { MU_0 } from './constants';
import { designCoil, type DesignCoilResult, type SolenoidCoilSpec } from './coil';
import { ellipticFromComplement } from './elliptic';
import { DesignError, requireFinite, requireFiniteResult, requireInRange, requireNonNegative, requireObject, requirePositive, withinSpec } from './errors';
import { nagaokaCoefficient, rosaKm, rosaKs } from './solenoid';
import { note, type DesignNote } from './notes';
import { sayNumber } from './text';

// ---------------------------------------------------------------------------
// Two coaxial loops

/**
 * Maxwell's formula without input checks: a, b > 0, z ≥ 0 finite; the
 * distances are scaled by the largest of the three so that no square
 * overflows or underflows needlessly. NaN when the circles coincide.
 */
function maxwell(a: number, b: number, z: number): number {
  const s = Math.max(a, b, z);
  const x = a / s;
  const y = b / s;
  const h = z / s;
  const r1 = Math.hypot(x + y, h);
  const r2 = Math.hypot(x - y, h);
  const sum = r1 + r2;
  const k1 = (4 * x * y) / (sum * sum);
  const mc = (4 * r1 * r2) / (sum * sum);
  if (!(mc > 0)) return Number.NaN;
  const m = Math.min(1, k1 * k1);
  const { d } = ellipticFromComplement(m, Math.min(1, mc));
  return MU_0 * s * sum * m * d;
}

/**
 * Mutual inductance of two coaxial circular filaments (Maxwell's formula,
 * exact from complete elliptic integrals, in its Landen-transformed form; see
 * the module header):
 *   M = μ0 (r1 + r2) [K(k1) − E(k1)],  k1 = (r1 − r2)/(r1 + r2),
 *   r1 = √((a + b)² + z²),  r2 = √((a − b)² + z²).
 * Limits: close loops of equal radius (z ≪ a) M → μ0 a [ln(8a/z) − 2];
 * distant loops (z ≫ a, b) M → μ0 π a² b² / (2 z³) (Grover 1946).
 * For round wires, use the distance between the wires' centres; the result is
 * then the mutual inductance of the two rings to a very good approximation
 * while the wires do not touch.
 * @param radiusA radius a of the first loop, metres (> 0)
 * @param radiusB radius b of the second loop, metres (> 0)
 * @param separation axial distance z between the loops' planes, metres (≥ 0; the sign is ignored)
 * @returns M in henries (> 0; it may underflow to 0 for loops absurdly far apart)
 * @throws DesignError for a radius that is not a positive finite number, a
 *   separation that is not finite, or two loops that coincide (same radius, same plane)
 */
export function mutualInductanceCoaxialLoops(radiusA: number, radiusB: number, separation: number): number {
  const a = requirePositive('radiusA', radiusA, 'Radius of the first loop', 'm');
  const b = requirePositive('radiusB', radiusB, 'Radius of the second loop', 'm');
  const z = Math.abs(requireFinite('separation', separation, 'Separation of the loops'));
  const m = maxwell(a, b, z);
  if (Number.isNaN(m)) {
    throw new DesignError('separation', 'The two loops have the same radius and lie in the same plane: they are one circle, and two filaments on top of each other have no finite mutual inductance. Separate them, or use the self-inductance of one loop.');
  }
  return requireFiniteResult('radiusA', m, 'The mutual inductance');
}

// ---------------------------------------------------------------------------
// Coaxial windings as sums of loops

/** A single-layer winding for the loop sum: turns as circles at a pitch along the common axis. */
export interface CoaxialWinding {
  /** Mean radius of the turns, metres (> 0). */
  radius: number;
  /** Axial position of turn 0's plane, metres (any sign). */
  position: number;
  /** Centre-to-centre distance of adjacent turns, metres (> 0). */
  pitch: number;
  /** Number of turns in the run (> 0; a fractional run weighs its part turns by their share). */
  turns: number;
  /** Where the run starts, in turns from turn 0 (≥ 0, default 0): a run from 2.5 to 6 turns has firstTurn 2.5, turns 3.5. */
  firstTurn?: number;
}

/** Each circle a run touches, at its plane, weighted by the share of that turn the run covers. */
function loopsOf(w: { position: number; pitch: number; turns: number; firstTurn: number }): Array<{ z: number; weight: number }> {
  const start = w.firstTurn;
  const end = w.firstTurn + w.turns;
  const out: Array<{ z: number; weight: number }> = [];
  for (let i = Math.floor(start); i < end; i++) {
    const weight = Math.min(i + 1, end) - Math.max(i, start);
    if (weight > 0) out.push({ z: w.position + i * w.pitch, weight });
  }
  return out;
}

const MAX_LOOPS = 100_000;

function checkWinding(field: string, w: unknown): Required<CoaxialWinding> {
  const o = requireObject<CoaxialWinding>(field, w, 'The winding');
  const radius = withinSpec(field, () => requirePositive('radius', o.radius, 'Radius of the turns', 'm'));
  const position = withinSpec(field, () => requireFinite('position', o.position, 'Position of the first turn'));
  const pitch = withinSpec(field, () => requirePositive('pitch', o.pitch, 'Pitch', 'm'));
  const turns = withinSpec(field, () => requirePositive('turns', o.turns, 'Number of turns'));
  const firstTurn = o.firstTurn === undefined ? 0 : withinSpec(field, () => requireNonNegative('firstTurn', o.firstTurn, 'First turn'));
  if (turns + firstTurn > MAX_LOOPS) throw new DesignError(`${field}.turns`, `More than ${sayNumber(MAX_LOOPS)} turns is beyond what the loop-by-loop sum is for.`);
  return { radius, position, pitch, turns, firstTurn };
}

/**
 * Mutual inductance of two coaxial single-layer windings as the sum of
 * Maxwell's formula over every pair of turns, each turn taken as a circle in
 * its plane (turn i of a run at position + i·pitch; a part turn counts with
 * its share): M = Σᵢ Σⱼ wᵢ wⱼ M_Maxwell(a, b, |zᵢ − zⱼ|).
 * Exact for circular filaments; for round wires it is the mutual inductance of
 * the rings at their centres, good while no two wires touch. The helix's
 * pitch angle and the leads are ignored.
 * @param a first winding (radius, position, pitch in metres; turns)
 * @param b second winding
 * @returns henries
 * @throws DesignError naming the winding's field ('a.radius', 'b.pitch', …), or 'b.position'
 *   when two turns of the same radius lie in the same plane
 */
export function mutualInductanceCoaxialWindings(a: CoaxialWinding, b: CoaxialWinding): number {
  const wa = checkWinding('a', a);
  const wb = checkWinding('b', b);
  const la = loopsOf(wa);
  const lb = loopsOf(wb);
  let sum = 0;
  for (const p of la) {
    for (const q of lb) {
      const m = maxwell(wa.radius, wb.radius, Math.abs(p.z - q.z));
      if (Number.isNaN(m)) {
        throw new DesignError('b.position', 'A turn of one winding lies on a turn of the other (same radius, same plane): move one winding or change its radius.');
      }
      sum += p.weight * q.weight * m;
    }
  }
  return requireFiniteResult('a.radius', sum, 'The mutual inductance');
}

/** Loop-sum core for callers that have checked their windings: per-loop mutuals of `b`'s loops with all of `a`. */
export function loopMutuals(radiusA: number, zsA: ReadonlyArray<{ z: number; weight: number }>, radiusB: number, zB: number): number {
  let sum = 0;
  for (const p of zsA) sum += p.weight * maxwell(radiusA, radiusB, Math.abs(p.z - zB));
  return sum;
}

export { loopsOf };

// ---------------------------------------------------------------------------
// Runs of turns of one single-layer solenoid

/** The geometry of a wound single-layer coil, SI units (internal to the core). */
export interface SolenoidGeometry {
  /** Mean radius r, metres. */
  radius: number;
  /** Pitch p, metres. */
  pitch: number;
  /** Bare wire diameter, metres. */
  wireDiameter: number;
  /** Overall wire diameter over the insulation, metres (the bare diameter for bare wire). */
  insulatedDiameter?: number;
  /** Turns as wound N. */
  turns: number;
}

/**
 * Self-inductance of a run of ℓ turns of the coil (low frequency): Nagaoka's
 * current sheet with Rosa's corrections, the same arithmetic as
 * `solenoidInductance`, for ℓ ≥ 1; ℓ·F(1) below one turn (module header).
 */
export function runInductance(g: SolenoidGeometry, length: number): number {
  if (!(length > 0)) return 0;
  if (length < 1) return length * runInductance(g, 1);
  const r = g.radius;
  const l = length * g.pitch;
  const nagaoka = nagaokaCoefficient(2 * r, l);
  const sheet = nagaoka * MU_0 * Math.PI * (r * length) * ((r * length) / l);
  return sheet - MU_0 * r * length * (rosaKs(g.pitch, g.wireDiameter) + rosaKm(length));
}

/**
 * Mutual inductance of two runs [a, b) and [c, d) of the same coil (turns
 * counted from the cold end, a ≤ b ≤ c ≤ d), from the run inductances:
 * M = [F(d − a) − F(c − a) − F(d − b) + F(c − b)] / 2 (module header).
 */
export function runMutual(g: SolenoidGeometry, a: number, b: number, c: number, d: number, f: (len: number) => number = (len) => runInductance(g, len)): number {
  return 0.5 * (f(d - a) - f(c - a) - f(d - b) + f(c - b));
}

// ---------------------------------------------------------------------------
// Tapped coil

/** What `tappedCoilSections` takes. */
export interface TappedCoilInput {
  /** The coil as on the Coil bench: a single-layer solenoid with `turns` (or an `inductance`, wound to the nearest half turn). */
  coil: SolenoidCoilSpec;
  /** The tap, in turns counted from the cold (earthy) end: 0.01 ≤ tap ≤ turns; half turns and any real value allowed. */
  tapTurns: number;
  /** Working frequency, Hz: the sections then lose the skin effect's share of the wire's internal inductance, as `designCoil` does. */
  frequency?: number;
}

/** The two sections of a tapped coil and what they give. Henries unless stated. */
export interface TappedCoilSections {
  /** Turns of the whole coil as wound. */
  turns: number;
  /** The tap, turns from the cold end (lower section's turns). */
  tapTurns: number;
  /** Whole coil, L = L1 + L2 + 2M (equals `designCoil`'s inductance, or its inductance at the frequency). */
  inductance: number;
  /** Lower section L1, tap to cold end. */
  lowerInductance: number;
  /** Upper section L2, top (hot end) to tap (0 with the tap at the top). */
  upperInductance: number;
  /** Mutual inductance M of the two sections (0 with the tap at the top). */
  mutualInductance: number;
  /** k = M/√(L1 L2) (0 with the tap at the top). */
  couplingCoefficient: number;
  /** Voltage step-up from the tap to the top at resonance, (L1 + L2 + 2M)/(L1 + M) (`tappedInductorRatio`). */
  stepUp: number;
  /** The ideal-transformer guess N/n, for comparison. */
  turnsRatio: number;
  /** Leakage inductance seen at the tap, (L1 L2 − M²)/L: the reactance ω·this appears in series with the tap at resonance. */
  leakageInductance: number;
  /** The coil as wound (designCoil's result; at the frequency when one was given). */
  coil: DesignCoilResult;
  notes: DesignNote[];
}

/** A checked single-layer coil for the match designs: geometry, wound result, and the skin effect's loss of inductance. */
export interface WoundSolenoid {
  geometry: SolenoidGeometry;
  coil: DesignCoilResult;
  /** Low-frequency inductance of the whole coil, H. */
  inductance: number;
  /** Inductance lost per turn to the skin effect at the frequency (¼ μ0 r (1 − ratio)); 0 without a frequency. H per turn. */
  skinLossPerTurn: number;
}

/**
 * Winds a single-layer coil from its spec (designCoil) and returns its
 * geometry. Errors are named by their spec path under `coil.`.
 * @throws DesignError('coil.form') for anything but a single-layer solenoid
 */
export function woundSolenoid(spec: unknown, frequency?: number): WoundSolenoid {
  const s = requireObject<SolenoidCoilSpec>('coil', spec, 'The coil');
  if (s.form !== 'solenoid') {
    throw new DesignError('coil.form', 'A tap or a link is worked out from a single-layer solenoid\'s geometry: give the coil as a single-layer solenoid (form "solenoid").');
  }
  if (frequency !== undefined) requireInRange('frequency', frequency, 1e-3, 1e12, 'The frequency', 'Hz');
  const coil = withinSpec('coil', () => designCoil({ ...s, sweepPoints: undefined, frequency } as SolenoidCoilSpec));
  const pitch = coil.pitch as number;
  const geometry: SolenoidGeometry = { radius: s.diameter / 2, pitch, wireDiameter: s.wire.diameter, insulatedDiameter: s.wire.insulatedDiameter ?? s.wire.diameter, turns: coil.turns };
  const lf = coil.inductanceAtFrequency ?? coil.inductance;
  return { geometry, coil, inductance: coil.inductance, skinLossPerTurn: (coil.inductance - lf) / coil.turns };
}

/** Low-frequency inductance of a run of the wound coil (the whole coil's own figure for a run of all its turns). */
export function runOf(w: WoundSolenoid, length: number): number {
  return length >= w.geometry.turns ? w.inductance : runInductance(w.geometry, length);
}

/** L1, L2, M of a coil tapped at n turns (0 < n ≤ N), low frequency then less the skin effect's share. */
export function sectionsAt(w: WoundSolenoid, n: number): { lower: number; upper: number; mutual: number; whole: number } {
  const N = w.geometry.turns;
  const whole = w.inductance - N * w.skinLossPerTurn;
  if (n >= N) return { lower: whole, upper: 0, mutual: 0, whole };
  const lower = runOf(w, n);
  const upper = runOf(w, N - n);
  const mutual = 0.5 * (w.inductance - lower - upper);
  return { lower: lower - n * w.skinLossPerTurn, upper: upper - (N - n) * w.skinLossPerTurn, mutual, whole };
}

/** The least tap taken, turns from the cold end (a hundredth of a turn: closer than any tap can be made). */
export const MIN_TAP = 0.01;

/** Checks a tap position against the coil: 0.01 ≤ tap ≤ N. */
export function checkTap(field: string, tap: unknown, turns: number, what = 'The tap'): number {
  const n = requireFinite(field, tap, what);
  if (n > turns * (1 + 1e-12)) {
    throw new DesignError(field, `${what} at ${sayNumber(n, 4)} turns is beyond the coil: it has only ${sayNumber(turns, 4)} turns (count from the cold end).`);
  }
  if (!(n >= MIN_TAP)) {
    throw new DesignError(field, `${what} must be above the cold end: give the turns from the cold end to the tap, at least ${sayNumber(MIN_TAP)} (got ${sayNumber(n, 4)}).`);
  }
  return Math.min(n, turns);
}

/** Notes on a tap's position that the section model leaves open. */
export function tapNotes(field: string, n: number, turns: number): DesignNote[] {
  const notes: DesignNote[] = [];
  if (n < 1 || (turns - n < 1 && turns - n > 0)) {
    notes.push(note('validity', `The tap is within the ${n < 1 ? 'first turn from the cold end' : 'last turn before the top'}: the part turn is taken as its share of a whole turn (exact for the flux it links with circular turns, an estimate for its own inductance). Expect to trim the tap on the bench.`, field));
  }
  if (Math.abs(2 * n - Math.round(2 * n)) > 1e-9) {
    notes.push(note('info', `A tap at ${sayNumber(n, 4)} turns: in practice taps sit at whole or half turns (where the wire crosses the side the leads leave from, or the opposite side).`, field));
  }
  return notes;
}

/**
 * Voltage step-up of a tapped inductor from the tap to the top, at the tank's
 * resonance, for a high-Q tank (the tap draws little current compared with
 * the circulating current I): the lower section carries V1 = jω(L1 + M) I and
 * the whole coil V = jω(L1 + L2 + 2M) I, so
 *   V/V1 = (L1 + L2 + 2M)/(L1 + M).
 * A resistance R at the tap is then seen across the whole tank as
 * (V/V1)² R. Derived here from the coupled-coil equations (Terman, *Radio
 * Engineers' Handbook*, 1943, treats the tapped coil as an autotransformer in
 * the same way). With tight coupling (M² = L1 L2) it is the turns ratio N/n;
 * the exact tap impedance adds the leakage reactance jω(L1 L2 − M²)/L.
 * @param sections.lowerInductance L1, tap to cold end, henries (> 0)
 * @param sections.upperInductance L2, top to tap, henries (≥ 0; 0 with the tap at the top)
 * @param sections.mutualInductance M between them, henries (|M| ≤ √(L1 L2))
 * @returns the step-up (≥ 1 for M ≥ −L2 …; 1 with the tap at the top)
 * @throws DesignError for a coupling coefficient above 1, or L1 + M ≤ 0
 */
export function tappedInductorRatio(sections: { lowerInductance: number; upperInductance: number; mutualInductance: number }): number {
  const s = requireObject<{ lowerInductance: number; upperInductance: number; mutualInductance: number }>('sections', sections, 'The sections');
  const l1 = requirePositive('lowerInductance', s.lowerInductance, 'The lower section\'s inductance', 'H');
  const l2 = requireNonNegative('upperInductance', s.upperInductance, 'The upper section\'s inductance', 'H');
  const m = requireFinite('mutualInductance', s.mutualInductance, 'The mutual inductance');
  // |M| ≤ √(L1 L2), compared as |M|/√L1 ≤ √L2 so that nothing overflows
  if (Math.abs(m) / Math.sqrt(l1) > Math.sqrt(l2) * (1 + 1e-12)) {
    throw new DesignError('mutualInductance', `A mutual inductance of ${sayNumber(m)} H between sections of ${sayNumber(l1)} H and ${sayNumber(l2)} H is a coupling coefficient above 1, which no pair of windings has.`);
  }
  const linked = l1 + m;
  if (!(linked > 0)) {
    throw new DesignError('mutualInductance', 'The lower section links no net flux (L1 + M ≤ 0): the tap would see no voltage. Check the sign of the mutual inductance.');
  }
  return requireFiniteResult('lowerInductance', (l1 + l2 + 2 * m) / linked, 'The step-up');
}

/**
 * The sections of a tapped single-layer solenoid: lower L1 (tap to cold end),
 * upper L2 (top to tap) and their mutual inductance M, from the coil's
 * geometry (the run-inductance model of the module header: Nagaoka and Rosa
 * as in `solenoidInductance`), with the step-up they give and the
 * ideal-transformer guess N/n beside it.
 * @param input.coil a single-layer solenoid spec (as `designCoil` takes it; turns or inductance)
 * @param input.tapTurns turns from the cold end to the tap, 0.01 ≤ n ≤ N (any real value)
 * @param input.frequency Hz, optional: the sections at that frequency (skin effect), as designCoil's inductanceAtFrequency
 * @throws DesignError('tapTurns') for a tap beyond the coil or at the cold end; 'coil.…' for the coil
 */
export function tappedCoilSections(input: TappedCoilInput): TappedCoilSections {
  const i = requireObject<TappedCoilInput>('input', input, 'The tapped coil');
  const w = woundSolenoid(i.coil, i.frequency);
  const N = w.geometry.turns;
  if (N < 2) throw new DesignError('coil.turns', `A tapped coil needs at least two turns (this one has ${sayNumber(N)}).`);
  const n = checkTap('tapTurns', i.tapTurns, N);
  const s = sectionsAt(w, n);
  const k = s.upper > 0 ? s.mutual / Math.sqrt(s.lower * s.upper) : 0;
  if (!(k < 1)) throw new DesignError('tapTurns', 'The sections come out coupled more tightly than is possible: the coil is outside the range of the section model (very wide pitch or very short coil).');
  return {
    turns: N,
    tapTurns: n,
    inductance: s.whole,
    lowerInductance: s.lower,
    upperInductance: s.upper,
    mutualInductance: s.mutual,
    couplingCoefficient: k,
    stepUp: tappedInductorRatio({ lowerInductance: s.lower, upperInductance: s.upper, mutualInductance: s.mutual }),
    turnsRatio: N / n,
    leakageInductance: (s.lower * s.upper - s.mutual * s.mutual) / s.whole,
    coil: w.coil,
    notes: [...w.coil.notes, ...tapNotes('tapTurns', n, N)],
  };
}
