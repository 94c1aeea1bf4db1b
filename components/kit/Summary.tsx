/**
 * The answer first: a compact list of the figures the technician came for
 * (the solved value; turns, inductance, Q, self-resonance and wire to cut; a
 * tank's resonance, loaded Q, bandwidth and dynamic resistance), above the
 * detailed cards with their formulas. Stale results stay, dimmed and tagged.
 */
import { For, Show } from 'solid-js';
import { formatResult, type ResultRowProps } from './ResultRow';
import './kit.css';

/** A figure of the summary: a result row's id, label, value, unit and figures, shown compactly. */
export interface SummaryItem extends Pick<ResultRowProps, 'id' | 'label' | 'symbol' | 'value' | 'unit' | 'significant'> {
  /** Text to show instead of the formatted value ("10.5", "AWG 22"). */
  text?: string;
  /** One short line under the value ("exactly 10.37 turns"). */
  detail?: string;
  /** The main answer: shown larger. */
  main?: boolean;
}

export interface SummaryProps {
  /** Heading; "Answer" by default. */
  title?: string;
  items: readonly SummaryItem[];
  stale?: boolean;
  /** Id of the section (default "summary"). */
  id?: string;
}

export function Summary(props: SummaryProps) {
  const id = () => props.id ?? 'summary';
  return (
    <section class="tw-summary" classList={{ 'tw-summary--stale': !!props.stale }} id={id()} aria-labelledby={`${id()}-title`}>
      <h2 class="tw-summary-title" id={`${id()}-title`}>
        {props.title ?? 'Answer'}
        <Show when={props.stale}>
          {' '}<span class="tw-stale-tag" title="Inputs are not valid right now: these are the last good results">stale</span>
        </Show>
      </h2>
      <dl class="tw-summary-list">
        <For each={props.items}>
          {(item) => (
            <div class="tw-summary-item" classList={{ 'tw-summary-item--main': !!item.main }} id={item.id}>
              <dt>
                {item.label}
                <Show when={item.symbol}>{' '}<span class="tw-symbol">{item.symbol}</span></Show>
              </dt>
              <dd>
                <output data-value={item.value ?? ''}>{item.text ?? formatResult(item.value, item.unit, item.significant)}</output>
                <Show when={item.detail}>
                  <span class="tw-summary-detail">{item.detail}</span>
                </Show>
              </dd>
            </div>
          )}
        </For>
      </dl>
    </section>
  );
}
