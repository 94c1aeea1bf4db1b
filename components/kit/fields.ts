/**
 * A bench's field table: every input declared once, with its link key, label,
 * unit or plain-number rule, default, when it applies, and the spec path it
 * fills. Everything a bench used to write by hand derives from the table:
 *
 * - the link codec (encodeLink / decodeLink), refusing hostile values with
 *   notices and using the same grammar and range as typing;
 * - the fields in use for the current choices (fieldsInUse);
 * - routing a core DesignError, whose `field` is a spec path ('pitch',
 *   'wire.diameter'), to the field in use that fills that path
 *   (routeDesignError), or to the bench's general message when none does;
 * - the plain object a draft or a shop-sheet file stores (BenchDocument), and
 *   the way back from an SI spec to field texts: see documents.ts.
 *
 * A bench's state is a BenchSnapshot: its choices and the texts as typed.
 * The link, a saved draft and a shop-sheet file all write that same state;
 * only the fields in use are written. Nothing here touches the DOM or Solid
 * (see bench.ts for the reactive side), so the shop sheet can use it at build
 * time and tests run it in Node.
 *
 * Conversions (a former diameter to a mean diameter, a wire gauge to a
 * diameter) belong to the bench's spec builder, not to the table: a field
 * names the path it fills, and `answers` lists further paths whose errors it
 * shows (the gauge select answers for 'wire.diameter').
 */
import {
  EXPRESSION_CONSTANTS, EXPRESSION_FUNCTIONS, checkRange, formatQuantityCompact, isQuantityError, looksLikeExpression,
  looksLikeRange, parsePlainNumber, parseQuantity, parseQuantityAsync, parseQuantityPoints, parseQuantityRange, parseQuantityRangeAsync,
  quoteText, sayBound, splitRange, MAX_POINTS_LENGTH, type NumberRange, type PlainNumberRule, type QuantityPoint, type QuantityRange,
  type QuantityUnit,
} from '../../src/quantity';
import { lowEndWithSharedUnit } from '../../src/quantity/parse';

// ---------------------------------------------------------------------------
// Declarations

/** The bench's current choices, by key (radio groups and selects). */
export type Choices = Readonly<Record<string, string>>;
/** A value that may depend on the current choices (a label that changes with the form). */
export type Dynamic<T> = T | ((choices: Choices) => T);
/**
 * When a field applies. A function of the choices, or a pattern of choice
 * values ({ coilLoss: 'Q' }, { form: ['solenoid', 'multilayer'] }). A
 * pattern also lets a link that gives this field without its choice pick
 * that choice (a link with coilQ but no coilLoss means coilLoss=Q).
 */
export type When = ((choices: Choices) => boolean) | Readonly<Record<string, string | readonly string[]>>;

interface FieldBase {
  /** Link key, input id and name; unique in the table. Letters, digits, _. */
  key: string;
  label: Dynamic<string>;
  /** The field's name in messages and link notices; defaults to the label. */
  what?: Dynamic<string>;
  symbol?: Dynamic<string | undefined>;
  /** Examples of accepted input, shown under the field. */
  hint?: Dynamic<string | undefined>;
  /** When the field applies; always when omitted. */
  when?: When;
  /** Further spec paths whose DesignError is shown at this field while it is in use. */
  answers?: readonly string[];
}

/** A quantity with a unit ("4.7 µH", "2*47p"). */
export interface QuantityFieldDef extends FieldBase {
  kind: 'quantity';
  unit: QuantityUnit;
  /** Spec path it fills, SI value ('wire.diameter'). */
  path: string;
  /** Text in the field at first ('' for blank). */
  default: Dynamic<string>;
  /** Blank means "not given": no value and no message (an ideal part, no load). */
  optional?: boolean;
  /** Values allowed, in SI (POSITIVE for a length or a part value). Checked at the field. */
  allowed?: NumberRange;
}

/** A plain number (turns, Q, μ′, tan δ, °C) with its range. */
export interface NumberFieldDef extends FieldBase {
  kind: 'number';
  path: string;
  default: Dynamic<string>;
  optional?: boolean;
  /** Range, step and the unit shown with it (°C). */
  rule?: PlainNumberRule;
}

/**
 * A range of two quantities typed as one text ("10p..365p", "5.9–6.2 MHz"),
 * filling two spec paths: a tuning capacitor's ends, a band's edges.
 */
export interface RangeFieldDef extends FieldBase {
  kind: 'range';
  unit: QuantityUnit;
  /** Spec path of the low end ('minCapacitance'). */
  low: string;
  /** Spec path of the high end ('maxCapacitance'). */
  high: string;
  default: Dynamic<string>;
  optional?: boolean;
  /** Values allowed for each end, SI. */
  allowed?: NumberRange;
}

/**
 * A short table typed as one text ("0: 365p; 90: 160p; 180: 10p"): points of
 * a plain number and a quantity, filling one spec path with `{ x, y }[]` in
 * the order typed (a variable capacitor's plates at a few angles).
 */
export interface PointsFieldDef extends FieldBase {
  kind: 'points';
  /** Unit of each point's quantity. */
  unit: QuantityUnit;
  path: string;
  /** Name of each point's number in messages ("angle"), and its rule (range, unit such as °). */
  xName: string;
  xRule?: PlainNumberRule;
  default: Dynamic<string>;
  optional?: boolean;
  /** Values allowed for each quantity, SI. */
  allowed?: NumberRange;
}

/** One of a few values: a radio group, or a select for long lists (wire gauges). */
export interface ChoiceFieldDef extends FieldBase {
  kind: 'choice';
  /** [value, label] pairs in display order. */
  options: readonly (readonly [string, string])[];
  default: string;
  /** Spec path filled with the chosen value ('form'); none for a choice of how to enter something. */
  path?: string;
  /** Radio buttons (default) or a select. */
  display?: 'radio' | 'select';
}

export type ValueFieldDef = QuantityFieldDef | NumberFieldDef | RangeFieldDef | PointsFieldDef;
/** What a value field gives: SI number, both ends of a range, or a table's points. */
export type FieldValue = number | QuantityRange | QuantityPoint[];
export type FieldDef = ValueFieldDef | ChoiceFieldDef;
export type FieldTable = readonly FieldDef[];

/** A bench's whole state: its choices and the texts as typed, by key. Plain data. */
export interface BenchSnapshot {
  choices: Record<string, string>;
  texts: Record<string, string>;
}

/** Nested plain data by spec path: `{ wire: { diameter: … } }`. */
export interface SpecObject {
  [key: string]: SpecLeaf;
}
export type SpecLeaf = string | number | SpecObject | QuantityPoint[];

/**
 * What a draft or a shop-sheet file stores: the choices, and the spec written
 * as text by path (`{ inductance: '4u7', wire: { diameter: '0.5 mm' } }`).
 * A choice with a path also appears in `spec` (form: 'solenoid').
 */
export interface BenchDocument {
  choices: Record<string, string>;
  spec: SpecObject;
}

const KEY = /^[A-Za-z][A-Za-z0-9_]*$/;
const PATH = /^[A-Za-z][A-Za-z0-9_]*(\.[A-Za-z][A-Za-z0-9_]*)*$/;

/**
 * Checks a table once, where it is declared: unique keys, valid keys and
 * paths, choice defaults among their options, value defaults that read as
 * values of the field. Throws an Error naming the field (a programming slip,
 * not a user's). Checks in the build and in tests; the browser's bundle skips them.
 */
export function defineFields<T extends FieldTable>(table: T): T {
  // The checks run in the build (server render) and in tests, where a bad table must fail;
  // a phone loading a bench would only repeat them (parsing every default took 10 ms there).
  if (!import.meta.env.SSR && !import.meta.env.DEV) return table;
  const keys = new Set<string>();
  const choices = defaultChoices(table);
  for (const f of table) {
    if (!KEY.test(f.key)) throw new Error(`field table: key "${f.key}" must be letters, digits and _`);
    if (keys.has(f.key)) throw new Error(`field table: key "${f.key}" is declared twice`);
    keys.add(f.key);
    for (const p of pathsOf(f)) if (!PATH.test(p)) throw new Error(`field table: ${f.key}: path "${p}" is not a dotted name`);
    for (const a of f.answers ?? []) if (!PATH.test(a)) throw new Error(`field table: ${f.key}: answers "${a}" is not a dotted name`);
    if (f.kind === 'choice') {
      if (!f.options.some(([v]) => v === f.default)) throw new Error(`field table: ${f.key}: default "${f.default}" is not an option`);
      continue;
    }
    const text = defaultText(f, choices);
    if (text.trim() === '' && !f.optional) throw new Error(`field table: ${f.key}: a required field needs a default`);
    if (text.trim() !== '' && !looksLikeExpression(text)) {
      const r = readFieldTextSync(f, text, choices);
      if (r.kind === 'error') throw new Error(`field table: ${f.key}: default "${text}" is refused: ${r.message}`);
    }
  }
  return table;
}

/** The spec paths a field fills: one, two for a range, none for a choice of how to enter something. */
export function pathsOf(f: FieldDef): string[] {
  if (f.kind === 'range') return [f.low, f.high];
  return f.path === undefined ? [] : [f.path];
}

/** Evaluates a Dynamic value for the choices. */
export function resolve<T>(d: Dynamic<T>, choices: Choices): T {
  return typeof d === 'function' ? (d as (c: Choices) => T)(choices) : d;
}

/** The choices of a table at their defaults. */
export function defaultChoices(table: FieldTable): Record<string, string> {
  const out: Record<string, string> = {};
  for (const f of table) if (f.kind === 'choice') out[f.key] = f.default;
  return out;
}

/** A value field's default text for the choices. */
export function defaultText(f: ValueFieldDef, choices: Choices): string {
  return resolve(f.default, choices);
}

/**
 * The table's state at its defaults, or at the defaults for `choices` (a
 * default may depend on a choice: a series tank's terminations are 5 Ω).
 */
export function defaultSnapshot(table: FieldTable, choices: Choices = {}): BenchSnapshot {
  const all = { ...defaultChoices(table), ...choices };
  const texts: Record<string, string> = {};
  for (const f of table) if (f.kind !== 'choice') texts[f.key] = defaultText(f, all);
  return { choices: all, texts };
}

/**
 * The texts after a change of choices: a field still showing its default
 * for the old choices takes its default for the new ones; anything typed stays.
 */
export function followDefaults(table: FieldTable, texts: Readonly<Record<string, string>>, before: Choices, after: Choices): Record<string, string> {
  const out = { ...texts };
  for (const f of table) {
    if (f.kind === 'choice') continue;
    const was = defaultText(f, before);
    if (out[f.key] === undefined || out[f.key] === was) out[f.key] = defaultText(f, after);
  }
  return out;
}

/** True when the field applies under these choices. */
export function applies(f: FieldDef, choices: Choices): boolean {
  const w = f.when;
  if (w === undefined) return true;
  if (typeof w === 'function') return w(choices);
  return Object.entries(w).every(([k, v]) => (typeof v === 'string' ? choices[k] === v : v.includes(choices[k])));
}

/** The fields that apply under these choices, in table order. */
export function fieldsInUse(table: FieldTable, choices: Choices): FieldDef[] {
  return table.filter((f) => applies(f, choices));
}

/** The field's name in messages ("Former diameter"). */
export function whatOf(f: FieldDef, choices: Choices): string {
  return resolve(f.what ?? f.label, choices);
}

/** The name in a notice, in running text: "frequency", but "AL" and "μ′" as they are. */
function inSentence(name: string): string {
  return /^[A-Z][a-z]/.test(name) ? name.charAt(0).toLowerCase() + name.slice(1) : name;
}

/**
 * A plain-number rule for a hint: "a plain number from −60 to 200 °C",
 * "a whole number, at least 1", "a plain number greater than zero".
 */
export function sayRule(rule: PlainNumberRule): string {
  const noun = rule.step === 1 ? 'a whole number' : rule.step === 0.5 ? 'a whole or half number' : 'a plain number';
  const b = (x: number) => sayBound(x, undefined);
  const u = rule.unit ? ` ${rule.unit}` : '';
  const { min, max, minExclusive, maxExclusive } = rule;
  if (min !== undefined && max !== undefined && !minExclusive && !maxExclusive) return `${noun} from ${b(min)} to ${b(max)}${u}`;
  const parts: string[] = [];
  if (min !== undefined) parts.push(minExclusive ? `greater than ${b(min)}` : `at least ${b(min)}`);
  if (max !== undefined) parts.push(maxExclusive ? `less than ${b(max)}` : `at most ${b(max)}`);
  return parts.length ? `${noun}, ${parts.join(' and ')}${u}` : `${noun}${u}`;
}

/** Looks a field up by key; undefined for an unknown key (never an inherited property). */
export function fieldByKey(table: FieldTable, key: string): FieldDef | undefined {
  return table.find((f) => f.key === key);
}

// ---------------------------------------------------------------------------
// Reading a field's text (one grammar for typing, links and documents)

/** What a text gives for a value field, without working out calculations. */
export type FieldReading =
  | { kind: 'value'; value: FieldValue }
  | { kind: 'blank' }
  | { kind: 'expression' }
  | { kind: 'error'; message: string };

function messageOf(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}

/** Engineering notation for bounds quoted in a quantity field's messages. */
function boundFormat(unit: QuantityUnit): (x: number) => string {
  return (x) => formatQuantityCompact(x, unit, 3);
}

/**
 * Reads a value field's text synchronously: its value, blank, a calculation
 * still to work out (see readFieldText), or the sentence saying why not.
 * Range and unit rules are the field's, so typing and links agree.
 */
export function readFieldTextSync(f: ValueFieldDef, text: string, choices: Choices): FieldReading {
  if (text.trim() === '') return f.optional ? { kind: 'blank' } : { kind: 'error', message: 'Enter a value.' };
  const what = whatOf(f, choices);
  try {
    if (f.kind === 'number') return { kind: 'value', value: parsePlainNumber(text, f.rule ?? {}, what) };
    if (f.kind === 'range') return { kind: 'value', value: parseQuantityRange(text, f.unit, { what, allowed: f.allowed, format: boundFormat(f.unit) }) };
    if (f.kind === 'points') return { kind: 'value', value: parseQuantityPoints(text, f.unit, { what, xName: f.xName, xRule: f.xRule, allowed: f.allowed, format: boundFormat(f.unit) }) };
    if (looksLikeExpression(text) && !looksLikeRange(text)) return { kind: 'expression' };
    const v = parseQuantity(text, f.unit);
    return { kind: 'value', value: checkRange(v, f.allowed, text, what, undefined, boundFormat(f.unit)) };
  } catch (e) {
    if (isQuantityError(e) && e.needsExpression) return { kind: 'expression' };
    return { kind: 'error', message: messageOf(e) };
  }
}

/**
 * Reads a value field's text, working out a calculation when there is one
 * (mathjs loads on demand). Resolves to the SI value, or undefined for a blank
 * optional field; rejects with the sentence for the field.
 */
export async function readFieldText(f: ValueFieldDef, text: string, choices: Choices): Promise<FieldValue | undefined> {
  const r = readFieldTextSync(f, text, choices);
  if (r.kind === 'value') return r.value;
  if (r.kind === 'blank') return undefined;
  if (r.kind === 'error') throw new Error(r.message);
  if (f.kind === 'range') {
    try {
      return await parseQuantityRangeAsync(text, f.unit, { what: whatOf(f, choices), allowed: f.allowed, format: boundFormat(f.unit) });
    } catch (e) {
      throw new Error(messageOf(e));
    }
  }
  const q = f as QuantityFieldDef;
  let v: number;
  try {
    v = await parseQuantityAsync(text, q.unit);
  } catch (e) {
    throw new Error(isQuantityError(e) ? e.message : messageOf(e));
  }
  try {
    return checkRange(v, q.allowed, text, whatOf(f, choices), undefined, boundFormat(q.unit));
  } catch (e) {
    throw new Error(messageOf(e));
  }
}

// ---------------------------------------------------------------------------
// Links

/** Longest value accepted from a link. */
export const MAX_LINK_VALUE = 120;
/** At most this many link parameters are looked at. */
export const MAX_LINK_PARAMS = 40;

const LINK_CHARS = /^[0-9A-Za-z .,+\-−*×/÷^()µμΩΩ"″π…–—]*$/u;
/** A typed table: numbers with units, their separators (: = ; new line) and the degree sign. */
const POINTS_CHARS = /^[0-9A-Za-z .+\-−:=;°µμΩΩ\n\r]*$/u;
const NUMBER_TOKEN = /\d[\d.]*(?:[eE][+-]?\d+)?[A-Za-zµμΩΩ"″]*\d*/gu;
const LINK_WORDS = new Set([...EXPRESSION_CONSTANTS, ...EXPRESSION_FUNCTIONS, 'π']);

/** A value quoted in a notice: control characters replaced, long text cut. */
function shown(text: string): string {
  const clean = text.replace(/[\u0000-\u001f\u007f-\u009f]/g, '?');
  return clean.length > 24 ? `${clean.slice(0, 24)}…` : clean;
}

/**
 * Why a link value for a quantity field is refused, or null when it is
 * acceptable: too long, characters no quantity uses, names other than the
 * calculator's own, or a value the field itself would refuse.
 */
export function refuseQuantityLinkText(text: string, unit: QuantityUnit, check?: (value: number) => void): string | null {
  if (text.length > MAX_LINK_VALUE) return `longer than ${MAX_LINK_VALUE} characters`;
  if (!LINK_CHARS.test(text)) return 'contains characters no quantity uses';
  if (looksLikeExpression(text) && !looksLikeRange(text)) {
    const words = text.replace(NUMBER_TOKEN, ' ').match(/[A-Za-zµμΩΩπ]+/gu) ?? [];
    const bad = words.find((w) => !LINK_WORDS.has(w));
    return bad ? `uses "${shown(bad)}", which is not allowed in a link` : null;
  }
  try {
    const v = parseQuantity(text, unit);
    check?.(v);
    return null;
  } catch (e) {
    return e instanceof Error ? e.message : 'is not a value';
  }
}

/** Why a link value for a plain-number field is refused, or null: the typing grammar and range. */
export function refusePlainNumberLinkText(text: string, rule: PlainNumberRule = {}, what = 'The value'): string | null {
  if (text.length > MAX_LINK_VALUE) return `longer than ${MAX_LINK_VALUE} characters`;
  try {
    parsePlainNumber(text, rule, what);
    return null;
  } catch (e) {
    return e instanceof Error ? e.message : 'not a plain number';
  }
}

/** Why a link value for this field is refused, or null. Blank is refused unless the field is optional. */
export function refuseLinkText(f: FieldDef, text: string, choices: Choices): string | null {
  if (f.kind === 'choice') {
    return f.options.some(([v]) => v === text) ? null : `expected one of ${f.options.map(([v]) => v).join(', ')}`;
  }
  if (text === '') return f.optional ? null : 'empty, and this value is needed';
  const what = whatOf(f, choices);
  if (f.kind === 'number') return refusePlainNumberLinkText(text, f.rule, what);
  if (f.kind === 'points') {
    if (text.length > MAX_POINTS_LENGTH) return `longer than ${MAX_POINTS_LENGTH} characters`;
    if (!POINTS_CHARS.test(text)) return 'contains characters no table of values uses';
    const r = readFieldTextSync(f, text, choices);
    return r.kind === 'error' ? r.message : null;
  }
  if (f.kind === 'range') {
    if (text.length > MAX_LINK_VALUE) return `longer than ${MAX_LINK_VALUE} characters`;
    if (!LINK_CHARS.test(text)) return 'contains characters no quantity uses';
    const r = readFieldTextSync(f, text, choices);
    if (r.kind === 'error') return r.message;
    if (r.kind !== 'expression') return null;
    const [low, high] = splitRange(text) as [string, string];
    return refuseQuantityLinkText(lowEndWithSharedUnit(low, high), f.unit) ?? refuseQuantityLinkText(high, f.unit);
  }
  return refuseQuantityLinkText(text, f.unit, (v) => checkRange(v, f.allowed, text, what, undefined, boundFormat(f.unit)));
}

/**
 * The query string (without "?") for a state: every field in use, in table
 * order, as typed. A blank optional field whose default is not blank is
 * written empty (`Rs=`), so opening the link does not bring the default back.
 */
export function encodeLink(table: FieldTable, snapshot: BenchSnapshot): string {
  const params = new URLSearchParams();
  const choices = { ...defaultChoices(table), ...snapshot.choices };
  for (const f of fieldsInUse(table, choices)) {
    if (f.kind === 'choice') {
      params.set(f.key, choices[f.key]);
      continue;
    }
    const text = (snapshot.texts[f.key] ?? defaultText(f, choices)).trim();
    if (text !== '') params.set(f.key, text);
    else if (f.optional && defaultText(f, choices).trim() !== '') params.set(f.key, '');
  }
  return params.toString();
}

/** What a link gave: choices and texts that passed, the keys given, and notices for what was ignored. */
export interface DecodedLink {
  choices: Record<string, string>;
  texts: Record<string, string>;
  /** Keys whose values were taken from the link, in link order. */
  given: string[];
  notices: string[];
}

/**
 * Reads a query string against a table. Unknown keys, values too long, with
 * characters no quantity has, names other than the calculator's own, values
 * the field would refuse (grammar, unit, range) and choices that are not
 * options are ignored and listed as notices (plain text, never markup). A
 * field given without the choice that makes it apply picks that choice when
 * its `when` is a pattern and the link does not set it.
 * @param base choices before the link (the bench's current ones; defaults when omitted)
 */
export function decodeLink(table: FieldTable, search: string, base?: Choices): DecodedLink {
  const out: DecodedLink = { choices: {}, texts: {}, given: [], notices: [] };
  let params: URLSearchParams;
  try {
    params = new URLSearchParams(search);
  } catch {
    out.notices.push('The link’s settings could not be read and were ignored.');
    return out;
  }
  const entries: [string, string][] = [];
  let seen = 0;
  for (const entry of params) {
    if (++seen > MAX_LINK_PARAMS) {
      out.notices.push(`The link has more than ${MAX_LINK_PARAMS} settings; the rest were ignored.`);
      break;
    }
    entries.push(entry);
  }
  const unknown: string[] = [];
  const choiceKeysGiven = new Set<string>();
  // Choices first: whether a value applies, and its label, may depend on them.
  for (const [key, raw] of entries) {
    const f = fieldByKey(table, key);
    if (!f) {
      unknown.push(shown(key));
      continue;
    }
    if (f.kind !== 'choice') continue;
    const text = raw.trim();
    const why = refuseLinkText(f, text, {});
    if (why === null) {
      out.choices[key] = text;
      choiceKeysGiven.add(key);
      if (!out.given.includes(key)) out.given.push(key);
    } else out.notices.push(`Ignored the link’s “${inSentence(whatOf(f, {}))}” setting “${shown(text)}”: ${why}.`);
  }
  const choices: Record<string, string> = { ...defaultChoices(table), ...base, ...out.choices };
  for (const [key, raw] of entries) {
    const f = fieldByKey(table, key);
    if (!f || f.kind === 'choice') continue;
    const text = raw.trim();
    const why = refuseLinkText(f, text, choices);
    if (why !== null) {
      out.notices.push(`Ignored the link’s value for ${inSentence(whatOf(f, choices))} (“${shown(text)}”): ${why.replace(/\.$/, '')}.`);
      continue;
    }
    out.texts[key] = text;
    if (!out.given.includes(key)) out.given.push(key);
    // A value given without its choice picks that choice, unless the link's own choices rule it out.
    if (f.when && typeof f.when !== 'function') {
      const pattern = Object.entries(f.when);
      const ruledOut = pattern.some(([ck, cv]) => choiceKeysGiven.has(ck) && !(typeof cv === 'string' ? cv === choices[ck] : cv.includes(choices[ck])));
      for (const [ck, cv] of ruledOut ? [] : pattern) {
        if (choiceKeysGiven.has(ck) || typeof cv !== 'string') continue;
        out.choices[ck] = cv;
        choices[ck] = cv;
        choiceKeysGiven.add(ck);
      }
    }
  }
  if (unknown.length) {
    out.notices.push(`Ignored unknown link setting${unknown.length > 1 ? 's' : ''}: ${unknown.slice(0, 5).join(', ')}${unknown.length > 5 ? ', …' : ''}.`);
  }
  return out;
}

// ---------------------------------------------------------------------------
// Errors from the core

/**
 * The key of the field in use that shows a DesignError naming spec path
 * `path`: the field that fills it; else one that answers for it; else one
 * that fills a part of it ('wire' → the field of 'wire.diameter') or a whole
 * that contains it ('wire.diameter.x' → 'wire.diameter'). Null when no field
 * in use does: the bench shows the message as a general one.
 */
export function routeDesignError(table: FieldTable, choices: Choices, path: string): string | null {
  const used = fieldsInUse(table, choices);
  const by = (test: (f: FieldDef) => boolean) => used.find(test)?.key ?? null;
  return (
    by((f) => pathsOf(f).includes(path)) ??
    by((f) => (f.answers ?? []).includes(path)) ??
    by((f) => pathsOf(f).some((p) => p.startsWith(`${path}.`))) ??
    by((f) => pathsOf(f).some((p) => path.startsWith(`${p}.`)))
  );
}

// ---------------------------------------------------------------------------
// Plain objects by spec path

/** The value at a dotted path, or undefined. Only own properties are read. */
export function getPath(obj: unknown, path: string): unknown {
  let at: unknown = obj;
  for (const part of path.split('.')) {
    if (typeof at !== 'object' || at === null || !Object.prototype.hasOwnProperty.call(at, part)) return undefined;
    at = (at as Record<string, unknown>)[part];
  }
  return at;
}

/** Sets a value at a dotted path, creating plain objects on the way. Throws if a path is set twice. */
export function setPath(obj: SpecObject, path: string, value: SpecLeaf): void {
  const parts = path.split('.');
  let at: SpecObject = obj;
  for (const part of parts.slice(0, -1)) {
    const next = at[part];
    if (next === undefined) at = at[part] = {};
    else if (typeof next === 'object' && !Array.isArray(next)) at = next;
    else throw new Error(`spec path ${path}: ${part} already holds a value`);
  }
  const last = parts[parts.length - 1];
  if (at[last] !== undefined) throw new Error(`spec path ${path} is filled by two fields in use`);
  at[last] = value;
}

/** Writes a field's value into a spec at its path(s). */
export function putValue(spec: SpecObject, f: ValueFieldDef, value: FieldValue): void {
  if (f.kind === 'range') {
    const r = value as QuantityRange;
    setPath(spec, f.low, r.low);
    setPath(spec, f.high, r.high);
  } else setPath(spec, f.path, value as number | QuantityPoint[]);
}

/** Re-exported so a table can declare ranges without importing the quantity layer. */
export { POSITIVE, NON_NEGATIVE } from '../../src/quantity';
export type { NumberRange, PlainNumberRule } from '../../src/quantity';
export { quoteText };
