/**
 * Fits on the exact engine against SciPy on the closed Breit–Rabi formula: a one-resonance field
 * calibration with both roots near a field-insensitive minimum, g_J and A from resonances at
 * known fields, and an unknown field with A. Reference: tests/reference/fit_reference.json,
 * written by scripts/reference/fit_reference.py (SciPy curve_fit, absolute_sigma=True; brentq).
 */
import { describe, expect, it } from 'vitest';
import ref from '../reference/fit_reference.json';
import type { HyperfineLevelSpec } from '../../server/src/physics/engine';
import { calibrateField, fitCurve, spectralModel, type SpectralParameter, type SpectralPoint } from '../../server/src/physics/fit';

const spec: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: ref.level.twoJ, twoI: ref.level.twoI, gJ: ref.level.gJ, gI: ref.level.gI, A: ref.level.A_Hz };

interface RefPoint {
  lower: number[];
  upper: number[];
  field_T: number | null;
  frequency_Hz: number;
  sigma_Hz: number;
}

function fitCase(c: { points: RefPoint[]; free: string[]; start: number[] }) {
  const points: SpectralPoint[] = c.points.map((q) => ({
    lower: { twoF: q.lower[0]!, twoMF: q.lower[1]! },
    upper: { twoF: q.upper[0]!, twoMF: q.upper[1]! },
    ...(q.field_T !== null ? { fieldT: q.field_T } : {}),
  }));
  const free = c.free as SpectralParameter[];
  const start = { ...spec, gJ: free.includes('g_J') ? c.start[free.indexOf('g_J')]! : spec.gJ, A: free.includes('A') ? c.start[free.indexOf('A')]! : spec.A };
  const fieldStart = free.includes('field') ? c.start[free.indexOf('field')]! : 0;
  const m = spectralModel(start, points, free, fieldStart);
  return fitCurve({
    names: free,
    start: m.start,
    scale: m.scale,
    y: Float64Array.from(c.points, (q) => q.frequency_Hz),
    sigma: Float64Array.from(c.points, (q) => q.sigma_Hz),
    model: m.model,
  });
}

function expectCase(r: ReturnType<typeof fitCase>, c: { params: number[]; errors: number[]; covariance: number[][]; chi2: number }): void {
  expect(r.status).toBe('converged');
  expect(r.scaledByResidual).toBe(false);
  c.params.forEach((p, j) => expect(Math.abs(r.params[j]! - p)).toBeLessThan(0.01 * c.errors[j]!));
  c.errors.forEach((e, j) => expect(r.errors[j]! / e).toBeCloseTo(1, 4));
  c.covariance.forEach((row, i) => row.forEach((v, j) => expect(r.covariance![i]![j]! / v).toBeCloseTo(1, 3)));
  expect(r.chi2).toBeCloseTo(c.chi2, 3);
}

describe('fits on the exact engine against SciPy (Breit–Rabi reference)', () => {
  it('field calibration lists both roots around the field-insensitive point, with u(B) = u(f)/|df/dB|', () => {
    const c = ref.calibration;
    const cal = calibrateField(spec, { lower: { twoF: c.lower[0]!, twoMF: c.lower[1]! }, upper: { twoF: c.upper[0]!, twoMF: c.upper[1]! } }, c.frequency_Hz, c.uncertainty_Hz, {
      fromT: c.range_T[0]!,
      toT: c.range_T[1]!,
    });
    expect(cal.roots).toHaveLength(2);
    cal.roots.forEach((root, k) => {
      const want = c.roots[k]!;
      expect(Math.abs(root.fieldT - want.field_T)).toBeLessThan(1e-6 * want.uncertainty_T);
      expect(root.uncertaintyT! / want.uncertainty_T).toBeCloseTo(1, 4);
      expect(Math.sign(root.dfdBHzPerT)).toBe(Math.sign(want.dfdB_Hz_per_T));
    });
  });

  it('g_J and A from resonances at known fields: values, standard uncertainties, covariance and χ² as curve_fit', () => {
    expectCase(fitCase(ref.gj_a), ref.gj_a);
  });

  it('an unknown field and A from four resonances at that field', () => {
    expectCase(fitCase(ref.field_a), ref.field_a);
  });
});
