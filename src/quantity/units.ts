/**
 * The units and prefixes a person may type after a number, and how they are
 * read. Tables only plus one reader (`readSuffix`); the rules themselves are
 * documented in `index.ts` and content/docs/entering-values.md.
 */
import { QuantityError } from './errors';

/** The kinds of quantity a field can ask for, by their SI symbol. */
export type QuantityUnit = 'H' | 'F' | 'Hz' | 'Ω' | 'm' | 'V' | 'A' | 'W' | 's';

/** All field units, in a fixed order. */
export const QUANTITY_UNITS: readonly QuantityUnit[] = ['H', 'F', 'Hz', 'Ω', 'm', 'V', 'A', 'W', 's'];

interface UnitKind {
  /** trade word for the kind of quantity */
  noun: string;
  /** English article before `noun` */
  article: 'a' | 'an';
  /** the unit's name, plural */
  unitName: string;
  /** examples shown when the text cannot be read */
  example: string;
  /** the unit's name in mathjs */
  mathName: string;
}

export const UNIT_KINDS: Readonly<Record<QuantityUnit, UnitKind>> = {
  H: { noun: 'inductance', article: 'an', unitName: 'henries', example: '4.7 µH or 4u7', mathName: 'H' },
  F: { noun: 'capacitance', article: 'a', unitName: 'farads', example: '220 pF or 4n7', mathName: 'F' },
  Hz: { noun: 'frequency', article: 'a', unitName: 'hertz', example: '7.1 MHz or 455k', mathName: 'Hz' },
  Ω: { noun: 'resistance', article: 'a', unitName: 'ohms', example: '2.2 kΩ or 4R7', mathName: 'ohm' },
  m: { noun: 'length', article: 'a', unitName: 'metres', example: '15 mm or 0.6 in', mathName: 'm' },
  V: { noun: 'voltage', article: 'a', unitName: 'volts', example: '250 V or 4V7', mathName: 'V' },
  A: { noun: 'current', article: 'a', unitName: 'amperes', example: '50 mA', mathName: 'A' },
  W: { noun: 'power', article: 'a', unitName: 'watts', example: '5 W', mathName: 'W' },
  s: { noun: 'time', article: 'a', unitName: 'seconds', example: '10 µs', mathName: 's' },
};

/** "an inductance in henries (H)" */
export function describeField(unit: QuantityUnit): string {
  const k = UNIT_KINDS[unit];
  return `${k.article} ${k.noun} in ${k.unitName} (${unit})`;
}

/** "a capacitance" */
export function describeKind(unit: QuantityUnit): string {
  const k = UNIT_KINDS[unit];
  return `${k.article} ${k.noun}`;
}

/**
 * Prefixes in their SI case, plus trade habits that cannot be misread:
 * K (kilo), U (micro), N (nano) from part markings and SPICE, meg/MEG/Meg (mega)
 * from SPICE. The micro signs µ (U+00B5) and μ (U+03BC) are turned into `u`
 * before this table is consulted. Longest first, so `meg` wins over `m`.
 */
const PREFIXES: ReadonlyArray<readonly [string, number]> = [
  ['meg', 6], ['MEG', 6], ['Meg', 6],
  ['f', -15], ['p', -12], ['n', -9], ['u', -6], ['m', -3],
  ['k', 3], ['M', 6], ['G', 9], ['T', 12],
  ['K', 3], ['U', -6], ['N', -9],
];

const PREFIX_SYMBOL: Readonly<Record<number, string>> = {
  [-15]: 'f', [-12]: 'p', [-9]: 'n', [-6]: 'µ', [-3]: 'm', 0: '', 3: 'k', 6: 'M', 9: 'G', 12: 'T',
};

/** Unit words that may carry a prefix, by the kind they name. */
const UNIT_WORDS: ReadonlyMap<string, QuantityUnit> = new Map<string, QuantityUnit>([
  ...(['H', 'h', 'henry', 'henries', 'henrys'] as const).map((w) => [w, 'H'] as const),
  ...(['F', 'farad', 'farads'] as const).map((w) => [w, 'F'] as const),
  // c = cycles per second, as in older books: kc, Mc
  ...(['Hz', 'hz', 'HZ', 'c', 'cps'] as const).map((w) => [w, 'Hz'] as const),
  ...(['Ω', 'ohm', 'ohms', 'Ohm', 'Ohms', 'OHM', 'OHMS'] as const).map((w) => [w, 'Ω'] as const),
  ...(['m', 'metre', 'metres', 'meter', 'meters'] as const).map((w) => [w, 'm'] as const),
  ...(['V', 'v', 'volt', 'volts'] as const).map((w) => [w, 'V'] as const),
  ...(['A', 'a', 'amp', 'amps', 'ampere', 'amperes'] as const).map((w) => [w, 'A'] as const),
  ...(['W', 'w', 'watt', 'watts'] as const).map((w) => [w, 'W'] as const),
  ...(['s', 'sec', 'secs', 'second', 'seconds'] as const).map((w) => [w, 's'] as const),
]);

const HZ_WORDS = new Set(['Hz', 'hz', 'HZ', 'c', 'cps']);

/** Whole suffixes with a fixed meaning that take no prefix. */
type Fixed = { unit: QuantityUnit; exp: number; factor: number };
const FIXED_SUFFIXES = new Map<string, Fixed>();
function fixed(words: string[], unit: QuantityUnit, exp: number, factor = 1): void {
  for (const w of words) FIXED_SUFFIXES.set(w, { unit, exp, factor });
}
fixed(['cm'], 'm', -2);
fixed(['in', 'inch', 'inches', '"'], 'm', 0, 0.0254); // 1 in = 25.4 mm exactly
fixed(['mil', 'mils', 'thou'], 'm', 0, 0.0000254); // 1/1000 in
// Older radio books: mfd = microfarad, mmfd / µµF = micro-microfarad = picofarad.
fixed(['mfd', 'MFD', 'Mfd'], 'F', -6);
fixed(['mmfd', 'MMFD', 'uuF', 'uuf', 'uufd'], 'F', -12);
// R for ohms, as on resistors: 100R, 4R7.
fixed(['R'], 'Ω', 0);

/** Farad spellings with two common readings (older microfarad vs SI milli/mega). */
const AMBIGUOUS_FARADS = new Set(['mf', 'mF', 'MF', 'Mf']);

/** What a suffix means: unit (null = none written), decimal exponent, and an extra factor (inches). */
export interface SuffixReading {
  unit: QuantityUnit | null;
  exp: number;
  factor: number;
}

/** Canonical spelling of a reading, for hints: "pF", "µ", "MHz". */
export function canonicalSuffix(r: SuffixReading): string {
  const p = r.factor === 1 ? (PREFIX_SYMBOL[r.exp] ?? `e${r.exp}`) : '';
  if (r.unit === null) return p;
  if (r.factor !== 1) return r.factor === 0.0254 ? 'in' : 'mil';
  if (r.unit === 'm' && r.exp === -2) return 'cm';
  return p + r.unit;
}

/** Reads a suffix without throwing: the reading, an error sentence, or null when unknown. */
function tryReadSuffix(suffix: string, field: QuantityUnit, numberText: string): SuffixReading | { error: string; code: 'ambiguous' } | null {
  if (suffix === '') return { unit: null, exp: 0, factor: 1 };
  if (AMBIGUOUS_FARADS.has(suffix)) {
    return {
      code: 'ambiguous',
      error: `${suffix} is ambiguous (older books mean microfarads, SI means millifarads): write µF or uF for microfarads, or 1000 µF for a millifarad.`,
    };
  }
  if (suffix === 'm') {
    if (field === 'm') return { unit: 'm', exp: 0, factor: 1 };
    if (field === 'Hz') {
      return { code: 'ambiguous', error: `In a frequency field m would mean millihertz; did you mean ${numberText}M (megahertz)?` };
    }
    return { unit: null, exp: -3, factor: 1 };
  }
  if (suffix === 'f' && field === 'F') {
    return { code: 'ambiguous', error: `${numberText}f is ambiguous: write ${numberText} fF for femtofarads or ${numberText} F for farads.` };
  }
  const fixed = FIXED_SUFFIXES.get(suffix);
  if (fixed) return { ...fixed };
  const word = UNIT_WORDS.get(suffix);
  if (word) return { unit: word, exp: 0, factor: 1 };
  for (const [p, exp] of PREFIXES) {
    if (suffix === p) return { unit: null, exp, factor: 1 };
  }
  for (const [p, exp] of PREFIXES) {
    if (!suffix.startsWith(p)) continue;
    const rest = suffix.slice(p.length);
    const unit = rest === 'f' ? 'F' : UNIT_WORDS.get(rest);
    if (!unit) continue;
    if (p === 'm' && HZ_WORDS.has(rest)) {
      return { code: 'ambiguous', error: `${suffix} would mean millihertz, which never suits a tank; did you mean ${numberText} MHz (megahertz)?` };
    }
    return { unit, exp, factor: 1 };
  }
  return null;
}

/**
 * Reads the letters after a number (`pF`, `u`, `MHz`, `ohm`, `in`, …) for a
 * field of kind `field`. `text` is the whole input (for the error), `shown`
 * the suffix as typed (for the message), `numberText` the number as typed
 * (for hints). Throws QuantityError for an unknown or ambiguous suffix; does
 * NOT check that the unit suits the field (the caller does).
 */
export function readSuffix(suffix: string, field: QuantityUnit, text: string, shown: string, numberText: string): SuffixReading {
  const r = tryReadSuffix(suffix, field, numberText);
  if (r !== null && 'error' in r) throw new QuantityError(text, r.error, r.code);
  if (r !== null) return r;
  // Unknown: look for a case slip that reads cleanly as this field's kind (PF → pF, MM → mm).
  const lower = suffix.toLowerCase();
  const variants = [lower, suffix.charAt(0) + suffix.slice(1).toLowerCase(), suffix.charAt(0).toUpperCase() + suffix.slice(1).toLowerCase(),
    suffix.charAt(0).toLowerCase() + suffix.slice(1), suffix.charAt(0).toUpperCase() + suffix.slice(1), lower.slice(0, 1) + lower.slice(1, 2).toUpperCase() + lower.slice(2)];
  for (const v of variants) {
    if (v === suffix) continue;
    const alt = tryReadSuffix(v, field, numberText);
    if (alt !== null && !('error' in alt) && (alt.unit === null || alt.unit === field)) {
      const canon = canonicalSuffix(alt);
      const hint = alt.unit === null ? `${numberText}${canon}` : `${numberText} ${canon}`;
      throw new QuantityError(text, `“${shown}” is not a unit or prefix this field understands; did you mean ${hint}?`, 'unknown-unit');
    }
  }
  throw new QuantityError(
    text,
    `“${shown}” is not a unit or prefix this field understands; for ${describeKind(field)} write, for example, ${UNIT_KINDS[field].example}.`,
    'unknown-unit',
  );
}

/** Prefix letters that may stand for the decimal point in RKM style (IEC 60062): 4p7, 2k2, 1M5. */
export const RKM_MARKERS = 'fpnumkMGTKUN';
/** Unit letters that may stand for the decimal point: 4R7 (ohms), 4V7 (volts, as on Zener diodes). */
export const RKM_UNIT_MARKERS: Readonly<Record<string, QuantityUnit>> = { R: 'Ω', V: 'V' };
