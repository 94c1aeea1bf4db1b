/**
 * Ranges a person types: "10p..365p", "10…365 pF", "5.9–6.2 MHz" (en dash),
 * "10p to 365p". Each end is read by the single-value rules (./parse.ts);
 * when only the high end carries a unit or prefix, the low end takes it too
 * ("5.9–6.2 MHz" is 5.9 MHz to 6.2 MHz), as ranges are written on data sheets.
 * A hyphen is never a range separator: it is the minus sign.
 */
import { QuantityError, isQuantityError } from './errors';
import { parseQuantityAsync } from './async';
import { checkRange, type NumberRange } from './number';
import { lowEndWithSharedUnit, parseQuantity, splitRange } from './parse';
import type { QuantityUnit } from './units';

/** The two ends of a range, SI, low ≤ high. */
export interface QuantityRange {
  low: number;
  high: number;
}

export interface QuantityRangeOptions {
  /** Name of the field for messages ("Tuning capacitor"). */
  what?: string;
  /** Values each end must lie in (checked with its message, quoting the text). */
  allowed?: NumberRange;
  /** Formats a bound for messages (engineering notation). */
  format?: (x: number) => string;
  /** Allow both ends equal (default: refused, a range needs two values). */
  allowEqual?: boolean;
}

function ends(text: string): [string, string] {
  const parts = splitRange(text);
  if (parts === null) {
    throw new QuantityError(text, 'Give a range of two values, low..high, e.g. 10p..365p or 5.9–6.2 MHz.', 'range');
  }
  return [lowEndWithSharedUnit(parts[0], parts[1]), parts[1]];
}

function endError(text: string, which: 'low' | 'high', e: unknown): unknown {
  if (!isQuantityError(e) || e.needsExpression) return e;
  return new QuantityError(text, `In the ${which} end of the range: ${e.message}`, e.code, { cause: e });
}

function finish(text: string, low: number, high: number, lowText: string, highText: string, o: QuantityRangeOptions): QuantityRange {
  const what = o.what ?? 'Each end';
  checkRange(low, o.allowed, lowText, what, undefined, o.format);
  checkRange(high, o.allowed, highText, what, undefined, o.format);
  if (low > high) {
    throw new QuantityError(text, `This range runs backwards: ${lowText} is above ${highText}. Write the low end first: ${highText}..${lowText}.`, 'backwards');
  }
  if (low === high && !o.allowEqual) {
    throw new QuantityError(text, `Both ends of this range are the same (${highText}): give two different values.`, 'range');
  }
  return { low, high };
}

/**
 * Reads a range of two plain values for a field of `unit`, SI.
 * Throws QuantityError: 'range' when the text is not two values, 'backwards'
 * when the low end is above the high end (the message gives the range the
 * right way round), the single-value codes for a bad end (the message says
 * which end). A calculation at either end throws QuantityExpressionError:
 * use parseQuantityRangeAsync.
 */
export function parseQuantityRange(text: string, unit: QuantityUnit, options: QuantityRangeOptions = {}): QuantityRange {
  const [lowText, highText] = ends(text);
  let low: number, high: number;
  try {
    low = parseQuantity(lowText, unit);
  } catch (e) {
    throw endError(text, 'low', e);
  }
  try {
    high = parseQuantity(highText, unit);
  } catch (e) {
    throw endError(text, 'high', e);
  }
  return finish(text, low, high, lowText, highText, options);
}

/** As parseQuantityRange, also working out a calculation at either end ("2*47p..365p"); loads mathjs only then. */
export async function parseQuantityRangeAsync(text: string, unit: QuantityUnit, options: QuantityRangeOptions = {}): Promise<QuantityRange> {
  const [lowText, highText] = ends(text);
  let low: number, high: number;
  try {
    low = await parseQuantityAsync(lowText, unit);
  } catch (e) {
    throw endError(text, 'low', e);
  }
  try {
    high = await parseQuantityAsync(highText, unit);
  } catch (e) {
    throw endError(text, 'high', e);
  }
  return finish(text, low, high, lowText, highText, options);
}
