import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { ATOMIC_MASS_UNIT, NUCLEAR_MAGNETON, BOHR_MAGNETON } from '../../server/src/physics/constants';

/** Problems as "line:col code" (1-based), for compact table-style assertions; regime notes left out. */
function problems(text: string): string[] {
  return analyze(text).problems.filter((p) => !p.code.startsWith('zeeman-') && p.code !== 'beam-unresolved').map((p) => `${p.range.start.line + 1}:${p.range.start.character + 1} ${p.code}`);
}

function model(text: string) {
  const a = analyze(text);
  if (!a.model) throw new Error('no model');
  return a.model;
}

describe('species', () => {
  it('loads built-in data and lets the file override it', () => {
    const m = model('species Rb87\n  mass = 86.9 u\n  level ground: 5s 2S1/2  A = 3.4 GHz\n');
    const s = m.species[0]!;
    expect(s.builtin?.id).toBe('Rb87');
    expect(s.massKg?.value).toBeCloseTo(86.9 * ATOMIC_MASS_UNIT, 40);
    expect(s.massKg?.source).toBe('this file');
    expect(s.twoI.value).toBe(3);
    const ground = s.levels[0]!;
    expect(ground.A?.value).toBe(3.4e9);
    expect(ground.A?.source).toBe('this file');
    // g_J not written in the file: taken from the built-in level of the same term, with its citation.
    expect(ground.gJMeasured?.source).toMatch(/Steck/);
  });

  it('accepts alias spellings of built-in species', () => {
    for (const name of ['87Rb', 'Rb-87', 'Rb87']) {
      expect(model(`species ${name}\n`).species[0]!.builtin?.id, name).toBe('Rb87');
    }
  });

  it('requires a mass for a species defined by hand and suggests a built-in name', () => {
    const a = analyze('species Rb78\n');
    const p = a.problems.find((x) => x.code === 'species-needs-mass')!;
    // The canonical id leads the message (not an alias such as rubidium-87).
    expect(p.message).toMatch(/^'Rb78' is not a built-in species; did you mean Rb87\b/);
    expect(p.data).toMatchObject({ suggestions: expect.arrayContaining(['Rb87']) });
    expect(p.range).toEqual({ start: { line: 0, character: 8 }, end: { line: 0, character: 12 } });
  });

  it('converts mu_I to g_I with the μ_B sign convention', () => {
    const m = model('species X\n  mass = 10 u\n  I = 3/2\n  mu_I = 3 muN\n');
    // g_I = −(μ_I/μ_N)(μ_N/μ_B)/I (our stated convention, H = μ_B B (g_J J_z + g_I I_z)).
    expect(m.species[0]!.gI.value).toBeCloseTo((-3 * NUCLEAR_MAGNETON) / BOHR_MAGNETON / 1.5, 15);
  });

  it('warns about a nuclear spin without a nuclear moment', () => {
    expect(problems('species X\n  mass = 10 u\n  I = 1\n')).toEqual(['1:9 species-needs-nuclear-g']);
  });

  it('rejects spins that are not multiples of 1/2', () => {
    expect(problems('species X\n  mass = 10 u\n  I = 0.7\n  g_I = 0.001\n')).toEqual(['3:7 spin-not-half-integer']);
    expect(problems('species X\n  mass = 10 u\n  I = -1/2\n')).toEqual(['3:7 spin-negative']);
  });

  it('rejects a negative mass', () => {
    expect(problems('species X\n  mass = -3 u\n')).toEqual(['2:10 value-out-of-range']);
  });
});

describe('levels', () => {
  it('reports duplicate level names with a pointer to the first', () => {
    const a = analyze('species Na23\n  level g: 3s 2S1/2\n  level g: 3p 2P°1/2\n');
    const p = a.problems.find((x) => x.code === 'name-duplicate')!;
    expect(p.range.start).toEqual({ line: 2, character: 8 });
    expect(p.related?.[0]?.range.start).toEqual({ line: 1, character: 8 });
  });

  it('places term-symbol problems inside the designation', () => {
    expect(problems('species Na23\n  level u: 3p 2P°5/2\n')).toEqual(['2:18 term-j-out-of-range']);
  });

  it('flags hyperfine constants that cannot act', () => {
    expect(problems('species Na23\n  level g: 3s 2S1/2  B = 2 MHz\n')).toEqual(['2:26 quadrupole-cannot-act']);
    expect(problems('species Na23\n  level g: 3s 2S1/2  C = 2 kHz\n')).toEqual(['2:26 octupole-cannot-act']);
    expect(problems('species X\n  mass = 4 u\n  level g: 2S1/2  A = 2 MHz\n')).toEqual(['3:23 hyperfine-without-nucleus']);
  });

  it('asks for J when the term has none', () => {
    expect(problems('species X\n  mass = 4 u\n  level g: 2P\n')).toEqual(['3:12 level-needs-j']);
  });

  it('points out a measured g_J far from the LS value', () => {
    expect(problems('species X\n  mass = 4 u\n  level g: 2P3/2  g_J = 1.2\n')).toEqual(['3:25 gj-measured-differs']);
    expect(problems('species X\n  mass = 4 u\n  level g: 2P3/2  g_J = 1.3341\n')).toEqual([]);
  });
});

describe('names and references', () => {
  const base = 'species Na23\n  level ground: 3s 2S1/2\n  level upper: 3p 2P°3/2\n';

  it('resolves line ends and offers did-you-mean', () => {
    const a = analyze(base + 'line D2: ground -> uper\n');
    const p = a.problems.find((x) => x.code === 'name-unknown')!;
    expect(p.data?.suggestions).toEqual(['upper']);
    expect(a.model!.lines[0]!.lower?.name).toBe('ground');
  });

  it('needs a species qualifier when two species share a level name', () => {
    const text = base + 'species K39\n  level ground: 4s 2S1/2\n' + 'magnet m\n  field = 1 T\n  gradient = 1 T/m\n  length = 1 cm\n'
      + 'beam b\n  level = ground\n  source = oven 400 K\n  slits = 20 um, 20 um apart 30 cm\n  magnet = m\n  drift = 10 cm\n';
    expect(problems(text)).toContain('11:11 name-ambiguous');
    // No detector: the beam engine's note that the pattern is for a point detector is forwarded, and
    // (the built-in K39 constants being uncertain) that the peaks then get no uncertainty.
    expect(problems(text.replace('level = ground', 'level = K39.ground'))).toEqual(['10:6 beam-point-detector', '10:6 uncertainty-undefined']);
  });

  it('records declarations and uses for go-to-definition', () => {
    const m = model(base + 'line D2: ground -> upper\n');
    const uses = m.names.filter((n) => !n.isDeclaration && n.kind === 'level');
    expect(uses.map((u) => [u.name, u.target?.range.start.line])).toEqual([['ground', 1], ['upper', 2]]);
  });
});

describe('apparatus', () => {
  it('reads magnets in SI units', () => {
    const m = model('magnet s\n  field = 4500 G\n  gradient = 18 G/cm\n  length = 8 cm\n');
    const mag = m.magnets[0]!;
    expect(mag.fieldT?.value).toBeCloseTo(0.45, 12);
    expect(mag.gradientTPerM?.value).toBeCloseTo(0.18, 12);
    expect(mag.lengthM?.value).toBeCloseTo(0.08, 12);
  });

  it('reports an incomplete magnet and a non-positive length', () => {
    expect(problems('magnet s\n  field = 1 T\n  length = 0 cm\n')).toEqual(['1:8 magnet-incomplete', '3:12 value-out-of-range']);
  });

  it('reads the three source forms', () => {
    const beam = (src: string) => model(`beam b\n  source = ${src}\n`).beams[0]!.source?.value;
    expect(beam('oven 720 K')).toEqual({ kind: 'oven', temperatureK: 720 });
    expect(beam('jet 1500 m/s spread 8 %')).toEqual({ kind: 'jet', speedMPerS: 1500, spreadFraction: 0.08 });
    expect(beam('speed 400 m/s')).toEqual({ kind: 'speed', speedMPerS: 400 });
  });

  it('rejects impossible sources', () => {
    const codes = (src: string) => analyze(`beam b\n  source = ${src}\n`).problems.map((p) => p.code).filter((c) => c !== 'beam-incomplete');
    expect(codes('oven -20 K')).toEqual(['beam-source-malformed']);
    expect(codes('oven 20 m')).toEqual(['unit-wrong-dimension']);
    expect(codes('furnace 400 K')).toEqual(['beam-source-malformed']);
    expect(codes('jet 1500 m/s')).toEqual(['beam-source-malformed']);
    expect(codes('jet 1500 m/s spread 150 %')).toEqual(['beam-source-malformed']);
  });

  it('flags a beam whose level belongs to another species than the one it names, at the level', () => {
    const text = 'species Na23\n  level g: 3s 2S1/2\nspecies Li7\n  level g: 2s 2S1/2\nbeam b\n  species = Na23\n  level = Li7.g\n';
    const found = analyze(text).problems.filter((p) => p.code === 'beam-level-of-other-species');
    expect(found.map((p) => [p.range.start.line, p.range.start.character, p.range.end.character])).toEqual([[6, 10, 15]]);
    expect(found[0]!.message).toBe("beam 'b' carries Na23, but its level 'g' belongs to Li7; name a level of Na23, or change the species.");
    // No beam result mixes Na23's mass with Li7's moments: the beam has no level, so it is not flown.
    expect(model(text).beams[0]!.level).toBeUndefined();
    // The same level named through the beam's own species, or with no species written, is fine.
    const clean = (t: string) => analyze(t).problems.filter((p) => p.code === 'beam-level-of-other-species');
    expect(clean(text.replace('level = Li7.g', 'level = Na23.g'))).toEqual([]);
    expect(clean(text.replace('  species = Na23\n', ''))).toEqual([]);
  });

  it('reads slits and rejects malformed ones', () => {
    const m = model('beam b\n  slits = 80 um, 50 um apart 40 cm\n');
    const slits = m.beams[0]!.slits!.value;
    expect(slits.firstM).toBeCloseTo(80e-6, 15);
    expect(slits.secondM).toBeCloseTo(50e-6, 15);
    expect(slits.separationM).toBeCloseTo(0.4, 15);
    expect(analyze('beam b\n  slits = 80 um 50 um\n').problems.map((p) => p.code)).toContain('beam-slits-malformed');
  });

  it('reads settings', () => {
    const m = model('settings\n  g_s = 2\n  reduced_mass = on\n');
    expect(m.settings).toEqual({ gS: 2, reducedMass: true });
    expect(problems('settings\n  g_s = 3\n')).toEqual(['2:9 value-not-allowed']);
  });
});
