/** The eval text report: unit echo, prefixes on derived units, π/σ spelling, no NaN or noise. */
import Ajv2020 from 'ajv/dist/2020';
import { readFileSync } from 'fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { finiteJsonText } from '../../server/src/eval/machineText';
import { textReport } from '../../server/src/cli/textReport';

const validate = new Ajv2020({ allErrors: true, strict: true }).compile(JSON.parse(readFileSync('docs/schema/evaluation.schema.json', 'utf8')));

// An invented scenario: a sodium beam with only F = 1 populated, fields written in mT, kG and G/cm.
const SETUP = `species Na23
  level ground: 3s 2S1/2
  level upper: 3p 2P°3/2
field bias = 25 mT
magnet sel
  field = 2 kG
  gradient = 50 G/cm
  length = 10 cm
beam b
  level = ground
  source = oven 600 K
  slits = 50 um, 50 um apart 30 cm
  magnet = sel
  drift = 40 cm
  detector = 20 um
  populations = 1 1
resonance r
  level = ground
  lower = 1 -1
  upper = 2 -1
  range = 0 mT, 20 mT
line D2: ground -> upper
`;

function report(text: string): { text: string; json: string } {
  const a = analyze(text);
  if (!a.result) throw new Error('no result');
  return { text: textReport('t.sublevel', a.result).join('\n'), json: finiteJsonText(a.result, 2) };
}

describe('eval text report', () => {
  const { text, json } = report(SETUP);

  it('shows quantities in the units the file wrote them in', () => {
    expect(text).toContain('at field bias = 25 mT');
    expect(text).toContain('at magnet sel = 2 kG');
    expect(text).toMatch(/sel +2 kG +50 G\/cm +10 cm/);
    expect(text).toContain('searched 0 mT … 20 mT');
    expect(text).toContain('in the intermediate regime at field bias (25 mT)');
    expect(text).not.toContain('250 G');
  });

  it('counts one sublevel in the singular', () => {
    // A J = 0 level without nuclear spin has 2J + 1 = 1 sublevel.
    const a = analyze('species Demo\n  mass = 40 u\n  level g: 1S0\n');
    const text = textReport('t.sublevel', a.result!).join('\n');
    expect(text).toContain(', 1 sublevel');
    expect(text).not.toContain('1 sublevels');
  });

  it('gives field sensitivities an SI prefix', () => {
    // The slopes are the engine's (checked in tests/physics); this checks how they are written:
    // −3.354704e9 Hz/T = −335.4704 kHz/G and 2.666337e10 Hz/T = 2.666337 MHz/G (1 G = 1e-4 T).
    // (with the uncertainty of the built-in constants in parentheses).
    expect(text).toMatch(/-335\.\d+(\(\d+\))? kHz\/G/);
    expect(text).toMatch(/2\.666\d+(\(\d+\))? MHz\/G/);
    expect(text).not.toMatch(/\d{5,} Hz\/G/);
  });

  it('writes polarisations as π, σ+, σ− and never in ASCII', () => {
    expect(text).toMatch(/ σ[+−] /);
    expect(text).toMatch(/ π /);
    expect(text).not.toMatch(/sigma|\bpi\b/);
  });

  it('has no NaN, Infinity or missing peak written as a number; an unpopulated sublevel says so', () => {
    expect(text).not.toMatch(/NaN|Infinity/);
    expect(text).toMatch(/F=2, m_F=\+2 .* no atoms/);
    expect(json).not.toMatch(/NaN|Infinity/);
    // null appears only as the documented 'no peak' of an unpopulated sublevel, and as the documented
    // 'none up to 100×' of the resolving values: the three F = 1 sublevels land in one merged peak.
    expect(json.match(/"resolving_(gradient_T_per_m|magnet_length_m|drift_m)": null/g)).toHaveLength(3);
    expect(json.match(/null/g)?.length).toBe(json.match(/"peak_m": null/g)!.length + 3);
  });

  it('the JSON gives an unpopulated sublevel a null peak and stays valid', () => {
    const doc = JSON.parse(json);
    expect(validate(doc), JSON.stringify(validate.errors)).toBe(true);
    const unpopulated = doc.beams[0].sublevels.filter((s: { population: number }) => s.population === 0);
    expect(unpopulated.length).toBe(5);
    for (const s of unpopulated) expect(s.peak_m).toBeNull();
    expect(doc.fields[0].field_unit).toBe('mT');
    expect(doc.magnets[0]).toMatchObject({ field_unit: 'kG', gradient_unit: 'G/cm', length_unit: 'cm' });
    expect(doc.resonances[0].range_units).toEqual(['mT', 'mT']);
  });

  it('prints the dip between well-separated peaks as 0 %, not as rounding noise', () => {
    const li = report(readFileSync('examples/lithium-beam.sublevel', 'utf8')).text;
    expect(li).toContain('dip 0 % of the smaller peak → resolved (criterion ≤ 80 %)');
    expect(li).not.toMatch(/\de-\d+ %/);
  });

  it('prints the undeflected peak of an m_J = 0 sublevel as 0, not as rounding noise', () => {
    // Invented scenario: Sr88 3P1 without a nucleus; m_J = 0 has no moment, so it is not deflected.
    const t = report(`species Sr88
  level t: 5s 5p 3P°1
magnet sel
  field = 0.3 T
  gradient = 100 T/m
  length = 5 cm
beam b
  level = t
  source = speed 500 m/s
  slits = 20 um, 20 um apart 30 cm
  magnet = sel
  drift = 40 cm
  detector = 10 um
`).text;
    expect(t).toMatch(/J=1, m_J=0 +m_J=0 +0 +0 µm +0 µm/);
    expect(t).toMatch(/^ +0 µm +50 µm +J=1, m_J=0$/m);
    expect(t).not.toMatch(/\de-\d+ (nm|µm)/);
  });

  it('shows configurations space-separated with the ° parity mark', () => {
    const t = report('species Li7\n  level g: 1s2.2s 2S1/2\n  level e: 1s2.2p 2Po3/2\n').text;
    expect(t).toContain('level g: 1s2 2s ²S₁/₂');
    expect(t).toContain('level e: 1s2 2p ²P°₃/₂');
    expect(t).not.toContain('1s2.2');
  });

  it('a line without components points at the finding that says why, by code and place', () => {
    const { text } = report('species Li7\n  level g: 2s 2S1/2\n  level t: 2p 2P E_J = 1/2 0 GHz, 3/2 10 GHz\nfield f = 100 G\nline L: g -> t\n');
    expect(text).toContain('  no components: see warning line-to-whole-term at 5:14');
    expect(text).toMatch(/\n  5:14 warning line-to-whole-term /);
    expect(text).toContain('diagnostics: 0 errors, 1 warning, 1 note');
  });

  it('an emission line is headed lower -> upper and says how it was written', () => {
    const { text } = report('species Na23\n  level g: 3s 2S1/2\n  level p: 3p 2P°3/2\nline L: p -> g\n');
    expect(text).toContain('line L: g -> p (Na23) (written as emission, upper level first)');
    // The built-in D2 frequency 508.848 716 2(13) THz (sodium D line data compilation; its uncertainty from memory).
    // The wavelength carries the line centre's uncertainty, carried over as u(λ) = λ u(ν)/ν (Steck: 589.158 326 4 nm).
    expect(text).toMatch(/line centre 508\.848\d*\(\d+\) THz \(vacuum wavelength 589\.15832\d*\(\d+\) nm\)/);
  });
});

describe('text report of a line to a whole term', () => {
  it('says how its strengths are normalised and gives the centroid g_eff', () => {
    const { text } = report('species Na23\n  level g: 3s 2S1/2\n  level p: 3p 2P° zeta = 343.68 GHz\nfield f = 1 T\nline L: g -> p\n');
    expect(text).toMatch(/Zeeman components at field f = 1 T \(strength = \(2L_u\+1\)\|<l\|d_q\|u>\|² \/ \|<L_u\|\|d\|\|L_l>\|²; σ± centroid g_eff [0-9.]+\):/);
  });
});
