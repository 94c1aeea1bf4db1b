/**
 * The Tank bench's field table (components/benches/tankFields.ts): the link
 * and document round trips of its spec, the routing of every DesignError the
 * core raises for a value the field accepts, what the core is given (tankOf,
 * stressOf), the collapse note, and the coil handed over from the Coil bench.
 * Independent figures: Thomson's formula and R_D = Q ω L (Terman, Radio
 * Engineers' Handbook, 1943), 1/Q_u = Σ 1/Q_i (Pozar, Microwave Engineering),
 * and the transducer gain 4 R_s |V_load/V_s|² / R_load (Pozar), worked here.
 */
import { describe, expect, it } from 'vitest';
import {
  decodeLink, defaultChoices, defaultSnapshot, encodeLink, fieldsInUse, pathsOf, readFieldTextSync,
  routeDesignError, type BenchSnapshot, type FieldTable, type ValueFieldDef,
} from '../../components/kit/fields';
import { documentToSnapshot, snapshotToDocument, snapshotToSpec } from '../../components/kit/documents';
import { COIL_FIELDS, designCoilFromFields, tankHandOff } from '../../components/benches/coilFields';
import {
  collapseNoteOf, COIL_LINK_KEY, handOffGreeting, readCoilLink, splitCoilLink, stressOf, sweepSpan, SWEEP_POINTS, TANK_FIELDS, tankOf, withCoilLink,
  type TankSpec,
} from '../../components/benches/tankFields';
import { analyzeTank } from '../../src/core/tank';
import { tankStress } from '../../src/core/tankStress';
import { sweepTank } from '../../src/core/tankSweep';
import { COIL_LIKE } from './sampleTables';
import { fieldOf, rel, thomson } from '../helpers/asserts';
import { inUse as inUseOf, radioCombinations } from '../helpers/fields';

const inUse = (s: BenchSnapshot) => inUseOf(TANK_FIELDS, s);



/** The spec of a state, as the bench builds it. */
async function specOf(choices: Record<string, string>, texts: Record<string, string> = {}): Promise<TankSpec> {
  const all = { ...defaultChoices(TANK_FIELDS), ...choices };
  const s = defaultSnapshot(TANK_FIELDS, all);
  Object.assign(s.texts, texts);
  const { spec, errors } = await snapshotToSpec(TANK_FIELDS, s);
  expect(errors).toEqual({});
  return spec as unknown as TankSpec;
}

/** Runs what the bench runs for a spec: the analysis, the sweep of the plots, and the stress when driven. */
function runBench(spec: TankSpec): void {
  const tank = tankOf(spec);
  const a = analyzeTank(tank);
  sweepTank(tank, { ...sweepSpan(a.resonantFrequency, a.bandwidth), points: 51, spacing: 'log' });
  const driven = stressOf(spec);
  if (driven) tankStress(driven);
}

describe('Tank field table', () => {
  it('fills each spec path from one field only, for every combination of choices', () => {
    for (const choices of radioCombinations(TANK_FIELDS)) {
      const paths = fieldsInUse(TANK_FIELDS, choices).flatMap(pathsOf);
      expect(new Set(paths).size).toBe(paths.length);
    }
  });

  it('starts with no drive and no ratings, and terminations that follow the tank', () => {
    const s = defaultSnapshot(TANK_FIELDS);
    for (const key of ['V', 'P', 'Vrating', 'Irating']) expect(s.texts[key]).toBe('');
    expect(s.texts.Rs).toBe('10 kΩ');
    expect(defaultSnapshot(TANK_FIELDS, { mode: 'series' }).texts.Rload).toBe('5 Ω');
  });

  it('every combination of choices survives the link and a document, with expressions and blanks', () => {
    for (const choices of radioCombinations(TANK_FIELDS)) {
      const s: BenchSnapshot = {
        choices,
        texts: {
          ...defaultSnapshot(TANK_FIELDS, choices).texts,
          L: '1/((2*pi*7.1MHz)^2 * 100pF)', C: '2*47p', Cself: '', Rs: '50', Rload: '2k2', f: '7.1M',
          V: '1 V', P: '100m', DF: '1e-3', Vrating: '', Irating: '2 A',
        },
      };
      const d = decodeLink(TANK_FIELDS, `?${encodeLink(TANK_FIELDS, s)}`);
      expect(d.notices).toEqual([]);
      const back = defaultSnapshot(TANK_FIELDS, d.choices);
      Object.assign(back.choices, d.choices);
      Object.assign(back.texts, d.texts);
      expect(inUse(back)).toEqual(inUse(s));
      const stored = JSON.parse(JSON.stringify(snapshotToDocument(TANK_FIELDS, s)));
      const doc = documentToSnapshot(TANK_FIELDS, stored);
      expect(doc.notices).toEqual([]);
      expect(inUse(doc.snapshot)).toEqual(inUse(s));
    }
  });

  it('writes a blank termination into the link, so the default does not come back', () => {
    const s = defaultSnapshot(TANK_FIELDS);
    s.texts.Rload = '';
    const query = encodeLink(TANK_FIELDS, s);
    expect(new URLSearchParams(query).get('Rload')).toBe('');
    expect(decodeLink(TANK_FIELDS, query).texts.Rload).toBe('');
    // no drive, no ratings: nothing of them in the link but the choice
    expect(query).not.toMatch(/(^|&)(V|P|Vrating|Irating)=/);
  });

  it('a value given without its choice picks the choice (Rcoil → series resistance, P → power)', () => {
    const d = decodeLink(TANK_FIELDS, '?Rcoil=0.5&DF=2e-4&P=5');
    expect(d.choices).toEqual({ coilLoss: 'R', capLoss: 'DF', drive: 'P' });
    expect(d.notices).toEqual([]);
  });

  it('refuses link values the field would refuse, saying why', () => {
    const d = decodeLink(TANK_FIELDS, '?L=-4.7u&coilQ=0&C=100p..200p&Rs=10 mm&V=1e999');
    expect(d.texts).toEqual({});
    expect(d.notices).toHaveLength(5);
    expect(d.notices[0]).toBe('Ignored the link’s value for inductance (“-4.7u”): Inductance must be greater than zero; you typed “-4.7u”.');
    expect(d.notices.join(' ')).toMatch(/coil Q/);
    expect(d.notices.join(' ')).toMatch(/range is not allowed/);
  });
});

describe('Tank field table: every DesignError lands at the field that fills its path', () => {
  // 1e-30 and 1e30 of each field's unit: values the field accepts (greater than zero) and the
  // core refuses (every tank value lies in 1e-24 … 1e24 SI). A drive is given for the ratings,
  // which the core checks only for a driven tank.
  const cases: [Record<string, string>, ValueFieldDef][] = [];
  for (const choices of radioCombinations(TANK_FIELDS)) {
    for (const f of fieldsInUse(TANK_FIELDS, choices)) {
      if (f.kind === 'choice') continue;
      if (!cases.some(([, g]) => g.key === f.key)) cases.push([choices, f]);
    }
  }

  it('covers every value field of the table', () => {
    expect(cases.map(([, f]) => f.key).sort()).toEqual(TANK_FIELDS.filter((f) => f.kind !== 'choice').map((f) => f.key).sort());
  });

  it.each(cases.flatMap(([choices, f]) => ['1e-30', '1e30'].map((x) => [f.key, x, choices, f] as const)))(
    '%s = %s of its unit',
    async (key, x, choices, f) => {
      const text = f.kind === 'number' ? x : `${x} ${f.unit}`;
      expect(readFieldTextSync(f, text, choices).kind).toBe('value');
      const driven = key === 'Vrating' || key === 'Irating' ? { [choices.drive]: choices.drive === 'V' ? '1 V' : '1 W' } : {};
      const spec = await specOf(choices, { ...driven, [key]: text });
      const path = fieldOf(() => runBench(spec));
      expect(pathsOf(f)).toContain(path);
      expect(routeDesignError(TANK_FIELDS, { ...defaultChoices(TANK_FIELDS), ...choices }, path)).toBe(key);
    },
  );

  it('a loss so high that nothing resonates is shown at the loss field, whichever way it is given', async () => {
    for (const [choices, texts, key] of [
      [{ coilLoss: 'Q' }, { coilQ: '0.3' }, 'coilQ'],
      [{ coilLoss: 'R' }, { Rcoil: '1k' }, 'Rcoil'],
      [{ capLoss: 'DF' }, { DF: '5' }, 'DF'],
      [{ capLoss: 'ESR' }, { ESR: '1k' }, 'ESR'],
    ] as const) {
      const spec = await specOf(choices, { Rs: '', Rload: '', ...texts });
      const path = fieldOf(() => runBench(spec));
      expect(routeDesignError(TANK_FIELDS, { ...defaultChoices(TANK_FIELDS), ...choices }, path)).toBe(key);
    }
  });

  it('the cases found trying the bench: C = 1e-300 at the capacitance, L = 47m computes (no error anywhere)', async () => {
    const spec = await specOf({}, { C: '1e-300 F' });
    expect(routeDesignError(TANK_FIELDS, defaultChoices(TANK_FIELDS), fieldOf(() => runBench(spec)))).toBe('C');
    const big = await specOf({}, { L: '47m' });
    expect(() => runBench(big)).not.toThrow();
    // 47 mH and 100 pF: Thomson's formula (Terman 1943)
    expect(rel(analyzeTank(tankOf(big)).naturalFrequency, thomson(47e-3, 100e-12))).toBeLessThan(1e-12);
  });
});

describe('What the core is given', () => {
  it('the tank without the drive; a self-capacitance of 0 means neglected', async () => {
    const spec = await specOf({ drive: 'V' }, { Cself: '0', V: '2 V', Vrating: '500' });
    expect(spec.coilSelfCapacitance).toBe(0);
    expect(tankOf(spec)).toEqual({ mode: 'parallel', inductance: 4.7e-6, coilQ: 150, capacitance: 1e-10, capacitorQ: 1000, sourceResistance: 1e4, loadResistance: 1e4 });
    expect(stressOf(spec)).toEqual({ ...tankOf(spec), driveVoltage: 2, capacitorVoltageRating: 500 });
    expect(stressOf(await specOf({}, { Vrating: '500' }))).toBeNull();
    // 4.7 µH across 100 pF: Thomson's formula (Terman 1943)
    expect(rel(analyzeTank(tankOf(spec)).naturalFrequency, thomson(4.7e-6, 100e-12))).toBeLessThan(1e-12);
  });

  it('the sweep spans about six bandwidths each side, at most a decade', () => {
    expect(sweepSpan(1e6, 1e4)).toEqual({ start: 1e6 / 1.06, stop: 1e6 * 1.06 });
    expect(sweepSpan(1e6, 1e7)).toEqual({ start: 1e5, stop: 1e7 });
  });

  it('the plotted sweep, centred on the resonance, has its middle point on the |Z| peak', async () => {
    for (const texts of [{}, { Rs: '50', Rload: '' }, { coilQ: '5', Rs: '', Rload: '' }] as Record<string, string>[]) {
      const tank = tankOf(await specOf({}, texts));
      const a = analyzeTank(tank);
      const sw = sweepTank(tank, { ...sweepSpan(a.resonantFrequency, a.bandwidth), points: SWEEP_POINTS, spacing: 'log' });
      const mid = (SWEEP_POINTS - 1) / 2;
      expect(rel(sw.frequency[mid], a.resonantFrequency)).toBeLessThan(1e-12);
      expect(rel(sw.magnitude[mid], a.dynamicResistance)).toBeLessThan(1e-9);
      expect(Math.max(...sw.magnitude)).toBe(sw.magnitude[mid]);
    }
  });
});

describe('Losses between unequal terminations, and the collapse note', () => {
  // The default coil and capacitor (Q 150 and 1000) between a 50 Ω antenna and a 2 kΩ stage.
  const L = 4.7e-6, C = 100e-12, Rs = 50, Rl = 2000;
  const X = Math.sqrt(L / C); // ωL at resonance (Terman 1943)
  const Qu = 1 / (1 / 150 + 1 / 1000); // Pozar: 1/Q_u = Σ 1/Q_i
  const RD = Qu * X; // Terman 1943: R_D = Q ω L
  const Rp = (RD * Rl) / (RD + Rl); // what the source sees at resonance
  // Pozar, transducer gain: 4 R_s |V_load/V_s|² / R_load, V_load/V_s = R_p/(R_s + R_p)
  const transducer = -10 * Math.log10((4 * Rs * (Rp / (Rs + Rp)) ** 2) / Rl);
  const gamma = (Rp - Rs) / (Rp + Rs);

  it('headline: transducer loss ≈ 10.2 dB = mismatch + dissipative, while the equal-termination rule says 0.017 dB', async () => {
    const a = analyzeTank(tankOf(await specOf({}, { Rs: '50', Rload: '2k' })));
    expect(transducer).toBeCloseTo(10.2, 1);
    expect(Math.abs(a.transducerLoss! - transducer)).toBeLessThan(0.01);
    expect(Math.abs(a.mismatchLoss! - -10 * Math.log10(1 - gamma ** 2))).toBeLessThan(0.01);
    expect(Math.abs(a.dissipativeLoss! - -10 * Math.log10(RD / (RD + Rl)))).toBeLessThan(0.01);
    // the single-resonator rule, −20 log10(1 − Q_L/Q_u) (common practice, no published source)
    const QL = 1 / (1 / Qu + X / ((Rs * Rl) / (Rs + Rl)));
    expect(a.insertionLoss!).toBeCloseTo(-20 * Math.log10(1 - QL / Qu), 3);
    expect(a.insertionLoss!).toBeLessThan(0.02);
  });

  it('a 50 Ω antenna straight across a 4.7 µH tank collapses it; the note names the source', async () => {
    const a = analyzeTank(tankOf(await specOf({}, { Rs: '50', Rload: '' })));
    expect(a.terminationsCollapse).toBe(true);
    const n = collapseNoteOf(a)!;
    expect(n.field).toBe('sourceResistance');
    expect(n.message).toMatch(/tap/);
    expect(routeDesignError(TANK_FIELDS, defaultChoices(TANK_FIELDS), n.field!)).toBe('Rs');
    // 10 kΩ either side of the same tank: loaded Q about 30, no collapse
    expect(collapseNoteOf(analyzeTank(tankOf(await specOf({}))))).toBeUndefined();
  });
});

describe('A coil handed over from the Coil bench', () => {
  const coilQuery = 'form=solenoid&give=L&L=4.7+%C2%B5H&D=25+mm&wind=pitch&p=1.2+mm&wire=awg&awg=22&f=7.1+MHz&T=-10';

  it('splits the coil’s query from the Tank link and puts it back', () => {
    const tank = 'L=4.7+%C2%B5H&coilQ=180&C=106.9p';
    const both = withCoilLink(tank, coilQuery);
    expect(new URLSearchParams(both).get(COIL_LINK_KEY)).toBe(coilQuery);
    expect(splitCoilLink(`?${both}`)).toEqual({ rest: tank, coil: coilQuery });
    expect(splitCoilLink('?L=1u')).toEqual({ rest: 'L=1u', coil: undefined });
    expect(withCoilLink(tank, undefined)).toBe(tank);
    // the rest reads against the Tank table without notices
    expect(decodeLink(TANK_FIELDS, splitCoilLink(`?${both}`).rest).notices).toEqual([]);
  });

  it('reads the coil with the coil bench’s table and writes it again, fields in use only', () => {
    const r = readCoilLink(COIL_LIKE, coilQuery);
    expect('query' in r).toBe(true);
    const back = new URLSearchParams((r as { query: string }).query);
    expect(back.get('D')).toBe('25 mm');
    expect(back.get('p')).toBe('1.2 mm');
    expect(back.get('T')).toBe('-10');
    expect(back.get('form')).toBe('solenoid');
    // fields of other forms are not written
    expect(back.has('OD')).toBe(false);
    // the query read again gives the same coil
    expect(readCoilLink(COIL_LIKE, back.toString())).toEqual(r);
  });

  it.each([
    ['markup', 'L=<script>window.__pwned=1</script>'],
    ['an unknown key', 'form=solenoid&zap=1'],
    ['a value the field refuses', 'D=20'],
    ['a choice that is not an option', 'form=<img src=x>'],
    ['nothing', ''],
    ['too long', `L=${'9'.repeat(1200)}`],
  ])('refuses the whole coil for %s, with a notice', (_what, text) => {
    const r = readCoilLink(COIL_LIKE, text);
    expect('notice' in r).toBe(true);
    expect((r as { notice: string }).notice).toMatch(/^Ignored the link’s coil from the Coil bench/);
  });

  it('the coil’s working frequency and C from the Coil bench resonate the tank there (Thomson, Terman 1943)', async () => {
    // The Coil bench sets C = 1/((2π f)² L) − C_s; the tank's resonance is then f.
    const f = 7.1e6, Lc = 4.7e-6, Cs = 3.2e-12;
    const Ct = 1 / ((2 * Math.PI * f) ** 2 * Lc) - Cs;
    const d = decodeLink(TANK_FIELDS, `?L=4.7u&coilQ=180&Cself=3.2p&f=7.1M&C=${Ct}F`);
    expect(d.notices).toEqual([]);
    const spec = await specOf(d.choices, d.texts);
    expect(rel(analyzeTank(tankOf(spec)).naturalFrequency, f)).toBeLessThan(1e-9);
    expect(rel(thomson(Lc, Ct + Cs), f)).toBeLessThan(1e-12);
  });

  it('a coil table value is never taken as a tank value', () => {
    // the Tank table has no key named like the coil's link key
    expect(TANK_FIELDS.some((f) => (f.key as string) === COIL_LINK_KEY)).toBe(false);
    expect(decodeLink(TANK_FIELDS, `?${COIL_LINK_KEY}=x`).notices[0]).toMatch(/unknown/);
  });
});


describe('The hand-off from the Coil bench and the way back, with the Coil bench’s own table', () => {
  const COIL = COIL_FIELDS as FieldTable;
  it.each([
    ['solenoid', {}, {}],
    ['solenoid, spaced, SWG, cold', { wind: 'pitch', wire: 'swg' }, { p: '1.5 mm', f: '3.6 MHz', T: '-20' }],
    ['toroid on AL', { form: 'toroid', core: 'al' }, { AL: '4.9 nH', L: '2.2u', f: '10.1M' }],
    ['multilayer', { form: 'multilayer' }, { L: '100u', f: '1M' }],
  ] as const)('%s: the tank resonates at the coil’s frequency, and the coil comes back whole', async (_what, choices, texts) => {
    const all = { ...defaultChoices(COIL), ...choices };
    const coilState: BenchSnapshot = { choices: all, texts: { ...defaultSnapshot(COIL, all).texts, ...texts } };
    const { spec: raw, errors } = await snapshotToSpec(COIL, coilState);
    expect(errors).toEqual({});
    const coilResult = designCoilFromFields(raw, all);
    const coilQuery = encodeLink(COIL, coilState);
    const href = tankHandOff(coilResult, coilQuery)!.href;
    const { rest, coil } = splitCoilLink(new URL(href, 'http://bench').search);
    // the tank's part reads against the Tank table without a notice
    const d = decodeLink(TANK_FIELDS, rest);
    expect(d.notices).toEqual([]);
    const a = analyzeTank(tankOf(await specOf(d.choices, d.texts)));
    // the |Z| peak of the tank built from the coil is at the coil's working frequency (within 0.5 %)
    expect(rel(a.resonantFrequency, coilResult.frequency!)).toBeLessThan(5e-3);
    // the way back: the coil's query read with its own table and written again is the coil's own link
    const back = readCoilLink(COIL, coil!);
    expect(back).toEqual({ query: coilQuery });
    expect(handOffGreeting(d.texts)).toMatch(/^Coil from the Coil bench: L = /);
    if (d.texts.coilQ === undefined) expect(handOffGreeting(d.texts)).toMatch(/coil’s Q \(not carried\)/);
  });
});
