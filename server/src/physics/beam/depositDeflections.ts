/**
 * Bins the deflections z = k/v² of one sublevel over the speed law. Bin masses come
 * from the law's cumulative fraction (exact for the oven) and each bin keeps the exact
 * centroid of its atoms (from ∫ f/v²), so nothing is lost but the spread inside a bin.
 * Returns the flux fraction that falls outside the grid.
 */
import type { SpeedLaw } from './speedLaw';

/** Binned point masses: mass[j] sits at centroid[j], inside bin j (centroid is meaningful only where mass ≠ 0). */
export interface BinnedMasses {
  mass: Float64Array;
  centroid: Float64Array;
}

/** Index of the bin containing x (edges ascending; x inside [edges[0], edges[n]]). */
export function binOf(edges: Float64Array, x: number): number {
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
 * P(z ≤ e) into at[0] and E[z; z ≤ e] into at[1], at a bin edge e. A plain function
 * writing into a typed array, calling the law's combined `cumulativeBelow`: closures
 * assigning captured doubles, and doubles returned from calls the optimiser does not
 * inline, are boxed on every write — about 2 MB of garbage per pattern (a scavenge per
 * pattern, up to a sixth of the run time, depending on the optimiser's mood).
 */
export function cumulativeAt(e: number, k: number, law: SpeedLaw, at: Float64Array): void {
  const invTotal = law.meanInverseSquare;
  if (k > 0) {
    if (e <= 0) {
      at[0] = 0;
      at[1] = 0;
    } else {
      law.cumulativeBelow(Math.sqrt(k / e), at);
      at[0] = 1 - at[0];
      at[1] = k * (invTotal - at[1]);
    }
  } else if (e >= 0) {
    at[0] = 1;
    at[1] = k * invTotal;
  } else {
    law.cumulativeBelow(Math.sqrt(k / e), at);
    at[1] = k * at[1];
  }
}

/** True where cumulativeAt has reached its limit exactly: (0, 0) for k > 0, (1, k⟨1/v²⟩) for k < 0. */
function saturated(e: number, k: number, law: SpeedLaw, at: Float64Array): boolean {
  cumulativeAt(e, k, law, at);
  return k > 0 ? at[0] === 0 && at[1] === 0 : at[0] === 1 && at[1] === k * law.meanInverseSquare;
}

const edgeValues = new Float64Array(2);

export function depositDeflections(out: BinnedMasses, edges: Float64Array, k: number, law: SpeedLaw): number {
  const bins = edges.length - 1;
  out.mass.fill(0); // centroids are written wherever a mass is
  if (k === 0 || law.singleSpeed !== undefined) {
    const z = law.singleSpeed !== undefined ? k / (law.singleSpeed * law.singleSpeed) : 0;
    if (!(z >= edges[0] && z <= edges[bins])) return 1;
    const j = binOf(edges, z);
    out.mass[j] = 1;
    out.centroid[j] = z;
    return 0;
  }
  const at = edgeValues;
  // Only edges where P or E[z; z ≤ e] still changes need the law (two exponentials or a
  // table look-up each). Going out from the axis the fastest atoms land first, so for k > 0
  // both stay exactly 0 up to some edge and for k < 0 both are exactly at their totals from
  // some edge on; a bisection on that (monotone) test finds the edge, and the loop below
  // starts or stops there. The skipped bins would get P − P = 0, so nothing changes; on the
  // oven's grid this skips about 60 % of the edges (the far side of the axis and the
  // fastest 1e-16 of the flux).
  let from = 0;
  let to = bins;
  let lo = -1;
  let hi = bins + 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    // k > 0: lo ends on the largest edge still at (0, 0); k < 0: hi on the first at the totals.
    const done = saturated(edges[mid], k, law, at);
    if (k > 0 ? done : !done) lo = mid;
    else hi = mid;
  }
  if (k > 0) from = Math.max(lo, 0);
  else to = Math.min(hi, bins);
  cumulativeAt(edges[0], k, law, at);
  const below = at[0];
  cumulativeAt(edges[from], k, law, at);
  let prevP = at[0];
  let prevM = at[1];
  for (let j = from; j < to; j++) {
    cumulativeAt(edges[j + 1], k, law, at);
    const p = at[0];
    const m = at[1];
    const mass = p - prevP;
    const moment = m - prevM;
    prevP = p;
    prevM = m;
    if (!(mass > 0)) continue;
    out.mass[j] = mass;
    const c = moment / mass;
    // Round-off in nearly empty bins can push the centroid out of its bin: use the bin centre then.
    out.centroid[j] = c >= edges[j] && c <= edges[j + 1] ? c : 0.5 * (edges[j] + edges[j + 1]);
  }
  cumulativeAt(edges[bins], k, law, at);
  return below + (1 - at[0]);
}
