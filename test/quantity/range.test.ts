/**
 * Ranges typed as one text ("10p..365p", "5.9–6.2 MHz"), for the band
 * planner: both ends in SI, the unit shared when only the high end has one,
 * a clear message for a range written backwards, and single-value fields that
 * say a range is not allowed. Rules of our own (Entering values page); values
 * worked by hand.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  formatQuantity, looksLikeRange, parseQuantity, parseQuantityRange, parseQuantityRangeAsync, POSITIVE, QuantityError, splitRange,
  type QuantityUnit,
} from '../../src/quantity';
import { refusal } from '../helpers/asserts';
import { expectSI } from '../helpers/asserts';


describe('parseQuantityRange', () => {
  it.each([
    ['10p..365p', 'F', 10e-12, 365e-12],
    ['10p...365p', 'F', 10e-12, 365e-12],
    ['10 pF … 365 pF', 'F', 10e-12, 365e-12],
    ['10..365p', 'F', 10e-12, 365e-12], // the low end takes the high end's prefix
    ['10–365 pF', 'F', 10e-12, 365e-12], // en dash, as on data sheets
    ['5.9–6.2 MHz', 'Hz', 5.9e6, 6.2e6],
    ['5.9M..6.2M', 'Hz', 5.9e6, 6.2e6],
    ['5.9M to 6.2M', 'Hz', 5.9e6, 6.2e6],
    ['4p7..22p', 'F', 4.7e-12, 22e-12], // RKM ends
    ['455k..10.7M', 'Hz', 455e3, 10.7e6],
    ['-5..5 V', 'V', -5, 5], // a leading minus is a sign, never a separator
  ] as const)('%j in a %s field', (text, unit, low, high) => {
    const r = parseQuantityRange(text, unit as QuantityUnit);
    expectSI(r.low, low);
    expectSI(r.high, high);
  });

  it('refuses a range written backwards and gives it the right way round', () => {
    const e = refusal(() => parseQuantityRange('365p..10p', 'F'));
    expect(e.code).toBe('backwards');
    expect(e.message).toBe('This range runs backwards: 365p is above 10p. Write the low end first: 10p..365p.');
  });
  it('refuses equal ends unless asked to allow them', () => {
    expect(refusal(() => parseQuantityRange('10p..10p', 'F')).message).toMatch(/same \(10p\)/);
    expect(parseQuantityRange('10p..10p', 'F', { allowEqual: true })).toEqual({ low: 10e-12, high: 10e-12 });
  });
  it('says which end is wrong, quoting it', () => {
    const e = refusal(() => parseQuantityRange('10p..365x', 'F'));
    expect(e.message).toMatch(/^In the high end of the range: “x” is not a unit/);
    expect(e.text).toBe('10p..365x');
    expect(refusal(() => parseQuantityRange('10 µH..365p', 'F')).message).toMatch(/^In the low end of the range: µH is an inductance/);
  });
  it('checks each end against the allowed values', () => {
    expect(refusal(() => parseQuantityRange('-10p..365p', 'F', { what: 'Tuning capacitor', allowed: POSITIVE })).message)
      .toBe('Tuning capacitor must be greater than zero; you typed “-10p”.');
  });
  it('asks for two values when given one', () => {
    const e = refusal(() => parseQuantityRange('365p', 'F'));
    expect(e.code).toBe('range');
    expect(e.message).toMatch(/two values, low\.\.high/);
  });
  it('refuses a missing end or a third one', () => {
    expect(refusal(() => parseQuantityRange('10p..', 'F')).message).toMatch(/a value at each end/);
    expect(refusal(() => parseQuantityRange('1p..2p..3p', 'F')).message).toMatch(/two ends/);
  });
  it('works out a calculation at either end', async () => {
    const r = await parseQuantityRangeAsync('2*47p..365p', 'F');
    expectSI(r.low, 94e-12);
    expectSI(r.high, 365e-12);
  }, 120_000);
  it('round-trips any two values written by formatQuantity', () => {
    fc.assert(fc.property(
      fc.double({ min: 1e-13, max: 1e-6, noNaN: true }), fc.double({ min: 1.01, max: 1000, noNaN: true }), fc.integer({ min: 3, max: 8 }),
      (low, ratio, sig) => {
        const a = formatQuantity(low, 'F', sig);
        const b = formatQuantity(low * ratio, 'F', sig);
        fc.pre(parseQuantity(a, 'F') < parseQuantity(b, 'F'));
        const r = parseQuantityRange(`${a}..${b}`, 'F');
        expect(r).toEqual({ low: parseQuantity(a, 'F'), high: parseQuantity(b, 'F') });
      },
    ), { numRuns: 1000 });
  });
});

describe('a single-value field and a range', () => {
  it('says a range is not allowed there, with the low end as an example', () => {
    for (const [text, example] of [['10p..365p', '10p'], ['5.9–6.2 MHz', '5.9 MHz'], ['10..365 pF', '10 pF']]) {
      const e = refusal(() => parseQuantity(text, text.includes('Hz') ? 'Hz' : 'F'));
      expect(e.code).toBe('range');
      expect(e.message).toBe(`A range is not allowed here: give one value, e.g. ${example}.`);
    }
  });
  it('does not take a minus sign or an exponent for a range', () => {
    expect(looksLikeRange('-5')).toBe(false);
    expect(looksLikeRange('1e-3')).toBe(false);
    expect(looksLikeRange('\u22125 V')).toBe(false);
    expect(looksLikeRange('–5')).toBe(false); // an en dash with nothing before it is not a range
    expect(splitRange('4.7')).toBeNull();
  });
});
