import { describe, expect, it } from 'vitest';
import {
  parseQuantity, looksLikeExpression, QuantityError, QuantityExpressionError, isQuantityError,
  MAX_QUANTITY_LENGTH, type QuantityUnit, type QuantityErrorCode,
} from '../../src/quantity';
import { expectSI } from '../helpers/asserts';

// Expected SI values worked by hand. Sources for the rules:
// SI prefixes and unit symbols — BIPM, The International System of Units (SI Brochure, 9th ed., 2019);
// RKM code (letter as decimal point, R for ohms) — IEC 60062;
// inch = 25.4 mm exactly, mil = 0.001 in — international yard and pound agreement, 1959;
// mfd, mmfd, µµF — older radio handbooks' spelling of microfarad and picofarad (common practice, no single published source);
// meg for mega, U/K/N letters — SPICE and part-marking habit (common practice, no published source).
const ACCEPTED: ReadonlyArray<readonly [string, QuantityUnit, number]> = [
  // inductance
  ['4.7u', 'H', 4.7e-6],
  ['4u7', 'H', 4.7e-6],
  ['4.7 \u00b5H', 'H', 4.7e-6], // micro sign U+00B5
  ['4.7 \u03bcH', 'H', 4.7e-6], // Greek mu U+03BC
  ['4.7uH', 'H', 4.7e-6],
  ['4.7 uh', 'H', 4.7e-6],
  ['4.7UH', 'H', 4.7e-6],
  ['   4.7 \u00b5H   ', 'H', 4.7e-6],
  ['4.7\u00a0\u00b5H', 'H', 4.7e-6], // no-break space
  ['4.7\u2009\u00b5H', 'H', 4.7e-6], // thin space
  ['4u7H', 'H', 4.7e-6],
  ['10 nH', 'H', 10e-9],
  ['1.5 mH', 'H', 1.5e-3],
  ['1.5mh', 'H', 1.5e-3],
  ['2 H', 'H', 2],
  ['1 henry', 'H', 1],
  ['1e-6', 'H', 1e-6],
  ['1E-6', 'H', 1e-6],
  ['.5u', 'H', 0.5e-6],
  ['5.u', 'H', 5e-6],
  ['1.5e3n', 'H', 1.5e-6],
  // capacitance
  ['220p', 'F', 220e-12],
  ['220 pF', 'F', 220e-12],
  ['220pf', 'F', 220e-12],
  ['0.22n', 'F', 0.22e-9],
  ['4p7', 'F', 4.7e-12],
  ['4n7', 'F', 4.7e-9],
  ['4N7', 'F', 4.7e-9],
  ['100 nF', 'F', 100e-9],
  ['1.5 \u00b5F', 'F', 1.5e-6],
  ['0.1 mfd', 'F', 0.1e-6],
  ['100 mmfd', 'F', 100e-12],
  ['47 \u00b5\u00b5F', 'F', 47e-12],
  ['1 fF', 'F', 1e-15],
  ['10 farads', 'F', 10],
  // frequency
  ['7.1 MHz', 'Hz', 7.1e6],
  ['7.1M', 'Hz', 7.1e6],
  ['7.1MHz', 'Hz', 7.1e6],
  ['7.1 Mhz', 'Hz', 7.1e6],
  ['7.1 MHZ', 'Hz', 7.1e6],
  ['3.3 kHz', 'Hz', 3300],
  ['3.3kHz', 'Hz', 3300],
  ['455k', 'Hz', 455e3],
  ['455 KHz', 'Hz', 455e3],
  ['1.8 GHz', 'Hz', 1.8e9],
  ['14meg', 'Hz', 14e6],
  ['14 MEG', 'Hz', 14e6],
  ['2M5', 'Hz', 2.5e6],
  ['60 Hz', 'Hz', 60],
  ['455 kc', 'Hz', 455e3], // older books: kilocycles (per second)
  ['7.1 Mc', 'Hz', 7.1e6],
  ['1e6', 'Hz', 1e6],
  // resistance
  ['2k2', '\u03a9', 2200],
  ['2K2', '\u03a9', 2200],
  ['4R7', '\u03a9', 4.7],
  ['0R1', '\u03a9', 0.1],
  ['100R', '\u03a9', 100],
  ['1M5', '\u03a9', 1.5e6],
  ['4.7 k\u03a9', '\u03a9', 4700], // Greek capital omega U+03A9
  ['4.7 k\u2126', '\u03a9', 4700], // ohm sign U+2126
  ['2k2\u03a9', '\u03a9', 2200],
  ['50 ohm', '\u03a9', 50],
  ['50 ohms', '\u03a9', 50],
  ['10 megohm', '\u03a9', 10e6],
  ['1 Meg', '\u03a9', 1e6],
  // length
  ['15 mm', 'm', 0.015],
  ['0.5mm', 'm', 0.5e-3],
  ['1.2 m', 'm', 1.2],
  ['0', 'm', 0], // zero needs no unit
  ['2 cm', 'm', 0.02],
  ['1 in', 'm', 0.0254],
  ['0.25"', 'm', 0.00635],
  ['0.25\u2033', 'm', 0.00635], // double prime
  ['1.5 inch', 'm', 0.0381],
  ['3 inches', 'm', 0.0762],
  ['10 mil', 'm', 0.000254],
  ['40 \u00b5m', 'm', 40e-6],
  ['1 metre', 'm', 1],
  // voltage, current, power, time
  ['250 V', 'V', 250],
  ['4V7', 'V', 4.7],
  ['1.5 kV', 'V', 1500],
  ['3.3v', 'V', 3.3],
  ['50 mA', 'A', 0.05],
  ['10ma', 'A', 0.01],
  ['2 A', 'A', 2],
  ['5 W', 'W', 5],
  ['100 mW', 'W', 0.1],
  ['10 \u00b5s', 's', 10e-6],
  ['1 ms', 's', 1e-3],
  ['2 s', 's', 2],
  // signs and zero
  ['-5', 'V', -5],
  ['+5', 'V', 5],
  ['\u22124.7 \u00b5H', 'H', -4.7e-6], // minus sign U+2212
  ['-4u7', 'H', -4.7e-6],
  ['0', 'F', 0],
  ['0 pF', 'F', 0],
];

describe('parseQuantity: accepted inputs', () => {
  it('has at least 40 cases', () => {
    expect(ACCEPTED.length).toBeGreaterThanOrEqual(40);
  });
  it.each(ACCEPTED)('%j in a %s field', (text, unit, expected) => {
    expectSI(parseQuantity(text, unit), expected);
  });
  it('returns +0 for -0', () => {
    expect(Object.is(parseQuantity('-0', 'V'), 0)).toBe(true);
  });
  it('reads 4.7u as the nearest double to 4.7e-6, not 4.7 × 1e-6', () => {
    expect(parseQuantity('4.7u', 'H')).toBe(4.7e-6);
    expect(parseQuantity('0.22n', 'F')).toBe(0.22e-9);
  });
});

const REJECTED: ReadonlyArray<readonly [string, QuantityUnit, QuantityErrorCode, RegExp]> = [
  ['', 'H', 'empty', /empty/],
  ['   ', 'H', 'empty', /empty/],
  ['abc', 'F', 'not-a-number', /not a number/],
  ['\u00b5H', 'H', 'not-a-number', /not a number/],
  ['NaN', 'F', 'not-finite', /finite/],
  ['Infinity', 'F', 'not-finite', /finite/],
  ['-Infinity', 'F', 'not-finite', /finite/],
  ['\u221e', 'F', 'not-finite', /finite/],
  ['1e999', 'F', 'not-finite', /too large/],
  ['1e999999999999999999999', 'F', 'not-finite', /too large/],
  ['1e308T', 'Hz', 'not-finite', /too large/],
  ['1e-999', 'F', 'not-finite', /too small/],
  ['+', 'F', 'not-a-number', /not a number/],
  ['-', 'F', 'not-a-number', /not a number/],
  ['*', 'F', 'not-a-number', /not a number/],
  ['/', 'F', 'not-a-number', /not a number/],
  ['()', 'F', 'not-a-number', /not a number/],
  ['4.7 pF', 'H', 'wrong-unit', /^pF is a capacitance; this field needs an inductance in henries \(H\)\.$/],
  ['7.1 MHz', 'F', 'wrong-unit', /MHz is a frequency; this field needs a capacitance in farads \(F\)/],
  ['15 mm', 'H', 'wrong-unit', /mm is a length/],
  ['2k2\u03a9', 'F', 'wrong-unit', /resistance/],
  ['4R7', 'H', 'wrong-unit', /resistance/],
  ['1 in', 'F', 'wrong-unit', /length/],
  ['7.1mhz', 'Hz', 'ambiguous', /did you mean 7\.1 MHz/],
  ['7.1 mHz', 'Hz', 'ambiguous', /millihertz.*did you mean 7\.1 MHz/],
  ['7.1m', 'Hz', 'ambiguous', /did you mean 7\.1M/],
  ['7.1 mc', 'Hz', 'ambiguous', /did you mean 7\.1 MHz/],
  ['0.1 mF', 'F', 'ambiguous', /microfarads/],
  ['0.1 mf', 'F', 'ambiguous', /microfarads/],
  ['0.1 MF', 'F', 'ambiguous', /microfarads/],
  ['1f', 'F', 'ambiguous', /femtofarads or 1 F/],
  ['1m5', 'm', 'ambiguous', /1\.5 m for metres or 1\.5 mm/],
  // a length without its unit: metres or millimetres? (our rule, stated on the Entering values page)
  ['20', 'm', 'no-unit', /^“20” has no unit; did you mean 20 mm\?/],
  ['1.2', 'm', 'no-unit', /did you mean 1\.2 mm\?/],
  ['-20', 'm', 'no-unit', /did you mean -20 mm\?/],
  // a range where one value is wanted
  ['10p..365p', 'F', 'range', /^A range is not allowed here: give one value, e\.g\. 10p\.$/],
  ['5.9–6.2 MHz', 'Hz', 'range', /give one value, e\.g\. 5\.9 MHz\./],
  ['10p to 365p', 'F', 'range', /not allowed here/],
  ['10…365p', 'F', 'range', /e\.g\. 10p\./],
  ['4,7', 'F', 'comma', /point.*4u7/],
  ['1,000', 'Hz', 'comma', /1,000/],
  ['4,7u', 'H', 'comma', /point/],
  ['220PF', 'F', 'unknown-unit', /did you mean 220 pF\?/],
  ['15MM', 'm', 'unknown-unit', /did you mean 15 mm\?/],
  ['220P', 'F', 'unknown-unit', /did you mean 220p\?/],
  ['4.7 xH', 'H', 'unknown-unit', /“xH” is not a unit/],
  ['4.7 \u00b5 H', 'H', 'unknown-unit', /not a unit/],
  ['4p7pF', 'F', 'unknown-unit', /write 4p7 or 4\.7 pF/],
  ['1 000', 'Hz', 'unknown-unit', /not a unit/],
  ['0x10', 'Hz', 'unknown-unit', /not a unit/],
  ['4.7.1', 'H', 'unknown-unit', /not a unit/],
  ['5 S', 's', 'unknown-unit', /did you mean 5 s\?/],
  ['1'.repeat(MAX_QUANTITY_LENGTH + 1), 'F', 'too-long', /longer than 200 characters/],
];

describe('parseQuantity: rejected inputs', () => {
  it('has at least 20 cases', () => {
    expect(REJECTED.length).toBeGreaterThanOrEqual(20);
  });
  it.each(REJECTED)('%j in a %s field → %s', (text, unit, code, message) => {
    let caught: unknown;
    try {
      parseQuantity(text, unit);
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(QuantityError);
    const err = caught as QuantityError;
    expect(err.code).toBe(code);
    expect(err.text).toBe(text);
    expect(err.message).toMatch(message);
    expect(err.needsExpression).toBe(false);
    // one sentence for a technician: no line breaks, ends with . or ?
    expect(err.message).not.toMatch(/\n/);
    expect(err.message).toMatch(/[.?]$/);
    expect(isQuantityError(err)).toBe(true);
  });
  it('is a QuantityError, also seen across realms', () => {
    const plain = { name: 'QuantityError', text: 'x', code: 'empty', message: 'm' };
    expect(isQuantityError(plain)).toBe(true);
    expect(isQuantityError(new Error('x'))).toBe(false);
    expect(isQuantityError(null)).toBe(false);
  });
});

describe('calculations are not worked out by parseQuantity', () => {
  it.each(['2*47p', '100p + 22p', '1/((2*pi*7.1MHz)^2 * 4.7uH)', 'sqrt(4.7u/100p)', '2pi', '47p\u00d72', '1e-6-1'])(
    '%j throws QuantityExpressionError with needsExpression',
    (text) => {
      let caught: unknown;
      try {
        parseQuantity(text, 'F');
      } catch (e) {
        caught = e;
      }
      expect(caught).toBeInstanceOf(QuantityExpressionError);
      expect(caught).toBeInstanceOf(QuantityError);
      expect((caught as QuantityError).needsExpression).toBe(true);
      expect((caught as QuantityError).code).toBe('expression');
      expect((caught as QuantityError).text).toBe(text);
    },
  );
});

describe('looksLikeExpression', () => {
  it.each([
    '2*47p', '100p + 22p', '1/((2*pi*7.1MHz)^2 * 4.7uH)', 'sqrt(4.7u/100p)', '2pi', '\u03c0*2', '47p\u00d72', '1\u00f72',
    '-5+1', '1e-6-1', '2k-1', '(4u7)', 'pi', '--5', '2^10',
  ])('%j is a calculation', (text) => {
    expect(looksLikeExpression(text)).toBe(true);
  });
  it.each(['1e-6', '1E+6', '-5', '+5', '\u22125', '4u7', '2k2', '4.7 \u00b5H', '220 pF', '', '+', '*', '()', '1,000', 'abc'])(
    '%j is not a calculation',
    (text) => {
      expect(looksLikeExpression(text)).toBe(false);
    },
  );
});
