/**
 * Bins the deflections z = k/v² of one sublevel over the speed law. Bin masses come
 * from the law's cumulative fraction (exact for the oven), and each bin's mass is
 * placed at the bin's exact centroid (from ∫ f/v²) shared linearly between the two
 * nearest bin centres, so the first moment of the binned distribution is exact.
 * Returns the flux fraction that falls outside the grid.
 */
import type { SpeedLaw } from './speedLaw';

export interface BinGrid {
  /** Left edge of bin 0, m. */
  startM: number;
  /** Bin width, m. */
  binM: number;
  bins: number;
}

/** Adds mass at position z shared between the two nearest bin centres. */
export function depositPoint(out: Float64Array, grid: BinGrid, z: number, mass: number): void {
  const t = (z - grid.startM) / grid.binM - 0.5;
  const n = grid.bins;
  if (t <= 0) {
    out[0] += mass;
    return;
  }
  if (t >= n - 1) {
    out[n - 1] += mass;
    return;
  }
  const i = Math.floor(t);
  const f = t - i;
  out[i] += mass * (1 - f);
  out[i + 1] += mass * f;
}

/**
 * Deposits one sublevel (deflection coefficient k, m³/s²) with unit total flux into
 * `out` (masses per bin). Returns the fraction beyond the grid edges.
 */
export function depositDeflections(out: Float64Array, grid: BinGrid, k: number, law: SpeedLaw): number {
  const { startM, binM, bins } = grid;
  const endM = startM + bins * binM;
  if (k === 0 || law.singleSpeed !== undefined) {
    const z = law.singleSpeed !== undefined ? k / (law.singleSpeed * law.singleSpeed) : 0;
    if (z < startM || z > endM) return 1;
    depositPoint(out, grid, z, 1);
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
  atEdge(startM);
  const below = prevP;
  for (let j = 0; j < bins; j++) {
    const p0 = prevP;
    const m0 = prevM;
    const left = startM + j * binM;
    atEdge(left + binM);
    const mass = prevP - p0;
    if (!(mass > 0)) continue;
    let centroid = (prevM - m0) / mass;
    // Round-off in tiny bins can push the centroid out of its bin.
    if (!(centroid >= left && centroid <= left + binM)) centroid = left + 0.5 * binM;
    depositPoint(out, grid, centroid, mass);
  }
  return below + (1 - prevP);
}
