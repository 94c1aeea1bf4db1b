/**
 * The Match bench's options, loaded when their place comes near the screen
 * (MatchCards.tsx): the table that sets them side by side (what to build,
 * loaded Q, bandwidth, loss, return loss, or why an option cannot be built),
 * and the details of each: the tap with its sections and the
 * turns-ratio guess beside it, the capacitive divider exact and by the
 * high-Q rule, the link with its coupling, and the L-network in both forms,
 * each with its formula, its full circuit's figures and its notes. Each card
 * is a computation of its own (matchPlan's planOption, kept for the same
 * values: the table has worked them out already).
 */
import { For, Show, type JSX } from 'solid-js';
import type { MatchOptionKind } from '../../src/core/matching';
import type { BenchState } from '../kit/bench';
import { Formula } from '../kit/Formula';
import { Later } from '../kit/Later';
import { NoteList } from '../kit/Note';
import { ResultRow } from '../kit/ResultRow';
import type { MatchFormulas } from './MatchBench';
import { OPTION_NAMES } from './matchFields';
import { buildText, henry, hz, mm, ohm, OPTION_KINDS, pf, planOption, sayDb, sayQ, sayTurns, turnFigures, turnsText, type BuiltOption } from './matchPlan';

type Option<K extends MatchOptionKind> = BuiltOption & { kind: K };

/** One option as a computation on the bench (the same values give the same design, worked out once). */
function optionOf<K extends MatchOptionKind>(bench: BenchState, kind: K) {
  const calc = bench.compute((raw, choices) => planOption(raw, choices, kind));
  return { calc, built: () => { const o = calc.result(); return o?.available ? (o as Option<K>) : undefined; } };
}

/** The exact circuit's figures of an option in a line, with the high-Q estimate beside its loaded Q. */
function circuitLine(o: BuiltOption): string {
  const r = o.response;
  const loss = r.transducerLoss === undefined ? `mismatch loss ${sayDb(r.mismatchLoss)}` : `${sayDb(r.transducerLoss)} from antenna to load`;
  return `In the full circuit: loaded Q ${sayQ(r.loadedQ)} (high-Q rules: ${sayQ(o.estimate.loadedQ)}) at ${hz(r.frequency)}, bandwidth ${hz(r.bandwidth)}, ${loss}, return loss ${sayDb(r.returnLoss)}.`;
}

/** The options side by side, each row a computation of its own in a task of its own. */
export function OptionsTable(props: { bench: BenchState; recommended: () => MatchOptionKind | undefined }) {
  return (
    <div class="tw-plot-keys-wrap match-table-wrap">
      <table class="tw-table match-options" id="options-table">
        <thead>
          <tr><th scope="col">Option</th><th scope="col">What to build</th><th scope="col">Loaded Q</th><th scope="col">Bandwidth</th><th scope="col">Loss</th><th scope="col">Return loss</th></tr>
        </thead>
        <tbody>
          <For each={OPTION_KINDS}>
            {(kind) => (
              <Later>
                <OptionRow bench={props.bench} kind={kind} recommended={props.recommended() === kind} />
              </Later>
            )}
          </For>
        </tbody>
      </table>
    </div>
  );
}

/** One row: what to build, loaded Q, bandwidth, loss and return loss of the full circuit; or why it cannot be built. */
function OptionRow(props: { bench: BenchState; kind: MatchOptionKind; recommended: boolean }) {
  const { calc, built } = optionOf(props.bench, props.kind);
  const r = () => built()!.response;
  const reason = () => { const o = calc.result(); return o && !o.available ? o.reason : undefined; };
  return (
    <tr id={`opt-${props.kind}`} classList={{ 'match-recommended': props.recommended, 'tw-result--stale': calc.stale() }}>
      <th scope="row">
        {OPTION_NAMES[props.kind]}
        <Show when={props.recommended}>
          <span class="match-tag">recommended</span>
        </Show>
      </th>
      <Show when={built()} fallback={<td class="match-why" colSpan={5} data-label="Not available">{reason() ? `Not available: ${reason()}` : 'Working it out…'}</td>}>
        <td class="match-build" data-label="What to build">{buildText(built()!)}</td>
        <td data-label="Loaded Q" data-value={r().loadedQ}>{sayQ(r().loadedQ)}</td>
        <td data-label="Bandwidth" data-value={r().bandwidth}>{hz(r().bandwidth)}</td>
        <td data-label={r().transducerLoss === undefined ? 'Mismatch loss' : 'Loss'} data-value={r().transducerLoss ?? r().mismatchLoss}>{sayDb(r().transducerLoss ?? r().mismatchLoss)}</td>
        <td data-label="Return loss" data-value={r().returnLoss}>{sayDb(r().returnLoss)}</td>
      </Show>
    </tr>
  );
}

/** Every option's card, each hydrated in a task of its own. */
export function OptionDetails(props: { bench: BenchState; formulas: MatchFormulas; tankCapacitance: () => number | undefined }) {
  const f = props.formulas;
  return (
    <>
      <Later>
        <TapCard bench={props.bench} formula={f.stepUp} />
      </Later>
      <Later>
        <DividerCard bench={props.bench} formula={f.divider} tankCapacitance={props.tankCapacitance} />
      </Later>
      <Later>
        <LinkCard bench={props.bench} formulas={[f.link, f.maxwell]} />
      </Later>
      <Later>
        <NetworkCard bench={props.bench} formula={f.lNetwork} />
      </Later>
    </>
  );
}

/** An option's card: its heading, its rows when it can be built, why not otherwise, its circuit figures and notes. */
function OptionCard<K extends MatchOptionKind>(props: { bench: BenchState; kind: K; title?: string; children: (o: () => Option<K>, stale: () => boolean) => JSX.Element }) {
  const { calc, built } = optionOf(props.bench, props.kind);
  const reason = () => { const o = calc.result(); return o && !o.available ? o.reason : undefined; };
  return (
    <section class="match-card" id={`card-${props.kind}`} aria-labelledby={`card-${props.kind}-title`}>
      <h3 id={`card-${props.kind}-title`}>{props.title ?? OPTION_NAMES[props.kind]}</h3>
      <Show when={built()} fallback={<p class="tw-table-note" id={`card-${props.kind}-why`}>{reason() ? `Not available: ${reason()}` : 'Working it out…'}</p>}>
        {props.children(() => built() as Option<K>, calc.stale)}
        <p class="tw-formula-meta match-circuit" id={`card-${props.kind}-circuit`}>{circuitLine(built()!)}</p>
        <NoteList notes={built()!.notes} />
      </Show>
    </section>
  );
}

function TapCard(props: { bench: BenchState; formula: JSX.Element }) {
  return (
    <OptionCard bench={props.bench} kind="tap">
      {(o, stale) => {
        const t = () => o().tap;
        const guess = () => t().turnsRatioGuess;
        return (
          <ResultRow id="out-tap" label="Antenna tap, turns from the cold end (nearest half turn)" value={t().practicalTapTurns} significant={turnFigures(t().practicalTapTurns)} stale={stale()} primary>
            <p class="tw-formula-meta" id="out-tap-detail">
              Exactly {t().tapTurns.toFixed(3)} turns present the {ohm(o().circuit.sourceResistance)} antenna as wanted; {turnsText(t().practicalTapTurns)} step it up
              {' '}{t().stepUp.toFixed(3)}× to {ohm(t().presentedResistance)}. Sections at the tap: L₁ {henry(t().lowerInductance)}, L₂ {henry(t().upperInductance)},
              {' '}M {henry(t().mutualInductance)}, k = {t().couplingCoefficient.toFixed(3)}, leakage {henry(t().leakageInductance)}.
            </p>
            <p class="tw-formula-meta" id="out-tap-guess">
              The turns-ratio guess N/√(R′/R) would tap at {guess().tapTurns.toFixed(2)} turns ({sayTurns(guess().practicalTapTurns)} in practice, giving {ohm(guess().presentedResistance)}):
              {' '}the sections share only part of their flux, so the real coil wants the tap higher.
            </p>
            <Formula math={props.formula} source="coupled sections of the coil (Terman 1943, the tapped coil as an autotransformer); L₁, L₂ from Nagaoka and Rosa, M = (L − L₁ − L₂)/2 (Grover 1946)" validity="high Q: the tap draws little beside the circulating current; close-wound or moderately spaced turns" />
          </ResultRow>
        );
      }}
    </OptionCard>
  );
}

function DividerCard(props: { bench: BenchState; formula: JSX.Element; tankCapacitance: () => number | undefined }) {
  return (
    <OptionCard bench={props.bench} kind="capacitiveDivider">
      {(o, stale) => {
        const v = () => o().divider;
        const a = () => v().approximate;
        const signed = (x: number) => `${x >= 0 ? '+' : '−'}${Math.abs(x * 100).toFixed(1)} %`;
        return (
          <>
            <ResultRow id="out-c1" label="C1, top of the tank to the joint (exact)" symbol="C₁" value={v().upperCapacitance} unit="F" significant={4} stale={stale()} primary />
            <ResultRow id="out-c2" label="C2, joint to the cold end, antenna across it (exact)" symbol="C₂" value={v().lowerCapacitance} unit="F" significant={4} stale={stale()}>
              <p class="tw-formula-meta" id="out-div-detail">
                In series {pf(v().seriesCapacitance)}, in place of the tank’s {pf(props.tankCapacitance() ?? Number.NaN)}: a little more, as the antenna’s
                loading takes some. Step-up from the joint to the top {v().stepUp.toFixed(3)}; the lower branch’s Q, ωC₂Rₛ = {v().branchQ.toFixed(2)}.
              </p>
              <p class="tw-formula-meta" id="out-div-approx">
                The high-Q rule (n = {a().stepUp.toFixed(3)}): C₁ ≈ nC/(n − 1) = {pf(a().upperCapacitance)}, C₂ ≈ nC = {pf(a().lowerCapacitance)}. Those would present
                {' '}{ohm(a().presentedResistance)} ({signed(a().resistanceError)}) and {pf(a().capacitance)} across the coil ({signed(a().capacitanceError)}): the rule holds
                while ωC₂Rₛ is well above 10{a().branchQ < 10 ? `; here it is ${a().branchQ.toFixed(2)}, so use the exact values` : ''}.
              </p>
              <Formula math={props.formula} source="exact: series–parallel conversion (derived on the method page); the high-Q rule: the tapped-capacitor transformer (Bowick, RF Circuit Design, 1982)" validity="the exact values while Rₛ < R′ < Rₛ(1 + Q′²); the rule while ωC₂Rₛ ≫ 1" />
            </ResultRow>
          </>
        );
      }}
    </OptionCard>
  );
}

function LinkCard(props: { bench: BenchState; formulas: [JSX.Element, JSX.Element] }) {
  return (
    <OptionCard bench={props.bench} kind="link">
      {(o, stale) => {
        const l = () => o().link;
        return (
          <ResultRow id="out-link" label="Link turns over the cold end (whole turns)" value={l().practicalTurns} significant={turnFigures(l().practicalTurns)} stale={stale()} primary>
            <p class="tw-formula-meta" id="out-link-detail">
              Exactly {l().turns.toFixed(2)} turns present the antenna as wanted; {sayTurns(l().practicalTurns)} present {ohm(l().presentedResistance)}. Wound {mm(l().diameter)} across
              (centre to centre), its first turn {l().position === 0 ? 'over the cold-end turn' : `${mm(l().position)} from the cold-end turn`}, pitch {mm(l().pitch)}:
              {' '}L_link {henry(l().linkInductance)}, M {henry(l().mutualInductance)}, k = {l().couplingCoefficient.toFixed(3)}, X = ωL_link = {ohm(l().reactance)}.
            </p>
            <Formula math={props.formulas[0]} source="coupled circuits (Terman 1943); M from Maxwell’s formula summed over every pair of turns (Maxwell 1873; Grover 1946)" validity="turns as coaxial circles; the link’s reactance below the antenna’s resistance" />
            <Formula math={props.formulas[1]} source="Maxwell’s formula for two coaxial circles (Maxwell 1873; Grover 1946)" validity="exact for filaments; round wires: between their centres" />
          </ResultRow>
        );
      }}
    </OptionCard>
  );
}

/** The L-network in both forms (two options of the core, one card). */
function NetworkCard(props: { bench: BenchState; formula: JSX.Element }) {
  return (
    <section class="match-card" id="card-network" aria-labelledby="card-network-title">
      <h3 id="card-network-title">L-network, both forms</h3>
      <p class="tw-table-note">For a coil that cannot be tapped: one series part from the antenna to the top of the tank, the shunt part folded into the tank capacitor.</p>
      <OptionCard bench={props.bench} kind="lowPassL" title="Low-pass: series inductor, shunt capacitor">
        {(o, stale) => (
          <ResultRow id="out-lp" label="Series inductor" value={o().network.seriesInductance} unit="H" significant={4} stale={stale()}>
            <p class="tw-formula-meta" id="out-lp-detail">
              Network Q {o().network.networkQ.toFixed(2)}; its shunt capacitor ({pf(o().network.shuntCapacitance as number)}) adds to the tank’s: fit {pf(o().network.tankCapacitance)} across the coil.
            </p>
          </ResultRow>
        )}
      </OptionCard>
      <OptionCard bench={props.bench} kind="highPassL" title="High-pass: series capacitor, shunt inductor">
        {(o, stale) => (
          <ResultRow id="out-hp" label="Series capacitor" value={o().network.seriesCapacitance} unit="F" significant={4} stale={stale()}>
            <p class="tw-formula-meta" id="out-hp-detail">
              Network Q {o().network.networkQ.toFixed(2)}; its shunt inductor ({henry(o().network.shuntInductance as number)})
              {o().network.shuntKept
                ? ` stays beside the tank (the series capacitor adds more than the tank’s whole capacitance); tank capacitor ${pf(o().network.tankCapacitance)}.`
                : ` is left out and the tank capacitor reduced instead: fit ${pf(o().network.tankCapacitance)} across the coil.`}
            </p>
          </ResultRow>
        )}
      </OptionCard>
      <Formula math={props.formula} source="the L-network (Bowick, RF Circuit Design, 1982; the same algebra in Terman 1943)" validity="lossless network parts; one frequency" />
    </section>
  );
}
