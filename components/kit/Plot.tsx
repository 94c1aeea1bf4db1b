/**
 * A line plot of one or more curves against a shared x axis (frequency, as a
 * rule), drawn by uPlot. uPlot's JavaScript loads only when the plot comes
 * near the screen (IntersectionObserver), so a page paints and answers first
 * and a phone never pays for a plot nobody scrolls to. Colours come from the
 * page's CSS variables, so the plot follows light and dark.
 *
 * Without a mouse: the plot is a slider (Tab to it, arrow keys move a cursor
 * along the data, Page Up/Down in larger steps, Home/End to the ends) with a
 * readout of every curve at the cursor, and a small table gives the curves at
 * the marked points. The x axis spans exactly the data.
 */
import { createEffect, createMemo, createSignal, For, onCleanup, onMount, Show } from 'solid-js';
import type uPlotType from 'uplot';
import { formatNumber, formatQuantity } from '../../src/quantity';
// The stylesheet is imported statically: Astro folds it into the page's CSS
// either way, and a dynamic import() of it asks for a CSS file the build
// never writes (a 404 that made the plot fail). Only the JavaScript is on demand.
import 'uplot/dist/uPlot.min.css';

export interface PlotSeries {
  label: string;
  /** y values, same length as x; NaN leaves a gap. */
  values: ArrayLike<number>;
  /** Which y axis: 'left' (default) or 'right'. */
  axis?: 'left' | 'right';
  /** Unit shown in the legend, the readout and on the axis. */
  unit?: string;
  dash?: boolean;
  /** Formats a value for the readout and the table of marked points (default: 4 figures and the unit). */
  format?: (y: number) => string;
}

export interface PlotMarker {
  x: number;
  label: string;
}

export interface PlotProps {
  id: string;
  /** Accessible description of what the plot shows. */
  caption: string;
  x: ArrayLike<number>;
  xLabel: string;
  xLog?: boolean;
  series: PlotSeries[];
  yLabel: string;
  yLog?: boolean;
  y2Label?: string;
  /** Dashed vertical lines, also listed in the table under the plot. */
  markers?: PlotMarker[];
  /** More points for the table only (not drawn), e.g. the resonance. */
  keyPoints?: PlotMarker[];
  /** Formats x for the axis, legend and readout (e.g. frequency with SI prefix). */
  formatX?: (x: number) => string;
  /** Formats the left axis's ticks. */
  formatY?: (y: number) => string;
  height?: number;
  stale?: boolean;
}

const PALETTE = ['--plot-1', '--plot-2', '--plot-3', '--plot-4'];
/** Units formatQuantity knows how to prefix; anything else is a plain number and its unit. */
const SI_UNITS = new Set(['Hz', 'Ω', 'H', 'F', 'V', 'A', 'W', 's', 'm']);
const AXIS_FONT_PX = 12;
const SMALL_PLOT_PX = 420;

function cssVar(name: string, fallback: string): string {
  const v = getComputedStyle(document.documentElement).getPropertyValue(name).trim();
  return v || fallback;
}

/** Default value text: engineering notation for SI units, else 4 figures and the unit. */
export function formatPlotValue(y: number, unit?: string): string {
  if (!Number.isFinite(y)) return '—';
  if (unit && SI_UNITS.has(unit)) return formatQuantity(y, unit, 4);
  return unit ? `${formatNumber(y, 4)} ${unit}` : formatNumber(y, 4);
}

/** Index of the point nearest x (x ascending). */
export function nearestIndex(xs: ArrayLike<number>, x: number): number {
  let lo = 0;
  let hi = xs.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (xs[mid] <= x) lo = mid; else hi = mid;
  }
  return Math.abs(xs[hi] - x) < Math.abs(x - xs[lo]) ? hi : lo;
}

/** y at x by straight-line interpolation between the neighbouring points (in log x on a log axis); NaN outside the data. */
export function valueAt(xs: ArrayLike<number>, ys: ArrayLike<number>, x: number, logX = false): number {
  const n = xs.length;
  if (n === 0 || !(x >= xs[0] && x <= xs[n - 1])) return Number.NaN;
  let i = nearestIndex(xs, x);
  if (xs[i] > x && i > 0) i--;
  if (i >= n - 1) return ys[n - 1];
  const t = logX ? Math.log(x / xs[i]) / Math.log(xs[i + 1] / xs[i]) : (x - xs[i]) / (xs[i + 1] - xs[i]);
  return ys[i] + (Number.isFinite(t) ? t : 0) * (ys[i + 1] - ys[i]);
}

/** Grid lines of a log axis at 1…9 × 10ⁿ inside [min, max]; uPlot labels the ones that fit. */
function logSplits(_u: uPlotType, _axis: number, min: number, max: number): number[] {
  const out: number[] = [];
  for (let e = Math.floor(Math.log10(min)); e <= Math.ceil(Math.log10(max)); e++) {
    for (let m = 1; m <= 9; m++) {
      const v = Number((m * 10 ** e).toPrecision(12));
      if (v >= min * (1 - 1e-9) && v <= max * (1 + 1e-9)) out.push(v);
    }
  }
  return out;
}

export function Plot(props: PlotProps) {
  let figure!: HTMLElement;
  let holder!: HTMLDivElement;
  let chart: uPlotType | undefined;
  let shape = '';
  const [failed, setFailed] = createSignal<string | null>(null);
  const [lib, setLib] = createSignal<typeof uPlotType>();
  const [near, setNear] = createSignal(false);
  /** Cursor index for keyboard use; undefined until the plot is first focused. */
  const [cursor, setCursor] = createSignal<number>();
  /** The data are read only once the plot is near the screen or focused, so a bench may compute them lazily. */
  const active = () => near() || cursor() !== undefined;

  const n = () => props.x.length;
  const fmtX = (x: number) => (props.formatX ? props.formatX(x) : formatNumber(x, 4));
  const fmtY = (s: PlotSeries, y: number) => (!Number.isFinite(y) ? '—' : s.format ? s.format(y) : formatPlotValue(y, s.unit));

  /** Where the keyboard cursor starts: the first marker inside the data, else the middle. */
  const startIndex = () => {
    const xs = props.x;
    const m = (props.markers ?? []).find((k) => k.x >= xs[0] && k.x <= xs[xs.length - 1]);
    return m ? nearestIndex(xs, m.x) : Math.floor((xs.length - 1) / 2);
  };
  const index = () => Math.min(Math.max(0, cursor() ?? startIndex()), Math.max(0, n() - 1));
  const readout = () => {
    if (n() === 0) return '';
    const i = index();
    return `${fmtX(props.x[i])}: ${props.series.map((s) => `${s.label} ${fmtY(s, s.values[i])}`).join(', ')}`;
  };

  /** Marked and key points inside the data, with every curve at each. */
  const rows = createMemo(() => {
    if (!active()) return [];
    const xs = props.x;
    if (xs.length === 0) return [];
    const points = [...(props.markers ?? []), ...(props.keyPoints ?? [])].filter((p) => p.x >= xs[0] && p.x <= xs[xs.length - 1]);
    return points
      .sort((a, b) => a.x - b.x)
      .map((p) => ({ label: p.label, x: fmtX(p.x), values: props.series.map((s) => fmtY(s, valueAt(xs, s.values, p.x, props.xLog))) }));
  });

  // Load uPlot only when the plot is about to be seen.
  onMount(() => {
    if (typeof IntersectionObserver === 'undefined') {
      setNear(true);
      return;
    }
    const io = new IntersectionObserver((entries) => {
      if (entries.some((e) => e.isIntersecting)) {
        setNear(true);
        io.disconnect();
      }
    }, { rootMargin: '200px 0px' });
    io.observe(figure);
    onCleanup(() => io.disconnect());
  });

  createEffect(() => {
    if (!near() || lib()) return;
    import('uplot').then(
      (mod) => setLib(() => mod.default),
      (e) => {
        setFailed('The plot could not be loaded; the numbers above and the table below are unaffected.');
        console.warn(e);
      },
    );
  });

  const data = (): uPlotType.AlignedData => [
    Array.from(props.x),
    ...props.series.map((s) => Array.from(s.values, (v) => (Number.isFinite(v) ? v : null))),
  ] as uPlotType.AlignedData;

  const width = () => Math.max(200, holder.clientWidth);
  const height = () => props.height ?? (holder.clientWidth < SMALL_PLOT_PX ? 240 : 280);

  /** Moves uPlot's cursor (and so its legend) to point i. */
  const showCursor = (i: number) => {
    if (!chart || i >= n()) return;
    const s = props.series[0];
    const y = s ? s.values[i] : Number.NaN;
    chart.setCursor({ left: chart.valToPos(props.x[i], 'x'), top: Number.isFinite(y) ? chart.valToPos(y, s.axis === 'right' ? 'y2' : 'y') : 0 });
  };

  createEffect(() => {
    const U = lib();
    if (!U) return;
    // Rebuild (not just setData) when anything shown in axes or legend changes.
    const next = [props.xLabel, props.yLabel, props.y2Label ?? '', props.xLog, props.yLog, ...props.series.map((s) => `${s.label}/${s.unit ?? ''}/${s.axis ?? ''}`)].join('|');
    if (chart && shape === next) {
      chart.setData(data());
      if (cursor() !== undefined) showCursor(index());
      return;
    }
    chart?.destroy();
    shape = next;
    const ink = cssVar('--ink', '#222');
    const grid = cssVar('--line', '#ccc');
    const font = `${AXIS_FONT_PX}px system-ui, sans-serif`;
    const markers = () => props.markers ?? [];
    /** Room for the widest tick label, so an axis title never sits on the ticks. */
    const fit = (u: uPlotType, values: string[] | null, axisIdx: number, cycle: number): number => {
      const axis = u.axes[axisIdx] as uPlotType.Axis & { _size?: number };
      if (cycle > 1 && axis._size) return axis._size;
      u.ctx.font = font;
      const widest = Math.max(0, ...(values ?? []).map((v) => (v ? u.ctx.measureText(v).width : 0)));
      return Math.ceil(widest + (axis.ticks?.size ?? 10) + (axis.gap ?? 5) + 8);
    };
    /** Least room between x labels: the widest label plus a gap, so labels never run together. */
    const xSpace = (u: uPlotType, _axis: number, _min: number, _max: number, plotDim: number): number => {
      u.ctx.font = font;
      const xs = props.x;
      const sample = [xs[0], xs[xs.length - 1], (xs[0] + xs[xs.length - 1]) / 2].map((v) => u.ctx.measureText(fmtX(v)).width);
      return Math.ceil(Math.max(30, ...sample) + (plotDim < SMALL_PLOT_PX ? 12 : 20));
    };
    const values = (format?: (v: number) => string) => (format ? (_u: uPlotType, vals: number[]) => vals.map((v) => (v == null ? '' : format(v))) : undefined);
    const opts: uPlotType.Options = {
      width: width(),
      height: height(),
      scales: {
        // The x axis spans the data exactly (uPlot would round a log axis out to whole decades).
        x: { time: false, distr: props.xLog ? 3 : 1, range: (_u, min, max) => (min === max ? [min * 0.9, max * 1.1] : [min, max]) },
        y: { distr: props.yLog ? 3 : 1 },
        y2: { distr: 1 },
      },
      axes: [
        { label: props.xLabel, stroke: ink, font, labelFont: font, grid: { stroke: grid }, space: xSpace, splits: props.xLog ? logSplits : undefined, values: values(props.formatX) },
        { label: props.yLabel, stroke: ink, font, labelFont: font, grid: { stroke: grid }, scale: 'y', size: fit, labelSize: 20, values: values(props.formatY) },
        ...(props.y2Label ? [{ label: props.y2Label, stroke: ink, font, labelFont: font, side: 1 as const, scale: 'y2', size: fit, labelSize: 20, grid: { show: false } }] : []),
      ],
      series: [
        { label: props.xLabel, value: (_u: uPlotType, v: number) => (v == null ? '—' : fmtX(v)) },
        ...props.series.map((s, i) => ({
          label: s.unit ? `${s.label} (${s.unit})` : s.label,
          scale: s.axis === 'right' ? 'y2' : 'y',
          stroke: cssVar(PALETTE[i % PALETTE.length], ink),
          width: 2,
          dash: s.dash ? [6, 4] : undefined,
          spanGaps: false,
        })),
      ],
      legend: { live: true },
      cursor: { drag: { x: false, y: false } },
      hooks: {
        draw: [
          (u) => {
            const ctx = u.ctx;
            ctx.save();
            ctx.strokeStyle = cssVar('--plot-marker', ink);
            ctx.fillStyle = ctx.strokeStyle;
            ctx.setLineDash([3, 3]);
            ctx.font = `${12 * devicePixelRatio}px system-ui, sans-serif`;
            let lastEnd = -Infinity;
            let line = 0;
            for (const m of [...markers()].sort((a, b) => a.x - b.x)) {
              const px = u.valToPos(m.x, 'x', true);
              if (!Number.isFinite(px) || px < u.bbox.left || px > u.bbox.left + u.bbox.width) continue;
              ctx.beginPath();
              ctx.moveTo(px, u.bbox.top);
              ctx.lineTo(px, u.bbox.top + u.bbox.height);
              ctx.stroke();
              // A label that would run into the one before goes a line lower.
              line = px + 4 < lastEnd ? line + 1 : 0;
              ctx.fillText(m.label, px + 4, u.bbox.top + (14 + 14 * line) * devicePixelRatio);
              lastEnd = Math.max(lastEnd, px + 4 + ctx.measureText(m.label).width + 4 * devicePixelRatio);
            }
            ctx.restore();
          },
        ],
        setScale: [
          (u, key) => {
            if (key !== 'x') return;
            figure.dataset.scaleMin = String(u.scales.x.min);
            figure.dataset.scaleMax = String(u.scales.x.max);
          },
        ],
      },
    };
    chart = new U(opts, data(), holder);
    if (cursor() !== undefined) showCursor(index());
  });

  onMount(() => {
    const ro = new ResizeObserver(() => chart?.setSize({ width: width(), height: height() }));
    ro.observe(holder);
    onCleanup(() => ro.disconnect());
  });
  onCleanup(() => chart?.destroy());

  const onKey = (e: KeyboardEvent) => {
    const last = n() - 1;
    if (last < 0) return;
    const step = Math.max(1, Math.round(last / 100));
    const big = Math.max(step, Math.round(last / 10));
    const i = index();
    const next = ({
      ArrowRight: i + step, ArrowUp: i + step, ArrowLeft: i - step, ArrowDown: i - step,
      PageUp: i + big, PageDown: i - big, Home: 0, End: last,
    } as Record<string, number>)[e.key];
    if (next === undefined) return;
    e.preventDefault();
    const clamped = Math.min(last, Math.max(0, next));
    setCursor(clamped);
    showCursor(clamped);
  };

  const readoutId = `${props.id}-readout`;
  return (
    <figure class="tw-plot" classList={{ 'tw-result--stale': !!props.stale }} id={props.id} ref={figure}
      data-x-first={active() && n() ? props.x[0] : undefined} data-x-last={active() && n() ? props.x[n() - 1] : undefined}>
      <div
        class="tw-plot-canvas"
        ref={holder}
        role="slider"
        tabindex="0"
        aria-label={`${props.caption} Arrow keys move a cursor along the curves.`}
        aria-valuemin={0}
        aria-valuemax={active() ? Math.max(0, n() - 1) : 0}
        aria-valuenow={active() ? index() : 0}
        aria-valuetext={active() ? readout() : 'no point chosen yet'}
        aria-describedby={readoutId}
        onKeyDown={onKey}
        onFocus={() => { if (cursor() === undefined) { setCursor(startIndex()); showCursor(index()); } }}
      />
      <Show when={failed()}>
        <p class="tw-field-msg">{failed()}</p>
      </Show>
      <p class="tw-plot-readout" id={readoutId}>
        <Show when={cursor() !== undefined} fallback="Tab to the plot and use the arrow keys to read values along it.">
          Cursor at {readout()}
        </Show>
      </p>
      <Show when={rows().length > 0}>
        <div class="tw-plot-keys-wrap">
        <table class="tw-plot-keys">
          <caption>At the marked points</caption>
          <thead>
            <tr>
              <th scope="col">Point</th>
              <th scope="col">{props.xLabel}</th>
              <For each={props.series}>{(s) => <th scope="col">{s.label}</th>}</For>
            </tr>
          </thead>
          <tbody>
            <For each={rows()}>
              {(r) => (
                <tr>
                  <th scope="row">{r.label}</th>
                  <td>{r.x}</td>
                  <For each={r.values}>{(v) => <td>{v}</td>}</For>
                </tr>
              )}
            </For>
          </tbody>
        </table>
        </div>
      </Show>
      <figcaption>{props.caption}</figcaption>
    </figure>
  );
}
