import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { reference } from '../physics/engine.wholeTerm.fixtures';

// ⁸⁷Rb 5P with the D-line frequencies as J-level energies and A_J, B_J (alkali D-line data compilation).
const RB = [
  'species Rb87',
  '  level p: 5p 2P°  E_J = 1/2 377.10746338 THz, 3/2 384.2304844685 THz',
  '    A_J = 1/2 408.328 MHz, 3/2 84.7185 MHz',
  '    B_J = 3/2 12.4965 MHz',
  'field f = 0.1 T',
  '',
].join('\n');

const codes = (text: string): string[] => analyze(text).problems.map((p) => p.code);

describe('a whole term with A_J, B_J and E_J (whole-term engine)', () => {
  const r = analyze(RB);
  const t = r.result!.terms[0]!;

  it('reports the radial parameters, the stated assumption and the J-level constants they give back', () => {
    expect(r.problems.filter((p) => p.severity !== 'info')).toEqual([]);
    expect(r.problems.map((p) => p.code)).toContain('hyperfine-between-levels-assumed');
    expect(t.zeta_Hz).toBeUndefined();
    expect(t.hyperfine!.source).toBe('level-constants, a_L = a_SD');
    // NumPy lstsq on the same data (tests/reference/engine_whole_term.json)
    expect(t.hyperfine!.a_orbital_Hz).toBeCloseTo(reference.cases.Rb87_5P.radial.orbital, 3);
    expect(t.hyperfine!.a_contact_Hz).toBeCloseTo(reference.cases.Rb87_5P.radial.contact, 3);
    expect(t.hyperfine!.levels.map((l) => [l.J_text, Math.round(l.A_Hz)])).toEqual([['1/2', 408328000], ['3/2', 84718500]]);
    // fine levels relative to the centre of gravity: Σ(2J+1) shift = 0, interval = the D-line difference
    const [a, b] = t.fine_levels;
    expect(2 * a!.shift_Hz + 4 * b!.shift_Hz).toBeCloseTo(0, 0);
    expect(b!.shift_Hz - a!.shift_Hz).toBeCloseTo((384.2304844685 - 377.10746338) * 1e12, -1);
  });

  it('energies at 0.1 T equal the independent NumPy construction (offset by the 5P1/2 energy)', () => {
    const want = reference.cases.Rb87_5P.energies_Hz[reference.cases.Rb87_5P.fields_T.indexOf(0.1)]!;
    const got = t.at_fields[0]!.exact.map((s) => s.energy_Hz - 377.10746338e12).sort((x, y) => x - y);
    expect(got.length).toBe(24);
    // absolute energies of 3.8e14 Hz carry ~0.06 Hz of round-off
    for (let k = 0; k < 24; k++) expect(Math.abs(got[k]! - want[k]!)).toBeLessThan(1);
  });

  it('labels |J, F, m_F> at low field and |m_L, m_S, m_I> at high field', () => {
    const s = t.at_fields[0]!.exact;
    expect(s.some((x) => x.low_label === 'J=3/2, F=3, m_F=+3' && x.high_label === 'm_L=+1, m_S=+1/2, m_I=+3/2')).toBe(true);
  });
});

describe('whole-term settings: mistakes in plain words', () => {
  it.each([
    ['A_J names a J the term lacks', 'species Rb87\n  level p: 5p 2P°  zeta = 4.75 THz\n    A_J = 5/2 1 MHz, 1/2 408 MHz\n', 'term-level-unknown', '5/2 1 MHz'],
    ['E_J misses a level', 'species Rb87\n  level p: 5p 2P°  E_J = 1/2 0 Hz\n    A_J = 1/2 408 MHz, 3/2 84 MHz\n', 'term-fine-missing', '1/2 0 Hz'],
    ['zeta and E_J', 'species Rb87\n  level p: 5p 2P°  zeta = 4.75 THz  E_J = 1/2 0 Hz, 3/2 7.1 THz\n', 'term-fine-twice', '4.75 THz'],
    ['A_J on a J level', 'species Rb87\n  level p: 5p 2P°3/2  A_J = 3/2 84 MHz\n', 'per-level-needs-term', '3/2 84 MHz'],
    ['a group without a J', 'species Rb87\n  level p: 5p 2P°  zeta = 4.75 THz  A_J = 408 MHz\n', 'term-level-value-malformed', '408 MHz'],
    ['A, B on a term point at A_J', 'species Rb87\n  level p: 5p 2P°  zeta = 4.75 THz  A = 408 MHz\n', 'term-hyperfine-unsupported', '408 MHz'],
  ])('%s', (_what, text, code, at) => {
    const p = analyze(text).problems.find((x) => x.code === code)!;
    expect(p).toBeDefined();
    const line = text.split('\n')[p.range.start.line]!;
    expect(line.slice(p.range.start.character, p.range.end.character)).toBe(at);
  });

  it('one A_J for a ²P term cannot fix three radial parameters: said once, with no results at fields', () => {
    const r = analyze('species Rb87\n  level p: 5p 2P°  zeta = 4.75 THz  A_J = 3/2 84 MHz\nfield f = 1 T\n');
    const p = r.problems.filter((x) => x.code === 'level-not-computed');
    expect(p.length).toBe(1);
    expect(p[0]!.message).toContain('One A constant cannot fix');
    expect(r.result!.terms[0]!.at_fields).toEqual([]);
  });

  it('A_J hint in the term-hyperfine-unsupported message', () => {
    const m = analyze('species Rb87\n  level p: 5p 2P°  zeta = 4.75 THz  A = 408 MHz\n').problems.find((x) => x.code === 'term-hyperfine-unsupported')!.message;
    expect(m).toContain('A_J = <J> <value>');
  });

  it('E_J alone (no hyperfine data) is a fine-structure term without the nucleus, like zeta', () => {
    const r = analyze('species Li7\n  level p: 2p 2P°  E_J = 1/2 0 GHz, 3/2 10.053 GHz\nfield f = 1 mT\n');
    expect(r.problems.filter((p) => p.severity !== 'info')).toEqual([]);
    const t = r.result!.terms[0]!;
    expect(t.hyperfine).toBeUndefined();
    expect(t.at_fields[0]!.exact.map((s) => s.low_label)).toContain('J=3/2, m_J=+3/2');
    expect(codes('species Li7\n  level p: 2p 2P°  E_J = 1/2 0 GHz, 3/2 10.053 GHz\n')).toEqual([]);
  });
});

describe('whole-term notes and partial data', () => {
  it('the strong-field note names the whole-term labels |J, F, m_F> and |m_L, m_S, m_I>', () => {
    // ⁷Li 2P (fine structure 10 GHz) is decoupled at 30 T.
    const r = analyze('species Li7\n  level p: 2p 2P°  zeta = 6.7 GHz\n    A_J = 1/2 45.9 MHz, 3/2 -3.06 MHz\nfield f = 30 T\n');
    const n = r.problems.find((p) => p.code === 'zeeman-strong-field')!;
    expect(n.message).toContain('labels |J, F, m_F> no longer describe the states; read the |m_L, m_S, m_I> labels');
  });

  it('E_J naming a J the term lacks: the error, and fine levels only with numbers (no undefined shift in the JSON)', () => {
    const r = analyze('species Rb87\n  level p: 5p 2P°  E_J = 1/2 0 Hz, 5/2 7 THz\n    A_J = 1/2 408 MHz, 3/2 84 MHz\nfield f = 1 mT\n');
    expect(r.problems.map((p) => p.code)).toContain('term-level-unknown');
    const t = r.result!.terms[0]!;
    expect(t.at_fields).toEqual([]);
    for (const l of t.fine_levels) expect(Number.isFinite(l.shift_Hz)).toBe(true);
  });
});
