import { describe, expect, it } from 'vitest';
import { detectorPattern, kernelDensity, type DetectorPattern } from '../../server/src/physics/beam';
import { sampleAt } from '../../server/src/physics/beam/peakShape';
import { ATOMIC_MASS_UNIT, BOHR_MAGNETON, BOLTZMANN_K, ELECTRON_GS } from '../../server/src/physics/constants';
import { beamRef, type PatternRef } from './beamReference';
import { MASS_39_U, SLIT_BEAM_GEOMETRY } from '../fixtures/slitBeamGeometry';

const at = (p: DetectorPattern, x: number): number => sampleAt(p.total, p.positionsM, p.edgesM, x);
const width = (p: DetectorPattern, j: number): number => p.edgesM[j + 1] - p.edgesM[j];

function refPattern(c: PatternRef, extra: { spanM?: { startM: number; endM: number } } = {}): DetectorPattern {
  return detectorPattern({
    massKg: c.mass_u * ATOMIC_MASS_UNIT,
    geometry: c.geometry,
    source: c.source,
    sublevels: [{ label: 'only', momentJT: c.moment_JT, population: 1 }],
    ...extra,
  });
}

describe('detector pattern vs SciPy nested quad of ∫ p(z) K(x − z) dz', () => {
  for (const c of beamRef.patterns) {
    // Grid error at 4096 bins is ~1e-5 (docs/beam.md); 1e-4 leaves room for the quadrature's own error.
    it(`${c.name}: profile samples within 1e-4 of the peak height (4096 bins)`, () => {
      const p = refPattern(c);
      expect(p.issues).toEqual([]);
      for (const [x, y] of c.samples) {
        expect(Math.abs(at(p, x) - y)).toBeLessThan(1e-4 * c.peak_height_per_m);
      }
    });
    it(`${c.name}: peak position within 2e-4 FWHM, FWHM and height within 1e-4`, () => {
      const p = refPattern(c);
      expect(p.peaks).toHaveLength(1);
      const pk = p.peaks[0];
      expect(Math.abs(pk.positionM - c.peak_position_m)).toBeLessThan(2e-4 * c.fwhm_m);
      expect(Math.abs((pk.fwhmM ?? NaN) / c.fwhm_m - 1)).toBeLessThan(1e-4);
      expect(Math.abs(pk.height / c.peak_height_per_m - 1)).toBeLessThan(1e-4);
    });
  }
});

describe('detector pattern vs a seeded NumPy Monte-Carlo of the same beam (4·10⁶ atoms)', () => {
  for (const c of beamRef.patterns) {
    const mc = c.monte_carlo;
    const p = refPattern(c, { spanM: { startM: mc.span_m[0], endM: mc.span_m[1] } });
    let mass = 0;
    let first = 0;
    const cum: number[] = [];
    for (let j = 0; j < p.total.length; j++) {
      mass += p.total[j] * width(p, j);
      first += p.total[j] * width(p, j) * p.positionsM[j];
      cum.push(mass);
    }
    const quantile = (q: number): number => {
      const t = q * mass;
      const j = cum.findIndex((v) => v >= t);
      const before = j > 0 ? cum[j - 1] : 0;
      return p.edgesM[j] + ((t - before) / (cum[j] - before)) * width(p, j);
    };
    // Tolerance: 4 Monte-Carlo standard errors (from 16 batches) plus a floor for the grid.
    it(`${c.name}: fraction in range, mean and quantiles`, () => {
      expect(Math.abs(mass - mc.fraction_inside)).toBeLessThan(4 * mc.fraction_inside_se + 1e-6);
      expect(Math.abs(first / mass - mc.mean_inside_m)).toBeLessThan(4 * mc.mean_inside_se_m);
      mc.quantile_levels.forEach((q, i) => {
        expect(Math.abs(quantile(q) - mc.quantiles_m[i])).toBeLessThan(4 * mc.quantiles_se_m[i]);
      });
    });
  }
});

describe('pattern first moment vs the closed form ⟨z⟩ = μ (∂B/∂z)(L1²/2 + L1 L2)/(2kT)', () => {
  it('oven beam with a 1e-9 slow-tail cut: mean of the binned pattern within 1e-4', () => {
    // The cut removes atoms slower than x_c·α with x_c⁴/2 ≈ 1e-9; they carry 1 − e^{−x_c²} ≈ 4.5e-5 of ⟨1/v²⟩
    // (closed form of the truncated oven integral), so 1e-4 is the honest tolerance.
    const c = beamRef.patterns[0];
    const p = detectorPattern({
      massKg: c.mass_u * ATOMIC_MASS_UNIT,
      geometry: c.geometry,
      source: c.source,
      sublevels: [{ label: 'only', momentJT: c.moment_JT, population: 1 }],
      tailFraction: 1e-9,
    });
    let m0 = 0;
    let m1 = 0;
    for (let j = 0; j < p.total.length; j++) {
      m0 += p.total[j] * width(p, j);
      m1 += p.total[j] * width(p, j) * p.positionsM[j];
    }
    const g = c.geometry;
    const lever = 0.5 * g.magnetLengthM ** 2 + g.magnetLengthM * g.driftM;
    const T = (c.source as { temperatureK: number }).temperatureK;
    const expected = (c.moment_JT * g.gradientTPerM * lever) / (2 * BOLTZMANN_K * T);
    expect(Math.abs(m1 / expected - 1)).toBeLessThan(1e-4);
    expect(Math.abs(p.sublevels[0].meanDeflectionM / expected - 1)).toBeLessThan(1e-14);
    expect(m0).toBeGreaterThan(1 - 2e-9);
  });
});

// Facts of the trade: a uniform gradient pushes each sublevel by a force proportional to its moment.
const geometry = SLIT_BEAM_GEOMETRY;
const mass = MASS_39_U; // invented scenario
const oven = { kind: 'effusive' as const, temperatureK: 550 };
const single = { kind: 'single' as const, speed: 700 };

describe('facts of the trade', () => {
  it('a sublevel with zero moment is not deflected: its pattern is the undeflected instrument kernel', () => {
    const p = detectorPattern({ massKg: mass, geometry, source: oven, sublevels: [{ label: '0', momentJT: 0, population: 1 }] });
    expect(p.peaks).toHaveLength(1);
    expect(Math.abs(p.peaks[0].positionM)).toBeLessThan(1e-3 * p.image!.kernelFwhmM);
    expect(p.sublevels[0].meanDeflectionM).toBe(0);
    // Shape equals the analytic kernel (trapezoid ⊗ aperture), to the grid's resolution.
    const img = p.image!;
    const peak = kernelDensity(0, img.boxAM, img.boxBM, img.detectorM);
    for (const x of [-80e-6, -40e-6, 0, 25e-6, 60e-6]) {
      const want = kernelDensity(x, img.boxAM, img.boxBM, img.detectorM);
      expect(Math.abs(at(p, x) - want)).toBeLessThan(1e-5 * peak);
    }
  });

  it('L = 0, S = 1/2, no nuclear spin (μ = ∓ g_s μ_B/2) gives two symmetric peaks', () => {
    const mu = (ELECTRON_GS * BOHR_MAGNETON) / 2;
    const p = detectorPattern({
      massKg: mass,
      geometry,
      source: oven,
      sublevels: [
        { label: 'm_s=+1/2', momentJT: -mu, population: 1 },
        { label: 'm_s=-1/2', momentJT: mu, population: 1 },
      ],
    });
    expect(p.peaks.map((k) => k.members)).toEqual([['m_s=+1/2'], ['m_s=-1/2']]);
    expect(p.peaks[0].positionM).toBeLessThan(0);
    // Refined positions carry the exact profile's round-off (up to ~1e-6 relative near its top), not the grid's symmetry.
    expect(Math.abs(p.peaks[0].positionM + p.peaks[1].positionM)).toBeLessThan(1e-6 * p.peaks[1].positionM);
    expect(Math.abs(p.peaks[0].height / p.peaks[1].height - 1)).toBeLessThan(1e-9);
    expect(p.maxima).toHaveLength(2);
    expect(p.allResolved).toBe(true);
  });

  it('moments −μ, 0, +μ give three equally spaced peaks with the middle one undeflected (single speed)', () => {
    const mu = BOHR_MAGNETON;
    const p = detectorPattern({
      massKg: mass,
      geometry,
      source: single,
      sublevels: [
        { label: 'm=-1', momentJT: -mu, population: 1 },
        { label: 'm=0', momentJT: 0, population: 1 },
        { label: 'm=+1', momentJT: mu, population: 1 },
      ],
    });
    const [a, b, c] = p.peaks.map((k) => k.positionM);
    const z = (mu * geometry.gradientTPerM * (0.5 * 0.12 ** 2 + 0.12 * 0.5)) / mass / 700 ** 2; // z = a(L1²/2 + L1 L2)/v²
    expect(p.peaks.map((k) => k.members)).toEqual([['m=-1'], ['m=0'], ['m=+1']]);
    const tol = 1e-3 * p.image!.kernelFwhmM;
    expect(Math.abs(b)).toBeLessThan(tol);
    expect(Math.abs(c - z)).toBeLessThan(tol);
    expect(Math.abs(a + z)).toBeLessThan(tol);
    expect(Math.abs(c - b - (b - a))).toBeLessThan(tol);
  });

  it('deflections scale linearly with the moment (mean deflections exactly; single-speed peaks to the grid)', () => {
    const mu = 0.7 * BOHR_MAGNETON;
    const p = detectorPattern({
      massKg: mass,
      geometry,
      source: oven,
      sublevels: [1, 2, 3].map((f) => ({ label: `${f}μ`, momentJT: f * mu, population: 1 })),
    });
    const means = p.sublevels.map((s) => s.meanDeflectionM);
    expect(means[1] / means[0]).toBeCloseTo(2, 13);
    expect(means[2] / means[0]).toBeCloseTo(3, 13);
    // The oven's most probable deflection scales too: peak positions of well-separated sublevels.
    const q = detectorPattern({
      massKg: mass,
      geometry: { ...geometry, gradientTPerM: 2000 },
      source: single,
      sublevels: [1, 2, 3].map((f) => ({ label: `${f}μ`, momentJT: f * mu, population: 1 })),
    });
    const pos = q.peaks.map((k) => k.positionM);
    expect(Math.abs(pos[1] / pos[0] - 2)).toBeLessThan(1e-3);
    expect(Math.abs(pos[2] / pos[0] - 3)).toBeLessThan(1e-3);
  });

  it('populations weight the peaks and the per-sublevel contributions add up to the total', () => {
    const mu = BOHR_MAGNETON;
    const p = detectorPattern({
      massKg: mass,
      geometry,
      source: single,
      sublevels: [
        { label: 'a', momentJT: -mu, population: 3 },
        { label: 'b', momentJT: mu, population: 1 },
      ],
    });
    expect(p.peaks[0].height / p.peaks[1].height).toBeCloseTo(3, 9);
    let worst = 0;
    for (let j = 0; j < p.total.length; j++) worst = Math.max(worst, Math.abs(p.perSublevel[0][j] + p.perSublevel[1][j] - p.total[j]));
    expect(worst).toBe(0);
    // Unit total flux: Σ total·bin = 1 − off-grid fraction (single speed: nothing off grid).
    const area = p.total.reduce((s, v, j) => s + v * width(p, j), 0);
    expect(area).toBeCloseTo(1, 12);
  });

  it('sublevels with nearly equal moments merge into one peak that lists both', () => {
    const mu = BOHR_MAGNETON;
    const p = detectorPattern({
      massKg: mass,
      geometry,
      source: single,
      sublevels: [
        { label: 'x', momentJT: mu, population: 1 },
        { label: 'y', momentJT: mu * (1 + 1e-4), population: 1 },
        { label: 'z', momentJT: -mu, population: 1 },
      ],
    });
    expect(p.peaks.map((k) => k.members)).toEqual([['z'], ['x', 'y']]);
  });
});
