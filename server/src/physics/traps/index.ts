/** Magnetic traps built from field sources: which sublevels are held, how deep, how stiff (docs/traps.md). */
export type { FigureTrapIssue, HarmonicShape, LinearShape, MajoranaEstimate, RfCut, SublevelFinding, SublevelTrap, TrapFigures, TrapInput, TrapIssue, TrapRegion, TrapSummary, WordedTrapIssue } from './types';
export { hasFigures } from './issues';
export { summariseTrap, labelText, ZERO_FIELD_FRACTION } from './trapSummary';
export { STANDARD_GRAVITY, gravityAlong } from './gravity';
export { energyCurves, rfPartner, type EnergyCurve } from './energyCurves';
export { MAJORANA_SOURCE, ADIABATIC_MARGIN, majoranaRate } from './majorana';
export { trapCautions } from './cautions';
export { defaultRegionRadius, distanceToSource, regionIssues, DEFAULT_REGION_FRACTION } from './defaultRegion';
