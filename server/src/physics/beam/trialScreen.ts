/**
 * A cheap first look at a trial of the resolving search (resolvingOptions.ts): the same pattern
 * on a coarse grid of SCREEN_BINS bins instead of the full 4,096 (11–13 % of the work). It
 * answers one question only — does this change leave the worst dip above a bar? — and only with
 * a margin wider than any difference between the coarse and the full worst dip seen on random oven
 * and jet set-ups (tests/physics/trialScreen.test.ts): an empirical margin, not a proof (docs/beam.md). A single-speed beam is never
 * screened: its flat-topped peaks need the full grid (coarse dips were off by up to 0.05 even at 512 bins).
 */
import { computePattern, type PatternInput } from './detectorPattern';
import { DEFAULT_BINS } from './patternOptions';
import { worstDip } from './pairDips';
import { hasBeamError } from './types';

export const SCREEN_BINS = 256;
/** Largest |coarse − full| worst dip seen on 3,244 random oven and jet trials: 0.032. */
export const SCREEN_MARGIN = 0.05;
/**
 * A coarse pattern with no dip at all between some pair (worst dip exactly 1: the sum is
 * monotone between the two peaks) had a full worst dip of at least 0.998 in 2,864 such trials.
 */
export const NO_DIP_MARGIN = 0.01;

/**
 * Module-internal switch, not a user option: tests turn the screen off to check that the advice
 * is the same without it (tests/physics/trialScreen.property.test.ts).
 */
export const TRIAL_SCREEN = { enabled: true };

/** Whether trials of this beam may be screened at all. */
export function screenable(input: PatternInput): boolean {
  return TRIAL_SCREEN.enabled && input.source.kind !== 'single' && (input.bins ?? DEFAULT_BINS) >= 8 * SCREEN_BINS;
}

/** True only when the full pattern's worst dip is certainly above `bar` (and the pattern has pairs to judge). */
export function certainlyAbove(input: PatternInput, groups: number[][], bar: number): boolean {
  const coarse = computePattern({ ...input, bins: SCREEN_BINS }, groups, false, true);
  if (hasBeamError(coarse.issues) || coarse.pairs.length === 0) return false;
  const worst = worstDip(coarse);
  return worst - (worst === 1 ? NO_DIP_MARGIN : SCREEN_MARGIN) > bar;
}
