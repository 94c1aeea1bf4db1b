/**
 * Tank bench: a lossy parallel or series LC tank between a source and a load.
 * Resonance, unloaded and loaded Q, bandwidth, dynamic resistance, insertion
 * loss as a single-resonator filter, capacitor voltage and circulating
 * current with cautions; |Z|, phase and the loaded response plotted from a
 * 1,000-point sweep; the SPICE netlist and the sweep offered as files.
 *
 * Accepts a coil handed over from the Coil bench in the query string:
 * L (inductance text), coilQ (plain number), Cself (capacitance text),
 * f (frequency text, where the Q was worked out).
 */
import { createMemo, createSignal, Show, type JSX } from 'solid-js';
import {
  analyzeTank, seriesToParallelResistance, sweepTank, tankNetlist, tankStress,
  type DesignNote, type TankInput, type TankMode, type TankStressInput,
} from '../../src/core';
import { formatQuantity } from '../../src/quantity';
import { createComputation } from '../kit/compute';
import { Formula } from '../kit/Formula';
import { NoteList } from '../kit/Note';
import { createNumber } from '../kit/numberState';
import { createOptionalQuantity } from '../kit/optionalQuantity';
import { Plot } from '../kit/Plot';
import { Choice } from '../kit/Choice';
import { LinkNotices } from '../kit/LinkNotices';
import { QuantityField } from '../kit/QuantityField';
import { createQuantity } from '../kit/quantityState';
import { ResultRow } from '../kit/ResultRow';
import { useUrlState } from '../kit/useUrlState';
import type { UrlSchema } from '../kit/urlState';

export type TankFormulaKey =
  | 'frequency' | 'unloadedQ' | 'loadedQParallel' | 'loadedQSeries' | 'bandwidth' | 'dynamicParallel' | 'dynamicSeries' | 'coilQ' | 'capacitorQ' | 'insertionLoss' | 'capVoltageParallel' | 'capVoltageSeries' | 'circulatingParallel' | 'circulatingSeries';
/** The page's typeset formulas, handed over as slots of the island (see kit/Formula). */
export type TankFormulas = Record<TankFormulaKey, JSX.Element>;

type CoilLoss = 'Q' | 'R';
type CapLoss = 'Q' | 'ESR' | 'DF';
type Drive = 'P' | 'V';

export const TANK_SCHEMA: UrlSchema = {
  mode: { kind: 'choice', options: ['parallel', 'series'], label: 'tank' },
  L: { kind: 'quantity', unit: 'H', label: 'inductance' },
  coilLoss: { kind: 'choice', options: ['Q', 'R'], label: 'coil loss given as' },
  coilQ: { kind: 'number', label: 'coil Q' },
  Rcoil: { kind: 'quantity', unit: 'Ω', label: 'coil resistance' },
  Cself: { kind: 'quantity', unit: 'F', label: 'coil self-capacitance' },
  C: { kind: 'quantity', unit: 'F', label: 'capacitance' },
  capLoss: { kind: 'choice', options: ['Q', 'ESR', 'DF'], label: 'capacitor loss given as' },
  capQ: { kind: 'number', label: 'capacitor Q' },
  ESR: { kind: 'quantity', unit: 'Ω', label: 'capacitor ESR' },
  DF: { kind: 'number', label: 'dissipation factor' },
  Rs: { kind: 'quantity', unit: 'Ω', label: 'source resistance' },
  Rload: { kind: 'quantity', unit: 'Ω', label: 'load resistance' },
  f: { kind: 'quantity', unit: 'Hz', label: 'frequency of the Q figures' },
  drive: { kind: 'choice', options: ['P', 'V'], label: 'drive given as' },
  P: { kind: 'quantity', unit: 'W', label: 'drive power' },
  V: { kind: 'quantity', unit: 'V', label: 'drive voltage' },
  Vrating: { kind: 'quantity', unit: 'V', label: 'capacitor voltage rating' },
  Irating: { kind: 'quantity', unit: 'A', label: 'wire current rating' },
};

/** Keys a Coil bench link carries; a link with these and no capacitance is a hand-over. */
const HANDOFF_KEYS = ['L', 'coilQ', 'Cself', 'f'] as const;

/** Demo terminations: a parallel tank between high resistances, a series tank between low ones. */
const DEFAULT_TERMINATION: Record<TankMode, string> = { parallel: '10 kΩ', series: '5 Ω' };

/** Points in the plotted and downloadable sweep. */
export const SWEEP_POINTS = 1000;

/** −3 dB as a power ratio of one half, in dB. */

/** Sweep span around the loaded peak: ± about 6 bandwidths, log spaced, at most a decade each way. */
function sweepSpan(centre: number, bandwidth: number): { start: number; stop: number } {
  const s = Math.min(1 + (6 * bandwidth) / centre, 10);
  return { start: centre / s, stop: centre * s };
}

/** A number for a CSV cell: 10 significant figures, no exponent surprises for spreadsheets. */
function cell(x: number): string {
  return Number.isFinite(x) ? String(Number(x.toPrecision(10))) : '';
}

/** "7.340MHz" for file names. */
function fileFrequency(f: number): string {
  return formatQuantity(f, 'Hz', 4).replace(/\s+/g, '').replace(/[µμ]/g, 'u');
}

/** Offers text as a file, made here in the browser (Blob + <a download>). */
function offerFile(name: string, text: string, type: string): void {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  a.rel = 'noopener';
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 5000);
}

/** Axis and legend labels: engineering notation without trailing zeros ("6.5 MHz", "10 kΩ"); blank for ticks uPlot leaves unlabelled. */
function tick(unit: string, significant: number) {
  return (x: number | null): string => (x == null || !Number.isFinite(x) ? '' : formatQuantity(x, unit, significant).replace(/(\.\d*?)0+(?= )/, '$1').replace(/\.(?= )/, ''));
}

/** A small relative offset for people: per cent, or ppm below 0.01 %. */
function relative(x: number): string {
  const a = Math.abs(x);
  return a >= 1e-4 ? `${(a * 100).toPrecision(2)} %` : `${Number((a * 1e6).toPrecision(2))} ppm`;
}

export default function TankBench(props: TankFormulas) {
  const [mode, setMode] = createSignal<TankMode>('parallel');
  const [coilLoss, setCoilLoss] = createSignal<CoilLoss>('Q');
  const [capLoss, setCapLoss] = createSignal<CapLoss>('Q');
  const [drive, setDrive] = createSignal<Drive>('V');
  const [handoff, setHandoff] = createSignal<string | null>(null);

  const L = createQuantity('H', '4.7 µH');
  const coilQ = createNumber('150', { what: 'Coil Q' });
  const Rcoil = createQuantity('Ω', '1.4 Ω');
  const Cself = createOptionalQuantity('F', '');
  const C = createQuantity('F', '100 pF');
  const capQ = createNumber('1000', { what: 'Capacitor Q' });
  const ESR = createQuantity('Ω', '20 mΩ');
  const DF = createNumber('0.001', { what: 'Dissipation factor' });
  const Rs = createOptionalQuantity('Ω', DEFAULT_TERMINATION.parallel);
  const Rload = createOptionalQuantity('Ω', DEFAULT_TERMINATION.parallel);
  /** Switching the tank swaps terminations still at the other tank's default for this one's. */
  const switchMode = (next: TankMode) => {
    for (const q of [Rs, Rload]) if (q.text() === DEFAULT_TERMINATION[mode()]) q.setText(DEFAULT_TERMINATION[next]);
    setMode(next);
  };
  const f = createOptionalQuantity('Hz', '');
  const P = createOptionalQuantity('W', '');
  const V = createOptionalQuantity('V', '1 V');
  const Vrating = createOptionalQuantity('V', '500 V');
  const Irating = createOptionalQuantity('A', '');

  const notices = useUrlState(
    TANK_SCHEMA,
    () => {
      const v: Record<string, string> = { mode: mode(), L: L.text(), coilLoss: coilLoss(), Cself: Cself.text(), C: C.text(), capLoss: capLoss() };
      if (coilLoss() === 'Q') v.coilQ = coilQ.text(); else v.Rcoil = Rcoil.text();
      if (capLoss() === 'Q') v.capQ = capQ.text(); else if (capLoss() === 'ESR') v.ESR = ESR.text(); else v.DF = DF.text();
      Object.assign(v, { Rs: Rs.text(), Rload: Rload.text(), f: f.text(), drive: drive() });
      if (drive() === 'P') v.P = P.text(); else v.V = V.text();
      Object.assign(v, { Vrating: Vrating.text(), Irating: Irating.text() });
      return v;
    },
    (v) => {
      if (v.mode) setMode(v.mode as TankMode);
      const texts: Record<string, { setText(t: string): void }> = { L, coilQ, Rcoil, Cself, C, capQ, ESR, DF, Rs, Rload, f, P, V, Vrating, Irating };
      for (const [key, state] of Object.entries(texts)) if (v[key] !== undefined) state.setText(v[key]);
      // A loss or drive given without its choice picks that choice.
      if (v.coilLoss) setCoilLoss(v.coilLoss as CoilLoss);
      else if (v.coilQ !== undefined) setCoilLoss('Q');
      else if (v.Rcoil !== undefined) setCoilLoss('R');
      if (v.capLoss) setCapLoss(v.capLoss as CapLoss);
      else if (v.capQ !== undefined) setCapLoss('Q');
      else if (v.ESR !== undefined) setCapLoss('ESR');
      else if (v.DF !== undefined) setCapLoss('DF');
      if (v.drive) setDrive(v.drive as Drive);
      else if (v.P !== undefined) setDrive('P');
      else if (v.V !== undefined) setDrive('V');
      const given = HANDOFF_KEYS.filter((k) => v[k] !== undefined);
      if (given.length > 0 && v.C === undefined && v.mode === undefined) {
        const parts = [
          v.L !== undefined ? `L = ${v.L}` : null,
          v.coilQ !== undefined ? `Q = ${v.coilQ}${v.f !== undefined ? ` at ${v.f}` : ''}` : null,
          v.Cself !== undefined ? `self-capacitance ${v.Cself}` : null,
        ].filter(Boolean);
        setHandoff(`Coil from the Coil bench: ${parts.join(', ') || `frequency ${v.f}`}. Set the capacitor, source and load to complete the tank.`);
      }
    },
  );

  /** Bench field for a core argument name. */
  const fieldOf = (core: string): string | undefined => ({
    inductance: 'L',
    capacitance: 'C',
    coilResistance: coilLoss() === 'Q' ? 'coilQ' : 'Rcoil',
    coilQ: 'coilQ',
    capacitorEsr: capLoss() === 'Q' ? 'capQ' : capLoss() === 'ESR' ? 'ESR' : 'DF',
    capacitorQ: 'capQ',
    dissipationFactor: 'DF',
    coilSelfCapacitance: 'Cself',
    sourceResistance: 'Rs',
    loadResistance: 'Rload',
    frequency: 'f',
    drivePower: 'P',
    driveVoltage: 'V',
    capacitorVoltageRating: 'Vrating',
    wireCurrentRating: 'Irating',
  } as Record<string, string>)[core];
  const CORE_FIELDS = ['inductance', 'capacitance', 'coilResistance', 'coilQ', 'capacitorEsr', 'capacitorQ', 'dissipationFactor', 'coilSelfCapacitance', 'sourceResistance', 'loadResistance', 'frequency', 'drivePower', 'driveVoltage', 'capacitorVoltageRating', 'wireCurrentRating'];

  /** The tank as the core takes it, or undefined while an input shown is not a value. */
  const tankInput = createMemo((): TankInput | undefined => {
    const coil = coilLoss() === 'Q' ? coilQ : Rcoil;
    const cap = capLoss() === 'Q' ? capQ : capLoss() === 'ESR' ? ESR : DF;
    const all = [L, coil, Cself, C, cap, Rs, Rload, f];
    if (all.some((q) => q.stale())) return undefined;
    const Lv = L.value(), Cv = C.value();
    if (Lv === undefined || Cv === undefined) return undefined;
    const t: TankInput = { mode: mode(), inductance: Lv, capacitance: Cv };
    if (coilLoss() === 'Q') t.coilQ = coilQ.value(); else t.coilResistance = Rcoil.value();
    if (capLoss() === 'Q') t.capacitorQ = capQ.value();
    else if (capLoss() === 'ESR') t.capacitorEsr = ESR.value();
    else t.dissipationFactor = DF.value();
    if (Cself.value() !== undefined) t.coilSelfCapacitance = Cself.value();
    if (Rs.value() !== undefined) t.sourceResistance = Rs.value();
    if (Rload.value() !== undefined) t.loadResistance = Rload.value();
    if (f.value() !== undefined) t.frequency = f.value();
    for (const k of Object.keys(t) as (keyof TankInput)[]) if (t[k] === undefined) delete t[k];
    return t;
  });

  const calc = createComputation(() => {
    const t = tankInput();
    if (!t) return undefined;
    const analysis = analyzeTank(t);
    const span = sweepSpan(analysis.loadedResonantFrequency, analysis.bandwidth);
    const sweep = sweepTank(t, { ...span, points: SWEEP_POINTS, spacing: 'log' });
    const w0 = 2 * Math.PI * analysis.naturalFrequency;
    const x0 = w0 * t.inductance;
    return {
      tank: t,
      analysis,
      sweep,
      edges: { lower: analysis.lowerFrequency, upper: analysis.upperFrequency },
      coilParallelR: analysis.coilResistance > 0 ? seriesToParallelResistance(analysis.coilResistance, x0) : Infinity,
    };
  }, CORE_FIELDS);

  const stress = createComputation(() => {
    const t = tankInput();
    if (!t) return undefined;
    const driveQ = drive() === 'P' ? P : V;
    if ([driveQ, Vrating, Irating].some((q) => q.stale())) return undefined;
    const dv = driveQ.value();
    if (dv === undefined) return null;
    const input: TankStressInput = { ...t };
    if (drive() === 'P') input.drivePower = dv; else input.driveVoltage = dv;
    if (Vrating.value() !== undefined) input.capacitorVoltageRating = Vrating.value();
    if (Irating.value() !== undefined) input.wireCurrentRating = Irating.value();
    return tankStress(input);
  }, CORE_FIELDS);

  const fieldError = (id: string): string | null => {
    for (const core of CORE_FIELDS) {
      if (fieldOf(core) !== id) continue;
      const msg = calc.fieldError(core) ?? stress.fieldError(core);
      if (msg) return msg;
    }
    return null;
  };

  const r = calc.result;
  const a = () => r()?.analysis;
  const s = () => stress.result() ?? undefined;
  const stale = () => calc.stale();
  const stressStale = () => stress.stale();
  const driveBlank = () => (drive() === 'P' ? P : V).blank();
  const parallel = () => mode() === 'parallel';
  const shownMode = () => a()?.mode ?? mode();
  const generalError = () => calc.generalError() ?? stress.generalError();

  const notes = createMemo((): DesignNote[] => {
    const seen = new Set<string>();
    const out: DesignNote[] = [];
    for (const n of [...(s()?.notes ?? []), ...(a()?.notes ?? [])]) {
      if (seen.has(n.message)) continue;
      seen.add(n.message);
      out.push(n);
    }
    const order = { caution: 0, validity: 1, info: 2 } as const;
    return out.sort((x, y) => order[x.level] - order[y.level]);
  });

  const downloadNetlist = () => {
    const res = r();
    if (!res || stale()) return;
    const text = tankNetlist(res.tank, { dataFile: 'tankwright-ac.data' });
    offerFile(`tankwright-${res.analysis.mode}-tank-${fileFrequency(res.analysis.loadedResonantFrequency)}.cir`, text, 'text/plain');
  };
  const downloadCsv = () => {
    const res = r();
    if (!res || stale()) return;
    const sw = res.sweep;
    const rows = ['frequency_Hz,impedance_magnitude_ohm,impedance_phase_deg,response_dB'];
    for (let i = 0; i < sw.frequency.length; i++) {
      rows.push(`${cell(sw.frequency[i])},${cell(sw.magnitude[i])},${cell(sw.phase[i])},${cell(sw.response[i])}`);
    }
    offerFile(`tankwright-${res.analysis.mode}-sweep-${fileFrequency(res.analysis.loadedResonantFrequency)}.csv`, rows.join('\n') + '\n', 'text/csv');
  };

  const fmtF = (x: number) => formatQuantity(x, 'Hz', 4);
  /** Log frequency axis only when the sweep spans more than a factor of 3 (low Q). */
  const wide = () => {
    const fr = r()?.sweep.frequency;
    return fr !== undefined && fr[fr.length - 1] / fr[0] > 3;
  };
  const markers = () => {
    const e = r()?.edges;
    const m = [];
    if (e?.lower !== undefined) m.push({ x: e.lower, label: 'f₁' });
    if (e?.upper !== undefined) m.push({ x: e.upper, label: 'f₂' });
    return m;
  };

  return (
    <div class="tw-bench tank-bench" data-bench="tank">
      <LinkNotices notices={notices()} />
      <Show when={handoff()}>
        <p class="tank-handoff" role="status" id="handoff">{handoff()}</p>
      </Show>
      <div class="tw-bench-inputs">
        <Choice name="mode" legend="Tank" value={mode()} onChoose={switchMode} options={[['parallel', 'Parallel'], ['series', 'Series']]} />

        <fieldset class="tank-group">
          <legend>Coil</legend>
          <QuantityField id="L" label="Inductance" symbol="L" q={L} hint="e.g. 4.7 µH, 4u7, 220n" designError={fieldError('L')} />
          <Choice class="tank-sub" name="coilLoss" legend="Coil loss given as" value={coilLoss()} onChoose={setCoilLoss} options={[['Q', 'Q'], ['R', 'Series resistance']]} />
          <Show when={coilLoss() === 'Q'} fallback={
            <QuantityField id="Rcoil" label="Coil series resistance" symbol="R" q={Rcoil} hint="AC resistance at the working frequency, e.g. 1.4 Ω, 1R4" designError={fieldError('Rcoil')} />
          }>
            <QuantityField id="coilQ" label="Coil Q" symbol="Q" q={coilQ} hint="plain number, e.g. 150" designError={fieldError('coilQ')} />
          </Show>
          <QuantityField id="Cself" label="Self-capacitance (optional)" symbol="Cₛ" q={Cself} hint="across the coil, e.g. 3 pF; blank: neglected" designError={fieldError('Cself')} />
        </fieldset>

        <fieldset class="tank-group">
          <legend>Capacitor</legend>
          <QuantityField id="C" label="Capacitance" symbol="C" q={C} hint="e.g. 100 pF, 4n7, 2*47p" designError={fieldError('C')} />
          <Choice class="tank-sub" name="capLoss" legend="Capacitor loss given as" value={capLoss()} onChoose={setCapLoss} options={[['Q', 'Q'], ['ESR', 'ESR'], ['DF', 'tan δ']]} />
          <Show when={capLoss() === 'Q'}>
            <QuantityField id="capQ" label="Capacitor Q" symbol="Q" q={capQ} hint="plain number, e.g. 1000 (NP0/C0G ceramic, mica: 1000 and up)" designError={fieldError('capQ')} />
          </Show>
          <Show when={capLoss() === 'ESR'}>
            <QuantityField id="ESR" label="Equivalent series resistance" q={ESR} hint="e.g. 20 mΩ, 0.02" designError={fieldError('ESR')} />
          </Show>
          <Show when={capLoss() === 'DF'}>
            <QuantityField id="DF" label="Dissipation factor" symbol="tan δ" q={DF} hint="plain number, e.g. 0.001 (= 0.1 %)" designError={fieldError('DF')} />
          </Show>
        </fieldset>

        <fieldset class="tank-group">
          <legend>{parallel() ? 'Source and load (across the tank)' : 'Source and load (in series)'}</legend>
          <QuantityField id="Rs" label="Source resistance (optional)" symbol="Rₛ" q={Rs} hint={parallel() ? 'e.g. 10k; blank: ideal current source' : 'e.g. 50 Ω; blank: ideal voltage source'} designError={fieldError('Rs')} />
          <QuantityField id="Rload" label="Load resistance (optional)" q={Rload} hint={parallel() ? 'e.g. 10k; blank: no load' : 'e.g. 50 Ω; blank: no load'} designError={fieldError('Rload')} />
          <QuantityField id="f" label="Frequency of the Q figures (optional)" symbol="f" q={f} hint="where the Q, ESR or tan δ were measured; blank: at resonance" designError={fieldError('f')} />
        </fieldset>

        <fieldset class="tank-group">
          <legend>Drive and ratings</legend>
          <Choice class="tank-sub" name="drive" legend="Drive given as" value={drive()} onChoose={setDrive} options={[['V', 'Voltage'], ['P', 'Power']]} />
          <Show when={drive() === 'V'} fallback={
            <QuantityField id="P" label="RF power into tank and load (optional)" symbol="P" q={P} hint="e.g. 5 W, 100m; blank: no stress figures" designError={fieldError('P')} />
          }>
            <QuantityField id="V" label={parallel() ? 'RMS voltage across the tank (optional)' : 'RMS voltage across the circuit (optional)'} symbol="V" q={V} hint="e.g. 1 V, 250m; blank: no stress figures" designError={fieldError('V')} />
          </Show>
          <QuantityField id="Vrating" label="Capacitor voltage rating (optional)" q={Vrating} hint="peak volts, derated for RF as the maker says" designError={fieldError('Vrating')} />
          <QuantityField id="Irating" label="Wire current rating (optional)" q={Irating} hint="A RMS the coil's wire carries at this frequency" designError={fieldError('Irating')} />
        </fieldset>
        <Show when={generalError()}>
          <p class="tw-bench-error" role="alert">{generalError()}</p>
        </Show>
      </div>

      <div class="tw-bench-results" aria-live="polite">
        <ResultRow id="out-f" label={shownMode() === 'parallel' ? 'Resonant frequency (|Z| peak)' : 'Resonant frequency (|Z| dip)'} symbol="f" value={a()?.resonantFrequency} unit="Hz" significant={6} stale={stale()} primary>
          <Formula math={props.frequency} source="Thomson's formula; Terman 1943" validity="peak found from the impedance itself; lumped model, f well below the coil's self-resonance" />
          <Show when={a()}>
            <p class="tw-formula-meta" id="out-f-detail">
              Lossless f₀ = {fmtF(a()!.naturalFrequency)}; the {shownMode() === 'parallel' ? 'peak' : 'dip'} is {relative((a()!.resonantFrequency - a()!.naturalFrequency) / a()!.naturalFrequency)} {a()!.resonantFrequency < a()!.naturalFrequency ? 'below' : 'above'} it
              {a()!.zeroPhaseFrequency !== undefined ? `; zero phase at ${fmtF(a()!.zeroPhaseFrequency!)}` : '; no zero-phase point near resonance'}
              {'. Loaded peak: '}{fmtF(a()!.loadedResonantFrequency)}.
            </p>
          </Show>
        </ResultRow>
        <ResultRow id="out-qu" label="Unloaded Q (coil and capacitor)" symbol="Qᵤ" value={a()?.unloadedQ} stale={stale()}>
          <Formula math={props.unloadedQ} source="Pozar, Microwave Engineering" validity="losses add; with Cₛ the capacitor's share is weighted by C/(C + Cₛ)" />
        </ResultRow>
        <ResultRow id="out-ql" label="Loaded Q (with source and load)" value={a()?.loadedQ} stale={stale()} primary>
          <Formula math={shownMode() === 'parallel' ? props.loadedQParallel : props.loadedQSeries} source="Pozar, Microwave Engineering" validity={`external Q here ${a() && Number.isFinite(a()!.externalQ) ? a()!.externalQ.toPrecision(4) : '∞ (no source or load resistance)'}`} />
        </ResultRow>
        <ResultRow id="out-bw" label="Bandwidth (−3 dB, loaded)" symbol="B" value={a()?.bandwidth} unit="Hz" stale={stale()} primary>
          <Formula math={props.bandwidth} source="Terman 1943" validity="the value shown is the exact −3 dB width of the computed response; f/Q_L agrees to about 1/Q_L²" />
          <Show when={r()?.edges.lower !== undefined && r()?.edges.upper !== undefined}>
            <p class="tw-formula-meta" id="out-bw-edges">−3 dB points: {fmtF(r()!.edges.lower!)} and {fmtF(r()!.edges.upper!)}. Unloaded bandwidth {formatQuantity(a()!.unloadedBandwidth, 'Hz', 4)}.</p>
          </Show>
        </ResultRow>
        <ResultRow id="out-rd" label={shownMode() === 'parallel' ? 'Dynamic resistance (tank alone, at its peak)' : 'Resistance at resonance (tank alone)'} value={a()?.dynamicResistance} unit="Ω" stale={stale()}>
          <Formula math={shownMode() === 'parallel' ? props.dynamicParallel : props.dynamicSeries} source="Terman 1943" validity={`shown: |Z| computed at the ${shownMode() === 'parallel' ? 'peak' : 'dip'}; the rule agrees for Q above about 10`} />
          <Show when={a()}>
            <p class="tw-formula-meta">With source and load: |Z| = {formatQuantity(a()!.loadedImpedance, 'Ω', 4)} at the loaded peak.</p>
          </Show>
        </ResultRow>
        <div class="tank-pair">
          <ResultRow id="out-qcoil" label="Coil Q at f₀" value={a()?.coilQ} stale={stale()}>
            <Formula math={props.coilQ} source="definition of Q" />
            <Show when={a()}>
              <p class="tw-formula-meta">Series R {formatQuantity(a()!.coilResistance, 'Ω', 4)}{Number.isFinite(r()?.coilParallelR ?? Infinity) ? `, as a parallel resistance ${formatQuantity(r()!.coilParallelR, 'Ω', 4)}` : ''}.</p>
            </Show>
          </ResultRow>
          <ResultRow id="out-qcap" label="Capacitor Q at f₀" value={a()?.capacitorQ} stale={stale()}>
            <Formula math={props.capacitorQ} source="definition of Q and tan δ" />
            <Show when={a()}>
              <p class="tw-formula-meta">ESR {formatQuantity(a()!.capacitorEsr, 'Ω', 4)}.</p>
            </Show>
          </ResultRow>
        </div>
        <ResultRow id="out-il" label="Insertion loss as a single-resonator filter, dB" value={a()?.insertionLoss} significant={3} stale={stale()}>
          <Formula math={props.insertionLoss} source="common practice; derived on the method page" validity="equal source and load resistances, near resonance" />
          <Show when={a()} >
            <p class="tw-formula-meta">
              {a()!.insertionLoss === undefined
                ? 'Give both the source and the load resistance to see the insertion loss.'
                : `Transducer loss at the loaded peak (includes any mismatch): ${a()!.transducerLoss!.toFixed(2)} dB.`}
            </p>
          </Show>
        </ResultRow>

        <h2 class="tank-heading">Voltages and currents at resonance</h2>
        <Show when={!driveBlank()} fallback={<p class="tw-table-note">Give the drive (voltage or power) to see the capacitor voltage and the circulating current.</p>}>
          <div class="tank-stack">
            <ResultRow id="out-vc" label="Capacitor voltage, RMS" value={s()?.capacitorVoltage} unit="V" stale={stressStale()}>
              <Formula math={shownMode() === 'parallel' ? props.capVoltageParallel : props.capVoltageSeries} source="circuit algebra at resonance" />
            </ResultRow>
            <ResultRow id="out-vcpk" label="Capacitor voltage, peak" value={s()?.capacitorVoltagePeak} unit="V" stale={stressStale()}>
              <p class="tw-formula-meta">√2 × RMS for a sine; compare with the capacitor's rating.</p>
            </ResultRow>
          </div>
          <ResultRow id="out-icirc" label="Circulating current (in the coil), RMS" value={s()?.circulatingCurrent} unit="A" stale={stressStale()}>
            <Formula math={shownMode() === 'parallel' ? props.circulatingParallel : props.circulatingSeries} source="circuit algebra at resonance" />
            <Show when={s()}>
              <p class="tw-formula-meta">Drive {formatQuantity(s()!.driveVoltage, 'V', 4)} RMS, {formatQuantity(s()!.power, 'W', 4)}, line current {formatQuantity(s()!.lineCurrent, 'A', 4)} at {fmtF(s()!.frequency)}.</p>
            </Show>
          </ResultRow>
        </Show>
        <NoteList notes={notes()} />
      </div>

      <section class="tank-plots" aria-label="Sweep plots and downloads">
        <Show when={r()}>
          <Plot
            id="plot-z"
            caption={`Impedance of the ${shownMode()} tank alone: |Z| (log scale, left) and phase (right) from ${fmtF(r()!.sweep.frequency[0])} to ${fmtF(r()!.sweep.frequency[SWEEP_POINTS - 1])}, ${SWEEP_POINTS} points.`}
            x={r()!.sweep.frequency}
            xLabel="Frequency"
            xLog={wide()}
            formatX={tick('Hz', 4)}
            series={[
              { label: '|Z|', values: r()!.sweep.magnitude, unit: 'Ω' },
              { label: 'Phase', values: r()!.sweep.phase, unit: '°', axis: 'right', dash: true },
            ]}
            yLabel="|Z| (Ω)"
            yLog
            formatY={tick('Ω', 3)}
            y2Label="Phase (°)"
            stale={stale()}
          />
          <Plot
            id="plot-response"
            caption={`Loaded response, dB relative to its peak (${shownMode() === 'parallel' ? 'tank voltage from the source through its resistance' : 'loop current'}); dashed lines f₁ and f₂ mark the −3 dB points.`}
            x={r()!.sweep.frequency}
            xLabel="Frequency"
            xLog={wide()}
            formatX={tick('Hz', 4)}
            series={[{ label: 'Response', values: r()!.sweep.response, unit: 'dB' }]}
            yLabel="Response (dB)"
            markers={markers()}
            stale={stale()}
          />
          <div class="tank-downloads">
            <button type="button" class="tw-copy" id="dl-netlist" onClick={downloadNetlist} disabled={stale()}>Download SPICE netlist (.cir)</button>
            <button type="button" class="tw-copy" id="dl-csv" onClick={downloadCsv} disabled={stale()}>Download sweep (.csv)</button>
            <span class="tw-table-note">Run the netlist with <code>ngspice -b</code>; it writes frequency, Re Z and Im Z to <code>tankwright-ac.data</code>.</span>
          </div>
        </Show>
      </section>
    </div>
  );
}
