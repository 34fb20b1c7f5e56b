/**
 * One mirror-symmetry test (physics/mirrorSymmetry.ts) for the beam's merged peaks; its cases by
 * construction. Set FUZZ_RUNS to raise the number of drawn sets (default 200 per property).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { detectorPattern } from '../../server/src/physics/beam';
import { BOHR_MAGNETON } from '../../server/src/physics/constants';
import { mirrorSymmetric } from '../../server/src/physics/mirrorSymmetry';
import { MASS_39_U, SLIT_BEAM_GEOMETRY } from '../fixtures/slitBeamGeometry';

const RUNS = Number(process.env.FUZZ_RUNS ?? '') || 200;
const EPS = Number.EPSILON;
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
  it('two members a rounding apart with different weights balance as a group, whichever side lists which first', () => {
    // The review's case {1: w2, 1+2ε: w1, −1−2ε: w2, −1: w1}: by distance then weight the two sides
    // paired w2 with w1, though at that distance each side holds w1 + w2.
    expect(symmetric(pairs([1, 1 + 2 * EPS, -1 - 2 * EPS, -1], [0.2, 0.1, 0.2, 0.1]))).toBe(true);
    expect(symmetric(pairs([1, 1 + 2 * EPS, -1 - 2 * EPS, -1], [0.2, 0.1, 0.2, 0.15]))).toBe(false);
    // One member against two at the mirror distance: the same profile, so symmetric.
    expect(symmetric(pairs([1, -1, -1 - EPS], [0.5, 0.25, 0.25]))).toBe(true);
    // Groups stay apart when their distances differ by more than round-off (64 ε of the largest).
    expect(symmetric(pairs([1, 1 + 1e-9, -1 - 1e-9, -1], [0.2, 0.1, 0.2, 0.1]))).toBe(false);
  });
});

/** Members of a symmetric set: distinct distances, each with a few members mirrored one by one, and some at 0. */
const symmetricSet = fc
  .record({
    // Distances are whole multiples of the scale, so distinct ones are far apart next to round-off.
    scale: fc.integer({ min: -30, max: 10 }).map((e) => 10 ** e),
    groups: fc.uniqueArray(
      fc.record({ n: fc.integer({ min: 1, max: 1000 }), weights: fc.array(fc.double({ min: 1e-3, max: 10, noNaN: true }), { minLength: 1, maxLength: 3 }) }),
      { selector: (g) => g.n, minLength: 1, maxLength: 6 },
    ),
    onAxis: fc.array(fc.double({ min: 0, max: 10, noNaN: true }), { maxLength: 2 }),
    // Round-off of computing each member apart: a few ε of its own size.
    jitter: fc.array(fc.integer({ min: -4, max: 4 }), { minLength: 64, maxLength: 64 }),
  })
  .map(({ scale, groups, onAxis, jitter }) => {
    let j = 0;
    const rounded = (v: number): number => v * (1 + jitter[j++ % jitter.length]! * EPS);
    const items: { x: number; w: number }[] = [];
    for (const { n, weights } of groups) {
      for (const w of weights) {
        items.push({ x: rounded(n * scale), w: rounded(w) });
        items.push({ x: -rounded(n * scale), w: rounded(w) });
      }
    }
    for (const w of onAxis) items.push({ x: jitter[j++ % jitter.length]! * EPS * scale, w });
    return items;
  })
  .chain((items) => fc.shuffledSubarray(items, { minLength: items.length }));

describe('mirrorSymmetric on drawn sets', () => {
  it('a mirrored set with positions and weights a rounding off, in any order, is symmetric', () => {
    fc.assert(fc.property(symmetricSet, (items) => symmetric(items)), { numRuns: RUNS });
  });
  it('moving one weight off the axis by more than round-off breaks the symmetry', () => {
    const broken = symmetricSet.chain((items) => {
      // Those at 0 are their own mirror whatever their weight: move one off it.
      const largest = Math.max(...items.map((m) => Math.abs(m.x)));
      const off = items.flatMap((m, i) => (Math.abs(m.x) > 1e-6 * largest ? [i] : []));
      return fc.record({ items: fc.constant(items), i: fc.constantFrom(...off), by: fc.double({ min: 1e-6, max: 1, noNaN: true }) });
    });
    fc.assert(
      fc.property(broken, ({ items, i, by }) => {
        const moved = items.map((m, k) => (k === i ? { x: m.x, w: m.w * (1 + by) } : m));
        return !symmetric(moved);
      }),
      { numRuns: RUNS },
    );
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
  it('moments a rounding apart with different populations on each side (was refined to a rounding of 0)', () => {
    // Invented scenario, the review's case in moments: ±μ and ±μ(1 + 2ε), populations swapped between the sides.
    const mu = 1e-4 * BOHR_MAGNETON;
    const p = detectorPattern({
      massKg: MASS_39_U,
      geometry: SLIT_BEAM_GEOMETRY,
      source: { kind: 'effusive', temperatureK: 600 },
      sublevels: [
        { label: 'a', momentJT: mu, population: 2 },
        { label: 'b', momentJT: mu * (1 + 2 * EPS), population: 1 },
        { label: 'c', momentJT: -mu * (1 + 2 * EPS), population: 2 },
        { label: 'd', momentJT: -mu, population: 1 },
      ],
    });
    expect(p.peaks).toHaveLength(1);
    expect(p.peaks[0]!.positionM).toBe(0);
  });
});
