/**
 * Tankwright core: the public API. Pure functions, SI units in and out.
 * Each module's header states the model it implements and its sources.
 */
export { DesignError, isDesignError, requireFinite, requirePositive, requireNonNegative, requireInRange, requireObject, requireFiniteResult } from './errors';
export { sayQuantity, sayMm, sayNumber, sayPercent } from './text';
export * from './constants';
export { note } from './notes';
export type { DesignNote, NoteLevel } from './notes';
export {
  resonantFrequency,
  inductanceForFrequency,
  capacitanceForFrequency,
  inductiveReactance,
  capacitiveReactance,
  characteristicImpedance,
} from './resonance';
export { E_SERIES, E_SERIES_NAMES, eSeries, nearestPreferredValue, preferredNeighbours, requireSeries, seriesValuesBetween } from './preferred';
export type { ESeriesName, PreferredNeighbours } from './preferred';
export { resonantPairs, toleranceSpread } from './pairs';
export { bandCoverage, designForBand, bandSelectivity, PADDER_SWITCH_RATIO } from './band';
export type { BandCircuit, BandCoverage, BandDesignInput, BandDesign, BandSelectivityInput, SelectivityPoint, BandSelectivity } from './band';
export { slugTuning } from './slug';
export type { SlugTuningInput, SlugSetting, SlugTuning } from './slug';
export { dialLaw } from './dial';
export type { PlatePoint, DialLawInput, DialLaw } from './dial';
export { imageFrequency, imageRejection } from './image';
export type { OscillatorSide, ImageRejectionInput, ImageRejection } from './image';
export { trackingPoints, designTracking, trackingError } from './tracking';
export type { TrackingCircuit, TrackingInput, TrackingCurve, TrackingExtreme, TrackingCurveInput, TrackingErrorResult, TrackingDesign } from './tracking';
export type {
  ShopCoil, PairSearch, PairSearchResult, PairCandidate, TrimmerRange, ToleranceSpread, ToleranceSpreadSamples, ToleranceSpreadSpec,
  MonteCarloSummary, PairDistribution, InductorSeries,
} from './pairs';
export { ellipticK, ellipticE, ellipticD } from './elliptic';
export {
  awgDiameter,
  parseAwg,
  swgDiameter,
  parseSwg,
  SWG_DIAMETERS_INCH,
  METRIC_WIRE_DIAMETERS,
  enamelledDiameter,
  resistivityAtTemperature,
  wireResistanceDc,
  wireLengthForCoil,
} from './wire';
export type { AwgSize, SwgSize, EnamelGrade, CoilWireInput } from './wire';
export {
  skinDepth,
  wireAcResistanceRatio,
  wireInternalImpedance,
  SKIN_ASYMPTOTIC_SWITCH,
} from './skin';
export type { WireInternalImpedance } from './skin';
export { complex, cAdd, cSub, cMul, cDiv, cInv, cParallel, cAbs, cArg } from './complex';
export type { Complex } from './complex';
export { analyzeTank } from './tank';
export type { TankAnalysis } from './tank';
export { resolveTank, TANK_VALUE_RANGE } from './tankModel';
export type { TankMode, TankInput, ResolvedTank } from './tankModel';
export { tankImpedance } from './tankKernel';
export type { TankImpedanceOptions } from './tankKernel';
export { sweepTank } from './tankSweep';
export type { TankSweep } from './tankSweep';
export { frequencyGrid, MAX_SWEEP_POINTS } from './sweep';
export type { SweepOptions } from './sweep';
export { tankStress, EXTRA_LOW_VOLTAGE_AC_RMS } from './tankStress';
export type { TankStressInput, TankStress } from './tankStress';
export { combineQ, combineLoadedQ, insertionLoss, seriesToParallelResistance, parallelToSeriesResistance } from './qRules';
export {
  transducerLoss,
  mismatchLoss,
  terminationsCollapse,
  COLLAPSE_LOADED_Q,
  COLLAPSE_LOAD_RATIO,
  COLLAPSE_RATIO_LOADED_Q,
} from './terminations';
export {
  nagaokaCoefficient,
  rosaCorrections,
  rosaKm,
  rosaKs,
  ROSA_KM_LIMIT,
  wheelerSolenoidInductance,
  solenoidInductance,
  turnsForInductance,
} from './solenoid';
export type { SolenoidInput, SolenoidResult, TurnsForInductanceInput, TurnsForInductanceResult } from './solenoid';
export {
  MEDHURST_TABLE,
  medhurstFittedH,
  medhurstH,
  medhurstSelfCapacitance,
  medhurstCapacitance,
  selfResonantFrequency,
  apparentCoil,
} from './selfCapacitance';
export type { MedhurstPoint, MedhurstH, SelfCapacitanceResult, ApparentCoilInput, ApparentCoil } from './selfCapacitance';
export { toroidInductance, toroidTurnsForInductance, inductanceFromAl, turnsFromAl, toroidCoreQ, toroidWinding } from './toroid';
export type { ToroidInput, ToroidResult, ToroidTurnsInput, ToroidTurnsResult, ToroidWindingInput, ToroidWinding } from './toroid';
export { tankNetlist } from './netlist';
export type { TankNetlistOptions } from './netlist';
export {
  transverseFieldLoss,
  solenoidProximityFactor,
  coilAcResistance,
  coilQ,
  proximityFieldFactor,
  BUTTERWORTH_LONG_COIL_BIAS,
  PROXIMITY_CLOSE_SPACING,
  PROXIMITY_SHORT_COIL,
} from './coilLoss';
export type { ProximityInput, ProximityResult, CoilResistanceInput, CoilResistance, CoilQInput, CoilQ, Uncertainty } from './coilLoss';
export { multilayerInductance, multilayerTurnsForInductance, multilayerCapacity } from './multilayer';
export type { MultilayerGeometry, MultilayerInput, MultilayerResult, MultilayerTurnsInput, MultilayerTurnsResult } from './multilayer';
export { designCoil, COIL_SPEC_FIELDS } from './coil';
export type {
  CoilForm,
  CoilWireSpec,
  CoilSpecCommon,
  SolenoidCoilSpec,
  ToroidCoilSpec,
  MultilayerCoilSpec,
  DesignCoilSpec,
  CoilSpecField,
  CoilSweep,
  DesignCoilResult,
} from './coil';
export { mutualInductanceCoaxialLoops, mutualInductanceCoaxialWindings, tappedCoilSections, tappedInductorRatio } from './mutual';
export type { CoaxialWinding, TappedCoilInput, TappedCoilSections } from './mutual';
export { resolveMatchTank } from './matchTank';
export type { MatchTankSpec, MatchTank, MatchEstimate, TapPlacement, SideInput } from './matchTank';
export { capacitiveDivider, lNetwork } from './matchNetworks';
export type { CapacitiveDividerInput, CapacitiveDivider, LNetworkInput, LNetwork } from './matchNetworks';
export { designLink } from './matchLink';
export type { LinkSpec, LinkPlacement, LinkInput, LinkDesign } from './matchLink';
export { designTap, designMatch, MATCH_OPTION_KINDS, MATCH_SPEC_FIELDS } from './matching';
export type { TapInput, TapDesign, MatchOptionKind, MatchSpec, LoadPlacement, MatchOption, TapOption, DividerOption, LinkOption, LNetworkOption, LNetworkParts, UnavailableOption, MatchDesign } from './matching';
export { matchCircuitAt, analyzeMatchCircuit, sweepMatchCircuit } from './matchCircuit';
export type { MatchCircuit, MatchPart, CircuitWinding, MatchPoint, MatchResponse, MatchSweep } from './matchCircuit';
export { matchNetlist } from './matchNetlist';
export type { MatchNetlistOptions } from './matchNetlist';
