import { describe, expect, it } from 'vitest';
import { BOHR_MAGNETON_HZ_PER_T } from '../../server/src/physics/constants';
import { paschenBackLimit, solveLevel } from '../../server/src/physics/engine';
import type { HighFieldLabel, HyperfineLevelSpec, LevelSpec } from '../../server/src/physics/engine';
import { CS133_6P32, RB87_5S } from './engine.fixtures';

function key(h: HighFieldLabel): string {
  return h.text;
}

/** Largest |E_matrix − E_PB| over all states at one field, matching by the adiabatic high-field label. */
function worstMiss(spec: LevelSpec, fieldT: number): number {
  const exact = solveLevel(spec, fieldT);
  const pb = new Map(paschenBackLimit(spec, fieldT).states.map((s) => [key(s.high), s.energyHz]));
  expect(pb.size).toBe(exact.states.length);
  let worst = 0;
  for (const s of exact.states) {
    const e = pb.get(key(s.high));
    expect(e, s.high.text).toBeDefined();
    worst = Math.max(worst, Math.abs(s.energyHz - (e as number)));
  }
  return worst;
}

describe('strong-field (Paschen–Back) limit', () => {
  it('the zero-field matrix has exactly the first-order strong-field energies on its diagonal (A m_I m_J + quadrupole term)', () => {
    // At B where the Zeeman term dominates, E − E_PB is second order in A/(μ_B B):
    // check that it falls as 1/B (ratio of misses at B and 10B ≈ 10).
    const m1 = worstMiss(CS133_6P32, 2);
    const m10 = worstMiss(CS133_6P32, 20);
    expect(m10).toBeGreaterThan(0);
    expect(m1 / m10).toBeGreaterThan(9);
    expect(m1 / m10).toBeLessThan(11);
  });

  it('87Rb 5S1/2 at 10 T: the miss stays below ΔE/(2x), the size of the next term of the Breit–Rabi expansion', () => {
    // Expanding sqrt(1 + 4mx/(2I+1) + x²) for large x gives x + 2m/(2I+1) + (1 − 4m²/(2I+1)²)/(2x) + …;
    // the last term, times ΔE/2, is what the strong-field formula leaves out (≤ ΔE/(4x)).
    const b = 10;
    const dE = RB87_5S.A * 2;
    const x = ((RB87_5S.gJ - RB87_5S.gI) * BOHR_MAGNETON_HZ_PER_T * b) / dE;
    const miss = worstMiss(RB87_5S, b);
    expect(miss).toBeLessThan(dE / (4 * x) * 1.01);
    expect(miss).toBeGreaterThan(dE / (4 * x) * 0.5);
  });

  it('the ordering of strong-field labels follows the Zeeman term sign(B)·(g_J m_J + g_I m_I)', () => {
    for (const sign of [1, -1]) {
      const r = solveLevel(CS133_6P32, 3 * sign);
      for (const s of r.states) {
        if (s.high.scheme !== 'mJ,mI') throw new Error('expected m_J, m_I labels');
        // the state is dominated by its own uncoupled basis vector at 3 T
        const k = s.basis.findIndex((b) => b.text === s.high.text);
        expect(Math.abs(s.vector[k])).toBeGreaterThan(0.95);
        // and its moment approaches −(g_J m_J + g_I m_I) μ_B
        const expected = -(CS133_6P32.gJ * s.high.twoMJ + CS133_6P32.gI * s.high.twoMI) / 2;
        expect(Math.abs(s.momentBohr - expected)).toBeLessThan(0.02);
      }
    }
  });

  it('with the quadrupole alone, the miss also falls as 1/B: its strong-field term is exactly the operator diagonal', () => {
    // A diagonal mismatch would leave a field-independent offset (ratio → 1).
    const quadOnly: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 3, twoI: 7, gJ: 1.334, gI: 0, A: 0, B: -0.4934e6 };
    const m1 = worstMiss(quadOnly, 1);
    const m10 = worstMiss(quadOnly, 10);
    expect(m10).toBeGreaterThan(0.01);
    expect(m1 / m10).toBeGreaterThan(9);
    expect(m1 / m10).toBeLessThan(11);
  });

  it('leaves the octupole out and says so', () => {
    const r = paschenBackLimit({ ...CS133_6P32, C: 560 }, 1);
    expect(r.issues.map((i) => i.code)).toContain('octupole-not-in-limit');
  });
});
