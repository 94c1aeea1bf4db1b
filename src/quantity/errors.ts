/**
 * Errors raised while reading a quantity a person typed.
 *
 * A `QuantityError` carries one sentence a technician understands (the
 * `message`), the text as typed (`text`) and a short machine-readable `code`
 * a field can use to decide how to show it. A workbench shows the sentence at
 * the field and keeps the last good value; nothing here ever crashes a page.
 */

/** Why a text could not be read as a quantity. */
export type QuantityErrorCode =
  | 'empty' // nothing but spaces
  | 'too-long' // longer than MAX_QUANTITY_LENGTH characters
  | 'not-a-number' // no number where one was expected
  | 'not-finite' // NaN, infinity, overflow or underflow
  | 'comma' // a comma used as a decimal mark or digit grouping
  | 'unknown-unit' // letters after the number that are no unit or prefix we know
  | 'wrong-unit' // a unit of another kind (pF in an inductance field)
  | 'ambiguous' // a suffix with two common readings (mf, mHz, 1m5 in a length field)
  | 'no-unit' // a length without its unit ("20": metres or millimetres?)
  | 'range' // a range in a single-value field, or a range that is not two values
  | 'backwards' // a range whose low end is above its high end
  | 'out-of-range' // a value outside what the field allows (a negative length, 0 turns)
  | 'expression' // a calculation given to the synchronous parser (see `needsExpression`)
  | 'expression-invalid'; // a calculation that could not be worked out

/** A text that is not a quantity of the kind a field needs. */
export class QuantityError extends Error {
  /** The input exactly as typed. */
  readonly text: string;
  /** Machine-readable reason (see QuantityErrorCode). */
  readonly code: QuantityErrorCode;
  /** True when the text is a calculation: give it to `parseQuantityAsync` instead. */
  readonly needsExpression: boolean = false;

  constructor(text: string, message: string, code: QuantityErrorCode, options?: { cause?: unknown }) {
    super(message, options);
    this.name = 'QuantityError';
    this.text = text;
    this.code = code;
  }
}

/**
 * Thrown by `parseQuantity` for a calculation such as `2*47p`: the text is not
 * wrong, it needs the expression evaluator (`parseQuantityAsync`).
 */
export class QuantityExpressionError extends QuantityError {
  override readonly needsExpression: boolean = true;

  constructor(text: string) {
    super(text, 'This is a calculation rather than a plain value; it is worked out separately.', 'expression');
    this.name = 'QuantityExpressionError';
  }
}

/** True for a QuantityError (or subclass), also across realms (workers, iframes). */
export function isQuantityError(e: unknown): e is QuantityError {
  if (e instanceof QuantityError) return true;
  if (typeof e !== 'object' || e === null) return false;
  const o = e as { name?: unknown; text?: unknown; code?: unknown };
  return (o.name === 'QuantityError' || o.name === 'QuantityExpressionError') && typeof o.text === 'string' && typeof o.code === 'string';
}
