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
  /** Its name in the answer dock ("Q", "SRF"); the symbol or label when absent. */
  short?: string;
  /** Its value in the answer dock, when `text` is too long for it ("152" for "152 (130–171)"). */
  brief?: string;
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

/** What the answer dock shows: the summary's items and whether they are stale. */
export interface DockedAnswer {
  items: readonly SummaryItem[];
  stale: boolean;
}

/**
 * The answer, docked at the foot of the screen while a phone shows the
 * fields: the summary's first three figures, following what is typed; a tap
 * scrolls to the summary. It sits at the end of the bench's inputs and sticks
 * to the bottom while they scroll (CSS sticky), so it leaves by itself where
 * the summary begins; from 52rem up the summary sits beside the fields and
 * the dock is hidden. Its box has a fixed height: filling it moves nothing.
 *
 * It repeats, for the eye, what the summary says; screen readers and the
 * keyboard have the summary itself (announced as it changes), so the dock is
 * hidden from them and is no tab stop: a control there would sit over the
 * fields it floats above.
 */
export function AnswerDock(props: { answer: DockedAnswer | undefined; target?: string }) {
  const shown = () => props.answer?.items.slice(0, 3) ?? [];
  const go = () => document.getElementById(props.target ?? 'summary')?.scrollIntoView({ block: 'start' });
  return (
    <div class="tw-dock" classList={{ 'tw-dock--stale': !!props.answer?.stale }} id="answer-dock" aria-hidden="true" onClick={go}>
      <span class="tw-dock-items">
        <Show when={shown().length > 0} fallback={<span class="tw-dock-item"><span class="tw-dock-value">The answer is below</span></span>}>
          <For each={shown()}>
            {(item) => (
              <span class="tw-dock-item">
                <span class="tw-dock-label">{item.short ?? item.symbol ?? item.label}</span>
                <span class="tw-dock-value">{item.brief ?? item.text ?? formatResult(item.value, item.unit, item.significant)}</span>
              </span>
            )}
          </For>
        </Show>
      </span>
      <span class="tw-dock-go">↓</span>
    </div>
  );
}
