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
  // Few reactive parts: a bench hydrates a dozen of these at once.
  const meta = () => [props.source, props.validity].filter(Boolean).join(' · ');
  return (
    <div class="tw-formula">
      {props.math !== undefined ? <div class="tw-formula-math">{props.math}</div> : <div class="tw-formula-math" innerHTML={props.html ?? ''} />}
      <Show when={meta()}>
        <p class="tw-formula-meta">{meta()}</p>
      </Show>
    </div>
  );
}
