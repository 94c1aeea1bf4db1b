/**
 * A labelled input for one quantity. Parses as the person types, ties its
 * message to the input (aria-describedby) and never throws away what was typed.
 */
import { Show, type Accessor, type JSX } from 'solid-js';

/** What a field needs from its state (a field of a bench's table, see bench.ts). */
export interface FieldState {
  /** What is in the field, exactly as typed. */
  text: Accessor<string>;
  /** Why the current text is not a value; null when it is. */
  error: Accessor<string | null>;
  /** True while a calculation is being evaluated. */
  pending: Accessor<boolean>;
  setText(text: string): void;
  readonly unit?: string;
}

export interface QuantityFieldProps {
  /** Stable id, unique on the page (also the URL key of the field). */
  id: string;
  label: string;
  /** Symbol shown after the label, e.g. "L". */
  symbol?: string;
  q: FieldState;
  /** Examples of accepted input, shown under the field. */
  hint?: string;
  /** A message from the core about this input (DesignError), shown like a parse error. */
  designError?: string | null;
  disabled?: boolean;
  children?: JSX.Element;
}

export function QuantityField(props: QuantityFieldProps) {
  const message = () => props.q.error() ?? props.designError ?? null;
  const hintId = () => `${props.id}-hint`;
  const msgId = () => `${props.id}-msg`;
  const describedBy = () => (message() ? `${msgId()} ${hintId()}` : hintId());
  return (
    <div class="tw-field" classList={{ 'tw-field--bad': !!message(), 'tw-field--off': !!props.disabled }}>
      <label for={props.id}>
        {props.label}
        <Show when={props.symbol}>
          {' '}<span class="tw-symbol">{props.symbol}</span>
        </Show>
      </label>
      <input
        id={props.id}
        name={props.id}
        type="text"
        inputmode="text"
        autocomplete="off"
        spellcheck={false}
        value={props.q.text()}
        disabled={props.disabled}
        aria-invalid={message() ? 'true' : 'false'}
        aria-describedby={describedBy()}
        onInput={(e) => props.q.setText(e.currentTarget.value)}
      />
      <Show when={message()}>
        <p class="tw-field-msg" id={msgId()} role="alert">{message()}</p>
      </Show>
      <Show when={props.q.pending()}>
        <p class="tw-field-pending">Evaluating…</p>
      </Show>
      <p class="tw-field-hint" id={hintId()}>{props.hint ?? (props.q.unit ? `Unit: ${props.q.unit}` : '')}</p>
      {props.children}
    </div>
  );
}
