/**
 * Propagated uncertainties against the outside world: the GUM law in a linear case (exact) and a
 * seeded NumPy Monte Carlo (JCGM 101 style) in a nonlinear one, tests/reference/uncertainty_mc.json
 * from scripts/reference/uncertainty_mc.py.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { frequencyText, withUncertainty } from '../../server/src/eval/quantityText';
import { BOHR_MAGNETON_HZ_PER_T } from '../../server/src/physics/constants';

interface McCase { name: string; A_Hz: number; u_A_Hz: number; f_Hz: number; u_f_Hz: number; field_T: number; mc_std_T: number; mc_std_uncertainty_T: number }
const MC = JSON.parse(readFileSync('tests/reference/uncertainty_mc.json', 'utf8')) as { cases: McCase[] };

function resonanceSetup(c: McCase): string {
  return [
    'species Rb87',
    `  level ground: 5s 2S1/2  A = ${c.A_Hz}(${c.u_A_Hz.toFixed(3)}) Hz  g_J = 2.00233113`,
    'resonance clock0',
    '  level = ground',
    '  lower = 1 0',
    '  upper = 2 0',
    `  frequency = ${c.f_Hz}(${c.u_f_Hz.toFixed(3)}) Hz`,
    '  range = 0 G, 2 G',
  ].join('\n');
}

describe('GUM law, linear case (JCGM 100 §5.1.2: u = |∂f/∂x| u_x exactly)', () => {
  // A J = 1/2 level without nucleus: E = g_J m_J μ_B B is linear in B and in g_J.
  const setup = (field: string, gJ: string): string =>
    ['species Ar40', '  mass = 39.96 u', '  I = 0', `  level s: 4s 2S1/2  g_J = ${gJ}`, `field f = ${field}`].join('\n');
  it('only B uncertain: u(E) = |g_J m_J μ_B| u(B)', () => {
    const r = analyze(setup('0.35(2) T', '2.0023')).result!;
    const exact = r.levels[0]!.at_fields[0]!.exact;
    for (const s of exact) expect(s.energy_Hz_unc).toBeCloseTo(2.0023 * 0.5 * BOHR_MAGNETON_HZ_PER_T * 0.02, 3);
    expect(r.fields[0]!.field_T_unc).toBeCloseTo(0.02, 15);
    // A constant moment has no uncertainty: no `_unc` rather than a printed 0.
    expect(exact.some((s) => 'moment_J_per_T_unc' in s)).toBe(false);
  });
  it('only g_J uncertain: u(E) = |m_J μ_B B| u(g_J), and the moment u(μ) = |m_J| u(g_J) μ_B', () => {
    const r = analyze(setup('0.35 T', '2.0023(4)')).result!;
    const s = r.levels[0]!.at_fields[0]!.exact[0]!;
    expect(s.energy_Hz_unc).toBeCloseTo(0.5 * BOHR_MAGNETON_HZ_PER_T * 0.35 * 0.0004, 4);
    expect(s.moment_bohr_unc).toBeCloseTo(0.5 * 0.0004, 12);
    expect(r.levels[0]!.g_J.used_unc).toBeCloseTo(0.0004, 15);
  });
  it('no uncertain input: no `_unc` anywhere and no input list', () => {
    const r = analyze(setup('0.35 T', '2.0023')).result!;
    expect(JSON.stringify(r)).not.toContain('_unc');
    expect(r.uncertainty_inputs).toBeUndefined();
    expect(r.version).toBe(2);
  });
});

describe('GUM against a seeded Monte Carlo (NumPy, JCGM 101 style), resonance field near a field-insensitive point', () => {
  it('half a gauss above the m = 0 line minimum: the GUM uncertainty is within 3 MC standard uncertainties of the MC spread', () => {
    const c = MC.cases.find((x) => x.name === 'half_gauss')!;
    const r = analyze(resonanceSetup(c)).result!;
    const hit = r.resonances[0]!.resonances!;
    expect(hit).toHaveLength(1);
    expect(hit[0]!.field_T).toBeCloseTo(c.field_T, 12);
    expect(Math.abs(hit[0]!.field_T_unc! - c.mc_std_T)).toBeLessThan(3 * c.mc_std_uncertainty_T);
    // The transition is pinned to the source: its frequency's uncertainty is u(f).
    expect(hit[0]!.transition.frequency_Hz_unc).toBeCloseTo(c.u_f_Hz, 6);
  });
  it('closer to the minimum the first-order value departs from the MC (the limit docs/uncertainty.md states), by under 5 %', () => {
    const c = MC.cases.find((x) => x.name === 'near_insensitive')!;
    const r = analyze(resonanceSetup(c)).result!;
    const hit = r.resonances[0]!.resonances![0]!;
    const rel = Math.abs(hit.field_T_unc! - c.mc_std_T) / c.mc_std_T;
    expect(rel).toBeGreaterThan(10 * c.mc_std_uncertainty_T / c.mc_std_T);
    expect(rel).toBeLessThan(0.05);
  });
});

describe('built-in data carry the uncertainties their source publishes', () => {
  it('Rb85 ground: A and g_J with their published uncertainties; the splitting 3A has u = 3 u(A)', () => {
    const r = analyze('species Rb85\n  level ground: 5s 2S1/2\n').result!;
    const l = r.levels[0]!;
    // Rubidium 85 D line data compilation (rev. 2.1.6), Table 5: A = h·1.011 910 813 0(20) GHz; Table 6: g_J = 2.002 331 13(20).
    expect(l.hyperfine!.A_Hz.uncertainty).toBeCloseTo(2, 9);
    expect(l.g_J.used_unc).toBeCloseTo(2e-7, 15);
    // Same compilation, Fig. 2: ground splitting 3.035 732 439 0(60) GHz.
    expect(l.hyperfine!.intervals[0]!.interval_Hz).toBeCloseTo(3035732439.0, 0);
    expect(l.hyperfine!.intervals[0]!.interval_Hz_unc).toBeCloseTo(6.0, 9);
    expect(r.uncertainty_inputs!.map((i) => i.id).sort()).toEqual(['level:Rb85.ground.A', 'level:Rb85.ground.g_J', 'species:Rb85.g_I']);
  });
  it('Rb87 ground: the splitting 2A prints with the published 6.834 682 610 904 290(90) GHz', () => {
    const r = analyze('species Rb87\n  level ground: 5s 2S1/2\n  level p: 5p 2P°3/2\n').result!;
    const [g, p] = r.levels;
    // Rubidium 87 D line data compilation, hyperfine-constant table: A(5²S1/2) = h·3.417 341 305 452 145(45) GHz,
    // A(5²P3/2) = h·84.7185(20) MHz, B(5²P3/2) = h·12.4965(37) MHz; the ground splitting 6.834 682 610 904 290(90) GHz.
    expect(g!.hyperfine!.A_Hz.uncertainty).toBeCloseTo(4.5e-5, 12);
    expect(p!.hyperfine!.A_Hz.uncertainty).toBeCloseTo(2000, 6);
    expect(p!.hyperfine!.B_Hz!.uncertainty).toBeCloseTo(3700, 6);
    expect(g!.hyperfine!.intervals[0]!.interval_Hz_unc).toBeCloseTo(9e-5, 12);
    expect(withUncertainty(g!.hyperfine!.intervals[0]!.interval_Hz, g!.hyperfine!.intervals[0]!.interval_Hz_unc, (v) => frequencyText(v, 15))).toBe('6.83468261090429(9) GHz');
  });
  it('Cs133 6p: A, B and C with the published uncertainties (the ground A is exact by the definition of the second)', () => {
    const r = analyze('species Cs133\n  level ground: 6s 2S1/2\n  level p1: 6p 2P°1/2\n  level p: 6p 2P°3/2\n').result!;
    const [g, p1, p] = r.levels;
    // Cesium D line data compilation, hyperfine-constant table: A(6²P1/2) = h·291.9201(75) MHz, A(6²P3/2) = h·50.288 27(23) MHz,
    // B(6²P3/2) = h·−0.4934(17) MHz, C(6²P3/2) = h·0.560(70) kHz.
    expect(g!.hyperfine!.A_Hz.uncertainty).toBeUndefined();
    expect(p1!.hyperfine!.A_Hz.uncertainty).toBeCloseTo(7500, 6);
    expect(p!.hyperfine!.A_Hz.uncertainty).toBeCloseTo(230, 6);
    expect(p!.hyperfine!.B_Hz!.uncertainty).toBeCloseTo(1700, 6);
    expect(p!.hyperfine!.C_Hz!.uncertainty).toBeCloseTo(70, 9);
  });
});

describe('where first order says nothing exact, the result says so', () => {
  it('a term with ζ = 0(0.1) GHz at zero field: every m block is degenerate, so the note uncertainty-one-sided is raised on the level', () => {
    const a = analyze('species Demo\n  mass = 40 u\n  level p: 3p 2P°  zeta = 0.0(1) GHz\nfield zero = 0 T\n');
    const note = a.problems.find((p) => p.code === 'uncertainty-one-sided');
    expect(note?.severity).toBe('info');
    expect(note?.range.start).toEqual({ line: 2, character: 8 });
    // The stretched state |m_L=+1, m_S=+1/2> is alone in its block: E = ζ/2 exactly, so u = u(ζ)/2 (linear).
    const top = a.result!.terms[0]!.at_fields[0]!.exact.find((s) => s.high_label === 'm_L=+1, m_S=+1/2')!;
    expect(top.energy_Hz_unc).toBeCloseTo(0.5e8, 3);
  });
});
