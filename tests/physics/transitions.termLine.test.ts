import { describe, expect, it } from 'vitest';
import { ELECTRON_GS } from '../../server/src/physics/constants';
import type { FineTermSpec, HyperfineLevelSpec } from '../../server/src/physics/engine';
import { electricDipoleLine, termDipoleLine, type TermLineEnd } from '../../server/src/physics/transitions';
import { RB87_5P } from './engine.wholeTerm.fixtures';

// ⁸⁷Rb 5S1/2 (alkali D-line data compilation): A = 3417.341305 MHz, g_J = 2.00233113.
const RB_5S: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 1, twoI: 3, gJ: 2.00233113, gI: -0.0009951414, A: 3417.341305452145e6 };
const ground: TermLineEnd = { spec: RB_5S, twoS: 1, L: 0 };
const term: TermLineEnd = { spec: RB87_5P, twoS: 1, L: 1 };

describe('a line from a J level to a whole term (⁸⁷Rb 5S1/2 → 5P)', () => {
  it.each([0, 0.01, 0.1, 0.3, 1])('sum rules at %s T: 1 out of every upper sublevel, (2L_u+1)/(2L_l+1) = 3 into every lower one (exact identities)', (b) => {
    const r = termDipoleLine(ground, term, b);
    expect(r.issues).toEqual([]);
    const out = new Map<string, number>();
    const into = new Map<string, number>();
    for (const c of r.components) {
      out.set(c.upper.low.text, (out.get(c.upper.low.text) ?? 0) + c.strength);
      into.set(c.lower.low.text, (into.get(c.lower.low.text) ?? 0) + c.strength);
    }
    expect(out.size).toBe(24);
    expect(into.size).toBe(8);
    for (const s of out.values()) expect(Math.abs(s - 1)).toBeLessThan(1e-12);
    for (const s of into.values()) expect(Math.abs(s - 3)).toBeLessThan(1e-12);
    expect(r.sumRuleDeviation).toBeLessThan(1e-12);
  });

  it('zero field: D2 carries twice the strength of D1 ((2J+1) ratio, textbook)', () => {
    const r = termDipoleLine(ground, term, 0);
    const toJ = (twoJ: number): number => r.components.filter((c) => c.upper.low.scheme === 'F' && c.upper.low.twoJ === twoJ).reduce((t, c) => t + c.strength, 0);
    expect(toJ(3) / toJ(1)).toBeCloseTo(2, 4);
  });

  it('zero field: the D2 components are those of the single-J line, in proportion (J-mixing ≤ 1e-4)', () => {
    const p32: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 3, twoI: 3, gJ: 1.3341064, gI: RB87_5P.gI, A: 84.7185e6, B: 12.4965e6 };
    const single = electricDipoleLine(RB_5S, p32, 0).components;
    const whole = termDipoleLine(ground, term, 0).components.filter((c) => c.upper.low.scheme === 'F' && c.upper.low.twoJ === 3);
    const key = (l: { text: string }, u: { text: string }): string => `${l.text}|${u.text.replace('J=3/2, ', '')}`;
    const byKey = new Map(whole.map((c) => [key(c.lower.low, c.upper.low), c.strength]));
    expect(whole.length).toBe(single.length);
    // |<J_u||d||J_l>|² = (2J_u+1)(2J_l+1){L_u J_u S; J_l L_l 1}² |<L_u||d||L_l>|² (textbook), so the two
    // normalisations differ by (2L_u+1)(2J_l+1){1 3/2 1/2; 1/2 0 1}² = 3 · 2 · 1/6 = 1 for ²S1/2 → ²P3/2.
    for (const c of single) expect(Math.abs(byKey.get(key(c.lower.low, c.upper.low))! / c.strength - 1)).toBeLessThan(1e-4);
  });

  it('1 T: σ± centroid g_eff of the whole line, and stretched components keep their polarisation', () => {
    const r = termDipoleLine(ground, term, 1);
    expect(r.gEffCentroid).not.toBeNull();
    expect(Number.isFinite(r.gEffCentroid!)).toBe(true);
    const top = r.components.filter((c) => c.upper.high.text === 'm_L=+1, m_S=+1/2, m_I=+3/2');
    expect(top.length).toBe(1);
    expect(top[0]!.polarization).toBe('σ+');
    expect(top[0]!.strength).toBeCloseTo(1, 9);
  });
});

describe('a line between two whole terms (fine structure only, ²P → ²D)', () => {
  const p: FineTermSpec = { kind: 'fine', twoS: 1, L: 1, zeta: 2e10, gL: 1, gS: ELECTRON_GS };
  const d: FineTermSpec = { kind: 'fine', twoS: 1, L: 2, zeta: 1e9, gL: 1, gS: ELECTRON_GS };
  it.each([0, 0.5, 5])('both sum rules at %s T', (b) => {
    const r = termDipoleLine({ spec: p, twoS: 1, L: 1 }, { spec: d, twoS: 1, L: 2 }, b);
    expect(r.issues).toEqual([]);
    expect(r.sumRuleDeviation).toBeLessThan(1e-12);
    // Σ all = (2L_u+1)(2S+1) upper sublevels × 1 = 10
    expect(r.components.reduce((t, c) => t + c.strength, 0)).toBeCloseTo(10, 10);
  });

  it('bad pairs in plain words: spin change, |ΔL| > 1, different nuclei', () => {
    const codes = (l: TermLineEnd, u: TermLineEnd): string[] => termDipoleLine(l, u, 0.1).issues.map((i) => i.code);
    expect(codes({ spec: p, twoS: 1, L: 1 }, { spec: { ...d, twoS: 3 }, twoS: 3, L: 2 })).toEqual(['line-spin-change']);
    expect(codes({ spec: p, twoS: 1, L: 1 }, { spec: { ...d, L: 3 }, twoS: 1, L: 3 })).toEqual(['line-term-delta-l']);
    expect(codes(ground, { spec: p, twoS: 1, L: 1 })).toEqual(['line-nucleus-mismatch']);
  });
});

describe('sublevel identity in a whole term', () => {
  it('|J, F, m_F> keys keep the J: 5P has F = 1 and F = 2 in both J levels (24 distinct keys)', async () => {
    const { lowKey } = await import('../../server/src/physics/transitions/sublevelTag');
    const { solveLevel } = await import('../../server/src/physics/engine');
    const keys = new Set(solveLevel(RB87_5P, 1e-3).states.map((s) => lowKey(s.low)));
    expect(keys.size).toBe(24);
  });
});
