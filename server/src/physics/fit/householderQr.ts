/**
 * Thin Householder QR of a tall n × p matrix (row-major), applied in place: R in the top p rows
 * and Qᵀ applied to a right-hand side. Least squares through QR keeps the condition number of J,
 * where the normal equations would square it (the certified-dataset tests need those digits).
 */

/** Factorises `a` (n × p, row-major, overwritten) and applies Qᵀ to `b` (length n, overwritten). Returns R (p × p, row-major). */
export function qrReduce(a: Float64Array, n: number, p: number, b: Float64Array): Float64Array {
  const r = new Float64Array(p * p);
  for (let k = 0; k < p; k++) {
    let norm = 0;
    for (let i = k; i < n; i++) norm = Math.hypot(norm, a[i * p + k]!);
    if (norm === 0) continue;
    const alpha = a[k * p + k]! > 0 ? -norm : norm;
    // v = x − alpha e1, stored in column k from row k down.
    a[k * p + k] = a[k * p + k]! - alpha;
    let vv = 0;
    for (let i = k; i < n; i++) vv += a[i * p + k]! * a[i * p + k]!;
    if (vv === 0) continue;
    for (let j = k + 1; j < p; j++) {
      let s = 0;
      for (let i = k; i < n; i++) s += a[i * p + k]! * a[i * p + j]!;
      const f = (2 * s) / vv;
      for (let i = k; i < n; i++) a[i * p + j] = a[i * p + j]! - f * a[i * p + k]!;
    }
    let s = 0;
    for (let i = k; i < n; i++) s += a[i * p + k]! * b[i]!;
    const f = (2 * s) / vv;
    for (let i = k; i < n; i++) b[i] = b[i]! - f * a[i * p + k]!;
    a[k * p + k] = alpha;
  }
  for (let i = 0; i < p; i++) for (let j = i; j < p; j++) r[i * p + j] = a[i * p + j]!;
  return r;
}

/**
 * Solves min ‖[R; diag(d)] x − [c; 0]‖ for the damped step: R (p × p upper triangular), the
 * damping diagonal d, c = the first p entries of Qᵀb. A second small QR folds d into R.
 */
export function solveDamped(r: Float64Array, p: number, d: Float64Array, c: Float64Array): Float64Array {
  const m = 2 * p;
  const a = new Float64Array(m * p);
  const b = new Float64Array(m);
  a.set(r);
  for (let j = 0; j < p; j++) a[(p + j) * p + j] = d[j]!;
  b.set(c);
  const rr = qrReduce(a, m, p, b);
  return backSubstitute(rr, p, b);
}

/** x with R x = b (upper triangular R); a zero pivot gives 0 for that unknown (the caller checks rank). */
export function backSubstitute(r: Float64Array, p: number, b: Float64Array): Float64Array {
  const x = new Float64Array(p);
  for (let i = p - 1; i >= 0; i--) {
    let s = b[i]!;
    for (let j = i + 1; j < p; j++) s -= r[i * p + j]! * x[j]!;
    const pivot = r[i * p + i]!;
    x[i] = pivot !== 0 ? s / pivot : 0;
  }
  return x;
}
