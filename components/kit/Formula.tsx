/**
 * A formula typeset at build time (see tex.ts), shown beside the result it
 * explains, with its source and range of validity. The MathML comes from our
 * own TeX through KaTeX during the build, never from user input.
 *
 * The page hands a bench its formulas as named slots (`formulaSlots` in the
 * page, `math={props.name}` here): each is in the HTML once, in place, and the
 * island takes the element over when it hydrates, so formulas are neither
 * copied into the island's props nor walked by hydration. A plain HTML string
 * (`html`) still works for small benches.
 */
import { Show, type JSX } from 'solid-js';

export interface FormulaProps {
  /** The formula as a slot of the island (an element the page typeset). */
  math?: JSX.Element;
  /** Or its MathML as a string produced at build time by tex(). */
  html?: string;
  /** Published source, e.g. "Terman 1943, §3". */
  source?: string;
  /** Range of validity in words. */
  validity?: string;
}

export function Formula(props: FormulaProps) {
  return (
    <div class="tw-formula">
      <Show when={props.math} fallback={<div class="tw-formula-math" innerHTML={props.html ?? ''} />}>
        <div class="tw-formula-math">{props.math}</div>
      </Show>
      <Show when={props.source || props.validity}>
        <p class="tw-formula-meta">
          <Show when={props.source}><span class="tw-source">{props.source}</span></Show>
          <Show when={props.source && props.validity}>{' · '}</Show>
          <Show when={props.validity}><span class="tw-validity">{props.validity}</span></Show>
        </p>
      </Show>
    </div>
  );
}
