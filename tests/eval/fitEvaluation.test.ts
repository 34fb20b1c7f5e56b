/**
 * Fits through the whole pipeline: the example file, a detector-profile round trip, CSV data
 * beside the setup, and every kind of bad input the issue names — each a problem at the right
 * place, nothing thrown, never the starting values passed off as a result.
 */
import { readFileSync } from 'fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { beamInputs } from '../../server/src/eval/beamInput';
import { gJLookup } from '../../server/src/eval/gJLookup';
import { memorySources } from '../../server/src/model/sources';
import { profileModel } from '../../server/src/physics/fit';
import { solveLevel } from '../../server/src/physics/engine';
import { hyperfineSpec } from '../../server/src/eval/levelSpec';
import { magnetAndBeam, speciesX } from '../fixtures/ovenBeam';

const RB = 'species Rb87\n  level g: 5s 2S1/2\n';
const pair = (lower: string, upper: string) => `  level = g\n  lower = ${lower}\n  upper = ${upper}\n`;

function codesAt(text: string, opts?: Parameters<typeof analyze>[1]): { code: string; line: number }[] {
  return analyze(text, opts).problems.map((p) => ({ code: p.code, line: p.range.start.line }));
}

describe('fits in the setup file', () => {
  it('the example file: g_J and A as SciPy finds them (tests/reference/fit_reference.json), both calibration roots', () => {
    const ref = JSON.parse(readFileSync('tests/reference/fit_reference.json', 'utf8'));
    const r = analyze(readFileSync('examples/fit-rubidium.sublevel', 'utf8')).result!;
    const [bias, constants] = r.fits!;
    expect(bias!.kind).toBe('calibration');
    expect(bias!.roots!.map((x) => x.field_T * 1e4)).toEqual([expect.closeTo(2.15228, 5), expect.closeTo(4.30555, 5)]);
    expect(constants!.status).toBe('converged');
    expect(constants!.parameters[0]!.value).toBeCloseTo(ref.gj_a.params[0], 8);
    expect(constants!.parameters[1]!.value / ref.gj_a.params[1]).toBeCloseTo(1, 9);
    expect(constants!.parameters[1]!.uncertainty! / ref.gj_a.errors[1]).toBeCloseTo(1, 3);
  });

  it('a resonance at an unknown field and A fitted together, the field starting from a calibration root', () => {
    const text = `${RB}data d\n${pair('1 0', '2 0')}  point = 6834.7212(1) MHz\ndata e\n${pair('1 1', '2 1')}  point = 6836.1284(1) MHz\nfit f\n  data = d, e\n  free = field, A\n`;
    const f = analyze(text).result!.fits![0]!;
    expect(f.status).toBe('converged');
    expect(f.dof).toBe(0);
    expect(f.parameters[0]!.value * 1e4).toBeGreaterThan(0.9);
    expect(codesAt(text).map((c) => c.code)).toContain('fit-too-few-points');
  });

  it('a detector profile: gradient, offset, background and amplitude recovered from seeded counts; gradient and temperature cannot be told apart', () => {
    const setup = speciesX('39 u', '2S1/2') + magnetAndBeam().replace('detector = 10 um', 'detector = 80 um');
    const base = analyze(setup);
    const beam = base.model!.beams[0]!;
    const gJOf = gJLookup(base.result!.levels);
    const inputs = beamInputs(beam, gJOf)!;
    const spec = hyperfineSpec(beam.level!, gJOf(beam.level!)!)!;
    const positions = Float64Array.from({ length: 161 }, (_, i) => -4e-3 + (8e-3 * i) / 160);
    const truth = profileModel({ input: inputs.input, spec, magnetFieldT: 0.5, twoF: solveLevel(spec, 0.5).states.map(() => 1) }, positions, new Float64Array(161).fill(1), ['offset'], 30e-6);
    const clean = new Float64Array(161);
    truth.model(Float64Array.from([30e-6, 0.5]), clean);
    let seed = 7;
    const rand = () => ((seed = (seed * 16807) % 2147483647) / 2147483647);
    const counts = Array.from(clean, (c) => Math.max(0, Math.round(c + Math.sqrt(Math.max(c, 1)) * Math.sqrt(-2 * Math.log(rand())) * Math.cos(2 * Math.PI * rand()))));
    const points = Array.from(positions, (x, i) => `  point = ${(x * 1e6).toFixed(3)} um ${counts[i]}`).join('\n');
    const text = `${setup}data scan\n  kind = profile\n  beam = b\n${points}\nfit shape\n  data = scan\n  free = gradient, offset, background\n  start = gradient 90 T/m, offset 0 um\n`;
    const r = analyze(text);
    const f = r.result!.fits![0]!;
    expect(f.status).toBe('converged');
    const byName = Object.fromEntries(f.parameters.map((p) => [p.name, p]));
    for (const [name, value] of [['gradient', 100], ['offset', 30e-6], ['background', 0]] as const) {
      expect(Math.abs(byName[name]!.value - value), name).toBeLessThan(4 * byName[name]!.uncertainty!);
      expect(byName[name]!.value).not.toBe(byName[name]!.start);
    }
    expect(f.reduced_chi2!).toBeGreaterThan(0.6);
    expect(f.reduced_chi2!).toBeLessThan(1.5);
    // Deflection goes as gradient / temperature for an oven (z = k/v², v² ∝ T): one profile cannot separate them.
    const both = analyze(text.replace('free = gradient, offset, background', 'free = gradient, temperature'));
    expect(both.problems.map((p) => p.code)).toContain('fit-undetermined');
  });

  it('reads points from a CSV file beside the setup, and reports a broken line with its number', () => {
    const csv = '# invented\nfrequency [MHz], uncertainty [kHz], field [mT]\n6834.696976, 0.3, 0.5\n6857.650357, 0.3, 20\nabc, 0.3, 60\n8025.092974, 0.3, 150\n';
    const text = `${RB}data d\n${pair('1 0', '2 0')}  file = "pi.csv"\nfit f\n  data = d\n  free = A\n`;
    const r = analyze(text, memorySources('/lab/setup.sublevel', { '/lab/pi.csv': csv }));
    const f = r.result!.fits![0]!;
    expect(f.points.map((p) => p.csv_line)).toEqual([3, 4, 6]);
    const broken = r.problems.find((p) => p.code === 'data-file-malformed')!;
    expect(broken.message).toContain('pi.csv line 5');
    expect(broken.range.start.line).toBe(6);
    expect(broken.related![0]!.range.start.line).toBe(4);
  });

  it('refuses a data file outside the folder, or one that is not CSV', () => {
    const text = (p: string) => `${RB}data d\n${pair('1 0', '2 0')}  file = "${p}"\n`;
    const sources = memorySources('/lab/setup.sublevel', { '/etc/x.csv': 'frequency [MHz]\n1\n', '/lab/notes.txt': 'x' });
    expect(codesAt(text('../etc/x.csv'), sources).map((c) => c.code)).toContain('data-file-refused');
    expect(codesAt(text('notes.txt'), sources).map((c) => c.code)).toContain('data-file-refused');
    expect(codesAt(text('missing.csv'), sources).map((c) => c.code)).toContain('data-file-missing');
  });
});

describe('bad input: a problem at the right place, nothing thrown', () => {
  const cases: [string, string, string, number][] = [
    ['too few points', `${RB}data d\n${pair('1 0', '2 0')}  point = 6834.7 MHz at 1 G\nfit f\n  data = d\n  free = g_J, A\n`, 'fit-too-few-points', 7],
    ['a pair that does not exist', `${RB}data d\n${pair('1 0', '3 0')}  point = 6834.7 MHz at 1 G\nfit f\n  data = d\n  free = A\n`, 'fit-pair-not-found', 4],
    ['negative counts', `${speciesX('39 u', '2S1/2')}${magnetAndBeam()}data s\n  kind = profile\n  beam = b\n  point = 10 um -3\n`, 'data-counts-invalid', 17],
    ['NaN counts', `${speciesX('39 u', '2S1/2')}${magnetAndBeam()}data s\n  kind = profile\n  beam = b\n  point = 10 um NaN\n`, 'data-counts-invalid', 17],
    ['a point without field when the field is not free', `${RB}data d\n${pair('1 0', '2 0')}  point = 6834.7 MHz\n  point = 6834.8 MHz\nfit f\n  data = d\n  free = A\n`, 'fit-not-possible', 6],
    ['an unknown parameter', `${RB}data d\n${pair('1 0', '2 0')}  point = 6834.7 MHz at 1 G\nfit f\n  data = d\n  free = feild\n`, 'fit-parameter-unknown', 9],
    ['a parameter the data cannot see', `${RB}data d\n${pair('1 0', '2 0')}  point = 6834.7 MHz at 1 G\nfit f\n  data = d\n  free = gradient\n`, 'fit-parameter-not-applicable', 9],
    ['a malformed point', `${RB}data d\n${pair('1 0', '2 0')}  point = 6834.7 MHz 1 G\n`, 'data-point-malformed', 6],
    ['mixed uncertainties', `${RB}data d\n${pair('1 0', '2 0')}  point = 6834.7(1) MHz at 1 G\n  point = 6834.8 MHz at 2 G\nfit f\n  data = d\n  free = A\n`, 'fit-not-possible', 7],
    ['no resonance in range', `${RB}data d\n${pair('1 0', '2 0')}  point = 2 GHz\nfit f: d -> field\n`, 'fit-no-root', 6],
  ];
  for (const [what, text, code, line] of cases) {
    it(what, () => {
      expect(() => analyze(text)).not.toThrow();
      expect(codesAt(text)).toContainEqual({ code, line });
    });
  }

  it('a fit that cannot reach a minimum says so and is marked not converged', () => {
    // g_J and A from intervals at one field only: the two cannot be told apart.
    const text = `${RB}data d\n${pair('1 0', '2 0')}  point = 6834.7(1) MHz at 1 G\n  point = 6834.7(1) MHz at 1 G\nfit f\n  data = d\n  free = g_J, A\n`;
    const r = analyze(text);
    const f = r.result!.fits![0]!;
    expect(r.problems.map((p) => p.code)).toContain('fit-undetermined');
    expect(f.parameters.some((p) => p.uncertainty === undefined)).toBe(true);
  });
});
