/**
 * Coil bench: wind a coil for an inductance, or find the inductance of a coil,
 * as a single-layer solenoid, a toroid or a multilayer coil.
 *
 * The bench is its field table (COIL_FIELDS in coilFields.ts): the link, the
 * fields in use and where a core error is shown all come from it. This file
 * only gathers the inputs, calls `designCoil` (through the table's spec
 * builder) and lays out what it returns: the answer first, then the detailed
 * cards with their formulas, the notes, the plot and the hand-off to the tank.
 */
import { createEffect, createMemo, createSignal, onMount, Show, untrack, type JSX } from 'solid-js';
import type { DesignCoilResult, DesignCoilSpec } from '../../src/core/coil';
import { formatNumber, formatQuantity, formatQuantityCompact } from '../../src/quantity';
import type { BenchState } from '../kit/bench';
import { createWakingBench, inParts, Later, type BenchParts } from '../kit/Later';
import { Fields } from '../kit/Field';
import type { Choices, SpecObject } from '../kit/fields';
import { formatShift } from '../kit/format';
import { Formula } from '../kit/Formula';
import { LinkNotices } from '../kit/LinkNotices';
import { NoteList } from '../kit/Note';
import { Plot } from '../kit/Plot';
import { ResultRow } from '../kit/ResultRow';
import { AnswerDock, Summary, type DockedAnswer, type SummaryItem } from '../kit/Summary';
import { designCoilFromFields, tankHandOff } from './coilDesign';
import { buildCoilSpec, COIL_FIELDS } from './coilFields';

export type CoilFormulaKey =
  | 'solenoidL' | 'wheeler' | 'meanDiameter' | 'overall' | 'windingLength' | 'wireSolenoid' | 'rdc' | 'racSolenoid'
  | 'q' | 'cself' | 'srf' | 'apparent' | 'toroidL' | 'al' | 'alTurns' | 'pathLength' | 'wireToroid' | 'racSkin'
  | 'toroidQ' | 'multilayerL' | 'wireMultilayer' | 'practical';
/** The page's typeset formulas, handed over as slots of the island (see kit/Formula). */
export type CoilFormulas = Record<CoilFormulaKey, JSX.Element>;

/** Points of the Q and apparent-inductance sweep drawn in the plot. */
export const SWEEP_POINTS = 120;

/** One computation: what designCoil returned, the spec it was given, the choices and the bench's link at the time. */
interface CoilRun {
  design: DesignCoilResult;
  spec: DesignCoilSpec;
  choices: Choices;
  query: string;
  /** designCoil with a sweep, worked out when the plot first asks (it is built only when scrolled into view). */
  sweep: () => DesignCoilResult['sweep'];
}

function runCoil(raw: SpecObject, choices: Choices, query: string): CoilRun {
  const design = designCoilFromFields(raw, choices);
  let sweep: DesignCoilResult['sweep'] | null = null;
  return {
    design,
    spec: buildCoilSpec(raw, choices),
    choices,
    query,
    sweep: () => (sweep ??= designCoilFromFields(raw, choices, { sweepPoints: SWEEP_POINTS }).sweep),
  };
}

/** A Q as people say it: whole numbers from 10 up, two figures below. */
export function sayQ(q: number): string {
  return q >= 10 ? String(Math.round(q)) : formatNumber(q, 2);
}

/** Turns as wound: "10.5", "46". */
const sayTurns = (n: number) => String(Number(n.toFixed(1)));
const mm = (x: number) => `${Number((x * 1e3).toPrecision(3))} mm`;
const hz = (f: number) => formatQuantityCompact(f, 'Hz', 4);

/** The wire in words: "AWG 22: 0.644 mm bare, about 0.692 mm over grade 1 enamel". */
function wireWords(run: CoilRun): string {
  const c = run.choices;
  const gauge = c.wire === 'awg' ? `AWG ${c.awg}: ` : c.wire === 'swg' ? `SWG ${c.swg}: ` : '';
  const { diameter, insulatedDiameter } = run.spec.wire;
  if (insulatedDiameter === undefined) return `${gauge}${mm(diameter)} bare copper`;
  const over = c.enamel === 'measured' ? `${mm(insulatedDiameter)} overall (measured)` : `about ${mm(insulatedDiameter)} over grade ${c.enamel} enamel (approximate maximum)`;
  return `${gauge}${mm(diameter)} bare, ${over}`;
}

/** The Q with its band, in words, for the summary and the Q card. */
function qWords(d: DesignCoilResult): { text: string; detail: string } | undefined {
  if (d.q === undefined || d.frequency === undefined) return undefined;
  const at = `at ${hz(d.frequency)}`;
  if (d.form === 'toroid') return { text: `≤ ${sayQ(d.q)}`, detail: `${at}; an upper bound: the winding’s proximity loss is not counted` };
  if (d.qLow === undefined || d.qHigh === undefined || d.qUncertainty === undefined) return { text: sayQ(d.q), detail: at };
  const leansUp = d.qUncertainty.above > 1.5 * d.qUncertainty.below;
  return {
    text: `${sayQ(d.q)} (${sayQ(d.qLow)}–${sayQ(d.qHigh)})`,
    detail: leansUp ? `${at}; likelier above ${sayQ(d.q)} than below: the method overstates close-turn loss` : `${at}; the band is our estimate of the model’s error`,
  };
}

/** The answer first: turns to wind, inductance as wound, Q, self-resonance, wire to cut. */
function summaryItems(run: CoilRun): SummaryItem[] {
  const d = run.design;
  const items: SummaryItem[] = [];
  if (d.targetInductance !== undefined) {
    items.push({
      id: 'sum-turns', label: 'Turns to wind', symbol: 'N', short: 'Turns', value: d.turns, text: sayTurns(d.turns), main: true,
      detail: d.exactTurns === undefined ? undefined : `exactly ${formatNumber(d.exactTurns, 4)} give ${formatQuantityCompact(d.targetInductance, 'H', 4)}`,
    });
  }
  const shift = d.targetInductance === undefined ? null : formatShift(d.inductance / d.targetInductance - 1);
  const atF = d.inductanceAtFrequency !== undefined && d.frequency !== undefined && formatShift(d.inductanceAtFrequency / d.inductance - 1)
    ? `${formatQuantityCompact(d.inductanceAtFrequency, 'H', 4)} at ${hz(d.frequency)}` : undefined;
  items.push({
    id: 'sum-L', label: d.targetInductance === undefined ? 'Inductance' : 'Inductance as wound', symbol: 'L', short: 'Inductance', value: d.inductance, unit: 'H',
    main: d.targetInductance === undefined,
    detail: [shift ? `${shift} from the target` : undefined, atF].filter(Boolean).join('; ') || undefined,
  });
  const q = qWords(d);
  items.push(q
    ? { id: 'sum-q', label: 'Unloaded Q', short: 'Q', value: d.q, text: q.text, brief: `${d.form === 'toroid' ? '≤ ' : ''}${sayQ(d.q!)}`, detail: q.detail }
    : { id: 'sum-q', label: 'Unloaded Q', short: 'Q', value: undefined, text: 'not estimated', brief: '—', detail: 'measure it: a multilayer winding’s loss depends on how it is laid' });
  items.push(d.selfResonantFrequency === undefined
    ? { id: 'sum-srf', label: 'Self-resonance', short: 'SRF', value: undefined, text: 'not estimated', brief: '—', detail: `not modelled for a ${d.form === 'toroid' ? 'toroid' : 'multilayer coil'}` }
    : { id: 'sum-srf', label: 'Self-resonance', short: 'SRF', value: d.selfResonantFrequency, unit: 'Hz', detail: `self-capacitance ${formatQuantityCompact(d.selfCapacitance!, 'F', 3)}` });
  items.push({ id: 'sum-wire', label: 'Wire to cut', symbol: 'ℓ', value: d.wireLength, unit: 'm', significant: 3, detail: `${wireWords(run).split(':')[0]}; both leads included` });
  return items;
}

/** The island, hydrated in parts (kit/Later): no single task blocks a phone for long. */
export default inParts('coil', CoilBenchParts);

function CoilBenchParts(outer: BenchParts<CoilFormulas>) {
  const props = outer.formulas;
  const { bench, notices, awake } = createWakingBench(COIL_FIELDS, outer.early);
  const [answer, setAnswer] = createSignal<DockedAnswer>();

  return (
    <div class="tw-bench tw-coil" data-bench="coil" data-awake={awake() ? '' : undefined}>
      <LinkNotices notices={notices()} />
      <div class="tw-bench-inputs">
        <Later>
          <Fields bench={bench} names={['form', 'give', 'L', 'N', 'dia', 'D', 'wind', 'p', 'OD', 'ID', 'h', 'core', 'AL']} />
        </Later>
        <Later>
          <Fields bench={bench} names={['mu', 'mu2', 'mD', 'mlen', 'depth', 'wire', 'awg', 'swg', 'wd', 'enamel', 'wod', 'f', 'lead', 'T']} />
        </Later>
        <Show when={bench.generalError()}>
          <p class="tw-bench-error" role="alert">{bench.generalError()}</p>
        </Show>
        <AnswerDock answer={answer()} />
      </div>

      <div class="tw-bench-results" aria-live="polite">
        <Later>
          <CoilResults bench={bench} formulas={props} onAnswer={setAnswer} />
        </Later>
      </div>
    </div>
  );
}

/** The results: the computation (designCoil through the field table) and its layout, answer first. */
function CoilResults(props: { bench: BenchState; formulas: CoilFormulas; onAnswer: (answer: DockedAnswer | undefined) => void }) {
  const bench = props.bench;
  const calc = bench.compute((raw, choices) => runCoil(raw, choices, untrack(() => bench.linkQuery())));
  const r = calc.result;
  const d = () => r()?.design;
  const stale = () => calc.stale();
  /** The computed coil's own choices (the layout of its results follows them, not the inputs being edited). */
  const rc = (key: string) => r()?.choices[key];
  const form = () => d()?.form;
  const fText = () => (d()?.frequency === undefined ? 'f' : hz(d()!.frequency!));

  const items = createMemo(() => (r() ? summaryItems(r()!) : undefined));
  createEffect(() => props.onAnswer(items() && { items: items()!, stale: stale() }));
  const handOff = createMemo(() => (r() ? tankHandOff(r()!.design, r()!.query) : undefined));
  // The Match bench's link: its code (the Match bench's field table) arrives once the bench is awake.
  const [matchLinks, setMatchLinks] = createSignal<typeof import('./matchLinks')>();
  onMount(() => void import('./matchLinks').then((m) => setMatchLinks(() => m), (e: unknown) => console.warn(e)));
  const matchHref = createMemo(() => {
    const m = matchLinks();
    return m && r() && r()!.design.frequency !== undefined ? m.matchLinkFor({ coil: r()!.spec }) : undefined;
  });
  const plotScale = createMemo(() => {
    const l = d()?.inductance ?? 1e-6;
    return l < 1e-6 ? { scale: 1e9, unit: 'nH' } : l < 1e-3 ? { scale: 1e6, unit: 'µH' } : { scale: 1e3, unit: 'mH' };
  });
  /** Axis ticks: "1 MHz", "10 MHz"; uPlot leaves the unlabelled log ticks null. */
  const frequencyTick = (x: number) => (typeof x === 'number' && Number.isFinite(x) ? formatQuantityCompact(x, 'Hz', 3) : '');

  return (
    <>
        <Later>
        <Show when={r()}>
          <Summary items={items()!} stale={stale()} />
        </Show>
        <p class="tw-coil-wire-summary" id="out-wire-size">Wire: {r() ? wireWords(r()!) : ''}</p>

        </Later>
        <Later>
        <Show when={d()?.targetInductance !== undefined}>
          <ResultRow id="out-turns" label="Turns to wind" symbol="N" value={d()?.turns} stale={stale()} primary significant={sayTurns(d()?.turns ?? 1).replace('.', '').length}>
            <p class="tw-coil-detail" id="out-turns-detail">
              Exactly {formatNumber(d()!.exactTurns!, 5)} turns give {formatQuantityCompact(d()!.targetInductance!, 'H', 4)}; wound with{' '}
              {sayTurns(d()!.turns)} {form() === 'solenoid' ? '(nearest half turn)' : '(nearest whole turn)'} it is{' '}
              <strong>{formatQuantity(d()!.inductance, 'H', 4)}</strong>{formatShift(d()!.inductance / d()!.targetInductance! - 1) ? ` (${formatShift(d()!.inductance / d()!.targetInductance! - 1)})` : ''}.
            </p>
            <Formula math={props.formulas.practical} source={form() === 'solenoid' ? 'half turns: leads leave on opposite sides' : 'whole turns: every pass through the hole is one turn'} />
          </ResultRow>
        </Show>
        <ResultRow id="out-L" label={d()?.targetInductance !== undefined ? 'Inductance as wound' : 'Inductance'} symbol="L" value={d()?.inductance} unit="H" stale={stale()} primary={d()?.targetInductance === undefined} significant={5}>
          <Show when={form() === 'solenoid'}>
            <Formula math={props.formulas.solenoidL} source="Nagaoka 1909; Rosa 1907; Grover 1946, ch. 16 and Table 7" validity="round wire, low frequency (includes the wire’s internal inductance), no metal or core nearby, pitch small beside the radius" />
          </Show>
          <Show when={form() === 'toroid'}>
            <Formula math={rc('core') === 'al' ? props.formulas.al : props.formulas.toroidL} source={rc('core') === 'al' ? 'definition of AL' : 'Ampère’s law; Grover 1946; Snelling 1988'} validity="evenly spread winding, all flux in the core; μ′ varies from core to core" />
          </Show>
          <Show when={form() === 'multilayer'}>
            <p class="tw-coil-detail" id="out-fit">
              {d()!.fits ? 'Fits' : 'Does not fit'} the winding section: about {Math.round(d()!.capacity ?? Number.NaN)} turns of this wire do, laid layer on layer.
            </p>
            <Formula math={props.formulas.multilayerL} source="Wheeler, Proc. IRE 16, 1928 (a, b, c in inches)" validity="about 1–2 % while 6a, 9b and 10c are within a factor of two of each other" />
          </Show>
        </ResultRow>

        </Later>
        <Later>
        <Show when={form() === 'solenoid'}>
          <ResultRow id="out-wheeler" label="Wheeler’s formula, for comparison" value={d()?.wheelerInductance} unit="H" stale={stale()}>
            <Formula math={props.formulas.wheeler} source="Wheeler, Proc. IRE 16, 1928 (r, l in inches)" validity="current sheet, within about 1 % for l > 0.4 D; no round-wire correction" />
          </ResultRow>
          <ResultRow id="out-D" label="Mean winding diameter (wire centre to centre)" symbol="D" value={(r()?.spec as { diameter?: number } | undefined)?.diameter} unit="m" stale={stale()}>
            <Formula math={props.formulas.meanDiameter} source="geometry" validity={rc('dia') === 'mean' ? 'as typed' : 'former diameter plus one overall wire diameter'} />
            <Show when={rc('dia') !== 'mean' && (rc('enamel') === '1' || rc('enamel') === '2')}>
              <Formula math={props.formulas.overall} source="approximate maximum overall diameter, fitted to IEC 60317-0-1 grades 1 and 2" validity="a few µm either way; measure the wire for a tight winding" />
            </Show>
          </ResultRow>
          <ResultRow id="out-len" label="Winding length" symbol="l" value={d()?.windingLength} unit="m" stale={stale()}>
            <Formula math={props.formulas.windingLength} source="geometry" validity={rc('wind') === 'pitch' ? 'spaced winding' : `close-wound: pitch = overall wire diameter, ${mm(d()?.pitch ?? 0)}`} />
          </ResultRow>
        </Show>
        <Show when={form() === 'toroid'}>
          <ResultRow id="out-al" label="AL of the core" value={d()?.al} unit="H" stale={stale()} significant={4}>
            <p class="tw-coil-detail">
              Per turn². From the dimensions: magnetic path l<sub>e</sub> = {formatQuantity(d()?.effectivePathLength ?? Number.NaN, 'm', 4)},
              area A<sub>e</sub> = {formatNumber((d()?.effectiveArea ?? Number.NaN) * 1e6, 4)} mm².
              About {d()?.turnsPerLayer} turns of this wire fit in one layer round the hole; {formatQuantity(d()?.lengthPerTurn ?? Number.NaN, 'm', 3)} of wire per turn.
            </p>
            <Formula math={props.formulas.pathLength} source="IEC 60205 core factors" validity="rectangular section" />
          </ResultRow>
        </Show>

        </Later>
        <Later>
        <ResultRow id="out-wire" label="Wire to cut" symbol="ℓ" value={d()?.wireLength} unit="m" stale={stale()}>
          <p class="tw-coil-detail">Includes both leads; add your own allowance for stripping and soldering.</p>
          <Formula math={form() === 'toroid' ? props.formulas.wireToroid : form() === 'multilayer' ? props.formulas.wireMultilayer : props.formulas.wireSolenoid}
            source={form() === 'toroid' ? 'geometry (our estimate: wire centre line round the core’s section)' : form() === 'multilayer' ? 'mean turn length times turns' : 'geometry of the helix'} />
        </ResultRow>
        <ResultRow id="out-rdc" label="DC resistance" value={d()?.resistanceDc} unit="Ω" stale={stale()}>
          <Formula math={props.formulas.rdc} source="IEC 60028 annealed copper, ρ₂₀ = 1/58 Ω·mm²/m, α = 0.00393 /K" />
        </ResultRow>

        </Later>
        <Later>
        <Show when={form() === 'solenoid' || form() === 'toroid'}>
          <ResultRow id="out-rac" label={`AC resistance at ${fText()}`} value={d()?.resistanceAc} unit="Ω" stale={stale()}>
            <Show when={form() === 'solenoid'}>
              <Formula math={props.formulas.racSolenoid} source="Butterworth 1922 (exact skin effect; transverse-field loss in a long-coil field)" validity="best for l/D ≥ 1 and d/p ≤ 0.7; overstates the loss of close turns (see the notes); no proximity loss for a single turn" />
            </Show>
            <Show when={form() === 'toroid'}>
              <Formula math={props.formulas.racSkin} source="exact skin effect of a round wire (Bessel functions)" validity="proximity of the other turns not included: a lower bound" />
            </Show>
          </ResultRow>
          <ResultRow id="out-q" label={`Unloaded Q at ${fText()}`} symbol="Q" value={d()?.q} stale={stale()} significant={3}>
            <Show when={form() === 'solenoid' && d()?.qLow !== undefined}>
              <p class="tw-coil-detail" id="out-q-range">
                Q between about {sayQ(d()!.qLow!)} and {sayQ(d()!.qHigh!)}: up to {Math.round(d()!.qUncertainty!.above * 100)} % above the figure and {Math.round(d()!.qUncertainty!.below * 100)} % below, by our estimate of the loss model’s error{d()!.qUncertainty!.above > 1.5 * d()!.qUncertainty!.below ? ' (one-sided: Butterworth’s method is known to overstate the loss of close turns)' : ''}.
                Self-capacitance lowers the Q you measure across the coil to {sayQ(d()!.apparentQ ?? Number.NaN)}.
              </p>
              <Formula math={props.formulas.q} source="definition of Q; L at f (skin effect removes part of the wire’s internal inductance)" validity="the band: Butterworth’s known overstatement for close turns, plus ±3 % and a share of the proximity loss (see the notes)" />
            </Show>
            <Show when={form() === 'toroid'}>
              <p class="tw-coil-detail" id="out-q-range">
                An upper bound. Core alone {d()?.coreQ === undefined ? 'not counted (μ″ blank or 0)' : sayQ(d()!.coreQ!)}, winding alone (skin effect only) {sayQ(d()?.windingQ ?? Number.NaN)}.
              </p>
              <Formula math={props.formulas.toroidQ} source="Snelling 1988 (series complex permeability)" validity="μ′ and μ″ at the working frequency; the combination is an upper bound since proximity loss is left out" />
            </Show>
          </ResultRow>
        </Show>

        </Later>
        <Later>
        <Show when={form() === 'solenoid'}>
          <ResultRow id="out-cself" label="Self-capacitance" symbol="Cₛ" value={d()?.selfCapacitance} unit="F" stale={stale()}>
            <Formula math={props.formulas.cself} source="Medhurst, Wireless Engineer 24, 1947" validity="0.1 ≤ l/D ≤ 50, about ±5 % for his coils; surroundings add to it" />
          </ResultRow>
          <ResultRow id="out-srf" label="Self-resonant frequency" value={d()?.selfResonantFrequency} unit="Hz" stale={stale()}>
            <Formula math={props.formulas.srf} source="lumped model" validity="an estimate: the winding is really a helical line; keep f below about half of it" />
          </ResultRow>
          <ResultRow id="out-lapp" label={`Apparent inductance at ${fText()}`} symbol="L′" value={d()?.apparentInductance} unit="H" stale={stale()} significant={5}>
            <Formula math={props.formulas.apparent} source="Terman, Radio Engineers’ Handbook, 1943" validity="Q ≫ 1 and f well below the self-resonant frequency" />
          </ResultRow>
        </Show>

        </Later>
        <Later>
        <NoteList notes={d()?.notes ?? []} />

        <Show when={form() === 'solenoid' && d()?.selfResonantFrequency !== undefined}>
          <Plot
            id="coil-plot"
            caption="Q and apparent inductance of this coil from a tenth of the working frequency to 90 % of its estimated self-resonance. Dashed: the Q you would measure across the coil, lowered by its self-capacitance. Above half the self-resonant frequency the lumped model is only a rough guide."
            x={r()!.sweep()?.frequency ?? []}
            xLabel="Frequency"
            xLog
            series={[
              { label: 'Q', values: r()!.sweep()?.q ?? [], format: sayQ },
              { label: 'Q across coil', values: r()!.sweep()?.qAcrossCoil ?? [], dash: true, format: sayQ },
              { label: 'L′', values: (r()!.sweep()?.apparentInductance ?? []).map((x) => x * plotScale().scale), axis: 'right', unit: plotScale().unit },
            ]}
            yLabel="Q"
            y2Label={`L′ (${plotScale().unit})`}
            markers={[{ x: d()!.frequency!, label: 'f' }, { x: 0.5 * d()!.selfResonantFrequency!, label: '½ SRF' }]}
            formatX={frequencyTick}
            stale={stale()}
          />
        </Show>

        <section class="tw-table-block tw-coil-handoff" aria-labelledby="handoff-title">
          <h2 id="handoff-title">Next: the tank</h2>
          <Show when={handOff()} fallback={<p>Complete the inputs to carry this coil to the tank bench.</p>}>
            <p>
              <a id="to-tank" href={handOff()!.href}>Tune this coil in the Tank bench</a>{' '}
              <span class="tw-coil-detail">
                (carries {handOff()!.carries.join(', ')}, and this coil’s settings for the way back{stale() ? '; from the last good design' : ''})
              </span>
            </p>
            <Show when={handOff()!.problem}>
              <p class="tw-coil-detail" id="handoff-problem">{handOff()!.problem}</p>
            </Show>
            <Show when={form() === 'multilayer'}>
              <p class="tw-coil-detail">No Q is estimated for a multilayer coil: set the tank’s coil Q from a measurement.</p>
            </Show>
            {/* In the server's page too (the bare bench until the link's code arrives), so hydration keeps the page as served. */}
            <p>
              <a id="to-match" href={matchHref() ?? '/match/'}>Match an antenna and the next stage to it on the Match bench</a>{' '}
              <span class="tw-coil-detail">({form() === 'solenoid' ? 'carries the winding, so taps and links are found from its geometry' : 'carries its inductance: taps need a single-layer coil'}; tuned to f)</span>
            </p>
          </Show>
        </section>
        </Later>
    </>
  );
}
