/**
 * Reading a plain quantity ("4u7", "220 pF", "7.1 MHz", "15 mm") into SI.
 * No dependencies; calculations are recognised here (`looksLikeExpression`)
 * but worked out in ./expression.ts. The rules are listed in ./index.ts.
 */
import { QuantityError, QuantityExpressionError } from './errors';
import { RKM_MARKERS, RKM_UNIT_MARKERS, describeField, describeKind, readSuffix, type QuantityUnit } from './units';

/** Longest text accepted, in characters (plain values and calculations alike). */
export const MAX_QUANTITY_LENGTH = 200;

/**
 * Replaces look-alike characters one for one (so positions stay the same):
 * µ (U+00B5) and μ (U+03BC) → u, Ω (U+2126) → Ω (U+03A9), − (U+2212) → -,
 * ″ and ” → " (inches), × and · → *, ÷ → /.
 */
export function normalizeQuantityText(text: string): string {
  return text.replace(/[\u00b5\u03bc\u2126\u2212\u2033\u201d\u00d7\u00b7\u22c5\u00f7]/g, (c) => {
    switch (c) {
      case '\u00b5':
      case '\u03bc':
        return 'u';
      case '\u2126':
        return '\u03a9';
      case '\u2212':
        return '-';
      case '\u2033':
      case '\u201d':
        return '"';
      case '\u00f7':
        return '/';
      default:
        return '*';
    }
  });
}

const OPERATOR = /[*/^()]/;
const CONSTANT_WORD = /(^|[^A-Za-z_])(pi|tau|π)(?![A-Za-z_])/;

/**
 * True when the text is a calculation rather than a plain value: it holds an
 * operator (+ − * / ^ × ÷), a parenthesis, or the constant pi/π/tau, and at
 * least one digit or name to work with. A leading sign (-5) and an exponent
 * sign (1e-6) are parts of a number, not operators; RKM values (4u7) are plain.
 */
export function looksLikeExpression(text: string): boolean {
  if (typeof text !== 'string') return false;
  const s = normalizeQuantityText(text).trim().replace(/^[+-]\s*/, '');
  if (!/[0-9A-Za-zπ]/.test(s)) return false;
  if (OPERATOR.test(s) || CONSTANT_WORD.test(s)) return true;
  for (let i = 0; i < s.length; i++) {
    const c = s[i];
    if (c !== '+' && c !== '-') continue;
    const exponentSign = i >= 2 && (s[i - 1] === 'e' || s[i - 1] === 'E') && /[0-9.]/.test(s[i - 2]) && /[0-9]/.test(s[i + 1] ?? '');
    if (!exponentSign) return true;
  }
  return false;
}

/** A plain quantity read from text: SI value and the unit written (null when none). */
export interface QuantityReading {
  value: number;
  unit: QuantityUnit | null;
  /** True when nothing followed the number: no unit, no prefix ("20"). */
  bare?: boolean;
}

const RKM = new RegExp(`^([+-]?)\\s*(\\d+)([${RKM_MARKERS}RV])(\\d+)(\\s*)(.*)$`, 's');
const PLAIN = /^([+-]?)\s*(\d+(?:\.\d*)?|\.\d+)(?:[eE]([+-]?\d+))?(\s*)(.*)$/s;
const NON_FINITE_WORD = /^[+-]?\s*(nan|inf|infinity|∞)$/i;

/**
 * Reads one plain quantity (already trimmed and normalised; `original` is the
 * same text as typed, position for position). Returns the SI value and the
 * unit written, without checking that the unit suits the field.
 */
export function readPlainQuantity(s: string, field: QuantityUnit, original: string = s, whole: string = original): QuantityReading {
  let sign: string;
  let mantissa: string;
  let exponent = 0;
  let suffix: string;
  let numberText: string;
  let reading: { unit: QuantityUnit | null; exp: number; factor: number };

  const rkm = RKM.exec(s);
  if (rkm) {
    const [, sg, whole1, marker, frac, gap, rest] = rkm;
    sign = sg;
    mantissa = `${whole1}.${frac}`;
    numberText = original.slice(0, original.length - rest.length - gap.length);
    suffix = rest;
    const unitMarker = RKM_UNIT_MARKERS[marker];
    let markerReading: { unit: QuantityUnit | null; exp: number; factor: number };
    if (unitMarker) {
      markerReading = { unit: unitMarker, exp: 0, factor: 1 };
    } else if (marker === 'm' && field === 'm') {
      throw new QuantityError(whole, `${numberText} is ambiguous in a length field: write ${whole1}.${frac} m for metres or ${whole1}.${frac} mm for millimetres.`, 'ambiguous');
    } else {
      markerReading = readSuffix(marker, field, whole, marker, whole1);
    }
    if (rest !== '') {
      const shownRest = original.slice(original.length - rest.length);
      const after = readSuffix(rest, field, whole, shownRest, numberText);
      if (after.unit === null || after.exp !== 0 || after.factor !== 1 || (markerReading.unit !== null && markerReading.unit !== after.unit)) {
        throw new QuantityError(whole, `After ${numberText} only a unit may follow; write ${numberText} or ${whole1}.${frac} ${shownRest}.`, 'unknown-unit');
      }
      markerReading = { ...markerReading, unit: after.unit };
    }
    reading = markerReading;
  } else {
    const plain = PLAIN.exec(s);
    if (!plain) {
      if (NON_FINITE_WORD.test(s)) {
        throw new QuantityError(whole, `A value must be a finite number; “${original}” is not one.`, 'not-finite');
      }
      throw new QuantityError(whole, `“${original}” is not a number; enter ${describeField(field)}, for example ${exampleOf(field)}.`, 'not-a-number');
    }
    const [, sg, digits, exp, gap, rest] = plain;
    sign = sg;
    mantissa = digits;
    exponent = exp === undefined ? 0 : Number(exp);
    suffix = rest;
    numberText = original.slice(0, original.length - rest.length - gap.length);
    reading = readSuffix(rest, field, whole, original.slice(original.length - rest.length), numberText);
  }

  // Build the decimal text and let the engine round it once: 4.7e-6 is then
  // the nearest double to 4.7 µ, not 4.7 × 1e-6 with two roundings.
  const totalExponent = exponent + reading.exp;
  let value: number;
  if (!/[1-9]/.test(mantissa)) value = 0;
  else if (totalExponent > 400) value = Number.POSITIVE_INFINITY;
  else if (totalExponent < -400) value = 0;
  else value = Number(`${mantissa}e${totalExponent}`) * reading.factor;
  if (!Number.isFinite(value)) {
    throw new QuantityError(whole, `${numberText}${suffix ? ' ' + suffix : ''} is too large to be a value; check the exponent.`, 'not-finite');
  }
  if (value === 0 && /[1-9]/.test(mantissa)) {
    throw new QuantityError(whole, `${numberText}${suffix ? ' ' + suffix : ''} is too small to be a value; check the exponent.`, 'not-finite');
  }
  if (sign === '-') value = -value;
  const bare = rkm === null && suffix === '';
  return bare ? { value: value + 0, unit: reading.unit, bare } : { value: value + 0, unit: reading.unit };
}

function exampleOf(field: QuantityUnit): string {
  return { H: '4.7 µH', F: '220 pF', Hz: '7.1 MHz', Ω: '2.2 kΩ', m: '15 mm', V: '250 V', A: '50 mA', W: '5 W', s: '10 µs' }[field];
}

/** Throws unless `reading.unit` is none or the field's own. */
export function requireFieldUnit(reading: QuantityReading, field: QuantityUnit, text: string, shownUnit: string): number {
  if (reading.unit !== null && reading.unit !== field) {
    throw new QuantityError(text, `${shownUnit} is ${describeKind(reading.unit)}; this field needs ${describeField(field)}.`, 'wrong-unit');
  }
  return reading.value;
}

/** Checks shared by the synchronous and asynchronous parsers; returns the trimmed, normalised text. */
export function prepareQuantityText(text: string): { s: string; original: string } {
  if (typeof text !== 'string') {
    throw new QuantityError(String(text), 'A value must be typed as text.', 'not-a-number');
  }
  if (text.length > MAX_QUANTITY_LENGTH) {
    throw new QuantityError(text, `This entry is longer than ${MAX_QUANTITY_LENGTH} characters; shorten it.`, 'too-long');
  }
  const original = text.trim();
  if (original === '') {
    throw new QuantityError(text, 'This field is empty; enter a value.', 'empty');
  }
  // trim() removes the same characters from both, since normalisation maps no space.
  return { s: normalizeQuantityText(original), original };
}

/** Sentence for a comma in a plain value. */
export function commaError(text: string): QuantityError {
  return new QuantityError(
    text,
    'Use a point for decimals (4.7) or RKM style (4u7), and no thousands separators: a comma is ambiguous, since 1,000 means one thousand in some countries and one in others.',
    'comma',
  );
}

/**
 * Reads a plain quantity typed by a person and returns it in SI units for a
 * field that needs `unit`. Throws QuantityError (message for the technician,
 * `text` = input) when it cannot; throws QuantityExpressionError
 * (`needsExpression === true`) for a calculation — see parseQuantityAsync.
 */
export function parseQuantity(text: string, unit: QuantityUnit): number {
  const { s, original } = prepareQuantityText(text);
  refuseRange(text, s, original);
  if (looksLikeExpression(s)) throw new QuantityExpressionError(text);
  if (s.includes(',')) throw commaError(text);
  const reading = readPlainQuantity(s, unit, original, text);
  if (unit === 'm' && reading.bare && reading.value !== 0) throw bareLengthError(text, original);
  return requireFieldUnit(reading, unit, text, shownUnitOf(s, original));
}

/**
 * A length typed without a unit ("20") is refused: whether it means metres or
 * millimetres cannot be told, and guessing either way builds a wrong coil.
 * Zero needs no unit.
 */
export function bareLengthError(text: string, shown: string = text.trim()): QuantityError {
  return new QuantityError(text, `“${shown}” has no unit; did you mean ${shown} mm? A length needs its unit: mm, cm, m, in or mil.`, 'no-unit');
}

// ---------------------------------------------------------------------------
// Ranges ("10p..365p", "5.9–6.2 MHz", "10p to 365p"): split here, read in ./range.ts.

/** Separators that always mean a range. */
const RANGE_DOTS = /\.\.\.?|\u2026/;
/** Separators that mean a range only with a value on each side: en dash, em dash, the word "to". */
const RANGE_WORD = /(?<=\S)\s*[\u2013\u2014]\s*(?=\S)|(?<=\S)\s+to\s+(?=\S)/i;

/**
 * Splits a range into its two ends as typed ("10p..365p" → ["10p", "365p"]),
 * or returns null when the text is not written as a range. Throws QuantityError
 * for a range with more than two ends or a missing end.
 */
export function splitRange(text: string): [string, string] | null {
  if (typeof text !== 'string') return null;
  const t = text.trim();
  const m = RANGE_DOTS.exec(t) ?? RANGE_WORD.exec(t);
  if (!m) return null;
  const low = t.slice(0, m.index).trim();
  const high = t.slice(m.index + m[0].length).trim();
  if (low === '' || high === '') {
    throw new QuantityError(text, `A range needs a value at each end, e.g. 10p..365p; ${quote(t)} lacks one.`, 'range');
  }
  if (RANGE_DOTS.test(high) || RANGE_WORD.test(high)) {
    throw new QuantityError(text, `A range has two ends, e.g. 10p..365p; ${quote(t)} has more.`, 'range');
  }
  return [low, high];
}

/** True when the text is written as a range of two values. */
export function looksLikeRange(text: string): boolean {
  if (typeof text !== 'string') return false;
  return RANGE_DOTS.test(text) || RANGE_WORD.test(text.trim());
}

const BARE_NUMBER = /^[+\-\u2212]?\s*(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+\-\u2212]?\d+)?$/;
const NUMBER_THEN_SUFFIX = /^[+\-\u2212]?\s*(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+\-\u2212]?\d+)?(\s*[^\d\s.+\-*/^()].*)$/s;

/**
 * The low end of a range with the high end's unit when only the high end
 * has one, as ranges are usually written: "5.9–6.2 MHz" → "5.9 MHz",
 * "10..365p" → "10p". Any other low end is returned as it is.
 */
export function lowEndWithSharedUnit(low: string, high: string): string {
  if (!BARE_NUMBER.test(low)) return low;
  const m = NUMBER_THEN_SUFFIX.exec(high);
  return m ? `${low}${m[1]}` : low;
}

function quote(t: string): string {
  return `“${t.length > 24 ? `${t.slice(0, 24)}…` : t}”`;
}

/** A single-value field refuses a range with a sentence saying so. */
function refuseRange(text: string, s: string, original: string): void {
  if (!looksLikeRange(s)) return;
  const ends = splitRange(original);
  const example = ends ? `, e.g. ${lowEndWithSharedUnit(ends[0], ends[1])}` : '';
  throw new QuantityError(text, `A range is not allowed here: give one value${example}.`, 'range');
}

/** The unit as typed (letters after the number), for messages: "pF", "4R7". */
function shownUnitOf(s: string, original: string): string {
  const m = /^[+-]?\s*(?:\d+[A-Za-z]\d+|\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?\s*/.exec(s);
  const rest = m ? original.slice(m[0].length) : original;
  if (rest !== '') return rest;
  return original;
}
