/**
 * The (level, field) memo of the exact evaluation: an equal level at an equal field is solved
 * once, and each caller gets states of its own to add to.
 */
import { describe, expect, it, vi } from 'vitest';

const calls = vi.hoisted(() => ({ solve: 0 }));
vi.mock('../../server/src/physics/engine', async (importOriginal) => {
  const e = await importOriginal<typeof import('../../server/src/physics/engine')>();
  return {
    ...e,
    solveLevel: (...a: Parameters<typeof e.solveLevel>) => {
      calls.solve++;
      return e.solveLevel(...a);
    },
  };
});

import { exactAtField } from '../../server/src/eval/exactAtField';
import type { HyperfineLevelSpec } from '../../server/src/physics/engine';

// An alkali-like 2S1/2 level with I = 3/2 (invented constants).
const spec = (): HyperfineLevelSpec => ({ kind: 'hyperfine', twoJ: 1, twoI: 3, gJ: 2.0023, gI: -0.000995, A: 3417.34e6 });

describe('exactAtField memo', () => {
  it('solves an equal level at an equal field once', () => {
    calls.solve = 0;
    const a = exactAtField(spec(), 0.01);
    const b = exactAtField(spec(), 0.01);
    expect(calls.solve).toBe(1);
    expect(b).toEqual(a);
    expect(a.exact).toHaveLength(8); // (2J+1)(2I+1)
    exactAtField(spec(), 0.02);
    exactAtField({ ...spec(), A: 3417.35e6 }, 0.01);
    expect(calls.solve).toBe(3);
  });

  it('gives each caller its own states', () => {
    const a = exactAtField(spec(), 0.03);
    a.exact[0]!.linear_energy_Hz = 1;
    expect(exactAtField(spec(), 0.03).exact[0]!.linear_energy_Hz).toBeUndefined();
  });
});
