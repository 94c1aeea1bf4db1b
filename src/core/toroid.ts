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
import { DesignError, requireFiniteResult, requireNonNegative, requireObject, requirePositive } from './errors';
import { note, type DesignNote } from './notes';
import { sayMm, sayNumber } from './text';


export interface ToroidInput {
  /** Number of turns N (passes through the core's hole). */
  turns: number;
  /** Core outer diameter OD, metres. */
  outerDiameter: number;
  /** Core inner diameter ID, metres (0 < ID < OD). */
  innerDiameter: number;
  /** Core height (axial thickness) h, metres. */
  height: number;
  /**
   * Relative permeability μr (real part μ' of the core's initial permeability; 1 for an air or
   * plastic former). Needed unless `al` is given; with `al` it only serves the notes.
   */
  relativePermeability?: number;
  /** Inductance factor AL of the core, henries per turn² (a maker's or a measured figure); when given it sets L = AL N². */
  al?: number;
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

/** Checks the core's dimensions (OD, ID, height; ID < OD). */
function validateDimensions(outerDiameter: number, innerDiameter: number, height: number): void {
  requirePositive('outerDiameter', outerDiameter, 'Outer diameter', 'm');
  requirePositive('innerDiameter', innerDiameter, 'Inner diameter', 'm');
  requirePositive('height', height, 'Core height', 'm');
  if (innerDiameter >= outerDiameter) {
    throw new DesignError(
      'innerDiameter',
      `The inner diameter (${sayMm(innerDiameter)}) must be smaller than the outer diameter (${sayMm(outerDiameter)}).`,
    );
  }
}

/** Checks the core and returns its AL: the given one, or μ0 μr h ln(OD/ID)/(2π) from the dimensions. */
function validateCore(core: ToroidCore): number {
  validateDimensions(core.outerDiameter, core.innerDiameter, core.height);
  if (core.relativePermeability !== undefined) requirePositive('relativePermeability', core.relativePermeability, 'Relative permeability');
  if (core.al !== undefined) return requirePositive('al', core.al, 'AL', 'H');
  if (core.relativePermeability === undefined) {
    throw new DesignError('relativePermeability', "Give the core's relative permeability μ′, or its AL.");
  }
  return coreAl(core.outerDiameter, core.innerDiameter, core.height, core.relativePermeability);
}

/** ln(OD/ID) as a difference of logarithms (no overflow of the ratio). */
function logRatio(core: Pick<ToroidCore, 'outerDiameter' | 'innerDiameter'>): number {
  return Math.log(core.outerDiameter) - Math.log(core.innerDiameter);
}

/** AL of a rectangular-section toroid: μ0 μr h ln(OD/ID) / (2π), H per turn². */
function coreAl(outerDiameter: number, innerDiameter: number, height: number, relativePermeability: number): number {
  const al = (MU_0 / TWO_PI) * relativePermeability * height * logRatio({ outerDiameter, innerDiameter });
  if (!(al > 0 && Number.isFinite(al))) {
    throw new DesignError(relativePermeability > height ? 'relativePermeability' : 'height', 'AL is beyond what can be computed with these values: they are far outside any real core.');
  }
  return al;
}

/**
 * Effective magnetic path length le and area Ae of a rectangular-section ring
 * (IEC 60205 core factors): le = 2π ln(OD/ID)/(2/ID − 2/OD), Ae = h ln²(OD/ID)/(2/ID − 2/OD).
 * Depends on the dimensions only, not on the permeability.
 */
function coreFactors(outerDiameter: number, innerDiameter: number, height: number): { effectivePathLength: number; effectiveArea: number } {
  const ln = logRatio({ outerDiameter, innerDiameter });
  // 2/ID − 2/OD = 2 (OD − ID)/(ID · OD), grouped so that neither term overflows
  const inverseRadii = ((2 / innerDiameter) * (outerDiameter - innerDiameter)) / outerDiameter;
  return {
    effectivePathLength: requireFiniteResult('innerDiameter', (TWO_PI * ln) / inverseRadii, 'The magnetic path length'),
    effectiveArea: requireFiniteResult('height', (height * ln * (ln / inverseRadii)), 'The effective area'),
  };
}

function coreNotes(core: ToroidCore, turns: number): DesignNote[] {
  const notes: DesignNote[] = [];
  const mu = core.relativePermeability;
  if (core.al === undefined && mu !== undefined && mu > 1.5) {
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
  if (mu !== undefined && mu < 10 && turns < 10) {
    // our threshold: with little permeability and few turns the flux outside the core is no longer negligible
    notes.push(
      note(
        'validity',
        'With few turns on a low-permeability core much of the flux leaks round the turns, and the leads add their own inductance: the real coil may differ from this figure by several per cent or more (the core does not estimate by how much; measure it).',
        'turns',
      ),
    );
  }
  return notes;
}

/**
 * Inductance of a toroid with rectangular cross-section:
 * L = μ0 μr N² h ln(OD/ID) / (2π) (Grover 1946; Snelling 1988), exact for an even winding
 * with all the flux in the core; or L = AL N² when the core's AL is given.
 * le = 2π ln(OD/ID)/(2/ID − 2/OD), Ae = h ln²(OD/ID)/(2/ID − 2/OD) (IEC 60205), from the dimensions.
 * @param input.turns N (> 0)
 * @param input.outerDiameter OD, metres
 * @param input.innerDiameter ID, metres (< OD)
 * @param input.height h, metres
 * @param input.relativePermeability μr (> 0; μ' of the core material); needed unless `al` is given
 * @param input.al AL in henries per turn² (optional; overrides the permeability for L)
 */
export function toroidInductance(input: ToroidInput): ToroidResult {
  requireObject<ToroidInput>('input', input, 'The toroid');
  requirePositive('turns', input.turns, 'Turns');
  const al = validateCore(input);
  return {
    inductance: requireFiniteResult('turns', al * input.turns * input.turns, 'The inductance'),
    al,
    ...coreFactors(input.outerDiameter, input.innerDiameter, input.height),
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
 * AL = μ0 μr h ln(OD/ID) / (2π) or as given. Practical turns: the nearest whole turn
 * (a toroid has no half turns), at least one.
 * @param input.inductance L, henries (> 0); other fields as `toroidInductance`
 */
export function toroidTurnsForInductance(input: ToroidTurnsInput): ToroidTurnsResult {
  requireObject<ToroidTurnsInput>('input', input, 'The toroid');
  requirePositive('inductance', input.inductance, 'Inductance', 'H');
  const al = validateCore(input);
  const turns = requireFiniteResult('inductance', Math.sqrt(input.inductance) / Math.sqrt(al), 'The number of turns');
  const practicalTurns = Math.max(1, Math.round(turns));
  const notes = coreNotes(input, practicalTurns);
  if (turns < 0.75) {
    notes.push(
      note(
        'validity',
        `Even one turn gives more than the wanted inductance (${sayNumber(turns * turns, 2)} of a turn's worth would be needed): use a smaller core or one of lower permeability.`,
        'inductance',
      ),
    );
  }
  return { turns, practicalTurns, practicalInductance: requireFiniteResult('inductance', al * practicalTurns * practicalTurns, 'The inductance'), al, notes };
}

/**
 * Inductance from the inductance factor: L = AL · N².
 * @param al AL in henries per turn² (makers' nH/turn² × 1e-9)
 * @param turns N (> 0)
 * @returns henries
 */
export function inductanceFromAl(al: number, turns: number): number {
  requirePositive('al', al, 'AL', 'H');
  requirePositive('turns', turns, 'Turns');
  return requireFiniteResult('turns', al * turns * turns, 'The inductance');
}

/**
 * Turns from the inductance factor: N = √(L / AL) (real-valued; round to whole turns).
 * @param al AL in henries per turn² (makers' nH/turn² × 1e-9)
 * @param inductance L, henries (> 0)
 */
export function turnsFromAl(al: number, inductance: number): number {
  requirePositive('al', al, 'AL', 'H');
  requirePositive('inductance', inductance, 'Inductance', 'H');
  return requireFiniteResult('al', Math.sqrt(inductance) / Math.sqrt(al), 'The number of turns');
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
  const coreQ = muImag === 0 ? Number.POSITIVE_INFINITY : requireFiniteResult('muImag', muReal / muImag, 'The core Q');
  if (windingQ === undefined) return coreQ;
  requirePositive('windingQ', windingQ, 'Winding Q');
  return 1 / (1 / coreQ + 1 / windingQ);
}

export interface ToroidWindingInput {
  /** Number of turns (> 0). */
  turns: number;
  /** Core outer diameter OD, metres. */
  outerDiameter: number;
  /** Core inner diameter ID, metres (< OD). */
  innerDiameter: number;
  /** Core height h, metres. */
  height: number;
  /** Overall wire diameter, insulation included (m); for bare wire, the bare diameter. */
  insulatedDiameter: number;
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
 * @param input turns, core OD, ID, height and the wire's overall (insulated) diameter, in metres
 */
export function toroidWinding(input: ToroidWindingInput): ToroidWinding {
  requireObject<ToroidWindingInput>('input', input, 'The winding');
  const { turns, outerDiameter, innerDiameter, height, insulatedDiameter } = input;
  requirePositive('turns', turns, 'The number of turns');
  validateDimensions(outerDiameter, innerDiameter, height);
  requirePositive('insulatedDiameter', insulatedDiameter, 'The wire’s overall diameter', 'm');
  const leadLength = requireNonNegative('leadLength', input.leadLength ?? 0, 'The lead length', 'm');
  if (insulatedDiameter >= innerDiameter) {
    throw new DesignError('insulatedDiameter', `The wire (${sayMm(insulatedDiameter)} overall) is as thick as the core’s ${sayMm(innerDiameter)} hole: it cannot be wound through it.`);
  }
  const lengthPerTurn = requireFiniteResult('height', 2 * height + (outerDiameter - innerDiameter) + 4 * insulatedDiameter, 'The wire per turn');
  const turnsPerLayer = requireFiniteResult('insulatedDiameter', Math.floor(Math.PI * (innerDiameter / insulatedDiameter - 1)), 'The turns per layer');
  const notes: DesignNote[] = [];
  if (turns > turnsPerLayer) {
    notes.push(note('validity', `${sayNumber(turns, 6)} turns do not fit in one layer round the hole (about ${sayNumber(turnsPerLayer, 6)} do): use thinner wire or a bigger core, or expect a second layer, more self-capacitance and a lower Q.`, 'innerDiameter'));
  }
  const wireLength = requireFiniteResult('turns', turns * lengthPerTurn + 2 * leadLength, 'The wire length');
  return { lengthPerTurn, wireLength, turnsPerLayer, notes };
}
