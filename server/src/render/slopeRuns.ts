/**
 * The kind of a state along the field axis: where its energy rises with B it seeks low field,
 * where it falls it seeks high field. A state can change kind along the sweep (it turns over),
 * so a curve is cut into runs of one kind, each drawn in its own style.
 */
import { BOHR_MAGNETON_HZ_PER_T } from '../physics/constants';

export type Trend = 'rising' | 'falling' | 'flat';

// A slope below a thousandth of a Bohr magneton (in Hz/T) counts as field-insensitive (common practice for display).
export const FLAT_SLOPE_HZ_PER_T = 1e-3 * BOHR_MAGNETON_HZ_PER_T;

export function trendOf(slopeHzPerT: number): Trend {
  if (!Number.isFinite(slopeHzPerT) || Math.abs(slopeHzPerT) < FLAT_SLOPE_HZ_PER_T) return 'flat';
  return slopeHzPerT > 0 ? 'rising' : 'falling';
}

export interface SlopeRun {
  trend: Trend;
  /** First and last sample index of the run (inclusive); neighbouring runs share their end sample. */
  from: number;
  to: number;
}

/** Runs of one trend along a sampled curve; a non-finite sample ends a run and leaves a gap. */
export function slopeRuns(xs: ArrayLike<number>, ys: ArrayLike<number>): SlopeRun[] {
  const n = Math.min(xs.length, ys.length);
  const runs: SlopeRun[] = [];
  let cur: SlopeRun | undefined;
  for (let k = 0; k + 1 < n; k++) {
    const ok = Number.isFinite(xs[k]) && Number.isFinite(xs[k + 1]) && Number.isFinite(ys[k]) && Number.isFinite(ys[k + 1]) && xs[k + 1] !== xs[k];
    if (!ok) {
      cur = undefined;
      continue;
    }
    const t = trendOf((ys[k + 1] - ys[k]) / (xs[k + 1] - xs[k]));
    if (cur && cur.trend === t && cur.to === k) cur.to = k + 1;
    else {
      cur = { trend: t, from: k, to: k + 1 };
      runs.push(cur);
    }
  }
  return runs;
}
