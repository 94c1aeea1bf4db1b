/**
 * The band plan: from the Band bench's values (its table's spec, SI, by
 * path) to the results at the top of the bench, by calling the core in turn:
 *
 *   designForBand (coil L, trimmer, padder, band covered)
 *   → bandSelectivity (the coil wound once by designCoil for that L at
 *     mid-band, its Q across the band, the tank's unloaded and loaded Q,
 *     bandwidth and dynamic resistance at each frequency)
 *
 * The image rejection (the core's imageRejection, for a superhet), what the
 * plots draw (the dial laws, the selectivity and image curves) and
 * the optional parts (a tuning slug, the user's plate table) are in
 * bandCurves.ts, which only the cards' chunk loads: each point of the
 * selectivity is a tank analysis, and a phone should not pay for a plot
 * nobody scrolls to.
 *
 * The parts the bench shows further down live in modules of their own, which
 * the bench loads when their section comes near the screen (so the page's
 * first JavaScript stays small): bandTracking.ts (three-point tracking and
 * the oscillator coil), bandPairs.ts (fixed pairs with their tolerance
 * spread) and bandLinks.ts (the hand-offs to the Coil and Tank benches).
 * Pure: no Solid, no DOM; tests and the shop sheet call them in Node.
 *
 * Every DesignError keeps a spec path the table routes to a field: the
 * core's own names, `coil.…` for the coil (bandSelectivity's prefix, and
 * the spec builder's errors are given it here too).
 */
import { designForBand, bandSelectivity, type BandDesign, type BandSelectivity } from '../../src/core/band';
import { designCoil, type DesignCoilResult, type DesignCoilSpec } from '../../src/core/coil';
import { DesignError, isDesignError, withinSpec } from '../../src/core/errors';
import type { DesignNote } from '../../src/core/notes';
import type { TankInput } from '../../src/core/tankModel';
import type { OscillatorSide } from '../../src/core/image';
import { formatNumber, formatQuantity, formatQuantityCompact, parseQuantityRange } from '../../src/quantity';
import { getPath, type Choices, type SpecObject } from '../kit/fields';
import { capacitorKindRange, COIL_PREFIX } from './bandFields';
import { buildCoilSpec } from './coilFields';

/** A number at a path of the raw values, or undefined. */
export function num(raw: unknown, path: string): number | undefined {
  const v = getPath(raw, path);
  return typeof v === 'number' ? v : undefined;
}


/** As the Coil bench says it (coilDesign.ts): with bare wire the overall diameter is the bare one, shown at the gauge or diameter. */
function inCoilTerms<T>(choices: Choices, fn: () => T): T {
  try {
    return fn();
  } catch (e) {
    if (isDesignError(e) && e.field === `${COIL_PREFIX}.wire.insulatedDiameter` && choices.enamel === 'bare') throw new DesignError(`${COIL_PREFIX}.wire.diameter`, e.message);
    throw e;
  }
}

/** The variable capacitor's ends, F: typed, or the kind chosen. */
export function capacitorRange(raw: SpecObject, choices: Choices): { min: number | undefined; max: number | undefined } {
  const kind = choices.capType === undefined || choices.capType === 'own' ? undefined : capacitorKindRange(choices.capType);
  if (kind !== undefined) {
    const r = parseQuantityRange(kind, 'F');
    return { min: r.low, max: r.high };
  }
  return { min: num(raw, 'minCapacitance'), max: num(raw, 'maxCapacitance') };
}

/** The coil's spec without L, turns or frequency (the band sets them), from the `coil.…` values. */
export function bandCoilSpec(raw: SpecObject, choices: Choices): DesignCoilSpec {
  const coilRaw = (getPath(raw, COIL_PREFIX) ?? {}) as SpecObject;
  return withinSpec(COIL_PREFIX, () => buildCoilSpec(coilRaw, { ...choices, give: 'L' }));
}

/** The superhet's IF and oscillator side, when the bench has one. */
export interface Superhet {
  intermediateFrequency: number;
  oscillatorSide: OscillatorSide;
}

export interface BandPlan {
  design: BandDesign;
  /** The coil as designCoil winds it for the band's L at mid-band. */
  coil: DesignCoilResult;
  /** The spec it was wound from (with L and the mid-band frequency). */
  coilSpec: DesignCoilSpec;
  /** Selectivity at the band's low, middle and high frequency (its curve: `selectivityAt`). */
  selectivity: BandSelectivity;
  /** The selectivity at this many points across the band (the plotted curve; a tank analysis per point). */
  selectivityAt: (points: number) => BandSelectivity;
  /** The superhet's IF and oscillator side, when the bench has one. */
  superhet?: Superhet;
  /** Every note of the plan, without repeats. */
  notes: DesignNote[];
}

/** The band designed and its coil wound: the first half of a plan. */
export interface BandWinding {
  design: BandDesign;
  /** The coil's spec without L, turns or frequency. */
  base: DesignCoilSpec;
  /** designCoil of it for the band's L at mid-band (as bandSelectivity winds it). */
  coil: DesignCoilResult;
}

let lastWinding: { raw: SpecObject; choices: Choices; result: BandWinding } | undefined;

/**
 * The band designed (designForBand) and its coil wound (designCoil for the
 * band's L at the middle of the band covered): the first half of `planBand`.
 * The bench works it out in a task of its own before the selectivity (a
 * phone then never blocks long on one), so the last one is kept for the same
 * values and choices (the same objects: the bench's spec is a memo).
 * @throws DesignError with a spec path the table routes
 */
export function windBand(raw: SpecObject, choices: Choices): BandWinding {
  if (lastWinding && lastWinding.raw === raw && lastWinding.choices === choices) return lastWinding.result;
  const design = bandDesign(raw, choices);
  const base = bandCoilSpec(raw, choices);
  const middle = 0.5 * (design.lowFrequency + design.highFrequency);
  const coil = inCoilTerms(choices, () => withinSpec(COIL_PREFIX, () => designCoil({ ...base, inductance: design.inductance, frequency: middle } as DesignCoilSpec)));
  const result = { design, base, coil };
  lastWinding = { raw, choices, result };
  return result;
}

/**
 * The whole plan for the bench's values (SI by path, as `bench.spec()` or
 * `snapshotToSpec(BAND_FIELDS, …)` gives) and its choices.
 * @throws DesignError with a spec path the table routes
 */
export function planBand(raw: SpecObject, choices: Choices): BandPlan {
  const { design, base, coil } = windBand(raw, choices);
  const coilQ = num(raw, 'coilQ');
  const selectivityAt = (points: number) => inCoilTerms(choices, () => bandSelectivity({
    band: design,
    coil: base,
    woundCoil: coil,
    ...(coilQ === undefined ? {} : { coilQ }),
    capacitorQ: num(raw, 'capacitorQ'),
    sourceResistance: num(raw, 'sourceResistance'),
    loadResistance: num(raw, 'loadResistance'),
    points,
  }));
  // Low, middle and high now; the curve (a tank analysis per point) when a plot asks.
  const selectivity = selectivityAt(2);
  const coilSpec = { ...base, inductance: design.inductance, frequency: selectivity.middle.frequency } as DesignCoilSpec;
  const side = superhetSide(choices);
  const ifreq = num(raw, 'intermediateFrequency');
  const superhet: Superhet | undefined = side === undefined || ifreq === undefined ? undefined : { intermediateFrequency: ifreq, oscillatorSide: side };
  const seen = new Set<string>();
  return {
    design, coil, coilSpec, selectivity, selectivityAt, superhet,
    notes: [...design.notes, ...selectivity.notes].filter((n) => (seen.has(n.message) ? false : (seen.add(n.message), true))),
  };
}

/** The oscillator's side for a superhet, or undefined for none. */
export function superhetSide(choices: Choices): 'above' | 'below' | undefined {
  return choices.osc === 'above' || choices.osc === 'below' ? choices.osc : undefined;
}

/** designForBand for the bench's values: the band, the capacitor typed or chosen, strays, margin (%), arrangement. */
export function bandDesign(raw: SpecObject, choices: Choices): BandDesign {
  const cap = capacitorRange(raw, choices);
  const margin = num(raw, 'marginPercent');
  return designForBand({
    lowFrequency: num(raw, 'lowFrequency') as number,
    highFrequency: num(raw, 'highFrequency') as number,
    minCapacitance: cap.min as number,
    maxCapacitance: cap.max as number,
    strayCapacitance: num(raw, 'strayCapacitance') as number,
    margin: margin === undefined ? undefined : margin / 100,
    arrangement: choices.arr === 'trimmer' ? 'trimmer' : 'auto',
  });
}

/** A frequency in 4 figures, compact: "6.05 MHz". */
export const hz = (f: number) => formatQuantityCompact(f, 'Hz', 4);
/** A Q as people say it: whole numbers from 10 up, two figures below. */
export const sayQ = (q: number) => (q >= 10 ? String(Math.round(q)) : q.toPrecision(2));
/** A frequency error with its sign: "−1.23 kHz". */
export const signedHz = (x: number) => (x < 0 ? `−${formatQuantity(-x, 'Hz', 3)}` : formatQuantity(x, 'Hz', 3));
/** Decibels, 3 figures. */
export const sayDb = (x: number) => `${formatNumber(x, 3)} dB`;
/** Turns as wound: "33.5", "46". */
export const sayTurns = (n: number) => String(Number(n.toFixed(1)));

/** "5.9–6.2 MHz" style text for a band, 4 figures. */
export function bandText(low: number, high: number): string {
  return `${formatQuantityCompact(low, 'Hz', 4)} to ${formatQuantityCompact(high, 'Hz', 4)}`;
}
