/**
 * Resonance bench: give any two of frequency, inductance and capacitance and
 * get the third, the reactance at resonance, √(L/C), and the E12 capacitors
 * either side of the capacitance with the frequency each gives.
 */
import { createMemo, createSignal, For, Show } from 'solid-js';
import {
  capacitanceForFrequency, characteristicImpedance, inductanceForFrequency,
  inductiveReactance, preferredNeighbours, resonantFrequency,
} from '../../src/core';
import { formatQuantity } from '../../src/quantity';
import { createComputation } from '../kit/compute';
import { Choice } from '../kit/Choice';
import { Formula } from '../kit/Formula';
import { NoteList } from '../kit/Note';
import { LinkNotices } from '../kit/LinkNotices';
import { QuantityField } from '../kit/QuantityField';
import { createQuantity } from '../kit/quantityState';
import { ResultRow } from '../kit/ResultRow';
import { useUrlState } from '../kit/useUrlState';
import type { UrlSchema } from '../kit/urlState';

export type Unknown = 'f' | 'L' | 'C';

export interface ResonanceFormulas {
  frequency: string;
  inductance: string;
  capacitance: string;
  reactance: string;
  impedance: string;
}

export const RESONANCE_SCHEMA: UrlSchema = {
  solve: { kind: 'choice', options: ['f', 'L', 'C'], label: 'solve for' },
  f: { kind: 'quantity', unit: 'Hz', label: 'frequency' },
  L: { kind: 'quantity', unit: 'H', label: 'inductance' },
  C: { kind: 'quantity', unit: 'F', label: 'capacitance' },
};

const NAMES: Record<Unknown, string> = { f: 'Frequency', L: 'Inductance', C: 'Capacitance' };
const FIELD_OF: Record<string, Unknown> = { frequency: 'f', inductance: 'L', capacitance: 'C' };

export default function ResonanceBench(props: { formulas: ResonanceFormulas }) {
  const [solve, setSolve] = createSignal<Unknown>('C');
  const f = createQuantity('Hz', '7.1 MHz');
  const L = createQuantity('H', '4.7 µH');
  const C = createQuantity('F', '100 pF');
  const inputs = { f, L, C } as const;

  const notices = useUrlState(
    RESONANCE_SCHEMA,
    () => ({ solve: solve(), f: f.text(), L: L.text(), C: C.text() }),
    (v) => {
      if (v.solve) setSolve(v.solve as Unknown);
      if (v.f !== undefined) f.setText(v.f);
      if (v.L !== undefined) L.setText(v.L);
      if (v.C !== undefined) C.setText(v.C);
    },
  );

  const known = (u: Unknown) => u !== solve();
  const inputsStale = () => (Object.keys(inputs) as Unknown[]).some((u) => known(u) && inputs[u].stale());

  const calc = createComputation(() => {
    const want = solve();
    const fv = f.value(), Lv = L.value(), Cv = C.value();
    if (inputsStale()) return undefined;
    let freq: number, ind: number, cap: number;
    if (want === 'f') {
      if (Lv === undefined || Cv === undefined) return undefined;
      ind = Lv; cap = Cv; freq = resonantFrequency(ind, cap);
    } else if (want === 'L') {
      if (fv === undefined || Cv === undefined) return undefined;
      freq = fv; cap = Cv; ind = inductanceForFrequency(freq, cap);
    } else {
      if (fv === undefined || Lv === undefined) return undefined;
      freq = fv; ind = Lv; cap = capacitanceForFrequency(freq, ind);
    }
    const e12 = preferredNeighbours(cap, 'E12');
    return {
      solvedFor: want,
      frequency: freq, inductance: ind, capacitance: cap,
      reactance: inductiveReactance(freq, ind),
      impedance: characteristicImpedance(ind, cap),
      neighbours: [...new Set([e12.below, e12.above])].map((c) => ({
        capacitance: c,
        frequency: resonantFrequency(ind, c),
        offset: resonantFrequency(ind, c) / freq - 1,
      })),
    };
  }, ['frequency', 'inductance', 'capacitance']);

  const fieldError = (u: Unknown) => {
    for (const [core, field] of Object.entries(FIELD_OF)) {
      if (field === u) {
        const msg = calc.fieldError(core);
        if (msg) return msg;
      }
    }
    return null;
  };
  const r = calc.result;
  const stale = () => calc.stale() || (r() !== undefined && r()!.solvedFor !== solve());
  const notes = createMemo(() => {
    const res = r();
    if (!res) return [];
    const list = [];
    if (res.frequency < 1e3 || res.frequency > 3e9) {
      list.push({ level: 'validity' as const, message: `At ${formatQuantity(res.frequency, 'Hz')} this is far outside receiver front-end practice; check the units you typed.` });
    }
    return list;
  });

  return (
    <div class="tw-bench" data-bench="resonance">
      <LinkNotices notices={notices()} />
      <div class="tw-bench-inputs">
        <Choice name="solve" legend="Solve for" value={solve()} onChoose={setSolve} options={(['f', 'L', 'C'] as Unknown[]).map((u) => [u, NAMES[u]] as const)} />
        <Show when={known('f')}>
          <QuantityField id="f" label="Frequency" symbol="f" q={f} hint="e.g. 7.1 MHz, 455k, 1.6e6" designError={fieldError('f')} />
        </Show>
        <Show when={known('L')}>
          <QuantityField id="L" label="Inductance" symbol="L" q={L} hint="e.g. 4.7 µH, 4u7, 220n" designError={fieldError('L')} />
        </Show>
        <Show when={known('C')}>
          <QuantityField id="C" label="Capacitance" symbol="C" q={C} hint="e.g. 100 pF, 4p7, 2*47p, 100p + 22p" designError={fieldError('C')} />
        </Show>
        <Show when={calc.generalError()}>
          <p class="tw-bench-error" role="alert">{calc.generalError()}</p>
        </Show>
      </div>
      <div class="tw-bench-results" aria-live="polite">
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
                    <td>{`${n.offset >= 0 ? '+' : '−'}${Math.abs(n.offset * 100).toFixed(2)} %`}</td>
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
