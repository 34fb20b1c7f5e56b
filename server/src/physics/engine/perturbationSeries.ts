/**
 * Rayleigh–Schrödinger series of one block's energies around an anchor field,
 * used by sweeps to carry an exact solve at one field to the fields near it.
 *
 * In the anchor's eigenbasis U, H(B_a + δ) = D + δ Z' with D the anchor's
 * energies (all different inside a block for generic constants) and Z' = Uᵀ Z U.
 * With t = δ / s, each energy is a power series E_k(t) = Σ_j c_kj t^j whose
 * coefficients follow from the standard recursion (intermediate normalisation):
 *   c_kj = (Z_s ψ_{j−1})_k,
 *   (ψ_j)_l = [Σ_{i=1}^{j−1} c_ki (ψ_{j−i})_l − (Z_s ψ_{j−1})_l] / (D_l − D_k),  l ≠ k,
 * with Z_s = s Z', ψ_0 = e_k, (ψ_j)_k = 0. The scale s = (smallest gap) / max|Z'_kl|
 * keeps the coefficients of the order of the gaps, so nothing overflows.
 * Moments and curvatures are the series' first and second derivatives.
 */
import { PLANCK_H } from '../constants';

/** Highest power kept. The reach grows like (1e-16)^(1/order) of the series' radius; 16 gives about a tenth. */
export const SERIES_ORDER = 16;
/**
 * Truncation allowed, relative to the block's energy, moment and curvature scales: at
 * or below the round-off of an exact solve (about 1e-16 of the energies, 1e-15 of the
 * moments and 1e-13 of the curvatures, which divide by gaps).
 */
const TRUNCATION_E = 1e-16;
const TRUNCATION_M = 1e-15;
const TRUNCATION_C = 1e-13;
/** Anchors whose smallest gap is below this fraction of the energy scale are not expanded. */
const MIN_RELATIVE_GAP = 1e-9;

export interface SeriesWorkspace {
  capacity: number;
  /** Z_s = s Uᵀ Z U, row-major. */
  zs: Float64Array;
  /** c_kj at k (SERIES_ORDER + 1) + j. */
  coef: Float64Array;
  /** j c_kj (the slope's coefficients) at k SERIES_ORDER + j − 1, 1 ≤ j ≤ SERIES_ORDER. */
  slope: Float64Array;
  /** j (j − 1) c_kj (the curvature's) at k SERIES_ORDER + j − 1, 2 ≤ j ≤ SERIES_ORDER; filled when curvatures are asked for. */
  bend: Float64Array;
  /** Ψ_j (n × n, column k for energy k) at j n², j ≤ STATE_ORDER. */
  psi: Float64Array;
  /** Z_s Ψ_j at j n², j ≤ STATE_ORDER. */
  zpsi: Float64Array;
  /** 1 / (D_l − D_k), zero on the diagonal. */
  invGap: Float64Array;
  /** c_kj at j n + k while the series is built. */
  orders: Float64Array;
  /** <Ψ_a|Ψ_b>_k at (a (STATE_ORDER + 1) + b) n + k, 1 ≤ a ≤ b ≤ STATE_ORDER. */
  overlap: Float64Array;
  /** Tesla per unit of t; 0 when the anchor cannot be expanded. */
  scaleT: number;
  /** Largest |t| where the truncation is below the TRUNCATION_* tolerances. */
  reach: number;
  /** max over the states of |c_kj| at j (orderFor). */
  top: Float64Array;
  /** The energy's and the slope dE/dt's truncation tolerances, in the series' units. */
  tolE: number;
  tolM: number;
}

/** Highest order of the states Ψ_j: Wigner's 2n + 1 rule gets energies to SERIES_ORDER from these. */
const STATE_ORDER = Math.floor(SERIES_ORDER / 2);

export function makeSeriesWorkspace(n: number): SeriesWorkspace {
  const k1 = SERIES_ORDER + 1;
  const s1 = STATE_ORDER + 1;
  return {
    capacity: n,
    zs: new Float64Array(n * n),
    coef: new Float64Array(n * k1),
    slope: new Float64Array(n * SERIES_ORDER),
    bend: new Float64Array(n * SERIES_ORDER),
    psi: new Float64Array(s1 * n * n),
    zpsi: new Float64Array(s1 * n * n),
    invGap: new Float64Array(n * n),
    orders: new Float64Array(k1 * n),
    overlap: new Float64Array(s1 * s1 * n),
    scaleT: 0,
    reach: 0,
    top: new Float64Array(k1),
    tolE: 0,
    tolM: 0,
  };
}

/** Z' = Uᵀ diag(z) U into sw.zs; returns max |Z'_kl| over k ≠ l. */
function rotateZeeman(vectors: Float64Array, z: Float64Array, n: number, zs: Float64Array): number {
  let off = 0;
  for (let k = 0; k < n; k++) {
    for (let l = k; l < n; l++) {
      let sum = 0;
      for (let i = 0; i < n; i++) sum += vectors[i * n + k] * z[i] * vectors[i * n + l];
      zs[k * n + l] = sum;
      zs[l * n + k] = sum;
      if (l !== k) off = Math.max(off, Math.abs(sum));
    }
  }
  return off;
}

/**
 * Σ_l x[xAt + l·xStep] y[yAt + l·yStep] for l < n. Two running sums: on these short dot
 * products one sum's chain of dependent additions, not the arithmetic, was the cost.
 */
function dot(x: Float64Array, xAt: number, xStep: number, y: Float64Array, yAt: number, yStep: number, n: number): number {
  let even = 0;
  let odd = 0;
  let l = 1;
  for (; l < n; l += 2, xAt += 2 * xStep, yAt += 2 * yStep) {
    even += x[xAt] * y[yAt];
    odd += x[xAt + xStep] * y[yAt + yStep];
  }
  return l === n ? even + odd + x[xAt] * y[yAt] : even + odd;
}

/**
 * The series coefficients of every energy at once: Ψ_j is n × n with column k the
 * j-th order state of energy k. The states go to order m = SERIES_ORDER / 2 only; the
 * energies beyond it follow from Wigner's 2n + 1 rule in intermediate normalisation
 * (T. Helgaker, P. Jørgensen, J. Olsen, Molecular Electronic-Structure Theory, Wiley
 * 2000, §14.2; checked against the plain recursion in tests):
 *   c_{2m+1} = <Ψ_m|Z_s|Ψ_m> − Σ_{a,b=1..m} c_{2m+1−a−b} <Ψ_a|Ψ_b>,
 *   c_{2m}   = <Ψ_{m−1}|Z_s|Ψ_m> − Σ_{a=1..m, b=1..m−1} c_{2m−a−b} <Ψ_a|Ψ_b>,
 * which halves the n³ products of the plain recursion.
 * Coefficients go to sw.coef[k (SERIES_ORDER + 1) + j].
 */
function energySeries(values: Float64Array, n: number, sw: SeriesWorkspace): void {
  const { zs, psi, zpsi, invGap, orders, coef, overlap } = sw;
  const nn = n * n;
  const s1 = STATE_ORDER + 1;
  for (let l = 0; l < n; l++) for (let k = 0; k < n; k++) invGap[l * n + k] = l === k ? 0 : 1 / (values[l] - values[k]);
  for (let i = 0; i < nn; i++) psi[i] = 0;
  for (let k = 0; k < n; k++) psi[k * n + k] = 1;
  for (let k = 0; k < n; k++) orders[k] = values[k];
  // Plain recursion up to Ψ_m (and Z_s Ψ_m when the last order is odd): c_j = (Z_s Ψ_{j−1})_kk.
  // Each element is summed in locals, not in memory: on blocks of order 3–6 the loads and
  // stores of running sums were the cost.
  const lastProduct = SERIES_ORDER % 2 === 1 ? STATE_ORDER : STATE_ORDER - 1;
  for (let j = 0; j <= lastProduct; j++) {
    // zpsi_j = Z_s Ψ_j (Ψ_0 = 1: Z_s itself)
    const from = j * nn;
    if (j === 0) {
      for (let i = 0; i < nn; i++) zpsi[i] = zs[i];
    } else {
      for (let l = 0; l < n; l++) {
        const zRow = l * n;
        for (let k = 0; k < n; k++) zpsi[from + zRow + k] = dot(zs, zRow, 1, psi, from + k, n, n);
      }
    }
    const next = j + 1;
    if (next > STATE_ORDER) break;
    for (let k = 0; k < n; k++) orders[next * n + k] = zpsi[from + k * n + k];
    // Ψ_{j+1} = (Σ_{i=1}^{j} c_i Ψ_{j+1−i} − Z_s Ψ_j) / (D_l − D_k), zero on the diagonal
    const at = next * nn;
    for (let l = 0, lk = 0; l < n; l++) {
      for (let k = 0; k < n; k++, lk++) {
        psi[at + lk] = (dot(orders, n + k, n, psi, from + lk, -nn, j) - zpsi[from + lk]) * invGap[lk];
      }
    }
  }
  // The energies of orders m + 1 … SERIES_ORDER, one column (state) k at a time: everything
  // below reads only column k, so each sum runs in a local.
  for (let k = 0; k < n; k++) {
    // <Ψ_a|Ψ_b>_k for a ≤ b (symmetric), as far as the sums below reach (a + b < SERIES_ORDER).
    for (let a = 1; a <= STATE_ORDER; a++) {
      for (let b = a; b <= STATE_ORDER && a + b < SERIES_ORDER; b++) overlap[(a * s1 + b) * n + k] = dot(psi, a * nn + k, n, psi, b * nn + k, n, n);
    }
    for (let j = STATE_ORDER + 1; j <= SERIES_ORDER; j++) {
      const m = j >> 1;
      const odd = j % 2 === 1;
      // <Ψ_m|Z_s|Ψ_m> (odd j) or <Ψ_{m−1}|Z_s|Ψ_m> (even j), with Z_s Ψ taken from the lower one.
      const head = dot(psi, m * nn + k, n, zpsi, (odd ? m : m - 1) * nn + k, n, n);
      // The double sum over the square a, b ≤ q (q = m for odd j, m − 1 for even j) by symmetry:
      // the diagonal once, each pair a < b twice (in separate sums, so the chains are short);
      // even j adds the row a = m, b < m.
      const q = odd ? m : m - 1;
      let diagonal = 0;
      let pairs = 0;
      for (let a = 1; a <= q; a++) {
        diagonal += orders[(j - 2 * a) * n + k] * overlap[(a * s1 + a) * n + k];
        pairs += dot(orders, (j - 2 * a - 1) * n + k, -n, overlap, (a * s1 + a + 1) * n + k, n, q - a);
      }
      const row = odd ? 0 : dot(orders, (j - m - 1) * n + k, -n, overlap, (s1 + m) * n + k, s1 * n, m - 1);
      orders[j * n + k] = head - diagonal - 2 * pairs - row;
    }
  }
  const k1 = SERIES_ORDER + 1;
  const { slope } = sw;
  for (let k = 0; k < n; k++) {
    for (let j = 0; j <= SERIES_ORDER; j++) coef[k * k1 + j] = orders[j * n + k];
    for (let j = 1; j <= SERIES_ORDER; j++) slope[k * SERIES_ORDER + j - 1] = j * orders[j * n + k];
  }
}

/**
 * Largest t where the terms of order ≥ SERIES_ORDER − 2 stay below the tolerances of
 * the energy, the slope and (tolC > 0) the curvature, all in units of t. The largest
 * coefficient of each order over the states sets it (one power per order and quantity).
 */
function reachOf(coef: Float64Array, n: number, tolE: number, tolM: number, tolC: number): number {
  const k1 = SERIES_ORDER + 1;
  let reach = Number.POSITIVE_INFINITY;
  for (let j = SERIES_ORDER - 2; j <= SERIES_ORDER; j++) {
    let c = 0;
    for (let k = 0; k < n; k++) c = Math.max(c, Math.abs(coef[k * k1 + j]));
    if (c === 0) continue;
    reach = Math.min(reach, (tolE / c) ** (1 / j), (tolM / (j * c)) ** (1 / (j - 1)));
    if (tolC > 0) reach = Math.min(reach, (tolC / (j * (j - 1) * c)) ** (1 / (j - 2)));
  }
  return reach;
}

/**
 * Expand the block around an anchor solved exactly (values ascending, vectors by column).
 * Sets sw.scaleT (0 if the anchor has a near-degenerate pair or non-finite numbers) and sw.reach
 * (which honours the curvature's truncation only when curvatures are asked for).
 */
export function expandAt(values: Float64Array, vectors: Float64Array, z: Float64Array, n: number, sw: SeriesWorkspace, curvature: boolean): void {
  sw.scaleT = 0;
  sw.reach = 0;
  let scaleE = 0;
  let minGap = Number.POSITIVE_INFINITY;
  let maxZ = 0;
  for (let k = 0; k < n; k++) {
    scaleE = Math.max(scaleE, Math.abs(values[k]));
    maxZ = Math.max(maxZ, Math.abs(z[k]));
    if (k > 0) minGap = Math.min(minGap, values[k] - values[k - 1]);
  }
  if (!(minGap > MIN_RELATIVE_GAP * scaleE) || !(scaleE < Number.POSITIVE_INFINITY)) return;
  const off = rotateZeeman(vectors, z, n, sw.zs);
  if (!(off < Number.POSITIVE_INFINITY)) return;
  // No coupling left: every energy is exactly linear in the field from here on.
  const scaleT = off > 0 ? minGap / off : 1;
  for (let i = 0; i < n * n; i++) sw.zs[i] *= scaleT;
  energySeries(values, n, sw);
  let curv = 0;
  for (let k = 0; k < n; k++) curv = Math.max(curv, Math.abs(2 * sw.coef[k * (SERIES_ORDER + 1) + 2]));
  if (curvature) {
    for (let k = 0; k < n; k++) {
      for (let j = 2; j <= SERIES_ORDER; j++) sw.bend[k * SERIES_ORDER + j - 1] = j * (j - 1) * sw.coef[k * (SERIES_ORDER + 1) + j];
    }
  }
  const tolC = curvature ? TRUNCATION_C * curv + 1e-300 : 0;
  sw.tolE = TRUNCATION_E * scaleE;
  sw.tolM = TRUNCATION_M * maxZ * scaleT;
  const reach = reachOf(sw.coef, n, sw.tolE, sw.tolM, tolC);
  if (!(reach > 0)) return;
  for (let j = 0; j <= SERIES_ORDER; j++) {
    let c = 0;
    for (let k = 0; k < n; k++) c = Math.max(c, Math.abs(sw.coef[k * (SERIES_ORDER + 1) + j]));
    sw.top[j] = c;
  }
  sw.scaleT = scaleT;
  sw.reach = reach;
}

/**
 * Share of the truncation tolerances that the terms an evaluation leaves out (orderFor) may
 * add to the truncation of the whole series: nearer the anchor the high orders are far below
 * round-off, so evaluating them only costs time.
 */
const DROP_SHARE = 0.25;

/**
 * The lowest order ≥ 1 at which the terms left out, bounded with each order's largest
 * coefficient over the states, stay within DROP_SHARE of the energy's and the slope's
 * tolerances for every |t| ≤ tAbs (|t| ≤ reach).
 */
export function orderFor(sw: SeriesWorkspace, tAbs: number): number {
  if (!(tAbs > 1e-100)) return 1; // at the anchor (and 1/t would overflow): every term past the first is nil
  const top = sw.top;
  const dropE = DROP_SHARE * sw.tolE;
  const dropM = DROP_SHARE * sw.tolM;
  // t^SERIES_ORDER by squaring (Math.pow cost as much as the rest), then down one power a step.
  const inv = 1 / tAbs;
  let power = 1;
  for (let x = tAbs, e = SERIES_ORDER; e > 0; x *= x, e >>= 1) if (e & 1) power *= x;
  let leftE = 0;
  let leftM = 0;
  for (let j = SERIES_ORDER; j > 1; j--) {
    const term = top[j] * power;
    leftE += term;
    leftM += j * term * inv;
    if (!(leftE <= dropE && leftM <= dropM)) return j;
    power *= inv;
  }
  return 1;
}

/** Where a block's series values go: state k, point r at base + k·stride + r; the moment `points` later, the curvature 2·`points`. */
export interface SeriesTarget {
  store: Float64Array;
  base: number;
  stride: number;
  points: number;
  curvature: boolean;
}

/**
 * Points `from` … `to` − 1 of every state of the block (n states) from the series around the
 * anchor field: energies (Hz), moments −h dE/dB (J/T) and, if asked for, d²E/dB² (Hz/T²) into
 * `target`. Horner's rule, four points per pass: one point's chain is a row of dependent
 * multiply-adds, so four independent chains keep the processor's pipelines full (about 3×
 * faster than one point at a time). Energies and moments of each four points go to the order
 * their farthest point needs (orderFor; on the Cs 6P3/2 sweeps 10.5 of 16 on average), found
 * once for all the block's states; curvatures to SERIES_ORDER.
 * The fields need not be sorted (the farthest of each four is looked for, not assumed to be an
 * end one); each must lie within the series' reach of the anchor, which the caller sees to
 * (sweepBlockBySeries, whose anchor placement does assume a monotonic sweep).
 */
export function evaluateSeries(sw: SeriesWorkspace, n: number, fieldsT: Float64Array, anchorT: number, from: number, to: number, target: SeriesTarget): void {
  const { store, stride, points } = target;
  const c = sw.coef;
  const d = sw.slope;
  const inv = 1 / sw.scaleT;
  const momentPerUnit = -PLANCK_H * inv;
  let r = from;
  for (; r + 4 <= to; r += 4) {
    const t0 = (fieldsT[r] - anchorT) * inv;
    const t1 = (fieldsT[r + 1] - anchorT) * inv;
    const t2 = (fieldsT[r + 2] - anchorT) * inv;
    const t3 = (fieldsT[r + 3] - anchorT) * inv;
    // The farthest of the four sets the order: on a monotonic sweep an end point, but the fields may come in any order.
    const order = orderFor(sw, Math.max(Math.abs(t0), Math.abs(t1), Math.abs(t2), Math.abs(t3)));
    for (let k = 0, at = target.base + r; k < n; k++, at += stride) {
      const base = k * (SERIES_ORDER + 1);
      const dBase = k * SERIES_ORDER - 1; // d[dBase + j] = j c_j
      const top = c[base + order];
      const dTop = d[dBase + order];
      const c0 = c[base];
      let e0 = top;
      let e1 = top;
      let e2 = top;
      let e3 = top;
      let s0 = dTop;
      let s1 = dTop;
      let s2 = dTop;
      let s3 = dTop;
      for (let j = order - 1; j >= 1; j--) {
        const cj = c[base + j];
        const dj = d[dBase + j];
        e0 = e0 * t0 + cj;
        e1 = e1 * t1 + cj;
        e2 = e2 * t2 + cj;
        e3 = e3 * t3 + cj;
        s0 = s0 * t0 + dj;
        s1 = s1 * t1 + dj;
        s2 = s2 * t2 + dj;
        s3 = s3 * t3 + dj;
      }
      store[at] = e0 * t0 + c0;
      store[at + 1] = e1 * t1 + c0;
      store[at + 2] = e2 * t2 + c0;
      store[at + 3] = e3 * t3 + c0;
      store[at + points] = s0 * momentPerUnit;
      store[at + points + 1] = s1 * momentPerUnit;
      store[at + points + 2] = s2 * momentPerUnit;
      store[at + points + 3] = s3 * momentPerUnit;
    }
  }
  for (; r < to; r++) {
    const t = (fieldsT[r] - anchorT) * inv;
    const order = orderFor(sw, Math.abs(t));
    for (let k = 0, at = target.base + r; k < n; k++, at += stride) {
      const base = k * (SERIES_ORDER + 1);
      const dBase = k * SERIES_ORDER - 1;
      let e = c[base + order];
      let s = d[dBase + order];
      for (let j = order - 1; j >= 1; j--) {
        e = e * t + c[base + j];
        s = s * t + d[dBase + j];
      }
      store[at] = e * t + c[base];
      store[at + points] = s * momentPerUnit;
    }
  }
  if (target.curvature) for (let k = 0; k < n; k++) evaluateCurvature(sw, k, fieldsT, anchorT, from, to, store, target.base + k * stride + 2 * points);
}

/** d²E/dB² of state k at points `from` … `to` − 1 into store[row + r], four points a pass like evaluateSeries. */
function evaluateCurvature(sw: SeriesWorkspace, k: number, fieldsT: Float64Array, anchorT: number, from: number, to: number, store: Float64Array, row: number): void {
  const inv = 1 / sw.scaleT;
  const b = sw.bend;
  const dBase = k * SERIES_ORDER - 1;
  const bTop = b[dBase + SERIES_ORDER];
  let r = from;
  for (; r + 4 <= to; r += 4) {
    const t0 = (fieldsT[r] - anchorT) * inv;
    const t1 = (fieldsT[r + 1] - anchorT) * inv;
    const t2 = (fieldsT[r + 2] - anchorT) * inv;
    const t3 = (fieldsT[r + 3] - anchorT) * inv;
    let b0 = bTop;
    let b1 = bTop;
    let b2 = bTop;
    let b3 = bTop;
    for (let j = SERIES_ORDER - 1; j >= 2; j--) {
      const bj = b[dBase + j];
      b0 = b0 * t0 + bj;
      b1 = b1 * t1 + bj;
      b2 = b2 * t2 + bj;
      b3 = b3 * t3 + bj;
    }
    store[row + r] = b0 * inv * inv;
    store[row + r + 1] = b1 * inv * inv;
    store[row + r + 2] = b2 * inv * inv;
    store[row + r + 3] = b3 * inv * inv;
  }
  for (; r < to; r++) {
    const t = (fieldsT[r] - anchorT) * inv;
    let d2 = bTop;
    for (let j = SERIES_ORDER - 1; j >= 2; j--) d2 = d2 * t + b[dBase + j];
    store[row + r] = d2 * inv * inv;
  }
}

/** Energy and slope dE/dB of state k at `offsetT` from the anchor, into out[0], out[1] (for checks). */
export function seriesValueAt(sw: SeriesWorkspace, k: number, offsetT: number, out: Float64Array): void {
  const c = sw.coef;
  const base = k * (SERIES_ORDER + 1);
  const t = offsetT / sw.scaleT;
  let e = c[base + SERIES_ORDER];
  let d1 = SERIES_ORDER * e;
  for (let j = SERIES_ORDER - 1; j >= 1; j--) {
    e = e * t + c[base + j];
    d1 = d1 * t + j * c[base + j];
  }
  out[0] = e * t + c[base];
  out[1] = d1 / sw.scaleT;
}
