/**
 * The back-transformation of the WebAssembly route (simdEigen.ts): Z ← Z · H_{n−3} ⋯ H_0, the
 * rows of Z being the tridiagonal's eigenvectors and H_k = I − β_k v_k v_kᵀ the reduction's
 * reflectors, REFLECTOR_BLOCK reflectors at a time in compact-WY form (Schreiber & Van Loan,
 * SIAM J. Sci. Stat. Comput. 10 (1989) 53; Golub & Van Loan, Matrix Computations, 4th ed.,
 * §5.1.7): H_{k0} ⋯ H_{k1−1} = I − V T Vᵀ with V = [v_{k0} … v_{k1−1}] and T upper triangular,
 * so a block costs three products on the module's register-tiled `multiply` kernel,
 * W = Z V, W ← W Tᵀ, Z ← Z − W Vᵀ, instead of one pass over Z per reflector (a rank-1 update
 * bound by loads and stores). Blocks run from the last reflectors to the first.
 *
 * Everything lives in the module's memory (byte offsets below); strides are multiples of four,
 * so the kernel's tiles of four rows and columns never reach past a row.
 */

/** Reflectors per block (a multiple of 4; 16, 24, 32 and 48 were measured, bench/eigen.bench.ts). */
export const REFLECTOR_BLOCK = 32;

/** The two product kernels (eigenKernelsWat.mjs): c = a·b and c ← c − a·b, tiles of 4 × 4. */
export interface ProductKernels {
  multiply(a: number, as: number, b: number, bs: number, c: number, cs: number, rows: number, inner: number, cols: number): void;
  multiplySubtract(a: number, as: number, b: number, bs: number, c: number, cs: number, rows: number, inner: number, cols: number): void;
}

/** Byte offsets in the module's memory and the strides (in doubles) of one call. */
export interface BackTransformLayout {
  /** Z: `rows` rows (a multiple of 4, padding rows finite) of stride zs (a multiple of 4, padding columns finite). */
  z: number;
  zs: number;
  rows: number;
  /** Reflector k as row k (stride zs), zero before index k + 1 and in the padding; rows n − 2 … n + 3 zero. */
  refl: number;
  betas: number;
  /** Scratch: the block's reflectors as columns (zs × REFLECTOR_BLOCK), their Gram matrix and Tᵀ (REFLECTOR_BLOCK² each), W and W Tᵀ (rows × REFLECTOR_BLOCK each). */
  columns: number;
  gram: number;
  tt: number;
  w: number;
  wt: number;
}

/** Doubles of scratch the layout needs after `columns` for order n (rows, zs: n rounded up to 4). */
export function backTransformScratch(zs: number, rows: number): number {
  const nb = REFLECTOR_BLOCK;
  return zs * nb + 2 * nb * nb + 2 * rows * nb;
}

/** Z ← Z · H_{n−3} ⋯ H_0 (see the file comment); `heap` is a Float64Array view of the module's memory. */
export function blockedBackTransform(kernels: ProductKernels, heap: Float64Array, l: BackTransformLayout, n: number): void {
  const reflectors = n - 2;
  const { zs, rows } = l;
  const betas = l.betas / 8;
  for (let k0 = Math.floor((reflectors - 1) / REFLECTOR_BLOCK) * REFLECTOR_BLOCK; k0 >= 0; k0 -= REFLECTOR_BLOCK) {
    const count = Math.min(REFLECTOR_BLOCK, reflectors - k0);
    // Width of the block's operands (a multiple of 4; the extra columns are zero).
    const bw = (count + 3) & ~3;
    // v_{k0} … are zero before index k0 + 1: columns from c0 on.
    const c0 = (k0 + 1) & ~3;
    const m = zs - c0;
    const vTop = l.refl + 8 * (k0 * zs + c0);
    packColumns(heap, vTop / 8, zs, count, bw, m, l.columns / 8);
    // Gram matrix G = Vᵀ V (rows of the packed reflectors times the columns).
    kernels.multiply(vTop, zs, l.columns, bw, l.gram, bw, count, m, bw);
    triangularFactorTransposed(heap, l.gram / 8, l.tt / 8, betas + k0, count, bw);
    kernels.multiply(l.z + 8 * c0, zs, l.columns, bw, l.w, bw, rows, m, bw);
    kernels.multiply(l.w, bw, l.tt, bw, l.wt, bw, rows, count, bw);
    kernels.multiplySubtract(l.wt, bw, vTop, zs, l.z + 8 * c0, zs, rows, count, m);
  }
}

/** out[r·bw + q] = v[q·vs + r] (reflector q's entry r) for r < m, q < count; zero for count ≤ q < bw. */
function packColumns(heap: Float64Array, v: number, vs: number, count: number, bw: number, m: number, out: number): void {
  for (let q = 0; q < count; q++) {
    const from = v + q * vs;
    for (let r = 0, to = out + q; r < m; r++, to += bw) heap[to] = heap[from + r];
  }
  for (let q = count; q < bw; q++) for (let r = 0, to = out + q; r < m; r++, to += bw) heap[to] = 0;
}

/**
 * Tᵀ of the compact-WY factor (row-major, stride bw, zero outside the lower triangle of the
 * count × count corner): T_ii = β_i, T_{0:i, i} = −β_i T_{0:i, 0:i} (Vᵀ v_i)_{0:i} (LAPACK's dlarft,
 * forward, by columns), with Vᵀ v_i read from the Gram matrix. Column i of T is row i of Tᵀ.
 */
function triangularFactorTransposed(heap: Float64Array, gram: number, tt: number, betas: number, count: number, bw: number): void {
  heap.fill(0, tt, tt + bw * bw);
  for (let i = 0; i < count; i++) {
    const beta = heap[betas + i];
    const row = tt + i * bw;
    heap[row + i] = beta;
    if (beta === 0) continue;
    for (let j = 0; j < i; j++) {
      // Σ_{j ≤ p < i} T_jp G_pi, T_jp = tt[p·bw + j].
      let s = 0;
      for (let p = j; p < i; p++) s += heap[tt + p * bw + j] * heap[gram + p * bw + i];
      heap[row + j] = -beta * s;
    }
  }
}
