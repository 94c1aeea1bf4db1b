/**
 * Every export of the core, called with hostile values: text ("5"), NaN,
 * null, undefined, ±Infinity, negatives, 0, 1e300, 1e-300, and null or
 * undefined in place of an options object, one at a time and (fast-check) in
 * random combinations.
 *
 * The rule (issue: input checks on every export): a call either returns a
 * result with no NaN and no ±Infinity among its numbers, except the fields an
 * export documents as Infinity (listed in its entry below), or throws a
 * DesignError. Never a TypeError, a RangeError or a silent NaN.
 *
 * The exports are enumerated from the module namespace, so a new export is
 * covered as soon as it is added; an export with no entry in the table below
 * fails the test, and so does an entry whose valid call (the baseline) fails.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import * as core from '../../src/core';

/** The hostile values of the issue. */
const HOSTILE: readonly unknown[] = ['5', Number.NaN, null, undefined, Infinity, -Infinity, -1, 0, 1e300, 1e-300];

/** How to call one export. */
interface Entry {
  /** Valid calls (one or more baselines). Plain objects among the arguments are attacked field by field. */
  calls: unknown[][];
  /** Call with `new` (a class). */
  construct?: true;
  /** The result is (or contains) an argument as given: do not inspect its numbers. */
  passThrough?: true;
  /**
   * Result fields documented as possibly +Infinity ('' for the result itself;
   * array elements as 'name[]').
   */
  mayBeInfinite?: readonly string[];
}

// Demo values (invented): a 7 MHz front-end tank, a 20 mm solenoid, a small toroid.
const tank = { inductance: 4.7e-6, capacitance: 100e-12, coilQ: 150, capacitorQ: 1000, dissipationFactor: 0.001, coilSelfCapacitance: 3e-12, sourceResistance: 20e3, loadResistance: 30e3, frequency: 7e6 };
const seriesTank = { mode: 'series', inductance: 1e-6, capacitance: 129e-12, coilResistance: 0.4, capacitorEsr: 0.02, sourceResistance: 1.5, loadResistance: 2.5 };
const sweep = { start: 1e6, stop: 2e7, points: 40, spacing: 'log' };
const z = (re: number, im: number) => ({ re, im });
const toroidCore = { outerDiameter: 12.7e-3, innerDiameter: 7.7e-3, height: 4.9e-3, relativePermeability: 10 };
const solenoid = { diameter: 20e-3, turns: 20, pitch: 1e-3, wireDiameter: 0.5e-3 };
const coilLoss = { frequency: 7e6, turns: 20, diameter: 20e-3, pitch: 1e-3, wireDiameter: 0.5e-3 };
const multilayer = { diameter: 20e-3, length: 10e-3, windingDepth: 5e-3 };
// the band planner: a 5.9–6.2 MHz band on a 10–365 pF capacitor (demo values, invented)
const bandCircuit = { inductance: 7.5e-6, minCapacitance: 10e-12, maxCapacitance: 365e-12, strayCapacitance: 12e-12, trimmerCapacitance: 343e-12, padderCapacitance: 99e-12 };
// tracking (demo values, invented: a 530–1600 kHz set, IF 455 kHz, 10–365 pF gang)
const trackingDemo = { lowFrequency: 530e3, highFrequency: 1600e3, intermediateFrequency: 455e3, oscillatorSide: 'above', signal: { inductance: 230e-6, minCapacitance: 10e-12, maxCapacitance: 365e-12, strayCapacitance: 12e-12, trimmerCapacitance: 20e-12 }, points: 21 };
const trackingOscillator = { inductance: 125.5e-6, minCapacitance: 10e-12, maxCapacitance: 365e-12, strayCapacitance: 12e-12, trimmerCapacitance: 28.6e-12, padderCapacitance: 384e-12 };
// the match bench (demo values, invented): a 16-turn 20 mm coil and a tapped tank as a circuit
const matchCoil = { form: 'solenoid', diameter: 20e-3, pitch: 1e-3, turns: 16, wire: { diameter: 0.5e-3, insulatedDiameter: 0.55e-3 } };
const matchCircuit = {
  frequency: 7.38e6, sourceNode: 'tap', sourceResistance: 50, loadNode: 'top', loadResistance: 30e3, topNode: 'top',
  parts: [
    { kind: 'windings', name: 'coil', windings: [{ name: 'coil1', from: '0', to: 'tap', inductance: 1.6e-7, resistance: 0.03 }, { name: 'coil2', from: 'tap', to: 'top', inductance: 3.96e-6, resistance: 0.2 }], coupling: [[1, 0.336], [0.336, 1]] },
    { kind: 'capacitor', name: 'tank', from: 'top', to: '0', capacitance: 100e-12 },
  ],
};
/** Q figures an ideal part or a missing termination makes Infinity (TankAnalysis). */
const TANK_INFINITE = ['coilQ', 'capacitorQ', 'unloadedQ', 'externalQ', 'dynamicResistance'];

const TABLE: Record<string, Entry> = {
  // errors.ts and text.ts
  DesignError: { construct: true, calls: [['pitch', 'Pitch 0.5 mm is smaller than the wire.']] },
  isDesignError: { calls: [[new core.DesignError('x', 'y')], [new Error('plain')]] },
  requireFinite: { calls: [['x', 1.5, 'X']] },
  requirePositive: { calls: [['x', 1.5, 'X', 'm']] },
  requireNonNegative: { calls: [['x', 0, 'X', 'm']] },
  requireInRange: { calls: [['x', 5, 0, 10, 'X', 'm']] },
  requireObject: { calls: [['x', { a: 1 }, 'X']], passThrough: true },
  requireFiniteResult: { calls: [['x', 2, 'X']] },
  sayQuantity: { calls: [[4.7e-6, 'H', 3]] },
  sayMm: { calls: [[0.0193, 3]] },
  sayNumber: { calls: [[1.23456, 3]] },
  sayPercent: { calls: [[0.183, 2]] },
  note: { calls: [['info', 'A remark.', 'pitch'], ['caution', 'A hazard.']] },
  // resonance, preferred, complex
  resonantFrequency: { calls: [[4.7e-6, 100e-12]] },
  inductanceForFrequency: { calls: [[7e6, 100e-12]] },
  capacitanceForFrequency: { calls: [[7e6, 4.7e-6]] },
  inductiveReactance: { calls: [[7e6, 4.7e-6]] },
  capacitiveReactance: { calls: [[7e6, 100e-12]] },
  characteristicImpedance: { calls: [[4.7e-6, 100e-12]] },
  preferredNeighbours: { calls: [[106.9e-12, 'E12'], [4.7e-6]] },
  eSeries: { calls: [['E96'], ['E12']] },
  nearestPreferredValue: { calls: [[106.9e-12, 'E24'], [4.4e-6]] },
  seriesValuesBetween: { calls: [['E12', 10e-12, 1e-9]] },
  requireSeries: { calls: [['series', 'E192']] },
  // pairs: demo values (invented), a 7.1 MHz tank and a 5.9–6.2 MHz band with one coil of a fictional shop
  resonantPairs: {
    calls: [
      [{ frequency: 7.1e6, strayCapacitance: 12e-12, samples: 50, count: 3 }],
      [{
        lowFrequency: 5.9e6, highFrequency: 6.2e6, capacitorSeries: 'E24', inductorSeries: 'none', shopCoils: [{ name: 'demo coil', inductance: 4.2e-6, selfCapacitance: 2.5e-12 }],
        strayCapacitance: 10e-12, reactanceRange: { minimum: 10, maximum: 3000 }, capacitanceTolerance: 0.05, inductanceTolerance: 0.05, strayTolerance: 0.25, count: 3, samples: 20, seed: 7, distribution: 'normal',
      }],
    ],
  },
  bandCoverage: { calls: [[bandCircuit], [{ ...bandCircuit, trimmerCapacitance: 355e-12, padderCapacitance: 99e-12 }]] },
  designForBand: {
    calls: [
      [{ lowFrequency: 5.9e6, highFrequency: 6.2e6, minCapacitance: 10e-12, maxCapacitance: 365e-12, strayCapacitance: 12e-12, margin: 0.01 }],
      [{ lowFrequency: 530e3, highFrequency: 1700e3, minCapacitance: 10e-12, maxCapacitance: 365e-12, strayCapacitance: 12e-12, margin: 0, arrangement: 'trimmer' }],
    ],
  },
  slugTuning: {
    calls: [
      [{ minCapacitance: 10e-12, maxCapacitance: 365e-12, strayCapacitance: 12e-12, trimmerCapacitance: 15e-12, minInductance: 200e-6, maxInductance: 260e-6, lowFrequency: 540e3, highFrequency: 1600e3 }],
      [{ minCapacitance: 10e-12, maxCapacitance: 365e-12, strayCapacitance: 12e-12, padderCapacitance: 500e-12, inductance: 230e-6, adjustment: 0.15 }],
    ],
  },
  dialLaw: {
    calls: [
      [{ ...bandCircuit, plates: 'slc', points: 19 }],
      [{ ...bandCircuit, plates: 'slf', rotation: 270, points: 10 }],
      [{ inductance: 7.5e-6, strayCapacitance: 12e-12, trimmerCapacitance: 343e-12, padderCapacitance: 99e-12, plates: [{ angle: 0, capacitance: 365e-12 }, { angle: 90, capacitance: 90e-12 }, { angle: 180, capacitance: 10e-12 }], points: 19 }],
    ],
  },
  bandSelectivity: {
    calls: [
      [{ band: bandCircuit, coil: { form: 'solenoid', diameter: 20e-3, pitch: 1e-3, wire: { diameter: 0.5e-3 } }, capacitorQ: 1000, sourceResistance: 20e3, loadResistance: 50e3, points: 5 }],
      [{ band: bandCircuit, coilQ: 150, dissipationFactor: 0.001, points: 3 }],
      [{ band: bandCircuit, coil: { form: 'solenoid', diameter: 20e-3, pitch: 1e-3, wire: { diameter: 0.5e-3 } }, woundCoil: { form: 'solenoid', turns: 20, inductance: 7.5e-6, q: 150 }, points: 3 }],
    ],
  },
  imageFrequency: { calls: [[6.05e6, 455e3, 'below'], [6.05e6, 455e3]] },
  // a lossless tank with no terminations has infinite loaded Q, and so an infinite estimate, as documented
  imageRejection: { calls: [[{ tank, signalFrequency: 7.1e6, intermediateFrequency: 455e3, oscillatorSide: 'below' }]], mayBeInfinite: ['loadedQ', 'estimate'] },
  trackingPoints: { calls: [[530e3, 1600e3]] },
  designTracking: { calls: [[trackingDemo], [{ ...trackingDemo, oscillatorStrayCapacitance: 0, trackingFrequencies: [600e3, 950e3, 1500e3] }]] },
  trackingError: { calls: [[{ ...trackingDemo, oscillator: trackingOscillator }]] },
  mutualInductanceCoaxialLoops: { calls: [[10e-3, 15e-3, 5e-3]] },
  mutualInductanceCoaxialWindings: { calls: [[{ radius: 10e-3, position: 0, pitch: 1e-3, turns: 10 }, { radius: 12e-3, position: 2e-3, pitch: 0.6e-3, turns: 2.5, firstTurn: 0 }]] },
  tappedCoilSections: { calls: [[{ coil: matchCoil, tapTurns: 2.5, frequency: 7e6 }], [{ coil: matchCoil, tapTurns: 16 }]] },
  tappedInductorRatio: { calls: [[{ lowerInductance: 1.6e-7, upperInductance: 3.3e-6, mutualInductance: 2.6e-7 }]] },
  resolveMatchTank: { calls: [[{ coil: matchCoil, capacitance: 100e-12, capacitorQ: 1000 }], [{ inductance: 4.7e-6, capacitance: 100e-12, unloadedQ: 150 }]] },
  capacitiveDivider: { calls: [[{ capacitance: 100e-12, frequency: 7.3e6, sourceResistance: 50, presentedResistance: 5.8e3, restResistance: 6e3 }]] },
  lNetwork: { calls: [[{ frequency: 7.3e6, sourceResistance: 50, presentedResistance: 5.8e3, capacitance: 100e-12 }]] },
  designTap: { calls: [[{ coil: matchCoil, capacitance: 100e-12, resistance: 50, loadedQ: 12 }], [{ coil: matchCoil, capacitance: 100e-12, unloadedQ: 150, resistance: 75, acrossResistance: 30e3 }]] },
  designLink: { calls: [[{ coil: matchCoil, capacitance: 100e-12, resistance: 50, link: { diameter: 21.1e-3, position: -5e-3, pitch: 0.55e-3 } }]] },
  designMatch: {
    calls: [
      [{ coil: matchCoil, capacitance: 100e-12, sourceResistance: 50, loadResistance: 1000, loadedQ: 12, split: 'equal', link: { position: 0 } }],
      [{ inductance: 4.7e-6, capacitance: 100e-12, unloadedQ: 150, sourceResistance: 50, loadResistance: 20e3, loadConnection: 'top', options: ['capacitiveDivider', 'highPassL'] }],
      [{ coil: matchCoil, capacitance: 100e-12, sourceResistance: 75, loadResistance: 2e3, loadTapTurns: 6, options: ['tap'] }],
    ],
  },
  matchCircuitAt: { calls: [[matchCircuit, 7.3e6]] },
  analyzeMatchCircuit: { calls: [[matchCircuit, { bandwidth: 6e5 }], [matchCircuit]] },
  sweepMatchCircuit: { calls: [[matchCircuit, { start: 6e6, stop: 8e6, points: 21, spacing: 'linear' }], [matchCircuit]] },
  matchNetlist: { calls: [[matchCircuit, { sweep: { start: 6e6, stop: 8e6, points: 21, spacing: 'linear' }, dataFile: 'm.data', title: 'demo' }], [matchCircuit]] },
  toleranceSpread: { calls: [[{ inductance: 4.7e-6, capacitance: 100e-12, strayCapacitance: 12e-12, selfCapacitance: 3e-12, inductanceTolerance: 0.05, capacitanceTolerance: 0.05, strayTolerance: 0.25, samples: 50, seed: 3, distribution: 'normal' }]] },
  complex: { calls: [[3, 4], [3]] },
  cAdd: { calls: [[z(1, 2), z(3, -1)]] },
  cSub: { calls: [[z(1, 2), z(3, -1)]] },
  cMul: { calls: [[z(1, 2), z(3, -1)]] },
  cDiv: { calls: [[z(1, 2), z(3, -1)]] },
  cInv: { calls: [[z(3, 4)]] },
  cParallel: { calls: [[z(50, 10), z(100, -30)]] },
  cAbs: { calls: [[z(3, 4)]] },
  cArg: { calls: [[z(3, 4)]] },
  // the tank
  analyzeTank: { calls: [[tank], [seriesTank]], mayBeInfinite: TANK_INFINITE },
  resolveTank: { calls: [[tank], [seriesTank]] },
  tankImpedance: { calls: [[tank, 7.1e6, { loaded: true }], [seriesTank, 14e6]], mayBeInfinite: ['re'] },
  sweepTank: { calls: [[tank, sweep], [seriesTank, { ...sweep, spacing: 'linear' }]], mayBeInfinite: ['magnitude[]'] },
  tankStress: { calls: [[{ ...tank, driveVoltage: 10, capacitorVoltageRating: 500, wireCurrentRating: 2 }], [{ ...seriesTank, drivePower: 5 }]] },
  tankNetlist: { calls: [[tank, { sweep, dataFile: 'x.data', title: 'demo' }], [seriesTank]] },
  frequencyGrid: { calls: [[sweep]] },
  combineQ: { calls: [[100, 400, Infinity], [Infinity]], mayBeInfinite: [''] },
  combineLoadedQ: { calls: [[100, 50], [Infinity, Infinity]], mayBeInfinite: [''] },
  insertionLoss: { calls: [[100, 50], [Infinity, 20]] },
  seriesToParallelResistance: { calls: [[2, 200]] },
  parallelToSeriesResistance: { calls: [[20e3, 200]] },
  transducerLoss: { calls: [[50, 2000, 0.9]] },
  mismatchLoss: { calls: [[50, z(100, 20)]] },
  terminationsCollapse: { calls: [[100, 5], [Infinity, Infinity]] },
  // the coil (other modules)
  ellipticK: { calls: [[0.5]] },
  ellipticE: { calls: [[0.5]] },
  ellipticD: { calls: [[0.5]] },
  awgDiameter: { calls: [[24], ['24']] },
  parseAwg: { calls: [['24'], [24]] },
  swgDiameter: { calls: [[24], ['24 SWG']] },
  parseSwg: { calls: [['24'], [24]] },
  enamelledDiameter: { calls: [[0.5e-3, 1], [0.5e-3]] },
  resistivityAtTemperature: { calls: [[40], []] },
  wireResistanceDc: { calls: [[10, 0.5e-3, 20]] },
  wireLengthForCoil: { calls: [[{ turns: 20, diameter: 20e-3, pitch: 1e-3, leadLength: 0.05 }]] },
  skinDepth: { calls: [[7e6]] },
  wireAcResistanceRatio: { calls: [[1e-3, 7e6]] },
  // skin depth is Infinity at DC (frequency 0), as documented
  wireInternalImpedance: { calls: [[1e-3, 7e6]], mayBeInfinite: ['skinDepth'] },
  nagaokaCoefficient: { calls: [[20e-3, 20e-3]] },
  rosaCorrections: { calls: [[20, 1e-3, 0.5e-3]] },
  rosaKm: { calls: [[20]] },
  rosaKs: { calls: [[1e-3, 0.5e-3]] },
  wheelerSolenoidInductance: { calls: [[0.01, 0.02, 20]] },
  solenoidInductance: { calls: [[solenoid]] },
  turnsForInductance: { calls: [[{ inductance: 4.7e-6, diameter: 20e-3, pitch: 1e-3, wireDiameter: 0.5e-3 }]] },
  medhurstFittedH: { calls: [[1]] },
  medhurstH: { calls: [[1]] },
  medhurstSelfCapacitance: { calls: [[20e-3, 20e-3]] },
  medhurstCapacitance: { calls: [[20e-3, 20e-3]] },
  selfResonantFrequency: { calls: [[4.7e-6, 3e-12]] },
  // apparent Q is Infinity for a lossless coil (resistance 0), as documented
  apparentCoil: { calls: [[{ inductance: 4.7e-6, resistance: 1, selfCapacitance: 3e-12, frequency: 7e6 }]], mayBeInfinite: ['apparentQ'] },
  toroidInductance: { calls: [[{ turns: 20, ...toroidCore }]] },
  toroidTurnsForInductance: { calls: [[{ inductance: 4.7e-6, ...toroidCore }]] },
  inductanceFromAl: { calls: [[4e-9, 20]] },
  turnsFromAl: { calls: [[4e-9, 4.7e-6]] },
  // a lossless core (μ'' = 0) with no winding Q has infinite Q, as documented
  toroidCoreQ: { calls: [[10, 0.05, 200], [10, 0.05]], mayBeInfinite: [''] },
  toroidWinding: { calls: [[{ turns: 20, outerDiameter: 12.7e-3, innerDiameter: 7.7e-3, height: 4.9e-3, insulatedDiameter: 0.55e-3, leadLength: 0.05 }]] },
  transverseFieldLoss: { calls: [[3]] },
  proximityFieldFactor: { calls: [[20], [1.5]] },
  solenoidProximityFactor: { calls: [[{ frequency: 7e6, turns: 20, wireDiameter: 0.5e-3, pitch: 1e-3 }]] },
  coilAcResistance: { calls: [[coilLoss]] },
  coilQ: { calls: [[{ ...coilLoss, inductance: 4.7e-6 }]] },
  multilayerInductance: { calls: [[{ ...multilayer, turns: 100 }]] },
  multilayerTurnsForInductance: { calls: [[{ ...multilayer, inductance: 100e-6 }]] },
  multilayerCapacity: { calls: [[10e-3, 5e-3, 0.3e-3]] },
  designCoil: {
    calls: [
      [{ form: 'solenoid', inductance: 4.7e-6, diameter: 20e-3, pitch: 1e-3, wire: { diameter: 0.5e-3, insulatedDiameter: 0.55e-3 }, frequency: 7e6, leadLength: 0.05, temperature: 20 }],
      [{ form: 'toroid', turns: 20, ...toroidCore, wire: { diameter: 0.5e-3 }, frequency: 7e6 }],
      [{ form: 'multilayer', inductance: 100e-6, ...multilayer, wire: { diameter: 0.3e-3 } }],
    ],
  },
};

const exports = Object.entries(core as Record<string, unknown>);
const functions = exports.filter(([, v]) => typeof v === 'function') as Array<[string, (...a: unknown[]) => unknown]>;

/** Paths of NaN or ±Infinity in a result ('' is the result itself; array elements as 'name[]'). */
function badNumbers(value: unknown, path = '', seen = new Set<unknown>()): string[] {
  if (typeof value === 'number') return Number.isFinite(value) ? [] : [`${path}=${String(value)}`];
  if (typeof value !== 'object' || value === null || seen.has(value)) return [];
  seen.add(value);
  if (ArrayBuffer.isView(value)) {
    const out: string[] = [];
    for (const x of Array.from(value as unknown as ArrayLike<number>)) if (typeof x === 'number' && !Number.isFinite(x)) out.push(`${path}[]=${String(x)}`);
    return out;
  }
  if (Array.isArray(value)) return value.flatMap((x) => badNumbers(x, `${path}[]`, seen));
  return Object.entries(value).flatMap(([k, x]) => badNumbers(x, path ? `${path}.${k}` : k, seen));
}

type Outcome = { ok: true } | { ok: false; why: string };

/** Call an export; returns what it returned or threw. */
function call(name: string, entry: Entry, args: unknown[]): { threw: true; error: unknown } | { threw: false; result: unknown } {
  const fn = (core as Record<string, unknown>)[name] as (...a: unknown[]) => unknown;
  try {
    return { threw: false, result: entry.construct ? new (fn as unknown as new (...a: unknown[]) => unknown)(...args) : fn(...args) };
  } catch (error) {
    return { threw: true, error };
  }
}

/** Judge a result by the rule: only documented Infinity, never NaN or −Infinity. */
function clean(entry: Entry, result: unknown): Outcome {
  if (entry.passThrough) return { ok: true };
  const allowed = new Set((entry.mayBeInfinite ?? []).map((p) => `${p}=Infinity`));
  const bad = badNumbers(result).filter((p) => !allowed.has(p));
  return bad.length === 0 ? { ok: true } : { ok: false, why: `returned ${bad.slice(0, 3).join(', ')}` };
}

/** Call and judge one call: a clean result or a DesignError. */
function judge(name: string, entry: Entry, args: unknown[]): Outcome {
  const r = call(name, entry, args);
  if (!r.threw) return clean(entry, r.result);
  const e = r.error;
  if (e instanceof core.DesignError && core.isDesignError(e) && typeof e.field === 'string' && e.message.length > 0) return { ok: true };
  return { ok: false, why: `threw ${(e as Error)?.name ?? typeof e}: ${(e as Error)?.message ?? String(e)}` };
}

function show(args: unknown[]): string {
  return args.map((a) => {
    if (typeof a === 'string') return JSON.stringify(a);
    if (typeof a === 'number' || a === undefined || a === null) return String(a);
    try {
      return JSON.stringify(a, (_, v) => (typeof v === 'number' && !Number.isFinite(v) ? String(v) : v === undefined ? 'undefined' : v));
    } catch {
      return String(a);
    }
  }).join(', ');
}

const isPlain = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && Object.getPrototypeOf(v) === Object.prototype;

/**
 * The places a hostile value can go in a call: each argument, each field of a
 * plain-object argument, and each field of a plain object inside it (one level).
 * Each place is a function from a value to the new argument list.
 */
function places(args: unknown[]): Array<{ where: string; put: (v: unknown) => unknown[] }> {
  const out: Array<{ where: string; put: (v: unknown) => unknown[] }> = [];
  args.forEach((arg, i) => {
    out.push({ where: `argument ${i + 1}`, put: (v) => args.map((a, j) => (j === i ? v : a)) });
    if (!isPlain(arg)) return;
    for (const [k, inner] of Object.entries(arg)) {
      out.push({ where: `argument ${i + 1}.${k}`, put: (v) => args.map((a, j) => (j === i ? { ...arg, [k]: v } : a)) });
      if (!isPlain(inner)) continue;
      for (const k2 of Object.keys(inner)) {
        out.push({ where: `argument ${i + 1}.${k}.${k2}`, put: (v) => args.map((a, j) => (j === i ? { ...arg, [k]: { ...inner, [k2]: v } } : a)) });
      }
    }
  });
  // one argument more than the baseline: a stray extra argument must not break anything either
  out.push({ where: `argument ${args.length + 1}`, put: (v) => [...args, v] });
  return out;
}

/** Cases run, for the closing figure. */
const count = { single: 0, random: 0 };

describe('every export of src/core, with hostile values', () => {
  it('every exported function has an entry in the table', () => {
    const missing = functions.map(([name]) => name).filter((name) => !(name in TABLE));
    expect(missing, `exports with no entry: add them to TABLE in ${import.meta.url}`).toEqual([]);
  });

  it('exported constants are finite numbers (or data made of them)', () => {
    const constants = exports.filter(([, v]) => typeof v !== 'function');
    expect(constants.length).toBeGreaterThan(0);
    for (const [name, v] of constants) expect(badNumbers(v), name).toEqual([]);
  });

  for (const [name] of functions) {
    const entry = TABLE[name];
    if (!entry) continue;
    it(`${name}: a clean result or a DesignError, one hostile value at a time and in random combinations`, () => {
      const failures: string[] = [];
      expect(entry.calls.length, `${name} needs at least one valid call`).toBeGreaterThan(0);
      for (const valid of entry.calls) {
        // the baseline is a valid call: it must not throw at all, and must be clean
        const base = call(name, entry, valid);
        if (base.threw) failures.push(`baseline (${show(valid)}) threw ${(base.error as Error)?.message}: the table's valid call is stale`);
        else {
          const o = clean(entry, base.result);
          if (!o.ok) failures.push(`baseline (${show(valid)}) ${o.why}`);
        }
        for (const place of places(valid)) {
          for (const h of HOSTILE) {
            const args = place.put(h);
            count.single++;
            const o = judge(name, entry, args);
            if (!o.ok) failures.push(`${place.where} = ${show([h])}: ${o.why}`);
          }
        }
        // random combinations: each place keeps its value, takes a hostile one, or a random double
        const slots = places(valid).slice(0, -1);
        const choice = fc.oneof(
          { weight: 2, arbitrary: fc.constant<'keep'>('keep') },
          { weight: 1, arbitrary: fc.constantFrom(...HOSTILE) },
          { weight: 1, arbitrary: fc.double({ noNaN: false }) },
          { weight: 1, arbitrary: fc.double({ min: -1e6, max: 1e6, noNaN: true }) },
        );
        fc.assert(
          fc.property(fc.array(choice, { minLength: slots.length, maxLength: slots.length }), (picks) => {
            let args = valid;
            picks.forEach((p, i) => {
              if (p === 'keep') return;
              // re-derive the place on the current arguments so several changes combine
              const here = places(args).find((s) => s.where === slots[i].where);
              if (here) args = here.put(p);
            });
            count.random++;
            const o = judge(name, entry, args);
            if (!o.ok) failures.push(`random (${show(args)}): ${o.why}`);
            return true;
          }),
          { numRuns: 40, seed: 20240607 },
        );
      }
      const unique = [...new Set(failures)];
      expect(unique.slice(0, 12), `${name}: ${unique.length} failing calls`).toEqual([]);
    });
  }

  it('figures: cases run', () => {
    // reported, not judged: single hostile values and random combinations over all exports
    console.log(`hostile sweep: ${functions.length} exported functions, ${count.single} single-value cases, ${count.random} random combinations`);
    expect(count.single).toBeGreaterThan(1000);
  });
});
