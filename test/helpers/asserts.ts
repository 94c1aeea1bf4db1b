/**
 * Assertions and reference formulas shared by the test files.
 */
import { expect } from 'vitest';
import { isDesignError } from '../../src/core/errors';
import { QuantityError } from '../../src/quantity';

/**
 * Relative difference |a − b| / |b|. Zero when both are zero; Infinity when
 * only `b` is zero (no relative measure exists, and a check must fail).
 */
export function rel(a: number, b: number): number {
  if (b === 0) return a === 0 ? 0 : Number.POSITIVE_INFINITY;
  return Math.abs(a - b) / Math.abs(b);
}

/** The `field` of the DesignError that `fn` throws; fails the test when it throws anything else or nothing. */
export function fieldOf(fn: () => unknown): string {
  try {
    fn();
  } catch (e) {
    expect(isDesignError(e), `expected a DesignError, got ${String(e)}`).toBe(true);
    return (e as { field: string }).field;
  }
  throw new Error('expected a DesignError, but nothing was thrown');
}

/** An SI value read back equals the expected one to 1e-12 relative (exactly, for zero). */
export function expectSI(actual: number, expected: number, tolerance = 1e-12): void {
  if (expected === 0) {
    expect(actual).toBe(0);
    return;
  }
  expect(rel(actual, expected)).toBeLessThan(tolerance);
}

/** Thomson's formula, f = 1 / (2π √(LC)), written here independently of the core (Terman 1943, section 3). */
export function thomson(inductance: number, capacitance: number): number {
  return 1 / (2 * Math.PI * Math.sqrt(inductance * capacitance));
}

/** The QuantityError `fn` throws; fails the test when it throws anything else or nothing. */
export function refusal(fn: () => unknown): QuantityError {
  try {
    fn();
  } catch (e) {
    expect(e).toBeInstanceOf(QuantityError);
    return e as QuantityError;
  }
  throw new Error('accepted');
}
