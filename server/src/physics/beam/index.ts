/** Beam deflection and detector pattern: the public surface of this folder. */
export type { BeamGeometry, BeamIssue, BeamIssueSeverity, BeamSublevel, SpeedDistribution } from './types';
export { deflectionAtSpeed, deflectionCoefficient, leverArmM2, meanDeflection } from './deflection';
export { sourceSpeeds, type SourceSpeeds } from './speedSummary';
export { peakSlopes, type PeakAt, type PeakSlopes } from './peakSlopes';
export { kernelDensity, slitImage, trapezoidDensity, type SlitImage } from './slitImage';
export {
  detectorPattern,
  type DetectorPattern,
  type PatternInput,
  type PatternPeak,
  type SublevelDeflection,
  type SpeedSummary,
} from './detectorPattern';
export type { PatternOptions } from './patternOptions';
export { DEFAULT_BINS, DEFAULT_MERGE_FRACTION, DEFAULT_TAIL_FRACTION } from './patternOptions';
export { DEFAULT_DIP_CRITERION, worstDip, type PairVerdict } from './pairDips';
export {
  smallestResolvingDrift,
  smallestResolvingGradient,
  smallestResolvingMagnetLength,
  smallestResolvingValue,
  type ResolveSearchOptions,
  type ResolveSearchResult,
  type ResolvingParameter,
} from './resolvingSolver';
export { LAB_REACH, resolvingOptions, VISIBLE_IMPROVEMENT, type AdviceParameter, type GrownParameter, type ResolvingOption, type ResolvingOptions, type SearchReach } from './resolvingOptions';
export { validateGeometry, MAX_HALF_ANGLE_RAD } from './validateGeometry';
export { validateSource } from './validateSource';
export { validateSublevels } from './validateSublevels';
export { EFFUSIVE_RELATIVE_SPREAD } from './jetLaw';
export { beamCautions, type CautionSetup } from './cautions';
