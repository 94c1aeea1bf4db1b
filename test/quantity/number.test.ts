/**
 * The one plain-number grammar (turns, Q, μ′, °C) and the range check, used
 * both when typing and when reading a link. The rules are our own, stated on
 * the Entering values page; expected values are worked by hand.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { checkRange, parsePlainNumber, POSITIVE, QuantityError, rangeProblem, type PlainNumberRule } from '../../src/quantity';

const TEMPERATURE: PlainNumberRule = { min: -60, max: 200, unit: '°C' };
const TURNS: PlainNumberRule = { min: 1, max: 100000, step: 0.5 };

function refusal(text: string, rule: PlainNumberRule, what = 'The value'): QuantityError {
  try {
    parsePlainNumber(text, rule, what);
  } catch (e) {
    expect(e).toBeInstanceOf(QuantityError);
    return e as QuantityError;
  }
  throw new Error(`“${text}” was accepted`);
}

describe('parsePlainNumber: accepted', () => {
  it.each([
    ['12', {}, 12],
    ['+12', {}, 12],
    ['10.5', {}, 10.5],
    ['.5', {}, 0.5],
    ['5.', {}, 5],
    ['2.5e-4', {}, 2.5e-4],
    ['1E3', {}, 1000],
    ['  150  ', {}, 150],
    ['-10', TEMPERATURE, -10],
    ['\u221210', TEMPERATURE, -10], // the minus sign U+2212, as typeset text pastes it
    ['- 10', TEMPERATURE, -10],
    ['-60', TEMPERATURE, -60], // the bounds themselves are allowed
    ['200', TEMPERATURE, 200],
    ['25 °C', TEMPERATURE, 25], // the rule's own unit may follow
    ['25°C', TEMPERATURE, 25],
    ['10.5', TURNS, 10.5],
    ['1e\u22123', {}, 1e-3],
  ] as const)('%j with %j is %d', (text, rule, expected) => {
    expect(parsePlainNumber(text, rule)).toBe(expected);
  });
  it('returns +0 for -0', () => {
    expect(Object.is(parsePlainNumber('-0', TEMPERATURE), 0)).toBe(true);
  });
});

describe('parsePlainNumber: refused, with a sentence that quotes the text', () => {
  it.each([
    ['250', TEMPERATURE, 'Wire temperature', 'out-of-range', /^Wire temperature must be between −60 and 200 °C; you typed “250”\.$/],
    ['-61', TEMPERATURE, 'Wire temperature', 'out-of-range', /between −60 and 200 °C; you typed “-61”/],
    ['0', TURNS, 'Turns', 'out-of-range', /^Turns must be between 1 and 100000; you typed “0”\.$/],
    ['10.3', TURNS, 'Turns', 'out-of-range', /^Turns must be a whole or half number \(10 or 10\.5\); you typed “10\.3”\.$/],
    ['-5', POSITIVE, 'Coil Q', 'out-of-range', /^Coil Q must be greater than zero; you typed “-5”\.$/],
    ['0', POSITIVE, 'Coil Q', 'out-of-range', /greater than zero/],
    ['ten', TURNS, 'Turns', 'not-a-number', /^“ten” is not a plain number: type digits, such as 12, 10\.5 or 2\.5e-4, with no unit\.$/],
    ['abc', TEMPERATURE, 'T', 'not-a-number', /such as 25 or -10 \(°C\)/],
    ['2,5', {}, 'Q', 'comma', /“2\.5” rather than “2,5”/],
    ['12 mm', {}, 'Turns', 'not-a-number', /no unit/],
    ['NaN', {}, 'Q', 'not-finite', /finite/],
    ['-Infinity', TEMPERATURE, 'T', 'not-finite', /finite/],
    ['1e999', {}, 'Q', 'not-finite', /too large/],
    ['1e-999', {}, 'Q', 'not-finite', /too small/],
    ['', {}, 'Q', 'empty', /empty/],
    ['--5', TEMPERATURE, 'T', 'not-a-number', /not a plain number/],
    ['2*6', TURNS, 'Turns', 'not-a-number', /not a plain number/],
    ['9'.repeat(201), {}, 'Q', 'too-long', /longer than 200/],
  ] as const)('%j with %j', (text, rule, what, code, message) => {
    const e = refusal(text, rule, what);
    expect(e.code).toBe(code);
    expect(e.text).toBe(text);
    expect(e.message).toMatch(message);
  });
});

describe('rangeProblem and checkRange', () => {
  it('name each kind of bound', () => {
    expect(rangeProblem(0, { min: 0, minExclusive: true })).toBe('must be greater than zero');
    expect(rangeProblem(-1, { min: 0 })).toBe('must be at least zero');
    expect(rangeProblem(5, { max: 4 }, 'V')).toBe('must be at most 4 V');
    expect(rangeProblem(4, { max: 4, maxExclusive: true })).toBe('must be less than 4');
    expect(rangeProblem(3, { step: 1 })).toBeNull();
    expect(rangeProblem(2.5, { step: 1 })).toBe('must be a whole number');
    expect(rangeProblem(NaN, { min: 0 })).toBe('must be at least zero');
  });
  it('quotes a quantity bound in engineering notation, never raw SI', () => {
    const mm = (x: number) => `${x * 1e3} mm`;
    expect(() => checkRange(-4.7e-6, { min: 1e-3 }, '-4.7u', 'Pitch', undefined, mm)).toThrow(/^Pitch must be at least 1 mm; you typed “-4\.7u”\.$/);
  });
});

describe('parsePlainNumber on any text', () => {
  it('returns a number in range or throws a QuantityError, never anything else', () => {
    const chars = fc.constantFrom(...'0123456789.,eE+-\u2212 °C∞naif'.split(''));
    const textArb = fc.oneof(fc.string({ maxLength: 20 }), fc.array(chars, { maxLength: 10 }).map((a) => a.join('')));
    fc.assert(fc.property(textArb, (text) => {
      try {
        const v = parsePlainNumber(text, TEMPERATURE, 'T');
        expect(v).toBeGreaterThanOrEqual(-60);
        expect(v).toBeLessThanOrEqual(200);
      } catch (e) {
        expect(e).toBeInstanceOf(QuantityError);
      }
    }), { numRuns: 3000 });
  });
  it('reads back every number JavaScript writes, with its sign', () => {
    fc.assert(fc.property(fc.double({ min: -1e300, max: 1e300, noNaN: true }), (x) => {
      expect(parsePlainNumber(String(x))).toBe(x + 0);
    }), { numRuns: 2000 });
  });
});
