/**
 * Fixed L–C pairs for a frequency: which preferred capacitor and which
 * inductor (a preferred value or one of the shop's own coils) resonate
 * nearest a target, how far part tolerances spread the resonance, and the
 * parallel trimmer that brings every unit back onto frequency.
 *
 * Method:
 * - Resonance by Thomson's formula f = 1 / (2π √(L C)), with C the fixed
 *   capacitor plus the strays across the coil (wiring, the next stage) plus
 *   the coil's own self-capacitance (Terman, *Radio Engineers' Handbook*,
 *   1943, section 3).
 * - Search: every capacitor of the chosen IEC 60063 series whose reactance at
 *   the target lies in a window (default 10 Ω … 3 kΩ, common practice for
 *   receiver tanks, no published source), against every inductor of the
 *   chosen series needed to resonate them and every shop coil; ranked by
 *   relative frequency error. Preferred values: IEC 60063:2015.
 * - Worst case: f falls as L, C or the strays rise, so its extremes lie at
 *   corners of the tolerance box; all eight corners (L, C, strays each at
 *   ±tolerance) are evaluated exactly.
 * - Monte Carlo: each unit draws L, C and strays independently, either
 *   uniform over ±tolerance (the default: a tolerance is a bound, and parts
 *   sorted out of a wider batch fill it rather evenly; uniform is the least
 *   committal choice on a bounded interval) or normal with the tolerance as
 *   3σ, cut at ±tolerance so no unit lies beyond its part's bound. The draws
 *   come from xoshiro128** (Blackman & Vigna, "Scrambled linear pseudorandom
 *   number generators", ACM TOMS 47, 2021) seeded from a 32-bit seed, so a
 *   run is reproducible; normal deviates by the Box–Muller transform (Box &
 *   Muller, Ann. Math. Stat. 29, 1958). Every candidate uses the same draws
 *   (common random numbers), so their spreads compare fairly.
 * - Trimmer: the parallel capacitance a unit needs is 1/(ω0² L) less its
 *   fixed, stray and self capacitance; its least and greatest over the eight
 *   corners give the trimmer's range. When the least would be negative (the
 *   fixed capacitor alone already tunes some units low) the next lower
 *   preferred capacitor is taken, down to none at all.
 *
 * Validity: lumped parts, well below the coil's self-resonance (f < 0.5 SRF,
 * a note says so otherwise); loss does not move the resonance (high Q).
 * Tolerances are part tolerances only; temperature drift and ageing are not
 * included.
 */
import { TWO_PI } from './constants';
import { DesignError, requireInRange, requireObject } from './errors';
import { note, type DesignNote } from './notes';
import { preferredNeighbours, requireSeries, seriesValuesBetween, type ESeriesName } from './preferred';
import { sayNumber, sayQuantity } from './text';

/** One of the shop's own coils, as measured. */
export interface ShopCoil {
  name: string;
  /** L in henries. */
  inductance: number;
  /** The coil's own capacitance in farads (across it); default 0. */
  selfCapacitance?: number;
}

/** How a part's value is spread within its tolerance in the Monte-Carlo run. */
export type PairDistribution = 'uniform' | 'normal';

/** Series the fixed inductors come from, or none (shop coils only). */
export type InductorSeries = 'E6' | 'E12' | 'none';

export interface ToleranceSpreadSpec {
  /** L in henries (nominal). */
  inductance: number;
  /** Fixed capacitor in farads (nominal). */
  capacitance: number;
  /** Strays across the coil in farads (wiring, next stage); default 0. */
  strayCapacitance?: number;
  /** The coil's own capacitance in farads; taken as exact; default 0. */
  selfCapacitance?: number;
  /** ± fraction, 0 … 0.5. */
  inductanceTolerance: number;
  /** ± fraction, 0 … 0.5. */
  capacitanceTolerance: number;
  /** ± fraction of the strays, 0 … 0.5; default 0. */
  strayTolerance?: number;
  /** Monte-Carlo units, 1 … 100 000; default 2000. */
  samples?: number;
  /** Whole number 0 … 4 294 967 295; default 1. */
  seed?: number;
  /** Default 'uniform'. */
  distribution?: PairDistribution;
}

export interface MonteCarloSummary {
  /** Lowest and highest resonance among the units, Hz. */
  low: number;
  high: number;
  mean: number;
  standardDeviation: number;
  samples: number;
  seed: number;
  distribution: PairDistribution;
}

export interface ToleranceSpread {
  /** Nominal resonance, Hz. */
  frequency: number;
  /** Lowest and highest resonance over the corners of the tolerance box, Hz. */
  worstCase: { low: number; high: number };
  monteCarlo: MonteCarloSummary;
}

export interface ToleranceSpreadSamples extends ToleranceSpread {
  /** Each unit's resonance, Hz, in the order drawn. */
  frequencies: Float64Array;
}

export interface TrimmerRange {
  /** The fixed capacitor to fit with the trimmer, F (the pair's own, or a lower preferred value, or 0). */
  capacitor: number;
  /** Least and greatest trimmer capacitance any unit needs, F. */
  minimum: number;
  maximum: number;
}

export interface PairCandidate {
  inductor: { source: 'series' | 'shop'; name: string; inductance: number; selfCapacitance: number };
  /** The fixed capacitor, F. */
  capacitance: number;
  /** Nominal resonance with strays and self-capacitance, Hz. */
  frequency: number;
  /** (frequency − target) / target. */
  error: number;
  /** √(L / C_total), Ω: the reactance of either part at resonance. */
  characteristicImpedance: number;
  spread: ToleranceSpread;
  /** The parallel trimmer that pulls every unit onto the target; null if the strays alone are too much. */
  trimmer: TrimmerRange | null;
  /** Band search only: the worst-case spread lies within the band. */
  spreadInBand?: boolean;
}

export interface PairSearch {
  /** Target in hertz (1 Hz … 100 GHz); or give lowFrequency and highFrequency. */
  frequency?: number;
  /** A band instead of a frequency: the pairs are ranked against its geometric centre. */
  lowFrequency?: number;
  highFrequency?: number;
  /** Series of the fixed capacitors; default E12. */
  capacitorSeries?: ESeriesName;
  /** Series of the fixed inductors; default E12; 'none' for the shop's coils only. */
  inductorSeries?: InductorSeries;
  shopCoils?: readonly ShopCoil[];
  /** Strays across the coil, F; default 0. */
  strayCapacitance?: number;
  /** Window of the fixed capacitor's reactance at the target, Ω; default 10 … 3000. */
  reactanceRange?: { minimum: number; maximum: number };
  /** ± fractions, 0 … 0.5. Defaults: the tolerance IEC 60063 pairs with each series (E6 ±20 %, E12 ±10 %, E24 ±5 %, E48 ±2 %, E96 ±1 %, E192 ±0.5 %; E3 ±20 %); strays 0. */
  capacitanceTolerance?: number;
  inductanceTolerance?: number;
  strayTolerance?: number;
  /** How many candidates to list, 1 … 200; default 10. */
  count?: number;
  samples?: number;
  seed?: number;
  distribution?: PairDistribution;
}

export interface PairSearchResult {
  /** The frequency the pairs are ranked against, Hz (a band's geometric centre). */
  target: number;
  candidates: PairCandidate[];
  /** L–C pairs evaluated by the search. */
  pairsSearched: number;
  notes: DesignNote[];
}

/** Fixed parts considered at all: capacitors 1 pF … 10 µF, inductors 10 nH … 1 H (common practice, no published source). */
const CAPACITOR_LIMITS = [1e-12, 10e-6] as const;
const INDUCTOR_LIMITS = [10e-9, 1] as const;
const DEFAULT_REACTANCE = { minimum: 10, maximum: 3000 } as const;

/** IEC 60063:2015: the tolerance each series is meant for (E3: wider than ±20 %, taken as ±20 %). */
const SERIES_TOLERANCE: Readonly<Record<ESeriesName, number>> = { E3: 0.2, E6: 0.2, E12: 0.1, E24: 0.05, E48: 0.02, E96: 0.01, E192: 0.005 };

const MAX_TOLERANCE = 0.5;

// ---------------------------------------------------------------------------
// Seeded random numbers

/** murmur3's 32-bit finaliser: a bijective mix, used to spread a seed over the state. */
function mix32(x: number): number {
  let h = x >>> 0;
  h = Math.imul(h ^ (h >>> 16), 0x85ebca6b);
  h = Math.imul(h ^ (h >>> 13), 0xc2b2ae35);
  return (h ^ (h >>> 16)) >>> 0;
}

/** xoshiro128** (Blackman & Vigna 2021): uniform numbers in [0, 1) from a 32-bit seed. */
function xoshiro128(seed: number): () => number {
  const s = new Uint32Array(4);
  for (let i = 0; i < 4; i++) s[i] = mix32(seed + Math.imul(0x9e3779b9, i + 1));
  return () => {
    const result = Math.imul(rotl(Math.imul(s[1], 5), 7), 9) >>> 0;
    const t = s[1] << 9;
    s[2] ^= s[0];
    s[3] ^= s[1];
    s[1] ^= s[2];
    s[0] ^= s[3];
    s[2] ^= t;
    s[3] = rotl(s[3], 11);
    return result / 4294967296;
  };
}

function rotl(x: number, k: number): number {
  return ((x << k) | (x >>> (32 - k))) >>> 0;
}

/** Deviates in [−1, 1] (a fraction of the tolerance) by the chosen law. */
function deviates(distribution: PairDistribution, seed: number): () => number {
  const next = xoshiro128(seed);
  if (distribution === 'uniform') return () => 2 * next() - 1;
  let spare: number | null = null;
  // Box–Muller, σ = 1/3 of the tolerance, draws beyond ±3σ thrown away.
  return () => {
    for (;;) {
      let z: number;
      if (spare !== null) {
        z = spare;
        spare = null;
      } else {
        const u = 1 - next(); // (0, 1]
        const v = next();
        const r = Math.sqrt(-2 * Math.log(u));
        z = r * Math.cos(TWO_PI * v);
        spare = r * Math.sin(TWO_PI * v);
      }
      if (Math.abs(z) <= 3) return z / 3;
    }
  };
}

// ---------------------------------------------------------------------------
// Checks

function requireTolerance(field: string, value: unknown, what: string): number {
  return requireInRange(field, value, 0, MAX_TOLERANCE, what);
}

function requireWhole(field: string, value: unknown, min: number, max: number, what: string): number {
  const v = requireInRange(field, value, min, max, what);
  if (!Number.isInteger(v)) throw new DesignError(field, `${what} must be a whole number (got ${sayNumber(v, 6)}).`);
  return v;
}

function requireDistribution(field: string, value: unknown): PairDistribution {
  if (value !== 'uniform' && value !== 'normal') {
    throw new DesignError(field, `The spread of part values must be "uniform" or "normal" (got ${typeof value === 'string' ? JSON.stringify(value.slice(0, 20)) : String(value)}).`);
  }
  return value;
}

interface MonteCarloOptions {
  samples: number;
  seed: number;
  distribution: PairDistribution;
}

function monteCarloOptions(spec: { samples?: unknown; seed?: unknown; distribution?: unknown }): MonteCarloOptions {
  return {
    samples: spec.samples === undefined ? 2000 : requireWhole('samples', spec.samples, 1, 100_000, 'The number of Monte-Carlo units'),
    seed: spec.seed === undefined ? 1 : requireWhole('seed', spec.seed, 0, 4294967295, 'The seed'),
    distribution: spec.distribution === undefined ? 'uniform' : requireDistribution('distribution', spec.distribution),
  };
}

// ---------------------------------------------------------------------------
// Spread of one pair

/** A pair with everything checked: nominal values and ± fractions. */
interface PairParts {
  inductance: number;
  capacitance: number;
  stray: number;
  self: number;
  tolL: number;
  tolC: number;
  tolS: number;
}

/** Thomson's formula, written so that 1e±300 values neither overflow nor underflow the product. */
function thomson(inductance: number, capacitance: number): number {
  return 1 / (TWO_PI * Math.sqrt(inductance) * Math.sqrt(capacitance));
}

/** The eight corners of the tolerance box: L and total C of each. */
function corners(p: PairParts): Array<{ inductance: number; capacitance: number; fixed: number }> {
  const out: Array<{ inductance: number; capacitance: number; fixed: number }> = [];
  for (const sl of [-1, 1]) {
    for (const sc of [-1, 1]) {
      for (const ss of [-1, 1]) {
        const fixed = p.capacitance * (1 + sc * p.tolC);
        out.push({ inductance: p.inductance * (1 + sl * p.tolL), capacitance: fixed + p.stray * (1 + ss * p.tolS) + p.self, fixed });
      }
    }
  }
  return out;
}

function spreadOf(p: PairParts, mc: MonteCarloOptions, keep: boolean): ToleranceSpreadSamples | ToleranceSpread {
  const frequency = thomson(p.inductance, p.capacitance + p.stray + p.self);
  let low = Infinity;
  let high = 0;
  for (const c of corners(p)) {
    const f = thomson(c.inductance, c.capacitance);
    if (f < low) low = f;
    if (f > high) high = f;
  }
  const draw = deviates(mc.distribution, mc.seed);
  const frequencies = keep ? new Float64Array(mc.samples) : null;
  let mcLow = Infinity;
  let mcHigh = 0;
  // Welford's running mean and variance of f / f_nominal (no overflow near 1e±300).
  let mean = 0;
  let m2 = 0;
  for (let i = 0; i < mc.samples; i++) {
    const l = p.inductance * (1 + p.tolL * draw());
    const c = p.capacitance * (1 + p.tolC * draw()) + p.stray * (1 + p.tolS * draw()) + p.self;
    const f = thomson(l, c);
    if (frequencies) frequencies[i] = f;
    if (f < mcLow) mcLow = f;
    if (f > mcHigh) mcHigh = f;
    const r = f / frequency;
    const d = r - mean;
    mean += d / (i + 1);
    m2 += d * (r - mean);
  }
  const monteCarlo: MonteCarloSummary = {
    low: mcLow,
    high: mcHigh,
    mean: mean * frequency,
    standardDeviation: mc.samples > 1 ? Math.sqrt(m2 / (mc.samples - 1)) * frequency : 0,
    samples: mc.samples,
    seed: mc.seed,
    distribution: mc.distribution,
  };
  const spread: ToleranceSpread = { frequency, worstCase: { low, high }, monteCarlo };
  return frequencies ? { ...spread, frequencies } : spread;
}

/**
 * Spread of a pair's resonance under part tolerances: the worst case over the
 * eight corners of the tolerance box (exact, f being monotonic in each part)
 * and a seeded Monte-Carlo run (each unit's frequency in `frequencies`).
 * f = 1 / (2π √(L (C + C_stray + C_self))), Thomson's formula.
 * @param spec inductance (H), capacitance, strayCapacitance, selfCapacitance (F),
 *   tolerances as ± fractions (0 … 0.5), samples (1 … 100 000), seed (0 … 2³²−1),
 *   distribution 'uniform' (default) or 'normal' (tolerance = 3σ, cut there)
 */
export function toleranceSpread(spec: ToleranceSpreadSpec): ToleranceSpreadSamples {
  const s = requireObject<ToleranceSpreadSpec>('spec', spec, 'The pair');
  const parts: PairParts = {
    inductance: requireInRange('inductance', s.inductance, 1e-15, 1e6, 'Inductance', 'H'),
    capacitance: requireInRange('capacitance', s.capacitance, 1e-18, 1e3, 'Capacitance', 'F'),
    stray: s.strayCapacitance === undefined ? 0 : requireInRange('strayCapacitance', s.strayCapacitance, 0, 1e-3, 'Stray capacitance', 'F'),
    self: s.selfCapacitance === undefined ? 0 : requireInRange('selfCapacitance', s.selfCapacitance, 0, 1e-3, 'Self-capacitance', 'F'),
    tolL: requireTolerance('inductanceTolerance', s.inductanceTolerance, 'The inductor\'s tolerance'),
    tolC: requireTolerance('capacitanceTolerance', s.capacitanceTolerance, 'The capacitor\'s tolerance'),
    tolS: s.strayTolerance === undefined ? 0 : requireTolerance('strayTolerance', s.strayTolerance, 'The strays\' tolerance'),
  };
  return spreadOf(parts, monteCarloOptions(s), true) as ToleranceSpreadSamples;
}

// ---------------------------------------------------------------------------
// Trimmer

/**
 * The parallel trimmer range that brings every corner of the tolerance box to
 * `target`, with the pair's fixed capacitor or, when that leaves some unit
 * already too low, the largest lower one from `lower` (descending), or none.
 */
function trimmerFor(p: PairParts, target: number, lower: readonly number[]): TrimmerRange | null {
  const w2 = (TWO_PI * target) ** 2;
  for (const capacitor of [p.capacitance, ...lower, 0]) {
    let minimum = Infinity;
    let maximum = -Infinity;
    for (const c of corners({ ...p, capacitance: capacitor })) {
      const need = 1 / (w2 * c.inductance) - c.capacitance;
      if (need < minimum) minimum = need;
      if (need > maximum) maximum = need;
    }
    if (minimum >= 0) return { capacitor, minimum, maximum };
  }
  return null;
}

// ---------------------------------------------------------------------------
// The search

interface Inductor {
  source: 'series' | 'shop';
  name: string;
  inductance: number;
  selfCapacitance: number;
}

function readShopCoils(value: unknown): Inductor[] {
  if (value === undefined) return [];
  if (!Array.isArray(value)) throw new DesignError('shopCoils', 'The shop\'s coils must be a list.');
  if (value.length > 1000) throw new DesignError('shopCoils', `The shop's coils are limited to 1000 (got ${value.length}).`);
  return value.map((raw, i) => {
    const at = `shopCoils[${i}]`;
    const coil = requireObject<ShopCoil>(at, raw, `Shop coil ${i + 1}`);
    if (typeof coil.name !== 'string' || coil.name.trim() === '') throw new DesignError(`${at}.name`, `Shop coil ${i + 1} needs a name.`);
    const name = coil.name.trim();
    return {
      source: 'shop',
      name,
      inductance: requireInRange(`${at}.inductance`, coil.inductance, 1e-12, 1e3, `The inductance of “${name}”`, 'H'),
      selfCapacitance: coil.selfCapacitance === undefined ? 0 : requireInRange(`${at}.selfCapacitance`, coil.selfCapacitance, 0, 1e-6, `The self-capacitance of “${name}”`, 'F'),
    };
  });
}

interface Target {
  target: number;
  band: { low: number; high: number } | null;
}

function readTarget(s: PairSearch): Target {
  if (s.frequency !== undefined) {
    if (s.lowFrequency !== undefined || s.highFrequency !== undefined) {
      throw new DesignError('frequency', 'Give either one frequency or a band (low and high frequency), not both.');
    }
    return { target: requireInRange('frequency', s.frequency, 1, 1e11, 'The frequency', 'Hz'), band: null };
  }
  if (s.lowFrequency === undefined && s.highFrequency === undefined) {
    throw new DesignError('frequency', 'The frequency is missing: give one, or a band (low and high frequency).');
  }
  const low = requireInRange('lowFrequency', s.lowFrequency, 1, 1e11, 'The band\'s low frequency', 'Hz');
  const high = requireInRange('highFrequency', s.highFrequency, 1, 1e11, 'The band\'s high frequency', 'Hz');
  if (high <= low) {
    throw new DesignError('highFrequency', `The band's high frequency ${sayQuantity(high, 'Hz', 4)} must be above its low frequency ${sayQuantity(low, 'Hz', 4)}.`);
  }
  return { target: Math.sqrt(low) * Math.sqrt(high), band: { low, high } };
}

/** Keeps the best `count` entries by |error|, in order; ties keep the earlier one first. */
function insertRanked<T extends { error: number }>(best: T[], item: T, count: number): void {
  const e = Math.abs(item.error);
  if (best.length === count && e >= Math.abs(best[count - 1].error)) return;
  let i = best.length;
  while (i > 0 && Math.abs(best[i - 1].error) > e) i--;
  best.splice(i, 0, item);
  if (best.length > count) best.pop();
}

/**
 * L–C pairs for a target frequency (or a band's geometric centre), ranked by
 * frequency error, each with its tolerance spread and trimmer range.
 *
 * Fixed capacitors come from `capacitorSeries` over the decades whose reactance
 * at the target lies in `reactanceRange` (1 pF … 10 µF); fixed inductors from
 * `inductorSeries` over the range those capacitors need (10 nH … 1 H); and every
 * coil in `shopCoils`, with the two preferred capacitors either side of what
 * it needs. The resonance of each pair counts the strays and the coil's
 * self-capacitance: f = 1 / (2π √(L (C + C_stray + C_self))).
 * @param spec see `PairSearch`; frequencies in Hz, capacitances in F, inductances in H,
 *   tolerances as ± fractions
 */
export function resonantPairs(spec: PairSearch): PairSearchResult {
  const s = requireObject<PairSearch>('spec', spec, 'The pair search');
  const { target, band } = readTarget(s);
  const capacitorSeries = s.capacitorSeries === undefined ? 'E12' : requireSeries('capacitorSeries', s.capacitorSeries);
  const inductorSeries = s.inductorSeries === undefined ? 'E12' : s.inductorSeries;
  if (inductorSeries !== 'E6' && inductorSeries !== 'E12' && inductorSeries !== 'none') {
    throw new DesignError('inductorSeries', `Fixed inductors come from E6 or E12, or "none" for the shop's coils only (got ${typeof inductorSeries === 'string' ? JSON.stringify(String(inductorSeries).slice(0, 20)) : String(inductorSeries)}).`);
  }
  const shop = readShopCoils(s.shopCoils);
  if (inductorSeries === 'none' && shop.length === 0) {
    throw new DesignError('inductorSeries', 'There is no inductor to pair: choose the E6 or E12 series, or give the shop\'s coils.');
  }
  const stray = s.strayCapacitance === undefined ? 0 : requireInRange('strayCapacitance', s.strayCapacitance, 0, 1e-6, 'Stray capacitance', 'F');
  let reactance: { minimum: number; maximum: number } = DEFAULT_REACTANCE;
  if (s.reactanceRange !== undefined) {
    const r = requireObject<{ minimum: number; maximum: number }>('reactanceRange', s.reactanceRange, 'The reactance window');
    const minimum = requireInRange('reactanceRange.minimum', r.minimum, 0.01, 1e7, 'The smallest reactance', 'Ω');
    const maximum = requireInRange('reactanceRange.maximum', r.maximum, 0.01, 1e7, 'The largest reactance', 'Ω');
    if (maximum <= minimum) throw new DesignError('reactanceRange.maximum', `The largest reactance ${sayQuantity(maximum, 'Ω')} must be above the smallest ${sayQuantity(minimum, 'Ω')}.`);
    reactance = { minimum, maximum };
  }
  const tolC = s.capacitanceTolerance === undefined ? SERIES_TOLERANCE[capacitorSeries] : requireTolerance('capacitanceTolerance', s.capacitanceTolerance, 'The capacitors\' tolerance');
  const tolL = s.inductanceTolerance === undefined ? SERIES_TOLERANCE[inductorSeries === 'none' ? 'E12' : inductorSeries] : requireTolerance('inductanceTolerance', s.inductanceTolerance, 'The inductors\' tolerance');
  const tolS = s.strayTolerance === undefined ? 0 : requireTolerance('strayTolerance', s.strayTolerance, 'The strays\' tolerance');
  const count = s.count === undefined ? 10 : requireWhole('count', s.count, 1, 200, 'The number of pairs to list');
  const mc = monteCarloOptions(s);
  const notes: DesignNote[] = [];

  const w = TWO_PI * target;
  const w2 = w * w;
  // Capacitors: reactance window at the target, within what is made.
  const cLow = Math.max(CAPACITOR_LIMITS[0], 1 / (w * reactance.maximum));
  const cHigh = Math.min(CAPACITOR_LIMITS[1], 1 / (w * reactance.minimum));
  const capacitorSet = new Set<number>(cLow <= cHigh ? seriesValuesBetween(capacitorSeries, cLow, cHigh) : []);
  for (const coil of shop) {
    const need = 1 / (w2 * coil.inductance) - stray - coil.selfCapacitance;
    if (need < CAPACITOR_LIMITS[0] || need > CAPACITOR_LIMITS[1]) continue;
    const n = preferredNeighbours(need, capacitorSeries);
    for (const c of [n.below, n.above]) if (c >= CAPACITOR_LIMITS[0] && c <= CAPACITOR_LIMITS[1]) capacitorSet.add(c);
  }
  const capacitors = [...capacitorSet].sort((a, b) => a - b);

  // Inductors: what those capacitors need with the strays, one step wider either side.
  const inductors: Inductor[] = [];
  if (inductorSeries !== 'none' && capacitors.length > 0) {
    const lLow = Math.max(INDUCTOR_LIMITS[0], 1 / (w2 * (capacitors[capacitors.length - 1] + stray)) / 1.5);
    const lHigh = Math.min(INDUCTOR_LIMITS[1], (1 / (w2 * (capacitors[0] + stray))) * 1.5);
    if (lLow <= lHigh) {
      for (const l of seriesValuesBetween(inductorSeries, lLow, lHigh)) {
        inductors.push({ source: 'series', name: `${sayQuantity(l, 'H')} (${inductorSeries})`, inductance: l, selfCapacitance: 0 });
      }
    }
  }
  inductors.push(...shop);

  // Exhaustive search, best `count` kept.
  const best: Array<{ inductor: Inductor; capacitance: number; frequency: number; error: number }> = [];
  let pairsSearched = 0;
  for (const inductor of inductors) {
    const sqrtL = Math.sqrt(inductor.inductance);
    for (const c of capacitors) {
      const frequency = 1 / (TWO_PI * sqrtL * Math.sqrt(c + stray + inductor.selfCapacitance));
      insertRanked(best, { inductor, capacitance: c, frequency, error: (frequency - target) / target }, count);
    }
    pairsSearched += capacitors.length;
  }
  if (best.length === 0) {
    notes.push(note('info', `No fixed pair fits ${sayQuantity(target, 'Hz', 4)}: the capacitors a tank there would need lie outside 1 pF … 10 µF or the reactance window. Widen the window or give the shop's coils.`, 'frequency'));
  }

  const candidates: PairCandidate[] = best.map((b) => {
    const parts: PairParts = { inductance: b.inductor.inductance, capacitance: b.capacitance, stray, self: b.inductor.selfCapacitance, tolL, tolC, tolS };
    const lower = seriesValuesBetween(capacitorSeries, CAPACITOR_LIMITS[0], b.capacitance).filter((c) => c < b.capacitance).reverse();
    const candidate: PairCandidate = {
      inductor: { ...b.inductor },
      capacitance: b.capacitance,
      frequency: b.frequency,
      error: b.error,
      characteristicImpedance: Math.sqrt(b.inductor.inductance) / Math.sqrt(b.capacitance + stray + b.inductor.selfCapacitance),
      spread: spreadOf(parts, mc, false),
      trimmer: trimmerFor(parts, target, lower),
    };
    if (band) candidate.spreadInBand = candidate.spread.worstCase.low >= band.low && candidate.spread.worstCase.high <= band.high;
    return candidate;
  });

  for (const coil of shop) {
    if (coil.selfCapacitance <= 0) continue;
    const srf = thomson(coil.inductance, coil.selfCapacitance);
    if (target > 0.5 * srf) {
      notes.push(note('validity', `Shop coil “${coil.name}” self-resonates at ${sayQuantity(srf, 'Hz', 3)}: above half of that the lumped model (L with its self-capacitance across it) loses accuracy.`, 'shopCoils'));
    }
  }
  if (candidates.some((c) => c.trimmer === null)) {
    notes.push(note('info', 'Where no trimmer is given, the strays and the coil\'s own capacitance alone already tune some units below the target: a smaller coil is needed.', 'strayCapacitance'));
  }
  notes.push(note('info', mc.distribution === 'uniform'
    ? 'Monte-Carlo units draw each part uniformly within its tolerance.'
    : 'Monte-Carlo units draw each part from a normal spread with the tolerance as 3σ, cut at the tolerance.', 'distribution'));
  return { target, candidates, pairsSearched, notes };
}
