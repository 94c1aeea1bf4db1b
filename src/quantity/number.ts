/**
 * Plain numbers a person types (turns, a Q, μ′, tan δ, a temperature in °C)
 * and the range a field allows. One grammar, used both when typing and when
 * reading a link, so a value the field takes is never refused in a link.
 *
 * Grammar: an optional sign (+, - or the minus sign U+2212), digits with an
 * optional decimal point, an optional exponent (1e-3, 2.5E4); spaces around
 * it are ignored; the field's own unit may follow (25 °C). A comma, a unit of
 * any other kind, NaN, infinities and overflow are refused with a sentence.
 * A minus is read wherever the range allows a negative value (−60 °C); where
 * it does not, the message names the range.
 */
import { QuantityError } from './errors';
import { MAX_QUANTITY_LENGTH } from './parse';

/** The values a field allows. Bounds are in the field's unit (SI for quantities). */
export interface NumberRange {
  /** Lowest value allowed (see minExclusive). */
  min?: number;
  /** Highest value allowed (see maxExclusive). */
  max?: number;
  /** True: `min` itself is not allowed ("greater than zero"). */
  minExclusive?: boolean;
  /** True: `max` itself is not allowed. */
  maxExclusive?: boolean;
  /** Values must be whole multiples of this: 1 for whole turns, 0.5 for half turns. */
  step?: number;
}

/** A plain-number field: its range, and the unit shown beside it (°C), if any. */
export interface PlainNumberRule extends NumberRange {
  /** Unit written after the number in messages and accepted after it when typed ("°C"). */
  unit?: string;
}

/** Greater than zero: the range of most physical inputs (a length, a Q, an inductance). */
export const POSITIVE: NumberRange = Object.freeze({ min: 0, minExclusive: true });
/** Zero or more (a lead length, a loss permeability). */
export const NON_NEGATIVE: NumberRange = Object.freeze({ min: 0 });

const PLAIN_NUMBER = /^([+\-\u2212]?)\s*(\d+(?:\.\d*)?|\.\d+)(?:[eE]([+\-\u2212]?\d+))?$/;
const NON_FINITE_WORD = /^[+\-\u2212]?\s*(nan|inf|infinity|∞)$/i;

/** The text as quoted in a message: control characters replaced, long text cut. */
export function quoteText(text: string, max = 24): string {
  const clean = String(text).replace(/[\u0000-\u001f\u007f-\u009f]/g, '?').trim();
  return `“${clean.length > max ? `${clean.slice(0, max)}…` : clean}”`;
}

/** A bound for a sentence: "zero", "200", "−60" (minus sign U+2212), with its unit. */
export function sayBound(x: number, unit?: string, format?: (x: number) => string): string {
  if (x === 0) return 'zero';
  if (format) return format(x).replace(/^-/, '\u2212');
  const n = String(Number(x.toPrecision(6))).replace('e+', 'e').replace(/^-/, '\u2212');
  return unit ? `${n} ${unit}` : n;
}

/**
 * What is wrong with `value` for `range`, as the end of a sentence
 * ("must be between −60 and 200 °C", "must be greater than zero", "must be
 * a whole number"), or null when it is allowed.
 * @param format writes a bound (quantity fields pass an engineering formatter)
 */
export function rangeProblem(value: number, range: NumberRange, unit?: string, format?: (x: number) => string): string | null {
  const { min, max, minExclusive, maxExclusive, step } = range;
  const low = min !== undefined && (minExclusive ? !(value > min) : !(value >= min));
  const high = max !== undefined && (maxExclusive ? !(value < max) : !(value <= max));
  const b = (x: number) => sayBound(x, unit, format);
  if (low || high) {
    if (min !== undefined && max !== undefined && !minExclusive && !maxExclusive) {
      return `must be between ${sayBound(min, undefined, format)} and ${b(max)}`;
    }
    if (low) return minExclusive ? `must be greater than ${b(min as number)}` : `must be at least ${b(min as number)}`;
    return maxExclusive ? `must be less than ${b(max as number)}` : `must be at most ${b(max as number)}`;
  }
  if (step !== undefined && step > 0) {
    const k = value / step;
    if (Math.abs(k - Math.round(k)) > 1e-9 * Math.max(1, Math.abs(k))) {
      return step === 1 ? 'must be a whole number' : step === 0.5 ? 'must be a whole or half number (10 or 10.5)' : `must be a multiple of ${b(step)}`;
    }
  }
  return null;
}

/** One sentence for a value outside its range: "Turns must be at least 1; you typed “0”." */
export function rangeMessage(what: string, problem: string, text: string): string {
  return `${what} ${problem}; you typed ${quoteText(text)}.`;
}

/**
 * Throws a QuantityError (code 'out-of-range') unless `value` is in `range`.
 * The message names the field (`what`), the range, and quotes `text` as typed.
 */
export function checkRange(value: number, range: NumberRange | undefined, text: string, what: string, unit?: string, format?: (x: number) => string): number {
  if (!range) return value;
  const problem = rangeProblem(value, range, unit, format);
  if (problem !== null) throw new QuantityError(text, rangeMessage(what, problem, text), 'out-of-range');
  return value;
}

function allowsNegative(rule: NumberRange): boolean {
  return rule.min === undefined || rule.min < 0;
}

/** Example of accepted input for messages, chosen so it suits the rule. */
function exampleFor(rule: PlainNumberRule): string {
  if (allowsNegative(rule)) return `25 or -10${rule.unit ? ` (${rule.unit})` : ''}`;
  if (rule.step === 1) return '12 or 150';
  return '12, 10.5 or 2.5e-4';
}

/**
 * Reads a plain number for a field with `rule`, and checks its range.
 * @param what the field's name for messages ("Wire temperature")
 * @throws QuantityError with a sentence quoting the text as typed
 */
export function parsePlainNumber(text: string, rule: PlainNumberRule = {}, what = 'The value'): number {
  if (typeof text !== 'string') throw new QuantityError(String(text), 'A value must be typed as text.', 'not-a-number');
  if (text.length > MAX_QUANTITY_LENGTH) {
    throw new QuantityError(text, `This entry is longer than ${MAX_QUANTITY_LENGTH} characters; shorten it.`, 'too-long');
  }
  let s = text.trim();
  if (s === '') throw new QuantityError(text, 'This field is empty; enter a value.', 'empty');
  if (rule.unit && s.endsWith(rule.unit)) s = s.slice(0, -rule.unit.length).trim();
  if (s.includes(',')) {
    throw new QuantityError(text, `Use a point for decimals and no thousands separators: ${quoteText(s.replace(/,/g, '.'))} rather than ${quoteText(s)}.`, 'comma');
  }
  if (NON_FINITE_WORD.test(s)) throw new QuantityError(text, `A value must be a finite number; ${quoteText(text)} is not one.`, 'not-finite');
  const m = PLAIN_NUMBER.exec(s);
  if (!m) {
    throw new QuantityError(text, `${quoteText(text)} is not a plain number: type digits, such as ${exampleFor(rule)}${rule.unit ? '' : ', with no unit'}.`, 'not-a-number');
  }
  const [, sign, digits, exp] = m;
  const exponent = exp === undefined ? 0 : Number(exp.replace('\u2212', '-'));
  let value = /[1-9]/.test(digits) ? Number(`${digits}e${exponent}`) : 0;
  if (!Number.isFinite(value)) throw new QuantityError(text, `${quoteText(text)} is too large to be a value; check the exponent.`, 'not-finite');
  if (value === 0 && /[1-9]/.test(digits)) throw new QuantityError(text, `${quoteText(text)} is too small to be a value; check the exponent.`, 'not-finite');
  if (sign === '-' || sign === '\u2212') value = -value;
  value += 0; // -0 → 0
  return checkRange(value, rule, text, what, rule.unit);
}
