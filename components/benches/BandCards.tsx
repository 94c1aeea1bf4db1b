/**
 * The Band bench's cards under the answer: coil, trimmer and padder with
 * their formulas, the band covered, the selectivity table, the notes, the
 * tuning, selectivity and image plots, the superhet tracking, the fixed pairs
 * with their tolerance spread, and the hand-offs to the Coil and Tank
 * benches. The island (BandBench.tsx) loads this chunk as it hydrates.
 * Tracking, pairs and hand-offs load their own code when their section
 * comes near the screen, as the kit's Plot loads uPlot.
 */
import { createEffect, createMemo, createSignal, For, onCleanup, onMount, Show, type Accessor, type JSX } from 'solid-js';
import type { PairCandidate } from '../../src/core/pairs';
import { formatNumber, formatQuantity, formatQuantityCompact } from '../../src/quantity';
import type { BenchState } from '../kit/bench';
import type { Computed } from '../kit/compute';
import { formatShift } from '../kit/format';
import { Formula } from '../kit/Formula';
import { Later } from '../kit/Later';
import { NoteList } from '../kit/Note';
import { ResultRow } from '../kit/ResultRow';
import type { BandFormulas, BandRun } from './BandBench';
import { bandText, hz, sayDb, sayQ, sayTurns, signedHz } from './bandPlan';
import { imageResponse } from './bandImage';

const pf = (c: number) => formatQuantityCompact(c, 'F', 3);

/**
 * A module loaded once the element with this id comes near the screen (or
 * at once where IntersectionObserver is missing); undefined until then.
 */
function loadNear<T>(id: string, load: () => Promise<T>, also?: () => boolean): { module: Accessor<T | undefined>; failed: Accessor<boolean> } {
  const [module, setModule] = createSignal<T>();
  const [failed, setFailed] = createSignal(false);
  let started = false;
  const go = () => {
    if (started) return;
    started = true;
    load().then((m) => setModule(() => m), (e: unknown) => {
      console.warn(e);
      setFailed(true);
    });
  };
  // Sooner when asked for (a slug or plate table typed far from the place it shows).
  if (also) createEffect(() => { if (also()) go(); });
  onMount(() => {
    const el = document.getElementById(id);
    if (!el || typeof IntersectionObserver === 'undefined') return void go();
    const io = new IntersectionObserver((entries) => {
      if (entries.some((e) => e.isIntersecting)) {
        io.disconnect();
        void go();
      }
    }, { rootMargin: '300px 0px' });
    io.observe(el);
    onCleanup(() => io.disconnect());
  });
  return { module, failed };
}

export default function BandCards(props: { bench: BenchState; formulas: BandFormulas; calc: Computed<BandRun> }) {
  const bench = props.bench;
  const f = props.formulas;
  const calc = props.calc;
  const r = calc.result;
  const p = () => r()?.plan;
  const d = () => p()?.design;
  const sel = () => p()?.selectivity;
  const stale = () => calc.stale();
  // The image rejection (superhet): a computation of its own, so an IF the core refuses is told at its field.
  const imageCalc = bench.compute(() => (p() ? { image: imageResponse(p()!) } : undefined));
  const image = () => imageCalc.result()?.image;
  const linkCode = loadNear('handoff', () => import('./bandLinks'));
  const links = createMemo(() => {
    const m = linkCode.module();
    const run = r();
    return m && run ? { coil: m.coilLink(run.raw, run.choices, run.plan), tank: m.tankLink(run.plan), match: m.matchLink(run.plan) } : undefined;
  });

  return (
    <>
      <Later>
        <ResultRow id="out-L" label="Coil inductance" symbol="L" value={d()?.inductance} unit="H" significant={5} stale={stale()} primary>
          <Formula math={f.inductance} source="Thomson’s formula at the band’s high end (plates open); Terman 1943, section 3" validity="lumped and lossless; strays constant across the band" />
        </ResultRow>
        <ResultRow id="out-turns" label="Turns to wind" symbol="N" value={p()?.coil.turns} stale={stale()} primary significant={sayTurns(p()?.coil.turns ?? 1).replace('.', '').length}>
          <Show when={p()}>
            <p class="tw-formula-meta" id="out-turns-detail">
              {sayTurns(p()!.coil.turns)} turns give {formatQuantity(p()!.coil.inductance, 'H', 4)}
              {p()!.coil.form === 'solenoid' && p()!.coil.windingLength !== undefined ? `, wound ${formatQuantity(p()!.coil.windingLength!, 'm', 3)} long` : ''};
              wire to cut {formatQuantity(p()!.coil.wireLength, 'm', 3)} with both leads. The trimmer takes up the difference from L.
              The Coil bench has the details (link below).
            </p>
          </Show>
        </ResultRow>
        <ResultRow id="out-trim" label="Trimmer across the variable capacitor" symbol="Cₜ" value={d()?.trimmerCapacitance} unit="F" significant={4} stale={stale()}>
          <Formula math={f.trimmer} source="Thomson’s formula at both ends of the band; our own derivation (method page)" validity={d()?.arrangement === 'padder' ? 'with a padder: the trimmer and strays are held at the capacitor’s maximum' : 'trimmer alone'} />
        </ResultRow>
        <ResultRow id="out-pad" label="Padder in series" symbol="Cₚ" value={d()?.padderCapacitance} unit="F" significant={4} stale={stale()}>
          <Show when={d()?.padderCapacitance !== undefined} fallback={<p class="tw-formula-meta" id="out-pad-none">No padder: the trimmer alone narrows the capacitor’s swing to the band.</p>}>
            <Formula math={f.padder} source="the ratio equation solved for the padder; our own derivation (method page)" validity={`crowds the meshed end of the dial ${formatNumber(d()?.crowding ?? Number.NaN, 3)} times`} />
          </Show>
        </ResultRow>
      </Later>

      <Later>
        <ResultRow id="out-low" label="Band covered, low end (plates meshed)" symbol="f₁" value={d()?.lowFrequency} unit="Hz" significant={5} stale={stale()}>
          <Formula math={f.coverage} source="Thomson’s formula; series and parallel capacitance (Terman 1943)" validity="lumped, lossless: loss moves resonance by about 1/Q²" />
        </ResultRow>
        <ResultRow id="out-high" label="Band covered, high end (plates open)" symbol="f₂" value={d()?.highFrequency} unit="Hz" significant={5} stale={stale()}>
          <Show when={d()}>
            <p class="tw-formula-meta" id="out-band-asked">Asked {bandText(d()!.requestedLowFrequency, d()!.requestedHighFrequency)}; the margin widens it at both ends.</p>
          </Show>
        </ResultRow>
        <ResultRow id="out-widest" label="Widest frequency ratio this capacitor gives" value={d()?.widestRatio} stale={stale()}>
          <Formula math={f.widest} source="Thomson’s formula with no trimmer and no padder" validity={d() ? `the band needs ${formatNumber(d()!.frequencyRatio, 4)}` : undefined} />
        </ResultRow>
      </Later>

      <Later>
        <SlugNear bench={bench} />
      </Later>

      <Later>
        <section class="tw-table-block band-block" aria-labelledby="sel-title" classList={{ 'tw-result--stale': stale() }}>
          <h2 id="sel-title">Selectivity across the band</h2>
          <div class="tw-plot-keys-wrap">
            <table class="tw-table" id="sel-table">
              <thead>
                <tr><th scope="col">At</th><th scope="col">Frequency</th><th scope="col">Coil Q</th><th scope="col">Unloaded Q</th><th scope="col">Loaded Q</th><th scope="col">Bandwidth</th><th scope="col">Dynamic R</th>
                  <Show when={image()}><th scope="col">Image rejection</th></Show></tr>
              </thead>
              <tbody>
                <For each={sel() ? ([['low', sel()!.low, image()?.low], ['middle', sel()!.middle, image()?.middle], ['high', sel()!.high, image()?.high]] as const) : []}>
                  {([name, pt, im]) => (
                    <tr id={`sel-${name}`}>
                      <th scope="row">{name}</th>
                      <td>{formatQuantity(pt.frequency, 'Hz', 4)}</td>
                      <td>{sayQ(pt.coilQ)}</td>
                      <td>{sayQ(pt.unloadedQ)}</td>
                      <td data-value={pt.loadedQ}>{sayQ(pt.loadedQ)}</td>
                      <td data-value={pt.bandwidth}>{formatQuantity(pt.bandwidth, 'Hz', 3)}</td>
                      <td>{formatQuantity(pt.dynamicResistance, 'Ω', 3)}</td>
                      <Show when={im}><td data-value={im!.rejection}>{sayDb(im!.rejection)} at {formatQuantity(im!.image, 'Hz', 4)}</td></Show>
                    </tr>
                  )}
                </For>
              </tbody>
            </table>
          </div>
          <Formula math={f.selectivity} source="Pozar, Microwave Engineering (loaded Q); coil Q from the Coil bench’s loss model (Butterworth 1922)" validity="tank analysed at each frequency with the coil’s Q there; source and load across the tank" />
          <Show when={image()}>
            <Formula math={f.image} source="the loaded tank’s own impedance at the image (one tuned circuit ahead of the mixer)" validity="one tuned circuit: an RF stage with its own tank adds its rejection in dB" />
          </Show>
        </section>
      </Later>

      <Later>
        <NoteList notes={p()?.notes ?? []} />
      </Later>

      <Later>
        <BandPlotsNear bench={bench} calc={calc} formula={f.dial} />
      </Later>

      <Later>
        <BandTrackingPart bench={bench} formula={f.tracking} />
      </Later>

      <Later>
        <BandPairs bench={bench} formula={f.spread} />
      </Later>

      <Later>
        <section class="tw-table-block band-handoff" aria-labelledby="handoff-title" id="handoff">
          <h2 id="handoff-title">Next: wind the coil, tune the tank, match it</h2>
          <Show when={links()} fallback={<p>{r() ? 'Preparing the links…' : 'Complete the inputs to carry this design to the Coil and Tank benches.'}</p>}>
            <ul class="band-links">
              <li>
                <a id="to-coil" href={links()!.coil}>Wind this coil on the Coil bench</a>{' '}
                <span class="tw-formula-meta">(carries L, the former, the wire and the mid-band frequency{stale() ? '; from the last good design' : ''})</span>
              </li>
              <li>
                <a id="to-tank" href={links()!.tank}>Tune the tank at mid-band on the Tank bench</a>{' '}
                <span class="tw-formula-meta">(carries L, the coil’s Q there, the strays as its self-capacitance, the capacitance that tunes it, the capacitor’s Q, source and load)</span>
              </li>
              <li>
                <a id="to-match" href={links()!.match}>Match the antenna and the next stage on the Match bench</a>{' '}
                <span class="tw-formula-meta">(carries the coil as wound and everything across it at mid-band; taps and links are found from its winding)</span>
              </li>
            </ul>
          </Show>
        </section>
      </Later>
    </>
  );
}

/** True when the slug or the plate table is given: their code is then loaded at once. */
const extrasAsked = (bench: BenchState) => () => !bench.field('slug').blank() || !bench.field('plates').blank();

/** Tuning with a slug: its code and computation arrive when a slug is given (or its place comes near). */
function SlugNear(props: { bench: BenchState }) {
  const code = loadNear('slug-part', () => import('./BandExtras'), extrasAsked(props.bench));
  return (
    <div id="slug-part">
      <Show when={code.module()}>
        {(m) => {
          const SlugSection = m().SlugSection;
          return <SlugSection bench={props.bench} />;
        }}
      </Show>
    </div>
  );
}

/**
 * The plots (tuning curve, selectivity, image rejection): drawn when their
 * place comes near the screen (or a plate table is given), so a phone loads
 * and hydrates no plot code at first; the space they take is held meanwhile.
 * The dial law's formula is the page's and stays in place.
 */
function BandPlotsNear(props: { bench: BenchState; calc: Computed<BandRun>; formula: JSX.Element }) {
  const code = loadNear('plots', () => import('./BandExtras'), extrasAsked(props.bench));
  const superhet = () => props.bench.choice('osc') !== 'none';
  return (
    <section class="band-stack" id="plots" aria-labelledby="plots-title">
      <h2 class="band-heading" id="plots-title">Tuning curve and selectivity, plotted</h2>
      <Show
        when={code.module()}
        fallback={<p class="tw-table-note band-plots-waiting" classList={{ 'band-plots-waiting--three': superhet() }}>{code.failed() ? 'The plots could not be loaded; the rest of the bench is unaffected.' : 'The plots are drawn when you scroll to them.'}</p>}
      >
        {(m) => {
          const BandPlots = m().BandPlots;
          return <BandPlots bench={props.bench} calc={props.calc} />;
        }}
      </Show>
      <Formula math={props.formula} source="dial laws of the two plate shapes; Thomson’s formula for each setting" validity="real straight-line-frequency plates are cut for one circuit and follow this only roughly" />
    </section>
  );
}

/** The fixed pairs for the band's centre, with their tolerance spread: a computation of its own. */
function BandPairs(props: { bench: BenchState; formula: JSX.Element }) {
  const code = loadNear('pairs', () => import('./bandPairs'));
  const calc = props.bench.compute((raw) => code.module()?.pairsForBand(raw));
  const res = calc.result;
  const range = (low: number, high: number) => `${hz(low)} – ${hz(high)}`;
  const trimmer = (c: PairCandidate) => (c.trimmer === null
    ? 'none: strays alone tune too low'
    : `${c.trimmer.capacitor > 0 ? `${pf(c.trimmer.capacitor)} + ` : ''}${pf(c.trimmer.minimum)}…${pf(c.trimmer.maximum)}`);
  return (
    <section class="tw-table-block band-block" aria-labelledby="pairs-title" classList={{ 'tw-result--stale': calc.stale() }} id="pairs">
      <h2 id="pairs-title">Fixed pairs for the band’s centre</h2>
      <Show when={res()} fallback={<p class="tw-table-note">{code.failed() ? 'The pairs could not be loaded; the rest of the bench is unaffected.' : 'Working out the pairs…'}</p>}>
        <p class="tw-table-note" id="pairs-target">
          Ranked by their error at {formatQuantity(res()!.target, 'Hz', 4)} (the geometric centre); {res()!.pairsSearched} pairs searched.
          Spread of each: worst case over the corners of the tolerance box, and {res()!.candidates[0]?.spread.monteCarlo.samples ?? 0} Monte-Carlo units (seed {res()!.candidates[0]?.spread.monteCarlo.seed ?? '—'}).
        </p>
        <div class="tw-plot-keys-wrap">
          <table class="tw-table" id="pairs-table">
            <thead>
              <tr>
                <th scope="col">Inductor</th><th scope="col">Capacitor</th><th scope="col">Resonance</th><th scope="col">Error</th>
                <th scope="col">Worst case</th><th scope="col">Monte Carlo (σ)</th><th scope="col">In band?</th><th scope="col">Trimmer to align</th>
              </tr>
            </thead>
            <tbody>
              <For each={res()!.candidates}>
                {(c) => (
                  <tr>
                    <th scope="row">{c.inductor.name}</th>
                    <td>{pf(c.capacitance)}</td>
                    <td data-value={c.frequency}>{hz(c.frequency)}</td>
                    <td>{formatShift(c.error) ?? 'within 0.1 %'}</td>
                    <td data-low={c.spread.worstCase.low} data-high={c.spread.worstCase.high}>{range(c.spread.worstCase.low, c.spread.worstCase.high)}</td>
                    <td>{range(c.spread.monteCarlo.low, c.spread.monteCarlo.high)} ({formatQuantityCompact(c.spread.monteCarlo.standardDeviation, 'Hz', 2)})</td>
                    <td>{c.spreadInBand ? 'yes' : 'no'}</td>
                    <td>{trimmer(c)}</td>
                  </tr>
                )}
              </For>
            </tbody>
          </table>
        </div>
        <Formula math={props.formula} source="Thomson’s formula at the corners of the tolerance box; IEC 60063 preferred values and their tolerances" validity="part tolerances only: drift with temperature and age comes on top" />
        <NoteList notes={res()!.notes} />
      </Show>
    </section>
  );
}

/** Superhet tracking: the oscillator's coil, trimmer and padder, and the error curve (a computation of its own). */
function BandTrackingPart(props: { bench: BenchState; formula: JSX.Element }) {
  // The tracking's code and its plot's arrive together when the section comes near.
  const code = loadNear('tracking', async () => {
    const [tracking, extras] = await Promise.all([import('./bandTracking'), import('./BandExtras')]);
    return { trackBand: tracking.trackBand, TrackingPlot: extras.TrackingPlot };
  });
  const calc = props.bench.compute((raw, choices) => code.module()?.trackBand(raw, choices));
  const stale = () => calc.stale();
  const t = () => calc.result() ?? undefined;
  const tr = () => t()?.tracking;
  const superhet = () => props.bench.choice('osc') !== 'none';
  const side = () => props.bench.choice('osc');
  return (
    <div id="tracking">
      <Show when={superhet()}>
        <section class="band-stack" aria-labelledby="tracking-title">
          <h2 class="band-heading" id="tracking-title">Oscillator tracking</h2>
          <Show when={tr()} fallback={<p class="tw-table-note">{code.failed() ? 'The tracking could not be loaded; the rest of the bench is unaffected.' : 'Working out the tracking…'}</p>}>
            <ResultRow id="out-osc-L" label="Oscillator coil" symbol="Lₒ" value={tr()!.oscillator.inductance} unit="H" significant={5} stale={stale()}>
              <Formula math={props.formula} source="three-point tracking (Terman 1943; Langford-Smith 1953), closed form derived on the method page; Chebyshev placement of the points" validity="lossless lumped tanks; the same gang section in both" />
              <Show when={t()!.oscillatorCoil}>
                <p class="tw-formula-meta" id="out-osc-turns">Wound on the same former: {sayTurns(t()!.oscillatorCoil!.turns)} turns ({formatQuantity(t()!.oscillatorCoil!.inductance, 'H', 4)}).</p>
              </Show>
            </ResultRow>
            <ResultRow id="out-osc-trim" label="Oscillator trimmer" value={tr()!.oscillator.trimmerCapacitance} unit="F" significant={4} stale={stale()} />
            <ResultRow id="out-osc-pad" label="Oscillator padder" value={tr()!.oscillator.padderCapacitance} unit="F" significant={4} stale={stale()}>
              <p class="tw-formula-meta">The oscillator tunes {bandText(tr()!.oscillatorLowFrequency, tr()!.oscillatorHighFrequency)}; exact at {tr()!.trackingFrequencies.map(hz).join(', ')}.</p>
            </ResultRow>
            <ResultRow id="out-track" label="Largest tracking error" value={tr()!.largestError.error} unit="Hz" significant={3} stale={stale()}>
              <p class="tw-formula-meta" id="out-track-detail">At {formatQuantity(tr()!.largestError.signalFrequency, 'Hz', 4)}: the oscillator is {signedHz(tr()!.largestError.error)} off, {formatNumber(Math.abs(tr()!.largestError.relativeError) * 100, 2)} % of the IF.</p>
            </ResultRow>
            {(() => {
              const TrackingPlot = code.module()!.TrackingPlot;
              return <TrackingPlot tracking={tr()!} side={side()} stale={stale()} />;
            })()}
            <NoteList notes={t()!.notes} />
          </Show>
        </section>
      </Show>
    </div>
  );
}
