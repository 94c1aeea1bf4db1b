/**
 * Band bench: "I must tune from here to there with this variable capacitor:
 * what coil, what trimmer, what padder, and how selective is it across the
 * band?"
 *
 * The bench is its field table (BAND_FIELDS in bandFields.ts) and its plan
 * (bandPlan.ts): the link, the fields in use and where a core error is shown
 * come from the table; the numbers from planBand (designForBand, the coil by
 * designCoil, bandSelectivity, dialLaw), trackBand (designTracking) and
 * pairsForBand (resonantPairs). This file only lays them out: the answer
 * first, the cards with their formulas, the notes, the plots, the tracking,
 * the fixed pairs with their tolerance spread, and the hand-offs to the Coil
 * and Tank benches. Tracking, pairs and hand-offs load their code when their
 * section comes near the screen, as the kit's Plot loads uPlot: the page's
 * first JavaScript then holds only what the answer needs.
 */
import { createEffect, createMemo, createSignal, lazy, Show, type JSX } from 'solid-js';
import { formatNumber, formatQuantityCompact } from '../../src/quantity';
import type { BenchState } from '../kit/bench';
import { Fields } from '../kit/Field';
import type { Choices, SpecObject } from '../kit/fields';
import { formatShift } from '../kit/format';
import { createWakingBench, inParts, Later, type BenchParts } from '../kit/Later';
import { LinkNotices } from '../kit/LinkNotices';
import { AnswerDock, Summary, type DockedAnswer, type SummaryItem } from '../kit/Summary';
import { BAND_FIELDS, COIL_KEYS } from './bandFields';
import { bandText, hz, planBand, sayQ, sayTurns, windBand, type BandPlan } from './bandPlan';

/**
 * The cards under the answer (rows with formulas, the selectivity table, plots, tracking, pairs,
 * hand-offs): their code is a chunk of its own, fetched as the bench hydrates and hydrated when it
 * arrives (Solid's lazy, as kit/Later uses it), so the page's first JavaScript holds the fields and
 * the answer. The server renders them in place, so nothing moves.
 */
const BandCards = lazy(() => import('./BandCards'));

export type BandFormulaKey =
  | 'coverage' | 'inductance' | 'widest' | 'trimmer' | 'padder' | 'selectivity' | 'image' | 'tracking' | 'dial' | 'spread';
/** The page's typeset formulas, handed over as slots of the island (see kit/Formula). */
export type BandFormulas = Record<BandFormulaKey, JSX.Element>;

/** One computation: the plan, and the values and choices it came from (for the hand-offs). */
export interface BandRun {
  plan: BandPlan;
  raw: SpecObject;
  choices: Choices;
}

/** The answer first: turns and inductance, trimmer, padder, the band covered, loaded Q across the band. */
function summaryItems(p: BandPlan): SummaryItem[] {
  const d = p.design;
  const s = p.selectivity;
  const shift = formatShift(p.coil.inductance / d.inductance - 1);
  return [
    {
      id: 'sum-turns', label: 'Turns to wind', symbol: 'N', short: 'Turns', value: p.coil.turns, text: sayTurns(p.coil.turns), main: true,
      detail: `${formatQuantityCompact(p.coil.inductance, 'H', 4)} as wound${shift ? ` (${shift})` : ''}`,
    },
    { id: 'sum-L', label: 'Coil inductance', symbol: 'L', short: 'L', value: d.inductance, unit: 'H', detail: 'for the band as designed' },
    {
      id: 'sum-trim', label: 'Trimmer (across the capacitor)', symbol: 'Cₜ', short: 'Trimmer', value: d.trimmerCapacitance, unit: 'F', significant: 3,
      text: d.trimmerCapacitance === 0 ? 'none' : undefined, detail: d.trimmerCapacitance > 50e-12 ? 'a fixed capacitor with a trimmer across it' : 'set at alignment',
    },
    {
      id: 'sum-pad', label: 'Padder (in series)', symbol: 'Cₚ', short: 'Padder', value: d.padderCapacitance, unit: 'F', significant: 3,
      text: d.padderCapacitance === undefined ? 'none' : undefined,
      detail: d.padderCapacitance === undefined ? 'the trimmer alone narrows the swing' : 'narrows the swing to the band',
    },
    {
      id: 'sum-band', label: 'Band covered', value: d.lowFrequency, text: `${hz(d.lowFrequency)} to ${hz(d.highFrequency)}`, brief: hz(d.lowFrequency),
      detail: `asked ${bandText(d.requestedLowFrequency, d.requestedHighFrequency)}; ratio ${formatNumber(d.frequencyRatio, 4)} of the ${formatNumber(d.widestRatio, 4)} the capacitor gives`,
    },
    {
      id: 'sum-q', label: 'Loaded Q, low · middle · high', value: s.middle.loadedQ, short: 'Loaded Q',
      text: `${sayQ(s.low.loadedQ)} · ${sayQ(s.middle.loadedQ)} · ${sayQ(s.high.loadedQ)}`, brief: sayQ(s.middle.loadedQ),
      detail: `bandwidth ${hz(s.low.bandwidth)} · ${hz(s.middle.bandwidth)} · ${hz(s.high.bandwidth)}`,
    },
  ];
}

/** The island, hydrated in parts (kit/Later): no single task blocks a phone for long. */
export default inParts('band', BandBenchParts);

function BandBenchParts(outer: BenchParts<BandFormulas>) {
  const { bench, notices, awake } = createWakingBench(BAND_FIELDS, outer.early);
  const [answer, setAnswer] = createSignal<DockedAnswer>();

  return (
    <div class="tw-bench band-bench" data-bench="band" data-awake={awake() ? '' : undefined}>
      <LinkNotices notices={notices()} />
      <div class="tw-bench-inputs">
        <Later>
          <fieldset class="band-group">
            <legend>Band and capacitor</legend>
            <Fields bench={bench} names={['band', 'capType', 'C', 'Cs', 'margin', 'arr', 'slug', 'plates']} />
          </fieldset>
          <fieldset class="band-group">
            <legend>Superhet (optional)</legend>
            <Fields bench={bench} names={['osc', 'IF', 'Cso']} />
          </fieldset>
        </Later>
        <fieldset class="band-group">
          <legend>Coil former and wire</legend>
          <Later>
            <Fields bench={bench} names={COIL_KEYS.slice(0, 12)} />
          </Later>
          <Later>
            <Fields bench={bench} names={[...COIL_KEYS.slice(12), 'Qcoil']} />
          </Later>
        </fieldset>
        <Later>
          <fieldset class="band-group">
            <legend>Losses and terminations</legend>
            <Fields bench={bench} names={['capQ', 'Rs', 'Rload']} />
          </fieldset>
          <fieldset class="band-group">
            <legend>Fixed pairs</legend>
            <Fields bench={bench} names={['capSeries', 'indSeries', 'tolC', 'tolL', 'seed']} />
          </fieldset>
        </Later>
        <Show when={bench.generalError()}>
          <p class="tw-bench-error" role="alert">{bench.generalError()}</p>
        </Show>
        <AnswerDock answer={answer()} />
      </div>

      <div class="tw-bench-results" aria-live="polite">
        <Later>
          <BandResults bench={bench} formulas={outer.formulas} onAnswer={setAnswer} />
        </Later>
      </div>
    </div>
  );
}

/**
 * The results. The plan's first half (the band designed, its coil wound: the
 * coil model's first run is the heaviest single piece of work on the page) is
 * worked out in this part's task; the selectivity, the answer and the cards
 * in the next (kit/Later), so a phone never blocks long on one. windBand keeps
 * its last result, so the plan does not wind the coil again.
 */
function BandResults(props: { bench: BenchState; formulas: BandFormulas; onAnswer: (answer: DockedAnswer | undefined) => void }) {
  props.bench.compute((raw, choices) => windBand(raw, choices));
  return (
    <Later>
      <BandAnswer {...props} />
    </Later>
  );
}

/** The plan (a computation on the bench), the answer first, then the cards (their code in a chunk of their own). */
function BandAnswer(props: { bench: BenchState; formulas: BandFormulas; onAnswer: (answer: DockedAnswer | undefined) => void }) {
  const calc = props.bench.compute((raw, choices): BandRun => ({ plan: planBand(raw, choices), raw, choices }));
  const items = createMemo(() => (calc.result() ? summaryItems(calc.result()!.plan) : undefined));
  createEffect(() => props.onAnswer(items() && { items: items()!, stale: calc.stale() }));
  return (
    <>
      <Later>
        <Show when={items()}>
          <Summary items={items()!} stale={calc.stale()} />
        </Show>
      </Later>
      <BandCards bench={props.bench} formulas={props.formulas} calc={calc} />
    </>
  );
}
