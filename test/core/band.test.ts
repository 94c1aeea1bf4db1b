/**
 * Band coverage and design for a band (src/core/band.ts), checked against
 * routes of their own: Thomson's formula and the series/parallel network
 * written again here, mathjs solving the trimmer equations as a linear
 * system, a bisection on the ratio equation for the padder (not the core's
 * quadratic), two examples derived by hand, and analyzeTank's published rules
 * for the selectivity figures.
 *
 * Demo values (invented) belong to the fictional Larkspur Lane radio workshop.
 */
import { describe, expect, it } from 'vitest';
import { create, all } from 'mathjs';
import fc from 'fast-check';
import { bandCoverage, bandSelectivity, designForBand, PADDER_SWITCH_RATIO, type BandCircuit } from '../../src/core/band';
import { dialLaw } from '../../src/core/dial';
import { slugTuning } from '../../src/core/slug';
import { designCoil } from '../../src/core/coil';
import { DesignError } from '../../src/core/errors';
import { fieldOf, rel, thomson } from '../helpers/asserts';

const math = create(all);
const pF = 1e-12;

/** Capacitance across the coil, written here independently: C_s + series(C_p, C_v + C_t). */
function across(c: BandCircuit, cv: number): number {
  const parallel = cv + (c.trimmerCapacitance ?? 0);
  if (c.padderCapacitance === undefined) return c.strayCapacitance + parallel;
  return c.strayCapacitance + 1 / (1 / c.padderCapacitance + 1 / parallel);
}

/** Band ends by Thomson's formula (Terman 1943, section 3) with the network above. */
function ends(c: BandCircuit): { low: number; high: number } {
  return { low: thomson(c.inductance, across(c, c.maxCapacitance)), high: thomson(c.inductance, across(c, c.minCapacitance)) };
}

/** The message of the DesignError `fn` throws. */
function messageOf(fn: () => unknown): string {
  try {
    fn();
  } catch (e) {
    expect(e).toBeInstanceOf(DesignError);
    return (e as Error).message;
  }
  throw new Error('expected a DesignError');
}

// Larkspur Lane demo job (invented): 5.9–6.2 MHz with a 10–365 pF broadcast-style capacitor, 12 pF of strays.
const demo = { lowFrequency: 5.9e6, highFrequency: 6.2e6, minCapacitance: 10 * pF, maxCapacitance: 365 * pF, strayCapacitance: 12 * pF, margin: 0 };

describe('bandCoverage', () => {
  it('gives Thomson\'s frequency at both ends, with trimmer and padder placed as the issue says', () => {
    const circuits: BandCircuit[] = [
      { inductance: 240e-6, minCapacitance: 12 * pF, maxCapacitance: 400 * pF, strayCapacitance: 15 * pF },
      { inductance: 10e-6, minCapacitance: 12 * pF, maxCapacitance: 400 * pF, strayCapacitance: 15 * pF, trimmerCapacitance: 30 * pF },
      { inductance: 7.5e-6, minCapacitance: 10 * pF, maxCapacitance: 365 * pF, strayCapacitance: 10 * pF, trimmerCapacitance: 355 * pF, padderCapacitance: 99 * pF },
      { inductance: 7.5e-6, minCapacitance: 10 * pF, maxCapacitance: 365 * pF, strayCapacitance: 0, padderCapacitance: 500 * pF },
    ];
    for (const c of circuits) {
      const r = bandCoverage(c);
      const e = ends(c);
      // Thomson's formula, Terman 1943, section 3 (computed in the test)
      expect(rel(r.lowFrequency, e.low)).toBeLessThan(1e-12);
      expect(rel(r.highFrequency, e.high)).toBeLessThan(1e-12);
      expect(rel(r.lowEndCapacitance, across(c, c.maxCapacitance))).toBeLessThan(1e-12);
      expect(rel(r.highEndCapacitance, across(c, c.minCapacitance))).toBeLessThan(1e-12);
      expect(r.frequencyRatio).toBeCloseTo(e.high / e.low, 12);
    }
  });

  it('refuses bad circuits at the field', () => {
    const c = { inductance: 10e-6, minCapacitance: 12 * pF, maxCapacitance: 400 * pF, strayCapacitance: 15 * pF };
    expect(fieldOf(() => bandCoverage({ ...c, maxCapacitance: 10 * pF }))).toBe('maxCapacitance');
    expect(fieldOf(() => bandCoverage({ ...c, strayCapacitance: -1 * pF }))).toBe('strayCapacitance');
    expect(fieldOf(() => bandCoverage({ ...c, padderCapacitance: 0 }))).toBe('padderCapacitance');
    expect(fieldOf(() => bandCoverage({ ...c, inductance: Number.NaN }))).toBe('inductance');
    expect(fieldOf(() => bandCoverage(null as unknown as BandCircuit))).toBe('circuit');
    expect(messageOf(() => bandCoverage({ ...c, maxCapacitance: 10 * pF }))).toContain('must be above its minimum');
  });
});

describe('designForBand', () => {
  it('covers the band it was asked for (bandCoverage of the design gives it back within 1e-9)', () => {
    const bands = [
      { ...demo },
      { ...demo, lowFrequency: 530e3, highFrequency: 1700e3 },
      { ...demo, lowFrequency: 3.5e6, highFrequency: 4e6, strayCapacitance: 25 * pF },
      { ...demo, lowFrequency: 14e6, highFrequency: 14.35e6, minCapacitance: 5 * pF, maxCapacitance: 50 * pF, strayCapacitance: 4 * pF },
    ];
    for (const b of bands) {
      const d = designForBand(b);
      const back = bandCoverage(d);
      expect(rel(back.lowFrequency, b.lowFrequency)).toBeLessThan(1e-9);
      expect(rel(back.highFrequency, b.highFrequency)).toBeLessThan(1e-9);
      // and by Thomson's formula with the network written in the test
      const e = ends(d);
      expect(rel(e.low, b.lowFrequency)).toBeLessThan(1e-9);
      expect(rel(e.high, b.highFrequency)).toBeLessThan(1e-9);
      expect(d.trimmerCapacitance).toBeGreaterThanOrEqual(0);
      expect(d.notes.length).toBeGreaterThan(0);
    }
  });

  it('trimmer only: the trimmer and coil solve the two Thomson equations (mathjs lusolve)', () => {
    // Broadcast band, 530–1700 kHz: the trimmer alone suffices.
    const b = { ...demo, lowFrequency: 530e3, highFrequency: 1700e3 };
    const d = designForBand(b);
    expect(d.arrangement).toBe('trimmer');
    expect(d.padderCapacitance).toBeUndefined();
    // Thomson at both ends with y = 1/L: (2π f1)² (C_max + C_0) = y and (2π f2)² (C_min + C_0) = y,
    // a linear system in C_0 (trimmer + strays, F) and y (1/H), solved by mathjs (LU decomposition):
    //   w1·C_0 − y = −w1·C_max,  w2·C_0 − y = −w2·C_min,  w = (2πf)²
    const w1 = (2 * Math.PI * b.lowFrequency) ** 2;
    const w2 = (2 * Math.PI * b.highFrequency) ** 2;
    const sol = math.lusolve([[w1, -1], [w2, -1]], [-w1 * b.maxCapacitance, -w2 * b.minCapacitance]) as number[][];
    const [c0, y] = [sol[0][0], sol[1][0]];
    expect(rel(d.trimmerCapacitance + d.strayCapacitance, c0)).toBeLessThan(1e-9);
    expect(rel(d.inductance, 1 / y)).toBeLessThan(1e-9);
  });

  it('worked example, trimmer only (derived by hand)', () => {
    // Derived by hand: band 1–2 MHz, capacitor 20–320 pF, strays 10 pF.
    //   n² = (2/1)² = 4;  C_0 = (C_max − n² C_min)/(n² − 1) = (320 − 80)/3 = 80 pF
    //   trimmer = C_0 − C_s = 70 pF;  C at the top = 20 + 80 = 100 pF, at the bottom 320 + 80 = 400 pF = 4 × 100 ✓
    //   L = 1/((2π·2 MHz)² · 100 pF) = 1/(1.579137e14 · 1e-10) = 63.3257 µH
    //   check: 1/(2π√(63.3257 µH · 400 pF)) = 1/(2π · 1.59155e-7 s) = 1.0000 MHz ✓
    const d = designForBand({ lowFrequency: 1e6, highFrequency: 2e6, minCapacitance: 20 * pF, maxCapacitance: 320 * pF, strayCapacitance: 10 * pF, margin: 0 });
    expect(d.arrangement).toBe('trimmer');
    expect(d.trimmerCapacitance / pF).toBeCloseTo(70, 9);
    expect(d.highEndCapacitance / pF).toBeCloseTo(100, 9);
    expect(d.lowEndCapacitance / pF).toBeCloseTo(400, 9);
    expect(d.inductance * 1e6).toBeCloseTo(63.3257, 4);
  });

  it('worked example, trimmer and padder (derived by hand)', () => {
    // Derived by hand: capacitor 10–100 pF, no strays, band top 10 MHz, band ratio √(10/7) = 1.195229.
    //   Trimmer alone: n² = 10/7, C_0 = (100 − 100/7)/(3/7) = 200 pF > 1 × C_max = 100 pF → padder.
    //   Parallel capacitance held at C_max: trimmer 100 pF; a = 10 + 100 = 110 pF, b = 100 + 100 = 200 pF.
    //   With no strays the quadratic reduces to C_p = a b/(C_0 − C_t) = 22000/100 = 220 pF.
    //   Check: series(220, 110) = 73.333 pF, series(220, 200) = 104.762 pF, ratio 1.428571 = 10/7 ✓
    //   L = 1/((2π·10 MHz)² · 73.333 pF) = 1/(3.947842e15 · 7.33333e-11) = 1/2.895084e5 = 3.45413 µH
    const f2 = 10e6;
    const f1 = f2 / Math.sqrt(10 / 7);
    const d = designForBand({ lowFrequency: f1, highFrequency: f2, minCapacitance: 10 * pF, maxCapacitance: 100 * pF, strayCapacitance: 0, margin: 0 });
    expect(d.arrangement).toBe('padder');
    expect(d.trimmerCapacitance / pF).toBeCloseTo(100, 9);
    expect((d.padderCapacitance as number) / pF).toBeCloseTo(220, 7);
    expect(d.highEndCapacitance / pF).toBeCloseTo(220 / 3, 7);
    expect(d.inductance * 1e6).toBeCloseTo(3.45413, 5);
    expect(d.crowding).toBeCloseTo((420 / 330) ** 2, 9);
  });

  it('the Larkspur Lane demo (5.9–6.2 MHz, 10–365 pF) is band-spread with a padder; the padder agrees with a bisection on the ratio equation', () => {
    const d = designForBand(demo);
    expect(d.arrangement).toBe('padder');
    expect(d.notes.map((n) => n.message).join(' ')).toMatch(/padder/);
    // the parallel capacitance is held at PADDER_SWITCH_RATIO × C_max
    expect(rel(d.trimmerCapacitance + d.strayCapacitance, PADDER_SWITCH_RATIO * demo.maxCapacitance)).toBeLessThan(1e-12);
    // bisection (independent of the core's quadratic) on C(C_max)/C(C_min) = n², which falls as the padder shrinks
    const n2 = (demo.highFrequency / demo.lowFrequency) ** 2;
    const ratio = (cp: number) => across({ ...d, padderCapacitance: cp }, demo.maxCapacitance) / across({ ...d, padderCapacitance: cp }, demo.minCapacitance);
    let lo = 1 * pF;
    let hi = 1e6 * pF;
    for (let i = 0; i < 200; i++) {
      const mid = Math.sqrt(lo * hi);
      if (ratio(mid) > n2) hi = mid;
      else lo = mid;
    }
    expect(rel(d.padderCapacitance as number, Math.sqrt(lo * hi))).toBeLessThan(1e-9);
    // the trimmer alone would have needed over 3 nF across the capacitor (mathjs route as above: C_0 = (C_max − n² C_min)/(n² − 1))
    const t = designForBand({ ...demo, arrangement: 'trimmer' });
    expect(t.arrangement).toBe('trimmer');
    expect(t.trimmerCapacitance).toBeGreaterThan(3e-9);
    expect(rel(t.trimmerCapacitance + demo.strayCapacitance, (365 * pF - n2 * 10 * pF) / (n2 - 1))).toBeLessThan(1e-9);
    expect(t.notes.some((n) => n.field === 'arrangement')).toBe(true);
    expect(d.inductance).toBeGreaterThan(10 * t.inductance);
  });

  it('is continuous at the switch to a padder', () => {
    // Band ratio such that trimmer + strays = C_max exactly, then a hair narrower.
    const cmin = 10 * pF;
    const cmax = 365 * pF;
    const cs = 12 * pF;
    const c0 = PADDER_SWITCH_RATIO * cmax;
    const atSwitch = Math.sqrt((cmax + c0) / (cmin + c0));
    const base = { minCapacitance: cmin, maxCapacitance: cmax, strayCapacitance: cs, margin: 0, lowFrequency: 5e6 };
    const before = designForBand({ ...base, highFrequency: 5e6 * atSwitch * (1 + 1e-7) });
    const after = designForBand({ ...base, highFrequency: 5e6 * atSwitch * (1 - 1e-7) });
    expect(before.arrangement).toBe('trimmer');
    expect(after.arrangement).toBe('padder');
    expect(after.padderCapacitance as number).toBeGreaterThan(1e-6); // microfarads: all but a short circuit
    expect(rel(after.inductance, before.inductance)).toBeLessThan(1e-4);
    expect(rel(after.trimmerCapacitance, before.trimmerCapacitance)).toBeLessThan(1e-4);
  });

  it('the limit case: the capacitor\'s ratio just covers the band, with no trimmer left', () => {
    const cmin = 10 * pF;
    const cmax = 365 * pF;
    const cs = 15 * pF;
    const widest = Math.sqrt((cmax + cs) / (cmin + cs)); // √(380/25) = 3.898718
    expect(widest).toBeCloseTo(3.898718, 6);
    const d = designForBand({ lowFrequency: 1e6, highFrequency: 1e6 * widest, minCapacitance: cmin, maxCapacitance: cmax, strayCapacitance: cs, margin: 0 });
    expect(d.trimmerCapacitance).toBe(0);
    expect(d.padderCapacitance).toBeUndefined();
    expect(d.notes.some((n) => /no trimmer is needed/.test(n.message))).toBe(true);
    const e = ends(d);
    expect(rel(e.low, 1e6)).toBeLessThan(1e-9);
    expect(rel(e.high, 1e6 * widest)).toBeLessThan(1e-9);
    // one part in 10⁴ wider and it cannot be done
    expect(fieldOf(() => designForBand({ lowFrequency: 1e6, highFrequency: 1e6 * widest * 1.0001, minCapacitance: cmin, maxCapacitance: cmax, strayCapacitance: cs, margin: 0 }))).toBe('highFrequency');
  });

  it('the impossible case: DesignError at highFrequency naming the widest ratio and what to change', () => {
    const b = { lowFrequency: 0.5e6, highFrequency: 3e6, minCapacitance: 10 * pF, maxCapacitance: 365 * pF, strayCapacitance: 15 * pF, margin: 0.02 };
    expect(fieldOf(() => designForBand(b))).toBe('highFrequency');
    const m = messageOf(() => designForBand(b));
    expect(m).toContain('3.899'); // √(380/25), computed above by hand
    expect(m).toContain('6.245'); // 6 × 1.02/0.98 with the margin
    expect(m).toMatch(/larger maximum/);
    expect(m).toMatch(/strays/);
    expect(m).toMatch(/split the band into 2 ranges/);
  });

  it('margin widens the band at both ends', () => {
    const d = designForBand({ ...demo, lowFrequency: 530e3, highFrequency: 1700e3, margin: 0.03 });
    expect(rel(d.lowFrequency, 530e3 * 0.97)).toBeLessThan(1e-9);
    expect(rel(d.highFrequency, 1700e3 * 1.03)).toBeLessThan(1e-9);
    expect(d.requestedLowFrequency).toBe(530e3);
    expect(d.requestedHighFrequency).toBe(1700e3);
    const back = ends(d);
    expect(rel(back.low, 530e3 * 0.97)).toBeLessThan(1e-9);
    expect(rel(back.high, 1700e3 * 1.03)).toBeLessThan(1e-9);
    expect(d.notes.some((n) => n.field === 'margin')).toBe(true);
    // a margin shrinks the trimmer (less of the capacitor's ratio is given away)
    expect(d.trimmerCapacitance).toBeLessThan(designForBand({ ...demo, lowFrequency: 530e3, highFrequency: 1700e3 }).trimmerCapacitance);
    expect(fieldOf(() => designForBand({ ...demo, margin: 0.7 }))).toBe('margin');
    expect(fieldOf(() => designForBand({ ...demo, margin: -0.01 }))).toBe('margin');
  });

  it('refuses a band typed backwards, a spot frequency and an unknown arrangement', () => {
    expect(fieldOf(() => designForBand({ ...demo, lowFrequency: 6.2e6, highFrequency: 5.9e6 }))).toBe('highFrequency');
    expect(messageOf(() => designForBand({ ...demo, lowFrequency: 6.2e6, highFrequency: 5.9e6 }))).toMatch(/wrong way round/);
    expect(fieldOf(() => designForBand({ ...demo, highFrequency: 5.9e6 * (1 + 1e-8) }))).toBe('highFrequency');
    expect(fieldOf(() => designForBand({ ...demo, arrangement: 'padder' as 'auto' }))).toBe('arrangement');
    expect(fieldOf(() => designForBand({ ...demo, lowFrequency: '5.9M' as unknown as number }))).toBe('lowFrequency');
  });
});

describe('designForBand over random bands and capacitors (fast-check)', () => {
  it('covers the band exactly when √((C_max + C_s)/(C_min + C_s)) allows it, and otherwise refuses at highFrequency', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e5, max: 1e8, noNaN: true }),
        fc.double({ min: 1.0001, max: 6, noNaN: true }),
        fc.double({ min: 2, max: 50, noNaN: true }),
        fc.double({ min: 1.5, max: 60, noNaN: true }),
        fc.oneof(fc.constant(0), fc.double({ min: 0.01, max: 40, noNaN: true })),
        fc.oneof(fc.constant(0), fc.double({ min: 1e-4, max: 0.1, noNaN: true })),
        (f1, ratio, cmin, spread, cs, margin) => {
          const b = { lowFrequency: f1, highFrequency: f1 * ratio, minCapacitance: cmin * pF, maxCapacitance: cmin * spread * pF, strayCapacitance: cs * pF, margin };
          const need = (ratio * (1 + margin)) / (1 - margin);
          const widest = Math.sqrt((cmin * spread + cs) / (cmin + cs));
          if (need > widest * (1 + 1e-9)) {
            expect(fieldOf(() => designForBand(b))).toBe('highFrequency');
            return;
          }
          if (need > widest * (1 - 1e-9)) return; // too close to the limit to say which side rounding falls
          const d = designForBand(b);
          const e = ends(d);
          expect(rel(e.low, f1 * (1 - margin))).toBeLessThan(1e-9);
          expect(rel(e.high, f1 * ratio * (1 + margin))).toBeLessThan(1e-9);
          expect(d.trimmerCapacitance).toBeGreaterThanOrEqual(0);
          if (d.padderCapacitance !== undefined) expect(d.padderCapacitance).toBeGreaterThan(0);
        },
      ),
      { numRuns: 500, seed: 20250608 },
    );
  });
});

describe('slugTuning', () => {
  const circuit = { minCapacitance: 10 * pF, maxCapacitance: 365 * pF, strayCapacitance: 12 * pF, trimmerCapacitance: 15 * pF };

  it('moves the band as √(L) without changing its ratio (Thomson\'s formula)', () => {
    const s = slugTuning({ ...circuit, minInductance: 200e-6, maxInductance: 260e-6 });
    const inL = ends({ ...circuit, inductance: 260e-6 });
    const outL = ends({ ...circuit, inductance: 200e-6 });
    expect(rel(s.slugIn.lowFrequency, inL.low)).toBeLessThan(1e-12);
    expect(rel(s.slugOut.highFrequency, outL.high)).toBeLessThan(1e-12);
    expect(rel(s.lowestFrequency, inL.low)).toBeLessThan(1e-12);
    expect(rel(s.highestFrequency, outL.high)).toBeLessThan(1e-12);
    expect(s.slugFrequencyRatio).toBeCloseTo(Math.sqrt(1.3), 12);
    expect(rel(s.slugIn.frequencyRatio, s.slugOut.frequencyRatio)).toBeLessThan(1e-12);
  });

  it('sets a band inside its window, with equal spare at both ends', () => {
    const s = slugTuning({ ...circuit, inductance: 230e-6, adjustment: 0.15, lowFrequency: 540e3, highFrequency: 1600e3 });
    const set = s.setting!;
    expect(set.withinSlugRange).toBe(true);
    // Thomson: L that puts each end exactly on the band
    expect(rel(thomson(set.inductanceForLowEnd, across({ ...circuit, inductance: 0 }, circuit.maxCapacitance)), 540e3)).toBeLessThan(1e-12);
    expect(rel(thomson(set.inductanceForHighEnd, across({ ...circuit, inductance: 0 }, circuit.minCapacitance)), 1600e3)).toBeLessThan(1e-12);
    const e = ends({ ...circuit, inductance: set.inductance });
    expect(e.low).toBeLessThanOrEqual(540e3);
    expect(e.high).toBeGreaterThanOrEqual(1600e3);
    expect(540e3 / e.low).toBeCloseTo(e.high / 1600e3, 12);
    expect(set.spare).toBeCloseTo(540e3 / e.low - 1, 12);
  });

  it('says when the slug cannot reach the band, and refuses a band wider than the capacitor\'s', () => {
    const s = slugTuning({ ...circuit, minInductance: 100e-6, maxInductance: 120e-6, lowFrequency: 540e3, highFrequency: 1600e3 });
    expect(s.setting!.withinSlugRange).toBe(false);
    expect(s.notes.some((n) => n.level === 'caution' && /add turns/.test(n.message))).toBe(true);
    expect(fieldOf(() => slugTuning({ ...circuit, minInductance: 100e-6, maxInductance: 300e-6, lowFrequency: 500e3, highFrequency: 1900e3 }))).toBe('highFrequency');
    expect(fieldOf(() => slugTuning({ ...circuit, minInductance: 100e-6, maxInductance: 300e-6, inductance: 200e-6, adjustment: 0.1 }))).toBe('inductance');
    expect(fieldOf(() => slugTuning({ ...circuit, inductance: 200e-6, adjustment: 1.5 }))).toBe('adjustment');
    expect(fieldOf(() => slugTuning({ ...circuit, minInductance: 300e-6, maxInductance: 100e-6 }))).toBe('maxInductance');
  });
});

describe('dialLaw', () => {
  const d = designForBand(demo);

  it('straight-line capacitance: C linear in angle, f by Thomson\'s formula, 0° plates meshed', () => {
    const law = dialLaw({ ...d, plates: 'slc', points: 19 });
    expect(law.angle).toHaveLength(19);
    expect(law.angle[0]).toBe(0);
    expect(law.angle[18]).toBe(180);
    expect(law.percent[18]).toBe(100);
    for (let i = 0; i < 19; i++) {
      expect(rel(law.capacitance[i], 365 * pF - (355 * pF * i) / 18)).toBeLessThan(1e-12);
      expect(rel(law.frequency[i], thomson(d.inductance, across(d, law.capacitance[i])))).toBeLessThan(1e-12);
    }
    expect(rel(law.frequency[0], demo.lowFrequency)).toBeLessThan(1e-9);
    expect(rel(law.frequency[18], demo.highFrequency)).toBeLessThan(1e-9);
  });

  it('straight-line frequency: f linear in angle, ends at the band\'s ends, C_v inside the capacitor\'s range', () => {
    const law = dialLaw({ ...d, plates: 'slf', points: 37, rotation: 270 });
    expect(law.angle[36]).toBe(270);
    const step = (demo.highFrequency - demo.lowFrequency) / 36;
    for (let i = 0; i < 37; i++) {
      expect(Math.abs(law.frequency[i] - (demo.lowFrequency + i * step))).toBeLessThan(1e-6 * demo.lowFrequency);
      // the capacitor setting gives that frequency back by Thomson's formula
      expect(rel(thomson(d.inductance, across(d, law.capacitance[i])), law.frequency[i])).toBeLessThan(1e-9);
      expect(law.capacitance[i]).toBeGreaterThanOrEqual(10 * pF);
      expect(law.capacitance[i]).toBeLessThanOrEqual(365 * pF);
    }
  });

  it('the user\'s plates: through the table\'s points, monotonic between them; a linear table gives the SLC law', () => {
    const table = [
      { angle: 0, capacitance: 365 * pF },
      { angle: 30, capacitance: 250 * pF },
      { angle: 90, capacitance: 90 * pF },
      { angle: 150, capacitance: 25 * pF },
      { angle: 180, capacitance: 10 * pF },
    ];
    const law = dialLaw({ ...d, plates: table, points: 181 });
    expect(law.plates).toBe('table');
    for (const p of table) expect(rel(law.capacitance[p.angle], p.capacitance)).toBeLessThan(1e-12);
    for (let i = 1; i < 181; i++) {
      expect(law.capacitance[i]).toBeLessThan(law.capacitance[i - 1]);
      expect(law.frequency[i]).toBeGreaterThan(law.frequency[i - 1]);
    }
    const linear = dialLaw({ ...d, plates: [{ angle: 0, capacitance: 365 * pF }, { angle: 60, capacitance: 246.666666666666 * pF }, { angle: 180, capacitance: 10 * pF }], points: 19 });
    const slc = dialLaw({ ...d, plates: 'slc', points: 19 });
    for (let i = 0; i < 19; i++) expect(rel(linear.capacitance[i], slc.capacitance[i])).toBeLessThan(1e-9);
  });

  it('monotone interpolation of a plate table: a value derived by hand', () => {
    // Derived by hand (Fritsch and Carlson 1980 with Fritsch and Butland's inner derivative): the table
    // (0°, 10 pF), (1°, 11 pF), (2°, 14 pF) is 10 pF + x² pF at x = 0, 1, 2. Slopes d = 1, 3 pF/°;
    // inner derivative (w1 + w2)/(w1/d0 + w2/d1) with w1 = w2 = 3 gives 6/4 = 1.5; end derivatives 1 and 3.
    // At 0.5° (t = 0.5) the Hermite cubic adds to 10 pF:
    //   1·(t(1−t)² = 0.125) + 1·(t²(3−2t) = 0.5) + 1.5·(t²(t−1) = −0.125) = 0.125 + 0.5 − 0.1875 = 0.4375 pF.
    const law = dialLaw({ ...d, plates: [{ angle: 0, capacitance: 10 * pF }, { angle: 1, capacitance: 11 * pF }, { angle: 2, capacitance: 14 * pF }], points: 5 });
    expect(law.angle).toEqual([0, 0.5, 1, 1.5, 2]);
    expect(law.capacitance[1] / pF).toBeCloseTo(10.4375, 12);
    expect(law.capacitance[2] / pF).toBeCloseTo(11, 12);
    expect(law.capacitance[4] / pF).toBe(14);
  });

  it('refuses a table that is not monotonic, angles that do not rise, and unknown plates', () => {
    const bad = [{ angle: 0, capacitance: 365 * pF }, { angle: 60, capacitance: 120 * pF }, { angle: 90, capacitance: 130 * pF }, { angle: 180, capacitance: 10 * pF }];
    expect(fieldOf(() => dialLaw({ ...d, plates: bad }))).toBe('plates');
    expect(messageOf(() => dialLaw({ ...d, plates: bad }))).toMatch(/at 90° it is 130 pF, more than 120 pF at 60°/);
    expect(fieldOf(() => dialLaw({ ...d, plates: [{ angle: 0, capacitance: 10 * pF }, { angle: 0, capacitance: 20 * pF }] }))).toBe('plates');
    expect(fieldOf(() => dialLaw({ ...d, plates: 'log' as 'slc' }))).toBe('plates');
    expect(fieldOf(() => dialLaw({ ...d, plates: 'slc', points: 1 }))).toBe('points');
  });
});

describe('bandSelectivity', () => {
  const d = designForBand(demo);
  const coil = { form: 'solenoid' as const, diameter: 20e-3, pitch: 1e-3, wire: { diameter: 0.5e-3, insulatedDiameter: 0.55e-3 } };

  it('follows the published Q rules at the band\'s ends and middle, for the coil wound once', () => {
    const s = bandSelectivity({ band: d, coil, capacitorQ: 1000, sourceResistance: 20e3, loadResistance: 50e3, points: 11 });
    expect(s.coil?.turns).toBeGreaterThan(0);
    for (const p of [s.low, s.middle, s.high]) {
      // the tank resonates at its frequency (Thomson's formula with the strays, computed here)
      expect(rel(thomson(p.tank.inductance, p.tank.capacitance + d.strayCapacitance), p.frequency)).toBeLessThan(1e-9);
      // bandwidth ≈ f/Q_L (Pozar, Microwave Engineering; O(1/Q²)) and R_D ≈ Q_u ω L (Terman 1943)
      expect(rel(p.bandwidth, p.frequency / p.loadedQ)).toBeLessThan(0.01);
      expect(rel(p.dynamicResistance, p.unloadedQ * 2 * Math.PI * p.frequency * d.inductance)).toBeLessThan(0.01);
      expect(p.loadedQ).toBeLessThan(p.unloadedQ);
      expect(p.unloadedQ).toBeLessThan(p.coilQ);
    }
    expect(s.low.frequency).toBeCloseTo(demo.lowFrequency, 3);
    expect(s.high.frequency).toBeCloseTo(demo.highFrequency, 3);
    expect(s.middle.frequency).toBeCloseTo(6.05e6, 3);
    expect(s.curve.frequency).toHaveLength(11);
    expect(s.curve.loadedQ[0]).toBeCloseTo(s.low.loadedQ, 9);
    expect(s.curve.bandwidth[10]).toBeCloseTo(s.high.bandwidth, 6);
    // a copper solenoid's Q rises with frequency across a narrow band (R_ac ∝ √f: Q ∝ √f, Terman 1943)
    expect(s.high.coilQ).toBeGreaterThan(s.low.coilQ);
    expect(rel(s.high.coilQ / s.low.coilQ, Math.sqrt(6.2 / 5.9))).toBeLessThan(0.02);
  });

  it('the coil\'s Q between designCoil\'s nodes is interpolated to within 0.1 % of designCoil itself, on a 3.3:1 band', () => {
    const wide = designForBand({ ...demo, lowFrequency: 530e3, highFrequency: 1700e3 });
    const big = { form: 'solenoid' as const, diameter: 40e-3, pitch: 0.4e-3, wire: { diameter: 0.3e-3, insulatedDiameter: 0.35e-3 } };
    const s = bandSelectivity({ band: wide, coil: big, points: 23 });
    const turns = s.coil!.turns;
    for (let i = 0; i < 23; i += 2) {
      const exact = designCoil({ ...big, turns, frequency: s.curve.frequency[i] }).q as number;
      expect(rel(s.curve.coilQ[i], exact)).toBeLessThan(1e-3);
    }
    // exact at the reported points
    expect(rel(s.middle.coilQ, designCoil({ ...big, turns, frequency: s.middle.frequency }).q as number)).toBeLessThan(1e-12);
  });

  it('a coil already wound (designCoil for the band\'s L at mid-band) gives the same selectivity as winding it there; a bad one is refused', () => {
    const own = bandSelectivity({ band: d, coil, capacitorQ: 1000, sourceResistance: 20e3, loadResistance: 50e3, points: 7 });
    const middle = 0.5 * (own.low.frequency + own.high.frequency);
    const woundCoil = designCoil({ ...coil, inductance: d.inductance, frequency: middle });
    const given = bandSelectivity({ band: d, coil, woundCoil, capacitorQ: 1000, sourceResistance: 20e3, loadResistance: 50e3, points: 7 });
    expect(given.coil).toBe(woundCoil);
    expect(given.curve).toEqual(own.curve);
    expect(given.middle.loadedQ).toBe(own.middle.loadedQ);
    expect(fieldOf(() => bandSelectivity({ band: d, coil, woundCoil: { ...woundCoil, turns: Number.NaN } }))).toBe('woundCoil');
    expect(fieldOf(() => bandSelectivity({ band: d, coil, woundCoil: 'wound' as never }))).toBe('woundCoil');
  });

  it('with a fixed coil Q and ideal capacitors the unloaded Q is the coil\'s (1/Q = Σ 1/Q_i, Pozar)', () => {
    const s = bandSelectivity({ band: d, coilQ: 150, points: 3 });
    for (const q of s.curve.unloadedQ) expect(q).toBeCloseTo(150, 6);
    // no terminations: loaded = unloaded
    expect(s.middle.loadedQ).toBeCloseTo(150, 6);
  });

  it('refuses missing or bad inputs at their (nested) fields', () => {
    expect(fieldOf(() => bandSelectivity({ band: d }))).toBe('coilQ');
    expect(fieldOf(() => bandSelectivity({ band: { ...d, inductance: -1 }, coilQ: 100 }))).toBe('band.inductance');
    expect(fieldOf(() => bandSelectivity({ band: { ...d, maxCapacitance: 1 * pF }, coilQ: 100 }))).toBe('band.maxCapacitance');
    expect(fieldOf(() => bandSelectivity({ band: d, coil: { ...coil, diameter: -1 } }))).toBe('coil.diameter');
    expect(fieldOf(() => bandSelectivity({ band: d, coilQ: 100, loadResistance: -5 }))).toBe('loadResistance');
    expect(fieldOf(() => bandSelectivity({ band: d, coilQ: 100, points: 0.5 }))).toBe('points');
  });
});
