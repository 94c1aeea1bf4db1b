/**
 * A plain dimensionless number as a bench holds it (a Q, a dissipation
 * factor, a ratio): the text as typed, the last good value, and why the
 * current text is not one. Same shape as a QuantityState, so QuantityField
 * shows it. Blank text is allowed when the field is optional (value
 * undefined, no message); otherwise it asks for a value.
 */
import { createSignal, type Accessor } from 'solid-js';

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

const PLAIN = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

/** Reads a plain number: digits, a decimal point, an optional exponent. */
export function readPlainNumber(text: string): number {
  const s = text.trim();
  if (s.includes(',')) throw new Error(`Use a point for decimals: “${s.replace(',', '.')}”, not “${s}”.`);
  if (!PLAIN.test(s)) throw new Error(`“${s.length > 24 ? `${s.slice(0, 24)}…` : s}” is not a plain number: type digits, e.g. 150 or 2.5e-4.`);
  return Number(s);
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
      const v = readPlainNumber(next);
      if (!(v > 0) || !Number.isFinite(v)) throw new Error(`${options.what ?? 'The value'} must be a number greater than zero.`);
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
