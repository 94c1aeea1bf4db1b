/**
 * Solid glue for urlState: applies the link's values once after hydration and
 * keeps the address bar in step with the bench (replaceState, debounced, so
 * the Back button is not flooded).
 */
import { createEffect, createSignal, on, onCleanup, onMount, type Accessor } from 'solid-js';
import { decodeState, encodeState, type UrlSchema } from './urlState';

export function useUrlState(
  schema: UrlSchema,
  current: Accessor<Record<string, string>>,
  apply: (values: Record<string, string>) => void,
): Accessor<string[]> {
  const [notices, setNotices] = createSignal<string[]>([]);
  const [ready, setReady] = createSignal(false);
  onMount(() => {
    const decoded = decodeState(window.location.search, schema);
    if (Object.keys(decoded.values).length) apply(decoded.values);
    setNotices(decoded.notices);
    setReady(true);
  });
  let timer: ReturnType<typeof setTimeout> | undefined;
  createEffect(
    on([ready, current], ([isReady, values]) => {
      if (!isReady) return;
      clearTimeout(timer);
      timer = setTimeout(() => {
        const query = encodeState(values, schema);
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
