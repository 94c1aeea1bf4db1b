/**
 * Resonance bench: give any two of frequency, inductance and capacitance and
 * get the third, the reactance at resonance, √(L/C), and the E12 capacitors
 * either side of the capacitance with the frequency each gives.
 *
 * The bench is its field table (RESONANCE_FIELDS): the link, the fields in
 * use and where a core error is shown all come from it.
 */
import { createMemo, For, Show } from 'solid-js';
// Core modules imported one by one, not through the index: the page then ships only these.
import { DesignError } from '../../src/core/errors';
import type { DesignNote } from '../../src/core/notes';
import { preferredNeighbours } from '../../src/core/preferred';
import {
  capacitanceForFrequency, characteristicImpedance, inductanceForFrequency, inductiveReactance, resonantFrequency,
} from '../../src/core/resonance';
import { formatQuantity, formatQuantityCompact } from '../../src/quantity';
import { Field } from '../kit/Field';
import { defineFields, POSITIVE } from '../kit/fields';
import { formatShift } from '../kit/format';
import { Formula } from '../kit/Formula';
import { createWakingBench, readEarlyInput } from '../kit/Later';
import { LinkNotices } from '../kit/LinkNotices';
import { NoteList } from '../kit/Note';
import { ResultRow } from '../kit/ResultRow';
import { Summary, type SummaryItem } from '../kit/Summary';

export type Unknown = 'f' | 'L' | 'C';

export interface ResonanceFormulas {
  frequency: string;
  inductance: string;
  capacitance: string;
  reactance: string;
  impedance: string;
}

/** The bench's spec: what to solve for and the two values given (SI). */
export interface ResonanceSpec {
  solve: Unknown;
  frequency?: number;
  inductance?: number;
  capacitance?: number;
}

export const RESONANCE_FIELDS = defineFields([
  {
    kind: 'choice', key: 'solve', path: 'solve', label: 'Solve for', default: 'C',
    options: [['f', 'Frequency'], ['L', 'Inductance'], ['C', 'Capacitance']],
  },
  {
    kind: 'quantity', key: 'f', path: 'frequency', label: 'Frequency', symbol: 'f', unit: 'Hz', default: '7.1 MHz',
    allowed: POSITIVE, when: { solve: ['L', 'C'] }, hint: 'e.g. 7.1 MHz, 455k, 1.6e6',
  },
  {
    kind: 'quantity', key: 'L', path: 'inductance', label: 'Inductance', symbol: 'L', unit: 'H', default: '4.7 µH',
    allowed: POSITIVE, when: { solve: ['f', 'C'] }, hint: 'e.g. 4.7 µH, 4u7, 220n',
  },
  {
    kind: 'quantity', key: 'C', path: 'capacitance', label: 'Capacitance', symbol: 'C', unit: 'F', default: '100 pF',
    allowed: POSITIVE, when: { solve: ['f', 'L'] }, hint: 'e.g. 100 pF, 4p7, 2*47p, 100p + 22p',
  },
] as const);

const NAMES: Record<Unknown, string> = { f: 'Resonant frequency', L: 'Inductance to resonate', C: 'Capacitance to resonate' };

export interface ResonanceResult {
  solvedFor: Unknown;
  frequency: number;
  inductance: number;
  capacitance: number;
  reactance: number;
  impedance: number;
  /** E12 capacitors either side of the capacitance, with the frequency each gives with this L. */
  neighbours: { capacitance: number; frequency: number; offset: number }[];
}

function finite(value: number, field: string, what: string): number {
  if (!Number.isFinite(value) || value === 0) {
    throw new DesignError(field, `The ${what} for these values is beyond what can be computed; check the units of the values given.`);
  }
  return value;
}

/** Solves the spec with the core; undefined when a value it needs is missing. */
export function solveResonance(spec: ResonanceSpec): ResonanceResult | undefined {
  const { solve, frequency: fv, inductance: Lv, capacitance: Cv } = spec;
  let freq: number, ind: number, cap: number;
  if (solve === 'f') {
    if (Lv === undefined || Cv === undefined) return undefined;
    ind = Lv; cap = Cv; freq = finite(resonantFrequency(ind, cap), 'frequency', 'resonant frequency');
  } else if (solve === 'L') {
    if (fv === undefined || Cv === undefined) return undefined;
    freq = fv; cap = Cv; ind = finite(inductanceForFrequency(freq, cap), 'inductance', 'inductance');
  } else {
    if (fv === undefined || Lv === undefined) return undefined;
    freq = fv; ind = Lv; cap = finite(capacitanceForFrequency(freq, ind), 'capacitance', 'capacitance');
  }
  const e12 = preferredNeighbours(cap, 'E12');
  return {
    solvedFor: solve,
    frequency: freq, inductance: ind, capacitance: cap,
    reactance: inductiveReactance(freq, ind),
    impedance: characteristicImpedance(ind, cap),
    neighbours: [...new Set([e12.below, e12.above])].map((c) => {
      const fc = resonantFrequency(ind, c);
      return { capacitance: c, frequency: fc, offset: fc / freq - 1 };
    }),
  };
}

/** The answer first: the solved value, and for a capacitance the nearest E12 part. */
function summaryItems(r: ResonanceResult): SummaryItem[] {
  const q = formatQuantityCompact;
  const given = r.solvedFor === 'f'
    ? `from ${q(r.inductance, 'H')} and ${q(r.capacitance, 'F')}`
    : r.solvedFor === 'L'
      ? `with ${q(r.capacitance, 'F')} at ${q(r.frequency, 'Hz')}`
      : `with ${q(r.inductance, 'H')} at ${q(r.frequency, 'Hz')}`;
  const value = { f: r.frequency, L: r.inductance, C: r.capacitance }[r.solvedFor];
  const unit = { f: 'Hz', L: 'H', C: 'F' }[r.solvedFor];
  const items: SummaryItem[] = [{ id: 'sum-solved', label: NAMES[r.solvedFor], value, unit, detail: given, main: true }];
  if (r.solvedFor === 'C') {
    const best = [...r.neighbours].sort((a, b) => Math.abs(a.offset) - Math.abs(b.offset))[0];
    const shift = formatShift(best.offset);
    items.push({
      id: 'sum-e12', label: 'Nearest E12 capacitor', value: best.capacitance, unit: 'F', significant: 2,
      detail: `gives ${formatQuantity(best.frequency, 'Hz')}${shift ? ` (${shift})` : ''}`,
    });
  }
  return items;
}

export default function ResonanceBench(props: { formulas: ResonanceFormulas }) {
  const { bench, notices, awake } = createWakingBench<ResonanceSpec>(RESONANCE_FIELDS, readEarlyInput('resonance'));
  const calc = bench.compute((spec) => solveResonance(spec));
  const r = calc.result;
  const stale = () => calc.stale();
  const solve = () => bench.choice('solve') as Unknown;

  const notes = createMemo((): DesignNote[] => {
    const res = r();
    if (!res || (res.frequency >= 1e3 && res.frequency <= 3e9)) return [];
    return [{ level: 'validity', message: `At ${formatQuantity(res.frequency, 'Hz')} this is far outside receiver front-end practice; check the units you typed.` }];
  });

  return (
    <div class="tw-bench" data-bench="resonance" data-awake={awake() ? '' : undefined}>
      <LinkNotices notices={notices()} />
      <div class="tw-bench-inputs">
        <Field bench={bench} name="solve" />
        <Field bench={bench} name="f" />
        <Field bench={bench} name="L" />
        <Field bench={bench} name="C" />
        <Show when={bench.generalError()}>
          <p class="tw-bench-error" role="alert">{bench.generalError()}</p>
        </Show>
      </div>
      <div class="tw-bench-results" aria-live="polite">
        <Show when={r()}>
          <Summary items={summaryItems(r()!)} stale={stale()} />
        </Show>
        <Show when={solve() === 'f'}>
          <ResultRow id="out-f" label="Resonant frequency" symbol="f" value={r()?.frequency} unit="Hz" stale={stale()} primary>
            <Formula html={props.formulas.frequency} source="Thomson's formula; Terman 1943" validity="lossless lumped L and C, well below the coil's self-resonance" />
          </ResultRow>
        </Show>
        <Show when={solve() === 'L'}>
          <ResultRow id="out-L" label="Inductance" symbol="L" value={r()?.inductance} unit="H" stale={stale()} primary>
            <Formula html={props.formulas.inductance} source="Thomson's formula rearranged" validity="lossless lumped L and C" />
          </ResultRow>
        </Show>
        <Show when={solve() === 'C'}>
          <ResultRow id="out-C" label="Capacitance" symbol="C" value={r()?.capacitance} unit="F" stale={stale()} primary>
            <Formula html={props.formulas.capacitance} source="Thomson's formula rearranged" validity="total tank capacitance: include strays, trimmer and the coil's self-capacitance" />
          </ResultRow>
        </Show>
        <ResultRow id="out-x" label="Reactance of L and of C at resonance" symbol="X" value={r()?.reactance} unit="Ω" stale={stale()}>
          <Formula html={props.formulas.reactance} source="definition of reactance" />
        </ResultRow>
        <ResultRow id="out-z0" label="Characteristic impedance" symbol="Z₀" value={r()?.impedance} unit="Ω" stale={stale()}>
          <Formula html={props.formulas.impedance} source="equals X at resonance; a tank's dynamic resistance is Q·Z₀ (Terman 1943)" />
        </ResultRow>
        <section class="tw-table-block" aria-labelledby="e12-title">
          <h3 id="e12-title">Nearest E12 capacitors (IEC 60063)</h3>
          <table class="tw-table" classList={{ 'tw-result--stale': stale() }} id="out-e12">
            <thead>
              <tr><th scope="col">Capacitor</th><th scope="col">Frequency with this L</th><th scope="col">Shift</th></tr>
            </thead>
            <tbody>
              <For each={r()?.neighbours ?? []}>
                {(n) => (
                  <tr>
                    <td>{formatQuantity(n.capacitance, 'F', 2)}</td>
                    <td>{formatQuantity(n.frequency, 'Hz')}</td>
                    <td>{formatShift(n.offset) ?? 'within 0.1 %'}</td>
                  </tr>
                )}
              </For>
            </tbody>
          </table>
          <p class="tw-table-note">Make up the difference with a trimmer, or a small fixed capacitor in parallel.</p>
        </section>
        <NoteList notes={notes()} />
      </div>
    </div>
  );
}
