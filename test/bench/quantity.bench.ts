import { bench, describe } from 'vitest';
import { parseQuantity, parseQuantityAsync, formatQuantity } from '../../src/quantity';

// Figures, not pass/fail: reading a field on every keystroke must cost next to nothing.
const plain = ['4.7 µH', '4u7', '220p', '7.1 MHz', '2k2', '15 mm', '0.25"', '1e-6', '100 mmfd', '455k'];
const units = ['H', 'H', 'F', 'Hz', 'Ω', 'm', 'm', 'H', 'F', 'Hz'] as const;

describe('quantity', () => {
  bench('parseQuantity, 10 plain values', () => {
    for (let i = 0; i < plain.length; i++) parseQuantity(plain[i], units[i]);
  });
  bench('formatQuantity, 10 values', () => {
    for (let i = 0; i < 10; i++) formatQuantity(1.2345e-12 * 10 ** i, 'F');
  });
  bench('parseQuantityAsync, one calculation (mathjs loaded)', async () => {
    await parseQuantityAsync('1/((2*pi*7.1MHz)^2 * 4.7uH)', 'F');
  });
});
