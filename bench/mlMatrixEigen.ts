/**
 * The ml-matrix eigen-decomposition (Householder tridiagonalisation + QL),
 * wrapped to the same buffer interface as the engine solvers, for the
 * eigen-solver comparison only (the engine does not use it).
 */
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';

/** Diagonal of `a` receives the eigenvalues, columns of `vectors` the eigenvectors. */
export function libraryEigenInPlace(a: Float64Array, n: number, vectors: Float64Array): boolean {
  const m = new Matrix(n, n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) m.set(i, j, a[i * n + j]);
  const evd = new EigenvalueDecomposition(m, { assumeSymmetric: true });
  const vals = evd.realEigenvalues;
  const vecs = evd.eigenvectorMatrix;
  let ok = true;
  for (let i = 0; i < n; i++) {
    a[i * n + i] = vals[i];
    if (!Number.isFinite(vals[i])) ok = false;
    for (let j = 0; j < n; j++) vectors[i * n + j] = vecs.get(i, j);
  }
  return ok;
}
