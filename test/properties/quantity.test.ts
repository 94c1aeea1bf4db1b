import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  formatQuantity, parseQuantity, looksLikeExpression, looksLikeRange, isQuantityError, QUANTITY_UNITS, type QuantityUnit,
} from '../../src/quantity';

const unitArb = fc.constantFrom<QuantityUnit>(...QUANTITY_UNITS);
const valueArb = fc.double({ min: 1e-15, max: 1e12, noNaN: true, noDefaultInfinity: true });
const figuresArb = fc.integer({ min: 1, max: 10 });

/** Half a unit in the last shown figure, relative to the value: 0.5 × 10^(1 − sig). */
function roundingBound(value: number, sig: number): number {
  return Math.abs(value) * (0.5 * 10 ** (1 - sig) * (1 + 1e-9) + 1e-15);
}

describe('formatQuantity → parseQuantity round trip', () => {
  it('returns every finite positive value 1e-15…1e12 within the rounding of the figures shown, for every unit', () => {
    fc.assert(
      fc.property(valueArb, unitArb, figuresArb, (value, unit, sig) => {
        const text = formatQuantity(value, unit, sig);
        const back = parseQuantity(text, unit);
        expect(Math.abs(back - value)).toBeLessThanOrEqual(roundingBound(value, sig));
      }),
      { numRuns: 3000 },
    );
  });
  it('holds for negative values too', () => {
    fc.assert(
      fc.property(valueArb, unitArb, figuresArb, (value, unit, sig) => {
        const back = parseQuantity(formatQuantity(-value, unit, sig), unit);
        expect(Math.abs(back + value)).toBeLessThanOrEqual(roundingBound(value, sig));
      }),
      { numRuns: 1000 },
    );
  });
  it('never writes a spelling the parser refuses as ambiguous (mF, MF, mHz)', () => {
    fc.assert(
      fc.property(valueArb, figuresArb, (value, sig) => {
        expect(formatQuantity(value, 'F', sig)).not.toMatch(/[mM]F$/);
        expect(formatQuantity(value, 'Hz', sig)).not.toMatch(/mHz$/);
      }),
    );
  });
});

describe('parseQuantity on any text', () => {
  it('returns a finite number or throws a QuantityError, never anything else', () => {
    const chars = fc.constantFrom(...'0123456789.,eE+-*/^() pnumkMGTKUNRVHFzΩΩµμ"hfamsin\t'.split(''));
    const textArb = fc.oneof(fc.string({ maxLength: 30 }), fc.array(chars, { maxLength: 14 }).map((a) => a.join('')));
    fc.assert(
      fc.property(textArb, unitArb, (text, unit) => {
        try {
          const v = parseQuantity(text, unit);
          expect(Number.isFinite(v)).toBe(true);
        } catch (e) {
          expect(isQuantityError(e)).toBe(true);
          // a range is refused as a range before it could be taken for a calculation
          expect((e as { needsExpression: boolean }).needsExpression).toBe(looksLikeExpression(text) && !looksLikeRange(text));
        }
      }),
      { numRuns: 5000 },
    );
  });
  it('reads RKM style as the same value as the decimal form (4k7 = 4.7k)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 999 }),
        fc.stringMatching(/^[0-9]{1,3}$/),
        fc.constantFrom('p', 'n', 'u', 'k', 'M'),
        (whole, frac, prefix) => {
          expect(parseQuantity(`${whole}${prefix}${frac}`, 'F')).toBe(parseQuantity(`${whole}.${frac}${prefix}`, 'F'));
        },
      ),
    );
  });
});
