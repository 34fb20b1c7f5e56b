/**
 * The crossing search follows the sweep's energy order and scans only the
 * pairs whose order changes, near where it changes. Here it must report
 * exactly the crossings an exhaustive scan of every pair at every point
 * brackets (the rule of docs/engine.md: a sign change of E_a − E_b between
 * neighbouring points, differences within 1e-10 of the sweep's energy scale
 * counting as zero). The crossing fields themselves are checked against SciPy
 * in engine.sweep.test.ts.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { sweepLevel } from '../../server/src/physics/engine';
import type { HyperfineLevelSpec, SweepResult } from '../../server/src/physics/engine';
import { CS133_6P32, RB87_5S } from './engine.fixtures';

const FUZZ = Number(process.env.FUZZ_RUNS ?? 0);

/** Every bracketed sign change of every pair, as "a-b" (a < b), sorted. Pairs of one block never change sign. */
function exhaustive(sweep: SweepResult): string[] {
  const points = sweep.fieldsT.length;
  let scale = 0;
  for (const s of sweep.states) for (let p = 0; p < points; p++) scale = Math.max(scale, Math.abs(s.energyHz[p]));
  const tol = 1e-10 * scale + 1e-300;
  const out: string[] = [];
  sweep.states.forEach((a, i) => {
    sweep.states.forEach((b, j) => {
      if (j <= i) return;
      let last = 0;
      for (let p = 0; p < points; p++) {
        const d = a.energyHz[p] - b.energyHz[p];
        const side = d > tol ? 1 : d < -tol ? -1 : 0;
        if (side === 0) continue;
        if (last !== 0 && side !== last) out.push(`${i}-${j}`);
        last = side;
      }
    });
  });
  return out.sort();
}

const reported = (sweep: SweepResult): string[] => sweep.crossings.map((c) => `${Math.min(c.stateA, c.stateB)}-${Math.max(c.stateA, c.stateB)}`).sort();

describe('crossing search along the sweep = exhaustive pair scan', () => {
  it('Cs 6P3/2 0–1 T (39 crossings), 87Rb through zero field', () => {
    const cs = sweepLevel(CS133_6P32, 0, 1, 2001);
    expect(cs.crossings.length).toBe(39);
    expect(reported(cs)).toEqual(exhaustive(cs));
    const rb = sweepLevel(RB87_5S, -1e-4, 1e-4, 41);
    expect(rb.crossings.length).toBeGreaterThan(0);
    expect(reported(rb)).toEqual(exhaustive(rb));
  });

  it('a pair that crosses and crosses back between sweeps points is found both times', () => {
    // Coarse sweep of Cs 6P3/2 up and back down: each crossing is met twice.
    const up = sweepLevel(CS133_6P32, 0, 0.05, 101);
    const upAndDown = sweepLevel(CS133_6P32, -0.05, 0.05, 201);
    expect(reported(up)).toEqual(exhaustive(up));
    expect(reported(upAndDown)).toEqual(exhaustive(upAndDown));
    expect(upAndDown.crossings.length).toBeGreaterThan(up.crossings.length);
  });

  it('random levels and ranges', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 5 }),
        fc.integer({ min: 1, max: 7 }),
        fc.double({ min: 0.3, max: 2.5, noNaN: true }),
        fc.double({ min: -3e9, max: 3e9, noNaN: true }),
        fc.double({ min: -3e8, max: 3e8, noNaN: true }),
        fc.double({ min: -1, max: 1, noNaN: true }),
        fc.double({ min: -1, max: 1, noNaN: true }),
        fc.integer({ min: 2, max: 300 }),
        (twoJ, twoI, gJ, A, B, from, to, points) => {
          if (from === to) return;
          const spec: HyperfineLevelSpec = { kind: 'hyperfine', twoJ, twoI, gJ, gI: -0.0004, A, B };
          const sweep = sweepLevel(spec, from, to, points);
          expect(reported(sweep)).toEqual(exhaustive(sweep));
        },
      ),
      { numRuns: FUZZ || 100 },
    );
  });
});
