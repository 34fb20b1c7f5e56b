/**
 * The `r2` key of a whole term (⟨r²⟩ of the valence electron): read in a0^2, passed to the engine
 * (diamagnetic term on), reported in JSON; the note when a term without it would need it; the
 * problems for a bad r2. Setups are invented scenarios (⁷Li 2P data as in the example file).
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { exactAtField } from '../../server/src/eval/exactAtField';
import { BOHR_RADIUS } from '../../server/src/physics/constants';
import { diamagneticHzPerT2, type WholeTermSpec } from '../../server/src/physics/engine';
import { LI7_2P } from '../physics/engine.wholeTerm.fixtures';
import { level } from '../fixtures/builtinLookup';

/** A J-level energy as the built-in ⁷Li entry publishes it (value and unit), so the setup follows the table. */
const published = (key: string): string => {
  const e = level('Li7', key).energyPublished!;
  return `${e.value} ${e.unit}`;
};
const term = (extra: string, fields: string) => `species Li7
  level p: 2p 2P°  E_J = 1/2 ${published('P1/2')}, 3/2 ${published('P3/2')}
    A_J = 1/2 45.9365 MHz, 3/2 -3.055 MHz
    B_J = 3/2 -0.221 MHz${extra}
${fields}`;
const STRONG = 'field weak = 2 G\nfield strong = 3 T\n';
const codes = (text: string) => analyze(text).problems.map((p) => p.code);

describe('r2 on a whole term', () => {
  it('turns the diamagnetic term on: JSON block with ⟨r²⟩ and e²⟨r²⟩/8mₑh, energies at 3 T moved by the term', () => {
    const withR2 = analyze(term('\n    r2 = 27.1 a0^2', STRONG)).result!.terms[0]!;
    const without = analyze(term('', STRONG)).result!.terms[0]!;
    const r2 = 27.1 * BOHR_RADIUS ** 2;
    expect(withR2.diamagnetic!.r2_m2).toBeCloseTo(r2, 35);
    expect(withR2.diamagnetic!.Hz_per_T2).toBeCloseTo(diamagneticHzPerT2(r2), 6);
    expect(without.diamagnetic).toBeUndefined();
    // The highest state at 3 T is |m_L=+1, m_S=+1/2, m_I=+3/2> (alone in its block): shift (e²B²⟨r²⟩/8mₑh)·4/5 exactly.
    const top = (t: typeof without) => t.at_fields[1]!.exact.reduce((a, b) => (b.energy_Hz > a.energy_Hz ? b : a)).energy_Hz;
    expect(top(withR2) - top(without)).toBeCloseTo(diamagneticHzPerT2(r2) * 0.8 * 9, -1);
    // At 2 G the term is 1e-8 of that: the energies agree to far below a hertz.
    expect(Math.abs(withR2.at_fields[0]!.exact[0]!.energy_Hz - without.at_fields[0]!.exact[0]!.energy_Hz)).toBeLessThan(0.1);
  });

  it('a term with ζ alone and r2 goes through the whole-term engine (the fine mode has no diamagnetic term)', () => {
    const r = analyze('species Li7\n  level p: 2p 2P°  zeta = 6.7 GHz  r2 = 27 a0^2\nfield f = 1 T\n').result!.terms[0]!;
    expect(r.diamagnetic?.r2_m2).toBeCloseTo(27 * BOHR_RADIUS ** 2, 35);
  });

  it('says when the term is left out but would matter (3 T), and not when every field is weak (2 G) or r2 is given', () => {
    const note = analyze(term('', STRONG)).result!.diagnostics.find((d) => d.code === 'diamagnetic-not-included');
    expect(note?.message).toMatch(/^term Li7\.p is computed without the diamagnetic term, which would change its splittings by up to about 1\.6 MHz at field strong \(3 T\) \(hydrogenic estimate, ⟨r²⟩ ≈ 30 a0², n = 2\)/);
    expect(codes(term('', 'field weak = 2 G\n'))).not.toContain('diamagnetic-not-included');
    expect(codes(term('\n    r2 = 27.1 a0^2', STRONG))).not.toContain('diamagnetic-not-included');
  });

  it('r2 of zero or below, r2 in the wrong unit, and r2 on a J level are said in plain words', () => {
    expect(codes(term('\n    r2 = 0 a0^2', STRONG))).toContain('r2-not-positive');
    expect(codes(term('\n    r2 = 27 MHz', STRONG))).toContain('unit-wrong-dimension');
    const onJ = analyze('species Li7\n  level p: 2p 2P°3/2  r2 = 27 a0^2\nfield f = 1 T\n').problems.find((p) => p.code === 'r2-needs-term');
    expect(onJ?.message).toMatch(/whole term only/);
  });
});

describe('exact results memo', () => {
  it('tells apart two whole terms that differ only in their J-level energies or ⟨r²⟩', () => {
    const other: WholeTermSpec = { ...LI7_2P, levelEnergies: [{ twoJ: 1, energyHz: 0 }, { twoJ: 3, energyHz: 20e9 }] };
    const a = exactAtField(LI7_2P, 0.1).exact.map((s) => s.energy_Hz);
    const b = exactAtField(other, 0.1).exact.map((s) => s.energy_Hz);
    const c = exactAtField({ ...LI7_2P, r2M2: 27 * BOHR_RADIUS ** 2 }, 0.1).exact.map((s) => s.energy_Hz);
    expect(Math.max(...b) - Math.max(...a)).toBeGreaterThan(9e9);
    expect(Math.abs(Math.max(...c) - Math.max(...a))).toBeGreaterThan(1e3);
  });
});

describe('r2 in the text report and the hover', () => {
  it('the report line and the hover name ⟨r²⟩ in a0² (what the file wrote)', async () => {
    const { textReport } = await import('../../server/src/cli/textReport');
    const { fineStructureSection } = await import('../../server/src/features/hover/fineStructureSection');
    const r = analyze(term('\n    r2 = 27.1 a0^2', STRONG)).result!;
    expect(fineStructureSection(r.terms[0]!)).toContain('diamagnetic term on (⟨r²⟩ = 27.1 a₀²)');
    expect(textReport('t.sublevel', r).join('\n')).toMatch(/diamagnetic term: ⟨r²⟩ = 27\.1 a0², e²⟨r²⟩\/8mₑh = 403\.4\d* kHz\/T² × ⟨sin²θ⟩ of m_L/);
  });
});
