/**
 * Convolution of a binned distribution with a unit-area box of width w, on any
 * ascending bin edges, in O(n).
 *
 * Bin masses are read as a density that is constant inside each bin (so no jitter
 * appears where bins change width), and each output bin receives the exact mass of
 * the convolved density. With S(t) the input mass left of t, bin j receives
 *   (1/w) [∫_{E_j+w/2}^{E_{j+1}+w/2} S − ∫_{E_j−w/2}^{E_{j+1}−w/2} S],
 * each integral summed piece by piece over the input bins the shifted range covers
 * (the two integrals are close, so their difference keeps the round-off of S times
 * bin width over w). Placing the output mass at the bin centre shifts the
 * mean by about (Δu)²/6 of itself on the sinh grid (detectorGrid.ts), below 1e-5.
 *
 * Wide bins. The bracket above equals ∫_{E_{j+1}−w/2}^{E_{j+1}+w/2} S − ∫_{E_j−w/2}^{E_j+w/2} S
 * (the two ranges share their middle part), i.e. bin j keeps its mass and trades
 * mass with its neighbours across its two edges only. When bins j − 1, j and j + 1
 * are each at least w/2 wide, each edge's window sees just the two bins beside it
 * and the exchange across an edge is (w/8)(ρ_right − ρ_left), so
 *   out_j = m_j + (w/8)(ρ_{j−1} − 2ρ_j + ρ_{j+1})
 * exactly (ρ = bin density, 0 off the grid). That is one line instead of summing
 * about four pieces, with no prefix sums that nearly cancel (so it is also more
 * accurate: within 2e-16 of exact rational arithmetic where the piecewise form was
 * off by up to 5e-10). On the oven's sinh grid about half of the occupied bins are
 * that wide (the slow tail); planning and the 48 convolutions of the 16-sublevel
 * bench pattern went from 1.6 to 1.05 ms.
 */
import type { BinnedMasses } from './depositDeflections';
import { scratchFloat64, scratchInt32, scratchUint8 } from './scratchBuffers';

/**
 * How the shifted ranges [E_j + s, E_{j+1} + s] cut across the input bins. It depends
 * only on the grid and the shift, so it is built once per pattern and reused for every
 * sublevel. Piece p of output bin j lies in input bin k[p] (k = n: right of the grid,
 * where S is the total mass); `w` holds, with stride 3, the piece's offset from that
 * bin's left edge, its length and half its squared length.
 */
interface ShiftPlan {
  /** Pieces of output bin j are start[j] … start[j+1] − 1. */
  start: Int32Array;
  k: Int32Array;
  w: Float64Array;
}

function planShift(edges: Float64Array, shift: number, name: string, wide: Uint8Array): ShiftPlan {
  const n = edges.length - 1;
  // Every piece ends at a range end or an input edge: at most 2n + 2 pieces.
  const cap = 2 * n + 2;
  const ks = scratchInt32(`${name}.k`, cap);
  const w = scratchFloat64(`${name}.w`, 3 * cap);
  const start = scratchInt32(`${name}.start`, n + 1);
  fillPieces(edges, shift, wide, start, ks, w);
  return { start, k: ks, w };
}

/**
 * The pieces of planShift, written into start, ks and w. A function of its own that returns
 * nothing: its loop is optimised mid-call (on-stack replacement) before any call has
 * returned, and a property store after the loop had no type feedback then, which
 * deoptimised planShift about 220 times in a large file's evaluation.
 */
function fillPieces(edges: Float64Array, shift: number, wide: Uint8Array, start: Int32Array, ks: Int32Array, w: Float64Array): void {
  const n = edges.length - 1;
  let count = 0;
  let k = 0;
  while (k < n && edges[k + 1] <= edges[0] + shift) k++;
  // start[n] is written by the loop's own store (see above: a store after the loop deoptimised it).
  for (let j = 0; j <= n; j++) {
    start[j] = count;
    if (j === n) break;
    const y2 = edges[j + 1] + shift;
    if (wide[j] === 1) {
      // No pieces needed (convolveBox uses the closed form); just keep k on the bin containing y2.
      while (k < n && edges[k + 1] <= y2) k++;
      continue;
    }
    let u = edges[j] + shift;
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
        const q = 3 * count;
        ks[count] = kk;
        w[q] = kk < n ? u - edges[kk] : 0;
        w[q + 1] = len;
        w[q + 2] = 0.5 * len * len;
        count++;
      }
      u = v;
      if (k < n && u >= edges[k + 1]) k++;
    }
  }
}

/** A box convolution prepared for one grid and width. */
export interface BoxOperator {
  widthM: number;
  edges: Float64Array;
  plus?: ShiftPlan;
  minus?: ShiftPlan;
  /** 1 where bins j − 1, j, j + 1 are all at least w/2 wide (closed form, no pieces). */
  wide: Uint8Array;
  /** Scratch: prefix masses (n + 1) and densities (n + 1). */
  prefix: Float64Array;
  density: Float64Array;
  /** 1 / bin width, n values. */
  inverseWidth: Float64Array;
}

/** `name` keys the reusable work arrays: operators alive at the same time need different names. */
export function boxOperator(edges: Float64Array, widthM: number, name: string): BoxOperator {
  const n = edges.length - 1;
  const inverseWidth = scratchFloat64(`${name}.inverseWidth`, n);
  for (let j = 0; j < n; j++) inverseWidth[j] = 1 / (edges[j + 1] - edges[j]);
  const wide = scratchUint8(`${name}.wide`, n);
  const half = widthM / 2;
  for (let j = 0; j < n; j++) {
    // Off the grid counts as wide (the density there is 0 however far one looks).
    const left = j === 0 || edges[j] - edges[j - 1] >= half;
    const right = j === n - 1 || edges[j + 2] - edges[j + 1] >= half;
    wide[j] = left && right && edges[j + 1] - edges[j] >= half ? 1 : 0;
  }
  const op: BoxOperator = {
    widthM,
    edges,
    wide,
    prefix: scratchFloat64('box.prefix', n + 1),
    density: scratchFloat64('box.density', n + 1),
    inverseWidth,
  };
  if (widthM > 0) {
    op.plus = planShift(edges, half, `${name}.plus`, wide);
    op.minus = planShift(edges, -half, `${name}.minus`, wide);
  }
  return op;
}

/** ∫ S over output bin j's shifted range. */
function shiftedArea(plan: ShiftPlan, prefix: Float64Array, density: Float64Array, j: number): number {
  const { start, k, w } = plan;
  let area = 0;
  const e = start[j + 1];
  for (let p = start[j], q = 3 * p; p < e; p++, q += 3) {
    const kk = k[p];
    const rho = density[kk];
    area += (prefix[kk] + rho * w[q]) * w[q + 1] + rho * w[q + 2];
  }
  return area;
}

/** Index of the bin containing x, clamped to [0, n − 1]. */
function clampedBin(edges: Float64Array, x: number): number {
  let lo = 0;
  let hi = edges.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (edges[mid] <= x) lo = mid;
    else hi = mid;
  }
  return lo;
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

/** Bins [from, to): where a binned quantity may be nonzero (it is zero outside). */
export interface BinRange {
  from: number;
  to: number;
}

/**
 * Convolves bin-constant masses with the operator's box (out must not alias mass).
 * With `range`, mass is known to be zero outside it (so the search for the occupied
 * bins starts there), and on return `range` holds where out may be nonzero, so a
 * caller can chain stages and restrict its own loops to a sublevel's support.
 */
export function convolveBox(mass: Float64Array, op: BoxOperator, out: Float64Array, range?: BinRange): void {
  const edges = op.edges;
  const n = edges.length - 1;
  const widthM = op.widthM;
  if (!op.plus || !op.minus) {
    out.set(mass);
    return;
  }
  const end = range ? range.to : n;
  let first = range ? range.from : 0;
  while (first < end && mass[first] === 0) first++;
  if (first === end) {
    out.fill(0);
    if (range) range.from = range.to = 0;
    return;
  }
  let last = end - 1;
  while (mass[last] === 0) last--;
  // Only bins within w/2 of the occupied range receive mass; their shifted ranges reach
  // input bins within w of it, so S and the density are needed only there (and at n).
  const j0 = clampedBin(edges, edges[first] - widthM / 2);
  const j1 = clampedBin(edges, edges[last + 1] + widthM / 2) + 1;
  const k0 = Math.max(0, clampedBin(edges, edges[first] - widthM) - 1);
  const k1 = Math.min(n, clampedBin(edges, edges[last + 1] + widthM) + 2);
  const { prefix, density, inverseWidth } = op;
  let below = 0;
  for (let k = k0; k < k1; k++) {
    const m = k >= first && k <= last ? mass[k] : 0;
    prefix[k] = below;
    density[k] = m * inverseWidth[k];
    below += m;
  }
  prefix[n] = below;
  density[n] = 0; // right of the grid S stays at the total
  out.fill(0, 0, j0);
  out.fill(0, j1);
  const { plus, minus, wide } = op;
  const scale = 1 / widthM;
  const eighth = widthM / 8;
  for (let j = j0; j < j1; j++) {
    let m: number;
    if (wide[j] === 1) {
      // Closed form for wide bins (header). mass[j] is 0 outside [first, last] as there.
      const rhoLeft = j > 0 ? density[j - 1] : 0;
      m = mass[j] + eighth * (rhoLeft - 2 * density[j] + density[j + 1]);
    } else {
      m = (shiftedArea(plus, prefix, density, j) - shiftedArea(minus, prefix, density, j)) * scale;
    }
    out[j] = m > 0 ? m : 0;
  }
  if (range) {
    range.from = j0;
    range.to = j1;
  }
}
