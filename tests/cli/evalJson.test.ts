import Ajv2020 from 'ajv/dist/2020';
import { readFileSync } from 'fs';
import { describe, expect, it } from 'vitest';
import { cli } from './runCli';

const schema = JSON.parse(readFileSync('docs/schema/evaluation.schema.json', 'utf8'));
const validate = new Ajv2020({ allErrors: true, strict: true }).compile(schema);

function evalJson(file: string) {
  const r = cli('eval', file, '--format', 'json');
  return { code: r.code, doc: JSON.parse(r.out) };
}

describe('sublevel eval --format json', () => {
  it.each(['lithium-beam', 'rubidium-bias', 'handmade-species', 'mistakes', 'lithium-whole-term', 'fit-rubidium', 'sodium-slower', 'coils-and-wires'])('%s validates against the published JSON Schema', (f) => {
    const { doc } = evalJson(`examples/${f}.sublevel`);
    const ok = validate(doc);
    expect(validate.errors ?? []).toEqual([]);
    expect(ok).toBe(true);
  });

  it('lists the field sources with their parts, centre values, winding and cautions; none in a file without sources', () => {
    const { code, doc } = evalJson('examples/coils-and-wires.sublevel');
    expect(code).toBe(0);
    expect(doc.fieldSources.map((s: { name: string; kind: string }) => `${s.kind} ${s.name}`)).toEqual(['coil quad', 'coil bias', 'wire rail', 'slab pole']);
    const [quad, bias, rail, pole] = doc.fieldSources;
    expect(quad.parts).toHaveLength(2);
    expect(quad.pair).toEqual({ sense: 'opposite', spacing_m: 0.07, spacing_over_radius: 2 });
    expect(quad.field_T).toEqual([0, 0, 0]);
    // 120 turns × 2 coils × 2π × 3.5 cm of 1.2 mm copper at 15 A (IEC annealed copper; hand-computed): 181.03 W.
    expect(quad.winding.power_W).toBeCloseTo(181.0345, 3);
    expect(quad.winding.cooling).toBe('water');
    expect(bias.centre_m).toEqual([0, 0, 0.09]);
    // A single loop's centre: μ0 N I / 2R = 1.25663706127e-6 × 80 / 0.12 = 8.37758e-4 T (CODATA 2022 μ0).
    expect(bias.field_abs_T).toBeCloseTo(8.3775804e-4, 10);
    expect(rail.winding).toBeUndefined();
    expect(pole.cautions[0]).toMatch(/^Permanent magnet/);
    expect(doc.diagnostics.map((d: { code: string }) => d.code)).toEqual(['coil-needs-cooling']);
    expect(evalJson('examples/rubidium-bias.sublevel').doc.fieldSources).toBeUndefined();
    const text = cli('eval', 'examples/coils-and-wires.sublevel').out;
    expect(text).toContain('\ncoil bias: one loop\n  at the centre (0, 0, 9) cm: |B| = 8.3776 G, B = (0, 0, 8.3776) G\n');
  });

  it('gives the 87Rb ground hyperfine interval and g_F values', () => {
    const { code, doc } = evalJson('examples/rubidium-bias.sublevel');
    expect(code).toBe(0);
    const ground = doc.levels.find((l: { level: string }) => l.level === 'ground');
    // 6 834 682 610.904 Hz: published 87Rb ground-state hyperfine splitting (alkali D-line data compilation for Rb-87).
    expect(ground.hyperfine.intervals[0].interval_Hz).toBeCloseTo(6834682610.904, 2);
    // g_F = ±1/2 · (g_J ∓ ...) ≈ -0.50182671 and +0.49983643 (same compilation lists -0.50182670 and 0.49983642; from memory).
    expect(ground.hyperfine.levels[0].g_F).toBeCloseTo(-0.5018267, 6);
    expect(ground.hyperfine.levels[1].g_F).toBeCloseTo(0.4998364, 6);
    expect(ground.sublevel_count).toBe(8);
  });

  it('reports linear energies m_F g_F μ_B B at the named fields', () => {
    const { doc } = evalJson('examples/rubidium-bias.sublevel');
    const ground = doc.levels.find((l: { level: string }) => l.level === 'ground');
    const trap = ground.at_fields.find((f: { source: { name: string } }) => f.source.name === 'trap');
    expect(trap.field_T).toBeCloseTo(3.23e-4, 15);
    const top = trap.linear.find((s: { label: string }) => s.label === 'F=2, m_F=+2');
    // μ_B/h = 13 996 244 917.1 Hz/T (CODATA 2022).
    const expected = ground.hyperfine.levels[1].shift_Hz + 2 * ground.hyperfine.levels[1].g_F * 13996244917.1 * 3.23e-4;
    expect(top.energy_Hz).toBeCloseTo(expected, 0);
  });
});

describe('sublevel eval --format json with uncertain inputs (version 2)', () => {
  const { doc } = evalJson('tests/fixtures/uncertain.sublevel');
  it('validates against the schema and lists its independent inputs', () => {
    expect(validate(doc)).toBe(true);
    expect(validate.errors ?? []).toEqual([]);
    expect(doc.version).toBe(2);
    expect(doc.uncertainty_inputs.map((i: { id: string }) => i.id)).toEqual([
      'field:bias', 'magnet:selector.field', 'magnet:selector.gradient', 'magnet:selector.length',
      'level:Li7.ground.A', 'level:Li7.ground.g_J', 'level:Li7.p_term.zeta', 'level:Li7.upper.A', 'level:Li7.upper.B',
      // The built-in ⁷Li D2 line enters as its two pieces: the lithium anchor, shared by all four built-in lithium
      // lines, and the read fine structure (docs/species-data.md, tests/eval/sharedBuiltinInputs.test.ts).
      'builtin:Li7.D1', 'builtin:Li7.2P-fine-structure', 'beam:main.drift', 'resonance:rf.frequency',
    ]);
  });
  it('gives the beam sublevels a deflection uncertainty that follows ⟨z⟩ ∝ μ G (L1²/2 + L1 L2) (GUM, product rule)', () => {
    const s = doc.beams[0].sublevels[0];
    const m = doc.magnets[0];
    const L1 = m.length_m;
    const L2 = 0.35;
    const lever = 0.5 * L1 * L1 + L1 * L2;
    const rel = Math.hypot(
      s.moment_J_per_T_unc / s.moment_J_per_T,
      m.gradient_T_per_m_unc / m.gradient_T_per_m,
      ((L1 + L2) * m.length_m_unc) / lever,
      (L1 * 0.002) / lever,
    );
    expect(s.mean_deflection_m_unc / Math.abs(s.mean_deflection_m)).toBeCloseTo(rel, 10);
  });
  it('gives every deflected peak a position uncertainty (docs/uncertainty.md; value checked in tests/eval/peakUncertainty.test.ts)', () => {
    for (const p of doc.beams[0].peaks) expect(p.position_m_unc / Math.abs(p.position_m)).toBeGreaterThan(1e-3);
    for (const s of doc.beams[0].sublevels) expect(s.peak_m_unc).toBeGreaterThan(0);
  });
  it('gives the term its fine-structure shifts with u = |shift/ζ| u(ζ) (linear in ζ)', () => {
    for (const f of doc.terms[0].fine_levels) expect(f.shift_Hz_unc).toBeCloseTo(Math.abs(f.shift_Hz / 6.7e9) * 2e7, 3);
  });
  it('gives line components offset uncertainties from both levels and the field (stretched pair: GUM, every term linear)', () => {
    const bias = doc.lines[0].at_fields.find((f: { source: { name: string } }) => f.source.name === 'bias');
    const c = bias.components.find((x: { lower_label: string; upper_label: string }) => x.lower_label === 'F=2, m_F=+2' && x.upper_label === 'F=3, m_F=+3');
    const gJu = doc.levels.find((l: { level: string }) => l.level === 'upper').g_J.used;
    const muB = 9.2740100657e-24 / 6.62607015e-34; // CODATA 2022 μ_B/h, Hz/T
    // E_l = (3/4) A_l + μ_B B (g_J,l/2 + 3 g_I/2); E_u = (9/4) A_u + B_u/4 + μ_B B (3 g_J,u/2 + 3 g_I/2) (stretched
    // states, exact at any field; the quadrupole term of F = I + J = 3 for I = J = 3/2 is B/4). The upper B is the
    // built-in −0.221(29) MHz (alkali hyperfine review; value and uncertainty from memory).
    const u = Math.hypot(0.75 * 0.5, 2.25 * 2000, 0.25 * 29e3, muB * (1.5 * gJu - 0.5 * 2.002301) * 3e-6, 0.5 * muB * 5e-4 * 2e-6);
    expect(c.offset_Hz_unc).toBeCloseTo(u, 3);
  });
  it('gives the resonance field found an uncertainty', () => {
    expect(doc.resonances[0].resonances[0].field_T_unc).toBeGreaterThan(0);
  });
});
