/**
 * The cancellation floor of a magnetised block (eval/cleanField.ts) is the round-off of its
 * closed form at the point, which scales with the distance to the block's nearest edge, not with
 * the block's thickness: far from a thin film its small gradients are values, not round-off.
 * Reference: tests/reference/thin_film_gradient.json (scripts/reference/thin_film_gradient.py:
 * mpmath at 50 digits, checked against mpmath quadrature of the surface-charge integral).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { cleanField, distanceToNearestEdge } from '../../server/src/eval/cleanField';
import { sumField } from '../../server/src/physics/fields';
import type { SlabSpec, Vec3 } from '../../server/src/physics/fields/types';

interface FilmCase {
  magnetisation: string;
  magnetisationT: Vec3;
  distanceM: number;
  point: Vec3;
  gradient: number[][];
}
const REF: { sizeM: Vec3; cases: FilmCase[]; quadratureChecks: { relativeDifference: number }[] } = JSON.parse(readFileSync('tests/reference/thin_film_gradient.json', 'utf8'));

const film = (magnetisationT: Vec3): SlabSpec => ({ kind: 'slab', centre: [0, 0, 0], sizeM: REF.sizeM, magnetisationT });

describe('a thin film (10 mm × 10 mm × 1 µm, 1 T) from 1 mm to 10 cm', () => {
  it('the reference: its closed form at 50 digits agrees with quadrature of the surface integral', () => {
    expect(REF.quadratureChecks.length).toBeGreaterThanOrEqual(24);
    for (const c of REF.quadratureChecks) expect(c.relativeDifference).toBeLessThan(1e-15);
  });

  it.each(REF.cases.map((c) => [c.magnetisation, c.distanceM, c] as const))('magnetised %s, %s m away: every gradient component as mpmath gives it, none zeroed', (_m, _d, c) => {
    const sample = cleanField([film(c.magnetisationT)], sumField)(c.point);
    if (!('sample' in sample)) throw new Error('the point is off the film');
    const largest = Math.max(...c.gradient.flat().map(Math.abs));
    for (let i = 0; i < 3; i++) {
      for (let j = 0; j < 3; j++) {
        const want = c.gradient[i]![j]!;
        const got = sample.sample.gradient[i]![j]!;
        // The closed form's round-off grows as the film's two faces cancel (~1e-5 of either at 10 cm): measured
        // 8e-10 of the largest component at 10 cm, 4e-12 at 1 mm. Before the floor followed the distance, every
        // component at 10 cm (and one at 3 cm) printed 0.
        expect(Math.abs(got - want)).toBeLessThanOrEqual(1e-8 * largest);
        expect(got).not.toBe(0);
      }
    }
  });

  it('still zeroes what cancels exactly: on the film\'s axis the off-diagonal gradient is 0 by symmetry', () => {
    for (const d of [1e-3, 1e-2, 1e-1]) {
      const sample = cleanField([film([0, 0, 1])], sumField)([0, 0, d]);
      if (!('sample' in sample)) throw new Error('the point is off the film');
      const G = sample.sample.gradient;
      expect([G[0][1], G[0][2], G[1][2], G[1][0], G[2][0], G[2][1]]).toEqual([0, 0, 0, 0, 0, 0]);
      expect(G[2][2]).toBeLessThan(0);
    }
  });
});

describe('distance to the nearest edge of a box (Pythagoras)', () => {
  const c: Vec3 = [0, 0, 0];
  const s: Vec3 = [2, 4, 6];
  it('inside, on a face\'s normal, beyond a corner, beside an edge', () => {
    // Centre: the nearest edges are the ones along z, at (±1, ±2): √5.
    expect(distanceToNearestEdge(c, s, [0, 0, 0])).toBeCloseTo(Math.sqrt(5), 14);
    // Beyond the corner (1, 2, 3) by (3, 4, 12): 13.
    expect(distanceToNearestEdge(c, s, [4, 6, 15])).toBeCloseTo(13, 13);
    // Beside the edge along z at (1, 2), mid-height, 3 and 4 away: 5.
    expect(distanceToNearestEdge(c, s, [4, 6, 0])).toBeCloseTo(5, 14);
    // Above the middle of the top face z = 3, by 1: the nearest edges are along y at x = ±1, z = 3: √2.
    expect(distanceToNearestEdge(c, s, [0, 0, 4])).toBeCloseTo(Math.sqrt(2), 14);
  });
});
