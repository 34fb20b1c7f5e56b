/**
 * Nelder–Mead simplex minimisation in three dimensions (standard coefficients 1, 2, ½, ½). Chosen
 * because a quadrupole's potential has a cone at its zero, where gradient methods stall.
 */
import type { Vec3 } from '../fields/types';

export interface SimplexResult {
  point: Vec3;
  value: number;
  iterations: number;
}

export function nelderMead(f: (p: Vec3) => number, start: Vec3, step: number, tolerance: number, maxIterations = 4000): SimplexResult {
  const pts: number[][] = [[...start]];
  for (let k = 0; k < 3; k++) {
    const p = [...start];
    p[k] += step;
    pts.push(p);
  }
  const vals = pts.map((p) => f(p as unknown as Vec3));
  let it = 0;
  for (; it < maxIterations; it++) {
    const order = [0, 1, 2, 3].sort((a, b) => vals[a] - vals[b]);
    const [best, , second, worst] = order as [number, number, number, number];
    let size = 0;
    for (const i of order) for (let k = 0; k < 3; k++) size = Math.max(size, Math.abs(pts[i][k] - pts[best][k]));
    if (size < tolerance) break;
    const c = [0, 0, 0];
    for (const i of order) if (i !== worst) for (let k = 0; k < 3; k++) c[k] += pts[i][k] / 3;
    const along = (t: number): number[] => c.map((ck, k) => ck + t * (pts[worst][k] - ck));
    const xr = along(-1);
    const fr = f(xr as unknown as Vec3);
    if (fr < vals[best]) {
      const xe = along(-2);
      const fe = f(xe as unknown as Vec3);
      if (fe < fr) [pts[worst], vals[worst]] = [xe, fe];
      else [pts[worst], vals[worst]] = [xr, fr];
    } else if (fr < vals[second]) {
      [pts[worst], vals[worst]] = [xr, fr];
    } else {
      const xc = fr < vals[worst] ? along(-0.5) : along(0.5);
      const fc = f(xc as unknown as Vec3);
      if (fc < Math.min(fr, vals[worst])) [pts[worst], vals[worst]] = [xc, fc];
      else {
        // Shrink toward the best point.
        for (const i of order) {
          if (i === best) continue;
          pts[i] = pts[i].map((v, k) => pts[best][k] + 0.5 * (v - pts[best][k]));
          vals[i] = f(pts[i] as unknown as Vec3);
        }
      }
    }
  }
  let b = 0;
  for (let i = 1; i < 4; i++) if (vals[i] < vals[b]) b = i;
  return { point: [pts[b][0], pts[b][1], pts[b][2]], value: vals[b], iterations: it };
}
