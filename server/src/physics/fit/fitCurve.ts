/**
 * One weighted fit from start to report: Levenberg–Marquardt, then covariance, standard
 * uncertainties, χ² and the diagnostics that say when the numbers should not be trusted. The
 * caller's model maps parameters to predictions; data, weights and names come with it.
 */
import { correlationOf, covarianceFromJacobian, NEAR_DEGENERATE_CORRELATION } from './covariance';
import { levenbergMarquardt, type LmOptions, type LmStatus } from './levenbergMarquardt';

export interface CurveProblem {
  /** Parameter names, for diagnostics. */
  names: readonly string[];
  start: readonly number[];
  /** Typical size of each parameter (difference steps); default |start|, or 1 for a start of 0. */
  scale?: readonly number[];
  y: Float64Array;
  /** Standard uncertainties of y; absent: unknown, the covariance is scaled by χ²/dof (as certified reference fits are). */
  sigma?: Float64Array;
  /** Predictions at `p` into `out`; false when the model cannot be evaluated there. */
  model(p: Float64Array, out: Float64Array): boolean;
  /** Relative difference step for the Jacobian (default 6e-6). */
  relativeStep?: number;
  /** Optional ∂model_i/∂p_j (count × p, row-major). */
  modelJacobian?(p: Float64Array, out: Float64Array): boolean;
}

export type FitDiagnosticCode =
  | 'fit-too-few-points'
  | 'fit-model-failed'
  | 'fit-not-converged'
  | 'fit-undetermined'
  | 'fit-near-degenerate'
  | 'fit-chi2-high'
  | 'fit-chi2-low'
  | 'fit-at-start';

export interface FitDiagnostic {
  code: FitDiagnosticCode;
  severity: 'error' | 'warning' | 'info';
  message: string;
  /** Indices of the parameters concerned. */
  params?: number[];
}

export interface FitOutcome {
  /** False when no best values exist to report (model failed, too few points): only diagnostics. */
  ok: boolean;
  params: number[];
  /** Standard uncertainties; null for a parameter the data do not determine. */
  errors: (number | null)[];
  covariance: number[][] | null;
  correlation: number[][] | null;
  chi2: number;
  dof: number;
  /** χ²/dof; null when dof = 0. */
  reducedChi2: number | null;
  /** Model predictions at the best values. */
  model: Float64Array;
  /** Data − model (unweighted). */
  residuals: Float64Array;
  /** The covariance was scaled by χ²/dof because the data carry no uncertainties. */
  scaledByResidual: boolean;
  status: LmStatus;
  iterations: number;
  evaluations: number;
  conditionNumber: number;
  diagnostics: FitDiagnostic[];
}

/** |χ²/dof − 1| beyond this many standard deviations √(2/dof) is reported (common practice). */
const CHI2_SIGMAS = 3;
/** A stop with the residuals this far from orthogonal to a Jacobian column is no minimum (unless round-off, below, allows more). */
const GRADIENT_COSINE_LIMIT = 1e-5;

/**
 * The largest cosine between the residuals and a Jacobian column that the model's round-off can
 * hide. Moving the rest of the way along column j lowers χ² by (cos_j‖r‖)²; each prediction carries
 * at least one unit of round-off δ_i = ε|model_i|/σ_i, so χ² itself is uncertain by about
 * 2Σ|r_i|δ_i. A gain below that cannot be seen by any optimiser, and the stop is a minimum
 * (common practice: a stopping test cannot ask for more than the function's own precision).
 * Example: 7 GHz resonances at ±20 Hz give δ ≈ 5e-8 and a limit near 7e-4.
 */
export function roundOffCosine(weightedResiduals: Float64Array, model: Float64Array, sigma: Float64Array | undefined): number {
  let norm = 0;
  let noise = 0;
  for (let i = 0; i < weightedResiduals.length; i++) {
    const r = weightedResiduals[i]!;
    norm += r * r;
    noise += 2 * Math.abs(r) * ((Number.EPSILON * Math.abs(model[i]!)) / (sigma ? sigma[i]! : 1));
  }
  return norm > 0 ? Math.sqrt(noise / norm) : 0;
}

export function fitCurve(problem: CurveProblem, options: LmOptions = {}): FitOutcome {
  const n = problem.y.length;
  const m = problem.start.length;
  const sigma = problem.sigma;
  const prediction = new Float64Array(n);
  const diagnostics: FitDiagnostic[] = [];
  const empty = (status: LmStatus): FitOutcome => ({
    ok: false,
    params: [...problem.start],
    errors: problem.start.map(() => null),
    covariance: null,
    correlation: null,
    chi2: Number.NaN,
    dof: n - m,
    reducedChi2: null,
    model: new Float64Array(0),
    residuals: new Float64Array(0),
    scaledByResidual: false,
    status,
    iterations: 0,
    evaluations: 0,
    conditionNumber: Number.NaN,
    diagnostics,
  });
  if (m === 0 || n < m) {
    diagnostics.push({
      code: 'fit-too-few-points',
      severity: 'error',
      message: `${n} data point${n === 1 ? '' : 's'} cannot determine ${m} free parameter${m === 1 ? '' : 's'} (${problem.names.join(', ')}): give at least ${m} point${m === 1 ? '' : 's'} or free fewer parameters`,
    });
    return empty('model-failed');
  }
  const lm = levenbergMarquardt(
    {
      count: n,
      residuals: (p, out) => {
        if (!problem.model(p, prediction)) return false;
        for (let i = 0; i < n; i++) out[i] = (prediction[i]! - problem.y[i]!) / (sigma ? sigma[i]! : 1);
        return true;
      },
      ...(problem.modelJacobian
        ? {
            jacobian: (p: Float64Array, out: Float64Array) => {
              if (!problem.modelJacobian!(p, out)) return false;
              if (sigma) for (let i = 0; i < n; i++) for (let j = 0; j < m; j++) out[i * m + j] = out[i * m + j]! / sigma[i]!;
              return true;
            },
          }
        : {}),
      ...(problem.scale ? { scale: Float64Array.from(problem.scale) } : {}),
      ...(problem.relativeStep ? { relativeStep: problem.relativeStep } : {}),
    },
    Float64Array.from(problem.start),
    options,
  );
  if (lm.status === 'model-failed') {
    diagnostics.push({ code: 'fit-model-failed', severity: 'error', message: 'the model cannot be computed at the starting values (or next to them): change the starting values' });
    return { ...empty('model-failed'), iterations: lm.iterations, evaluations: lm.evaluations };
  }
  const params = Array.from(lm.params);
  problem.model(lm.params, prediction);
  const residuals = Float64Array.from(problem.y, (y, i) => y - prediction[i]!);
  const dof = n - m;
  const reducedChi2 = dof > 0 ? lm.chi2 / dof : null;
  const scaledByResidual = !sigma;
  const cov = covarianceFromJacobian(lm.jacobian, n, m);
  let covariance = cov.covariance;
  if (covariance && scaledByResidual) {
    // Unknown uncertainties: estimated from the scatter (needs dof > 0).
    const factor = reducedChi2 ?? Number.NaN;
    covariance = Number.isFinite(factor) ? covariance.map((row) => row.map((c) => c * factor)) : null;
  }
  const errors = params.map((_, j) => (covariance && covariance[j]![j]! >= 0 ? Math.sqrt(covariance[j]![j]!) : null));
  const correlation = covariance ? correlationOf(covariance) : null;

  const cosineLimit = Math.max(GRADIENT_COSINE_LIMIT, roundOffCosine(lm.residuals, prediction, sigma));
  const notMinimum = !(lm.gradientCosine <= cosineLimit) && !lm.atRoundOff;

  if (lm.status !== 'converged' || notMinimum) {
    const why = lm.status === 'max-iterations' ? `after ${lm.iterations} iterations` : 'no step lowers χ² any further';
    diagnostics.push({
      code: 'fit-not-converged',
      severity: 'error',
      message: `the fit did not converge (${why}); the values shown are where it stopped, not a best fit: try other starting values or free fewer parameters`,
    });
  }
  if (cov.undetermined.length > 0) {
    diagnostics.push({
      code: 'fit-undetermined',
      severity: 'error',
      message: `the data do not determine ${cov.undetermined.map((j) => problem.names[j]).join(' and ')} separately (a combination has no effect on the model): fix one or add data that separate them`,
      params: cov.undetermined,
    });
  } else if (correlation) {
    for (let i = 0; i < m; i++)
      for (let j = i + 1; j < m; j++)
        if (Math.abs(correlation[i]![j]!) > NEAR_DEGENERATE_CORRELATION) {
          diagnostics.push({
            code: 'fit-near-degenerate',
            severity: 'warning',
            message: `${problem.names[i]} and ${problem.names[j]} are ${(100 * Math.abs(correlation[i]![j]!)).toFixed(2)} % correlated: the data barely tell them apart, their uncertainties are large`,
            params: [i, j],
          });
        }
  }
  if (dof === 0) {
    diagnostics.push({ code: 'fit-too-few-points', severity: 'info', message: `as many points as free parameters (${m}): the fit passes through the data and χ² says nothing about its quality` });
  } else if (sigma && reducedChi2 !== null) {
    const band = CHI2_SIGMAS * Math.sqrt(2 / dof);
    if (reducedChi2 > 1 + band) {
      diagnostics.push({ code: 'fit-chi2-high', severity: 'warning', message: `χ²/dof = ${reducedChi2.toPrecision(3)} is far above 1 (expected 1 ± ${(band / CHI2_SIGMAS).toPrecision(2)}): the model misses the data or their uncertainties are too small` });
    } else if (reducedChi2 < 1 - band) {
      diagnostics.push({ code: 'fit-chi2-low', severity: 'warning', message: `χ²/dof = ${reducedChi2.toPrecision(3)} is far below 1 (expected 1 ± ${(band / CHI2_SIGMAS).toPrecision(2)}): the data's uncertainties look too large` });
    }
  }
  if (lm.iterations === 0 && lm.status === 'converged') {
    diagnostics.push({ code: 'fit-at-start', severity: 'info', message: 'the starting values are already a minimum of χ² (no step was needed)' });
  }
  return {
    ok: true,
    params,
    errors,
    covariance,
    correlation,
    chi2: lm.chi2,
    dof,
    reducedChi2,
    model: Float64Array.from(prediction),
    residuals,
    scaledByResidual,
    status: lm.status,
    iterations: lm.iterations,
    evaluations: lm.evaluations,
    conditionNumber: cov.conditionNumber,
    diagnostics,
  };
}
