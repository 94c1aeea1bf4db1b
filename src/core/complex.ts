/**
 * Complex numbers for circuit impedances: a plain `{ re, im }` record and a
 * few pure functions. Kept tiny on purpose (no mathjs in the core): hot loops
 * such as frequency sweeps inline the arithmetic on scalars instead.
 */

/** A complex number re + j·im (for impedances: resistance + j·reactance, Ω). */
export interface Complex {
  re: number;
  im: number;
}

/** re + j·im. */
export function complex(re: number, im = 0): Complex {
  return { re, im };
}

/** a + b. */
export function cAdd(a: Complex, b: Complex): Complex {
  return { re: a.re + b.re, im: a.im + b.im };
}

/** a − b. */
export function cSub(a: Complex, b: Complex): Complex {
  return { re: a.re - b.re, im: a.im - b.im };
}

/** a · b. */
export function cMul(a: Complex, b: Complex): Complex {
  return { re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re };
}

/** a / b (Smith's algorithm, avoids overflow for large or small parts). */
export function cDiv(a: Complex, b: Complex): Complex {
  if (Math.abs(b.re) >= Math.abs(b.im)) {
    const r = b.im / b.re;
    const d = b.re + b.im * r;
    return { re: (a.re + a.im * r) / d, im: (a.im - a.re * r) / d };
  }
  const r = b.re / b.im;
  const d = b.re * r + b.im;
  return { re: (a.re * r + a.im) / d, im: (a.im * r - a.re) / d };
}

/** 1 / a. */
export function cInv(a: Complex): Complex {
  return cDiv({ re: 1, im: 0 }, a);
}

/** Parallel combination a·b / (a + b) of two impedances. */
export function cParallel(a: Complex, b: Complex): Complex {
  return cDiv(cMul(a, b), cAdd(a, b));
}

/** Magnitude |a|. */
export function cAbs(a: Complex): number {
  return Math.hypot(a.re, a.im);
}

/** Argument of a in radians, −π … π. */
export function cArg(a: Complex): number {
  return Math.atan2(a.im, a.re);
}
