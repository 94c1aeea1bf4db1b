/**
 * Resonance of an ideal (lossless) inductor and capacitor.
 *
 * Model: Thomson's formula for an LC circuit, f = 1 / (2π √(LC)), and the
 * reactances X_L = 2π f L, X_C = 1 / (2π f C) that are equal at resonance.
 * Sources: Terman, *Radio Engineers' Handbook* (1943), section 3; any circuit
 * text. Valid for lumped parts: well below the coil's self-resonance (see
 * `selfCapacitance`) and with Q high enough that loss does not shift the peak
 * (the tank module handles lossy tanks).
 */
import { TWO_PI } from './constants';
import { requirePositive } from './errors';

/**
 * Resonant frequency f = 1 / (2π √(LC)).
 * @param inductance L in henries (> 0)
 * @param capacitance C in farads (> 0)
 * @returns f in hertz
 */
export function resonantFrequency(inductance: number, capacitance: number): number {
  requirePositive('inductance', inductance, 'Inductance');
  requirePositive('capacitance', capacitance, 'Capacitance');
  return 1 / (TWO_PI * Math.sqrt(inductance * capacitance));
}

/**
 * Inductance that resonates with C at f: L = 1 / ((2π f)² C).
 * @param frequency f in hertz (> 0)
 * @param capacitance C in farads (> 0)
 * @returns L in henries
 */
export function inductanceForFrequency(frequency: number, capacitance: number): number {
  requirePositive('frequency', frequency, 'Frequency');
  requirePositive('capacitance', capacitance, 'Capacitance');
  const w = TWO_PI * frequency;
  return 1 / (w * w * capacitance);
}

/**
 * Capacitance that resonates with L at f: C = 1 / ((2π f)² L).
 * @param frequency f in hertz (> 0)
 * @param inductance L in henries (> 0)
 * @returns C in farads
 */
export function capacitanceForFrequency(frequency: number, inductance: number): number {
  requirePositive('frequency', frequency, 'Frequency');
  requirePositive('inductance', inductance, 'Inductance');
  const w = TWO_PI * frequency;
  return 1 / (w * w * inductance);
}

/**
 * Inductive reactance X_L = 2π f L.
 * @param frequency f in hertz (> 0)
 * @param inductance L in henries (> 0)
 * @returns X_L in ohms
 */
export function inductiveReactance(frequency: number, inductance: number): number {
  requirePositive('frequency', frequency, 'Frequency');
  requirePositive('inductance', inductance, 'Inductance');
  return TWO_PI * frequency * inductance;
}

/**
 * Capacitive reactance magnitude X_C = 1 / (2π f C).
 * @param frequency f in hertz (> 0)
 * @param capacitance C in farads (> 0)
 * @returns |X_C| in ohms
 */
export function capacitiveReactance(frequency: number, capacitance: number): number {
  requirePositive('frequency', frequency, 'Frequency');
  requirePositive('capacitance', capacitance, 'Capacitance');
  return 1 / (TWO_PI * frequency * capacitance);
}

/**
 * Characteristic impedance of the LC pair, Z0 = √(L/C): the reactance of
 * either part at resonance.
 * @param inductance L in henries (> 0)
 * @param capacitance C in farads (> 0)
 * @returns Z0 in ohms
 */
export function characteristicImpedance(inductance: number, capacitance: number): number {
  requirePositive('inductance', inductance, 'Inductance');
  requirePositive('capacitance', capacitance, 'Capacitance');
  return Math.sqrt(inductance / capacitance);
}
