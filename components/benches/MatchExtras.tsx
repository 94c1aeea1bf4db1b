/**
 * The Match bench's parts loaded when their place comes near the screen
 * (MatchCards.tsx): the return-loss plot with its sweeps (matchCurves.ts,
 * worked out when the browser is idle),
 * and the option to build, drawn on its coil (where the taps and the link go,
 * turns counted from the cold end; our own simple sketch) with its SPICE
 * netlist (the core's matchNetlist) to copy or download.
 */
import { createEffect, createMemo, createSignal, For, onCleanup, Show, untrack } from 'solid-js';
import { isDesignError } from '../../src/core/errors';
import type { MatchOptionKind } from '../../src/core/matching';
import { matchNetlist } from '../../src/core/matchNetlist';
import { formatQuantityCompact } from '../../src/quantity';
import type { BenchState } from '../kit/bench';
import { Plot } from '../kit/Plot';
import { OPTION_NAMES } from './matchFields';
import { returnLossCurves, type ReturnLossCurves } from './matchCurves';
import { mm, planAnswer, planOption, sayDb, sayTurns, turnsText, type BuiltOption } from './matchPlan';

const tickHz = (x: number | null) => (x == null || !Number.isFinite(x) ? '' : formatQuantityCompact(x, 'Hz', 4));

/** How long the typing must pause before the curves follow it, ms. */
const PAUSE = 250;

/**
 * A value that follows `source` once it has stood still for PAUSE ms (a
 * timer of our own: Solid's createDeferred would bring its scheduler into
 * the runtime every page loads). Starts at the source's value.
 */
function afterPause<T>(source: () => T, same: (a: T, b: T) => boolean): () => T {
  const [value, setValue] = createSignal(source());
  createEffect(() => {
    const next = source();
    if (same(next, untrack(value))) return;
    const timer = setTimeout(() => setValue(() => next), PAUSE);
    onCleanup(() => clearTimeout(timer));
  });
  return value;
}

/**
 * Return loss at the antenna against frequency: one curve per option, and the
 * antenna straight across (dashed). The sweeps (every option over 201 points)
 * are the heaviest work on the bench, so the curves follow the typing after a
 * pause (afterPause), marked stale until they have;
 * a value the core refuses leaves the last curves, stale (its field says why).
 */
export function ReturnLossPlot(props: { bench: BenchState }) {
  const values = afterPause(() => ({ raw: props.bench.spec(), choices: props.bench.choices() }), (a, b) => a.raw === b.raw && a.choices === b.choices);
  const run = createMemo<{ curves?: ReturnLossCurves; ok: boolean }>((last) => {
    const { raw, choices } = values();
    if (!raw) return { curves: last?.curves, ok: false };
    try {
      return { curves: returnLossCurves(raw, choices), ok: true };
    } catch (e) {
      if (!isDesignError(e)) console.error(e);
      return { curves: last?.curves, ok: false };
    }
  });
  const c = () => run().curves;
  const stale = () => !run().ok || values().raw !== props.bench.spec();
  return (
    <Show when={c()}>
      <Plot
        id="plot-rl"
        caption="Return loss at the antenna’s port against frequency, one curve per option as built, and the antenna and load straight across the top (dashed). Higher is a better match: 10 dB reflects a tenth of the power, 20 dB a hundredth."
        x={c()!.frequencies}
        xLabel="Frequency"
        formatX={tickHz}
        series={c()!.curves.map((k, i) => ({
          label: k.kind === 'direct' ? 'No match' : OPTION_NAMES[k.kind],
          values: k.returnLoss,
          unit: 'dB',
          dash: k.kind === 'direct' || i >= 4,
          format: sayDb,
        }))}
        yLabel="Return loss (dB)"
        markers={[{ x: c()!.frequency, label: 'f₀' }]}
        stale={stale()}
      />
    </Show>
  );
}

/** Offers text as a file made in the browser: a Blob URL for a link, revoked when it changes. */
function createFileUrl(text: () => string | undefined, type: string): () => string | undefined {
  const [url, setUrl] = createSignal<string>();
  createEffect(() => {
    const t = text();
    if (t === undefined) return setUrl(undefined);
    const u = URL.createObjectURL(new Blob([t], { type }));
    setUrl(u);
    onCleanup(() => URL.revokeObjectURL(u));
  });
  return url;
}

/** The option to build (the one chosen, or the recommended one), and the coil it goes on. */
function chosen(bench: BenchState) {
  return bench.compute((raw, choices) => {
    const plan = planAnswer(raw, choices);
    const kind = (choices.build && choices.build !== 'best' ? choices.build : plan.recommended?.kind) as MatchOptionKind | undefined;
    const option = kind === undefined ? undefined : plan.tried[kind] ?? planOption(raw, choices, kind);
    return { plan, kind, option };
  });
}

export function BuildSection(props: { bench: BenchState }) {
  const calc = chosen(props.bench);
  const run = () => calc.result();
  const option = createMemo((): BuiltOption | { reason: string } | undefined => {
    const r = run();
    if (!r || r.kind === undefined) return undefined;
    if (r.option) return r.option.available ? r.option : { reason: r.option.reason };
    return undefined;
  });
  const built = () => { const o = option(); return o && 'circuit' in o ? o : undefined; };
  const netlist = createMemo(() => {
    const o = built();
    return o ? matchNetlist(o.circuit, { title: `Tankwright match: ${OPTION_NAMES[o.kind]}`, dataFile: 'tankwright-match.data' }) : undefined;
  });
  const url = createFileUrl(netlist, 'text/plain');
  const [status, setStatus] = createSignal('');
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(netlist() ?? '');
      setStatus('Copied');
    } catch {
      setStatus('Copy blocked by the browser: select the text instead');
    }
    setTimeout(() => setStatus(''), 2500);
  };
  return (
    <div class="match-build-body" classList={{ 'tw-result--stale': calc.stale() }}>
      <Show when={run()?.kind !== undefined} fallback={<p class="tw-table-note">No option can be built for these values.</p>}>
        <Show when={built()} fallback={<p class="tw-table-note" id="build-why">{option() && 'reason' in option()! ? `Not available: ${(option() as { reason: string }).reason}` : 'Working it out…'}</p>}>
          <CoilSketch plan={run()!.plan} option={built()!} />
          <section class="match-netlist-block" aria-labelledby="netlist-title">
            <h3 id="netlist-title">SPICE netlist: {OPTION_NAMES[built()!.kind]}</h3>
            <p class="tw-table-note">
              Coupled windings as inductors with K elements; a 1 V AC source behind the antenna’s resistance. Run it with <code>ngspice -b</code>:
              it writes the frequency, the input impedance and the voltages at the top, the antenna and the load to <code>tankwright-match.data</code>.
            </p>
            <div class="match-netlist-actions">
              <button type="button" class="tw-copy" id="copy-netlist" onClick={copy}>Copy netlist</button>
              <Show when={url()}>
                <a class="tw-copy" id="dl-netlist" href={url()} download={`tankwright-match-${built()!.kind}.cir`}>Download (.cir)</a>
              </Show>
              <span class="tw-copy-status" role="status" aria-live="polite">{status()}</span>
            </div>
            <pre class="match-netlist" id="netlist" tabindex="0" aria-label="SPICE netlist">{netlist()}</pre>
          </section>
        </Show>
      </Show>
    </div>
  );
}

/** A mark on the coil: turns from the cold end, what it is, its label. */
interface Mark {
  turns: number;
  name: string;
  text: string;
}

const W = 420;
const X0 = 50;
const X1 = 378;
const TOP = 64;
const BOTTOM = 100;

/**
 * The coil drawn from the side: the former, one stroke per turn (every n-th
 * for a long coil), the cold end on the left (to ground), the top on the
 * right; the antenna's and the load's taps at their turns, a link over the
 * cold end when it is the option. Our own simple sketch, not to scale across.
 */
function CoilSketch(props: { plan: ReturnType<typeof planAnswer>; option: BuiltOption }) {
  const coil = () => props.plan.design.tank.coil;
  const turns = () => coil()?.turns ?? 0;
  const x = (n: number) => X0 + ((X1 - X0) * n) / turns();
  const step = () => Math.max(1, Math.ceil(turns() / 120));
  const strokes = createMemo(() => {
    const out: number[] = [];
    for (let i = 0; i < turns(); i += step()) out.push(i);
    return out;
  });
  const marks = createMemo((): Mark[] => {
    const m: Mark[] = [];
    if (props.option.kind === 'tap') m.push({ turns: props.option.tap.practicalTapTurns, name: 'antenna', text: `antenna tap, ${turnsText(props.option.tap.practicalTapTurns)}` });
    const lt = props.plan.design.load?.tap;
    if (lt) m.push({ turns: lt.practicalTapTurns, name: 'load', text: `load tap, ${turnsText(lt.practicalTapTurns)}` });
    return m.sort((a, b) => a.turns - b.turns);
  });
  /** The link's turns in coil turns from the cold end (its axial position over the coil's pitch). */
  const linkTurns = createMemo(() => {
    if (props.option.kind !== 'link' || !coil()?.pitch) return [];
    const l = props.option.link;
    return Array.from({ length: Math.ceil(l.practicalTurns) }, (_, j) => (l.position + j * l.pitch) / (coil()!.pitch as number));
  });
  const ticks = () => {
    const n = turns();
    const every = n <= 12 ? 2 : n <= 30 ? 5 : n <= 80 ? 10 : 20;
    const out: number[] = [];
    for (let t = 0; t <= n; t += every) out.push(t);
    return out;
  };
  /**
   * Where the i-th tap's label sits below the coil (taps counted from the cold end): the tap nearest the top
   * on the first row, each one nearer the cold end a row lower, so no lead crosses a label; a row lower
   * still when a link's label takes the first.
   */
  const below = (i: number) => BOTTOM + (linkTurns().length > 0 ? 44 : 24) + 20 * (marks().length - 1 - i);
  const slant = () => Math.min(8, (X1 - X0) / turns() / 2);
  const describe = () => [
    `${sayTurns(turns())} turns${coil()?.windingLength === undefined ? '' : `, ${mm(coil()!.windingLength as number)} long`}; the cold end (to ground) on the left, the top of the tank on the right.`,
    ...marks().map((k) => `${k.text[0].toUpperCase()}${k.text.slice(1)} from the cold end.`),
    ...(props.option.kind === 'link' ? [`Link: ${turnsText(props.option.link.practicalTurns)}, ${mm(props.option.link.diameter)} across, ${props.option.link.position === 0 ? 'over the cold-end turn' : `${mm(props.option.link.position)} from the cold-end turn`}.`] : []),
    ...(props.option.kind === 'capacitiveDivider' || props.option.kind === 'lowPassL' || props.option.kind === 'highPassL' ? ['The antenna does not connect to the coil: it goes through the parts listed above.'] : []),
  ];
  return (
    <Show when={coil()?.turns !== undefined && coil()?.form === 'solenoid'} fallback={<p class="tw-table-note" id="sketch-none">No drawing: the coil is given by its inductance only, so nothing is tapped or linked on it.</p>}>
      <figure class="match-sketch" id="coil-sketch">
        <svg viewBox={`0 0 ${W} 170`} role="img" aria-labelledby="sketch-title sketch-desc">
          <title id="sketch-title">Where to tap the coil: {OPTION_NAMES[props.option.kind]}</title>
          <desc id="sketch-desc">{describe().join(' ')}</desc>
          <rect class="sk-former" x={X0 - 6} y={TOP + 4} width={X1 - X0 + 12} height={BOTTOM - TOP - 8} rx="3" />
          <For each={strokes()}>{(i) => <line class="sk-turn" x1={x(i)} y1={TOP} x2={x(i) + slant()} y2={BOTTOM} />}</For>
          <For each={ticks()}>{(t) => <text class="sk-tick" x={x(t)} y={TOP - 8} text-anchor="middle">{t}</text>}</For>
          {/* cold end to ground, top to the tank capacitor */}
          <line class="sk-lead" x1={X0} y1={BOTTOM} x2={X0} y2={BOTTOM + 30} />
          <line class="sk-lead" x1={X0 - 10} y1={BOTTOM + 30} x2={X0 + 10} y2={BOTTOM + 30} />
          <line class="sk-lead" x1={X0 - 6} y1={BOTTOM + 35} x2={X0 + 6} y2={BOTTOM + 35} />
          <line class="sk-lead" x1={X0 - 2} y1={BOTTOM + 40} x2={X0 + 2} y2={BOTTOM + 40} />
          <text class="sk-label" x={X0 - 8} y={TOP + 22} text-anchor="end">cold</text>
          <text class="sk-label" x={X1 + 12} y={TOP + 22}>top</text>
          <text class="sk-note" x={X0} y={TOP - 24} text-anchor="middle">turns</text>
          <For each={linkTurns()}>
            {(n) => <ellipse class="sk-link" cx={x(n) + slant() / 2} cy={(TOP + BOTTOM) / 2} rx={Math.max(3, slant())} ry={(BOTTOM - TOP) / 2 + 8} />}
          </For>
          <Show when={linkTurns().length > 0}>
            <text class="sk-label sk-link-label" x={Math.max(x(linkTurns()[0]), X0 + 16)} y={BOTTOM + 24}>link, {turnsText((props.option as Extract<BuiltOption, { kind: 'link' }>).link.practicalTurns)}</text>
          </Show>
          <For each={marks()}>
            {(k, i) => (
              <g class={`sk-tap sk-tap--${k.name}`}>
                <circle cx={x(k.turns) + slant() / 2} cy={BOTTOM} r="3.5" />
                <line x1={x(k.turns) + slant() / 2} y1={BOTTOM} x2={x(k.turns) + slant() / 2} y2={below(i())} />
                <text x={x(k.turns) + slant() / 2 + (x(k.turns) > W - 150 ? -4 : 4)} y={below(i())} text-anchor={x(k.turns) > W - 150 ? 'end' : 'start'}>{k.text}</text>
              </g>
            )}
          </For>
        </svg>
        <figcaption>
          <For each={describe()}>{(line) => <span class="match-sketch-line">{line}</span>}</For>
        </figcaption>
      </figure>
    </Show>
  );
}
