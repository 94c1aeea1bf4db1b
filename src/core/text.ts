/**
 * Numbers in the core's note and error sentences. The core cannot import
 * `src/quantity` (layers), so this is its one small formatter: engineering
 * notation with an SI prefix, a few significant figures, no trailing noise.
 * Every module that writes a number into a sentence uses these.
 */

const PREFIXES: ReadonlyArray<readonly [number, string]> = [
  [1e12, 'T'], [1e9, 'G'], [1e6, 'M'], [1e3, 'k'], [1, ''], [1e-3, 'm'], [1e-6, 'µ'], [1e-9, 'n'], [1e-12, 'p'], [1e-15, 'f'],
];

/** Units written without a milli- or micro- prefix in sentences (a frequency of 0.5 Hz, not 500 mHz). */
const NO_SMALL_PREFIX = new Set(['Hz']);

/** Significant figures as a whole number from 1 to 21 (what toPrecision takes). */
function figures(significant: number): number {
  return typeof significant === 'number' && Number.isFinite(significant) ? Math.min(21, Math.max(1, Math.round(significant))) : 3;
}

/** Plain text of a number; exponent form (without "e+") from 1e6 and below 1e-3: 1.2e14 → "1.2e14". */
function plain(x: number, significant: number): string {
  const rounded = Number(x.toPrecision(significant));
  const a = Math.abs(rounded);
  const text = a !== 0 && (a >= 1e6 || a < 1e-3) ? rounded.toExponential() : String(rounded);
  return text.replace('e+', 'e');
}

/**
 * `x` in engineering notation: `sayQuantity(4.7e-6, 'H')` → "4.7 µH",
 * `sayQuantity(-0.0193, 'm')` → "-19.3 mm". Figures: `significant` (default 3),
 * trailing zeros dropped. Lengths use m, mm and µm only (no km, no nm below 1 µm
 * except where smaller). Outside f…T, or for non-finite values, plain JavaScript text.
 */
export function sayQuantity(x: number, unit: string, significant = 3): string {
  if (typeof x !== 'number' || !Number.isFinite(x)) return `${String(x)} ${unit}`.trim();
  if (x === 0) return `0 ${unit}`.trim();
  const sig = figures(significant);
  const a = Math.abs(x);
  for (const [scale, prefix] of PREFIXES) {
    if (unit === 'm' && (prefix === 'k' || prefix === 'M' || prefix === 'G' || prefix === 'T')) continue;
    if (NO_SMALL_PREFIX.has(unit) && scale < 1) continue;
    if (a >= scale * (1 - 0.5 * 10 ** (1 - sig))) {
      // Beyond the largest prefix a mantissa of four or more digits reads badly: exponent form instead.
      if (a / scale >= 999.5) break;
      return `${plain(x / scale, sig)} ${prefix}${unit}`;
    }
  }
  return `${plain(x, sig)} ${unit}`.trim();
}

/** Millimetres for geometry sentences: "0.8 mm", "12.7 mm". */
export function sayMm(x: number, significant = 3): string {
  if (typeof x !== 'number' || !Number.isFinite(x)) return `${String(x)} mm`;
  return `${plain(x * 1e3, figures(significant))} mm`;
}

/** A plain number (a ratio, a Q, turns): "0.34", "1.2e+14" → "1.2e14". */
export function sayNumber(x: number, significant = 3): string {
  if (typeof x !== 'number' || !Number.isFinite(x)) return String(x);
  return plain(x, figures(significant));
}

/** A fraction as a signed percentage: 0.183 → "+18 %", −0.05 → "−5 %". */
export function sayPercent(fraction: number, significant = 2): string {
  if (typeof fraction !== 'number' || !Number.isFinite(fraction)) return String(fraction);
  const p = plain(Math.abs(fraction) * 100, figures(significant));
  return `${fraction < 0 ? '\u2212' : '+'}${p} %`;
}
