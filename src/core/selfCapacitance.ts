/**
 * Self-capacitance and self-resonance of a single-layer solenoid, and the
 * apparent inductance and resistance it causes below self-resonance.
 *
 * Models and sources:
 * - Medhurst, "H.F. resistance and self-capacitance of single-layer
 *   solenoids", Wireless Engineer 24 (1947), pp. 35–43 and 80–92: measured
 *   self-capacitance C[pF] = H · D[cm], H a function of length/diameter l/D only
 *   (nearly independent of pitch), tabulated for l/D from 0.1 to 50; Medhurst
 *   claimed about 5 % for his data. His coils were measured in one particular
 *   mounting; surroundings (a chassis, a screen can, a former's dielectric)
 *   change the value.
 * - The fitted form H ≈ 0.1126 l/D + 0.08 + 0.27/√(l/D), as commonly cited
 *   (attributed to Medhurst). It is used here only to extend the table beyond
 *   its range, scaled to meet the table's end values, with a 'validity' note.
 * - Apparent (effective) inductance and resistance of a coil with distributed
 *   capacitance, below self-resonance, in the lumped model L ∥ C:
 *   L' = L/(1 − ω²LC), R' = R/(1 − ω²LC)² (Terman, *Radio Engineers'
 *   Handbook*, 1943, §2, valid for Q ≫ 1). The lumped picture fails as the
 *   frequency nears self-resonance, where the winding behaves as a helical
 *   transmission line; we warn above half the self-resonant frequency.
 *
 * The value of H is interpolated through the table points by a monotone
 * (Fritsch–Carlson) cubic in ln(l/D): smooth, exact at the points, and with
 * no overshoot between them.
 */
import { TWO_PI } from './constants';
import { DesignError, requireFiniteResult, requireNonNegative, requireObject, requirePositive } from './errors';
import { note, type DesignNote } from './notes';
import { sayNumber, sayQuantity } from './text';

/** One point of Medhurst's table: l/D, H (pF per cm of diameter), and where the value was taken from. */
export interface MedhurstPoint {
  readonly lengthOverDiameter: number;
  readonly h: number;
  /** 'published' = copied from a cited reference list; 'from memory' = recalled without a source at hand. */
  readonly source: 'published' | 'from memory';
}

/**
 * Medhurst 1947, Table of H against l/D. The four 'published' points are as
 * given in the project's reference list (l/D 0.5, 1, 2, 5). The other points are
 * recalled from memory (Medhurst's table as widely reproduced); they agree with
 * the independent fitted form within 8 % and should be checked against the
 * paper when it is at hand.
 */
export const MEDHURST_TABLE: readonly MedhurstPoint[] = (
  [
    [0.1, 0.96, 'from memory'],
    [0.15, 0.79, 'from memory'],
    [0.2, 0.7, 'from memory'],
    [0.25, 0.64, 'from memory'],
    [0.3, 0.6, 'from memory'],
    [0.35, 0.57, 'from memory'],
    [0.4, 0.54, 'from memory'],
    [0.45, 0.52, 'from memory'],
    [0.5, 0.5, 'published'], // Medhurst 1947
    [0.6, 0.48, 'from memory'],
    [0.7, 0.47, 'from memory'],
    [0.8, 0.46, 'from memory'],
    [0.9, 0.46, 'from memory'],
    [1.0, 0.46, 'published'], // Medhurst 1947
    [1.5, 0.47, 'from memory'],
    [2.0, 0.5, 'published'], // Medhurst 1947
    [2.5, 0.56, 'from memory'],
    [3.0, 0.61, 'from memory'],
    [3.5, 0.67, 'from memory'],
    [4.0, 0.72, 'from memory'],
    [4.5, 0.77, 'from memory'],
    [5.0, 0.81, 'published'], // Medhurst 1947
    [6.0, 0.92, 'from memory'],
    [7.0, 1.01, 'from memory'],
    [8.0, 1.12, 'from memory'],
    [9.0, 1.22, 'from memory'],
    [10, 1.32, 'from memory'],
    [15, 1.86, 'from memory'],
    [20, 2.36, 'from memory'],
    [25, 2.9, 'from memory'],
    [30, 3.4, 'from memory'],
    [35, 3.94, 'from memory'],
    [40, 4.43, 'from memory'],
    [45, 4.94, 'from memory'],
    [50, 5.5, 'from memory'],
  ] as const
).map(([lengthOverDiameter, h, source]) => ({ lengthOverDiameter, h, source }));

/**
 * The commonly cited fitted form of Medhurst's H: H ≈ 0.1126 x + 0.08 + 0.27/√x, x = l/D.
 * @param lengthOverDiameter x = l/D (> 0)
 * @returns H in pF per cm of coil diameter
 */
export function medhurstFittedH(lengthOverDiameter: number): number {
  requirePositive('lengthOverDiameter', lengthOverDiameter, 'Length-to-diameter ratio');
  const x = lengthOverDiameter;
  return 0.1126 * x + 0.08 + 0.27 / Math.sqrt(x);
}

// Fritsch–Carlson monotone cubic through (ln x_i, H_i), built once.
const knotsX = MEDHURST_TABLE.map((p) => Math.log(p.lengthOverDiameter));
const knotsY = MEDHURST_TABLE.map((p) => p.h);
const knotSlopes = monotoneSlopes(knotsX, knotsY);

function monotoneSlopes(x: readonly number[], y: readonly number[]): number[] {
  const n = x.length;
  const secant: number[] = [];
  for (let i = 0; i < n - 1; i++) secant.push((y[i + 1] - y[i]) / (x[i + 1] - x[i]));
  const m: number[] = new Array(n);
  m[0] = secant[0];
  m[n - 1] = secant[n - 2];
  for (let i = 1; i < n - 1; i++) {
    m[i] = secant[i - 1] * secant[i] <= 0 ? 0 : (secant[i - 1] + secant[i]) / 2;
  }
  for (let i = 0; i < n - 1; i++) {
    if (secant[i] === 0) {
      m[i] = 0;
      m[i + 1] = 0;
      continue;
    }
    const a = m[i] / secant[i];
    const b = m[i + 1] / secant[i];
    const r = a * a + b * b;
    if (r > 9) {
      const t = 3 / Math.sqrt(r);
      m[i] = t * a * secant[i];
      m[i + 1] = t * b * secant[i];
    }
  }
  return m;
}

function interpolateH(u: number): number {
  // u = ln(l/D), inside [knotsX[0], knotsX[last]]
  let lo = 0;
  let hi = knotsX.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (knotsX[mid] <= u) lo = mid;
    else hi = mid;
  }
  const h = knotsX[hi] - knotsX[lo];
  const t = (u - knotsX[lo]) / h;
  const t2 = t * t;
  const t3 = t2 * t;
  return (
    (2 * t3 - 3 * t2 + 1) * knotsY[lo] +
    (t3 - 2 * t2 + t) * h * knotSlopes[lo] +
    (-2 * t3 + 3 * t2) * knotsY[hi] +
    (t3 - t2) * h * knotSlopes[hi]
  );
}

export interface MedhurstH {
  /** H in pF per cm of coil diameter. */
  h: number;
  /** True when l/D is outside Medhurst's table (0.1 … 50) and the value is extrapolated. */
  extrapolated: boolean;
}

/**
 * Medhurst's H(l/D), interpolated in his table; outside 0.1 … 50 the fitted
 * form, scaled to meet the table's end point, extends it.
 * @param lengthOverDiameter l/D (> 0)
 */
export function medhurstH(lengthOverDiameter: number): MedhurstH {
  requirePositive('lengthOverDiameter', lengthOverDiameter, 'Length-to-diameter ratio');
  const first = MEDHURST_TABLE[0];
  const last = MEDHURST_TABLE[MEDHURST_TABLE.length - 1];
  const x = lengthOverDiameter;
  if (x < first.lengthOverDiameter) {
    return { h: (medhurstFittedH(x) * first.h) / medhurstFittedH(first.lengthOverDiameter), extrapolated: true };
  }
  if (x > last.lengthOverDiameter) {
    return { h: (medhurstFittedH(x) * last.h) / medhurstFittedH(last.lengthOverDiameter), extrapolated: true };
  }
  return { h: interpolateH(Math.log(x)), extrapolated: false };
}

export interface SelfCapacitanceResult {
  /** Self-capacitance in farads. */
  selfCapacitance: number;
  /** Medhurst's H used, pF per cm of diameter. */
  h: number;
  notes: DesignNote[];
}

/**
 * Medhurst's self-capacitance of a single-layer solenoid, with notes:
 * C = H(l/D) · D, with C in pF and D in cm (Medhurst 1947), i.e.
 * C[F] = H · D[m] · 1e−10.
 * @param diameter coil diameter D in metres, wire centre to wire centre (> 0)
 * @param length winding length l in metres (> 0)
 * Validity: Medhurst's table covers 0.1 ≤ l/D ≤ 50, about ±5 % for his coils;
 * a 'validity' note is returned outside it.
 */
export function medhurstSelfCapacitance(diameter: number, length: number): SelfCapacitanceResult {
  requirePositive('diameter', diameter, 'Coil diameter', 'm');
  requirePositive('length', length, 'Coil length', 'm');
  const ratio = length / diameter;
  if (!(ratio > 0 && Number.isFinite(ratio))) {
    throw new DesignError('length', 'The length-to-diameter ratio is beyond what can be computed: these values are far outside anything that can be wound.');
  }
  const { h, extrapolated } = medhurstH(ratio);
  const notes: DesignNote[] = [];
  if (extrapolated) {
    notes.push(
      note(
        'validity',
        `Length/diameter ${sayNumber(ratio)} is outside Medhurst's table (0.1 to 50): the self-capacitance is extrapolated with his fitted form and may be well off (the fitted form alone differs from his table by up to 6 % inside it; outside, nobody has checked).`,
        'length',
      ),
    );
  }
  notes.push(
    note('info', "Self-capacitance depends on the surroundings: a nearby chassis, screen can or coil former adds to Medhurst's value."),
  );
  return { selfCapacitance: requireFiniteResult('diameter', h * diameter * 1e-10, 'The self-capacitance'), h, notes };
}

/**
 * Medhurst's self-capacitance C = H(l/D) · D (C in pF, D in cm; Medhurst 1947).
 * @param diameter coil diameter D in metres, wire centre to wire centre (> 0)
 * @param length winding length l in metres (> 0)
 * @returns self-capacitance in farads. Table range 0.1 ≤ l/D ≤ 50 (±5 %);
 * use `medhurstSelfCapacitance` for the notes when outside it.
 */
export function medhurstCapacitance(diameter: number, length: number): number {
  return medhurstSelfCapacitance(diameter, length).selfCapacitance;
}

/**
 * Self-resonant frequency in the lumped model, f_sr = 1/(2π √(L C_self)).
 * @param inductance L in henries (> 0)
 * @param selfCapacitance C in farads (> 0)
 * @returns hertz. A lumped estimate: a single-layer solenoid's true first
 * resonance is that of a helical line and may differ by tens of percent.
 */
export function selfResonantFrequency(inductance: number, selfCapacitance: number): number {
  requirePositive('inductance', inductance, 'Inductance', 'H');
  requirePositive('selfCapacitance', selfCapacitance, 'Self-capacitance', 'F');
  // 1/(2π √L √C): the product L·C cannot under- or overflow on its own
  const f = 1 / (TWO_PI * Math.sqrt(inductance) * Math.sqrt(selfCapacitance));
  if (!(f > 0 && Number.isFinite(f))) {
    throw new DesignError(inductance < selfCapacitance ? 'inductance' : 'selfCapacitance', 'The self-resonant frequency is beyond what can be computed with these values: they are far outside anything that can be built.');
  }
  return f;
}

export interface ApparentCoilInput {
  /** True (low-frequency) inductance L in henries (> 0). */
  inductance: number;
  /** True series loss resistance R at this frequency in ohms (≥ 0). */
  resistance: number;
  /** Self-capacitance C in farads (> 0). */
  selfCapacitance: number;
  /** Frequency in hertz (> 0, below self-resonance). */
  frequency: number;
}

export interface ApparentCoil {
  /** Apparent (effective) inductance L/(1 − ω²LC), henries. */
  apparentInductance: number;
  /** Apparent resistance R/(1 − ω²LC)², ohms. */
  apparentResistance: number;
  /** Apparent Q = ωL'/R' = Q(1 − ω²LC) (Infinity when R = 0). */
  apparentQ: number;
  /** Lumped self-resonant frequency, hertz. */
  selfResonantFrequency: number;
  /** f / f_sr. */
  frequencyRatio: number;
  notes: DesignNote[];
}

/**
 * Apparent inductance and resistance of a coil with self-capacitance, below
 * self-resonance (Terman 1943): L' = L/(1 − ω²LC), R' = R/(1 − ω²LC)².
 * Inputs in SI (H, Ω, F, Hz). Valid for Q ≫ 1 and f well below f_sr; a
 * 'validity' note is returned above 0.5 f_sr (the lumped model fails there),
 * and a DesignError is thrown at or above f_sr.
 */
export function apparentCoil(input: ApparentCoilInput): ApparentCoil {
  requireObject<ApparentCoilInput>('input', input, 'The coil');
  const { inductance, resistance, selfCapacitance, frequency } = input;
  requirePositive('inductance', inductance, 'Inductance', 'H');
  requireNonNegative('resistance', resistance, 'Resistance', 'Ω');
  requirePositive('selfCapacitance', selfCapacitance, 'Self-capacitance', 'F');
  requirePositive('frequency', frequency, 'Frequency', 'Hz');
  const fsr = selfResonantFrequency(inductance, selfCapacitance);
  const ratio = frequency / fsr;
  if (ratio >= 1) {
    throw new DesignError(
      'frequency',
      `${sayQuantity(frequency, 'Hz')} is at or above the coil's self-resonance (about ${sayQuantity(fsr, 'Hz')}): there the coil no longer acts as an inductor. Use a lower frequency or a smaller coil.`,
    );
  }
  const w = TWO_PI * frequency;
  const k = 1 - ratio * ratio; // 1 − ω²LC
  const apparentInductance = requireFiniteResult('frequency', inductance / k, 'The apparent inductance');
  const apparentResistance = requireFiniteResult('frequency', resistance / k / k, 'The apparent resistance');
  // Q' = ωL'/R' = (ωL/R)(1 − ω²LC); Infinity only for a lossless coil (R = 0)
  const apparentQ = resistance === 0 ? Infinity : requireFiniteResult('resistance', ((w * inductance) / resistance) * k, 'The apparent Q');
  const notes: DesignNote[] = [];
  if (ratio > 0.5) {
    notes.push(
      note(
        'validity',
        `The frequency is ${Math.round(ratio * 100)} % of the self-resonant frequency: above about half of it the lumped self-capacitance model fails (the winding acts as a helical line, whose resonances may lie tens of per cent from the lumped estimate), so treat the apparent values as rough.`,
        'frequency',
      ),
    );
  }
  if (resistance > 0 && (w * inductance) / resistance < 10) {
    notes.push(note('validity', "The coil's Q is below 10: Terman's apparent-value formulas assume a high Q.", 'resistance'));
  }
  return { apparentInductance, apparentResistance, apparentQ, selfResonantFrequency: fsr, frequencyRatio: ratio, notes };
}
