/** The GUM law of propagation for independent inputs (JCGM 100:2008 §5.1.2) and the covariance of two results (§F.1.2.3). */
import { describe, expect, it } from 'vitest';
import { combine, correlation, covariance, covarianceMatrix, implicitRoot, standardUncertainty, type UncertainInput } from '../../../server/src/physics/uncertainty';

const inputs = new Map<string, UncertainInput>([
  ['x', { id: 'x', label: 'x', value: 2, u: 0.1 }],
  ['y', { id: 'y', label: 'y', value: 3, u: 0.2 }],
]);

describe('propagation', () => {
  it('u(f)² = Σ (∂f/∂x_i)² u_i² for f = 3x − 4y: u = sqrt(0.09 + 0.64)', () => {
    expect(standardUncertainty({ x: 3, y: -4 }, inputs)).toBeCloseTo(Math.sqrt(0.09 + 0.64), 15);
  });
  it('results sharing an input are correlated: a = x + y, b = x − y → cov = u_x² − u_y², r = −0.6', () => {
    const a = { x: 1, y: 1 };
    const b = { x: 1, y: -1 };
    expect(covariance(a, b, inputs)).toBeCloseTo(0.01 - 0.04, 15);
    expect(correlation(a, b, inputs)).toBeCloseTo(-0.03 / 0.05, 12);
    expect(covarianceMatrix([a, b], inputs)).toEqual([[covariance(a, a, inputs), covariance(a, b, inputs)], [covariance(b, a, inputs), covariance(b, b, inputs)]]);
    // u(a − b) from the covariance equals the direct propagation of a − b = 2y.
    const diff = combine([[1, a], [-1, b]]);
    expect(standardUncertainty(diff, inputs) ** 2).toBeCloseTo(covariance(a, a, inputs) + covariance(b, b, inputs) - 2 * covariance(a, b, inputs), 15);
  });
  it('an input id not in the table contributes nothing; no shared input gives no correlation', () => {
    expect(standardUncertainty({ z: 5 }, inputs)).toBe(0);
    expect(correlation({ x: 1 }, { z: 1 }, inputs)).toBeUndefined();
  });
  it('implicit root: g = x² − θ at x = 2 moves as dx/dθ = 1/(2x); a zero slope gives no first-order answer', () => {
    expect(implicitRoot(4, { theta: -1 })).toEqual({ theta: 0.25 });
    expect(implicitRoot(0, { theta: -1 })).toBeUndefined();
  });
});
