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
  const invTotal = law.meanInverseSquare;
  // P(z ≤ e) and E[z; z ≤ e] at a bin edge e.
  let prevP = 0;
  let prevM = 0;
  const atEdge = (e: number): void => {
    if (k > 0) {
      if (e <= 0) {
        prevP = 0;
        prevM = 0;
      } else {
        const v = Math.sqrt(k / e);
        prevP = 1 - law.slowerFraction(v);
        prevM = k * (invTotal - law.inverseSquareBelow(v));
      }
    } else if (e >= 0) {
      prevP = 1;
      prevM = k * invTotal;
    } else {
      const v = Math.sqrt(k / e);
      prevP = law.slowerFraction(v);
      prevM = k * law.inverseSquareBelow(v);
    }
  };
  atEdge(edges[0]);
  const below = prevP;
  for (let j = 0; j < bins; j++) {
    const p0 = prevP;
    const m0 = prevM;
    atEdge(edges[j + 1]);
    const mass = prevP - p0;
    if (!(mass > 0)) continue;
    out.mass[j] = mass;
    const c = (prevM - m0) / mass;
    // Round-off in nearly empty bins can push the centroid out of its bin: use the bin centre then.
    out.centroid[j] = c >= edges[j] && c <= edges[j + 1] ? c : 0.5 * (edges[j] + edges[j + 1]);
  }
  return below + (1 - prevP);
}
