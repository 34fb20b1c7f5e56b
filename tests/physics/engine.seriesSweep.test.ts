/**
 * Sweeps by perturbation series (the default) against an exact solve at every
 * field, and against NumPy. The exact route is the engine's own solver, checked
 * against NumPy eigh in engine.reference.test.ts; here the series route must
 * reproduce it at every field — energies, moments, curvatures, and the same
 * states in the same order with the same labels — including sweeps through
 * zero field, near-degenerate blocks and crossings between blocks.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { BOHR_MAGNETON_HZ_PER_T, PLANCK_H } from '../../server/src/physics/constants';
import { breitRabi, sweepLevel } from '../../server/src/physics/engine';
import type { FineTermSpec, HyperfineLevelSpec, LevelSpec, SweepResult } from '../../server/src/physics/engine';
import { CS133_6P32, GROUND_LEVELS } from './engine.fixtures';
import { LI7_2P, RB87_5P } from './engine.wholeTerm.fixtures';

const FUZZ = Number(process.env.FUZZ_RUNS ?? 0);

/**
 * Largest disagreement between two sweeps of the same spec, relative to each quantity's scale
 * over the sweep (never less than 1e-280: below that the values are subnormal round-off of zero).
 */
function disagreement(a: SweepResult, b: SweepResult): { energy: number; moment: number; curvature: number } {
  let eScale = 1e-280;
  let mScale = 1e-280;
  let cScale = 1e-280;
  for (const s of b.states) {
    for (let p = 0; p < b.fieldsT.length; p++) {
      eScale = Math.max(eScale, Math.abs(s.energyHz[p]));
      mScale = Math.max(mScale, Math.abs(s.momentJT[p]));
      cScale = Math.max(cScale, Math.abs(s.d2EdB2?.[p] ?? 0));
    }
  }
  let energy = 0;
  let moment = 0;
  let curvature = 0;
  a.states.forEach((s, i) => {
    const t = b.states[i];
    for (let p = 0; p < a.fieldsT.length; p++) {
      energy = Math.max(energy, Math.abs(s.energyHz[p] - t.energyHz[p]) / eScale);
      moment = Math.max(moment, Math.abs(s.momentJT[p] - t.momentJT[p]) / mScale);
      if (s.d2EdB2 && t.d2EdB2) curvature = Math.max(curvature, Math.abs(s.d2EdB2[p] - t.d2EdB2[p]) / cScale);
    }
  });
  return { energy, moment, curvature };
}

/**
 * Largest ‖H‖ / gap over the sweep's blocks (states of one m) and points: eigenvectors, and so moments and
 * curvatures, are known only to about ε‖H‖/gap (first-order eigenvector perturbation; Golub & Van Loan,
 * Matrix Computations, §8.1 — from memory), whichever route computes them. Gaps below 1e-9 of the block's
 * scale are left out: there neither route expands a series, both solve exactly (perturbationSeries.ts).
 */
function conditionOf(sweep: SweepResult): number {
  const byM = new Map<number, SweepResult['states']>();
  for (const s of sweep.states) byM.set(s.twoM, [...(byM.get(s.twoM) ?? []), s]);
  let worst = 1;
  for (const states of byM.values()) {
    for (let p = 0; p < sweep.fieldsT.length; p++) {
      const e = states.map((s) => s.energyHz[p]).sort((x, y) => x - y);
      const scale = Math.max(...e.map(Math.abs));
      for (let k = 1; k < e.length; k++) {
        const gap = e[k] - e[k - 1];
        if (gap > 1e-9 * scale) worst = Math.max(worst, scale / gap);
      }
    }
  }
  return worst;
}

function expectSameSweep(spec: LevelSpec, fromT: number, toT: number, points: number, tolerance = 1e-10): void {
  const options = { crossings: false, curvature: true } as const;
  const series = sweepLevel(spec, fromT, toT, points, options);
  const exact = sweepLevel(spec, fromT, toT, points, { ...options, method: 'per-field' });
  expect(series.issues).toEqual(exact.issues);
  // Same states in the same order, with the same labels.
  expect(series.states.map((s) => [s.twoM, s.low.text, s.high.text])).toEqual(exact.states.map((s) => [s.twoM, s.low.text, s.high.text]));
  const d = disagreement(series, exact);
  // Energies are as well conditioned as the matrix (Weyl); moments and curvatures as its eigenvectors.
  const vectorTolerance = Math.max(tolerance, 16 * Number.EPSILON * conditionOf(exact));
  expect(d.energy).toBeLessThanOrEqual(tolerance);
  expect(d.moment).toBeLessThanOrEqual(vectorTolerance);
  expect(d.curvature).toBeLessThanOrEqual(vectorTolerance);
}

describe('series sweep = an exact solve at every field', () => {
  it('Cs 6P3/2 over 0–0.1 T and 0–1 T (2001 points, 39 crossings between blocks): within 1e-14 of the scales', () => {
    // Measured 4.7e-16 (energy), 2.1e-15 (moment), 2.9e-15 (curvature).
    expectSameSweep(CS133_6P32, 0, 0.1, 2001, 1e-14);
    expectSameSweep(CS133_6P32, 0, 1, 2001, 1e-14);
  });

  it('blocks up to order 16 (J = I = 15/2 with B and C), downwards through zero', () => {
    const big: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 15, twoI: 15, gJ: 1.2, gI: 0.0002, A: 300e6, B: -50e6, C: 1e5 };
    expectSameSweep(big, 0.2, -0.05, 301, 1e-12);
  });

  it('whole terms (⁸⁷Rb 5P, ⁷Li 2P: J levels THz or GHz apart, hyperfine MHz) over 0–1 T and through zero', () => {
    // The moments of these blocks carry an exact solve's round-off of about ε·(THz)/(MHz) (blockSweep.ts):
    // measured 7e-12 (0–1 T) and 3.1e-11 (through zero) between the two routes, 9e-12 before the series
    // allowed for it. Against 40-digit eigenvectors (mpmath, of the same blocks, 12 fields of the sweep
    // through zero, checked once while writing this) the series was 5.8e-12 off and the per-field solve 7.9e-12.
    const d = (spec: LevelSpec, from: number, to: number, points: number) => {
      const options = { crossings: false, curvature: true } as const;
      const series = sweepLevel(spec, from, to, points, options);
      const exact = sweepLevel(spec, from, to, points, { ...options, method: 'per-field' });
      expect(series.issues).toEqual(exact.issues);
      expect(series.states.map((s) => s.high.text)).toEqual(exact.states.map((s) => s.high.text));
      return disagreement(series, exact);
    };
    for (const [spec, from, to, points] of [[RB87_5P, 0, 1, 2001], [RB87_5P, 0.05, -0.02, 701], [LI7_2P, 0, 1, 2001]] as const) {
      const e = d(spec, from, to, points);
      expect(e.energy).toBeLessThanOrEqual(1e-14);
      expect(e.moment).toBeLessThanOrEqual(1e-10);
      expect(e.curvature).toBeLessThanOrEqual(1e-9);
    }
  });

  it('blocks of order 1 and 2 in closed form (J = 1/2 levels): the Breit–Rabi formula, and the exact solve to 1e-14', () => {
    // Every block of a J = 1/2 level has order 1 or 2, so the whole sweep takes smallBlockSweep.ts.
    for (const [name, spec] of GROUND_LEVELS) {
      const sweep = sweepLevel(spec, -0.3, 0.5, 801, { crossings: false, curvature: true });
      expect(sweep.issues, name).toEqual([]);
      const splitting = Math.abs(spec.A) * (spec.twoI + 1);
      for (let p = 0; p < sweep.fieldsT.length; p += 20) {
        const closed = breitRabi(spec, sweep.fieldsT[p]).states.map((c) => c.energyHz).sort((x, y) => x - y);
        const ours = sweep.states.map((st) => st.energyHz[p]).sort((x, y) => x - y);
        ours.forEach((e, k) => expect(Math.abs(e - closed[k]), `${name} at ${sweep.fieldsT[p]} T`).toBeLessThanOrEqual(1e-12 * splitting + 1e-12 * Math.abs(closed[k])));
      }
      expectSameSweep(spec, -0.3, 0.5, 801, 1e-14);
      expectSameSweep(spec, 0, 2e-3, 401, 1e-14);
    }
    // A level whose 2 × 2 blocks have no coupling (ζ = 0) and fields whose squares underflow: solved exactly there.
    expectSameSweep({ kind: 'fine', twoS: 1, L: 1, zeta: 0, gL: 1, gS: 2.0023 }, 0, -2.5e-172, 2, 0);
  });

  it('a quadrupole-only level (A = 0): zero-field levels of different F degenerate inside a block', () => {
    // For J = 3/2, I = 3/2 the quadrupole energies of F = 0 and F = 2 … are not all different,
    // so some blocks are exactly degenerate at B = 0 and nearly so close to it.
    const quad: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 3, twoI: 3, gJ: 1.33, gI: 0.0005, A: 0, B: 20e6 };
    expectSameSweep(quad, -0.01, 0.01, 401);
    expectSameSweep({ ...quad, A: 1e-3 }, -0.01, 0.01, 401);
  });

  it('an octupole-only level at 1e-19 T: gaps of 5e-9 of the block scale, curvatures to their conditioning', () => {
    // Found by the random sweep below: zero-field energies of different F degenerate inside a block,
    // split by a Zeeman term 1e-9 of them; the two routes' curvatures differ by 2.1e-8 of the scale,
    // which ε‖H‖/gap (2e8 ε = 4e-8) allows and 1e-10 did not.
    const spec: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 7, twoI: 3, gJ: 0.001, gI: 1e-7, A: 0, B: 0, C: 0.001 };
    expectSameSweep(spec, 4.040305317569305e-19, 0, 270);
  });

  it('random levels and ranges, hyperfine and fine, through zero and near-degeneracies', () => {
    // Zero or a magnitude in [lo, hi] of either sign (subnormal constants only test round-off of zero).
    const signed = (lo: number, hi: number) =>
      fc.oneof(fc.constant(0), fc.tuple(fc.double({ min: lo, max: hi, noNaN: true }), fc.boolean()).map(([x, neg]) => (neg ? -x : x)));
    const hyperfine = fc.record({
      kind: fc.constant('hyperfine' as const),
      twoJ: fc.integer({ min: 1, max: 7 }),
      twoI: fc.integer({ min: 1, max: 9 }),
      gJ: signed(1e-3, 2.5),
      gI: signed(1e-7, 0.01),
      // A from 0 (quadrupole-dominated, near-degenerate blocks) to large, either sign
      A: signed(1, 2e9),
      B: signed(1, 5e8),
      C: signed(1e-3, 1e5),
    });
    const fine = fc.record({
      kind: fc.constant('fine' as const),
      twoS: fc.integer({ min: 1, max: 6 }),
      L: fc.integer({ min: 0, max: 4 }),
      zeta: signed(1, 1e12),
      gL: fc.constant(1),
      gS: fc.double({ min: 1.9, max: 2.1, noNaN: true }),
    });
    fc.assert(
      fc.property(
        fc.oneof(hyperfine, fine),
        fc.double({ min: -2, max: 2, noNaN: true }),
        fc.double({ min: -2, max: 2, noNaN: true }),
        fc.integer({ min: 2, max: 400 }),
        (spec: HyperfineLevelSpec | FineTermSpec, from, to, points) => {
          if (from === to) return;
          expectSameSweep(spec, from, to, points);
        },
      ),
      { numRuns: FUZZ || 150 },
    );
  });
});

describe('series sweep against NumPy eigh (tests/reference/engine_cs6p32.json)', () => {
  const ref = JSON.parse(readFileSync(path.join(__dirname, '../reference/engine_cs6p32.json'), 'utf8')) as {
    level: Omit<HyperfineLevelSpec, 'kind'>;
    results: { fieldT: number; states: { energyHz: number; slopeHzPerT: number }[] }[];
  };

  it('energies and slopes at the reference fields, taken from one 20001-point sweep 0–1 T, to 1e-9', () => {
    const sweep = sweepLevel({ kind: 'hyperfine', ...ref.level }, 0, 1, 20001, { crossings: false });
    for (const r of ref.results) {
      const p = Math.round(r.fieldT * 20000);
      expect(sweep.fieldsT[p]).toBe(r.fieldT);
      // NumPy's states are sorted by energy at that field; sort ours the same way.
      const ours = sweep.states.map((s) => ({ e: s.energyHz[p], slope: -s.momentJT[p] / PLANCK_H })).sort((x, y) => x.e - y.e);
      r.states.forEach((e, k) => {
        expect(Math.abs(ours[k].e - e.energyHz)).toBeLessThanOrEqual(Math.max(1e-9 * Math.abs(e.energyHz), 1e-3));
        if (r.fieldT === 0) return; // degenerate m within one F: slopes belong to NumPy's own mixtures
        expect(Math.abs(ours[k].slope - e.slopeHzPerT)).toBeLessThanOrEqual(Math.max(1e-9 * Math.abs(e.slopeHzPerT), 1e-6 * BOHR_MAGNETON_HZ_PER_T));
      });
    }
  });
});
