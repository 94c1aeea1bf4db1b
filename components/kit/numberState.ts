/**
 * A plain dimensionless number as a bench holds it (a Q, a dissipation
 * factor, a ratio): the text as typed, the last good value, and why the
 * current text is not one. Same shape as a QuantityState, so QuantityField
 * shows it. Blank text is allowed when the field is optional (value
 * undefined, no message); otherwise it asks for a value.
 */
import { createSignal, type Accessor } from 'solid-js';
import { parsePlainNumber, POSITIVE } from '../../src/quantity';

export interface NumberState {
  /** What is in the field, exactly as typed. */
  text: Accessor<string>;
  /** Current value; undefined while blank or invalid (see `stale`). */
  value: Accessor<number | undefined>;
  /** Last value that parsed, kept while the text is invalid. */
  lastGood: Accessor<number | undefined>;
  error: Accessor<string | null>;
  pending: Accessor<boolean>;
  /** True when the text is not a value (the last good one is shown instead). */
  stale: Accessor<boolean>;
  /** True when the field is blank (optional fields only). */
  blank: Accessor<boolean>;
  setText(text: string): void;
}

/** Reads a plain number by the one grammar (src/quantity/number.ts): digits, a point, an exponent, a sign. */
export function readPlainNumber(text: string): number {
  return parsePlainNumber(text);
}

/**
 * @param initialText text in the field at first
 * @param options optional: blank means "not given"; what: noun for messages ("Coil Q")
 */
export function createNumber(initialText = '', options: { optional?: boolean; what?: string } = {}): NumberState {
  const [text, setTextSignal] = createSignal(initialText);
  const [last, setLast] = createSignal<number | undefined>(undefined);
  const [error, setError] = createSignal<string | null>(null);
  const [blank, setBlank] = createSignal(false);

  function setText(next: string): void {
    setTextSignal(next);
    if (next.trim() === '') {
      setBlank(true);
      setError(options.optional ? null : 'Enter a value.');
      return;
    }
    setBlank(false);
    try {
      const v = parsePlainNumber(next, POSITIVE, options.what ?? 'The value');
      setLast(v);
      setError(null);
    } catch (e) {
      setError(e instanceof Error ? e.message : String(e));
    }
  }
  setText(initialText);
  const value = () => (error() === null && !blank() ? last() : undefined);
  return { text, value, lastGood: last, error, pending: () => false, stale: () => error() !== null, blank, setText };
}
