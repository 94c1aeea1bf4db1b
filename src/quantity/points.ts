/**
 * A short table a person types as one text: points of a plain number and a
 * quantity, "0: 365p; 45: 250p; 90: 160p; 180: 10p" (a variable capacitor's
 * capacitance at a few dial angles). Points are separated by semicolons or
 * new lines; in each, the number comes first, then a colon or equals sign
 * (or only a space), then the quantity, read by the single-value rules
 * (./parse.ts). The number may carry the rule's own unit ("90°").
 * Calculations are not read here: a table is measured figures.
 */
import { QuantityError, isQuantityError } from './errors';
import { checkRange, parsePlainNumber, quoteText, type NumberRange, type PlainNumberRule } from './number';
import { parseQuantity } from './parse';
import type { QuantityUnit } from './units';

/** One point of a typed table: x as a plain number, y SI. */
export interface QuantityPoint {
  x: number;
  y: number;
}

export interface QuantityPointsOptions {
  /** Name of the table for messages ("Plate table"). */
  what?: string;
  /** Name of the number in each point for messages ("angle"). */
  xName?: string;
  /** Rule for the number (range, its unit such as °). */
  xRule?: PlainNumberRule;
  /** Values each quantity must lie in (SI). */
  allowed?: NumberRange;
  /** Formats a bound for messages (engineering notation). */
  format?: (x: number) => string;
  /** Fewest and most points (default 2 and 24). */
  minPoints?: number;
  maxPoints?: number;
}

/** Longest table text read. */
export const MAX_POINTS_LENGTH = 600;

const SPLIT = /^\s*([^\s:=]+)\s*(?:[:=]\s*|\s+)(.+?)\s*$/;

/**
 * Reads a typed table of points, in the order typed (the caller checks any
 * order it needs). Throws QuantityError with a sentence naming the point
 * ("Point 3 (“90 abc”): …").
 */
export function parseQuantityPoints(text: string, unit: QuantityUnit, options: QuantityPointsOptions = {}): QuantityPoint[] {
  const what = options.what ?? 'The table';
  const xName = options.xName ?? 'number';
  const minPoints = options.minPoints ?? 2;
  const maxPoints = options.maxPoints ?? 24;
  if (typeof text !== 'string') throw new QuantityError(String(text), 'A table must be typed as text.', 'not-a-number');
  if (text.length > MAX_POINTS_LENGTH) throw new QuantityError(text, `${what} is longer than ${MAX_POINTS_LENGTH} characters; shorten it.`, 'too-long');
  const rows = text.split(/[;\n\r]+/).map((r) => r.trim()).filter((r) => r !== '');
  if (rows.length === 0) throw new QuantityError(text, `${what} is empty; enter points as ${xName}: value; …`, 'empty');
  if (rows.length < minPoints) throw new QuantityError(text, `${what} needs at least ${minPoints} points, separated by semicolons (“0: 365p; 180: 10p”); it has ${rows.length}.`, 'range');
  if (rows.length > maxPoints) throw new QuantityError(text, `${what} takes at most ${maxPoints} points; it has ${rows.length}.`, 'range');
  return rows.map((row, i) => {
    const where = `Point ${i + 1} (${quoteText(row)})`;
    const m = SPLIT.exec(row);
    if (!m) throw new QuantityError(text, `${where} needs two parts, the ${xName} and the value, as “90: 160p”.`, 'not-a-number');
    const read = <T>(part: string, fn: () => T): T => {
      try {
        return fn();
      } catch (e) {
        if (!isQuantityError(e)) throw e;
        const message = e.needsExpression ? 'a table takes plain values, not calculations.' : e.message.charAt(0).toLowerCase() + e.message.slice(1);
        throw new QuantityError(text, `${where}, ${part}: ${message}`, e.needsExpression ? 'expression-invalid' : e.code, { cause: e });
      }
    };
    const x = read(`the ${xName}`, () => parsePlainNumber(m[1], options.xRule ?? {}, `The ${xName}`));
    const y = read('the value', () => checkRange(parseQuantity(m[2], unit), options.allowed, m[2], 'The value', undefined, options.format));
    return { x, y };
  });
}
