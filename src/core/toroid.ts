/**
 * Toroidal inductor on a core of rectangular cross-section, and the
 * inductance factor AL.
 *
 * Model: Ampère's law round a closed core. With N turns spread evenly round a
 * core of inner diameter ID, outer diameter OD and height h, the field at radius
 * ρ is N I / (2πρ) and the flux through the cross-section integrates to
 *   L = μ0 μr N² h ln(OD/ID) / (2π),
 * exact for a uniform winding (all flux inside the core; no leakage). Effective
 * magnetic path length and area after IEC 60205 (core factors C1 = Σ l/A,
 * C2 = Σ l/A²: le = C1²/C2, Ae = C1/C2). Sources: Grover, *Inductance
 * Calculations* (1946), toroidal coils; Snelling, *Soft Ferrites* (1988), ch. 2;
 * IEC 60205.
 *
 * Core loss from complex permeability μ = μ' − jμ'' (series form): the core
 * alone has Q = μ'/μ''; the coil's Q combines as 1/Q = 1/Q_core + 1/Q_winding
 * (Snelling 1988; Pozar, *Microwave Engineering*, for the combination rule).
 *
 * AL: inductance per turn squared, L = AL N². The core module keeps AL in
 * henries per turn² (SI). Core makers quote it in nH/turn² (sometimes as µH per
 * 100 turns: 1 µH/100 t = 0.1 nH/t²); the quantity field converts, so
 * "250 nH" entered as AL becomes 250e-9 here.
 */
import { MU_0, TWO_PI } from './constants';
import { DesignError, requireNonNegative, requirePositive } from './errors';
import { note, type DesignNote } from './notes';


export interface ToroidInput {
  /** Number of turns N (passes through the core's hole). */
  turns: number;
  /** Core outer diameter OD, metres. */
  outerDiameter: number;
  /** Core inner diameter ID, metres (0 < ID < OD). */
  innerDiameter: number;
  /** Core height (axial thickness) h, metres. */
  height: number;
  /** Relative permeability μr (real part μ' of the core's initial permeability; 1 for an air or plastic former). */
  relativePermeability: number;
}

export interface ToroidResult {
  /** Inductance, henries. */
  inductance: number;
  /** Inductance factor AL = L/N², henries per turn². */
  al: number;
  /** Effective magnetic path length le (IEC 60205), metres. */
  effectivePathLength: number;
  /** Effective cross-section area Ae (IEC 60205), square metres. */
  effectiveArea: number;
  notes: DesignNote[];
}

type ToroidCore = Omit<ToroidInput, 'turns'>;

function validateCore(core: ToroidCore): void {
  requirePositive('outerDiameter', core.outerDiameter, 'Outer diameter');
  requirePositive('innerDiameter', core.innerDiameter, 'Inner diameter');
  requirePositive('height', core.height, 'Core height');
  requirePositive('relativePermeability', core.relativePermeability, 'Relative permeability');
  if (core.innerDiameter >= core.outerDiameter) {
    throw new DesignError(
      'innerDiameter',
      `The inner diameter (${mmText(core.innerDiameter)}) must be smaller than the outer diameter (${mmText(core.outerDiameter)}).`,
    );
  }
}

function mmText(x: number): string {
  return `${Number((x * 1e3).toPrecision(3))} mm`;
}

/** AL of a rectangular-section toroid: μ0 μr h ln(OD/ID) / (2π), H per turn². */
function coreAl(core: ToroidCore): number {
  return (MU_0 * core.relativePermeability * core.height * Math.log(core.outerDiameter / core.innerDiameter)) / TWO_PI;
}

function coreNotes(core: ToroidCore, turns: number): DesignNote[] {
  const notes: DesignNote[] = [];
  if (core.relativePermeability > 1.5) {
    notes.push(
      note(
        'info',
        "The result is only as good as the permeability: it varies from core to core and changes with frequency, temperature and DC current. Where the core's maker gives AL, use that.",
        'relativePermeability',
      ),
    );
  }
  if (!Number.isInteger(turns)) {
    notes.push(note('validity', 'On a toroid every pass through the hole is one turn; a fraction of a turn does not exist.', 'turns'));
  }
  if (core.relativePermeability < 10 && turns < 10) {
    // our threshold: with little permeability and few turns the flux outside the core is no longer negligible
    notes.push(
      note(
        'validity',
        'With few turns on a low-permeability core much of the flux leaks round the turns, and the leads add their own inductance: expect the real coil to differ by several per cent.',
        'turns',
      ),
    );
  }
  return notes;
}

/**
 * Inductance of a toroid with rectangular cross-section:
 * L = μ0 μr N² h ln(OD/ID) / (2π) (Grover 1946; Snelling 1988), exact for an even winding
 * with all the flux in the core. le = 2π ln(OD/ID)/(2/ID − 2/OD), Ae = h ln²(OD/ID)/(2/ID − 2/OD) (IEC 60205).
 * @param input.turns N (> 0)
 * @param input.outerDiameter OD, metres
 * @param input.innerDiameter ID, metres (< OD)
 * @param input.height h, metres
 * @param input.relativePermeability μr (> 0; μ' of the core material)
 */
export function toroidInductance(input: ToroidInput): ToroidResult {
  requirePositive('turns', input.turns, 'Turns');
  validateCore(input);
  const al = coreAl(input);
  const ln = Math.log(input.outerDiameter / input.innerDiameter);
  const inverseRadii = 2 / input.innerDiameter - 2 / input.outerDiameter;
  return {
    inductance: al * input.turns * input.turns,
    al,
    effectivePathLength: (TWO_PI * ln) / inverseRadii,
    effectiveArea: (input.height * ln * ln) / inverseRadii,
    notes: coreNotes(input, input.turns),
  };
}

export interface ToroidTurnsInput extends ToroidCore {
  /** Wanted inductance, henries. */
  inductance: number;
}

export interface ToroidTurnsResult {
  /** Real-valued N with AL N² = L. */
  turns: number;
  /** Nearest whole number of turns (at least 1). */
  practicalTurns: number;
  /** Inductance with `practicalTurns`, henries. */
  practicalInductance: number;
  /** AL of the core, henries per turn². */
  al: number;
  notes: DesignNote[];
}

/**
 * Turns on a rectangular-section toroid for a wanted inductance: N = √(L / AL),
 * AL = μ0 μr h ln(OD/ID) / (2π). Practical turns: the nearest whole turn
 * (a toroid has no half turns), at least one.
 * @param input.inductance L, henries (> 0); other fields as `toroidInductance`
 */
export function toroidTurnsForInductance(input: ToroidTurnsInput): ToroidTurnsResult {
  requirePositive('inductance', input.inductance, 'Inductance');
  validateCore(input);
  const al = coreAl(input);
  const turns = Math.sqrt(input.inductance / al);
  const practicalTurns = Math.max(1, Math.round(turns));
  const notes = coreNotes(input, practicalTurns);
  if (turns < 0.75) {
    notes.push(
      note(
        'validity',
        `Even one turn gives more than the wanted inductance (${Number((turns * turns).toPrecision(2))} of it would be needed): use a smaller core or one of lower permeability.`,
        'inductance',
      ),
    );
  }
  return { turns, practicalTurns, practicalInductance: al * practicalTurns * practicalTurns, al, notes };
}

/**
 * Inductance from the inductance factor: L = AL · N².
 * @param al AL in henries per turn² (makers' nH/turn² × 1e-9)
 * @param turns N (> 0)
 * @returns henries
 */
export function inductanceFromAl(al: number, turns: number): number {
  requirePositive('al', al, 'AL');
  requirePositive('turns', turns, 'Turns');
  return al * turns * turns;
}

/**
 * Turns from the inductance factor: N = √(L / AL) (real-valued; round to whole turns).
 * @param al AL in henries per turn² (makers' nH/turn² × 1e-9)
 * @param inductance L, henries (> 0)
 */
export function turnsFromAl(al: number, inductance: number): number {
  requirePositive('al', al, 'AL');
  requirePositive('inductance', inductance, 'Inductance');
  return Math.sqrt(inductance / al);
}

/**
 * Q of a core from its complex (series) permeability μ = μ' − jμ'': Q_core = μ'/μ''
 * (Snelling 1988). With `windingQ` given, the inductor's Q: 1/Q = 1/Q_core + 1/Q_winding.
 * A lossless core (μ'' = 0) has infinite Q_core; the result is then `windingQ` (or Infinity).
 * @param muReal μ' (> 0), at the working frequency
 * @param muImag μ'' (≥ 0), at the working frequency
 * @param windingQ optional Q of the winding alone (ωL/R_winding, > 0)
 */
export function toroidCoreQ(muReal: number, muImag: number, windingQ?: number): number {
  requirePositive('muReal', muReal, "Permeability μ'");
  requireNonNegative('muImag', muImag, "Loss permeability μ''");
  const coreQ = muImag === 0 ? Number.POSITIVE_INFINITY : muReal / muImag;
  if (windingQ === undefined) return coreQ;
  requirePositive('windingQ', windingQ, 'Winding Q');
  return 1 / (1 / coreQ + 1 / windingQ);
}

export interface ToroidWindingInput {
  turns: number;
  outerDiameter: number;
  innerDiameter: number;
  height: number;
  /** Overall wire diameter, insulation included (m). */
  wireDiameter: number;
  /** Length of each of the two leads (m); default 0. */
  leadLength?: number;
}

export interface ToroidWinding {
  /** Wire in one turn: the rectangle round the core section, its centre line half a wire out on each face (m). */
  lengthPerTurn: number;
  /** Wire to cut: all turns plus both leads (m). */
  wireLength: number;
  /** Turns that lie side by side in one layer round the inside of the hole. */
  turnsPerLayer: number;
  notes: DesignNote[];
}

/**
 * Wire for a single-layer winding on a rectangular-section toroid, and how
 * many turns fit in one layer round the hole.
 *   length per turn = 2h + (OD − ID) + 4d   (each face plus half a wire each side)
 *   turns per layer = ⌊π (ID − d) / d⌋      (wire centres on a circle of diameter ID − d)
 * Geometry only (common practice, no published source); real windings need a
 * little more wire for tension and spread.
 * @param input turns, core OD, ID, height and overall wire diameter in metres
 */
export function toroidWinding(input: ToroidWindingInput): ToroidWinding {
  const { turns, outerDiameter, innerDiameter, height, wireDiameter } = input;
  requirePositive('turns', turns, 'The number of turns');
  requirePositive('outerDiameter', outerDiameter, 'The outer diameter');
  requirePositive('innerDiameter', innerDiameter, 'The inner diameter');
  requirePositive('height', height, 'The core height');
  requirePositive('wireDiameter', wireDiameter, 'The wire diameter');
  const leadLength = requireNonNegative('leadLength', input.leadLength ?? 0, 'The lead length');
  if (innerDiameter >= outerDiameter) {
    throw new DesignError('innerDiameter', 'The inner diameter must be smaller than the outer diameter.');
  }
  if (wireDiameter >= innerDiameter) {
    throw new DesignError('wireDiameter', 'The wire is as thick as the core’s hole: it cannot be wound through it.');
  }
  const lengthPerTurn = 2 * height + (outerDiameter - innerDiameter) + 4 * wireDiameter;
  const turnsPerLayer = Math.floor((Math.PI * (innerDiameter - wireDiameter)) / wireDiameter);
  const notes: DesignNote[] = [];
  if (turns > turnsPerLayer) {
    notes.push(note('validity', `${turns} turns do not fit in one layer round the hole (about ${turnsPerLayer} do): use thinner wire or a bigger core, or expect a second layer, more self-capacitance and a lower Q.`, 'innerDiameter'));
  }
  return { lengthPerTurn, wireLength: turns * lengthPerTurn + 2 * leadLength, turnsPerLayer, notes };
}
