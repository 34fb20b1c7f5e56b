/** Weighted least-squares fitting: the public surface of this folder (no I/O). */
export { levenbergMarquardt, type LeastSquaresProblem, type LmOptions, type LmResult, type LmStatus } from './levenbergMarquardt';
export { covarianceFromJacobian, correlationOf } from './covariance';
export { fitCurve, type CurveProblem, type FitDiagnostic, type FitDiagnosticCode, type FitOutcome } from './fitCurve';
