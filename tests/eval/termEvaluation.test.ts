import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { BOHR_MAGNETON, ELECTRON_GS } from '../../server/src/physics/constants';

const text = 'species Li7\n  level p: 2p 2P°  zeta = 6.70 GHz\nfield weak = 1 mG\nfield strong = 20 T\n';

describe('a whole term with fine structure (level without J, with zeta)', () => {
  const r = analyze(text);
  const t = r.result!.terms[0]!;

  it('has no problems and is not mistaken for a J level', () => {
    expect(r.problems.filter((p) => p.severity === 'error' || p.severity === 'warning')).toEqual([]);
    expect(r.result!.levels).toEqual([]);
  });

  it('splits into J levels by the Landé interval rule: E(3/2) − E(1/2) = 3ζ/2 (textbook)', () => {
    const [j12, j32] = t.fine_levels;
    expect(j32!.shift_Hz - j12!.shift_Hz).toBeCloseTo(1.5 * 6.7e9, 3);
    // centre of gravity: Σ(2J+1) E_J = 0
    expect(2 * j12!.shift_Hz + 4 * j32!.shift_Hz).toBeCloseTo(0, 3);
    expect(j12!.g_J).toBeCloseTo((4 - ELECTRON_GS) / 3, 14); // Landé 2P1/2 with g_L = 1, g_s = |g_e|
  });

  it('weak field: moments are −g_J m_J μ_B; strong field: −(m_L + g_s m_S) μ_B (Paschen–Back)', () => {
    const weak = t.at_fields.find((f) => f.source.name === 'weak')!.exact;
    const top = weak.find((s) => s.low_label.includes('J=3/2, m_J=+3/2'))!;
    expect(top.moment_J_per_T / BOHR_MAGNETON).toBeCloseTo(-(t.fine_levels[1]!.g_J * 1.5), 6);
    const strong = t.at_fields.find((f) => f.source.name === 'strong')!;
    expect(strong.regime?.verdict).toMatch(/^strong/);
    const s = strong.exact.find((x) => x.high_label === 'm_L=+1, m_S=+1/2')!;
    expect(s.moment_bohr).toBeCloseTo(-(1 + ELECTRON_GS / 2), 9);
    const mixed = strong.exact.find((x) => x.high_label === 'm_L=0, m_S=+1/2')!;
    expect(mixed.moment_bohr).toBeCloseTo(-(ELECTRON_GS / 2), 2);
  });

  it('warns when zeta is given together with J, and when J is missing without zeta', () => {
    const codes = (t: string) => analyze(t).problems.map((p) => p.code);
    expect(codes('species Li7\n  level p: 2p 2P°3/2  zeta = 6.7 GHz\n')).toContain('zeta-needs-term');
    expect(codes('species Li7\n  level p: 2p 2P°\n')).toContain('level-needs-j');
    expect(codes('species Li7\n  level p: 2p 2P°  zeta = 6.7 GHz  A = 3 MHz\n')).toContain('term-hyperfine-unsupported');
  });
});
