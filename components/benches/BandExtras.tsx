/**
 * The Band bench's parts that only some people reach, loaded on demand (see
 * BandCards.tsx: when their place comes near the screen, or at once when a
 * slug or a plate table is given): the tuning curve, selectivity and image
 * plots, with the curves they draw (bandCurves.ts: the dial laws, the
 * selectivity across the band), and tuning with a slug. The slug and the
 * plate table are computations of their own on the bench, so a bad entry is
 * told at its field while the plan stands; they are created when this code
 * arrives, which a typed slug or table brings about at once.
 */
import { Show, type Accessor } from 'solid-js';
import { formatNumber, formatQuantity, formatQuantityCompact } from '../../src/quantity';
import type { BenchState } from '../kit/bench';
import type { Computed } from '../kit/compute';
import { NoteList } from '../kit/Note';
import { Plot } from '../kit/Plot';
import { ResultRow } from '../kit/ResultRow';
import type { BandRun } from './BandBench';
import { curvesOf, ownDialFor, slugFor } from './bandCurves';
import { bandText, sayDb, sayQ, signedHz } from './bandPlan';
import type { BandTracking } from './bandTracking';

/** Axis and readout labels: engineering notation without trailing zeros. */
const tickHz = (x: number | null) => (x == null || !Number.isFinite(x) ? '' : formatQuantityCompact(x, 'Hz', 4));
const tickPercent = (x: number | null) => (x == null || !Number.isFinite(x) ? '' : `${formatNumber(x, 3)} %`);

/** A tuning slug: how far it moves the band, and where to set it for the band asked (nothing without a slug). */
export function SlugSection(props: { bench: BenchState }) {
  const calc = props.bench.compute((raw, choices) => ({ slug: slugFor(raw, choices) }));
  const s = () => calc.result()?.slug;
  return (
    <Show when={s()}>
      <section class="band-stack" aria-labelledby="slug-title">
        <h2 class="band-heading" id="slug-title">Tuning slug</h2>
        <ResultRow id="out-slug-low" label="Lowest frequency, slug fully in" value={s()!.lowestFrequency} unit="Hz" significant={4} stale={calc.stale()} />
        <ResultRow id="out-slug-high" label="Highest frequency, slug fully out" value={s()!.highestFrequency} unit="Hz" significant={4} stale={calc.stale()}>
          <p class="tw-formula-meta" id="out-slug-detail">
            The slug runs the coil from {formatQuantity(s()!.minInductance, 'H', 4)} to {formatQuantity(s()!.maxInductance, 'H', 4)}: it moves the whole band,
            by a factor of up to {formatNumber(s()!.slugFrequencyRatio, 4)}, without widening it (the capacitor network sets the ratio, {formatNumber(s()!.capacitorRatio, 4)}).
            Slug in: {bandText(s()!.slugIn.lowFrequency, s()!.slugIn.highFrequency)}; slug out: {bandText(s()!.slugOut.lowFrequency, s()!.slugOut.highFrequency)}.
          </p>
        </ResultRow>
        <Show when={s()!.setting}>
          <ResultRow id="out-slug-set" label="Slug setting for the band asked" symbol="L" value={s()!.setting!.inductance} unit="H" significant={4} stale={calc.stale()}>
            <p class="tw-formula-meta">
              Any inductance from {formatQuantity(s()!.setting!.inductanceForLowEnd, 'H', 4)} to {formatQuantity(s()!.setting!.inductanceForHighEnd, 'H', 4)} covers it;
              {s()!.setting!.withinSlugRange ? ` the middle leaves ${formatNumber(s()!.setting!.spare * 100, 2)} % spare at each end.` : ' the slug does not reach that window (see the notes).'}
              {' '}Thomson’s formula with L scaled: the slug moves every frequency by √(L/L′).
            </p>
          </ResultRow>
        </Show>
        <NoteList notes={s()!.notes} />
      </section>
    </Show>
  );
}

/** The tuning curve (with the user's plates when given), the selectivity across the band and the image rejection. */
export function BandPlots(props: { bench: BenchState; calc: Computed<BandRun> }) {
  const own = props.bench.compute((raw, choices) => ({ dial: ownDialFor(raw, choices) }));
  const p = () => props.calc.result()?.plan;
  const stale = () => props.calc.stale();
  const curves = () => curvesOf(p()!);
  const ownDial: Accessor<ReturnType<typeof ownDialFor>> = () => own.result()?.dial;
  return (
    <Show when={p()}>
      <Plot
        id="plot-dial"
        caption={`Tuning curve: frequency against dial rotation, 0 % with the plates meshed. Solid: straight-line-capacitance plates; dashed: straight-line-frequency plates cut for this circuit${ownDial() ? '; third: your plate table, 0 % at its first angle' : ''}. The padder crowds the meshed end of a straight-line-capacitance dial.`}
        x={curves().dial.slc.percent}
        xLabel="Rotation"
        formatX={tickPercent}
        series={[
          { label: 'SLC', values: curves().dial.slc.frequency, unit: 'Hz' },
          { label: 'SLF', values: curves().dial.slf.frequency, unit: 'Hz', dash: true },
          ...(ownDial() ? [{ label: 'Your plates', values: ownDial()!.frequency, unit: 'Hz' }] : []),
        ]}
        yLabel="Frequency"
        formatY={tickHz}
        markers={[{ x: 50, label: 'half way' }]}
        stale={stale()}
      />
      <Plot
        id="plot-selectivity"
        caption="Selectivity across the band: loaded Q (solid) and unloaded Q (dashed) on the left, the −3 dB bandwidth on the right."
        x={curves().selectivity.frequency}
        xLabel="Frequency"
        formatX={tickHz}
        series={[
          { label: 'Loaded Q', values: curves().selectivity.loadedQ, format: sayQ },
          { label: 'Unloaded Q', values: curves().selectivity.unloadedQ, dash: true, format: sayQ },
          { label: 'Bandwidth', values: curves().selectivity.bandwidth.map((b) => b / 1e3), unit: 'kHz', axis: 'right' },
        ]}
        yLabel="Q"
        y2Label="Bandwidth (kHz)"
        stale={stale()}
      />
      <Show when={p()!.superhet}>
        <Plot
          id="plot-image"
          caption="Image rejection of the signal tank across the band, dB below its response on tune."
          x={curves().selectivity.frequency}
          xLabel="Frequency"
          formatX={tickHz}
          series={[{ label: 'Image rejection', values: curves().image ?? [], unit: 'dB', format: sayDb }]}
          yLabel="Rejection (dB)"
          stale={stale()}
        />
      </Show>
      <NoteList notes={ownDial()?.notes ?? []} />
    </Show>
  );
}

/** The tracking error across the band, zero at the three tracking points (marked). */
export function TrackingPlot(props: { tracking: BandTracking['tracking']; side: string; stale: boolean }) {
  const tr = () => props.tracking;
  return (
    <Plot
      id="plot-tracking"
      caption={`Tracking error across the band: the oscillator's frequency minus signal ${props.side === 'below' ? '−' : '+'} IF. Zero at the three tracking points, marked.`}
      x={tr().curve.signalFrequency}
      xLabel="Signal frequency"
      formatX={tickHz}
      series={[{ label: 'Error', values: tr().curve.error, unit: 'Hz', format: signedHz }]}
      yLabel="Error (Hz)"
      markers={tr().trackingFrequencies.map((x, i) => ({ x, label: `f${'₁₂₃'[i]}` }))}
      stale={props.stale}
    />
  );
}
