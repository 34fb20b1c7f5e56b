/**
 * Line shapes against the outside world: SciPy's voigt_profile and wofz (tests/reference/voigt.json,
 * written by scripts/reference/voigt.py, which also checks SciPy against 50-digit mpmath), Doppler
 * widths from the Maxwell distribution (same script) and a textbook value, published air
 * wavelengths, and the textbook σ/π angular factors.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  FaddeevaReal,
  GAUSS_FWHM_PER_SIGMA,
  VoigtShape,
  airWavelengthM,
  beamTransverseRmsSpeed,
  dopplerSigmaHz,
  erfcx,
  faddeevaReal,
  gridFrequencies,
  naturalFwhmHz,
  observedWeight,
  analyserProblem,
  synthesizeSpectrum,
  voigtFwhmApprox,
  voigtProfile,
} from '../../server/src/physics/lineshape';

interface Ref {
  voigt_profile: { x_Hz: number; sigma_Hz: number; gamma_Hz: number; value: number }[];
  wofz_real: { x: number; y: number; re_w: number }[];
  doppler: { nu0_Hz: number; T_K: number; mass_u: number; fwhm_Hz: number }[];
  beam_transverse: { slit1_m: number; slit2_m: number; separation_m: number; mean_speed: number; rms_spread: number; transverse_rms_speed: number };
  atomic_mass_constant_kg: number;
}
const ref = JSON.parse(readFileSync(new URL('../reference/voigt.json', import.meta.url), 'utf8')) as Ref;

const rel = (a: number, b: number): number => Math.abs(a / b - 1);

describe('Voigt profile against SciPy (voigt.json)', () => {
  it('matches scipy.special.voigt_profile to 1e-12 relative for γ/σ from 1e-6 to 1e6, centre to far wings', () => {
    let worst = 0;
    for (const r of ref.voigt_profile) worst = Math.max(worst, rel(voigtProfile(r.x_Hz, r.sigma_Hz, r.gamma_Hz), r.value));
    expect(ref.voigt_profile.length).toBeGreaterThan(150);
    expect(worst).toBeLessThan(1e-12);
  });

  it('matches Re scipy.special.wofz to 1e-12 relative over the region boundaries of the algorithm', () => {
    let worst = 0;
    for (const r of ref.wofz_real) worst = Math.max(worst, rel(faddeevaReal(r.x, r.y), r.re_w));
    expect(worst).toBeLessThan(1e-12);
  });

  it('is even in the detuning and reduces to the Gaussian and the Lorentzian (closed forms)', () => {
    expect(new FaddeevaReal(0.3).at(-2.2)).toBe(new FaddeevaReal(0.3).at(2.2));
    const s = 2e6;
    expect(rel(voigtProfile(3e6, s, 0), Math.exp(-((3e6 / s) ** 2) / 2) / (s * Math.sqrt(2 * Math.PI)))).toBeLessThan(1e-14);
    const g = 5e6;
    expect(rel(voigtProfile(3e6, 0, g), g / Math.PI / (9e12 + g * g))).toBeLessThan(1e-14);
  });

  it('has unit area (trapezoid sum over ±2000 widths; Lorentzian tails beyond carry 2/(π·2000·…))', () => {
    const grid = { fromHz: -4e9, stepHz: 1e4, points: 800_001 };
    const v = synthesizeSpectrum([{ frequencyHz: 0, weight: 1 }], 1e6, 1e6, grid);
    let area = 0;
    for (let i = 1; i < v.length; i++) area += 0.5 * (v[i]! + v[i - 1]!) * grid.stepHz;
    // Missing Lorentzian tail beyond ±4 GHz: (2/π) γ/4e9 = 1.6e-4.
    expect(area).toBeCloseTo(1 - (2 / Math.PI) * (1e6 / 4e9), 6);
  });

  it('refuses widths that are both zero or not finite', () => {
    expect(() => new VoigtShape(0, 0)).toThrow(/not both 0/);
    expect(() => new VoigtShape(Number.NaN, 1)).toThrow();
  });
});

describe('erfcx (mpmath values, 30 digits, from mpmath.exp(y**2)*mpmath.erfc(y))', () => {
  it.each([
    [0, 1],
    [0.5, 0.6156903441929258],
    [1, 0.42758357615580705],
    [3, 0.17900115118138999],
    [7, 0.0798000543291529334898644977009],
  ])('erfcx(%s)', (y, v) => {
    expect(rel(erfcx(y), v)).toBeLessThan(3e-15);
  });
});

describe('widths', () => {
  it('natural FWHM 1/(2πτ): Rb D2 τ = 26.2348 ns gives Γ/2π = 6.0666 MHz (Steck, Rubidium 87 D Line Data)', () => {
    expect(naturalFwhmHz(26.2348e-9) / 1e6).toBeCloseTo(6.0666, 3);
  });

  it('Doppler FWHM equals the half-maximum width of the Maxwell-mapped profile (voigt.json, SciPy brentq)', () => {
    for (const d of ref.doppler) {
      const fwhm = dopplerSigmaHz(d.nu0_Hz, d.T_K, d.mass_u * ref.atomic_mass_constant_kg) * GAUSS_FWHM_PER_SIGMA;
      expect(rel(fwhm, d.fwhm_Hz)).toBeLessThan(1e-9);
    }
  });

  it('Doppler FWHM of the Na D line at 500 K is about 1.7 GHz (Demtröder, Laser Spectroscopy, §3.2 example; from memory)', () => {
    const fwhm = dopplerSigmaHz(5.0893e14, 500, 22.98977 * 1.66053906892e-27) * GAUSS_FWHM_PER_SIGMA;
    expect(fwhm / 1e9).toBeCloseTo(1.7, 1);
  });

  it('transverse rms speed of a collimated beam equals the quadrature over both slits and the flux (voigt.json, SciPy dblquad/quad)', () => {
    const b = ref.beam_transverse;
    expect(rel(beamTransverseRmsSpeed(b.slit1_m, b.slit2_m, b.separation_m, b.mean_speed, b.rms_spread), b.transverse_rms_speed)).toBeLessThan(1e-10);
  });

  it('Voigt FWHM approximation: both limits exact to its stated 0.02 % (Olivero & Longbothum 1977)', () => {
    expect(rel(voigtFwhmApprox(0, 3), 3)).toBeLessThan(1e-12);
    expect(rel(voigtFwhmApprox(3, 0), 3)).toBeLessThan(3e-4);
  });
});

describe('air wavelengths (updated Edlén equation)', () => {
  it.each([
    // NIST ASD (Kramida et al.), Na I D2 and D1: vacuum 589.1583 / 589.7558 nm, air 588.9950 / 589.5924 nm (from memory).
    [589.1583, 588.995],
    [589.7558, 589.5924],
  ])('vacuum %s nm → air %s nm', (vac, air) => {
    expect(airWavelengthM(vac * 1e-9)! * 1e9).toBeCloseTo(air, 3);
  });

  it('633 nm in vacuum is 632.82500 nm in standard air (NIST air-index equations, Ciddor 1996, at 15 °C, 101 325 Pa, dry, 450 µmol/mol CO₂)', () => {
    expect(Math.abs(airWavelengthM(633e-9)! * 1e9 - 632.825005)).toBeLessThan(2e-5);
  });

  it('gives no air wavelength below 200 nm (vacuum by convention)', () => {
    expect(airWavelengthM(121.567e-9)).toBeUndefined();
  });
});

describe('angular factors (dipole radiation pattern; Corney, Atomic and Laser Spectroscopy, ch. 5)', () => {
  it.each([
    ['π', 'along', 'all', 0],
    ['σ+', 'along', 'all', 1],
    ['σ−', 'along', 'sigma-', 1],
    ['σ+', 'along', 'sigma-', 0],
    ['π', 'across', 'all', 1],
    ['σ+', 'across', 'all', 0.5],
    ['σ−', 'across', 'pi', 0],
    ['π', 'across', 'sigma', 0],
  ] as const)('%s seen %s through %s: %s', (pol, dir, an, w) => {
    expect(observedWeight(pol, dir, an)).toBe(w);
  });

  it('says when an analyser cannot work from a direction', () => {
    expect(analyserProblem('along', 'pi')).toMatch(/not emitted along the field/);
    expect(analyserProblem('across', 'sigma+')).toMatch(/no analyser separates them/);
    expect(analyserProblem('across', 'pi')).toBeUndefined();
  });
});

describe('synthesized spectrum (tabulated core) against the exact profile', () => {
  // Grid steps of 0.37 σ (table step a fraction of it) and 0.0011 σ (a multiple of it).
  it.each([
    [1e-12, 0.37], [1e-9, 0.37], [1e-4, 0.0011], [0.01, 0.37], [0.3, 0.0011], [1, 0.05], [3, 0.37], [6.99, 0.0011], [7.01, 0.37], [50, 0.37],
  ])('within 5e-10 relative at γ/(σ√2) = %s, grid step %s σ', (y, stepSigmas) => {
    const sigma = 1e8;
    const gamma = y * sigma * Math.SQRT2;
    const grid = { fromHz: -70 * sigma + 1234.5, stepHz: stepSigmas * sigma, points: Math.min(40_001, Math.ceil((140 * sigma) / (stepSigmas * sigma))) };
    const comps = [{ frequencyHz: 0, weight: 1 }, { frequencyHz: 3.3 * sigma, weight: 0.25 }];
    const got = synthesizeSpectrum(comps, sigma, gamma, grid);
    const shape = new VoigtShape(sigma, gamma);
    const f = gridFrequencies(grid);
    let worst = 0;
    for (let i = 0; i < f.length; i++) worst = Math.max(worst, rel(got[i]!, shape.at(f[i]!) + 0.25 * shape.at(f[i]! - 3.3 * sigma)));
    expect(worst).toBeLessThan(5e-10);
  });

  it('is exact for a pure Lorentzian (σ = 0)', () => {
    const v = synthesizeSpectrum([{ frequencyHz: 1e6, weight: 2 }], 0, 3e6, { fromHz: 0, stepHz: 1e6, points: 3 });
    expect(rel(v[2]!, (2 * 3e6) / Math.PI / (1e12 + 9e12))).toBeLessThan(1e-15);
  });
});
// Speed lives in `npm run bench spectrum` (bench/spectrum.bench.ts), not in a timed unit test.
