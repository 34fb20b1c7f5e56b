/**
 * Gauss–Legendre nodes and weights on [−1, 1] by Newton iteration on P_n
 * (three-term recurrence). Used for the speed-law integrals of the jet source.
 */
export interface QuadratureRule {
  nodes: Float64Array;
  weights: Float64Array;
}

const cache = new Map<number, QuadratureRule>();

export function gaussLegendre(n: number): QuadratureRule {
  const hit = cache.get(n);
  if (hit) return hit;
  const nodes = new Float64Array(n);
  const weights = new Float64Array(n);
  const half = Math.floor((n + 1) / 2);
  for (let i = 0; i < half; i++) {
    // Chebyshev-like first guess for the i-th largest root.
    let x = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 1;
    for (let iter = 0; iter < 100; iter++) {
      let p0 = 1;
      let p1 = x;
      for (let k = 2; k <= n; k++) {
        const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      const pn = n === 1 ? x : p1;
      const pnm1 = n === 1 ? 1 : p0;
      dp = (n * (x * pn - pnm1)) / (x * x - 1);
      const dx = pn / dp;
      x -= dx;
      if (Math.abs(dx) < 1e-16) break;
    }
    // Recompute the derivative at the converged root for the weight.
    let p0 = 1;
    let p1 = x;
    for (let k = 2; k <= n; k++) {
      const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
      p0 = p1;
      p1 = p2;
    }
    dp = n === 1 ? 1 : (n * (x * p1 - p0)) / (x * x - 1);
    const w = 2 / ((1 - x * x) * dp * dp);
    nodes[i] = -x;
    nodes[n - 1 - i] = x;
    weights[i] = w;
    weights[n - 1 - i] = w;
  }
  const rule = { nodes, weights };
  cache.set(n, rule);
  return rule;
}
