/**
 * A level's two regime limits travel as two recipes that share one point (spec and field): after the
 * worker's packing, reading both searches the regime once, not once per limit.
 */
import { describe, expect, it, vi } from 'vitest';

const calls = vi.hoisted(() => ({ n: 0 }));
vi.mock('../../server/src/physics/engine', async (original) => {
  const engine = await original<typeof import('../../server/src/physics/engine')>();
  return { ...engine, regime: (...args: Parameters<typeof engine.regime>) => (calls.n++, engine.regime(...args)) };
});

const { analyze } = await import('../../server/src/eval/analyze');
const { packResult, unpackResult } = await import('../../server/src/service/resultHandOff');

// A hyperfine level at one field (constants as in tests/fixtures/diff/beam-one-peak.sublevel).
const TEXT = 'species Li7\n  level upper: 2p 2P°3/2  A = -3.055 MHz  B = -0.221 MHz\nfield f = 10 nT\n';

describe('regime limits after the hand-off', () => {
  it('both limits of a level at a field come from one regime search', () => {
    const result = analyze(TEXT).result!;
    const unpacked = unpackResult(packResult(result)!);
    const regimeJson = unpacked.levels[0]!.at_fields[0]!.regime!;
    calls.n = 0;
    const linear = regimeJson.linear_limit_T;
    const strong = regimeJson.strong_limit_T;
    expect(calls.n).toBe(1);
    // The same limits as read where they were judged.
    const here = analyze(TEXT).result!.levels[0]!.at_fields[0]!.regime!;
    expect(linear).toBe(here.linear_limit_T);
    expect(strong).toBe(here.strong_limit_T);
  });
});
