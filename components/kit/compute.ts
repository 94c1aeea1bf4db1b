/**
 * Runs a core computation for a bench and keeps the last good result. While
 * inputs are invalid the previous result stays on screen, marked stale, and a
 * DesignError is routed to the field it names.
 */
import { createMemo, type Accessor } from 'solid-js';
import { isDesignError } from '../../src/core/errors';

export interface Computed<T> {
  /** Last good result (undefined until the first success). */
  result: Accessor<T | undefined>;
  /** True when the shown result is not from the current inputs. */
  stale: Accessor<boolean>;
  /** Core error for a field (by the core's argument name), if any. */
  fieldError: (field: string) => string | null;
  /** A core error that names no known field, or an unexpected failure. */
  generalError: Accessor<string | null>;
}

/**
 * @param run returns the result, or undefined when inputs are incomplete/invalid
 *            (their fields already show why); may throw DesignError.
 * @param fields the core argument names this bench shows at a field.
 */
export function createComputation<T>(run: () => T | undefined, fields: readonly string[]): Computed<T> {
  let lastGood: T | undefined;
  const attempt = createMemo(() => {
    try {
      const value = run();
      if (value === undefined) return { ok: false as const, error: null, field: null };
      lastGood = value;
      return { ok: true as const, value };
    } catch (e) {
      if (isDesignError(e)) return { ok: false as const, error: e.message, field: e.field };
      console.error(e);
      return { ok: false as const, error: 'Something went wrong in this calculation. The inputs are kept; please report the link.', field: null };
    }
  });
  const result = createMemo(() => {
    const a = attempt();
    return a.ok ? a.value : lastGood;
  });
  return {
    result,
    stale: () => !attempt().ok,
    fieldError: (field) => {
      const a = attempt();
      return !a.ok && a.field === field ? a.error : null;
    },
    generalError: () => {
      const a = attempt();
      if (a.ok || a.error === null) return null;
      return a.field !== null && fields.includes(a.field) ? null : a.error;
    },
  };
}
