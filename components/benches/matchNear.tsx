/**
 * Parts of the Match bench loaded when their place comes near the screen:
 * the options table and details, the plot, the coil drawing and the netlist
 * arrive only for a reader who scrolls to them (as the kit's Plot loads
 * uPlot), so a phone's first work is the fields and the answer.
 */
import { createSignal, onCleanup, onMount, Show, type Accessor, type JSX } from 'solid-js';

/**
 * Where a place counts as near: up to 300 px below the screen, or anywhere
 * above it. A place flung past between two frames is never seen inside a
 * band around the screen (the observer only reports changes), so one the
 * reader has scrolled past counts as reached.
 */
const NEAR = '100000px 0px 300px 0px';

/**
 * A module loaded once the element with this id comes near the screen or is
 * scrolled past (at once where IntersectionObserver is missing); undefined
 * until then, and `failed` when the load did not succeed.
 */
export function whenNear<T>(id: string, load: () => Promise<T>): { module: Accessor<T | undefined>; failed: Accessor<boolean> } {
  const [module, setModule] = createSignal<T>();
  const [failed, setFailed] = createSignal(false);
  const start = () => load().then((m) => setModule(() => m), (e: unknown) => {
    console.warn(e);
    setFailed(true);
  });
  onMount(() => {
    const place = document.getElementById(id);
    if (!place || typeof IntersectionObserver === 'undefined') return void start();
    const watch = new IntersectionObserver((seen) => {
      if (!seen.some((e) => e.isIntersecting)) return;
      watch.disconnect();
      void start();
    }, { rootMargin: NEAR });
    watch.observe(place);
    onCleanup(() => watch.disconnect());
  });
  return { module, failed };
}

/**
 * What a part shows once its code is near: `children` with the module, or
 * meanwhile a line that holds the part's place (`size` names its height in
 * the page's CSS: match-waiting--<size>) and says what comes, or that it
 * could not be loaded (the rest of the bench is unaffected).
 * @param props.near the element (by id) whose coming near loads the code
 */
export function NearPart<T>(props: { near: string; load: () => Promise<T>; size: string; what: string; waiting: string; children: (module: T) => JSX.Element }) {
  const code = whenNear(props.near, props.load);
  return (
    <Show
      when={code.module()}
      fallback={<p class={`tw-table-note match-waiting match-waiting--${props.size}`}>{code.failed() ? `${props.what} could not be loaded; the rest of the bench is unaffected.` : props.waiting}</p>}
    >
      {(m) => props.children(m())}
    </Show>
  );
}
