/**
 * A bench's state in the address bar: reads the link once after hydration
 * and keeps the query string in step with the bench (replaceState, debounced,
 * so the Back button is not flooded). Returns the notices for what the link
 * carried that was ignored (show them with LinkNotices).
 *
 * The source is usually a BenchState (bench.ts), whose readLink and linkQuery
 * come from its field table. A bench that reacts to what a link gave (the
 * Tank bench greeting a coil handed over) wraps readLink.
 */
import { createEffect, createSignal, on, onCleanup, onMount, type Accessor } from 'solid-js';

export interface LinkSource {
  /** Applies what passes of a query string; returns the notices for what did not. */
  readLink(search: string): { notices: readonly string[] };
  /** The query string (without "?") for the current state; reactive. */
  linkQuery(): string;
}

export function createUrlState(source: LinkSource): Accessor<string[]> {
  const [notices, setNotices] = createSignal<string[]>([]);
  const [ready, setReady] = createSignal(false);
  onMount(() => {
    setNotices([...source.readLink(window.location.search).notices]);
    setReady(true);
  });
  let timer: ReturnType<typeof setTimeout> | undefined;
  createEffect(
    on([ready, () => source.linkQuery()], ([isReady, query]) => {
      if (!isReady) return;
      clearTimeout(timer);
      timer = setTimeout(() => {
        const url = `${window.location.pathname}${query ? `?${query}` : ''}${window.location.hash}`;
        if (url !== `${window.location.pathname}${window.location.search}${window.location.hash}`) {
          window.history.replaceState(window.history.state, '', url);
        }
      }, 250);
    }),
  );
  onCleanup(() => clearTimeout(timer));
  return notices;
}
