/**
 * Eigen-decomposition used by the engine: own cyclic Jacobi for blocks up to
 * JACOBI_MAX_ORDER, own Householder + implicit-shift QR above. Both beat
 * ml-matrix's EigenvalueDecomposition on every order measured; the switch
 * point comes from bench/eigen.bench.ts (numbers in docs/engine.md).
 */
import { householderQlInPlace } from './householderQl';
import { jacobiInPlace } from './jacobiEigen';
import { sortEigenPairs } from './sortEigenPairs';

export const JACOBI_MAX_ORDER = 8;

/**
 * Eigenpairs of the symmetric matrix `a` (destroyed), sorted ascending:
 * values[k] and column k of `vectors`. Returns false on non-finite input or
 * no convergence.
 */
export function symmetricEigen(a: Float64Array, n: number, values: Float64Array, vectors: Float64Array): boolean {
  let ok: boolean;
  if (n <= JACOBI_MAX_ORDER) {
    ok = jacobiInPlace(a, n, vectors);
    for (let i = 0; i < n; i++) values[i] = a[i * n + i];
  } else {
    const scratch = new Float64Array(3 * n);
    ok = householderQlInPlace(a, n, values, vectors, scratch.subarray(0, n), scratch.subarray(n, 2 * n), scratch.subarray(2 * n));
  }
  sortEigenPairs(values, vectors, n);
  return ok;
}
