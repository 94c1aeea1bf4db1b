/**
 * The Band bench's field table and plan (components/benches/bandFields.ts,
 * bandPlan.ts, bandTracking.ts, bandPairs.ts, bandLinks.ts), in Node: the
 * link round trip of every combination of choices, a range typed backwards
 * refused at its field, the plan against Thomson's formula written here,
 * the coil wound by designCoil exactly as the Coil bench would, a
 * DesignError from the core shown at the field that fills or answers for its
 * path (every field), and the hand-off links read back by the Coil and Tank
 * benches' own tables. Routing and round trips are behaviour of our own
 * design, checked by hand; physical figures against Thomson's formula
 * (Terman 1943, section 3).
 */
import { describe, expect, it } from 'vitest';
import { designCoil } from '../../src/core/coil';
import { isDesignError } from '../../src/core/errors';
import { snapshotToSpec } from '../../components/kit/documents';
import {
  decodeLink, defaultChoices, defaultSnapshot, encodeLink, fieldByKey, fieldsInUse, pathsOf, readFieldTextSync, routeDesignError,
  type BenchSnapshot, type Choices, type ValueFieldDef,
} from '../../components/kit/fields';
import { BAND_FIELDS, CAPACITOR_KINDS, COIL_KEYS } from '../../components/benches/bandFields';
import { planBand, type BandPlan } from '../../components/benches/bandPlan';
import { trackBand } from '../../components/benches/bandTracking';
import { curvesOf, ownDialFor, slugFor } from '../../components/benches/bandCurves';
import { imageResponse } from '../../components/benches/bandImage';
import { pairsForBand } from '../../components/benches/bandPairs';
import { coilLink, matchLink, tankLink } from '../../components/benches/bandLinks';
import { MATCH_FIELDS } from '../../components/benches/matchFields';
import { matchSpecOf } from '../../components/benches/matchPlan';
import { resolveMatchTank } from '../../src/core/matchTank';
import { COIL_FIELDS } from '../../components/benches/coilFields';
import { TANK_FIELDS } from '../../components/benches/tankFields';
import { inUse, radioCombinations } from '../helpers/fields';
import { rel, thomson } from '../helpers/asserts';

const TABLE = BAND_FIELDS;

/** The table's state for some choices and texts (the rest at their defaults). */
function stateOf(choices: Choices, texts: Record<string, string> = {}): BenchSnapshot {
  const s = defaultSnapshot(TABLE, choices);
  return { choices: s.choices, texts: { ...s.texts, ...texts } };
}

interface Outcome { raw: Awaited<ReturnType<typeof snapshotToSpec>>['spec']; plan?: BandPlan; path?: string; message?: string }

/** The plan (and tracking and pairs) for a state, or the first DesignError's path and message. */
async function run(s: BenchSnapshot): Promise<Outcome> {
  const { spec: raw, errors } = await snapshotToSpec(TABLE, s);
  expect(errors).toEqual({});
  try {
    const plan = planBand(raw, s.choices);
    imageResponse(plan);
    trackBand(raw, s.choices);
    pairsForBand(raw);
    return { raw, plan };
  } catch (e) {
    if (!isDesignError(e)) throw e;
    return { raw, path: e.field, message: e.message };
  }
}

describe('Band field table', () => {
  it('shows the Coil bench’s own former and wire fields, their paths under coil.', () => {
    for (const key of COIL_KEYS) {
      const band = fieldByKey(TABLE, key)!;
      const coil = fieldByKey(COIL_FIELDS, key)!;
      expect(band.label).toBe(coil.label);
      expect(pathsOf(band)).toEqual(pathsOf(coil).map((p) => `coil.${p}`));
    }
  });

  it('no two fields in use fill one path, and each receives the errors on its own paths and those it answers for, for every combination of choices', () => {
    const combos = radioCombinations(TABLE);
    expect(combos.length).toBeGreaterThan(100);
    for (const choices of combos) {
      for (const kind of ['own', '365']) {
        const c = { ...choices, capType: kind };
        const used = fieldsInUse(TABLE, c);
        const paths = used.flatMap(pathsOf);
        expect(new Set(paths).size).toBe(paths.length);
        for (const f of used) {
          for (const p of pathsOf(f)) expect(routeDesignError(TABLE, c, p), p).toBe(f.key);
          for (const p of f.answers ?? []) {
            // a path some field in use fills goes there; the kind's answers go to the range while that is in use
            const filler = used.find((g) => pathsOf(g).includes(p));
            expect(routeDesignError(TABLE, c, p), p).toBe(filler?.key ?? (f.key === 'capType' && kind === 'own' ? 'C' : f.key));
          }
        }
        // the capacitor's errors always have a field: the range typed, or the kind chosen
        expect(routeDesignError(TABLE, c, 'minCapacitance')).toBe(kind === 'own' ? 'C' : 'capType');
        expect(routeDesignError(TABLE, c, 'band.maxCapacitance')).toBe(kind === 'own' ? 'C' : 'capType');
      }
    }
  });

  const typed = {
    band: '3.5–3.8 MHz', C: '12p..500p', margin: '1.5', IF: '1.6M', D: '0.5 in', p: '1.5 mm', OD: '20mm', ID: '10mm', h: '6 mm',
    mu: '8', mu2: '0.2', AL: '5n', mD: '12 mm', mlen: '6 mm', depth: '4 mm', wd: '0.71 mm', wod: '0.76 mm', lead: '0 mm', T: '-10',
    Qcoil: '150', capQ: '2000', Cs: '2*10p', Rs: '', Rload: '1M', tolC: '2', tolL: '', seed: '42',
  };
  it('every combination of choices survives the link, with ranges, blanks, negative numbers and calculations', () => {
    for (const choices of radioCombinations(TABLE)) {
      const s = stateOf(choices, typed);
      const d = decodeLink(TABLE, `?${encodeLink(TABLE, s)}`);
      expect(d.notices).toEqual([]);
      const back = { choices: { ...defaultChoices(TABLE), ...d.choices }, texts: { ...defaultSnapshot(TABLE).texts, ...d.texts } };
      expect(inUse(TABLE, back)).toEqual(inUse(TABLE, s));
    }
  });

  it('a range typed backwards is refused at its field, with the range the right way round; so is a link carrying one', () => {
    const band = fieldByKey(TABLE, 'band') as ValueFieldDef;
    const r = readFieldTextSync(band, '6.2M..5.9M', defaultChoices(TABLE));
    expect(r).toEqual({ kind: 'error', message: 'This range runs backwards: 6.2M is above 5.9M. Write the low end first: 5.9M..6.2M.' });
    expect(readFieldTextSync(band, '5.9–6.2 MHz', defaultChoices(TABLE))).toEqual({ kind: 'value', value: { low: 5.9e6, high: 6.2e6 } });
    const d = decodeLink(TABLE, '?band=6.2M..5.9M&C=365p..10p');
    expect(d.texts).toEqual({});
    expect(d.notices.join(' ')).toMatch(/band .*runs backwards.*capacitor range .*runs backwards/s);
  });
});

describe('Band plan', () => {
  it('covers the band asked, widened by the margin, by Thomson’s formula with the parts it gives (trimmer and padder)', async () => {
    const { plan } = await run(stateOf({}));
    const d = plan!.design;
    expect(d.arrangement).toBe('padder');
    // The tank's capacitance at each end of the capacitor, by series and parallel capacitance
    const total = (cv: number) => 15e-12 + (d.padderCapacitance! * (cv + d.trimmerCapacitance)) / (d.padderCapacitance! + cv + d.trimmerCapacitance);
    expect(rel(thomson(d.inductance, total(365e-12)), 5.9e6 * 0.98)).toBeLessThan(1e-9);
    expect(rel(thomson(d.inductance, total(10e-12)), 6.2e6 * 1.02)).toBeLessThan(1e-9);
  });

  it('a trimmer alone when asked: the capacitor and trimmer in parallel cover the band exactly', async () => {
    const { plan } = await run(stateOf({ arr: 'trimmer' }, { band: '3.5–7.3 MHz', margin: '0' }));
    const d = plan!.design;
    expect(d.padderCapacitance).toBeUndefined();
    expect(rel(thomson(d.inductance, 15e-12 + d.trimmerCapacitance + 365e-12), 3.5e6)).toBeLessThan(1e-9);
    expect(rel(thomson(d.inductance, 15e-12 + d.trimmerCapacitance + 10e-12), 7.3e6)).toBeLessThan(1e-9);
  });

  it('a capacitor chosen by kind is the same as its range typed', async () => {
    for (const [kind, , range] of CAPACITOR_KINDS) {
      const byKind = await run(stateOf({ capType: kind }, { band: '7..7.3M' }));
      const typedRange = await run(stateOf({ capType: 'own' }, { band: '7..7.3M', C: range }));
      expect(byKind.plan!.design).toEqual(typedRange.plan!.design);
    }
  });

  it('winds the coil as the Coil bench would: designCoil of the same spec, L the band’s, at mid-band', async () => {
    const { plan } = await run(stateOf({}));
    const spec = plan!.coilSpec;
    expect(spec).toMatchObject({ form: 'solenoid', inductance: plan!.design.inductance, closeWound: true });
    expect(designCoil(spec).turns).toBe(plan!.coil.turns);
    expect(Number.isInteger(plan!.coil.turns * 2)).toBe(true);
    // mid-band is the middle of the band covered
    expect(spec.frequency).toBeCloseTo((plan!.design.lowFrequency + plan!.design.highFrequency) / 2, 3);
  });

  it('selectivity: the loaded Q is below the unloaded Q, and B = f/Q_L within 1/Q_L² at each end (Terman 1943)', async () => {
    const { plan } = await run(stateOf({}));
    for (const p of [plan!.selectivity.low, plan!.selectivity.middle, plan!.selectivity.high]) {
      expect(p.loadedQ).toBeLessThan(p.unloadedQ);
      expect(rel(p.bandwidth, p.frequency / p.loadedQ)).toBeLessThan(2 / p.loadedQ ** 2 + 1e-3);
    }
    // the image (oscillator above: f + 2 IF) is rejected; a single tuned circuit gives about Q (x − 1/x), x = f_im/f, in amplitude (Terman 1943)
    const im = imageResponse(plan!)!.middle;
    const x = im.image / plan!.selectivity.middle.frequency;
    const rule = 20 * Math.log10(Math.hypot(1, plan!.selectivity.middle.loadedQ * (x - 1 / x)));
    expect(Math.abs(im.rejection - rule)).toBeLessThan(1.5);
  });

  it('the plotted curves agree with the plan at its points: dial ends on the band covered, selectivity and image at mid-band; worked out once', async () => {
    const { plan } = await run(stateOf({}));
    const c = curvesOf(plan!);
    expect(curvesOf(plan!)).toBe(c);
    const d = plan!.design;
    for (const law of [c.dial.slc, c.dial.slf]) {
      expect(rel(law.frequency[0], d.lowFrequency)).toBeLessThan(1e-12);
      expect(rel(law.frequency[law.frequency.length - 1], d.highFrequency)).toBeLessThan(1e-12);
    }
    const mid = (c.selectivity.frequency.length - 1) / 2;
    expect(rel(c.selectivity.frequency[mid], plan!.selectivity.middle.frequency)).toBeLessThan(1e-12);
    expect(rel(c.selectivity.loadedQ[mid], plan!.selectivity.middle.loadedQ)).toBeLessThan(1e-9);
    expect(c.image![mid]).toBeCloseTo(imageResponse(plan!)!.middle.rejection, 9);
  });

  it('no superhet: no image and no tracking', async () => {
    const { raw, plan } = await run(stateOf({ osc: 'none' }));
    expect(imageResponse(plan!)).toBeUndefined();
    expect(trackBand(raw, { ...defaultChoices(TABLE), osc: 'none' })).toBeNull();
  });

  it.each([['', 15e-12], ['27p', 27e-12]])('tracking (oscillator strays “%s”): the oscillator runs exactly at signal + IF at its three points, by Thomson’s formula with its own parts', async (cso, stray) => {
    const s = stateOf({ osc: 'above' }, { band: '0.55..1.6M', C: '10p..365p', IF: '455k', margin: '0', Cso: cso });
    const { raw } = await run(s);
    const t = trackBand(raw, s.choices)!.tracking;
    const o = t.oscillator;
    // blank: the signal circuit's 15 pF; given: its own
    expect(o.strayCapacitance).toBeCloseTo(stray, 18);
    const sig = planBand(raw, s.choices).design;
    const tank = (k: typeof o, cv: number) => k.strayCapacitance + (k.padderCapacitance * (cv + k.trimmerCapacitance)) / (k.padderCapacitance + cv + k.trimmerCapacitance);
    const sigTank = (cv: number) => sig.strayCapacitance + (sig.padderCapacitance === undefined ? cv + sig.trimmerCapacitance
      : (sig.padderCapacitance * (cv + sig.trimmerCapacitance)) / (sig.padderCapacitance + cv + sig.trimmerCapacitance));
    for (const f of t.trackingFrequencies) {
      // the gang setting that tunes the signal circuit to f, by bisection on Thomson's formula
      let lo = 10e-12;
      let hi = 365e-12;
      for (let i = 0; i < 200; i++) {
        const mid = (lo + hi) / 2;
        if (thomson(sig.inductance, sigTank(mid)) > f) lo = mid; else hi = mid;
      }
      expect(rel(thomson(o.inductance, tank(o, (lo + hi) / 2)), f + 455e3)).toBeLessThan(1e-7);
    }
  });
});

describe('Tuning slug and plate table', () => {
  // Thomson's formula (Terman 1943, section 3) with the designed network, written here.
  const network = (d: BandPlan['design'], cv: number) => d.strayCapacitance
    + (d.padderCapacitance === undefined ? cv + d.trimmerCapacitance : (d.padderCapacitance * (cv + d.trimmerCapacitance)) / (d.padderCapacitance + cv + d.trimmerCapacitance));

  it('a ±10 % slug moves the band by √(L/L′) without widening it, and sets the designed L for the band asked', async () => {
    const s = stateOf({}, { slug: '10' });
    const { raw, plan } = await run(s);
    const d = plan!.design;
    const slug = slugFor(raw, s.choices)!;
    expect(rel(slug.lowestFrequency, thomson(1.1 * d.inductance, network(d, d.maxCapacitance)))).toBeLessThan(1e-12);
    expect(rel(slug.highestFrequency, thomson(0.9 * d.inductance, network(d, d.minCapacitance)))).toBeLessThan(1e-12);
    expect(rel(slug.slugIn.frequencyRatio, slug.slugOut.frequencyRatio)).toBeLessThan(1e-12);
    // the band asked lies inside the designed one (the margin), so the designed L is inside the slug's window
    const set = slug.setting!;
    expect(set.withinSlugRange).toBe(true);
    expect(set.inductanceForLowEnd).toBeLessThanOrEqual(d.inductance * (1 + 1e-12));
    expect(set.inductanceForHighEnd).toBeGreaterThanOrEqual(d.inductance * (1 - 1e-12));
    expect(thomson(set.inductanceForLowEnd, network(d, d.maxCapacitance))).toBeCloseTo(d.requestedLowFrequency, 0);
  });

  it('no slug: none in the plan; a slug the core refuses is told at its field', async () => {
    const s = stateOf({});
    expect(slugFor((await run(s)).raw, s.choices)).toBeUndefined();
    const f = fieldByKey(TABLE, 'slug') as ValueFieldDef;
    expect(readFieldTextSync(f, '95', {}).kind).toBe('error');
    expect(readFieldTextSync(f, '0', {}).kind).toBe('error');
  });

  it('the user’s plate table: Thomson’s frequency at each of its points in the designed circuit', async () => {
    const s = stateOf({}, { plates: '0: 365p; 45°: 250p; 90: 150p; 135: 60p; 180: 10p' });
    const { raw, plan } = await run(s);
    const d = plan!.design;
    const law = ownDialFor(raw, s.choices)!;
    expect(law.plates).toBe('table');
    expect(law.percent[0]).toBe(0);
    expect(law.percent[law.percent.length - 1]).toBe(100);
    for (const [angle, c] of [[0, 365e-12], [45, 250e-12], [90, 150e-12], [135, 60e-12], [180, 10e-12]] as const) {
      const i = law.angle.findIndex((a: number) => Math.abs(a - angle) < 1e-9);
      expect(i, String(angle)).toBeGreaterThanOrEqual(0);
      expect(rel(law.frequency[i], thomson(d.inductance, network(d, c)))).toBeLessThan(1e-9);
    }
  });

  it('a plate table that does not fall steadily is told at its field; one off the capacitor’s range gets a note', async () => {
    const s = stateOf({}, { plates: '0: 365p; 90: 380p; 180: 10p' });
    const bad = await run(s);
    expect(bad.plan).toBeDefined(); // the plan stands; the table's own computation refuses it
    let refused: unknown;
    try {
      ownDialFor(bad.raw, s.choices);
    } catch (e) {
      refused = e;
    }
    expect(isDesignError(refused) && refused.field).toBe('plates');
    expect((refused as Error).message).toMatch(/steadily/);
    expect(routeDesignError(TABLE, defaultChoices(TABLE), 'plates')).toBe('plates');
    const o = stateOf({}, { plates: '0: 500p; 180: 15p' });
    const law = ownDialFor((await run(o)).raw, o.choices)!;
    expect(law.notes.some((n) => n.field === 'plates' && /another band/.test(n.message))).toBe(true);
  });

  it('a plate table’s text: points by semicolon, each an angle and a capacitance, refused with the point named', () => {
    const f = fieldByKey(TABLE, 'plates') as ValueFieldDef;
    const ok = readFieldTextSync(f, '0 365 pF; 90°=150p\n180: 10p', {});
    expect(ok).toEqual({ kind: 'value', value: [{ x: 0, y: 365e-12 }, { x: 90, y: 150e-12 }, { x: 180, y: 10e-12 }] });
    const cases: [string, RegExp][] = [
      ['0: 365p', /at least 2 points/],
      ['0: 365p; 90: 150 µH', /Point 2 .*capacitance/i],
      ['0: 365p; ninety: 150p', /Point 2 .*angle/],
      ['0: 365p; 90: -5p', /Point 2 .*greater than zero/],
      ['0: 365p; 90: 2*75p', /plain values/],
    ];
    for (const [text, re] of cases) {
      const r = readFieldTextSync(f, text, {});
      expect(r.kind, text).toBe('error');
      expect(r.kind === 'error' && r.message, text).toMatch(re);
    }
  });

  it('the plate table, slug and oscillator strays go through the link and back', () => {
    const s = stateOf({}, { plates: '0: 365p; 90: 150p; 180: 10p', slug: '8', Cso: '22p' });
    const d = decodeLink(TABLE, encodeLink(TABLE, s));
    expect(d.notices).toEqual([]);
    expect(d.texts).toMatchObject({ plates: '0: 365p; 90: 150p; 180: 10p', slug: '8', Cso: '22p' });
    expect(decodeLink(TABLE, 'plates=<img src=x onerror=alert(1)>').notices[0]).toMatch(/characters no table/);
  });
});

describe('Core errors land at the field that fills or answers for their path', () => {
  const cases: [string, Choices, Record<string, string>, string][] = [
    ['band', {}, { band: '1M..10M' }, 'highFrequency'],
    ['C', {}, { C: '1e-30..365p' }, 'minCapacitance'],
    ['Cs', {}, { Cs: '1e-30 F' }, 'strayCapacitance'],
    ['IF', { osc: 'below' }, { IF: '7 MHz' }, 'intermediateFrequency'],
    ['D', {}, { D: '200 m' }, 'coil.diameter'],
    ['p', { wind: 'pitch' }, { p: '0.3 mm' }, 'coil.pitch'],
    ['awg', { form: 'toroid', enamel: 'bare' }, { ID: '0.6 mm' }, 'coil.wire.diameter'],
    ['wd', { wire: 'mm' }, { wd: '1e-9 m' }, 'coil.wire.diameter'],
    ['wod', { wire: 'mm', enamel: 'measured' }, { wd: '0.5 mm', wod: '0.4 mm' }, 'coil.wire.insulatedDiameter'],
    ['Qcoil', { form: 'multilayer' }, { Qcoil: '' }, 'coilQ'],
    ['lead', {}, { lead: '200 m' }, 'coil.leadLength'],
  ];
  it.each(cases)('%s %j %j → %s', async (key, choices, texts, path) => {
    const s = stateOf(choices, texts);
    const r = await run(s);
    expect(r.path, r.message).toBe(path);
    expect(routeDesignError(TABLE, s.choices, r.path!)).toBe(key);
  });

  it('an impossible band names the widest ratio the capacitor gives, and what to change', async () => {
    const r = await run(stateOf({}, { band: '1M..10M' }));
    // √((365 + 15)/(10 + 15)) = 3.899 (Thomson's formula with no trimmer and no padder)
    expect(Math.sqrt(380 / 25)).toBeCloseTo(3.899, 3);
    expect(r.message).toMatch(/gives at most 3\.899/);
    expect(r.message).toMatch(/larger maximum|split the band/);
  });
});

describe('Hand-offs', () => {
  it('the Match bench reads the coil’s link with no notice: the same turns and the capacitance across it at mid-band (Thomson’s formula)', async () => {
    const s = stateOf({});
    const { plan } = await run(s);
    const href = matchLink(plan!);
    expect(href.startsWith('/match/?')).toBe(true);
    const d = decodeLink(MATCH_FIELDS, href.slice('/match/?'.length));
    expect(d.notices).toEqual([]);
    const { spec, errors } = await snapshotToSpec(MATCH_FIELDS, { choices: { ...defaultChoices(MATCH_FIELDS), ...d.choices }, texts: { ...defaultSnapshot(MATCH_FIELDS, d.choices).texts, ...d.texts } });
    expect(errors).toEqual({});
    const match = matchSpecOf(spec, { ...defaultChoices(MATCH_FIELDS), ...d.choices });
    const tank = resolveMatchTank(match);
    expect(tank.coil?.turns).toBe(plan!.coil.turns);
    // the capacitance carried resonates the band's L at mid-band; the Match bench tunes it with the coil's L at that
    // frequency (without the wire's internal inductance), so by Thomson's formula f = f_mid √(L_band / L_match)
    const expected = plan!.selectivity.middle.frequency * Math.sqrt(plan!.design.inductance / tank.inductance);
    expect(rel(tank.frequency, expected)).toBeLessThan(1e-4);
    expect(rel(tank.inductance, plan!.design.inductance)).toBeLessThan(0.02);
  });

  it('the Coil bench reads the coil’s link with no notice and winds the same coil', async () => {
    const s = stateOf({ wire: 'swg' });
    const { raw, plan } = await run(s);
    const href = coilLink(raw, s.choices, plan!);
    expect(href.startsWith('/coil/?')).toBe(true);
    const d = decodeLink(COIL_FIELDS, href.slice('/coil/?'.length));
    expect(d.notices).toEqual([]);
    expect(d.choices).toMatchObject({ form: 'solenoid', give: 'L', wire: 'swg', swg: '24' });
    const { spec: coilRaw, errors } = await snapshotToSpec(COIL_FIELDS, { choices: { ...defaultChoices(COIL_FIELDS), ...d.choices }, texts: { ...defaultSnapshot(COIL_FIELDS).texts, ...d.texts } });
    expect(errors).toEqual({});
    expect(rel(coilRaw.inductance as number, plan!.design.inductance)).toBeLessThan(1e-5);
    expect(coilRaw.diameter).toBe(0.01);
  });

  it('the Tank bench reads the tank’s link with no notice, and its L and C resonate at mid-band (Thomson’s formula)', async () => {
    const { plan } = await run(stateOf({}));
    const href = tankLink(plan!);
    const d = decodeLink(TANK_FIELDS, href.slice('/tank/?'.length));
    expect(d.notices).toEqual([]);
    const { spec, errors } = await snapshotToSpec(TANK_FIELDS, { choices: { ...defaultChoices(TANK_FIELDS), ...d.choices }, texts: { ...defaultSnapshot(TANK_FIELDS).texts, ...d.texts } });
    expect(errors).toEqual({});
    const f = thomson(spec.inductance as number, (spec.capacitance as number) + (spec.coilSelfCapacitance as number));
    expect(rel(f, plan!.selectivity.middle.frequency)).toBeLessThan(2e-5);
    expect(spec).toMatchObject({ mode: 'parallel', capacitorQ: 1000, sourceResistance: 20e3, loadResistance: 50e3 });
  });
});
