import { describe, expect, it } from 'vitest';
import { resonantPairs, toleranceSpread, type PairCandidate, type PairSearch, type ToleranceSpreadSpec } from '../../src/core/pairs';
import { DesignError } from '../../src/core/errors';

/** Thomson's formula, f = 1 / (2π √(LC)) (Terman, Radio Engineers' Handbook, 1943, section 3). */
const thomson = (l: number, c: number) => 1 / (2 * Math.PI * Math.sqrt(l * c));

// IEC 60063:2015, E12 series
const E12 = [1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2];
const decades = (mantissas: number[], from: number, to: number) => {
  const out: number[] = [];
  for (let k = from; k <= to; k++) for (const m of mantissas) out.push(Number((m * 10 ** k).toPrecision(12)));
  return out;
};

/** Relative closeness: |a − b| ≤ tol·|b|. */
const near = (a: number, b: number, tol = 1e-12) => expect(Math.abs(a - b)).toBeLessThanOrEqual(tol * Math.abs(b));

// Demo shop coils of our own fictional workshop (invented values).
const shopCoils = [
  { name: 'bench 40 m slug coil', inductance: 4.2e-6, selfCapacitance: 2.5e-12 },
  { name: 'drawer 3, green former', inductance: 2.93e-6, selfCapacitance: 1.8e-12 },
];

describe('resonantPairs: ranking', () => {
  const spec: PairSearch = { frequency: 7.1e6, strayCapacitance: 12e-12, count: 12, samples: 200 };
  const result = resonantPairs(spec);

  it('gives each candidate the frequency of Thomson’s formula with strays and self-capacitance', () => {
    expect(result.candidates).toHaveLength(12);
    for (const c of result.candidates) {
      const f = thomson(c.inductor.inductance, c.capacitance + 12e-12 + c.inductor.selfCapacitance);
      near(c.frequency, f, 1e-12);
      near(c.error, (f - 7.1e6) / 7.1e6, 1e-9);
    }
  });
  it('ranks by |frequency error|, smallest first', () => {
    const errors = result.candidates.map((c) => Math.abs(c.error));
    for (let i = 1; i < errors.length; i++) expect(errors[i]).toBeGreaterThanOrEqual(errors[i - 1]);
  });
  it('finds the best pairs a brute-force search of E12 parts finds', () => {
    // Brute force in the test: every E12 capacitor whose reactance at 7.1 MHz lies in
    // the documented window (10 Ω … 3 kΩ) against every E12 inductor 10 nH … 1 H,
    // resonance by Thomson's formula.
    const w = 2 * Math.PI * 7.1e6;
    const caps = decades(E12, -12, -6).filter((c) => 1 / (w * c) >= 10 && 1 / (w * c) <= 3000);
    const inds = decades(E12, -8, -1);
    const all: Array<{ l: number; c: number; e: number }> = [];
    for (const l of inds) for (const c of caps) all.push({ l, c, e: Math.abs(thomson(l, c + 12e-12) / 7.1e6 - 1) });
    all.sort((a, b) => a.e - b.e);
    const worstListed = Math.abs(result.candidates[result.candidates.length - 1].error);
    const better = all.filter((p) => p.e < worstListed * (1 - 1e-9));
    for (const p of better) {
      expect(result.candidates.some((c) => Math.abs(c.inductor.inductance / p.l - 1) < 1e-9 && Math.abs(c.capacitance / p.c - 1) < 1e-9)).toBe(true);
    }
    near(Math.abs(result.candidates[0].error), all[0].e, 1e-9);
    expect(result.pairsSearched).toBeGreaterThan(100);
  });
  it('uses fixed values of the chosen series only', () => {
    const r = resonantPairs({ frequency: 3.6e6, capacitorSeries: 'E6', inductorSeries: 'E6', count: 20, samples: 10 });
    // IEC 60063:2015 E6: 1.0 1.5 2.2 3.3 4.7 6.8
    const e6 = [1.0, 1.5, 2.2, 3.3, 4.7, 6.8];
    const mantissa = (x: number) => Number((x / 10 ** Math.floor(Math.log10(x) + 1e-9)).toPrecision(6));
    for (const c of r.candidates) {
      expect(e6).toContain(mantissa(c.capacitance));
      expect(e6).toContain(mantissa(c.inductor.inductance));
    }
  });
  it('offers the shop’s coils with their self-capacitance and the preferred capacitors either side', () => {
    // 4.2 µH with 2.5 pF own and 12 pF strays: C = 1/(ω²L) − 14.5 pF ≈ 105.1 pF at 7.1 MHz,
    // between E12 100 pF and 120 pF (IEC 60063:2015)
    const r = resonantPairs({ ...spec, inductorSeries: 'none', shopCoils, count: 4 });
    expect(r.candidates.every((c) => c.inductor.source === 'shop')).toBe(true);
    const bench = r.candidates.filter((c) => c.inductor.name === 'bench 40 m slug coil').map((c) => c.capacitance).sort((a, b) => a - b);
    expect(bench).toEqual([100e-12, 120e-12]);
    const best = r.candidates[0];
    near(best.frequency, thomson(best.inductor.inductance, best.capacitance + 12e-12 + best.inductor.selfCapacitance), 1e-12);
  });
  it('warns when a shop coil is used above half its self-resonance', () => {
    // invented coil: 4.2 µH with 60 pF of its own self-resonates at 1/(2π√(LC)) ≈ 10.0 MHz;
    // the lumped model holds below half of that (common practice, no published source)
    const srf = thomson(4.2e-6, 60e-12);
    expect(srf).toBeLessThan(2 * 7.1e6);
    const r = resonantPairs({ ...spec, shopCoils: [{ name: 'heavy former', inductance: 4.2e-6, selfCapacitance: 60e-12 }] });
    expect(r.notes.some((n) => n.level === 'validity' && n.field === 'shopCoils' && /heavy former/.test(n.message))).toBe(true);
    expect(resonantPairs({ ...spec, shopCoils }).notes.some((n) => n.level === 'validity')).toBe(false);
  });
  it('ranks a shop coil first when it hits the target exactly', () => {
    // invented coil: L chosen so that 150 pF + 12 pF strays + 3 pF own resonate at 7.1 MHz
    const l = 1 / ((2 * Math.PI * 7.1e6) ** 2 * 165e-12);
    const r = resonantPairs({ ...spec, shopCoils: [{ name: 'made to measure', inductance: l, selfCapacitance: 3e-12 }] });
    expect(r.candidates[0].inductor.name).toBe('made to measure');
    expect(r.candidates[0].capacitance).toBe(150e-12);
    expect(Math.abs(r.candidates[0].error)).toBeLessThan(1e-12);
  });
  it('ranks a band against its geometric centre and says whether the spread stays inside', () => {
    const r = resonantPairs({ lowFrequency: 5.9e6, highFrequency: 6.2e6, capacitorSeries: 'E24', count: 8, samples: 50, capacitanceTolerance: 0.01, inductanceTolerance: 0.01 });
    near(r.target, Math.sqrt(5.9e6 * 6.2e6), 1e-12);
    for (const c of r.candidates) {
      near(c.error, c.frequency / r.target - 1, 1e-9);
      expect(c.spreadInBand).toBe(c.spread.worstCase.low >= 5.9e6 && c.spread.worstCase.high <= 6.2e6);
    }
    // ±1 % parts move f by about ±1 %: inside a ±2.5 % band for a pair close to its centre
    expect(r.candidates[0].spreadInBand).toBe(true);
  });
});

describe('toleranceSpread', () => {
  const pair: ToleranceSpreadSpec = {
    inductance: 4.7e-6, capacitance: 100e-12, strayCapacitance: 15e-12, selfCapacitance: 3e-12,
    inductanceTolerance: 0.1, capacitanceTolerance: 0.05, strayTolerance: 0.3, samples: 5000, seed: 42,
  };

  it('worst case is Thomson’s formula at the extreme corners', () => {
    const s = toleranceSpread(pair);
    near(s.frequency, thomson(4.7e-6, 118e-12));
    near(s.worstCase.low, thomson(4.7e-6 * 1.1, 105e-12 + 19.5e-12 + 3e-12));
    near(s.worstCase.high, thomson(4.7e-6 * 0.9, 95e-12 + 10.5e-12 + 3e-12));
  });
  it('the worst case bounds every Monte-Carlo unit, uniform and normal', () => {
    for (const distribution of ['uniform', 'normal'] as const) {
      const s = toleranceSpread({ ...pair, distribution });
      expect(s.frequencies).toHaveLength(5000);
      const outside = s.frequencies.filter((f) => f < s.worstCase.low || f > s.worstCase.high);
      expect(outside.length).toBe(0);
      expect(s.monteCarlo.low).toBe(Math.min(...s.frequencies));
      expect(s.monteCarlo.high).toBe(Math.max(...s.frequencies));
    }
  });
  it('same seed, same units; another seed, other units', () => {
    const a = toleranceSpread(pair);
    const b = toleranceSpread(pair);
    expect(Array.from(b.frequencies)).toEqual(Array.from(a.frequencies));
    const c = toleranceSpread({ ...pair, seed: 43 });
    expect(Array.from(c.frequencies)).not.toEqual(Array.from(a.frequencies));
    expect(c.frequencies.filter((f, i) => f === a.frequencies[i]).length).toBe(0);
    const n1 = toleranceSpread({ ...pair, distribution: 'normal', seed: 7 });
    const n2 = toleranceSpread({ ...pair, distribution: 'normal', seed: 7 });
    expect(Array.from(n2.frequencies)).toEqual(Array.from(n1.frequencies));
  });
  it('Monte-Carlo spread matches the first-order propagation of each law', () => {
    // JCGM 100:2008 (GUM) 5.1.2: u(f)/f = ½ √(u(L)²/L² + u(C_tot)²/C_tot²) for f ∝ (L C)^−½;
    // uniform over ±a: u = a/√3 (GUM 4.3.7); normal with a = 3σ: u = a/3
    // (cut at 3σ: 0.986 σ, Johnson, Kotz & Balakrishnan, Continuous Univariate Distributions, vol. 1, 1994, ch. 13).
    const spec = { inductance: 10e-6, capacitance: 200e-12, inductanceTolerance: 0.02, capacitanceTolerance: 0.03, samples: 40000, seed: 5 };
    const u = toleranceSpread({ ...spec, distribution: 'uniform' });
    const expectedU = 0.5 * Math.sqrt((0.02 / Math.sqrt(3)) ** 2 + (0.03 / Math.sqrt(3)) ** 2) * u.frequency;
    near(u.monteCarlo.standardDeviation, expectedU, 0.03);
    const n = toleranceSpread({ ...spec, distribution: 'normal' });
    const expectedN = 0.986 * 0.5 * Math.sqrt((0.02 / 3) ** 2 + (0.03 / 3) ** 2) * n.frequency;
    near(n.monteCarlo.standardDeviation, expectedN, 0.03);
    // mean stays at the nominal to well under the spread
    near(u.monteCarlo.mean, u.frequency, 0.002);
    near(n.monteCarlo.mean, n.frequency, 0.002);
  });
  it('zero tolerance gives every unit the nominal frequency', () => {
    const s = toleranceSpread({ inductance: 1e-6, capacitance: 50e-12, inductanceTolerance: 0, capacitanceTolerance: 0, samples: 10 });
    for (const f of s.frequencies) near(f, thomson(1e-6, 50e-12));
    expect(s.monteCarlo.standardDeviation).toBe(0);
  });
});

describe('trimmer range', () => {
  const stray = 12e-12;
  const tol = { inductanceTolerance: 0.05, capacitanceTolerance: 0.05, strayTolerance: 0.25 };
  const r = resonantPairs({ frequency: 7.1e6, strayCapacitance: stray, shopCoils, count: 15, samples: 100, ...tol });

  /** The eight corners of one candidate's tolerance box with the trimmer's fixed capacitor. */
  const cornersOf = (c: PairCandidate) => {
    const out: Array<{ l: number; c: number }> = [];
    for (const sl of [-1, 1]) for (const sc of [-1, 1]) for (const ss of [-1, 1]) {
      out.push({
        l: c.inductor.inductance * (1 + sl * tol.inductanceTolerance),
        c: c.trimmer!.capacitor * (1 + sc * tol.capacitanceTolerance) + stray * (1 + ss * tol.strayTolerance) + c.inductor.selfCapacitance,
      });
    }
    return out;
  };

  it('pulls the extreme corners onto frequency (Thomson’s formula)', () => {
    for (const c of r.candidates) {
      expect(c.trimmer).not.toBeNull();
      const t = c.trimmer!;
      expect(t.minimum).toBeGreaterThanOrEqual(0);
      expect(t.maximum).toBeGreaterThanOrEqual(t.minimum);
      // the lowest unit (L, C and strays high) takes the least trimmer, the highest the most
      const lowUnit = { l: c.inductor.inductance * 1.05, c: t.capacitor * 1.05 + stray * 1.25 + c.inductor.selfCapacitance };
      const highUnit = { l: c.inductor.inductance * 0.95, c: t.capacitor * 0.95 + stray * 0.75 + c.inductor.selfCapacitance };
      near(thomson(lowUnit.l, lowUnit.c + t.minimum), 7.1e6, 1e-9);
      near(thomson(highUnit.l, highUnit.c + t.maximum), 7.1e6, 1e-9);
    }
  });
  it('every corner finds its setting within the range', () => {
    for (const c of r.candidates) {
      for (const k of cornersOf(c)) {
        const setting = 1 / ((2 * Math.PI * 7.1e6) ** 2 * k.l) - k.c;
        expect(setting).toBeGreaterThanOrEqual(c.trimmer!.minimum * (1 - 1e-9) - 1e-24);
        expect(setting).toBeLessThanOrEqual(c.trimmer!.maximum * (1 + 1e-9));
      }
    }
  });
  it('keeps the pair’s capacitor when it leaves room, else takes a lower E12 value', () => {
    // IEC 60063:2015 E12 mantissas
    const mantissa = (x: number) => Number((x / 10 ** Math.floor(Math.log10(x) + 1e-9)).toPrecision(6));
    for (const c of r.candidates) {
      const t = c.trimmer!;
      expect(t.capacitor).toBeLessThanOrEqual(c.capacitance);
      if (t.capacitor > 0) expect(E12).toContain(mantissa(t.capacitor));
      if (t.capacitor < c.capacitance) {
        // with the pair's own capacitor the lowest corner would need negative trimmer capacitance
        const need = 1 / ((2 * Math.PI * 7.1e6) ** 2 * c.inductor.inductance * 1.05) - (c.capacitance * 1.05 + stray * 1.25 + c.inductor.selfCapacitance);
        expect(need).toBeLessThan(0);
      }
    }
  });
  it('is null when the strays alone tune a unit below the target', () => {
    // 30 µH with 20 pF strays resonates at 6.5 MHz before any capacitor: nothing can pull it up to 7.1 MHz
    const s = resonantPairs({ frequency: 7.1e6, strayCapacitance: 20e-12, inductorSeries: 'none', shopCoils: [{ name: 'too big', inductance: 30e-6 }], count: 2, samples: 10 });
    expect(s.candidates.length).toBeGreaterThan(0);
    for (const c of s.candidates) expect(c.trimmer).toBeNull();
    expect(s.notes.some((n) => /smaller coil/.test(n.message))).toBe(true);
  });
});

/** The DesignError a call throws (fails the test if it returns or throws anything else). */
function designErrorOf(call: () => unknown, label: string): DesignError {
  let error: unknown;
  try {
    call();
  } catch (e) {
    error = e;
  }
  expect(error, label).toBeInstanceOf(DesignError);
  return error as DesignError;
}

describe('hostile input', () => {
  const good: PairSearch = { frequency: 7.1e6, samples: 20 };
  const HOSTILE: unknown[] = ['5', Number.NaN, null, Infinity, -Infinity, -1, 1e300];

  it('resonantPairs throws DesignError naming the field', () => {
    const fields = ['frequency', 'strayCapacitance', 'capacitanceTolerance', 'inductanceTolerance', 'strayTolerance', 'count', 'samples', 'seed'];
    for (const field of fields) {
      for (const bad of HOSTILE) {
        expect(designErrorOf(() => resonantPairs({ ...good, [field]: bad } as PairSearch), `${field} = ${String(bad)}`).field).toBe(field);
      }
    }
  });
  it('refuses bad shapes, series, laws, bands and coils', () => {
    const bad: Array<[unknown, string]> = [
      [null, 'spec'],
      ['7 MHz', 'spec'],
      [{}, 'frequency'],
      [{ frequency: 7e6, lowFrequency: 6e6 }, 'frequency'],
      [{ lowFrequency: 6.2e6, highFrequency: 5.9e6 }, 'highFrequency'],
      [{ lowFrequency: 5.9e6 }, 'highFrequency'],
      [{ ...good, capacitorSeries: 'E5' }, 'capacitorSeries'],
      [{ ...good, inductorSeries: 'E24' }, 'inductorSeries'],
      [{ ...good, inductorSeries: 'none' }, 'inductorSeries'],
      [{ ...good, distribution: 'gaussian' }, 'distribution'],
      [{ ...good, count: 2.5 }, 'count'],
      [{ ...good, count: 0 }, 'count'],
      [{ ...good, seed: -1 }, 'seed'],
      [{ ...good, capacitanceTolerance: 0.6 }, 'capacitanceTolerance'],
      [{ ...good, reactanceRange: { minimum: 500, maximum: 50 } }, 'reactanceRange.maximum'],
      [{ ...good, reactanceRange: null }, 'reactanceRange'],
      [{ ...good, shopCoils: 'coil' }, 'shopCoils'],
      [{ ...good, shopCoils: [null] }, 'shopCoils[0]'],
      [{ ...good, shopCoils: [{ name: '', inductance: 1e-6 }] }, 'shopCoils[0].name'],
      [{ ...good, shopCoils: [{ name: 'x', inductance: -1e-6 }] }, 'shopCoils[0].inductance'],
      [{ ...good, shopCoils: [{ name: 'x', inductance: 1e-6, selfCapacitance: Number.NaN }] }, 'shopCoils[0].selfCapacitance'],
    ];
    for (const [spec, field] of bad) {
      expect(designErrorOf(() => resonantPairs(spec as PairSearch), JSON.stringify(spec)).field).toBe(field);
    }
  });
  it('toleranceSpread throws DesignError naming the field', () => {
    const pair: ToleranceSpreadSpec = { inductance: 1e-6, capacitance: 100e-12, inductanceTolerance: 0.1, capacitanceTolerance: 0.1, samples: 10 };
    for (const field of ['inductance', 'capacitance', 'strayCapacitance', 'selfCapacitance', 'inductanceTolerance', 'capacitanceTolerance', 'strayTolerance', 'samples', 'seed']) {
      for (const bad of HOSTILE) {
        expect(designErrorOf(() => toleranceSpread({ ...pair, [field]: bad } as ToleranceSpreadSpec), `${field} = ${String(bad)}`).field).toBe(field);
      }
    }
    expect(() => toleranceSpread(undefined as unknown as ToleranceSpreadSpec)).toThrow(DesignError);
  });
  it('a frequency where no fixed pair fits returns no candidates and says why', () => {
    // 20 GHz: a 10 Ω … 3 kΩ reactance needs under 1 pF, below the fixed capacitors considered
    const r = resonantPairs({ frequency: 20e9, samples: 5 });
    expect(r.candidates).toEqual([]);
    expect(r.notes.some((n) => n.field === 'frequency')).toBe(true);
  });
});
