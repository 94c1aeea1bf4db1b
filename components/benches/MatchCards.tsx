/**
 * The Match bench's cards under the answer: the tank, what the antenna does
 * straight across the top, the resistance it must be seen as, the load's
 * tap, the options side by side, each option's details with its formula, the
 * notes, the return-loss plot and the coil drawing with the SPICE netlist.
 * The island (MatchBench.tsx) loads this chunk as it hydrates.
 *
 * The options (table and details), the plot, the drawing and the netlist
 * load their code when their place comes near the screen (matchNear.tsx):
 * only the answer's option is worked out as the page wakes; each of the
 * others is then a computation of its own, in a task of its own.
 */
import { Show } from 'solid-js';
import { formatQuantityCompact } from '../../src/quantity';
import type { BenchState } from '../kit/bench';
import type { Computed } from '../kit/compute';
import { Field } from '../kit/Field';
import { Formula } from '../kit/Formula';
import { Later } from '../kit/Later';
import { Note, NoteList } from '../kit/Note';
import { ResultRow } from '../kit/ResultRow';
import type { MatchFormulas } from './MatchBench';
import { NearPart } from './matchNear';
import { henry, hz, ohm, pf, Q_TOLERANCE, sayDb, sayQ, turnFigures, type MatchPlan } from './matchPlan';

/** The options table and details; the plot, drawing and netlist: chunks loaded when near. */
const options = () => import('./MatchOptions');
const extras = () => import('./MatchExtras');

export default function MatchCards(props: { bench: BenchState; formulas: MatchFormulas; calc: Computed<MatchPlan> }) {
  const f = props.formulas;
  const p = () => props.calc.result();
  const d = () => p()?.design;
  const stale = () => props.calc.stale();
  const load = () => d()?.load;

  return (
    <>
      <Later>
        <h2 class="match-heading" id="tank-title">The tank</h2>
        <ResultRow id="out-f0" label="Resonance" symbol="f₀" value={d()?.tank.frequency} unit="Hz" significant={5} stale={stale()}>
          <Show when={p()?.tuningCapacitance !== undefined}>
            <p class="tw-formula-meta" id="out-ctune">
              Tuned by its frequency: {pf(p()!.tuningCapacitance!)} across the coil (all of it, strays and the coil’s own included).
            </p>
          </Show>
          <Formula math={f.resonance} source="Thomson’s formula with the coil’s inductance at f₀ (Nagaoka and Rosa, skin effect); R_D: Terman 1943" validity="lumped: f₀ below half the coil’s self-resonance" />
        </ResultRow>
        <Show when={d()?.tank.coil}>
          <ResultRow id="out-turns" label="Turns of the coil, as wound" symbol="N" value={d()!.tank.coil!.turns} significant={turnFigures(d()!.tank.coil!.turns)} stale={stale()}>
            <p class="tw-formula-meta" id="out-turns-detail">
              As the Coil bench winds it{d()!.tank.coil!.windingLength === undefined ? '' : `: ${formatQuantityCompact(d()!.tank.coil!.windingLength!, 'm', 3)} long`}; taps are counted in these turns from the cold (earthy) end.
            </p>
          </ResultRow>
        </Show>
        <ResultRow id="out-Qu" label="Unloaded Q" symbol="Qᵤ" value={d()?.tank.unloadedQ} significant={3} stale={stale()}>
          <Show when={d()}>
            <p class="tw-formula-meta">
              {p()!.spec.unloadedQ !== undefined ? 'As given.' : `The coil’s Q at f₀ from its loss model (Butterworth)${p()!.spec.capacitorQ === undefined ? '' : ` with the capacitor’s ${sayQ(p()!.spec.capacitorQ!)}`}: 1/Qᵤ = 1/Q_coil + 1/Q_C.`}
              {' '}Inductance at f₀: {henry(d()!.tank.inductance)}; ω₀L = {ohm(d()!.tank.reactance)}.
            </p>
          </Show>
        </ResultRow>
        <ResultRow id="out-Rd" label="Dynamic resistance" symbol="R_D" value={d()?.tank.dynamicResistance} unit="Ω" significant={3} stale={stale()} />
        <NoteList notes={d()?.notes ?? []} />
      </Later>

      <Later>
        <h2 class="match-heading" id="why-title">Why a match</h2>
        <ResultRow id="out-direct" label="Loaded Q with the antenna straight across the top" value={d()?.direct.loadedQ} significant={3} stale={stale()}>
          <Show when={d()}>
            <p class="tw-formula-meta" id="out-direct-detail">
              {ohm(d()!.direct.presentedResistance)} across a tank of {ohm(d()!.tank.dynamicResistance)} swamps it: bandwidth {hz(d()!.direct.bandwidth)}
              {d()!.direct.transducerLoss === undefined ? '' : `, ${sayDb(d()!.direct.transducerLoss!)} lost from antenna to load`}. A match makes the antenna
              look like {ohm(d()!.sourceTarget)} across the top instead.
            </p>
          </Show>
          <Formula math={f.loadedQ} source="Pozar, Microwave Engineering (loaded and external Q); Terman 1943 (dynamic resistance)" validity="high-Q rules: every termination seen across the top of the tank" />
        </ResultRow>
        <ResultRow id="out-target" label="The antenna must be seen across the tank as" symbol="R′ₛ" value={d()?.sourceTarget} unit="Ω" significant={4} stale={stale()}>
          <Show when={d()}>
            <p class="tw-formula-meta" id="out-target-detail">
              {d()!.goal.loadedQ === undefined
                ? 'For a match: the tank’s own loss and the load together, so the antenna sees its own resistance (the most power in).'
                : `For a loaded Q of ${sayQ(d()!.goal.loadedQ!)}${load()?.tap && p()!.spec.loadTapTurns === undefined ? (d()!.goal.split === 'equal' ? ', antenna and load sharing the loading equally (the least loss for that Q)' : ', the antenna seeing its own resistance') : ', with the load as connected'}.`}
            </p>
          </Show>
        </ResultRow>
        <Show when={p()?.overcoupled && p()!.recommended}>
          <Note level="info">
            <span id="out-overcoupled">
              To bring the loaded Q down to {sayQ(d()!.goal.loadedQ!)} the antenna is coupled more tightly than a match (a match gives a loaded Q of
              {' '}{sayQ(p()!.overcoupled!.matchedQ)} here): it sees about {ohm(p()!.recommended!.estimate.inputResistance)} instead of its own {ohm(p()!.spec.sourceResistance)},
              {' '}and the mismatch costs {sayDb(p()!.recommended!.response.mismatchLoss)} in the full circuit. For less loss ask for a loaded Q nearer {sayQ(p()!.overcoupled!.matchedQ)}, or let the
              next stage load the tank more (a lower input resistance, or its tap higher up the coil).
            </span>
          </Note>
        </Show>
        <Show when={load()}>
          <ResultRow id="out-loadtap" label={load()!.tap ? 'Load tap, turns from the cold end' : 'Load across the top'} value={load()!.tap ? load()!.tap!.practicalTapTurns : load()!.resistance} unit={load()!.tap ? undefined : 'Ω'} significant={load()!.tap ? turnFigures(load()!.tap!.practicalTapTurns) : 3} stale={stale()}>
            <p class="tw-formula-meta" id="out-loadtap-detail">
              {load()!.tap
                ? `${p()!.spec.loadTapTurns === undefined ? `Exactly ${load()!.tap!.tapTurns.toFixed(2)} turns; the nearest half turn` : 'The tap given'} steps ${ohm(load()!.resistance)} up ${load()!.tap!.stepUp.toFixed(3)}× to ${ohm(load()!.presentedResistance)} across the tank, the same for every option below.`
                : 'Straight across the tank, the same for every option below.'}
            </p>
          </ResultRow>
        </Show>
      </Later>

      <section class="tw-table-block match-block" aria-labelledby="options-title" id="options">
        <h2 id="options-title">The options side by side</h2>
        <p class="tw-table-note" id="options-rule">
          Each as built (taps to the half turn, links to the whole turn) and solved as a whole circuit. Recommended: the first of tap, link,
          capacitive divider, high-pass and low-pass L-network (the fewest extra parts first) whose loaded Q comes within {Math.round(Q_TOLERANCE * 100)} % of the
          one asked (for a match: a return loss of 10 dB or more); failing that, the nearest.
        </p>
        <Later>
          <NearPart near="options" load={options} size="table" what="The options" waiting="The options are worked out when you scroll to them.">
            {(m) => <m.OptionsTable bench={props.bench} recommended={() => p()?.recommended?.kind} />}
          </NearPart>
        </Later>
        <Formula math={f.losses} source="transducer gain and mismatch loss: Pozar, Microwave Engineering; the full circuit by nodal analysis" validity="loss: antenna to load at the loaded resonance (mismatch loss alone without a load); lossless parts besides the coil and capacitor Q" />
      </section>

      <section class="match-stack" id="details" aria-labelledby="each-title">
        <h2 class="match-heading" id="each-title">Each option</h2>
        <Later>
          <NearPart near="details" load={options} size="details" what="The details" waiting="The details of each option appear when you scroll to them.">
            {(m) => <m.OptionDetails bench={props.bench} formulas={f} tankCapacitance={() => d()?.tank.capacitance} />}
          </NearPart>
        </Later>
      </section>

      <section class="match-stack" id="plot-part" aria-labelledby="plot-title">
        <h2 class="match-heading" id="plot-title">Return loss at the antenna</h2>
        <Later>
          <NearPart near="plot-part" load={extras} size="plot" what="The plot" waiting="The plot is drawn when you scroll to it.">
            {(m) => <m.ReturnLossPlot bench={props.bench} />}
          </NearPart>
        </Later>
      </section>

      <section class="match-stack" id="build-part" aria-labelledby="build-title">
        <h2 class="match-heading" id="build-title">Build it: the coil and the netlist</h2>
        <Later>
          <Field bench={props.bench} name="build" />
          <NearPart near="build-part" load={extras} size="build" what="The drawing and the netlist" waiting="The drawing and the netlist appear when you scroll to them.">
            {(m) => <m.BuildSection bench={props.bench} />}
          </NearPart>
        </Later>
      </section>

      <div class="tw-note tw-note--caution match-caution" role="note" id="match-caution">
        <strong class="tw-note-label">Caution:</strong> a receiver front end works at microwatts, but the same tap or link on a
        transmitter’s tank does not: 100 W into a tank loaded to a few kilohms puts hundreds of volts on its top (V = √(PR)), and the
        circulating current heats the coil. Check the parts’ ratings on the Tank bench, follow local codes and licensed practice, and <a href="/cautions/">read the cautions</a>.
      </div>
    </>
  );
}
