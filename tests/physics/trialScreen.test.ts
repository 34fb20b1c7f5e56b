/**
 * The coarse screen of the resolving search (physics/beam/trialScreen.ts) may only claim "the
 * full pattern's worst dip is above the bar" when it is. Checked against the full 4,096-bin
 * pattern on invented oven and jet set-ups (tests/fixtures/adviceScenarios.ts) with the changes
 * the search tries; and it must actually fire where nothing can help (the generated file's beam).
 */
import { describe, expect, it } from 'vitest';
import { detectorPattern, type PatternInput } from '../../server/src/physics/beam';
import { computePattern } from '../../server/src/physics/beam/detectorPattern';
import { worstDip } from '../../server/src/physics/beam/pairDips';
import { certainlyAbove, screenable } from '../../server/src/physics/beam/trialScreen';
import { BOHR_MAGNETON, ATOMIC_MASS_UNIT } from '../../server/src/physics/constants';
import { adviceScenario } from '../fixtures/adviceScenarios';

const BARS = [0.8, 0.9, 0.95, 0.98];

/** The changed set-ups a search tries: a stronger gradient, a longer drift, narrower slits, a narrower jet. */
function trials(input: PatternInput): PatternInput[] {
  const g = input.geometry;
  return [
    ...[1.5, 5, 50].map((f) => ({ ...input, geometry: { ...g, gradientTPerM: f * g.gradientTPerM } })),
    ...[2, 10].map((f) => ({ ...input, geometry: { ...g, driftM: f * (g.driftM || g.magnetLengthM / 10) } })),
    ...[0.5, 0.1].map((f) => ({ ...input, geometry: { ...g, slit1M: f * g.slit1M, slit2M: f * g.slit2M } })),
    ...[0.1, 0.02].map((s) => ({ ...input, source: { kind: 'jet' as const, meanSpeed: 600, relativeSpread: s } })),
  ];
}

describe('coarse screen of resolving trials', () => {
  it('never claims a dip above the bar that the full pattern does not have', () => {
    let claims = 0;
    let checked = 0;
    for (const [seed, index] of [[1, 0], [1, 14], [4, 5], [4, 7], [4, 14], [4, 57], [2, 1], [3, 4], [3, 9], [5, 2]] as const) {
      const input = adviceScenario(seed, index);
      if (!screenable(input)) continue;
      const present = detectorPattern(input);
      const groups = present.peaks.map((p) => p.memberIndices);
      for (const trial of trials(input)) {
        const full = computePattern(trial, groups, false);
        if (full.pairs.length === 0) continue;
        checked++;
        for (const bar of BARS) {
          if (!certainlyAbove(trial, groups, bar)) continue;
          claims++;
          expect(worstDip(full), `scenario ${seed}/${index}, bar ${bar}`).toBeGreaterThan(bar);
        }
      }
    }
    expect(checked).toBeGreaterThan(40);
    expect(claims).toBeGreaterThan(20);
  });

  it('a single-speed beam is never screened', () => {
    expect(screenable({ ...adviceScenario(1, 0), source: { kind: 'single', speed: 500 } })).toBe(false);
  });

  it('fires on the eight close sublevels of an oven beam, where no change helps', () => {
    // Invented: 61 u from a 450 K oven, moments 0.3–1 μ_B on both sides, close enough that the
    // speed spread merges every neighbour (the generated benchmark file's beams are like this).
    const moments = [-1, -0.93, -0.86, -0.8, 0.3, 0.36, 0.42, 0.5];
    const input: PatternInput = {
      massKg: 61 * ATOMIC_MASS_UNIT,
      geometry: { slit1M: 80e-6, slit2M: 50e-6, slitSeparationM: 0.4, magnetLengthM: 0.06, driftM: 0.3, detectorWidthM: 25e-6, gradientTPerM: 120 },
      source: { kind: 'effusive', temperatureK: 450 },
      sublevels: moments.map((m, i) => ({ label: `s${i}`, momentJT: m * BOHR_MAGNETON, population: 1 })),
    };
    const present = detectorPattern(input);
    const groups = present.peaks.map((p) => p.memberIndices);
    expect(groups.length).toBeGreaterThan(2);
    const bar = worstDip(present) - 0.02;
    for (const trial of trials(input).slice(0, 7)) expect(certainlyAbove(trial, groups, bar)).toBe(true);
  });
});
