/** Weighted least-squares fitting: the public surface of this folder (no I/O). */
export { levenbergMarquardt, type LeastSquaresProblem, type LmOptions, type LmResult, type LmStatus } from './levenbergMarquardt';
export { covarianceFromJacobian, correlationOf } from './covariance';
export { fitCurve, roundOffCosine, type CurveProblem, type FitDiagnostic, type FitDiagnosticCode, type FitOutcome } from './fitCurve';
export { spectralModel, pairExists, type SpectralParameter, type SpectralPoint, type SpectralModel } from './spectralModel';
export { profileModel, isSizeParameter, PROFILE_RELATIVE_STEP, type ProfileFlights, type ProfileParameter, type ProfileSetup, type ProfileModel } from './profileModel';
export { calibrateField, type FieldCalibration, type CalibrationRoot } from './fieldCalibration';
