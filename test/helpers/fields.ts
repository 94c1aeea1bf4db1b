/**
 * Helpers for tests of field tables (the kit's and each bench's).
 */
import { defaultChoices, fieldsInUse, type BenchSnapshot, type FieldTable } from '../../components/kit/fields';

/** Every combination of a table's radio choices (selects stay at their defaults). */
export function radioCombinations(table: FieldTable): Record<string, string>[] {
  let combos: Record<string, string>[] = [defaultChoices(table)];
  for (const f of table) {
    if (f.kind !== 'choice' || f.display === 'select') continue;
    combos = combos.flatMap((c) => f.options.map(([v]) => ({ ...c, [f.key]: v })));
  }
  return combos;
}

/** The part of a state a link or document carries: choices and texts of the fields in use. */
export function inUse(table: FieldTable, s: BenchSnapshot): { choices: Record<string, string>; texts: Record<string, string> } {
  const choices = { ...defaultChoices(table), ...s.choices };
  const out = { choices: {} as Record<string, string>, texts: {} as Record<string, string> };
  for (const f of fieldsInUse(table, choices)) {
    if (f.kind === 'choice') out.choices[f.key] = choices[f.key];
    else out.texts[f.key] = (s.texts[f.key] ?? '').trim();
  }
  return out;
}
