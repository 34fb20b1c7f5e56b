/** Detector-pattern diagram data for one beam, from its evaluation. */
import type { BeamEvaluation } from '../eval/beamEvaluation';
import type { PatternViewData } from '../render';

/** Bins whose total is below this fraction of the maximum are trimmed from the ends of the view. */
const VIEW_FLOOR = 0.01;

/** `trim` (for drawing) cuts the far tails; the CSV export keeps the whole computed grid. */
export function patternView(beamName: string, e: BeamEvaluation, trim = true): PatternViewData | undefined {
  const p = e.pattern;
  if (!p || !e.result.computed) return undefined;
  const unresolved = p.pairs.filter((x) => !x.resolved).length;
  const [from, to] = trim ? visibleRange(p.total, p.positionsM) : [0, p.total.length];
  const cut = (a: Float64Array): Float64Array => a.subarray(from, to);
  return {
    title: `beam ${beamName}: ${e.result.species ?? ''} ${e.result.level ?? ''} on the detector`,
    positionsM: cut(p.positionsM),
    total: cut(p.total),
    parts: p.sublevels.map((s, i) => ({ id: `p${i}`, label: s.label, values: cut(p.perSublevel[i]!) })),
    peaks: p.peaks.map((k) => ({ positionM: k.positionM, height: k.totalHeight, members: k.members })),
    verdict: {
      resolved: p.allResolved,
      text:
        p.peaks.length <= 1
          ? 'one peak'
          : unresolved === 0
            ? `${p.peaks.length} peaks, all resolved`
            : `${unresolved} of ${p.pairs.length} neighbouring pairs not resolved`,
    },
  };
}

/**
 * The index range to draw: the slow-atom tail of an oven beam makes the computed grid far wider
 * than the peaks, so the view keeps the region above 1 % of the maximum plus a margin of 10 % of
 * its width (in position: the grid is not uniform).
 */
export function visibleRange(total: Float64Array, positionsM: Float64Array): [number, number] {
  let max = 0;
  for (const v of total) max = Math.max(max, v);
  if (!(max > 0) || total.length === 0) return [0, total.length];
  let first = 0;
  while (first < total.length && total[first]! < VIEW_FLOOR * max) first++;
  let last = total.length - 1;
  while (last > first && total[last]! < VIEW_FLOOR * max) last--;
  const margin = 0.1 * (positionsM[last]! - positionsM[first]!);
  const lo = positionsM[first]! - margin;
  const hi = positionsM[last]! + margin;
  while (first > 0 && positionsM[first - 1]! >= lo) first--;
  while (last < total.length - 1 && positionsM[last + 1]! <= hi) last++;
  return [first, last + 1];
}
