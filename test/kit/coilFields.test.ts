/**
 * The Coil bench's field table and spec builder (components/benches/coilFields.ts, coilDesign.ts),
 * in Node: the link round trip of every combination of choices (negative
 * temperatures, calculations), the conversions of the spec builder (gauges,
 * enamel, former → mean diameter) against the published definitions, a
 * DesignError from the core shown at the field that fills its path for every
 * field, the way back from a DesignCoilSpec, and the hand-off to the Tank
 * bench. Routing and round trips are behaviour of our own design, checked by hand.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { designCoil, type DesignCoilResult, type DesignCoilSpec } from '../../src/core/coil';
import { isDesignError } from '../../src/core/errors';
import { enamelledDiameter } from '../../src/core/wire';
import { snapshotToSpec } from '../../components/kit/documents';
import {
  decodeLink, defaultChoices, defaultSnapshot, encodeLink, fieldsInUse, pathsOf, routeDesignError,
  type BenchSnapshot, type Choices, type FieldTable,
} from '../../components/kit/fields';
import { AWG_RANGE, COIL_FIELDS, SWG_RANGE, buildCoilSpec } from '../../components/benches/coilFields';
import { coilSnapshotFromSpec, designCoilFromFields, tankHandOff } from '../../components/benches/coilDesign';
import { rel, thomson } from '../helpers/asserts';

const TABLE = COIL_FIELDS as FieldTable;

/** Every combination of the table's radio choices (selects stay at their defaults, except the enamel's four). */
function combinations(): Record<string, string>[] {
  let combos: Record<string, string>[] = [defaultChoices(TABLE)];
  for (const f of TABLE) {
    if (f.kind !== 'choice' || (f.display === 'select' && f.key !== 'enamel')) continue;
    combos = combos.flatMap((c) => f.options.map(([v]) => ({ ...c, [f.key]: v })));
  }
  return combos;
}

/** What a link carries of a state: the fields in use. */
function inUse(s: BenchSnapshot): BenchSnapshot {
  const choices = { ...defaultChoices(TABLE), ...s.choices };
  const out: BenchSnapshot = { choices: {}, texts: {} };
  for (const f of fieldsInUse(TABLE, choices)) {
    if (f.kind === 'choice') out.choices[f.key] = choices[f.key];
    else out.texts[f.key] = (s.texts[f.key] ?? '').trim();
  }
  return out;
}

/** The table's state for some choices and texts (the rest at their defaults). */
function stateOf(choices: Choices, texts: Record<string, string> = {}): BenchSnapshot {
  const s = defaultSnapshot(TABLE, choices);
  return { choices: s.choices, texts: { ...s.texts, ...texts } };
}

/** ASTM B258: d = 0.127 mm × 92^((36 − n)/39), written here independently of the core. */
const awg = (n: number) => 0.127e-3 * 92 ** ((36 - n) / 39);

/** The spec of a state, and the design (or the DesignError's path and message). */
async function run(s: BenchSnapshot): Promise<{ spec: DesignCoilSpec; result?: DesignCoilResult; path?: string; message?: string }> {
  const { spec: raw, errors } = await snapshotToSpec(TABLE, s);
  expect(errors).toEqual({});
  const spec = buildCoilSpec(raw, s.choices);
  try {
    return { spec, result: designCoilFromFields(raw, s.choices) };
  } catch (e) {
    if (!isDesignError(e)) throw e;
    return { spec, path: e.field, message: e.message };
  }
}

describe('Coil field table', () => {
  it('brings none of the coil’s physics with it (the Tank bench imports it to read a coil’s link)', () => {
    const source = readFileSync(new URL('../../components/benches/coilFields.ts', import.meta.url), 'utf8');
    const imports = [...source.matchAll(/^import (type )?.*from '([^']+)';$/gm)].filter((m) => !m[1]).map((m) => m[2]);
    expect(imports).not.toContain('../../src/core/coil');
    expect(imports.filter((i) => i.startsWith('../../src/core/'))).toEqual(['../../src/core/errors', '../../src/core/wire']);
  });

  it('offers AWG 8–40 and SWG 10–48 as selects', () => {
    const opts = (key: string) => {
      const f = TABLE.find((x) => x.key === key);
      return f?.kind === 'choice' ? f.options.map(([v]) => Number(v)) : [];
    };
    expect(opts('awg')).toEqual(Array.from({ length: AWG_RANGE[1] - AWG_RANGE[0] + 1 }, (_, i) => 8 + i));
    expect(opts('awg').at(-1)).toBe(40);
    expect(opts('swg')[0]).toBe(10);
    expect(opts('swg').at(-1)).toBe(48);
    expect(SWG_RANGE).toEqual([10, 48]);
  });

  it('no two fields in use fill one spec path, and each receives the errors on its own paths, for every combination of choices', () => {
    for (const choices of combinations()) {
      const used = fieldsInUse(TABLE, choices);
      const paths = used.flatMap(pathsOf);
      expect(new Set(paths).size).toBe(paths.length);
      for (const f of used) for (const p of pathsOf(f)) expect(routeDesignError(TABLE, choices, p)).toBe(f.key);
      // the wire's diameters always have a field to show their errors
      expect(routeDesignError(TABLE, choices, 'wire.diameter')).toBe(choices.wire === 'mm' ? 'wd' : choices.wire);
      expect(routeDesignError(TABLE, choices, 'wire.insulatedDiameter')).toBe(choices.enamel === 'measured' ? 'wod' : 'enamel');
    }
  });

  const typed = {
    L: '2*0.5u', N: '10.5', D: '0.5 in', p: '1.5 mm', OD: '20mm', ID: '10mm', h: '6 mm', mu: '8', mu2: '0.2', AL: '5n',
    mD: '12 mm', mlen: '6 mm', depth: '4 mm', wd: '0.71 mm', wod: '0.76 mm', f: '3.6 MHz', lead: '0 mm',
  };
  it('every combination of choices survives the link, with negative temperatures and calculations', () => {
    for (const choices of combinations()) {
      for (const T of ['-10', '\u221240', '200', '-60']) {
        const s = stateOf(choices, { ...typed, T });
        const d = decodeLink(TABLE, `?${encodeLink(TABLE, s)}`);
        expect(d.notices).toEqual([]);
        expect(inUse({ choices: { ...defaultChoices(TABLE), ...d.choices }, texts: { ...defaultSnapshot(TABLE).texts, ...d.texts } })).toEqual(inUse(s));
      }
    }
  });

  it('reads ?T=-10 and refuses what the fields refuse, quoting it', () => {
    expect(decodeLink(TABLE, '?T=-10')).toMatchObject({ texts: { T: '-10' }, notices: [] });
    expect(decodeLink(TABLE, '?T=250').notices).toEqual(['Ignored the link’s value for wire temperature (“250”): Wire temperature must be between −60 and 200 °C; you typed “250”.']);
    expect(decodeLink(TABLE, '?D=-20mm').notices).toEqual(['Ignored the link’s value for former diameter (“-20mm”): Former diameter must be greater than zero; you typed “-20mm”.']);
    expect(decodeLink(TABLE, '?D=0mm').notices[0]).toMatch(/Former diameter must be greater than zero/);
    expect(decodeLink(TABLE, '?D=20').notices[0]).toMatch(/did you mean 20 mm\?/);
    expect(decodeLink(TABLE, '?swg=9').notices[0]).toMatch(/expected one of 10, 11, /);
  });
});

describe('Coil spec builder', () => {
  it('a gauge becomes the bare diameter: AWG by ASTM B258, SWG by the BS 3737 table', () => {
    for (const n of [8, 22, 24, 40]) {
      const spec = buildCoilSpec({}, { ...defaultChoices(TABLE), wire: 'awg', awg: String(n), enamel: 'bare' });
      expect(rel(spec.wire.diameter, awg(n))).toBeLessThan(1e-12);
      expect(spec.wire.insulatedDiameter).toBeUndefined();
    }
    // ASTM B258 as tabulated: AWG 22 = 0.6438 mm, AWG 24 = 0.5106 mm (4 figures)
    expect(buildCoilSpec({}, { ...defaultChoices(TABLE), wire: 'awg', awg: '22' }).wire.diameter).toBeCloseTo(0.6438e-3, 7);
    expect(buildCoilSpec({}, { ...defaultChoices(TABLE), wire: 'awg', awg: '24' }).wire.diameter).toBeCloseTo(0.5106e-3, 7);
    // BS 3737 (Imperial Standard Wire Gauge) in thousandths of an inch: 10 = 128, 22 = 28, 30 = 12.4, 48 = 1.6
    for (const [n, thou] of [[10, 128], [22, 28], [30, 12.4], [48, 1.6]] as const) {
      const d = buildCoilSpec({}, { ...defaultChoices(TABLE), wire: 'swg', swg: String(n) }).wire.diameter;
      expect(rel(d, thou * 25.4e-6)).toBeLessThan(1e-9);
    }
  });

  it('an enamel grade sets the overall diameter, a measured one is taken as typed, bare wire has none', () => {
    const raw = { wire: { diameter: 0.5e-3, insulatedDiameter: 0.56e-3 } };
    const c = { ...defaultChoices(TABLE), wire: 'mm' };
    expect(buildCoilSpec(raw, { ...c, enamel: '1' }).wire).toEqual({ diameter: 0.5e-3, insulatedDiameter: enamelledDiameter(0.5e-3, 1) });
    expect(buildCoilSpec(raw, { ...c, enamel: '2' }).wire).toEqual({ diameter: 0.5e-3, insulatedDiameter: enamelledDiameter(0.5e-3, 2) });
    expect(buildCoilSpec(raw, { ...c, enamel: 'measured' }).wire).toEqual({ diameter: 0.5e-3, insulatedDiameter: 0.56e-3 });
    expect(buildCoilSpec(raw, { ...c, enamel: 'bare' }).wire).toEqual({ diameter: 0.5e-3 });
  });

  it('a former diameter becomes the mean winding diameter: former + one overall wire diameter', async () => {
    const { spec } = await run(stateOf({ wire: 'mm', enamel: 'measured', wind: 'pitch' }, { D: '20 mm', wd: '1 mm', wod: '1.1 mm', p: '2 mm' }));
    expect(spec).toMatchObject({ form: 'solenoid', diameter: 0.0211, pitch: 0.002, wire: { diameter: 0.001, insulatedDiameter: 0.0011 } });
    expect(rel((spec as { diameter: number }).diameter, 0.0211)).toBeLessThan(1e-12);
    const mean = await run(stateOf({ wire: 'mm', enamel: 'bare', dia: 'mean' }, { D: '20 mm', wd: '1 mm' }));
    expect(mean.spec).toMatchObject({ diameter: 0.02, closeWound: true });
    expect('pitch' in mean.spec).toBe(false);
  });

  it('gives designCoil exactly the spec written by hand, for each form', async () => {
    const d22 = awg(22);
    const cases: [BenchSnapshot, DesignCoilSpec][] = [
      [stateOf({}), { form: 'solenoid', inductance: 1e-6, diameter: 0.01 + enamelledDiameter(d22, 1), closeWound: true, wire: { diameter: d22, insulatedDiameter: enamelledDiameter(d22, 1) }, frequency: 7.1e6, leadLength: 0.01, temperature: 20 }],
      [stateOf({ form: 'toroid', give: 'N', core: 'al', wire: 'mm', enamel: 'bare' }, { N: '20', AL: '5 nH', wd: '0.5 mm', mu: '', mu2: '' }),
        { form: 'toroid', turns: 20, outerDiameter: 12.7e-3, innerDiameter: 7.7e-3, height: 4.8e-3, al: 5e-9, wire: { diameter: 0.5e-3 }, frequency: 7.1e6, leadLength: 0.01, temperature: 20 }],
      [stateOf({ form: 'toroid' }, { T: '-10' }),
        { form: 'toroid', inductance: 1e-6, outerDiameter: 12.7e-3, innerDiameter: 7.7e-3, height: 4.8e-3, relativePermeability: 10, muImag: 0.1, wire: { diameter: d22, insulatedDiameter: enamelledDiameter(d22, 1) }, frequency: 7.1e6, leadLength: 0.01, temperature: -10 }],
      [stateOf({ form: 'multilayer', give: 'N' }, { N: '100' }),
        { form: 'multilayer', turns: 100, diameter: 12e-3, length: 6e-3, windingDepth: 4e-3, wire: { diameter: d22, insulatedDiameter: enamelledDiameter(d22, 1) }, frequency: 7.1e6, leadLength: 0.01, temperature: 20 }],
    ];
    for (const [state, expected] of cases) {
      const { spec, result } = await run(state);
      expect(Object.keys(spec).sort()).toEqual(Object.keys(expected).sort());
      for (const [k, v] of Object.entries(expected)) {
        if (typeof v === 'number') expect(rel((spec as unknown as Record<string, number>)[k], v), k).toBeLessThan(1e-12);
        else if (typeof v === 'object') expect(rel(spec.wire.diameter, v.diameter)).toBeLessThan(1e-12);
        else expect((spec as unknown as Record<string, unknown>)[k]).toBe(v);
      }
      expect(result).toEqual(designCoil(spec));
    }
  });
});

describe('Core errors land at the field that fills their path', () => {
  // A value each field accepts (it is a length, a frequency, a number in its range) that the core refuses:
  // lengths outside 1 µm … 100 m, inductances outside 1 pH … 1 kH, turns above 10⁷, a pitch closer than the wire,
  // a frequency above self-resonance, a wire thicker than a toroid's hole.
  const cases: [string, Choices, Record<string, string>, string][] = [
    ['L', { give: 'L' }, { L: '0.1p' }, 'inductance'],
    ['N', { give: 'N' }, { N: '2e7' }, 'turns'],
    ['D', { dia: 'mean' }, { D: '1e-9 m' }, 'diameter'],
    ['D', { dia: 'former' }, { D: '200 m' }, 'diameter'],
    ['p', { wind: 'pitch' }, { p: '0.3 mm' }, 'pitch'],
    ['OD', { form: 'toroid' }, { OD: '200 m' }, 'outerDiameter'],
    ['ID', { form: 'toroid' }, { ID: '1e-9 m' }, 'innerDiameter'],
    ['h', { form: 'toroid' }, { h: '1e-9 m' }, 'height'],
    ['mu', { form: 'toroid' }, { mu: '1e-4' }, 'relativePermeability'],
    ['mu', { form: 'toroid', core: 'mu' }, { mu: '' }, 'relativePermeability'],
    ['mu2', { form: 'toroid' }, { mu2: '2e7' }, 'muImag'],
    ['AL', { form: 'toroid', core: 'al' }, { AL: '1e-16 H' }, 'al'],
    ['mD', { form: 'multilayer' }, { mD: '1e-9 m' }, 'diameter'],
    ['mlen', { form: 'multilayer' }, { mlen: '1e-9 m' }, 'length'],
    ['depth', { form: 'multilayer' }, { depth: '1e-9 m' }, 'windingDepth'],
    ['wd', { wire: 'mm' }, { wd: '1e-9 m' }, 'wire.diameter'],
    ['wod', { wire: 'mm', enamel: 'measured' }, { wd: '0.5 mm', wod: '0.4 mm' }, 'wire.insulatedDiameter'],
    ['awg', { form: 'toroid', wire: 'awg', awg: '22', enamel: 'bare' }, { ID: '0.6 mm' }, 'wire.diameter'],
    ['swg', { form: 'toroid', wire: 'swg', swg: '24', enamel: 'bare' }, { ID: '0.5 mm' }, 'wire.diameter'],
    ['enamel', { form: 'toroid', wire: 'awg', awg: '22', enamel: '2' }, { ID: '0.67 mm' }, 'wire.insulatedDiameter'],
    ['f', {}, { f: '1e-4 Hz' }, 'frequency'],
    ['f', {}, { f: '2 GHz' }, 'frequency'],
    ['lead', {}, { lead: '200 m' }, 'leadLength'],
  ];
  it.each(cases)('%s %j %j → %s', async (key, choices, texts, path) => {
    const s = stateOf(choices, texts);
    const r = await run(s);
    expect(r.path, r.message).toBe(path);
    expect(routeDesignError(TABLE, s.choices, r.path!)).toBe(key);
  });
  it('covers every field that fills a spec path, except the form and the temperature, whose ranges lie inside the core’s', () => {
    const filling = TABLE.filter((f) => pathsOf(f).length > 0 || (f.answers ?? []).length > 0).map((f) => f.key);
    expect(new Set([...cases.map((c) => c[0]), 'form', 'T'])).toEqual(new Set(filling));
  });
  it('a mean diameter worked out from a former says so; bare wire too thick for the hole is the gauge’s', async () => {
    const former = await run(stateOf({}, { D: '200 m' }));
    expect(former.message).toMatch(/former diameter plus the wire’s 0\.692 mm overall diameter/);
    const hole = await run(stateOf({ form: 'toroid', enamel: 'bare' }, { ID: '0.6 mm' }));
    expect(hole.message).toMatch(/as thick as the core’s 0\.6 mm hole/);
  });
});

describe('From a DesignCoilSpec back to the bench', () => {
  const specs: DesignCoilSpec[] = [
    { form: 'solenoid', turns: 15, diameter: 0.0255, pitch: 0.002, wire: { diameter: 0.001 }, frequency: 5e6, leadLength: 0.01, temperature: -5 },
    { form: 'solenoid', inductance: 4.7e-6, diameter: 0.0207, closeWound: true, wire: { diameter: 0.5e-3, insulatedDiameter: 0.56e-3 }, frequency: 3.6e6, leadLength: 0, temperature: 20 },
    { form: 'toroid', turns: 30, outerDiameter: 0.02, innerDiameter: 0.01, height: 0.006, al: 4.9e-9, relativePermeability: 8, muImag: 0.2, wire: { diameter: 0.4e-3, insulatedDiameter: 0.45e-3 }, frequency: 1.8e6, leadLength: 0.02, temperature: 40 },
    { form: 'toroid', inductance: 2e-6, outerDiameter: 0.0127, innerDiameter: 0.0077, height: 0.0048, relativePermeability: 10, wire: { diameter: 0.5e-3 }, frequency: 7e6, leadLength: 0.01, temperature: 20 },
    { form: 'multilayer', inductance: 100e-6, diameter: 0.012, length: 0.006, windingDepth: 0.004, wire: { diameter: 0.2e-3, insulatedDiameter: 0.23e-3 }, frequency: 455e3, leadLength: 0.01, temperature: 20 },
  ];
  it.each(specs)('%j reads back to the same spec', async (spec) => {
    const snapshot = coilSnapshotFromSpec(spec);
    const { spec: raw, errors } = await snapshotToSpec(TABLE, snapshot);
    expect(errors).toEqual({});
    const back = buildCoilSpec(raw, snapshot.choices);
    expect(Object.keys(back).sort()).toEqual(Object.keys(spec).sort());
    expect(JSON.parse(JSON.stringify(back), (_k, v) => (typeof v === 'number' ? Number(v.toPrecision(9)) : v))).toEqual(spec);
    // and through the link
    const d = decodeLink(TABLE, `?${encodeLink(TABLE, snapshot)}`);
    expect(d.notices).toEqual([]);
  });
});

describe('Coil → Tank hand-off', () => {
  it.each([
    ['solenoid', stateOf({ give: 'N', dia: 'mean', wind: 'pitch', wire: 'mm', enamel: 'bare' }, { N: '15', D: '25 mm', p: '2 mm', wd: '1 mm', f: '6 MHz' })],
    ['toroid', stateOf({ form: 'toroid' }, { f: '3.6 MHz' })],
    ['multilayer', stateOf({ form: 'multilayer', give: 'N' }, { N: '200', f: '455 kHz' })],
  ])('%s: C resonates the coil at f with its self-capacitance; the coil’s own link rides along', async (_form, s) => {
    const { result } = await run(s);
    const query = encodeLink(TABLE, s);
    const h = tankHandOff(result!, query)!;
    const p = new URL(h.href, 'http://x').searchParams;
    expect(h.href.startsWith('/tank/?')).toBe(true);
    const L = Number(parseFloat(p.get('L')!)) * { nH: 1e-9, 'µH': 1e-6, mH: 1e-3 }[p.get('L')!.split(' ')[1] as 'nH']!;
    const C = h.capacitance!;
    const cs = result!.selfCapacitance ?? 0;
    // Thomson's formula (Terman 1943) with the tank's total capacitance C + C_s, L at f written to 5 figures
    expect(rel(thomson(L, C + cs), result!.frequency!)).toBeLessThan(5e-5);
    expect(p.get('C')).not.toBeNull();
    expect(p.get('coil')).toBe(query);
    const d = decodeLink(TABLE, p.get('coil')!);
    expect(d.notices).toEqual([]);
    expect(encodeLink(TABLE, { choices: { ...defaultChoices(TABLE), ...d.choices }, texts: { ...defaultSnapshot(TABLE).texts, ...d.texts } })).toBe(query);
    if (result!.form === 'multilayer') expect(p.get('coilQ')).toBeNull();
    else expect(Number(p.get('coilQ'))).toBe(Number(result!.q!.toPrecision(5)));
  });
  it('hands over no capacitance when the self-capacitance alone tunes below f', () => {
    // a coil result made up for the check: 10 µH with 30 pF of self-capacitance resonates at 9.19 MHz
    const r = { form: 'solenoid', turns: 40, inductance: 10e-6, inductanceAtFrequency: 10e-6, wireLength: 1, resistanceDc: 0.1, selfCapacitance: 30e-12, frequency: 10e6, notes: [] } as DesignCoilResult;
    const h = tankHandOff(r, 'form=solenoid')!;
    expect(h.capacitance).toBeUndefined();
    expect(new URL(h.href, 'http://x').searchParams.get('C')).toBeNull();
    expect(h.problem).toMatch(/No capacitance can tune this coil to 10 MHz/);
  });
});
