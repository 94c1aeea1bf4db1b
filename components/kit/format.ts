/**
 * Small formatting rules the benches share, beyond formatQuantity.
 */

/** Shifts smaller than this (0.1 %) are noise beside part tolerances and are not shown. */
export const SHIFT_THRESHOLD = 1e-3;

/** True when a relative shift is large enough to be worth showing. */
export function significantShift(fraction: number, threshold = SHIFT_THRESHOLD): boolean {
  return Number.isFinite(fraction) && Math.abs(fraction) >= threshold;
}

/**
 * A relative shift for people, or null when it does not matter (below
 * `threshold`, 0.1 % by default): "+3.39 %", "−0.15 %", "+12.5 %". The minus
 * is U+2212. Use it for "the peak is … below f₀" and for offsets in tables;
 * leave the sentence out when it returns null.
 */
export function formatShift(fraction: number, threshold = SHIFT_THRESHOLD): string | null {
  if (!significantShift(fraction, threshold)) return null;
  const p = Math.abs(fraction * 100);
  return `${fraction < 0 ? '\u2212' : '+'}${p >= 10 ? p.toFixed(1) : p.toFixed(2)} %`;
}
