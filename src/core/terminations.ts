/**
 * What the source and load do to a tank: the power that reaches the load, and
 * when the terminations swamp the tank's own selectivity.
 *
 * - Transducer loss: the available power of the source, |V_s|²/(4 R_s), over
 *   the power delivered to the load, |V_load|²/R_load, in dB (Pozar,
 *   *Microwave Engineering*, ch. 11, transducer power gain; Mason's
 *   definition). It is the figure a receiver's front end loses from antenna
 *   to first stage, whatever the terminations. For equal source and load it
 *   equals the single-resonator insertion-loss rule −20 log10(1 − Q_L/Q_u)
 *   (see `insertionLoss`); for unequal ones it also counts the mismatch.
 * - Mismatch loss at a port: −10 log10(1 − |Γ|²), Γ = (Z_in − R_s)/(Z_in + R_s)
 *   (Pozar ch. 2). The transducer loss is exactly the mismatch loss plus the
 *   dissipative loss −10 log10(P_load/P_in) (power taken by the network
 *   itself).
 * - Collapse of the tank (a rule of our own, stated here): the terminations
 *   collapse the tank when they load it to a loaded Q below 2 (the −3 dB
 *   bandwidth is then over half the resonant frequency: the tank barely
 *   selects), or when they load it more than 20 times as heavily as its own
 *   losses (Q_e < Q_u/20) and leave a loaded Q below 10 (the level where the
 *   Q rules stop being good approximations). Then a tap on the coil, a link
 *   winding or a capacitive divider that presents the terminations to the
 *   tank at another resistance would buy selectivity for little loss:
 *   Q_L = Q_u/10 costs 0.92 dB by the insertion-loss rule. Both thresholds
 *   are chosen here (no published source): 2 where a tank stops behaving as
 *   one, 20 and 10 where matching clearly pays.
 */
import { DesignError, requireFinite, requireObject, requirePositive } from './errors';
import { note, type DesignNote } from './notes';
import { combineLoadedQ, insertionLoss } from './qRules';
import { sayNumber, sayQuantity } from './text';
import { type Complex } from './complex';

/** Loaded Q below which the terminations collapse the tank. */
export const COLLAPSE_LOADED_Q = 2;
/** Q_u/Q_e above which the terminations swamp the tank's own loss … */
export const COLLAPSE_LOAD_RATIO = 20;
/** … when the loaded Q is also below this. */
export const COLLAPSE_RATIO_LOADED_Q = 10;

/** −10 log10 of a power ratio in (0, 1], ≥ 0 (−0 turned into 0). */
function lossDb(ratio: number): number {
  return Math.max(0, -10 * Math.log10(ratio));
}

/**
 * Transducer loss from a source of resistance R_s to a load R_load:
 * L_T = −10 log10(P_load / P_av) dB with P_av = |V_s|²/(4 R_s) and
 * P_load = |V_load|²/R_load, so L_T = −10 log10(4 R_s |H|² / R_load) where
 * H = V_load/V_s is the voltage gain from the source's open-circuit voltage
 * (Pozar, *Microwave Engineering*, transducer power gain). Any passive
 * network between them gives L_T ≥ 0.
 * @param sourceResistance R_s in ohms (> 0)
 * @param loadResistance R_load in ohms (> 0)
 * @param voltageGain |V_load / V_s| (> 0, dimensionless), V_s the source's open-circuit voltage
 * @returns loss in dB (≥ 0)
 * @throws DesignError for a gain that would deliver more than the available power
 */
export function transducerLoss(sourceResistance: number, loadResistance: number, voltageGain: number): number {
  const rs = requirePositive('sourceResistance', sourceResistance, 'Source resistance', 'Ω');
  const rl = requirePositive('loadResistance', loadResistance, 'Load resistance', 'Ω');
  const h = requirePositive('voltageGain', voltageGain, 'Voltage gain');
  // 4 R_s |H|² / R_load, ordered so that no intermediate overflows or underflows needlessly.
  const gain = 4 * h * (h * (rs / rl));
  if (!(gain > 0) || !Number.isFinite(gain)) {
    throw new DesignError('voltageGain', `A voltage gain of ${sayNumber(h)} from ${sayQuantity(rs, 'Ω')} into ${sayQuantity(rl, 'Ω')} is beyond what can be computed. Check the values.`);
  }
  if (gain > 1 + 1e-9) {
    throw new DesignError('voltageGain', `A voltage gain of ${sayNumber(h)} from ${sayQuantity(rs, 'Ω')} into ${sayQuantity(rl, 'Ω')} would deliver ${sayNumber(gain)} times the source's available power: no passive network can (at most ${sayNumber(0.5 * Math.sqrt(rl / rs))}).`);
  }
  return lossDb(gain);
}

/**
 * Mismatch loss of a source of resistance R_s driving an input impedance
 * Z_in: −10 log10(1 − |Γ|²) = −10 log10(4 R_s Re Z_in / |Z_in + R_s|²) dB,
 * Γ = (Z_in − R_s)/(Z_in + R_s) (Pozar, *Microwave Engineering*, ch. 2).
 * @param sourceResistance R_s in ohms (> 0)
 * @param inputImpedance Z_in in ohms (Re > 0, finite)
 * @returns loss in dB (≥ 0; 0 when Z_in = R_s)
 */
export function mismatchLoss(sourceResistance: number, inputImpedance: Complex): number {
  const rs = requirePositive('sourceResistance', sourceResistance, 'Source resistance', 'Ω');
  const z = requireObject<Complex>('inputImpedance', inputImpedance, 'The input impedance');
  const re = requireFinite('inputImpedance', z.re, 'The input resistance');
  const im = requireFinite('inputImpedance', z.im, 'The input reactance');
  if (!(re > 0)) {
    throw new DesignError('inputImpedance', `An input resistance of ${sayQuantity(re, 'Ω')} takes no power from the source: give an input impedance with a positive resistance.`);
  }
  // In units of R_s: 4 r / ((1 + r)² + x²), with hypot so the squares cannot overflow.
  const r = re / rs;
  const x = im / rs;
  const h = Math.hypot(1 + r, x);
  const ratio = ((4 * r) / h) / h;
  if (!(ratio > 0) || !Number.isFinite(ratio)) {
    throw new DesignError('inputImpedance', `An input impedance of ${sayQuantity(re, 'Ω')} + j${sayQuantity(im, 'Ω')} against a ${sayQuantity(rs, 'Ω')} source is beyond what can be computed. Check the values.`);
  }
  return lossDb(Math.min(ratio, 1));
}

/**
 * Do the terminations collapse the tank? True when the loaded Q is below
 * `COLLAPSE_LOADED_Q` (2), or when Q_e < Q_u/`COLLAPSE_LOAD_RATIO` (20) and
 * the loaded Q is below `COLLAPSE_RATIO_LOADED_Q` (10). A rule of our own
 * (see the module header); loaded Q from 1/Q_L = 1/Q_u + 1/Q_e (Pozar).
 * @param unloadedQ Q_u of the tank alone (> 0; Infinity for ideal parts)
 * @param externalQ Q_e set by the terminations alone (> 0; Infinity for none: never a collapse)
 */
export function terminationsCollapse(unloadedQ: number, externalQ: number): boolean {
  const ql = combineLoadedQ(unloadedQ, externalQ);
  if (externalQ === Infinity) return false; // no terminations
  return ql < COLLAPSE_LOADED_Q || (externalQ * COLLAPSE_LOAD_RATIO < unloadedQ && ql < COLLAPSE_RATIO_LOADED_Q);
}

/** What `collapseNote` needs to say, in SI units. */
export interface CollapseFacts {
  mode: 'parallel' | 'series';
  unloadedQ: number;
  externalQ: number;
  loadedQ: number;
  /** Terminated −3 dB bandwidth and resonance, Hz. */
  bandwidth: number;
  frequency: number;
  sourceResistance?: number;
  loadResistance?: number;
  /** 1/Q shares of source and load (for which one dominates). */
  sourceShare: number;
  loadShare: number;
}

/**
 * The note `analyzeTank` gives when `terminationsCollapse` holds: level
 * 'validity' below Q_L = 2 (the tank no longer selects), 'info' otherwise;
 * its field is the termination that loads the tank most. Undefined when the
 * terminations do not collapse the tank.
 */
export function collapseNote(f: CollapseFacts): DesignNote | undefined {
  if (!Number.isFinite(f.externalQ) || !terminationsCollapse(f.unloadedQ, f.externalQ)) return undefined;
  const sourceLeads = f.sourceShare >= f.loadShare;
  const field = sourceLeads ? 'sourceResistance' : 'loadResistance';
  const say = (r: number | undefined) => sayQuantity(r as number, 'Ω');
  let who: string;
  if (f.sourceResistance !== undefined && f.loadResistance !== undefined) {
    const total = f.sourceShare + f.loadShare;
    const pct = (x: number) => `${sayNumber((100 * x) / total, 2)} %`;
    who = `Of that load, the ${say(f.sourceResistance)} source takes ${pct(f.sourceShare)} and the ${say(f.loadResistance)} load ${pct(f.loadShare)}.`;
  } else if (f.sourceResistance !== undefined) {
    who = `The ${say(f.sourceResistance)} source sets it.`;
  } else {
    who = `The ${say(f.loadResistance)} load sets it.`;
  }
  const qu = Number.isFinite(f.unloadedQ) ? `the tank's own Q_u = ${sayNumber(f.unloadedQ)}` : 'an ideal coil and capacitor';
  const figures = `external Q ${sayNumber(f.externalQ)} against ${qu}, a loaded Q of ${sayNumber(f.loadedQ)} and a −3 dB bandwidth of ${sayQuantity(f.bandwidth, 'Hz')} at ${sayQuantity(f.frequency, 'Hz')}`;
  const direction = f.mode === 'parallel' ? 'higher' : 'lower';
  const cost = sayNumber(insertionLoss(10, 1), 1);
  const remedy = `Instead of connecting ${f.sourceResistance !== undefined && f.loadResistance !== undefined ? 'them' : 'it'} straight to the tank, match through a tap on the coil, a link winding or a capacitive divider, which presents the termination to the tank at a ${direction} resistance and raises the loaded Q towards Q_u, at the cost of some insertion loss (a loaded Q of Q_u/10 costs about ${cost} dB).`;
  if (f.loadedQ < COLLAPSE_LOADED_Q) {
    return note('validity', `The source and load resistances collapse the tank: ${figures}, so it barely selects. ${who} ${remedy}`, field);
  }
  return note('info', `The source and load resistances set almost all of the tank's loss: ${figures}. ${who} ${remedy}`, field);
}
