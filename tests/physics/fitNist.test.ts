/**
 * The fitter on NIST StRD nonlinear-regression datasets of lower, average and higher difficulty,
 * from both NIST starting points, with the Jacobian taken by central differences (as the
 * physics fits take it). Agreement is counted in significant digits, the log relative error
 * (LRE) NIST suggests; certified values carry 11 digits. Source of data and certified values:
 * tests/fixtures/nistStrd.ts.
 */
import { describe, expect, it } from 'vitest';
import { fitCurve } from '../../server/src/physics/fit';
import { NIST_DATASETS, type NistDataset } from '../fixtures/nistStrd';

function lre(value: number | null, certified: number): number {
  if (value === null) return 0;
  const rel = Math.abs(value - certified) / Math.abs(certified);
  return rel === 0 ? 15 : -Math.log10(rel);
}

function fit(d: NistDataset, start: number[]) {
  const b = new Array<number>(start.length);
  return fitCurve({
    names: start.map((_, i) => `b${i + 1}`),
    start,
    y: Float64Array.from(d.y),
    model: (p, out) => {
      for (let j = 0; j < p.length; j++) b[j] = p[j]!;
      for (let i = 0; i < d.x.length; i++) out[i] = d.model(b, d.x[i]!);
      return true;
    },
  });
}

/** Digits required: parameters and residual sum of squares; standard deviations (through the Jacobian, one difference step less exact). */
const REQUIRED = { params: 6.5, sd: 5.4, rss: 9 };

describe('NIST StRD certified nonlinear regressions', () => {
  for (const d of NIST_DATASETS) {
    d.starts.forEach((start, k) => {
      it(`${d.name} (${d.difficulty} difficulty) from start ${k + 1}`, () => {
        const r = fit(d, start);
        expect(r.ok).toBe(true);
        expect(r.status).toBe('converged');
        expect(r.diagnostics.filter((x) => x.severity === 'error')).toEqual([]);
        expect(r.scaledByResidual).toBe(true);
        expect(r.dof).toBe(d.x.length - start.length);
        d.certified.forEach((c, j) => expect(lre(r.params[j]!, c), `b${j + 1}`).toBeGreaterThan(REQUIRED.params));
        d.certifiedSd.forEach((c, j) => expect(lre(r.errors[j]!, c), `sd b${j + 1}`).toBeGreaterThan(REQUIRED.sd));
        expect(lre(r.chi2, d.certifiedRss)).toBeGreaterThan(REQUIRED.rss);
      });
    });
  }

  it('the residual standard deviation is √(RSS/dof) (Misra1a certified 1.0187876330E-01)', () => {
    const d = NIST_DATASETS[0]!;
    const r = fit(d, d.starts[1]!);
    expect(lre(Math.sqrt(r.reducedChi2!), 1.018787633e-1)).toBeGreaterThan(9);
  });
});
