/**
 * A workbench's inputs in the query string, so a design can be bookmarked and
 * shared. Values are kept as the text a person typed ("4u7", "2*47p").
 *
 * @deprecated for new benches: declare a field table (fields.ts), whose codec
 * shares these refusals. Kept for the Coil and Tank benches until they move.
 *
 * Reading is defensive: a link can come from anywhere. Unknown keys, values
 * that are too long, carry characters no quantity has, name functions other
 * than the calculator's own (sqrt, pi, …), or do not parse, are ignored and listed as notices the bench
 * shows as plain text (never as markup). Nothing read from the URL can crash
 * the page or reach innerHTML.
 */
import type { PlainNumberRule, QuantityUnit } from '../../src/quantity';
import { MAX_LINK_PARAMS, refusePlainNumberLinkText, refuseQuantityLinkText } from './fields';

export type UrlFieldSpec =
  | { kind: 'quantity'; unit: QuantityUnit; label: string }
  | { kind: 'choice'; options: readonly string[]; label: string }
  | { kind: 'number'; label: string; rule?: PlainNumberRule };

export type UrlSchema = Record<string, UrlFieldSpec>;

export interface DecodedState {
  values: Record<string, string>;
  notices: string[];
}

export { MAX_LINK_VALUE as MAX_URL_VALUE } from './fields';
const MAX_PARAMS = MAX_LINK_PARAMS;

function shown(text: string): string {
  const clean = text.replace(/[\u0000-\u001f\u007f-\u009f]/g, '?');
  return clean.length > 24 ? `${clean.slice(0, 24)}…` : clean;
}

/** Why a link value for a quantity field is refused, or null when it is acceptable. */
export function refuseQuantityText(text: string, unit: QuantityUnit): string | null {
  return refuseQuantityLinkText(text, unit);
}

/** Why a link value for a plain-number field is refused, or null: the same grammar and range as typing. */
export function refusePlainNumberText(text: string, rule?: PlainNumberRule): string | null {
  return refusePlainNumberLinkText(text, rule);
}

/** Reads the values a schema knows from a query string. */
export function decodeState(search: string, schema: UrlSchema): DecodedState {
  const values: Record<string, string> = {};
  const notices: string[] = [];
  let params: URLSearchParams;
  try {
    params = new URLSearchParams(search);
  } catch {
    return { values, notices: ['The link’s settings could not be read and were ignored.'] };
  }
  let seen = 0;
  const unknown: string[] = [];
  for (const [key, raw] of params) {
    if (++seen > MAX_PARAMS) {
      notices.push(`The link has more than ${MAX_PARAMS} settings; the rest were ignored.`);
      break;
    }
    const spec = Object.prototype.hasOwnProperty.call(schema, key) ? schema[key] : undefined;
    if (!spec) {
      unknown.push(shown(key));
      continue;
    }
    const text = raw.trim();
    if (spec.kind === 'choice') {
      if (spec.options.includes(text)) values[key] = text;
      else notices.push(`Ignored the link’s “${spec.label}” setting “${shown(text)}”: expected one of ${spec.options.join(', ')}.`);
      continue;
    }
    if (spec.kind === 'number') {
      const bad = refusePlainNumberText(text, spec.rule);
      if (bad === null) values[key] = text;
      else notices.push(`Ignored the link’s value for ${spec.label} (“${shown(text)}”): ${bad}`);
      continue;
    }
    const why = refuseQuantityText(text, spec.unit);
    if (why === null) values[key] = text;
    else notices.push(`Ignored the link’s value for ${spec.label} (“${shown(text)}”): ${why}`);
  }
  if (unknown.length) notices.push(`Ignored unknown link setting${unknown.length > 1 ? 's' : ''}: ${unknown.slice(0, 5).join(', ')}${unknown.length > 5 ? ', …' : ''}.`);
  return { values, notices };
}

/** The query string (without "?") for the given values, in schema order. */
export function encodeState(values: Record<string, string>, schema: UrlSchema): string {
  const params = new URLSearchParams();
  for (const key of Object.keys(schema)) {
    const v = values[key];
    if (v !== undefined && v.trim() !== '') params.set(key, v.trim());
  }
  return params.toString();
}
