/**
 * Match bench: "my antenna is 50 Ω, the next stage a kilohm, the tank tens of
 * kilohms: where do I tap the coil (or how do I split the capacitor, or how
 * many turns of link), and what loaded Q, bandwidth and loss does it give?"
 *
 * The bench is its field table (MATCH_FIELDS in matchFields.ts) and its plan
 * (matchPlan.ts): the link, the fields in use and where a core error is shown
 * come from the table; the numbers from designMatch (src/core/matching.ts),
 * one option at a time. This file lays out the fields and the answer first:
 * the recommended option's figures beside what the antenna straight across
 * the top would give. The cards (the tank, the options side by side, each
 * option's details with its formula) are a chunk of their own; the return
 * loss plot, the coil drawing and the SPICE netlist load their code when
 * their place comes near the screen, so a phone loads none of that at first.
 */
import { createSignal, lazy, Show, type JSX } from 'solid-js';
import { Fields } from '../kit/Field';
import { createWakingBench, inParts, Later, type BenchParts } from '../kit/Later';
import { LinkNotices } from '../kit/LinkNotices';
import { AnswerDock, type DockedAnswer } from '../kit/Summary';
import { MATCH_FIELDS, MATCH_GROUPS } from './matchFields';

/**
 * The answer and the cards under it: chunks of their own (the answer's brings
 * the match core), fetched as the bench hydrates and hydrated when they
 * arrive (Solid's lazy, as kit/Later uses it); the server renders them in
 * place, so nothing moves, and the page's first JavaScript holds the fields.
 */
const MatchResults = lazy(() => import('./MatchAnswer'));

export type MatchFormulaKey = 'resonance' | 'loadedQ' | 'stepUp' | 'maxwell' | 'link' | 'divider' | 'lNetwork' | 'losses';
/** The page's typeset formulas, handed over as slots of the island (see kit/Formula). */
export type MatchFormulas = Record<MatchFormulaKey, JSX.Element>;

/** The island, hydrated in parts (kit/Later): no single task blocks a phone for long. */
export default inParts('match', MatchBenchParts);

function MatchBenchParts(outer: BenchParts<MatchFormulas>) {
  const { bench, notices, awake } = createWakingBench(MATCH_FIELDS, outer.early);
  const [answer, setAnswer] = createSignal<DockedAnswer>();

  return (
    <div class="tw-bench match-bench" data-bench="match" data-awake={awake() ? '' : undefined}>
      <LinkNotices notices={notices()} />
      <div class="tw-bench-inputs">
        <fieldset class="match-group">
          <legend>Coil</legend>
          <Later>
            <Fields bench={bench} names={MATCH_GROUPS.coil} />
            <Show when={bench.choice('coilBy') === 'L'}>
              <p class="tw-field-hint" id="coil-why">
                A tap or a link is worked out from a single-layer coil’s turns (Nagaoka and Rosa, Maxwell’s formula): a toroid’s or a
                multilayer coil’s flux is not shared turn by turn as those models have it. Here only the capacitive divider and the L-network are offered.
              </p>
            </Show>
          </Later>
        </fieldset>
        <Show when={bench.choice('coilBy') === 'solenoid'}>
          <fieldset class="match-group">
            <legend>Wire</legend>
            <Later>
              <Fields bench={bench} names={MATCH_GROUPS.wire} />
            </Later>
          </fieldset>
        </Show>
        <Later>
          <fieldset class="match-group">
            <legend>Tank</legend>
            <Fields bench={bench} names={MATCH_GROUPS.tank} />
          </fieldset>
          <fieldset class="match-group">
            <legend>Antenna and next stage</legend>
            <Fields bench={bench} names={MATCH_GROUPS.terminations} />
          </fieldset>
          <fieldset class="match-group">
            <legend>Goal</legend>
            <Fields bench={bench} names={MATCH_GROUPS.goal} />
          </fieldset>
          <Show when={bench.choice('coilBy') === 'solenoid'}>
            <fieldset class="match-group">
              <legend>Link winding (optional)</legend>
              <Fields bench={bench} names={MATCH_GROUPS.link} />
            </fieldset>
          </Show>
        </Later>
        <Show when={bench.generalError()}>
          <p class="tw-bench-error" role="alert">{bench.generalError()}</p>
        </Show>
        <AnswerDock answer={answer()} />
      </div>

      <div class="tw-bench-results" aria-live="polite">
        <Later>
          <MatchResults bench={bench} formulas={outer.formulas} onAnswer={setAnswer} />
        </Later>
      </div>
    </div>
  );
}

