/**
 * A labelled select for one choice of many (a wire gauge), with an optional
 * hint and a message from the core tied to it by aria-describedby.
 */
import { For, Show } from 'solid-js';

export interface SelectProps<T extends string> {
  /** Stable id and form name (also its link key). */
  id: string;
  label: string;
  value: T;
  onChoose: (value: T) => void;
  /** [value, label] pairs, in display order. */
  options: readonly (readonly [T, string])[];
  hint?: string;
  message?: string | null;
}

export function Select<T extends string>(props: SelectProps<T>) {
  const msgId = () => `${props.id}-msg`;
  const hintId = () => `${props.id}-hint`;
  return (
    <div class="tw-field tw-select" classList={{ 'tw-field--bad': !!props.message }}>
      <label for={props.id}>{props.label}</label>
      <select
        id={props.id}
        name={props.id}
        aria-invalid={props.message ? 'true' : 'false'}
        aria-describedby={[props.message ? msgId() : '', props.hint ? hintId() : ''].filter(Boolean).join(' ') || undefined}
        onChange={(e) => props.onChoose(e.currentTarget.value as T)}
      >
        <For each={props.options}>{([v, label]) => <option value={v} selected={props.value === v}>{label}</option>}</For>
      </select>
      <Show when={props.message}>
        <p class="tw-field-msg" id={msgId()} role="alert">{props.message}</p>
      </Show>
      <Show when={props.hint}>
        <p class="tw-field-hint" id={hintId()}>{props.hint}</p>
      </Show>
    </div>
  );
}
