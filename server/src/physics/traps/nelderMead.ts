/**
 * Nelder–Mead simplex minimisation in three dimensions (standard coefficients 1, 2, ½, ½). Chosen
 * because a quadrupole's potential has a cone at its zero, where gradient methods stall. The
 * simplex lives in one typed array (no allocation per step: the trap summary runs it often).
 */
import type { Vec3 } from '../fields/types';

export interface SimplexResult {
  point: Vec3;
  value: number;
  iterations: number;
}

export function nelderMead(f: (p: Vec3) => number, start: Vec3, step: number, tolerance: number, maxIterations = 4000): SimplexResult {
  // Vertex v occupies x[3v .. 3v+2]; vertex 4 and 5 are scratch (trial points).
  const x = new Float64Array(18);
  const val = new Float64Array(4);
  const at = (v: number): Vec3 => [x[3 * v], x[3 * v + 1], x[3 * v + 2]];
  for (let v = 0; v < 4; v++) {
    for (let k = 0; k < 3; k++) x[3 * v + k] = start[k] + (v === k + 1 ? step : 0);
    val[v] = f(at(v));
  }
  const order = [0, 1, 2, 3];
  const c = new Float64Array(3);
  // Trial point into scratch slot s: centroid + t·(worst − centroid).
  const trial = (s: number, worst: number, t: number): number => {
    for (let k = 0; k < 3; k++) x[3 * s + k] = c[k] + t * (x[3 * worst + k] - c[k]);
    return f(at(s));
  };
  const take = (from: number, into: number, value: number): void => {
    for (let k = 0; k < 3; k++) x[3 * into + k] = x[3 * from + k];
    val[into] = value;
  };
  let it = 0;
  for (; it < maxIterations; it++) {
    order.sort((a, b) => val[a] - val[b]);
    const best = order[0];
    const second = order[2];
    const worst = order[3];
    let size = 0;
    for (let v = 1; v < 4; v++) for (let k = 0; k < 3; k++) size = Math.max(size, Math.abs(x[3 * order[v] + k] - x[3 * best + k]));
    if (size < tolerance) break;
    for (let k = 0; k < 3; k++) c[k] = (x[3 * order[0] + k] + x[3 * order[1] + k] + x[3 * order[2] + k]) / 3;
    const fr = trial(4, worst, -1);
    if (fr < val[best]) {
      const fe = trial(5, worst, -2);
      if (fe < fr) take(5, worst, fe);
      else take(4, worst, fr);
    } else if (fr < val[second]) {
      take(4, worst, fr);
    } else {
      const fc = trial(5, worst, fr < val[worst] ? -0.5 : 0.5);
      if (fc < Math.min(fr, val[worst])) take(5, worst, fc);
      else {
        // Shrink toward the best point.
        for (let v = 0; v < 4; v++) {
          if (v === best) continue;
          for (let k = 0; k < 3; k++) x[3 * v + k] = x[3 * best + k] + 0.5 * (x[3 * v + k] - x[3 * best + k]);
          val[v] = f(at(v));
        }
      }
    }
  }
  let b = 0;
  for (let v = 1; v < 4; v++) if (val[v] < val[b]) b = v;
  return { point: at(b), value: val[b], iterations: it };
}
