/**
 * Permeability (slug) tuning: a coil whose inductance a slug in its former
 * adjusts over L_min … L_max, with the capacitor network of `bandCoverage`
 * (band.ts). Every frequency scales by √(L/L′), so the slug moves the band
 * without changing its ratio, which the capacitor network alone sets.
 *
 * Sources: Thomson's formula (Terman, *Radio Engineers' Handbook*, 1943,
 * section 3); the window of inductance that covers a band is our own
 * derivation from it (method page, "Tuning with a slug"). Validity: as
 * band.ts (lumped, lossless, strays constant across the band); the slug's
 * effect on the coil's Q and self-capacitance is not modelled.
 */
import { checkBand, checkNetwork, coverageOf, LIMIT_TOLERANCE, partnerAt, type BandCircuit, type BandCoverage } from './band';
import { DesignError, requireFinite, requireObject } from './errors';
import { note, type DesignNote } from './notes';
import { tankValue } from './tankModel';
import { sayNumber, sayQuantity } from './text';

/** What `slugTuning` takes: the capacitor network and the coil's inductance range (min/max, or inductance ± adjustment). */
export interface SlugTuningInput {
  minCapacitance: number;
  maxCapacitance: number;
  strayCapacitance: number;
  trimmerCapacitance?: number;
  padderCapacitance?: number;
  /** Coil with the slug fully out, H (with maxInductance). */
  minInductance?: number;
  /** Coil with the slug fully in, H (with minInductance). */
  maxInductance?: number;
  /** Coil's nominal inductance, H (with adjustment, instead of min/max). */
  inductance?: number;
  /** Slug range as a fraction either way: L (1 − a) … L (1 + a), 0 < a < 1. */
  adjustment?: number;
  /** A band to set with the slug (both ends or neither), Hz. */
  lowFrequency?: number;
  highFrequency?: number;
}

/** The slug's setting for a band, from `slugTuning`. */
export interface SlugSetting {
  /** Inductance that puts the capacitor's low end exactly on the band's low end, H (the smallest that still covers). */
  inductanceForLowEnd: number;
  /** Inductance that puts the capacitor's high end exactly on the band's high end, H (the largest that still covers). */
  inductanceForHighEnd: number;
  /** Inductance to set: the window's geometric middle (equal spare at both ends), clamped to the slug's range, H. */
  inductance: number;
  /** Spare at each end at that inductance, as a fraction of frequency (0 = exact). */
  spare: number;
  /** Band covered at that inductance, Hz. */
  lowFrequency: number;
  highFrequency: number;
  /** True when the slug reaches an inductance that covers the band. */
  withinSlugRange: boolean;
}

/** What `slugTuning` returns. */
export interface SlugTuning {
  minInductance: number;
  maxInductance: number;
  /** Frequency ratio the slug alone gives at any one capacitor setting, √(L_max/L_min). */
  slugFrequencyRatio: number;
  /** Frequency ratio the capacitor gives at any one slug setting. */
  capacitorRatio: number;
  /** Band with the slug fully in (largest L) and fully out (smallest L), Hz. */
  slugIn: BandCoverage;
  slugOut: BandCoverage;
  /** Lowest and highest frequency reachable with slug and capacitor, Hz. */
  lowestFrequency: number;
  highestFrequency: number;
  /** The slug's setting for the band given (when one was). */
  setting?: SlugSetting;
  notes: DesignNote[];
}

function inductanceRange(input: SlugTuningInput): { lo: number; hi: number } {
  const hasRange = input.minInductance !== undefined || input.maxInductance !== undefined;
  const hasNominal = input.inductance !== undefined || input.adjustment !== undefined;
  if (hasRange && hasNominal) {
    throw new DesignError('inductance', 'Give the slug\'s range either as minimum and maximum inductance, or as an inductance and an adjustment, not both.');
  }
  if (hasNominal) {
    const l = tankValue('inductance', input.inductance, 'Inductance', 'H');
    const a = requireFinite('adjustment', input.adjustment, 'The slug\'s adjustment');
    if (!(a > 0 && a < 1)) throw new DesignError('adjustment', `The slug's adjustment is a fraction either way, above 0 and below 1 (0.1 for ±10 %); got ${sayNumber(a)}.`);
    return { lo: l * (1 - a), hi: l * (1 + a) };
  }
  const lo = tankValue('minInductance', input.minInductance, 'The coil\'s minimum inductance (slug out)', 'H');
  const hi = tankValue('maxInductance', input.maxInductance, 'The coil\'s maximum inductance (slug in)', 'H');
  if (!(hi > lo)) throw new DesignError('maxInductance', `The coil's maximum inductance ${sayQuantity(hi, 'H')} must be above its minimum ${sayQuantity(lo, 'H')}.`);
  return { lo, hi };
}

/**
 * Permeability (slug) tuning: a coil whose inductance a slug adjusts over
 * L_min … L_max, with the capacitor network of `bandCoverage`. The slug scales
 * every frequency by √(L/L'): it moves the band without changing its ratio,
 * which the capacitor network alone sets. Returns the band at both slug ends,
 * everything reachable, and, for a band given, the inductance window that
 * covers it, L from 1/((2π f_low)² C(C_max)) to 1/((2π f_high)² C(C_min)),
 * and the setting in the window's geometric middle. Lumped and lossless.
 * @param input capacitances in F, inductances in H, band in Hz
 * @throws DesignError naming the input at fault; `highFrequency` when the capacitor's ratio cannot cover the band
 */
export function slugTuning(input: SlugTuningInput): SlugTuning {
  requireObject<SlugTuningInput>('slug', input, 'The slug tuning');
  const n = checkNetwork(input);
  const { lo, hi } = inductanceRange(input);
  const slugIn = coverageOf(n, hi);
  const slugOut = coverageOf(n, lo);
  const capacitorRatio = slugIn.frequencyRatio;
  const notes: DesignNote[] = [];
  const result: SlugTuning = {
    minInductance: lo,
    maxInductance: hi,
    slugFrequencyRatio: Math.sqrt(hi / lo),
    capacitorRatio,
    slugIn,
    slugOut,
    lowestFrequency: slugIn.lowFrequency,
    highestFrequency: slugOut.highFrequency,
    notes,
  };
  if (input.lowFrequency === undefined && input.highFrequency === undefined) return result;
  const band = checkBand(input.lowFrequency, input.highFrequency);
  const lForLow = partnerAt(slugIn.lowEndCapacitance, band.low);
  const lForHigh = partnerAt(slugIn.highEndCapacitance, band.high);
  const needed = band.high / band.low;
  if (lForLow > lForHigh * (1 + LIMIT_TOLERANCE)) {
    throw new DesignError('highFrequency', `The band ${sayQuantity(band.low, 'Hz', 4)} to ${sayQuantity(band.high, 'Hz', 4)} needs a frequency ratio of ${sayNumber(needed, 4)}, but the capacitor${n.trimmer > 0 || n.padder !== undefined ? ' with its trimmer and padder' : ''} gives ${sayNumber(capacitorRatio, 4)}: a slug moves the band but cannot widen it. Use less trimmer or padder, a larger capacitor, fewer strays, or split the band.`);
  }
  const middle = Math.sqrt(lForLow * lForHigh);
  const inductance = Math.min(Math.max(middle, lo, lForLow), hi, lForHigh);
  const within = lo <= lForHigh && hi >= lForLow;
  const at = coverageOf(n, within ? inductance : middle);
  const spare = Math.min(band.low / at.lowFrequency, at.highFrequency / band.high) - 1;
  result.setting = {
    inductanceForLowEnd: lForLow,
    inductanceForHighEnd: lForHigh,
    inductance: within ? inductance : middle,
    spare: Math.max(0, spare),
    lowFrequency: at.lowFrequency,
    highFrequency: at.highFrequency,
    withinSlugRange: within,
  };
  if (!within) {
    const short = lForLow > hi ? `it needs at least ${sayQuantity(lForLow, 'H', 4)}, but the slug fully in gives ${sayQuantity(hi, 'H', 4)}: add turns` : `it needs at most ${sayQuantity(lForHigh, 'H', 4)}, but the slug fully out gives ${sayQuantity(lo, 'H', 4)}: take off turns`;
    notes.push(note('caution', `The slug cannot set this band: ${short}.`, lForLow > hi ? 'maxInductance' : 'minInductance'));
  }
  notes.push(note('info', 'A slug moves both ends of the band together; the capacitor network sets the band\'s width. The usual alignment sets the low end with the slug and the high end with the trimmer (common practice, no published source).'));
  return result;
}
