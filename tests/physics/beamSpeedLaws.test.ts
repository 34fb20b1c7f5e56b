import { describe, expect, it } from 'vitest';
import { effusiveLaw } from '../../server/src/physics/beam/effusiveLaw';
import { gaussLegendre } from '../../server/src/physics/beam/gaussLegendre';
import { EFFUSIVE_RELATIVE_SPREAD, jetLaw } from '../../server/src/physics/beam/jetLaw';
import { speedAtSlowerFraction } from '../../server/src/physics/beam/speedLaw';
import { meanDeflection, sourceSpeeds } from '../../server/src/physics/beam';
import { ATOMIC_MASS_UNIT, BOLTZMANN_K } from '../../server/src/physics/constants';
import { beamRef } from './beamReference';

const rel = (a: number, b: number): number => Math.abs(a / b - 1);

describe('reference file', () => {
  it('was made by SciPy 1.17 and NumPy 2.4', () => {
    expect(beamRef.scipy_version.startsWith('1.17')).toBe(true);
    expect(beamRef.numpy_version.startsWith('2.4')).toBe(true);
  });
});

describe('Gauss–Legendre rule vs numpy.polynomial.legendre.leggauss', () => {
  for (const [n, ref] of Object.entries(beamRef.gauss_legendre)) {
    it(`n = ${n}`, () => {
      const rule = gaussLegendre(Number(n));
      ref.nodes.forEach((x, i) => expect(rule.nodes[i]).toBeCloseTo(x, 14));
      ref.weights.forEach((w, i) => expect(rule.weights[i]).toBeCloseTo(w, 14));
    });
  }
});

describe('oven (flux-weighted effusive) speed law', () => {
  for (const ref of beamRef.oven_laws) {
    const m = ref.mass_u * ATOMIC_MASS_UNIT;
    const T = ref.temperature_K;
    const law = effusiveLaw(T, m);
    it(`${ref.mass_u} u at ${T} K: closed forms (standard molecular-beam textbook results, from memory; re-derived in docs/beam.md)`, () => {
      // ⟨1/v²⟩ = M/(2kT) and most probable flux speed √(3kT/M): closed forms of the v³ e^{−Mv²/2kT} law.
      expect(rel(law.meanInverseSquare, m / (2 * BOLTZMANN_K * T))).toBeLessThan(1e-15);
      expect(rel(law.mostProbableSpeed, Math.sqrt((3 * BOLTZMANN_K * T) / m))).toBeLessThan(1e-15);
    });
    it(`${ref.mass_u} u at ${T} K: moments agree with SciPy quad (1e-10)`, () => {
      expect(rel(law.meanInverseSquare, ref.mean_inverse_square)).toBeLessThan(1e-10);
      expect(rel(law.meanSpeed, ref.mean_speed)).toBeLessThan(1e-10);
      expect(rel(law.rmsSpread, ref.rms_spread)).toBeLessThan(1e-9);
      // minimize_scalar locates a flat maximum to ~√ε: compare the mode to 1e-6.
      expect(rel(law.mostProbableSpeed, ref.most_probable_speed)).toBeLessThan(1e-6);
      for (const [v, frac] of ref.slower_fraction) expect(law.slowerFraction(v)).toBeCloseTo(frac, 12);
    });
  }
  it('small-speed series and the direct formula join smoothly (no cancellation jump)', () => {
    const law = effusiveLaw(500, 50 * ATOMIC_MASS_UNIT);
    const alpha = Math.sqrt((2 * BOLTZMANN_K * 500) / (50 * ATOMIC_MASS_UNIT));
    for (const y of [1e-6, 1e-3, 0.019999, 0.020001, 0.05]) {
      const exact = 1 - (1 + y) * Math.exp(-y); // fine at these y to ~1e-16/y relative
      const got = law.slowerFraction(alpha * Math.sqrt(y));
      expect(rel(got, exact)).toBeLessThan(y < 1e-5 ? 1e-4 : 1e-9);
      // Leading term y²/2 of the series (Taylor expansion).
      if (y <= 1e-3) expect(rel(got, (y * y) / 2)).toBeLessThan(y);
    }
  });
  it('mean deflection: ⟨z⟩ = μ (∂B/∂z)(L1²/2 + L1 L2)/(2kT), independent of the mass', () => {
    const g = { slit1M: 1e-4, slit2M: 1e-4, slitSeparationM: 0.5, magnetLengthM: 0.1, driftM: 0.3, detectorWidthM: 0, gradientTPerM: 200 };
    const mu = 9.27e-24;
    const expected = (mu * 200 * (0.5 * 0.01 + 0.1 * 0.3)) / (2 * BOLTZMANN_K * 700);
    for (const mass of [7, 40, 133]) {
      const z = meanDeflection(mu, mass * ATOMIC_MASS_UNIT, g, { kind: 'effusive', temperatureK: 700 });
      expect(rel(z, expected)).toBeLessThan(1e-14);
    }
  });
});

describe('supersonic jet speed law vs SciPy quad + brentq', () => {
  for (const ref of beamRef.jet_laws) {
    it(`mean ${ref.mean_speed_in} m/s, relative rms ${ref.relative_spread_in}`, () => {
      const law = jetLaw(ref.mean_speed_in, ref.relative_spread_in);
      expect(rel(law.meanSpeed, ref.mean_speed)).toBeLessThan(1e-9);
      expect(rel(law.rmsSpread, ref.rms_spread)).toBeLessThan(1e-8);
      expect(rel(law.meanInverseSquare, ref.mean_inverse_square)).toBeLessThan(1e-8);
      expect(rel(law.mostProbableSpeed, ref.most_probable_speed)).toBeLessThan(1e-6);
      for (const [v, frac] of ref.slower_fraction) expect(law.slowerFraction(v)).toBeCloseTo(frac, 8); // table error ≈ 1e-9 at 1024 panels
    });
  }
  it('the largest allowed spread is the oven value √(2 − 9π/16)/(3√π/4) ≈ 0.3630 (SciPy quad of the oven law)', () => {
    const ov = beamRef.oven_laws[0];
    expect(EFFUSIVE_RELATIVE_SPREAD).toBeCloseTo(ov.rms_spread / ov.mean_speed, 10);
    expect(EFFUSIVE_RELATIVE_SPREAD).toBeCloseTo(0.363, 3);
  });
  it('quantile inversion returns the speed with the requested slower fraction', () => {
    const law = jetLaw(900, 0.1);
    for (const p of [1e-6, 0.1, 0.5, 0.9]) expect(law.slowerFraction(speedAtSlowerFraction(law, p))).toBeCloseTo(p, 10);
  });
});

describe('source summaries', () => {
  it('single speed: ⟨1/v²⟩ = 1/v²', () => {
    const r = sourceSpeeds({ kind: 'single', speed: 650 }, 1e-25);
    expect(r.speeds?.meanInverseSquare).toBeCloseTo(1 / 650 ** 2, 20);
    expect(r.speeds?.rmsSpread).toBe(0);
  });
  it('bad inputs come back as issues', () => {
    expect(sourceSpeeds({ kind: 'effusive', temperatureK: -3 }, 1e-25).issues.map((i) => i.code)).toEqual(['beam-temperature-invalid']);
    expect(sourceSpeeds({ kind: 'jet', meanSpeed: 800, relativeSpread: 0.5 }, 1e-25).issues.map((i) => i.code)).toEqual([
      'beam-spread-too-wide',
    ]);
    expect(Number.isNaN(meanDeflection(1e-23, 0, { slit1M: 1, slit2M: 1, slitSeparationM: 1, magnetLengthM: 1, driftM: 1, detectorWidthM: 0, gradientTPerM: 1 }, { kind: 'single', speed: 1 }))).toBe(true);
  });
});
