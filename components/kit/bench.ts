/**
 * The reactive side of a field table (fields.ts): createBenchState makes one
 * state per field, keeps the choices, knows the fields in use, builds the SI
 * spec of the fields in use, runs the bench's computations with DesignError
 * routing, and reads and writes the link and stored documents. A bench
 * declares its table, calls this once, and lays out <Field>s and results.
 */
import { batch, createMemo, createSignal, type Accessor } from 'solid-js';
import type { QuantityUnit } from '../../src/quantity';
import { createComputation, type Computed } from './compute';
import {
  decodeLink, defaultChoices, defaultText, followDefaults, encodeLink, fieldsInUse, putValue, readFieldText,
  readFieldTextSync, routeDesignError, setPath, whatOf,
  type BenchSnapshot, type Choices, type DecodedLink, type FieldDef, type FieldTable,
  type FieldValue, type SpecObject, type ValueFieldDef,
} from './fields';

/** One value field as the bench holds it: the text as typed, its value, and why it is not one. */
export interface FieldValueState {
  readonly def: ValueFieldDef;
  /** The field's unit (quantity and range fields), for the default hint. */
  readonly unit?: QuantityUnit;
  /** What is in the field, exactly as typed. */
  text: Accessor<string>;
  /** Current value (SI, or both ends of a range); undefined while blank, invalid or being worked out. */
  value: Accessor<FieldValue | undefined>;
  /** Last value that was read, kept while the text is not one. */
  lastGood: Accessor<FieldValue | undefined>;
  /** Why the current text is not a value; null when it is (or is a blank optional field). */
  error: Accessor<string | null>;
  /** True while a calculation is being worked out. */
  pending: Accessor<boolean>;
  /** True when the field is blank. */
  blank: Accessor<boolean>;
  /** True when the text is not a value right now (error or pending). */
  stale: Accessor<boolean>;
  setText(text: string): void;
}

/** Creates the state of one value field, starting with `initialText`. */
export function createFieldValueState(def: ValueFieldDef, choices: Accessor<Choices>, initialText: string): FieldValueState {
  const [text, setTextSignal] = createSignal(initialText);
  const [value, setValue] = createSignal<FieldValue | undefined>(undefined);
  const [lastGood, setLastGood] = createSignal<FieldValue | undefined>(undefined);
  const [error, setError] = createSignal<string | null>(null);
  const [pending, setPending] = createSignal(false);
  let generation = 0;

  const settle = (v: FieldValue | undefined, message: string | null) => {
    batch(() => {
      setValue(v);
      if (v !== undefined) setLastGood(v);
      setError(message);
      setPending(false);
    });
  };

  function setText(next: string): void {
    setTextSignal(next);
    const mine = ++generation;
    const c = choices();
    const r = readFieldTextSync(def, next, c);
    if (r.kind === 'value') return settle(r.value, null);
    if (r.kind === 'blank') return settle(undefined, null);
    if (r.kind === 'error') return settle(undefined, r.message);
    batch(() => {
      setValue(undefined);
      setError(null);
      setPending(true);
    });
    readFieldText(def, next, c).then(
      (v) => {
        if (mine === generation) settle(v, null);
      },
      (e: unknown) => {
        if (mine === generation) settle(undefined, e instanceof Error ? e.message : String(e));
      },
    );
  }
  setText(initialText);
  return {
    def,
    unit: def.kind === 'number' ? undefined : def.unit,
    text,
    value,
    lastGood,
    error,
    pending,
    blank: () => text().trim() === '',
    stale: () => error() !== null || pending(),
    setText,
  };
}

/** A bench's whole state, built from its field table. */
export interface BenchState<S = SpecObject> {
  readonly table: FieldTable;
  /** All choices, by key. */
  choices: Accessor<Choices>;
  choice(key: string): string;
  /**
   * Sets a choice. Fields still showing their default for the old choices
   * take their default for the new ones (a parallel tank's 10 kΩ becomes a
   * series tank's 5 Ω unless the person typed something else).
   */
  choose(key: string, value: string): void;
  /** The state of a value field. Throws for a key the table lacks (a programming slip). */
  field(key: string): FieldValueState;
  /** The fields that apply under the current choices. */
  inUse: Accessor<readonly FieldDef[]>;
  uses(key: string): boolean;
  /**
   * The SI spec of the fields in use (values by path, choices with a path by
   * value); undefined while a field in use is not a value. The bench's spec
   * builder turns it into what the core takes (conversions live there).
   */
  spec: Accessor<S | undefined>;
  /** True while some field in use is not a value. */
  inputsStale: Accessor<boolean>;
  /**
   * Runs `run` on the spec whenever it changes; keeps the last good result,
   * marks it stale, and shows a DesignError at the field in use that fills
   * the path it names (or as the general error when none does).
   */
  compute<T>(run: (spec: S, choices: Choices) => T | undefined): Computed<T>;
  /** The core's message for a field, from any of the bench's computations. */
  designError(key: string): string | null;
  /** A core message no field in use shows. */
  generalError: Accessor<string | null>;
  /** The state as plain data: choices and texts of every field. */
  snapshot(): BenchSnapshot;
  /**
   * Applies a (partial) state: choices first, then texts. With documents.ts:
   * a stored draft (documentToSnapshot) or a spec handed over (specToSnapshot).
   */
  load(snapshot: Partial<BenchSnapshot>): void;
  /** Reads a query string and applies what passes (see decodeLink). */
  readLink(search: string): DecodedLink;
  /** The query string for the current state (reactive). */
  linkQuery(): string;
}

/**
 * Creates the state of a bench from its table: choices at their defaults,
 * every value field at its default text.
 */
export function createBenchState<S = SpecObject>(table: FieldTable): BenchState<S> {
  const [choices, setChoices] = createSignal<Choices>(defaultChoices(table));
  const states = new Map<string, FieldValueState>();
  for (const f of table) {
    if (f.kind !== 'choice') states.set(f.key, createFieldValueState(f, choices, defaultText(f, choices())));
  }
  const field = (key: string): FieldValueState => {
    const s = states.get(key);
    if (!s) throw new Error(`bench: no value field "${key}" in the table`);
    return s;
  };
  const inUse = createMemo(() => fieldsInUse(table, choices()));

  const spec = createMemo((): S | undefined => {
    const c = choices();
    const out: SpecObject = {};
    for (const f of inUse()) {
      if (f.kind === 'choice') {
        if (f.path) setPath(out, f.path, c[f.key]);
        continue;
      }
      const s = field(f.key);
      if (s.stale()) return undefined;
      const v = s.value();
      if (v === undefined) {
        if (!f.optional) return undefined;
        continue;
      }
      putValue(out, f, v);
    }
    return out as S;
  });

  // A signal: a computation may start after the fields that show its errors (a bench hydrating in parts, kit/Later).
  const [computations, setComputations] = createSignal<readonly Computed<unknown>[]>([]);
  const route = (path: string) => routeDesignError(table, choices(), path);

  /** Sets choices; fields still at their default for the old choices take the new default. */
  function setChoicesFollowing(next: Choices): void {
    const before = choices();
    const texts = Object.fromEntries([...states].map(([k, st]) => [k, st.text()]));
    const after = followDefaults(table, texts, before, next);
    setChoices(next);
    for (const [key, text] of Object.entries(after)) if (text !== texts[key]) field(key).setText(text);
  }

  function load(s: Partial<BenchSnapshot>): void {
    batch(() => {
      if (s.choices) {
        const next: Record<string, string> = { ...choices() };
        for (const f of table) if (f.kind === 'choice' && s.choices[f.key] !== undefined) next[f.key] = s.choices[f.key];
        setChoicesFollowing(next);
      }
      for (const [key, text] of Object.entries(s.texts ?? {})) states.get(key)?.setText(text);
    });
  }

  const snapshot = (): BenchSnapshot => ({
    choices: { ...choices() },
    texts: Object.fromEntries([...states].map(([k, s]) => [k, s.text()])),
  });

  return {
    table,
    choices,
    choice: (key) => choices()[key],
    choose(key, value) {
      if (choices()[key] !== value) batch(() => setChoicesFollowing({ ...choices(), [key]: value }));
    },
    field,
    inUse,
    uses: (key) => inUse().some((f) => f.key === key),
    spec,
    inputsStale: () => spec() === undefined,
    compute<T>(run: (spec: S, choices: Choices) => T | undefined): Computed<T> {
      const c = createComputation(() => {
        const s = spec();
        return s === undefined ? undefined : run(s, choices());
      }, route);
      setComputations((list) => [...list, c as Computed<unknown>]);
      return c;
    },
    designError: (key) => {
      for (const c of computations()) {
        const m = c.fieldError(key);
        if (m) return m;
      }
      return null;
    },
    generalError: () => {
      for (const c of computations()) {
        const m = c.generalError();
        if (m) return m;
      }
      return null;
    },
    snapshot,
    load,
    readLink(search) {
      const d = decodeLink(table, search, choices());
      load(d);
      return d;
    },
    linkQuery: () => encodeLink(table, snapshot()),
  };
}

export { whatOf };
