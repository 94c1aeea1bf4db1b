/**
 * What the Match bench draws, loaded with its plot (MatchExtras.tsx), not
 * with the answer: the return loss at the antenna's port against frequency
 * for every option that can be built, from the core's exact circuit
 * (sweepMatchCircuit), and for the antenna and load straight across the top
 * of the tank (no match) for comparison. Pure: no Solid, no DOM.
 */
import type { MatchCircuit } from '../../src/core/matchCircuit';
import { sweepMatchCircuit } from '../../src/core/matchCircuit';
import type { MatchDesign, MatchOptionKind } from '../../src/core/matching';
import type { Choices, SpecObject } from '../kit/fields';
import { designOption, matchSpecOf, OPTION_KINDS, type BuiltOption } from './matchPlan';

/** Points of each curve. */
export const CURVE_POINTS = 201;

/** One curve: an option (or 'direct', no match) and its return loss at each frequency, dB. */
export interface ReturnLossCurve {
  kind: MatchOptionKind | 'direct';
  returnLoss: number[];
}

export interface ReturnLossCurves {
  /** The tank's resonance f₀, Hz. */
  frequency: number;
  /** The frequencies of every curve, Hz. */
  frequencies: number[];
  curves: ReturnLossCurve[];
}

/**
 * The tank with the antenna and the load straight across its top: the coil
 * as an inductance with its loss ω₀L/Qᵤ in series (the loss the options'
 * circuits give the coil), the tank capacitor, the load at the top.
 */
export function directCircuit(design: MatchDesign, sourceResistance: number): MatchCircuit {
  const t = design.tank;
  return {
    frequency: t.frequency,
    sourceNode: 'top',
    sourceResistance,
    topNode: 'top',
    ...(design.load ? { loadNode: 'top', loadResistance: design.load.resistance } : {}),
    parts: [
      { kind: 'inductor', name: 'coil', from: 'top', to: '0', inductance: t.inductance, resistance: t.reactance / t.unloadedQ },
      { kind: 'capacitor', name: 'tank', from: 'top', to: '0', capacitance: t.capacitance },
    ],
  };
}

/**
 * The return-loss curves for the bench's values: every option that can be
 * built and the straight-across tank, over f₀ ± 2.5 of the widest option's
 * bandwidths (at most ± f₀/2), CURVE_POINTS points each.
 * @throws DesignError with a spec path the table routes (as planAnswer)
 */
export function returnLossCurves(raw: SpecObject, choices: Choices): ReturnLossCurves {
  const spec = matchSpecOf(raw, choices);
  const built: BuiltOption[] = [];
  let design: MatchDesign | undefined;
  for (const kind of OPTION_KINDS) {
    try {
      const d = designOption(spec, kind);
      design ??= d;
      const o = d.options[0];
      if (o.available) built.push(o);
    } catch (e) {
      // A link refused for its geometry is said at its field by its own row; the others still draw.
      if (kind !== 'link') throw e;
    }
  }
  const d = design as MatchDesign;
  const f0 = d.tank.frequency;
  const widest = Math.max(f0 / 50, ...built.map((o) => o.response.bandwidth));
  const half = Math.min(0.5 * f0, 2.5 * widest);
  const sweep = { start: f0 - half, stop: f0 + half, points: CURVE_POINTS, spacing: 'linear' as const };
  const curves: ReturnLossCurve[] = built.map((o) => ({ kind: o.kind, returnLoss: sweepMatchCircuit(o.circuit, sweep).returnLoss }));
  const direct = sweepMatchCircuit(directCircuit(d, spec.sourceResistance), sweep);
  curves.push({ kind: 'direct', returnLoss: direct.returnLoss });
  return { frequency: f0, frequencies: direct.frequency, curves };
}
