/**
 * @deprecated Use createUrlState (createUrlState.ts) with a field table's
 * BenchState. Kept only until the Coil and Tank benches move to field tables;
 * delete it then.
 */
import type { Accessor } from 'solid-js';
import { createUrlState } from './createUrlState';
import { decodeState, encodeState, type UrlSchema } from './urlState';

export function useUrlState(
  schema: UrlSchema,
  current: Accessor<Record<string, string>>,
  apply: (values: Record<string, string>) => void,
): Accessor<string[]> {
  return createUrlState({
    readLink(search) {
      const decoded = decodeState(search, schema);
      if (Object.keys(decoded.values).length) apply(decoded.values);
      return decoded;
    },
    linkQuery: () => encodeState(current(), schema),
  });
}
