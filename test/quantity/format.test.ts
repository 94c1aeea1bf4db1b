import { describe, expect, it } from 'vitest';
import { formatQuantity, formatNumber, NO_VALUE } from '../../src/quantity';

// Engineering notation with SI prefixes (BIPM SI Brochure, 9th ed., 2019); the
// expected strings are worked by hand from the rounding rule (round half away
// from zero in the last shown figure, as Number.prototype.toExponential does).
describe('formatQuantity', () => {
  it.each([
    [7.3413e6, 'Hz', 4, '7.341 MHz'],
    [100e-12, 'F', 4, '100.0 pF'],
    [4.7e-6, 'H', 4, '4.700 \u00b5H'],
    [2200, '\u03a9', 4, '2.200 k\u03a9'],
    [999.96e3, 'Hz', 4, '1.000 MHz'], // carry across the prefix boundary
    [999.94e3, 'Hz', 4, '999.9 kHz'],
    [999.96e-12, 'F', 4, '1.000 nF'],
    [0, 'H', 4, '0 H'],
    [-0, 'H', 4, '0 H'],
    [-4.7e-6, 'H', 4, '-4.700 \u00b5H'],
    [15e-3, 'm', 4, '15.00 mm'],
    [2.54e-5, 'm', 3, '25.4 \u00b5m'],
    [1, 'Hz', 4, '1.000 Hz'],
    [7.3413e6, 'Hz', 3, '7.34 MHz'],
    [470, '\u03a9', 1, '500 \u03a9'],
    [470, '\u03a9', 2, '470 \u03a9'],
    [1e-15, 'F', 4, '1.000 fF'],
    [1e12, 'Hz', 4, '1.000 THz'],
    [1e-18, 'H', 4, '1.000e-18 H'], // below femto: exponent form
    [1e15, '\u03a9', 4, '1.000e15 \u03a9'], // above tera
    [999.96e12, '\u03a9', 4, '1.000e15 \u03a9'],
    // farads skip m and M (mF/MF are refused as ambiguous on input)
    [1.5e-3, 'F', 4, '1500 \u00b5F'],
    [15e-3, 'F', 4, '15000 \u00b5F'],
    [0.15, 'F', 4, '0.1500 F'],
    [2, 'F', 4, '2.000 F'],
    [2000, 'F', 4, '2.000e3 F'],
    // hertz skip milli and below (mHz is refused on input)
    [0.5, 'Hz', 4, '0.5000 Hz'],
    [5e-6, 'Hz', 4, '5.000e-6 Hz'],
    [1500, '', 4, '1.500 k'],
    [50e-3, 'A', 2, '50 mA'],
  ] as const)('%d %s (%d figures) → %s', (value, unit, sig, expected) => {
    expect(formatQuantity(value, unit, sig)).toBe(expected);
  });
  it('uses 4 figures by default and the micro sign U+00B5', () => {
    expect(formatQuantity(4.7e-6, 'H')).toBe('4.700 \u00b5H');
    expect(formatQuantity(4.7e-6, 'H').codePointAt(6)).toBe(0xb5);
  });
  it('writes an em dash for values that are not finite', () => {
    expect(NO_VALUE).toBe('\u2014');
    expect(formatQuantity(Number.NaN, 'H')).toBe('\u2014');
    expect(formatQuantity(Number.POSITIVE_INFINITY, 'Hz')).toBe('\u2014');
    expect(formatQuantity(Number.NEGATIVE_INFINITY, 'F')).toBe('\u2014');
  });
  it('keeps the figure count within 1…15', () => {
    expect(formatQuantity(4.7e-6, 'H', 0)).toBe('5 \u00b5H');
    expect(formatQuantity(4.7e-6, 'H', 40)).toBe('4.70000000000000 \u00b5H');
    expect(formatQuantity(4.7e-6, 'H', Number.NaN)).toBe('4.700 \u00b5H');
  });
});

describe('formatNumber', () => {
  it.each([
    [123.456, 4, '123.5'],
    [0.0047, 4, '0.004700'],
    [123456, 4, '1.235e5'],
    [-12.34, 3, '-12.3'],
    [1e-9, 2, '1.0e-9'],
    [0, 4, '0'],
    [250, 4, '250.0'],
  ] as const)('%d (%d figures) → %s', (value, sig, expected) => {
    expect(formatNumber(value, sig)).toBe(expected);
  });
  it('uses 4 figures by default and an em dash for non-finite values', () => {
    expect(formatNumber(87.654)).toBe('87.65');
    expect(formatNumber(Number.NaN)).toBe('\u2014');
    expect(formatNumber(Number.POSITIVE_INFINITY)).toBe('\u2014');
  });
});
