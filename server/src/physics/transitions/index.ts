/**
 * Optical (electric-dipole) and RF/microwave (magnetic-dipole) transitions between Zeeman
 * sublevels at any field, built on the exact engine's eigenvectors, moments and
 * curvatures. Pure computation; nothing throws. See docs/transitions.md.
 */
export type {
  DipoleComponent,
  DipoleLineOptions,
  DipoleLineResult,
  EffectiveLande,
  FieldRange,
  InsensitivePoint,
  InsensitiveResult,
  LineTerm,
  MagneticKind,
  MagneticOptions,
  MagneticResult,
  MagneticTransition,
  Polarization,
  Resonance,
  ResonanceOptions,
  ResonanceResult,
  StickRow,
  SublevelPair,
  SublevelRef,
  SublevelTag,
  TransitionIssue,
} from './types';
export { electricDipoleLine, electricDipoleLineChecks, CENTROID_PROBE_T } from './electricDipoleLine';
export { stickSpectrum } from './stickSpectrum';
export { termDipoleLine } from './termDipoleLine';
export type { TermLineEnd, TermLineResult } from './termDipoleLine';
export { selectionRules } from './selectionRules';
export { effectiveLandeFactor, landeFromComponents } from './effectiveLande';
export type { LandeLevel } from './effectiveLande';
export { emissionWeight, alongFieldWeight, acrossFieldWeight, polarizationOf } from './emissionPattern';
export { uncoupledDipoleFactor } from './electricDipoleElement';
export { magneticTransitions } from './magneticTransitions';
export { fieldInsensitivePoints } from './fieldInsensitivePoints';
export { resonanceFields } from './resonanceFields';
export { DEFAULT_SCAN_POINTS, MAX_SCAN_POINTS } from './rootScan';
