/**
 * Short tables typed as one text ("0: 365p; 90: 150p; 180: 10p"), for a
 * variable capacitor's plates on the Band bench: points in the order typed,
 * each number and quantity by the single-value rules, a refusal that names
 * the point and the part of it at fault, and the way back from SI points to
 * a text that reads the same (kit/documents specToSnapshot). Grammar of our
 * own (Entering values page); values worked by hand.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { formatQuantityCompact, parseQuantityPoints, POSITIVE, QuantityError, MAX_POINTS_LENGTH } from '../../src/quantity';
import { refusal } from '../helpers/asserts';
import { specToSnapshot } from '../../components/kit/documents';
import { defineFields } from '../../components/kit/fields';


const DEG = { min: -3600, max: 3600, unit: '°' };

describe('parseQuantityPoints', () => {
  it.each([
    ['0: 365p; 180: 10p', [[0, 365e-12], [180, 10e-12]]],
    ['0 365 pF;90°=150p', [[0, 365e-12], [90, 150e-12]]],
    ['  0:365p ;\n 45 : 250p ;; 90: 0.15n ; ', [[0, 365e-12], [45, 250e-12], [90, 150e-12]]],
    ['-90: 10p; 90: 20p', [[-90, 10e-12], [90, 20e-12]]],
  ] as const)('%j', (text, want) => {
    const got = parseQuantityPoints(text, 'F', { xRule: DEG });
    expect(got.map((p) => [p.x, p.y])).toHaveLength(want.length);
    got.forEach((p, i) => {
      expect(p.x).toBe(want[i][0]);
      expect(p.y).toBeCloseTo(want[i][1], 20);
    });
  });

  it.each([
    ['', 'empty', /empty/],
    ['0: 365p', 'range', /at least 2 points/],
    ['0: 365p; 90', 'not-a-number', /Point 2 .*needs two parts, the angle and the value/],
    ['0: 365p; 90: 1 µH', 'wrong-unit', /Point 2 \(“90: 1 µH”\), the value: /],
    ['0: 365p; 9000: 1p', 'out-of-range', /Point 2 .*the angle: the angle must be between/i],
    ['0: 365p; 90: 0p', 'out-of-range', /Point 2 .*greater than zero/],
    ['0: 365p; 90: 3,5p', 'comma', /Point 2/],
    ['0: 365p; 90: 2*75p', 'expression-invalid', /plain values/],
    ['0: NaN; 90: 1p', 'not-finite', /Point 1/],
  ] as const)('%j is refused (%s)', (text, code, re) => {
    const e = refusal(() => parseQuantityPoints(text, 'F', { xName: 'angle', xRule: DEG, allowed: POSITIVE }));
    expect(e.code).toBe(code);
    expect(e.message).toMatch(re);
  });

  it('refuses more points than asked and text longer than its limit', () => {
    const many = Array.from({ length: 25 }, (_, i) => `${i}: ${i + 1}p`).join('; ');
    expect(refusal(() => parseQuantityPoints(many, 'F')).message).toMatch(/at most 24 points/);
    expect(refusal(() => parseQuantityPoints('1: 1p; '.repeat(MAX_POINTS_LENGTH), 'F')).code).toBe('too-long');
  });

  it('SI points written back as text read the same (property, 200 tables)', () => {
    const table = defineFields([
      { kind: 'points', key: 'plates', path: 'plates', label: 'Plates', unit: 'F', xName: 'angle', xRule: DEG, default: '', optional: true, allowed: POSITIVE },
    ] as const);
    fc.assert(fc.property(
      fc.array(fc.tuple(fc.integer({ min: -3600, max: 3600 }), fc.double({ min: 1e-13, max: 1e-6, noNaN: true })), { minLength: 2, maxLength: 24 }),
      (pts) => {
        const spec = { plates: pts.map(([x, y]) => ({ x, y })) };
        const text = specToSnapshot(table, spec).texts.plates;
        const back = parseQuantityPoints(text, 'F', { xRule: DEG });
        expect(back).toHaveLength(pts.length);
        back.forEach((p, i) => {
          expect(p.x).toBe(pts[i][0]);
          expect(Math.abs(p.y / pts[i][1] - 1)).toBeLessThan(1e-8);
        });
        expect(text).toContain(formatQuantityCompact(pts[0][1], 'F', 9));
      },
    ), { numRuns: 200, seed: 7 });
  });
});
