/**
 * Householder tridiagonalisation followed by implicit bulge chasing
 * (implicit symmetric QR steps with a Wilkinson shift) for a real symmetric
 * matrix stored row-major in a Float64Array. Written for the small m blocks:
 * columns that are already tridiagonal (blocks without the quadrupole term)
 * skip their reflection, and all work happens in caller-provided buffers.
 */

import { deflatingQr } from './tridiagonalValues';

/**
 * Reduce `a` (order n, full symmetric storage, destroyed) to tridiagonal form
 * T = Qᵀ A Q: d receives the diagonal, e[i] = T[i+1][i], q the orthogonal Q.
 * `w1`, `w2` are scratch vectors of length n.
 */
function tridiagonalise(a: Float64Array, n: number, d: Float64Array, e: Float64Array, q: Float64Array, w1: Float64Array, w2: Float64Array): void {
  q.fill(0, 0, n * n);
  for (let i = 0; i < n; i++) q[i * n + i] = 1;
  for (let k = 0; k < n - 2; k++) {
    // x = A[k+1.., k]; reflect it onto the first unit vector unless it already is there.
    let tail = 0;
    for (let i = k + 2; i < n; i++) tail += a[i * n + k] * a[i * n + k];
    if (tail === 0) continue;
    const x0 = a[(k + 1) * n + k];
    const alpha = -(x0 >= 0 ? 1 : -1) * Math.sqrt(tail + x0 * x0);
    // v lives in w1[k+1..n-1]; H = I − β v vᵀ
    w1[k + 1] = x0 - alpha;
    for (let i = k + 2; i < n; i++) w1[i] = a[i * n + k];
    const vv = w1[k + 1] * w1[k + 1] + tail;
    const beta = 2 / vv;
    // p = β A v on the trailing block, then w = p − (β/2)(vᵀp) v
    let vp = 0;
    for (let i = k + 1; i < n; i++) {
      let s = 0;
      for (let j = k + 1; j < n; j++) s += a[i * n + j] * w1[j];
      w2[i] = beta * s;
      vp += w1[i] * w2[i];
    }
    const kk = 0.5 * beta * vp;
    for (let i = k + 1; i < n; i++) w2[i] -= kk * w1[i];
    // A ← A − v wᵀ − w vᵀ on the trailing block; column k becomes (alpha, 0, …)
    for (let i = k + 1; i < n; i++) {
      for (let j = k + 1; j < n; j++) a[i * n + j] -= w1[i] * w2[j] + w2[i] * w1[j];
    }
    a[(k + 1) * n + k] = alpha;
    a[k * n + k + 1] = alpha;
    for (let i = k + 2; i < n; i++) {
      a[i * n + k] = 0;
      a[k * n + i] = 0;
    }
    // Q ← Q H
    for (let r = 0; r < n; r++) {
      let s = 0;
      for (let j = k + 1; j < n; j++) s += q[r * n + j] * w1[j];
      s *= beta;
      for (let j = k + 1; j < n; j++) q[r * n + j] -= s * w1[j];
    }
  }
  for (let i = 0; i < n; i++) d[i] = a[i * n + i];
  for (let i = 0; i < n - 1; i++) e[i] = a[(i + 1) * n + i];
}

/** In-place transpose of the n × n row-major m. */
function transpose(m: Float64Array, n: number): void {
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const t = m[i * n + j];
      m[i * n + j] = m[j * n + i];
      m[j * n + i] = t;
    }
  }
}

/** Wilkinson shift: the eigenvalue of the trailing 2 × 2 [[dm1, b], [b, dm]] nearer dm. */
function wilkinsonShift(dm1: number, dm: number, b: number): number {
  const delta = 0.5 * (dm1 - dm);
  const root = Math.hypot(delta, b);
  const denom = delta >= 0 ? delta + root : delta - root;
  return denom === 0 ? dm : dm - (b * b) / denom;
}

/**
 * One implicit shifted QR sweep on the unreduced window [l, m] of the
 * tridiagonal (d, e); rotations are also applied to the columns of q.
 */
function chaseBulge(d: Float64Array, e: Float64Array, q: Float64Array | null, n: number, l: number, m: number): void {
  const mu = wilkinsonShift(d[m - 1], d[m], e[m - 1]);
  let x = d[l] - mu;
  let z = e[l];
  for (let k = l; k < m; k++) {
    const r = Math.hypot(x, z);
    const c = r === 0 ? 1 : x / r;
    const s = r === 0 ? 0 : z / r;
    if (k > l) e[k - 1] = r;
    const a = d[k];
    const b = e[k];
    const cc = d[k + 1];
    d[k] = c * c * a + 2 * c * s * b + s * s * cc;
    d[k + 1] = s * s * a - 2 * c * s * b + c * c * cc;
    e[k] = c * s * (cc - a) + (c * c - s * s) * b;
    if (k < m - 1) {
      z = s * e[k + 1];
      e[k + 1] *= c;
      x = e[k];
    }
    // q holds Qᵀ here (row k is column k of Q), so the rotation runs along two contiguous rows.
    if (q === null) continue;
    for (let i = 0, rk = k * n, rk1 = rk + n; i < n; i++) {
      const qk = q[rk + i];
      const qk1 = q[rk1 + i];
      q[rk + i] = c * qk + s * qk1;
      q[rk1 + i] = c * qk1 - s * qk;
    }
  }
}

/**
 * Eigen-decomposition of the symmetric `a` (destroyed): d receives the
 * eigenvalues (unsorted), columns of `vectors` the eigenvectors. `e`, `w1`,
 * `w2` are scratch of length n. Returns false on non-finite input or if the
 * iteration limit (30 n sweeps) is reached.
 */
export function householderQlInPlace(
  a: Float64Array,
  n: number,
  d: Float64Array,
  vectors: Float64Array,
  e: Float64Array,
  w1: Float64Array,
  w2: Float64Array,
): boolean {
  // Work on A / max|a_ij| so sums of squares can neither overflow nor underflow.
  let big = 0;
  for (let i = 0; i < n * n; i++) big = Math.max(big, Math.abs(a[i]));
  if (!(big < Number.POSITIVE_INFINITY)) return false;
  const scale = big > 0 && 1 / big < Number.POSITIVE_INFINITY ? big : 1;
  for (let i = 0; i < n * n; i++) a[i] /= scale;
  tridiagonalise(a, n, d, e, vectors, w1, w2);
  transpose(vectors, n);
  const ok = tridiagonalQr(d, e, vectors, n);
  transpose(vectors, n);
  for (let i = 0; i < n; i++) d[i] *= scale;
  return ok;
}

/**
 * Eigenvalues of the tridiagonal (d, e) into d (unsorted; e destroyed) by implicit shifted QR,
 * the rotations also applied to the rows of `qt` (Qᵀ) unless it is null. Returns false on
 * non-finite input or if the iteration limit (30 n sweeps) is reached.
 */
export function tridiagonalQr(d: Float64Array, e: Float64Array, qt: Float64Array | null, n: number): boolean {
  return deflatingQr(d, e, n, (l, m) => chaseBulge(d, e, qt, n, l, m));
}
