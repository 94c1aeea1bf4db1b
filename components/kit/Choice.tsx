/**
 * A group of radio buttons under a legend: one choice of a few, reachable
 * with Tab and the arrow keys like any native radio group.
 */
import { For } from 'solid-js';

export interface ChoiceProps<T extends string> {
  /** Form name of the group; also its URL key, by convention. */
  name: string;
  legend: string;
  value: T;
  onChoose: (value: T) => void;
  /** [value, label] pairs, in display order. */
  options: readonly (readonly [T, string])[];
  class?: string;
}

export function Choice<T extends string>(props: ChoiceProps<T>) {
  return (
    <fieldset class={`tw-choice${props.class ? ` ${props.class}` : ''}`}>
      <legend>{props.legend}</legend>
      <For each={props.options}>
        {([v, label]) => (
          <label>
            <input type="radio" name={props.name} value={v} checked={props.value === v} onChange={() => props.onChoose(v)} />
            {' '}{label}
          </label>
        )}
      </For>
    </fieldset>
  );
}
