/**
 * The published rules for the Q of a resonator and its losses, as plain
 * functions of Q values and resistances (no circuit).
 *
 * - Element Q values combine as 1/Q = Σ 1/Q_i, and the loaded Q of a
 *   resonator from its unloaded and external Q as 1/Q_L = 1/Q_u + 1/Q_e
 *   (Pozar, *Microwave Engineering*, ch. 6).
 * - Series and parallel equivalents of a loss at one frequency,
 *   R_p = R_s (1 + Q²) with Q = X / R_s (exact circuit algebra).
 * - Insertion loss of a single resonator between equal terminations,
 *   IL = −20 log10(1 − Q_L/Q_u) dB (common practice; derived at
 *   `insertionLoss`). For unequal terminations see `transducerLoss` in
 *   `terminations`.
 *
 * Q values are dimensionless and greater than zero; Infinity stands for a
 * lossless part where the function says so.
 */
import { DesignError, requireFiniteResult, requirePositive } from './errors';
import { sayNumber, sayQuantity } from './text';

/** A Q value: a number greater than zero, Infinity allowed (a lossless part). */
function requireQ(field: string, value: unknown, what: string): number {
  if (value === Infinity) return value;
  return requirePositive(field, value, what);
}

/**
 * Combine the Q values of the parts of one resonator: 1/Q = Σ 1/Q_i
 * (Pozar, *Microwave Engineering*). Infinity stands for a lossless part.
 * @param qs Q of each part (> 0, dimensionless; Infinity for lossless)
 * @returns the resonator's Q (Infinity when every part is lossless)
 * @throws DesignError (field `q`) for no Q, or a Q that is not a number above zero
 */
export function combineQ(...qs: number[]): number {
  if (qs.length === 0) throw new DesignError('q', 'Give at least one Q value to combine.');
  let inv = 0;
  for (const q of qs) {
    if (q === Infinity) continue;
    if (typeof q !== 'number' || !Number.isFinite(q) || q <= 0) {
      throw new DesignError('q', `Every Q must be a number greater than zero (got ${typeof q === 'number' ? sayNumber(q) : String(q)}); use Infinity for a lossless part.`);
    }
    inv += 1 / q;
  }
  if (inv === 0) return Infinity;
  return requireFiniteResult('q', 1 / inv, 'The combined Q');
}

/**
 * Loaded Q from unloaded and external Q: 1/Q_L = 1/Q_u + 1/Q_e
 * (Pozar, *Microwave Engineering*).
 * @param unloadedQ Q_u of the resonator alone (> 0; Infinity for lossless)
 * @param externalQ Q_e set by the terminations alone (> 0; Infinity for none)
 * @returns Q_L (Infinity only when both are Infinity)
 */
export function combineLoadedQ(unloadedQ: number, externalQ: number): number {
  const qu = requireQ('unloadedQ', unloadedQ, 'Unloaded Q');
  const qe = requireQ('externalQ', externalQ, 'External Q');
  const inv = 1 / qu + 1 / qe;
  if (inv === 0) return Infinity;
  return requireFiniteResult('unloadedQ', 1 / inv, 'The loaded Q');
}

/**
 * Insertion loss of a single resonator between equal source and load
 * resistances: IL = −20 log10(1 − Q_L/Q_u) dB. Common practice, no single
 * published source named here. Derivation (parallel tank R_D between
 * terminations R, Q_u = R_D/X, Q_L = (R_D ∥ R/2)/X): the voltage gain at
 * resonance relative to a lossless resonator is R_D/(R_D + R/2) = 1 − Q_L/Q_u.
 * Valid near resonance for Q_L ≳ 5; unequal terminations add mismatch loss
 * (see `transducerLoss`).
 * @param unloadedQ Q_u (> 0; Infinity for a lossless resonator)
 * @param loadedQ Q_L (0 < Q_L < Q_u)
 * @returns loss in dB (≥ 0)
 */
export function insertionLoss(unloadedQ: number, loadedQ: number): number {
  const qu = requireQ('unloadedQ', unloadedQ, 'Unloaded Q');
  const ql = requirePositive('loadedQ', loadedQ, 'Loaded Q');
  if (!(ql < qu)) {
    throw new DesignError('loadedQ', `Loaded Q ${sayNumber(ql, 4)} must be below the unloaded Q ${sayNumber(qu, 4)}: loading a tank can only lower its Q.`);
  }
  // log1p keeps the figure exact when Q_L/Q_u is tiny; + 0 turns −0 into 0.
  return (-20 / Math.LN10) * Math.log1p(-ql / qu) + 0;
}

/**
 * The same rule from the unloaded and external Q:
 * 1 − Q_L/Q_u = Q_u/(Q_u + Q_e), so IL = 20 log10(1 + Q_e/Q_u) dB. Written
 * this way it stays exact for a very light load (Q_e ≫ Q_u), where
 * Q_L/Q_u rounds to 1. For `analyzeTank`; arguments already checked.
 */
export function insertionLossFromExternalQ(unloadedQ: number, externalQ: number): number {
  return (20 / Math.LN10) * Math.log1p(externalQ / unloadedQ);
}

/**
 * Parallel equivalent of a series loss at one frequency:
 * R_p = R_s (1 + Q²), Q = X/R_s (exact circuit algebra: R_s + jX ≡ R_p ∥ jX_p
 * with X_p = X (1 + 1/Q²)).
 * @param seriesResistance R_s in ohms (> 0)
 * @param reactance |X| of the part in series with it, ohms (> 0)
 * @returns R_p in ohms
 */
export function seriesToParallelResistance(seriesResistance: number, reactance: number): number {
  const rs = requirePositive('seriesResistance', seriesResistance, 'Series resistance', 'Ω');
  const x = requirePositive('reactance', reactance, 'Reactance', 'Ω');
  const q = x / rs;
  return finiteResistance(rs * (1 + q * q), rs, x);
}

/**
 * Series equivalent of a parallel loss at one frequency:
 * R_s = R_p / (1 + Q²), Q = R_p/X (exact circuit algebra).
 * @param parallelResistance R_p in ohms (> 0)
 * @param reactance |X| of the part it shunts, ohms (> 0)
 * @returns R_s in ohms
 */
export function parallelToSeriesResistance(parallelResistance: number, reactance: number): number {
  const rp = requirePositive('parallelResistance', parallelResistance, 'Parallel resistance', 'Ω');
  const x = requirePositive('reactance', reactance, 'Reactance', 'Ω');
  const q = rp / x;
  // R_p/(1 + Q²) = R_p X² / (X² + R_p²), written to stay finite when Q² overflows.
  const r = q > 1e150 ? (x / q) : rp / (1 + q * q);
  return finiteResistance(r, rp, x);
}

/** A converted resistance must be a finite number above zero; else the inputs are beyond arithmetic. */
function finiteResistance(r: number, given: number, reactance: number): number {
  if (Number.isFinite(r) && r > 0) return r;
  throw new DesignError('reactance', `A reactance of ${sayQuantity(reactance, 'Ω')} against ${sayQuantity(given, 'Ω')} is a Q of ${sayNumber(reactance / given)}: the equivalent resistance is beyond what can be computed. Check the values.`);
}
