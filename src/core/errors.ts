/**
 * Errors the core raises for inputs it cannot design with, and the checks
 * every exported function runs on its inputs.
 *
 * A `DesignError` names the input at fault (`field`, the same name the caller
 * used for the argument) and carries one sentence a technician understands.
 * Workbenches catch it, show the sentence at that field and keep the last good
 * result on screen marked stale.
 *
 * The checks refuse anything that is not a JavaScript number (strings, null,
 * undefined, objects), NaN and ±Infinity, so no export ever computes with a
 * string by concatenation or returns a silent NaN. Values are quoted in the
 * message in engineering notation when the unit is known ("got −4.7 µH").
 */
import { sayQuantity, sayNumber } from './text';

export class DesignError extends Error {
  /** Name of the input at fault, as the caller spelled it (e.g. "pitch"). */
  readonly field: string;

  constructor(field: string, message: string) {
    super(String(message));
    this.name = 'DesignError';
    this.field = String(field);
  }
}

/** True for a DesignError, also across realms (workers, iframes). */
export function isDesignError(e: unknown): e is DesignError {
  return e instanceof DesignError || (typeof e === 'object' && e !== null && (e as { name?: unknown }).name === 'DesignError' && typeof (e as { field?: unknown }).field === 'string');
}

/** A value quoted in a message: engineering notation with the unit when there is one. */
function quote(value: number, unit?: string): string {
  return unit ? sayQuantity(value, unit) : sayNumber(value, 4);
}

function describe(value: unknown): string {
  if (value === undefined) return 'missing';
  if (value === null) return 'empty';
  if (typeof value === 'string') return `the text “${value.length > 20 ? `${value.slice(0, 20)}…` : value}”`;
  return `a ${typeof value}`;
}

/**
 * Throws a DesignError unless `value` is a finite number (any sign).
 * @param unit SI unit symbol for quoting the value back ('m', 'H', …); omit for plain numbers
 */
export function requireFinite(field: string, value: unknown, what: string = field): number {
  if (typeof value !== 'number') {
    throw new DesignError(field, value === undefined ? `${what} is missing: give a value.` : `${what} must be a number, not ${describe(value)}.`);
  }
  if (Number.isNaN(value)) throw new DesignError(field, `${what} is not a number.`);
  if (!Number.isFinite(value)) {
    throw new DesignError(field, `${what} must be a finite value, not ${value > 0 ? 'infinity' : 'minus infinity'}.`);
  }
  return value;
}

/** Throws a DesignError unless `value` is a finite number greater than zero. */
export function requirePositive(field: string, value: unknown, what: string = field, unit?: string): number {
  const v = requireFinite(field, value, what);
  if (v <= 0) {
    throw new DesignError(field, v === 0 ? `${what} must be greater than zero.` : `${what} must be greater than zero (got ${quote(v, unit)}).`);
  }
  return v;
}

/** Throws a DesignError unless `value` is a finite number ≥ 0. */
export function requireNonNegative(field: string, value: unknown, what: string = field, unit?: string): number {
  const v = requireFinite(field, value, what);
  if (v < 0) throw new DesignError(field, `${what} cannot be negative (got ${quote(v, unit)}).`);
  return v;
}

/** Throws a DesignError unless `value` is a finite number in [min, max]. */
export function requireInRange(field: string, value: unknown, min: number, max: number, what: string = field, unit?: string): number {
  const v = requireFinite(field, value, what);
  if (v < min || v > max) {
    throw new DesignError(field, `${what} must be between ${quote(min, unit)} and ${quote(max, unit)} (got ${quote(v, unit)}).`);
  }
  return v;
}

/** Throws a DesignError unless `value` is a plain object (the argument of a function that takes one). */
export function requireObject<T extends object>(field: string, value: unknown, what: string = field): T {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new DesignError(field, `${what} must be given as an object of named values, not ${describe(value)}.`);
  }
  return value as T;
}

/**
 * A result that must be a finite number: throws a DesignError naming `field`
 * when extreme inputs overflow or underflow the arithmetic (1e300 H, 1e-300 F),
 * instead of returning a silent NaN or Infinity.
 */
export function requireFiniteResult(field: string, value: number, what: string): number {
  if (!Number.isFinite(value)) {
    throw new DesignError(field, `${what} is beyond what can be computed with these values: they are far outside anything that can be built.`);
  }
  return value;
}

/**
 * Runs `fn`, and names a DesignError it throws by its place in a larger spec:
 * field 'inductance' becomes 'band.inductance' under the prefix 'band' (a
 * function that checks a nested object reports the path a bench can route).
 */
export function withinSpec<T>(prefix: string, fn: () => T): T {
  try {
    return fn();
  } catch (e) {
    if (isDesignError(e)) throw new DesignError(`${prefix}.${e.field}`, e.message);
    throw e;
  }
}
