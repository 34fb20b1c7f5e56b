/**
 * Eigen-decomposition used by the engine: own cyclic Jacobi for blocks up to
 * JACOBI_MAX_ORDER, own Householder + implicit-shift QR above, and from
 * INVERSE_ITERATION_MIN_ORDER on the QR for eigenvalues only with the vectors by inverse
 * iteration. From SIMD_MIN_ORDER on, where WebAssembly runs, that route's reduction and
 * back-transformation run as SIMD kernels (simdEigen.ts). All beat ml-matrix's
 * EigenvalueDecomposition on every order measured; the switch points come from
 * bench/eigen.bench.ts (numbers in docs/engine.md).
 */
import { householderInverseIterationInPlace } from './householderInverseIteration';
import { householderQlInPlace } from './householderQl';
import { jacobiInPlace } from './jacobiEigen';
import { simdEigenpairs, simdKernelsAvailable } from './simdEigen';
import { sortEigenPairs } from './sortEigenPairs';

export const JACOBI_MAX_ORDER = 8;
/**
 * From this order on, the vectors come from inverse iteration and the kept reflectors
 * (householderInverseIteration.ts): 1.7× faster at 40, 1.9× at 160 (bench/eigen.bench.ts,
 * docs/engine.md); below it the accumulated QR rotations cost no more.
 */
export const INVERSE_ITERATION_MIN_ORDER = 32;
/**
 * From this order on, where WebAssembly runs, blocks take the WebAssembly route (simdEigen.ts:
 * reduction and back-transformation as SIMD kernels, the tridiagonal by divide and conquer):
 * 1.4–1.8× faster than the QR route at order 9, 1.3–2.3× at 10–14 (four runs of
 * bench/eigen.bench.ts, docs/engine.md), so every order above JACOBI_MAX_ORDER takes it. The module is compiled on
 * the first such block.
 */
export const SIMD_MIN_ORDER = JACOBI_MAX_ORDER + 1;

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
  } else if (n >= SIMD_MIN_ORDER && simdKernelsAvailable()) {
    // `a` is left as it was, so the QR route can take it should the secular equation or a merge not settle.
    ok = simdEigenpairs(a, n, values, vectors) || qrRoute(a, n, values, vectors);
  } else if (n >= INVERSE_ITERATION_MIN_ORDER) {
    // Should inverse iteration not converge (it reports so), the QR route solves a copy.
    const copy = inputCopy(a, n);
    ok = householderInverseIterationInPlace(a, n, values, vectors) || qrRoute(copy, n, values, vectors);
  } else {
    ok = qrRoute(a, n, values, vectors);
  }
  // The WebAssembly route's values come ascending: the selection sort's n²/2 comparisons
  // (16.5 µs at order 160, 23.8 µs at 192, measured alone) would find nothing to move.
  if (!ascending(values, n)) sortEigenPairs(values, vectors, n);
  return ok;
}

/** True if values[0..n) never decrease (false where a NaN stands: the sort then runs as before). */
function ascending(values: Float64Array, n: number): boolean {
  for (let i = 0; i + 1 < n; i++) if (!(values[i]! <= values[i + 1]!)) return false;
  return true;
}

/** Householder + QR with every rotation accumulated (householderQl.ts). */
function qrRoute(a: Float64Array, n: number, values: Float64Array, vectors: Float64Array): boolean {
  const scratch = new Float64Array(3 * n);
  return householderQlInPlace(a, n, values, vectors, scratch.subarray(0, n), scratch.subarray(n, 2 * n), scratch.subarray(2 * n));
}

/** The largest input copied so far, reused: a large block is solved at many fields in a row. */
let copyBuffer = new Float64Array(0);

function inputCopy(a: Float64Array, n: number): Float64Array {
  if (copyBuffer.length < n * n) copyBuffer = new Float64Array(n * n);
  const copy = copyBuffer.subarray(0, n * n);
  copy.set(a.subarray(0, n * n));
  return copy;
}
