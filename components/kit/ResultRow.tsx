/**
 * One computed result: its name, value in engineering notation, a copy
 * button, and optionally the formula that produced it. A stale result (inputs
 * currently invalid) stays visible, dimmed and labelled.
 */
import { children, createSignal, Show, type JSX } from 'solid-js';
import { formatQuantity, formatNumber } from '../../src/quantity';

export interface ResultRowProps {
  /** Stable id (used by tests and for the copy status). */
  id: string;
  label: string;
  symbol?: string;
  /** SI value; undefined shows a dash. */
  value: number | undefined;
  /** SI unit symbol; omit for a plain number (Q, ratios). */
  unit?: string;
  significant?: number;
  stale?: boolean;
  /** Emphasise the main answer of a bench. */
  primary?: boolean;
  /** Formula and its source, rendered beside the value. */
  children?: JSX.Element;
}

export function formatResult(value: number | undefined, unit: string | undefined, significant = 4): string {
  if (value === undefined || !Number.isFinite(value)) return '—';
  return unit ? formatQuantity(value, unit, significant) : formatNumber(value, significant);
}

async function copyText(text: string): Promise<boolean> {
  try {
    await navigator.clipboard.writeText(text);
    return true;
  } catch {
    return false;
  }
}

export function ResultRow(props: ResultRowProps) {
  const [status, setStatus] = createSignal('');
  // Resolve the children once: reading props.children twice would build them twice,
  // and server and browser would then disagree on hydration keys.
  const why = children(() => props.children);
  const shown = () => formatResult(props.value, props.unit, props.significant);
  const copy = async () => {
    const ok = await copyText(shown());
    setStatus(ok ? 'Copied' : 'Copy blocked by the browser: select the value instead');
    setTimeout(() => setStatus(''), 2500);
  };
  return (
    <div class="tw-result" classList={{ 'tw-result--stale': !!props.stale, 'tw-result--primary': !!props.primary }} id={props.id}>
      <div class="tw-result-head">
        <span class="tw-result-label">
          {props.label}
          <Show when={props.symbol}>{' '}<span class="tw-symbol">{props.symbol}</span></Show>
        </span>
        <output class="tw-result-value" data-value={props.value ?? ''}>{shown()}</output>
        <Show when={props.stale}>
          <span class="tw-stale-tag" title="Inputs are not valid right now: this is the last good result">stale</span>
        </Show>
        <button type="button" class="tw-copy" aria-label={`Copy ${props.label}`} onClick={copy} disabled={props.value === undefined}>
          Copy
        </button>
        <span class="tw-copy-status" role="status" aria-live="polite">{status()}</span>
      </div>
      <Show when={why()}>
        <div class="tw-result-why">{why()}</div>
      </Show>
    </div>
  );
}
