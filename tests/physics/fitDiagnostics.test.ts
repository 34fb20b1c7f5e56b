/** The fitter says when its numbers should not be trusted, and never returns its start as a result silently. */
import { describe, expect, it } from 'vitest';
import { fitCurve, type CurveProblem } from '../../server/src/physics/fit';
import { NIST_DATASETS } from '../fixtures/nistStrd';

const mgh09 = NIST_DATASETS.find((d) => d.name === 'MGH09')!;
const line = (y: number[], sigma?: number[]): CurveProblem => ({
  names: ['a', 'b'],
  start: [0, 0],
  y: Float64Array.from(y),
  ...(sigma ? { sigma: Float64Array.from(sigma) } : {}),
  model: (p, out) => {
    for (let i = 0; i < y.length; i++) out[i] = p[0]! + p[1]! * i;
    return true;
  },
});
const codes = (r: ReturnType<typeof fitCurve>) => r.diagnostics.map((d) => d.code);

describe('fit diagnostics', () => {
  it('a fit stopped by the iteration limit is marked not converged (MGH09 from NIST start 1, 3 iterations)', () => {
    const b = [0, 0, 0, 0];
    const r = fitCurve(
      { names: ['b1', 'b2', 'b3', 'b4'], start: mgh09.starts[0]!, y: Float64Array.from(mgh09.y), model: (p, out) => { p.forEach((v, j) => (b[j] = v)); mgh09.x.forEach((x, i) => (out[i] = mgh09.model(b, x))); return true; } },
      { maxIterations: 3 },
    );
    expect(r.status).toBe('max-iterations');
    expect(codes(r)).toContain('fit-not-converged');
  });

  it('too few points: no values at all', () => {
    const r = fitCurve(line([1]));
    expect(r.ok).toBe(false);
    expect(codes(r)).toEqual(['fit-too-few-points']);
  });

  it('too few points for one free parameter: the message counts in the singular', () => {
    const r = fitCurve({ names: ['a'], start: [0], y: new Float64Array(0), model: () => true });
    expect(r.diagnostics.map((d) => d.message)).toEqual(['0 data points cannot determine 1 free parameter (a): give at least 1 point or free fewer parameters']);
  });

  it('a model that cannot be computed at the start', () => {
    const r = fitCurve({ ...line([1, 2, 3]), model: () => false });
    expect(r.ok).toBe(false);
    expect(codes(r)).toEqual(['fit-model-failed']);
  });

  it('χ²/dof far from 1 with given uncertainties (exact line: χ² = 0 → too low; σ 100× too small → too high)', () => {
    // 40 points: dof 38, the band is 1 ± 3√(2/38) = 1 ± 0.69.
    const exact = Array.from({ length: 40 }, (_, i) => 1 + 2 * i);
    expect(codes(fitCurve(line(exact, exact.map(() => 1))))).toContain('fit-chi2-low');
    expect(codes(fitCurve(line([1, 2.5, 3, 4.5, 5, 6.5], [0.01, 0.01, 0.01, 0.01, 0.01, 0.01])))).toContain('fit-chi2-high');
  });

  it('a straight line: exact values and the textbook standard errors σ√(Σx²/(nΣx²−(Σx)²)) and σ√(n/(…))', () => {
    const r = fitCurve(line([1, 3, 5, 7], [1, 1, 1, 1]));
    expect(r.params[0]).toBeCloseTo(1, 9);
    expect(r.params[1]).toBeCloseTo(2, 9);
    // x = 0..3: Σx = 6, Σx² = 14, n = 4, Δ = 4·14 − 36 = 20.
    expect(r.errors[0]).toBeCloseTo(Math.sqrt(14 / 20), 9);
    expect(r.errors[1]).toBeCloseTo(Math.sqrt(4 / 20), 9);
  });

  it('starting values that are already the minimum are said to be so', () => {
    const r = fitCurve({ ...line([1, 3, 5, 7], [1, 1, 1, 1]), start: [1, 2] });
    expect(codes(r)).toContain('fit-at-start');
  });
});
