/**
 * Cross-check of the match designs against ngspice. The core designs a tap,
 * a capacitive divider, a link or an L-network by the high-Q rules, writes
 * the circuit as built (coupled sections with the K element, the coil's loss
 * in its windings, taps at half turns) with its own exporter (matchNetlist),
 * and ngspice runs an AC sweep of it in batch mode. ngspice is the
 * independent solver: the core's formulas are not used to judge its data.
 *
 * At resonance — where the impedance the source looks into is real, nearest
 * the tank's design frequency — the simulated voltage step-up from the
 * source's node to the top must agree with the design's step-up within 3 %
 * ((L1 + L2 + 2M)/(L1 + M) for a tap, the divider's ratio), and the simulated
 * input resistance with the design's prediction within 5 % (the rest of the
 * tank seen back through the step-up). The loaded Q of a front end matched
 * with an antenna tap and a load tap (f over the −3 dB width of the load's
 * voltage) must agree with the high-Q estimate within 3 %, and with the
 * core's own exact circuit analysis to 1e-4.
 *
 * Coils, tanks and resistances are demo values (invented) of a fictional
 * workshop's 7 MHz and 14 MHz front ends.
 */
import { describe, expect, it } from 'vitest';
import { matchNetlist } from '../../src/core/matchNetlist';
import { designMatch, designTap, type MatchOption } from '../../src/core/matching';
import { type MatchCircuit } from '../../src/core/matchCircuit';
import { rel } from '../helpers/asserts';
import { parabolicExtreme, runNgspice, spiceFolder } from '../helpers/spice';
import { ngspiceAvailable, requireTool } from '../helpers/tools';

const dir = spiceFolder('tankwright-match-spice-');

/** Columns of the data file matchNetlist's control block writes. */
interface Simulated {
  f: number[];
  zin: Array<{ re: number; im: number }>;
  vtop: number[];
  vsrc: number[];
  vload: number[];
}

function simulate(name: string, circuit: MatchCircuit, start: number, stop: number, points = 4001): Simulated {
  const rows = runNgspice(dir, name, matchNetlist(circuit, { sweep: { start, stop, points, spacing: 'linear' }, dataFile: `${name}.data`, title: name }));
  return {
    f: rows.map((r) => r[0]),
    zin: rows.map((r) => ({ re: r[1], im: r[2] })),
    vtop: rows.map((r) => Math.hypot(r[3], r[4])),
    vsrc: rows.map((r) => Math.hypot(r[5], r[6])),
    vload: rows.map((r) => (r.length >= 9 ? Math.hypot(r[7], r[8]) : Number.NaN)),
  };
}

/** Where Im Z_in crosses zero nearest `f0`, by linear interpolation: Re Z_in and |V_top/V_src| there. */
function atZeroPhase(s: Simulated, f0: number): { frequency: number; inputResistance: number; stepUp: number } {
  let best = -1;
  for (let i = 0; i + 1 < s.f.length; i++) {
    if (s.zin[i].im * s.zin[i + 1].im <= 0 && (best < 0 || Math.abs(s.f[i] - f0) < Math.abs(s.f[best] - f0))) best = i;
  }
  expect(best, 'no zero-phase point in the sweep').toBeGreaterThanOrEqual(0);
  const t = s.zin[best].im / (s.zin[best].im - s.zin[best + 1].im);
  const lerp = (a: number, b: number) => a + t * (b - a);
  return {
    frequency: lerp(s.f[best], s.f[best + 1]),
    inputResistance: lerp(s.zin[best].re, s.zin[best + 1].re),
    stepUp: lerp(s.vtop[best] / s.vsrc[best], s.vtop[best + 1] / s.vsrc[best + 1]),
  };
}

/** Loaded Q of a sampled response: peak by a parabola, −3 dB points by linear interpolation. */
function loadedQOf(f: number[], v: number[]): number {
  const { index: i, x: fPeak, y: peak } = parabolicExtreme(f, v, 1);
  const level = peak / Math.SQRT2;
  let lo = i;
  while (lo > 0 && v[lo - 1] > level) lo--;
  let hi = i;
  while (hi < v.length - 1 && v[hi + 1] > level) hi++;
  expect(lo).toBeGreaterThan(0);
  expect(hi).toBeLessThan(v.length - 1);
  const cross = (k: number) => f[k] + ((level - v[k]) / (v[k + 1] - v[k])) * (f[k + 1] - f[k]);
  return fPeak / (cross(hi) - cross(lo - 1));
}

// Demo coils (invented): a 7 MHz antenna coil, a close-wound 14 MHz coil, a spaced 14 MHz coil.
const coil7 = { form: 'solenoid' as const, diameter: 20e-3, pitch: 1e-3, inductance: 4.7e-6, wire: { diameter: 0.5e-3, insulatedDiameter: 0.55e-3 } };
const coilClose = { form: 'solenoid' as const, diameter: 12e-3, closeWound: true, turns: 25, wire: { diameter: 0.4e-3, insulatedDiameter: 0.45e-3 } };
const coilSpaced = { form: 'solenoid' as const, diameter: 30e-3, pitch: 2e-3, turns: 8, wire: { diameter: 1e-3 } };

const run = requireTool('ngspice', ngspiceAvailable(), 'install ngspice (apt-get install ngspice) to run the SPICE cross-checks');
const figures: string[] = [];

describe.runIf(run)('match designs against ngspice', () => {
  const taps = [
    { name: 'tap-antenna-q12', input: { coil: coil7, capacitance: 100e-12, resistance: 50, loadedQ: 12 } },
    { name: 'tap-75ohm-match', input: { coil: coilClose, capacitance: 220e-12, resistance: 75, acrossResistance: 30e3 } },
    { name: 'tap-load-1k5', input: { coil: coilSpaced, capacitance: 47e-12, resistance: 1500, loadedQ: 25, acrossResistance: 20e3 } },
  ];
  for (const { name, input } of taps) {
    it(`${name}: step-up within 3 % and input resistance at the tap within 5 % at resonance`, () => {
      const d = designTap(input);
      const f0 = d.tank.frequency;
      const span = (4 * f0) / Math.min(d.tank.unloadedQ, 4 * d.estimate.loadedQ);
      const s = simulate(name, d.circuit, f0 - span, f0 + span);
      const m = atZeroPhase(s, f0);
      const up = rel(m.stepUp, d.tap.stepUp);
      const r = rel(m.inputResistance, d.estimate.inputResistance);
      figures.push(`${name}: tap ${d.tap.practicalTapTurns} of ${d.tank.coil?.turns} turns, step-up ${m.stepUp.toFixed(4)} (core ${d.tap.stepUp.toFixed(4)}, ${(100 * up).toFixed(2)} %), R_in ${m.inputResistance.toFixed(2)} Ω (core ${d.estimate.inputResistance.toFixed(2)} Ω, ${(100 * r).toFixed(2)} %)`);
      expect(up).toBeLessThan(0.03);
      expect(r).toBeLessThan(0.05);
      // the exact analysis of the same circuit agrees with ngspice to the sweep's resolution
      const peak = parabolicExtreme(s.f, s.vtop, 1);
      expect(rel(peak.x, d.response.frequency)).toBeLessThan(1e-5);
    });
  }

  const dividers = [
    { name: 'divider-50ohm-7m', spec: { coil: coil7, capacitance: 100e-12, sourceResistance: 50, options: ['capacitiveDivider' as const] } },
    { name: 'divider-300ohm-load', spec: { inductance: 10e-6, capacitance: 330e-12, unloadedQ: 120, sourceResistance: 300, loadResistance: 5e3, loadConnection: 'top' as const, options: ['capacitiveDivider' as const] } },
  ];
  for (const { name, spec } of dividers) {
    it(`${name}: step-up within 3 % and input resistance at the joint within 5 % at resonance`, () => {
      const d = designMatch(spec);
      const o = d.options[0] as Extract<MatchOption, { kind: 'capacitiveDivider' }>;
      expect(o.available).toBe(true);
      const f0 = d.tank.frequency;
      const span = (4 * f0) / o.estimate.loadedQ;
      const s = simulate(name, o.circuit, f0 - span, f0 + span);
      const m = atZeroPhase(s, f0);
      const up = rel(m.stepUp, o.divider.stepUp);
      const r = rel(m.inputResistance, o.estimate.inputResistance);
      figures.push(`${name}: C1 ${(o.divider.upperCapacitance * 1e12).toFixed(2)} pF, C2 ${(o.divider.lowerCapacitance * 1e12).toFixed(1)} pF (branch Q ${o.divider.branchQ.toFixed(2)}), step-up ${m.stepUp.toFixed(4)} (core ${o.divider.stepUp.toFixed(4)}, ${(100 * up).toFixed(2)} %), R_in ${m.inputResistance.toFixed(2)} Ω (core ${o.estimate.inputResistance.toFixed(2)} Ω, ${(100 * r).toFixed(2)} %)`);
      expect(up).toBeLessThan(0.03);
      expect(r).toBeLessThan(0.05);
    });
  }

  it('front end with an antenna tap and a load tap: loaded Q within 3 % of the estimate, and as the core\'s exact analysis', () => {
    const d = designMatch({ coil: coil7, capacitance: 100e-12, sourceResistance: 50, loadResistance: 1000, loadedQ: 12 });
    const o = d.options.find((x) => x.kind === 'tap') as Extract<MatchOption, { kind: 'tap' }>;
    expect(o.available).toBe(true);
    const f0 = d.tank.frequency;
    const span = (5 * f0) / o.estimate.loadedQ;
    const s = simulate('front-end-taps', o.circuit, f0 - span, f0 + span, 8001);
    const q = loadedQOf(s.f, s.vload);
    figures.push(`front end: antenna tap ${o.tap.practicalTapTurns}, load tap ${d.load?.tap?.practicalTapTurns} turns; loaded Q ngspice ${q.toFixed(4)}, core estimate ${o.estimate.loadedQ.toFixed(4)} (${(100 * rel(q, o.estimate.loadedQ)).toFixed(2)} %), core exact ${o.response.loadedQ.toFixed(4)} (${rel(q, o.response.loadedQ).toExponential(1)}); wanted 12`);
    expect(rel(q, o.estimate.loadedQ)).toBeLessThan(0.03);
    expect(rel(q, o.response.loadedQ)).toBeLessThan(1e-4);
  });

  it('every option of one front end: ngspice\'s loaded Q and input impedance at the peak as the core\'s exact analysis', () => {
    const d = designMatch({ coil: coil7, capacitance: 100e-12, sourceResistance: 50, loadResistance: 1000, loadedQ: 12 });
    for (const o of d.options) {
      expect(o.available, o.kind).toBe(true);
      if (!o.available) continue;
      const f0 = o.response.frequency;
      const span = 4 * o.response.bandwidth;
      const s = simulate(`option-${o.kind}`, o.circuit, f0 - span, f0 + span, 8001);
      const q = loadedQOf(s.f, s.vload);
      // Z_in at the core's loaded resonance, interpolated between ngspice's points
      const k = s.f.findIndex((x) => x > f0) - 1;
      const t = (f0 - s.f[k]) / (s.f[k + 1] - s.f[k]);
      const z = { re: s.zin[k].re + t * (s.zin[k + 1].re - s.zin[k].re), im: s.zin[k].im + t * (s.zin[k + 1].im - s.zin[k].im) };
      const dz = Math.hypot(z.re - o.response.inputImpedance.re, z.im - o.response.inputImpedance.im) / Math.hypot(o.response.inputImpedance.re, o.response.inputImpedance.im);
      figures.push(`${o.kind}: loaded Q ngspice ${q.toFixed(3)}, core exact ${o.response.loadedQ.toFixed(3)}, high-Q estimate ${o.estimate.loadedQ.toFixed(3)}; Z_in ngspice ${z.re.toFixed(2)}${z.im < 0 ? '−' : '+'}j${Math.abs(z.im).toFixed(2)} Ω (${dz.toExponential(1)} from the core)`);
      expect(rel(q, o.response.loadedQ), o.kind).toBeLessThan(1e-4);
      expect(dz, o.kind).toBeLessThan(1e-4);
    }
  });

  it('figures', () => {
    console.log(`ngspice agreement:\n  ${figures.join('\n  ')}`);
    expect(figures.length).toBeGreaterThan(6);
  });
});
