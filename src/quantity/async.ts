/**
 * Reading a value that may be a calculation. Plain values go through
 * parseQuantity and never load mathjs; calculations load it on demand.
 */
import { looksLikeExpression, looksLikeRange, parseQuantity } from './parse';
import type { QuantityUnit } from './units';

/**
 * Reads a plain value or works out a calculation ("2*47p", "100p + 22p",
 * "1/((2*pi*7.1MHz)^2 * 4.7uH)") for a field that needs `unit`; returns SI.
 * Plain values go through parseQuantity and never load mathjs. Rejects with
 * QuantityError like parseQuantity, and for calculations that cannot be
 * worked out or give a result of another kind.
 */
export async function parseQuantityAsync(text: string, unit: QuantityUnit): Promise<number> {
  if (typeof text === 'string' && looksLikeExpression(text) && !looksLikeRange(text)) {
    const { evaluateQuantityExpression } = await import('./expression');
    return evaluateQuantityExpression(text, unit);
  }
  return parseQuantity(text, unit);
}
