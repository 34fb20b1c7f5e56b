/** Numerical and reporting options of the detector pattern, with their defaults and checks. */
import { DEFAULT_DIP_CRITERION } from './pairDips';
import { DEFAULT_SPEED_PANELS } from './speedLawFor';
import { beamIssue, type BeamIssue } from './types';

export interface PatternOptions {
  /** Number of bins of the detector-position grid (default 4096). */
  bins?: number;
  /** Panels of the jet's cumulative speed table (default 1024; the oven and single speed are exact). */
  speedPanels?: number;
  /** Flux fraction of the slow tail allowed beyond the grid, per sublevel (default 1e-3). */
  tailFraction?: number;
  /** Sublevels whose own peaks lie closer than this × image FWHM form one peak (default 0.25). */
  mergeFraction?: number;
  /** A pair is resolved when (dip ÷ smaller peak) ≤ this (default 0.8). */
  dipCriterion?: number;
  /** Fixed grid [start, end] in metres instead of the automatic span. */
  spanM?: { startM: number; endM: number };
  /** Local maxima of the sum below this prominence (relative to the highest) are not listed (default 1e-3). */
  minRelativeProminence?: number;
}

export interface ResolvedOptions {
  bins: number;
  speedPanels: number;
  tailFraction: number;
  mergeFraction: number;
  dipCriterion: number;
  spanM?: { startM: number; endM: number };
  minRelativeProminence: number;
}

export const DEFAULT_BINS = 4096;
export const DEFAULT_TAIL_FRACTION = 1e-3;
export const DEFAULT_MERGE_FRACTION = 0.25;
export const DEFAULT_MIN_PROMINENCE = 1e-3;

export function resolveOptions(o: PatternOptions): { options: ResolvedOptions; issues: BeamIssue[] } {
  const issues: BeamIssue[] = [];
  const bins = o.bins ?? DEFAULT_BINS;
  const speedPanels = o.speedPanels ?? DEFAULT_SPEED_PANELS;
  const tailFraction = o.tailFraction ?? DEFAULT_TAIL_FRACTION;
  const mergeFraction = o.mergeFraction ?? DEFAULT_MERGE_FRACTION;
  const dipCriterion = o.dipCriterion ?? DEFAULT_DIP_CRITERION;
  const minRelativeProminence = o.minRelativeProminence ?? DEFAULT_MIN_PROMINENCE;
  const bad = (what: string, allowed: string, got: unknown): void => {
    issues.push(beamIssue('error', 'beam-option-invalid', `${what} must be ${allowed} (got ${String(got)}).`));
  };
  if (!Number.isInteger(bins) || bins < 16 || bins > 1 << 22) bad('The number of bins', 'an integer from 16 to 4194304', bins);
  if (!Number.isInteger(speedPanels) || speedPanels < 8 || speedPanels > 1 << 16) {
    bad('The number of speed-table panels', 'an integer from 8 to 65536', speedPanels);
  }
  if (!(tailFraction > 0 && tailFraction < 0.5)) bad('The tail fraction', 'between 0 and 0.5', tailFraction);
  if (!(mergeFraction >= 0 && Number.isFinite(mergeFraction))) bad('The merge fraction', 'a number ≥ 0', mergeFraction);
  if (!(dipCriterion > 0 && dipCriterion <= 1)) bad('The dip criterion', 'in (0, 1]', dipCriterion);
  if (!(minRelativeProminence >= 0 && minRelativeProminence < 1)) bad('The prominence threshold', 'in [0, 1)', minRelativeProminence);
  if (o.spanM && !(Number.isFinite(o.spanM.startM) && Number.isFinite(o.spanM.endM) && o.spanM.endM > o.spanM.startM)) {
    bad('The grid span', 'a finite interval with end > start', `${o.spanM.startM}..${o.spanM.endM}`);
  }
  return {
    options: { bins, speedPanels, tailFraction, mergeFraction, dipCriterion, spanM: o.spanM, minRelativeProminence },
    issues,
  };
}
