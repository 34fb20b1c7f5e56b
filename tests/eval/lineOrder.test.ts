import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';

const NA = 'species Na23\n  level g: 3s 2S1/2\n  level p: 3p 2P3/2\nfield bias = 1 mT\n';

function codes(text: string): string[] {
  return analyze(text).result!.diagnostics.map((d) => `${d.line}:${d.column} ${d.severity} ${d.code}`);
}

describe('line order and whole-term lines', () => {
  it('an emission line (upper level first) is computed the right way round, positive, and said so', () => {
    const forward = analyze(NA + 'line L: g -> p\n').result!.lines[0]!;
    const r = analyze(NA + 'line L: p -> g\n').result!;
    const back = r.lines[0]!;
    // Na D2 at 508.848 716 2 THz (alkali D-line data compilation, from memory).
    expect(back.line_centre_Hz! / 508.8487162e12).toBeCloseTo(1, 9);
    expect(back.line_centre_Hz).toBe(forward.line_centre_Hz);
    expect(back.lower).toBe('g');
    expect(back.upper).toBe('p');
    expect(back.written_as_emission).toBe(true);
    expect(forward.written_as_emission).toBeUndefined();
    expect(back.at_fields[0]!.components.map((c) => c.offset_Hz)).toEqual(forward.at_fields[0]!.components.map((c) => c.offset_Hz));
    for (const c of back.at_fields[0]!.components) expect(c.absolute_Hz!).toBeGreaterThan(0);
    expect(codes(NA + 'line L: p -> g\n')).toContain('5:9 info line-written-as-emission');
    expect(codes(NA + 'line L: g -> p\n')).not.toContain('5:9 info line-written-as-emission');
  });

  it('two levels of equal energy: a warning, offsets only, no centre (no infinite wavelength)', () => {
    const text = 'species X\n  mass = 10 u\n  level a: 3s 2S1/2 energy = 100 THz\n  level b: 3p 2P°1/2 energy = 100 THz\nfield f = 1 mT\nline L: a -> b\n';
    const r = analyze(text).result!;
    expect(r.diagnostics.map((d) => d.code)).toContain('line-levels-same-energy');
    expect(r.lines[0]!.line_centre_Hz).toBeUndefined();
    expect(r.lines[0]!.at_fields[0]!.components.length).toBeGreaterThan(0);
    for (const c of r.lines[0]!.at_fields[0]!.components) expect(c.absolute_Hz).toBeUndefined();
  });

  it('a line to a whole term known only by E_J (no nucleus in the engine) gets a warning at the term that says what to write', () => {
    const text = 'species Na23\n  level g: 3s 2S1/2\n  level p: 3p 2P E_J = 1/2 0 GHz, 3/2 515 GHz\nline L: g -> p\n';
    const d = analyze(text).result!.diagnostics.find((x) => x.code === 'line-to-whole-term')!;
    expect(d).toMatchObject({ severity: 'warning', line: 4, column: 14 });
    expect(d.message).toContain('A_J = 1/2 <A>, 3/2 <A>');
  });

  it('a line to a whole term with zeta is computed (it used to stop with line-to-whole-term and no components)', () => {
    const text = 'species Na23\n  level g: 3s 2S1/2\n  level p: 3p 2P zeta = 343.68 GHz\nfield f = 1 T\nline L: g -> p\n';
    const r = analyze(text).result!;
    expect(r.diagnostics.map((x) => x.code)).not.toContain('line-to-whole-term');
    const c = r.lines[0]!.at_fields[0]!.components;
    // 2 × 4 lower (F, m_F) and 6 × 4 upper (m_L, m_S, m_I) sublevels; every upper one decays with total strength 1
    const out = new Map<string, number>();
    for (const x of c) out.set(x.upper_high_label!, (out.get(x.upper_high_label!) ?? 0) + x.strength);
    expect(out.size).toBe(24);
    for (const v of out.values()) expect(v).toBeCloseTo(1, 12);
    expect(r.lines[0]!.strengths_reduced_in).toBe('L');
  });
});
