/**
 * The query-string codec every workbench uses: values a link may carry, and
 * everything it must refuse (with a notice, never a crash).
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { decodeState, encodeState, refuseQuantityText, MAX_URL_VALUE, type UrlSchema } from '../../components/kit/urlState';

const schema: UrlSchema = {
  solve: { kind: 'choice', options: ['f', 'L', 'C'], label: 'solve for' },
  f: { kind: 'quantity', unit: 'Hz', label: 'frequency' },
  L: { kind: 'quantity', unit: 'H', label: 'inductance' },
  C: { kind: 'quantity', unit: 'F', label: 'capacitance' },
};

describe('decodeState', () => {
  it('reads the values a person typed, as typed', () => {
    const d = decodeState('?solve=L&f=7.1+MHz&C=2*47p', schema);
    expect(d.values).toEqual({ solve: 'L', f: '7.1 MHz', C: '2*47p' });
    expect(d.notices).toEqual([]);
  });

  it('round-trips through encodeState', () => {
    const values = { solve: 'C', f: '455k', L: '4.7 µH', C: '100p + 22p' };
    expect(decodeState(encodeState(values, schema), schema).values).toEqual(values);
  });

  it.each([
    ['markup', '?L=<script>alert(1)</script>', /characters no quantity uses/],
    ['a wrong unit', '?L=4.7pF', /capacitance/],
    ['a function call', '?C=import(1)', /not allowed/],
    ['a name that is not a quantity', '?f=constructor', /./],
    ['a bad choice', '?solve=<img>', /expected one of f, L, C/],
    ['an unknown key', '?__proto__=1', /unknown link setting/],
    ['a huge value', `?C=${'9'.repeat(MAX_URL_VALUE + 1)}`, /longer than/],
  ])('ignores %s with a notice', (_what, query, why) => {
    const d = decodeState(query, schema);
    expect(Object.keys(d.values)).toEqual([]);
    expect(d.notices.length).toBe(1);
    expect(d.notices[0]).toMatch(why);
  });

  it('never throws and never passes markup through, whatever the query', () => {
    fc.assert(fc.property(fc.string({ maxLength: 300 }), fc.string({ maxLength: 300 }), (k, v) => {
      const query = `?${encodeURIComponent(k)}=${encodeURIComponent(v)}&L=${encodeURIComponent(v)}`;
      const d = decodeState(query, schema);
      for (const value of Object.values(d.values)) expect(value).not.toMatch(/[<>&]/);
      for (const n of d.notices) expect(n.length).toBeLessThan(400);
    }));
  });

  it('accepts expressions built only from numbers, units, sqrt and pi', () => {
    expect(refuseQuantityText('1/((2*pi*7.1MHz)^2 * 4.7uH)', 'F')).toBeNull();
    expect(refuseQuantityText('sqrt(4u7/100p)', 'Ω')).toBeNull();
    expect(refuseQuantityText('alert(1)', 'F')).toMatch(/alert/);
  });
});

describe('links keep every calculation a field accepts', () => {
  it.each(['max(47p, 100p)', '2×47p', '1/(2*π*1k)', '100p − 22p', 'hypot(3,4)'])('%s survives the link', (text) => {
    expect(refuseQuantityText(text, 'F')).toBeNull();
  });
});
