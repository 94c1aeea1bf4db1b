/**
 * Runs a core computation for a bench and keeps the last good result. While
 * inputs are invalid the previous result stays on screen, marked stale, and a
 * DesignError is routed to the field that shows it (see fields.ts:
 * routeDesignError); an error no field in use shows is a general one.
 */
import { createMemo, type Accessor } from 'solid-js';
import { isDesignError } from '../../src/core/errors';

export interface Computed<T> {
  /** Last good result (undefined until the first success). */
  result: Accessor<T | undefined>;
  /** True when the shown result is not from the current inputs. */
  stale: Accessor<boolean>;
  /** The core's message for the field with this key, if the current error is routed there. */
  fieldError: (key: string) => string | null;
  /** A core error that no field in use shows, or an unexpected failure. */
  generalError: Accessor<string | null>;
}

/** Maps a DesignError's `field` (a core name or spec path) to the key of the field that shows it, or null. */
export type ErrorRoute = (field: string) => string | null;

const UNEXPECTED = 'Something went wrong in this calculation. The inputs are kept; please report the link.';

/**
 * @param run returns the result, or undefined when inputs are incomplete or
 *            invalid (their fields already say why); may throw DesignError.
 * @param route where a DesignError is shown: a routing function (a field
 *            table's), or the list of names that are field keys as they are.
 */
export function createComputation<T>(run: () => T | undefined, route: ErrorRoute | readonly string[]): Computed<T> {
  const routeOf: ErrorRoute = typeof route === 'function' ? route : (field) => (route.includes(field) ? field : null);
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
      return { ok: false as const, error: UNEXPECTED, field: null };
    }
  });
  const result = createMemo(() => {
    const a = attempt();
    return a.ok ? a.value : lastGood;
  });
  /** Key of the field showing the current error; null for none or a general one. */
  const routed = createMemo(() => {
    const a = attempt();
    return a.ok || a.field === null ? null : routeOf(a.field);
  });
  return {
    result,
    stale: () => !attempt().ok,
    fieldError: (key) => {
      const a = attempt();
      return !a.ok && routed() === key ? a.error : null;
    },
    generalError: () => {
      const a = attempt();
      if (a.ok || a.error === null) return null;
      return routed() === null ? a.error : null;
    },
  };
}
