/**
 * Matching (src/core/matching.ts and the modules it combines: matchTank,
 * matchNetworks, matchLink, matchCircuit, matchNetlist). Reference checks:
 * - every circuit the core builds is solved again here with mathjs's complex
 *   matrices (an independent general-purpose library: its own inverse and LU
 *   solve), so the core's nodal analysis is judged from outside;
 * - the capacitive divider and the L-network against their circuits written
 *   out with mathjs;
 * - the link's mutual inductance against the loop-by-loop sum of
 *   `mutualInductanceCoaxialWindings`, and its reflected resistance against
 *   the coupled-circuit formula;
 * - the published Q rules: 1/Q_L = 1/Q_u + 1/Q_e and the insertion-loss rule
 *   −20 log10(1 − Q_L/Q_u) for equal terminations (Pozar; qRules);
 * - a worked example derived by hand (marked), the issue's own figure for a
 *   50 Ω antenna straight across a 4.7 µH tank.
 * Coils and tanks are demo values (invented), a fictional workshop's 7 MHz
 * front end.
 */
import fc from 'fast-check';
import { abs, add, complex, divide, inv, lusolve, matrix, multiply, subtract, zeros, type Complex, type Matrix } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { designCoil } from '../../src/core/coil';
import { matchCircuitAt, sweepMatchCircuit, type MatchCircuit } from '../../src/core/matchCircuit';
import { matchNetlist } from '../../src/core/matchNetlist';
import { capacitiveDivider, lNetwork } from '../../src/core/matchNetworks';
import { designLink } from '../../src/core/matchLink';
import { resolveMatchTank } from '../../src/core/matchTank';
import { designMatch, designTap, type MatchOption } from '../../src/core/matching';
import { mutualInductanceCoaxialWindings, tappedCoilSections } from '../../src/core/mutual';
import { insertionLoss } from '../../src/core/qRules';
import { fieldOf, rel } from '../helpers/asserts';

const TWO_PI = 2 * Math.PI;
const coil = { form: 'solenoid' as const, diameter: 20e-3, pitch: 1e-3, inductance: 4.7e-6, wire: { diameter: 0.5e-3, insulatedDiameter: 0.55e-3 } };
const frontEnd = { coil, capacitance: 100e-12, sourceResistance: 50, loadResistance: 1000, loadedQ: 12 };

const c = (re: number, im = 0) => complex(re, im);
const par = (a: Complex, b: Complex) => divide(multiply(a, b), add(a, b)) as Complex;

/**
 * The circuit solved with mathjs: nodal admittance matrix (coupled windings
 * through the inverse of their impedance matrix R + jωL, inverted by mathjs),
 * a 1 V EMF behind R_s as its Norton equivalent, LU solve by mathjs.
 * Returns Z_in at the source and the transducer gain to the load.
 */
function mathjsSolve(circuit: MatchCircuit, f: number): { zin: Complex; gain?: number } {
  const w = TWO_PI * f;
  const names = new Set<string>();
  const nodesOf = (a: string, b: string) => [a, b].forEach((n) => n !== '0' && names.add(n));
  for (const p of circuit.parts) {
    if (p.kind === 'windings') p.windings.forEach((x) => nodesOf(x.from, x.to));
    else nodesOf(p.from, p.to);
  }
  const list = [...names];
  const n = list.length;
  const at = (s: string) => list.indexOf(s);
  const y = zeros(n, n) as Matrix;
  const put = (i: number, j: number, v: Complex) => { if (i >= 0 && j >= 0) y.set([i, j], add(y.get([i, j]), v)); };
  const between = (a: string, b: string, v: Complex) => {
    const i = at(a); const j = at(b);
    put(i, i, v); put(j, j, v); put(i, j, multiply(-1, v) as Complex); put(j, i, multiply(-1, v) as Complex);
  };
  for (const p of circuit.parts) {
    if (p.kind === 'resistor') between(p.from, p.to, c(1 / p.resistance));
    else if (p.kind === 'capacitor') between(p.from, p.to, c(0, w * p.capacitance));
    else if (p.kind === 'inductor') between(p.from, p.to, divide(1, c(p.resistance ?? 0, w * p.inductance)) as Complex);
    else {
      const m = p.windings.length;
      const z = zeros(m, m) as Matrix;
      for (let i = 0; i < m; i++) {
        for (let j = 0; j < m; j++) {
          const mij = p.coupling[i][j] * Math.sqrt(p.windings[i].inductance * p.windings[j].inductance);
          z.set([i, j], c(i === j ? p.windings[i].resistance : 0, w * mij));
        }
      }
      const yb = inv(z) as Matrix;
      for (let i = 0; i < m; i++) {
        for (let j = 0; j < m; j++) {
          const v = yb.get([i, j]) as Complex;
          const wi = p.windings[i]; const wj = p.windings[j];
          put(at(wi.from), at(wj.from), v); put(at(wi.to), at(wj.to), v);
          put(at(wi.from), at(wj.to), multiply(-1, v) as Complex); put(at(wi.to), at(wj.from), multiply(-1, v) as Complex);
        }
      }
    }
  }
  const s = at(circuit.sourceNode);
  put(s, s, c(1 / circuit.sourceResistance));
  if (circuit.loadNode) put(at(circuit.loadNode), at(circuit.loadNode), c(1 / (circuit.loadResistance as number)));
  const b = zeros(n, 1) as Matrix;
  b.set([s, 0], c(1 / circuit.sourceResistance));
  const v = lusolve(y, b) as Matrix;
  const vs = v.get([s, 0]) as Complex;
  const current = divide(subtract(c(1), vs), circuit.sourceResistance) as Complex;
  const out: { zin: Complex; gain?: number } = { zin: divide(vs, current) as Complex };
  if (circuit.loadNode) {
    const vl = abs(v.get([at(circuit.loadNode), 0]) as Complex) as unknown as number;
    out.gain = (4 * circuit.sourceResistance * vl * vl) / (circuit.loadResistance as number);
  }
  return out;
}

const cRel = (a: { re: number; im: number }, b: Complex) => Math.hypot(a.re - b.re, a.im - b.im) / Math.hypot(b.re, b.im);

describe('the exact circuit', () => {
  const design = designMatch(frontEnd);

  it('every option\'s circuit, solved again with mathjs, gives the same input impedance and transducer loss', () => {
    for (const o of design.options) {
      expect(o.available, o.kind).toBe(true);
      if (!o.available) continue;
      for (const f of [o.response.frequency, design.tank.frequency * 0.97, design.tank.frequency * 1.05]) {
        const core = matchCircuitAt(o.circuit, f);
        const ref = mathjsSolve(o.circuit, f);
        expect(cRel(core.inputImpedance, ref.zin), o.kind).toBeLessThan(1e-9);
        expect(Math.abs((core.transducerLoss as number) + 10 * Math.log10(ref.gain as number)), o.kind).toBeLessThan(1e-9);
      }
    }
  });

  it('the loaded resonance is the peak of the transducer gain, and its −3 dB edges are half power', () => {
    // definition of the −3 dB bandwidth; gains from mathjs
    const o = design.options[0] as Extract<MatchOption, { available: true }>;
    const g = (f: number) => mathjsSolve(o.circuit, f).gain as number;
    const peak = g(o.response.frequency);
    expect(g(o.response.frequency * (1 + 1e-4))).toBeLessThan(peak);
    expect(g(o.response.frequency * (1 - 1e-4))).toBeLessThan(peak);
    expect(rel(g(o.response.lowerFrequency), peak / 2)).toBeLessThan(1e-6);
    expect(rel(g(o.response.upperFrequency), peak / 2)).toBeLessThan(1e-6);
    expect(rel(o.response.loadedQ, o.response.frequency / (o.response.upperFrequency - o.response.lowerFrequency))).toBeLessThan(1e-9);
  });

  it('the sweep for the return-loss plot agrees with the point figures', () => {
    const o = design.options[0] as Extract<MatchOption, { available: true }>;
    const f = o.response.frequency;
    const sw = sweepMatchCircuit(o.circuit, { start: f * 0.9, stop: f, points: 11, spacing: 'linear' });
    expect(sw.frequency.length).toBe(11);
    expect(sw.returnLoss[10]).toBeCloseTo(o.response.returnLoss, 9);
    expect(sw.transducerLoss?.[10]).toBeCloseTo(o.response.transducerLoss as number, 9);
    expect(sweepMatchCircuit(o.circuit).frequency.length).toBe(401);
  });

  it('the netlist names every coupled pair with the K element and its coefficient', () => {
    const o = design.options.find((x) => x.kind === 'link') as Extract<MatchOption, { kind: 'link' }>;
    const text = matchNetlist(o.circuit, { sweep: { start: 6e6, stop: 8e6, points: 11 } });
    const group = o.circuit.parts.find((p) => p.kind === 'windings');
    expect(group?.kind).toBe('windings');
    const m = group?.kind === 'windings' ? group.windings.length : 0;
    expect(text.match(/^K\S+ L\S+ L\S+ \S+$/gm)?.length).toBe((m * (m - 1)) / 2);
    expect(text).toMatch(/^Rsource emf lk /m);
    expect(text).toMatch(/^wrdata match-ac\.data zin vtop vsrc vload$/m);
  });

  it('refuses a circuit that cannot exist, at its field', () => {
    const o = design.options[0] as Extract<MatchOption, { available: true }>;
    const group = o.circuit.parts[0];
    if (group.kind !== 'windings') throw new Error('expected windings first');
    // three windings each coupled at 0.99 to the first but not to each other: no real windings do that
    const k = (i: number, j: number) => (i === j ? 1 : i === 0 || j === 0 ? 0.99 : 0);
    const tight = { ...o.circuit, parts: [{ ...group, coupling: group.coupling.map((row, i) => row.map((_, j) => k(i, j))) }, ...o.circuit.parts.slice(1)] };
    expect(fieldOf(() => matchCircuitAt(tight, 7e6))).toBe('parts');
    expect(fieldOf(() => matchCircuitAt({ ...o.circuit, sourceNode: 'Top' }, 7e6))).toBe('sourceNode');
    expect(fieldOf(() => matchCircuitAt({ ...o.circuit, sourceNode: 'nowhere' }, 7e6))).toBe('sourceNode');
  });
});

describe('capacitiveDivider', () => {
  const f = 7e6;
  const w = TWO_PI * f;
  /** Admittance across the top: C1 in series with (R_s ∥ C2), written out with mathjs. */
  const across = (c1: number, c2: number, rs: number) => divide(1, add(c(0, -1 / (w * c1)), par(c(rs), c(0, -1 / (w * c2))))) as Complex;

  it('the exact values present R′ in parallel with the tank capacitance (circuit written out with mathjs)', () => {
    for (const [rs, rp, cap] of [[50, 5.8e3, 100e-12], [50, 40e3, 100e-12], [300, 6e3, 330e-12], [2e3, 50e3, 100e-12]]) {
      const d = capacitiveDivider({ capacitance: cap, frequency: f, sourceResistance: rs, presentedResistance: rp });
      const y = across(d.upperCapacitance, d.lowerCapacitance, rs);
      expect(rel(y.re, 1 / rp)).toBeLessThan(1e-9);
      expect(rel(y.im, w * cap)).toBeLessThan(1e-9);
      // what the usual values really present, written out the same way
      const ya = across(d.approximate.upperCapacitance, d.approximate.lowerCapacitance, rs);
      expect(rel(d.approximate.presentedResistance, 1 / ya.re)).toBeLessThan(1e-9);
      expect(rel(d.approximate.capacitance, ya.im / w)).toBeLessThan(1e-9);
    }
  });

  it('tends to the usual values C1 = nC/(n − 1), C2 = nC when the source hardly loads C2, and says when they fail', () => {
    // the tapped-capacitor rule (Bowick, RF Circuit Design, 1982, ch. 4; chapter from memory)
    const good = capacitiveDivider({ capacitance: 100e-12, frequency: f, sourceResistance: 2e3, presentedResistance: 50e3 });
    expect(good.branchQ).toBeGreaterThan(20);
    expect(rel(good.upperCapacitance, (5 * 100e-12) / 4)).toBeLessThan(0.01);
    expect(rel(good.lowerCapacitance, 5 * 100e-12)).toBeLessThan(0.01);
    expect(good.notes).toEqual([]);
    const poor = capacitiveDivider({ capacitance: 100e-12, frequency: f, sourceResistance: 50, presentedResistance: 5.8e3 });
    expect(poor.branchQ).toBeLessThan(5);
    expect(Math.abs(poor.approximate.resistanceError)).toBeGreaterThan(0.05);
    expect(poor.notes[0].message).toMatch(/Use the exact values/);
  });

  it('the step-up is the voltage ratio with the source driving the joint and the tank resonant (mathjs)', () => {
    const rs = 50; const rp = 40e3; const cap = 100e-12;
    const d = capacitiveDivider({ capacitance: cap, frequency: f, sourceResistance: rs, presentedResistance: rp, restResistance: 30e3 });
    const zt = par(c(30e3), c(0, 1 / (w * cap)));
    const ratio = abs(divide(zt, add(zt, c(0, -1 / (w * d.upperCapacitance))))) as unknown as number;
    expect(rel(d.stepUp, ratio)).toBeLessThan(1e-12);
  });

  it('refuses a step-down and a step-up the capacitance cannot give, at the source resistance', () => {
    expect(fieldOf(() => capacitiveDivider({ capacitance: 100e-12, frequency: f, sourceResistance: 5e3, presentedResistance: 4e3 }))).toBe('sourceResistance');
    expect(fieldOf(() => capacitiveDivider({ capacitance: 1e-12, frequency: 1e5, sourceResistance: 50, presentedResistance: 1e6 }))).toBe('sourceResistance');
  });
});

describe('lNetwork', () => {
  it('both forms present R′ (circuit written out with mathjs), and the folded tank capacitor keeps the tank resonant', () => {
    const f = 7e6; const w = TWO_PI * f; const rs = 50; const rp = 6e3; const cap = 100e-12;
    const n = lNetwork({ frequency: f, sourceResistance: rs, presentedResistance: rp, capacitance: cap });
    expect(rel(n.networkQ, Math.sqrt(rp / rs - 1))).toBeLessThan(1e-12);
    const low = par(add(c(rs), c(0, w * n.lowPass.seriesInductance)) as Complex, c(0, -1 / (w * n.lowPass.shuntCapacitance)));
    const high = par(add(c(rs), c(0, -1 / (w * n.highPass.seriesCapacitance))) as Complex, c(0, w * n.highPass.shuntInductance));
    for (const z of [low, high]) {
      expect(rel(z.re, rp)).toBeLessThan(1e-9);
      expect(Math.abs(z.im) / rp).toBeLessThan(1e-9);
    }
    // folded: the series branch beside the one tank capacitor and the coil resonating C is a pure R′
    const coilY = c(0, -w * cap);
    const yLow = add(add(divide(1, add(c(rs), c(0, w * n.lowPass.seriesInductance))), c(0, w * (n.lowPass.tankCapacitance as number))), coilY) as Complex;
    const yHigh = add(add(divide(1, add(c(rs), c(0, -1 / (w * n.highPass.seriesCapacitance)))), c(0, w * (n.highPass.tankCapacitance as number))), coilY) as Complex;
    for (const y of [yLow, yHigh]) {
      expect(rel(y.re, 1 / rp)).toBeLessThan(1e-9);
      expect(Math.abs(y.im) * rp).toBeLessThan(1e-9);
    }
  });

  it('refuses a step-down at the source resistance', () => {
    expect(fieldOf(() => lNetwork({ frequency: 7e6, sourceResistance: 100, presentedResistance: 50 }))).toBe('sourceResistance');
  });
});

describe('designTap', () => {
  it('worked example, derived by hand: a 50 Ω antenna tapped on for a loaded Q of 12 with Q_u = 150', () => {
    // derived by hand: R′ = 1/(1/(Q_L X) − 1/(Q_u X)) = Q_L X / (1 − Q_L/Q_u), step-up √(R′/50)
    const d = designTap({ coil, capacitance: 137e-12, unloadedQ: 150, resistance: 50, loadedQ: 12 });
    const x = d.tank.reactance;
    const wanted = (12 * x) / (1 - 12 / 150);
    expect(rel(d.wantedResistance, wanted)).toBeLessThan(1e-12);
    // at the real-valued tap the sections (worked out again by tappedCoilSections) give exactly that step-up
    const s = tappedCoilSections({ coil, tapTurns: d.tap.tapTurns, frequency: d.tank.frequency });
    expect(rel(s.stepUp, Math.sqrt(wanted / 50))).toBeLessThan(1e-9);
    // the ideal-transformer guess N/√(R′/R) puts the tap nearer the cold end: the end turns link less flux
    expect(rel(d.tap.turnsRatioGuess.tapTurns, d.tank.coil!.turns / Math.sqrt(wanted / 50))).toBeLessThan(1e-12);
    expect(d.tap.turnsRatioGuess.tapTurns).toBeLessThan(d.tap.tapTurns);
    // practical tap: the nearest half turn
    expect(d.tap.practicalTapTurns).toBe(Math.round(2 * d.tap.tapTurns) / 2);
    // the loaded Q at the practical tap by 1/Q_L = 1/Q_u + 1/Q_e (Pozar), Q_e = R′/X
    expect(rel(d.estimate.loadedQ, 1 / (1 / 150 + x / d.tap.presentedResistance))).toBeLessThan(1e-12);
    // and the full circuit agrees with the high-Q rule within a few per cent
    expect(rel(d.response.loadedQ, d.estimate.loadedQ)).toBeLessThan(0.05);
  });

  it('matches a source to the tank (it then sees its own resistance) when no loaded Q is given', () => {
    const d = designTap({ coil, capacitance: 100e-12, resistance: 75, acrossResistance: 30e3 });
    const t = d.tank;
    expect(rel(d.wantedResistance, 1 / (1 / t.dynamicResistance + 1 / 30e3))).toBeLessThan(1e-12);
    expect(rel(d.response.loadedQ, t.dynamicResistance * 30e3 / (t.dynamicResistance + 30e3) / 2 / t.reactance)).toBeLessThan(0.1);
    // half-turn rounding leaves some mismatch, far less than a decibel
    expect(d.response.mismatchLoss).toBeLessThan(0.5);
  });

  it('refuses a source above the tank\'s dynamic resistance, a loaded Q above the unloaded Q, and a load already too heavy', () => {
    const high = (() => { try { designTap({ coil, capacitance: 100e-12, resistance: 100e3 }); } catch (e) { return e as Error & { field: string }; } })();
    expect(high?.field).toBe('resistance');
    expect(high?.message).toMatch(/only steps a resistance up/);
    const q = (() => { try { designTap({ coil, capacitance: 100e-12, unloadedQ: 150, resistance: 50, loadedQ: 200 }); } catch (e) { return e as Error & { field: string }; } })();
    expect(q?.field).toBe('loadedQ');
    expect(q?.message).toMatch(/unloaded\) Q is only 150/);
    expect(fieldOf(() => designTap({ coil, capacitance: 100e-12, unloadedQ: 150, resistance: 50, loadedQ: 100, acrossResistance: 5e3 }))).toBe('loadedQ');
    expect(fieldOf(() => designTap({ coil, capacitance: 100e-12, unloadedQ: 150, resistance: 20e3, loadedQ: 20 }))).toBe('resistance');
  });
});

describe('designMatch', () => {
  it('the issue\'s own figure: a 50 Ω antenna straight across a 4.7 µH tank gives a loaded Q of about 0.27', () => {
    // issue 9 text (the Tank bench's figure); by hand Q_L ≈ R_s/(ωL) at 6.27 MHz (137 pF)
    const d = designMatch({ coil, capacitance: 137e-12, unloadedQ: 150, sourceResistance: 50, loadedQ: 12, options: ['tap'] });
    expect(d.direct.loadedQ).toBeCloseTo(50 / d.tank.reactance / (1 + 50 / d.tank.dynamicResistance), 12);
    expect(d.direct.loadedQ).toBeGreaterThan(0.25);
    expect(d.direct.loadedQ).toBeLessThan(0.29);
  });

  it('two taps for a loaded Q of 12: the terminations share the load equally, and the transducer loss follows the insertion-loss rule', () => {
    const d = designMatch(frontEnd);
    const t = d.tank;
    const load = d.load!;
    // the source's target keeps the loaded Q at 12 after the load's tap is rounded (1/Q_L = 1/Q_u + Σ 1/Q_e)
    expect(rel(1 / (t.reactance * (1 / t.dynamicResistance + 1 / d.sourceTarget + 1 / load.presentedResistance)), 12)).toBeLessThan(1e-12);
    const tap = d.options.find((o) => o.kind === 'tap') as Extract<MatchOption, { kind: 'tap' }>;
    // Pozar / qRules: −20 log10(1 − Q_L/Q_u) for equal terminations, at the loaded Q the circuit really has
    expect(Math.abs((tap.response.transducerLoss as number) - insertionLoss(t.unloadedQ, tap.response.loadedQ))).toBeLessThan(0.1);
    expect(rel(tap.response.loadedQ, 12)).toBeLessThan(0.05);
    // the same coil as the Coil bench winds it
    expect(d.tank.coil?.turns).toBe(designCoil(coil).turns);
  });

  it('the link: its mutual inductance is the loop-by-loop sum, and it presents L²(R² + X²)/(M² R)', () => {
    const d = designMatch({ ...frontEnd, options: ['link'] });
    const o = d.options[0] as Extract<MatchOption, { kind: 'link' }>;
    expect(o.available).toBe(true);
    const g = d.tank.coil!;
    const sum = mutualInductanceCoaxialWindings(
      { radius: coil.diameter / 2, position: 0, pitch: g.pitch as number, turns: g.turns },
      { radius: o.link.diameter / 2, position: o.link.position, pitch: o.link.pitch, turns: o.link.practicalTurns },
    );
    expect(rel(o.link.mutualInductance, sum)).toBeLessThan(1e-12);
    const x = TWO_PI * d.tank.frequency * o.link.linkInductance;
    const l = d.tank.inductance;
    expect(rel(o.link.presentedResistance, (l * l * (50 * 50 + x * x)) / (o.link.mutualInductance ** 2 * 50))).toBeLessThan(1e-12);
    expect(o.link.couplingCoefficient).toBeGreaterThan(0);
    expect(o.link.couplingCoefficient).toBeLessThan(1);
    // the link's diameter by default clears the coil's wire: coil diameter plus both overall wire diameters
    expect(o.link.diameter).toBeCloseTo(20e-3 + 2 * 0.55e-3, 12);
  });

  it('a link moved away from the cold end needs more turns; too close it loads too much, too far too little', () => {
    // a match of a 50 Ω source to the tank alone (R′ = R_D): the coupling falls as the link moves off the end
    const at = (position: number) => designLink({ coil, capacitance: 100e-12, resistance: 50, link: { position } });
    const near = at(-2e-3);
    const far = at(-10e-3);
    expect(far.link.turns).toBeGreaterThan(near.link.turns);
    expect(far.link.couplingCoefficient).toBeLessThan(near.link.couplingCoefficient);
    expect(fieldOf(() => at(0))).toBe('link.position');
    expect(fieldOf(() => at(-20e-3))).toBe('link.diameter');
    expect(fieldOf(() => designLink({ coil, capacitance: 100e-12, resistance: 50, link: { diameter: 20.2e-3 } }))).toBe('link.diameter');
  });

  it('match goal with the load across the top: the source is presented as the tank in parallel with the load', () => {
    const d = designMatch({ coil, capacitance: 100e-12, sourceResistance: 50, loadResistance: 20e3, loadConnection: 'top' });
    const rd = d.tank.dynamicResistance;
    expect(rel(d.sourceTarget, (rd * 20e3) / (rd + 20e3))).toBeLessThan(1e-12);
    for (const o of d.options) if (o.available) expect(o.estimate.inputResistance, o.kind).toBeGreaterThan(0);
  });

  it('with only an inductance, taps and links are set aside with the reason, the rest designed', () => {
    const d = designMatch({ inductance: 4.7e-6, capacitance: 100e-12, unloadedQ: 150, sourceResistance: 50, loadResistance: 20e3, loadedQ: 12 });
    const byKind = Object.fromEntries(d.options.map((o) => [o.kind, o]));
    expect(byKind.tap.available).toBe(false);
    expect(byKind.link.available).toBe(false);
    expect((byKind.tap as { reason: string }).reason).toMatch(/geometry/);
    expect(byKind.capacitiveDivider.available).toBe(true);
    expect(byKind.highPassL.available).toBe(true);
    expect(d.load?.connection).toBe('top');
  });

  it('bad input is refused at the field that caused it, in a technician\'s words', () => {
    const err = (spec: object) => { try { designMatch(spec as never); } catch (e) { return e as Error & { field: string }; } throw new Error('no error'); };
    const beyond = err({ ...frontEnd, loadTapTurns: 40 });
    expect(beyond.field).toBe('loadTapTurns');
    expect(beyond.message).toMatch(/beyond the coil/);
    const high = err({ coil, capacitance: 100e-12, sourceResistance: 100e3 });
    expect(high.field).toBe('sourceResistance');
    expect(high.message).toMatch(/above the .* it must be seen as across the tank for a match/);
    expect(err({ ...frontEnd, loadedQ: 500 }).field).toBe('loadedQ');
    expect(err({ ...frontEnd, loadedQ: undefined }).field).toBe('loadedQ');
    expect(err({ ...frontEnd, loadResistance: 50e3 }).field).toBe('loadResistance');
    expect(err({ ...frontEnd, split: 'half' }).field).toBe('split');
    expect(err({ ...frontEnd, options: ['transformer'] }).field).toBe('options');
    expect(err({ ...frontEnd, link: { diameter: -1 } }).field).toBe('link.diameter');
    expect(err({ ...frontEnd, coil: { ...coil, pitch: 0.1e-3 } }).field).toBe('coil.pitch');
    expect(err({ ...frontEnd, capacitance: 1e-20 }).field).toBe('capacitance');
    expect(err({ ...frontEnd, loadConnection: 'top', loadTapTurns: 3 }).field).toBe('loadTapTurns');
  });
});

describe('properties (fast-check)', () => {
  it('for any single-layer coil and tap: L1 + L2 + 2M = L, and the step-up falls from the cold end to 1 at the top', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 5e-3, max: 60e-3, noNaN: true }), fc.double({ min: 0.02, max: 0.3, noNaN: true }), fc.integer({ min: 4, max: 120 }), fc.double({ min: 0.02, max: 0.98, noNaN: true }),
        (diameter, pitchRatio, twiceTurns, where) => {
          const pitch = pitchRatio * diameter / 2;
          const turns = twiceTurns / 2;
          const spec = { form: 'solenoid' as const, diameter, pitch, turns, wire: { diameter: pitch / 2 } };
          const whole = designCoil(spec).inductance;
          const a = tappedCoilSections({ coil: spec, tapTurns: where * turns });
          const b = tappedCoilSections({ coil: spec, tapTurns: Math.min(turns, (where + 0.01) * turns) });
          expect(rel(a.lowerInductance + a.upperInductance + 2 * a.mutualInductance, whole)).toBeLessThan(1e-11);
          expect(a.stepUp).toBeGreaterThan(b.stepUp);
          expect(b.stepUp).toBeGreaterThanOrEqual(1);
          expect(a.couplingCoefficient).toBeLessThan(1);
        },
      ),
      { numRuns: 150, seed: 9 },
    );
  });

  it('for any step-up the capacitance allows, the exact divider presents R′ ∥ C (mathjs)', () => {
    fc.assert(
      fc.property(fc.double({ min: 10, max: 5e3, noNaN: true }), fc.double({ min: 1.5, max: 2000, noNaN: true }), fc.double({ min: 10e-12, max: 1e-9, noNaN: true }), fc.double({ min: 1e5, max: 1e8, noNaN: true }),
        (rs, ratio, cap, f) => {
          const rp = rs * ratio;
          const q = TWO_PI * f * cap * rp;
          fc.pre(ratio < 0.9 * (1 + q * q));
          const d = capacitiveDivider({ capacitance: cap, frequency: f, sourceResistance: rs, presentedResistance: rp });
          const w = TWO_PI * f;
          const y = divide(1, add(c(0, -1 / (w * d.upperCapacitance)), par(c(rs), c(0, -1 / (w * d.lowerCapacitance))))) as Complex;
          expect(rel(y.re, 1 / rp)).toBeLessThan(1e-7);
          expect(rel(y.im, w * cap)).toBeLessThan(1e-7);
        }),
      { numRuns: 200, seed: 9 },
    );
  });

  it('resolveMatchTank agrees with the tank it describes: f0 from Thomson\'s formula, R_D = Q_u ω0 L', () => {
    // Thomson's formula and Terman's R_D = Q ω L (Terman 1943)
    const t = resolveMatchTank({ coil, capacitance: 100e-12, unloadedQ: 150 });
    expect(rel(t.frequency, 1 / (TWO_PI * Math.sqrt(t.inductance * 100e-12)))).toBeLessThan(1e-12);
    expect(rel(t.dynamicResistance, 150 * TWO_PI * t.frequency * t.inductance)).toBeLessThan(1e-12);
    const f = designCoil({ ...coil, frequency: t.frequency });
    expect(rel(t.inductance, f.inductanceAtFrequency as number)).toBeLessThan(1e-6);
  });
});
