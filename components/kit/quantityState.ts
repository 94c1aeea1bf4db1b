/**
 * One typed quantity as a bench holds it: the text the person typed, the last
 * good SI value, and the sentence explaining why the current text is not a
 * value. Plain numbers parse synchronously; expressions (2*47p, …) go through
 * parseQuantityAsync, which loads mathjs only when first needed.
 */
import { createSignal, type Accessor } from 'solid-js';
import { looksLikeExpression, parseQuantity, parseQuantityAsync, type QuantityUnit } from '../../src/quantity';

export interface QuantityState {
  readonly unit: QuantityUnit;
  /** What is in the field, exactly as typed. */
  text: Accessor<string>;
  /** Last good value in SI units (undefined until one parses). */
  value: Accessor<number | undefined>;
  /** Why the current text is not a value; null when it is. */
  error: Accessor<string | null>;
  /** True while an expression is being evaluated. */
  pending: Accessor<boolean>;
  /** True when `value` no longer matches the text (error or pending). */
  stale: Accessor<boolean>;
  setText(text: string): void;
}

function messageOf(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}

export function createQuantity(unit: QuantityUnit, initialText = ''): QuantityState {
  const [text, setTextSignal] = createSignal(initialText);
  const [value, setValue] = createSignal<number | undefined>(undefined);
  const [error, setError] = createSignal<string | null>(null);
  const [pending, setPending] = createSignal(false);
  let generation = 0;

  function setText(next: string): void {
    setTextSignal(next);
    const mine = ++generation;
    if (next.trim() === '') {
      setPending(false);
      setError('Enter a value.');
      return;
    }
    if (looksLikeExpression(next)) {
      setPending(true);
      parseQuantityAsync(next, unit).then(
        (v) => {
          if (mine !== generation) return;
          setValue(v);
          setError(null);
          setPending(false);
        },
        (e: unknown) => {
          if (mine !== generation) return;
          setError(messageOf(e));
          setPending(false);
        },
      );
      return;
    }
    try {
      const v = parseQuantity(next, unit);
      setValue(v);
      setError(null);
      setPending(false);
    } catch (e) {
      setError(messageOf(e));
      setPending(false);
    }
  }

  if (initialText !== '') setText(initialText);
  const stale = () => error() !== null || pending();
  return { unit, text, value, error, pending, stale, setText };
}
