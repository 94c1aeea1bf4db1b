/**
 * AC resistance and Q of a single-layer solenoid: skin effect plus the
 * proximity effect of the other turns.
 *
 * Model: Butterworth's method (S. Butterworth, "Eddy-current losses in
 * cylindrical conductors, with special applications to the alternating
 * current resistances of short coils", Phil. Trans. R. Soc. A 222 (1922),
 * pp. 57–100; and his papers in Experimental Wireless 1926). The loss in each
 * turn is the sum of
 *   1. the loss from its own current, exactly as for an isolated straight wire
 *      (skin effect, Bessel functions; see `skin.ts`), and
 *   2. the eddy-current loss of a round wire in a uniform transverse AC field
 *      H0, solved exactly with Bessel functions (the two add because their
 *      cross term vanishes around the wire). Per metre of wire, relative to R_dc:
 *         ΔR/R_dc = 8π² (a H0/I)² s² Γ(s),  Γ(s) = Re{ j/(2ζ) · conj(1 − 1/(2ζ)) },
 *      with s = a/δ, ζ = (q/2) J0(q)/J1(q), q = (1 − j)s; this reduces to
 *      Γ = Im(ζ)/(2|ζ|²). Limits: Γ → s²/8
 *      (the classical low-frequency eddy loss πσω²B²a⁴/8) and Γ → 1/(2s)
 *      (surface loss 2π a R_s H0²).
 * The field of the other turns at a wire is taken as that of a long current
 * sheet, H0 = K/2 = I/(2p) (axial; the mean of the field just inside, K, and
 * just outside, 0). Then
 *      proximityFactor = 1 + (π²/2)(d/p)² s² Γ(s) / F(s),   F = R_ac/R_dc straight,
 * which tends to 1 + (π²/2)(d/p)² at high frequency and to 1 at DC.
 *
 * Which turns see that field (our estimate, a reduction of the long-coil
 * picture, not a published method): the field at a turn comes from the OTHER
 * turns, so a single turn has none, and an end turn has other turns on one
 * side only. We take the mean square of that field over the turns as a share
 * g(N) of the long-coil value: each inner turn sees the full long-coil field,
 * the two end turns half of it (a quarter of the loss), so
 *      g = 1 − 1.5/N for N ≥ 2,   g = (N − 1)/4 for 1 ≤ N < 2,   g = 0 for N ≤ 1,
 * and proximityFactor = 1 + g (π²/2)(d/p)² s² Γ(s)/F(s). The leads carry skin
 * effect only. A sum of the other turns' fields at each turn's centre
 * (circular filaments) would say the inner turns of a short coil see less
 * than a long coil's field, but Medhurst's measurements (1947), as we recall
 * them (from memory; his table is not used here), show short close-wound coils
 * losing more than long ones: the end turns' strong radial field and the
 * field's non-uniformity across each wire. Until a field solution settles it,
 * the long-coil value for inner turns is kept as the cautious (higher-loss)
 * choice.
 *
 * Known bias: for a long coil, Butterworth's uniform-field method overstates
 * the resistance against an exact periodic solution of the long coil, more and
 * more as d/p grows: about +16 % at d/p = 0.5, +25 % at 0.6, +36 % at 0.7,
 * +61 % at 0.9 and +74 % close-wound (exact periodic long-coil solution,
 * figures in the project's issue, not yet reproduced here; read as the
 * high-frequency limit). We turn each figure into the overstated share φ of
 * the proximity term, φ = 1 − ((1 + e)/(1 + bias) − 1)/e with e = (π²/2)(d/p)²
 * (φ ≈ (d/p)/2: 0.25 at 0.5 … 0.51 close-wound), interpolate φ linearly in d/p
 * (and to 0 at d/p = 0), and apply it at every frequency and turn count. So
 * the resistance may be lower, and Q higher, than stated by that bias.
 *
 * Uncertainty (our estimate, not a measured figure): beyond that known bias,
 * ±(3 % + 30 % of the proximity share of the loss) for d/p ≤ 0.7 and l/D ≥ 1,
 * and ±(3 % + 50 % of it) outside that range. The band is returned one-sided
 * where the bias is known: R from R/((1 + bias)(1 + u)) to R (1 + u), Q from
 * Q/(1 + u) to Q (1 + bias)(1 + u).
 *
 * Why not Medhurst's table: Medhurst (Wireless Engineer 24, 1947, pp. 35–43
 * and 80–92) measured the ratio of coil resistance to straight-wire resistance
 * against d/p and l/D. We could not source his table values reliably, so they
 * are not used (none are invented here).
 */
import { COPPER_RESISTIVITY_20C, COPPER_TEMPERATURE_COEFFICIENT, TWO_PI } from './constants';
import { DesignError, requireFiniteResult, requireNonNegative, requireObject, requirePositive } from './errors';
import { note, type DesignNote } from './notes';
import { internalImpedanceRatio, internalRatioFromZeta, skinDepth } from './skin';
import { sayMm, sayNumber } from './text';
import { resistivityAtTemperature, wireLengthForCoil } from './wire';

/** Pitch ratio d/p above which the uniform-field proximity model is outside its comfortable range. */
export const PROXIMITY_CLOSE_SPACING = 0.7;
/** Length/diameter below which end fields make the long-coil field assumption doubtful. */
export const PROXIMITY_SHORT_COIL = 1;

/**
 * Loss of a round wire in a uniform transverse AC field H0, relative to R_dc of
 * the wire for its own current I: ΔR/R_dc = 8π² (a H0/I)² s² Γ(s). Returns s² Γ(s).
 * @param s radius over skin depth a/δ (≥ 0)
 */
export function transverseFieldLoss(s: number): number {
  requireNonNegative('s', s, 'The radius-to-skin-depth ratio');
  if (s === 0) return 0;
  return requireFiniteResult('s', transverseFromZeta(s, internalImpedanceRatio(s)), 'The transverse-field loss');
}

/**
 * Mean square of the other turns' field at a turn, as a share of the long-coil
 * value H0² = (I/2p)² (our estimate; see the module header): 0 for one turn,
 * (N − 1)/4 up to two turns, 1 − 1.5/N from two turns on (inner turns the full
 * field, the two end turns half of it).
 * @param turns N (≥ 0, fractional allowed)
 */
export function proximityFieldFactor(turns: number): number {
  requireNonNegative('turns', turns, 'Number of turns');
  if (turns <= 1) return 0;
  if (turns < 2) return (turns - 1) / 4;
  return 1 - 1.5 / turns;
}

/**
 * Butterworth's long-coil resistance against an exact periodic solution of the
 * long coil, high-frequency limit: [d/p, fraction by which Butterworth's R is
 * higher]. Exact periodic long-coil solution, figures in the project's issue,
 * not yet reproduced here.
 */
export const BUTTERWORTH_LONG_COIL_BIAS: readonly (readonly [number, number])[] = [
  [0.5, 0.16], [0.6, 0.25], [0.7, 0.36], [0.9, 0.61], [1, 0.74],
];

/** φ at each point of BUTTERWORTH_LONG_COIL_BIAS: the overstated share of the proximity term. */
const OVERSTATED_SHARE: readonly (readonly [number, number])[] = [
  [0, 0],
  ...BUTTERWORTH_LONG_COIL_BIAS.map(([x, bias]) => {
    const e = ((Math.PI * Math.PI) / 2) * x * x;
    return [x, 1 - ((1 + e) / (1 + bias) - 1) / e] as const;
  }),
];

/** Overstated share φ(d/p) of the proximity term, interpolated linearly (our reading of the figures above). */
function overstatedShare(pitchRatio: number): number {
  for (let i = 1; i < OVERSTATED_SHARE.length; i++) {
    const [x1, y1] = OVERSTATED_SHARE[i];
    if (pitchRatio <= x1) {
      const [x0, y0] = OVERSTATED_SHARE[i - 1];
      return y0 + ((y1 - y0) * (pitchRatio - x0)) / (x1 - x0);
    }
  }
  return OVERSTATED_SHARE[OVERSTATED_SHARE.length - 1][1];
}

/** s² Γ from ζ: with u = 1/(2ζ), Re{j u conj(1 − u)} = Re{j (u − |u|²)} = −Im(u) = Im(ζ)/(2|ζ|²). */
function transverseFromZeta(s: number, [zr, zi]: readonly [number, number]): number {
  const u = s / Math.hypot(zr, zi); // s/|ζ| stays near √2 at high frequency: nothing overflows
  return (u * u * zi) / 2;
}

export interface ProximityInput {
  /** Frequency in hertz (≥ 0). */
  frequency: number;
  /** Number of turns N (≥ 1); omitted: a long coil (every turn sees the full long-coil field). */
  turns?: number;
  /** Bare wire diameter d in metres (> 0). */
  wireDiameter: number;
  /** Pitch p in metres, centre to centre (≥ wireDiameter). */
  pitch: number;
  /** Resistivity in Ω·m at the working temperature (default copper at 20 °C). */
  resistivity?: number;
}

export interface ProximityResult {
  /** R_ac/R_dc of the same wire straight and isolated (skin effect alone). */
  skinRatio: number;
  /** Coil AC resistance over straight-wire AC resistance (≥ 1). */
  proximityFactor: number;
  /** Share g of the long-coil field's square the turns see (1 for a long coil; see `proximityFieldFactor`). */
  fieldFactor: number;
  /** a/δ. */
  radiusOverSkinDepth: number;
}

/**
 * Proximity factor of a single-layer solenoid by Butterworth's method
 * (uniform transverse field on each turn, the long-coil H0 = I/(2p) reduced
 * by g(N) for end turns and few turns; see the module header):
 * proximityFactor = 1 + g (π²/2)(d/p)² s² Γ(s)/F(s).
 * Inputs in SI; best for l/D ≥ 1 and d/p ≤ 0.7; overstates the loss of close-wound coils
 * (see `BUTTERWORTH_LONG_COIL_BIAS`).
 */
export function solenoidProximityFactor(input: ProximityInput): ProximityResult {
  requireObject<ProximityInput>('input', input, 'The coil');
  const { frequency, wireDiameter, pitch, resistivity = COPPER_RESISTIVITY_20C } = input;
  requireNonNegative('frequency', frequency, 'Frequency', 'Hz');
  requirePositive('wireDiameter', wireDiameter, 'Wire diameter', 'm');
  requirePositive('pitch', pitch, 'Pitch', 'm');
  requirePositive('resistivity', resistivity, 'Resistivity');
  const fieldFactor = input.turns === undefined ? 1 : proximityFieldFactor(requirePositive('turns', input.turns, 'Number of turns'));
  checkPitch(pitch, wireDiameter);
  if (frequency === 0) return { skinRatio: 1, proximityFactor: 1, fieldFactor, radiusOverSkinDepth: 0 };
  const s = wireDiameter / 2 / skinDepth(frequency, resistivity);
  if (!Number.isFinite(s)) {
    throw new DesignError('frequency', 'The wire is beyond computing at this frequency: its radius is more than 1e308 skin depths.');
  }
  const zeta = internalImpedanceRatio(s);
  const skinRatio = zeta[0];
  const ratio = wireDiameter / pitch;
  const geometric = fieldFactor * ((Math.PI * Math.PI) / 2) * ratio * ratio;
  return { skinRatio, proximityFactor: 1 + (geometric * transverseFromZeta(s, zeta)) / skinRatio, fieldFactor, radiusOverSkinDepth: s };
}

function checkPitch(pitch: number, wireDiameter: number): void {
  if (pitch < wireDiameter * (1 - 1e-9)) {
    throw new DesignError(
      'pitch',
      `Pitch ${sayMm(pitch)} is smaller than the wire's ${sayMm(wireDiameter)} diameter: turns would overlap.`,
    );
  }
}

export interface CoilResistanceInput {
  /** Frequency in hertz (≥ 0). */
  frequency: number;
  /** Number of turns N (> 0). */
  turns: number;
  /** Winding diameter D in metres, wire centre to wire centre (> 0). */
  diameter: number;
  /** Pitch p in metres, centre to centre (≥ wireDiameter). */
  pitch: number;
  /** Bare wire diameter d in metres (> 0). */
  wireDiameter: number;
  /** Winding length l in metres (default N · p). Used for l/D. */
  length?: number;
  /** Length of EACH lead in metres (default 0): counted with skin effect, no proximity. */
  leadLength?: number;
  /** Wire temperature in °C (default 20). */
  temperature?: number;
  /** Resistivity at 20 °C in Ω·m (default annealed copper, IEC 60028). */
  resistivity?: number;
  /** Temperature coefficient in 1/K (default copper 0.00393, IEC 60028). */
  temperatureCoefficient?: number;
}

/** How far a stated value may lie from the truth, as fractions of it (0.2 = 20 %). */
export interface Uncertainty {
  /** The true value may be lower than stated by up to this fraction. */
  below: number;
  /** The true value may be higher than stated by up to this fraction. */
  above: number;
}

export interface CoilResistance {
  /** DC resistance of winding and leads, ohms. */
  dcResistance: number;
  /** AC resistance of winding and leads, ohms. */
  acResistance: number;
  /** Lowest AC resistance the models allow, ohms: acResistance / ((1 + longCoilBias)(1 + modelError)). */
  acResistanceLow: number;
  /** Highest AC resistance the models allow, ohms: acResistance · (1 + modelError). */
  acResistanceHigh: number;
  /** The band of acResistance as fractions of it (one-sided where the bias is known). */
  resistanceUncertainty: Uncertainty;
  /** Skin-effect ratio of the wire, straight and isolated. */
  skinRatio: number;
  /** Proximity factor of the winding (coil AC resistance / straight-wire AC resistance). */
  proximityFactor: number;
  /** Share of the long-coil field's square the turns see (see `proximityFieldFactor`). */
  fieldFactor: number;
  /** Fraction by which acResistance is likely too high: Butterworth's overstatement for close turns (see `BUTTERWORTH_LONG_COIL_BIAS`). */
  longCoilBias: number;
  /** Our estimate of the model's other error, either way (fraction): 3 % + 30 % (50 % outside l/D ≥ 1, d/p ≤ 0.7) of the proximity share. */
  modelError: number;
  /** Wire length used, metres (helix plus both leads). */
  wireLength: number;
  notes: DesignNote[];
}

/**
 * AC resistance of a single-layer solenoid: R_ac = R_dc,winding · F · P + R_dc,leads · F,
 * F the straight-wire skin ratio (exact), P the proximity factor (Butterworth's method with
 * our reduction for end turns and few turns; see the module header). R_dc from IEC 60028
 * copper at the given temperature. Inputs in SI (m, Hz, °C, Ω·m). Returns the band
 * [acResistanceLow, acResistanceHigh], one-sided where Butterworth's bias is known, and
 * notes stating its size; 'validity' notes outside l/D ≥ 1 and d/p ≤ 0.7.
 */
export function coilAcResistance(input: CoilResistanceInput): CoilResistance {
  requireObject<CoilResistanceInput>('input', input, 'The coil');
  const { frequency, turns, diameter, pitch, wireDiameter, leadLength = 0 } = input;
  requireNonNegative('frequency', frequency, 'Frequency', 'Hz');
  requirePositive('turns', turns, 'Number of turns');
  requirePositive('diameter', diameter, 'Coil diameter', 'm');
  requirePositive('pitch', pitch, 'Pitch', 'm');
  requirePositive('wireDiameter', wireDiameter, 'Wire diameter', 'm');
  requireNonNegative('leadLength', leadLength, 'Lead length', 'm');
  checkPitch(pitch, wireDiameter);
  if (wireDiameter >= diameter) {
    throw new DesignError('wireDiameter', `The wire (${sayMm(wireDiameter)}) is as thick as the coil diameter: it cannot be wound so.`);
  }
  const length = input.length ?? turns * pitch;
  requirePositive('length', length, 'Coil length', 'm');

  const { rho, wireLength, rWinding, rLeads } = dcParts(input);
  const { skinRatio, proximityFactor, fieldFactor } = solenoidProximityFactor({ frequency, wireDiameter, pitch, resistivity: rho, turns });
  const skinWinding = rWinding * skinRatio;
  const acResistance = requireFiniteResult('frequency', skinWinding * proximityFactor + rLeads * skinRatio, 'The AC resistance');

  const pitchRatio = wireDiameter / pitch;
  const lengthRatio = length / diameter;
  const inRange = pitchRatio <= PROXIMITY_CLOSE_SPACING && lengthRatio >= PROXIMITY_SHORT_COIL;
  // Known bias: the proximity term is overstated by the share φ(d/p).
  const proximityPart = skinWinding * (proximityFactor - 1);
  const longCoilBias = acResistance > 0 ? proximityPart * overstatedShare(pitchRatio) / (acResistance - proximityPart * overstatedShare(pitchRatio)) : 0;
  const proximityShare = acResistance > 0 ? proximityPart / acResistance : 0;
  const modelError = 0.03 + (inRange ? 0.3 : 0.5) * proximityShare;
  const acResistanceLow = acResistance / ((1 + longCoilBias) * (1 + modelError));
  const acResistanceHigh = acResistance * (1 + modelError);

  const notes: DesignNote[] = [];
  if (fieldFactor > 0 && pitchRatio > PROXIMITY_CLOSE_SPACING) {
    notes.push(note('validity', `Wire diameter/pitch is ${sayNumber(pitchRatio, 2)}: for turns this close Butterworth's method overstates the proximity loss; against an exact solution for a long coil it gives about ${percent(biasAtHighFrequency(pitchRatio))} too much resistance at high frequency${pitchRatio < 0.99 ? ' (74 % close-wound)' : ''}, so Q may be that much higher.`, 'pitch'));
  }
  if (fieldFactor > 0 && lengthRatio < PROXIMITY_SHORT_COIL) {
    notes.push(note('validity', `Length/diameter is ${sayNumber(lengthRatio, 2)}: the proximity model assumes a coil at least as long as it is wide; the end fields of short coils change the loss, so the model's own error is taken as ±${percent(modelError)} here (3 % plus half the proximity share of the loss).`, 'length'));
  }
  if (turns < 3 && frequency > 0) {
    notes.push(note('info', fieldFactor === 0
      ? 'A single turn has no neighbours: its AC resistance is the skin effect of the wire alone (no proximity loss).'
      : `With ${sayNumber(turns)} turns the proximity loss is our estimate: each end turn is taken to see half the field a turn of a long coil sees (${percent(fieldFactor)} of the long-coil proximity loss overall).`, 'turns'));
  }
  notes.push(note('info', `AC resistance by Butterworth's method (exact skin effect; proximity loss in the field of the other turns). The true value may be up to ${percent(1 - acResistanceLow / acResistance)} lower than stated${describeBias(longCoilBias, modelError)} and up to ${percent(modelError)} higher, by our estimate.`));
  return {
    dcResistance: rWinding + rLeads,
    acResistance,
    acResistanceLow,
    acResistanceHigh,
    resistanceUncertainty: { below: acResistance > 0 ? 1 - acResistanceLow / acResistance : 0, above: modelError },
    skinRatio,
    proximityFactor,
    fieldFactor,
    longCoilBias,
    modelError,
    wireLength,
    notes,
  };
}

/** Resistivity at the temperature, wire length and DC resistances of winding and leads (inputs checked by the caller). */
function dcParts(input: CoilResistanceInput): { rho: number; wireLength: number; rWinding: number; rLeads: number } {
  const { turns, diameter, pitch, wireDiameter, leadLength = 0, temperature = 20 } = input;
  const rho = resistivityAtTemperature(temperature, input.resistivity ?? COPPER_RESISTIVITY_20C, input.temperatureCoefficient ?? COPPER_TEMPERATURE_COEFFICIENT);
  const windingLength = wireLengthForCoil({ turns, diameter, pitch });
  const wireLength = requireFiniteResult('leadLength', windingLength + 2 * leadLength, 'The wire length');
  // ρ ℓ / (π d²/4), grouped so that a huge coil overflows to a DesignError, never to Infinity
  const perMetre = ((rho / wireDiameter / wireDiameter) * 4) / Math.PI;
  const rWinding = requireFiniteResult('turns', perMetre * windingLength, 'The winding’s resistance');
  const rLeads = requireFiniteResult('leadLength', perMetre * 2 * leadLength, 'The leads’ resistance');
  return { rho, wireLength, rWinding, rLeads };
}

/**
 * AC resistance (as `coilAcResistance`) and the wire's internal-inductance ratio
 * (as `wireInternalImpedance`) at many frequencies, for plots: the inputs are
 * checked once, and each point costs one evaluation of the Bessel ratio.
 * Values equal those of the single-frequency functions.
 * @param input the coil, as for `coilAcResistance` (its `frequency` is ignored)
 * @param frequencies hertz, each > 0
 */
export function solenoidLossSweep(
  input: Omit<CoilResistanceInput, 'frequency'>,
  frequencies: ArrayLike<number>,
): { acResistance: Float64Array; internalInductanceRatio: Float64Array } {
  const n = frequencies.length;
  const acResistance = new Float64Array(n);
  const internalInductanceRatio = new Float64Array(n);
  if (n === 0) return { acResistance, internalInductanceRatio };
  coilAcResistance({ ...input, frequency: frequencies[0] }); // checks the inputs once
  const { rho, rWinding, rLeads } = dcParts({ ...input, frequency: 0 });
  const fieldFactor = proximityFieldFactor(input.turns);
  const ratio = input.wireDiameter / input.pitch;
  const geometric = fieldFactor * ((Math.PI * Math.PI) / 2) * ratio * ratio;
  for (let i = 0; i < n; i++) {
    const s = input.wireDiameter / 2 / skinDepth(frequencies[i], rho);
    const zeta = internalImpedanceRatio(s);
    const skinRatio = zeta[0];
    const proximityFactor = 1 + (geometric * transverseFromZeta(s, zeta)) / skinRatio;
    acResistance[i] = rWinding * skinRatio * proximityFactor + rLeads * skinRatio;
    internalInductanceRatio[i] = internalRatioFromZeta(s, zeta);
  }
  return { acResistance, internalInductanceRatio };
}

/** Butterworth's high-frequency overstatement of R for a long coil at this d/p (interpolated through φ). */
function biasAtHighFrequency(pitchRatio: number): number {
  const e = ((Math.PI * Math.PI) / 2) * pitchRatio * pitchRatio;
  const phi = overstatedShare(pitchRatio);
  return (phi * e) / (1 + (1 - phi) * e);
}

/** What the lower (R) or upper (Q) side of the band is made of. */
function describeBias(longCoilBias: number, modelError: number): string {
  if (longCoilBias < 0.005) return '';
  return ` (the method overstates the loss of close turns by about ${percent(longCoilBias)} here, and the model's other error is ${percent(modelError)})`;
}

/** A fraction as a whole percentage without sign: 0.236 → "24 %" (below 1 %: one decimal). */
function percent(fraction: number): string {
  const p = fraction * 100;
  return `${p < 1 ? sayNumber(p, 1) : Math.round(p)} %`;
}

export interface CoilQInput extends CoilResistanceInput {
  /** Inductance L in henries (> 0), e.g. from the solenoid module. */
  inductance: number;
}

export interface CoilQ extends CoilResistance {
  /** Unloaded Q = ωL/R_ac (0 at DC). */
  q: number;
  /** Lowest Q the models allow: ωL / acResistanceHigh. */
  qLow: number;
  /** Highest Q the models allow: ωL / acResistanceLow (one-sided: Butterworth's known overstatement raises it). */
  qHigh: number;
  /** The band of Q as fractions of q: Q may be lower by `below`, higher by `above`. */
  qUncertainty: Uncertainty;
}

/**
 * Unloaded Q of a single-layer solenoid, Q = ωL/R_ac, with R_ac from `coilAcResistance`.
 * The inductance is taken as given (plain number). Self-capacitance is not
 * included: near self-resonance use `apparentCoil` on the result.
 * The band: qLow = ωL/acResistanceHigh, qHigh = ωL/acResistanceLow; its size is stated in a note.
 */
export function coilQ(input: CoilQInput): CoilQ {
  requireObject<CoilQInput>('input', input, 'The coil');
  requirePositive('inductance', input.inductance, 'Inductance', 'H');
  const r = coilAcResistance(input);
  const w = TWO_PI * input.frequency;
  // ωL/R grouped as (ω/R)·L or ω·(L/R), whichever stays finite
  const qOf = (resistance: number) => requireFiniteResult('inductance', w * (input.inductance / resistance), 'The Q');
  const q = qOf(r.acResistance);
  const qLow = qOf(r.acResistanceHigh);
  const qHigh = qOf(r.acResistanceLow);
  const qUncertainty: Uncertainty = q > 0 ? { below: 1 - qLow / q, above: qHigh / q - 1 } : { below: 0, above: 0 };
  const notes = r.notes.map((n) =>
    n.level === 'info' && n.message.startsWith('AC resistance by Butterworth')
      ? note('info', `Q from Butterworth's AC resistance (exact skin effect; proximity loss in the field of the other turns). The true Q may be up to ${percent(qUncertainty.above)} higher than stated${describeBias(r.longCoilBias, r.modelError)} and up to ${percent(qUncertainty.below)} lower, by our estimate.`)
      : n,
  );
  return { ...r, notes, q, qLow, qHigh, qUncertainty };
}
