/** First-order uncertainty propagation with sparse sensitivities (see docs/uncertainty.md). */
export type { InputTable, Sensitivities, Uncertain, UncertainInput } from './types';
export { combine, correlation, covariance, covarianceMatrix, exact, fromInput, hasSensitivity, NO_SENSITIVITY, standardUncertainty } from './propagate';
export { difference, implicitRoot, scaled, throughParams, type ParamSensitivities } from './chain';
export { levelDerivatives, type LevelDerivatives, type LevelParam, type ParamPartials, type StateDerivatives } from './levelDerivatives';
