/**
 * The Match bench's answer, a chunk of its own (MatchBench.tsx loads it as
 * the bench hydrates): the core warmed up, then the plan (matchPlan's
 * planAnswer: the first option that meets the goal, usually the tap), the
 * summary and the cards (their own chunk), each in a task of its own. The
 * summary's first figures also go to the answer dock.
 */
import { createEffect, createMemo, lazy, Show, untrack } from 'solid-js';
import type { MatchSpec } from '../../src/core/matching';
import { resolveMatchTank } from '../../src/core/matchTank';
import { formatQuantityCompact } from '../../src/quantity';
import type { BenchState } from '../kit/bench';
import { Later } from '../kit/Later';
import { Summary, type DockedAnswer, type SummaryItem } from '../kit/Summary';
import type { MatchFormulas } from './MatchBench';
import { buildText, designOption, henry, hz, matchSpecOf, mm, ohm, pf, planAnswer, sayDb, sayQ, sayTurns, type BuiltOption, type MatchPlan } from './matchPlan';

/** The cards under the answer: a chunk of their own, fetched as the answer hydrates. */
const MatchCards = lazy(() => import('./MatchCards'));

/** The recommended option as the answer's first figure: what to build, in its own terms. */
function buildItem(o: BuiltOption): SummaryItem {
  const id = 'sum-build';
  switch (o.kind) {
    case 'tap':
      return {
        id, label: 'Antenna tap, turns from the cold end', short: 'Tap', value: o.tap.practicalTapTurns, text: sayTurns(o.tap.practicalTapTurns), main: true,
        detail: `exactly ${o.tap.tapTurns.toFixed(2)}; steps ${ohm(o.circuit.sourceResistance)} up ${o.tap.stepUp.toFixed(2)}× to ${ohm(o.tap.presentedResistance)}`,
      };
    case 'link':
      return {
        id, label: 'Antenna link, turns over the cold end', short: 'Link', value: o.link.practicalTurns, text: sayTurns(o.link.practicalTurns), main: true,
        detail: `${mm(o.link.diameter)} across; k = ${o.link.couplingCoefficient.toFixed(3)}`,
      };
    case 'capacitiveDivider':
      return {
        id, label: 'Capacitive divider, C1 (top) · C2 (cold side)', short: 'C1 · C2', value: o.divider.upperCapacitance, main: true,
        text: `${pf(o.divider.upperCapacitance)} · ${pf(o.divider.lowerCapacitance)}`, brief: pf(o.divider.upperCapacitance),
        detail: 'in place of the tank capacitor; the antenna across C2',
      };
    case 'lowPassL':
      return {
        id, label: 'L-network (low-pass): series inductor', short: 'Series L', value: o.network.seriesInductance, text: henry(o.network.seriesInductance as number), main: true,
        detail: `tank capacitor ${pf(o.network.tankCapacitance)}`,
      };
    case 'highPassL':
      return {
        id, label: 'L-network (high-pass): series capacitor', short: 'Series C', value: o.network.seriesCapacitance, text: pf(o.network.seriesCapacitance as number), main: true,
        detail: buildText(o).replace(/^series C [^;]*; /, ''),
      };
  }
}

/** The answer first: what to build, its loaded Q, bandwidth and loss, the load's tap, and the antenna straight across for comparison. */
function summaryItems(p: MatchPlan): SummaryItem[] {
  const d = p.design;
  const o = p.recommended;
  const items: SummaryItem[] = [];
  if (!o) {
    items.push({ id: 'sum-build', label: 'Recommended option', value: undefined, text: 'none can be built', main: true, detail: 'each option says why below' });
  } else {
    items.push(buildItem(o));
    const r = o.response;
    const asked = d.goal.loadedQ === undefined ? 'a match' : `asked ${sayQ(d.goal.loadedQ)}`;
    items.push({
      id: 'sum-ql', label: 'Loaded Q', short: 'Loaded Q', value: r.loadedQ, text: sayQ(r.loadedQ),
      detail: `${asked}${p.meetsGoal ? '' : ': no option comes within 25 %, this is the nearest'}`,
    });
    items.push({ id: 'sum-bw', label: 'Bandwidth, −3 dB', symbol: 'B', short: 'BW', value: r.bandwidth, unit: 'Hz', significant: 3, detail: `around ${hz(r.frequency)}` });
  }
  if (d.load?.tap) {
    items.push({
      id: 'sum-loadtap', label: 'Load tap, turns from the cold end', value: d.load.tap.practicalTapTurns, text: sayTurns(d.load.tap.practicalTapTurns),
      detail: `exactly ${d.load.tap.tapTurns.toFixed(2)}; ${ohm(d.load.resistance)} seen as ${ohm(d.load.presentedResistance)}`,
    });
  }
  if (o) {
    const r = o.response;
    const loss = r.transducerLoss ?? r.mismatchLoss;
    items.push({
      id: 'sum-loss', label: r.transducerLoss === undefined ? 'Mismatch loss at the antenna' : 'Loss, antenna to load', value: loss, text: sayDb(loss),
      detail: `return loss ${sayDb(r.returnLoss)}${r.transducerLoss === undefined ? '' : `; mismatch ${sayDb(r.mismatchLoss)}`}`,
    });
  }
  const direct = d.direct;
  const directLoss = direct.transducerLoss ?? direct.mismatchLoss;
  items.push({
    id: 'sum-direct', label: `No match: ${ohm(d.direct.presentedResistance)} straight across the top`, value: direct.loadedQ,
    text: `Q ${sayQ(direct.loadedQ)}`, detail: `bandwidth ${formatQuantityCompact(direct.bandwidth, 'Hz', 3)}; ${sayDb(directLoss)} lost`,
  });
  return items;
}

interface ResultsProps {
  bench: BenchState;
  formulas: MatchFormulas;
  onAnswer: (answer: DockedAnswer | undefined) => void;
}

/**
 * Warms the match core up before the answer, once, each step in a task of
 * its own (kit/Later): the coil model's first run (the coil wound three times
 * to find its resonance), then the capacitive divider's design (the load's
 * tap placed and a circuit solved; kept for the options table). Their first
 * runs are the heaviest work as the page wakes; once the code is warm the
 * answer's own design repeats the tank in a fraction of the time. A failure
 * is left to the answer's computation, which says why at the field.
 */
function warmUp(bench: BenchState, step: (spec: MatchSpec) => unknown): void {
  untrack(() => {
    const values = bench.spec();
    try {
      if (values) step(matchSpecOf(values, bench.choices()));
    } catch {
      // said at the field by the answer's computation
    }
  });
}

export default function MatchResults(props: ResultsProps) {
  warmUp(props.bench, resolveMatchTank);
  return (
    <Later>
      <WarmDivider {...props} />
    </Later>
  );
}

function WarmDivider(props: ResultsProps) {
  warmUp(props.bench, (spec) => designOption(spec, 'capacitiveDivider'));
  return (
    <Later>
      <MatchAnswer {...props} />
    </Later>
  );
}

/**
 * The answer (a computation on the bench: the tank and the first option that
 * meets the goal, usually the tap) in this part's task; the summary in the
 * next, and the cards (their own chunk) after it.
 */
function MatchAnswer(props: ResultsProps) {
  const calc = props.bench.compute((raw, choices) => planAnswer(raw, choices));
  const items = createMemo(() => (calc.result() ? summaryItems(calc.result()!) : undefined));
  createEffect(() => props.onAnswer(items() && { items: items()!, stale: calc.stale() }));
  return (
    <>
      <Later>
        <Show when={items()}>
          <Summary items={items()!} stale={calc.stale()} />
        </Show>
      </Later>
      <Later>
        <MatchCards bench={props.bench} formulas={props.formulas} calc={calc} />
      </Later>
    </>
  );
}

