/**
 * The matching method page (content/docs/matching.md) against the core, so
 * the page cannot drift from the code.
 *
 * Each worked example of the page (a paragraph starting "**Worked example
 * (title).**", with the table after it, if any) is recomputed here with the
 * same inputs: every figure the page gives must appear in that paragraph as
 * the core's value, rounded as written, and once those figures are taken out
 * no digit may be left (so a number added to an example without a check here
 * fails). Beside the core's figures, each example is checked against
 * something outside the matching code: Maxwell's formula against Neumann's
 * integral done numerically here and the published close and distant forms
 * (Grover 1946); the high-Q rules written out by hand (Pozar; Terman 1943);
 * the capacitive divider's admittance and the L-network's reactances
 * written out here; the link's mutual inductance as the loop-by-loop sum.
 * The README's rows for the match exports are checked against the core too.
 * The worked examples are demo data (invented parts, a fictional workshop).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { fig, flat, methodPage, parts } from '../helpers/pageExamples';
import {
  MU_0, analyzeTank, capacitiveDivider, designCoil, designLink, designMatch, designTap, insertionLoss, lNetwork, matchNetlist,
  mutualInductanceCoaxialLoops, mutualInductanceCoaxialWindings, tappedCoilSections, type MatchOption,
} from '../../src/core';
import { rel, thomson } from '../helpers/asserts';

const { page, example, expectExample } = methodPage('matching.md');

/** "4.646 µH" (a computed value to `sig` figures). */
function q(x: number, unit: string, sig = 3): string {
  const { mantissa, prefix } = parts(x, sig);
  return `${x < 0 ? '\u2212' : ''}${mantissa} ${prefix}${unit}`;
}

/** An input as typed: "137 pF", "1 kΩ", "0.55 mm" (no trailing zeros, no binary noise). */
function typed(x: number, unit: string): string {
  const { mantissa, prefix } = parts(x, 12);
  return `${String(Number(mantissa))} ${prefix}${unit}`;
}
/** A length in millimetres as typed: "0.55 mm". */
const mm = (x: number): string => `${String(Number(fig(x * 1e3, 12)))} mm`;

/** A fraction as a percentage without sign: "2.3 %". */
const pct = (x: number, sig: number): string => `${fig(Math.abs(x) * 100, sig)} %`;

/** A loss in decibels: "0.891 dB". */
const dB = (x: number, sig = 3): string => `${fig(x, sig)} dB`;


// ---------------------------------------------------------------------------
// The workshop's front end (invented): 18 turns on a 20 mm former, 137 pF in all, Q_u 150,
// a 50 Ω antenna and a 1 kΩ next stage, a loaded Q of 12.

const coil = { form: 'solenoid' as const, diameter: 20e-3, pitch: 1e-3, turns: 18, wire: { diameter: 0.5e-3, insulatedDiameter: 0.55e-3 } };
const tankSpec = { coil, capacitance: 137e-12, unloadedQ: 150 };
const antenna = 50;
const nextStage = 1000;
const wantedQ = 12;
const frontEnd = designMatch({ ...tankSpec, sourceResistance: antenna, loadResistance: nextStage, loadedQ: wantedQ });
const tank = frontEnd.tank;
const X = tank.reactance;
/** The available option of kind K (an L-network option's kind is either form's). */
type OptionOf<K extends MatchOption['kind']> = MatchOption extends infer O ? (O extends { available: true; kind: infer T } ? (K extends T ? O : never) : never) : never;
const option = <K extends MatchOption['kind']>(kind: K): OptionOf<K> => {
  const o = frontEnd.options.find((x) => x.kind === kind);
  expect(o?.available, kind).toBe(true);
  return o as OptionOf<K>;
};

/** Γ² for a source R_s looking into R (real). */
const gamma2 = (r: number, rs: number) => ((r - rs) / (r + rs)) ** 2;
const lossOf = (ratio: number) => -10 * Math.log10(ratio);

/**
 * Neumann's formula for two coaxial circles (F. E. Neumann 1845; Grover 1946),
 * M = μ0 a b ∫₀^π cos φ / √(a² + b² + z² − 2ab cos φ) dφ, by composite
 * Simpson's rule on a fine grid (nothing of the core used).
 */
function neumann(a: number, b: number, z: number): number {
  const n = 400_000;
  const h = Math.PI / n;
  const f = (p: number) => Math.cos(p) / Math.sqrt(a * a + b * b + z * z - 2 * a * b * Math.cos(p));
  let s = f(0) + f(Math.PI);
  for (let i = 1; i < n; i++) s += (i % 2 ? 4 : 2) * f(i * h);
  return MU_0 * a * b * (s * h) / 3;
}

describe('the matching page, worked examples against the core', () => {
  it('why match', () => {
    const alone = designMatch({ ...tankSpec, sourceResistance: antenna, options: ['tap'] });
    const both = designMatch({ ...tankSpec, sourceResistance: antenna, loadResistance: nextStage, loadConnection: 'top', options: ['tap'] });
    const wound = designCoil(coil);
    const t = alone.tank;
    // Thomson's formula (Terman 1943) with the coil's inductance at resonance; R_D = Q_u ω0 L (Terman 1943)
    expect(rel(t.frequency, thomson(t.inductance, 137e-12))).toBeLessThan(1e-9);
    expect(rel(t.dynamicResistance, 150 * 2 * Math.PI * t.frequency * t.inductance)).toBeLessThan(1e-12);
    // 1/Q_L = 1/Q_u + 1/Q_e with Q_e = R_s/(ω0 L) (Pozar); B = f0/Q_L, which for a parallel tank fed from a
    // resistance is the exact −3 dB width (the Tank bench's exact analysis agrees)
    expect(rel(alone.direct.loadedQ, 1 / (1 / 150 + t.reactance / antenna))).toBeLessThan(1e-12);
    const exact = analyzeTank({ inductance: t.inductance, capacitance: 137e-12, coilQ: 150, sourceResistance: antenna });
    expect(rel(exact.bandwidth, alone.direct.bandwidth)).toBeLessThan(1e-6);
    // with the load across as well: the load sees R_D ∥ R_L through the 50 Ω source (the tank method's worked example, by hand)
    const rp = 1 / (1 / t.dynamicResistance + 1 / nextStage);
    const gain = (4 * antenna * (rp / (antenna + rp)) ** 2) / nextStage;
    expect(rel(both.direct.transducerLoss as number, lossOf(gain))).toBeLessThan(1e-9);
    expect(rel(both.direct.mismatchLoss, lossOf(1 - gamma2(rp, antenna)))).toBeLessThan(1e-9);
    expectExample('why match', [
      `${wound.turns} turns`, mm(0.5e-3), mm(0.55e-3), mm(1e-3), mm(20e-3), q(wound.inductance, 'H', 4), q(t.inductance, 'H', 4),
      typed(137e-12, 'F'), q(wound.selfCapacitance as number, 'F'), q(t.frequency, 'Hz', 4), q(t.reactance, 'Ω', 4),
      `unloaded Q of ${t.unloadedQ}`, q(t.dynamicResistance, 'Ω'), typed(antenna, 'Ω'), fig(alone.direct.loadedQ, 3), q(alone.direct.bandwidth, 'Hz'),
      typed(nextStage, 'Ω'), fig(both.direct.loadedQ, 3), dB(both.direct.transducerLoss as number), dB(both.direct.mismatchLoss),
    ]);
  });

  it('Maxwell\'s formula', () => {
    const near = mutualInductanceCoaxialLoops(10e-3, 10e-3, 1e-3);
    const far = mutualInductanceCoaxialLoops(10e-3, 10e-3, 100e-3);
    const link = mutualInductanceCoaxialLoops(10e-3, 10.55e-3, 0);
    // Neumann's integral, numerically
    expect(rel(near, neumann(10e-3, 10e-3, 1e-3))).toBeLessThan(1e-8);
    expect(rel(far, neumann(10e-3, 10e-3, 100e-3))).toBeLessThan(1e-8);
    expect(rel(link, neumann(10e-3, 10.55e-3, 0))).toBeLessThan(1e-8);
    // Grover 1946: close loops μ0 a [ln(8a/z) − 2]; distant loops μ0 π a² b² / (2 z³)
    const close = MU_0 * 10e-3 * (Math.log(8 * 10e-3 / 1e-3) - 2);
    const dipole = (MU_0 * Math.PI * 10e-3 ** 2 * 10e-3 ** 2) / (2 * 100e-3 ** 3);
    expect(close).toBeLessThan(near);
    expect(dipole).toBeGreaterThan(far);
    expectExample('Maxwell\'s formula', [
      mm(10e-3), mm(1e-3), q(near, 'H', 4), q(close, 'H', 4), pct(close / near - 1, 1), mm(100e-3), q(far, 'H', 4), q(dipole, 'H', 4),
      pct(dipole / far - 1, 2), mm(10.55e-3), q(link, 'H', 4),
    ]);
  });

  it('sections and step-up', () => {
    const at = (n: number) => tappedCoilSections({ coil, tapTurns: n, frequency: tank.frequency });
    const [one, two, middle, ten] = [at(1), at(2), at(9), at(10)];
    for (const s of [one, two, middle, ten]) {
      // L1 + L2 + 2M is the whole coil at the frequency, the tank's inductance (the tank winds its coil at the
      // resonance found one step before the last, a part in a billion away)
      expect(rel(s.lowerInductance + s.upperInductance + 2 * s.mutualInductance, tank.inductance)).toBeLessThan(1e-8);
      // the step-up from the coupled-coil equations, written out here
      expect(rel(s.stepUp, (s.lowerInductance + s.upperInductance + 2 * s.mutualInductance) / (s.lowerInductance + s.mutualInductance))).toBeLessThan(1e-12);
      expect(rel(s.couplingCoefficient, s.mutualInductance / Math.sqrt(s.lowerInductance * s.upperInductance))).toBeLessThan(1e-12);
    }
    // at the middle the sections are alike, so the step-up is 2 exactly
    expect(middle.stepUp).toBeCloseTo(2, 12);
    // near the cold end the step-up exceeds the turns ratio, in the upper half it falls short of it
    expect(two.stepUp).toBeGreaterThan(two.turnsRatio);
    expect(ten.stepUp).toBeLessThan(ten.turnsRatio);
    expectExample('sections and step-up', [
      '2 turns', q(tank.frequency, 'Hz', 4), q(two.lowerInductance, 'H', 4), q(two.upperInductance, 'H', 4), q(two.mutualInductance, 'H', 4),
      fig(two.couplingCoefficient, 3), q(two.inductance, 'H', 4), fig(two.stepUp, 4), `turns ratio says ${two.turnsRatio}`,
      '1 turn', fig(one.stepUp, 4), `against ${one.turnsRatio}`, '9 turns', fig(middle.stepUp, 4), '10 turns', fig(ten.stepUp, 4), `against ${ten.turnsRatio}`,
    ]);
  });

  it('a tap for a loaded Q', () => {
    const d = designTap({ ...tankSpec, resistance: antenna, loadedQ: wantedQ });
    // derived by hand: R′ = 1/(1/(Q_L X) − 1/(Q_u X)) = Q_L X/(1 − Q_L/Q_u)
    const wanted = (wantedQ * X) / (1 - wantedQ / 150);
    expect(rel(d.wantedResistance, wanted)).toBeLessThan(1e-12);
    const made = tappedCoilSections({ coil, tapTurns: d.tap.practicalTapTurns, frequency: tank.frequency });
    expect(rel(d.tap.presentedResistance, made.stepUp ** 2 * antenna)).toBeLessThan(1e-8);
    // 1/Q_L = 1/Q_u + X/R′ (Pozar)
    expect(rel(d.estimate.loadedQ, 1 / (1 / 150 + X / d.tap.presentedResistance))).toBeLessThan(1e-12);
    // the turns ratio's tap N/√(R′/R), and what the real sections give at its half turn
    const guess = tappedCoilSections({ coil, tapTurns: d.tap.turnsRatioGuess.practicalTapTurns, frequency: tank.frequency });
    expect(rel(d.tap.turnsRatioGuess.tapTurns, 18 / Math.sqrt(wanted / antenna))).toBeLessThan(1e-12);
    expect(rel(d.tap.turnsRatioGuess.presentedResistance, guess.stepUp ** 2 * antenna)).toBeLessThan(1e-8);
    // the antenna looks into R_s R_D/R′ (the tank's own loss seen back through the step-up), Γ from that
    const rin = (antenna * tank.dynamicResistance) / d.tap.presentedResistance;
    expect(rel(d.estimate.inputResistance, rin)).toBeLessThan(1e-12);
    expect(rel(d.estimate.mismatchLoss, lossOf(1 - gamma2(rin, antenna)))).toBeLessThan(1e-9);
    expectExample('a tap for a loaded Q', [
      typed(antenna, 'Ω'), `loaded Q of ${wantedQ}`, q(d.wantedResistance, 'Ω', 4), `${fig(d.tap.tapTurns, 3)} turns`, `${d.tap.practicalTapTurns} turns`,
      fig(d.tap.stepUp, 4), q(d.tap.presentedResistance, 'Ω', 4), fig(d.estimate.loadedQ, 4), fig(d.response.loadedQ, 4), q(d.response.bandwidth, 'Hz'),
      `${fig(d.tap.turnsRatioGuess.tapTurns, 3)} turns`, `${d.tap.turnsRatioGuess.practicalTapTurns} turns`, fig(d.tap.turnsRatioGuess.stepUp, 4),
      q(d.tap.turnsRatioGuess.presentedResistance, 'Ω', 4), fig(d.turnsRatioEstimate.loadedQ, 3), q(d.estimate.inputResistance, 'Ω'), dB(d.estimate.mismatchLoss),
    ]);
  });

  it('a tap for a match', () => {
    const d = designTap({ ...tankSpec, resistance: antenna });
    // a match: the antenna presents the tank's own dynamic resistance; the loaded Q is then about Q_u/2
    expect(rel(d.wantedResistance, tank.dynamicResistance)).toBeLessThan(1e-12);
    expect(rel(d.tap.turnsRatioGuess.tapTurns, 18 / Math.sqrt(tank.dynamicResistance / antenna))).toBeLessThan(1e-12);
    expect(Math.abs(d.response.loadedQ / 75 - 1)).toBeLessThan(0.02);
    expectExample('a tap for a match', [
      q(d.wantedResistance, 'Ω'), `${fig(d.tap.tapTurns, 4)} turns`, `${fig(d.tap.turnsRatioGuess.tapTurns, 3)} turns`, `${d.tap.practicalTapTurns} turn`,
      q(d.tap.presentedResistance, 'Ω', 4), fig(d.response.loadedQ, 3), q(d.response.bandwidth, 'Hz'), dB(d.response.mismatchLoss, 1),
    ]);
  });

  it('the two splits', () => {
    const equal = -20 * Math.log10(1 - wantedQ / 150);
    // the page's formulas for the equal split, from G′_s = G′_load = (G_T − G_D)/2 written out here
    const gt = 1 / (wantedQ * X);
    const gd = 1 / tank.dynamicResistance;
    const half = (gt - gd) / 2;
    expect(rel(equal, lossOf((4 * half * half) / (gt * gt)))).toBeLessThan(1e-9);
    // the insertion-loss rule of qRules (common practice; the tank method)
    expect(rel(insertionLoss(150, wantedQ), equal)).toBeLessThan(1e-12);
    const gamma = (half - (gd + half)) / (half + gd + half);
    const mismatch = lossOf(1 - gamma * gamma);
    expect(rel(mismatch, lossOf(1 - (wantedQ / 150) ** 2))).toBeLessThan(1e-9);
    // matching the source: G′_load = G_T/2 − G_D, G′_s = G_D + G′_load
    const gl = gt / 2 - gd;
    const matched = lossOf((4 * (gd + gl) * gl) / (gt * gt));
    expect(rel(matched, -10 * Math.log10(1 - (2 * wantedQ) / 150))).toBeLessThan(1e-9);
    expect(matched).toBeGreaterThan(equal);
    expectExample('the two splits', [`loaded Q of ${wantedQ}`, 'unloaded Q of 150', dB(equal), dB(mismatch), dB(matched)]);
  });

  it('antenna and next stage', () => {
    const load = frontEnd.load!;
    const tap = option('tap');
    const gt = 1 / (wantedQ * X);
    const gd = 1 / tank.dynamicResistance;
    // equal split: the load should present (G_T − G_D)/2; the source then what is left of G_T
    const loadWanted = 2 / (gt - gd);
    expect(load.tap!.presentedResistance).toBe(load.presentedResistance);
    expect(rel(frontEnd.sourceTarget, 1 / (gt - gd - 1 / load.presentedResistance))).toBeLessThan(1e-12);
    const made = tappedCoilSections({ coil, tapTurns: load.tap!.practicalTapTurns, frequency: tank.frequency });
    expect(rel(load.presentedResistance, made.stepUp ** 2 * nextStage)).toBeLessThan(1e-8);
    expectExample('antenna and next stage', [
      typed(nextStage, 'Ω'), `loaded Q of ${wantedQ}`, q(loadWanted, 'Ω', 4), `${fig(load.tap!.tapTurns, 3)} turns`, `${load.tap!.practicalTapTurns} turns`,
      q(load.presentedResistance, 'Ω', 4), q(frontEnd.sourceTarget, 'Ω', 4), `${fig(tap.tap.tapTurns, 3)} turns`, fig(tap.tap.turnsRatioGuess.tapTurns, 3),
      `${tap.tap.practicalTapTurns} turns`, fig(tap.response.loadedQ, 3), q(tap.response.bandwidth, 'Hz'), dB(tap.response.transducerLoss as number),
      dB(tap.response.mismatchLoss, 2),
    ]);
  });

  it('capacitive divider', () => {
    const w = 2 * Math.PI * tank.frequency;
    const alone = capacitiveDivider({ capacitance: 137e-12, frequency: tank.frequency, sourceResistance: antenna, presentedResistance: tank.dynamicResistance });
    const o = option('capacitiveDivider');
    const fe = o.divider;
    /** The admittance across the top of C1 in series with (R_s ∥ C2), written out here. */
    const across = (c1: number, c2: number) => {
      const d = 1 / antenna ** 2 + (w * c2) ** 2;
      const zr = 1 / antenna / d;
      const zi = -(w * c2) / d - 1 / (w * c1);
      const m = zr * zr + zi * zi;
      return { r: m / zr, c: -zi / m / w };
    };
    for (const [d, target] of [[alone, tank.dynamicResistance], [fe, frontEnd.sourceTarget]] as const) {
      // the exact pair presents R′ in parallel with the tank's capacitance
      const y = across(d.upperCapacitance, d.lowerCapacitance);
      expect(rel(y.r, target)).toBeLessThan(1e-9);
      expect(rel(y.c, 137e-12)).toBeLessThan(1e-9);
      // the usual rule n = √(R′/R_s), C1 = nC/(n − 1), C2 = nC (Bowick 1982), and what it really presents
      const n = Math.sqrt(target / antenna);
      expect(rel(d.approximate.upperCapacitance, (n * 137e-12) / (n - 1))).toBeLessThan(1e-12);
      expect(rel(d.approximate.lowerCapacitance, n * 137e-12)).toBeLessThan(1e-12);
      const ya = across(d.approximate.upperCapacitance, d.approximate.lowerCapacitance);
      expect(rel(d.approximate.presentedResistance, ya.r)).toBeLessThan(1e-9);
      expect(rel(d.approximate.capacitance, ya.c)).toBeLessThan(1e-9);
      expect(rel(d.branchQ, w * d.lowerCapacitance * antenna)).toBeLessThan(1e-12);
    }
    // the rule fails where the lower branch's Q is a few: the core says so there, not for the match
    expect(alone.notes).toHaveLength(0);
    expect(fe.notes.some((x) => x.level === 'validity')).toBe(true);
    expectExample('capacitive divider', [
      typed(antenna, 'Ω'), q(tank.dynamicResistance, 'Ω'), q(alone.upperCapacitance, 'F', 4), q(alone.lowerCapacitance, 'F', 4), fig(alone.branchQ, 3),
      q(alone.approximate.upperCapacitance, 'F', 4), q(alone.approximate.lowerCapacitance, 'F', 4), q(alone.approximate.presentedResistance, 'Ω', 4),
      pct(alone.approximate.resistanceError, 2), q(frontEnd.sourceTarget, 'Ω', 4), q(fe.upperCapacitance, 'F', 4), q(fe.lowerCapacitance, 'F', 4),
      fig(fe.branchQ, 3), q(fe.approximate.upperCapacitance, 'F', 4), q(fe.approximate.lowerCapacitance, 'F', 4),
      q(fe.approximate.presentedResistance, 'Ω', 4), pct(fe.approximate.resistanceError, 2), q(fe.approximate.capacitance, 'F', 4), typed(137e-12, 'F'),
      fig(o.response.loadedQ, 3), dB(o.response.transducerLoss as number),
    ]);
  });

  it('link', () => {
    const o = option('link');
    const k = o.link;
    const wound = tank.coil!;
    // the mutual inductance as Maxwell's formula summed over every pair of turns
    const sum = mutualInductanceCoaxialWindings(
      { radius: coil.diameter / 2, position: 0, pitch: wound.pitch as number, turns: wound.turns },
      { radius: k.diameter / 2, position: k.position, pitch: k.pitch, turns: k.practicalTurns },
    );
    expect(rel(k.mutualInductance, sum)).toBeLessThan(1e-12);
    expect(rel(k.couplingCoefficient, k.mutualInductance / Math.sqrt(tank.inductance * k.linkInductance))).toBeLessThan(1e-12);
    // R′ = L²(R² + X²)/(M² R), the coupled-circuit reflection (Terman 1943) written out here
    const x = 2 * Math.PI * tank.frequency * k.linkInductance;
    expect(rel(k.reactance, x)).toBeLessThan(1e-12);
    expect(rel(k.presentedResistance, (tank.inductance ** 2 * (antenna ** 2 + x * x)) / (k.mutualInductance ** 2 * antenna))).toBeLessThan(1e-12);
    // the default link: the coil's wire close-wound, its diameter the coil's plus both overall wire diameters
    expect(k.pitch).toBe(0.55e-3);
    expect(rel(k.diameter, 20e-3 + 2 * 0.55e-3)).toBeLessThan(1e-12);
    expectExample('link', [
      mm(k.pitch), `${fig(k.diameter * 1e3, 3)} mm`, `${fig(k.turns, 3)} turns`, `${k.practicalTurns} turns`, q(k.linkInductance, 'H', 4),
      q(k.mutualInductance, 'H', 4), fig(k.couplingCoefficient, 3), q(k.presentedResistance, 'Ω', 4), q(k.reactance, 'Ω', 3), typed(antenna, 'Ω'),
      fig(o.response.loadedQ, 3), dB(o.response.transducerLoss as number),
    ]);
  });

  it('L-network', () => {
    const lp = option('lowPassL');
    const hp = option('highPassL');
    const w = 2 * Math.PI * tank.frequency;
    const net = lNetwork({ frequency: tank.frequency, sourceResistance: antenna, presentedResistance: frontEnd.sourceTarget, capacitance: 137e-12 });
    // Q = √(R′/R_s − 1), |X_series| = Q R_s, |X_shunt| = R′/Q (Bowick 1982), written out here
    const nq = Math.sqrt(frontEnd.sourceTarget / antenna - 1);
    expect(rel(lp.network.networkQ, nq)).toBeLessThan(1e-12);
    expect(rel(lp.network.seriesInductance as number, (nq * antenna) / w)).toBeLessThan(1e-12);
    expect(rel(lp.network.shuntCapacitance as number, nq / (w * frontEnd.sourceTarget))).toBeLessThan(1e-12);
    expect(rel(hp.network.seriesCapacitance as number, 1 / (w * nq * antenna))).toBeLessThan(1e-12);
    expect(rel(hp.network.shuntInductance as number, frontEnd.sourceTarget / nq / w)).toBeLessThan(1e-12);
    // the folded tank capacitors, C + C_shunt and C − 1/(ω² L_shunt)
    expect(rel(lp.network.tankCapacitance, 137e-12 + (lp.network.shuntCapacitance as number))).toBeLessThan(1e-12);
    expect(rel(hp.network.tankCapacitance, 137e-12 - 1 / (w * w * (hp.network.shuntInductance as number)))).toBeLessThan(1e-12);
    expect(hp.network.shuntKept).toBe(false);
    expect(net.lowPass.seriesInductance).toBe(lp.network.seriesInductance);
    // the low-pass form's own selectivity: the circuit's loaded Q well above the rules' (the core notes it)
    expect(lp.response.loadedQ / lp.estimate.loadedQ).toBeGreaterThan(1.1);
    expect(lp.notes.some((n) => n.field === 'loadedQ')).toBe(true);
    expect(Math.abs(hp.response.loadedQ / hp.estimate.loadedQ - 1)).toBeLessThan(0.1);
    expectExample('L-network', [
      typed(antenna, 'Ω'), q(frontEnd.sourceTarget, 'Ω', 4), fig(nq, 4), q(lp.network.seriesInductance as number, 'H', 4),
      q(lp.network.shuntCapacitance as number, 'F', 4), q(lp.network.tankCapacitance, 'F', 4), q(hp.network.seriesCapacitance as number, 'F', 4),
      q(hp.network.shuntInductance as number, 'H', 4), q(hp.network.tankCapacitance, 'F', 4), fig(lp.estimate.loadedQ, 3), fig(lp.response.loadedQ, 3),
      fig(hp.response.loadedQ, 3),
    ]);
  });

  it('every option, exact', () => {
    const names: Record<MatchOption['kind'], string> = {
      tap: 'tap', capacitiveDivider: 'capacitive divider', link: 'link', lowPassL: 'low-pass L-network', highPassL: 'high-pass L-network',
    };
    const built = frontEnd.options.map((o) => {
      expect(o.available, o.kind).toBe(true);
      const a = o as Extract<MatchOption, { available: true }>;
      // loaded Q is the peak over its −3 dB width
      expect(rel(a.response.loadedQ, a.response.frequency / a.response.bandwidth)).toBeLessThan(1e-12);
      return a;
    });
    expect(built).toHaveLength(5);
    const row = (o: (typeof built)[number], cells: string[]) => `| ${names[o.kind]} | ${cells.join(' | ')} |`;
    expectExample('every option, exact', [
      q(tank.frequency, 'Hz', 4), typed(nextStage, 'Ω'), `loaded Q of ${wantedQ}`,
      '| option | loaded Q, rules | loaded Q, circuit | bandwidth |', '| option | peak | loss | mismatch |', '|---|---|---|---|',
      ...built.map((o) => row(o, [fig(o.estimate.loadedQ, 3), fig(o.response.loadedQ, 3), q(o.response.bandwidth, 'Hz')])),
      ...built.map((o) => row(o, [q(o.response.frequency, 'Hz', 4), dB(o.response.transducerLoss as number), dB(o.response.mismatchLoss, 2)])),
    ]);
  });
});

describe('the matching page, statements outside the examples', () => {
  it('names its bench and links the cautions', () => {
    expect(page).toMatch(/^bench: \/match\/$/m);
    expect(page).toContain('[Match bench](/match/)');
    expect(page).toContain('[cautions](/cautions/)');
  });

  it('the core notes a circuit\'s loaded Q more than 10 % from the rules\', as the page says', () => {
    expect(flat(page)).toContain('whenever the circuit\'s loaded Q is more than 10 % from the rules\'');
    for (const o of frontEnd.options) {
      if (!o.available) continue;
      const off = Math.abs(o.response.loadedQ / o.estimate.loadedQ - 1) > 0.1;
      expect(o.notes.some((n) => n.field === 'loadedQ' && /loaded Q/.test(n.message)), o.kind).toBe(off);
    }
  });
});

describe('the README\'s rows for the match exports', () => {
  const readme = readFileSync(new URL('../../README.md', import.meta.url), 'utf8');
  const start = readme.indexOf('### Matching the antenna and the next stage');
  const section = readme.slice(start, readme.indexOf('\n### ', start + 1));
  /** In exponent form without a plus sign: "6.308e6". */
  const sci = (x: number, sig = 4): string => x.toExponential(sig - 1).replace('e+', 'e');
  /** A figure as the README writes it: the value to `sig` figures, in exponent form below 0.01 or from 10⁴ up. */
  const num = (x: number, sig = 4): string => {
    const v = Number(x.toPrecision(sig));
    return Math.abs(v) >= 0.01 && Math.abs(v) < 1e4 ? String(v) : sci(v, sig);
  };
  const row = (name: string): string => {
    const line = section.split('\n').find((l) => l.startsWith(`| \`${name}`));
    expect(line, `README row for ${name}`).toBeDefined();
    return line as string;
  };

  it('gives the figures the core gives', () => {
    expect(start).toBeGreaterThan(0);
    expect(row('mutualInductanceCoaxialLoops')).toContain(`→ ${num(mutualInductanceCoaxialLoops(10e-3, 10e-3, 1e-3))} H`);
    const link = mutualInductanceCoaxialWindings({ radius: 10e-3, position: 0, pitch: 1e-3, turns: 18 }, { radius: 10.55e-3, position: 0, pitch: 0.55e-3, turns: 2 });
    expect(row('mutualInductanceCoaxialWindings')).toContain(`→ ${num(link)} H`);
    const s = tappedCoilSections({ coil, tapTurns: 2 });
    expect(row('tappedCoilSections')).toContain(
      `lowerInductance: ${num(s.lowerInductance)}, upperInductance: ${sci(s.upperInductance)}, mutualInductance: ${num(s.mutualInductance)}, `
      + `couplingCoefficient: ${s.couplingCoefficient.toFixed(3)}, stepUp: ${num(s.stepUp)}, turnsRatio: ${s.turnsRatio}, leakageInductance: ${num(s.leakageInductance)}`,
    );
    expect(row('tappedInductorRatio')).toContain(`→ ${num(s.stepUp)}`);
    expect(row('resolveMatchTank')).toContain(
      `frequency: ${sci(tank.frequency)}, inductance: ${num(tank.inductance)}, reactance: ${num(tank.reactance)}, dynamicResistance: ${sci(tank.dynamicResistance)}`,
    );
    const tap = designTap({ ...tankSpec, resistance: antenna, loadedQ: wantedQ });
    expect(row('designTap')).toContain(
      `tap ${num(tap.tap.tapTurns, 3)} turns from the cold end (make it ${tap.tap.practicalTapTurns}), \`estimate.loadedQ\` ${num(tap.estimate.loadedQ)}, `
      + `\`response.loadedQ\` ${tap.response.loadedQ.toFixed(2)}; the turns ratio would say ${tap.tap.turnsRatioGuess.tapTurns.toFixed(2)}`,
    );
    const t = option('tap');
    expect(row('designMatch')).toContain(
      `load tap ${frontEnd.load!.tap!.practicalTapTurns} turns, antenna tap ${t.tap.practicalTapTurns} turns, exact loaded Q ${t.response.loadedQ.toFixed(1)} `
      + `and transducer loss ${num(t.response.transducerLoss as number, 3)} dB; \`direct.loadedQ\` ${num(designMatch({ ...tankSpec, sourceResistance: antenna, loadResistance: nextStage, loadConnection: 'top', options: ['tap'] }).direct.loadedQ, 3)}`,
    );
    const d = option('capacitiveDivider').divider;
    expect(row('capacitiveDivider')).toContain(
      `${num(frontEnd.sourceTarget / 1e3)} kΩ → C1 ${num(d.upperCapacitance)} F, C2 ${num(d.lowerCapacitance)} F; the usual values present ${Math.round(d.approximate.resistanceError * 100)} % too much (\`approximate.resistanceError\` ${num(d.approximate.resistanceError, 2)}`,
    );
    const lp = option('lowPassL').network;
    const hp = option('highPassL').network;
    expect(row('lNetwork')).toContain(
      `\`networkQ\` ${num(lp.networkQ)}; low-pass ${num(lp.seriesInductance as number)} H in series, tank capacitor ${num(lp.tankCapacitance)} F; `
      + `high-pass ${num(hp.seriesCapacitance as number)} F in series, tank capacitor ${num(hp.tankCapacitance)} F`,
    );
    const lk = designLink({ ...tankSpec, resistance: antenna });
    expect(row('designLink')).toContain(
      `→ ${num(lk.link.turns, 3)} turns (wind ${lk.link.practicalTurns}), M ${num(lk.link.mutualInductance)} H, k ${num(lk.link.couplingCoefficient, 3)}, `
      + `presents ${sci(lk.link.presentedResistance)} Ω for ${sci(lk.wantedResistance)} Ω wanted, exact loaded Q ${num(lk.response.loadedQ, 3)}`,
    );
    const r = t.response;
    expect(row('matchCircuitAt')).toContain(
      `frequency: ${sci(r.frequency)}, bandwidth: ${sci(r.bandwidth)}, loadedQ: ${r.loadedQ.toFixed(1)}, transducerLoss: ${num(r.transducerLoss as number, 3)}, `
      + `inputImpedance: { re: ${num(r.inputImpedance.re)}, im: ${num(r.inputImpedance.im)} }`,
    );
    const k = t.circuit.parts.find((p) => p.kind === 'windings');
    expect(k?.kind).toBe('windings');
    expect(row('matchNetlist')).toContain(`\`K1_0_1 Lcoil1 Lcoil2 ${(k as { coupling: number[][] }).coupling[0][1].toExponential(11)}\``);
    expect(matchNetlist(t.circuit)).toContain(`K1_0_1 Lcoil1 Lcoil2 ${(k as { coupling: number[][] }).coupling[0][1].toExponential(11)}`);
  });
});
