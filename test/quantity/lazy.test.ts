import { describe, expect, it } from 'vitest';
import { parseQuantity, parseQuantityAsync, QuantityError } from '../../src/quantity';
import { expressionEngineLoaded } from '../../src/quantity/expression';

// Vitest gives each test file its own module registry, so mathjs starts unloaded here.
describe('mathjs is loaded only for calculations', () => {
  it('plain values, and plain values that are refused, never load it', async () => {
    expect(await parseQuantityAsync('4u7', 'H')).toBe(4.7e-6);
    expect(await parseQuantityAsync('1e-6', 'H')).toBe(1e-6);
    expect(await parseQuantityAsync('-5', 'V')).toBe(-5);
    expect(parseQuantity('7.1 MHz', 'Hz')).toBe(7.1e6);
    await expect(parseQuantityAsync('4,7', 'F')).rejects.toBeInstanceOf(QuantityError);
    await expect(parseQuantityAsync('', 'F')).rejects.toBeInstanceOf(QuantityError);
    expect(expressionEngineLoaded()).toBe(false);
  });
  it('a calculation loads it', async () => {
    expect(await parseQuantityAsync('2*47p', 'F')).toBeCloseTo(94e-12, 20);
    expect(expressionEngineLoaded()).toBe(true);
  }, 120_000); // first mathjs import can take seconds on a busy machine
});
