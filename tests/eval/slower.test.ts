/**
 * Slowers through the whole pipeline: the example file against scripts/reference/slower.py
 * (SciPy; CODATA 2022), the driven pair's rate from the engine against μ_B/h (g_u J_u − g_l J_l),
 * and every bad input as a plain-words diagnostic at its place.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { slowerReport } from '../../server/src/eval/slowerText';
import { BOHR_MAGNETON_HZ_PER_T } from '../../server/src/physics/constants';

interface RefCase { name: string; length_m: number; detuning_Hz: number; delta_B_T: number; bias_T: number; a_max_m_per_s2: number; flight: { final_m_per_s: number } }
const REF = JSON.parse(readFileSync(new URL('../reference/slower.json', import.meta.url), 'utf8')) as { cases: RefCase[] };

const NA = `species Na23
  level ground: 3s 2S1/2
  level p32:    3p 2P°3/2
  level p12:    3p 2P°1/2

line D2: ground -> p32
line D1: ground -> p12
`;

function run(text: string) {
  const a = analyze(text);
  return { result: a.result!, problems: a.problems, text };
}

/** The problem with this code, and the text its range covers. */
function problem(r: ReturnType<typeof run>, code: string) {
  const p = r.problems.find((x) => x.code === code);
  if (!p) throw new Error(`no ${code} among ${r.problems.map((x) => `${x.code}: ${x.message}`).join('\n')}`);
  const lines = r.text.split('\n');
  const covered = p.range.start.line === p.range.end.line ? lines[p.range.start.line]!.slice(p.range.start.character, p.range.end.character) : '';
  return { ...p, covered };
}

describe('the example file', () => {
  const r = run(readFileSync(new URL('../../examples/sodium-slower.sublevel', import.meta.url), 'utf8'));
  const s = r.result.slowers![0]!;
  const ref = REF.cases.find((c) => c.name === 'sodium example file')!;

  it('has no errors or warnings', () => {
    expect(r.problems.filter((p) => p.severity === 'error' || p.severity === 'warning')).toEqual([]);
  });

  it('length, ΔB, bias, detuning and the flight agree with SciPy (the built-in energies give λ to 1e-10)', () => {
    expect(s.computed).toBe(true);
    expect(Math.abs(s.a_max_m_per_s2! / ref.a_max_m_per_s2 - 1)).toBeLessThan(1e-9);
    expect(Math.abs(s.length_m! / ref.length_m - 1)).toBeLessThan(1e-6);
    expect(Math.abs(s.delta_B_T! / ref.delta_B_T - 1)).toBeLessThan(1e-6);
    expect(Math.abs(s.bias_T! / ref.bias_T - 1)).toBeLessThan(1e-6);
    expect(Math.abs(s.detuning_Hz! / ref.detuning_Hz - 1)).toBeLessThan(1e-6);
    expect(Math.abs(s.flight!.final_m_per_s - ref.flight.final_m_per_s)).toBeLessThan(1e-3);
  });

  it('the wavelength carries the D2 energy\'s uncertainty: u(λ) = λ u(ν)/ν, in JSON and in the text', () => {
    // The stored Na D2 energy, 508.848 716 2(13) THz (compilation value, recalled uncertainty): 1.3 MHz / 508.85 THz × 589.158 nm.
    expect(s.wavelength_m_unc! / s.wavelength_m!).toBeCloseTo(1.3e6 / 508.8487162e12, 15);
    expect(slowerReport(s).join('\n')).toContain('λ = 589.1583263(15) nm (vacuum)');
  });

  it('drives the stretched σ+ pair with the closed-form rate μ_B/h (g_u·3/2 − g_l·1/2) (Steck g-factors)', () => {
    expect(s.driven_pair).toMatchObject({ lower: 'F=2, m_F=+2', upper: 'F=3, m_F=+3', cycling: true });
    expect(s.driven_pair!.rate_Hz_per_T / (BOHR_MAGNETON_HZ_PER_T * (1.3342 * 1.5 - 2.002296 * 0.5))).toBeCloseTo(1, 9);
    expect(s.driven_pair!.rate_spread).toBeLessThan(1e-9);
    expect(s.polarisation).toBe('sigma+');
  });

  it('gives 101 uniform samples from the entrance to the exit, and 6 more where the fields bend at the exit, with the coils’ field and the flight through it', () => {
    expect(s.samples).toHaveLength(107);
    const zs = s.samples!.map((x) => x.z_m);
    for (let i = 0; i <= 100; i++) expect(zs).toContain((s.length_m! * i) / 100);
    // Uniform only over the smooth first 85 %.
    expect(zs.filter((z) => z < 0.85 * s.length_m!)).toHaveLength(85);
    expect(s.samples![0]!.B_ideal_T).toBeCloseTo(s.entry_field_T!, 12);
    expect(s.samples!.at(-1)!.z_m).toBeCloseTo(s.length_m!, 12);
    expect(s.samples!.at(-1)!.flight_speed_m_per_s).toBeCloseTo(s.coils!.flight!.final_m_per_s, 9);
    for (const x of s.samples!) {
      expect(Number.isFinite(x.flight_speed_m_per_s)).toBe(true);
      // The 20 sections follow the profile to within a few gauss, except near the zero crossing where the ratio means nothing.
      expect(Math.abs(x.B_coils_T! - x.B_ideal_T)).toBeLessThan(20e-4);
    }
  });

  it('the coil design catches 950 m/s, drops nobody and brings the atom near the final speed', () => {
    expect(s.coils!.sources).toHaveLength(20);
    expect(s.coils!.capture_m_per_s).toBeGreaterThan(950);
    expect(s.coils!.drop_at_m).toBeUndefined();
    expect(s.coils!.flight!.final_m_per_s).toBeGreaterThan(25);
    expect(s.coils!.flight!.final_m_per_s).toBeLessThan(40);
  });

  it('a last section with too few turns releases the atoms early: they leave fast, and the message gives the exit fields', () => {
    const short = run(readFileSync(new URL('../../examples/sodium-slower.sublevel', import.meta.url), 'utf8').replace('turns = 372', 'turns = 60'));
    const w = short.result.slowers![0]!;
    const p = problem(short, 'slower-coils-exit-fast');
    expect(p.severity).toBe('warning');
    expect(p.message).toMatch(/leaves the coils' field at 2\d\d(\.\d)? m\/s, well above the final speed 30 m\/s: at the exit the coils give -2\d\d(\.\d)? G where the profile needs -557\.8 G/);
    expect(w.coils!.drop_at_m).toBeUndefined();
  });

  it('the same coils at 15 % less current miss the fast atoms: capture below, and the atom is not slowed', () => {
    const weak = run(readFileSync(new URL('../../examples/sodium-slower.sublevel', import.meta.url), 'utf8').replace(/current = (-?)20 A/g, 'current = $117 A'));
    const w = weak.result.slowers![0]!;
    expect(w.coils!.capture_m_per_s).toBeLessThan(0.95 * 950);
    expect(problem(weak, 'slower-coils-capture-below').message).toMatch(/resonant with atoms up to 8\d\d(\.\d+)? m\/s only, below the capture speed 950 m\/s/);
    expect(w.coils!.flight!.final_m_per_s).toBeGreaterThan(800);
  });

  it('shows the laser and coil cautions', () => {
    expect(s.cautions.join(' ')).toMatch(/Slowing laser at 589 nm.*safety officer/);
    expect(s.cautions.join(' ')).toMatch(/Slower coils for up to 558 G/);
  });
});

describe('designs', () => {
  it('increasing: σ− on the bottom pair, zero field at the entrance, red detuning by v0/λ', () => {
    const r = run(`${NA}
slower up
  line = D2
  capture = 600 m/s
  final = 25 m/s
  design = increasing
`);
    const s = r.result.slowers![0]!;
    expect(s.polarisation).toBe('sigma-');
    expect(s.driven_pair).toMatchObject({ lower: 'F=2, m_F=-2', upper: 'F=3, m_F=-3', cycling: true });
    expect(s.entry_field_T).toBe(0);
    expect(s.exit_field_T!).toBeGreaterThan(0);
    expect(s.detuning_Hz! * s.wavelength_m!).toBeCloseTo(-600, 6);
  });

  it('a bias written in G is echoed in G and sets the detuning', () => {
    const r = run(`${NA}
slower zs
  line = D2
  capture = 600 m/s
  final = 25 m/s
  bias = -100 G
`);
    const s = r.result.slowers![0]!;
    expect(s.bias_T).toBeCloseTo(-0.01, 15);
    expect(s.bias_unit).toBe('G');
    expect(s.detuning_Hz! / (s.driven_pair!.rate_Hz_per_T * -0.01)).toBeCloseTo(1, 12);
  });
});

describe('diagnostics', () => {
  it('a line without a lifetime says which level needs `lifetime = … ns`', () => {
    const r = run(`species Nalike
  mass = 23 u
  I = 0
  level g: 3s 2S1/2
  level e: 3p 2P°3/2  energy = 16973 cm^-1

line L: g -> e

slower s
  line = L
  capture = 800 m/s
  final = 20 m/s
`);
    const p = problem(r, 'slower-line-no-data');
    expect(p.severity).toBe('error');
    expect(p.message).toContain("add `lifetime = … ns` (or `linewidth = … MHz`) to level 'e'");
    expect(p.message).toContain("add `energy = …` (e.g. in THz or cm^-1) to level 'g'");
    expect(p.covered).toBe('L');
    expect(r.result.slowers![0]!.computed).toBe(false);
  });

  it('a hand-made J = 1/2 → 3/2 line without a nucleus cycles on |m_J = +1/2> → |m_J = +3/2>', () => {
    const r = run(`species Nalike
  mass = 23 u
  I = 0
  level g: 3s 2S1/2  energy = 0 cm^-1
  level e: 3p 2P°3/2  energy = 16973 cm^-1  lifetime = 16 ns

line L: g -> e

slower s
  line = L
  capture = 800 m/s
  final = 20 m/s
`);
    const s = r.result.slowers![0]!;
    expect(s.computed).toBe(true);
    expect(s.driven_pair!.cycling).toBe(true);
    // The stretched pair's closed form μ_B/h (g_u·3/2 − g_l·1/2) with the Landé g_J the level results report.
    const gl = r.result.levels.find((l) => l.level === 'g')!.g_J.used;
    const gu = r.result.levels.find((l) => l.level === 'e')!.g_J.used;
    expect(s.driven_pair!.rate_Hz_per_T / (BOHR_MAGNETON_HZ_PER_T * (1.5 * gu - 0.5 * gl))).toBeCloseTo(1, 9);
  });

  it('D1 does not cycle: a warning naming the dark sublevel; with `repump = on` a note', () => {
    const text = (extra: string): string => `${NA}
slower s
  line = D1
  capture = 600 m/s
  final = 25 m/s
${extra}`;
    const w = problem(run(text('')), 'slower-not-cycling');
    expect(w.severity).toBe('warning');
    // The weak-field rate of D1's σ+ pair is negative, so a decreasing design drives the σ− side.
    expect(w.message).toMatch(/σ− light pumps the atoms into F=2, m_F=-2 .* ends at m = −2/);
    expect(w.covered).toBe('D1');
    const n = problem(run(text('  repump = on\n')), 'slower-not-cycling');
    expect(n.severity).toBe('info');
    expect(n.message).toContain('repump = on');
    expect(problem(run(text('')), 'slower-rate-varies').severity).toBe('info');
  });

  it.each([
    ['final = 700 m/s', 'slower-final-not-below-capture', '700 m/s'],
    ['safety = 1.5', 'slower-safety-out-of-range', '1.5'],
    ['safety = 0', 'slower-safety-out-of-range', '0'],
    ['design = sideways', 'value-not-allowed', 'sideways'],
    ['saturation = -1', 'value-out-of-range', '-1'],
  ])('%s → %s', (setting, code, covered) => {
    const key = setting.split(' ')[0]!;
    const base = ['line = D2', 'capture = 600 m/s', 'final = 25 m/s'].filter((l) => !l.startsWith(key));
    const r = run(`${NA}
slower s
${[...base, setting].map((l) => `  ${l}`).join('\n')}
`);
    const p = problem(r, code);
    expect(p.severity).toBe('error');
    expect(p.covered).toBe(covered);
    for (const x of r.result.slowers ?? []) for (const v of Object.values(x)) if (typeof v === 'number') expect(Number.isFinite(v)).toBe(true);
  });

  it('a slower without its settings says which; an unknown line is named', () => {
    const r = run(`${NA}
slower s
  line = D3
`);
    expect(problem(r, 'slower-incomplete').message).toContain('no capture, final');
    expect(problem(r, 'name-unknown').covered).toBe('D3');
  });

  it('too little light for η: a warning at the safety setting', () => {
    const r = run(`${NA}
slower s
  line = D2
  capture = 600 m/s
  final = 25 m/s
  safety = 0.8
  saturation = 1
`);
    const p = problem(r, 'slower-saturation-too-low');
    expect(p.severity).toBe('warning');
    expect(p.covered).toBe('0.8');
    // And the simulated atom indeed cannot keep up: it leaves far above the final speed.
    expect(r.result.slowers![0]!.flight!.final_m_per_s).toBeGreaterThan(300);
  });

  it('a bias that makes a decreasing profile cross zero gets a note', () => {
    const r = run(`${NA}
slower s
  line = D2
  capture = 600 m/s
  final = 25 m/s
  bias = -300 G
`);
    expect(problem(r, 'slower-design-mismatch').severity).toBe('info');
    expect(r.result.slowers![0]!.zero_crossing_m).toBeGreaterThan(0);
  });
});
