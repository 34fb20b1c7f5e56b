import { describe, expect, it } from 'vitest';
import { breitRabi, breitRabiEnergy, solveLevel } from '../../server/src/physics/engine';
import type { HyperfineLevelSpec } from '../../server/src/physics/engine';
import { GROUND_LEVELS, relDiff } from './engine.fixtures';

// Fields from 0 to 10 T on a log-ish grid, both signs; includes the stretched-state
// zero crossing region x ≈ 1 for every species.
const FIELDS = [0, 1e-7, 1e-5, 3e-4, 1e-3, 0.01, 0.03, 0.05, 0.1, 0.2, 0.3, 0.5, 0.8, 1, 2, 5, 10];

function compare(spec: HyperfineLevelSpec, fieldT: number): number {
  const matrix = solveLevel(spec, fieldT);
  const closed = breitRabi(spec, fieldT);
  expect(matrix.issues).toEqual([]);
  expect(closed.issues).toEqual([]);
  expect(matrix.states.length).toBe(closed.states.length);
  const scale = Math.abs(spec.A) * (spec.twoI + 1);
  let worst = 0;
  for (const s of matrix.states) {
    if (s.low.scheme !== 'F') throw new Error('expected F labels');
    const { twoF, twoMF } = s.low;
    const match = closed.states.find((c) => c.low.twoF === twoF && c.low.twoMF === twoMF);
    expect(match, `Breit–Rabi state F=${twoF}/2 m=${twoMF}/2`).toBeDefined();
    // 1e-9 relative; values passing through zero are compared against 1e-9 of the hyperfine splitting
    worst = Math.max(worst, relDiff(s.energyHz, match!.energyHz, 1e-3 * scale));
  }
  return worst;
}

describe('Breit–Rabi formula against the matrix engine (J = 1/2 ground levels, 0 to 10 T)', () => {
  for (const [name, spec] of GROUND_LEVELS) {
    it(`${name}: every |F, m_F> agrees to 1e-9 relative at ±B, labels matched adiabatically`, () => {
      for (const b of FIELDS) {
        expect(compare(spec, b)).toBeLessThan(1e-9);
        expect(compare(spec, -b)).toBeLessThan(1e-9);
      }
    });
  }

  it('inverted hyperfine structure (A < 0, as in 40K 4S1/2) also agrees, labels included', () => {
    // 40K: I = 4, A = −285.7308 MHz (alkali hyperfine compilation; from memory), g_I = +0.000176490 (from memory).
    const k40: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 1, twoI: 8, gJ: 2.00229421, gI: 0.00017649, A: -285.7308e6 };
    for (const b of FIELDS) expect(compare(k40, b)).toBeLessThan(1e-9);
  });

  it('stretched states follow E = A I/2 ± (g_J/2 + g_I I) μ_B B exactly, through x = ±1', () => {
    const spec = GROUND_LEVELS[3][1]; // 87Rb
    const mu = 13996244917.1; // μ_B/h, Hz/T (CODATA 2022)
    for (const b of [0, 0.2, 0.244, 0.5]) {
      const up = breitRabiEnergy(3, spec.A, spec.gJ, spec.gI, 4, -4, b);
      const expected = (spec.A * 1.5) / 2 - (spec.gJ / 2 + spec.gI * 1.5) * mu * b;
      expect(relDiff(up, expected, 1e3)).toBeLessThan(1e-9);
    }
  });

  it('refuses levels other than J = 1/2 with an issue, without throwing', () => {
    const r = breitRabi({ kind: 'hyperfine', twoJ: 3, twoI: 3, gJ: 1.33, gI: 0, A: 1e6 }, 0.1);
    expect(r.states).toEqual([]);
    expect(r.issues.map((i) => i.code)).toEqual(['not-breit-rabi']);
  });
});
