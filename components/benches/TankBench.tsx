/**
 * Tank bench: a lossy parallel or series LC tank between a source and a load.
 * The answer first (resonance, loaded Q, bandwidth, dynamic resistance, and
 * the transducer loss from source to load when both are given), then the
 * detailed cards with their formulas; a prominent note when the terminations
 * collapse the tank; capacitor voltage and circulating current with cautions
 * once a drive is given (the section is closed until then); |Z|, phase and
 * the loaded response plotted from a 1,000-point sweep; the SPICE netlist and
 * the sweep offered as files.
 *
 * The bench is its field table (TANK_FIELDS in tankFields.ts): the link, the
 * fields in use and where a core error is shown all come from it. The one
 * addition to the link is `coil`: the Coil bench's own link query, carried by
 * a coil handed over, read with the Coil bench's table and offered back as
 * "Back to the coil". That table loads only when a link carries a coil.
 */
import { createEffect, createMemo, createSignal, Show, type JSX } from 'solid-js';
// Core modules imported one by one, not through the index: the page then ships only these.
import type { DesignNote } from '../../src/core/notes';
import { tankNetlist } from '../../src/core/netlist';
import { seriesToParallelResistance } from '../../src/core/qRules';
import { analyzeTank, type TankAnalysis } from '../../src/core/tank';
import { tankStress } from '../../src/core/tankStress';
import { sweepTank } from '../../src/core/tankSweep';
import { formatNumber, formatQuantity } from '../../src/quantity';
import { createBenchState } from '../kit/bench';
import { createUrlState } from '../kit/createUrlState';
import { Field } from '../kit/Field';
import { formatShift } from '../kit/format';
import { Formula } from '../kit/Formula';
import { createAwake, inParts, Later, type BenchParts } from '../kit/Later';
import { LinkNotices } from '../kit/LinkNotices';
import { NoteList } from '../kit/Note';
import { Plot } from '../kit/Plot';
import { ResultRow } from '../kit/ResultRow';
import { AnswerDock, Summary, type SummaryItem } from '../kit/Summary';
import {
  collapseNoteOf, DRIVE_KEYS, handOffGreeting, readCoilLink, splitCoilLink, stressOf, sweepSpan, SWEEP_POINTS, TANK_FIELDS,
  tankOf, withCoilLink, type TankSpec,
} from './tankFields';

export type TankFormulaKey =
  | 'frequency' | 'unloadedQ' | 'loadedQParallel' | 'loadedQSeries' | 'bandwidth' | 'dynamicParallel' | 'dynamicSeries' | 'coilQ'
  | 'capacitorQ' | 'transducerLoss' | 'insertionLoss' | 'capVoltageParallel' | 'capVoltageSeries' | 'circulatingParallel' | 'circulatingSeries';
/** The page's typeset formulas, handed over as slots of the island (see kit/Formula). */
export type TankFormulas = Record<TankFormulaKey, JSX.Element>;

/** Where the method page explains the collapse and the remedies (a tap, a link winding, a capacitive divider). */
const MATCHING_HREF = '/methods/tank/#when-the-terminations-collapse-the-tank';

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

const fmtF = (x: number) => formatQuantity(x, 'Hz', 4);
const fmtDb = (x: number) => `${formatNumber(x, 3)} dB`;
/** Plot readouts: the response to 0.01 dB ("0.00 dB" at the peak, not "−0.000004813 dB"), the phase to 0.1°. */
const fmtResponse = (y: number) => `${(Math.round(y * 100) / 100 || 0).toFixed(2).replace('-', '−')} dB`;
const fmtDeg = (y: number) => `${(Math.round(y * 10) / 10 || 0).toFixed(1).replace('-', '−')}°`;
const fmtQ = (x: number) => (Number.isFinite(x) ? formatNumber(x, 4) : '∞ (ideal parts)');

/** The answer first: resonance, loaded Q, bandwidth, dynamic resistance; the transducer loss when source and load are both given. */
function summaryItems(a: TankAnalysis): SummaryItem[] {
  const parallel = a.mode === 'parallel';
  const shift = formatShift(a.resonantFrequency / a.naturalFrequency - 1);
  const loadedShift = formatShift(a.loadedResonantFrequency / a.resonantFrequency - 1);
  const resonance = [
    shift ? `${shift} from the lossless f₀ ${fmtF(a.naturalFrequency)}` : 'at the lossless f₀ (within 0.1 %)',
    loadedShift ? `loaded: ${fmtF(a.loadedResonantFrequency)}` : null,
  ].filter(Boolean).join('; ');
  const items: SummaryItem[] = [
    { id: 'sum-f', label: parallel ? 'Resonance (|Z| peak)' : 'Resonance (|Z| dip)', symbol: 'f', short: 'Resonance', value: a.resonantFrequency, unit: 'Hz', main: true, detail: resonance },
    { id: 'sum-ql', label: 'Loaded Q', value: a.loadedQ, detail: `unloaded ${fmtQ(a.unloadedQ)}` },
    { id: 'sum-bw', label: 'Bandwidth, −3 dB', symbol: 'B', short: 'BW', value: a.bandwidth, unit: 'Hz', detail: `${fmtF(a.lowerFrequency)} to ${fmtF(a.upperFrequency)}` },
    {
      id: 'sum-rd', label: parallel ? 'Dynamic resistance' : 'Resistance at resonance', value: a.dynamicResistance, unit: 'Ω',
      text: Number.isFinite(a.dynamicResistance) ? undefined : '∞', detail: parallel ? 'the tank alone, at its peak' : 'the tank alone',
    },
  ];
  if (a.transducerLoss !== undefined) {
    items.push({ id: 'sum-tl', label: 'Transducer loss', value: a.transducerLoss, text: fmtDb(a.transducerLoss), detail: 'source to load, at resonance' });
  }
  return items;
}

/** The island, hydrated in parts (kit/Later): no single task blocks a phone for long. */
export default inParts('tank', TankBenchParts);

function TankBenchParts(outer: BenchParts<TankFormulas>) {
  const props = outer.formulas;
  const bench = createBenchState<TankSpec>(TANK_FIELDS);
  /** A coil handed over: its link query (written again by its table) and the greeting. */
  const [coil, setCoil] = createSignal<{ query: string; greeting: string } | null>(null);
  const [coilNotice, setCoilNotice] = createSignal<string | null>(null);
  const [driveOpen, setDriveOpen] = createSignal(false);

  const linkNotices = createUrlState({
    readLink(search) {
      const { rest, coil: coilText } = splitCoilLink(search);
      const d = bench.readLink(rest);
      if (coilText !== undefined) {
        // The Coil bench's table, only for a link that carries a coil.
        import('./coilFields').then(
          ({ COIL_FIELDS }) => {
            const r = readCoilLink(COIL_FIELDS, coilText);
            if ('notice' in r) setCoilNotice(r.notice);
            else setCoil({ query: r.query, greeting: handOffGreeting(d.texts) });
          },
          () => setCoilNotice('The way back to the Coil bench could not be loaded; the values the link gave are shown.'),
        );
      }
      // A link that carries a drive or a rating opens the section that holds them.
      if (DRIVE_KEYS.some((k) => (d.texts[k] ?? '') !== '')) setDriveOpen(true);
      return { notices: d.notices };
    },
    linkQuery: () => withCoilLink(bench.linkQuery(), coil()?.query),
  });
  const awake = createAwake(() => bench.load(outer.early));
  const notices = () => {
    const extra = coilNotice();
    return extra ? [...linkNotices(), extra] : linkNotices();
  };

  const calc = bench.compute((spec) => {
    const tank = tankOf(spec);
    const analysis = analyzeTank(tank);
    // Centred on the tank's own peak with an odd number of points: the middle point is the peak itself.
    const sweep = sweepTank(tank, { ...sweepSpan(analysis.resonantFrequency, analysis.bandwidth), points: SWEEP_POINTS, spacing: 'log' });
    const x0 = 2 * Math.PI * analysis.naturalFrequency * tank.inductance;
    return {
      tank,
      analysis,
      sweep,
      coilParallelR: analysis.coilResistance > 0 ? seriesToParallelResistance(analysis.coilResistance, x0) : Infinity,
    };
  });
  /** The driven tank's voltages and currents; null while no drive is given. */
  const stress = bench.compute((spec) => {
    const driven = stressOf(spec);
    return driven ? tankStress(driven) : null;
  });

  const r = calc.result;
  const a = () => r()?.analysis;
  const s = () => stress.result() ?? undefined;
  const stale = () => calc.stale();
  const stressStale = () => stress.stale();
  const parallel = () => bench.choice('mode') === 'parallel';
  const shownMode = () => a()?.mode ?? bench.choice('mode');
  const driveGiven = () => !bench.field(bench.choice('drive') === 'P' ? 'P' : 'V').blank();
  const ratingsGiven = () => !bench.field('Vrating').blank() || !bench.field('Irating').blank();
  /** A message at a field of the drive section opens it, so it is never hidden. */
  const driveTrouble = () => DRIVE_KEYS.some((k) => bench.uses(k) && (bench.field(k).error() !== null || bench.designError(k) !== null));

  const items = createMemo(() => (a() ? summaryItems(a()!) : undefined));
  const collapse = createMemo(() => {
    const an = a();
    return an ? collapseNoteOf(an) : undefined;
  });
  // The Match bench's link with this tank's values: its code (the Match bench's table) is fetched when the tank collapses.
  const [matchLinks, setMatchLinks] = createSignal<typeof import('./matchLinks')>();
  createEffect(() => {
    if (collapse() && !matchLinks()) void import('./matchLinks').then((m) => setMatchLinks(() => m), (e: unknown) => console.warn(e));
  });
  const matchHref = createMemo(() => {
    const m = matchLinks();
    const t = r()?.tank;
    const an = a();
    if (!m || !t || !an || !collapse() || an.mode !== 'parallel') return undefined;
    const href = m.matchLinkFor({
      inductance: t.inductance,
      capacitance: t.capacitance + (t.coilSelfCapacitance ?? 0),
      unloadedQ: an.unloadedQ,
      sourceResistance: t.sourceResistance,
      loadResistance: t.loadResistance,
    });
    if (t.loadResistance !== undefined) return href;
    // No load here: none there either (a blank optional field is written empty, not left to its default).
    const params = new URLSearchParams(href.slice(href.indexOf('?') + 1));
    params.set('Rload', '');
    return `/match/?${params.toString()}`;
  });
  const notes = createMemo((): DesignNote[] => {
    const seen = new Set<string>();
    const shown = collapse();
    const out: DesignNote[] = [];
    for (const n of [...(s()?.notes ?? []), ...(a()?.notes ?? [])]) {
      if (seen.has(n.message) || (shown && n.message === shown.message)) continue;
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

  /** Log frequency axis only when the sweep spans more than a factor of 3 (low Q). */
  const wide = () => {
    const fr = r()?.sweep.frequency;
    return fr !== undefined && fr[fr.length - 1] / fr[0] > 3;
  };
  const edges = () => {
    const an = a();
    return an ? [{ x: an.lowerFrequency, label: 'f₁' }, { x: an.upperFrequency, label: 'f₂' }] : [];
  };
  const unequal = () => {
    const t = r()?.tank;
    return t?.sourceResistance !== undefined && t.loadResistance !== undefined && Math.abs(t.sourceResistance - t.loadResistance) > 0.01 * Math.max(t.sourceResistance, t.loadResistance);
  };
  /** The resonance card's line: the lossless f₀, and the shifts worth showing (from 0.1 %). */
  const resonanceDetail = (an: TankAnalysis) => {
    const word = an.mode === 'parallel' ? 'peak' : 'dip';
    const shift = formatShift(an.resonantFrequency / an.naturalFrequency - 1);
    const out = [`Lossless f₀ = ${fmtF(an.naturalFrequency)}; the |Z| ${word} is ${shift ? `${shift} from it` : 'there within 0.1 %'}.`];
    if (an.zeroPhaseFrequency === undefined) out.push('The impedance is never purely resistive near resonance.');
    else {
      const zp = formatShift(an.zeroPhaseFrequency / an.resonantFrequency - 1);
      if (zp) out.push(`Zero phase at ${fmtF(an.zeroPhaseFrequency)} (${zp} from the ${word}).`);
    }
    const loaded = formatShift(an.loadedResonantFrequency / an.resonantFrequency - 1);
    if (loaded) out.push(`With source and load the ${word} is at ${fmtF(an.loadedResonantFrequency)} (${loaded}).`);
    return out.join(' ');
  };

  return (
    <div class="tw-bench tank-bench" data-bench="tank" data-awake={awake() ? '' : undefined}>
      <LinkNotices notices={notices()} />
      <Show when={coil()}>
        <p class="tank-handoff" role="status" id="handoff">
          {coil()!.greeting}{' '}
          <a id="back-to-coil" href={`/coil/?${coil()!.query}`}>Back to this coil on the Coil bench</a>
        </p>
      </Show>
      <div class="tw-bench-inputs">
        <Later>
        <Field bench={bench} name="mode" />

        <fieldset class="tank-group">
          <legend>Coil</legend>
          <Field bench={bench} name="L" />
          <Field bench={bench} name="coilLoss" class="tank-sub" />
          <Field bench={bench} name="coilQ" />
          <Field bench={bench} name="Rcoil" />
          <Field bench={bench} name="Cself" />
        </fieldset>
        </Later>

        <Later>
        <fieldset class="tank-group">
          <legend>Capacitor</legend>
          <Field bench={bench} name="C" />
          <Field bench={bench} name="capLoss" class="tank-sub" />
          <Field bench={bench} name="capQ" />
          <Field bench={bench} name="ESR" />
          <Field bench={bench} name="DF" />
        </fieldset>

        <fieldset class="tank-group">
          <legend>{parallel() ? 'Source and load (across the tank)' : 'Source and load (in series)'}</legend>
          <Field bench={bench} name="Rs" />
          <Field bench={bench} name="Rload" />
          <Field bench={bench} name="f" />
        </fieldset>
        </Later>

        <Later>
        <details class="tank-group tank-drive" id="drive" open={driveOpen() || driveTrouble()} onToggle={(e) => setDriveOpen(e.currentTarget.open)}>
          <summary>Drive and ratings <span class="tank-optional">(for a driven tank)</span></summary>
          <div class="tank-drive-body">
            <p class="tw-field-hint">Receiver work needs none of this. Give the drive to see the capacitor voltage and the circulating current, with cautions.</p>
            <Field bench={bench} name="drive" class="tank-sub" />
            <Field bench={bench} name="V" />
            <Field bench={bench} name="P" />
            <Field bench={bench} name="Vrating" />
            <Field bench={bench} name="Irating" />
          </div>
        </details>
        </Later>
        <Show when={bench.generalError()}>
          <p class="tw-bench-error" role="alert">{bench.generalError()}</p>
        </Show>
        <AnswerDock answer={items() && { items: items()!, stale: stale() }} />
      </div>

      <div class="tw-bench-results" aria-live="polite">
        <Later>
        <Show when={a()}>
          <Summary items={items()!} stale={stale()} />
        </Show>
        <Show when={collapse()}>
          <section class="tank-collapse" id="collapse" aria-labelledby="collapse-title" classList={{ 'tw-result--stale': stale() }}>
            <h3 id="collapse-title">A tap or a link winding is needed</h3>
            <p>{collapse()!.message}</p>
            <Show when={shownMode() === 'parallel'}>
              <p><a id="to-match" href={matchHref() ?? '/match/'}>Find the tap, divider, link or L-network on the Match bench</a> (carries this tank’s L, C, unloaded Q, source and load).</p>
            </Show>
            <p>More on the method page: <a href={MATCHING_HREF}>when the terminations collapse the tank</a>.</p>
          </section>
        </Show>
        </Later>
        <Later>
        <ResultRow id="out-f" label={shownMode() === 'parallel' ? 'Resonant frequency (|Z| peak)' : 'Resonant frequency (|Z| dip)'} symbol="f" value={a()?.resonantFrequency} unit="Hz" stale={stale()} primary>
          <Formula math={props.frequency} source="Thomson's formula; Terman 1943" validity="peak found from the impedance itself; lumped model, f well below the coil's self-resonance" />
          <Show when={a()}>
            <p class="tw-formula-meta" id="out-f-detail">{resonanceDetail(a()!)}</p>
          </Show>
        </ResultRow>
        <ResultRow id="out-qu" label="Unloaded Q (coil and capacitor)" symbol="Qᵤ" value={a()?.unloadedQ} stale={stale()}>
          <Formula math={props.unloadedQ} source="Pozar, Microwave Engineering" validity="losses add; with Cₛ the capacitor's share is weighted by C/(C + Cₛ)" />
        </ResultRow>
        <ResultRow id="out-ql" label="Loaded Q (with source and load)" value={a()?.loadedQ} stale={stale()} primary>
          <Formula math={shownMode() === 'parallel' ? props.loadedQParallel : props.loadedQSeries} source="Pozar, Microwave Engineering" validity={`external Q here ${a() && Number.isFinite(a()!.externalQ) ? formatNumber(a()!.externalQ, 3) : '∞ (no source or load resistance)'}`} />
        </ResultRow>
        <ResultRow id="out-bw" label="Bandwidth (−3 dB, loaded)" symbol="B" value={a()?.bandwidth} unit="Hz" stale={stale()} primary>
          <Formula math={props.bandwidth} source="Terman 1943" validity="the value shown is the exact −3 dB width of the computed response; f/Q_L agrees to about 1/Q_L²" />
          <Show when={a()}>
            <p class="tw-formula-meta" id="out-bw-edges">−3 dB points: {fmtF(a()!.lowerFrequency)} and {fmtF(a()!.upperFrequency)}. Unloaded bandwidth {fmtF(a()!.unloadedBandwidth)}.</p>
          </Show>
        </ResultRow>
        <ResultRow id="out-rd" label={shownMode() === 'parallel' ? 'Dynamic resistance (tank alone, at its peak)' : 'Resistance at resonance (tank alone)'} value={a()?.dynamicResistance} unit="Ω" stale={stale()}>
          <Formula math={shownMode() === 'parallel' ? props.dynamicParallel : props.dynamicSeries} source="Terman 1943" validity={`shown: |Z| computed at the ${shownMode() === 'parallel' ? 'peak' : 'dip'}; the rule agrees for Q above about 10`} />
          <Show when={a()}>
            <p class="tw-formula-meta">With source and load: |Z| = {formatQuantity(a()!.loadedImpedance, 'Ω', 4)} at the loaded {shownMode() === 'parallel' ? 'peak' : 'dip'}.</p>
          </Show>
        </ResultRow>

        </Later>
        <Later>
        <Show
          when={a()?.transducerLoss !== undefined}
          fallback={<p class="tw-table-note" id="out-loss-none">Give both the source and the load resistance to see the loss from source to load.</p>}
        >
          <div class="tank-pair" id="losses">
            <ResultRow id="out-tl" label="Transducer loss, source to load, dB" value={a()?.transducerLoss} significant={3} stale={stale()} primary>
              <Formula math={props.transducerLoss} source="Pozar, Microwave Engineering (transducer power gain)" validity="from the circuit at the loaded resonance, for any source and load" />
              <p class="tw-formula-meta" id="out-tl-parts">
                Mismatch at the source {fmtDb(a()!.mismatchLoss!)} + lost in the coil and capacitor {fmtDb(a()!.dissipativeLoss!)}.
              </p>
            </ResultRow>
            <ResultRow id="out-il" label="Insertion-loss rule, dB" value={a()?.insertionLoss} significant={3} stale={stale()}>
              <Formula math={props.insertionLoss} source="common practice; derived on the method page" validity="equal source and load resistances only" />
              <p class="tw-formula-meta" id="out-il-note">
                {unequal()
                  ? 'Source and load differ here, so the rule does not apply: read the transducer loss.'
                  : 'Equal terminations: the rule and the transducer loss agree.'}
              </p>
            </ResultRow>
          </div>
        </Show>

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

        </Later>
        <Later>
        <Show when={driveGiven()} fallback={
          <Show when={ratingsGiven()}>
            <p class="tw-table-note" id="out-stress-none">Give the drive (voltage or power) to check the capacitor and wire against their ratings.</p>
          </Show>
        }>
          <h2 class="tank-heading" id="stress-title">Voltages and currents at resonance</h2>
          <div class="tank-stack">
            <ResultRow id="out-vc" label="Capacitor voltage, RMS" value={s()?.capacitorVoltage} unit="V" stale={stressStale()}>
              <Formula math={shownMode() === 'parallel' ? props.capVoltageParallel : props.capVoltageSeries} source="circuit algebra at resonance" />
            </ResultRow>
            <ResultRow id="out-vcpk" label="Capacitor voltage, peak" value={s()?.capacitorVoltagePeak} unit="V" stale={stressStale()}>
              <p class="tw-formula-meta">√2 × RMS for a sine; compare with the capacitor's rating.</p>
            </ResultRow>
            <ResultRow id="out-icirc" label="Circulating current (in the coil), RMS" value={s()?.circulatingCurrent} unit="A" stale={stressStale()}>
              <Formula math={shownMode() === 'parallel' ? props.circulatingParallel : props.circulatingSeries} source="circuit algebra at resonance" />
              <Show when={s()}>
                <p class="tw-formula-meta">Drive {formatQuantity(s()!.driveVoltage, 'V', 4)} RMS, {formatQuantity(s()!.power, 'W', 4)}, line current {formatQuantity(s()!.lineCurrent, 'A', 4)} at {fmtF(s()!.frequency)}.</p>
              </Show>
            </ResultRow>
          </div>
        </Show>
        <NoteList notes={notes()} />
        </Later>
      </div>

      <section class="tank-plots" aria-label="Sweep plots and downloads">
        <Later>
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
              { label: 'Phase', values: r()!.sweep.phase, unit: '°', axis: 'right', dash: true, format: fmtDeg },
            ]}
            yLabel="|Z| (Ω)"
            yLog
            formatY={tick('Ω', 3)}
            y2Label="Phase (°)"
            keyPoints={a() ? [{ x: a()!.resonantFrequency, label: shownMode() === 'parallel' ? '|Z| peak' : '|Z| dip' }] : []}
            stale={stale()}
          />
          <Plot
            id="plot-response"
            caption={`Loaded response, dB relative to its peak (${shownMode() === 'parallel' ? 'tank voltage from the source through its resistance' : 'loop current'}); dashed lines f₁ and f₂ mark the −3 dB points.`}
            x={r()!.sweep.frequency}
            xLabel="Frequency"
            xLog={wide()}
            formatX={tick('Hz', 4)}
            series={[{ label: 'Response', values: r()!.sweep.response, unit: 'dB', format: fmtResponse }]}
            yLabel="Response (dB)"
            markers={edges()}
            stale={stale()}
          />
          <div class="tank-downloads">
            <button type="button" class="tw-copy" id="dl-netlist" onClick={downloadNetlist} disabled={stale()}>Download SPICE netlist (.cir)</button>
            <button type="button" class="tw-copy" id="dl-csv" onClick={downloadCsv} disabled={stale()}>Download sweep (.csv)</button>
            <span class="tw-table-note">Run the netlist with <code>ngspice -b</code>; it writes frequency, Re Z and Im Z to <code>tankwright-ac.data</code>.</span>
          </div>
        </Show>
        </Later>
      </section>
    </div>
  );
}
