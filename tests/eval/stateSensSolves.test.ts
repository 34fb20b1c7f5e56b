/**
 * statesAt solves each m block of a level once (it used to solve the level twice: once for the
 * labels, once for the derivatives) and gives the same numbers as the two separate solves.
 */
import { describe, expect, it, vi } from 'vitest';

const solves = vi.hoisted(() => ({ count: 0 }));
vi.mock('../../server/src/physics/engine/blockSolver', async (importOriginal) => {
  const real = await importOriginal<typeof import('../../server/src/physics/engine/blockSolver')>();
  return { ...real, solveBlockAt: (...a: Parameters<typeof real.solveBlockAt>) => (solves.count++, real.solveBlockAt(...a)) };
});

import { buildLevelModel } from '../../server/src/physics/engine/buildModel';
import { solveLevel, type LevelSpec } from '../../server/src/physics/engine';
import { lowKey } from '../../server/src/physics/transitions/sublevelTag';
import { fromInput, levelDerivatives, throughParams, type ParamSensitivities } from '../../server/src/physics/uncertainty';
import { statesAt } from '../../server/src/eval/uncertainty/stateSens';

// A 87Rb-like ground level (J = 1/2, I = 3/2) and a fine-structure term, at fields in each regime.
const CASES: [string, LevelSpec, number][] = [
  ['J = 1/2, I = 3/2 at 0.1 T', { kind: 'hyperfine', twoJ: 1, twoI: 3, gJ: 2.00233, gI: -0.000995, A: 3.417e9 }, 0.1],
  ['J = 3/2, I = 7/2 with B at 20 G', { kind: 'hyperfine', twoJ: 3, twoI: 7, gJ: 1.3341, gI: -0.0004, A: 50.28e6, B: -0.49e6 }, 0.002],
];

describe('statesAt', () => {
  it.each(CASES)('%s: one solve per block, the same numbers as solveLevel + levelDerivatives', (_n, spec, fieldT) => {
    const params: ParamSensitivities = { A: fromInput({ id: 'A', label: 'A', value: 1, u: 1 }).sens, field: fromInput({ id: 'B', label: 'field', value: fieldT, u: 1e-6 }).sens };
    const blocks = buildLevelModel(spec).model!.blocks.length;
    solves.count = 0;
    const got = statesAt(spec, fieldT, params);
    expect(solves.count).toBe(blocks);
    // The reference: the level's labels from solveLevel, the derivatives from levelDerivatives, matched by index.
    const solved = solveLevel(spec, fieldT).states;
    const d = levelDerivatives(spec, fieldT).states;
    expect(got.byText.size).toBe(solved.length);
    solved.forEach((s, k) => {
      const v = got.byKey.get(lowKey(s.low))!;
      expect(got.byText.get(s.low.text)).toBe(v);
      expect(v.energyHz).toBe(s.energyHz);
      expect(v.energy).toEqual(throughParams(d[k]!.dE, params));
      expect(v.slope).toEqual(throughParams(d[k]!.dSlope, params));
    });
  });
});
