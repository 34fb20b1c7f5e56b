import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { textReport } from '../../server/src/cli/textReport';

const MU0 = 1.25663706127e-6; // CODATA 2022

/** Na23 ground level through two long conductors with opposite currents (invented numbers). */
function setup(opts: { wire?: string; magnet?: string; beam?: string } = {}): string {
  return [
    'species Na23',
    '  level ground: 3s 2S1/2',
    '',
    'wire rails',
    '  current   = 900 A',
    '  through   = 0, 2, 0 mm',
    '  direction = x',
    '  return    = 0, -2, 0 mm',
    opts.wire ?? '',
    '',
    'magnet selector',
    '  sources = rails',
    '  length  = 8 cm',
    '  at      = 0, 0, 1.5 mm',
    opts.magnet ?? '',
    '',
    'beam main',
    '  species  = Na23',
    '  level    = ground',
    '  source   = oven 600 K',
    '  slits    = 50 um, 50 um apart 80 cm',
    '  magnet   = selector',
    '  drift    = 40 cm',
    '  detector = 20 um',
    opts.beam ?? '',
    '',
  ].join('\n');
}

function codes(text: string): string[] {
  return analyze(text).result!.diagnostics.map((d) => d.code);
}

describe('a magnet built from sources', () => {
  it('reports |B| and ∂|B|/∂z of the sources at the beam line (two infinite wires: μ0 I a/π(a² + z²), textbook superposition)', () => {
    const m = analyze(setup()).result!.magnets[0]!;
    const a = 2e-3, z = 1.5e-3, I = 900;
    expect(m.sources).toEqual(['rails']);
    expect(m.at_m).toEqual([0, 0, 1.5e-3]);
    expect(Math.abs(m.field_T! / ((MU0 * I * a) / (Math.PI * (a * a + z * z))) - 1)).toBeLessThan(1e-9);
    expect(Math.abs(m.gradient_T_per_m! / ((-2 * MU0 * I * a * z) / (Math.PI * (a * a + z * z) ** 2)) - 1)).toBeLessThan(1e-9);
  });

  it('flies the beam through the field: field-map peaks, per-sublevel flights, no NaN, said in the text report', () => {
    const a = analyze(setup());
    const b = a.result!.beams[0]!;
    expect(b.computed).toBe(true);
    expect(b.deflection_model).toBe('field-map');
    expect(b.field_map!.flights).toBe(8 * 3);
    expect(b.field_map!.reference_speed_m_per_s).toBeGreaterThan(600);
    expect(b.sublevels.every((s) => s.field_map !== undefined)).toBe(true);
    // low-field seekers (μ < 0) go to weaker field: +z here, where |B| falls
    for (const s of b.sublevels) expect(Math.sign(s.mean_deflection_m)).toBe(-Math.sign(s.moment_J_per_T));
    expect(b.peaks.length).toBeGreaterThan(1);
    expect(b.resolving_gradient_T_per_m).toBeUndefined();
    // the two conductors' field does not turn along this line: round-off is shown as 0, not 1e-22
    expect(b.field_map!.worst_adiabaticity).toBe(0);
    expect(JSON.stringify(a.result)).not.toMatch(/NaN|Infinity/);
    const text = textReport('x.sublevel', a.result!).join('\n');
    expect(text).toContain("flights through the sources' field (field map)");
  });

  it('agrees with the uniform model given the same field and gradient when the deflection is small against the field scale', () => {
    const fast = '  source   = speed 3000 m/s';
    const mapped = analyze(setup().replace('  source   = oven 600 K', fast)).result!;
    const m = mapped.magnets[0]!;
    const uniform = analyze(
      setup().replace('  source   = oven 600 K', fast).replace('  sources = rails', `  field = ${m.field_T} T\n  gradient = ${m.gradient_T_per_m} T/m`).replace('  at      = 0, 0, 1.5 mm', ''),
    ).result!;
    const a = mapped.beams[0]!.sublevels;
    const u = uniform.beams[0]!.sublevels;
    expect(uniform.beams[0]!.deflection_model).toBeUndefined();
    // a 3000 m/s atom moves ≤ 10 µm across a field that changes on the 1 mm scale: agreement to ~1 %
    a.forEach((s, i) => expect(Math.abs(s.mean_deflection_m / u[i]!.mean_deflection_m - 1)).toBeLessThan(0.02));
  });

  it('says when the sources and numbers are both given, and uses the sources', () => {
    const r = analyze(setup({ magnet: '  field = 0.5 T' })).result!;
    expect(r.diagnostics.map((d) => d.code)).toContain('magnet-sources-and-numbers');
    expect(r.magnets[0]!.field_T).not.toBe(0.5);
  });

  it('a beam line that runs into a conductor is an error on the beam, and nothing is computed from it', () => {
    // a second conductor across the beam line, 2 cm after the magnet centre
    const text = setup({ wire: '\nwire cross\n  current = 10 A\n  through = 2, 0, 1.5 cm\n  direction = y' }).replace('  sources = rails', '  sources = rails, cross').replace('  through = 2, 0, 1.5 cm', '  through = 2, 0, 0.15 cm');
    const r = analyze(text).result!;
    const found = r.diagnostics.find((d) => d.code === 'magnet-line-meets-source')!;
    expect(found.message).toContain("runs into source 'cross' 6 cm into the magnet");
    // on the magnet's `at` setting, where the fix goes
    expect(found.line).toBe(text.split('\n').findIndex((l) => l.startsWith('  at ')) + 1);
    expect(r.beams[0]!.computed).toBe(false);
    expect(JSON.stringify(r)).not.toMatch(/NaN|Infinity/);
  });

  it('a magnet centred on one of its conductors is an error on `at` naming that source, and nothing is computed from it', () => {
    // `at` on the rail's return wire: the sum leaves that wire out there, so a value would mislead.
    const text = setup().replace('  at      = 0, 0, 1.5 mm', '  at      = 0, -2, 0 mm');
    const r = analyze(text).result!;
    const found = r.diagnostics.filter((d) => d.code === 'magnet-at-on-source');
    expect(found.map((d) => d.message)).toEqual(["the beam line of magnet 'selector' passes through a wire of source 'rails' at its centre, where the field is not defined; move `at`."]);
    expect(found[0]!.line).toBe(text.split('\n').findIndex((l) => l.startsWith('  at ')) + 1);
    expect(r.magnets[0]!.field_T).toBeUndefined();
    expect(JSON.stringify(r)).not.toMatch(/NaN|Infinity/);
  });

  it('warns of spin flips when the beam line passes the zero between two equal currents', () => {
    const text = setup().replace('  return    = 0, -2, 0 mm', '').replace('  sources = rails', '  sources = rails, twin').replace('  at      = 0, 0, 1.5 mm', '  at      = 0, 0, 0 mm') + '\nwire twin\n  current   = 900 A\n  through   = 0, -2, 0 mm\n  direction = x\n';
    const r = analyze(text).result!;
    expect(r.diagnostics.map((d) => d.code)).toContain('magnet-spin-flip-risk');
    expect(r.beams[0]!.field_map?.worst_adiabaticity).toBeNull();
    expect(JSON.stringify(r)).not.toMatch(/NaN|Infinity/);
  });

  it('a magnet with sources but no length asks for it', () => {
    expect(codes(setup().replace('  length  = 8 cm\n', ''))).toContain('magnet-incomplete');
  });
});
