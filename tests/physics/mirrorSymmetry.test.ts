/** One mirror-symmetry test (physics/mirrorSymmetry.ts) for the beam's merged peaks; its cases by construction. */
import { describe, expect, it } from 'vitest';
import { detectorPattern } from '../../server/src/physics/beam';
import { BOHR_MAGNETON } from '../../server/src/physics/constants';
import { mirrorSymmetric } from '../../server/src/physics/mirrorSymmetry';
import { MASS_39_U, SLIT_BEAM_GEOMETRY } from '../fixtures/slitBeamGeometry';

const pairs = (xs: number[], ws: number[]) => xs.map((x, i) => ({ x, w: ws[i]! }));
const symmetric = (p: { x: number; w: number }[]) => mirrorSymmetric(p, (q) => q.x, (q) => q.w);

describe('mirrorSymmetric', () => {
  it('pairs ±x with equal weights, in any order; those at 0 are their own mirror whatever their weights', () => {
    expect(symmetric(pairs([3, -1, 1, -3], [0.2, 0.5, 0.5, 0.2]))).toBe(true);
    expect(symmetric(pairs([0, 2, 0, -2], [0.1, 0.4, 0.3, 0.4]))).toBe(true);
    expect(symmetric(pairs([0], [1]))).toBe(true);
    expect(symmetric([])).toBe(true);
    // Two components at each of ±x, their weights listed in different orders.
    expect(symmetric(pairs([-1, -1, 1, 1], [0.1, 0.3, 0.3, 0.1]))).toBe(true);
  });
  it('is false for unequal weights, an unpaired position, or positions apart by more than round-off', () => {
    expect(symmetric(pairs([-1, 1], [0.5, 0.6]))).toBe(false);
    expect(symmetric(pairs([-1, 1, 2], [0.5, 0.5, 0.1]))).toBe(false);
    expect(symmetric(pairs([-1, 1 + 1e-12], [0.5, 0.5]))).toBe(false);
    // Computed apart, a pair matches to a few ε of the largest: 64 ε is allowed (physics/roundOff.ts).
    expect(symmetric(pairs([-1, 1 + 8 * Number.EPSILON], [0.5, 0.5 + 4 * Number.EPSILON]))).toBe(true);
  });
});

describe('a merged beam peak symmetric about the axis is at 0 exactly', () => {
  it('a ±μ pair with two undeflected sublevels of different populations (was refined to a rounding of 0)', () => {
    // Invented scenario: moments ±1e-4 μ_B merge with the undeflected ones into one peak at the axis.
    const mu = 1e-4 * BOHR_MAGNETON;
    const p = detectorPattern({
      massKg: MASS_39_U,
      geometry: SLIT_BEAM_GEOMETRY,
      source: { kind: 'effusive', temperatureK: 600 },
      sublevels: [
        { label: 'a', momentJT: 0, population: 1 },
        { label: 'b', momentJT: mu, population: 2 },
        { label: 'c', momentJT: 0, population: 3 },
        { label: 'd', momentJT: -mu, population: 2 },
      ],
    });
    expect(p.peaks).toHaveLength(1);
    expect(p.peaks[0]!.positionM).toBe(0);
  });
});
