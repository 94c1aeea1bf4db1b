/**
 * Complex numbers for circuit impedances: a plain `{ re, im }` record and a
 * few pure functions. Kept tiny on purpose (no mathjs in the core): hot loops
 * such as frequency sweeps inline the arithmetic on scalars instead.
 *
 * Every function checks its arguments (a `{ re, im }` record of finite
 * numbers) and its result: a non-number, NaN, an infinity, division by zero
 * or an overflow gives a DesignError naming the argument, never a silent NaN.
 */
import { DesignError, requireFinite, requireObject } from './errors';

/** A complex number re + j·im (for impedances: resistance + j·reactance, Ω). */
export interface Complex {
  re: number;
  im: number;
}

/** A checked complex argument. */
function arg(field: string, a: unknown): Complex {
  const z = requireObject<Complex>(field, a, `Complex number ${field}`);
  requireFinite(field, z.re, `The real part of ${field}`);
  requireFinite(field, z.im, `The imaginary part of ${field}`);
  return z;
}

/** A checked complex result: both parts finite. */
function result(field: string, re: number, im: number): Complex {
  if (!Number.isFinite(re) || !Number.isFinite(im)) {
    throw new DesignError(field, `The result overflows: the complex numbers are too large (or too small) to combine.`);
  }
  return { re, im };
}

/** re + j·im. */
export function complex(re: number, im = 0): Complex {
  return { re: requireFinite('re', re, 'The real part'), im: requireFinite('im', im, 'The imaginary part') };
}

/** a + b. */
export function cAdd(a: Complex, b: Complex): Complex {
  arg('a', a);
  arg('b', b);
  return result('a', a.re + b.re, a.im + b.im);
}

/** a − b. */
export function cSub(a: Complex, b: Complex): Complex {
  arg('a', a);
  arg('b', b);
  return result('a', a.re - b.re, a.im - b.im);
}

/** a · b. */
export function cMul(a: Complex, b: Complex): Complex {
  arg('a', a);
  arg('b', b);
  return result('a', a.re * b.re - a.im * b.im, a.re * b.im + a.im * b.re);
}

/** a / b (Smith's algorithm, avoids overflow for large or small parts). */
export function cDiv(a: Complex, b: Complex): Complex {
  arg('a', a);
  arg('b', b);
  if (b.re === 0 && b.im === 0) throw new DesignError('b', 'Division by zero: the divisor is 0 + j0.');
  if (Math.abs(b.re) >= Math.abs(b.im)) {
    const r = b.im / b.re;
    const d = b.re + b.im * r;
    return result('b', (a.re + a.im * r) / d, (a.im - a.re * r) / d);
  }
  const r = b.re / b.im;
  const d = b.re * r + b.im;
  return result('b', (a.re * r + a.im) / d, (a.im * r - a.re) / d);
}

/** 1 / a. */
export function cInv(a: Complex): Complex {
  arg('a', a);
  if (a.re === 0 && a.im === 0) throw new DesignError('a', 'Division by zero: 0 + j0 has no inverse.');
  return cDiv({ re: 1, im: 0 }, a);
}

/** Parallel combination a·b / (a + b) of two impedances. */
export function cParallel(a: Complex, b: Complex): Complex {
  const sum = cAdd(a, b);
  if (sum.re === 0 && sum.im === 0) {
    throw new DesignError('b', 'These two impedances are in parallel resonance (a + b = 0): the combination is infinite.');
  }
  return cDiv(cMul(a, b), sum);
}

/** Magnitude |a|. */
export function cAbs(a: Complex): number {
  arg('a', a);
  return result('a', Math.hypot(a.re, a.im), 0).re;
}

/** Argument of a in radians, −π … π. */
export function cArg(a: Complex): number {
  arg('a', a);
  return Math.atan2(a.im, a.re);
}
