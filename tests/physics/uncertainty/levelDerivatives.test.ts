/**
 * The engine's parameter derivatives (Hellmann–Feynman and first-order perturbation) against
 * central finite differences of the engine itself on random setups, and against closed forms.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { solveLevel, type HyperfineLevelSpec, type FineTermSpec, type LevelSpec } from '../../../server/src/physics/engine';
import { levelDerivatives, type LevelParam } from '../../../server/src/physics/uncertainty';
import { BOHR_MAGNETON_HZ_PER_T, ELECTRON_GS, PLANCK_H } from '../../../server/src/physics/constants';

const RUNS = Number(process.env.FUZZ_RUNS ?? 60);

/** Energies and slopes dE/dB by adiabatic label, so states are matched across the step. */
function byLabel(spec: LevelSpec, fieldT: number): Map<string, { e: number; slope: number }> {
  const out = new Map<string, { e: number; slope: number }>();
  for (const s of solveLevel(spec, fieldT).states) out.set(`${s.twoM}|${s.low.text}`, { e: s.energyHz, slope: -s.momentJT / PLANCK_H });
  return out;
}

function withParam(spec: LevelSpec, fieldT: number, p: LevelParam, delta: number): [LevelSpec, number] {
  if (p === 'field') return [spec, fieldT + delta];
  const s = { ...spec } as Record<string, unknown>;
  s[p] = ((s[p] as number | undefined) ?? 0) + delta;
  return [s as unknown as LevelSpec, fieldT];
}

/** Compare analytic ∂E/∂p and ∂(dE/dB)/∂p with central differences; returns the worst misfit in tolerance units. */
function worstMisfit(spec: LevelSpec, fieldT: number, p: LevelParam, h: number, eScale: number, slopeScale: number): number {
  const d = levelDerivatives(spec, fieldT);
  const states = solveLevel(spec, fieldT).states;
  const plus = byLabel(...withParam(spec, fieldT, p, h));
  const minus = byLabel(...withParam(spec, fieldT, p, -h));
  let worst = 0;
  states.forEach((s, k) => {
    const key = `${s.twoM}|${s.low.text}`;
    const fdE = (plus.get(key)!.e - minus.get(key)!.e) / (2 * h);
    const fdS = (plus.get(key)!.slope - minus.get(key)!.slope) / (2 * h);
    expect(d.states[k]!.energyHz).toBe(s.energyHz);
    worst = Math.max(worst, Math.abs(fdE - d.states[k]!.dE[p]!) / (1e-6 * eScale), Math.abs(fdS - d.states[k]!.dSlope[p]!) / (1e-5 * slopeScale));
  });
  return worst;
}

describe('level derivatives against central finite differences (fast-check, random hyperfine levels)', () => {
  const spec = fc.record({
    twoJ: fc.integer({ min: 1, max: 4 }),
    twoI: fc.integer({ min: 1, max: 7 }),
    A: fc.double({ min: 5e7, max: 2e9, noNaN: true }).chain((a) => fc.constantFrom(a, -a)),
    Bratio: fc.double({ min: -0.3, max: 0.3, noNaN: true }),
    gJ: fc.double({ min: 0.5, max: 2.1, noNaN: true }),
    gI: fc.double({ min: -1e-3, max: 1e-3, noNaN: true }),
    fieldT: fc.double({ min: 1e-3, max: 0.4, noNaN: true }),
  });
  for (const p of ['field', 'A', 'B', 'gJ', 'gI'] as LevelParam[]) {
    it(`∂E/∂${p} and ∂²E/∂B∂${p}`, () => {
      fc.assert(
        fc.property(spec, (r) => {
          const s: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: r.twoJ, twoI: r.twoI, gJ: r.gJ, gI: r.gI, A: r.A, B: r.Bratio * r.A };
          const muScale = BOHR_MAGNETON_HZ_PER_T * (r.gJ * r.twoJ + 1);
          const steps: Record<string, [number, number, number]> = {
            field: [1e-6 + 1e-5 * r.fieldT, muScale, (muScale * muScale) / Math.abs(r.A)],
            A: [1e-5 * Math.abs(r.A), 1, muScale / Math.abs(r.A)],
            B: [1e-5 * Math.abs(r.A), 1, muScale / Math.abs(r.A)],
            gJ: [1e-6, BOHR_MAGNETON_HZ_PER_T * r.fieldT * r.twoJ, BOHR_MAGNETON_HZ_PER_T * r.twoJ],
            gI: [1e-6, BOHR_MAGNETON_HZ_PER_T * r.fieldT * r.twoI, BOHR_MAGNETON_HZ_PER_T * r.twoI],
          };
          const [h, eScale, slopeScale] = steps[p]!;
          expect(worstMisfit(s, r.fieldT, p, h, eScale, slopeScale)).toBeLessThan(1);
        }),
        { numRuns: RUNS },
      );
    });
  }

  it('∂E/∂ζ of a fine-structure term (2P, random ζ and field)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e9, max: 5e12, noNaN: true }), fc.double({ min: 0.01, max: 5, noNaN: true }), (zeta, fieldT) => {
        const s: FineTermSpec = { kind: 'fine', twoS: 1, L: 1, zeta, gL: 1, gS: ELECTRON_GS };
        expect(worstMisfit(s, fieldT, 'zeta', 1e-5 * zeta, 1, BOHR_MAGNETON_HZ_PER_T / zeta)).toBeLessThan(1);
      }),
      { numRuns: RUNS },
    );
  });
});

describe('level derivatives against closed forms', () => {
  // Linear Zeeman of a J = 1/2 level without nucleus: E = g_J m_J μ_B B exactly, so ∂E/∂g_J = m_J μ_B B (textbook, exact).
  it('J = 1/2 without nucleus: ∂E/∂g_J = m_J μ_B B and ∂E/∂B = g_J m_J μ_B', () => {
    const d = levelDerivatives({ kind: 'hyperfine', twoJ: 1, twoI: 0, gJ: 2.00233, gI: 0, A: 0 }, 0.35);
    expect(d.states.map((s) => s.dE.gJ)).toEqual([-0.5 * BOHR_MAGNETON_HZ_PER_T * 0.35, 0.5 * BOHR_MAGNETON_HZ_PER_T * 0.35]);
    expect(d.states.map((s) => s.dE.field)).toEqual([-0.5 * 2.00233 * BOHR_MAGNETON_HZ_PER_T, 0.5 * 2.00233 * BOHR_MAGNETON_HZ_PER_T]);
    expect(d.states.every((s) => s.dSlope.A === 0 && !s.degenerate)).toBe(true);
  });

  // At B = 0 the F levels are (2F+1)-fold degenerate: ∂E/∂A = [F(F+1) − I(I+1) − J(J+1)]/2 (textbook interval rule).
  it('zero field, J = 1/2, I = 3/2: ∂E/∂A is −5/4 (F = 1) and +3/4 (F = 2), the degenerate m states handled', () => {
    const d = levelDerivatives({ kind: 'hyperfine', twoJ: 1, twoI: 3, gJ: 2.00233, gI: -0.000995, A: 3.417e9 }, 0);
    const dA = d.states.map((s) => s.dE.A!);
    for (const v of dA.slice(0, 3)) expect(v).toBeCloseTo(-1.25, 12);
    for (const v of dA.slice(3)) expect(v).toBeCloseTo(0.75, 12);
  });
});
