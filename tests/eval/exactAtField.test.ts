/**
 * The (level, field) memo of the exact evaluation: an equal level at an equal field is solved
 * once; the states are shared, and each level's table at a field is a copy of its own.
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

import { analyze } from '../../server/src/eval/analyze';
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

  it('shares the states, and gives each level a table of its own to add to', () => {
    expect(exactAtField(spec(), 0.03)).toBe(exactAtField(spec(), 0.03));
    // Two equal levels at one field: the uncertainty pass writes into one table, the other stays as it was.
    const r = analyze(['species A', '  I = 3/2', '  g_I = -0.000995', '  level g: 5s 2S1/2  A = 3417.34 MHz', 'species B', '  I = 3/2', '  g_I = -0.000995', '  level g: 5s 2S1/2  A = 3417.34 MHz', 'field f = 3 G'].join('\n')).result!;
    const [a, b] = r.levels.map((l) => l.at_fields[0]!.exact);
    expect(a).toEqual(b);
    expect(a).not.toBe(b);
    a![0]!.energy_Hz_unc = 1;
    expect(b![0]!.energy_Hz_unc).toBeUndefined();
    expect(exactAtField(spec(), 0.0003).exact[0]!.energy_Hz_unc).toBeUndefined();
  });
});
