/**
 * The `trap` block through the whole pipeline: model, evaluation, diagnostics. Anti-Helmholtz
 * gradient from the textbook closed form dB_z/dz = 3 μ0 N I a R² / (R² + a²)^{5/2} for loops of
 * radius R at ±a (Griffiths, Introduction to Electrodynamics, the on-axis loop field differentiated).
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { trapSummaryLines } from '../../server/src/eval/trapText';

const MU0 = 1.25663706127e-6; // CODATA 2022 vacuum permeability

const PAIR = (current: string) => `species Rb87
  level ground: 5s 2S1/2
coil quad
  radius  = 4 cm
  turns   = 100
  current = ${current}
  spacing = 8 cm
  sense   = opposite
`;

function pairGradient(ampereTurns: number): number {
  const R = 0.04;
  const a = 0.04;
  return (3 * MU0 * ampereTurns * a * R * R) / (R * R + a * a) ** 2.5;
}

describe('trap from an anti-Helmholtz pair', () => {
  const text = `${PAIR('20 A')}trap q
  sources     = quad
  level       = ground
  temperature = 300 uK
  cut         = 3 mK
`;
  const r = analyze(text);
  const t = r.result!.traps![0]!;

  it('holds |2,+2⟩, |2,+1⟩ and |1,−1⟩ at the zero; the strongest |B| gradient is the axial one of the closed form', () => {
    expect(t.computed).toBe(true);
    expect(t.sublevels.filter((s) => s.trapped).map((s) => s.label).sort()).toEqual(['F=1, m_F=-1', 'F=2, m_F=+1', 'F=2, m_F=+2']);
    const s = t.sublevels.find((x) => x.label === 'F=2, m_F=+2')!;
    expect(s.shape).toBe('linear');
    expect(Math.abs(s.gradients_T_per_m![0] / pairGradient(2000) - 1)).toBeLessThan(1e-6);
    expect(Math.abs(s.gradients_T_per_m![1] / (pairGradient(2000) / 2) - 1)).toBeLessThan(1e-6);
    expect(s.rf_cut).toBeDefined();
    expect(s.majorana!.rate_per_s).toBeGreaterThan(0);
  });

  it('takes the default region from the coils: 90 % of the way to the windings, √(4² + 4²) cm', () => {
    expect(t.region!.from).toBe('sources');
    expect(t.region!.radius_m).toBeCloseTo(0.9 * Math.hypot(0.04, 0.04), 12);
  });

  it('a weak pair cannot hold |2,+1⟩: the diagnostic names the gradient it needs and the one it has', () => {
    const weak = analyze(`${PAIR('5 A')}trap q\n  sources = quad\n  level = ground\n`);
    const msgs = weak.problems.filter((p) => p.code === 'trap-gravity-too-strong').map((p) => p.message);
    // "has": the largest |B| gradient along gravity below the centre; at the centre it is the closed form's.
    const has = weak.result!.traps![0]!.gravity_gradient_T_per_m!;
    expect(has).toBeGreaterThanOrEqual(pairGradient(500) * (1 - 1e-9));
    expect(msgs).toContain(`trap 'q': This trap cannot hold |F=2, m_F=+1⟩ against gravity: it needs ≥ 30.5 G/cm along gravity (has ${Number((has * 100).toPrecision(3))} G/cm).`);
    expect(msgs).toHaveLength(2);
  });

  it('a trap without sources or level says so; unknown names get did-you-mean', () => {
    const codes = analyze(`${PAIR('20 A')}trap q\n  level = ground\n`).problems.map((p) => p.code);
    expect(codes).toContain('trap-incomplete');
    const unknown = analyze(`${PAIR('20 A')}trap q\n  sources = qaud\n  level = ground\n`).problems.find((p) => p.code === 'name-unknown');
    expect(unknown?.message).toMatch(/did you mean 'quad'/);
  });

  it('gravity off, cut as a frequency, region and centre by hand', () => {
    const x = analyze(`${PAIR('20 A')}trap q\n  sources = quad\n  level = ground\n  gravity = off\n  cut = 20 MHz\n  region = 2 cm\n  centre = 0, 0, 1 mm\n`);
    const tr = x.result!.traps![0]!;
    expect(tr.gravity).toBe('off');
    expect(tr.region).toEqual({ centre_m: [0, 0, 0.001], radius_m: 0.02, from: 'file', unit: 'cm' });
    // The radius's written unit wins over the centre's: one unit for both.
    expect(trapSummaryLines(tr)[1]).toContain('region 2 cm about (0, 0, 0.1) cm');
    expect(tr.cut_J).toBeCloseTo(6.62607015e-34 * 20e6, 40);
    expect(tr.sublevels.find((s) => s.label === 'F=2, m_F=+2')!.rf_cut).toBeDefined();
  });

  it('bad values: a cut in metres, a negative temperature', () => {
    const codes = analyze(`${PAIR('20 A')}trap q\n  sources = quad\n  level = ground\n  cut = 3 m\n  temperature = -1 K\n`).problems.map((p) => p.code);
    expect(codes).toContain('unit-wrong-dimension');
    expect(codes).toContain('value-out-of-range');
  });

  it('a temperature unit typed in the wrong case gets its did-you-mean and fix: 2 mk as a cut, 200 uk as a temperature', () => {
    const problems = analyze(`${PAIR('20 A')}trap q\n  sources = quad\n  level = ground\n  cut = 2 mk\n  temperature = 200 uk\n`).problems.filter((p) => p.code === 'unit-unknown');
    expect(problems.map((p) => [p.message, p.data?.suggestions])).toEqual([
      ["cut needs an energy written as a temperature (e.g. 1 mK) or a frequency (e.g. 20 MHz); unknown unit 'mk' — did you mean 'mK'?", ['mK']],
      ["unknown unit 'uk' — did you mean 'uK'?", ['uK']],
    ]);
  });

  it('writes round-off of the searches as 0: the zero of the field is at the origin with |B| = 0', () => {
    const s = t.sublevels.find((x) => x.label === 'F=2, m_F=+2')!;
    expect(s.minimum_m).toEqual([0, 0, 0]);
    expect(s.field_at_minimum_T).toBe(0);
    expect(t.field_at_centre_T).toBe(0);
  });

  it('never prints NaN or Infinity', () => {
    expect(JSON.stringify(r.result)).not.toMatch(/NaN|Infinity/);
  });
});

describe('a trap on a conductor (the sum of its sources leaves that part out there)', () => {
  const withWire = (centre: string) => `${PAIR('20 A')}wire w
  current   = 3 A
  through   = 0, 0, 0 cm
  direction = x
trap q
  sources = quad, w
  level   = ground
${centre}`;

  it('a wire through the default centre: an error at the wire’s `through` (what the file wrote), the trap related, no sublevels, no NaN', () => {
    const r = analyze(withWire(''));
    const p = r.problems.filter((x) => x.code === 'trap-on-conductor');
    expect(p.map((x) => x.message)).toEqual(["trap 'q': The trap's centre lies on a wire of its sources, where the field has no value: no trap is computed. Move the centre or the source."]);
    expect(p[0]!.severity).toBe('error');
    const lines = withWire('').split('\n');
    expect(lines[p[0]!.range.start.line]).toBe('  through   = 0, 0, 0 cm');
    expect(p[0]!.related!.map((x) => [lines[x.range.start.line], x.message])).toEqual([['trap q', "trap 'q' (no `centre` written: its centre is the origin)"]]);
    expect(r.problems.map((x) => x.code)).not.toContain('trap-region-invalid');
    expect(r.result!.traps![0]!.computed).toBe(false);
    expect(JSON.stringify(r.result)).not.toMatch(/NaN|Infinity/);
  });

  it('a centre given on the wire: the error sits on `centre`, the wire’s `through` related', () => {
    const text = withWire('  centre  = 1 cm, 0, 0\n');
    const p = analyze(text).problems.find((x) => x.code === 'trap-on-conductor')!;
    const lines = text.split('\n');
    expect(lines[p.range.start.line]).toBe('  centre  = 1 cm, 0, 0');
    expect(p.related!.map((x) => [lines[x.range.start.line], x.message])).toEqual([['  through   = 0, 0, 0 cm', "wire 'w' is placed here"]]);
  });

  it('a region that meets a block’s face below the centre (where the gravity ray ends): the error sits on `region`, not on `centre`', () => {
    // The block's top face is at z = −1 cm, the region's lowest point (invented numbers).
    const text = `${PAIR('20 A')}slab plate
  size          = 10, 10, 2 cm
  magnetisation = 1 mT along z
  centre        = 0, 0, -2 cm
trap q
  sources = quad, plate
  level   = ground
  centre  = 0, 0, 0
  region  = 1 cm
`;
    const p = analyze(text).problems.find((x) => x.code === 'trap-on-conductor')!;
    expect(p.message).toMatch(/The trap region meets the surface of a magnetised block/);
    const lines = text.split('\n');
    expect(lines[p.range.start.line]).toBe('  region  = 1 cm');
    expect(p.related!.map((x) => lines[x.range.start.line])).toEqual(['  centre        = 0, 0, -2 cm']);
  });
});


describe('a weak pair without gravity: the minimum is the field zero, not round-off beside it', () => {
  // 1 mA through one turn: |B| of nT–µT. Each trapped sublevel's potential carries its GHz hyperfine
  // energy, so offsets of ~1e-10 m are below its round-off; before, |2,+1⟩ read a sag of 0.087 nm.
  const r = analyze(`${PAIR('1 mA').replace('turns   = 100', 'turns   = 1')}trap q\n  sources = quad\n  level   = ground\n  gravity = off\n`);
  const trapped = r.result!.traps![0]!.sublevels.filter((s) => s.trapped);
  it('every trapped sublevel sits at the centre with sag 0', () => {
    expect(trapped.map((s) => s.label).sort()).toEqual(['F=1, m_F=-1', 'F=2, m_F=+1', 'F=2, m_F=+2']);
    for (const s of trapped) {
      expect(s.sag_m, s.label).toBe(0);
      expect(s.minimum_m, s.label).toEqual([0, 0, 0]);
    }
  });
});
