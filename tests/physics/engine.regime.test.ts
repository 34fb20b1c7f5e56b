import { describe, expect, it } from 'vitest';
import { BOHR_MAGNETON_HZ_PER_T } from '../../server/src/physics/constants';
import { linearZeeman, regime, solveLevel } from '../../server/src/physics/engine';
import type { HyperfineLevelSpec } from '../../server/src/physics/engine';
import { CS133_6P32, RB87_5S } from './engine.fixtures';

const dE = RB87_5S.A * 2; // ΔE = A(I + 1/2)
const bPerX = dE / ((RB87_5S.gJ - RB87_5S.gI) * BOHR_MAGNETON_HZ_PER_T); // field at x = 1

describe('regime number and verdicts (87Rb 5S1/2)', () => {
  it('x is the Breit–Rabi x = (g_J − g_I) μ_B B / ΔE', () => {
    const r = regime(RB87_5S, 0.1);
    expect(Math.abs(r.x - 0.1 / bPerX)).toBeLessThan(1e-12);
    expect(Math.abs(r.zeroFieldSpreadHz - dE)).toBeLessThan(1e-5);
    expect(regime(RB87_5S, -0.1).x).toBe(r.x);
  });

  it('linear limit: where the Breit–Rabi expansion puts a 1 % miss, x = 4f/(g_J − g_I)', () => {
    // Expansion of Breit–Rabi (textbook): the quadratic term (ΔE/4)(1 − 4m²/(2I+1)²) x² is largest at m = 0;
    // it equals f × the largest linear shift (|g_F m_F| = g_J/2 + 3g_I/2 for |2, ±2>) at x ≈ 4f·max|g_F m_F|/(g_J − g_I).
    const f = 0.01;
    const maxGm = RB87_5S.gJ / 2 + (3 * RB87_5S.gI) / 2;
    const expected = ((4 * f * maxGm) / (RB87_5S.gJ - RB87_5S.gI)) * bPerX;
    const r = regime(RB87_5S, 0);
    // cubic terms shift it by about x ≈ 2 %
    expect(Math.abs(r.linearLimitT / expected - 1)).toBeLessThan(0.03);
  });

  it('strong limit: the first omitted term ΔE/(4x) equals f ΔE at x = 1/(4f)', () => {
    const r = regime(RB87_5S, 0);
    const expected = (1 / (4 * 0.01)) * bPerX;
    expect(Math.abs(r.strongLimitT / expected - 1)).toBeLessThan(0.03);
  });

  it('the limits mean what they say: the linear formula misses by just under/over 1 % of the largest linear shift', () => {
    const r = regime(RB87_5S, 0);
    const miss = (b: number): number => {
      const lin = new Map(linearZeeman(RB87_5S, b).states.map((s) => [s.low.text, s]));
      let worst = 0;
      let shift = 0;
      for (const s of solveLevel(RB87_5S, b).states) {
        const l = lin.get(s.low.text)!;
        worst = Math.max(worst, Math.abs(s.energyHz - l.energyHz));
        shift = Math.max(shift, Math.abs(l.slopeHzPerT * b));
      }
      return worst / shift;
    };
    expect(miss(r.linearLimitT * 0.999)).toBeLessThan(0.01);
    expect(miss(r.linearLimitT * 1.001)).toBeGreaterThan(0.01);
  });

  it('verdicts below, between and above the limits', () => {
    expect(regime(RB87_5S, 1e-4).verdict).toBe('weak field (linear)');
    expect(regime(RB87_5S, 0).verdict).toBe('weak field (linear)');
    expect(regime(RB87_5S, 0.1).verdict).toBe('intermediate');
    expect(regime(RB87_5S, 10).verdict).toBe('strong field (Paschen–Back / decoupled)');
    expect(regime(RB87_5S, -10).verdict).toBe('strong field (Paschen–Back / decoupled)');
  });

  it('a stricter fraction lowers the linear limit', () => {
    expect(regime(RB87_5S, 0, 0.001).linearLimitT).toBeLessThan(regime(RB87_5S, 0, 0.01).linearLimitT);
  });
});

describe('regime edge cases', () => {
  it('Cs 6P3/2: hyperfine spread ≈ 604 MHz; weak below a few tenths of a mT', () => {
    const r = regime(CS133_6P32, 1e-5);
    // spread E(F=5) − E(F=2) = 251.09 + 201.29 + 151.22 MHz with A and B only (computed in the zero-field tests)
    expect(Math.abs(r.zeroFieldSpreadHz / 1e6 - 603.6)).toBeLessThan(0.1);
    expect(r.verdict).toBe('weak field (linear)');
    expect(r.linearLimitT).toBeGreaterThan(1e-5);
    expect(r.linearLimitT).toBeLessThan(1e-2);
    expect(regime(CS133_6P32, 3).verdict).not.toBe('weak field (linear)');
  });

  it('no nucleus: exactly linear at every field', () => {
    const bare: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 1, twoI: 0, gJ: 2.0023, gI: 0, A: 0 };
    const r = regime(bare, 5);
    expect(r.linearLimitT).toBe(Number.POSITIVE_INFINITY);
    expect(r.verdict).toBe('weak field (linear)');
    expect(r.issues.map((i) => i.code)).toContain('no-zero-field-structure');
  });

  it('fine-structure term: x uses g_S − g_L over the fine-structure spread', () => {
    const term = { kind: 'fine' as const, twoS: 1, L: 1, zeta: 1e10, gL: 1, gS: 2.00231930436 };
    const r = regime(term, 1);
    expect(Math.abs(r.x - (1.00231930436 * BOHR_MAGNETON_HZ_PER_T) / 1.5e10)).toBeLessThan(1e-12);
    expect(r.verdict).toBe('intermediate');
  });

  it('a bad fraction is an issue', () => {
    expect(regime(RB87_5S, 0.1, 2).issues.map((i) => i.code)).toEqual(['bad-fraction']);
  });
});

describe('regime limits searched on demand', () => {
  it('give the same numbers in either order of reading, and the same verdicts at and around them', () => {
    const linearFirst = regime(RB87_5S, 1e-4);
    const lin = linearFirst.linearLimitT;
    const strong = linearFirst.strongLimitT;
    const strongFirst = regime(RB87_5S, 1e-4);
    expect(strongFirst.strongLimitT).toBe(strong);
    expect(strongFirst.linearLimitT).toBe(lin);
    // Fields on either side of the linear limit: the early verdict (a partial scan) agrees with the limit read afterwards.
    for (const b of [lin / 10, lin * 0.999999, lin, lin * 1.000001, lin * 10]) {
      const r = regime(RB87_5S, b);
      expect(r.verdict === 'weak field (linear)', String(b)).toBe(b <= lin);
      expect(r.linearLimitT).toBe(lin);
    }
  });
});
