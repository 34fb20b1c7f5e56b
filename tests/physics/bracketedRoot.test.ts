import { describe, expect, it } from 'vitest';
import { bracketedRoot } from '../../server/src/physics/bracketedRoot';

describe('bracketedRoot', () => {
  it('bisects to neighbouring doubles: √2 as the zero of x² − 2 (Math.SQRT2 is the double nearest √2)', () => {
    const x = bracketedRoot((t) => t * t - 2, 1, 2);
    expect(Math.abs(x - Math.SQRT2)).toBeLessThanOrEqual(Number.EPSILON * 2);
  });
  it('either order of signs; an end that is a zero is returned', () => {
    expect(bracketedRoot((t) => 1 - t, 0, 3)).toBe(1);
    expect(bracketedRoot((t) => t - 3, 0, 3)).toBe(3);
  });
  it('NaN without a sign change (the caller keeps its estimate)', () => {
    expect(bracketedRoot((t) => t * t + 1, -1, 1)).toBeNaN();
    expect(bracketedRoot(() => NaN, -1, 1)).toBeNaN();
  });
});
