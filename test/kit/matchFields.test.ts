/**
 * The Match bench's field table and plan (components/benches/matchFields.ts,
 * matchPlan.ts, matchCurves.ts, matchLinks.ts), in Node: the link round trip
 * of every combination of choices, every path designMatch may name routed to
 * a field in use, the core's refusals (a tap beyond the coil, a source the
 * tank cannot step down to, a loaded Q above the unloaded Q, …) shown at the
 * field that caused them, the plan against figures worked out here from
 * published formulas, and the hand-off link read back by the bench's own
 * table. Routing and round trips are behaviour of our own design, checked by
 * hand. Physical checks name their source beside them.
 */
import { describe, expect, it } from 'vitest';
import { designCoil, type DesignCoilSpec } from '../../src/core/coil';
import { isDesignError } from '../../src/core/errors';
import { MATCH_SPEC_FIELDS } from '../../src/core/matching';
import { awgDiameter, enamelledDiameter, swgDiameter } from '../../src/core/wire';
import { snapshotToSpec } from '../../components/kit/documents';
import {
  decodeLink, defaultChoices, defaultSnapshot, encodeLink, fieldByKey, fieldsInUse, pathsOf, routeDesignError,
  type BenchSnapshot, type Choices,
} from '../../components/kit/fields';
import { COIL_KEYS, MATCH_FIELDS } from '../../components/benches/matchFields';
import {
  matchLinkFor, matchSpecOf, meetsGoal, OPTION_KINDS, planAnswer, planOption, Q_TOLERANCE, type BuiltOption, type MatchPlan,
} from '../../components/benches/matchPlan';
import { CURVE_POINTS, returnLossCurves } from '../../components/benches/matchCurves';
import { COIL_FIELDS } from '../../components/benches/coilFields';
import { inUse, radioCombinations } from '../helpers/fields';
import { rel, thomson } from '../helpers/asserts';

const TABLE = MATCH_FIELDS;

/** The table's state for some choices and texts (the rest at their defaults). */
function stateOf(choices: Choices, texts: Record<string, string> = {}): BenchSnapshot {
  const s = defaultSnapshot(TABLE, choices);
  return { choices: s.choices, texts: { ...s.texts, ...texts } };
}

type Raw = Awaited<ReturnType<typeof snapshotToSpec>>['spec'];
interface Outcome { raw: Raw; plan?: MatchPlan; path?: string; message?: string }

/** The answer and every option for a state, or the first DesignError's path and message. */
async function run(s: BenchSnapshot): Promise<Outcome> {
  const { spec: raw, errors } = await snapshotToSpec(TABLE, s);
  expect(errors).toEqual({});
  try {
    const plan = planAnswer(raw, s.choices);
    for (const kind of OPTION_KINDS) planOption(raw, s.choices, kind);
    return { raw, plan };
  } catch (e) {
    if (!isDesignError(e)) throw e;
    return { raw, path: e.field, message: e.message };
  }
}

/** An option of a state's plan, which must be buildable. */
async function optionOf<K extends BuiltOption['kind']>(s: BenchSnapshot, kind: K): Promise<BuiltOption & { kind: K }> {
  const { raw } = await run(s);
  const o = planOption(raw, s.choices, kind);
  expect(o.available, o.available ? '' : o.reason).toBe(true);
  return o as BuiltOption & { kind: K };
}

const TWO_PI = 2 * Math.PI;

describe('Match field table', () => {
  it('shows the Coil bench’s own single-layer fields, their paths under coil., only for a single-layer coil', () => {
    for (const key of COIL_KEYS) {
      const match = fieldByKey(TABLE, key)!;
      const coil = fieldByKey(COIL_FIELDS, key)!;
      expect(match.label).toBe(coil.label);
      expect(pathsOf(match)).toEqual(pathsOf(coil).map((p) => `coil.${p}`));
      expect(fieldsInUse(TABLE, { ...defaultChoices(TABLE), coilBy: 'L' }).some((f) => f.key === key)).toBe(false);
    }
  });

  it('no two fields in use fill one path; every path designMatch may name reaches a field in use, for every combination of choices', () => {
    const combos = radioCombinations(TABLE);
    expect(combos.length).toBeGreaterThan(200);
    const coilPaths = COIL_KEYS.flatMap((k) => pathsOf(fieldByKey(TABLE, k)!));
    const corePaths = [...MATCH_SPEC_FIELDS, 'frequency', 'tank.capacitance', 'tank.inductance', 'coil.frequency', 'coil.form', 'coil.turns', 'coil.inductance', ...coilPaths];
    for (const c of combos) {
      const used = fieldsInUse(TABLE, c);
      const paths = used.flatMap(pathsOf);
      expect(new Set(paths).size).toBe(paths.length);
      // a path a field in use fills goes to that field
      for (const f of used) for (const p of pathsOf(f)) expect(routeDesignError(TABLE, c, p), p).toBe(f.key);
      // (the coil's own paths arise only with a single-layer coil: a coil given by its inductance has no coil spec)
      for (const p of corePaths.filter((x) => c.coilBy === 'solenoid' || !x.startsWith('coil.'))) {
        const key = routeDesignError(TABLE, c, p);
        expect(key, `${p} with ${JSON.stringify(c)}`).not.toBeNull();
        expect(used.some((f) => f.key === key)).toBe(true);
      }
    }
  });

  const typed = {
    L: '10u', N: '22.5', D: '0.5 in', p: '1.5 mm', wd: '0.71 mm', wod: '0.76 mm', lead: '0 mm', T: '-10', Lc: '2*4u7', C: '2*47p', f: '3.6M',
    Qu: '', capQ: '', Rs: '75', Rload: '', loadTap: '3.5', QL: '8.5', lkD: '', lkPos: '-2 mm', lkN: '2',
  };
  it('every combination of choices survives the link, with blanks, negative numbers and calculations', () => {
    for (const choices of radioCombinations(TABLE)) {
      for (const build of ['best', 'link']) {
        const s = stateOf({ ...choices, build }, typed);
        const d = decodeLink(TABLE, `?${encodeLink(TABLE, s)}`);
        expect(d.notices).toEqual([]);
        const back = { choices: { ...defaultChoices(TABLE), ...d.choices }, texts: { ...defaultSnapshot(TABLE).texts, ...d.texts } };
        expect(inUse(TABLE, back)).toEqual(inUse(TABLE, s));
      }
    }
  });

  it('a value given without its choice picks the choice (a frequency tunes by frequency; a coil inductance means no geometry)', () => {
    expect(decodeLink(TABLE, 'f=7.1M').choices).toMatchObject({ tune: 'f' });
    expect(decodeLink(TABLE, 'Lc=10u').choices).toMatchObject({ coilBy: 'L' });
    expect(decodeLink(TABLE, 'loadTap=4').choices).toMatchObject({ coilBy: 'solenoid', loadAt: 'tap' });
    expect(decodeLink(TABLE, 'Rs=<b>50</b>').notices[0]).toMatch(/characters no quantity uses/);
  });
});

describe('Match plan', () => {
  it('the tank resonates where Thomson’s formula puts it with the coil’s inductance at f₀, and R_D = Q_u ω₀ L (Terman 1943)', async () => {
    const { plan } = await run(stateOf({}));
    const t = plan!.design.tank;
    // designCoil at the resonance gives the inductance there (skin effect included)
    const wound = designCoil({ ...matchSpecOf((await run(stateOf({}))).raw, stateOf({}).choices).coil!, frequency: t.frequency } as DesignCoilSpec);
    expect(rel(t.inductance, wound.inductanceAtFrequency!)).toBeLessThan(1e-6);
    expect(rel(thomson(t.inductance, 100e-12), t.frequency)).toBeLessThan(1e-9);
    expect(rel(t.dynamicResistance, t.unloadedQ * TWO_PI * t.frequency * t.inductance)).toBeLessThan(1e-12);
    // the coil's Q with the capacitor's 1000: 1/Q_u = 1/Q_coil + 1/Q_C (Pozar)
    expect(rel(1 / t.unloadedQ, 1 / wound.q! + 1 / 1000)).toBeLessThan(1e-3);
  });

  it('tuned by its frequency: the capacitance worked out resonates the coil there (Thomson’s formula)', async () => {
    const { plan } = await run(stateOf({ tune: 'f' }, { f: '3.6 MHz' }));
    expect(rel(thomson(plan!.design.tank.inductance, plan!.tuningCapacitance!), 3.6e6)).toBeLessThan(1e-6);
    expect(rel(plan!.design.tank.frequency, 3.6e6)).toBeLessThan(1e-6);
    // a bare inductance too
    const bare = await run(stateOf({ coilBy: 'L', tune: 'f' }, { Lc: '10u', f: '3.6M' }));
    expect(rel(thomson(10e-6, bare.plan!.tuningCapacitance!), 3.6e6)).toBeLessThan(1e-12);
  });

  it('the antenna straight across collapses the tank: 1/Q_L = 1/Q_u + ω₀L (1/R_s + 1/R_load) (Pozar), well below one, as the issue found', async () => {
    const { plan } = await run(stateOf({}));
    const t = plan!.design.tank;
    const q = 1 / (1 / t.unloadedQ + t.reactance * (1 / 50 + 1 / 1000));
    expect(rel(plan!.design.direct.loadedQ, q)).toBeLessThan(1e-12);
    expect(q).toBeLessThan(0.3);
    expect(rel(plan!.design.direct.bandwidth, t.frequency / q)).toBeLessThan(1e-12);
  });

  it('the recommended tap gives the loaded Q asked: the estimate by 1/Q_L = 1/Q_u + Σ 1/Q_e with R′ = n²R (Pozar; Terman 1943), the full circuit within 25 %', async () => {
    const { plan } = await run(stateOf({}));
    const o = plan!.recommended!;
    expect(o.kind).toBe('tap');
    if (o.kind !== 'tap') return;
    const t = plan!.design.tank;
    const load = plan!.design.load!;
    // R′ = n²R with the step-up from the sections, (L1 + L2 + 2M)/(L1 + M) (Terman 1943, the tapped coil)
    const n = (o.tap.lowerInductance + o.tap.upperInductance + 2 * o.tap.mutualInductance) / (o.tap.lowerInductance + o.tap.mutualInductance);
    expect(rel(o.tap.stepUp, n)).toBeLessThan(1e-12);
    expect(rel(o.tap.presentedResistance, n * n * 50)).toBeLessThan(1e-12);
    expect(rel(load.presentedResistance, load.tap!.stepUp ** 2 * 1000)).toBeLessThan(1e-12);
    const q = 1 / (1 / t.unloadedQ + t.reactance / o.tap.presentedResistance + t.reactance / load.presentedResistance);
    expect(rel(o.estimate.loadedQ, q)).toBeLessThan(1e-12);
    // half-turn taps: the estimate stays within a few per cent of the 12 asked; so does the full circuit
    expect(Math.abs(q / 12 - 1)).toBeLessThan(0.1);
    expect(Math.abs(o.response.loadedQ / 12 - 1)).toBeLessThan(Q_TOLERANCE);
    expect(plan!.meetsGoal).toBe(true);
    expect(Number.isInteger(2 * o.tap.practicalTapTurns)).toBe(true);
    expect(Math.abs(o.tap.practicalTapTurns - o.tap.tapTurns)).toBeLessThanOrEqual(0.25);
    // the bandwidth of the full circuit is its resonance over its loaded Q
    expect(rel(o.response.bandwidth, o.response.frequency / o.response.loadedQ)).toBeLessThan(1e-9);
  });

  it('a tap’s step-up tends to the turns ratio as the coupling of the sections tends to 1 (the ideal autotransformer, Terman 1943)', async () => {
    let last = Infinity;
    let lastK = 0;
    for (const d of ['5 mm', '20 mm', '80 mm']) {
      const s = stateOf({ give: 'N', dia: 'mean', wire: 'mm', enamel: 'bare', goal: 'match' }, { N: '20', D: d, wd: '0.3 mm', lead: '0', C: '1n', Qu: '100', loadTap: '5' });
      const { plan, message } = await run(s);
      expect(message).toBeUndefined();
      const tap = plan!.design.load!.tap!;
      const departure = Math.abs(tap.stepUp / (20 / 5) - 1);
      expect(tap.couplingCoefficient).toBeGreaterThan(lastK);
      expect(departure).toBeLessThan(last);
      // our own bound, not a published figure: the departure shrinks with 1 − k
      expect(departure).toBeLessThan((1 - tap.couplingCoefficient) / 2);
      last = departure;
      lastK = tap.couplingCoefficient;
    }
  });

  it('the capacitive divider: C1 C2/(C1 + C2) close to the tank’s C, and the high-Q rule C1 = nC/(n − 1), C2 = nC with n = √(R′/R_s) (Bowick 1982)', async () => {
    const s = stateOf({});
    const o = await optionOf(s, 'capacitiveDivider');
    const { plan } = await run(s);
    const v = o.divider;
    expect(Math.abs((v.upperCapacitance * v.lowerCapacitance) / (v.upperCapacitance + v.lowerCapacitance) / 100e-12 - 1)).toBeLessThan(0.05);
    const n = Math.sqrt(plan!.design.sourceTarget / 50);
    expect(rel(v.approximate.upperCapacitance, (n * 100e-12) / (n - 1))).toBeLessThan(1e-12);
    expect(rel(v.approximate.lowerCapacitance, n * 100e-12)).toBeLessThan(1e-12);
  });

  it('the L-network: Q = √(R′/R_s − 1), series reactance Q R_s, shunt reactance R′/Q (Bowick 1982)', async () => {
    const s = stateOf({});
    const { plan } = await run(s);
    const rp = plan!.design.sourceTarget;
    const w = TWO_PI * plan!.design.tank.frequency;
    const q = Math.sqrt(rp / 50 - 1);
    const lp = await optionOf(s, 'lowPassL');
    const hp = await optionOf(s, 'highPassL');
    expect(rel(lp.network.networkQ, q)).toBeLessThan(1e-12);
    expect(rel(lp.network.seriesInductance!, (q * 50) / w)).toBeLessThan(1e-12);
    expect(rel(lp.network.tankCapacitance, 100e-12 + 1 / (w * (rp / q)))).toBeLessThan(1e-12);
    expect(rel(hp.network.seriesCapacitance!, 1 / (w * q * 50))).toBeLessThan(1e-12);
  });

  it('a match (no loaded Q) with the load across the top: the antenna sees its own resistance, R′ₛ = R_D ∥ R_load (maximum power transfer)', async () => {
    const { plan } = await run(stateOf({ goal: 'match', loadAt: 'top' }, { Rload: '100k' }));
    const t = plan!.design.tank;
    expect(rel(plan!.design.sourceTarget, 1 / (1 / t.dynamicResistance + 1 / 100e3))).toBeLessThan(1e-12);
    const o = plan!.recommended!;
    expect(meetsGoal(o, plan!.design.goal)).toBe(true);
    expect(o.response.returnLoss).toBeGreaterThanOrEqual(10);
  });

  it('a loaded Q below what a match gives couples the antenna more tightly than a match: said, with the match’s loaded Q 1/(ω₀L · 2(G_D + G_load)) (Pozar)', async () => {
    const { plan } = await run(stateOf({ coilBy: 'L' }, { Lc: '4.7u', Qu: '150', Rload: '100k', QL: '12' }));
    const t = plan!.design.tank;
    const matched = 1 / (TWO_PI * t.frequency * t.inductance * 2 * (1 / t.dynamicResistance + 1 / 100e3));
    expect(rel(plan!.overcoupled!.matchedQ, matched)).toBeLessThan(1e-12);
    expect(matched).toBeGreaterThan(12);
    // the antenna then sees the rest of the tank stepped down by n² = R′/R_s, more than its own 50 Ω (Terman 1943), and the mismatch costs loss
    const rest = 1 / (1 / t.dynamicResistance + 1 / 100e3);
    const seen = (50 * rest) / plan!.design.sourceTarget;
    expect(rel(plan!.recommended!.estimate.inputResistance, seen)).toBeLessThan(1e-12);
    expect(seen).toBeGreaterThan(50);
    expect(plan!.recommended!.response.mismatchLoss).toBeGreaterThan(1);
    // asked above it: no such note; nor with the load's tap designed for an equal share
    expect((await run(stateOf({ coilBy: 'L' }, { Lc: '4.7u', Qu: '150', Rload: '100k', QL: '100' }))).plan!.overcoupled).toBeUndefined();
    expect((await run(stateOf({}))).plan!.overcoupled).toBeUndefined();
  });

  it('a coil given by its inductance: no tap or link, the divider and L-network still match it', async () => {
    const { plan } = await run(stateOf({ coilBy: 'L' }, { Lc: '4.7u', Qu: '150' }));
    expect(plan!.tried.tap?.available).toBe(false);
    expect(plan!.recommended?.kind).toBe('capacitiveDivider');
    expect(plan!.design.load?.connection).toBe('top');
  });

  it('the return-loss curves: one per option and one straight across, centred on f₀; straight across, −20 log|Γ| of the tank’s own impedance (Pozar)', async () => {
    const s = stateOf({});
    const { raw, plan } = await run(s);
    const c = returnLossCurves(raw, s.choices);
    expect(c.curves.map((k) => k.kind)).toEqual([...OPTION_KINDS, 'direct']);
    expect(c.frequencies.length).toBe(CURVE_POINTS);
    const mid = (CURVE_POINTS - 1) / 2;
    const t = plan!.design.tank;
    expect(rel(c.frequencies[mid], t.frequency)).toBeLessThan(1e-12);
    // at f₀: the coil (ωL with its loss ωL/Q_u in series), C and the load in parallel, seen by the 50 Ω antenna
    const w = TWO_PI * t.frequency;
    const r = t.reactance / t.unloadedQ;
    const coil = { re: r / (r * r + (w * t.inductance) ** 2), im: -(w * t.inductance) / (r * r + (w * t.inductance) ** 2) };
    const y = { re: coil.re + 1 / 1000, im: coil.im + w * t.capacitance };
    const z = { re: y.re / (y.re ** 2 + y.im ** 2), im: -y.im / (y.re ** 2 + y.im ** 2) };
    const gamma = Math.hypot(z.re - 50, z.im) / Math.hypot(z.re + 50, z.im);
    const direct = c.curves.find((k) => k.kind === 'direct')!;
    expect(direct.returnLoss[mid]).toBeCloseTo(-20 * Math.log10(gamma), 9);
    // each option's curve peaks near its own loaded resonance
    for (const k of c.curves.filter((x) => x.kind !== 'direct')) {
      const o = planOption(raw, s.choices, k.kind as BuiltOption['kind']) as BuiltOption;
      const peak = c.frequencies[k.returnLoss.indexOf(Math.max(...k.returnLoss))];
      expect(Math.abs(peak - o.response.frequency)).toBeLessThan(o.response.bandwidth / 2);
    }
  });
});

describe('Core errors land at the field that caused them', () => {
  const cases: [string, Choices, Record<string, string>, string, RegExp][] = [
    ['loadTap', {}, { loadTap: '50' }, 'loadTapTurns', /beyond the coil: it has only 35\.5 turns/],
    ['Rs', {}, { Rs: '100k' }, 'sourceResistance', /100 kΩ source/],
    ['Rs', { goal: 'match', loadAt: 'top' }, { Rs: '100k', Rload: '' }, 'sourceResistance', /only steps a resistance up/],
    ['QL', {}, { QL: '500' }, 'loadedQ', /cannot be reached: the tank's own \(unloaded\) Q is only/],
    ['QL', {}, { QL: '0.4' }, 'loadedQ', /no longer a tuned circuit/],
    ['goal', { goal: 'match' }, {}, 'loadedQ', /Give the loaded Q wanted/],
    ['Rload', {}, { Rload: '1M' }, 'loadResistance', /1 MΩ load is above/],
    ['D', {}, { D: '200 m' }, 'coil.diameter', /diameter/],
    ['p', { wind: 'pitch' }, { p: '0.3 mm' }, 'coil.pitch', /turns would overlap/],
    ['N', { give: 'N' }, { N: '1' }, 'coil.turns', /at least two turns/],
    ['wd', { wire: 'mm' }, { wd: '1e-9 m' }, 'coil.wire.diameter', /wire diameter/],
    ['lead', {}, { lead: '200 m' }, 'coil.leadLength', /lead length/],
    ['C', {}, { C: '1 F' }, 'capacitance', /outside the 1 kHz to 10 GHz/],
    ['C', {}, { C: '0.1 pF' }, 'coil.frequency', /self-resonance/],
    ['f', { tune: 'f' }, { f: '1 Hz' }, 'frequency', /1 Hz is outside/],
    ['Qu', {}, { Qu: '1' }, 'unloadedQ', /hardly a tuned circuit/],
    ['Qu', { coilBy: 'L' }, { Qu: '' }, 'unloadedQ', /Give the tank's unloaded Q/],
    ['lkD', {}, { lkD: '10 mm' }, 'link.diameter', /would cut into its turns/],
    ['lkPos', {}, { lkPos: '1 m' }, 'link.position', /too far/],
  ];
  it.each(cases)('%s %j %j → %s', async (key, choices, texts, path, message) => {
    const s = stateOf(choices, texts);
    const r = await run(s);
    expect(r.path, r.message).toBe(path);
    expect(r.message).toMatch(message);
    expect(routeDesignError(TABLE, s.choices, r.path!)).toBe(key);
  });

  it('a link the core refuses for its geometry leaves the answer standing (only the link says why)', async () => {
    const s = stateOf({}, { lkD: '10 mm' });
    const { spec: raw } = await snapshotToSpec(TABLE, s);
    expect(planAnswer(raw, s.choices).recommended?.kind).toBe('tap');
    expect(planOption(raw, s.choices, 'tap').available).toBe(true);
    expect(() => planOption(raw, s.choices, 'link')).toThrow(/would cut into its turns/);
  });
});

describe('The hand-off link', () => {
  /** The Match bench's values for a link from matchLinkFor, read as the bench reads it. */
  async function open(href: string) {
    expect(href.startsWith('/match/?')).toBe(true);
    const d = decodeLink(TABLE, href.slice('/match/?'.length));
    expect(d.notices).toEqual([]);
    const snapshot = { choices: { ...defaultChoices(TABLE), ...d.choices }, texts: { ...defaultSnapshot(TABLE, d.choices).texts, ...d.texts } };
    const { spec, errors } = await snapshotToSpec(TABLE, snapshot);
    expect(errors).toEqual({});
    return { d, snapshot, spec: matchSpecOf(spec, snapshot.choices) };
  }

  it('a Coil bench coil (AWG 24, grade 1 enamel, close-wound) comes over as its gauge and winds the same coil (designCoil)', async () => {
    const wd = awgDiameter(24);
    const coil: DesignCoilSpec = { form: 'solenoid', inductance: 3.3e-6, diameter: 12e-3 + enamelledDiameter(wd, 1), closeWound: true, wire: { diameter: wd, insulatedDiameter: enamelledDiameter(wd, 1) }, leadLength: 0.01, frequency: 7.1e6 };
    const { d, snapshot, spec } = await open(matchLinkFor({ coil, sourceResistance: 75 }));
    expect(d.choices).toMatchObject({ coilBy: 'solenoid', give: 'L', dia: 'mean', wind: 'close', wire: 'awg', awg: '24', enamel: '1', tune: 'f' });
    expect(designCoil({ ...spec.coil!, frequency: 7.1e6 } as DesignCoilSpec).turns).toBe(designCoil(coil).turns);
    expect(spec.sourceResistance).toBe(75);
    // what is not handed over keeps the bench's default: the load stays 1 kΩ
    expect(snapshot.texts.Rload).toBe('1 kΩ');
    expect(spec.loadResistance).toBe(1000);
  });

  it('a coil of turns on SWG wire, spaced, with the tank’s capacitance, Q, source and load', async () => {
    const wd = swgDiameter(20);
    const coil: DesignCoilSpec = { form: 'solenoid', turns: 14.5, diameter: 25e-3, pitch: 2e-3, wire: { diameter: wd } };
    const { d, spec } = await open(matchLinkFor({ coil, capacitance: 150e-12, unloadedQ: 180, sourceResistance: 50, loadResistance: 2200 }));
    expect(d.choices).toMatchObject({ give: 'N', wind: 'pitch', wire: 'swg', swg: '20', enamel: 'bare', tune: 'C' });
    expect(spec.coil).toMatchObject({ turns: 14.5, pitch: 2e-3, leadLength: 0, temperature: 20 });
    expect(rel((spec.coil as { diameter: number }).diameter, 25e-3)).toBeLessThan(1e-6);
    expect(spec).toMatchObject({ unloadedQ: 180, sourceResistance: 50, loadResistance: 2200 });
    expect(rel(spec.capacitance, 150e-12)).toBeLessThan(1e-6);
    expect(designCoil({ ...spec.coil! } as DesignCoilSpec).turns).toBe(14.5);
  });

  it('a metric wire with a measured overall diameter', async () => {
    const coil: DesignCoilSpec = { form: 'solenoid', inductance: 1e-6, diameter: 8.4e-3, closeWound: true, wire: { diameter: 0.42e-3, insulatedDiameter: 0.47e-3 } };
    const { d, spec } = await open(matchLinkFor({ coil, capacitance: 47e-12 }));
    expect(d.choices).toMatchObject({ wire: 'mm', enamel: 'measured' });
    expect(rel(spec.coil!.wire.insulatedDiameter!, 0.47e-3)).toBeLessThan(1e-6);
  });

  it('a toroid or a bare inductance goes over as its inductance (no tap can be worked out for it)', async () => {
    const toroid: DesignCoilSpec = { form: 'toroid', inductance: 12e-6, outerDiameter: 12.7e-3, innerDiameter: 7.7e-3, height: 4.8e-3, relativePermeability: 10, wire: { diameter: 0.4e-3 } };
    const a = await open(matchLinkFor({ coil: toroid, capacitance: 100e-12, unloadedQ: 120 }));
    expect(a.d.choices).toMatchObject({ coilBy: 'L' });
    expect(a.spec).toMatchObject({ inductance: 12e-6, unloadedQ: 120 });
    const b = await open(matchLinkFor({ inductance: 4.7e-6, capacitance: 100e-12, unloadedQ: 150, sourceResistance: 50, loadResistance: 10e3 }));
    expect(b.spec).toMatchObject({ inductance: 4.7e-6, unloadedQ: 150, sourceResistance: 50, loadResistance: 10e3 });
  });
});
