/**
 * The core's formatter for numbers in sentences (text.ts). The expected
 * strings are engineering notation as the SI brochure writes prefixes
 * (BIPM, The International System of Units, 9th ed. 2019, Table 7).
 */
import { describe, expect, test } from 'vitest';
import { sayMm, sayNumber, sayPercent, sayQuantity } from '../../src/core/text';

describe('sayQuantity', () => {
  test('engineering notation with SI prefixes (BIPM SI brochure, Table 7)', () => {
    expect(sayQuantity(4.7e-6, 'H')).toBe('4.7 µH');
    expect(sayQuantity(100e-12, 'F')).toBe('100 pF');
    expect(sayQuantity(7.34127e6, 'Hz', 4)).toBe('7.341 MHz');
    expect(sayQuantity(2200, 'Ω')).toBe('2.2 kΩ');
  });
  test('negative values keep their sign; lengths stay in m, mm, µm', () => {
    expect(sayQuantity(-0.0193, 'm')).toBe('-19.3 mm');
    expect(sayQuantity(12, 'm')).toBe('12 m');
    expect(sayQuantity(12e3, 'm')).toBe('12000 m');
  });
  test('rounding carries into the next prefix', () => {
    expect(sayQuantity(999.96e3, 'Hz')).toBe('1 MHz');
  });
  test('frequencies below 1 Hz are not written in mHz (mHz is refused on input)', () => {
    expect(sayQuantity(0.5, 'Hz')).toBe('0.5 Hz');
  });
  test('beyond the prefixes: exponent form without "e+"', () => {
    expect(sayQuantity(1e24, 'F')).toBe('1e24 F');
    expect(sayQuantity(1e-300, 'F')).toBe('1e-300 F');
  });
  test('significant figures are clamped, never a RangeError', () => {
    expect(sayQuantity(2e12, 'Hz', NaN)).toBe('2 THz');
    expect(sayQuantity(1234, 'Ω', 0)).toBe('1 kΩ');
    expect(sayQuantity(1234, 'Ω', 99)).toBe('1.234 kΩ');
  });
  test('non-finite values are written as JavaScript writes them', () => {
    expect(sayQuantity(Number.NaN, 'H')).toBe('NaN H');
    expect(sayQuantity(Number.POSITIVE_INFINITY, 'Hz')).toBe('Infinity Hz');
  });
});

describe('sayMm, sayNumber, sayPercent', () => {
  test('millimetres', () => {
    expect(sayMm(0.0008)).toBe('0.8 mm');
    expect(sayMm(0.0127)).toBe('12.7 mm');
  });
  test('plain numbers drop "e+"', () => {
    expect(sayNumber(1.2e14)).toBe('1.2e14');
    expect(sayNumber(0.34567)).toBe('0.346');
  });
  test('percentages carry a sign (U+2212 for minus)', () => {
    expect(sayPercent(0.183)).toBe('+18 %');
    expect(sayPercent(-0.05)).toBe('\u22125 %');
  });
});
