/**
 * Whether a sum of one even shape placed at signed positions with weights is symmetric about 0:
 * the positions off 0 pair off as ±x with equal weights (those at 0 are their own mirror). Such
 * a sum peaks at 0 exactly when 0 is its top, where a search ends a rounding away. Used by the
 * beam's peak refinement (sublevels deflected by ±k; the spectrum's highest point keeps a wider
 * rule by heights, lineshape/spectrumPeak.ts). Positions and weights of a pair are computed
 * apart, so they are compared to round-off of the largest (physics/roundOff.ts).
 */
import { equalWithinRoundOff } from './roundOff';

export function mirrorSymmetric<T>(items: readonly T[], at: (item: T) => number, weight: (item: T) => number): boolean {
  const atScale = Math.max(0, ...items.map((m) => Math.abs(at(m))));
  const weightScale = Math.max(0, ...items.map((m) => Math.abs(weight(m))));
  // Each side by distance from 0, equal distances by weight, so a pair's members meet at the same index.
  const side = (sign: number): [number, number][] =>
    items
      .map((m): [number, number] => [sign * at(m), weight(m)])
      .filter(([x]) => x > 0 && !equalWithinRoundOff(x, 0, atScale))
      .sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  const right = side(1);
  const left = side(-1);
  return (
    right.length === left.length &&
    right.every(([x, w], i) => equalWithinRoundOff(x, left[i]![0], atScale) && equalWithinRoundOff(w, left[i]![1], weightScale))
  );
}
