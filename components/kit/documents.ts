/**
 * A bench's state as plain data that outlives the page: the document a draft
 * or a shop-sheet file stores (choices, and the spec written as text by
 * path), the way back from a stored document, and between field texts and an
 * SI spec (a coil handed from one bench to another, a design computed at
 * build time). Every value read back goes through its field's grammar and
 * range, as a link does. Kept apart from fields.ts so that a bench that never
 * stores a design does not ship this.
 *
 * With a BenchState: `bench.load(documentToSnapshot(table, doc).snapshot)`,
 * `snapshotToDocument(table, bench.snapshot())`, `bench.load(specToSnapshot(table, spec, choices))`.
 */
import { formatQuantityCompact, type QuantityPoint, type QuantityUnit } from '../../src/quantity';
import { lowEndWithSharedUnit, splitRange } from '../../src/quantity/parse';
import {
  defaultChoices, defaultSnapshot, defaultText, fieldsInUse, getPath, pathsOf, putValue, readFieldText, refuseLinkText, setPath, whatOf,
  type BenchDocument, type BenchSnapshot, type Choices, type FieldTable, type SpecObject, type ValueFieldDef,
} from './fields';

function messageOf(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}

/** The document a draft or a shop-sheet file stores for a state: choices, and texts of the fields in use by path. */
export function snapshotToDocument(table: FieldTable, snapshot: BenchSnapshot): BenchDocument {
  const choices = { ...defaultChoices(table), ...snapshot.choices };
  const spec: SpecObject = {};
  const usedChoices: Record<string, string> = {};
  for (const f of fieldsInUse(table, choices)) {
    if (f.kind === 'choice') {
      usedChoices[f.key] = choices[f.key];
      if (f.path) setPath(spec, f.path, choices[f.key]);
      continue;
    }
    const text = (snapshot.texts[f.key] ?? defaultText(f, choices)).trim();
    if (text === '') continue;
    const ends = f.kind === 'range' ? splitRange(text) : null;
    if (f.kind !== 'range') setPath(spec, f.path, text);
    else if (ends) {
      setPath(spec, f.low, lowEndWithSharedUnit(ends[0], ends[1]));
      setPath(spec, f.high, ends[1]);
    }
  }
  return { choices: usedChoices, spec };
}

/**
 * The state for a stored document, checked like a link: every value goes
 * through its field's grammar and range; refused values keep the default and
 * are listed as notices. Numbers stored as numbers (turns: 12) are read as
 * their text; a length must still carry its unit.
 */
export function documentToSnapshot(table: FieldTable, doc: unknown): { snapshot: BenchSnapshot; notices: string[] } {
  const notices: string[] = [];
  if (typeof doc !== 'object' || doc === null) return { snapshot: defaultSnapshot(table), notices: ['The stored design is not an object; the defaults are shown.'] };
  const storedChoices = getPath(doc, 'choices');
  const spec = getPath(doc, 'spec');
  const chosen = defaultChoices(table);
  for (const f of table) {
    if (f.kind !== 'choice') continue;
    const v = getPath(storedChoices, f.key) ?? (f.path ? getPath(spec, f.path) : undefined);
    if (v === undefined) continue;
    const text = String(v);
    const why = refuseLinkText(f, text, chosen);
    if (why === null) chosen[f.key] = text;
    else notices.push(`${whatOf(f, chosen)}: ${why}.`);
  }
  const snapshot = defaultSnapshot(table, chosen);
  for (const f of fieldsInUse(table, snapshot.choices)) {
    if (f.kind === 'choice') continue;
    const where = pathsOf(f).join(', ');
    const stored = pathsOf(f).map((p) => getPath(spec, p));
    if (stored.every((v) => v === undefined)) {
      if (f.optional) snapshot.texts[f.key] = '';
      continue;
    }
    if (!stored.every((v) => typeof v === 'string' || typeof v === 'number')) {
      notices.push(`${whatOf(f, snapshot.choices)} (${where}): expected text such as “${defaultText(f, snapshot.choices) || '…'}”.`);
      continue;
    }
    const text = stored.map((v) => String(v).trim()).join('..');
    const why = refuseLinkText(f, text, snapshot.choices);
    if (why === null) snapshot.texts[f.key] = text;
    else notices.push(`${whatOf(f, snapshot.choices)} (${where}): ${why.replace(/\.$/, '')}.`);
  }
  return { snapshot, notices };
}

/** A table's SI points as a field's text ("0: 365p; 180: 10p"); undefined unless every point is two finite numbers. */
function writePoints(points: unknown[], unit: QuantityUnit, significant: number): string | undefined {
  const ok = points.every((p) => typeof p === 'object' && p !== null && Number.isFinite((p as QuantityPoint).x) && Number.isFinite((p as QuantityPoint).y));
  if (!ok || points.length === 0) return undefined;
  return (points as QuantityPoint[]).map((p) => `${Number(p.x.toPrecision(significant))}: ${formatQuantityCompact(p.y, unit, significant)}`).join('; ');
}

/**
 * Field texts for an SI spec (a coil handed back from the Tank bench, a
 * design read from a shop-sheet file): each value field in use under
 * `choices` gets the value at its path, written compactly with up to
 * `significant` figures ("10.5 mm", "12", "7.1 MHz"). Choices with a path
 * take the spec's value there. Fields whose path the spec lacks keep their
 * default (optional ones are left blank).
 */
export function specToSnapshot(table: FieldTable, spec: unknown, choices: Choices = {}, significant = 9): BenchSnapshot {
  const chosen = { ...defaultChoices(table), ...choices };
  for (const f of table) {
    if (f.kind !== 'choice' || !f.path) continue;
    const v = getPath(spec, f.path);
    if (typeof v === 'string' && f.options.some(([o]) => o === v)) chosen[f.key] = v;
  }
  const snapshot = defaultSnapshot(table, chosen);
  const write = (f: ValueFieldDef, v: unknown): string | undefined => {
    if (typeof v === 'string') return v;
    if (f.kind === 'points' && Array.isArray(v)) return writePoints(v, f.unit, significant);
    if (typeof v !== 'number' || !Number.isFinite(v)) return undefined;
    return f.kind === 'number' ? String(Number(v.toPrecision(significant))).replace('e+', 'e') : formatQuantityCompact(v, f.unit, significant);
  };
  for (const f of fieldsInUse(table, snapshot.choices)) {
    if (f.kind === 'choice') continue;
    const texts = pathsOf(f).map((p) => write(f, getPath(spec, p)));
    if (texts.every((t) => t !== undefined)) snapshot.texts[f.key] = texts.join('..');
    else if (f.optional) snapshot.texts[f.key] = '';
  }
  return snapshot;
}

/**
 * The SI spec of a state, worked out away from the page (the shop sheet at
 * build time, tests): values of the fields in use by path, choices with a
 * path by value. `errors` holds the sentence for each field that is not a
 * value, by key; the spec then lacks those paths.
 */
export async function snapshotToSpec(table: FieldTable, snapshot: BenchSnapshot): Promise<{ spec: SpecObject; errors: Record<string, string> }> {
  const choices = { ...defaultChoices(table), ...snapshot.choices };
  const spec: SpecObject = {};
  const errors: Record<string, string> = {};
  for (const f of fieldsInUse(table, choices)) {
    if (f.kind === 'choice') {
      if (f.path) setPath(spec, f.path, choices[f.key]);
      continue;
    }
    const text = snapshot.texts[f.key] ?? defaultText(f, choices);
    try {
      const v = await readFieldText(f, text, choices);
      if (v !== undefined) putValue(spec, f, v);
    } catch (e) {
      errors[f.key] = messageOf(e);
    }
  }
  return { spec, errors };
}
