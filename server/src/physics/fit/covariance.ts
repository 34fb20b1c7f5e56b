/**
 * Parameter covariance (JᵀJ)⁻¹ of a weighted least-squares fit from the Jacobian of the
 * weighted residuals, through the SVD of the column-scaled R factor: the singular values show a
 * parameter combination the data do not determine (the covariance is then not reported as if
 * it were). ml-matrix gives the small SVD.
 */
import type * as MlMatrix from 'ml-matrix';
import { qrReduce } from './householderQr';

let mlMatrix: typeof MlMatrix | undefined;

/**
 * ml-matrix, loaded by the first fit rather than with the program: it is a seventh of the CLI,
 * and every `check` would compile it at start-up (docs/speed.md, "Start-up").
 */
function svdLibrary(): typeof MlMatrix {
  mlMatrix ??= require('ml-matrix') as typeof MlMatrix;
  return mlMatrix;
}

/**
 * Below this ratio of smallest to largest singular value (scaled columns) a combination is
 * undetermined: Jacobians by central differences are good to ~1e-8 relative, so a weaker
 * combination cannot be told from none.
 */
export const SINGULAR_RATIO = 1e-7;
/** Above this |correlation| two parameters are called nearly degenerate (common practice). */
export const NEAR_DEGENERATE_CORRELATION = 0.999;

export interface CovarianceResult {
  /** (JᵀJ)⁻¹, p × p; null when J is rank deficient. */
  covariance: number[][] | null;
  /** Largest over smallest singular value of J with unit-norm columns. */
  conditionNumber: number;
  /** Parameters that take part in an undetermined combination (empty when J has full rank). */
  undetermined: number[];
}

export function covarianceFromJacobian(jac: Float64Array, n: number, p: number): CovarianceResult {
  const scale = new Float64Array(p);
  for (let j = 0; j < p; j++) {
    let s = 0;
    for (let i = 0; i < n; i++) s += jac[i * p + j]! * jac[i * p + j]!;
    scale[j] = Math.sqrt(s);
  }
  const dead = [...scale.keys()].filter((j) => !(scale[j]! > 0) || !Number.isFinite(scale[j]!));
  if (dead.length > 0 || n < p) return { covariance: null, conditionNumber: Number.POSITIVE_INFINITY, undetermined: dead.length > 0 ? dead : [...scale.keys()] };
  const a = new Float64Array(n * p);
  for (let i = 0; i < n; i++) for (let j = 0; j < p; j++) a[i * p + j] = jac[i * p + j]! / scale[j]!;
  const r = qrReduce(a, n, p, new Float64Array(n));
  const rows: number[][] = [];
  for (let i = 0; i < p; i++) rows.push(Array.from(r.subarray(i * p, i * p + p)));
  const { Matrix, SingularValueDecomposition } = svdLibrary();
  const svd = new SingularValueDecomposition(new Matrix(rows), { autoTranspose: true });
  const s = svd.diagonal;
  const v = svd.rightSingularVectors;
  const largest = Math.max(...s);
  const smallest = Math.min(...s);
  const conditionNumber = smallest > 0 ? largest / smallest : Number.POSITIVE_INFINITY;
  const weak = s.map((x, k) => (x <= SINGULAR_RATIO * largest ? k : -1)).filter((k) => k >= 0);
  if (weak.length > 0) {
    const involved = new Set<number>();
    for (const k of weak) for (let j = 0; j < p; j++) if (Math.abs(v.get(j, k)) > 0.1) involved.add(j);
    return { covariance: null, conditionNumber, undetermined: [...involved].sort((x, y) => x - y) };
  }
  const cov: number[][] = [];
  for (let i = 0; i < p; i++) {
    const row: number[] = [];
    for (let j = 0; j < p; j++) {
      let c = 0;
      for (let k = 0; k < p; k++) c += (v.get(i, k) * v.get(j, k)) / (s[k]! * s[k]!);
      row.push(c / (scale[i]! * scale[j]!));
    }
    cov.push(row);
  }
  return { covariance: cov, conditionNumber, undetermined: [] };
}

export function correlationOf(cov: number[][]): number[][] {
  return cov.map((row, i) => row.map((c, j) => (i === j ? 1 : c / Math.sqrt(cov[i]![i]! * cov[j]![j]!))));
}
