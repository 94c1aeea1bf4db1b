/**
 * Band coverage: what band a coil and a variable capacitor tune, and the coil,
 * trimmer and padder that make a given capacitor tune a given band; and the
 * selectivity across the band. Tuning by a slug in the coil is in slug.ts,
 * the dial law (frequency against rotation) in dial.ts; both use the network
 * defined here.
 *
 * The circuit (lumped, lossless for the band algebra):
 *
 *     coil L ── stray C_s across it (wiring, the next stage's input, the coil's own self-capacitance)
 *           └── padder C_p in series with (variable C_v ∥ trimmer C_t)
 *
 * so the capacitance across the coil is
 *   C(C_v) = C_s + C_p (C_v + C_t) / (C_p + C_v + C_t)      (no padder: C_s + C_v + C_t)
 * and Thomson's formula f = 1/(2π√(L C)) gives the band: the low end with the
 * plates meshed (C_v = C_max), the high end with them open (C_v = C_min).
 *
 * Design (derived here from the two equations above; nothing else is assumed):
 * - A band f1 … f2 needs the capacitance ratio n² = (f2/f1)² = C(C_max)/C(C_min).
 *   The largest ratio a capacitor can give is (C_max + C_s)/(C_min + C_s)
 *   (no trimmer, no padder); a wider band cannot be tuned in one range.
 * - Trimmer only: (C_max + C_0)/(C_min + C_0) = n² gives the parallel
 *   capacitance C_0 = C_t + C_s = (C_max − n² C_min)/(n² − 1), one solution.
 * - Trimmer and padder: two equations (the two band ends) in three unknowns
 *   (L, C_t, C_p), so one quantity is free. We hold the parallel capacitance
 *   C_t + C_s at `PADDER_SWITCH_RATIO` × C_max, the largest we accept with a
 *   trimmer alone, and solve the padder from the ratio equation, a quadratic:
 *     A C_p² − B C_p − D = 0,  A = C_0 − C_t − C_s,  B = C_s(a + b) + a b,
 *     D = C_s a b,  a = C_min + C_t,  b = C_max + C_t,
 *   (divided through by n² − 1), whose positive root is the padder. At the
 *   switch-over A = 0 and the padder is infinite, so the design moves from
 *   trimmer-only to trimmer-and-padder without a jump. Why hold the parallel
 *   capacitance there: a narrow band with a trimmer alone needs a parallel
 *   capacitance many times the capacitor's own (3.4 nF across a 365 pF
 *   capacitor for 5.9–6.2 MHz), so the coil becomes small, the tank's dynamic
 *   resistance falls with L/C, and the fixed capacitor's tolerance and drift
 *   move the band more than the variable tunes it. The padder keeps the coil
 *   and the whole rotation on the band, at the price of crowding the dial's
 *   meshed end (the ratio of the tuning rates is returned).
 * - Margin m widens the band to f1 (1 − m) … f2 (1 + m).
 *
 * Sources: Thomson's formula and series and parallel capacitance (any circuit
 * text; Terman, *Radio Engineers' Handbook*, 1943, section 3). Band coverage
 * with trimmers and padders is treated in Terman 1943 and in Langford-Smith,
 * *Radiotron Designer's Handbook*, 4th ed., 1953 (chapters on tuned circuits
 * and superheterodyne tracking; section numbers from memory, not checked);
 * the algebra here is our own derivation from the circuit above. The
 * parallel-capacitance limit for switching to a padder is our own choice
 * (common practice, no published source). Monotone interpolation (the coil's
 * Q between its nodes across the band, and a plate table in dial.ts): Fritsch and Carlson, "Monotone piecewise cubic interpolation", SIAM
 * J. Numer. Anal. 17 (1980) 238–246, with the derivative of Fritsch and
 * Butland, SIAM J. Sci. Stat. Comput. 5 (1984) 300–304.
 *
 * Validity: lumped parts, well below the coil's self-resonance (say the band's
 * top below half of it) and with strays that do not change across the band;
 * the band algebra ignores loss (a shift of order 1/Q², see `analyzeTank`).
 * Image rejection is not computed here: `bandSelectivity` returns the tank at
 * each point (`tank`, a TankInput) so the superheterodyne tracking module can
 * evaluate it at the image frequency with `tankImpedance`.
 */
import { designCoil, type DesignCoilResult, type DesignCoilSpec } from './coil';
import { TWO_PI } from './constants';
import { DesignError, requireFinite, requireInRange, requireNonNegative, requireObject, withinSpec } from './errors';
import { note, type DesignNote } from './notes';
import { frequencyGrid } from './sweep';
import { analyzeTank } from './tank';
import { tankValue, type TankInput } from './tankModel';
import { sayNumber, sayPercent, sayQuantity } from './text';

/**
 * Parallel capacitance (trimmer plus strays), as a multiple of the variable
 * capacitor's maximum, above which `designForBand` adds a series padder
 * instead of a larger trimmer (our own choice; see the module header).
 */
export const PADDER_SWITCH_RATIO = 1;

/** Trimmer capacitance above which the trimmer is a fixed capacitor plus a trimmer (common practice, no published source). */
const LARGE_TRIMMER = 50e-12;

/** Narrowest band accepted, as a fraction of its low frequency: narrower is a spot frequency. */
const NARROWEST_BAND = 1e-6;

/** Frequencies across the band at which `bandSelectivity` asks designCoil for the coil's Q (odd: the middle is one). */
const COIL_Q_NODES = 9;

/** Relative tolerance for the limit case where the capacitor's ratio just covers the band. */
export const LIMIT_TOLERANCE = 1e-12;

// ---------------------------------------------------------------------------
// The circuit

/** A tuned circuit for band coverage: coil, variable capacitor, strays, trimmer, padder. SI units. */
export interface BandCircuit {
  /** Coil inductance L, H. */
  inductance: number;
  /** Variable capacitor, plates open, F (> 0). */
  minCapacitance: number;
  /** Variable capacitor, plates meshed, F (> minCapacitance). */
  maxCapacitance: number;
  /** Stray capacitance across the coil (wiring, next stage, coil self-capacitance), F (≥ 0). */
  strayCapacitance: number;
  /** Trimmer in parallel with the variable capacitor, F (≥ 0; omit for none). */
  trimmerCapacitance?: number;
  /** Padder in series with variable and trimmer, F (> 0; omit for none). */
  padderCapacitance?: number;
}

/** What `bandCoverage` returns. */
export interface BandCoverage {
  /** Band's low end (plates meshed), Hz. */
  lowFrequency: number;
  /** Band's high end (plates open), Hz. */
  highFrequency: number;
  /** highFrequency / lowFrequency. */
  frequencyRatio: number;
  /** Total capacitance across the coil at the low end, F. */
  lowEndCapacitance: number;
  /** Total capacitance across the coil at the high end, F. */
  highEndCapacitance: number;
}

/**
 * The capacitor network, checked (SI): variable capacitor's ends, strays,
 * trimmer (0 for none) and padder (undefined for none). Shared with the
 * tracking module, which checks its circuits with its own messages.
 */
export interface Network {
  min: number;
  max: number;
  stray: number;
  trimmer: number;
  padder: number | undefined;
}

/** A capacitance that may be zero (strays, trimmer). */
function zeroOrMore(field: string, value: unknown, what: string): number {
  if (value === 0) return 0;
  requireNonNegative(field, value, what, 'F');
  return tankValue(field, value, what, 'F');
}

export function checkNetwork(c: Partial<BandCircuit>): Network {
  const min = tankValue('minCapacitance', c.minCapacitance, 'The capacitor\'s minimum capacitance', 'F');
  const max = tankValue('maxCapacitance', c.maxCapacitance, 'The capacitor\'s maximum capacitance', 'F');
  if (!(max > min)) {
    throw new DesignError('maxCapacitance', `The capacitor's maximum ${sayQuantity(max, 'F')} must be above its minimum ${sayQuantity(min, 'F')}.`);
  }
  const stray = zeroOrMore('strayCapacitance', c.strayCapacitance, 'Stray capacitance');
  const trimmer = c.trimmerCapacitance === undefined ? 0 : zeroOrMore('trimmerCapacitance', c.trimmerCapacitance, 'Trimmer capacitance');
  let padder: number | undefined;
  if (c.padderCapacitance !== undefined) {
    if (c.padderCapacitance === 0) throw new DesignError('padderCapacitance', 'Padder capacitance must be greater than zero; leave it out for no padder.');
    padder = tankValue('padderCapacitance', c.padderCapacitance, 'Padder capacitance', 'F');
  }
  return { min, max, stray, trimmer, padder };
}

/** Capacitance across the coil with the variable capacitor at `cv`, F: C_s + series(C_v + C_t, C_p). */
export function totalCapacitance(n: Network, cv: number): number {
  const p = cv + n.trimmer;
  return n.stray + (n.padder === undefined ? p : (n.padder * p) / (n.padder + p));
}

/** The variable capacitor's setting that gives `total` across the coil, F (inverse of totalCapacitance). */
export function variableFor(n: Network, total: number): number {
  const s = total - n.stray;
  return (n.padder === undefined ? s : (s * n.padder) / (n.padder - s)) - n.trimmer;
}

/** Thomson's formula with √L·√C (the product can overflow), Hz. */
export function thomson(l: number, c: number): number {
  return 1 / (TWO_PI * Math.sqrt(l) * Math.sqrt(c));
}

/** The inductance or capacitance that resonates with `x` (a capacitance or an inductance) at f: 1/((2πf)² x). */
export function partnerAt(x: number, f: number): number {
  const w = TWO_PI * f;
  return 1 / w / (w * x);
}

export function coverageOf(n: Network, l: number): BandCoverage {
  const lowEndCapacitance = totalCapacitance(n, n.max);
  const highEndCapacitance = totalCapacitance(n, n.min);
  const lowFrequency = requireFiniteFigure('inductance', thomson(l, lowEndCapacitance), 'The band\'s low end');
  const highFrequency = requireFiniteFigure('inductance', thomson(l, highEndCapacitance), 'The band\'s high end');
  return { lowFrequency, highFrequency, frequencyRatio: highFrequency / lowFrequency, lowEndCapacitance, highEndCapacitance };
}

/** The band must have width to be swept (a padder far smaller than the capacitor leaves none). */
export function requireWidth(cover: BandCoverage): void {
  if (!(cover.highFrequency > cover.lowFrequency * (1 + 1e-12))) {
    throw new DesignError('padderCapacitance', `The circuit hardly tunes at all (${sayQuantity(cover.lowFrequency, 'Hz', 6)} to ${sayQuantity(cover.highFrequency, 'Hz', 6)}): the padder or the strays swamp the variable capacitor.`);
  }
}

/** A figure that must be finite and above zero. */
export function requireFiniteFigure(field: string, value: number, what: string): number {
  if (!(Number.isFinite(value) && value > 0)) {
    throw new DesignError(field, `${what} is beyond what can be computed with these values: they are far outside anything that can be built.`);
  }
  return value;
}

/**
 * The band a coil and a variable capacitor tune: f = 1/(2π√(L C)) with
 * C = C_s + C_p (C_v + C_t)/(C_p + C_v + C_t) at C_v = C_max (low end) and
 * C_v = C_min (high end); without a padder C = C_s + C_v + C_t (Thomson's
 * formula, Terman 1943; series and parallel capacitance). Lumped, lossless.
 * @param circuit L in H; capacitances in F (trimmer and padder optional)
 * @returns the band's ends in Hz and the total capacitance across the coil at each, F
 * @throws DesignError naming the input at fault
 */
export function bandCoverage(circuit: BandCircuit): BandCoverage {
  requireObject<BandCircuit>('circuit', circuit, 'The tuned circuit');
  const l = tankValue('inductance', circuit.inductance, 'Inductance', 'H');
  return coverageOf(checkNetwork(circuit), l);
}

// ---------------------------------------------------------------------------
// Design for a band

/** What `designForBand` takes. SI units. */
export interface BandDesignInput {
  /** Band's low end, Hz. */
  lowFrequency: number;
  /** Band's high end, Hz (> lowFrequency). */
  highFrequency: number;
  /** Variable capacitor, plates open, F. */
  minCapacitance: number;
  /** Variable capacitor, plates meshed, F. */
  maxCapacitance: number;
  /** Stray capacitance across the coil, F (≥ 0). */
  strayCapacitance: number;
  /** Fraction the band is widened by at each end (0 … 0.5; default 0 = exact). */
  margin?: number;
  /** 'auto' (default): trimmer alone while it stays within PADDER_SWITCH_RATIO × C_max, else trimmer and padder; 'trimmer': trimmer alone, however large. */
  arrangement?: 'auto' | 'trimmer';
}

/** What `designForBand` returns: a BandCircuit (hand it to `bandCoverage`) with the band and notes. */
export interface BandDesign extends BandCircuit {
  /** Parallel trimmer (fixed part plus trimmer), F (0 in the limit case). */
  trimmerCapacitance: number;
  /** Series padder, F; undefined when none is needed. */
  padderCapacitance: number | undefined;
  /** 'trimmer' (trimmer alone) or 'padder' (trimmer and series padder). */
  arrangement: 'trimmer' | 'padder';
  /** Band the design covers (the band asked for, widened by the margin), Hz. */
  lowFrequency: number;
  highFrequency: number;
  /** Band asked for, Hz. */
  requestedLowFrequency: number;
  requestedHighFrequency: number;
  /** Covered highFrequency / lowFrequency. */
  frequencyRatio: number;
  /** Widest frequency ratio this capacitor gives with these strays, √((C_max + C_s)/(C_min + C_s)). */
  widestRatio: number;
  /** Total capacitance across the coil at the low and high ends, F. */
  lowEndCapacitance: number;
  highEndCapacitance: number;
  /**
   * Rate of change of the tank's capacitance with the variable's, at the plates-open end over
   * the plates-meshed end: ((C_p + C_max + C_t)/(C_p + C_min + C_t))²; 1 without a padder.
   * How much the padder crowds the meshed end of a straight-line-capacitance dial.
   */
  crowding: number;
  notes: DesignNote[];
}

function frequencyValue(field: string, value: unknown, what: string): number {
  return tankValue(field, value, what, 'Hz');
}

/** The band's ends, checked: low below high, and a band rather than a spot frequency. */
export function checkBand(low: unknown, high: unknown): { low: number; high: number } {
  const f1 = frequencyValue('lowFrequency', low, 'The band\'s low end');
  const f2 = frequencyValue('highFrequency', high, 'The band\'s high end');
  if (!(f2 > f1)) {
    throw new DesignError('highFrequency', f2 === f1
      ? `The band's two ends are both ${sayQuantity(f1, 'Hz', 4)}: give a low end and a higher high end.`
      : `The band's high end ${sayQuantity(f2, 'Hz', 4)} is below its low end ${sayQuantity(f1, 'Hz', 4)}: the two are the wrong way round.`);
  }
  if ((f2 - f1) / f1 < NARROWEST_BAND) {
    throw new DesignError('highFrequency', `The band ${sayQuantity(f1, 'Hz', 7)} to ${sayQuantity(f2, 'Hz', 7)} is narrower than one part in a million: that is a spot frequency, not a band to tune.`);
  }
  return { low: f1, high: f2 };
}

/** The sentence for a band wider than the capacitor can tune. */
function tooWide(f1: number, f2: number, margin: number, n: Network, widest: number): string {
  const ratio = f2 / f1;
  const withMargin = (ratio * (1 + margin)) / (1 - margin);
  const marginText = margin > 0 ? ` (${sayNumber(withMargin, 4)} with the ${sayPercent(margin).slice(1)} margin)` : '';
  const cap = `${sayQuantity(n.min, 'F')} to ${sayQuantity(n.max, 'F')} capacitor${n.stray > 0 ? ` with ${sayQuantity(n.stray, 'F')} of strays` : ''}`;
  let split: string;
  const perRange = Math.log(widest) - Math.log((1 + margin) / (1 - margin));
  if (perRange <= 0) {
    split = ' or reduce the margin: the margin alone needs more than this capacitor can give';
  } else {
    const ranges = Math.ceil(Math.log(ratio) / perRange - 1e-9);
    const edges = ranges <= 4 ? Array.from({ length: ranges + 1 }, (_, i) => f1 * ratio ** (i / ranges)) : [];
    const example = edges.length > 0
      ? ` (for example ${edges.slice(0, -1).map((e, i) => `${sayQuantity(e, 'Hz')} to ${sayQuantity(edges[i + 1], 'Hz')}`).join(', ')})`
      : '';
    split = ` or split the band into ${ranges} ranges${example}`;
  }
  return `The band ${sayQuantity(f1, 'Hz', 4)} to ${sayQuantity(f2, 'Hz', 4)} needs a frequency ratio of ${sayNumber(ratio, 4)}${marginText}, but this ${cap} gives at most ${sayNumber(widest, 4)}, √((C_max + C_stray)/(C_min + C_stray)). Use a capacitor with a larger maximum or a smaller minimum, cut the strays,${split}.`;
}

/**
 * The coil, trimmer and padder that make a variable capacitor tune a band
 * exactly (widened by `margin` at each end): see the module header for the
 * algebra and for how the trimmer-and-padder case chooses its free quantity.
 * L = 1/((2π f_high)² C(C_min)). Lumped and lossless; strays constant.
 * @param input band in Hz, capacitances in F, margin as a fraction
 * @returns a BandCircuit with the covered band, the arrangement chosen and notes giving the reason
 * @throws DesignError naming the input at fault; `highFrequency` when the capacitor cannot tune the band
 */
export function designForBand(input: BandDesignInput): BandDesign {
  requireObject<BandDesignInput>('band', input, 'The band design');
  const band = checkBand(input.lowFrequency, input.highFrequency);
  const n = checkNetwork({ ...input, trimmerCapacitance: undefined, padderCapacitance: undefined });
  const margin = input.margin === undefined ? 0 : requireInRange('margin', requireFinite('margin', input.margin, 'Margin'), 0, 0.5, 'Margin');
  const arrangement = input.arrangement ?? 'auto';
  if (arrangement !== 'auto' && arrangement !== 'trimmer') {
    throw new DesignError('arrangement', `The arrangement must be "auto" or "trimmer" (got ${typeof arrangement === 'string' ? JSON.stringify(arrangement) : String(arrangement)}).`);
  }
  const f1 = band.low * (1 - margin);
  const f2 = band.high * (1 + margin);
  const n2 = (f2 / f1) ** 2;
  const k = n2 - 1;
  const widest2 = (n.max + n.stray) / (n.min + n.stray);
  const widestRatio = Math.sqrt(widest2);
  if (n2 > widest2 * (1 + LIMIT_TOLERANCE)) {
    throw new DesignError('highFrequency', tooWide(band.low, band.high, margin, n, widestRatio));
  }
  const notes: DesignNote[] = [];
  // Trimmer alone: C_0 = C_t + C_s = (C_max − n² C_min)/(n² − 1).
  const c0 = (n.max - n2 * n.min) / k;
  const exactTrimmer = Math.max(0, c0 - n.stray);
  const limit = PADDER_SWITCH_RATIO * n.max;
  const ratioText = `The band ratio ${sayNumber(f2 / f1, 4)}${margin > 0 ? ' (with the margin)' : ''}`;
  let trimmer: number;
  let padder: number | undefined;
  const held = Math.max(0, limit - n.stray);
  const padderNeeded = arrangement === 'auto' && c0 > limit && c0 - held - n.stray > LIMIT_TOLERANCE * c0;
  if (!padderNeeded) {
    trimmer = exactTrimmer;
    if (exactTrimmer === 0 || exactTrimmer <= LIMIT_TOLERANCE * (n.max + n.stray)) {
      trimmer = 0;
      notes.push(note('info', `${ratioText} is all this capacitor gives with ${sayQuantity(n.stray, 'F')} of strays (${sayNumber(widestRatio, 4)}): no trimmer is needed and none is left for alignment. Any more stray capacitance will lose the band's high end; set the band with a slug in the coil, or allow a margin.`, 'highFrequency'));
    } else {
      notes.push(note('info', `${ratioText} is narrower than this capacitor's ${sayNumber(widestRatio, 4)} (with the strays): a parallel trimmer of ${sayQuantity(trimmer, 'F')} narrows its swing to the band, and the whole rotation covers it. ${c0 > limit ? 'No padder, as asked.' : `No padder: the trimmer and strays together (${sayQuantity(c0, 'F')}) stay within the capacitor's maximum ${sayQuantity(n.max, 'F')}.`}`));
    }
    if (c0 > limit) {
      notes.push(note('info', `A trimmer alone needs ${sayQuantity(c0, 'F')} in parallel, ${sayNumber(c0 / n.max)} times the capacitor's maximum: most of the tank's capacitance is fixed, so the coil is small and the fixed capacitor's tolerance and drift move the band more than the variable tunes it. The "auto" arrangement would add a series padder.`, 'arrangement'));
    }
  } else {
    // Trimmer and padder: hold C_t + C_s at the limit, solve the padder (module header).
    trimmer = held;
    const a = n.min + trimmer;
    const b = n.max + trimmer;
    const qa = c0 - trimmer - n.stray;
    const qb = n.stray * (a + b) + a * b;
    const qd = n.stray * a * b;
    padder = (qb + Math.sqrt(qb * qb + 4 * qa * qd)) / (2 * qa);
    const trimmerOnlyL = 1 / (TWO_PI * f2) / (TWO_PI * f2 * (n.min + c0));
    notes.push(note('info', `${ratioText} is much narrower than this capacitor's ${sayNumber(widestRatio, 4)}: a trimmer alone would need ${sayQuantity(c0, 'F')} in parallel (${sayNumber(c0 / n.max)} times the capacitor's maximum) and a coil of only ${sayQuantity(trimmerOnlyL, 'H')}. So the parallel capacitance (trimmer ${sayQuantity(trimmer, 'F')} with the strays) is held at the capacitor's maximum, and a series padder of ${sayQuantity(padder, 'F')} narrows the swing to the band, keeping the whole rotation on it (band-spread). Holding the parallel capacitance at the trimmer-only limit keeps the coil large and makes the design continuous with the trimmer-only one at the switch-over.`));
  }
  const circuit: Network = { ...n, trimmer, padder };
  const highEndCapacitance = totalCapacitance(circuit, n.min);
  const inductance = requireFiniteFigure('highFrequency', partnerAt(highEndCapacitance, f2), 'The inductance');
  const cover = coverageOf(circuit, inductance);
  const crowding = padder === undefined ? 1 : ((padder + n.max + trimmer) / (padder + n.min + trimmer)) ** 2;
  if (padder !== undefined) {
    notes.push(note('info', `The padder crowds the meshed end of the dial: there the tank's capacitance changes ${sayNumber(crowding)} times more slowly per picofarad of the variable than at the open end (see the dial law).`));
  }
  if (trimmer > LARGE_TRIMMER) {
    notes.push(note('info', `${sayQuantity(trimmer, 'F')} is more than a trimmer alone gives: use a fixed capacitor with a trimmer across it set near mid-travel, so the band can be aligned both ways.`, 'trimmerCapacitance'));
  }
  if (margin > 0) {
    notes.push(note('info', `The band is widened by ${sayPercent(margin).slice(1)} at each end: the capacitor covers ${sayQuantity(f1, 'Hz', 4)} to ${sayQuantity(f2, 'Hz', 4)}.`, 'margin'));
  }
  return {
    inductance,
    minCapacitance: n.min,
    maxCapacitance: n.max,
    strayCapacitance: n.stray,
    trimmerCapacitance: trimmer,
    padderCapacitance: padder,
    arrangement: padder === undefined ? 'trimmer' : 'padder',
    lowFrequency: cover.lowFrequency,
    highFrequency: cover.highFrequency,
    requestedLowFrequency: band.low,
    requestedHighFrequency: band.high,
    frequencyRatio: cover.frequencyRatio,
    widestRatio,
    lowEndCapacitance: cover.lowEndCapacitance,
    highEndCapacitance: cover.highEndCapacitance,
    crowding,
    notes,
  };
}

/**
 * Monotone cubic (Fritsch–Carlson) interpolant through strictly monotonic
 * points: derivatives by Fritsch and Butland's weighted harmonic mean inside,
 * one-sided slopes at the ends; cubic Hermite pieces between. Never overshoots
 * the table, so a monotonic table gives a monotonic curve.
 */
export function monotoneInterpolator(xs: readonly number[], ys: readonly number[]): (x: number) => number {
  const n = xs.length;
  const h: number[] = [];
  const d: number[] = [];
  for (let i = 0; i < n - 1; i++) {
    h.push(xs[i + 1] - xs[i]);
    d.push((ys[i + 1] - ys[i]) / h[i]);
  }
  const m = new Array<number>(n);
  m[0] = d[0];
  m[n - 1] = d[n - 2];
  for (let i = 1; i < n - 1; i++) {
    if (d[i - 1] * d[i] <= 0) m[i] = 0;
    else {
      const w1 = 2 * h[i] + h[i - 1];
      const w2 = h[i] + 2 * h[i - 1];
      m[i] = (w1 + w2) / (w1 / d[i - 1] + w2 / d[i]);
    }
  }
  return (x: number) => {
    let i = 0;
    while (i < n - 2 && x > xs[i + 1]) i++;
    const t = (x - xs[i]) / h[i];
    const t1 = 1 - t;
    return ys[i] * (1 + 2 * t) * t1 * t1 + h[i] * m[i] * t * t1 * t1 + ys[i + 1] * t * t * (3 - 2 * t) + h[i] * m[i + 1] * t * t * (t - 1);
  };
}

/** Points of a curve: a whole number from 2 to 10,000, or the fallback. */
export function checkPoints(value: unknown, fallback: number): number {
  if (value === undefined) return fallback;
  if (typeof value !== 'number' || !Number.isInteger(value) || value < 2 || value > 10_000) {
    throw new DesignError('points', `Number of points must be a whole number from 2 to 10,000 (got ${typeof value === 'number' ? sayNumber(value) : typeof value}).`);
  }
  return value;
}

// ---------------------------------------------------------------------------
// Selectivity across the band

/** What `bandSelectivity` takes. */
export interface BandSelectivityInput {
  /** The tuned circuit (a BandDesign will do). */
  band: BandCircuit;
  /**
   * The coil as for `designCoil` (form, geometry, wire; its inductance,
   * turns, frequency and sweepPoints are set here): wound once for the band's
   * inductance at mid-band, its Q is then taken from designCoil at 9 frequencies
   * across the band (exact there, including low, middle and high) and
   * interpolated between them (monotone cubic).
   */
  coil?: DesignCoilSpec;
  /**
   * The coil already wound: `designCoil` of `coil` with the band's inductance
   * at mid-band, as a caller that has just wound it holds it (saves winding it
   * again). Not checked against `coil` beyond being a wound solenoid, toroid
   * or multilayer result with finite turns and inductance.
   */
  woundCoil?: DesignCoilResult;
  /** The coil's Q, instead of (or overriding the Q of) the coil spec; held constant across the band. */
  coilQ?: number;
  /** Q of the tuning capacitors (variable, trimmer and padder alike), or their tan δ; omit for ideal. */
  capacitorQ?: number;
  dissipationFactor?: number;
  /** Source and load resistances across the tank, Ω (omit for none). */
  sourceResistance?: number;
  loadResistance?: number;
  /** Points of the curves across the band (default 41, 2 … 10,000). */
  points?: number;
}

/** Selectivity at one frequency of the band. */
export interface SelectivityPoint {
  /** Tuned frequency, Hz. */
  frequency: number;
  /** The coil's Q at the frequency. */
  coilQ: number;
  /** Unloaded and loaded Q of the tank (analyzeTank). */
  unloadedQ: number;
  loadedQ: number;
  /** −3 dB bandwidth of the terminated tank, Hz. */
  bandwidth: number;
  /** Peak |Z| of the tank alone, Ω. */
  dynamicResistance: number;
  /**
   * The tank tuned to this frequency, as `analyzeTank` takes it (its Q values
   * given at this frequency): for image rejection, evaluate it with
   * `tankImpedance(tank, imageFrequency, { loaded: true })` against its value here.
   */
  tank: TankInput;
}

/** What `bandSelectivity` returns. */
export interface BandSelectivity {
  low: SelectivityPoint;
  middle: SelectivityPoint;
  high: SelectivityPoint;
  /** Equal-length curves over the band, linear in frequency. */
  curve: { frequency: number[]; coilQ: number[]; unloadedQ: number[]; loadedQ: number[]; bandwidth: number[]; dynamicResistance: number[] };
  /** The coil as wound for the band (when a coil spec was given), at mid-band. */
  coil?: DesignCoilResult;
  notes: DesignNote[];
}

/** A wound coil handed in: the figures bandSelectivity reads, checked for shape. */
function checkWound(value: unknown): DesignCoilResult {
  const w = requireObject<DesignCoilResult>('woundCoil', value, 'The wound coil');
  if (!['solenoid', 'toroid', 'multilayer'].includes(w.form)) throw new DesignError('woundCoil', 'The wound coil must be a result of designCoil (solenoid, toroid or multilayer).');
  tankValue('woundCoil', w.turns, 'The wound coil\'s turns');
  tankValue('woundCoil', w.inductance, 'The wound coil\'s inductance', 'H');
  if (w.q !== undefined) tankValue('woundCoil', w.q, 'The wound coil\'s Q');
  return w;
}

/**
 * Q, bandwidth and dynamic resistance across the band: at each frequency f
 * the tank is the band's coil L with the capacitor network set to
 * C = 1/((2π f)² L) − C_s, the strays across the coil, the coil's Q at f
 * (from `designCoil`'s loss model for the coil wound once, at 9 frequencies
 * evenly across the band with monotone cubic interpolation between; or `coilQ`), the
 * capacitors' Q, and the source and load; `analyzeTank` computes the rest.
 * Models and validity: those of `designCoil` and `analyzeTank`.
 * @param input the band circuit, the coil spec or Q, capacitor loss, terminations in Ω
 * @throws DesignError naming the input at fault ('band.…', 'coil.…' for nested inputs)
 */
export function bandSelectivity(input: BandSelectivityInput): BandSelectivity {
  requireObject<BandSelectivityInput>('band', input, 'The selectivity inputs');
  const circuit = requireObject<BandCircuit>('band', input.band, 'The tuned circuit');
  const l = withinSpec('band', () => tankValue('inductance', circuit.inductance, 'Inductance', 'H'));
  const n = withinSpec('band', () => checkNetwork(circuit));
  const cover = coverageOf(n, l);
  requireWidth(cover);
  const points = checkPoints(input.points, 41);
  const fixedQ = input.coilQ === undefined ? undefined : tankValue('coilQ', input.coilQ, 'Coil Q');
  const common = {
    capacitorQ: input.capacitorQ,
    dissipationFactor: input.dissipationFactor,
    sourceResistance: input.sourceResistance,
    loadResistance: input.loadResistance,
  };
  const middleFrequency = 0.5 * (cover.lowFrequency + cover.highFrequency);
  const notes: DesignNote[] = [];
  let coil: DesignCoilResult | undefined;
  let qAt: (f: number) => number;
  if (input.coil !== undefined) {
    const spec = requireObject<DesignCoilSpec>('coil', input.coil, 'The coil');
    const base = { ...spec, turns: undefined, inductance: undefined, sweepPoints: undefined };
    coil = input.woundCoil === undefined
      ? withinSpec('coil', () => designCoil({ ...base, inductance: l, frequency: middleFrequency } as DesignCoilSpec))
      : checkWound(input.woundCoil);
    const wound = coil;
    const turns = wound.turns;
    if (fixedQ === undefined && wound.q === undefined) {
      throw new DesignError('coilQ', `The ${wound.form} model gives no Q for this coil: give the coil's Q (measured or estimated).`);
    }
    if (fixedQ !== undefined) qAt = () => fixedQ;
    else {
      // designCoil at a few frequencies, monotone cubic between: Q varies smoothly across a band (about as √f).
      // Only the low, middle and high frequency when no curve is asked for (they are nodes either way, so their Q is the same).
      const nodes = Array.from(frequencyGrid({ start: cover.lowFrequency, stop: cover.highFrequency, points: points <= 3 ? 3 : COIL_Q_NODES, spacing: 'linear' }));
      // The middle node is the frequency the coil was wound at: its Q is the wound coil's own.
      const centre = (nodes.length - 1) / 2;
      const qs = nodes.map((f, i) => (i === centre && wound.q !== undefined && Math.abs(f / middleFrequency - 1) < 1e-12
        ? wound.q
        : withinSpec('coil', () => designCoil({ ...base, turns, frequency: f } as DesignCoilSpec).q as number)));
      qAt = monotoneInterpolator(nodes, qs);
    }
    const off = wound.inductance / l - 1;
    if (Math.abs(off) > 1e-3) {
      notes.push(note('info', `Wound with ${sayNumber(turns)} turns the coil has ${sayQuantity(wound.inductance, 'H', 4)}, ${sayPercent(off)} from the ${sayQuantity(l, 'H', 4)} the band needs: the trimmer or a slug takes up the difference.`, 'coil.inductance'));
    }
    if (wound.selfCapacitance !== undefined && wound.selfCapacitance > n.stray) {
      notes.push(note('validity', `The coil's own self-capacitance (${sayQuantity(wound.selfCapacitance, 'F')}, Medhurst) is more than the ${sayQuantity(n.stray, 'F')} of strays allowed for: the band will sit lower than designed. Include it in the strays.`, 'band.strayCapacitance'));
    }
    if (wound.selfResonantFrequency !== undefined && cover.highFrequency > 0.5 * wound.selfResonantFrequency) {
      notes.push(note('validity', `The band's high end ${sayQuantity(cover.highFrequency, 'Hz', 4)} is above half the coil's self-resonance (${sayQuantity(wound.selfResonantFrequency, 'Hz', 4)}): the lumped model is only rough there.`));
    }
  } else if (fixedQ !== undefined) {
    qAt = () => fixedQ;
  } else {
    throw new DesignError('coilQ', 'Give the coil (its form, size and wire) or its Q: the selectivity depends on the coil\'s loss.');
  }
  const tankNotes: DesignNote[] = [];
  const at = (f: number, network = partnerAt(l, f) - n.stray, keepNotes = false): SelectivityPoint => {
    const q = qAt(f);
    const tank: TankInput = {
      inductance: l,
      capacitance: network,
      coilQ: q,
      frequency: f,
      ...(n.stray > 0 ? { coilSelfCapacitance: n.stray } : {}),
      ...Object.fromEntries(Object.entries(common).filter(([, v]) => v !== undefined)),
    };
    const a = analyzeTank(tank);
    if (keepNotes) tankNotes.push(...a.notes.filter((x) => x.level !== 'info'));
    return { frequency: f, coilQ: q, unloadedQ: a.unloadedQ, loadedQ: a.loadedQ, bandwidth: a.bandwidth, dynamicResistance: a.dynamicResistance, tank };
  };
  const low = at(cover.lowFrequency, cover.lowEndCapacitance - n.stray, true);
  const middle = at(middleFrequency);
  const high = at(cover.highFrequency, cover.highEndCapacitance - n.stray, true);
  const curve = { frequency: [] as number[], coilQ: [] as number[], unloadedQ: [] as number[], loadedQ: [] as number[], bandwidth: [] as number[], dynamicResistance: [] as number[] };
  const grid = frequencyGrid({ start: cover.lowFrequency, stop: cover.highFrequency, points, spacing: 'linear' });
  for (const f of grid) {
    // The band's ends and middle are worked out above: a tank analysis each is enough.
    const p = f === cover.lowFrequency ? low : f === cover.highFrequency ? high : f === middleFrequency ? middle : at(f);
    curve.frequency.push(f);
    curve.coilQ.push(p.coilQ);
    curve.unloadedQ.push(p.unloadedQ);
    curve.loadedQ.push(p.loadedQ);
    curve.bandwidth.push(p.bandwidth);
    curve.dynamicResistance.push(p.dynamicResistance);
  }
  const seen = new Set<string>();
  for (const m of tankNotes) {
    if (!seen.has(m.message)) {
      seen.add(m.message);
      notes.push(m);
    }
  }
  return { low, middle, high, curve, ...(coil ? { coil } : {}), notes };
}
