/**
 * One field of a bench's table, laid out by its kind: a quantity, plain
 * number or range as a QuantityField, a choice as a radio group or a select.
 * Shown only while the field applies; its label, symbol and hint follow the
 * choices; a DesignError routed to it appears under it.
 */
import { For, Show, type JSX } from 'solid-js';
import type { BenchState } from './bench';
import { Choice } from './Choice';
import { fieldByKey, resolve, sayRule, type FieldDef } from './fields';
import { QuantityField } from './QuantityField';
import { Select } from './Select';

export interface FieldProps {
  bench: BenchState<unknown>;
  /** The field's key in the table. */
  name: string;
  /** Extra class on a radio group (e.g. a sub-choice inside a group). */
  class?: string;
  /** Shown inside the field, after its hint. */
  children?: JSX.Element;
}

/** The hint shown when the table gives none. */
function defaultHint(f: FieldDef): string | undefined {
  if (f.kind === 'quantity') return `Unit: ${f.unit}`;
  if (f.kind === 'range') return `two values, low..high, e.g. 10p..365p (${f.unit})`;
  if (f.kind === 'number') return sayRule(f.rule ?? {});
  if (f.kind === 'points') return `points as ${f.xName}: value, separated by semicolons (${f.unit})`;
  return undefined;
}

export function Field(props: FieldProps) {
  const def = fieldByKey(props.bench.table, props.name);
  if (!def) throw new Error(`Field: no field "${props.name}" in the bench's table`);
  const c = () => props.bench.choices();
  const label = () => resolve(def.label, c());
  const hint = () => (def.hint === undefined ? undefined : resolve(def.hint, c())) ?? defaultHint(def);
  const message = () => props.bench.designError(def.key);
  return (
    <Show when={props.bench.uses(def.key)}>
      {def.kind === 'choice'
        ? def.display === 'select'
          ? <Select id={def.key} label={label()} value={props.bench.choice(def.key)} options={def.options} hint={hint()} message={message()} onChoose={(v) => props.bench.choose(def.key, v)} />
          : <Choice name={def.key} legend={label()} value={props.bench.choice(def.key)} options={def.options} class={props.class} message={message()} onChoose={(v) => props.bench.choose(def.key, v)} />
        : (
          <QuantityField
            id={def.key}
            label={label()}
            symbol={def.symbol === undefined ? undefined : resolve(def.symbol, c())}
            q={props.bench.field(def.key)}
            hint={hint()}
            designError={message()}
          >
            {props.children}
          </QuantityField>
        )}
    </Show>
  );
}

/** Fields of a bench's table, in the order named. */
export function Fields(props: { bench: BenchState<unknown>; names: readonly string[] }) {
  return <For each={props.names}>{(name) => <Field bench={props.bench} name={name} />}</For>;
}
