import { describe, expect, it } from 'vitest';
import { E_SERIES, eSeries, nearestPreferredValue, preferredNeighbours, seriesValuesBetween, type ESeriesName } from '../../src/core/preferred';
import { DesignError } from '../../src/core/errors';

describe('IEC 60063 preferred values', () => {
  it('E12 is the published list', () => {
    // IEC 60063:2015, E12 series
    expect(E_SERIES.E12).toEqual([1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2]);
    expect(eSeries('E12')).toEqual([1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2]);
  });
  it('E3, E6 and E24: every value as published', () => {
    // IEC 60063:2015, E3, E6 and E24 series (two significant figures)
    expect(eSeries('E3')).toEqual([1.0, 2.2, 4.7]);
    expect(eSeries('E6')).toEqual([1.0, 1.5, 2.2, 3.3, 4.7, 6.8]);
    expect(eSeries('E24')).toEqual([
      1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0,
      3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1,
    ]);
  });
  it('E6 and E3 are every second and fourth E12 value', () => {
    // IEC 60063:2015: each series is the next one, thinned
    expect(E_SERIES.E6).toEqual(E_SERIES.E12.filter((_, i) => i % 2 === 0));
    expect(E_SERIES.E3).toEqual(E_SERIES.E12.filter((_, i) => i % 4 === 0));
    expect(E_SERIES.E24.filter((_, i) => i % 2 === 0)).toEqual(E_SERIES.E12);
  });
  it('E48, E96 and E192: lengths, one decade in [1, 10), ascending', () => {
    // IEC 60063:2015: E48, E96 and E192 hold 48, 96 and 192 values per decade
    for (const [name, n] of [['E48', 48], ['E96', 96], ['E192', 192]] as const) {
      const values = eSeries(name);
      expect(values).toHaveLength(n);
      expect(values[0]).toBe(1);
      expect(values[n - 1]).toBeLessThan(10);
      for (let i = 1; i < n; i++) expect(values[i]).toBeGreaterThan(values[i - 1]);
    }
  });
  it('E48, E96 and E192: spot checks against the published tables', () => {
    // IEC 60063:2015, three-figure series, as tabulated in the Wikipedia article
    // "E series of preferred numbers" (table of E48, E96 and E192 values)
    const e48 = eSeries('E48');
    expect([e48[1], e48[4], e48[8], e48[16], e48[24], e48[32], e48[40], e48[47]]).toEqual([1.05, 1.21, 1.47, 2.15, 3.16, 4.64, 6.81, 9.53]);
    const e96 = eSeries('E96');
    expect([e96[1], e96[5], e96[11], e96[30], e96[45], e96[67], e96[83], e96[95]]).toEqual([1.02, 1.13, 1.30, 2.05, 2.94, 4.99, 7.32, 9.76]);
    const e192 = eSeries('E192');
    expect([e192[1], e192[3], e192[83], e192[129], e192[135], e192[185], e192[191]]).toEqual([1.01, 1.04, 2.71, 4.70, 5.05, 9.20, 9.88]);
  });
  it('E48 and E96 are every fourth and second E192 value', () => {
    // IEC 60063:2015: each three-figure series is the next one, thinned
    expect(eSeries('E96')).toEqual(eSeries('E192').filter((_, i) => i % 2 === 0));
    expect(eSeries('E48')).toEqual(eSeries('E96').filter((_, i) => i % 2 === 0));
  });
  it('three-figure values are 10^(i/n) rounded, except E192’s 9.20', () => {
    // IEC 60063:2015 derives E48–E192 from the geometric series 10^(i/n), rounded to
    // three figures; the Wikipedia article "E series of preferred numbers" notes
    // 9.20 in E192 as the one value that is not (rounding gives 9.19).
    for (const [name, n] of [['E48', 48], ['E96', 96], ['E192', 192]] as const) {
      const off = eSeries(name).filter((v, i) => Math.abs(v - Math.round(100 * 10 ** (i / n)) / 100) > 1e-9);
      expect(off).toEqual(name === 'E192' ? [9.2] : []);
    }
  });
  it('finds the neighbours of 106.9 pF: 100 pF and 120 pF', () => {
    const n = preferredNeighbours(106.9e-12, 'E12');
    expect(n.below).toBe(100e-12);
    expect(n.above).toBe(120e-12);
    expect(n.nearest).toBe(100e-12);
  });
  it('neighbours in the three-figure series', () => {
    // IEC 60063:2015, E96: … 1.05, 1.07 …; E192: … 9.09, 9.20, 9.31 …
    expect(preferredNeighbours(106.9e-12, 'E96')).toEqual({ below: 105e-12, above: 107e-12, nearest: 107e-12 });
    expect(preferredNeighbours(9.15e3, 'E192')).toEqual({ below: 9.09e3, above: 9.2e3, nearest: 9.2e3 });
    expect(preferredNeighbours(9.9e-6, 'E192')).toEqual({ below: 9.88e-6, above: 10e-6, nearest: 9.88e-6 });
  });
  it('handles decade edges and exact values', () => {
    expect(preferredNeighbours(9e-12).below).toBe(8.2e-12);
    expect(preferredNeighbours(9e-12).above).toBe(10e-12);
    expect(preferredNeighbours(4.7e-6)).toEqual({ below: 4.7e-6, above: 4.7e-6, nearest: 4.7e-6 });
    expect(preferredNeighbours(1e-9).below).toBe(1e-9);
  });
  it('rejects non-positive values', () => {
    expect(() => preferredNeighbours(0)).toThrow(DesignError);
    expect(() => preferredNeighbours(-1)).toThrow(DesignError);
  });
  it('rejects unknown series and values beyond 1e±305, keeps 1e±300 finite', () => {
    // IEC 60063:2015 E12: 1e300 sits on the 1.0 step of its decade
    expect(preferredNeighbours(1e300).below).toBe(1e300);
    expect(preferredNeighbours(1e-300).above).toBe(1e-300);
    expect(() => preferredNeighbours(1e307)).toThrow(DesignError);
    expect(() => preferredNeighbours(1e-6, 'toString' as 'E12')).toThrow(/Unknown series/);
    expect(() => preferredNeighbours(1e-6, null as unknown as 'E12')).toThrow(DesignError);
  });
});

describe('nearestPreferredValue', () => {
  it('decides on a ratio (logarithmic) scale, not by difference', () => {
    // IEC 60063:2015 E12: 8.2 and 10 either side of 9.08; their geometric mean is
    // √82 ≈ 9.055, so 9.08 is nearer 10 by ratio though nearer 8.2 by difference
    expect(nearestPreferredValue(9.08e-12, 'E12')).toBe(10e-12);
    expect(nearestPreferredValue(9.03e-12, 'E12')).toBe(8.2e-12);
    // E24: 9.1 and 10, geometric mean √91 ≈ 9.539
    expect(nearestPreferredValue(9.55, 'E24')).toBe(10);
    expect(nearestPreferredValue(9.52, 'E24')).toBe(9.1);
  });
  it('crosses decade edges both ways', () => {
    // IEC 60063:2015 E24 ends a decade on 9.1, the next begins on 1.0
    expect(nearestPreferredValue(9.8e3, 'E24')).toBe(10e3);
    expect(nearestPreferredValue(0.99e-6, 'E12')).toBe(1e-6);
    expect(nearestPreferredValue(0.99, 'E3')).toBe(1);
    // E3: 4.7 and 10, geometric mean √47 ≈ 6.856
    expect(nearestPreferredValue(6.9e-9, 'E3')).toBe(10e-9);
    expect(nearestPreferredValue(6.8e-9, 'E3')).toBe(4.7e-9);
    // E192: 9.88 and 10, geometric mean √98.8 ≈ 9.940
    expect(nearestPreferredValue(9.95e-12, 'E192')).toBe(10e-12);
    expect(nearestPreferredValue(9.93e-12, 'E192')).toBe(9.88e-12);
  });
  it('returns every preferred value as itself, exactly, in any decade', () => {
    for (const name of ['E6', 'E24', 'E96', 'E192'] as const) {
      for (const m of eSeries(name)) {
        for (const scale of [1e-12, 1e-6, 1, 1e3]) {
          const v = Number((m * scale).toPrecision(12));
          expect(nearestPreferredValue(v, name)).toBe(v);
        }
      }
    }
  });
  it('defaults to E12', () => {
    // IEC 60063:2015 E12: … 3.9, 4.7 …
    expect(nearestPreferredValue(4.4e-6)).toBe(4.7e-6);
  });
  it('throws DesignError on hostile input', () => {
    for (const bad of ['5', Number.NaN, null, undefined, Infinity, -Infinity, -1, 0, 1e306]) {
      expect(() => nearestPreferredValue(bad as number, 'E12')).toThrow(DesignError);
    }
    for (const bad of ['E5', 'e12', '', 'toString', null, 12, {}]) {
      expect(() => nearestPreferredValue(1e-9, bad as ESeriesName)).toThrow(DesignError);
      expect(() => eSeries(bad as ESeriesName)).toThrow(DesignError);
    }
    try {
      eSeries('E7' as ESeriesName);
    } catch (e) {
      expect((e as DesignError).field).toBe('series');
      expect((e as DesignError).message).toMatch(/E192/);
    }
  });
});

describe('seriesValuesBetween', () => {
  it('lists the values of a range, ends included', () => {
    // IEC 60063:2015 E6: 1.0 1.5 2.2 3.3 4.7 6.8
    expect(seriesValuesBetween('E6', 3.3e-12, 22e-12)).toEqual([3.3e-12, 4.7e-12, 6.8e-12, 10e-12, 15e-12, 22e-12]);
    expect(seriesValuesBetween('E192', 1, 9.99)).toHaveLength(192);
  });
  it('throws DesignError on hostile input', () => {
    expect(() => seriesValuesBetween('E12', 10, 1)).toThrow(DesignError);
    expect(() => seriesValuesBetween('E12', 1e-300, 1e300)).toThrow(DesignError);
    expect(() => seriesValuesBetween('E12', Number.NaN, 1)).toThrow(DesignError);
    expect(() => seriesValuesBetween('X' as ESeriesName, 1, 10)).toThrow(DesignError);
  });
});
