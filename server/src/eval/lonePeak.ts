/**
 * A beam whose atoms land in one peak, read from its result in one place. The physics decides it
 * once (physics/beam/detectorPattern.ts, `mergedLonePeak`); the JSON document carries that verdict
 * as `all_resolved` of a one-peak pattern, so the diagnostics, the advice, the hover and the text
 * report all read it here instead of each testing the peak count again.
 */
import type { BeamResult } from './resultTypes';

/**
 * 'merged': the sublevels deflect differently but land together (not resolved, `beam-one-peak`);
 * 'nothing-to-resolve': one sublevel with atoms, or sublevels that all deflect alike.
 */
export type LonePeak = 'merged' | 'nothing-to-resolve';

/** The kind of lone peak, or undefined when the beam was not computed or shows no lone peak. */
export function lonePeak(r: BeamResult): LonePeak | undefined {
  if (!r.computed || r.peaks.length !== 1 || r.all_resolved === undefined) return undefined;
  return r.all_resolved ? 'nothing-to-resolve' : 'merged';
}

/** A merged lone peak, in words. */
export const MERGED_PEAK_TEXT = 'the sublevels deflect differently but land together';

/** A lone peak with nothing to resolve, in words: why there is nothing. */
export function nothingToResolveText(r: BeamResult): string {
  return (r.peaks[0]?.members.length ?? 0) > 1 ? 'the sublevels all deflect alike, nothing to resolve' : 'one sublevel with atoms, nothing to resolve';
}
