/**
 * Progressive hydration: `<Later>` hydrates its children in a task of their
 * own, after the part of the bench around it.
 *
 * A bench is one island, and Solid hydrates an island in one go: on a phone
 * (Lighthouse's 4× slower CPU) the Coil and Tank benches blocked the main
 * thread for over 150 ms in one task. Wrapping the fields, the answer and the
 * detailed cards each in a Later splits that into tasks short enough that the
 * page answers a tap between them.
 *
 * How: Solid's `lazy` already hydrates a component whose code arrives after
 * the rest of the island; here the "code" is at hand and only the next task
 * is waited for. The server renders the children in place (the HTML is the
 * same with or without Later), the browser keeps that HTML on screen until
 * the children hydrate, and effects (onMount, the link) wait until every
 * Later of the island has hydrated. Each Later waits for a task of its own;
 * nested ones wait in turn.
 */
import { createSignal, lazy, onMount, type Component, type JSX } from 'solid-js';
import { isServer } from 'solid-js/web';
import { createBenchState, type BenchState } from './bench';
import { createUrlState } from './createUrlState';
import type { BenchSnapshot, FieldTable, SpecObject } from './fields';

interface LaterProps {
  children: JSX.Element;
}

/** The children, as they are: what a Later hydrates once its task comes. */
const Children = (props: LaterProps) => props.children;

/** Resolves in the next task (a timer task: the browser may paint or take input first). */
const nextTask = (): Promise<void> => new Promise((done) => setTimeout(done, 0));

export function Later(props: LaterProps): JSX.Element {
  // One lazy per Later: a lazy component loads once, so a shared one would hydrate every Later in the same task.
  const Deferred = lazy(async () => {
    if (!isServer) await nextTask();
    return { default: Children };
  });
  return <Deferred>{props.children}</Deferred>;
}

/**
 * True once the whole island has hydrated, every Later included: Solid runs
 * onMount only then. `restore` runs first (a bench gives back early input,
 * see readEarlyInput); call this after createUrlState so the link is read
 * before. A bench marks its root with it (`data-awake`), which browser tests
 * wait for.
 */
export function createAwake(restore?: () => void): () => boolean {
  const [awake, setAwake] = createSignal(false);
  onMount(() => {
    restore?.();
    setAwake(true);
  });
  return awake;
}

/**
 * A bench's state as a bench hydrated in parts starts it: the state from its
 * table, the link read and written (createUrlState), and what was typed
 * before the scripts arrived given back once awake (after the link).
 */
export function createWakingBench<S = SpecObject>(table: FieldTable, early: Partial<BenchSnapshot>): { bench: BenchState<S>; notices: () => string[]; awake: () => boolean } {
  const bench = createBenchState<S>(table);
  const notices = createUrlState(bench);
  const awake = createAwake(() => bench.load(early));
  return { bench, notices, awake };
}

/**
 * What the person typed or chose before the bench hydrated, read from the
 * server's HTML as it stands: text fields whose value differs from the one
 * sent, radio groups and selects set to another option. Hydration writes the
 * bench's state into every control, and a click or keystroke before it ends
 * makes Solid render the rest afresh, so both would wipe it: read it in the
 * island's first task, before any Later, and give it back with `bench.load`
 * once the bench is awake (after the link, so what the hand did wins).
 * Keys are field keys: a field's input id, a radio group's name, a select's id.
 */
export function readEarlyInput(bench: string): Partial<BenchSnapshot> {
  const root = isServer ? null : document.querySelector(`[data-bench="${bench}"]`);
  if (!root) return {};
  const texts: Record<string, string> = {};
  const choices: Record<string, string> = {};
  for (const input of root.querySelectorAll<HTMLInputElement>('input[type="text"][id]')) {
    if (input.value !== input.defaultValue) texts[input.id] = input.value;
  }
  for (const radio of root.querySelectorAll<HTMLInputElement>('input[type="radio"]:checked')) {
    if (!radio.defaultChecked) choices[radio.name] = radio.value;
  }
  for (const select of root.querySelectorAll<HTMLSelectElement>('select[id]')) {
    const chosen = select.selectedOptions[0];
    if (chosen && !chosen.defaultSelected) choices[select.id] = chosen.value;
  }
  return { texts, choices };
}

/** What a bench hydrated in parts receives: the page's formulas and what was typed before it woke. */
export interface BenchParts<F> {
  formulas: F;
  early: Partial<BenchSnapshot>;
}

/**
 * A bench's island hydrated in parts: the first task only reads early input
 * (readEarlyInput); the bench's state and layout hydrate in the next, and each
 * Later inside it in one of its own.
 * @param bench the bench's data-bench name
 */
export function inParts<F extends Record<string, JSX.Element>>(bench: string, Parts: Component<BenchParts<F>>): Component<F> {
  return (props: F) => {
    const early = readEarlyInput(bench);
    return (
      <Later>
        <Parts formulas={props} early={early} />
      </Later>
    );
  };
}
