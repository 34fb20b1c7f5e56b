import { describe, expect, it } from 'vitest';
import { ELECTRON_GS } from '../../server/src/physics/constants';
import { landeGJ, paschenBackLimit, solveLevel } from '../../server/src/physics/engine';
import type { FineTermSpec } from '../../server/src/physics/engine';

/** Na 3p 2P: fine-structure interval E(3/2) − E(1/2) = 515.52 GHz (sodium D-line data compilation;
 *  from memory) = (3/2) ζ by the interval rule, so ζ = 343.68 GHz. */
const NA_3P: FineTermSpec = { kind: 'fine', twoS: 1, L: 1, zeta: 343.68e9, gL: 1, gS: ELECTRON_GS };

describe('fine-structure mode: zero field', () => {
  it('Landé interval rule E(J) − E(J−1) = ζ J (textbook) for a 3D term', () => {
    const term: FineTermSpec = { kind: 'fine', twoS: 2, L: 2, zeta: 2e10, gL: 1, gS: 2 };
    const { states } = solveLevel(term, 0);
    const byJ = new Map<number, number>();
    for (const s of states) if (s.low.scheme === 'J') byJ.set(s.low.twoJ, s.energyHz);
    expect([...byJ.keys()].sort()).toEqual([2, 4, 6]);
    expect(Math.abs((byJ.get(4) as number) - (byJ.get(2) as number) - 2 * term.zeta)).toBeLessThan(1e-3);
    expect(Math.abs((byJ.get(6) as number) - (byJ.get(4) as number) - 3 * term.zeta)).toBeLessThan(1e-3);
  });

  it('Na 3P (2P, S = 1/2): the interval rule gives E(3/2) − E(1/2) = (3/2) ζ = 515.52 GHz', () => {
    const { states } = solveLevel(NA_3P, 0);
    const e = (twoJ: number): number => states.find((s) => s.low.scheme === 'J' && s.low.twoJ === twoJ)!.energyHz;
    expect(Math.abs(e(3) - e(1) - 515.52e9)).toBeLessThan(1);
  });
});

describe('fine-structure mode: weak field', () => {
  it('textbook Landé values with g_S = 2, g_L = 1: 2P1/2 2/3, 2P3/2 4/3, 3P1 3/2, 3P2 3/2, 4D1/2 0, 2D5/2 6/5', () => {
    expect(landeGJ(1, 1, 1, 1, 2)).toBeCloseTo(2 / 3, 15);
    expect(landeGJ(1, 1, 3, 1, 2)).toBeCloseTo(4 / 3, 15);
    expect(landeGJ(1, 2, 2, 1, 2)).toBeCloseTo(3 / 2, 15);
    expect(landeGJ(1, 2, 4, 1, 2)).toBeCloseTo(3 / 2, 15);
    expect(landeGJ(2, 3, 1, 1, 2)).toBeCloseTo(0, 15);
    expect(landeGJ(2, 1, 5, 1, 2)).toBeCloseTo(6 / 5, 15);
  });

  it('Na 3P at 0.1 mT: each |J, m_J> has moment −g_J m_J μ_B with g_J from g_S (CODATA) and g_L', () => {
    const { states, issues } = solveLevel(NA_3P, 1e-4);
    expect(issues).toEqual([]);
    expect(states.length).toBe(6);
    for (const s of states) {
      if (s.low.scheme !== 'J') throw new Error('expected J label');
      const g = landeGJ(1, 1, s.low.twoJ, NA_3P.gL, NA_3P.gS);
      // relative correction ~ μ_B B / ζ ≈ 4e-6
      expect(Math.abs(s.momentBohr + (g * s.low.twoMJ) / 2)).toBeLessThan(1e-5);
    }
    // 2P3/2 g_J = 2/3 + g_S/3 = 1.334106 (from the Landé formula with the CODATA g_S)
    expect(landeGJ(1, 1, 3, 1, ELECTRON_GS)).toBeCloseTo(1.3341064, 7);
  });
});

describe('fine-structure mode: strong field (Paschen–Back)', () => {
  it('slopes approach g_L m_L + g_S m_S and the labels are |m_L, m_S>', () => {
    const weakSpinOrbit: FineTermSpec = { kind: 'fine', twoS: 1, L: 1, zeta: 1e9, gL: 1, gS: ELECTRON_GS };
    for (const b of [100, -100]) {
      const { states } = solveLevel(weakSpinOrbit, b);
      const labels = new Set(states.map((s) => s.high.text));
      expect(labels.size).toBe(6);
      for (const s of states) {
        if (s.high.scheme !== 'mL,mS') throw new Error('expected m_L, m_S label');
        const slope = (weakSpinOrbit.gL * s.high.twoML + weakSpinOrbit.gS * s.high.twoMS) / 2;
        // correction ~ ζ/(μ_B B) ≈ 7e-4
        expect(Math.abs(-s.momentBohr - slope)).toBeLessThan(2e-3);
      }
    }
  });

  it('energies approach ζ m_L m_S + μ_B B (g_L m_L + g_S m_S) with a miss falling as 1/B', () => {
    const miss = (b: number): number => {
      const exact = solveLevel(NA_3P, b).states;
      const pb = new Map(paschenBackLimit(NA_3P, b).states.map((s) => [s.high.text, s.energyHz]));
      return Math.max(...exact.map((s) => Math.abs(s.energyHz - (pb.get(s.high.text) as number))));
    };
    const r = miss(1000) / miss(10000);
    expect(r).toBeGreaterThan(9);
    expect(r).toBeLessThan(11);
  });
});

describe('fine-structure mode with a nuclear spin (no hyperfine coupling)', () => {
  it('adds g_I m_I μ_B B to every state and keeps m_J, m_I blocks separate', () => {
    const withI: FineTermSpec = { ...NA_3P, twoI: 3, gI: -0.0008046108 };
    const { states } = solveLevel(withI, 0.01);
    const bare = solveLevel(NA_3P, 0.01).states;
    expect(states.length).toBe(24);
    for (const s of states) {
      if (s.low.scheme !== 'J' || s.low.twoMI === null) throw new Error('expected J, m_I label');
      const twoJ = s.low.twoJ;
      const twoMJ = s.low.twoMJ;
      const twoMI = s.low.twoMI;
      const partner = bare.find((x) => x.low.scheme === 'J' && x.low.twoJ === twoJ && x.low.twoMJ === twoMJ)!;
      const shift = (13996244917.1 * 0.01 * withI.gI! * twoMI) / 2; // μ_B/h CODATA 2022
      expect(Math.abs(s.energyHz - partner.energyHz - shift)).toBeLessThan(1e-3);
    }
  });
});
