/**
 * Cross-check of the tracking core against ngspice: the oscillator tank that
 * designTracking returns (coil, gang section ∥ trimmer, padder in series,
 * stray across the coil) is written here as a netlist of separate elements,
 * and ngspice's AC analysis finds its resonance (the peak of |Z| seen by a
 * 1 A current source) with the gang at both ends. It must equal the
 * oscillator range the core reports, and the signal tank's resonance must
 * equal the band's ends when the gang is set where the core's curve says.
 *
 * The core's netlist exporter (tankNetlist) writes one lumped capacitance,
 * not the trimmer-padder network, so the network is written out here; the
 * core's formulas are not used to judge the data.
 * Reference: ngspice AC analysis (independent solver).
 */
import { describe, expect, it } from 'vitest';
import { designTracking, type TrackingCircuit, type TrackingInput } from '../../src/core/tracking';
import { parabolicExtreme, runNgspice, spiceFolder } from '../helpers/spice';
import { ngspiceAvailable, requireTool } from '../helpers/tools';

const dir = spiceFolder('tankwright-tracking-');

/**
 * Netlist of one tuned circuit with the gang at `gang` farads: L and the stray
 * from `hot` to ground, padder from `hot` to `mid`, gang and trimmer from
 * `mid` to ground; a 10 MΩ resistor across (Q ≈ 10⁴, so the peak of |Z| sits
 * within about 1e-8 of the lossless resonance) and a 1 A AC current source.
 */
function netlist(name: string, k: TrackingCircuit, gang: number, start: number, stop: number): string {
  const v = (x: number) => x.toExponential(15);
  const lines = [
    `* ${name}: tuned circuit with gang, trimmer, padder and stray`,
    'I1 0 hot AC 1',
    `L1 hot 0 ${v(k.inductance)}`,
    'R1 hot 0 1e7',
    `CS hot 0 ${v(k.strayCapacitance)}`,
  ];
  if (k.padderCapacitance === undefined) lines.push('RP hot mid 1e-6');
  else lines.push(`CP hot mid ${v(k.padderCapacitance)}`);
  lines.push(`CG mid 0 ${v(gang)}`);
  if (k.trimmerCapacitance) lines.push(`CT mid 0 ${v(k.trimmerCapacitance)}`);
  lines.push(
    `.ac lin 4001 ${v(start)} ${v(stop)}`,
    '.control',
    'set wr_singlescale',
    'option numdgt=15',
    'run',
    `wrdata ${name}.data mag(v(hot))`,
    'quit',
    '.endc',
    '.end',
  );
  return `${lines.join('\n')}\n`;
}

/** Frequency of the |Z| peak from an ngspice AC sweep around `guess` (±1 %), by a parabola through the best samples. */
function simulatedResonance(name: string, k: TrackingCircuit, gang: number, guess: number): number {
  const rows = runNgspice(dir, name, netlist(name, k, gang, guess * 0.99, guess * 1.01));
  return parabolicExtreme(rows.map((r) => r[0]), rows.map((r) => r[1])).x;
}

// Demo sets (invented values, the fictional Harbour Lane workshop), as in test/core/tracking.test.ts.
const cases: Array<{ name: string; input: TrackingInput }> = [
  {
    name: 'mw-above',
    input: { lowFrequency: 530e3, highFrequency: 1600e3, intermediateFrequency: 455e3, signal: { inductance: 230e-6, minCapacitance: 10e-12, maxCapacitance: 365e-12, strayCapacitance: 12e-12, trimmerCapacitance: 20e-12 } },
  },
  {
    name: 'sw-below',
    input: { lowFrequency: 5.9e6, highFrequency: 6.2e6, intermediateFrequency: 455e3, oscillatorSide: 'below', signal: { inductance: 6.1e-6, minCapacitance: 10e-12, maxCapacitance: 365e-12, strayCapacitance: 10e-12, trimmerCapacitance: 60e-12, padderCapacitance: 150e-12 } },
  },
];

describe.runIf(requireTool('ngspice', ngspiceAvailable(), 'apt-get install -y ngspice'))('tracking against ngspice', () => {
  for (const { name, input } of cases) {
    it(`${name}: the oscillator tank resonates where the core says at both gang ends`, () => {
      const d = designTracking(input);
      const osc = d.oscillator;
      const low = simulatedResonance(`${name}-osc-max`, osc, osc.maxCapacitance, d.oscillatorLowFrequency);
      const high = simulatedResonance(`${name}-osc-min`, osc, osc.minCapacitance, d.oscillatorHighFrequency);
      // ngspice AC analysis (independent solver): within 1e-7 (agreement seen: 1.2e-11)
      expect(Math.abs(low / d.oscillatorLowFrequency - 1)).toBeLessThan(1e-7);
      expect(Math.abs(high / d.oscillatorHighFrequency - 1)).toBeLessThan(1e-7);
    });

    it(`${name}: at the curve's gang setting for each band end, ngspice tunes signal and oscillator tanks one IF apart (plus the reported error)`, () => {
      const d = designTracking({ ...input, points: 3 });
      const side = input.oscillatorSide === 'below' ? -1 : 1;
      for (const i of [0, 2]) {
        const f = d.curve.signalFrequency[i];
        const gang = d.curve.capacitance[i];
        const signal = simulatedResonance(`${name}-sig-${i}`, input.signal, gang, f);
        const oscillator = simulatedResonance(`${name}-osc-${i}`, d.oscillator, gang, d.curve.oscillatorFrequency[i]);
        expect(Math.abs(signal / f - 1)).toBeLessThan(1e-7);
        // the oscillator's distance from signal ± IF is the tracking error the core reports
        expect(Math.abs(oscillator - (f + side * input.intermediateFrequency) - d.curve.error[i])).toBeLessThan(1e-7 * oscillator);
      }
    });
  }
});
