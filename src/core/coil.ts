/**
 * One coil design: `designCoil(spec)` is the single entry point for a coil, as
 * `analyzeTank` is for a tank. The spec is plain serialisable data in SI units
 * (a bench's state, a link, a saved draft and a shop-sheet file are all this
 * object); the result is plain data too.
 *
 * Each form of coil sits behind one small contract (`CoilContract`): the
 * geometry's checks, inductance for N turns, turns for an inductance, wire
 * length, loss and self-capacitance. The contracts only combine the core's own
 * models, which keep their sources and ranges:
 * - single-layer solenoid: Nagaoka's coefficient with Rosa's corrections
 *   (`solenoid.ts`), Butterworth's AC resistance (`coilLoss.ts`), Medhurst's
 *   self-capacitance and the lumped apparent values (`selfCapacitance.ts`);
 * - toroid of rectangular section: μ from the dimensions or a given AL, the
 *   wire's skin effect for the winding's Q, μ′/μ″ for the core's (`toroid.ts`,
 *   `skin.ts`); no self-capacitance is estimated;
 * - multilayer air coil: Wheeler 1928 (`multilayer.ts`); no AC resistance, Q or
 *   self-capacitance is estimated.
 * The inductance at the working frequency subtracts the part of the wire's
 * internal inductance that the skin effect removes (solenoid: Rosa's ks holds
 * its low-frequency value ¼ μ0 r per turn; `wireInternalImpedance` gives the
 * ratio at f). DesignErrors carry the spec path of the input at fault
 * ('diameter', 'wire.diameter', 'pitch', …), so a bench can show each at its field.
 */
import { TWO_PI } from './constants';
import { DesignError, isDesignError, requireFinite, requireInRange, requireNonNegative, requireObject } from './errors';
import { coilQ, solenoidLossSweep, type Uncertainty } from './coilLoss';
import { multilayerCapacity, multilayerInductance, multilayerTurnsForInductance } from './multilayer';
import { note, type DesignNote } from './notes';
import { apparentCoil, medhurstSelfCapacitance, selfResonantFrequency } from './selfCapacitance';
import { wireInternalImpedance } from './skin';
import { solenoidInductance, turnsForInductance, type SolenoidResult } from './solenoid';
import { frequencyGrid } from './sweep';
import { sayMm, sayNumber } from './text';
import { toroidCoreQ, toroidInductance, toroidTurnsForInductance, toroidWinding } from './toroid';
import { resistivityAtTemperature, wireLengthForCoil, wireResistanceDc } from './wire';

// ---------------------------------------------------------------------------
// The spec

export type CoilForm = 'solenoid' | 'toroid' | 'multilayer';

/** The wire: one meaning per name, as everywhere in the core. */
export interface CoilWireSpec {
  /** Bare copper diameter, metres. */
  diameter: number;
  /** Overall diameter over the insulation, metres (≥ diameter); omitted for bare wire. */
  insulatedDiameter?: number;
}

/** What every form shares. Give `inductance` (turns are found) or `turns` (inductance is found), not both. */
export interface CoilSpecCommon {
  /** Wanted inductance, henries. */
  inductance?: number;
  /** Turns as wound (solenoid: half turns allowed; toroid and multilayer: whole turns). */
  turns?: number;
  wire: CoilWireSpec;
  /** Working frequency, hertz; the frequency-dependent results need it. */
  frequency?: number;
  /** Length of EACH of the two leads, metres (default 0). */
  leadLength?: number;
  /** Wire temperature, °C (default 20). */
  temperature?: number;
  /** Points of the Q and apparent-inductance sweep (2 … 10,000; solenoid with a frequency only); omitted: no sweep. */
  sweepPoints?: number;
}

export interface SolenoidCoilSpec extends CoilSpecCommon {
  form: 'solenoid';
  /** MEAN winding diameter, wire centre to wire centre, metres (a former's diameter plus one overall wire diameter). */
  diameter: number;
  /** Pitch, centre to centre of adjacent turns, metres; not needed when closeWound. */
  pitch?: number;
  /** Turns touching: the pitch is the wire's overall diameter (insulatedDiameter, or the bare diameter). */
  closeWound?: boolean;
}

export interface ToroidCoilSpec extends CoilSpecCommon {
  form: 'toroid';
  /** Core outer diameter, metres. */
  outerDiameter: number;
  /** Core inner diameter (the hole), metres. */
  innerDiameter: number;
  /** Core height (axial thickness), metres. */
  height: number;
  /** μ′ of the core at the working frequency (1 for an air or plastic ring); needed unless `al` is given, and for the core's Q. */
  relativePermeability?: number;
  /** AL, henries per turn² (a maker's 250 nH/turn² is 250e-9); when given it sets the inductance. */
  al?: number;
  /** μ″ of the core at the working frequency (≥ 0) for the core's Q = μ′/μ″; omitted: core loss not counted. */
  muImag?: number;
}

export interface MultilayerCoilSpec extends CoilSpecCommon {
  form: 'multilayer';
  /** Mean winding diameter (to the middle of the winding depth), metres. */
  diameter: number;
  /** Winding length along the axis, metres. */
  length: number;
  /** Winding depth, outer radius − inner radius, metres. */
  windingDepth: number;
}

export type DesignCoilSpec = SolenoidCoilSpec | ToroidCoilSpec | MultilayerCoilSpec;

/** Every spec path a DesignError from `designCoil` can name. */
export const COIL_SPEC_FIELDS = [
  'form', 'inductance', 'turns', 'diameter', 'pitch', 'closeWound', 'outerDiameter', 'innerDiameter', 'height',
  'relativePermeability', 'al', 'muImag', 'length', 'windingDepth', 'wire', 'wire.diameter', 'wire.insulatedDiameter',
  'frequency', 'leadLength', 'temperature', 'sweepPoints',
] as const;
export type CoilSpecField = (typeof COIL_SPEC_FIELDS)[number];

// ---------------------------------------------------------------------------
// The result

/** Q and apparent inductance against frequency, f/10 … 0.9 f_sr (solenoid). Equal-length arrays; the last point is the last frequency computed. */
export interface CoilSweep {
  /** Hz, log-spaced. */
  frequency: number[];
  /** The coil's own Q, ωL_f/R_ac. */
  q: number[];
  /** The Q measured across the coil, lowered by its self-capacitance: Q (1 − ω²L C_s). */
  qAcrossCoil: number[];
  /** Apparent inductance L_f/(1 − ω²L C_s), henries. */
  apparentInductance: number[];
}

export interface DesignCoilResult {
  form: CoilForm;
  /** Turns as wound: the nearest half turn (solenoid) or whole turn (toroid, multilayer) when an inductance was given; else the turns given. */
  turns: number;
  /** Real-valued turns that give exactly the wanted inductance (only when an inductance was given). */
  exactTurns?: number;
  /** The wanted inductance, henries (only when one was given). */
  targetInductance?: number;
  /** Low-frequency inductance as wound, henries. */
  inductance: number;
  /** Wire to cut: winding plus both leads, metres. */
  wireLength: number;
  /** DC resistance of winding and leads at the temperature, ohms. */
  resistanceDc: number;

  // — solenoid —
  /** Wheeler's 1928 short-coil formula for comparison (current sheet), henries. */
  wheelerInductance?: number;
  /** Nagaoka's current-sheet inductance before Rosa's corrections, henries. */
  currentSheetInductance?: number;
  /** The wire's low-frequency internal inductance included in `inductance` (¼ μ0 r N), henries. */
  internalInductance?: number;
  /** Winding length, metres (solenoid N·p; multilayer as given). */
  windingLength?: number;
  /** Pitch used, metres (close-wound: the wire's overall diameter). */
  pitch?: number;

  // — toroid —
  /** AL used, henries per turn² (given, or from μ′ and the dimensions). */
  al?: number;
  /** Effective magnetic path length (IEC 60205), metres. */
  effectivePathLength?: number;
  /** Effective cross-section area (IEC 60205), square metres. */
  effectiveArea?: number;
  /** Wire in one turn round the core's section, metres. */
  lengthPerTurn?: number;
  /** Turns that lie side by side in one layer round the hole. */
  turnsPerLayer?: number;
  /** Q of the core alone, μ′/μ″ (only when μ″ > 0 was given, with a frequency). */
  coreQ?: number;
  /** Q of the winding alone, skin effect only (toroid, with a frequency): an upper bound. */
  windingQ?: number;

  // — multilayer —
  /** Largest ÷ smallest of Wheeler's denominator terms (1 = ideal). */
  termRatio?: number;
  /** Turns of this wire that fit the winding section wound layer on layer. */
  capacity?: number;
  /** Whether the turns fit the section (turns ≤ capacity). */
  fits?: boolean;

  // — at the working frequency (when `frequency` was given) —
  frequency?: number;
  /** Skin depth in the wire at the frequency and temperature, metres. */
  skinDepth?: number;
  /** Inductance at the frequency: the skin effect removes part of the wire's internal inductance (solenoid); else as `inductance`. */
  inductanceAtFrequency?: number;
  /** AC resistance of winding and leads, ohms (solenoid: Butterworth; toroid: skin effect only, a lower bound). */
  resistanceAc?: number;
  /** Unloaded Q, ωL_f/R_ac (toroid: combined with the core's Q). */
  q?: number;
  /** Lowest Q the models allow (solenoid). */
  qLow?: number;
  /** Highest Q the models allow (solenoid: one-sided by Butterworth's known overstatement; toroid: q itself, an upper bound). */
  qHigh?: number;
  /** The Q band as fractions of q (solenoid only). */
  qUncertainty?: Uncertainty;
  /** Apparent inductance at the frequency, L_f/(1 − ω²L_f C_s), henries (solenoid). */
  apparentInductance?: number;
  /** Apparent series resistance at the frequency, ohms (solenoid). */
  apparentResistance?: number;
  /** Q measured across the coil at the frequency, lowered by its self-capacitance (solenoid). */
  apparentQ?: number;

  // — self-capacitance (solenoid) —
  /** Medhurst's self-capacitance, farads. */
  selfCapacitance?: number;
  /** Lumped self-resonant frequency 1/(2π√(L C_s)), hertz, with L at the working frequency when one was given. */
  selfResonantFrequency?: number;

  /** Validity notes, cautions and remarks, deduplicated; `field` is a spec path where there is one. */
  notes: DesignNote[];
  /** Q and apparent L against frequency (solenoid, when `sweepPoints` and `frequency` were given). */
  sweep?: CoilSweep;
}

// ---------------------------------------------------------------------------
// Checked common inputs

/** The spec's common inputs after checking, with defaults filled in. */
interface CommonInputs {
  target?: number;
  turns?: number;
  wireDiameter: number;
  insulatedDiameter: number;
  insulated: boolean;
  frequency?: number;
  leadLength: number;
  temperature: number;
  resistivity: number;
  sweepPoints?: number;
}

/** Limits outside which a coil cannot be built (and the arithmetic would overflow or underflow). */
const LIMITS = {
  length: [1e-6, 100] as const, // m: 1 µm … 100 m
  inductance: [1e-12, 1e3] as const, // H
  frequency: [1e-3, 1e12] as const, // Hz
  turns: [1, 1e7] as const,
  al: [1e-15, 1e-2] as const, // H/turn²
  permeability: [1e-3, 1e7] as const,
  temperature: [-273.15, 1000] as const, // °C
};

function checkLength(field: string, value: unknown, what: string): number {
  const v = requireFinite(field, value, what);
  if (v <= 0) throw new DesignError(field, v === 0 ? `${what} must be greater than zero.` : `${what} must be greater than zero (got ${sayMm(v)}).`);
  return requireInRange(field, v, LIMITS.length[0], LIMITS.length[1], what, 'm');
}

function checkCommon(spec: DesignCoilSpec): CommonInputs {
  const hasL = spec.inductance !== undefined;
  const hasN = spec.turns !== undefined;
  if (hasL && hasN) throw new DesignError('turns', 'Give either the inductance wanted or the number of turns, not both.');
  if (!hasL && !hasN) throw new DesignError('inductance', 'Give the inductance wanted, or the number of turns.');
  const target = hasL ? requireInRange('inductance', requireFinite('inductance', spec.inductance, 'Inductance'), LIMITS.inductance[0], LIMITS.inductance[1], 'Inductance', 'H') : undefined;
  let turns: number | undefined;
  if (hasN) {
    turns = requireFinite('turns', spec.turns, 'Turns');
    if (turns < 1) throw new DesignError('turns', `A coil needs at least one turn (got ${sayNumber(turns)}).`);
    requireInRange('turns', turns, LIMITS.turns[0], LIMITS.turns[1], 'Turns');
  }
  const wire = requireObject<CoilWireSpec>('wire', spec.wire, 'The wire');
  const wireDiameter = checkLength('wire.diameter', wire.diameter, 'The bare wire diameter');
  let insulatedDiameter = wireDiameter;
  const insulated = wire.insulatedDiameter !== undefined;
  if (insulated) {
    insulatedDiameter = checkLength('wire.insulatedDiameter', wire.insulatedDiameter, 'The wire’s overall diameter');
    if (insulatedDiameter < wireDiameter) {
      throw new DesignError('wire.insulatedDiameter', `The ${sayMm(insulatedDiameter)} diameter over the insulation is smaller than the ${sayMm(wireDiameter)} bare wire.`);
    }
  }
  const frequency = spec.frequency === undefined ? undefined : requireInRange('frequency', requireFinite('frequency', spec.frequency, 'Frequency'), LIMITS.frequency[0], LIMITS.frequency[1], 'Frequency', 'Hz');
  const leadLength = spec.leadLength === undefined ? 0 : requireInRange('leadLength', requireNonNegative('leadLength', spec.leadLength, 'The lead length', 'm'), 0, LIMITS.length[1], 'The lead length', 'm');
  const temperature = spec.temperature === undefined ? 20 : requireInRange('temperature', requireFinite('temperature', spec.temperature, 'Temperature'), LIMITS.temperature[0], LIMITS.temperature[1], 'Temperature');
  const resistivity = resistivityAtTemperature(temperature);
  let sweepPoints: number | undefined;
  if (spec.sweepPoints !== undefined) {
    const n = spec.sweepPoints;
    if (typeof n !== 'number' || !Number.isInteger(n) || n < 2 || n > 10_000) {
      throw new DesignError('sweepPoints', `Sweep points must be a whole number from 2 to 10,000 (got ${typeof n === 'number' ? sayNumber(n) : typeof n}).`);
    }
    sweepPoints = n;
  }
  return { target, turns, wireDiameter, insulatedDiameter, insulated, frequency, leadLength, temperature, resistivity, sweepPoints };
}

// ---------------------------------------------------------------------------
// The contract each form fulfils

/** The winding as found: turns, inductance and what the form adds to the result. */
interface Winding {
  turns: number;
  exactTurns?: number;
  inductance: number;
  notes: DesignNote[];
  extra: Partial<DesignCoilResult>;
}

/** Loss at the working frequency. */
interface Loss {
  inductanceAtFrequency: number;
  skinDepth: number;
  resistanceAc?: number;
  q?: number;
  qLow?: number;
  qHigh?: number;
  qUncertainty?: Uncertainty;
  notes: DesignNote[];
  extra: Partial<DesignCoilResult>;
}

/**
 * One form of coil. `G` is its checked geometry. Every method takes plain
 * numbers and returns plain data; `designCoil` runs them in order.
 */
interface CoilContract<G> {
  /** Core argument names → spec paths, for errors and notes. */
  readonly fields: Readonly<Record<string, CoilSpecField | null>>;
  /** Checks the form's geometry in the spec. */
  geometry(spec: DesignCoilSpec, common: CommonInputs): G;
  inductanceForTurns(g: G, turns: number, common: CommonInputs): Winding;
  turnsForInductance(g: G, inductance: number, common: CommonInputs): Winding;
  wireLength(g: G, winding: Winding, common: CommonInputs): { wireLength: number; notes: DesignNote[]; extra: Partial<DesignCoilResult> };
  /** Loss at `common.frequency` (given). */
  loss(g: G, winding: Winding, wireLength: number, resistanceDc: number, common: CommonInputs & { frequency: number }): Loss;
  /** Self-capacitance, or a note that none is estimated. */
  selfCapacitance(g: G, winding: Winding): { selfCapacitance?: number; notes: DesignNote[] };
}

/** Shared field names (core argument → spec path). */
const COMMON_FIELDS: Readonly<Record<string, CoilSpecField | null>> = {
  inductance: 'inductance',
  turns: 'turns',
  wireDiameter: 'wire.diameter',
  insulatedDiameter: 'wire.insulatedDiameter',
  frequency: 'frequency',
  s: 'frequency',
  resistance: null,
  windingQ: 'frequency',
  leadLength: 'leadLength',
  temperature: 'temperature',
  resistivity: 'temperature',
  temperatureCoefficient: 'temperature',
  sweepPoints: 'sweepPoints',
  start: 'frequency',
  stop: 'frequency',
  points: 'sweepPoints',
};

/** Skin effect at the frequency: the wire's internal inductance ratio and R_ac/R_dc. */
function skinAt(common: CommonInputs, frequency: number) {
  return wireInternalImpedance(common.wireDiameter, frequency, common.resistivity);
}

// — single-layer solenoid —

interface SolenoidGeometry {
  diameter: number;
  pitch: number;
}

function solenoidWinding(sol: SolenoidResult, turns: number, pitch: number, exactTurns?: number, notes: DesignNote[] = []): Winding {
  return {
    turns,
    exactTurns,
    inductance: sol.inductance,
    notes: [...notes, ...sol.notes],
    extra: {
      wheelerInductance: sol.wheelerInductance,
      currentSheetInductance: sol.currentSheetInductance,
      internalInductance: sol.internalInductance,
      windingLength: sol.length,
      pitch,
    },
  };
}

const SOLENOID: CoilContract<SolenoidGeometry> = {
  fields: { diameter: 'diameter', pitch: 'pitch', closeWound: 'closeWound', length: null, radius: 'diameter', m: 'diameter', mc: 'pitch', lengthOverDiameter: 'pitch', selfCapacitance: 'diameter' },
  geometry(spec, common) {
    const s = spec as SolenoidCoilSpec;
    const diameter = checkLength('diameter', s.diameter, 'The mean winding diameter');
    if (s.closeWound !== undefined && typeof s.closeWound !== 'boolean') {
      throw new DesignError('closeWound', 'Close-wound must be true or false.');
    }
    let pitch: number;
    if (s.closeWound) {
      pitch = common.insulatedDiameter;
    } else {
      if (s.pitch === undefined) throw new DesignError('pitch', 'Give the pitch (turn spacing), or choose close-wound.');
      pitch = checkLength('pitch', s.pitch, 'The pitch');
      if (pitch < common.insulatedDiameter) {
        throw new DesignError(
          'pitch',
          common.insulated
            ? `pitch ${sayMm(pitch)} is smaller than the wire's ${sayMm(common.insulatedDiameter)} diameter over its insulation: turns would overlap.`
            : `pitch ${sayMm(pitch)} is smaller than the wire's ${sayMm(common.wireDiameter)} diameter: turns would overlap.`,
        );
      }
    }
    return { diameter, pitch };
  },
  inductanceForTurns(g, turns, common) {
    const sol = solenoidInductance({ diameter: g.diameter, turns, pitch: g.pitch, wireDiameter: common.wireDiameter });
    const notes: DesignNote[] = [];
    if (Math.abs(2 * turns - Math.round(2 * turns)) > 1e-9) {
      notes.push(note('info', `${sayNumber(turns, 6)} turns: a real coil has whole or half turns (leads on the same or on opposite sides).`, 'turns'));
    }
    return solenoidWinding(sol, turns, g.pitch, undefined, notes);
  },
  turnsForInductance(g, inductance, common) {
    const t = turnsForInductance({ inductance, diameter: g.diameter, pitch: g.pitch, wireDiameter: common.wireDiameter });
    return solenoidWinding(t.practical, t.practicalTurns, g.pitch, t.turns, t.notes.filter((n) => !t.practical.notes.includes(n)));
  },
  wireLength(g, w, common) {
    return { wireLength: wireLengthForCoil({ turns: w.turns, diameter: g.diameter, pitch: g.pitch, leadLength: common.leadLength }), notes: [], extra: {} };
  },
  loss(g, w, _wireLength, _resistanceDc, common) {
    const skin = skinAt(common, common.frequency);
    const internal = w.extra.internalInductance ?? 0;
    const inductanceAtFrequency = w.inductance - internal * (1 - skin.internalInductanceRatio);
    const loss = coilQ({
      frequency: common.frequency, turns: w.turns, diameter: g.diameter, pitch: g.pitch, wireDiameter: common.wireDiameter,
      leadLength: common.leadLength, temperature: common.temperature, inductance: inductanceAtFrequency,
    });
    return {
      inductanceAtFrequency,
      skinDepth: skin.skinDepth,
      resistanceAc: loss.acResistance,
      q: loss.q,
      qLow: loss.qLow,
      qHigh: loss.qHigh,
      qUncertainty: loss.qUncertainty,
      notes: loss.notes,
      extra: {},
    };
  },
  selfCapacitance(g, w) {
    const cs = medhurstSelfCapacitance(g.diameter, w.extra.windingLength ?? w.turns * g.pitch);
    return { selfCapacitance: cs.selfCapacitance, notes: cs.notes };
  },
};

// — toroid —

type ToroidGeometry = Pick<ToroidCoilSpec, 'outerDiameter' | 'innerDiameter' | 'height' | 'relativePermeability' | 'al' | 'muImag'>;

function toroidWindingResult(g: ToroidGeometry, turns: number, inductance: number, al: number, notes: DesignNote[], exactTurns?: number): Winding {
  const factors = toroidInductance({ ...g, turns: 1 });
  return { turns, exactTurns, inductance, notes, extra: { al, effectivePathLength: factors.effectivePathLength, effectiveArea: factors.effectiveArea } };
}

const TOROID: CoilContract<ToroidGeometry> = {
  fields: { outerDiameter: 'outerDiameter', innerDiameter: 'innerDiameter', height: 'height', relativePermeability: 'relativePermeability', muReal: 'relativePermeability', al: 'al', muImag: 'muImag' },
  geometry(spec) {
    const s = spec as ToroidCoilSpec;
    const g: ToroidGeometry = {
      outerDiameter: checkLength('outerDiameter', s.outerDiameter, 'The outer diameter'),
      innerDiameter: checkLength('innerDiameter', s.innerDiameter, 'The inner diameter'),
      height: checkLength('height', s.height, 'The core height'),
    };
    if (s.relativePermeability !== undefined) {
      g.relativePermeability = requireInRange('relativePermeability', requireFinite('relativePermeability', s.relativePermeability, 'Permeability μ′'), LIMITS.permeability[0], LIMITS.permeability[1], 'Permeability μ′');
    }
    if (s.al !== undefined) g.al = requireInRange('al', requireFinite('al', s.al, 'AL'), LIMITS.al[0], LIMITS.al[1], 'AL', 'H');
    if (s.muImag !== undefined) {
      g.muImag = requireInRange('muImag', requireFinite('muImag', s.muImag, 'Loss permeability μ″'), 0, LIMITS.permeability[1], 'Loss permeability μ″');
      if (g.muImag > 0 && g.relativePermeability === undefined) {
        throw new DesignError('relativePermeability', 'The core’s Q is μ′/μ″: give μ′ as well as μ″.');
      }
    }
    return g;
  },
  inductanceForTurns(g, turns) {
    const t = toroidInductance({ ...g, turns });
    return toroidWindingResult(g, turns, t.inductance, t.al, t.notes);
  },
  turnsForInductance(g, inductance) {
    const t = toroidTurnsForInductance({ ...g, inductance });
    return toroidWindingResult(g, t.practicalTurns, t.practicalInductance, t.al, t.notes, t.turns);
  },
  wireLength(g, w, common) {
    const winding = toroidWinding({
      turns: w.turns, outerDiameter: g.outerDiameter, innerDiameter: g.innerDiameter, height: g.height,
      insulatedDiameter: common.insulatedDiameter, leadLength: common.leadLength,
    });
    return { wireLength: winding.wireLength, notes: winding.notes, extra: { lengthPerTurn: winding.lengthPerTurn, turnsPerLayer: winding.turnsPerLayer } };
  },
  loss(g, w, _wireLength, resistanceDc, common) {
    const skin = skinAt(common, common.frequency);
    const resistanceAc = resistanceDc * skin.resistanceRatio;
    const windingQ = (TWO_PI * common.frequency * w.inductance) / resistanceAc;
    const lossy = g.muImag !== undefined && g.muImag > 0 && g.relativePermeability !== undefined;
    const coreQ = lossy ? toroidCoreQ(g.relativePermeability!, g.muImag!) : undefined;
    const q = lossy ? toroidCoreQ(g.relativePermeability!, g.muImag!, windingQ) : windingQ;
    const notes = [
      note('info', "The winding's AC resistance here is the skin effect of the wire alone; the proximity of neighbouring turns adds to it by an amount not estimated here, so the winding's Q and the coil's Q are upper bounds."),
    ];
    if (!lossy) notes.push(note('info', 'No core loss counted (μ″ not given or zero): the Q is the winding’s alone.', 'muImag'));
    return {
      inductanceAtFrequency: w.inductance,
      skinDepth: skin.skinDepth,
      resistanceAc,
      q,
      qHigh: q,
      notes,
      extra: { windingQ, ...(coreQ === undefined ? {} : { coreQ }) },
    };
  },
  selfCapacitance() {
    return { notes: [note('info', 'No self-capacitance or self-resonance is estimated for toroids.')] };
  },
};

// — multilayer —

type MultilayerGeometry = Pick<MultilayerCoilSpec, 'diameter' | 'length' | 'windingDepth'>;

const MULTILAYER: CoilContract<MultilayerGeometry> = {
  fields: { diameter: 'diameter', length: 'length', windingDepth: 'windingDepth' },
  geometry(spec) {
    const s = spec as MultilayerCoilSpec;
    return {
      diameter: checkLength('diameter', s.diameter, 'The mean winding diameter'),
      length: checkLength('length', s.length, 'The winding length'),
      windingDepth: checkLength('windingDepth', s.windingDepth, 'The winding depth'),
    };
  },
  inductanceForTurns(g, turns) {
    const m = multilayerInductance({ ...g, turns });
    const notes = Number.isInteger(turns) ? m.notes : [...m.notes, note('info', `${sayNumber(turns, 6)} turns: a multilayer winding has whole turns.`, 'turns')];
    return { turns, inductance: m.inductance, notes, extra: { termRatio: m.termRatio, windingLength: g.length } };
  },
  turnsForInductance(g, inductance) {
    const t = multilayerTurnsForInductance({ ...g, inductance });
    return { turns: t.practicalTurns, exactTurns: t.turns, inductance: t.practicalInductance, notes: t.notes, extra: { termRatio: t.termRatio, windingLength: g.length } };
  },
  wireLength(g, w, common) {
    const wireLength = wireLengthForCoil({ turns: w.turns, diameter: g.diameter, pitch: 0, leadLength: common.leadLength });
    const capacity = multilayerCapacity(g.length, g.windingDepth, common.insulatedDiameter);
    const fits = w.turns <= capacity;
    const notes = fits
      ? []
      : [note('validity', `${sayNumber(w.turns, 6)} turns of ${sayMm(common.insulatedDiameter)} wire do not fit a ${sayMm(g.length)} × ${sayMm(g.windingDepth)} winding section (about ${sayNumber(capacity, 6)} do, wound layer on layer): make the section bigger or the wire thinner.`, 'windingDepth')];
    return { wireLength, notes, extra: { capacity, fits } };
  },
  loss(_g, w, _wireLength, _resistanceDc, common) {
    return {
      inductanceAtFrequency: w.inductance,
      skinDepth: skinAt(common, common.frequency).skinDepth,
      notes: [],
      extra: {},
    };
  },
  selfCapacitance() {
    return {
      notes: [note('info', 'AC resistance, Q and self-capacitance of a multilayer winding are not estimated here: the proximity loss between layers is large and depends on how the wire is laid. Measure Q, or use a single-layer coil where Q matters.')],
    };
  },
};

const CONTRACTS: Readonly<Record<CoilForm, CoilContract<unknown>>> = {
  solenoid: SOLENOID as CoilContract<unknown>,
  toroid: TOROID as CoilContract<unknown>,
  multilayer: MULTILAYER as CoilContract<unknown>,
};

// ---------------------------------------------------------------------------
// designCoil

/** Spec path for a core argument name; `null` where there is none. */
function specField(contract: CoilContract<unknown>, field: string | undefined): CoilSpecField | null {
  if (field === undefined) return null;
  if (field in contract.fields) return contract.fields[field];
  if (field in COMMON_FIELDS) return COMMON_FIELDS[field];
  return (COIL_SPEC_FIELDS as readonly string[]).includes(field) ? (field as CoilSpecField) : null;
}

function dedupe(notes: DesignNote[], contract: CoilContract<unknown>): DesignNote[] {
  const seen = new Set<string>();
  const out: DesignNote[] = [];
  for (const n of notes) {
    if (seen.has(n.message)) continue;
    seen.add(n.message);
    const field = specField(contract, n.field);
    out.push(field === null ? note(n.level, n.message) : note(n.level, n.message, field));
  }
  return out;
}

/**
 * Designs or analyses a coil from a plain spec (SI units): the turns to wind for
 * an inductance, or the inductance of a winding; wire to cut; DC resistance;
 * and, at a working frequency, AC resistance, Q with its band, self-capacitance,
 * self-resonance, the inductance at the frequency and the apparent values, with
 * an optional sweep for a plot. See `DesignCoilSpec` and `DesignCoilResult`;
 * the models and their sources are those of the modules each form combines
 * (module header).
 * @throws DesignError whose `field` is a spec path ('diameter', 'wire.diameter', 'pitch', …)
 */
export function designCoil(spec: DesignCoilSpec): DesignCoilResult {
  requireObject<DesignCoilSpec>('form', spec, 'The coil spec');
  const form = spec.form;
  if (form !== 'solenoid' && form !== 'toroid' && form !== 'multilayer') {
    throw new DesignError('form', `The coil form must be "solenoid", "toroid" or "multilayer" (got ${typeof form === 'string' ? `“${form}”` : typeof form}).`);
  }
  const contract = CONTRACTS[form];
  const common = checkCommon(spec);
  try {
    return compute(form, contract, spec, common);
  } catch (e) {
    if (!isDesignError(e)) throw e;
    const field = specField(contract, e.field) ?? (common.target !== undefined ? 'inductance' : 'turns');
    throw new DesignError(field, e.message);
  }
}

function compute(form: CoilForm, contract: CoilContract<unknown>, spec: DesignCoilSpec, common: CommonInputs): DesignCoilResult {
  const g = contract.geometry(spec, common);
  const winding = common.target !== undefined
    ? contract.turnsForInductance(g, common.target, common)
    : contract.inductanceForTurns(g, common.turns!, common);
  const wire = contract.wireLength(g, winding, common);
  const resistanceDc = wireResistanceDc(wire.wireLength, common.wireDiameter, common.temperature);
  const notes: DesignNote[] = [...winding.notes, ...wire.notes];
  const result: DesignCoilResult = {
    form,
    turns: winding.turns,
    ...(winding.exactTurns === undefined ? {} : { exactTurns: winding.exactTurns }),
    ...(common.target === undefined ? {} : { targetInductance: common.target }),
    inductance: winding.inductance,
    wireLength: wire.wireLength,
    resistanceDc,
    ...winding.extra,
    ...wire.extra,
    notes,
  };

  let loss: Loss | undefined;
  if (common.frequency !== undefined) {
    const at = { ...common, frequency: common.frequency };
    loss = contract.loss(g, winding, wire.wireLength, resistanceDc, at);
    notes.push(...loss.notes);
    Object.assign(result, {
      frequency: common.frequency,
      skinDepth: loss.skinDepth,
      inductanceAtFrequency: loss.inductanceAtFrequency,
      ...definedOnly({ resistanceAc: loss.resistanceAc, q: loss.q, qLow: loss.qLow, qHigh: loss.qHigh, qUncertainty: loss.qUncertainty }),
      ...loss.extra,
    });
  }

  const self = contract.selfCapacitance(g, winding);
  notes.push(...self.notes);
  if (self.selfCapacitance !== undefined) {
    const lf = loss?.inductanceAtFrequency ?? winding.inductance;
    result.selfCapacitance = self.selfCapacitance;
    result.selfResonantFrequency = selfResonantFrequency(lf, self.selfCapacitance);
    if (loss !== undefined && loss.resistanceAc !== undefined) {
      const app = apparentCoil({ inductance: lf, resistance: loss.resistanceAc, selfCapacitance: self.selfCapacitance, frequency: common.frequency! });
      result.apparentInductance = app.apparentInductance;
      result.apparentResistance = app.apparentResistance;
      result.apparentQ = app.apparentQ;
      notes.push(...app.notes);
      if (common.sweepPoints !== undefined) {
        result.sweep = solenoidSweep(g as SolenoidGeometry, winding, common, self.selfCapacitance, result.selfResonantFrequency, common.sweepPoints);
      }
    }
  }
  result.notes = dedupe(notes, contract);
  return result;
}

function definedOnly<T extends object>(o: T): Partial<T> {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as Partial<T>;
}

/**
 * Q, Q across the coil and apparent inductance from f/10 to 0.9 f_sr (or to f
 * when f is above that), log-spaced (`frequencyGrid`); at each point the same
 * models as at the working frequency: L_f with the skin effect's share of the
 * internal inductance, R_ac from `coilAcResistance`, and the lumped
 * self-capacitance (Terman's apparent values). A point at or above its own
 * self-resonance ends the sweep, so the last point is the last one computed.
 */
function solenoidSweep(g: SolenoidGeometry, w: Winding, common: CommonInputs, selfCapacitance: number, srf: number, points: number): CoilSweep {
  const f = common.frequency!;
  const grid = frequencyGrid({ start: f / 10, stop: Math.max(0.9 * srf, f), points });
  const internal = w.extra.internalInductance ?? 0;
  const loss = solenoidLossSweep(
    { turns: w.turns, diameter: g.diameter, pitch: g.pitch, wireDiameter: common.wireDiameter, leadLength: common.leadLength, temperature: common.temperature },
    grid,
  );
  const out: CoilSweep = { frequency: [], q: [], qAcrossCoil: [], apparentInductance: [] };
  for (let i = 0; i < grid.length; i++) {
    const fi = grid[i];
    const li = w.inductance - internal * (1 - loss.internalInductanceRatio[i]);
    const ratio = fi / selfResonantFrequency(li, selfCapacitance);
    const k = 1 - ratio * ratio;
    if (!(k > 0)) break;
    const q = (TWO_PI * fi * li) / loss.acResistance[i];
    out.frequency.push(fi);
    out.q.push(q);
    out.qAcrossCoil.push(q * k);
    out.apparentInductance.push(li / k);
  }
  return out;
}
