/**
 * The any-field Zeeman engine: exact diagonalisation of one level's
 * fine/hyperfine + Zeeman Hamiltonian, block by block in the conserved m,
 * with adiabatic labels, moments, curvatures, sweeps, crossings, regime
 * detection and closed-form cross-checks. See docs/engine.md.
 */
export type {
  CoupledFLabel,
  CoupledJLabel,
  EngineIssue,
  FineTermSpec,
  HighFieldLabel,
  HyperfineLevelSpec,
  IssueSeverity,
  LevelCrossing,
  LevelSpec,
  LowFieldLabel,
  RegimeResult,
  RegimeVerdict,
  SolveResult,
  SublevelState,
  SweepOptions,
  SweepResult,
  SweptState,
  UncoupledJILabel,
  UncoupledLSLabel,
  WholeTermSpec,
} from './types';
export { solveLevel } from './solveLevel';
export { buildLevelModel } from './buildModel';
export { sweepLevel } from './sweepLevel';
export { regime } from './regime';
export { breitRabi, breitRabiEnergy, linearZeeman, paschenBackLimit } from './closedForms';
export type { LinearEnergy, StrongFieldEnergy } from './closedForms';
export { hyperfineZeroFieldHz, fineZeroFieldHz, quadrupoleActs, octupoleActs } from './zeroFieldLevels';
export { landeGF, landeGJ } from './landeFactors';
export { levelCoefficients } from './termHyperfineParameters';
export type { LevelCoefficients, RadialParameters } from './termHyperfineParameters';
export { termLevelConstants } from './termLevelConstants';
export { diamagneticHzPerT2, hydrogenicR2InBohr2, sinSquaredMean } from './diamagnetic';
export type { TermConstants } from './termLevelConstants';
export { validateSpec } from './validateSpec';
export { symmetricEigen } from './symmetricEigen';
export * as engineLimits from './limits';
