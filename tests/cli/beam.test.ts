import { readFileSync } from 'fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { BOLTZMANN_K, BOHR_MAGNETON, ELECTRON_GS } from '../../server/src/physics/constants';
import { cli } from './runCli';
import { magnetAndBeam, speciesX } from '../fixtures/ovenBeam';

const geometry = magnetAndBeam();
/** A spin-1/2 atom of 40 u and a J = 1 atom of 52 u (invented), each followed by a magnet and beam text. */
const HALF = speciesX('40 u', '2S1/2');
const ONE = speciesX('52 u', '3S1');

function beamOf(text: string) {
  const a = analyze(text);
  return { a, beam: a.result!.beams[0]! };
}

describe('beam results through the setup file', () => {
  it('L = 0, S = 1/2, no nucleus: two symmetric peaks (fact of the trade)', () => {
    const { beam } = beamOf(HALF + geometry);
    expect(beam.computed).toBe(true);
    expect(beam.peaks).toHaveLength(2);
    expect(beam.peaks[0]!.position_m).toBeCloseTo(-beam.peaks[1]!.position_m, 6);
    // moments ±g_s μ_B/2 with g_s = |g_e| (CODATA 2022)
    expect(Math.abs(beam.sublevels[0]!.moment_J_per_T)).toBeCloseTo((ELECTRON_GS * BOHR_MAGNETON) / 2, 30);
  });

  it('mean deflection = F (L1²/2 + L1 L2)/(2kT) for an effusive beam (molecular-beam texts, e.g. Ramsey)', () => {
    const { beam } = beamOf(HALF + geometry);
    const s = beam.sublevels.find((x) => x.moment_J_per_T > 0)!;
    const F = s.moment_J_per_T * 100;
    const expected = (F * (0.1 ** 2 / 2 + 0.1 * 0.4)) / (2 * BOLTZMANN_K * 500);
    expect(s.mean_deflection_m / expected).toBeCloseTo(1, 9);
  });

  it('J = 1 with three sublevels: three equally spaced peaks, the middle one undeflected (fact of the trade)', () => {
    const { beam } = beamOf(ONE + geometry);
    expect(beam.peaks).toHaveLength(3);
    const [a, b, c] = beam.peaks.map((p) => p.position_m);
    expect(Math.abs(b!)).toBeLessThan(1e-6);
    expect(c! - b!).toBeCloseTo(b! - a!, 6);
  });

  it('flags unresolvable peaks at the gradient and offers the smallest gradient that resolves them, with its dip', () => {
    const weak = magnetAndBeam('0.5 T/m');
    const { a, beam } = beamOf(ONE + weak);
    expect(beam.all_resolved).toBe(false);
    const p = a.problems.find((x) => x.code === 'beam-unresolved')!;
    expect(p.range.start.line).toBe(5); // the magnet's gradient setting
    expect(p.message).toMatch(/a gradient of [\d.]+ T\/m gives \d+ % and resolves every pair; a magnet of .* gives/);
    const g = p.data!.resolvingGradientTPerM as number;
    expect(g).toBeGreaterThan(0.5);
    // Feeding the suggested gradient back in resolves the pattern.
    const fixed = beamOf(ONE + weak.replace('0.5 T/m', `${g * 1.001} T/m`));
    expect(fixed.beam.all_resolved).toBe(true);
  });

  it('reports slits too wide for their separation as a beam geometry problem', () => {
    const wide = geometry.replace('slits = 30 um, 30 um apart 50 cm', 'slits = 5 cm, 5 cm apart 10 cm');
    const { a, beam } = beamOf(ONE + wide);
    expect(beam.computed).toBe(false);
    expect(a.problems.map((p) => p.code)).toContain('beam-slits-too-wide');
  });

  it('populations select sublevels (e.g. after optical pumping): only the listed ones reach the detector', () => {
    const { beam } = beamOf(ONE + geometry + '  populations = 1 +1 1\n');
    for (const s of beam.sublevels) expect(s.population, s.label).toBe(s.label.endsWith('m_J=+1') ? 1 : 0);
    expect(beam.peaks).toHaveLength(1);
  });

  it('a detector placed off the beam reports the fraction it collects and warns when it misses', () => {
    const far = geometry.replace('detector = 10 um', 'detector = 10 um at 1 m');
    const { a, beam } = beamOf(HALF + far);
    expect(beam.detector_fraction).toBeLessThan(1e-6);
    expect(a.problems.map((p) => p.code)).toContain('beam-misses-detector');
  });
});

describe('sublevel profile and render', () => {
  it('profile writes position, total and one column per sublevel; columns add up to the total', () => {
    const r = cli('profile', 'examples/lithium-beam.sublevel');
    expect(r.code).toBe(0);
    const rows = r.out.split('\n');
    expect(rows[0]).toBe('# sublevel profile: file=examples/lithium-beam.sublevel; beam=main; level=Li7.ground; field=magnet selector 0.45 T');
    expect(rows[1]).toMatch(/^position_m,total_per_m,"share_per_m\[F=1, m_F=\+1\]"/);
    const cells = rows[Math.floor(rows.length / 2)]!.split(',').map(Number);
    const sum = cells.slice(2).reduce((s, x) => s + x, 0);
    expect(sum).toBeCloseTo(cells[1]!, 6);
  });

  it('render writes SVG for both views and names bad options', () => {
    expect(cli('render', 'examples/lithium-beam.sublevel', '--view', 'pattern').out).toMatch(/^<svg[^>]*viewBox/);
    expect(cli('render', 'examples/lithium-beam.sublevel').out).toContain('m_J=+1/2, m_I=+3/2');
    const bad = cli('render', 'examples/lithium-beam.sublevel', '--level', 'groud');
    expect(bad.code).toBe(2);
    expect(bad.err).toContain("did you mean 'ground'");
    const none = cli('render', 'examples/rubidium-bias.sublevel', '--view', 'pattern');
    expect(none.code).toBe(1);
    expect(none.err).toContain('examples/rubidium-bias.sublevel:1:1 error nothing-to-compute No beam to draw');
  });

  it('the demo beam file states the cautions in its report', () => {
    expect(readFileSync('README.md', 'utf8')).toMatch(/Cautions/);
    expect(cli('eval', 'examples/lithium-beam.sublevel').out).toMatch(/Strong magnet \(.* T at the beam\): keep pacemakers/);
  });
});
