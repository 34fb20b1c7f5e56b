/**
 * Resolution of neighbouring peaks: the lowest point of the summed pattern between
 * the two peak positions, divided by the lower of the pattern's values at those
 * positions. 1 means no dip at all. A pair counts as resolved when the ratio is at
 * most the criterion (default 0.8: a Rayleigh-type dip, common practice; the
 * dip between two diffraction-limited lines at the Rayleigh
 * spacing is 8/π² ≈ 0.81 of the maxima, from memory).
 */
import { centreBelow, sampleAt } from './peakShape';

export const DEFAULT_DIP_CRITERION = 0.8;

export interface PairVerdict {
  /** Index into the peak list (sorted by position). */
  left: number;
  right: number;
  /** Minimum between the peaks ÷ the smaller of the two peak values, in (0, 1]. */
  dipRatio: number;
  resolved: boolean;
}

export function pairDips(
  total: Float64Array,
  centresM: Float64Array,
  edgesM: Float64Array,
  peakPositionsM: readonly number[],
  criterion: number,
): PairVerdict[] {
  const out: PairVerdict[] = [];
  for (let p = 0; p + 1 < peakPositionsM.length; p++) {
    const xl = peakPositionsM[p];
    const xr = peakPositionsM[p + 1];
    const hl = sampleAt(total, centresM, edgesM, xl);
    const hr = sampleAt(total, centresM, edgesM, xr);
    const smaller = Math.min(hl, hr);
    let low = smaller;
    const first = centreBelow(centresM, xl) + 1;
    const last = centreBelow(centresM, xr);
    for (let j = first; j <= last; j++) low = Math.min(low, total[j]);
    const dipRatio = smaller > 0 ? low / smaller : 1;
    out.push({ left: p, right: p + 1, dipRatio, resolved: dipRatio <= criterion });
  }
  return out;
}

/** The largest dip ratio of a pattern's neighbouring pairs (0 when there is no pair). */
export function worstDip(p: { pairs: readonly PairVerdict[] }): number {
  return p.pairs.length === 0 ? 0 : Math.max(...p.pairs.map((q) => q.dipRatio));
}
