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
    expect(codes(NA + 'line L: p -> g\n')).toContain('5:1 info line-written-as-emission');
    expect(codes(NA + 'line L: g -> p\n')).not.toContain('5:1 info line-written-as-emission');
  });

  it('two levels of equal energy: a warning, offsets only, no centre (no infinite wavelength)', () => {
    const text = 'species X\n  mass = 10 u\n  level a: 3s 2S1/2 energy = 100 THz\n  level b: 3p 2P°1/2 energy = 100 THz\nfield f = 1 mT\nline L: a -> b\n';
    const r = analyze(text).result!;
    expect(r.diagnostics.map((d) => d.code)).toContain('line-levels-same-energy');
    expect(r.lines[0]!.line_centre_Hz).toBeUndefined();
    expect(r.lines[0]!.at_fields[0]!.components.length).toBeGreaterThan(0);
    for (const c of r.lines[0]!.at_fields[0]!.components) expect(c.absolute_Hz).toBeUndefined();
  });

  it('a line to a whole term (zeta, no J) gets a warning at the term that says what to write', () => {
    const text = 'species Na23\n  level g: 3s 2S1/2\n  level p: 3p 2P zeta = 10 GHz\nline L: g -> p\n';
    const d = analyze(text).result!.diagnostics.find((x) => x.code === 'line-to-whole-term')!;
    expect(d).toMatchObject({ severity: 'warning', line: 4, column: 14 });
    expect(d.message).toContain('2P3/2');
  });
});
