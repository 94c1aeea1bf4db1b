/**
 * Lossy LC tank circuits: resonance, Q, bandwidth, dynamic resistance,
 * insertion and transducer loss. `analyzeTank` is the one entry point for a
 * tank, as `designCoil` is for a coil.
 *
 * The tank is split by concept:
 * - `tankModel`: the inputs, their checks, the lumped circuit and its Q figures;
 * - `qRules`: the published Q rules (1/Q = Σ 1/Q_i, 1/Q_L = 1/Q_u + 1/Q_e,
 *   insertion loss, series/parallel equivalents);
 * - `tankKernel`: the exact impedance and the resonance and −3 dB edge finders;
 * - `terminations`: transducer and mismatch loss, and when the source and load
 *   collapse the tank;
 * - `tankSweep`: the response over a band for plots;
 * - `tankStress`: voltages, currents and cautions of a driven tank.
 *
 * Resistances are held fixed with frequency. That is exact for the circuit
 * analysed; a real coil's loss grows about as √f (skin effect) and a real
 * capacitor's tan δ is roughly constant, so Q values given at one frequency
 * are only carried over approximately to another.
 *
 * Exact results (resonance, −3 dB bandwidth, peak impedance, transducer loss)
 * come from the complex impedance itself. The Q figures come from the
 * published rules:
 * - element Q values combine as 1/Q = Σ 1/Q_i, and loaded from unloaded and
 *   external Q as 1/Q_L = 1/Q_u + 1/Q_e (Pozar, *Microwave Engineering*);
 * - the dynamic resistance of a parallel tank is R_D = Q ω L = Q / (ω C)
 *   (Terman, *Radio Engineers' Handbook*, 1943);
 * - insertion loss of a single resonator between equal terminations,
 *   IL = −20 log10(1 − Q_L/Q_u) dB (common practice; derived at
 *   `insertionLoss`).
 * The exact values agree with the rules to O(1/Q²); below Q ≈ 10 the notes
 * say so.
 */
import { note, type DesignNote } from './notes';
import { insertionLossFromExternalQ } from './qRules';
import { collapseNote, mismatchLoss, terminationsCollapse, transducerLoss } from './terminations';
import { evaluateAt, findResonance, findZeroPhase, invert, kernelOf, scratch, type Resonance } from './tankKernel';
import { dominantField, qFigures, requireFiniteFigures, resolveTank, type TankInput, type TankMode } from './tankModel';
import { sayNumber, sayQuantity } from './text';

/** What `analyzeTank` returns. Frequencies Hz, resistances Ω, bandwidths Hz, losses dB. */
export interface TankAnalysis {
  mode: TankMode;
  /** Lossless formula 1/(2π√(L(C + C_s))), Hz. */
  naturalFrequency: number;
  /** Where the tank's own |Z| peaks (parallel) or dips (series), Hz: found from the impedance. */
  resonantFrequency: number;
  /** Where the tank's own impedance is purely resistive nearest resonance, Hz (absent when there is none). */
  zeroPhaseFrequency?: number;
  /** Where the terminated tank's |Z| peaks (parallel) or dips (series), Hz. */
  loadedResonantFrequency: number;
  /** Coil Q = ω0 L / R_L at f0 (Infinity for an ideal coil). */
  coilQ: number;
  /** Capacitor Q = 1/(ω0 C ESR) at f0 (Infinity for an ideal capacitor). */
  capacitorQ: number;
  /** 1/Q_u = Σ 1/Q_i over coil and capacitor (capacitor weighted by C/(C + C_s) when C_s is given; Infinity when both are ideal). */
  unloadedQ: number;
  /** Q set by the source and load resistances alone (Infinity when neither is given). */
  externalQ: number;
  /** 1/Q_L = 1/Q_u + 1/Q_e (Pozar). */
  loadedQ: number;
  /**
   * −3 dB width of the terminated tank's impedance peak (parallel) or current
   * peak (series), Hz; exact, at any Q (computed from the detuning, not as a
   * difference of two nearly equal frequencies).
   */
  bandwidth: number;
  /** Lower and upper −3 dB frequencies of the terminated response, Hz; exact (upper − lower = bandwidth within rounding). */
  lowerFrequency: number;
  upperFrequency: number;
  /** −3 dB width of the tank's own impedance response, Hz; exact (0 for ideal parts). */
  unloadedBandwidth: number;
  /**
   * Parallel: the tank's own peak |Z| (Terman's R_D ≈ Q ω L; Infinity when coil and capacitor are ideal).
   * Series: its |Z| minimum (≈ X/Q; 0 when ideal). Ω.
   */
  dynamicResistance: number;
  /** |Z| at the loaded resonance including source and load resistances, Ω. */
  loadedImpedance: number;
  /** Coil loss resistance used, Ω (0 = ideal coil). */
  coilResistance: number;
  /** Capacitor ESR used, Ω (0 = ideal capacitor). */
  capacitorEsr: number;
  /**
   * The single-resonator rule −20 log10(1 − Q_L/Q_u), dB, when both source
   * and load resistances are given. Exact for equal terminations only.
   */
  insertionLoss?: number;
  /**
   * Transducer loss from source to load at the loaded resonance, dB, when both
   * are given: the source's available power |V_s|²/(4 R_s) over the power
   * delivered to the load. The loss a receiver's front end actually has.
   * Equals `mismatchLoss + dissipativeLoss`.
   */
  transducerLoss?: number;
  /**
   * Mismatch loss at the source, −10 log10(1 − |Γ|²) with Γ from the source
   * resistance and the input impedance of tank and load, dB (when both are given).
   */
  mismatchLoss?: number;
  /**
   * Power that enters the tank but is lost in the coil and capacitor rather
   * than reaching the load, −10 log10(P_load/P_in), dB (when both are given).
   */
  dissipativeLoss?: number;
  /**
   * True when the source and load resistances collapse the tank (see
   * `terminationsCollapse`: loaded Q below 2, or Q_e < Q_u/20 with a loaded Q
   * below 10); a note then says so and points to matching with a tap or link.
   */
  terminationsCollapse: boolean;
  notes: DesignNote[];
}

/** Fields of `TankAnalysis` documented as Infinity in some cases (ideal parts, no terminations). */
const MAY_BE_INFINITE = ['coilQ', 'capacitorQ', 'unloadedQ', 'externalQ', 'dynamicResistance'] as const;

/** Relative difference at which source and load count as unequal for the mismatch note. */
const UNEQUAL = 0.01;

/**
 * Analyse a lossy tank (see the module header for the model).
 *
 * - `resonantFrequency`: where the tank's own |Z| peaks (parallel) or dips
 *   (series), found from the impedance. For a coil with series resistance
 *   across an ideal capacitor the zero-phase frequency is f0 √(1 − 1/Q²) and
 *   the |Z| peak is at f0 √(√(1 + 2/Q²) − 1/Q²), much closer to f0; both
 *   differ from 1/(2π√(LC)) only as 1/Q² or 1/Q⁴.
 * - Q values: 1/Q_u = 1/Q_coil + 1/Q_cap, 1/Q_L = 1/Q_u + 1/Q_e (Pozar),
 *   evaluated at f0 as Q = ω0 W / P (stored energy over loss). With C_s
 *   given, the capacitor's and the terminations' terms are weighted by
 *   k = C/(C + C_s) in both modes (the coil's term is its own 1/Q_coil);
 *   without C_s every weight is 1.
 * - `bandwidth`: exact −3 dB width of the terminated response (≈ f/Q_L).
 * - `dynamicResistance`: parallel, the tank's peak |Z| (≈ Q_u ω L, Terman 1943);
 *   series, its |Z| at resonance (the minimum, ≈ X/Q_u).
 * - Losses, when both terminations are given: `insertionLoss` by the rule
 *   −20 log10(1 − Q_L/Q_u); `transducerLoss` from the circuit (available
 *   power of the source over power in the load, Pozar), split into
 *   `mismatchLoss` and `dissipativeLoss`.
 * - `terminationsCollapse` and its note: see `terminationsCollapse`.
 * Valid while the lumped model holds (f0 well below the coil's self-resonance)
 * and for Q above about 1 (below that there is no clear resonance).
 * @param tank inputs in SI units (H, F, Ω, Hz)
 * @throws DesignError naming the input at fault
 */
export function analyzeTank(tank: TankInput): TankAnalysis {
  const t = resolveTank(tank);
  const k = kernelOf(t);
  const q = qFigures(t);
  const notes: DesignNote[] = [];
  const f0 = t.naturalFrequency;
  const parallel = t.mode === 'parallel';
  const toHz = (v: number) => f0 * Math.exp(v);
  const widthHz = (r: Resonance) => f0 * (Math.expm1(r.upper) - Math.expm1(r.lower));
  const hasTerminations = t.sourceResistance !== undefined || t.loadResistance !== undefined;
  const lossyParts = t.coilResistance > 0 || t.capacitorEsr > 0;

  // The tank alone.
  let resonantFrequency = f0;
  let shift = 0;
  let zeroPhaseFrequency: number | undefined = f0;
  let dynamicResistance = parallel ? Infinity : 0;
  let unloadedBandwidth = 0;
  let unloaded: Resonance | undefined;
  if (lossyParts) {
    unloaded = findResonance(k, false, q.unloadedQ, dominantField(q.shares, false), 'coil and capacitor');
    resonantFrequency = toHz(unloaded.v);
    shift = Math.expm1(unloaded.v);
    unloadedBandwidth = widthHz(unloaded);
    evaluateAt(k, unloaded.v, scratch);
    const immittance = Math.hypot(scratch[0], scratch[1]);
    dynamicResistance = parallel ? 1 / immittance : immittance;
    const vz = findZeroPhase(k, unloaded.v, q.unloadedQ);
    zeroPhaseFrequency = Number.isFinite(vz) ? toHz(vz) : undefined;
  } else {
    notes.push(note('info', 'Coil and capacitor are ideal (no loss given): the Q comes from the source and load resistances alone.'));
  }

  // With source and load.
  let loaded = unloaded;
  if (hasTerminations || !unloaded) {
    loaded = findResonance(k, true, q.loadedQ, dominantField(q.shares, true), 'total');
  }
  const lr = loaded as Resonance;
  const loadedResonantFrequency = toHz(lr.v);
  const lowerFrequency = toHz(lr.lower);
  const upperFrequency = toHz(lr.upper);
  const bandwidth = widthHz(lr);
  const loadedImpedance = parallel ? 1 / Math.sqrt(lr.value) : Math.sqrt(lr.value);

  // Losses from source to load.
  let losses: Pick<TankAnalysis, 'insertionLoss' | 'transducerLoss' | 'mismatchLoss' | 'dissipativeLoss'> = {};
  if (t.sourceResistance !== undefined && t.loadResistance !== undefined) {
    const rs = t.sourceResistance;
    const rl = t.loadResistance;
    evaluateAt(k, lr.v, scratch);
    let gain: number;
    let toLoad: number;
    let input;
    if (parallel) {
      // Y_p = Y_tank + 1/R_load; V_load/V_s = 1/(1 + R_s Y_p); P_load/P_in = (1/R_load)/Re Y_p.
      const gp = scratch[0] + 1 / rl;
      const bp = scratch[1];
      gain = 1 / Math.hypot(1 + rs * gp, rs * bp);
      toLoad = 1 / (rl * gp);
      input = invert(gp, bp);
    } else {
      // I = V_s/(Z_tank + R_s + R_load); V_load/V_s = R_load/|…|; P_load/P_in = R_load/(Re Z_tank + R_load).
      gain = rl / Math.hypot(scratch[0] + rs + rl, scratch[1]);
      toLoad = rl / (scratch[0] + rl);
      input = { re: scratch[0] + rl, im: scratch[1] };
    }
    losses = {
      insertionLoss: insertionLossFromExternalQ(q.unloadedQ, q.externalQ),
      transducerLoss: transducerLoss(rs, rl, gain),
      mismatchLoss: mismatchLoss(rs, input),
      dissipativeLoss: Math.max(0, -10 * Math.log10(toLoad)),
    };
    if (Math.abs(rs - rl) > UNEQUAL * Math.max(rs, rl)) {
      notes.push(note('info', `With a ${sayQuantity(rs, 'Ω')} source and a ${sayQuantity(rl, 'Ω')} load, the transducer loss from source to load is ${sayNumber(losses.transducerLoss as number)} dB: ${sayNumber(losses.mismatchLoss as number)} dB of mismatch at the source and ${sayNumber(losses.dissipativeLoss as number)} dB lost in the coil and capacitor. The insertion-loss rule −20 log10(1 − Q_L/Q_u) = ${sayNumber(losses.insertionLoss as number)} dB holds for equal source and load resistances only.`));
    }
  }

  // When the terminations swamp the tank.
  const shares = new Map(q.shares);
  const collapse = collapseNote({
    mode: t.mode,
    unloadedQ: q.unloadedQ,
    externalQ: q.externalQ,
    loadedQ: q.loadedQ,
    bandwidth,
    frequency: loadedResonantFrequency,
    sourceResistance: t.sourceResistance,
    loadResistance: t.loadResistance,
    sourceShare: shares.get('sourceResistance') ?? 0,
    loadShare: shares.get('loadResistance') ?? 0,
  });
  if (collapse) notes.push(collapse);

  // Notes on the frequency and on the validity of the rules.
  if (lossyParts && Math.abs(shift) > 1e-4) {
    const zp = zeroPhaseFrequency !== undefined
      ? `the impedance is purely resistive at ${sayQuantity(zeroPhaseFrequency, 'Hz', 4)}`
      : 'the impedance is never purely resistive near resonance';
    notes.push(note('info', `With losses this high the tank's |Z| ${parallel ? 'peaks' : 'dips'} at ${sayQuantity(resonantFrequency, 'Hz', 4)}, ${sayNumber(Math.abs(shift) * 100)} % ${shift < 0 ? 'below' : 'above'} the lossless 1/(2π√(LC)) = ${sayQuantity(f0, 'Hz', 4)}, and ${zp}. For a coil with series resistance the zero-phase frequency is f0·√(1 − 1/Q²) and the |Z| peak is at f0·√(√(1 + 2/Q²) − 1/Q²), closer to f0.`));
  }
  if (q.loadedQ < 10) {
    notes.push(note('validity', `Loaded Q is ${sayNumber(q.loadedQ)}, below 10: the rules bandwidth ≈ f/Q and R_D ≈ QωL are only approximate here; the bandwidth, resonance and impedance shown are computed from the impedance itself.`));
  }
  if (t.coilSelfCapacitance > 0) {
    const srf = 1 / (2 * Math.PI * Math.sqrt(t.inductance) * Math.sqrt(t.coilSelfCapacitance));
    if (f0 > 0.5 * srf) {
      notes.push(note('validity', `The tank resonates at ${sayQuantity(f0, 'Hz')}, more than half the coil's self-resonant frequency (${sayQuantity(srf, 'Hz')}): the lumped coil model (inductance with its self-capacitance across it) is unreliable here.`, 'coilSelfCapacitance'));
    }
  }
  const qGiven = tank.coilQ !== undefined || tank.capacitorQ !== undefined || tank.dissipationFactor !== undefined;
  if (qGiven && tank.frequency !== undefined && Math.abs(Math.log(tank.frequency / f0)) > Math.log(1.1)) {
    notes.push(note('validity', `Q values were given at ${sayQuantity(tank.frequency, 'Hz')} but the tank resonates near ${sayQuantity(f0, 'Hz')}: they were carried over as fixed resistances, while a real coil's loss grows about as √f and a capacitor's tan δ stays roughly constant. Give the Q values at resonance for a better figure.`, 'frequency'));
  }

  const result: TankAnalysis = {
    mode: t.mode,
    naturalFrequency: f0,
    resonantFrequency,
    loadedResonantFrequency,
    coilQ: q.coilQ,
    capacitorQ: q.capacitorQ,
    unloadedQ: q.unloadedQ,
    externalQ: q.externalQ,
    loadedQ: q.loadedQ,
    bandwidth,
    lowerFrequency,
    upperFrequency,
    unloadedBandwidth,
    dynamicResistance,
    loadedImpedance,
    coilResistance: t.coilResistance,
    capacitorEsr: t.capacitorEsr,
    ...losses,
    terminationsCollapse: hasTerminations && terminationsCollapse(q.unloadedQ, q.externalQ),
    notes,
  };
  if (zeroPhaseFrequency !== undefined) result.zeroPhaseFrequency = zeroPhaseFrequency;
  return requireFiniteFigures(result, dominantField(q.shares, true), MAY_BE_INFINITE);
}
