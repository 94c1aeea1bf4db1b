/**
 * An optional quantity: like createQuantity, but a blank field means "not
 * given" (value undefined, no message) instead of asking for a value. Used for
 * inputs a core function lets the caller leave out (an ideal part, no load).
 */
import type { Accessor } from 'solid-js';
import type { QuantityUnit } from '../../src/quantity';
import { createQuantity, type QuantityState } from './quantityState';

export interface OptionalQuantityState extends QuantityState {
  /** True when the field is blank: the input is not given. */
  blank: Accessor<boolean>;
}

export function createOptionalQuantity(unit: QuantityUnit, initialText = ''): OptionalQuantityState {
  const q = createQuantity(unit, initialText);
  const blank = () => q.text().trim() === '';
  return {
    ...q,
    blank,
    value: () => (blank() ? undefined : q.value()),
    error: () => (blank() ? null : q.error()),
    stale: () => !blank() && q.stale(),
  };
}
