/**
 * The scalar product a·b of two angular momenta inside one block of the
 * uncoupled basis |m_a, m_b> with fixed m_a + m_b:
 *   a·b = a_z b_z + ½ (a₊ b₋ + a₋ b₊).
 * The basis is ordered by m_a descending, so a₋ b₊ links neighbour k to k+1.
 */
import { raiseCoef } from './halfIntegers';

/**
 * Row-major matrix of a·b for the block listed by `twoMa` (descending, step 2),
 * with twoMb = twoMTotal − twoMa.
 */
export function dotProductBlock(twoA: number, twoB: number, twoMa: readonly number[], twoMTotal: number): Float64Array {
  const n = twoMa.length;
  const x = new Float64Array(n * n);
  for (let k = 0; k < n; k++) {
    const ma = twoMa[k];
    const mb = twoMTotal - ma;
    x[k * n + k] = (ma * mb) / 4;
    if (k + 1 < n) {
      // <ma−1, mb+1| ½ a₋ b₊ |ma, mb> = ½ sqrt(a(a+1) − ma(ma−1)) sqrt(b(b+1) − mb(mb+1))
      const v = 0.5 * raiseCoef(twoA, ma - 2) * raiseCoef(twoB, mb);
      x[k * n + k + 1] = v;
      x[(k + 1) * n + k] = v;
    }
  }
  return x;
}

/** c = a·b for row-major square matrices of order n. */
export function multiplySquare(a: Float64Array, b: Float64Array, n: number): Float64Array {
  const c = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < n; k++) {
      const aik = a[i * n + k];
      if (aik === 0) continue;
      for (let j = 0; j < n; j++) c[i * n + j] += aik * b[k * n + j];
    }
  }
  return c;
}

/** Values of m_a (twice) present in the block of total twoM, descending. */
export function blockProjections(twoA: number, twoB: number, twoMTotal: number): number[] {
  const hi = Math.min(twoA, twoMTotal + twoB);
  const lo = Math.max(-twoA, twoMTotal - twoB);
  const out: number[] = [];
  for (let m = hi; m >= lo; m -= 2) out.push(m);
  return out;
}
