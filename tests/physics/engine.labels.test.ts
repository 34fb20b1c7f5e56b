import { describe, expect, it } from 'vitest';
import { BOHR_MAGNETON, BOHR_MAGNETON_HZ_PER_T } from '../../server/src/physics/constants';
import { landeGF, solveLevel } from '../../server/src/physics/engine';
import type { HyperfineLevelSpec } from '../../server/src/physics/engine';
import { CS133_6P32, CS133_6S, RB87_5S } from './engine.fixtures';

describe('low-field labels and slopes', () => {
  // Weak-field slope dE/dB = g_F m_F μ_B (textbook linear Zeeman effect), g_F with the nuclear term.
  for (const [name, spec] of [
    ['87Rb 5S1/2', RB87_5S],
    ['133Cs 6S1/2', CS133_6S],
    ['133Cs 6P3/2', CS133_6P32],
  ] as [string, HyperfineLevelSpec][]) {
    it(`${name}: moment at 1 nT is −g_F m_F μ_B for the labelled |F, m_F>, both field signs`, () => {
      for (const b of [1e-9, -1e-9, 0]) {
        const { states } = solveLevel(spec, b);
        const seen = new Set<string>();
        for (const s of states) {
          if (s.low.scheme !== 'F') throw new Error('expected F label');
          seen.add(s.low.text);
          expect(s.twoM).toBe(s.low.twoMF);
          const gF = landeGF(s.low.twoF, spec.twoJ, spec.twoI, spec.gJ, spec.gI);
          const expected = (-gF * s.low.twoMF * BOHR_MAGNETON) / 2;
          // 1 nT: the quadratic part of the moment is ~ (μ_B B)/ΔE ~ 1e-7 of μ_B or less
          expect(Math.abs(s.momentJT - expected) / BOHR_MAGNETON).toBeLessThan(1e-6);
          expect(Math.abs(s.momentBohr * BOHR_MAGNETON - s.momentJT)).toBeLessThan(1e-12 * BOHR_MAGNETON);
        }
        expect(seen.size).toBe(states.length); // every label used once
      }
    });
  }

  it('Cs 6P3/2 F=3 has g_F = 0 with g_I = 0 (textbook value: g_J [F(F+1)+J(J+1)−I(I+1)] = 0)', () => {
    expect(landeGF(6, 3, 7, 1.334, 0)).toBe(0);
  });
});

describe('exactness checks at every field', () => {
  it('each block: the eigenvalue sum equals the trace (Σ diag H0 + B Σ Zeeman); vectors are orthonormal', () => {
    for (const b of [0, 1e-4, 0.01, 0.1, 0.37, 1, 4, -0.2]) {
      const { states } = solveLevel(CS133_6P32, b);
      const blocks = new Map<number, typeof states>();
      for (const s of states) blocks.set(s.twoM, [...(blocks.get(s.twoM) ?? []), s]);
      expect(blocks.size).toBe(11);
      for (const [twoM, members] of blocks) {
        const basis = members[0].basis;
        expect(members.length).toBe(basis.length);
        // trace from the strong-field formula terms: Σ (A m_I m_J + quadrupole diagonal) + B μ_B Σ(g_J m_J + g_I m_I)
        let trace = 0;
        for (const h of basis) {
          if (h.scheme !== 'mJ,mI') throw new Error('basis label');
          const mJ = h.twoMJ / 2;
          const mI = h.twoMI / 2;
          trace += CS133_6P32.A * mJ * mI;
          trace += ((CS133_6P32.B as number) * (3 * mI * mI - 63 / 4) * (3 * mJ * mJ - 15 / 4)) / (4 * 3.5 * 6 * 1.5 * 2);
          trace += BOHR_MAGNETON_HZ_PER_T * b * (CS133_6P32.gJ * mJ + CS133_6P32.gI * mI);
        }
        const sum = members.reduce((acc, s) => acc + s.energyHz, 0);
        // energies are ≤ ~1e11 Hz here, so round-off is ~1e-5 Hz
        expect(Math.abs(sum - trace), `block 2m=${twoM} at ${b} T`).toBeLessThan(1e-4);
        for (const u of members) {
          for (const v of members) {
            let dot = 0;
            for (let i = 0; i < basis.length; i++) dot += u.vector[i] * v.vector[i];
            expect(Math.abs(dot - (u === v ? 1 : 0))).toBeLessThan(1e-13);
          }
        }
      }
    }
  });

  it('reversing the field maps E(m, B) to E(−m, −B) with the same F label', () => {
    const up = solveLevel(CS133_6P32, 0.05).states;
    const down = solveLevel(CS133_6P32, -0.05).states;
    for (const s of up) {
      if (s.low.scheme !== 'F') throw new Error('label');
      const { twoF, twoMF } = s.low;
      const mirror = down.find((d) => d.low.scheme === 'F' && d.low.twoF === twoF && d.low.twoMF === -twoMF);
      expect(mirror).toBeDefined();
      expect(Math.abs(mirror!.energyHz - s.energyHz)).toBeLessThan(1e-6);
      expect(Math.abs(mirror!.momentBohr + s.momentBohr)).toBeLessThan(1e-12);
    }
  });

  it('eigenvectors carry a sign convention: largest component positive', () => {
    for (const s of solveLevel(RB87_5S, 0.3).states) {
      let big = 0;
      for (const c of s.vector) if (Math.abs(c) > Math.abs(big)) big = c;
      expect(big).toBeGreaterThan(0);
    }
  });
});

describe('curvature from second-order perturbation', () => {
  it('stretched states have zero curvature; curvatures of each block sum to zero', () => {
    for (const b of [0, 0.02, 0.5]) {
      const { states } = solveLevel(CS133_6P32, b);
      const sums = new Map<number, number>();
      for (const s of states) sums.set(s.twoM, (sums.get(s.twoM) ?? 0) + s.d2EdB2);
      expect(Math.abs(states.find((s) => s.twoM === 10)!.d2EdB2)).toBe(0);
      // Σ_k d²E_k/dB² = d²(trace)/dB² = 0 because the trace is linear in B.
      const scale = Math.max(...states.map((s) => Math.abs(s.d2EdB2)));
      for (const v of sums.values()) expect(Math.abs(v)).toBeLessThan(1e-12 * scale);
    }
  });
});
