/**
 * Against NumPy: tests/reference/engine_cs6p32.json is written by
 * scripts/reference/engine_cs6p32.py (numpy.linalg.eigh on the full 32 × 32
 * Kronecker-product matrix; curvature from mpmath central differences at 50
 * digits). Library versions are recorded in the JSON.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { BOHR_MAGNETON_HZ_PER_T } from '../../server/src/physics/constants';
import { solveLevel } from '../../server/src/physics/engine';
import type { HyperfineLevelSpec } from '../../server/src/physics/engine';

interface RefState {
  energyHz: number;
  slopeHzPerT: number;
  twoM: number | null;
  vector?: { twoMJ: number; twoMI: number; c: number }[];
}
interface Reference {
  libraries: Record<string, string>;
  level: { twoJ: number; twoI: number; A: number; B: number; gJ: number; gI: number };
  muBOverHHzPerT: number;
  results: { fieldT: number; states: RefState[] }[];
  curvature: { fieldT: number; twoM: number; rank: number; energyHz: number; d2EdB2: number }[];
}

const ref = JSON.parse(readFileSync(path.join(__dirname, '../reference/engine_cs6p32.json'), 'utf8')) as Reference;
const spec: HyperfineLevelSpec = { kind: 'hyperfine', ...ref.level };

/** 1e-9 relative, or 1e-3 Hz absolute for values near zero. */
function close(a: number, b: number, rel = 1e-9, abs = 1e-3): boolean {
  return Math.abs(a - b) <= Math.max(rel * Math.abs(b), abs);
}

describe('Cs 6P3/2 against NumPy eigh (reference vectors)', () => {
  it('uses the same μ_B/h (CODATA 2022) as the reference', () => {
    expect(Math.abs(BOHR_MAGNETON_HZ_PER_T / ref.muBOverHHzPerT - 1)).toBeLessThan(1e-12);
    expect(ref.libraries.numpy).toMatch(/^\d+\./);
  });

  for (const r of ref.results) {
    it(`B = ${r.fieldT} T: energies, slopes and eigenvectors`, () => {
      const { states, issues } = solveLevel(spec, r.fieldT);
      expect(issues).toEqual([]);
      expect(states.length).toBe(32);
      states.forEach((s, k) => {
        const e = r.states[k];
        expect(close(s.energyHz, e.energyHz), `energy ${k}: ${s.energyHz} vs ${e.energyHz}`).toBe(true);
        if (e.vector === undefined) return; // B = 0: NumPy mixes the degenerate m within one F
        expect(s.twoM).toBe(e.twoM);
        // Slopes to 1e-9 relative, or 1e-6 of μ_B/h absolute where a slope passes through zero.
        expect(close(-s.momentBohr * BOHR_MAGNETON_HZ_PER_T, e.slopeHzPerT, 1e-9, 1e-6 * BOHR_MAGNETON_HZ_PER_T)).toBe(true);
        // Eigenvector up to an overall sign: |<ours|numpy>| = 1.
        let overlap = 0;
        for (const c of e.vector) {
          const i = s.basis.findIndex((b) => b.scheme === 'mJ,mI' && b.twoMJ === c.twoMJ && b.twoMI === c.twoMI);
          expect(i).toBeGreaterThanOrEqual(0);
          overlap += s.vector[i] * c.c;
        }
        expect(Math.abs(Math.abs(overlap) - 1)).toBeLessThan(1e-9);
      });
    });
  }

  it('curvature d²E/dB² from second-order perturbation matches mpmath finite differences', () => {
    const fields = [...new Set(ref.curvature.map((c) => c.fieldT))];
    for (const b of fields) {
      const { states } = solveLevel(spec, b);
      for (const c of ref.curvature.filter((x) => x.fieldT === b)) {
        const block = states.filter((s) => s.twoM === c.twoM).sort((x, y) => x.energyHz - y.energyHz);
        const s = block[c.rank];
        expect(close(s.energyHz, c.energyHz)).toBe(true);
        // 1e-9 relative (measured agreement ~1e-12); stretched states have exactly zero curvature.
        expect(Math.abs(s.d2EdB2 - c.d2EdB2), `2m=${c.twoM} rank=${c.rank} at ${b} T`).toBeLessThanOrEqual(
          Math.max(1e-9 * Math.abs(c.d2EdB2), 1e-3),
        );
      }
    }
  });
});
