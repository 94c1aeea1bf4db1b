/**
 * Writing SI values for people: engineering notation with an SI prefix
 * ("7.341 MHz", "100.0 pF", "4.700 µH"). Every string written here reads back
 * with parseQuantity to the value within the rounding of the figures shown.
 */

/** Shown for NaN and ±Infinity: an em dash, "no value". */
export const NO_VALUE = '\u2014';

const PREFIX_SYMBOL: Readonly<Record<number, string>> = {
  [-15]: 'f', [-12]: 'p', [-9]: 'n', [-6]: '\u00b5', [-3]: 'm', 0: '', 3: 'k', 6: 'M', 9: 'G', 12: 'T',
};
const ALL_PREFIXES = [-15, -12, -9, -6, -3, 0, 3, 6, 9, 12];
/**
 * Prefixes used per unit. Farads skip m and M (mF and MF are read as ambiguous,
 * so 1.5 mF is written 1500 µF, as on capacitor cans); hertz skip milli and
 * below (mHz is refused on input).
 */
const PREFIXES_FOR: Readonly<Record<string, readonly number[]>> = {
  F: [-15, -12, -9, -6, 0],
  Hz: [0, 3, 6, 9, 12],
};
/** Most digits before the point when a unit skips a prefix (15000 µF). */
const MAX_INTEGER_DIGITS = 5;

function figures(significant: number): number {
  if (!Number.isFinite(significant)) return 4;
  return Math.min(15, Math.max(1, Math.round(significant)));
}

/**
 * Formats `value` (SI) with `significant` figures (1…15, default 4) in
 * engineering notation with an SI prefix and the unit symbol: `7.341 MHz`,
 * `100.0 pF`, `4.700 µH` (µ is U+00B5), `2.200 kΩ`, `-4.700 µH`.
 * Rounding carries across a prefix (999.96 kHz → `1.000 MHz`). Zero is `0 H`.
 * Below 1 (from 0.001) where the unit has no prefix for it, a plain decimal
 * (`0.5000 Hz`); beyond the prefixes f…T, exponent form that parseQuantity
 * reads back (`1.000e-18 H`). NaN and ±Infinity give `—` (U+2014).
 * Negative values use an ASCII hyphen-minus so the text can be pasted anywhere.
 */
export function formatQuantity(value: number, unit: string, significant = 4): string {
  if (typeof value !== 'number' || !Number.isFinite(value)) return NO_VALUE;
  const tail = (prefix: string) => (unit === '' && prefix === '' ? '' : ` ${prefix}${unit}`);
  if (value === 0) return `0${tail('')}`;
  const sig = figures(significant);
  const sign = value < 0 ? '-' : '';
  const [mant, expText] = Math.abs(value).toExponential(sig - 1).split('e');
  const e = Number(expText);
  const digits = mant.replace('.', '');
  const allowed = PREFIXES_FOR[unit] ?? ALL_PREFIXES;

  let p: number | undefined;
  for (const a of allowed) if (a <= e) p = a;
  if (p !== undefined) {
    const next = allowed.find((a) => a > (p as number));
    const gap = next === undefined ? 3 : Math.min(next - p, MAX_INTEGER_DIGITS);
    const shift = e - p;
    if (shift < gap) {
      const intPart = digits.slice(0, shift + 1).padEnd(shift + 1, '0');
      const frac = digits.slice(shift + 1);
      return `${sign}${intPart}${frac ? '.' + frac : ''}${tail(PREFIX_SYMBOL[p])}`;
    }
  }
  if (e >= -3 && e < 0) {
    return `${sign}${Math.abs(value).toPrecision(sig)}${tail('')}`;
  }
  return `${sign}${mant}e${e}${tail('')}`;
}

/**
 * Formats a unitless value such as Q or a ratio with `significant` figures
 * (default 4), without prefixes: `123.4`, `0.004700`, exponent form beyond
 * what toPrecision writes plainly (`1.235e5`). NaN and ±Infinity give `—`.
 */
export function formatNumber(value: number, significant = 4): string {
  if (typeof value !== 'number' || !Number.isFinite(value)) return NO_VALUE;
  if (value === 0) return '0';
  return value.toPrecision(figures(significant)).replace('e+', 'e');
}

/**
 * Like formatQuantity, without the trailing zeros of the figures: `10 mm`,
 * `100 pF`, `7.1 MHz`, `4.7 µH`. For text that goes back into a field or a
 * link, and for bounds and values quoted in sentences.
 */
export function formatQuantityCompact(value: number, unit: string, significant = 4): string {
  return formatQuantity(value, unit, significant).replace(/^(-?\d+)\.(\d*?)0+(?=\D|$)/, (_, i: string, f: string) => (f ? `${i}.${f}` : i));
}
