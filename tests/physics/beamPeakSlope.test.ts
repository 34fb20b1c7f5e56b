// The peak refinement's slope and mode (physics/beam/peakRefine.ts). The closed-form slope is held
// to central differences of the exact profile (own consistency check) and to the slope written by
// scripts/reference/beam_peak_modes.py (mpmath quadrature of ∫ p(z) K'(x − z) dz, 30 digits: the
// outside reference); the modes themselves are in beamPeakModes.test.ts.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { deflectionCoefficient, detectorPattern, slitImage, type BeamGeometry } from '../../server/src/physics/beam';
import { exactProfile, exactProfileSlope, refinePeak } from '../../server/src/physics/beam/peakRefine';
import { speedLawFor } from '../../server/src/physics/beam/speedLawFor';
import { ATOMIC_MASS_UNIT } from '../../server/src/physics/constants';

const geometry: BeamGeometry = { slit1M: 1e-5, slit2M: 1e-5, slitSeparationM: 0.5, magnetLengthM: 0.1, driftM: 0.4, detectorWidthM: 1e-5, gradientTPerM: 200 };
const MU = 9.2740100657e-24;
const massKg = 40 * ATOMIC_MASS_UNIT;
const law = speedLawFor({ kind: 'effusive', temperatureK: 900 }, massKg);

describe('mirror-image peaks are exact negatives', () => {
  it('±moment sublevels of one pattern (invented scenario)', () => {
    const moments = [1.5 * MU, -1.5 * MU, 0.7 * MU, -0.7 * MU, 1.0003 * MU, -1.0003 * MU];
    const p = detectorPattern({ massKg, geometry, source: { kind: 'effusive', temperatureK: 900 }, sublevels: moments.map((m, i) => ({ label: `s${i}`, momentJT: m, population: 1 })) });
    for (let i = 0; i < moments.length; i += 2) {
      const up = p.sublevels[i]!.peakM;
      const down = p.sublevels[i + 1]!.peakM;
      expect(up).toBeGreaterThan(1e-4);
      expect(Math.abs(up + down) / up).toBeLessThanOrEqual(1e-12);
    }
  });

  for (const w of [1e-5, 0]) {
    it(`the same mode whatever the grid's guess (detector ${w} m)`, () => {
      const g = { ...geometry, detectorWidthM: w };
      const image = slitImage(g);
      const k = deflectionCoefficient(1.5 * MU, massKg, g);
      const guesses = [0.00167933, 0.00167934, 0.001679345];
      const up = guesses.map((x) => refinePeak(x, 2e-6, [{ k, weight: 1 }], law, image));
      const down = guesses.map((x) => refinePeak(-x, 2e-6, [{ k: -k, weight: 1 }], law, image));
      for (const x of [...up, ...down.map((d) => -d)]) expect(x).toBe(up[0]);
      // Not the guess kept: the slope there is zero to its round-off, and the guesses are 1e-8 m apart.
      expect(Math.abs(exactProfileSlope(up[0]!, [{ k, weight: 1 }], law, image))).toBeLessThan(1e-3);
      expect(Math.abs(exactProfileSlope(guesses[0]!, [{ k, weight: 1 }], law, image))).toBeGreaterThan(1);
    });
  }
});

describe('the closed-form slope', () => {
  const image = slitImage(geometry);
  const members = [{ k: deflectionCoefficient(1.5 * MU, massKg, geometry), weight: 0.7 }, { k: deflectionCoefficient(-0.4 * MU, massKg, geometry), weight: 0.3 }, { k: 0, weight: 0.2 }];
  it('matches central differences of the exact profile (own consistency check)', () => {
    const f = (x: number) => exactProfile(x, members, law, image);
    for (const x of [-2e-3, -4e-4, 3e-6, 1e-3, 1.7e-3, 2.5e-3]) {
      // Richardson on two central differences: truncation ~(h/1 mm)⁴, round-off of the profile's values ~1e-7.
      const d = (h: number) => (f(x + h) - f(x - h)) / (2 * h);
      const fd = (4 * d(5e-7) - d(1e-6)) / 3;
      const exact = exactProfileSlope(x, members, law, image);
      expect(Math.abs(fd - exact), `x = ${x}`).toBeLessThan(1e-5 * Math.abs(exact) + 1e-2);
    }
  });

  const ref = JSON.parse(readFileSync(join(__dirname, '..', 'reference', 'beam_peak_modes.json'), 'utf8')) as {
    scenarios: { geometry: BeamGeometry; mass_u: number; source: { kind: 'effusive'; temperatureK: number }; sublevels: { label: string; moment_JT: number; slope_samples_per_m2: [number, number][] }[] }[];
  };
  for (const s of ref.scenarios) {
    it(`matches the mpmath slope beside each mode: ${s.mass_u} u`, () => {
      const mass = s.mass_u * ATOMIC_MASS_UNIT;
      const sLaw = speedLawFor(s.source, mass);
      const sImage = slitImage(s.geometry);
      let checked = 0;
      for (const r of s.sublevels) {
        const one = [{ k: deflectionCoefficient(r.moment_JT, mass, s.geometry), weight: 1 }];
        for (const [x, slope] of r.slope_samples_per_m2) {
          expect(Math.abs(exactProfileSlope(x, one, sLaw, sImage) / slope - 1), `${r.label} at ${x}`).toBeLessThan(SLOPE_TOLERANCE);
          checked++;
        }
      }
      expect(checked).toBeGreaterThanOrEqual(12);
    });
  }
});

/** Measured worst 4.0e-10 (the 40 u beam; 2.5e-11 for 6 u). */
const SLOPE_TOLERANCE = 1e-9;

describe('guards of the refinement', () => {
  const image = slitImage(geometry);
  const one = [{ k: deflectionCoefficient(1.5 * MU, massKg, geometry), weight: 1 }];
  it('keeps a guess on the flank, where no cell near it turns down', () => {
    expect(refinePeak(1.2e-3, 2e-6, one, law, image)).toBe(1.2e-3);
  });
  it('puts ±k members of equal weight at 0 exactly, and keeps the guess for a single-speed beam', () => {
    expect(refinePeak(3e-9, 2e-6, [...one, { k: -one[0]!.k, weight: 1 }], law, image)).toBe(0);
    expect(refinePeak(1.7e-3, 2e-6, one, speedLawFor({ kind: 'single', speed: 500 }, massKg), image)).toBe(1.7e-3);
  });
});
