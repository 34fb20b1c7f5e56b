/**
 * Eigen-decomposition for the larger blocks: Householder tridiagonalisation on the lower
 * triangle with the reflectors kept (not accumulated into Q), eigenvalues of the tridiagonal by
 * implicit QR without vectors (householderQl.ts), its eigenvectors by inverse iteration
 * (tridiagonalVectors.ts), and the reflectors applied to those vectors at the end. Work: about
 * 4/3 n³ + 2 n³ flops against the 2 n³ + ~12 n³ of accumulating every QR rotation — the
 * split LAPACK's dsyevx/dstein route uses (Golub & Van Loan, Matrix Computations, 4th ed.,
 * §8.3 and §8.4.4 for the back-transformation). Row-major storage; every inner loop runs
 * along a row.
 */
import { tridiagonalQr } from './householderQl';
import { tridiagonalEigenpairs } from './tridiagonalVectors';

/**
 * Reduce the lower triangle of `a` to T = Qᵀ A Q (d diagonal, e sub-diagonal). The reflector of
 * step k, H_k = I − β_k v vᵀ with v nonzero from k + 1 on, stays in column k of `a` below the
 * diagonal (where the column it annihilates was, as LAPACK's dsytrd keeps it), β_k in betas[k].
 */
function tridiagonaliseLower(a: Float64Array, n: number, d: Float64Array, e: Float64Array, v: Float64Array, betas: Float64Array, p: Float64Array): void {
  for (let k = 0; k < n - 2; k++) {
    let tail = 0;
    for (let i = k + 2; i < n; i++) tail += a[i * n + k] * a[i * n + k];
    const x0 = a[(k + 1) * n + k];
    if (tail === 0) {
      betas[k] = 0;
      e[k] = x0;
      continue;
    }
    const alpha = -(x0 >= 0 ? 1 : -1) * Math.sqrt(tail + x0 * x0);
    a[(k + 1) * n + k] = x0 - alpha;
    // v (contiguous copy of column k) for the passes below.
    for (let i = k + 1; i < n; i++) v[i] = a[i * n + k];
    const beta = 2 / (v[k + 1] * v[k + 1] + tail);
    betas[k] = beta;
    e[k] = alpha;
    // p = β A v on the trailing block, from its lower triangle (row i: a_ij, j ≤ i).
    for (let i = k + 1; i < n; i++) p[i] = 0;
    for (let i = k + 1; i < n; i++) {
      const row = i * n;
      const vi = v[i];
      let s = 0;
      for (let j = k + 1; j < i; j++) {
        const aij = a[row + j];
        s += aij * v[j];
        p[j] += aij * vi;
      }
      p[i] += s + a[row + i] * vi;
    }
    let vp = 0;
    for (let i = k + 1; i < n; i++) {
      p[i] *= beta;
      vp += v[i] * p[i];
    }
    // w = p − (β/2)(vᵀp) v, then A ← A − v wᵀ − w vᵀ on the lower trailing triangle.
    const kk = 0.5 * beta * vp;
    for (let i = k + 1; i < n; i++) p[i] -= kk * v[i];
    for (let i = k + 1; i < n; i++) {
      const row = i * n;
      const vi = v[i];
      const wi = p[i];
      for (let j = k + 1; j <= i; j++) a[row + j] -= vi * p[j] + wi * v[j];
    }
  }
  for (let i = 0; i < n; i++) d[i] = a[i * n + i];
  if (n >= 2) e[n - 2] = a[(n - 1) * n + n - 2];
}

/**
 * Row r of zt ← H_0 … H_{n−3} (row r) for every row, the reflectors read from the columns of
 * `a` (tridiagonaliseLower). Four rows share each pass over a
 * reflector (four dot products, then four updates), which halves the loads per operation.
 */
function applyReflectors(zt: Float64Array, n: number, a: Float64Array, betas: Float64Array, reflector: Float64Array): void {
  for (let k = n - 3; k >= 0; k--) {
    const beta = betas[k];
    if (beta === 0) continue;
    // The reflector, copied out of column k so the passes below read it contiguously.
    for (let i = k + 1; i < n; i++) reflector[i] = a[i * n + k];
    let r = 0;
    for (; r + 3 < n; r += 4) {
      const a0 = r * n;
      const a1 = a0 + n;
      const a2 = a1 + n;
      const a3 = a2 + n;
      let s0 = 0;
      let s1 = 0;
      let s2 = 0;
      let s3 = 0;
      for (let i = k + 1; i < n; i++) {
        const v = reflector[i];
        s0 += v * zt[a0 + i];
        s1 += v * zt[a1 + i];
        s2 += v * zt[a2 + i];
        s3 += v * zt[a3 + i];
      }
      s0 *= beta;
      s1 *= beta;
      s2 *= beta;
      s3 *= beta;
      for (let i = k + 1; i < n; i++) {
        const v = reflector[i];
        zt[a0 + i] -= s0 * v;
        zt[a1 + i] -= s1 * v;
        zt[a2 + i] -= s2 * v;
        zt[a3 + i] -= s3 * v;
      }
    }
    for (; r < n; r++) {
      const at = r * n;
      let s = 0;
      for (let i = k + 1; i < n; i++) s += reflector[i] * zt[at + i];
      s *= beta;
      for (let i = k + 1; i < n; i++) zt[at + i] -= s * reflector[i];
    }
  }
}

/**
 * Eigenpairs of the symmetric `a` (order n ≥ 2, destroyed): values ascending into `values`,
 * column k of `vectors` the k-th eigenvector. Returns false on non-finite input or no convergence.
 */
export function householderInverseIterationInPlace(a: Float64Array, n: number, values: Float64Array, vectors: Float64Array): boolean {
  // Work on A / max|a_ij| so sums of squares can neither overflow nor underflow.
  let big = 0;
  for (let i = 0; i < n * n; i++) big = Math.max(big, Math.abs(a[i]));
  if (!(big < Number.POSITIVE_INFINITY)) return false;
  const scale = big > 0 && 1 / big < Number.POSITIVE_INFINITY ? big : 1;
  for (let i = 0; i < n * n; i++) a[i] /= scale;
  const d = new Float64Array(n);
  const e = new Float64Array(n);
  const betas = new Float64Array(n);
  const v = new Float64Array(n);
  tridiagonaliseLower(a, n, d, e, v, betas, values);
  // Row k of zt: the k-th eigenvector, first of T, then of A = H_0 … H_{n−3} T-vectors.
  const zt = vectors;
  if (!tridiagonalEigenpairs(d, e, n, values, zt, (bd, be, m) => tridiagonalQr(bd, be, null, m))) return false;
  applyReflectors(zt, n, a, betas, v);
  // Rows to columns.
  for (let i = 0; i < n; i++) {
    for (let k = i + 1; k < n; k++) {
      const t = zt[i * n + k];
      zt[i * n + k] = zt[k * n + i];
      zt[k * n + i] = t;
    }
  }
  for (let i = 0; i < n; i++) values[i] *= scale;
  return true;
}
