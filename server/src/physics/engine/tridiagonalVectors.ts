/**
 * Eigenvectors of a symmetric tridiagonal matrix (diagonal d, off-diagonal e) at eigenvalues
 * already known to full accuracy, by inverse iteration with reorthogonalisation inside clusters:
 * the scheme of LAPACK's dstein (after Wilkinson & Reinsch, Handbook for Automatic Computation
 * II, 1971, procedure tinvit). Each vector costs O(n) per iteration plus O(n·k) against the k
 * earlier vectors of its cluster, instead of the O(n²) per QR sweep of accumulated rotations.
 *
 * - T − λI is factorised with partial pivoting (three bands of U), a zero pivot replaced by
 *   ε‖T‖, so the solve cannot fail;
 * - eigenvalues closer than 10 ε‖T‖ are pulled apart by that much, so their solves differ;
 * - neighbours closer than CLUSTER·‖T‖ form a cluster whose vectors are orthogonalised against
 *   each other (modified Gram–Schmidt) before every solve and once more at the end;
 * - a vector has converged when its growth shows a residual below RESIDUAL·ε‖T‖√n (plus
 *   twice the pull); EXTRA more iterations follow, as in dstein;
 * - T splits where an off-diagonal element is below ε of its neighbours; each block is solved
 *   on its own (exactly degenerate eigenvalues of different blocks need no orthogonalising);
 * - runs of LANES vectors outside any cluster are iterated together, their solves interleaved
 *   (solveLanes): each back-substitution is a chain of dependent operations, and four chains
 *   side by side keep the processor busy. Each vector sees the same operations in the same
 *   order as alone, so the results are bit-for-bit those of one vector at a time.
 */

const EPS = 2.220446049250313e-16;
/** dstein's ORTOL: neighbours closer than 1e-3 ‖T‖ are orthogonalised explicitly. */
const CLUSTER = 1e-3;
const RESIDUAL = 10;
const EXTRA = 2;
const MAX_ITERATIONS = 8;

/** Scratch for one call, of the order n. */
export interface TridiagonalScratch {
  dd: Float64Array;
  du: Float64Array;
  du2: Float64Array;
  dl: Float64Array;
  swap: Uint8Array;
  x: Float64Array;
}

/** Vectors iterated together outside clusters (see solveLanes). */
const LANES = 4;

export function makeTridiagonalScratch(n: number): TridiagonalScratch {
  return {
    dd: new Float64Array(n),
    du: new Float64Array(n),
    du2: new Float64Array(n),
    dl: new Float64Array(n),
    swap: new Uint8Array(n),
    x: new Float64Array(n),
  };
}

/** LU of T − λI with partial pivoting (LAPACK dgttrf's layout); zero pivots become `tiny`. */
function factorise(d: Float64Array, e: Float64Array, n: number, lambda: number, tiny: number, s: TridiagonalScratch): void {
  const { dd, du, du2, dl, swap } = s;
  for (let i = 0; i < n; i++) dd[i] = d[i] - lambda;
  for (let i = 0; i < n - 1; i++) {
    du[i] = e[i];
    dl[i] = e[i];
    du2[i] = 0;
  }
  for (let i = 0; i < n - 1; i++) {
    if (Math.abs(dd[i]) >= Math.abs(dl[i])) {
      swap[i] = 0;
      if (dd[i] === 0) dd[i] = tiny;
      const f = dl[i] / dd[i];
      dl[i] = f;
      dd[i + 1] -= f * du[i];
    } else {
      swap[i] = 1;
      const f = dd[i] / dl[i];
      dd[i] = dl[i];
      dl[i] = f;
      const t = du[i];
      du[i] = dd[i + 1];
      dd[i + 1] = t - f * dd[i + 1];
      if (i < n - 2) {
        du2[i] = du[i + 1];
        du[i + 1] = -f * du[i + 1];
      }
    }
  }
  if (dd[n - 1] === 0) dd[n - 1] = tiny;
}

/** b ← (T − λI)⁻¹ b with the factors in s. */
function solve(n: number, s: TridiagonalScratch, b: Float64Array, at: number): void {
  const { dd, du, du2, dl, swap } = s;
  for (let i = 0; i < n - 1; i++) {
    if (swap[i] === 0) {
      b[at + i + 1] -= dl[i] * b[at + i];
    } else {
      const t = b[at + i];
      b[at + i] = b[at + i + 1];
      b[at + i + 1] = t - dl[i] * b[at + i];
    }
  }
  b[at + n - 1] /= dd[n - 1];
  if (n > 1) b[at + n - 2] = (b[at + n - 2] - du[n - 2] * b[at + n - 1]) / dd[n - 2];
  for (let i = n - 3; i >= 0; i--) b[at + i] = (b[at + i] - du[i] * b[at + i + 1] - du2[i] * b[at + i + 2]) / dd[i];
}

/**
 * b_q ← (T − λ_q I)⁻¹ b_q for four factorisations at once: the operations of `solve` for each
 * lane, interleaved so the four dependency chains overlap.
 */
function solveLanes(n: number, s0: TridiagonalScratch, s1: TridiagonalScratch, s2: TridiagonalScratch, s3: TridiagonalScratch, b0: Float64Array, b1: Float64Array, b2: Float64Array, b3: Float64Array): void {
  const w0 = s0.swap, w1 = s1.swap, w2 = s2.swap, w3 = s3.swap;
  const l0 = s0.dl, l1 = s1.dl, l2 = s2.dl, l3 = s3.dl;
  for (let i = 0; i < n - 1; i++) {
    if (w0[i] === 0) b0[i + 1] -= l0[i] * b0[i];
    else { const t = b0[i]; b0[i] = b0[i + 1]; b0[i + 1] = t - l0[i] * b0[i]; }
    if (w1[i] === 0) b1[i + 1] -= l1[i] * b1[i];
    else { const t = b1[i]; b1[i] = b1[i + 1]; b1[i + 1] = t - l1[i] * b1[i]; }
    if (w2[i] === 0) b2[i + 1] -= l2[i] * b2[i];
    else { const t = b2[i]; b2[i] = b2[i + 1]; b2[i + 1] = t - l2[i] * b2[i]; }
    if (w3[i] === 0) b3[i + 1] -= l3[i] * b3[i];
    else { const t = b3[i]; b3[i] = b3[i + 1]; b3[i + 1] = t - l3[i] * b3[i]; }
  }
  const d0 = s0.dd, d1 = s1.dd, d2 = s2.dd, d3 = s3.dd;
  const u0 = s0.du, u1 = s1.du, u2 = s2.du, u3 = s3.du;
  const v0 = s0.du2, v1 = s1.du2, v2 = s2.du2, v3 = s3.du2;
  const m = n - 1;
  b0[m] /= d0[m];
  b1[m] /= d1[m];
  b2[m] /= d2[m];
  b3[m] /= d3[m];
  if (n > 1) {
    b0[m - 1] = (b0[m - 1] - u0[m - 1] * b0[m]) / d0[m - 1];
    b1[m - 1] = (b1[m - 1] - u1[m - 1] * b1[m]) / d1[m - 1];
    b2[m - 1] = (b2[m - 1] - u2[m - 1] * b2[m]) / d2[m - 1];
    b3[m - 1] = (b3[m - 1] - u3[m - 1] * b3[m]) / d3[m - 1];
  }
  for (let i = n - 3; i >= 0; i--) {
    b0[i] = (b0[i] - u0[i] * b0[i + 1] - v0[i] * b0[i + 2]) / d0[i];
    b1[i] = (b1[i] - u1[i] * b1[i + 1] - v1[i] * b1[i + 2]) / d1[i];
    b2[i] = (b2[i] - u2[i] * b2[i + 1] - v2[i] * b2[i + 2]) / d2[i];
    b3[i] = (b3[i] - u3[i] * b3[i + 1] - v3[i] * b3[i + 2]) / d3[i];
  }
}

function normalise(z: Float64Array, at: number, n: number): number {
  let s = 0;
  for (let i = 0; i < n; i++) s += z[at + i] * z[at + i];
  const norm = Math.sqrt(s);
  const inv = 1 / norm;
  for (let i = 0; i < n; i++) z[at + i] *= inv;
  return norm;
}

/** normalise() of four vectors at once (their sums interleaved); the norms go to `norms`. */
function normaliseLanes(n: number, x0: Float64Array, x1: Float64Array, x2: Float64Array, x3: Float64Array, norms: Float64Array): void {
  let s0 = 0;
  let s1 = 0;
  let s2 = 0;
  let s3 = 0;
  for (let i = 0; i < n; i++) {
    s0 += x0[i] * x0[i];
    s1 += x1[i] * x1[i];
    s2 += x2[i] * x2[i];
    s3 += x3[i] * x3[i];
  }
  norms[0] = Math.sqrt(s0);
  norms[1] = Math.sqrt(s1);
  norms[2] = Math.sqrt(s2);
  norms[3] = Math.sqrt(s3);
  const i0 = 1 / norms[0];
  const i1 = 1 / norms[1];
  const i2 = 1 / norms[2];
  const i3 = 1 / norms[3];
  for (let i = 0; i < n; i++) {
    x0[i] *= i0;
    x1[i] *= i1;
    x2[i] *= i2;
    x3[i] *= i3;
  }
}

/** x minus its projections on the block's vectors from … k − 1 (modified Gram–Schmidt). */
function orthogonalise(x: Float64Array, z: Float64Array, rows: Int32Array, stride: number, offset: number, n: number, from: number, k: number): void {
  for (let q = from; q < k; q++) {
    const qa = rows[q] * stride + offset;
    let dot = 0;
    for (let i = 0; i < n; i++) dot += z[qa + i] * x[i];
    for (let i = 0; i < n; i++) x[i] -= dot * z[qa + i];
  }
}

/**
 * Eigenvectors of one unreduced block of T (d, e of order n) for its ascending eigenvalues
 * `values`: the k-th vector goes to z[rows[k]·stride + offset …] (zero elsewhere in that row).
 * `lanes` holds LANES + 1 scratch sets (the last absorbs the solves of lanes already done);
 * `together` lets runs of isolated vectors be iterated side by side.
 * Returns false if a vector did not converge.
 */
function blockEigenvectors(
  d: Float64Array,
  e: Float64Array,
  n: number,
  values: Float64Array,
  z: Float64Array,
  rows: Int32Array,
  stride: number,
  offset: number,
  lanes: TridiagonalScratch[],
  together: boolean,
): boolean {
  let norm = 0;
  for (let i = 0; i < n; i++) norm = Math.max(norm, Math.abs(d[i]) + (i > 0 ? Math.abs(e[i - 1]) : 0) + (i < n - 1 ? Math.abs(e[i]) : 0));
  if (norm === 0) norm = 1;
  const tiny = EPS * norm;
  const pull = 10 * EPS * norm;
  const cluster = CLUSTER * norm;
  const floor = RESIDUAL * EPS * norm * Math.sqrt(n);
  const s = lanes[0];
  const x = s.x;
  let clusterStart = 0;
  let shifted = Number.NEGATIVE_INFINITY;
  // A fixed pseudo-random start (an LCG), so results depend on nothing but the input.
  let seed = 12345;
  const converged = [0, 0, 0, 0];
  const extra = [0, 0, 0, 0];
  const norms = lanes[LANES].dd; // the spare set never factorises: its dd holds the four norms
  for (let k = 0; k < n; ) {
    // LANES vectors in a row, each farther than `cluster` from the one before: no
    // orthogonalisation links them, so they can be iterated together.
    let run = 0;
    while (together && run < LANES && k + run < n && (k + run === 0 || values[k + run] - values[k + run - 1] > cluster)) run++;
    if (run === LANES) {
      for (let q = 0; q < LANES; q++) {
        const lambda = Math.max(values[k + q], shifted + pull);
        shifted = lambda;
        converged[q] = 1 / (floor + 2 * (lambda - values[k + q]));
        factorise(d, e, n, lambda, tiny, lanes[q]);
        const xq = lanes[q].x;
        for (let i = 0; i < n; i++) {
          seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0;
          xq[i] = seed / 4294967296 - 0.5;
        }
        normalise(xq, 0, n);
        extra[q] = -1;
      }
      clusterStart = k + LANES - 1;
      for (let it = 0; it < MAX_ITERATIONS; it++) {
        let active = 0;
        for (let q = 0; q < LANES; q++) if (extra[q] < EXTRA) active++;
        if (active === 0) break;
        const spare = lanes[LANES].x;
        const x0 = extra[0] < EXTRA ? lanes[0].x : spare;
        const x1 = extra[1] < EXTRA ? lanes[1].x : spare;
        const x2 = extra[2] < EXTRA ? lanes[2].x : spare;
        const x3 = extra[3] < EXTRA ? lanes[3].x : spare;
        solveLanes(n, lanes[0], lanes[1], lanes[2], lanes[3], x0, x1, x2, x3);
        normaliseLanes(n, x0, x1, x2, x3, norms);
        for (let q = 0; q < LANES; q++) {
          if (extra[q] >= EXTRA) continue;
          const growth = norms[q];
          if (!(growth < Number.POSITIVE_INFINITY)) return false;
          if (extra[q] >= 0 || growth >= converged[q]) extra[q]++;
        }
      }
      normaliseLanes(n, lanes[0].x, lanes[1].x, lanes[2].x, lanes[3].x, norms);
      for (let q = 0; q < LANES; q++) {
        if (extra[q] < 0) return false;
        const xq = lanes[q].x;
        const at = rows[k + q] * stride + offset;
        for (let i = 0; i < n; i++) z[at + i] = xq[i];
      }
      k += LANES;
      continue;
    }
    if (k > 0 && values[k] - values[k - 1] > cluster) clusterStart = k;
    const lambda = Math.max(values[k], shifted + pull);
    shifted = lambda;
    // (T − λ'I)⁻¹ grows at most 1 / |λ' − λ|: a pulled-apart value converges that far.
    const limit = 1 / (floor + 2 * (lambda - values[k]));
    factorise(d, e, n, lambda, tiny, s);
    for (let i = 0; i < n; i++) {
      seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0;
      x[i] = seed / 4294967296 - 0.5;
    }
    normalise(x, 0, n);
    let more = -1;
    for (let it = 0; it < MAX_ITERATIONS && more < EXTRA; it++) {
      orthogonalise(x, z, rows, stride, offset, n, clusterStart, k);
      solve(n, s, x, 0);
      const growth = normalise(x, 0, n);
      if (!(growth < Number.POSITIVE_INFINITY)) return false;
      if (more >= 0 || growth >= limit) more++;
    }
    if (more < 0) return false;
    orthogonalise(x, z, rows, stride, offset, n, clusterStart, k);
    normalise(x, 0, n);
    const at = rows[k] * stride + offset;
    for (let i = 0; i < n; i++) z[at + i] = x[i];
    k++;
  }
  return true;
}

/**
 * Eigenvectors of T (order n): T is split where an off-diagonal element is below ε of its
 * neighbours (treated as zero there, as the QR deflation does), each block gets its own eigenvalues
 * (implicit QR) and vectors, and row k of `z` (n × n, row-major) receives the vector of the
 * k-th smallest eigenvalue, which goes to values[k]. Returns false on no convergence.
 * `together = false` iterates one vector at a time (the same results; for the tests).
 */
export function tridiagonalEigenpairs(d: Float64Array, e: Float64Array, n: number, values: Float64Array, z: Float64Array, qr: QrValues, together = true): boolean {
  const lanes = laneScratch(n);
  z.fill(0, 0, n * n);
  // Eigenvalues of every block, with the block each came from, then one global order.
  const owner = new Int32Array(n);
  const blockValues = new Float64Array(n);
  const work = new Float64Array(n);
  let start = 0;
  for (let i = 0; i < n; i++) {
    if (i < n - 1 && !(Math.abs(e[i]) <= EPS * (Math.abs(d[i]) + Math.abs(d[i + 1])))) continue;
    blockValues.set(d.subarray(start, i + 1), start);
    work.set(e.subarray(start, i), start);
    if (!qr(blockValues.subarray(start, i + 1), work.subarray(start, i + 1), i + 1 - start)) return false;
    blockValues.subarray(start, i + 1).sort();
    owner.fill(start, start, i + 1);
    start = i + 1;
  }
  const order = Array.from({ length: n }, (_, k) => k).sort((a, b) => blockValues[a] - blockValues[b] || a - b);
  const rowOf = new Int32Array(n);
  order.forEach((k, r) => {
    rowOf[k] = r;
    values[r] = blockValues[k];
  });
  for (let b = 0; b < n; ) {
    let end = b;
    while (end + 1 < n && owner[end + 1] === b) end++;
    const m = end + 1 - b;
    const ok = blockEigenvectors(d.subarray(b, end + 1), e.subarray(b, end + 1), m, blockValues.subarray(b, end + 1), z, rowOf.subarray(b, end + 1), n, b, lanes, together);
    if (!ok) return false;
    b = end + 1;
  }
  return true;
}

/** LANES + 1 scratch sets of at least order n, kept between calls (a large block is solved at many fields in a row). */
let laneCache: TridiagonalScratch[] = [];

function laneScratch(n: number): TridiagonalScratch[] {
  if (laneCache.length === 0 || laneCache[0].dd.length < n) laneCache = Array.from({ length: LANES + 1 }, () => makeTridiagonalScratch(n));
  return laneCache;
}

export type QrValues = (d: Float64Array, e: Float64Array, n: number) => boolean;
