/**
 * What a bench ignored in the link that opened it (see urlState), shown as
 * plain text above the bench.
 */
import { For, Show } from 'solid-js';

export function LinkNotices(props: { notices: readonly string[] }) {
  return (
    <Show when={props.notices.length > 0}>
      <div class="tw-link-notices" role="status">
        <For each={props.notices}>{(n) => <p>{n}</p>}</For>
      </div>
    </Show>
  );
}
