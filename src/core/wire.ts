/**
 * Round winding wire: gauges, enamel build, DC resistance and the length to cut.
 *
 * Models and sources:
 * - American Wire Gauge, ASTM B258 (*Standard Specification for Standard
 *   Nominal Diameters and Cross-Sectional Areas of AWG Sizes of Solid Round
 *   Wires Used as Electrical Conductors*): d = 0.005 in × 92^((36 − n)/39),
 *   i.e. 0.127 mm × 92^((36 − n)/39); gauge 0000 counts as n = −3, 000 as −2,
 *   00 as −1. AWG 36 is 0.127 mm and 0000 is 0.46 in exactly by definition.
 * - Imperial Standard Wire Gauge (SWG), fixed by Order in Council in 1883 and
 *   later given as BS 3737:1964 (now withdrawn): a table of diameters in
 *   thousandths of an inch, 7/0 = 0.500 in to 50 = 0.001 in. The diameters are
 *   defined by the table itself (no formula). Values here from memory; they
 *   agree with the table as widely reproduced (see `SWG_DIAMETERS_INCH`).
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
import { DesignError, requireFinite, requireFiniteResult, requireNonNegative, requireObject, requirePositive } from './errors';

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
  return parseGauge(gauge, 'AWG', (text) => (Object.prototype.hasOwnProperty.call(AWG_ZEROS, text) ? AWG_ZEROS[text] : undefined), -3, 40, 'a number from 0 to 40, or 00, 000, 0000 (or 2/0, 3/0, 4/0)', '0000 to 40');
}

/**
 * Reads a gauge of either system: a number as it is, or text with the system's
 * name or "#" around it; `special` reads the system's zero sizes ("4/0", "000").
 * @throws DesignError (field `gauge`) for anything not a whole gauge in [min, max]
 */
function parseGauge(
  gauge: unknown, system: 'AWG' | 'SWG', special: (text: string) => number | undefined,
  min: number, max: number, spelling: string, range: string,
): number {
  let n: number;
  if (typeof gauge === 'number') {
    n = gauge;
  } else if (typeof gauge === 'string') {
    const name = system.toLowerCase();
    const text = gauge.trim().replace(new RegExp(`^${name}\\s*#?\\s*`, 'i'), '').replace(new RegExp(`\\s*${name}$`, 'i'), '').replace(/^#\s*/, '');
    const zero = special(text);
    if (zero !== undefined) n = zero;
    else if (/^\d{1,2}$/.test(text)) n = Number(text);
    else throw new DesignError('gauge', `“${gauge.length > 20 ? `${gauge.slice(0, 20)}…` : gauge}” is not an ${system} size: write ${spelling}.`);
  } else {
    throw new DesignError('gauge', gauge === undefined ? 'The wire gauge is missing.' : `The wire gauge must be a number or text such as "22", not ${gauge === null ? 'empty' : `a ${typeof gauge}`}.`);
  }
  if (!Number.isInteger(n) || n < min || n > max) {
    throw new DesignError('gauge', `${system} ${String(gauge)} is outside the table: use whole gauges from ${range}.`);
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

/** An SWG size: an integer −6 … 50 (−6 = 7/0, 0 = 0 or 1/0) or one of the usual spellings ("7/0", "0000000", "22", "SWG 22", "22 swg"). */
export type SwgSize = number | string;

/**
 * Imperial Standard Wire Gauge (BS 3737:1964; Order in Council 1883): diameter
 * in inches of gauges 7/0 … 50, indexed by gauge number + 6 (7/0 is −6, 6/0 −5,
 * … 2/0 −1, 0 is 0). From memory; the values agree with the table as widely
 * reproduced from BS 3737 (e.g. SWG 22 = 0.028 in, 30 = 0.0124 in, 40 = 0.0048 in).
 */
export const SWG_DIAMETERS_INCH: readonly number[] = [
  0.5, 0.464, 0.432, 0.4, 0.372, 0.348, // 7/0 … 2/0
  0.324, 0.3, 0.276, 0.252, 0.232, 0.212, 0.192, 0.176, 0.16, 0.144, // 0 … 9
  0.128, 0.116, 0.104, 0.092, 0.08, 0.072, 0.064, 0.056, 0.048, 0.04, // 10 … 19
  0.036, 0.032, 0.028, 0.024, 0.022, 0.02, 0.018, 0.0164, 0.0148, 0.0136, // 20 … 29
  0.0124, 0.0116, 0.0108, 0.01, 0.0092, 0.0084, 0.0076, 0.0068, 0.006, 0.0052, // 30 … 39
  0.0048, 0.0044, 0.004, 0.0036, 0.0032, 0.0028, 0.0024, 0.002, 0.0016, 0.0012, // 40 … 49
  0.001, // 50
];

/**
 * Reads an SWG size as its gauge number (7/0 → −6, 6/0 → −5, … 2/0 → −1,
 * 0 or 1/0 → 0, "22" → 22). Accepts integers −6 … 50 and strings such as
 * "7/0", "0000000", "00", "22", "SWG 22", "22 SWG", "#22".
 * @throws DesignError (field `gauge`) for anything else
 */
export function parseSwg(gauge: SwgSize): number {
  const zeros = (text: string): number | undefined => {
    const slash = /^([1-7])\/0$/.exec(text);
    if (slash) return 1 - Number(slash[1]);
    return /^0{1,7}$/.test(text) ? 1 - text.length : undefined;
  };
  return parseGauge(gauge, 'SWG', zeros, -6, 50, 'a number from 0 to 50, or 2/0 … 7/0 (00 … 0000000)', '7/0 to 50');
}

/**
 * Bare diameter of an SWG size, from the table of BS 3737:1964 (the Imperial
 * Standard Wire Gauge of 1883): SWG 22 = 0.028 in = 0.7112 mm.
 * @param gauge SWG size (integer −6 … 50, −6 = 7/0; or a string, see `parseSwg`)
 * @returns diameter in metres (exact conversion of the table's inches, 1 in = 25.4 mm)
 */
export function swgDiameter(gauge: SwgSize): number {
  const n = parseSwg(gauge);
  return Number((SWG_DIAMETERS_INCH[n + 6] * 0.0254).toPrecision(12));
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
  requireFinite('temperature', temperature, 'Temperature');
  if (temperature < -273.15) throw new DesignError('temperature', `Temperature ${temperature} °C is below absolute zero.`);
  requirePositive('resistivity', resistivity, 'Resistivity');
  requireFinite('temperatureCoefficient', temperatureCoefficient, 'The temperature coefficient');
  const rho = requireFiniteResult('temperature', resistivity * (1 + temperatureCoefficient * (temperature - 20)), 'The resistivity at this temperature');
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
  // ρ ℓ / (π d²/4), grouped so that a very thin wire overflows to a DesignError rather than Infinity
  const r = (((rho / wireDiameter) * (length / wireDiameter)) * 4) / Math.PI;
  return requireFiniteResult(r === Infinity && length > wireDiameter ? 'length' : 'wireDiameter', r, 'The wire’s resistance');
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
export function wireLengthForCoil(input: CoilWireInput): number {
  requireObject<CoilWireInput>('input', input, 'The coil');
  const { turns, diameter, pitch, leadLength = 0 } = input;
  requirePositive('turns', turns, 'Number of turns');
  requirePositive('diameter', diameter, 'Coil diameter');
  requireNonNegative('pitch', pitch, 'Pitch');
  requireNonNegative('leadLength', leadLength, 'Lead length');
  const perTurn = Math.hypot(Math.PI * diameter, pitch);
  return requireFiniteResult(perTurn > turns ? (diameter > pitch ? 'diameter' : 'pitch') : 'turns', turns * perTurn + 2 * leadLength, 'The wire length');
}
