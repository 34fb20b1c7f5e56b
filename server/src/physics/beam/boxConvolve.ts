/**
 * Convolution of a binned distribution with a unit-area box of width w, on any
 * ascending bin edges, in O(n).
 *
 * Input: bin masses read as a density that is constant inside each bin (no jitter
 * when bins change width). Output: each bin's exact mass and exact centroid of the
 * convolved density. With S(t) the input mass left of t, bin j receives
 *   (1/w) [∫_{E_j+w/2}^{E_{j+1}+w/2} S − ∫_{E_j−w/2}^{E_{j+1}−w/2} S],
 * and its first moment about the bin centre follows from ∫ (t − mid) S(t) dt over the
 * same shifted ranges. Both are summed piece by piece over the input bins a range
 * covers, so no large numbers cancel.
 */
import type { BinnedMasses } from './depositDeflections';

/**
 * How the shifted ranges [E_j + s, E_{j+1} + s] cut across the input bins. It depends
 * only on the grid and the shift, so it is built once per pattern and reused for every
 * sublevel. Piece p of output bin j lies in input bin k[p] (k = n: right of the grid,
 * where S is the total mass), starts `off` after that bin's left edge, and carries the
 * polynomial weights of ∫ S and ∫ (t − mid) S over the piece.
 */
interface ShiftPlan {
  /** Pieces of output bin j are start[j] … start[j+1] − 1. */
  start: Int32Array;
  k: Int32Array;
  off: Float64Array;
  /** len, len²/2, ((b² − a²)/2), ((b³ − a³)/3 − a(b² − a²)/2) with a, b the piece ends about mid. */
  w1: Float64Array;
  w2: Float64Array;
  m1: Float64Array;
  m2: Float64Array;
}

function planShift(edges: Float64Array, shift: number): ShiftPlan {
  const n = edges.length - 1;
  const ks: number[] = [];
  const offs: number[] = [];
  const w1: number[] = [];
  const w2: number[] = [];
  const m1: number[] = [];
  const m2: number[] = [];
  const start = new Int32Array(n + 1);
  let k = 0;
  while (k < n && edges[k + 1] <= edges[0] + shift) k++;
  for (let j = 0; j < n; j++) {
    start[j] = ks.length;
    const y1 = edges[j] + shift;
    const y2 = edges[j + 1] + shift;
    const mid = 0.5 * (y1 + y2);
    let u = y1;
    while (u < y2) {
      let v: number;
      let kk: number;
      if (k >= n) {
        v = y2;
        kk = n;
      } else if (u < edges[k]) {
        v = Math.min(y2, edges[k]); // left of the grid: S = 0, nothing to add
        kk = -1;
      } else {
        v = Math.min(y2, edges[k + 1]);
        kk = k;
      }
      if (kk >= 0 && v > u) {
        const len = v - u;
        const a = u - mid;
        const b = v - mid;
        ks.push(kk);
        offs.push(kk < n ? u - edges[kk] : 0);
        w1.push(len);
        w2.push(0.5 * len * len);
        m1.push(0.5 * (b * b - a * a));
        m2.push((b * b * b - a * a * a) / 3 - (a * (b * b - a * a)) / 2);
      }
      u = v;
      if (k < n && u >= edges[k + 1]) k++;
    }
  }
  start[n] = ks.length;
  return {
    start,
    k: Int32Array.from(ks),
    off: Float64Array.from(offs),
    w1: Float64Array.from(w1),
    w2: Float64Array.from(w2),
    m1: Float64Array.from(m1),
    m2: Float64Array.from(m2),
  };
}

/** A box convolution prepared for one grid and width. */
export interface BoxOperator {
  widthM: number;
  edges: Float64Array;
  plus?: ShiftPlan;
  minus?: ShiftPlan;
  /** Scratch: prefix masses (n + 1), densities (n), shifted integrals. */
  prefix: Float64Array;
  density: Float64Array;
  areaPlus: Float64Array;
  areaMinus: Float64Array;
  momentPlus: Float64Array;
  momentMinus: Float64Array;
}

export function boxOperator(edges: Float64Array, widthM: number): BoxOperator {
  const n = edges.length - 1;
  const op: BoxOperator = {
    widthM,
    edges,
    prefix: new Float64Array(n + 1),
    density: new Float64Array(n + 1),
    areaPlus: new Float64Array(n),
    areaMinus: new Float64Array(n),
    momentPlus: new Float64Array(n),
    momentMinus: new Float64Array(n),
  };
  if (widthM > 0) {
    op.plus = planShift(edges, widthM / 2);
    op.minus = planShift(edges, -widthM / 2);
  }
  return op;
}

function applyPlan(plan: ShiftPlan, prefix: Float64Array, density: Float64Array, area: Float64Array, moment: Float64Array): void {
  const { start, k, off, w1, w2, m1, m2 } = plan;
  const n = area.length;
  for (let j = 0; j < n; j++) {
    let ar = 0;
    let mo = 0;
    for (let p = start[j], e = start[j + 1]; p < e; p++) {
      const kk = k[p];
      const rho = density[kk];
      const s0 = prefix[kk] + rho * off[p];
      ar += s0 * w1[p] + rho * w2[p];
      mo += s0 * m1[p] + rho * m2[p];
    }
    area[j] = ar;
    moment[j] = mo;
  }
}

/**
 * Moves each bin's mass from its centroid onto the two nearest bin centres (linear
 * sharing), so a bin-constant density afterwards has the same total and mean.
 */
export function shareToCentres(src: BinnedMasses, edges: Float64Array, out: Float64Array): void {
  const n = edges.length - 1;
  out.fill(0);
  for (let j = 0; j < n; j++) {
    const m = src.mass[j];
    if (m === 0) continue;
    const c = 0.5 * (edges[j] + edges[j + 1]);
    const x = src.centroid[j];
    if (x > c && j + 1 < n) {
      const f = (x - c) / (0.5 * (edges[j + 1] + edges[j + 2]) - c);
      out[j] += m * (1 - f);
      out[j + 1] += m * f;
    } else if (x < c && j > 0) {
      const f = (c - x) / (c - 0.5 * (edges[j - 1] + edges[j]));
      out[j] += m * (1 - f);
      out[j - 1] += m * f;
    } else out[j] += m;
  }
}

/** Convolves bin-constant masses with the operator's box; writes masses and centroids. */
export function convolveBox(mass: Float64Array, op: BoxOperator, out: BinnedMasses): void {
  const edges = op.edges;
  const n = edges.length - 1;
  const widthM = op.widthM;
  if (!op.plus || !op.minus) {
    out.mass.set(mass);
    for (let j = 0; j < n; j++) out.centroid[j] = 0.5 * (edges[j] + edges[j + 1]);
    return;
  }
  const { prefix, density } = op;
  prefix[0] = 0;
  for (let j = 0; j < n; j++) {
    prefix[j + 1] = prefix[j] + mass[j];
    density[j] = mass[j] / (edges[j + 1] - edges[j]);
  }
  density[n] = 0; // right of the grid S stays at the total
  applyPlan(op.plus, prefix, density, op.areaPlus, op.momentPlus);
  applyPlan(op.minus, prefix, density, op.areaMinus, op.momentMinus);
  for (let j = 0; j < n; j++) {
    const lo = edges[j];
    const hi = edges[j + 1];
    const c = 0.5 * (lo + hi);
    const m = (op.areaPlus[j] - op.areaMinus[j]) / widthM;
    if (m > 0) {
      out.mass[j] = m;
      // ∫ (x − c) g dx = (1/w)[∫ (t − mid₊) S − ∫ (t − mid₋) S] since x − c = t − mid for t = x ± w/2.
      const x = c + (op.momentPlus[j] - op.momentMinus[j]) / (widthM * m);
      out.centroid[j] = x >= lo && x <= hi ? x : c;
    } else {
      out.mass[j] = 0;
      out.centroid[j] = c;
    }
  }
}
