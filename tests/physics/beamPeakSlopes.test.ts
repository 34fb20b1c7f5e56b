// Exact slopes of a peak position (physics/beam/peakSlopes.ts) against central finite differences
// of the maximum of the exact profile. The maximum for the differences is found here by plain
// bisection on the profile's closed-form slope (peakRefine.ts exactProfileSlope, itself held to
// differences of the profile and to an mpmath reference in beamPeakSlope.test.ts), which places it
// to round-off. A bisection on differences of the profile's values, used before, is limited for the
// jet by the speed table: its H = e P − E differs from ∫ P by the tables' own errors, which moved that
// maximum by 4.6e-6 m of 0.02 m at 1024 panels (the slope's zero moved 1.3e-7 m; both agree to 5e-10 m
// at 16384 panels).
import { describe, expect, it } from 'vitest';
import { deflectionCoefficient, detectorPattern, peakSlopes, slitImage, type BeamGeometry, type PatternInput, type SlitImage } from '../../server/src/physics/beam';
import { exactProfileSlope, type RefineMember } from '../../server/src/physics/beam/peakRefine';
import { speedLawFor } from '../../server/src/physics/beam/speedLawFor';
import { ATOMIC_MASS_UNIT } from '../../server/src/physics/constants';

const geometry: BeamGeometry = { slit1M: 1e-5, slit2M: 1e-5, slitSeparationM: 0.5, magnetLengthM: 0.1, driftM: 0.4, detectorWidthM: 1e-5, gradientTPerM: 200 };
const MU = 9.2740100657e-24;
/** Two close sublevels (one merged peak), one alone on the other side, one undeflected; unequal populations. */
const moments = [10 * MU, 10.003 * MU, -7 * MU, 0];
const populations = [1, 0.6, 0.8, 0.5];

function setup(jet: boolean): PatternInput {
  return {
    massKg: 40 * ATOMIC_MASS_UNIT,
    geometry,
    source: jet ? { kind: 'jet', meanSpeed: 600, relativeSpread: 0.2 } : { kind: 'effusive', temperatureK: 900 },
    sublevels: moments.map((m, i) => ({ label: `s${i}`, momentJT: m, population: populations[i]! })),
  };
}

/** The maximum of the exact profile near `guess`: bisection on the sign of its slope. */
function maximum(members: RefineMember[], input: PatternInput, image: SlitImage, guess: number): number {
  const law = speedLawFor(input.source, input.massKg);
  const slope = (x: number) => exactProfileSlope(x, members, law, image);
  let lo = guess - 6e-5;
  let hi = guess + 6e-5;
  expect(slope(lo)).toBeGreaterThan(0);
  expect(slope(hi)).toBeLessThan(0);
  for (let n = 0; n < 60; n++) {
    const mid = 0.5 * (lo + hi);
    if (slope(mid) > 0) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

describe('peak slopes against central differences of the exact maximum', () => {
  for (const jet of [false, true]) {
    it(jet ? 'jet' : 'oven', () => {
      const input = setup(jet);
      const pattern = detectorPattern(input);
      const image = slitImage(geometry);
      const popSum = populations.reduce((a, b) => a + b, 0);
      const ks = moments.map((m) => deflectionCoefficient(m, input.massKg, geometry));
      if (!jet) expect(pattern.peaks.find((p) => p.members.includes('s0'))!.memberIndices).toEqual([0, 1]); // the sum over members
      const checked = pattern.peaks.filter((p) => p.positionM !== 0);
      expect(checked.length).toBeGreaterThanOrEqual(2);
      for (const peak of checked) {
        const members = (shift: (i: number) => number) => peak.memberIndices.map((i) => ({ k: ks[i]! + shift(i), weight: populations[i]! / popSum }));
        const x0 = maximum(members(() => 0), input, image, peak.positionM);
        expect(Math.abs(x0 - peak.positionM), peak.members.join("+")).toBeLessThan(1e-10 * Math.abs(x0)); // the same maximum the pattern refined (measured ≤ 4.5e-11, jet: the slope's round-off band, bisected from other ends)
        const slopes = peakSlopes(input, [{ positionM: x0, memberIndices: peak.memberIndices }])[0]!;
        peak.memberIndices.forEach((i, j) => {
          const h = 2e-3 * Math.abs(ks[i]!); // moves the maximum ~2e-5 m, 1e4 times its placement error
          const at = (d: number) => maximum(members((q) => (q === i ? d : 0)), input, image, x0);
          const fd = (at(h) - at(-h)) / (2 * h);
          expect(Math.abs(slopes.perK[j]! / fd - 1), `${peak.members.join('+')} k${i}`).toBeLessThan(1e-3); // measured ≤ 7e-4 (jet, lone peak)
        });
      }
    });
  }

  it('box widths and the detector width: wide slits, where the image shapes the peak', () => {
    // With 10 µm slits the image moves an oven peak by ~1e-9 m per 10 % of a width: too little to difference.
    const wide = { ...geometry, slit1M: 3e-4, slit2M: 2e-4, detectorWidthM: 1e-4 };
    const input: PatternInput = { ...setup(false), geometry: wide, sublevels: [{ label: 'a', momentJT: 0.5 * MU, population: 1 }] };
    const image = slitImage(wide);
    const members = [{ k: deflectionCoefficient(0.5 * MU, input.massKg, wide), weight: 1 }];
    const x0 = maximum(members, input, image, detectorPattern(input).peaks[0]!.positionM);
    const slopes = peakSlopes(input, [{ positionM: x0, memberIndices: [0] }])[0]!;
    for (const [key, slope] of [['boxAM', slopes.perBoxA], ['boxBM', slopes.perBoxB], ['detectorM', slopes.perDetector]] as const) {
      const h = 0.02 * image[key];
      const at = (d: number) => maximum(members, input, { ...image, [key]: image[key] + d }, x0);
      const fd = (at(h) - at(-h)) / (2 * h);
      expect(Math.abs(fd), key).toBeGreaterThan(1e-2); // a real dependence, not noise
      expect(Math.abs(slope / fd - 1), key).toBeLessThan(1e-3);
    }
  });

  it('a lone peak far out moves almost in proportion to its coefficient (x_p ≈ k⟨·⟩: dx_p/dk ≈ x_p/k)', () => {
    const input = { ...setup(false), sublevels: [{ label: 'a', momentJT: 5 * MU, population: 1 }] };
    const peak = detectorPattern(input).peaks[0]!;
    const s = peakSlopes(input, [peak])[0]!;
    const k = deflectionCoefficient(5 * MU, input.massKg, geometry);
    expect((s.perK[0]! * k) / peak.positionM).toBeCloseTo(1, 2);
  });

  it('no slopes where the refinement does not run: single speed, point detector', () => {
    const input = setup(false);
    expect(peakSlopes({ ...input, source: { kind: 'single', speed: 500 } }, [{ positionM: 1e-4, memberIndices: [0] }])[0]).toBeUndefined();
    expect(peakSlopes({ ...input, geometry: { ...geometry, detectorWidthM: 0 } }, [{ positionM: 1e-4, memberIndices: [0] }])[0]).toBeUndefined();
  });
});
