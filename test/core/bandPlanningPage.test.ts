/**
 * The band-planning method page (content/docs/band-planning.md) against the
 * core, so the page cannot drift from the code.
 *
 * Each worked example of the page (a paragraph starting "**Worked example
 * (title).**", with the table after it, if any) is recomputed here with the
 * same inputs: every figure the page gives must appear in that paragraph as
 * the core's value, rounded as written, and once those figures are taken out
 * no digit may be left (so a number added to an example without a check here
 * fails). A few statements outside the examples are checked too, some against
 * sources outside the project (IEC 60063's series against the geometric
 * rule they round, GUM first-order propagation, the universal resonance curve).
 * The worked examples are demo data (invented parts, a fictional workshop).
 */
import { describe, expect, it } from 'vitest';
import { fig, flat, methodPage, parts } from '../helpers/pageExamples';
import {
  analyzeTank, bandCoverage, bandSelectivity, designForBand, designTracking, dialLaw, eSeries, imageRejection,
  nearestPreferredValue, PADDER_SWITCH_RATIO, preferredNeighbours, resonantPairs, slugTuning, toleranceSpread,
} from '../../src/core';
import { isDesignError } from '../../src/core/errors';

const { page, example, expectExample } = methodPage('band-planning.md');

const MINUS = '\u2212';

/** "7.26 µH"; with `signed`, "+6.61 kHz" or "−5.42 kHz". */
function q(x: number, unit: string, sig = 3, signed = false): string {
  const { mantissa, prefix } = parts(x, sig);
  const sign = x < 0 ? MINUS : signed ? '+' : '';
  return `${sign}${mantissa} ${prefix}${unit}`;
}

/** Exact figures of an input, as typed: no trailing zeros, no binary noise. */
const EXACT = 12;
const exact = (text: string): string => String(Number(text));

/** An input range, "5.9–6.2 MHz" (one prefix for both ends, figures as typed). */
function span(lo: number, hi: number, unit: string): string {
  const a = parts(lo, EXACT);
  const b = parts(hi, EXACT);
  a.mantissa = exact(a.mantissa);
  b.mantissa = exact(b.mantissa);
  expect(a.prefix).toBe(b.prefix);
  return `${a.mantissa}–${b.mantissa} ${a.prefix}${unit}`;
}

/** "519.4 kHz to 1.734 MHz". */
const to = (lo: number, hi: number, unit: string, sig = 4, sigHigh = sig): string => `${q(lo, unit, sig)} to ${q(hi, unit, sigHigh)}`;

/** A fraction as "2 %", or signed "+0.35 %", "−0.8 %". */
function pct(x: number, sig: number, signed = false): string {
  return `${x < 0 ? MINUS : signed ? '+' : ''}${fig(Math.abs(x) * 100, sig)} %`;
}

/** An input length in millimetres, as typed: "0.55 mm". */
const mm = (x: number): string => `${exact(fig(x * 1e3, EXACT))} mm`;


// ---------------------------------------------------------------------------
// The demo parts (invented): a 10–365 pF capacitor with 12 pF of strays.

const pF = 1e-12;
const capacitor = { minCapacitance: 10 * pF, maxCapacitance: 365 * pF, strayCapacitance: 12 * pF };
const capacitorText = [span(10 * pF, 365 * pF, 'F'), q(12 * pF, 'F', 2)];
const spread = { lowFrequency: 5.9e6, highFrequency: 6.2e6 };
const spreadText = span(5.9e6, 6.2e6, 'Hz');
const broadcast = { lowFrequency: 530e3, highFrequency: 1700e3, margin: 0.02 };

describe('the band-planning page, worked examples against the core', () => {
  it('coverage', () => {
    const c = bandCoverage({ inductance: 63.33e-6, minCapacitance: 20 * pF, maxCapacitance: 320 * pF, strayCapacitance: 0, trimmerCapacitance: 70 * pF });
    expectExample('coverage', [
      q(63.33e-6, 'H', 4), span(20 * pF, 320 * pF, 'F'), q(70 * pF, 'F', 2),
      q(c.lowEndCapacitance, 'F'), q(c.highEndCapacitance, 'F'), to(c.lowFrequency, c.highFrequency, 'Hz'), fig(c.frequencyRatio, 3),
    ]);
  });

  it('the widest band', () => {
    let message = '';
    try {
      designForBand({ lowFrequency: 500e3, highFrequency: 2.5e6, ...capacitor });
    } catch (e) {
      expect(isDesignError(e)).toBe(true);
      expect((e as { field: string }).field).toBe('highFrequency');
      message = (e as Error).message;
    }
    const widest = Math.sqrt((capacitor.maxCapacitance + capacitor.strayCapacitance) / (capacitor.minCapacitance + capacitor.strayCapacitance));
    // the refusal names the widest ratio, and a split into ranges the page repeats
    expect(message).toContain(`gives at most ${fig(widest, 3)}`);
    const split = message.match(/into (\d+) ranges \(for example ([^)]*)\)/);
    expect(split).not.toBeNull();
    const ranges = split![2].split(', ');
    expect(ranges).toHaveLength(Number(split![1]));
    expectExample('the widest band', [
      ...capacitorText, fig(widest, 3), to(500e3, 2.5e6, 'Hz', 2), fig(2.5e6 / 500e3, 3), `${split![1]} ranges`, ...ranges,
    ]);
  });

  it('broadcast band, trimmer alone', () => {
    const d = designForBand({ ...broadcast, ...capacitor });
    expect(d.arrangement).toBe('trimmer');
    expectExample('broadcast band, trimmer alone', [
      to(530e3, 1.7e6, 'Hz', 2), pct(broadcast.margin, 1), to(d.lowFrequency, d.highFrequency, 'Hz'), fig(d.frequencyRatio, 4),
      q(d.trimmerCapacitance + d.strayCapacitance, 'F'), q(d.trimmerCapacitance, 'F'), q(d.inductance, 'H', 4),
    ]);
  });

  it('5.9–6.2 MHz (band-spread with a padder)', () => {
    const d = designForBand({ ...spread, ...capacitor });
    const alone = designForBand({ ...spread, ...capacitor, arrangement: 'trimmer' });
    expect(d.arrangement).toBe('padder');
    // the parallel capacitance is held at PADDER_SWITCH_RATIO × C_max
    expect(d.trimmerCapacitance + d.strayCapacitance).toBeCloseTo(PADDER_SWITCH_RATIO * capacitor.maxCapacitance, 20);
    expectExample('5.9–6.2 MHz', [
      spreadText, fig(d.frequencyRatio, 4), q(alone.trimmerCapacitance + alone.strayCapacitance, 'F'), q(alone.inductance, 'H'),
      q(d.trimmerCapacitance + d.strayCapacitance, 'F'), q(d.trimmerCapacitance, 'F'), q(d.strayCapacitance, 'F', 2),
      q(d.padderCapacitance as number, 'F'), q(d.inductance, 'H'), q(d.lowEndCapacitance, 'F', 4), q(d.highEndCapacitance, 'F', 4), fig(d.crowding, 3),
    ]);
  });

  it('slug', () => {
    const d = designForBand({ ...broadcast, ...capacitor });
    const s = slugTuning({ ...capacitor, trimmerCapacitance: d.trimmerCapacitance, inductance: d.inductance, adjustment: 0.1, lowFrequency: 530e3, highFrequency: 1700e3 });
    const set = s.setting!;
    expect(set.withinSlugRange).toBe(true);
    expect(fig(s.slugOut.frequencyRatio, 4)).toBe(fig(s.slugIn.frequencyRatio, 4));
    expectExample('slug', [
      `±${pct(0.1, 2)}`, to(s.minInductance, s.maxInductance, 'H'), fig(s.slugFrequencyRatio, 4),
      to(s.slugIn.lowFrequency, s.slugIn.highFrequency, 'Hz'), to(s.slugOut.lowFrequency, s.slugOut.highFrequency, 'Hz'), fig(s.capacitorRatio, 4),
      to(530e3, 1.7e6, 'Hz', 2), to(set.inductanceForLowEnd, set.inductanceForHighEnd, 'H'), q(set.inductance, 'H', 4), pct(set.spare, 3),
    ]);
  });

  it('dial law', () => {
    const d = designForBand({ ...spread, ...capacitor });
    const slc = dialLaw({ ...d, plates: 'slc', points: 5 });
    const slf = dialLaw({ ...d, plates: 'slf', points: 5 });
    expect(slc.angle).toEqual([0, 45, 90, 135, 180]);
    const f = slc.frequency;
    const step = slf.frequency[1] - slf.frequency[0];
    for (let i = 1; i < 5; i++) expect(slf.frequency[i] - slf.frequency[i - 1]).toBeCloseTo(step, 3);
    expectExample('dial law', [
      spreadText, '180°', '45°', '90°', '135°', q(f[1], 'Hz', 4), q(f[2], 'Hz', 4), q(f[3], 'Hz', 4),
      q(f[1] - f[0], 'Hz'), q(f[4] - f[3], 'Hz', 4), q(step, 'Hz'),
    ]);
  });

  it('selectivity, with image rejection', () => {
    const d = designForBand({ ...spread, ...capacitor });
    const coil = { form: 'solenoid' as const, diameter: 20e-3, pitch: 1e-3, wire: { diameter: 0.5e-3, insulatedDiameter: 0.55e-3 } };
    const s = bandSelectivity({ band: d, coil, capacitorQ: 1000, sourceResistance: 20e3, loadResistance: 50e3, points: 3 });
    const wound = s.coil!;
    const points = [s.low, s.middle, s.high];
    const images = points.map((p) => imageRejection({ tank: p.tank, signalFrequency: p.frequency, intermediateFrequency: 455e3 }));
    const external = points.map((p) => analyzeTank(p.tank).externalQ);
    // Q_e = (R_s ∥ R_load)/(ωL) for a parallel tank (Pozar, Microwave Engineering, ch. 6)
    points.forEach((p, i) => expect(external[i]).toBeCloseTo((20e3 * 50e3) / (70e3 * 2 * Math.PI * p.frequency * d.inductance), 6));
    const row = (name: string, cells: string[]) => `|${name ? ` ${name} ` : ' '}| ${cells.join(' | ')} |`;
    expectExample('selectivity', [
      spreadText, mm(20e-3), mm(1e-3), mm(0.5e-3), mm(0.55e-3), `${wound.turns} turns`, q(wound.inductance, 'H', 4),
      pct(wound.inductance / d.inductance - 1, 1, true), q(d.inductance, 'H'), 'Q 1000', q(20e3, 'Ω', 2), q(50e3, 'Ω', 2), q(455e3, 'Hz'),
      row('', points.map((p, i) => q(p.frequency, 'Hz', i === 1 ? 3 : 2))),
      '|---|---|---|---|',
      row('coil Q', points.map((p) => fig(p.coilQ, 3))),
      row('unloaded Q', points.map((p) => fig(p.unloadedQ, 3))),
      row('external Q', external.map((x) => fig(x, 3))),
      row('loaded Q', points.map((p) => fig(p.loadedQ, 3))),
      row('bandwidth', points.map((p) => q(p.bandwidth, 'Hz'))),
      row('dynamic resistance', points.map((p) => q(p.dynamicResistance, 'Ω'))),
      row('image', images.map((m) => q(m.imageFrequency, 'Hz'))),
      row('image rejection', images.map((m) => `${fig(m.rejection, 3)} dB`)),
    ]);
    // "The universal-resonance estimate agrees with the exact rejection to within 0.01 dB here."
    expect(flat(page)).toContain('agrees with the exact rejection to within 0.01 dB here');
    for (const m of images) expect(Math.abs(m.estimate - m.rejection)).toBeLessThan(0.01);
    // and the estimate is the universal resonance curve, written here (Terman 1943)
    for (const m of images) {
      const xi = m.imageFrequency / m.signalFrequency - m.signalFrequency / m.imageFrequency;
      expect(m.estimate).toBeCloseTo(10 * Math.log10(1 + (m.loadedQ * xi) ** 2), 9);
    }
  });

  it('tracking', () => {
    const signal = { inductance: 230e-6, ...capacitor, trimmerCapacitance: 20 * pF };
    const input = { lowFrequency: 530e3, highFrequency: 1600e3, intermediateFrequency: 455e3, signal };
    const t = designTracking({ ...input, points: 20001 });
    const cover = bandCoverage(signal);
    const o = t.oscillator;
    // the extremes between the tracking points, on a dense curve: one between each neighbouring pair
    const { error: e, signalFrequency: f } = t.curve;
    const inner: number[] = [];
    for (let i = 1; i < e.length - 1; i++) if ((e[i] - e[i - 1]) * (e[i + 1] - e[i]) < 0) inner.push(i);
    expect(inner).toHaveLength(2);
    const [p1, p2, p3] = t.trackingFrequencies;
    expect(f[inner[0]] > p1 && f[inner[0]] < p2 && f[inner[1]] > p2 && f[inner[1]] < p3).toBe(true);
    expect(t.largestError.signalFrequency).toBe(530e3);
    const wider = designTracking({ ...input, oscillatorStrayCapacitance: 30 * pF });
    expect(wider.largestError.error).toBeCloseTo(t.largestError.error, 6);
    const last = e.length - 1;
    expectExample('tracking', [
      q(230e-6, 'H'), span(10 * pF, 365 * pF, 'F'), q(12 * pF, 'F', 2), q(20 * pF, 'F', 2),
      to(cover.lowFrequency, cover.highFrequency, 'Hz'), to(530e3, 1.6e6, 'Hz', 2), q(455e3, 'Hz'),
      to(530e3 + 455e3, 1.6e6 + 455e3, 'Hz', 3, 4),
      `${q(p1, 'Hz', 4)}, ${q(p2, 'Hz', 4)} and ${q(p3, 'Hz', 4)}`,
      q(o.inductance, 'H', 4), q(o.trimmerCapacitance, 'F'), q(o.padderCapacitance, 'F'), to(t.oscillatorLowFrequency, t.oscillatorHighFrequency, 'Hz'),
      `${q(t.largestError.error, 'Hz', 3, true)} at ${q(t.largestError.signalFrequency, 'Hz', 2)}`, pct(t.largestError.relativeError, 3),
      `${q(e[inner[0]], 'Hz', 3, true)} near ${q(f[inner[0]], 'Hz')}`, `${q(e[inner[1]], 'Hz', 3, true)} near ${q(f[inner[1]], 'Hz')}`,
      `${q(e[last], 'Hz', 3, true)} at ${q(f[last], 'Hz', 2)}`,
      q(30 * pF, 'F', 2), q(wider.oscillator.inductance, 'H', 4), q(wider.oscillator.trimmerCapacitance, 'F'), q(wider.oscillator.padderCapacitance, 'F'),
      q(wider.largestError.error, 'Hz', 3, true),
      // images inside the band: signals up to f₂ − 2·IF, images from f₁ + 2·IF
      to(530e3, 1.6e6 - 2 * 455e3, 'Hz', 2), to(530e3 + 2 * 455e3, 1.6e6, 'Hz', 3, 2),
    ]);
    // and the core's own note says the same span of signals
    expect(t.notes.some((n) => n.message.includes(`from ${q(530e3, 'Hz', 2)} to ${q(1.6e6 - 2 * 455e3, 'Hz', 2)}`))).toBe(true);
  });

  it('preferred values', () => {
    const n = preferredNeighbours(106.9e-12, 'E12');
    expect(n.nearest).toBe(nearestPreferredValue(106.9e-12, 'E12'));
    expectExample('preferred values', [
      q(106.9e-12, 'F', 4), 'E12', 'E24', q(n.below, 'F'), q(n.above, 'F'), `nearest is ${q(n.nearest, 'F')}`, q(nearestPreferredValue(106.9e-12, 'E24'), 'F'),
    ]);
  });

  it('tolerance spread, with the first-order rule of the GUM', () => {
    const spec = { inductance: 4.7e-6, capacitance: 100 * pF, strayCapacitance: 12 * pF, inductanceTolerance: 0.05, capacitanceTolerance: 0.02, strayTolerance: 0.2, samples: 2000, seed: 1 };
    const s = toleranceSpread(spec);
    // JCGM 100:2008, 4.3.7: a part uniform over ±a has u = a/√3; f ∝ (L C_tot)^(−1/2), sensitivities −½
    const total = spec.capacitance + spec.strayCapacitance;
    const u = [spec.inductanceTolerance, (spec.capacitanceTolerance * spec.capacitance) / total, (spec.strayTolerance * spec.strayCapacitance) / total].map((a) => a / Math.sqrt(3));
    const firstOrder = 0.5 * Math.hypot(...u) * s.frequency;
    expect(Math.abs(s.monteCarlo.standardDeviation / firstOrder - 1)).toBeLessThan(0.05);
    expectExample('tolerance spread', [
      q(4.7e-6, 'H', 2), `±${pct(0.05, 1)}`, q(100 * pF, 'F'), `±${pct(0.02, 1)}`, q(12 * pF, 'F', 2), `±${pct(0.2, 2)}`,
      q(s.frequency, 'Hz', 4), to(s.worstCase.low, s.worstCase.high, 'Hz'), `${s.monteCarlo.samples} units`, `seed ${s.monteCarlo.seed}`,
      to(s.monteCarlo.low, s.monteCarlo.high, 'Hz'), q(s.monteCarlo.standardDeviation, 'Hz'), q(firstOrder, 'Hz'),
    ]);
  });

  it('pairs', () => {
    const r = resonantPairs({ frequency: 7.1e6, strayCapacitance: 12 * pF, capacitorSeries: 'E12', inductorSeries: 'E12', capacitanceTolerance: 0.1, inductanceTolerance: 0.1 });
    const [first, second] = r.candidates;
    const trim = second.trimmer!;
    // the defaults are the same search (E12 parts at the ±10 % IEC 60063 pairs with E12; 10 Ω … 3 kΩ window)
    const byDefault = resonantPairs({ frequency: 7.1e6, strayCapacitance: 12 * pF, reactanceRange: { minimum: 10, maximum: 3000 } });
    expect(byDefault.candidates.map((c) => c.frequency)).toEqual(r.candidates.map((c) => c.frequency));
    expect(byDefault.pairsSearched).toBe(r.pairsSearched);
    expect(resonantPairs({ frequency: 7.1e6, strayCapacitance: 12 * pF }).candidates.map((c) => c.frequency)).toEqual(r.candidates.map((c) => c.frequency));
    expectExample('pairs', [
      q(7.1e6, 'Hz', 2), q(12 * pF, 'F', 2), 'E12', `±${pct(0.1, 2)}`, `${r.pairsSearched} pairs`,
      `${q(first.inductor.inductance, 'H', 2)} with ${q(first.capacitance, 'F', 2)}`, q(first.frequency, 'Hz', 4), pct(first.error, 2, true),
      q(first.characteristicImpedance, 'Ω'),
      `${q(second.inductor.inductance, 'H', 2)} with ${q(second.capacitance, 'F', 2)}`, q(second.frequency, 'Hz', 4), pct(second.error, 2, true),
      to(second.spread.worstCase.low, second.spread.worstCase.high, 'Hz'),
      `${q(trim.capacitor, 'F', 2)} fixed`, to(trim.minimum, trim.maximum, 'F', 3),
    ]);
  });
});

describe('the band-planning page, statements outside the examples', () => {
  it('lists E12 as IEC 60063 gives it, and E3 to E24 keep the values the geometric rule would round otherwise', () => {
    expect(flat(page)).toContain(`E12, for example: ${eSeries('E12').map((v) => v.toFixed(1)).join(', ')}.`);
    // IEC 60063: E24 against 10^(i/24) to two figures; the page says 2.7 to 4.7 and 8.2 differ
    const e24 = eSeries('E24');
    const differ = e24.filter((v, i) => Number((10 ** (i / 24)).toPrecision(2)) !== v);
    expect(differ).toEqual([2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 8.2]);
    // E192 against 10^(i/192) to three figures: only 9.20 differs (the rule gives 9.19)
    const e192 = eSeries('E192');
    expect(e192.filter((v, i) => Number((10 ** (i / 192)).toPrecision(3)) !== v)).toEqual([9.2]);
    expect(flat(page)).toContain('(9.20 where rounding gives 9.19)');
  });

  it('the padder switch is at the capacitor\'s maximum, as the page says', () => {
    expect(PADDER_SWITCH_RATIO).toBe(1);
    expect(flat(page)).toContain('switches to a padder only when $C_0$ would exceed $C_{\\max}$');
  });
});
