/**
 * The cancellation floor of a magnetised block (eval/cleanField.ts) is the round-off its closed form
 * leaves at the point (physics/fields/slabField.ts, slabFieldWithRoundOff), not a rule by distance:
 * a thin film's far field and gradient, 1e-15 T and 1e-16 T/m at 10 m, are values and print as such,
 * while components that vanish by symmetry stay exactly 0, and B and the gradient are each kept or
 * zeroed whole.
 * Reference: tests/reference/thin_film_gradient.json (scripts/reference/thin_film_gradient.py:
 * mpmath at 50 digits, checked against mpmath quadrature of the surface-charge integral and, far
 * away, against the point dipole of the same moment).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { cleanField } from '../../server/src/eval/cleanField';
import { slabFieldWithRoundOff } from '../../server/src/physics/fields';
import type { SlabSpec, Vec3 } from '../../server/src/physics/fields/types';

interface FilmCase {
  magnetisation: string;
  magnetisationT: Vec3;
  direction: 'generic' | 'axis';
  distanceM: number;
  point: Vec3;
  B: number[];
  gradient: number[][];
  dipoleRelativeDifference: number;
}
const REF: { sizeM: Vec3; cases: FilmCase[]; quadratureChecks: { relativeDifference: number }[] } = JSON.parse(readFileSync('tests/reference/thin_film_gradient.json', 'utf8'));

const film = (magnetisationT: Vec3): SlabSpec => ({ kind: 'slab', centre: [0, 0, 0], sizeM: REF.sizeM, magnetisationT });

function cleaned(c: FilmCase): { B: number[]; G: number[] } {
  const s = cleanField([film(c.magnetisationT)])(c.point);
  if (!('sample' in s)) throw new Error('the point is off the film');
  return { B: [...s.sample.B], G: s.sample.gradient.flat() };
}

/** Each component as the reference gives it: within the closed form's round-off bound, symmetry zeros exactly 0. */
function expectMatches(got: number[], want: number[], bound: number): void {
  for (let i = 0; i < want.length; i++) {
    if (want[i] === 0) expect(got[i]).toBe(0);
    else {
      expect(got[i]).not.toBe(0);
      expect(Math.abs(got[i]! - want[i]!)).toBeLessThanOrEqual(bound);
    }
  }
}

describe('a thin film (10 mm × 10 mm × 1 µm, 1 T) from 1 mm to 10 m', () => {
  it('the reference: its closed form at 50 digits agrees with quadrature and, far away, with the point dipole', () => {
    expect(REF.quadratureChecks.length).toBeGreaterThanOrEqual(24);
    for (const c of REF.quadratureChecks) expect(c.relativeDifference).toBeLessThan(1e-15);
    // The dipole is the far limit: its relative difference falls as (size/distance)², ~1e-6 at 10 m.
    for (const c of REF.cases.filter((c) => c.distanceM >= 1)) expect(c.dipoleRelativeDifference).toBeLessThan(1e-4 / c.distanceM ** 2);
    expect(REF.cases.filter((c) => c.distanceM === 10)).toHaveLength(6);
  });

  it.each(REF.cases.map((c) => [c.magnetisation, c.direction, c.distanceM, c] as const))('magnetised %s, %s direction, %s m away: B and the gradient as mpmath gives them, nothing zeroed but symmetry zeros', (_m, _w, _d, c) => {
    const { roundOff } = slabFieldWithRoundOff(film(c.magnetisationT), c.point);
    const { B, G } = cleaned(c);
    expectMatches(B, c.B, roundOff.B);
    expectMatches(G, c.gradient.flat(), roundOff.gradient);
    // The bound stays below every value it guards, so none is zeroed: at 10 m it is ~5e-16 T against a
    // field of ~1e-14 T (its smallest component 2.9e-15 T), while the actual error there is ~2e-17 T.
    const smallest = (v: number[]): number => Math.min(...v.filter((x) => x !== 0).map(Math.abs));
    expect(roundOff.B).toBeLessThan(0.5 * smallest(c.B));
    expect(roundOff.gradient).toBeLessThan(0.5 * smallest(c.gradient.flat()));
  });

  it('at 2 m along (0.36, 0.48, 0.8), magnetised along its normal: B has the reference\'s direction, not one component of it', () => {
    // Before, B printed (0, 1.146e-12, 0) T here, and 0 from 3 m on.
    const c = REF.cases.find((c) => c.magnetisation === 'normal' && c.direction === 'generic' && c.distanceM === 2)!;
    const { B } = cleaned(c);
    const norm = (v: number[]): number => Math.hypot(...v);
    const cos = B.reduce((s, v, i) => s + v * c.B[i]!, 0) / (norm(B) * norm(c.B));
    expect(1 - cos).toBeLessThan(1e-6);
  });
});

describe('exact cancellations still print 0', () => {
  it('the centre of an off-origin block (50 × 20 × 6 mm at (13, −70, 31) mm): every derivative is 0 by symmetry, B is kept', () => {
    const block: SlabSpec = { kind: 'slab', centre: [0.013, -0.07, 0.031], sizeM: [0.05, 0.02, 0.006], magnetisationT: [0, 0, 1.2] };
    const s = cleanField([block])(block.centre);
    if (!('sample' in s)) throw new Error('the centre is inside, not on the block');
    expect(s.sample.gradient.flat()).toEqual([0, 0, 0, 0, 0, 0, 0, 0, 0]);
    // Inside: B = J − N·J with N the block's demagnetising factor along z (about 0.68 for this shape, textbook order of magnitude).
    expect(s.sample.B[2]).toBeGreaterThan(0.2);
    expect(s.sample.B[2]).toBeLessThan(0.6);
  });

  it('two equal blocks magnetised against each other, midway between them: B is 0 as a whole', () => {
    const a: SlabSpec = { kind: 'slab', centre: [0.02, 0.3, -0.1], sizeM: [0.01, 0.01, 0.01], magnetisationT: [0.3, 0.4, 1] };
    const b: SlabSpec = { ...a, centre: [0.04, 0.3, -0.1], magnetisationT: [-0.3, -0.4, -1] };
    const s = cleanField([a, b])([0.03, 0.3, -0.1]);
    if (!('sample' in s)) throw new Error('the midpoint is off both blocks');
    expect(s.sample.B).toEqual([0, 0, 0]);
  });
});
