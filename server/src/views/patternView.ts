/**
 * Detector-pattern diagram data for one beam, from its evaluation. The whole computed grid is
 * passed on (the figure picks its own window around every counted peak; exports never trim),
 * and the peaks are exactly the ones the beam report counts.
 */
import type { BeamEvaluation } from '../eval/beamEvaluation';
import type { PatternViewData } from '../render';

export function patternView(beamName: string, e: BeamEvaluation): PatternViewData | undefined {
  const p = e.pattern;
  if (!p || !e.result.computed) return undefined;
  const unresolved = p.pairs.filter((x) => !x.resolved).length;
  return {
    title: `beam ${beamName}: ${e.result.species ?? ''} ${e.result.level ?? ''} on the detector`,
    positionsM: p.positionsM,
    total: p.total,
    parts: p.sublevels.map((s, i) => ({ id: `p${i}`, label: s.label, values: p.perSublevel[i]! })),
    peaks: p.peaks.map((k) => ({ positionM: k.positionM, height: k.totalHeight, fwhmM: k.fwhmM, members: k.members })),
    verdict: {
      resolved: p.allResolved,
      text:
        p.peaks.length <= 1
          ? onePeakText(p.peaks[0]?.members.length ?? 0)
          : unresolved === 0
            ? `${p.peaks.length} peaks, all resolved`
            : `${p.peaks.length} peaks; ${unresolved} of ${p.pairs.length} neighbouring pairs not resolved`,
    },
  };
}

/** A lone peak says how many states it holds: with several, the magnet separates none of them. */
function onePeakText(states: number): string {
  return states > 1 ? `one peak: all ${states} states with atoms land together` : 'one peak';
}
