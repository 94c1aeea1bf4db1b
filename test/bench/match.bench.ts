/**
 * One full Match bench recompute, as the bench will run it on a keystroke:
 * the front end designed with every option (the coil wound at resonance, the
 * taps, divider, link and L-networks, each checked in its exact circuit), and
 * the return-loss curve of every option over 401 points for the plot; and
 * the parts alone. Budget: well under one animation frame (16 ms); if it is
 * not, the bench runs it in a Web Worker (DESIGN.md).
 * vitest bench reports the mean in ms; multiply by 1,000 for µs.
 */
import { bench, describe } from 'vitest';
import { analyzeMatchCircuit, sweepMatchCircuit } from '../../src/core/matchCircuit';
import { designMatch, type MatchOption } from '../../src/core/matching';
import { tappedCoilSections, mutualInductanceCoaxialLoops } from '../../src/core/mutual';

// Demo job (invented, the fictional Larkspur Lane workshop): a 7 MHz front end, 50 Ω antenna, 1 kΩ next stage, loaded Q 12.
const coil = { form: 'solenoid' as const, diameter: 20e-3, pitch: 1e-3, inductance: 4.7e-6, wire: { diameter: 0.5e-3, insulatedDiameter: 0.55e-3 } };
const spec = { coil, capacitance: 100e-12, sourceResistance: 50, loadResistance: 1000, loadedQ: 12 };
let k = 0;
/** Vary the capacitance a little so nothing is cached between runs. */
const next = () => ({ ...spec, capacitance: 100e-12 + (k++ % 100) * 1e-15 });
const built = designMatch(spec).options.filter((o): o is Extract<MatchOption, { available: true }> => o.available);

describe('match bench', () => {
  bench('full recompute: designMatch (5 options) and a 401-point return-loss curve for each', () => {
    const d = designMatch(next());
    for (const o of d.options) {
      if (!o.available) continue;
      const f = o.response.frequency;
      sweepMatchCircuit(o.circuit, { start: f - 4 * o.response.bandwidth, stop: f + 4 * o.response.bandwidth, points: 401, spacing: 'linear' });
    }
  });
  bench('designMatch alone (5 options, each in its exact circuit)', () => {
    designMatch(next());
  });
  bench('designMatch, taps only', () => {
    designMatch({ ...next(), options: ['tap'] });
  });
  bench('analyzeMatchCircuit of the two-tap front end (resonance, −3 dB edges, figures)', () => {
    analyzeMatchCircuit(built[0].circuit);
  });
  bench('sweepMatchCircuit, 401 points, two-tap front end', () => {
    sweepMatchCircuit(built[0].circuit, { start: 6.8e6, stop: 8e6, points: 401, spacing: 'linear' });
  });
  bench('tappedCoilSections (one tap, coil wound by designCoil)', () => {
    tappedCoilSections({ coil: { ...coil, inductance: undefined, turns: 18 }, tapTurns: 2 + (k++ % 10) * 0.5 });
  });
  bench('mutualInductanceCoaxialLoops', () => {
    mutualInductanceCoaxialLoops(10e-3, 10.5e-3, 1e-3 + (k++ % 100) * 1e-5);
  });
});
