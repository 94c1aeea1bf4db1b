/**
 * Resonance of an ideal (lossless) inductor and capacitor.
 *
 * Model: Thomson's formula for an LC circuit, f = 1 / (2π √(LC)), and the
 * reactances X_L = 2π f L, X_C = 1 / (2π f C) that are equal at resonance.
 * Sources: Terman, *Radio Engineers' Handbook* (1943), section 3; any circuit
 * text. Valid for lumped parts: well below the coil's self-resonance (see
 * `selfCapacitance`) and with Q high enough that loss does not shift the peak
 * (the tank module handles lossy tanks).
 *
 * Every function refuses a missing, non-numeric, non-finite or non-positive
 * input, and a result that would overflow or underflow (inputs near 1e±300)
 * with a DesignError, never a silent Infinity or zero.
 */
import { TWO_PI } from './constants';
import { DesignError, requirePositive } from './errors';
import { sayQuantity } from './text';

/** Smallest positive double with full precision (below it, subnormals lose digits). */
const MIN_NORMAL = 2.2250738585072014e-308;

/**
 * A result that must be a finite number above zero. Extreme inputs (1e±300)
 * can overflow or underflow the arithmetic; then the input farther from 1 in
 * its unit is named, never a silent Infinity or 0.
 */
function requireResult(value: number, what: string, inputs: ReadonlyArray<readonly [string, number, string]>): number {
  if (Number.isFinite(value) && value >= MIN_NORMAL) return value;
  let [field, x, unit] = inputs[0];
  for (const input of inputs) if (Math.abs(Math.log10(input[1])) > Math.abs(Math.log10(x))) [field, x, unit] = input;
  throw new DesignError(field, `With ${inputs.map(([, v, u]) => sayQuantity(v, u)).join(' and ')} the ${what} is beyond what can be computed: ${sayQuantity(x, unit)} is far outside anything that can be built.`);
}

/**
 * Resonant frequency f = 1 / (2π √(LC)).
 * @param inductance L in henries (> 0)
 * @param capacitance C in farads (> 0)
 * @returns f in hertz
 */
export function resonantFrequency(inductance: number, capacitance: number): number {
  const L = requirePositive('inductance', inductance, 'Inductance', 'H');
  const C = requirePositive('capacitance', capacitance, 'Capacitance', 'F');
  // √L·√C: the product LC itself can overflow or underflow.
  return requireResult(1 / (TWO_PI * Math.sqrt(L) * Math.sqrt(C)), 'resonant frequency', [['inductance', L, 'H'], ['capacitance', C, 'F']]);
}

/**
 * Inductance that resonates with C at f: L = 1 / ((2π f)² C).
 * @param frequency f in hertz (> 0)
 * @param capacitance C in farads (> 0)
 * @returns L in henries
 */
export function inductanceForFrequency(frequency: number, capacitance: number): number {
  const f = requirePositive('frequency', frequency, 'Frequency', 'Hz');
  const C = requirePositive('capacitance', capacitance, 'Capacitance', 'F');
  const w = TWO_PI * f;
  return requireResult(1 / w / (w * C), 'inductance', [['frequency', f, 'Hz'], ['capacitance', C, 'F']]);
}

/**
 * Capacitance that resonates with L at f: C = 1 / ((2π f)² L).
 * @param frequency f in hertz (> 0)
 * @param inductance L in henries (> 0)
 * @returns C in farads
 */
export function capacitanceForFrequency(frequency: number, inductance: number): number {
  const f = requirePositive('frequency', frequency, 'Frequency', 'Hz');
  const L = requirePositive('inductance', inductance, 'Inductance', 'H');
  const w = TWO_PI * f;
  return requireResult(1 / w / (w * L), 'capacitance', [['frequency', f, 'Hz'], ['inductance', L, 'H']]);
}

/**
 * Inductive reactance X_L = 2π f L.
 * @param frequency f in hertz (> 0)
 * @param inductance L in henries (> 0)
 * @returns X_L in ohms
 */
export function inductiveReactance(frequency: number, inductance: number): number {
  const f = requirePositive('frequency', frequency, 'Frequency', 'Hz');
  const L = requirePositive('inductance', inductance, 'Inductance', 'H');
  return requireResult(TWO_PI * f * L, 'reactance', [['frequency', f, 'Hz'], ['inductance', L, 'H']]);
}

/**
 * Capacitive reactance magnitude X_C = 1 / (2π f C).
 * @param frequency f in hertz (> 0)
 * @param capacitance C in farads (> 0)
 * @returns |X_C| in ohms
 */
export function capacitiveReactance(frequency: number, capacitance: number): number {
  const f = requirePositive('frequency', frequency, 'Frequency', 'Hz');
  const C = requirePositive('capacitance', capacitance, 'Capacitance', 'F');
  return requireResult(1 / (TWO_PI * f * C), 'reactance', [['frequency', f, 'Hz'], ['capacitance', C, 'F']]);
}

/**
 * Characteristic impedance of the LC pair, Z0 = √(L/C): the reactance of
 * either part at resonance.
 * @param inductance L in henries (> 0)
 * @param capacitance C in farads (> 0)
 * @returns Z0 in ohms
 */
export function characteristicImpedance(inductance: number, capacitance: number): number {
  const L = requirePositive('inductance', inductance, 'Inductance', 'H');
  const C = requirePositive('capacitance', capacitance, 'Capacitance', 'F');
  return requireResult(Math.sqrt(L) / Math.sqrt(C), 'characteristic impedance', [['inductance', L, 'H'], ['capacitance', C, 'F']]);
}
