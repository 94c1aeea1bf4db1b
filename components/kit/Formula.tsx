/**
 * A formula typeset at build time (see tex.ts), shown beside the result it
 * explains, with its source and range of validity. The HTML comes from our
 * own TeX through KaTeX during the build, never from user input.
 */
import { Show } from 'solid-js';

export interface FormulaProps {
  /** KaTeX HTML produced at build time by tex(). */
  html: string;
  /** Published source, e.g. "Terman 1943, §3". */
  source?: string;
  /** Range of validity in words. */
  validity?: string;
}

export function Formula(props: FormulaProps) {
  return (
    <div class="tw-formula">
      <div class="tw-formula-math" innerHTML={props.html} />
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
