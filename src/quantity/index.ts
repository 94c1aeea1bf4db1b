/**
 * Quantities a person types, read into SI and written back for people.
 *
 * `parseQuantity(text, unit)` reads a plain value for a field that needs
 * `unit` and returns SI; `parseQuantityAsync` also works out calculations
 * (loading mathjs on demand); `formatQuantity` / `formatNumber` write values.
 * No dependencies here; mathjs is imported dynamically by ./expression.ts.
 * The same rules are explained for users in content/docs/entering-values.md.
 *
 * Rules for reading (a field's kind is one of H F Hz Ω m V A W s):
 * - Number: 4.7, .5, 5., 1e-6, 1E6; surrounding spaces ignored; space or none
 *   between number and unit (also no-break and thin spaces).
 * - Prefixes in their SI case: f p n µ m k M G T. `M` is always mega and `m`
 *   always milli (unlike SPICE, where M is milli). Also accepted because they
 *   cannot be misread: `u` and `U` for micro, `K` for kilo, `N` for nano, and
 *   `meg`/`MEG`/`Meg` for mega (SPICE habit). Both micro signs, µ (U+00B5) and
 *   μ (U+03BC), are accepted; Ω may be U+03A9 or U+2126.
 * - A prefix alone takes the field's unit: 220p in a capacitance field is
 *   220 pF, 7.1M in a frequency field is 7.1 MHz.
 * - RKM style (IEC 60062) everywhere: the prefix letter is the decimal point,
 *   4p7 = 4.7p, 2k2, 1M5, 4u7; R for ohms (4R7 = 4.7 Ω, 100R = 100 Ω) and V
 *   for volts (4V7 = 4.7 V). A unit may follow (4u7H); a second prefix may not.
 * - Units: H; F; Hz (also hz, HZ, and c / cps as in kc, Mc of older books);
 *   Ω, ohm, ohms, R; m, metre(s), meter(s);
 *   V; A; W; s. Lowercase h, f (after a prefix: 220pf), v, a, w are accepted.
 *   Older radio spellings: mfd = µF; mmfd, µµF, uuF = pF.
 * - Lengths need their unit: a bare number ("20") is refused with "did you
 *   mean 20 mm?" (code 'no-unit'), since metres and millimetres are both
 *   plausible and a guess builds the wrong coil; zero needs no unit. `m` right
 *   after the number means metres and `mm` millimetres; also cm, in / inch /
 *   inches / " (25.4 mm), mil / mils / thou (0.0254 mm). A calculation in a
 *   length field must carry units too (2*10mm, not 2*10).
 * - Ranges ("10p..365p", "10…365 pF", "5.9–6.2 MHz", "10p to 365p") are read
 *   by parseQuantityRange → { low, high }; a single-value field refuses them
 *   with "A range is not allowed here: give one value" (code 'range'); a range
 *   written high to low is refused (code 'backwards') with the right order.
 * - A unit of another kind is refused, naming both kinds ("pF is a
 *   capacitance; this field needs an inductance in henries (H).").
 * - Refused as ambiguous, with a hint: mHz / mhz / mc and a bare m in a frequency
 *   field (millihertz never suits a tank; "did you mean MHz?"); mF, mf, MF, Mf
 *   (older books mean microfarads, SI means milli/mega: write µF);
 *   a bare f in a capacitance field (femto or farads?); 1m5 in a length field
 *   (metres or millimetres?). Case slips get a hint (PF → pF, MM → mm).
 * - Comma: refused, in every position. Use a point (4.7) or RKM style (4u7);
 *   1,000 means one thousand in some countries and one in others.
 * - Signs: a leading + or − (also U+2212) is read; negative values are
 *   returned and the core decides whether they are allowed.
 * - Refused as not finite: NaN, Infinity, ∞, overflow (1e999) and underflow
 *   (1e-999, which would silently become zero).
 * - Empty text, text longer than 200 characters, text without a number and
 *   bare operators (+, *, ()) are refused.
 * - A calculation (operators + − * / ^ × ÷, parentheses, pi/π/tau, functions)
 *   is not worked out by parseQuantity: it throws QuantityExpressionError with
 *   `needsExpression === true`; see `looksLikeExpression`. parseQuantityAsync
 *   works it out: numbers with suffixes follow the rules above, a result with
 *   a unit must have the field's dimension, a bare result is in the field's
 *   unit; a sum of a number with a unit and one without is refused
 *   (100p + 22pF; R is the ohm, so 2k2 + 4R7 too). Allowed names: pi, e, tau, sqrt, cbrt, abs, exp, log (natural),
 *   log10, sin, cos, tan, atan, min, max, hypot.
 *
 * Plain numbers (turns, Q, μ′, °C): parsePlainNumber(text, rule, what), one
 * grammar for typing and for links: optional sign (+, -, U+2212), digits, an
 * optional point and exponent, and the rule's own unit (°C) may follow. The
 * rule's range (NumberRange: min, max, exclusive ends, step) is checked with a
 * sentence that names the field and quotes the text ("Wire temperature must
 * be between −60 and 200 °C; you typed “250”."); checkRange does the same for
 * a quantity's SI value.
 *
 * Rules for writing: see formatQuantity (engineering notation with an SI
 * prefix, `—` for non-finite values, exponent form beyond f…T).
 */
export { QuantityError, QuantityExpressionError, isQuantityError } from './errors';
export type { QuantityErrorCode } from './errors';
export type { QuantityUnit } from './units';
export { QUANTITY_UNITS } from './units';
export { parseQuantity, looksLikeExpression, looksLikeRange, splitRange, MAX_QUANTITY_LENGTH } from './parse';
export { parseQuantityAsync } from './async';
export { parseQuantityRange, parseQuantityRangeAsync, type QuantityRange, type QuantityRangeOptions } from './range';
export { parseQuantityPoints, MAX_POINTS_LENGTH, type QuantityPoint, type QuantityPointsOptions } from './points';
export {
  parsePlainNumber, checkRange, rangeProblem, rangeMessage, quoteText, sayBound, POSITIVE, NON_NEGATIVE,
  type NumberRange, type PlainNumberRule,
} from './number';
export { formatQuantity, formatQuantityCompact, formatNumber, NO_VALUE } from './format';
export { EXPRESSION_CONSTANTS, EXPRESSION_FUNCTIONS } from './names';

