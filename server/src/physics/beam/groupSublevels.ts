/**
 * Which sublevels make one peak: sorted by the position of their own profile's
 * maximum, neighbours closer than `mergeFraction` × (FWHM of the undeflected image)
 * join the same group (a chain can grow longer than that; see docs/beam.md).
 */
export function groupByPeakPosition(positionsM: readonly number[], indices: readonly number[], mergeDistanceM: number): number[][] {
  const order = [...indices].sort((a, b) => positionsM[a] - positionsM[b] || a - b);
  const groups: number[][] = [];
  for (const idx of order) {
    const last = groups[groups.length - 1];
    if (last && positionsM[idx] - positionsM[last[last.length - 1]] <= mergeDistanceM) last.push(idx);
    else groups.push([idx]);
  }
  return groups;
}
