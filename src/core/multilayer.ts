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
 * smallest, within 2 % up to 2 ×; beyond that the error grows with the ratio,
 * to about 4 % at 3 ×, 10 % at 6 ×, 17 % at 12 × and 23 % at 24 × (long deep
 * windings read high; long thin windings and flat deep ones low). For a very
 * long winding reaching nearly to the axis it tends to +33 %, since Wheeler's
 * long-coil limit is 0.886 μ0πa²N²/b against the exact μ0πN²(a² − ac/3 + c²/12)/b.
 * `errorBound` states the size for each coil; the note fires beyond 2 ×.
 * The formula treats the winding as evenly filled; it says nothing of the wire's
 * insulation or spacing except through a, b and c.
 */
import { DesignError, requireFiniteResult, requireObject, requirePositive } from './errors';
import { note, type DesignNote } from './notes';
import { sayMm, sayNumber } from './text';

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
  /** Size of Wheeler's error to expect at this term ratio (fraction, either sign): our numerical check, see the module header. */
  errorBound: number;
  notes: DesignNote[];
}

function validate(g: MultilayerGeometry): void {
  requirePositive('diameter', g.diameter, 'Mean winding diameter', 'm');
  requirePositive('length', g.length, 'Winding length', 'm');
  requirePositive('windingDepth', g.windingDepth, 'Winding depth', 'm');
  if (g.windingDepth >= g.diameter) {
    throw new DesignError(
      'windingDepth',
      `A winding depth of ${sayMm(g.windingDepth)} is not less than the ${sayMm(g.diameter)} mean diameter: the winding would reach the axis.`,
    );
  }
}

/** L per turn² in henries: 0.8e-6 a² / (0.0254 (6a + 9b + 10c)) with a, b, c in metres. */
function perTurnSquared(g: MultilayerGeometry): { al: number; termRatio: number } {
  const a = g.diameter / 2;
  const t = [6 * a, 9 * g.length, 10 * g.windingDepth];
  const denominator = t[0] + t[1] + t[2];
  const al = (0.8e-6 / METRES_PER_INCH) * a * (a / denominator);
  const termRatio = Math.max(...t) / Math.min(...t);
  if (!(al > 0 && Number.isFinite(al) && Number.isFinite(termRatio))) {
    throw new DesignError(g.length > g.diameter ? 'length' : 'diameter', 'The inductance is beyond what can be computed with these values: they are far outside anything that can be wound.');
  }
  return { al, termRatio };
}

/**
 * Largest error of Wheeler's multilayer formula we found at a given ratio of its
 * denominator terms (our numerical check of Maxwell's formula over the winding
 * section; module header), interpolated in ln(ratio); 33 % beyond 24 ×.
 */
const ERROR_BOUNDS: readonly (readonly [number, number])[] = [
  [1, 0.013], [1.5, 0.013], [2, 0.02], [3, 0.05], [6, 0.12], [12, 0.2], [24, 0.27],
];

function errorBoundFor(termRatio: number): number {
  const last = ERROR_BOUNDS[ERROR_BOUNDS.length - 1];
  if (termRatio >= last[0]) return 0.33;
  for (let i = 1; i < ERROR_BOUNDS.length; i++) {
    const [x1, y1] = ERROR_BOUNDS[i];
    if (termRatio <= x1) {
      const [x0, y0] = ERROR_BOUNDS[i - 1];
      return y0 + ((y1 - y0) * Math.log(termRatio / x0)) / Math.log(x1 / x0);
    }
  }
  return 0.33;
}

function validityNotes(termRatio: number, errorBound: number): DesignNote[] {
  if (termRatio <= 2) return [];
  return [
    note(
      'validity',
      `Wheeler's multilayer formula is within about 1–2 % when 6 × radius, 9 × length and 10 × depth are within a factor of two of each other; here the largest is ${sayNumber(termRatio, 2)} × the smallest, and at that ratio we found errors of up to about ${Math.round(errorBound * 100)} % against a numerical integration of Maxwell's formula over the winding (long deep windings read high, long thin and flat deep ones low). Measure it if that matters.`,
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
  requireObject<MultilayerInput>('input', input, 'The coil');
  requirePositive('turns', input.turns, 'Turns');
  validate(input);
  const { al, termRatio } = perTurnSquared(input);
  const errorBound = errorBoundFor(termRatio);
  return {
    inductance: requireFiniteResult('turns', al * input.turns * input.turns, 'The inductance'),
    termRatio,
    errorBound,
    notes: validityNotes(termRatio, errorBound),
  };
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
  /** Size of Wheeler's error to expect at this term ratio (fraction); see `MultilayerResult`. */
  errorBound: number;
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
  requireObject<MultilayerTurnsInput>('input', input, 'The coil');
  requirePositive('inductance', input.inductance, 'Inductance', 'H');
  validate(input);
  const { al, termRatio } = perTurnSquared(input);
  const turns = requireFiniteResult('inductance', Math.sqrt(input.inductance) / Math.sqrt(al), 'The number of turns');
  const practicalTurns = Math.max(1, Math.round(turns));
  const errorBound = errorBoundFor(termRatio);
  return {
    turns,
    practicalTurns,
    practicalInductance: requireFiniteResult('inductance', al * practicalTurns * practicalTurns, 'The inductance'),
    termRatio,
    errorBound,
    notes: validityNotes(termRatio, errorBound),
  };
}

/**
 * Turns of round wire that fit a rectangular winding section wound layer on
 * layer (square stacking): ⌊b/d⌋ × ⌊c/d⌋ for winding length b, depth c and
 * overall wire diameter d. A random ("scramble") winding holds somewhat fewer.
 * Geometry only (common practice, no published source).
 * @param length winding length b (m)
 * @param windingDepth radial depth c (m)
 * @param insulatedDiameter the wire's overall diameter, insulation included (m); for bare wire, the bare diameter
 */
export function multilayerCapacity(length: number, windingDepth: number, insulatedDiameter: number): number {
  requirePositive('length', length, 'The winding length', 'm');
  requirePositive('windingDepth', windingDepth, 'The winding depth', 'm');
  requirePositive('insulatedDiameter', insulatedDiameter, 'The wire’s overall diameter', 'm');
  return requireFiniteResult(
    'insulatedDiameter',
    Math.floor(length / insulatedDiameter) * Math.floor(windingDepth / insulatedDiameter),
    'The number of turns that fit',
  );
}
