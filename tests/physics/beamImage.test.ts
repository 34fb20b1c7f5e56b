import { describe, expect, it } from 'vitest';
import { kernelDensity, slitImage, trapezoidDensity } from '../../server/src/physics/beam';
import { beamRef } from './beamReference';

describe('two-slit image at the detector', () => {
  it('box widths from similar triangles: a = w2 (1 + L/d), b = w1 L/d (worked by hand)', () => {
    // w1 = 60 µm, w2 = 40 µm, d = 0.5 m, L = 0.1 + 0.4 m → a = 80 µm, b = 60 µm (same as the SciPy script's image_a/b).
    const g = beamRef.patterns[0].geometry;
    const img = slitImage(g);
    expect(img.boxAM).toBeCloseTo(80e-6, 18);
    expect(img.boxBM).toBeCloseTo(60e-6, 18);
    expect(img.boxAM).toBeCloseTo(beamRef.patterns[0].image_a_m, 18);
    expect(img.boxBM).toBeCloseTo(beamRef.patterns[0].image_b_m, 18);
    expect(img.baseWidthM).toBeCloseTo(140e-6, 18);
    expect(img.topWidthM).toBeCloseTo(20e-6, 18);
    expect(img.fwhmM).toBeCloseTo(80e-6, 18);
    expect(img.halfSupportM).toBeCloseTo(80e-6, 18); // (80 + 60 + 20)/2 µm
  });

  it('without a detector aperture the kernel FWHM is max(a, b) (trapezoid geometry)', () => {
    const img = slitImage({ ...beamRef.patterns[0].geometry, detectorWidthM: 0 });
    expect(img.kernelFwhmM / 80e-6 - 1).toBeLessThan(1e-12);
    expect(img.kernelFwhmM / 80e-6 - 1).toBeGreaterThan(-1e-12);
  });

  for (const k of beamRef.kernels) {
    it(`kernel a=${k.a}, b=${k.b}, w=${k.w} matches SciPy quad of trapezoid ⊗ box (1e-9 of peak)`, () => {
      const peak = kernelDensity(0, k.a, k.b, k.w);
      for (const [x, y] of k.samples) expect(Math.abs(kernelDensity(x, k.a, k.b, k.w) - y)).toBeLessThan(1e-9 * peak);
    });
  }

  it('the trapezoid has unit area (midpoint sum over 20 000 points)', () => {
    const a = 70e-6;
    const b = 30e-6;
    const n = 20000;
    const h = (a + b) / n;
    let s = 0;
    for (let i = 0; i < n; i++) s += trapezoidDensity(-(a + b) / 2 + (i + 0.5) * h, a, b) * h;
    expect(s).toBeCloseTo(1, 8);
  });
});
