import { describe, expect, it } from 'vitest';
import {
  detectorPattern,
  kernelDensity,
  LAB_REACH,
  leverArmM2,
  resolvingOptions,
  slitImage,
  smallestResolvingDrift,
  smallestResolvingGradient,
  smallestResolvingMagnetLength,
  type PatternInput,
} from '../../server/src/physics/beam';
import { BOHR_MAGNETON } from '../../server/src/physics/constants';
import { MASS_39_U, SLIT_BEAM_GEOMETRY } from '../fixtures/slitBeamGeometry';

// Invented scenario: 39 u, single speed 700 m/s, two sublevels with moments ±μ_B.
const geometry = SLIT_BEAM_GEOMETRY;
const mass = MASS_39_U;
const speed = 700;
const pair: PatternInput = {
  massKg: mass,
  geometry,
  source: { kind: 'single', speed },
  sublevels: [
    { label: 'down', momentJT: -BOHR_MAGNETON, population: 1 },
    { label: 'up', momentJT: BOHR_MAGNETON, population: 1 },
  ],
};

/**
 * Independent expectation from the analytic kernel K (checked against SciPy in beamImage.test.ts):
 * two copies of K a distance Δ apart have dip ratio min_{0≤x≤Δ} [K(x) + K(Δ − x)] / [K(0) + K(Δ)].
 * Bisection for the Δ where it equals the criterion.
 */
function separationAtCriterion(criterion: number): number {
  const img = slitImage(geometry);
  const K = (x: number): number => kernelDensity(x, img.boxAM, img.boxBM, img.detectorM);
  const ratio = (d: number): number => {
    let low = Infinity;
    for (let i = 0; i <= 4000; i++) {
      const x = (d * i) / 4000;
      low = Math.min(low, K(x) + K(d - x));
    }
    return low / (K(0) + K(d));
  };
  let lo = 0;
  let hi = 2 * img.halfSupportM;
  for (let i = 0; i < 60; i++) {
    const mid = 0.5 * (lo + hi);
    if (ratio(mid) > criterion) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

describe('resolvability verdict', () => {
  it('dip ratio is 1 when the peaks sit on top of each other and falls to 0 when they are far apart', () => {
    const far = detectorPattern({ ...pair, geometry: { ...geometry, gradientTPerM: 500 } });
    expect(far.pairs).toHaveLength(1);
    expect(far.pairs[0].dipRatio).toBe(0);
    expect(far.pairs[0].resolved).toBe(true);
    // Merge fraction 0 keeps the two sublevels apart even when they nearly coincide.
    const close = detectorPattern({ ...pair, geometry: { ...geometry, gradientTPerM: 0.2 }, mergeFraction: 0 });
    expect(close.pairs).toHaveLength(1);
    expect(close.pairs[0].dipRatio).toBeGreaterThan(0.99);
    expect(close.pairs[0].resolved).toBe(false);
  });

  it('the criterion is adjustable: the same pattern passes at 0.9 and fails at 0.8 and 0.5', () => {
    const g = { ...geometry, gradientTPerM: 2.8 };
    const p = detectorPattern({ ...pair, geometry: g });
    const dip = p.pairs[0].dipRatio;
    expect(dip).toBeGreaterThan(0.5);
    expect(dip).toBeLessThan(0.9);
    expect(detectorPattern({ ...pair, geometry: g, dipCriterion: 0.9 }).allResolved).toBe(true);
    expect(p.allResolved).toBe(false); // default 0.8
    expect(detectorPattern({ ...pair, geometry: g, dipCriterion: 0.5 }).allResolved).toBe(false);
  });
});

describe('smallest resolving gradient / length / drift', () => {
  it('gradient agrees with the analytic two-kernel dip (to 1e-3)', () => {
    const delta = separationAtCriterion(0.8);
    // Peaks at ±z with z = μ G (L1²/2 + L1 L2) / (M v²), so Δ = 2z.
    const expected = (delta / 2) * ((mass * speed * speed) / (BOHR_MAGNETON * leverArmM2(geometry)));
    const r = smallestResolvingGradient(pair, { upperBound: 1000 });
    expect(r.issues).toEqual([]);
    expect(r.value).toBeDefined();
    expect(Math.abs(r.value! / expected - 1)).toBeLessThan(1e-3);
    expect(r.peaks).toEqual([['down'], ['up']]);
  });

  it('the value found resolves and 0.1 % less does not', () => {
    const r = smallestResolvingGradient(pair, { upperBound: 1000 });
    const at = detectorPattern({ ...pair, geometry: { ...geometry, gradientTPerM: r.value! } });
    const below = detectorPattern({ ...pair, geometry: { ...geometry, gradientTPerM: r.value! * 0.999 } });
    expect(at.allResolved).toBe(true);
    expect(below.allResolved).toBe(false);
  });

  it('a negative gradient keeps its sign', () => {
    const r = smallestResolvingGradient({ ...pair, geometry: { ...geometry, gradientTPerM: -150 } }, { upperBound: 1000 });
    const positive = smallestResolvingGradient(pair, { upperBound: 1000 });
    expect(r.value! / -positive.value! - 1).toBeCloseTo(0, 6);
  });

  it('magnet length: the lever L1²/2 + L1·L2 needed matches the gradient solution', () => {
    const g = smallestResolvingGradient(pair, { upperBound: 1000 }).value!;
    const lever = (g * leverArmM2(geometry)) / geometry.gradientTPerM; // same deflection at 150 T/m
    // Solve L1²/2 + L1 L2 = lever for L1 — but the image widens with L1 too, so only check the verdict.
    const l = smallestResolvingMagnetLength(pair, { upperBound: 1 });
    expect(l.value).toBeDefined();
    const at = detectorPattern({ ...pair, geometry: { ...geometry, magnetLengthM: l.value! } });
    const below = detectorPattern({ ...pair, geometry: { ...geometry, magnetLengthM: l.value! * 0.999 } });
    expect(at.allResolved).toBe(true);
    expect(below.allResolved).toBe(false);
    expect(0.5 * l.value! ** 2 + l.value! * geometry.driftM).toBeLessThan(lever * 1.05);
  });

  it('drift: reports 0 when already resolved at the magnet exit, and a value when not', () => {
    expect(smallestResolvingDrift(pair, { upperBound: 5, lowerBound: 0 }).value).toBe(0);
    const weak = { ...pair, geometry: { ...geometry, gradientTPerM: 4 } };
    const r = smallestResolvingDrift(weak, { upperBound: 5, lowerBound: 0 });
    expect(r.value).toBeGreaterThan(0);
    expect(detectorPattern({ ...weak, geometry: { ...weak.geometry, driftM: r.value! } }).allResolved).toBe(true);
  });

  it('reports, without throwing, when nothing within the bound resolves', () => {
    const r = smallestResolvingGradient(pair, { upperBound: 1 });
    expect(r.value).toBeUndefined();
    expect(r.issues.map((i) => i.code)).toEqual(['beam-unresolvable-within-bound']);
    expect(r.dipRatios[0]).toBeGreaterThan(0.8);
  });

  it('reports when all sublevels form one peak', () => {
    const same = { ...pair, sublevels: pair.sublevels.map((s) => ({ ...s, momentJT: BOHR_MAGNETON })) };
    const r = smallestResolvingGradient(same, { upperBound: 1000 });
    expect(r.value).toBeUndefined();
    expect(r.issues.map((i) => i.code)).toEqual(['beam-nothing-to-resolve']);
  });

  it('one merged peak even at the bound is unresolvable, not "nothing to resolve"', () => {
    // ±μ_B at 0.2 T/m: peaks 7.9 µm apart against a 102 µm image (merged below 0.25 of it).
    const r = smallestResolvingGradient(pair, { upperBound: 0.2 });
    expect(r.value).toBeUndefined();
    expect(r.peaks).toEqual([['down', 'up']]);
    expect(r.issues.map((i) => i.code)).toEqual(['beam-unresolvable-within-bound']);
  });

  it('rejects bad bounds as an issue', () => {
    expect(smallestResolvingGradient(pair, { upperBound: -1 }).issues[0].code).toBe('beam-search-bounds-invalid');
    expect(smallestResolvingGradient(pair, { upperBound: 10, lowerBound: 20 }).issues[0].code).toBe('beam-search-bounds-invalid');
  });
});

describe('one peak: merged, or nothing to resolve', () => {
  const weak = { ...geometry, gradientTPerM: 0.2 };

  it('sublevels that deflect oppositely but land in one peak are not resolved', () => {
    // ±μ_B at 0.2 T/m: z = ±μ G (L1²/2 + L1 L2)/(M v²) = ±3.9 µm, well inside 0.25 × the 102 µm image.
    const p = detectorPattern({ ...pair, geometry: weak });
    expect(p.peaks).toHaveLength(1);
    expect(p.pairs).toEqual([]);
    expect(p.allResolved).toBe(false);
    expect(p.mergedLonePeak).toBe(true);
  });

  it('sublevels that all deflect alike have nothing to resolve: equal moments, μ = 0 (J = 0), one sublevel, one populated', () => {
    const alike = (moments: number[], populations = moments.map(() => 1)): boolean => {
      const p = detectorPattern({ ...pair, sublevels: moments.map((m, i) => ({ label: `s${i}`, momentJT: m, population: populations[i]! })) });
      expect(p.peaks).toHaveLength(1);
      expect(p.mergedLonePeak).toBe(!p.allResolved);
      return p.allResolved;
    };
    expect(alike([BOHR_MAGNETON, BOHR_MAGNETON, BOHR_MAGNETON])).toBe(true);
    expect(alike([0, 0, 0])).toBe(true);
    expect(alike([BOHR_MAGNETON])).toBe(true);
    expect(alike([BOHR_MAGNETON, -BOHR_MAGNETON], [1, 0])).toBe(true);
  });

  it('the tolerance: round-off-size differences of the moments are alike, 1e-7 of them is not', () => {
    // Tolerance 1e-9 of the larger of the largest |k| and the image's k (deflectAlike.ts); at 150 T/m
    // the image width is 0.04 of ±μ_B's deflection, so the first term sets it.
    const at = (m2: number): boolean => detectorPattern({ ...pair, sublevels: [{ label: 'a', momentJT: BOHR_MAGNETON, population: 1 }, { label: 'b', momentJT: m2, population: 1 }] }).allResolved;
    expect(at(BOHR_MAGNETON * (1 + 1e-12))).toBe(true);
    expect(at(BOHR_MAGNETON * (1 + 1e-7))).toBe(false);
    // Moments that are zero but for round-off are alike by the image floor (±1e-40 J/T deflect by ±3e-20 m,
    // 6e-16 of the 102 µm image apart); ±1e-30 J/T (±3e-10 m, 6e-6 of the image apart) are merged.
    const opposite = (m: number): boolean => detectorPattern({ ...pair, sublevels: [{ label: 'a', momentJT: -m, population: 1 }, { label: 'b', momentJT: m, population: 1 }] }).allResolved;
    expect(opposite(1e-40)).toBe(true);
    expect(opposite(1e-30)).toBe(false);
  });

  it('the advice for one merged peak finds the gradient of the analytic two-kernel dip (to 1e-3)', () => {
    const input = { ...pair, geometry: weak };
    const found = resolvingOptions(input, detectorPattern(input));
    expect(found.presentWorstDipRatio).toBe(1);
    const g = found.options.find((o) => o.parameter === 'gradient')!;
    expect(g.resolvesAll).toBe(true);
    const expected = (separationAtCriterion(0.8) / 2) * ((mass * speed * speed) / (BOHR_MAGNETON * leverArmM2(geometry)));
    expect(Math.abs(g.value / expected - 1)).toBeLessThan(1e-3);
    // Every option offered resolves or visibly splits the peak, and is computed: the pattern with it agrees.
    for (const o of found.options) expect(o.worstDipRatio).toBeLessThanOrEqual(0.98);
    expect(detectorPattern({ ...input, geometry: { ...geometry, gradientTPerM: g.value } }).allResolved).toBe(true);
  });

  it('a magnet far weaker than one that splits the peak: the search reaches a laboratory magnet, not only 100 times the present one', () => {
    // At 1 mT/m, 100 times the present gradient (0.1 T/m) falls far short of the analytic splitting
    // gradient (above); 100 times the 12 cm magnet and 50 cm drift are beyond the laboratory reach.
    const expected = (separationAtCriterion(0.8) / 2) * ((mass * speed * speed) / (BOHR_MAGNETON * leverArmM2(geometry)));
    const input = { ...pair, geometry: { ...geometry, gradientTPerM: 0.001 } };
    const found = resolvingOptions(input, detectorPattern(input));
    expect(found.reach.gradient).toEqual({ limit: LAB_REACH.gradient, by: 'lab' });
    expect(found.reach.magnetLength).toEqual({ limit: 12, by: 'present' });
    expect(found.reach.drift).toEqual({ limit: 50, by: 'present' });
    expect(found.nothingWithinReach).toBe(false);
    const g = found.options.find((o) => o.parameter === 'gradient')!;
    expect(g.resolvesAll).toBe(true);
    expect(Math.abs(g.value / expected - 1)).toBeLessThan(1e-3);
  });

  it('nothing within reach: moments 1e-7 apart stay one peak up to a laboratory magnet; 100 times a strong magnet is the reach', () => {
    const close = { ...pair, sublevels: [{ label: 'a', momentJT: BOHR_MAGNETON, population: 1 }, { label: 'b', momentJT: BOHR_MAGNETON * (1 + 1e-7), population: 1 }] };
    const weakMagnet = { ...close, geometry: weak };
    const found = resolvingOptions(weakMagnet, detectorPattern(weakMagnet));
    expect(found.options).toEqual([]);
    expect(found.nothingWithinReach).toBe(true);
    expect(found.reach.gradient).toEqual({ limit: LAB_REACH.gradient, by: 'lab' });
    // 100 times 150 T/m is beyond the laboratory reach: the search keeps its relative bound.
    const strong = { ...close, geometry: { ...geometry, gradientTPerM: 150 } };
    const atStrong = resolvingOptions(strong, detectorPattern(strong));
    expect(atStrong.reach.gradient).toEqual({ limit: 15000, by: 'present' });
    // A magnet built from sources is searched without gradient, length and drift: not "nothing within reach".
    expect(resolvingOptions(weakMagnet, detectorPattern(weakMagnet), ['slits', 'detector', 'speedSpread']).nothingWithinReach).toBe(false);
  });

  it('a drift of 0 is searched from a tenth of the magnet length: its reach says so, not "100 times the present one"', () => {
    const close = { ...pair, sublevels: [{ label: 'a', momentJT: BOHR_MAGNETON, population: 1 }, { label: 'b', momentJT: BOHR_MAGNETON * (1 + 1e-7), population: 1 }] };
    const long = { ...close, geometry: { ...geometry, gradientTPerM: 150, magnetLengthM: 0.5, driftM: 0 } };
    const found = resolvingOptions(long, detectorPattern(long));
    // 100 × 0.05 m = 5 m, beyond the laboratory's 3 m: the relative bound holds, from the magnet.
    expect(found.reach.drift).toEqual({ limit: 5, by: 'magnet' });
    const short = { ...long, geometry: { ...long.geometry, magnetLengthM: 0.1 } };
    expect(resolvingOptions(short, detectorPattern(short)).reach.drift).toEqual({ limit: LAB_REACH.drift, by: 'lab' });
  });
});
