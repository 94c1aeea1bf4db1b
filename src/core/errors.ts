/**
 * Errors the core raises for inputs it cannot design with.
 *
 * A `DesignError` names the input at fault (`field`, the same name the caller
 * used for the argument) and carries one sentence a technician understands.
 * Workbenches catch it, show the sentence at that field and keep the last good
 * result on screen marked stale.
 */
export class DesignError extends Error {
  /** Name of the input at fault, as the caller spelled it (e.g. "pitch"). */
  readonly field: string;

  constructor(field: string, message: string) {
    super(message);
    this.name = 'DesignError';
    this.field = field;
  }
}

/** True for a DesignError, also across realms (workers, iframes). */
export function isDesignError(e: unknown): e is DesignError {
  return e instanceof DesignError || (typeof e === 'object' && e !== null && (e as { name?: unknown }).name === 'DesignError' && typeof (e as { field?: unknown }).field === 'string');
}

/** Throws a DesignError unless `value` is a finite number greater than zero. */
export function requirePositive(field: string, value: number, what: string = field): number {
  if (typeof value !== 'number' || Number.isNaN(value)) {
    throw new DesignError(field, `${what} is not a number.`);
  }
  if (!Number.isFinite(value)) {
    throw new DesignError(field, `${what} must be a finite value, not ${value > 0 ? 'infinity' : 'minus infinity'}.`);
  }
  if (value <= 0) {
    throw new DesignError(field, `${what} must be greater than zero (got ${value}).`);
  }
  return value;
}

/** Throws a DesignError unless `value` is a finite number ≥ 0. */
export function requireNonNegative(field: string, value: number, what: string = field): number {
  if (typeof value !== 'number' || Number.isNaN(value)) {
    throw new DesignError(field, `${what} is not a number.`);
  }
  if (!Number.isFinite(value)) {
    throw new DesignError(field, `${what} must be a finite value.`);
  }
  if (value < 0) {
    throw new DesignError(field, `${what} cannot be negative (got ${value}).`);
  }
  return value;
}
