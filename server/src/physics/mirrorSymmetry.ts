/**
 * Whether a sum of one even shape placed at signed positions with weights is symmetric about 0:
 * the weight at each distance x off 0 equals the weight at −x (those at 0 are their own mirror).
 * Such a sum peaks at 0 exactly when 0 is its top, where a search ends a rounding away. Used by
 * the beam's peak refinement (sublevels deflected by ±k; the spectrum's highest point keeps a wider
 * rule by heights, lineshape/spectrumPeak.ts).
 *
 * Positions and weights of a pair are computed apart, so they are compared to round-off of the
 * largest (physics/roundOff.ts: 64 ε of the largest |position|, of the largest weight). Distances
 * equal within that round-off are one group, and a group's summed weight on the + side is
 * compared with its sum on the − side: matching members one by one would pair wrongly when two
 * members sit a rounding apart with different weights, as their order by distance can flip
 * between the sides.
 */
import { equalWithinRoundOff } from './roundOff';

export function mirrorSymmetric<T>(items: readonly T[], at: (item: T) => number, weight: (item: T) => number): boolean {
  const atScale = Math.max(0, ...items.map((m) => Math.abs(at(m))));
  const weightScale = Math.max(0, ...items.map((m) => Math.abs(weight(m))));
  // Members off 0 by distance from 0, each with its weight signed by its side (+ for x > 0).
  const offAxis = items
    .map((m): [number, number] => [at(m), weight(m)])
    .filter(([x]) => !equalWithinRoundOff(x, 0, atScale))
    .map(([x, w]): [number, number] => [Math.abs(x), Math.sign(x) * w])
    .sort((a, b) => a[0] - b[0]);
  // Walk the distances; a gap wider than round-off closes a group, whose two sides must balance.
  // Both sides share one walk, so a member and its mirror (a rounding apart) fall in one group.
  let balance = 0;
  let groupWeight = 0;
  for (let i = 0; i < offAxis.length; i++) {
    const [x, signedWeight] = offAxis[i]!;
    balance += signedWeight;
    groupWeight += Math.abs(signedWeight);
    const next = offAxis[i + 1];
    if (next === undefined || !equalWithinRoundOff(next[0], x, atScale)) {
      // The sums carry the round-off of their terms, so the tolerance grows with the group's total.
      if (!equalWithinRoundOff(balance, 0, Math.max(weightScale, groupWeight))) return false;
      balance = 0;
      groupWeight = 0;
    }
  }
  return true;
}
