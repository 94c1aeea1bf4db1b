/**
 * Round winding wire: gauges, enamel build, DC resistance and the length to cut.
 *
 * Models and sources:
 * - American Wire Gauge, ASTM B258 (*Standard Specification for Standard
 *   Nominal Diameters and Cross-Sectional Areas of AWG Sizes of Solid Round
 *   Wires Used as Electrical Conductors*): d = 0.005 in × 92^((36 − n)/39),
 *   i.e. 0.127 mm × 92^((36 − n)/39); gauge 0000 counts as n = −3, 000 as −2,
 *   00 as −1. AWG 36 is 0.127 mm and 0000 is 0.46 in exactly by definition.
 * - Metric nominal bare diameters: the R20 preferred-number steps of ISO 3 as
 *   used for the nominal conductor diameters of IEC 60317-0-1 — common
 *   practice, list recalled from memory and not checked against the standard.
 * - Enamel grade 1 / grade 2 maximum overall diameter: IEC 60317-0-1 tabulates
 *   them; we could not reproduce that table from a source here, so
 *   `enamelledDiameter` uses a power-law approximation of the maximum increase
 *   over the bare wire, fitted to values recalled from memory (see there).
 * - Resistivity of annealed copper 1/58 Ω·mm²/m at 20 °C and temperature
 *   coefficient 0.00393 /K: IEC 60028 (*International standard of resistance
 *   for copper*).
 */
import { COPPER_RESISTIVITY_20C, COPPER_TEMPERATURE_COEFFICIENT } from './constants';
import { DesignError, requireNonNegative, requirePositive } from './errors';

/** An AWG size: an integer −3 … 40 (−3 = 0000) or one of the usual spellings ("0000", "4/0", "22", "AWG 22"). */
export type AwgSize = number | string;

const AWG_ZEROS: Readonly<Record<string, number>> = {
  '0000': -3, '4/0': -3,
  '000': -2, '3/0': -2,
  '00': -1, '2/0': -1,
  '0': 0, '1/0': 0,
};

/**
 * Reads an AWG size as the gauge number n used in the ASTM B258 formula
 * (0000 → −3, 000 → −2, 00 → −1, 0 → 0, "22" → 22).
 * Accepts integers −3 … 40 and strings such as "0000", "4/0", "00", "22", "AWG 22", "22 AWG".
 */
export function parseAwg(gauge: AwgSize): number {
  let n: number;
  if (typeof gauge === 'number') {
    n = gauge;
  } else if (typeof gauge === 'string') {
    const text = gauge.trim().replace(/^awg\s*#?\s*/i, '').replace(/\s*awg$/i, '').replace(/^#\s*/, '');
    if (text in AWG_ZEROS) n = AWG_ZEROS[text];
    else if (/^\d{1,2}$/.test(text)) n = Number(text);
    else throw new DesignError('gauge', `"${gauge}" is not an AWG size: write a number from 0 to 40, or 00, 000, 0000 (or 2/0, 3/0, 4/0).`);
  } else {
    throw new DesignError('gauge', 'The wire gauge is missing.');
  }
  if (!Number.isInteger(n) || n < -3 || n > 40) {
    throw new DesignError('gauge', `AWG ${String(gauge)} is outside the table: use whole gauges from 0000 to 40.`);
  }
  return n;
}

/**
 * Bare diameter of an AWG size, ASTM B258: d = 0.127 mm × 92^((36 − n)/39).
 * @param gauge AWG size (integer −3 … 40, −3 = 0000; or a string, see `parseAwg`)
 * @returns diameter in metres (unrounded formula value; ASTM B258's table rounds to 0.0001 in)
 */
export function awgDiameter(gauge: AwgSize): number {
  const n = parseAwg(gauge);
  return 0.127e-3 * 92 ** ((36 - n) / 39);
}

/**
 * Common metric nominal bare diameters of enamelled round copper wire, in metres,
 * 0.020 mm to 5.00 mm: the R20 preferred-number steps (ISO 3) used for the
 * nominal diameters of IEC 60317-0-1. Common practice; recalled from memory,
 * not checked against the standard (IEC 60317-0-1 also lists R40 intermediate sizes).
 */
export const METRIC_WIRE_DIAMETERS: readonly number[] = [
  0.020, 0.022, 0.025, 0.028, 0.032, 0.036, 0.040, 0.045, 0.050, 0.056, 0.063, 0.071, 0.080, 0.090,
  0.100, 0.112, 0.125, 0.140, 0.160, 0.180, 0.200, 0.224, 0.250, 0.280, 0.315, 0.355, 0.400, 0.450,
  0.500, 0.560, 0.630, 0.710, 0.800, 0.900, 1.000, 1.120, 1.250, 1.400, 1.600, 1.800, 2.000, 2.240,
  2.500, 2.800, 3.150, 3.550, 4.000, 4.500, 5.000,
].map((mm) => Number((mm * 1e-3).toPrecision(6)));

/** Enamel build grades of IEC 60317-0-1 (grade 1: thin, grade 2: medium). */
export type EnamelGrade = 1 | 2;

/**
 * Approximate maximum overall diameter of enamelled round copper wire.
 *
 * Model (an approximation, not the standard's table): the maximum increase
 * over the bare diameter d follows a power law, Δ = c · (d / 1 mm)^0.58 mm, with
 * c = 0.0625 for grade 1 and c = 0.095 for grade 2, fitted by us to IEC 60317-0-1
 * maximum overall diameters recalled from memory (e.g. 0.100 mm → about 0.117 / 0.125 mm,
 * 0.500 mm → about 0.544 / 0.566 mm, 1.000 mm → about 1.062 / 1.093 mm). Expect
 * a few micrometres of disagreement with the standard's table; for a tight
 * winding-length budget measure the wire. Intended for 0.02 mm to 2.5 mm.
 * @param wireDiameter bare conductor diameter in metres (> 0)
 * @param grade enamel grade, 1 or 2 (default 1)
 * @returns approximate maximum overall diameter in metres
 */
export function enamelledDiameter(wireDiameter: number, grade: EnamelGrade = 1): number {
  requirePositive('wireDiameter', wireDiameter, 'Wire diameter');
  if (grade !== 1 && grade !== 2) {
    throw new DesignError('grade', `Enamel grade ${String(grade)} is not known here: use grade 1 (thin) or grade 2 (medium).`);
  }
  const dMm = wireDiameter * 1e3;
  const c = grade === 1 ? 0.0625 : 0.095;
  return (dMm + c * dMm ** 0.58) * 1e-3;
}

/**
 * Resistivity at a temperature: ρ(T) = ρ20 · (1 + α (T − 20 °C)).
 * @param temperature conductor temperature in °C (default 20)
 * @param resistivity ρ20, resistivity at 20 °C in Ω·m (default annealed copper, IEC 60028)
 * @param temperatureCoefficient α in 1/K at 20 °C (default copper 0.00393, IEC 60028)
 * @returns resistivity in Ω·m. The linear law is good to about 1 % from −50 °C to 150 °C for copper.
 */
export function resistivityAtTemperature(
  temperature = 20,
  resistivity: number = COPPER_RESISTIVITY_20C,
  temperatureCoefficient: number = COPPER_TEMPERATURE_COEFFICIENT,
): number {
  if (typeof temperature !== 'number' || !Number.isFinite(temperature)) {
    throw new DesignError('temperature', 'Temperature must be a finite number of degrees Celsius.');
  }
  if (temperature < -273.15) throw new DesignError('temperature', `Temperature ${temperature} °C is below absolute zero.`);
  requirePositive('resistivity', resistivity, 'Resistivity');
  if (typeof temperatureCoefficient !== 'number' || !Number.isFinite(temperatureCoefficient)) {
    throw new DesignError('temperatureCoefficient', 'The temperature coefficient must be a finite number per kelvin.');
  }
  const rho = resistivity * (1 + temperatureCoefficient * (temperature - 20));
  if (!(rho > 0)) {
    throw new DesignError('temperature', `At ${temperature} °C the linear temperature law gives no positive resistivity: the temperature is too far from 20 °C for it.`);
  }
  return rho;
}

/**
 * DC resistance of a round wire: R = ρ(T) · length / (π d² / 4), ρ(T) = ρ20 (1 + α (T − 20 °C)).
 * @param length wire length in metres (> 0)
 * @param wireDiameter bare diameter in metres (> 0)
 * @param temperature conductor temperature in °C (default 20)
 * @param resistivity ρ20 in Ω·m (default annealed copper 1/58 Ω·mm²/m, IEC 60028)
 * @param temperatureCoefficient α in 1/K (default copper 0.00393, IEC 60028)
 * @returns resistance in ohms
 */
export function wireResistanceDc(
  length: number,
  wireDiameter: number,
  temperature = 20,
  resistivity: number = COPPER_RESISTIVITY_20C,
  temperatureCoefficient: number = COPPER_TEMPERATURE_COEFFICIENT,
): number {
  requirePositive('length', length, 'Wire length');
  requirePositive('wireDiameter', wireDiameter, 'Wire diameter');
  const rho = resistivityAtTemperature(temperature, resistivity, temperatureCoefficient);
  return (rho * length) / ((Math.PI * wireDiameter * wireDiameter) / 4);
}

export interface CoilWireInput {
  /** Number of turns (> 0, may be fractional). */
  turns: number;
  /** Winding diameter in metres, measured wire centre to wire centre (> 0). */
  diameter: number;
  /** Pitch: axial advance per turn, centre to centre, in metres (≥ 0; 0 for a flat ring of turns). */
  pitch: number;
  /** Length of EACH of the two leads in metres (≥ 0, default 0). */
  leadLength?: number;
}

/**
 * Length of wire to cut for a single-layer helical coil:
 * ℓ = N · √((π D)² + p²) + 2 · leadLength.
 * Each turn of a helix of diameter D and pitch p is the hypotenuse of a
 * right triangle with sides π D and p (the helix unrolled onto a plane).
 * Both leads are added, each `leadLength` long. Add your own allowance for
 * stripping and soldering. D is the centre-to-centre (mean) winding diameter.
 * @returns length in metres
 */
export function wireLengthForCoil({ turns, diameter, pitch, leadLength = 0 }: CoilWireInput): number {
  requirePositive('turns', turns, 'Number of turns');
  requirePositive('diameter', diameter, 'Coil diameter');
  requireNonNegative('pitch', pitch, 'Pitch');
  requireNonNegative('leadLength', leadLength, 'Lead length');
  return turns * Math.hypot(Math.PI * diameter, pitch) + 2 * leadLength;
}
