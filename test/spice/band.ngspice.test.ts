/**
 * Cross-check of the band algebra against ngspice: for designed bands, a
 * netlist of the whole tuned circuit (coil with a little loss, strays across
 * it, padder in series with the variable capacitor and its trimmer) is run
 * as an AC analysis with the variable capacitor at each end of its travel,
 * and the frequency where |Z| peaks must be the band's end that
 * bandCoverage gives. ngspice works from the netlist alone (an independent
 * solver): the core's formulas are not used to judge its data.
 *
 * The netlist is written here rather than by tankNetlist, because the tank
 * exporter has a single capacitor and this circuit has three.
 */
import { describe, expect, it } from 'vitest';
import { bandCoverage, designForBand, type BandCircuit, type BandDesignInput } from '../../src/core/band';
import { impedanceColumns, parabolicExtreme, runNgspice, spiceFolder } from '../helpers/spice';
import { ngspiceAvailable, requireTool } from '../helpers/tools';

const dir = spiceFolder('tankwright-band-spice-');

/** Coil Q used for the simulated coil: enough loss for a finite peak, too little to move it measurably. */
const COIL_Q = 1000;

/** 15 significant figures for the netlist. */
const num = (x: number) => x.toPrecision(15);

/**
 * Netlist of the tuned circuit with the variable capacitor at `cv`: a 1 A AC
 * drive into node hot, so V(hot) is the circuit's impedance.
 */
function netlist(c: BandCircuit, cv: number, f: number, name: string): string {
  const r = (2 * Math.PI * f * c.inductance) / COIL_Q;
  const span = (6 * f) / COIL_Q;
  const tune = c.padderCapacitance === undefined ? 'hot' : 'tune';
  const lines = [
    `* ${name}: band circuit, variable capacitor at ${num(cv)} F`,
    'Idrive 0 hot DC 0 AC 1',
    `Rcoil hot coil ${num(r)}`,
    `Lcoil coil 0 ${num(c.inductance)}`,
  ];
  if (c.strayCapacitance > 0) lines.push(`Cstray hot 0 ${num(c.strayCapacitance)}`);
  if (c.padderCapacitance !== undefined) lines.push(`Cpadder hot tune ${num(c.padderCapacitance)}`);
  lines.push(`Cvariable ${tune} 0 ${num(cv)}`);
  if ((c.trimmerCapacitance ?? 0) > 0) lines.push(`Ctrimmer ${tune} 0 ${num(c.trimmerCapacitance as number)}`);
  lines.push(
    `.ac lin 4001 ${num(f - span)} ${num(f + span)}`,
    '.control',
    'set wr_singlescale',
    'set wr_vecnames',
    'option numdgt=15',
    'run',
    'let zin = v(hot)',
    `wrdata ${name}.data zin`,
    'quit 0',
    '.endc',
    '.end',
  );
  return lines.join('\n') + '\n';
}

/** Frequency of the |Z| peak from ngspice, by a parabola through the best sample and its neighbours. */
function simulatedPeak(c: BandCircuit, cv: number, f: number, name: string): number {
  const { f: fs, z } = impedanceColumns(runNgspice(dir, name, netlist(c, cv, f, name)));
  return parabolicExtreme(fs, z).x;
}

// Demo bands (invented, the fictional Larkspur Lane workshop): band-spread with a padder, a broadcast band
// with a trimmer and a margin, the limit case with no trimmer, and the hand-derived padder example.
const pF = 1e-12;
const cases: Array<{ name: string; band: BandDesignInput; arrangement: 'trimmer' | 'padder' }> = [
  { name: 'spread-5m9-6m2', band: { lowFrequency: 5.9e6, highFrequency: 6.2e6, minCapacitance: 10 * pF, maxCapacitance: 365 * pF, strayCapacitance: 12 * pF, margin: 0 }, arrangement: 'padder' },
  { name: 'broadcast-530k-1m7', band: { lowFrequency: 530e3, highFrequency: 1700e3, minCapacitance: 10 * pF, maxCapacitance: 365 * pF, strayCapacitance: 12 * pF, margin: 0.02 }, arrangement: 'trimmer' },
  { name: 'limit-no-trimmer', band: { lowFrequency: 1e6, highFrequency: 1e6 * Math.sqrt(380 / 25), minCapacitance: 10 * pF, maxCapacitance: 365 * pF, strayCapacitance: 15 * pF, margin: 0 }, arrangement: 'trimmer' },
  { name: 'hand-padder-10m', band: { lowFrequency: 10e6 / Math.sqrt(10 / 7), highFrequency: 10e6, minCapacitance: 10 * pF, maxCapacitance: 100 * pF, strayCapacitance: 0, margin: 0 }, arrangement: 'padder' },
];

describe.runIf(requireTool('ngspice', ngspiceAvailable(), 'apt-get install -y ngspice'))('band coverage against ngspice', () => {
  for (const { name, band, arrangement } of cases) {
    it(`${name}: the |Z| peak at both ends of the capacitor's travel is the band's end`, () => {
      const d = designForBand(band);
      expect(d.arrangement).toBe(arrangement);
      const cover = bandCoverage(d);
      const low = simulatedPeak(d, d.maxCapacitance, cover.lowFrequency, `${name}-low`);
      const high = simulatedPeak(d, d.minCapacitance, cover.highFrequency, `${name}-high`);
      // ngspice AC analysis (independent solver). Tolerance 1e-9 (agreement seen: about 1e-11): the coil's
      // loss (Q = 1000) moves the |Z| peak of a coil with series resistance across a capacitor by about
      // 1/(4Q⁴) ≈ 2.5e-13 (peak at f0·√(√(1 + 2/Q²) − 1/Q²), see analyzeTank), the parabola on 4001 points
      // over ±6 f/Q finds the peak of the sampled curve to about 1e-11, and ngspice writes 15 digits.
      expect(Math.abs(low / cover.lowFrequency - 1)).toBeLessThan(1e-9);
      expect(Math.abs(high / cover.highFrequency - 1)).toBeLessThan(1e-9);
      // and those are the band asked for, widened by the margin
      const m = band.margin ?? 0;
      expect(Math.abs(low / (band.lowFrequency * (1 - m)) - 1)).toBeLessThan(1e-9);
      expect(Math.abs(high / (band.highFrequency * (1 + m)) - 1)).toBeLessThan(1e-9);
    });
  }
});
