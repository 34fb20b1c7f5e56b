/**
 * Eigenvalues of a symmetric tridiagonal matrix by implicit shifted QR, values only: the same
 * deflation and Wilkinson-shifted bulge chase as tridiagonalQr (householderQl.ts), with each
 * rotation's length (and the shift's root) taken as √(x² + z²) instead of Math.hypot. In V8 Math.hypot is a generic
 * builtin that allocates its argument list on every call; on order 160 the value-only QR ran
 * 2× faster and the whole tridiagonal eigen-solve lost a fifth of its time to garbage
 * collection before this (bench/eigen.bench.ts, docs/engine.md). Math.hypot remains for the
 * rare x² + z² outside [1e-280, 1e280], where the square could underflow or overflow.
 * With vectors it solves the small pieces of the divide and conquer in its JavaScript kernel set
 * (divideConquerTridiagonal.ts); the WebAssembly route runs the same chase, operation for
 * operation, as a kernel (leafEigen in scripts/wasm/eigenKernelsWat.mjs; the tests compare the
 * bits). The JavaScript route keeps tridiagonalQr, the reference, bit-for-bit.
 */
const EPS = 2.220446049250313e-16;

/** √(x² + z²) without the call of Math.hypot where the square is safe. */
function rotationLength(x: number, z: number): number {
  const r2 = x * x + z * z;
  return r2 > 1e-280 && r2 < 1e280 ? Math.sqrt(r2) : Math.hypot(x, z);
}

/** Wilkinson shift: the eigenvalue of the trailing 2 × 2 [[dm1, b], [b, dm]] nearer dm. */
function wilkinsonShift(dm1: number, dm: number, b: number): number {
  const delta = 0.5 * (dm1 - dm);
  const root = rotationLength(delta, b);
  const denom = delta >= 0 ? delta + root : delta - root;
  return denom === 0 ? dm : dm - (b * b) / denom;
}

/**
 * One implicit shifted QR sweep on the unreduced window [l, m] of (d, e); the rotations also
 * go to rows k, k + 1 of `qt` (stride qs) unless it is null.
 */
function chaseValues(d: Float64Array, e: Float64Array, l: number, m: number, qt: Float64Array | null, qs: number): void {
  const mu = wilkinsonShift(d[m - 1], d[m], e[m - 1]);
  let x = d[l] - mu;
  let z = e[l];
  for (let k = l; k < m; k++) {
    const r = rotationLength(x, z);
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
    if (qt === null) continue;
    for (let i = 0, rk = k * qs, rk1 = rk + qs; i < qs; i++) {
      const qk = qt[rk + i];
      const qk1 = qt[rk1 + i];
      qt[rk + i] = c * qk + s * qk1;
      qt[rk1 + i] = c * qk1 - s * qk;
    }
  }
}

/**
 * The deflation loop both QR routes share: split off converged values at the bottom, find the
 * unreduced block [l, m] above, and let `chase` run one shifted sweep over it. Returns false on
 * non-finite input or if the iteration limit (30 n sweeps) is reached.
 */
export function deflatingQr(d: Float64Array, e: Float64Array, n: number, chase: (l: number, m: number) => void): boolean {
  let norm = 0;
  for (let i = 0; i < n; i++) norm = Math.max(norm, Math.abs(d[i]) + (i > 0 ? Math.abs(e[i - 1]) : 0) + (i < n - 1 ? Math.abs(e[i]) : 0));
  if (!Number.isFinite(norm)) return false;
  const floor = 1e-300 + EPS * 1e-3 * norm;
  let m = n - 1;
  for (let iter = 0; m > 0; iter++) {
    if (iter > 30 * n) return false;
    while (m > 0 && Math.abs(e[m - 1]) <= EPS * (Math.abs(d[m - 1]) + Math.abs(d[m])) + floor) {
      e[m - 1] = 0;
      m--;
    }
    if (m === 0) break;
    let l = m - 1;
    while (l > 0 && Math.abs(e[l - 1]) > EPS * (Math.abs(d[l - 1]) + Math.abs(d[l])) + floor) l--;
    if (l > 0) e[l - 1] = 0;
    chase(l, m);
  }
  return true;
}

/** Eigenvalues of the tridiagonal (d, e) into d (unsorted; e destroyed); false as deflatingQr. */
export function tridiagonalValues(d: Float64Array, e: Float64Array, n: number): boolean {
  return deflatingQr(d, e, n, (l, m) => chaseValues(d, e, l, m, null, 0));
}

/**
 * Eigenvalues into d as tridiagonalValues, with the rotations accumulated into the rows of `qt`
 * (n × n, row-major): start from the identity and row k ends as the eigenvector of d[k].
 */
export function tridiagonalValuesVectors(d: Float64Array, e: Float64Array, n: number, qt: Float64Array): boolean {
  return deflatingQr(d, e, n, (l, m) => chaseValues(d, e, l, m, qt, n));
}
