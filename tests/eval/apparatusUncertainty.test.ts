// The oven temperature, slit widths, slit separation and detector width reach the beam's numbers
// (docs/uncertainty.md): exact first-order sensitivities, checked against central differences of
// the whole evaluation (the GUM law with a numerically differentiated model, JCGM 100 §5.1.3).
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import type { BeamResult } from '../../server/src/eval/resultTypes';

/**
 * Invented apparatus: ⁷Li from an oven through a selector magnet, with wide slits so the image
 * shapes the peaks. The level's constants are written without uncertainties (the built-in ones
 * carry some), so the apparatus is the only uncertain input.
 */
const BASE = { oven: '720 K', slits: '80 um, 50 um apart 40 cm', detector: '25 um' };
type Parts = typeof BASE;

function setup(parts: Partial<Parts>): string {
  const p = { ...BASE, ...parts };
  return `species Li7
  level ground: 2s 2S1/2  A = 401.7520433 MHz  g_J = 2.0023010

magnet selector
  field    = 0.450 T
  gradient = 180 T/m
  length   = 8.00 cm

beam main
  species  = Li7
  level    = ground
  source   = oven ${p.oven}
  slits    = ${p.slits}
  magnet   = selector
  drift    = 35.0 cm
  detector = ${p.detector}
`;
}
const beam = (parts: Partial<Parts>): BeamResult => analyze(setup(parts)).result!.beams[0]!;

/**
 * Compares every deflected peak's (and sublevel peak's) uncertainty with |Δx/Δθ| u from central
 * differences ±h; `rel` is the agreement asked for.
 */
function checkPeaks(uncertain: Partial<Parts>, plus: Partial<Parts>, minus: Partial<Parts>, h: number, u: number, rel: number): void {
  const b = beam(uncertain);
  const up = beam(plus);
  const down = beam(minus);
  let checked = 0;
  for (const [j, p] of b.peaks.entries()) {
    if (p.position_m === 0) continue;
    const fd = Math.abs(up.peaks[j]!.position_m - down.peaks[j]!.position_m) / (2 * h);
    expect(p.position_m_unc, p.members.join('+')).toBeDefined();
    expect(Math.abs(p.position_m_unc! / (fd * u) - 1), p.members.join('+')).toBeLessThan(rel);
    checked++;
  }
  for (const [i, s] of b.sublevels.entries()) {
    if (s.peak_m === null || s.peak_m === 0) continue;
    const fd = Math.abs(up.sublevels[i]!.peak_m! - down.sublevels[i]!.peak_m!) / (2 * h);
    expect(Math.abs(s.peak_m_unc! / (fd * u) - 1), s.label).toBeLessThan(rel);
  }
  expect(checked).toBeGreaterThan(1);
}

describe('oven temperature', () => {
  it('moves every deflection as 1/T: u(⟨z⟩) = |⟨z⟩| u(T)/T exactly', () => {
    const b = beam({ oven: '720(6) K' });
    for (const s of b.sublevels) expect(s.mean_deflection_m_unc! / Math.abs(s.mean_deflection_m)).toBeCloseTo(6 / 720, 12);
    expect(analyze(setup({ oven: '720(6) K' })).result!.uncertainty_inputs!.map((i) => i.id)).toContain('beam:main.temperature');
  });

  it('moves the peaks: dx/dT by central differences of the evaluation', () => {
    // The refined positions are good to ~1e-5 relative: over a ±2 % step that is ~5e-4 of the slope.
    checkPeaks({ oven: '720(6) K' }, { oven: '734.4 K' }, { oven: '705.6 K' }, 14.4, 6, 2e-3);
  });

  it('an oven written in °C keeps its uncertainty in kelvin', () => {
    const b = beam({ oven: '447(6) degC' });
    for (const s of b.sublevels) expect(s.mean_deflection_m_unc! / Math.abs(s.mean_deflection_m)).toBeCloseTo(6 / 720.15, 12);
  });
});

describe('slits and detector', () => {
  // Their effect on a deflected oven peak is small (the image is ~100 µm against mm deflections),
  // so the steps are large (±20 %) and the agreement asked for is looser: the slope is not constant over them.
  it('the first slit width', () => {
    checkPeaks({ slits: '80(4) um, 50 um apart 40 cm' }, { slits: '96 um, 50 um apart 40 cm' }, { slits: '64 um, 50 um apart 40 cm' }, 16e-6, 4e-6, 2e-2);
  });
  it('the second slit width', () => {
    checkPeaks({ slits: '80 um, 50(3) um apart 40 cm' }, { slits: '80 um, 60 um apart 40 cm' }, { slits: '80 um, 40 um apart 40 cm' }, 10e-6, 3e-6, 2e-2);
  });
  it('the slit separation', () => {
    checkPeaks({ slits: '80 um, 50 um apart 40.0(5) cm' }, { slits: '80 um, 50 um apart 42 cm' }, { slits: '80 um, 50 um apart 38 cm' }, 0.02, 0.005, 2e-2);
  });
  it('the detector width', () => {
    checkPeaks({ detector: '25(2) um' }, { detector: '30 um' }, { detector: '20 um' }, 5e-6, 2e-6, 2e-2);
  });
  it('do not move the mean deflections, and list themselves as inputs', () => {
    const a = analyze(setup({ slits: '80(4) um, 50(3) um apart 40.0(5) cm', detector: '25(2) um' })).result!;
    for (const s of a.beams[0]!.sublevels) expect(s.mean_deflection_m_unc).toBeUndefined();
    expect(a.uncertainty_inputs!.map((i) => i.id)).toEqual(['beam:main.slit1', 'beam:main.slit2', 'beam:main.slit_separation', 'beam:main.detector']);
  });
  it('a single-speed beam: no slope, so no peak uncertainty, and the warning uncertainty-undefined says so', () => {
    const text = setup({ slits: '80(4) um, 50 um apart 40 cm' }).replace('oven 720 K', 'speed 1000 m/s');
    const a = analyze(text);
    for (const p of a.result!.beams[0]!.peaks) expect(p.position_m_unc).toBeUndefined();
    expect(a.problems.map((p) => p.code)).toContain('uncertainty-undefined');
  });
});
