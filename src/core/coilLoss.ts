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
 * Why not Medhurst's table: Medhurst (Wireless Engineer 24, 1947, pp. 35–43
 * and 80–92) measured the ratio of coil resistance to straight-wire resistance
 * against d/p and l/D. We could not source his table values reliably, so they
 * are not used (none are invented here).
 *
 * Expected uncertainty (our estimate, not a measured figure): the
 * uniform-field picture ignores (a) the non-uniform field of the nearest
 * turns, which matters as d/p → 1 and makes this model OVERSTATE the
 * proximity loss of close-wound coils (at d/p = 1 it gives 5.9 at high
 * frequency; Dowell's one-dimensional layer model gives about 2√π ≈ 3.5 for a
 * long close-wound single layer), and (b) the end fields of short coils (l/D < 1).
 * We report ±(3 % + 30 % of the proximity share of the loss) for d/p ≤ 0.7 and
 * l/D ≥ 1, and ±(3 % + 50 % of it) outside that range, with 'validity' notes.
 */
import { COPPER_RESISTIVITY_20C, COPPER_TEMPERATURE_COEFFICIENT, TWO_PI } from './constants';
import { DesignError, requireNonNegative, requirePositive } from './errors';
import { note, type DesignNote } from './notes';
import { internalImpedanceRatio, skinDepth } from './skin';
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
  if (s === 0) return 0;
  return transverseFromZeta(s, internalImpedanceRatio(s));
}

/** s² Γ from ζ: with u = 1/(2ζ), Re{j u conj(1 − u)} = Re{j (u − |u|²)} = −Im(u) = Im(ζ)/(2|ζ|²). */
function transverseFromZeta(s: number, [zr, zi]: readonly [number, number]): number {
  return (s * s * zi) / (2 * (zr * zr + zi * zi));
}

export interface ProximityInput {
  /** Frequency in hertz (≥ 0). */
  frequency: number;
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
  /** a/δ. */
  radiusOverSkinDepth: number;
}

/**
 * Proximity factor of a long single-layer solenoid by Butterworth's method
 * (uniform transverse field H0 = I/(2p) on each turn; see the module header):
 * proximityFactor = 1 + (π²/2)(d/p)² s² Γ(s)/F(s).
 * Inputs in SI; valid best for l/D ≥ 1 and d/p ≤ 0.7, overstating the loss of close-wound coils.
 */
export function solenoidProximityFactor({ frequency, wireDiameter, pitch, resistivity = COPPER_RESISTIVITY_20C }: ProximityInput): ProximityResult {
  requireNonNegative('frequency', frequency, 'Frequency');
  requirePositive('wireDiameter', wireDiameter, 'Wire diameter');
  requirePositive('pitch', pitch, 'Pitch');
  requirePositive('resistivity', resistivity, 'Resistivity');
  checkPitch(pitch, wireDiameter);
  if (frequency === 0) return { skinRatio: 1, proximityFactor: 1, radiusOverSkinDepth: 0 };
  const s = wireDiameter / 2 / skinDepth(frequency, resistivity);
  const zeta = internalImpedanceRatio(s);
  const skinRatio = zeta[0];
  const ratio = wireDiameter / pitch;
  const extra = ((Math.PI * Math.PI) / 2) * ratio * ratio * transverseFromZeta(s, zeta);
  return { skinRatio, proximityFactor: 1 + extra / skinRatio, radiusOverSkinDepth: s };
}

function checkPitch(pitch: number, wireDiameter: number): void {
  if (pitch < wireDiameter * (1 - 1e-9)) {
    throw new DesignError(
      'pitch',
      `Pitch ${(pitch * 1e3).toPrecision(3)} mm is smaller than the wire's ${(wireDiameter * 1e3).toPrecision(3)} mm diameter: turns would overlap.`,
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

export interface CoilResistance {
  /** DC resistance of winding and leads, ohms. */
  dcResistance: number;
  /** AC resistance of winding and leads, ohms. */
  acResistance: number;
  /** Skin-effect ratio of the wire, straight and isolated. */
  skinRatio: number;
  /** Proximity factor of the winding (coil AC resistance / straight-wire AC resistance). */
  proximityFactor: number;
  /** Relative uncertainty of acResistance (e.g. 0.2 for ±20 %), our estimate. */
  uncertainty: number;
  /** Wire length used, metres (helix plus both leads). */
  wireLength: number;
  notes: DesignNote[];
}

/**
 * AC resistance of a single-layer solenoid: R_ac = R_dc,winding · F · P + R_dc,leads · F,
 * F the straight-wire skin ratio (exact), P the proximity factor (Butterworth's method,
 * long-coil field; see the module header). R_dc from IEC 60028 copper at the given temperature.
 * Inputs in SI (m, Hz, °C, Ω·m). Returns an uncertainty and 'validity' notes outside l/D ≥ 1, d/p ≤ 0.7.
 */
export function coilAcResistance(input: CoilResistanceInput): CoilResistance {
  const {
    frequency, turns, diameter, pitch, wireDiameter,
    leadLength = 0, temperature = 20,
    resistivity = COPPER_RESISTIVITY_20C, temperatureCoefficient = COPPER_TEMPERATURE_COEFFICIENT,
  } = input;
  requireNonNegative('frequency', frequency, 'Frequency');
  requirePositive('turns', turns, 'Number of turns');
  requirePositive('diameter', diameter, 'Coil diameter');
  requirePositive('pitch', pitch, 'Pitch');
  requirePositive('wireDiameter', wireDiameter, 'Wire diameter');
  requireNonNegative('leadLength', leadLength, 'Lead length');
  checkPitch(pitch, wireDiameter);
  if (wireDiameter >= diameter) {
    throw new DesignError('wireDiameter', `The wire (${(wireDiameter * 1e3).toPrecision(3)} mm) is as thick as the coil diameter: it cannot be wound so.`);
  }
  const length = input.length ?? turns * pitch;
  requirePositive('length', length, 'Coil length');

  const rho = resistivityAtTemperature(temperature, resistivity, temperatureCoefficient);
  const area = (Math.PI * wireDiameter * wireDiameter) / 4;
  const windingLength = wireLengthForCoil({ turns, diameter, pitch });
  const wireLength = windingLength + 2 * leadLength;
  const rWinding = (rho * windingLength) / area;
  const rLeads = (rho * 2 * leadLength) / area;
  const { skinRatio, proximityFactor } = solenoidProximityFactor({ frequency, wireDiameter, pitch, resistivity: rho });
  const acResistance = rWinding * skinRatio * proximityFactor + rLeads * skinRatio;

  const notes: DesignNote[] = [];
  const pitchRatio = wireDiameter / pitch;
  const lengthRatio = length / diameter;
  const inRange = pitchRatio <= PROXIMITY_CLOSE_SPACING && lengthRatio >= PROXIMITY_SHORT_COIL;
  if (pitchRatio > PROXIMITY_CLOSE_SPACING) {
    notes.push(note('validity', `Wire diameter/pitch is ${pitchRatio.toFixed(2)}: for turns this close the proximity model is expected to overstate the loss (so understate Q), by as much as about 1.7 times for close winding.`, 'pitch'));
  }
  if (lengthRatio < PROXIMITY_SHORT_COIL) {
    notes.push(note('validity', `Length/diameter is ${lengthRatio.toPrecision(2)}: the proximity model assumes a coil at least as long as it is wide; end fields of short coils change the loss.`, 'length'));
  }
  const proximityShare = 1 - 1 / proximityFactor; // share of the winding's AC loss due to proximity
  const uncertainty = 0.03 + (inRange ? 0.3 : 0.5) * proximityShare;
  notes.push(note('info', `AC resistance by Butterworth's method (exact skin effect, long-coil proximity field); expected uncertainty about ±${Math.round(uncertainty * 100)} %.`));
  return { dcResistance: rWinding + rLeads, acResistance, skinRatio, proximityFactor, uncertainty, wireLength, notes };
}

export interface CoilQInput extends CoilResistanceInput {
  /** Inductance L in henries (> 0), e.g. from the solenoid module. */
  inductance: number;
}

export interface CoilQ extends CoilResistance {
  /** Unloaded Q = ωL/R_ac (Infinity at DC). */
  q: number;
}

/**
 * Unloaded Q of a single-layer solenoid, Q = ωL/R_ac, with R_ac from `coilAcResistance`.
 * The inductance is taken as given (plain number). Self-capacitance is not
 * included: near self-resonance use `apparentCoil` on the result.
 * The relative uncertainty of Q equals that of R_ac.
 */
export function coilQ(input: CoilQInput): CoilQ {
  requirePositive('inductance', input.inductance, 'Inductance');
  const r = coilAcResistance(input);
  const q = (TWO_PI * input.frequency * input.inductance) / r.acResistance;
  return { ...r, q };
}
