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
    psi: new Float64Array(s1 * n * n),
    zpsi: new Float64Array(s1 * n * n),
    invGap: new Float64Array(n * n),
    orders: new Float64Array(k1 * n),
    overlap: new Float64Array(s1 * s1 * n),
    scaleT: 0,
    reach: 0,
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

/** out[k] = Σ_l x[l n + k] y[l n + k] (column-wise dot products of two n × n blocks) at `at`. */
function columnDots(x: Float64Array, xAt: number, y: Float64Array, yAt: number, n: number, out: Float64Array, at: number): void {
  for (let k = 0; k < n; k++) out[at + k] = 0;
  for (let l = 0; l < n; l++) {
    const xr = xAt + l * n;
    const yr = yAt + l * n;
    for (let k = 0; k < n; k++) out[at + k] += x[xr + k] * y[yr + k];
  }
}

/**
 * The series coefficients of every energy at once: Ψ_j is n × n with column k the
 * j-th order state of energy k, so the innermost loops run over k and the chains of
 * different states overlap. The states go to order m = SERIES_ORDER / 2 only; the
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
  const lastProduct = SERIES_ORDER % 2 === 1 ? STATE_ORDER : STATE_ORDER - 1;
  for (let j = 0; j <= lastProduct; j++) {
    // zpsi_j = Z_s Ψ_j
    const from = j * nn;
    for (let i = 0; i < nn; i++) zpsi[from + i] = 0;
    for (let l = 0; l < n; l++) {
      const out = from + l * n;
      for (let i = 0; i < n; i++) {
        const zli = zs[l * n + i];
        const row = from + i * n;
        for (let k = 0; k < n; k++) zpsi[out + k] += zli * psi[row + k];
      }
    }
    const next = j + 1;
    if (next > STATE_ORDER) break;
    for (let k = 0; k < n; k++) orders[next * n + k] = zpsi[from + k * n + k];
    // Ψ_{j+1} = (Σ_{i=1}^{j} c_i Ψ_{j+1−i} − Z_s Ψ_j) / (D_l − D_k), zero on the diagonal
    const at = next * nn;
    for (let i = 0; i < nn; i++) psi[at + i] = -zpsi[from + i];
    for (let i = 1; i < next; i++) {
      const src = (next - i) * nn;
      const ci = i * n;
      for (let l = 0; l < n; l++) {
        for (let k = 0; k < n; k++) psi[at + l * n + k] += orders[ci + k] * psi[src + l * n + k];
      }
    }
    for (let i = 0; i < nn; i++) psi[at + i] *= invGap[i];
  }
  // <Ψ_a|Ψ_b> for a ≤ b (symmetric), as far as the sums below reach (a + b < SERIES_ORDER).
  for (let a = 1; a <= STATE_ORDER; a++) {
    for (let b = a; b <= STATE_ORDER && a + b < SERIES_ORDER; b++) columnDots(psi, a * nn, psi, b * nn, n, overlap, (a * s1 + b) * n);
  }
  for (let j = STATE_ORDER + 1; j <= SERIES_ORDER; j++) {
    const m = j >> 1;
    const at = j * n;
    const odd = j % 2 === 1;
    // <Ψ_m|Z_s|Ψ_m> (odd j) or <Ψ_{m−1}|Z_s|Ψ_m> (even j), with Z_s Ψ taken from the lower one.
    columnDots(psi, m * nn, zpsi, (odd ? m : m - 1) * nn, n, orders, at);
    // The double sum over the square a, b ≤ q (q = m for odd j, m − 1 for even j) by symmetry:
    // the diagonal once, each pair a < b twice; even j adds the row a = m, b < m.
    const q = odd ? m : m - 1;
    for (let a = 1; a <= q; a++) {
      for (let b = a; b <= q; b++) {
        const c = (j - a - b) * n;
        const o = (a * s1 + b) * n;
        const w = a === b ? 1 : 2;
        for (let k = 0; k < n; k++) orders[at + k] -= w * orders[c + k] * overlap[o + k];
      }
    }
    if (!odd) {
      for (let b = 1; b < m; b++) {
        const c = (j - m - b) * n;
        const o = (b * s1 + m) * n;
        for (let k = 0; k < n; k++) orders[at + k] -= orders[c + k] * overlap[o + k];
      }
    }
  }
  const k1 = SERIES_ORDER + 1;
  for (let k = 0; k < n; k++) for (let j = 0; j <= SERIES_ORDER; j++) coef[k * k1 + j] = orders[j * n + k];
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
  const tolC = curvature ? TRUNCATION_C * curv + 1e-300 : 0;
  const reach = reachOf(sw.coef, n, TRUNCATION_E * scaleE, TRUNCATION_M * maxZ * scaleT, tolC);
  if (!(reach > 0)) return;
  sw.scaleT = scaleT;
  sw.reach = reach;
}

/**
 * Points `from` … `to` − 1 of state k from the series around the anchor field: the
 * energy (Hz) goes to store[energyRow + r], the moment −h dE/dB (J/T) to
 * store[momentRow + r] and, if curvatureRow ≥ 0, d²E/dB² (Hz/T²) to
 * store[curvatureRow + r]. Horner's rule; the loop over points is innermost so that
 * the independent chains of neighbouring points overlap.
 */
export function evaluateSeries(
  sw: SeriesWorkspace,
  k: number,
  fieldsT: Float64Array,
  anchorT: number,
  from: number,
  to: number,
  store: Float64Array,
  energyRow: number,
  momentRow: number,
  curvatureRow: number,
): void {
  const c = sw.coef;
  const base = k * (SERIES_ORDER + 1);
  const inv = 1 / sw.scaleT;
  const momentPerUnit = -PLANCK_H * inv;
  const top = c[base + SERIES_ORDER];
  for (let r = from; r < to; r++) {
    const t = (fieldsT[r] - anchorT) * inv;
    let e = top;
    let d1 = SERIES_ORDER * top;
    for (let j = SERIES_ORDER - 1; j >= 1; j--) {
      const cj = c[base + j];
      e = e * t + cj;
      d1 = d1 * t + j * cj;
    }
    store[energyRow + r] = e * t + c[base];
    store[momentRow + r] = d1 * momentPerUnit;
  }
  if (curvatureRow < 0) return;
  for (let r = from; r < to; r++) {
    const t = (fieldsT[r] - anchorT) * inv;
    let d2 = SERIES_ORDER * (SERIES_ORDER - 1) * top;
    for (let j = SERIES_ORDER - 1; j >= 2; j--) d2 = d2 * t + j * (j - 1) * c[base + j];
    store[curvatureRow + r] = d2 * inv * inv;
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
