/**
 * A group of radio buttons under a legend: one choice of a few, reachable
 * with Tab and the arrow keys like any native radio group. A message from the
 * core about the choice (a DesignError routed here) is shown under it and
 * tied to the group.
 */
import { For, Show } from 'solid-js';

export interface ChoiceProps<T extends string> {
  /** Form name of the group; also its URL key, by convention. */
  name: string;
  legend: string;
  value: T;
  onChoose: (value: T) => void;
  /** [value, label] pairs, in display order. */
  options: readonly (readonly [T, string])[];
  class?: string;
  /** A message from the core about this choice. */
  message?: string | null;
}

export function Choice<T extends string>(props: ChoiceProps<T>) {
  const msgId = () => `${props.name}-msg`;
  return (
    <fieldset
      class={`tw-choice${props.class ? ` ${props.class}` : ''}`}
      classList={{ 'tw-field--bad': !!props.message }}
      aria-describedby={props.message ? msgId() : undefined}
    >
      <legend>{props.legend}</legend>
      <For each={props.options}>
        {([v, label]) => (
          <label>
            <input type="radio" name={props.name} value={v} checked={props.value === v} onChange={() => props.onChoose(v)} />
            {' '}{label}
          </label>
        )}
      </For>
      <Show when={props.message}>
        <p class="tw-field-msg" id={msgId()} role="alert">{props.message}</p>
      </Show>
    </fieldset>
  );
}
