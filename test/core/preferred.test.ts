import { describe, expect, it } from 'vitest';
import { E_SERIES, preferredNeighbours, DesignError } from '../../src/core';

describe('IEC 60063 preferred values', () => {
  it('E12 is the published list', () => {
    // IEC 60063:2015, E12 series
    expect(E_SERIES.E12).toEqual([1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2]);
  });
  it('E6 and E3 are every second and fourth E12 value', () => {
    // IEC 60063:2015: each series is the next one, thinned
    expect(E_SERIES.E6).toEqual(E_SERIES.E12.filter((_, i) => i % 2 === 0));
    expect(E_SERIES.E3).toEqual(E_SERIES.E12.filter((_, i) => i % 4 === 0));
    expect(E_SERIES.E24.filter((_, i) => i % 2 === 0)).toEqual(E_SERIES.E12);
  });
  it('finds the neighbours of 106.9 pF: 100 pF and 120 pF', () => {
    const n = preferredNeighbours(106.9e-12, 'E12');
    expect(n.below).toBe(100e-12);
    expect(n.above).toBe(120e-12);
    expect(n.nearest).toBe(100e-12);
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
