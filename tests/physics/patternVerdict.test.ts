/**
 * The verdict-only pattern (computePattern's `verdictOnly`, used by the advice's coarse screen)
 * must give the very numbers of the ordinary pattern: peak positions, dip ratios, the resolved
 * flags and the error issues, bit for bit, on invented oven and jet set-ups and on trial inputs
 * built by spreading a changed geometry over the input (the shapes the advice search makes).
 */
import { describe, expect, it } from 'vitest';
import { detectorPattern, type PatternInput } from '../../server/src/physics/beam';
import { computePattern, type DetectorPattern } from '../../server/src/physics/beam/detectorPattern';
import { adviceScenario } from '../fixtures/adviceScenarios';

function verdicts(p: DetectorPattern): unknown {
  return {
    peaks: p.peaks.map((q) => [q.positionM, q.fwhmM, q.height, q.totalHeight, q.memberIndices]),
    pairs: p.pairs,
    allResolved: p.allResolved,
    merged: p.mergedLonePeak,
    errors: p.issues.filter((i) => i.severity === 'error').map((i) => i.code),
  };
}

function trials(input: PatternInput): PatternInput[] {
  const g = input.geometry;
  return [
    input,
    { ...input, bins: 256 },
    { ...input, geometry: { ...g, gradientTPerM: 3 * g.gradientTPerM } },
    { ...input, bins: 256, geometry: { ...g, slit1M: 0.3 * g.slit1M, slit2M: 0.3 * g.slit2M } },
    { ...input, source: { kind: 'jet' as const, meanSpeed: 600, relativeSpread: 0.05 } },
    // An invalid change: the verdict must carry the same error.
    { ...input, geometry: { ...g, slit1M: -1 } },
  ];
}

describe('verdict-only detector pattern', () => {
  it('gives the same peaks, dips and errors as the full pattern, bit for bit', () => {
    let compared = 0;
    for (const [seed, index] of [[1, 0], [1, 14], [4, 5], [2, 1], [3, 9], [5, 2]] as const) {
      const input = adviceScenario(seed, index);
      const groups = detectorPattern(input).peaks.map((p) => p.memberIndices);
      for (const trial of trials(input)) {
        for (const fixed of [groups, undefined]) {
          const full = verdicts(computePattern(trial, fixed, false));
          // Twice: the second call reuses (and must clear) the work arrays of the first.
          expect(verdicts(computePattern(trial, fixed, false, true)), `scenario ${seed}/${index}`).toEqual(full);
          expect(verdicts(computePattern(trial, fixed, false, true))).toEqual(full);
          compared++;
        }
      }
    }
    expect(compared).toBe(72);
  });

  it('leaves out only what the verdict does not need', () => {
    const input = adviceScenario(1, 0);
    const full = computePattern(input, undefined, false);
    const verdict = computePattern(input, undefined, false, true);
    expect(full.maxima.length).toBeGreaterThan(0);
    expect(verdict.maxima).toEqual([]);
    expect(Array.from(verdict.total)).toEqual(Array.from(full.total));
  });
});
