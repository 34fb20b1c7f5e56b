/**
 * Eigenpairs of a symmetric tridiagonal matrix T by divide and conquer (Cuppen, Numer. Math. 36
 * (1981) 177; Golub & Van Loan, Matrix Computations, 4th ed., §8.4.4): T is cut in two by a
 * rank-one term, T = diag(T₁, T₂) + ρ v vᵀ; each half is solved the same way (pieces of at most
 * DIVIDE_LEAF_ORDER by QR with the rotations accumulated); then the eigenproblem of
 * D + ρ z zᵀ, z = (last row of Q₁, first row of Q₂), is solved by the secular equation
 * (secularRoots.ts), and the pieces' vectors times that problem's vectors give T's.
 *
 * - **Deflation**: a component with ρ|z_j| ≤ 8ε max(|d|, ρ) is dropped (its vector and value
 *   stay as they are), and of two poles so close that a rotation zeroing one z component
 *   leaves an off-diagonal term below the same bound, that one is dropped too. What is left has
 *   poles at least that bound apart and no tiny weights.
 * - **Vectors** by Gu & Eisenstat's formula (SIAM J. Matrix Anal. Appl. 16 (1995) 172): the
 *   weights ẑ are recomputed from the computed roots, so that those roots are exact for
 *   D + ρ ẑ ẑᵀ, and the vectors ẑ_j / (d_j − λ_i) are orthogonal to working accuracy however
 *   close the roots come to the poles.
 * - **Products**: the new vectors (stored as rows) are U · G, G holding the pieces' vectors. Rows
 *   of G from the upper piece are zero in the lower columns and vice versa; sorted upper-only,
 *   mixed (joined by a deflating rotation), lower-only, each half of the columns needs only its
 *   share of G's rows (about half the work of the full product). The leaves' QR, the secular
 *   iteration and the products run in `MergeKernels`: JavaScript loops (here) or the
 *   WebAssembly kernels (simdEigen.ts), one call per leaf or merge and step.
 */
import { javascriptSecularSums, secularRoots } from './secularRoots';
import { tridiagonalValuesVectors } from './tridiagonalValues';

const EPS = 2.220446049250313e-16;

/** Pieces of at most this order are solved by QR with the rotations accumulated. */
export const DIVIDE_LEAF_ORDER = 24;

/**
 * Where the leaves' QR and the merges' O(n²) and O(n³) loops run, and their operands: those of
 * the secular equation (secularRoots.ts), of the leaves and of the matrix products, with v (new
 * vectors in the pieces' basis), g (the pieces' vectors) and w (the product), each at least
 * (n + 4) × productStride(n) doubles. `multiply` sets w[cOff + r·cs + c] = Σ_l v[aOff + r·as + l] ·
 * g[bOff + l·bs + c] for r < rows, c < cols; it may also write up to three more rows and columns
 * of w (and read as far in v, g).
 */
export interface MergeKernels {
  /** Row i (stride k) of gaps: d_j − λ_i of the merge's roots; z2: the squared weights z_j². */
  gaps: Float64Array;
  z2: Float64Array;
  /** The kept poles d_j and, after `weights`, the Gu–Eisenstat weights (n each). */
  dk: Float64Array;
  zhat: Float64Array;
  /** λ_i = dk[origin[i]] + tau[i], from `roots` (n each). */
  origin: Int32Array;
  tau: Float64Array;
  /** The k roots of 1/ρ + Σ z2_j/(dk_j − λ) = 0 into origin, tau and the rows of gaps (secularRoots); false if one does not settle. */
  roots(k: number, rho: number): boolean;
  /** zhat_j ← ẑ_j² = Π_i (λ_i − d_j) / (ρ Π_{i≠j} (d_i − d_j)), from the rows of gaps (javascriptMergeKernels.weights says how). */
  weights(k: number, rho: number): void;
  /** For i < k: x_j = zhat_j / gaps[i·k + j] (gaps may be left holding x), then v[i·ps + column[j]] = x_j / ‖x‖: the new vectors. */
  cauchyRows(k: number, ps: number): void;
  /** A leaf's diagonal and off-diagonal (DIVIDE_LEAF_ORDER each) and its vectors (DIVIDE_LEAF_ORDER² doubles). */
  leafD: Float64Array;
  leafE: Float64Array;
  leafQ: Float64Array;
  /**
   * Eigenpairs of the leaf (leafD, leafE; order m ≤ DIVIDE_LEAF_ORDER, leafE[m − 1] = 0) by QR with
   * the rotations accumulated (tridiagonalValuesVectors): values ascending into leafD, and row
   * fromRows[r] of leafQ (stride m) the vector of leafD[r]. False on no convergence.
   */
  leaf(m: number): boolean;
  v: Float64Array;
  g: Float64Array;
  w: Float64Array;
  /** Row indices for copyRows, and v's column of each kept component for cauchyRows (n each). */
  fromRows: Int32Array;
  toRows: Int32Array;
  column: Int32Array;
  /** For q < count: `cols` entries of row fromRows[q] of `from` (stride fs, from fromAt) to row toRows[q] of `to` (stride ts, from toAt). */
  copyRows(from: Float64Array, fromAt: number, fs: number, to: Float64Array, toAt: number, ts: number, count: number, cols: number): void;
  multiply(rows: number, inner: number, cols: number, aOff: number, as: number, bOff: number, bs: number, cOff: number, cs: number): void;
}

/** Scratch of one call (order n), kept between calls: a large block is solved at many fields. */
interface Scratch {
  n: number;
  /** Stride of the product operands in the current call (productStride of its order). */
  ps: number;
  count: DeflationCount | null;
  d: Float64Array;
  e: Float64Array;
  z: Float64Array;
  perm: Int32Array;
  types: Uint8Array;
  kept: Int32Array;
  dropped: Int32Array;
  zk: Float64Array;
  target: Int32Array;
  merged: Float64Array;
}

let cache: Scratch | null = null;

function scratch(n: number): Scratch {
  if (cache !== null && cache.n >= n) return cache;
  cache = {
    n,
    ps: 0,
    count: null,
    d: new Float64Array(n),
    e: new Float64Array(n),
    z: new Float64Array(n),
    perm: new Int32Array(n),
    types: new Uint8Array(n),
    kept: new Int32Array(n),
    dropped: new Int32Array(n),
    zk: new Float64Array(n),
    target: new Int32Array(n),
    merged: new Float64Array(n),
  };
  return cache;
}


/** Components kept (solved by the secular equation) and dropped by deflation, summed over merges. */
export interface DeflationCount {
  kept: number;
  dropped: number;
}

/** Stride of the product operands for order n (room for the padding the kernel may touch). */
export function productStride(n: number): number {
  return n + 8;
}

/**
 * Eigenpairs of the tridiagonal (d diagonal, e[i] = T[i+1][i]; neither modified): values
 * ascending into `values`, row k of `z` (stride zs ≥ n, rows 0..n−1 overwritten whole) the
 * eigenvector of values[k]. Returns false on non-finite input or if a piece's QR does not
 * converge. `count`, if given, gets the merges' kept and dropped components added (for tests).
 */
export function divideConquerTridiagonal(d: Float64Array, e: Float64Array, n: number, values: Float64Array, z: Float64Array, zs: number, products: MergeKernels, count?: DeflationCount): boolean {
  if (n <= 0) return true;
  for (let i = 0; i < n; i++) if (!Number.isFinite(d[i]) || (i < n - 1 && !Number.isFinite(e[i]))) return false;
  const s = scratch(n);
  s.ps = productStride(n);
  s.count = count ?? null;
  s.d.set(d.subarray(0, n));
  s.e.set(e.subarray(0, n - 1));
  z.fill(0, 0, n * zs);
  if (!solvePiece(s, z, zs, products, 0, n)) return false;
  values.set(s.d.subarray(0, n));
  return true;
}

/** Solves T[at .. at+m) (its diagonal already corrected for the cuts): values into s.d, vectors into z's rows. */
function solvePiece(s: Scratch, z: Float64Array, zs: number, products: MergeKernels, at: number, m: number): boolean {
  if (m <= DIVIDE_LEAF_ORDER) return solveLeaf(s, z, zs, products, at, m);
  const m1 = m >> 1;
  const beta = s.e[at + m1 - 1];
  // T = diag(T₁ − |β| e_last e_lastᵀ, T₂ − |β| e_first e_firstᵀ) + |β| v vᵀ, v = (e_last, sign(β) e_first).
  s.d[at + m1 - 1] -= Math.abs(beta);
  s.d[at + m1] -= Math.abs(beta);
  if (!solvePiece(s, z, zs, products, at, m1)) return false;
  if (!solvePiece(s, z, zs, products, at + m1, m - m1)) return false;
  return merge(s, z, zs, products, at, m1, m - m1, beta);
}

/** A small piece by QR with the rotations accumulated (MergeKernels.leaf), sorted ascending, into rows at.. of z. */
function solveLeaf(s: Scratch, z: Float64Array, zs: number, products: MergeKernels, at: number, m: number): boolean {
  const { leafD, leafE, toRows } = products;
  for (let i = 0; i < m; i++) {
    leafD[i] = s.d[at + i];
    leafE[i] = i < m - 1 ? s.e[at + i] : 0;
  }
  if (!products.leaf(m)) return false;
  for (let r = 0; r < m; r++) {
    s.d[at + r] = leafD[r];
    toRows[r] = at + r;
  }
  products.copyRows(products.leafQ, 0, m, z, at, zs, m, m);
  return true;
}

/**
 * Joins the solved pieces [at, at+m1) and [at+m1, at+m1+m2) (values ascending in s.d, vectors as
 * rows of z) into the solution of their whole, values ascending again.
 */
function merge(s: Scratch, z: Float64Array, zs: number, products: MergeKernels, at: number, m1: number, m2: number, beta: number): boolean {
  const m = m1 + m2;
  const { d, z: zv, perm, types, kept, dropped } = s;
  // z = Qᵀ v / √2 (unit length), ρ = 2|β|.
  const rho = 2 * Math.abs(beta);
  const sign = beta >= 0 ? Math.SQRT1_2 : -Math.SQRT1_2;
  for (let t = 0; t < m1; t++) {
    zv[t] = Math.SQRT1_2 * z[(at + t) * zs + at + m1 - 1];
    types[t] = 1;
  }
  for (let t = m1; t < m; t++) {
    zv[t] = sign * z[(at + t) * zs + at + m1];
    types[t] = 2;
  }
  // Both pieces' values are ascending: one merge gives the order.
  let dmax = 0;
  for (let p = 0, a = 0, b = m1; p < m; p++) {
    perm[p] = b >= m || (a < m1 && d[at + a] <= d[at + b]) ? a++ : b++;
    dmax = Math.max(dmax, Math.abs(d[at + p]));
  }
  const tol = 8 * EPS * Math.max(dmax, rho);
  let k = 0;
  let nDropped = 0;
  let pending = -1;
  for (let p = 0; p < m; p++) {
    const t = perm[p];
    if (rho * Math.abs(zv[t]) <= tol) {
      dropped[nDropped++] = t;
      continue;
    }
    if (pending >= 0) {
      const r = Math.sqrt(zv[pending] * zv[pending] + zv[t] * zv[t]);
      const c = zv[t] / r;
      const sn = zv[pending] / r;
      const dp = d[at + pending];
      const dt = d[at + t];
      if (Math.abs((dt - dp) * c * sn) <= tol) {
        // Rotate the pair so that `pending` has no z component left; it is dropped.
        rotateRows(z, (at + pending) * zs + at, (at + t) * zs + at, m, c, sn);
        d[at + pending] = c * c * dp + sn * sn * dt;
        d[at + t] = sn * sn * dp + c * c * dt;
        zv[pending] = 0;
        zv[t] = r;
        types[t] |= types[pending];
        types[pending] = types[t];
        dropped[nDropped++] = pending;
        pending = t;
        continue;
      }
      kept[k++] = pending;
    }
    pending = t;
  }
  if (pending >= 0) kept[k++] = pending;
  if (s.count !== null) {
    s.count.kept += k;
    s.count.dropped += nDropped;
  }
  const ps = s.ps;
  const b0 = (m1 + 3) & ~3;
  if (k > 0 && !newVectors(s, z, zs, products, at, m1, m2, k, rho, ps, b0)) return false;
  sortDropped(d, at, dropped, nDropped);
  // Pieces' vectors of the dropped components, after the kept ones in g.
  const { g, w, fromRows, toRows } = products;
  for (let q = 0; q < nDropped; q++) {
    fromRows[q] = at + dropped[q];
    toRows[q] = k + q;
  }
  copySplitRows(products, z, at, zs, g, 0, ps, nDropped, m1, m2, b0);
  // Both lists ascending: merge them into the rows of z (kept rows' targets in toRows, dropped ones' in target).
  const { merged, target } = s;
  const { dk, origin, tau } = products;
  for (let r = 0, i = 0, q = 0; r < m; r++) {
    const lambda = i < k ? dk[origin[i]] + tau[i] : Number.POSITIVE_INFINITY;
    if (q >= nDropped || lambda <= d[at + dropped[q]]) {
      merged[r] = lambda;
      fromRows[i] = i;
      toRows[i++] = at + r;
    } else {
      merged[r] = d[at + dropped[q]];
      target[q++] = at + r;
    }
  }
  joinSplitRows(products, w, 0, ps, z, at, zs, k, m1, m2, b0);
  for (let q = 0; q < nDropped; q++) {
    fromRows[q] = k + q;
    toRows[q] = target[q];
  }
  joinSplitRows(products, g, 0, ps, z, at, zs, nDropped, m1, m2, b0);
  d.set(merged.subarray(0, m), at);
  return true;
}

/**
 * The k kept components: roots of the secular equation, Gu–Eisenstat weights, the new vectors
 * in the pieces' basis (rows of v, columns in upper-only, mixed, lower-only order) and their
 * products with the pieces' vectors (rows of w, upper columns at 0, lower ones at b0).
 */
function newVectors(s: Scratch, z: Float64Array, zs: number, products: MergeKernels, at: number, m1: number, m2: number, k: number, rho: number, ps: number, b0: number): boolean {
  const { d, z: zv, types, kept, zk } = s;
  const { z2, dk, zhat, column, fromRows } = products;
  for (let j = 0; j < k; j++) {
    dk[j] = d[at + kept[j]];
    zk[j] = zv[kept[j]];
    z2[j] = zk[j] * zk[j];
  }
  if (!products.roots(k, rho)) return false;
  // ẑ_j² = Π_i (λ_i − d_j) / (ρ Π_{i≠j} (d_i − d_j)), then its root with z_j's sign.
  products.weights(k, rho);
  for (let j = 0; j < k; j++) zhat[j] = (zk[j] >= 0 ? 1 : -1) * Math.sqrt(zhat[j]);
  let k1 = 0;
  let k2 = 0;
  for (let j = 0; j < k; j++) {
    if (types[kept[j]] === 1) k1++;
    else if (types[kept[j]] === 3) k2++;
  }
  // Columns of v: upper-only components first, then mixed, then lower-only.
  let upperNext = 0;
  let mixedNext = k1;
  let lowerNext = k1 + k2;
  for (let j = 0; j < k; j++) {
    const type = types[kept[j]];
    column[j] = type === 1 ? upperNext++ : type === 3 ? mixedNext++ : lowerNext++;
  }
  const { g, w } = products;
  products.cauchyRows(k, ps);
  // The pieces' vectors of the kept components into g, row column[j] for component j.
  for (let j = 0; j < k; j++) {
    fromRows[j] = at + kept[j];
    products.toRows[j] = column[j];
  }
  copySplitRows(products, z, at, zs, g, 0, ps, k, m1, m2, b0);
  const upper = k1 + k2;
  const lower = k - k1;
  if (upper > 0) products.multiply(k, upper, m1, 0, ps, 0, ps, 0, ps);
  else for (let i = 0; i < k; i++) w.fill(0, i * ps, i * ps + m1);
  if (lower > 0) products.multiply(k, lower, m2, k1, ps, k1 * ps + b0, ps, b0, ps);
  else for (let i = 0; i < k; i++) w.fill(0, i * ps + b0, i * ps + b0 + m2);
  return true;
}

/** Rows p, q (m entries from the given offsets) ← (c p − s q, s p + c q). */
function rotateRows(z: Float64Array, p: number, q: number, m: number, c: number, s: number): void {
  for (let i = 0; i < m; i++) {
    const x = z[p + i];
    const y = z[q + i];
    z[p + i] = c * x - s * y;
    z[q + i] = s * x + c * y;
  }
}

/**
 * Rows fromRows[q] of the piece (m1 upper, m2 lower entries from column `at` of z) to rows toRows[q]
 * of g or w, the lower part moved to column b0.
 */
function copySplitRows(p: MergeKernels, z: Float64Array, at: number, zs: number, g: Float64Array, gAt: number, ps: number, count: number, m1: number, m2: number, b0: number): void {
  p.copyRows(z, at, zs, g, gAt, ps, count, m1);
  p.copyRows(z, at + m1, zs, g, gAt + b0, ps, count, m2);
}

/** The inverse of copySplitRows. */
function joinSplitRows(p: MergeKernels, g: Float64Array, gAt: number, ps: number, z: Float64Array, at: number, zs: number, count: number, m1: number, m2: number, b0: number): void {
  p.copyRows(g, gAt, ps, z, at, zs, count, m1);
  p.copyRows(g, gAt + b0, ps, z, at + m1, zs, count, m2);
}

/** copyRows in plain JavaScript (MergeKernels), for either kernel set's arrays. */
export function copyRowsByLoops(fromRows: Int32Array, toRows: Int32Array, from: Float64Array, fromAt: number, fs: number, to: Float64Array, toAt: number, ts: number, count: number, cols: number): void {
  for (let q = 0; q < count; q++) {
    const src = fromAt + fromRows[q] * fs;
    const dst = toAt + toRows[q] * ts;
    for (let i = 0; i < cols; i++) to[dst + i] = from[src + i];
  }
}

/** Insertion sort of the dropped components by value (nearly sorted already). */
function sortDropped(d: Float64Array, at: number, dropped: Int32Array, count: number): void {
  for (let q = 1; q < count; q++) {
    const t = dropped[q];
    const x = d[at + t];
    let p = q;
    while (p > 0 && d[at + dropped[p - 1]] > x) {
      dropped[p] = dropped[p - 1];
      p--;
    }
    dropped[p] = t;
  }
}

/** The leaves' QR and the merges' loops in plain JavaScript, with operands of order up to n. */
export function javascriptMergeKernels(n: number): MergeKernels {
  const size = (n + 4) * productStride(n);
  const L = DIVIDE_LEAF_ORDER;
  const v = new Float64Array(size);
  const g = new Float64Array(size);
  const w = new Float64Array(size);
  const dk = new Float64Array(n);
  const sums = javascriptSecularSums(n, dk);
  const { gaps, z2 } = sums;
  const zhat = new Float64Array(n);
  const origin = new Int32Array(n);
  const tau = new Float64Array(n);
  const leafD = new Float64Array(L);
  const leafE = new Float64Array(L);
  const leafQ = new Float64Array(L * L);
  const fromRows = new Int32Array(n);
  const toRows = new Int32Array(n);
  const column = new Int32Array(n);
  return {
    gaps,
    z2,
    dk,
    zhat,
    origin,
    tau,
    leafD,
    leafE,
    leafQ,
    fromRows,
    toRows,
    column,
    copyRows(from, fromAt, fs, to, toAt, ts, count, cols) {
      copyRowsByLoops(fromRows, toRows, from, fromAt, fs, to, toAt, ts, count, cols);
    },
    roots(k, rho) {
      return secularRoots(dk, k, rho, origin, tau, sums);
    },
    weights(k, rho) {
      // Ratios near one to stay in range: root i < k − 1 pairs with pole i + 1 for j ≤ i and
      // with pole i for j > i; the last root with ρ.
      for (let j = 0; j < k; j++) zhat[j] = -gaps[(k - 1) * k + j] / rho;
      for (let i = 0; i < k - 1; i++) {
        const row = i * k;
        for (let j = 0; j <= i; j++) zhat[j] *= gaps[row + j] / (dk[j] - dk[i + 1]);
        for (let j = i + 1; j < k; j++) zhat[j] *= gaps[row + j] / (dk[j] - dk[i]);
      }
    },
    cauchyRows(k, ps) {
      for (let i = 0; i < k; i++) {
        const row = i * k;
        let sum = 0;
        for (let j = 0; j < k; j++) {
          const x = zhat[j] / gaps[row + j];
          gaps[row + j] = x;
          sum += x * x;
        }
        const scale = 1 / Math.sqrt(sum);
        for (let j = 0; j < k; j++) v[i * ps + column[j]] = scale * gaps[row + j];
      }
    },
    leaf(m) {
      const q = leafQ.subarray(0, m * m);
      q.fill(0);
      for (let i = 0; i < m; i++) q[i * m + i] = 1;
      if (!tridiagonalValuesVectors(leafD, leafE, m, q)) return false;
      for (let i = 0; i < m; i++) {
        let j = i;
        while (j > 0 && leafD[fromRows[j - 1]] > leafD[i]) {
          fromRows[j] = fromRows[j - 1];
          j--;
        }
        fromRows[j] = i;
      }
      for (let r = 0; r < m; r++) leafE[r] = leafD[fromRows[r]];
      leafD.set(leafE.subarray(0, m));
      return true;
    },
    v,
    g,
    w,
    multiply(rows, inner, cols, aOff, as, bOff, bs, cOff, cs) {
      for (let r = 0; r < rows; r++) {
        const out = cOff + r * cs;
        w.fill(0, out, out + cols);
        for (let l = 0; l < inner; l++) {
          const x = v[aOff + r * as + l];
          const from = bOff + l * bs;
          for (let c = 0; c < cols; c++) w[out + c] += x * g[from + c];
        }
      }
    },
  };
}
