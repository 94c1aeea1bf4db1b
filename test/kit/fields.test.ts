/**
 * Field tables: the link codec, fields in use, documents and specs, and the
 * routing of a core DesignError (whose `field` is a spec path) to the field
 * that fills that path. Tables: the Resonance bench's own, and tables
 * modelled on the Coil and Tank benches and the band planner (sampleTables).
 * The behaviour checked is our own design (DESIGN.md, "One design, many
 * views"); expected values are worked by hand.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  applies, decodeLink, defaultChoices, defaultSnapshot, defineFields, encodeLink, fieldsInUse, pathsOf,
  readFieldTextSync, refuseLinkText, routeDesignError, type BenchSnapshot, type FieldTable,
} from '../../components/kit/fields';
import { documentToSnapshot, snapshotToDocument, snapshotToSpec, specToSnapshot } from '../../components/kit/documents';
import { RESONANCE_FIELDS } from '../../components/benches/ResonanceBench';
import { BAND_LIKE, COIL_LIKE, TANK_LIKE } from './sampleTables';
import { rel } from '../helpers/asserts';
import { inUse, radioCombinations } from '../helpers/fields';



function viaLink(table: FieldTable, s: BenchSnapshot): BenchSnapshot {
  const d = decodeLink(table, `?${encodeLink(table, s)}`);
  expect(d.notices).toEqual([]);
  const back = defaultSnapshot(table);
  Object.assign(back.choices, d.choices);
  Object.assign(back.texts, d.texts);
  return back;
}

function viaDocument(table: FieldTable, s: BenchSnapshot): BenchSnapshot {
  // through JSON, as a draft or an export would store it
  const stored = JSON.parse(JSON.stringify(snapshotToDocument(table, s)));
  const { snapshot, notices } = documentToSnapshot(table, stored);
  expect(notices).toEqual([]);
  return snapshot;
}

describe('defineFields', () => {
  it('refuses a table with a slip in it', () => {
    const q = { kind: 'quantity', unit: 'F', path: 'capacitance', label: 'C', default: '100 pF' } as const;
    expect(() => defineFields([{ ...q, key: 'C' }, { ...q, key: 'C' }])).toThrow(/declared twice/);
    expect(() => defineFields([{ ...q, key: 'C', default: '20' , unit: 'm' }])).toThrow(/no unit/);
    expect(() => defineFields([{ ...q, key: 'C', default: '' }])).toThrow(/needs a default/);
    expect(() => defineFields([{ ...q, key: 'C', path: 'a..b' }])).toThrow(/dotted name/);
    expect(() => defineFields([{ kind: 'choice', key: 'x', label: 'X', default: 'z', options: [['a', 'A']] }])).toThrow(/not an option/);
  });
  it('no two fields in use fill the same spec path, for every combination of choices', () => {
    for (const table of [RESONANCE_FIELDS, COIL_LIKE, TANK_LIKE, BAND_LIKE] as FieldTable[]) {
      for (const choices of radioCombinations(table)) {
        const paths = fieldsInUse(table, choices).flatMap(pathsOf);
        expect(new Set(paths).size).toBe(paths.length);
      }
    }
  });
});

describe('Resonance bench: link and spec round trips', () => {
  it('writes the fields in use, in table order, as typed', () => {
    expect(encodeLink(RESONANCE_FIELDS, defaultSnapshot(RESONANCE_FIELDS))).toBe('solve=C&f=7.1+MHz&L=4.7+%C2%B5H');
  });
  it.each([
    [{ solve: 'C' }, { f: '7.1 MHz', L: '4u7' }],
    [{ solve: 'L' }, { f: '455k', C: '2*100p' }],
    [{ solve: 'f' }, { L: '1/((2*pi*7.1MHz)^2 * 100pF)', C: '100p + 22p' }],
    [{ solve: 'C' }, { f: '10.7 MHz', L: '4.7 µH' }],
  ])('%j %j survives the link and a document', (choices, texts) => {
    const s: BenchSnapshot = { choices: { ...choices }, texts: { ...defaultSnapshot(RESONANCE_FIELDS).texts, ...texts } };
    expect(inUse(RESONANCE_FIELDS, viaLink(RESONANCE_FIELDS, s))).toEqual(inUse(RESONANCE_FIELDS, s));
    expect(inUse(RESONANCE_FIELDS, viaDocument(RESONANCE_FIELDS, s))).toEqual(inUse(RESONANCE_FIELDS, s));
  });
  it('an SI spec becomes field texts and reads back to the same spec', async () => {
    const spec = { solve: 'L', frequency: 455e3, capacitance: 2.2e-10 };
    const snapshot = specToSnapshot(RESONANCE_FIELDS, spec);
    expect(snapshot.choices.solve).toBe('L');
    expect(snapshot.texts.f).toBe('455 kHz');
    expect(snapshot.texts.C).toBe('220 pF');
    const back = await snapshotToSpec(RESONANCE_FIELDS, snapshot);
    expect(back.errors).toEqual({});
    expect(back.spec).toEqual(spec);
  });
  it('works out calculations when reading a spec', async () => {
    const { spec } = await snapshotToSpec(RESONANCE_FIELDS, { choices: { solve: 'f' }, texts: { L: '4u7', C: '2*47p' } });
    expect(spec.solve).toBe('f');
    expect(rel(spec.capacitance as number, 94e-12)).toBeLessThan(1e-12);
  }, 120_000);
  it('routes each core error to the field in use that fills its path, else to the general message', () => {
    const fill = { frequency: 'f', inductance: 'L', capacitance: 'C' } as const;
    for (const solve of ['f', 'L', 'C']) {
      for (const [path, key] of Object.entries(fill)) {
        expect(routeDesignError(RESONANCE_FIELDS, { solve }, path)).toBe(key === solve ? null : key);
      }
      expect(routeDesignError(RESONANCE_FIELDS, { solve }, 'series')).toBeNull();
    }
  });
});

describe('Coil-like table', () => {
  const typed = {
    L: '2*0.5u', N: '10.5', D: '0.5 in', p: '1.5 mm', OD: '20mm', ID: '10mm', h: '6 mm', mu: '8', mu2: '0.2', AL: '5n',
    mD: '12 mm', mlen: '6 mm', depth: '4 mm', wd: '0.71 mm', f: '3.6 MHz', lead: '0', T: '-10',
  };
  it('every combination of choices survives the link and a document, with negative temperatures and calculations', () => {
    for (const choices of radioCombinations(COIL_LIKE)) {
      for (const T of ['-10', '\u221240', '200', '-60']) {
        const s: BenchSnapshot = { choices, texts: { ...defaultSnapshot(COIL_LIKE).texts, ...typed, T } };
        expect(inUse(COIL_LIKE, viaLink(COIL_LIKE, s))).toEqual(inUse(COIL_LIKE, s));
        expect(inUse(COIL_LIKE, viaDocument(COIL_LIKE, s))).toEqual(inUse(COIL_LIKE, s));
      }
    }
  });
  it('reads ?T=-10 as the bench does (−60 to 200 °C)', () => {
    expect(decodeLink(COIL_LIKE, '?T=-10')).toMatchObject({ texts: { T: '-10' }, notices: [] });
    expect(decodeLink(COIL_LIKE, `?T=${encodeURIComponent('\u221210')}`)).toMatchObject({ texts: { T: '\u221210' }, notices: [] });
  });
  it.each([
    ['?T=250', 'Ignored the link’s value for wire temperature (“250”): Wire temperature must be between −60 and 200 °C; you typed “250”.'],
    ['?give=N&N=0', 'Ignored the link’s value for turns (“0”): Turns must be between 1 and 100000; you typed “0”.'],
    ['?give=N&N=10.3', 'Ignored the link’s value for turns (“10.3”): Turns must be a whole or half number (10 or 10.5); you typed “10.3”.'],
    ['?D=20', 'Ignored the link’s value for former diameter (“20”): “20” has no unit; did you mean 20 mm? A length needs its unit: mm, cm, m, in or mil.'],
    ['?D=-20mm', 'Ignored the link’s value for former diameter (“-20mm”): Former diameter must be greater than zero; you typed “-20mm”.'],
    ['?C=10p..365p', 'Ignored unknown link setting: C.'],
    ['?f=5.9M..6.2M', 'Ignored the link’s value for working frequency (“5.9M..6.2M”): A range is not allowed here: give one value, e.g. 5.9M.'],
    ['?awg=99', 'Ignored the link’s “gauge” setting “99”: expected one of 8, 9, 10, 11, 12, 13, 14, 15, 16, 17, 18, 19, 20, 21, 22, 23, 24, 25, 26, 27, 28, 29, 30, 31, 32, 33, 34, 35, 36, 37, 38, 39, 40.'],
  ])('refuses %s with a notice that quotes it', (query, notice) => {
    const d = decodeLink(COIL_LIKE, query);
    expect(d.notices).toEqual([notice]);
    expect(Object.keys(d.texts)).toEqual([]);
  });
  it('a value given without its choice picks that choice', () => {
    expect(decodeLink(COIL_LIKE, '?p=2mm').choices).toEqual({ form: 'solenoid', wind: 'pitch' });
    expect(decodeLink(COIL_LIKE, '?AL=5n').choices).toEqual({ form: 'toroid', core: 'al' });
    // …but never overrides a choice the link sets
    expect(decodeLink(COIL_LIKE, '?wind=close&p=2mm').choices).toEqual({ wind: 'close' });
  });
  it.each([
    [{ wind: 'pitch' }, 'pitch', 'p'],
    [{ wind: 'close' }, 'pitch', null], // close-wound: the pitch is the wire's, no field to show it at
    [{}, 'diameter', 'D'],
    [{ form: 'multilayer' }, 'diameter', 'mD'],
    [{ form: 'toroid' }, 'relativePermeability', 'mu'],
    [{ form: 'toroid' }, 'muReal', 'mu'], // a field answers for another name
    [{ form: 'toroid', core: 'al' }, 'al', 'AL'],
    [{ wire: 'mm' }, 'wire.diameter', 'wd'],
    [{ wire: 'awg' }, 'wire.diameter', 'awg'], // the gauge select answers for the diameter it sets
    [{ wire: 'swg' }, 'wire.diameter', 'swg'],
    [{ wire: 'mm' }, 'wire', 'wd'], // an error about the whole wire goes to its diameter
    [{}, 'temperature', 'T'],
    [{ give: 'N' }, 'turns', 'N'],
    [{ give: 'L' }, 'turns', null],
    [{}, 'form', 'form'],
    [{}, 'insulatedDiameter', null],
  ] as const)('routes a DesignError on %j %s to %s', (choices, path, key) => {
    expect(routeDesignError(COIL_LIKE, { ...defaultChoices(COIL_LIKE), ...choices }, path)).toBe(key);
  });
  it('every field in use receives the errors on its own path, for every combination of choices', () => {
    for (const choices of radioCombinations(COIL_LIKE)) {
      for (const f of fieldsInUse(COIL_LIKE, choices)) {
        for (const p of pathsOf(f)) expect(routeDesignError(COIL_LIKE, choices, p)).toBe(f.key);
      }
    }
  });
  it('hands a coil back from its SI spec (mean diameter, spaced, metric wire)', async () => {
    const spec = { form: 'solenoid', turns: 15, diameter: 0.0255, pitch: 0.002, wire: { diameter: 0.001 }, frequency: 5e6, leadLength: 0.01, temperature: -5 };
    const s = specToSnapshot(COIL_LIKE, spec, { give: 'N', dia: 'mean', wind: 'pitch', wire: 'mm' });
    expect(s.texts).toMatchObject({ N: '15', D: '25.5 mm', p: '2 mm', wd: '1 mm', f: '5 MHz', lead: '10 mm', T: '-5' });
    const back = await snapshotToSpec(COIL_LIKE, s);
    expect(back.errors).toEqual({});
    expect(back.spec).toEqual(spec);
  });
});

describe('Tank-like table', () => {
  it('a link with a loss value and no loss choice picks the choice (a coil handed over)', () => {
    const d = decodeLink(TANK_LIKE, '?L=4.7u&coilQ=150&Cself=3p&f=7.1M', { ...defaultChoices(TANK_LIKE), coilLoss: 'R' });
    expect(d.choices).toEqual({ coilLoss: 'Q' });
    expect(d.given).toEqual(['L', 'coilQ', 'Cself', 'f']);
    expect(decodeLink(TANK_LIKE, '?ESR=20m').choices).toEqual({ capLoss: 'ESR' });
  });
  it('a blank optional field whose default is not blank stays blank through the link', () => {
    const s = defaultSnapshot(TANK_LIKE);
    s.texts.Rs = '';
    const query = encodeLink(TANK_LIKE, s);
    expect(query).toContain('Rs=&');
    expect(viaLink(TANK_LIKE, s).texts.Rs).toBe('');
    expect(viaDocument(TANK_LIKE, s).texts.Rs).toBe('');
    // a required field sent blank is refused
    expect(decodeLink(TANK_LIKE, '?L=').notices).toEqual(['Ignored the link’s value for inductance (“”): empty, and this value is needed.']);
  });
  it('every combination of choices survives the link and a document, with expressions', () => {
    for (const choices of radioCombinations(TANK_LIKE)) {
      const s: BenchSnapshot = {
        choices,
        texts: { ...defaultSnapshot(TANK_LIKE).texts, C: '2*47p', Cself: '', Rs: '50', Rload: '2k2', f: '7.1M', V: '1 V', P: '100m', DF: '1e-3', Vrating: '' },
      };
      expect(inUse(TANK_LIKE, viaLink(TANK_LIKE, s))).toEqual(inUse(TANK_LIKE, s));
      expect(inUse(TANK_LIKE, viaDocument(TANK_LIKE, s))).toEqual(inUse(TANK_LIKE, s));
    }
  });
  it.each([
    [{ coilLoss: 'Q' }, 'coilResistance', 'coilQ'],
    [{ coilLoss: 'R' }, 'coilResistance', 'Rcoil'],
    [{ capLoss: 'Q' }, 'capacitorEsr', 'capQ'],
    [{ capLoss: 'ESR' }, 'capacitorEsr', 'ESR'],
    [{ capLoss: 'DF' }, 'capacitorEsr', 'DF'],
    [{}, 'sourceResistance', 'Rs'],
    [{}, 'capacitance', 'C'],
    [{ drive: 'V' }, 'drivePower', null],
    [{ drive: 'P' }, 'drivePower', 'P'],
  ] as const)('routes a DesignError on %j %s to %s', (choices, path, key) => {
    expect(routeDesignError(TANK_LIKE, { ...defaultChoices(TANK_LIKE), ...choices }, path)).toBe(key);
  });
  it('a stored document: numbers read as text, wrong shapes and hostile values refused with notices', () => {
    const { snapshot, notices } = documentToSnapshot(TANK_LIKE, {
      choices: { mode: 'series', coilLoss: 'Q' },
      spec: { inductance: '4u7', coilQ: 150, capacitance: { value: 1 }, sourceResistance: '<b>50</b>', loadResistance: '50' },
    });
    expect(snapshot.choices.mode).toBe('series');
    expect(snapshot.texts).toMatchObject({ L: '4u7', coilQ: '150', Rload: '50', C: '100 pF', Rs: '5 Ω' });
    expect(notices).toEqual([
      'Capacitance (capacitance): expected text such as “100 pF”.',
      'Source resistance (sourceResistance): contains characters no quantity uses.',
    ]);
    expect(documentToSnapshot(TANK_LIKE, 'x').notices).toEqual(['The stored design is not an object; the defaults are shown.']);
  });
});

describe('Band-like table: ranges', () => {
  it('a range field fills two spec paths', async () => {
    const { spec, errors } = await snapshotToSpec(BAND_LIKE, defaultSnapshot(BAND_LIKE));
    expect(errors).toEqual({});
    expect(spec).toEqual({ lowFrequency: 5.9e6, highFrequency: 6.2e6, minCapacitance: 10e-12, maxCapacitance: 365e-12, strayCapacitance: 15e-12, margin: 0.02 });
  });
  it('survives the link and a document; a document holds each end at its path', () => {
    const s = defaultSnapshot(BAND_LIKE);
    expect(viaLink(BAND_LIKE, s)).toEqual(s);
    expect(snapshotToDocument(BAND_LIKE, s).spec).toMatchObject({ lowFrequency: '5.9 MHz', highFrequency: '6.2 MHz', minCapacitance: '10p', maxCapacitance: '365p' });
    expect(viaDocument(BAND_LIKE, s).texts.cap).toBe('10p..365p');
  });
  it('refuses a backwards range in a link, and routes either end’s error to the field', () => {
    expect(decodeLink(BAND_LIKE, '?cap=365p..10p').notices).toEqual([
      'Ignored the link’s value for tuning capacitor (“365p..10p”): This range runs backwards: 365p is above 10p. Write the low end first: 10p..365p.',
    ]);
    expect(routeDesignError(BAND_LIKE, {}, 'maxCapacitance')).toBe('cap');
    expect(routeDesignError(BAND_LIKE, {}, 'lowFrequency')).toBe('band');
  });
  it('works out a calculation in a range', async () => {
    const { spec } = await snapshotToSpec(BAND_LIKE, { choices: {}, texts: { ...defaultSnapshot(BAND_LIKE).texts, cap: '2*5p..365p' } });
    expect(rel(spec.minCapacitance as number, 10e-12)).toBeLessThan(1e-12);
  }, 120_000);
});

describe('reading a field: one grammar for typing and links', () => {
  it('a field accepts in a link exactly what it accepts when typed (plain values)', () => {
    const texts = ['-10', '−10', '250', '20', '20 mm', '0', '1e999', '10.5', '4u7', '2,5', '10p..365p', '', ' 12 ', '+3'];
    for (const table of [COIL_LIKE, TANK_LIKE, RESONANCE_FIELDS, BAND_LIKE] as FieldTable[]) {
      const choices = defaultChoices(table);
      for (const f of table) {
        if (f.kind === 'choice') continue;
        for (const t of texts) {
          const typed = readFieldTextSync(f, t.trim(), choices).kind;
          const linked = refuseLinkText(f, t.trim(), choices) === null;
          expect(linked, `${f.key} ${t}`).toBe(typed === 'value' || typed === 'blank');
        }
      }
    }
  });
});

describe('decodeLink on any query (fuzz)', () => {
  const keys = fc.constantFrom(...COIL_LIKE.map((f) => f.key), ...TANK_LIKE.map((f) => f.key), '__proto__', 'constructor', 'x');
  const values = fc.oneof(
    fc.string({ maxLength: 200 }),
    fc.constantFrom('<script>alert(1)</script>', 'import(1)', '2*47p', '-10', '−10', '1e999', '10p..365p', 'sqrt(4u7/100p)', 'alert(1)', '"><img src=x>', '20', '0.5 mm'),
  );
  it('never throws; what passes is refused by no field and carries no markup; notices stay short', () => {
    for (const table of [COIL_LIKE, TANK_LIKE, BAND_LIKE, RESONANCE_FIELDS] as FieldTable[]) {
      fc.assert(fc.property(fc.array(fc.tuple(keys, values), { maxLength: 45 }), (pairs) => {
        const query = `?${pairs.map(([k, v]) => `${encodeURIComponent(k)}=${encodeURIComponent(v)}`).join('&')}`;
        const d = decodeLink(table, query);
        const choices = { ...defaultChoices(table), ...d.choices };
        for (const [key, text] of Object.entries(d.texts)) {
          const f = table.find((x) => x.key === key);
          expect(f).toBeDefined();
          expect(refuseLinkText(f!, text, choices)).toBeNull();
          expect(text).not.toMatch(/[<>&'`]/); // " stays: it is the inch mark
        }
        for (const [key, v] of Object.entries(d.choices)) {
          const f = table.find((x) => x.key === key);
          expect(f?.kind).toBe('choice');
          expect(f!.kind === 'choice' && f!.options.some(([o]) => o === v)).toBe(true);
        }
        for (const n of d.notices) expect(n.length).toBeLessThan(500);
        expect(Object.getPrototypeOf(d.texts)).toBe(Object.prototype);
      }), { numRuns: 300 });
    }
  });
  it('decoding what it encodes is the identity on the fields in use (any texts the fields accept)', () => {
    const accepted = fc.constantFrom('4u7', '100 pF', '2*47p', '7.1 MHz', '-10', '150', '0.5 mm', '10 kΩ', '1e-3', '12');
    fc.assert(fc.property(fc.dictionary(fc.constantFrom(...COIL_LIKE.map((f) => f.key)), accepted), fc.constantFrom(...radioCombinations(COIL_LIKE)), (texts, choices) => {
      const s: BenchSnapshot = { choices, texts: { ...defaultSnapshot(COIL_LIKE).texts, ...texts } };
      const d = decodeLink(COIL_LIKE, encodeLink(COIL_LIKE, s));
      const kept = inUse(COIL_LIKE, s);
      for (const [k, t] of Object.entries(kept.texts)) {
        const f = COIL_LIKE.find((x) => x.key === k)!;
        if (refuseLinkText(f, t, { ...defaultChoices(COIL_LIKE), ...choices }) === null) expect(d.texts[k]).toBe(t);
        else expect(d.texts[k]).toBeUndefined();
      }
    }), { numRuns: 300 });
  });
});

describe('applies', () => {
  it('reads a pattern of choices or a function', () => {
    const f = COIL_LIKE.find((x) => x.key === 'p')!;
    expect(applies(f, { form: 'solenoid', wind: 'pitch' })).toBe(true);
    expect(applies(f, { form: 'toroid', wind: 'pitch' })).toBe(false);
    expect(applies(RESONANCE_FIELDS[1], { solve: 'f' })).toBe(false);
  });
});
