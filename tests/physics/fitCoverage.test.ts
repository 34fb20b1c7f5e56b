/**
 * Coverage: data generated from known g_J and A (exact engine) with seeded Gaussian noise are
 * fitted back; the true values must lie within ±1 standard uncertainty in ≈ 68.3 % and within
 * ±2 in ≈ 95.4 % of trials (normal-distribution fractions). With 400 trials the binomial
 * standard deviation is ≈ 2.3 % and ≈ 1.0 %: the bands below are about 4 of those wide.
 */
import { describe, expect, it } from 'vitest';
import type { HyperfineLevelSpec } from '../../server/src/physics/engine';
import { fitCurve, spectralModel, type SpectralPoint } from '../../server/src/physics/fit';

/** mulberry32: a small seeded generator, so the test is the same on every run. */
function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function gaussian(rand: () => number): number {
  return Math.sqrt(-2 * Math.log(1 - rand())) * Math.cos(2 * Math.PI * rand());
}

describe('coverage of the reported uncertainties', () => {
  it('true g_J and A fall within 1σ and 2σ at the normal rates', () => {
    const truth: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 1, twoI: 3, gJ: 2.0023, gI: -0.000995, A: 3417.34e6 };
    const points: SpectralPoint[] = [0.5e-3, 20e-3, 60e-3, 150e-3].flatMap((fieldT) => [
      { lower: { twoF: 2, twoMF: 0 }, upper: { twoF: 4, twoMF: 0 }, fieldT },
      { lower: { twoF: 2, twoMF: 2 }, upper: { twoF: 4, twoMF: 2 }, fieldT },
    ]);
    const exact = new Float64Array(points.length);
    spectralModel(truth, points, [], 0).model(new Float64Array(0), exact);
    const sigma = 300;
    const rand = seeded(15);
    const trials = 400;
    const within = [0, 0];
    const inside = [0, 0];
    for (let t = 0; t < trials; t++) {
      const y = Float64Array.from(exact, (f) => f + sigma * gaussian(rand));
      const m = spectralModel({ ...truth, gJ: 2, A: 3417e6 }, points, ['g_J', 'A'], 0);
      const r = fitCurve({ names: ['g_J', 'A'], start: m.start, scale: m.scale, y, sigma: new Float64Array(points.length).fill(sigma), model: m.model });
      expect(r.status).toBe('converged');
      [truth.gJ, truth.A].forEach((v, j) => {
        const z = Math.abs(r.params[j]! - v) / r.errors[j]!;
        if (z <= 1) within[j]!++;
        if (z <= 2) inside[j]!++;
      });
    }
    for (const j of [0, 1]) {
      expect(within[j]! / trials).toBeGreaterThan(0.59);
      expect(within[j]! / trials).toBeLessThan(0.78);
      expect(inside[j]! / trials).toBeGreaterThan(0.91);
      expect(inside[j]! / trials).toBeLessThan(0.995);
    }
  });
});
