/**
 * Weighted nonlinear least squares by Levenberg–Marquardt (Moré's scaled trust-region form,
 * Nielsen's damping update). Each step solves the damped problem by QR of the Jacobian rather
 * than the normal equations, and a Jacobian not supplied is taken by central differences. The
 * model is a function of the parameters only: no I/O, never throws (a failing model is a status).
 * See docs/fit.md for why this is our own code and not a package.
 */
import { qrReduce, solveDamped } from './householderQr';

export interface LeastSquaresProblem {
  /** Number of residuals. */
  count: number;
  /** Weighted residuals r_i = (model_i − y_i)/σ_i at `p` into `out`; false (or a non-finite value) when the model cannot be evaluated there. */
  residuals(p: Float64Array, out: Float64Array): boolean;
  /** ∂r_i/∂p_j into `out` (count × p, row-major); without it central differences are used. */
  jacobian?(p: Float64Array, out: Float64Array): boolean;
  /** Typical size of each parameter, for difference steps (default |start|, or 1 for a start of 0). */
  scale?: Float64Array;
  /** Relative difference step (default 6e-6); a model computed on a grid needs a larger one. */
  relativeStep?: number;
}

export interface LmOptions {
  maxIterations?: number;
  /** Relative change of χ² (actual and predicted) that ends the fit. */
  ftol?: number;
  /** Relative size of the scaled step that ends the fit. */
  xtol?: number;
  /** Largest cosine between a Jacobian column and the residual vector that ends the fit. */
  gtol?: number;
}

export type LmStatus = 'converged' | 'max-iterations' | 'model-failed' | 'stalled';

export interface LmResult {
  params: Float64Array;
  chi2: number;
  residuals: Float64Array;
  /** ∂r/∂p at `params`, count × p row-major. */
  jacobian: Float64Array;
  iterations: number;
  evaluations: number;
  status: LmStatus;
  /** Largest cosine between a Jacobian column and the residuals at the end (0 at an exact minimum). */
  gradientCosine: number;
  /** χ² fell twenty orders of magnitude below its start: the residuals are the model's round-off, so the cosine means nothing. */
  atRoundOff: boolean;
}

const DEFAULTS = { maxIterations: 200, ftol: 1e-15, xtol: 1e-13, gtol: 1e-12 };
/** Relative difference step: central differences lose ~h² to truncation and ε/h to rounding. */
const DIFF_STEP = 6e-6;

function sumSquares(r: Float64Array): number {
  let s = 0;
  for (let i = 0; i < r.length; i++) s += r[i]! * r[i]!;
  return s;
}

function finite(r: Float64Array): boolean {
  for (let i = 0; i < r.length; i++) if (!Number.isFinite(r[i]!)) return false;
  return true;
}

/** Evaluates the Jacobian, analytic or by central differences; false when the model fails nearby. */
function jacobianAt(problem: LeastSquaresProblem, p: Float64Array, here: Float64Array, scale: Float64Array, out: Float64Array, count: () => void): boolean {
  const n = problem.count;
  const m = p.length;
  if (problem.jacobian) {
    count();
    return problem.jacobian(p, out) && finite(out);
  }
  const plus = new Float64Array(n);
  const minus = new Float64Array(n);
  const q = Float64Array.from(p);
  for (let j = 0; j < m; j++) {
    const h = (problem.relativeStep ?? DIFF_STEP) * Math.max(Math.abs(p[j]!), scale[j]!);
    q[j] = p[j]! + h;
    count();
    const okPlus = problem.residuals(q, plus) && finite(plus);
    q[j] = p[j]! - h;
    count();
    const okMinus = problem.residuals(q, minus) && finite(minus);
    q[j] = p[j]!;
    if (!okPlus && !okMinus) return false;
    // At the edge of the model's domain: a one-sided difference from the current point.
    const hi = okPlus ? plus : here;
    const lo = okMinus ? minus : here;
    const width = (okPlus ? p[j]! + h : p[j]!) - (okMinus ? p[j]! - h : p[j]!);
    for (let i = 0; i < n; i++) out[i * m + j] = (hi[i]! - lo[i]!) / width;
  }
  return true;
}

function gradientCosine(jac: Float64Array, r: Float64Array, n: number, m: number): number {
  const rNorm = Math.sqrt(sumSquares(r));
  if (rNorm === 0) return 0;
  let worst = 0;
  for (let j = 0; j < m; j++) {
    let dot = 0;
    let col = 0;
    for (let i = 0; i < n; i++) {
      dot += jac[i * m + j]! * r[i]!;
      col += jac[i * m + j]! * jac[i * m + j]!;
    }
    if (col > 0) worst = Math.max(worst, Math.abs(dot) / (Math.sqrt(col) * rNorm));
  }
  return worst;
}

export function levenbergMarquardt(problem: LeastSquaresProblem, start: Float64Array, options: LmOptions = {}): LmResult {
  const { maxIterations, ftol, xtol, gtol } = { ...DEFAULTS, ...options };
  const n = problem.count;
  const m = start.length;
  let evaluations = 0;
  const tally = (): void => {
    evaluations++;
  };
  // A parameter starting at 0 has no size of its own: a unit step scale (the caller gives better ones).
  const scale = problem.scale ?? Float64Array.from(start, (v) => (v !== 0 ? Math.abs(v) : 1));
  const p = Float64Array.from(start);
  const r = new Float64Array(n);
  const jac = new Float64Array(n * m);
  const fail = (iterations: number): LmResult => ({
    params: p,
    chi2: Number.NaN,
    residuals: r,
    jacobian: jac,
    iterations,
    evaluations,
    status: 'model-failed',
    gradientCosine: Number.NaN,
    atRoundOff: false,
  });
  tally();
  if (!problem.residuals(p, r) || !finite(r)) return fail(0);
  let chi2 = sumSquares(r);
  const chi2Start = chi2;
  /** An exactly determined fit ends with χ² at the model's round-off, where no step helps any more. */
  const atRoundOff = (x: number) => x <= 1e-20 * chi2Start;
  if (!jacobianAt(problem, p, r, scale, jac, tally)) return fail(0);

  const diag = new Float64Array(m);
  let lambda = 1e-3;
  let nu = 2;
  const trial = new Float64Array(m);
  const rTrial = new Float64Array(n);
  let status: LmStatus = 'max-iterations';
  let iterations = 0;
  let freshJacobian = true;
  let work: Float64Array = new Float64Array(n * m);
  let qtr: Float64Array = new Float64Array(n);
  let rFactor: Float64Array = new Float64Array(m * m);

  while (iterations < maxIterations) {
    if (freshJacobian) {
      // Moré's scaling: the largest column norm seen so far for each parameter.
      for (let j = 0; j < m; j++) {
        let col = 0;
        for (let i = 0; i < n; i++) col += jac[i * m + j]! * jac[i * m + j]!;
        diag[j] = Math.max(diag[j]!, Math.sqrt(col));
        if (diag[j] === 0) diag[j] = 1;
      }
      if (gradientCosine(jac, r, n, m) <= gtol || chi2 === 0) {
        status = 'converged';
        break;
      }
      work = Float64Array.from(jac);
      qtr = Float64Array.from(r, (v) => -v);
      rFactor = qrReduce(work, n, m, qtr);
      freshJacobian = false;
    }
    iterations++;
    const damping = Float64Array.from(diag, (d) => Math.sqrt(lambda) * d);
    const step = solveDamped(rFactor, m, damping, qtr.subarray(0, m));
    // Predicted χ² after the step, from the linear model r + Jδ.
    let predicted = 0;
    for (let i = 0; i < n; i++) {
      let v = r[i]!;
      for (let j = 0; j < m; j++) v += jac[i * m + j]! * step[j]!;
      predicted += v * v;
    }
    let scaledStep = 0;
    let scaledP = 0;
    for (let j = 0; j < m; j++) {
      trial[j] = p[j]! + step[j]!;
      scaledStep += (diag[j]! * step[j]!) ** 2;
      scaledP += (diag[j]! * p[j]!) ** 2;
    }
    tally();
    const ok = problem.residuals(trial, rTrial) && finite(rTrial);
    const chi2Trial = ok ? sumSquares(rTrial) : Number.POSITIVE_INFINITY;
    const predictedDrop = chi2 - predicted;
    const rho = predictedDrop > 0 ? (chi2 - chi2Trial) / predictedDrop : -1;
    const tinyStep = Math.sqrt(scaledStep) <= xtol * Math.sqrt(scaledP);
    if (rho > 1e-4) {
      const actualDrop = chi2 - chi2Trial;
      p.set(trial);
      r.set(rTrial);
      chi2 = chi2Trial;
      lambda *= Math.max(1 / 3, 1 - (2 * rho - 1) ** 3);
      nu = 2;
      if (!jacobianAt(problem, p, r, scale, jac, tally)) return fail(iterations);
      freshJacobian = true;
      if ((actualDrop <= ftol * chi2 && predictedDrop <= ftol * chi2) || tinyStep) {
        status = 'converged';
        break;
      }
    } else {
      if (tinyStep && ok) {
        status = 'converged';
        break;
      }
      lambda *= nu;
      nu *= 2;
      if (lambda > 1e30) {
        // No step helps: at round-off, the point is the solution.
        status = atRoundOff(chi2) ? 'converged' : 'stalled';
        break;
      }
    }
  }
  return { params: p, chi2, residuals: r, jacobian: jac, iterations, evaluations, status, gradientCosine: gradientCosine(jac, r, n, m), atRoundOff: atRoundOff(chi2) };
}
