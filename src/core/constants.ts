/**
 * Physical constants, SI units. One place, so every module agrees.
 */

/** Magnetic constant μ0 in H/m (CODATA 2018 recommended value). */
export const MU_0 = 1.25663706212e-6;

/** Electric constant ε0 in F/m (CODATA 2018 recommended value). */
export const EPSILON_0 = 8.8541878128e-12;

/** Speed of light in vacuum, m/s (exact, SI definition). */
export const SPEED_OF_LIGHT = 299_792_458;

/** Resistivity of annealed copper at 20 °C, Ω·m (IEC 60028: 1/58 Ω·mm²/m). */
export const COPPER_RESISTIVITY_20C = 1 / 58e6;

/** Temperature coefficient of resistance of annealed copper at 20 °C, 1/K (IEC 60028). */
export const COPPER_TEMPERATURE_COEFFICIENT = 0.00393;

export const TWO_PI = 2 * Math.PI;
