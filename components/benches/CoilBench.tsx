/**
 * Coil bench: wind a coil for an inductance, or find the inductance of a coil.
 * Three forms: single-layer air solenoid (Nagaoka with Rosa's corrections,
 * Butterworth's loss method, Medhurst's self-capacitance), toroid of
 * rectangular section (μr from geometry or a typed AL, core Q from μ′/μ″),
 * and multilayer air coil (Wheeler 1928). Every number comes from src/core;
 * this file only gathers inputs, calls the core and lays out the results.
 */
import { createMemo, createSignal, For, Show, type JSX } from 'solid-js';
import {
  apparentCoil, awgDiameter, coilAcResistance, coilQ, DesignError, enamelledDiameter, inductanceFromAl, isDesignError,
  medhurstSelfCapacitance, multilayerInductance, multilayerCapacity, multilayerTurnsForInductance, resistivityAtTemperature,
  selfResonantFrequency, solenoidInductance, toroidCoreQ, toroidInductance, toroidTurnsForInductance, toroidWinding, turnsForInductance,
  turnsFromAl, wireInternalImpedance, wireLengthForCoil, wireResistanceDc, type DesignNote,
} from '../../src/core';
import { formatNumber, formatQuantity } from '../../src/quantity';
import { createComputation } from '../kit/compute';
import { Formula } from '../kit/Formula';
import { NoteList } from '../kit/Note';
import { Plot } from '../kit/Plot';
import { Choice } from '../kit/Choice';
import { LinkNotices } from '../kit/LinkNotices';
import { QuantityField } from '../kit/QuantityField';
import { createQuantity, type QuantityState } from '../kit/quantityState';
import { ResultRow } from '../kit/ResultRow';
import { useUrlState } from '../kit/useUrlState';
import type { UrlSchema } from '../kit/urlState';

export type CoilForm = 'solenoid' | 'toroid' | 'multilayer';
export type CoilGiven = 'L' | 'N';

export type CoilFormulaKey =
  | 'solenoidL' | 'wheeler' | 'meanDiameter' | 'overall' | 'windingLength' | 'wireSolenoid' | 'rdc' | 'racSolenoid'
  | 'q' | 'cself' | 'srf' | 'apparent' | 'toroidL' | 'al' | 'alTurns' | 'pathLength' | 'wireToroid' | 'racSkin'
  | 'toroidQ' | 'multilayerL' | 'wireMultilayer' | 'practical';
/** The page's typeset formulas, handed over as slots of the island (see kit/Formula). */
export type CoilFormulas = Record<CoilFormulaKey, JSX.Element>;

const AWG_OPTIONS = Array.from({ length: 33 }, (_, i) => String(i + 8)); // AWG 8 … 40

export const COIL_SCHEMA: UrlSchema = {
  form: { kind: 'choice', options: ['solenoid', 'toroid', 'multilayer'], label: 'coil form' },
  give: { kind: 'choice', options: ['L', 'N'], label: 'what is given' },
  L: { kind: 'quantity', unit: 'H', label: 'target inductance' },
  N: { kind: 'number', label: 'turns' },
  dia: { kind: 'choice', options: ['former', 'mean'], label: 'diameter measured at' },
  D: { kind: 'quantity', unit: 'm', label: 'coil diameter' },
  wind: { kind: 'choice', options: ['close', 'pitch'], label: 'winding' },
  p: { kind: 'quantity', unit: 'm', label: 'pitch' },
  OD: { kind: 'quantity', unit: 'm', label: 'core outer diameter' },
  ID: { kind: 'quantity', unit: 'm', label: 'core inner diameter' },
  h: { kind: 'quantity', unit: 'm', label: 'core height' },
  core: { kind: 'choice', options: ['mu', 'al'], label: 'core given by' },
  mu: { kind: 'number', label: 'μ′' },
  mu2: { kind: 'number', label: 'μ″' },
  AL: { kind: 'quantity', unit: 'H', label: 'AL' },
  mD: { kind: 'quantity', unit: 'm', label: 'mean winding diameter' },
  mlen: { kind: 'quantity', unit: 'm', label: 'winding length' },
  depth: { kind: 'quantity', unit: 'm', label: 'winding depth' },
  wire: { kind: 'choice', options: ['awg', 'mm'], label: 'wire size system' },
  awg: { kind: 'choice', options: AWG_OPTIONS, label: 'AWG' },
  wd: { kind: 'quantity', unit: 'm', label: 'bare wire diameter' },
  enamel: { kind: 'choice', options: ['bare', '1', '2'], label: 'enamel grade' },
  f: { kind: 'quantity', unit: 'Hz', label: 'working frequency' },
  lead: { kind: 'quantity', unit: 'm', label: 'lead length' },
  T: { kind: 'number', label: 'wire temperature' },
};

/** Keys written to the link for each form (the rest of the state is kept but not shown). */
const KEYS_FOR: Record<CoilForm, readonly string[]> = {
  solenoid: ['form', 'give', 'L', 'N', 'dia', 'D', 'wind', 'p', 'wire', 'awg', 'wd', 'enamel', 'f', 'lead', 'T'],
  toroid: ['form', 'give', 'L', 'N', 'core', 'OD', 'ID', 'h', 'mu', 'mu2', 'AL', 'wire', 'awg', 'wd', 'enamel', 'f', 'lead', 'T'],
  multilayer: ['form', 'give', 'L', 'N', 'mD', 'mlen', 'depth', 'wire', 'awg', 'wd', 'enamel', 'f', 'lead', 'T'],
};

// ---------------------------------------------------------------------------
// Plain numbers (turns, permeability, temperature): same contract as a quantity field.

interface NumberRule { min?: number; above?: number; max?: number; what: string }

function createPlainNumber(initial: string, rule: NumberRule): Omit<QuantityState, 'unit'> {
  const [text, setTextSignal] = createSignal(initial);
  const [value, setValue] = createSignal<number | undefined>(undefined);
  const [error, setError] = createSignal<string | null>(null);
  const setText = (next: string) => {
    setTextSignal(next);
    const t = next.trim().replace(/^\u2212/, '-');
    if (t === '') return setError('Enter a value.');
    if (!/^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/.test(t)) {
      return setError(`${rule.what} is a plain number, such as ${rule.min !== undefined && rule.min < 0 ? '25 or -10' : '12 or 10.5'} (no unit).`);
    }
    const v = Number(t);
    if (rule.above !== undefined && !(v > rule.above)) return setError(`${rule.what} must be more than ${rule.above}.`);
    if (rule.min !== undefined && v < rule.min) return setError(`${rule.what} must be at least ${rule.min}.`);
    if (rule.max !== undefined && v > rule.max) return setError(`${rule.what} must be at most ${rule.max}.`);
    setValue(v);
    setError(null);
  };
  setText(initial);
  return { text, value, error, pending: () => false, stale: () => error() !== null, setText };
}
/** QuantityField reads only text, error, pending and setText (and `unit` for a missing hint; every number field here has a hint). */
const asField = (n: Omit<QuantityState, 'unit'>) => n as QuantityState;

// ---------------------------------------------------------------------------

type Input = Omit<QuantityState, 'unit'>;

export interface CoilDesign {
  form: CoilForm;
  given: CoilGiven;
  /** Exact (real) turns for the target inductance; undefined when turns were given. */
  exactTurns?: number;
  /** Turns of the coil as wound (the practical whole/half turn, or the given turns). */
  turns: number;
  /** Low-frequency inductance of the coil as wound, H. */
  inductance: number;
  /** Target inductance, when given. */
  target?: number;
  wheeler?: number;
  meanDiameter?: number;
  overallDiameter: number;
  wireDiameter: number;
  pitch?: number;
  windingLength?: number;
  wireLength: number;
  dcResistance: number;
  acResistance?: number;
  uncertainty?: number;
  inductanceAtF?: number;
  q?: number;
  selfCapacitance?: number;
  srf?: number;
  apparentInductance?: number;
  apparentQ?: number;
  al?: number;
  pathLength?: number;
  area?: number;
  coreQ?: number;
  windingQ?: number;
  frequency: number;
  notes: DesignNote[];
  sweep?: { f: number[]; q: number[]; qa: number[]; la: number[] };
  /** First and last frequency of the sweep (known before the sweep is worked out). */
  sweepRange?: [number, number];
}

/** Core argument names → this bench's field ids, per form. */
const FIELD_MAP: Record<CoilForm, Record<string, string>> = {
  solenoid: { inductance: 'L', turns: 'N', diameter: 'D', pitch: 'p', wireDiameter: 'wd', frequency: 'f', leadLength: 'lead', temperature: 'T' },
  toroid: {
    inductance: 'L', turns: 'N', outerDiameter: 'OD', innerDiameter: 'ID', height: 'h', relativePermeability: 'mu',
    muReal: 'mu', muImag: 'mu2', al: 'AL', wireDiameter: 'wd', frequency: 'f', leadLength: 'lead', temperature: 'T',
  },
  multilayer: { inductance: 'L', turns: 'N', diameter: 'mD', length: 'mlen', windingDepth: 'depth', wireDiameter: 'wd', frequency: 'f', leadLength: 'lead', temperature: 'T' },
};
const ALL_FIELDS = ['L', 'N', 'D', 'p', 'wd', 'f', 'lead', 'T', 'OD', 'ID', 'h', 'mu', 'mu2', 'AL', 'mD', 'mlen', 'depth'];

function dedupe(notes: DesignNote[]): DesignNote[] {
  const seen = new Set<string>();
  return notes.filter((n) => (seen.has(n.message) ? false : (seen.add(n.message), true)));
}

const SWEEP_POINTS = 120;

export default function CoilBench(props: CoilFormulas) {
  const [form, setForm] = createSignal<CoilForm>('solenoid');
  const [given, setGiven] = createSignal<CoilGiven>('L');
  const [dia, setDia] = createSignal<'former' | 'mean'>('former');
  const [wind, setWind] = createSignal<'close' | 'pitch'>('close');
  const [core, setCore] = createSignal<'mu' | 'al'>('mu');
  const [wire, setWire] = createSignal<'awg' | 'mm'>('awg');
  const [awg, setAwg] = createSignal('22');
  const [enamel, setEnamel] = createSignal<'bare' | '1' | '2'>('1');

  const L = createQuantity('H', '1 µH');
  const N = createPlainNumber('12', { min: 1, max: 100000, what: 'Turns' });
  const D = createQuantity('m', '10 mm');
  const p = createQuantity('m', '1 mm');
  const OD = createQuantity('m', '12.7 mm');
  const ID = createQuantity('m', '7.7 mm');
  const h = createQuantity('m', '4.8 mm');
  const mu = createPlainNumber('10', { above: 0, max: 1e6, what: 'μ′' });
  const mu2 = createPlainNumber('0.1', { min: 0, max: 1e6, what: 'μ″' });
  const AL = createQuantity('H', '5 nH');
  const mD = createQuantity('m', '12 mm');
  const mlen = createQuantity('m', '6 mm');
  const depth = createQuantity('m', '4 mm');
  const wd = createQuantity('m', '0.5 mm');
  const f = createQuantity('Hz', '7.1 MHz');
  const lead = createQuantity('m', '10 mm');
  const T = createPlainNumber('20', { min: -60, max: 200, what: 'Wire temperature' });
  const inputs: Record<string, Input> = { L, N, D, p, OD, ID, h, mu, mu2, AL, mD, mlen, depth, wd, f, lead, T };
  const choices: Record<string, [() => string, (v: string) => void]> = {
    form: [form, (v) => setForm(v as CoilForm)],
    give: [given, (v) => setGiven(v as CoilGiven)],
    dia: [dia, (v) => setDia(v as 'former' | 'mean')],
    wind: [wind, (v) => setWind(v as 'close' | 'pitch')],
    core: [core, (v) => setCore(v as 'mu' | 'al')],
    wire: [wire, (v) => setWire(v as 'awg' | 'mm')],
    awg: [awg, setAwg],
    enamel: [enamel, (v) => setEnamel(v as 'bare' | '1' | '2')],
  };

  const notices = useUrlState(
    COIL_SCHEMA,
    () => {
      const out: Record<string, string> = {};
      for (const key of KEYS_FOR[form()]) {
        if (key in choices) out[key] = choices[key][0]();
        else if (key in inputs) out[key] = inputs[key].text();
      }
      return out;
    },
    (v) => {
      for (const [key, text] of Object.entries(v)) {
        if (key in choices) choices[key][1](text);
        else if (key in inputs) inputs[key].setText(text);
      }
    },
  );

  /** Fields the current form and choices use. */
  const used = createMemo(() => {
    const u = ['f', 'lead', 'T', given() === 'L' ? 'L' : 'N'];
    if (wire() === 'mm') u.push('wd');
    if (form() === 'solenoid') {
      u.push('D');
      if (wind() === 'pitch') u.push('p');
    } else if (form() === 'toroid') {
      u.push('OD', 'ID', 'h', 'mu', 'mu2');
      if (core() === 'al') u.push('AL');
    } else {
      u.push('mD', 'mlen', 'depth');
    }
    return u;
  });

  function design(): CoilDesign | undefined {
    const ids = used();
    const vals: Record<string, number | undefined> = {};
    for (const id of ids) vals[id] = inputs[id].value();
    if (ids.some((id) => inputs[id].stale() || vals[id] === undefined)) return undefined;
    const fm = form();
    try {
      return compute(fm, vals as Record<string, number>);
    } catch (e) {
      if (isDesignError(e)) {
        const id = FIELD_MAP[fm][e.field];
        throw new DesignError(id !== undefined && ids.includes(id) ? id : 'general', e.message);
      }
      throw e;
    }
  }

  function compute(fm: CoilForm, v: Record<string, number>): CoilDesign {
    const giveL = given() === 'L';
    const wireDiameter = wire() === 'awg' ? awgDiameter(Number(awg())) : v.wd;
    const grade = enamel();
    const overallDiameter = grade === 'bare' ? wireDiameter : enamelledDiameter(wireDiameter, grade === '1' ? 1 : 2);
    const frequency = v.f;
    const temperature = v.T;
    const leadLength = v.lead;
    const rho = resistivityAtTemperature(temperature);
    const skin = wireInternalImpedance(wireDiameter, frequency, rho);
    const notes: DesignNote[] = [];

    if (fm === 'solenoid') {
      const meanDiameter = dia() === 'former' ? v.D + overallDiameter : v.D;
      const closeWound = wind() === 'close';
      const pitch = closeWound ? overallDiameter : v.p;
      if (!closeWound && pitch < overallDiameter) {
        throw new DesignError('pitch', `pitch ${formatQuantity(pitch, 'm', 3)} is smaller than the wire's ${formatQuantity(overallDiameter, 'm', 3)} diameter over its enamel: turns would overlap.`);
      }
      let turns: number, exactTurns: number | undefined, sol;
      if (giveL) {
        const t = turnsForInductance({ inductance: v.L, diameter: meanDiameter, wireDiameter, pitch, closeWound: false });
        exactTurns = t.turns;
        turns = t.practicalTurns;
        sol = t.practical;
        notes.push(...t.notes);
      } else {
        turns = v.N;
        sol = solenoidInductance({ diameter: meanDiameter, turns, pitch, wireDiameter });
        notes.push(...sol.notes);
      }
      const length = sol.length;
      // At f the skin effect removes part of the wire's internal inductance (Rosa's ks holds its DC value).
      const inductanceAtF = sol.inductance - sol.internalInductance * (1 - skin.internalInductanceRatio);
      const loss = coilQ({ frequency, turns, diameter: meanDiameter, pitch, wireDiameter, leadLength, temperature, inductance: inductanceAtF });
      const cs = medhurstSelfCapacitance(meanDiameter, length);
      const app = apparentCoil({ inductance: inductanceAtF, resistance: loss.acResistance, selfCapacitance: cs.selfCapacitance, frequency });
      notes.push(...loss.notes, ...cs.notes, ...app.notes);
      const srf = app.selfResonantFrequency;
      // Sweep f/10 … 0.9 f_sr on a log scale (numbers from the core at each point), worked out
      // when the plot first reads it (it is built only when scrolled into view).
      const lo = frequency / 10;
      const hi = Math.max(0.9 * srf, frequency * 1.01);
      let sweep: CoilDesign['sweep'];
      const sweepNow = () => {
      sweep = { f: [] as number[], q: [] as number[], qa: [] as number[], la: [] as number[] };
      for (let i = 0; i < SWEEP_POINTS; i++) {
        const fi = lo * (hi / lo) ** (i / (SWEEP_POINTS - 1));
        if (fi >= srf) break;
        const ratio = wireInternalImpedance(wireDiameter, fi, rho).internalInductanceRatio;
        const li = sol.inductance - sol.internalInductance * (1 - ratio);
        const r = coilAcResistance({ frequency: fi, turns, diameter: meanDiameter, pitch, wireDiameter, leadLength, temperature }).acResistance;
        const k = 1 - (fi / selfResonantFrequency(li, cs.selfCapacitance)) ** 2;
        sweep.f.push(fi);
        sweep.q.push((2 * Math.PI * fi * li) / r);
        sweep.qa.push((2 * Math.PI * fi * li * k) / r);
        sweep.la.push(li / k);
      }
      return sweep;
      };
      return {
        form: fm, given: given(), exactTurns, turns, inductance: sol.inductance, target: giveL ? v.L : undefined,
        wheeler: sol.wheelerInductance, meanDiameter, overallDiameter, wireDiameter, pitch, windingLength: length,
        wireLength: loss.wireLength, dcResistance: loss.dcResistance, acResistance: loss.acResistance, uncertainty: loss.uncertainty,
        inductanceAtF, q: loss.q, selfCapacitance: cs.selfCapacitance, srf, apparentInductance: app.apparentInductance,
        apparentQ: app.apparentQ, frequency, notes: dedupe(notes), sweepRange: [lo, Math.min(hi, srf)],
        get sweep() { return sweep ?? sweepNow(); },
      };
    }

    if (fm === 'toroid') {
      const geometry = { outerDiameter: v.OD, innerDiameter: v.ID, height: v.h, relativePermeability: v.mu };
      const geo = toroidInductance({ ...geometry, turns: 1 });
      const al = core() === 'al' ? v.AL : geo.al;
      // With a typed AL the permeability note does not apply.
      const fromAl = (n: number) => {
        notes.push(...toroidInductance({ ...geometry, turns: n }).notes.filter((x) => x.field !== 'relativePermeability'));
        return inductanceFromAl(al, n);
      };
      let turns: number, exactTurns: number | undefined, inductance: number;
      if (giveL) {
        if (core() === 'al') {
          exactTurns = turnsFromAl(al, v.L);
          turns = Math.max(1, Math.round(exactTurns));
          inductance = fromAl(turns);
        } else {
          const t = toroidTurnsForInductance({ ...geometry, inductance: v.L });
          exactTurns = t.turns;
          turns = t.practicalTurns;
          inductance = t.practicalInductance;
          notes.push(...t.notes);
        }
      } else {
        turns = v.N;
        if (core() === 'al') {
          inductance = fromAl(turns);
        } else {
          const t = toroidInductance({ ...geometry, turns });
          inductance = t.inductance;
          notes.push(...t.notes);
        }
      }
      const winding = toroidWinding({ turns, outerDiameter: v.OD, innerDiameter: v.ID, height: v.h, wireDiameter: overallDiameter, leadLength });
      const wireLength = winding.wireLength;
      notes.push(...winding.notes);
      const dcResistance = wireResistanceDc(wireLength, wireDiameter, temperature);
      const acResistance = dcResistance * skin.resistanceRatio;
      const windingQ = (2 * Math.PI * frequency * inductance) / acResistance;
      const q = toroidCoreQ(v.mu, v.mu2, windingQ);
      const coreQ = toroidCoreQ(v.mu, v.mu2);
      notes.push({ level: 'info', message: "The winding's AC resistance here is the skin effect of the wire alone; the proximity of neighbouring turns adds to it, so the winding Q is an upper bound. No self-capacitance is estimated for toroids." });
      return {
        form: fm, given: given(), exactTurns, turns, inductance, target: giveL ? v.L : undefined, overallDiameter, wireDiameter,
        wireLength, dcResistance, acResistance, q, windingQ, coreQ, al, pathLength: geo.effectivePathLength, area: geo.effectiveArea,
        inductanceAtF: inductance, frequency, notes: dedupe(notes),
      };
    }

    // multilayer
    const geometry = { diameter: v.mD, length: v.mlen, windingDepth: v.depth };
    let turns: number, exactTurns: number | undefined, inductance: number;
    if (giveL) {
      const t = multilayerTurnsForInductance({ ...geometry, inductance: v.L });
      exactTurns = t.turns;
      turns = t.practicalTurns;
      inductance = t.practicalInductance;
      notes.push(...t.notes);
    } else {
      turns = v.N;
      const m = multilayerInductance({ ...geometry, turns });
      inductance = m.inductance;
      notes.push(...m.notes);
    }
    const wireLength = wireLengthForCoil({ turns, diameter: v.mD, pitch: 0, leadLength });
    const dcResistance = wireResistanceDc(wireLength, wireDiameter, temperature);
    const fit = multilayerCapacity(v.mlen, v.depth, overallDiameter);
    if (turns > fit) {
      notes.push({ level: 'validity', message: `${formatNumber(turns, 4)} turns of ${formatQuantity(overallDiameter, 'm', 3)} wire do not fit a ${formatQuantity(v.mlen, 'm', 3)} × ${formatQuantity(v.depth, 'm', 3)} winding section (about ${fit} do, wound layer on layer): make the section bigger or the wire thinner.`, field: 'depth' });
    }
    notes.push({ level: 'info', message: 'AC resistance, Q and self-capacitance of a multilayer winding are not estimated here: the proximity loss between layers is large and depends on how the wire is laid. Measure Q, or use a single-layer coil where Q matters.' });
    return {
      form: fm, given: given(), exactTurns, turns, inductance, target: giveL ? v.L : undefined, meanDiameter: v.mD,
      overallDiameter, wireDiameter, wireLength, dcResistance, frequency, notes: dedupe(notes),
    };
  }

  const calc = createComputation(design, ALL_FIELDS);
  const r = calc.result;
  const stale = () => calc.stale() || (r() !== undefined && (r()!.form !== form() || r()!.given !== given()));
  const err = (id: string) => calc.fieldError(id);

  const lUnit = (l: number) => (l < 1e-6 ? { scale: 1e9, unit: 'nH' } : l < 1e-3 ? { scale: 1e6, unit: 'µH' } : { scale: 1e3, unit: 'mH' });
  const plotScale = createMemo(() => lUnit(r()?.inductance ?? 1e-6));

  const handOff = createMemo(() => {
    const d = r();
    if (!d) return undefined;
    const params = new URLSearchParams();
    params.set('L', formatQuantity(d.inductanceAtF ?? d.inductance, 'H', 5));
    if (d.q !== undefined && Number.isFinite(d.q)) params.set('coilQ', String(Number(d.q.toPrecision(5))));
    if (d.selfCapacitance !== undefined) params.set('Cself', formatQuantity(d.selfCapacitance, 'F', 5));
    params.set('f', formatQuantity(d.frequency, 'Hz', 5));
    return `/tank/?${params.toString()}`;
  });

  /** Figures that show a half turn on a solenoid (10.5, 7.0) and whole turns elsewhere (46). */
  const turnFigures = (n: number | undefined) => {
    if (n === undefined || !(n > 0)) return 3;
    const digits = Math.floor(Math.log10(n)) + 1;
    return r()?.form === 'solenoid' ? Math.max(2, digits + 1) : Math.max(1, digits);
  };
  const percent = (x: number) => `${x >= 0 ? '+' : '−'}${Math.abs(x * 100).toFixed(1)} %`;
  const mm = (x: number) => `${Number((x * 1e3).toPrecision(3))} mm`;
  const wireSummary = () => {
    const d = r();
    if (!d) return '';
    const bare = `${mm(d.wireDiameter)}${wire() === 'awg' ? ` (AWG ${awg()})` : ''}`;
    return enamel() === 'bare' ? `${bare} bare copper` : `${bare} bare, about ${mm(d.overallDiameter)} over grade ${enamel()} enamel (approximate maximum)`;
  };
  /** Axis ticks: "1 MHz", "10 MHz"; uPlot leaves the unlabelled log ticks null. */
  const frequencyTick = (x: number) => {
    if (typeof x !== 'number' || !Number.isFinite(x)) return '';
    const [num, unit] = formatQuantity(x, 'Hz', 3).split(' ');
    return `${Number(num)} ${unit}`;
  };

  const radio = <T extends string>(name: string, legend: string, value: () => T, set: (v: T) => void, options: [T, string][]): JSX.Element => (
    <Choice name={name} legend={legend} value={value()} onChoose={set} options={options} />
  );

  return (
    <div class="tw-bench tw-coil" data-bench="coil">
      <LinkNotices notices={notices()} />
      <div class="tw-bench-inputs">
        {radio('form', 'Coil form', form, setForm, [['solenoid', 'Single-layer'], ['toroid', 'Toroid'], ['multilayer', 'Multilayer']])}
        {radio('give', 'You give', given, setGiven, [['L', 'Inductance → turns'], ['N', 'Turns → inductance']])}
        <Show when={given() === 'L'}>
          <QuantityField id="L" label="Target inductance" symbol="L" q={L} hint="e.g. 1 µH, 4u7, 680n" designError={err('L')} />
        </Show>
        <Show when={given() === 'N'}>
          <QuantityField id="N" label="Turns" symbol="N" q={asField(N)} hint={form() === 'solenoid' ? 'a plain number; half turns allowed (10.5)' : 'a plain number of whole turns'} designError={err('N')} />
        </Show>

        <Show when={form() === 'solenoid'}>
          {radio('dia', 'Diameter given is', dia, setDia, [['former', 'the former (outside)'], ['mean', 'wire centre to centre']])}
          <QuantityField id="D" label={dia() === 'former' ? 'Former diameter' : 'Mean winding diameter'} symbol={dia() === 'former' ? undefined : 'D'} q={D}
            hint={dia() === 'former' ? 'outside of the tube you wind on; the wire’s overall diameter is added' : 'measured wire centre to wire centre'} designError={err('D')} />
          {radio('wind', 'Winding', wind, setWind, [['close', 'Close-wound'], ['pitch', 'Spaced (give pitch)']])}
          <Show when={wind() === 'pitch'}>
            <QuantityField id="p" label="Pitch, turn to turn" symbol="p" q={p} hint="centre to centre, e.g. 1 mm, 2.5 mm, 0.1 in" designError={err('p')} />
          </Show>
        </Show>

        <Show when={form() === 'toroid'}>
          <QuantityField id="OD" label="Core outer diameter" symbol="OD" q={OD} hint="e.g. 12.7 mm, 0.5 in" designError={err('OD')} />
          <QuantityField id="ID" label="Core inner diameter" symbol="ID" q={ID} hint="the hole" designError={err('ID')} />
          <QuantityField id="h" label="Core height" symbol="h" q={h} hint="axial thickness" designError={err('h')} />
          {radio('core', 'Core given by', core, setCore, [['mu', 'permeability μ′'], ['al', 'AL (measured or stated)']])}
          <Show when={core() === 'al'}>
            <QuantityField id="AL" label="AL, inductance per turn²" q={AL} hint="type it in nH: 5 nH means 5 nH/turn²" designError={err('AL')} />
          </Show>
          <QuantityField id="mu" label="Permeability μ′ at f" symbol="μ′" q={asField(mu)} hint="relative, plain number; 1 for an air or plastic ring" designError={err('mu')} />
          <QuantityField id="mu2" label="Loss permeability μ″ at f" symbol="μ″" q={asField(mu2)} hint="from the material’s μ′, μ″ curves; 0 if lossless" designError={err('mu2')} />
        </Show>

        <Show when={form() === 'multilayer'}>
          <QuantityField id="mD" label="Mean winding diameter" symbol="D" q={mD} hint="to the middle of the winding depth" designError={err('mD')} />
          <QuantityField id="mlen" label="Winding length" symbol="b" q={mlen} hint="along the axis" designError={err('mlen')} />
          <QuantityField id="depth" label="Winding depth" symbol="c" q={depth} hint="radial build: outer minus inner radius" designError={err('depth')} />
        </Show>

        <fieldset class="tw-choice tw-coil-wire">
          <legend>Wire</legend>
          <label><input type="radio" name="wire" value="awg" checked={wire() === 'awg'} onChange={() => setWire('awg')} /> AWG</label>
          <label><input type="radio" name="wire" value="mm" checked={wire() === 'mm'} onChange={() => setWire('mm')} /> Metric bare diameter</label>
          <Show when={wire() === 'awg'}>
            <label class="tw-coil-select">Gauge{' '}
              <select id="awg" name="awg" onChange={(e) => setAwg(e.currentTarget.value)}>
                <For each={AWG_OPTIONS}>{(g) => <option value={g} selected={awg() === g}>AWG {g}</option>}</For>
              </select>
            </label>
          </Show>
          <label class="tw-coil-select">Enamel{' '}
            <select id="enamel" name="enamel" onChange={(e) => setEnamel(e.currentTarget.value as 'bare' | '1' | '2')}>
              <option value="bare" selected={enamel() === 'bare'}>none (bare)</option>
              <option value="1" selected={enamel() === '1'}>grade 1 (thin)</option>
              <option value="2" selected={enamel() === '2'}>grade 2 (medium)</option>
            </select>
          </label>
        </fieldset>
        <Show when={wire() === 'mm'}>
          <QuantityField id="wd" label="Bare wire diameter" symbol="d" q={wd} hint="copper only, e.g. 0.5 mm, 0.71 mm" designError={err('wd')} />
        </Show>
        <QuantityField id="f" label="Working frequency" symbol="f" q={f} hint="e.g. 7.1 MHz, 455k" designError={err('f')} />
        <QuantityField id="lead" label="Length of each lead" q={lead} hint="both leads are counted; 0 for none" designError={err('lead')} />
        <QuantityField id="T" label="Wire temperature, °C" symbol="T" q={asField(T)} hint="plain number; 20 for a cool bench" designError={err('T')} />
        <Show when={calc.generalError()}>
          <p class="tw-bench-error" role="alert">{calc.generalError()}</p>
        </Show>
      </div>

      <div class="tw-bench-results" aria-live="polite">
        <p class="tw-coil-wire-summary">Wire: {wireSummary()}</p>
        <Show when={given() === 'L'}>
          <ResultRow id="out-turns" label="Turns to wind" symbol="N" value={r()?.turns} stale={stale()} primary significant={turnFigures(r()?.turns)}>
            <p class="tw-coil-detail" id="out-turns-detail">
              <Show when={r()?.exactTurns !== undefined}>
                Exactly {formatNumber(r()!.exactTurns!, 5)} turns give {formatQuantity(r()!.target!, 'H', 4)}; wound with{' '}
                {formatNumber(r()!.turns, turnFigures(r()!.turns))} {r()!.form === 'solenoid' ? '(nearest half turn)' : '(nearest whole turn)'} it is{' '}
                <strong>{formatQuantity(r()!.inductance, 'H', 4)}</strong> ({percent(r()!.inductance / r()!.target! - 1)}).
              </Show>
            </p>
            <Formula math={props.practical} source={r()?.form === 'solenoid' ? 'half turns: leads leave on opposite sides' : 'whole turns: every pass through the hole is one turn'} />
          </ResultRow>
        </Show>
        <ResultRow id="out-L" label={given() === 'L' ? 'Inductance as wound' : 'Inductance'} symbol="L" value={r()?.inductance} unit="H" stale={stale()} primary={given() === 'N'} significant={5}>
          <Show when={form() === 'solenoid'}>
            <Formula math={props.solenoidL} source="Nagaoka 1909; Rosa 1907; Grover 1946, ch. 16 and Table 7" validity="round wire, low frequency (includes the wire’s internal inductance), no metal or core nearby, pitch small beside the radius" />
          </Show>
          <Show when={form() === 'toroid'}>
            <Formula math={core() === 'al' ? props.al : props.toroidL} source={core() === 'al' ? 'definition of AL' : 'Ampère’s law; Grover 1946; Snelling 1988'} validity="evenly spread winding, all flux in the core; μ′ varies from core to core" />
          </Show>
          <Show when={form() === 'multilayer'}>
            <Formula math={props.multilayerL} source="Wheeler, Proc. IRE 16, 1928 (a, b, c in inches)" validity="about 1–2 % while 6a, 9b and 10c are within a factor of two of each other" />
          </Show>
        </ResultRow>

        <Show when={form() === 'solenoid'}>
          <ResultRow id="out-wheeler" label="Wheeler’s formula, for comparison" value={r()?.wheeler} unit="H" stale={stale()}>
            <Formula math={props.wheeler} source="Wheeler, Proc. IRE 16, 1928 (r, l in inches)" validity="current sheet, within about 1 % for l > 0.4 D; no round-wire correction" />
          </ResultRow>
          <ResultRow id="out-D" label="Mean winding diameter (wire centre to centre)" symbol="D" value={r()?.meanDiameter} unit="m" stale={stale()}>
            <Formula math={props.meanDiameter} source="geometry" validity={dia() === 'former' ? 'former diameter plus one overall wire diameter' : 'as typed'} />
          </ResultRow>
          <ResultRow id="out-len" label="Winding length" symbol="l" value={r()?.windingLength} unit="m" stale={stale()}>
            <Formula math={props.windingLength} source="geometry" validity={wind() === 'close' ? 'close-wound: pitch = overall wire diameter' : 'spaced winding'} />
          </ResultRow>
        </Show>
        <Show when={form() === 'toroid'}>
          <ResultRow id="out-al" label="AL of the core" value={r()?.al} unit="H" stale={stale()} significant={4}>
            <p class="tw-coil-detail">Per turn². <Show when={r()?.pathLength !== undefined}>From the dimensions: magnetic path l<sub>e</sub> = {formatQuantity(r()!.pathLength!, 'm', 4)}, area A<sub>e</sub> = {formatNumber(r()!.area! * 1e6, 4)} mm².</Show></p>
            <Formula math={props.pathLength} source="IEC 60205 core factors" validity="rectangular section" />
          </ResultRow>
        </Show>

        <ResultRow id="out-wire" label="Wire to cut" symbol="ℓ" value={r()?.wireLength} unit="m" stale={stale()}>
          <p class="tw-coil-detail">Includes both leads; add your own allowance for stripping and soldering.</p>
          <Formula math={form() === 'solenoid' ? props.wireSolenoid : form() === 'toroid' ? props.wireToroid : props.wireMultilayer}
            source={form() === 'toroid' ? 'geometry (our estimate: wire centre line round the core’s section)' : form() === 'multilayer' ? 'mean turn length times turns' : 'geometry of the helix'} />
        </ResultRow>
        <ResultRow id="out-rdc" label="DC resistance" value={r()?.dcResistance} unit="Ω" stale={stale()}>
          <Formula math={props.rdc} source="IEC 60028 annealed copper, ρ₂₀ = 1/58 Ω·mm²/m, α = 0.00393 /K" />
        </ResultRow>

        <Show when={form() !== 'multilayer'}>
          <ResultRow id="out-rac" label={`AC resistance at ${r() ? formatQuantity(r()!.frequency, 'Hz') : 'f'}`} value={r()?.acResistance} unit="Ω" stale={stale()}>
            <Show when={form() === 'solenoid'}>
              <Formula math={props.racSolenoid} source="Butterworth 1922 (exact skin effect; transverse-field loss in a long-coil field)" validity="best for l/D ≥ 1 and d/p ≤ 0.7; overstates the loss of close-wound coils" />
            </Show>
            <Show when={form() === 'toroid'}>
              <Formula math={props.racSkin} source="exact skin effect of a round wire (Bessel functions)" validity="proximity of the other turns not included: a lower bound" />
            </Show>
          </ResultRow>
          <ResultRow id="out-q" label={`Unloaded Q at ${r() ? formatQuantity(r()!.frequency, 'Hz') : 'f'}`} symbol="Q" value={r()?.q} stale={stale()} significant={3}>
            <Show when={form() === 'solenoid' && r()?.uncertainty !== undefined}>
              <p class="tw-coil-detail" id="out-q-range">
                Expected uncertainty ±{Math.round(r()!.uncertainty! * 100)} %: Q between about {formatNumber(r()!.q! / (1 + r()!.uncertainty!), 3)} and {formatNumber(r()!.q! / Math.max(0.05, 1 - r()!.uncertainty!), 3)}.
                Self-capacitance lowers the Q you measure across the coil to {formatNumber(r()!.apparentQ!, 3)}.
              </p>
              <Formula math={props.q} source="definition of Q; L at f (skin effect removes part of the wire’s internal inductance)" validity="uncertainty is our estimate: ±(3 % + 30 to 50 % of the proximity share of the loss)" />
            </Show>
            <Show when={form() === 'toroid'}>
              <p class="tw-coil-detail">Core alone {formatNumber(r()?.coreQ ?? NaN, 3)}, winding alone (skin effect only) {formatNumber(r()?.windingQ ?? NaN, 3)}.</p>
              <Formula math={props.toroidQ} source="Snelling 1988 (series complex permeability)" validity="μ′ and μ″ at the working frequency; the combination is an upper bound since proximity loss is left out" />
            </Show>
          </ResultRow>
        </Show>

        <Show when={form() === 'solenoid'}>
          <ResultRow id="out-cself" label="Self-capacitance" symbol="Cₛ" value={r()?.selfCapacitance} unit="F" stale={stale()}>
            <Formula math={props.cself} source="Medhurst, Wireless Engineer 24, 1947" validity="0.1 ≤ l/D ≤ 50, about ±5 % for his coils; surroundings add to it" />
          </ResultRow>
          <ResultRow id="out-srf" label="Self-resonant frequency" value={r()?.srf} unit="Hz" stale={stale()}>
            <Formula math={props.srf} source="lumped model" validity="an estimate: the winding is really a helical line; keep f below about half of it" />
          </ResultRow>
          <ResultRow id="out-lapp" label={`Apparent inductance at ${r() ? formatQuantity(r()!.frequency, 'Hz') : 'f'}`} symbol="L′" value={r()?.apparentInductance} unit="H" stale={stale()} significant={5}>
            <Formula math={props.apparent} source="Terman, Radio Engineers’ Handbook, 1943" validity="Q ≫ 1 and f well below the self-resonant frequency" />
          </ResultRow>
        </Show>

        <NoteList notes={r()?.notes ?? []} />

        <Show when={form() === 'solenoid' && r()?.sweepRange}>
          <Plot
            id="coil-plot"
            caption={`Q and apparent inductance of this coil from ${formatQuantity(r()!.sweepRange![0], 'Hz', 3)} to ${formatQuantity(r()!.sweepRange![1], 'Hz', 3)} (90 % of the estimated self-resonance). Dashed: the Q you would measure across the coil, lowered by its self-capacitance. Above half the self-resonant frequency the lumped model is only a rough guide.`}
            x={r()!.sweep!.f}
            xLabel="Frequency"
            xLog
            series={[
              { label: 'Q', values: r()!.sweep!.q },
              { label: 'Q across coil', values: r()!.sweep!.qa, dash: true },
              { label: 'L′', values: r()!.sweep!.la.map((x) => x * plotScale().scale), axis: 'right', unit: plotScale().unit },
            ]}
            yLabel="Q"
            y2Label={`L′ (${plotScale().unit})`}
            markers={[{ x: r()!.frequency, label: 'f' }, { x: 0.5 * r()!.srf!, label: '½ SRF' }]}
            formatX={frequencyTick}
            stale={stale()}
          />
        </Show>

        <section class="tw-table-block tw-coil-handoff" aria-labelledby="handoff-title">
          <h2 id="handoff-title">Next: the tank</h2>
          <Show when={handOff()} fallback={<p>Complete the inputs to carry this coil to the tank bench.</p>}>
            <p>
              <a id="to-tank" href={handOff()}>Use this coil in the tank bench</a>{' '}
              <span class="tw-coil-detail">
                (L at f{r()?.q !== undefined ? ', Q' : ''}{r()?.selfCapacitance !== undefined ? ', self-capacitance' : ''} and f{stale() ? '; from the last good design' : ''})
              </span>
            </p>
          </Show>
        </section>
      </div>
    </div>
  );
}
