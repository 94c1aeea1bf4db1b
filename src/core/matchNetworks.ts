/**
 * Two matching networks that need no tap on the coil, as plain formulas:
 * the capacitive divider (the tank capacitor split in two, the source at
 * the joint) and the L-network (one series and one shunt part).
 *
 * Capacitive divider. The source R_s sits across the lower capacitor C2; C1
 * runs from the joint to the top. Seen across the tank they must present the
 * wanted resistance R′ in parallel with the tank's capacitance C at ω:
 * Y = G′ + jB, G′ = 1/R′, B = ωC. Exact solution (derived here by the
 * series–parallel conversion, nothing else assumed): with
 * a = G′/(G′² + B²), b = B/(G′² + B²) (the series form of Y),
 *   ωC2 = G_s √((G′² + B²)/(G′ G_s) − 1),   1/(ωC1) = b − a R_s ωC2,
 * which exists when R_s < R′ < R_s (1 + Q′²), Q′ = ωC R′ (a step-up, and not
 * more than the tank's own Q at R′ allows). The usual high-Q values,
 * n = √(R′/R_s), C1 = nC/(n − 1), C2 = nC (the tapped-capacitor rule, e.g.
 * Bowick, *RF Circuit Design*, 1982, ch. 4, chapter from memory), assume the
 * source hardly loads C2: they hold while Q2 = ωC2 R_s ≫ 1 and fail when it
 * is a few (their actual R′ and capacitance are returned beside them).
 *
 * L-network between R_s and a larger R′ (lossless parts; Bowick 1982, ch. 4,
 * chapter from memory; the same algebra in Terman 1943):
 *   Q = √(R′/R_s − 1),  |X_series| = Q R_s,  |X_shunt| = R′/Q,
 * series part at the source, shunt part across R′ (the tank). Low-pass form:
 * series L, shunt C; high-pass form: series C, shunt L. The network alone
 * presents a pure R′, so the tank keeps its capacitance C beside the shunt
 * part. Across a tank the shunt part is usually folded into the tank
 * capacitor (one part fewer): the low-pass form's shunt C simply adds to it,
 * C + C_shunt; the high-pass form's shunt L, whose susceptance equals the
 * series capacitor's share 1/(ω X_shunt), is left out and the tank capacitor
 * reduced by that much, C − 1/(ω² L_shunt) (possible while that stays above
 * zero). Both are returned as `tankCapacitance`, the one capacitor across the
 * coil with the series part alone.
 */
import { TWO_PI } from './constants';
import { DesignError, requireFiniteResult, requireObject } from './errors';
import { note, type DesignNote } from './notes';
import { tankValue } from './tankModel';
import { sayNumber, sayPercent, sayQuantity } from './text';

/** What `capacitiveDivider` takes. SI units. */
export interface CapacitiveDividerInput {
  /** The tank capacitance the two capacitors replace (their series value at high Q), farads. */
  capacitance: number;
  /** Frequency of the match (the tank's resonance), hertz. */
  frequency: number;
  /** Source resistance at the joint, ohms. */
  sourceResistance: number;
  /** Resistance the source must be seen as across the whole tank, ohms (> sourceResistance). */
  presentedResistance: number;
  /** The rest of the tank's loading across the top (its own loss and the load), ohms, for the step-up; default: presentedResistance (a match). */
  restResistance?: number;
}

/** A capacitive divider, exact and by the usual rule. Farads, ohms. */
export interface CapacitiveDivider {
  /** C1, top to joint (exact). */
  upperCapacitance: number;
  /** C2, joint to ground, the source across it (exact). */
  lowerCapacitance: number;
  /** C1 C2/(C1 + C2): a little below the tank's capacitance, as the loaded lower branch acts as a larger capacitor. */
  seriesCapacitance: number;
  /** |V_top / V_joint| at the frequency with the exact values, the source driving the joint and the coil resonating C with `restResistance` across the top: Z_t/(Z_t + 1/(jωC1)), Z_t = R_rest ∥ jωL, ω²LC = 1. */
  stepUp: number;
  /** Q2 = ωC2 R_s of the lower branch (exact values): the usual rule needs it well above 1 (say 10). */
  branchQ: number;
  /** The usual high-Q values and what they would really give. */
  approximate: {
    /** n = √(R′/R_s). */
    stepUp: number;
    upperCapacitance: number;
    lowerCapacitance: number;
    /** Resistance they present across the tank, ohms. */
    presentedResistance: number;
    /** Capacitance they present across the tank, farads (should be the tank's). */
    capacitance: number;
    /** presentedResistance / wanted − 1. */
    resistanceError: number;
    /** capacitance / the tank's − 1. */
    capacitanceError: number;
    /** Q2 = ωC2 R_s with these values. */
    branchQ: number;
  };
  notes: DesignNote[];
}

/** The admittance across the top of C1 in series with (R_s ∥ C2) at ω. */
function dividerAdmittance(w: number, c1: number, c2: number, rs: number): { g: number; b: number } {
  // Z2 = 1/(G_s + jωC2); Z = Z2 − j/(ωC1); Y = 1/Z
  const gs = 1 / rs;
  const b2 = w * c2;
  const d2 = gs * gs + b2 * b2;
  const zr = gs / d2;
  const zi = -b2 / d2 - 1 / (w * c1);
  const d = zr * zr + zi * zi;
  return { g: zr / d, b: -zi / d };
}

/**
 * The two capacitors whose series combination is the tank's capacitance and
 * which present the source resistance R_s as R′ across the tank: exact, and
 * by the usual high-Q rule with what that rule really gives (module header).
 * @param input capacitance (F), frequency (Hz), sourceResistance and presentedResistance (Ω)
 * @throws DesignError('sourceResistance') when R_s ≥ R′ (a divider only steps up), or
 *   R′ > R_s (1 + Q′²) (a step-up the tank's Q does not allow)
 */
export function capacitiveDivider(input: CapacitiveDividerInput): CapacitiveDivider {
  const i = requireObject<CapacitiveDividerInput>('input', input, 'The divider');
  const c = tankValue('capacitance', i.capacitance, 'The tank capacitance', 'F');
  const f = tankValue('frequency', i.frequency, 'The frequency', 'Hz');
  const rs = tankValue('sourceResistance', i.sourceResistance, 'The source resistance', 'Ω');
  const rp = tankValue('presentedResistance', i.presentedResistance, 'The resistance to present', 'Ω');
  const rest = i.restResistance === undefined ? rp : tankValue('restResistance', i.restResistance, 'The rest of the tank\'s loading', 'Ω');
  const w = TWO_PI * f;
  if (!(rp > rs * (1 + 1e-9))) {
    throw new DesignError('sourceResistance', `The ${sayQuantity(rs, 'Ω')} source is not below the ${sayQuantity(rp, 'Ω')} it must be seen as across the tank: a capacitive divider only steps a resistance up. Connect the source across the top instead.`);
  }
  const qp = w * c * rp;
  if (!(rp / rs < 1 + qp * qp)) {
    throw new DesignError('sourceResistance', `Stepping ${sayQuantity(rs, 'Ω')} up to ${sayQuantity(rp, 'Ω')} needs more than the capacitance allows at ${sayQuantity(f, 'Hz')} (the step-up in resistance can be at most 1 + Q′² = ${sayNumber(1 + qp * qp)}, Q′ = ωC R′): use more tank capacitance, or a tap.`);
  }
  // a = G′/(G′² + B²) and b/(G′² + B²), written as R′/(1 + Q′²) and R′Q′/(1 + Q′²) so that nothing overflows
  const aSer = rp / (1 + qp * qp);
  const bSer = (rp * qp) / (1 + qp * qp);
  const gs = 1 / rs;
  const b2 = gs * Math.sqrt(1 / (aSer * gs) - 1);
  const x1 = bSer - aSer * rs * b2;
  const c1 = requireFiniteResult('capacitance', 1 / (w * x1), 'The upper capacitor');
  const c2 = requireFiniteResult('capacitance', b2 / w, 'The lower capacitor');
  // Z_t = R_rest ∥ jX_L with X_L = 1/(ωC): the coil resonating the tank's capacitance
  const xl = 1 / (w * c);
  const zt = { re: (rest * xl * xl) / (rest * rest + xl * xl), im: (rest * rest * xl) / (rest * rest + xl * xl) };
  const stepUp = Math.hypot(zt.re, zt.im) / Math.hypot(zt.re, zt.im - x1);
  const branchQ = b2 * rs;

  const n = Math.sqrt(rp / rs);
  const c1a = (n * c) / (n - 1);
  const c2a = n * c;
  const ya = dividerAdmittance(w, c1a, c2a, rs);
  const approxR = 1 / ya.g;
  const approxC = ya.b / w;
  const approximate = {
    stepUp: n,
    upperCapacitance: c1a,
    lowerCapacitance: c2a,
    presentedResistance: approxR,
    capacitance: approxC,
    resistanceError: approxR / rp - 1,
    capacitanceError: approxC / c - 1,
    branchQ: w * c2a * rs,
  };
  const notes: DesignNote[] = [];
  if (Math.abs(approximate.resistanceError) > 0.05 || Math.abs(approximate.capacitanceError) > 0.01) {
    notes.push(note('validity', `The usual values C1 = nC/(n − 1), C2 = nC assume the source hardly loads C2 (its Q = ωC2·R_s well above 10); here it is ${sayNumber(approximate.branchQ, 2)}, so they would present ${sayQuantity(approxR, 'Ω')} instead of ${sayQuantity(rp, 'Ω')} (${sayPercent(approximate.resistanceError)}) and ${sayQuantity(approxC, 'F')} instead of ${sayQuantity(c, 'F')} across the coil (${sayPercent(approximate.capacitanceError)}). Use the exact values.`, 'sourceResistance'));
  }
  return { upperCapacitance: c1, lowerCapacitance: c2, seriesCapacitance: (c1 * c2) / (c1 + c2), stepUp, branchQ, approximate, notes };
}

/** What `lNetwork` takes. SI units. */
export interface LNetworkInput {
  /** Frequency of the match, hertz. */
  frequency: number;
  /** Source resistance, ohms (the series part's side). */
  sourceResistance: number;
  /** Resistance to present it as, ohms (> sourceResistance; the shunt part's side, across the tank). */
  presentedResistance: number;
  /** The tank's capacitance across the coil, farads (optional): gives the tank capacitor to fit with each form. */
  capacitance?: number;
}

/** An L-network in both forms. Henries, farads. */
export interface LNetwork {
  /** Q = √(R′/R_s − 1) of the network. */
  networkQ: number;
  /** Series inductance from the source, shunt capacitance across the tank; `tankCapacitance` C + C_shunt: the tank capacitor with the shunt folded in. */
  lowPass: { seriesInductance: number; shuntCapacitance: number; tankCapacitance?: number };
  /** Series capacitance from the source, shunt inductance across the tank; `tankCapacitance` C − 1/(ω² L_shunt): the tank capacitor with the shunt inductor left out (absent when that is not above zero). */
  highPass: { seriesCapacitance: number; shuntInductance: number; tankCapacitance?: number };
  notes: DesignNote[];
}

/**
 * The L-network that presents R_s as R′ (R′ > R_s) at one frequency, in its
 * low-pass and high-pass forms (module header).
 * @throws DesignError('sourceResistance') unless R_s < R′ (this orientation only steps up)
 */
export function lNetwork(input: LNetworkInput): LNetwork {
  const i = requireObject<LNetworkInput>('input', input, 'The L-network');
  const f = tankValue('frequency', i.frequency, 'The frequency', 'Hz');
  const rs = tankValue('sourceResistance', i.sourceResistance, 'The source resistance', 'Ω');
  const rp = tankValue('presentedResistance', i.presentedResistance, 'The resistance to present', 'Ω');
  const c = i.capacitance === undefined ? undefined : tankValue('capacitance', i.capacitance, 'The tank capacitance', 'F');
  if (!(rp > rs * (1 + 1e-9))) {
    throw new DesignError('sourceResistance', `The ${sayQuantity(rs, 'Ω')} source is not below the ${sayQuantity(rp, 'Ω')} it must be seen as: an L-network with its series part at the source only steps up (and equal resistances need no network).`);
  }
  const w = TWO_PI * f;
  // Q² = R′/R_s − 1 without cancellation when R′ ≈ R_s
  const q = Math.sqrt((rp - rs) / rs);
  const xs = q * rs;
  const xp = rp / q;
  const shuntC = 1 / (w * xp);
  const shuntL = xp / w;
  const notes: DesignNote[] = [];
  const lowPass: LNetwork['lowPass'] = { seriesInductance: requireFiniteResult('frequency', xs / w, 'The series inductance'), shuntCapacitance: requireFiniteResult('frequency', shuntC, 'The shunt capacitance') };
  const highPass: LNetwork['highPass'] = { seriesCapacitance: requireFiniteResult('frequency', 1 / (w * xs), 'The series capacitance'), shuntInductance: requireFiniteResult('frequency', shuntL, 'The shunt inductance') };
  if (c !== undefined) {
    lowPass.tankCapacitance = c + shuntC;
    if (shuntC < c) highPass.tankCapacitance = c - shuntC;
    else notes.push(note('info', `The high-pass form's series capacitor adds ${sayQuantity(shuntC, 'F')} across the tank, more than its whole ${sayQuantity(c, 'F')}: keep its shunt inductor (${sayQuantity(shuntL, 'H')}) beside the tank rather than leaving it out.`, 'capacitance'));
  }
  if (q > 10) {
    notes.push(note('info', `The network's own Q is ${sayNumber(q, 2)}: the match is narrow and the series part's loss counts. A tap, a link or a capacitive divider does the same step-up with fewer extra parts.`));
  }
  return { networkQ: q, lowPass, highPass, notes };
}
