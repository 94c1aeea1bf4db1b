import { beforeAll, describe, expect, it } from 'vitest';
import { parseQuantityAsync, QuantityError, type QuantityUnit, type QuantityErrorCode } from '../../src/quantity';
import { loadRestrictedMath, tokenizeExpression, expressionEngineLoaded } from '../../src/quantity/expression';
import { expectSI } from '../helpers/asserts';

async function rejection(text: string, unit: QuantityUnit): Promise<QuantityError> {
  try {
    await parseQuantityAsync(text, unit);
  } catch (e) {
    expect(e).toBeInstanceOf(QuantityError);
    return e as QuantityError;
  }
  throw new Error(`${text} was accepted`);
}

const TWO_PI = 2 * Math.PI;

// The first import of mathjs (transformed by Vite in tests) can take seconds on a
// busy 2-core machine: load it once here, outside the per-test time limit.
beforeAll(async () => {
  await loadRestrictedMath();
}, 120_000);

describe('parseQuantityAsync: calculations', () => {
  const cases: ReadonlyArray<readonly [string, QuantityUnit, number]> = [
    ['2*47p', 'F', 94e-12],
    ['100p + 22p', 'F', 122e-12],
    ['100pF + 22pF', 'F', 122e-12],
    ['100p \u00d7 2', 'F', 200e-12], // × sign
    ['1\u00f72', 'V', 0.5], // ÷ sign
    // Thomson's formula rearranged, C = 1 / ((2πf)² L); exact expression, value ≈ 106.91 pF
    ['1/((2*pi*7.1MHz)^2 * 4.7uH)', 'F', 1 / ((TWO_PI * 7.1e6) ** 2 * 4.7e-6)],
    // characteristic impedance √(L/C) of 4.7 µH and 100 pF ≈ 216.79 Ω (exact expression)
    ['sqrt(4.7u/100p)', '\u03a9', Math.sqrt(4.7e-6 / 100e-12)],
    ['sqrt(4.7uH/100pF)', '\u03a9', Math.sqrt(4.7e-6 / 100e-12)],
    // Thomson's formula f = 1/(2π√(LC)) ≈ 7.341 MHz (exact expression)
    ['1/(2*pi*sqrt(4.7uH*100pF))', 'Hz', 1 / (TWO_PI * Math.sqrt(4.7e-6 * 100e-12))],
    // inductive reactance X = 2πfL (exact expression)
    ['2*pi*7.1MHz*4.7uH', '\u03a9', TWO_PI * 7.1e6 * 4.7e-6],
    ['2 * 3.3k', '\u03a9', 6600],
    ['4u7 * 2', 'H', 9.4e-6],
    ['2k2\u03a9 + 4R7', '\u03a9', 2204.7], // R is the ohm: both terms carry a unit
    ['(1 + 2) * 1k', '\u03a9', 3000],
    ['1 in + 10 mm', 'm', 0.0354], // 25.4 mm + 10 mm
    ['15mm/2', 'm', 0.0075],
    ['2*10mm', 'm', 0.02],
    ['0*1', 'm', 0], // zero needs no unit
    ['-(2*47p)', 'F', -94e-12],
    ['2pi*1M', 'Hz', TWO_PI * 1e6],
    ['\u03c0*1M', 'Hz', Math.PI * 1e6],
    ['max(47p, 100p)', 'F', 100e-12],
    ['hypot(3, 4)', '\u03a9', 5],
    ['4.7uH/1uH', 'H', 4.7], // dimensionless result is taken in the field's unit
    ['2^10', 'Hz', 1024],
  ];
  it.each(cases)('%j in a %s field', async (text, unit, expected) => {
    expectSI(await parseQuantityAsync(text, unit), expected);
  });

  it('reads plain values exactly as parseQuantity does', async () => {
    expect(await parseQuantityAsync('4u7', 'H')).toBe(4.7e-6);
    expect(await parseQuantityAsync('7.1 MHz', 'Hz')).toBe(7.1e6);
    await expect(parseQuantityAsync('4.7 pF', 'H')).rejects.toThrow('pF is a capacitance; this field needs an inductance in henries (H).');
  });
});

describe('parseQuantityAsync: refused calculations', () => {
  const refused: ReadonlyArray<readonly [string, QuantityUnit, QuantityErrorCode, RegExp]> = [
    ['1/((2*pi*7.1MHz)^2 * 4.7uH)', 'H', 'wrong-unit', /gives a capacitance \(F\), but this field needs an inductance in henries \(H\)/],
    ['7.1MHz * 2', 'F', 'wrong-unit', /gives a frequency \(Hz\)/],
    ['4.7uH * 100pF', 'F', 'wrong-unit', /gives a value in/],
    ['100p + 22pF', 'F', 'expression-invalid', /with a unit and one without/],
    ['2k2 + 4R7', '\u03a9', 'expression-invalid', /with a unit and one without/],
    ['1/0', 'F', 'not-finite', /no finite value/],
    ['1e300k * 1e300k', 'F', 'not-finite', /no finite value/],
    ['sqrt(-1)', 'F', 'not-finite', /complex/],
    ['(1', 'F', 'expression-invalid', /could not be worked out/],
    ['2*', 'F', 'expression-invalid', /could not be worked out/],
    ['foo(1)', 'F', 'expression-invalid', /cannot be used/],
    ['x*2', 'F', 'expression-invalid', /not a name/],
    ['2*47p,3', 'F', 'comma', /point/],
    ['2*4,7p', 'F', 'comma', /point/],
    ['7.1mhz*2', 'Hz', 'ambiguous', /MHz/],
    ['4.7pF*2', 'H', 'wrong-unit', /gives a capacitance/],
    ['1+'.repeat(100) + '1', 'F', 'too-long', /200 characters/],
    // a length needs its unit in a calculation too (our rule, Entering values page)
    ['2*10', 'm', 'no-unit', /^This calculation gives 20 with no unit, and a length needs one: write the unit on its numbers/],
    ['10mm/2mm', 'm', 'no-unit', /gives 5 with no unit/],
    ['2*5p..10p', 'F', 'range', /A range is not allowed here/],
  ];
  it.each(refused)('%j in a %s field → %s', async (text, unit, code, message) => {
    const err = await rejection(text, unit);
    expect(err.code).toBe(code);
    expect(err.message).toMatch(message);
    expect(err.text).toBe(text);
    expect(err.message).not.toMatch(/\n/);
  });
});

describe('parseQuantityAsync: hostile calculations', () => {
  // Attempts to reach mathjs functions that alter or re-enter the parser
  // (mathjs documentation, "Security": import, createUnit, evaluate, parse,
  // simplify, derivative), and common sandbox-escape shapes.
  it.each([
    'import({}, {override: true})',
    'import({pi: 3}, {override: true})',
    'createUnit("foo")',
    'createUnit("pF", "1 F")',
    'evaluate("1+1")',
    'parse("1")',
    'compile("1")',
    'simplify("x")',
    'derivative("x^2", "x")',
    'resolve(1)',
    'reviver("a", 1)',
    'cos.constructor("return process")()',
    'sqrt.constructor',
    '[1, 2]',
    '{a: 1}',
    '"abc"',
    'a = 2',
    'f(x) = x',
    '2*47p; 3',
    '2*47p\n3',
    '_q0 * 2',
    'config({number: "BigNumber"})',
    '1 ? 2 : 3',
    '1 == 1',
    '5!',
  ])('%j is refused with a QuantityError', async (text) => {
    const err = await rejection(text, 'F');
    expect(err.text).toBe(text);
  });

  it('the restricted instance itself refuses import, createUnit, evaluate, parse and the rest', async () => {
    const { evaluate, math } = await loadRestrictedMath();
    for (const call of ['import({}, {})', 'createUnit("foo")', 'evaluate("1")', 'parse("1")', 'compile("1")',
      'simplify("x")', 'derivative("x", "x")', 'resolve(1)', 'reviver("a", 1)']) {
      expect(() => evaluate(call), call).toThrow(/disabled/);
    }
    expect(() => math.evaluate('1+1')).toThrow(/disabled/);
    expect(() => math.parse('1')).toThrow(/disabled/);
    expect(() => math.import({}, {})).toThrow(/disabled/);
    // while ordinary arithmetic still works through the kept reference
    expect(evaluate('2 + 3')).toBe(5);
    expect(expressionEngineLoaded()).toBe(true);
  });
});

describe('tokenizeExpression', () => {
  it('hands numbers to mathjs as variables, with their units', () => {
    const t = tokenizeExpression('1/((2*pi*7.1MHz)^2 * 4.7uH)', 'F');
    expect(t.values).toEqual([
      { value: 1, unit: null },
      { value: 2, unit: null },
      { value: 7.1e6, unit: 'Hz' },
      { value: 2, unit: null },
      { value: 4.7e-6, unit: 'H' },
    ]);
    expect(t.source).not.toMatch(/MHz|uH/);
    expect(t.source).toMatch(/_q4/);
  });
  it('reads RKM and bare prefixes inside a calculation', () => {
    expect(tokenizeExpression('sqrt(4u7/100p)', '\u03a9').values).toEqual([
      { value: 4.7e-6, unit: null },
      { value: 100e-12, unit: null },
    ]);
  });
  it('keeps pi and functions as names', () => {
    const t = tokenizeExpression('2pi + sqrt(4)', 'F');
    expect(t.values.map((v) => v.value)).toEqual([2, 4]);
    expect(t.source).toMatch(/pi/);
    expect(t.source).toMatch(/sqrt/);
  });
});
