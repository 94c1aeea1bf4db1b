/**
 * A line plot of one or more curves against a shared x axis (frequency, as a
 * rule), drawn by uPlot. uPlot's JavaScript loads on demand, so a bench
 * paints its numbers first (its small stylesheet comes with the page's CSS). Colours come from the page's CSS variables, so
 * the plot follows light and dark. The canvas has a text caption; the data
 * itself is offered for download by the bench (CSV).
 */
import { createEffect, createSignal, onCleanup, onMount, Show } from 'solid-js';
import type uPlotType from 'uplot';
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
  /** Unit shown in the legend and on the axis. */
  unit?: string;
  dash?: boolean;
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
  markers?: PlotMarker[];
  /** Formats x for the legend/axis (e.g. frequency with SI prefix). */
  formatX?: (x: number) => string;
  formatY?: (y: number) => string;
  height?: number;
  stale?: boolean;
}

const PALETTE = ['--plot-1', '--plot-2', '--plot-3', '--plot-4'];

function cssVar(name: string, fallback: string): string {
  const v = getComputedStyle(document.documentElement).getPropertyValue(name).trim();
  return v || fallback;
}

export function Plot(props: PlotProps) {
  let holder!: HTMLDivElement;
  let chart: uPlotType | undefined;
  const [failed, setFailed] = createSignal<string | null>(null);
  const [lib, setLib] = createSignal<typeof uPlotType>();

  onMount(async () => {
    try {
      const mod = await import('uplot');
      setLib(() => mod.default);
    } catch (e) {
      setFailed('The plot could not be loaded; the numbers above are unaffected.');
      console.warn(e);
    }
  });

  const data = (): uPlotType.AlignedData => [
    Array.from(props.x),
    ...props.series.map((s) => Array.from(s.values, (v) => (Number.isFinite(v) ? v : null))),
  ] as uPlotType.AlignedData;

  createEffect(() => {
    const U = lib();
    if (!U) return;
    // Rebuild (not just setData) when anything shown in axes or legend changes.
    const shape = [props.xLabel, props.yLabel, props.y2Label ?? '', props.xLog, props.yLog, ...props.series.map((s) => `${s.label}/${s.unit ?? ''}/${s.axis ?? ''}`)].join('|');
    if (chart && (chart as unknown as { _shape?: string })._shape === shape) {
      chart.setData(data());
      return;
    }
    chart?.destroy();
    const ink = cssVar('--ink', '#222');
    const grid = cssVar('--line', '#ccc');
    const markers = () => props.markers ?? [];
    const opts: uPlotType.Options = {
      width: Math.max(280, holder.clientWidth),
      height: props.height ?? 280,
      scales: {
        x: { time: false, distr: props.xLog ? 3 : 1 },
        y: { distr: props.yLog ? 3 : 1 },
        y2: { distr: 1 },
      },
      axes: [
        { label: props.xLabel, stroke: ink, grid: { stroke: grid }, values: props.formatX ? (_u, vals) => vals.map((v) => (v == null ? '' : props.formatX!(v))) : undefined },
        { label: props.yLabel, stroke: ink, grid: { stroke: grid }, scale: 'y', values: props.formatY ? (_u, vals) => vals.map((v) => (v == null ? '' : props.formatY!(v))) : undefined },
        ...(props.y2Label ? [{ label: props.y2Label, stroke: ink, side: 1 as const, scale: 'y2', grid: { show: false } }] : []),
      ],
      series: [
        { label: props.xLabel, value: props.formatX ? (_u: uPlotType, v: number) => (v == null ? '—' : props.formatX!(v)) : undefined },
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
            for (const m of markers()) {
              const px = u.valToPos(m.x, 'x', true);
              if (!Number.isFinite(px)) continue;
              ctx.beginPath();
              ctx.moveTo(px, u.bbox.top);
              ctx.lineTo(px, u.bbox.top + u.bbox.height);
              ctx.stroke();
              ctx.fillText(m.label, px + 4, u.bbox.top + 14 * devicePixelRatio);
            }
            ctx.restore();
          },
        ],
      },
    };
    chart = new U(opts, data(), holder);
    (chart as unknown as { _shape?: string })._shape = shape;
  });

  onMount(() => {
    const ro = new ResizeObserver(() => chart?.setSize({ width: Math.max(280, holder.clientWidth), height: props.height ?? 280 }));
    ro.observe(holder);
    onCleanup(() => ro.disconnect());
  });
  onCleanup(() => chart?.destroy());

  return (
    <figure class="tw-plot" classList={{ 'tw-result--stale': !!props.stale }} id={props.id}>
      <div class="tw-plot-canvas" ref={holder} role="img" aria-label={props.caption} />
      <Show when={failed()}>
        <p class="tw-field-msg">{failed()}</p>
      </Show>
      <figcaption>{props.caption}</figcaption>
    </figure>
  );
}
