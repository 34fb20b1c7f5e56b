import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import type { LevelResult } from '../../server/src/eval/resultTypes';
import { linearZeeman, solveLevel, type HyperfineLevelSpec } from '../../server/src/physics/engine';

/** μ_N/h = 7.622 593 2188 MHz/T (CODATA 2022). */
const MU_N_HZ_PER_T = 7.6225932188e6;

function level(text: string, name: string): LevelResult {
  const l = analyze(text).result!.levels.find((x) => x.level === name);
  if (!l) throw new Error(`no level ${name}`);
  return l;
}

/** Energies of the exact sublevels at the first field, ascending. */
function exactEnergies(l: LevelResult): number[] {
  return l.at_fields[0]!.exact.map((s) => s.energy_Hz);
}

describe('nuclear Zeeman effect of a level without hyperfine constants', () => {
  // Moments from the built-in table: 87Sr μ = −1.09316 μ_N (I = 9/2; ChemLin isotope data),
  // 171Yb μ = +0.49367 μ_N (I = 1/2; from memory).
  it('87Sr 5s2 1S0 splits into 10 sublevels, |μ|/(I h) ≈ 185.17 Hz/G apart (≈ 185 Hz/G from memory)', () => {
    const l = level('species Sr87\n  level ground: 5s2 1S0\nfield bias = 1 T\n', 'ground');
    const e = exactEnergies(l);
    expect(l.sublevel_count).toBe(10);
    expect(e).toHaveLength(10);
    const step = (1.09316 * MU_N_HZ_PER_T) / 4.5;
    for (let k = 1; k < e.length; k++) expect((e[k]! - e[k - 1]!) / step).toBeCloseTo(1, 9);
    expect(step * 1e-4).toBeCloseTo(185.17, 2);
    // A negative nuclear moment (g_I > 0 in H = μ_B B g_I I_z) puts m_I = +9/2 on top.
    const top = l.at_fields[0]!.exact.at(-1)!;
    expect(top.low_label).toBe('F=9/2, m_F=+9/2');
    expect(top.moment_bohr).toBeLessThan(0);
    expect(top.linear_energy_Hz).toBeCloseTo(top.energy_Hz, 6);
  });

  it('A on a J = 0 level is flagged where it is written and leaves the nuclear splitting alone', () => {
    const r = analyze('species Sr87\n  level ground: 5s2 1S0 A = 100 MHz\nfield bias = 1 T\n').result!;
    expect(r.diagnostics.map((d) => `${d.line}:${d.column} ${d.code}`)).toEqual(['2:29 dipole-cannot-act']);
    const e = r.levels[0]!.at_fields[0]!.exact.map((s) => s.energy_Hz);
    expect(e).toHaveLength(10);
    expect((e[9]! - e[0]!) / (9 * (1.09316 * MU_N_HZ_PER_T) / 4.5)).toBeCloseTo(1, 9);
  });

  it('87Sr 3P0 (clock level, J = 0) has the same nuclear splitting', () => {
    const l = level('species Sr87\n  level clock: 5s.5p 3P°0\nfield bias = 10 G\n', 'clock');
    const e = exactEnergies(l);
    expect(e).toHaveLength(10);
    expect((e[9]! - e[0]!) / (9 * 1.09316 * MU_N_HZ_PER_T * 1e-3 / 4.5)).toBeCloseTo(1, 9);
  });

  it('171Yb 1S0: two sublevels 2|μ| μ_N B/h apart, m_I = +1/2 lower (positive moment)', () => {
    const l = level('species Yb171\n  level g: 4f14 6s2 1S0\nfield f = 1 T\n', 'g');
    const ex = l.at_fields[0]!.exact;
    expect(ex).toHaveLength(2);
    expect((ex[1]!.energy_Hz - ex[0]!.energy_Hz) / (2 * 0.49367 * MU_N_HZ_PER_T)).toBeCloseTo(1, 9);
    expect(ex[0]!.low_label).toBe('F=1/2, m_F=+1/2');
  });

  it('a J > 0 level without A keeps g_I: (g_J m_J + g_I m_I) μ_B B, labelled with m_I', () => {
    const text = 'species X\n  mass = 10 u\n  I = 3/2\n  g_I = -0.001\n  level a: 2S1/2\nfield f = 1 T\n';
    const l = level(text, 'a');
    const ex = l.at_fields[0]!.exact;
    expect(ex).toHaveLength(8);
    const muB = 13996244917.1; // μ_B/h, Hz/T (CODATA 2022)
    const gJ = l.g_J.used;
    const want: number[] = [];
    for (const mJ of [-0.5, 0.5]) for (const mI of [-1.5, -0.5, 0.5, 1.5]) want.push((gJ * mJ - 0.001 * mI) * muB);
    want.sort((a, b) => a - b);
    ex.forEach((s, k) => expect(s.energy_Hz / want[k]!).toBeCloseTo(1, 10));
    expect(ex[0]!.low_label).toBe('J=1/2, m_J=-1/2, m_I=+3/2');
    expect(ex[0]!.m_I).toBe(1.5);
    for (const s of ex) expect(s.linear_energy_Hz).toBeCloseTo(s.energy_Hz, 3);
  });

  it('the engine, its linear closed form and its labels agree for an uncoupled nucleus', () => {
    const spec: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 2, twoI: 3, gJ: 1.5, gI: -0.0004, A: 0 };
    const exact = solveLevel(spec, 0.3).states;
    const lin = linearZeeman(spec, 0.3).states;
    expect(exact).toHaveLength(12);
    for (const s of exact) {
      const match = lin.find((x) => x.low.text === s.low.text)!;
      expect(match.energyHz).toBeCloseTo(s.energyHz, 4);
      expect(-s.momentBohr).toBeCloseTo(match.slopeHzPerT / 13996244917.1, 9);
    }
  });

  it('an NMR-type resonance of the 87Sr ground level at 1 G is at 185.17 Hz', () => {
    const text = 'species Sr87\n  level g: 5s2 1S0\nfield f = 1 G\nresonance nmr\n  level = g\n';
    const t = analyze(text).result!.resonances[0]!.at_fields[0]!.transitions;
    expect(t.length).toBe(9);
    for (const x of t) expect(Math.abs(x.frequency_Hz) / ((1.09316 * MU_N_HZ_PER_T * 1e-4) / 4.5)).toBeCloseTo(1, 9);
  });

  it('a line between a level with A and one without gets components (same nucleus on both)', () => {
    const text = 'species X\n  mass = 23 u\n  I = 3/2\n  g_I = -0.0008\n  level g: 3s 2S1/2 A = 885 MHz\n  level p: 3p 2P°1/2\nfield f = 1 mT\nline L: g -> p\n';
    const r = analyze(text).result!;
    expect(r.lines[0]!.at_fields[0]!.components.length).toBeGreaterThan(0);
  });
});
