/**
 * The z samples of a design check: a uniform grid over [0, L] (every one of its points kept), each
 * interval halved while the ideal field or the checked field at its midpoint lies more than `tol`
 * off the chord. The √ end of the ideal profile and a coil design's fall at the exit then draw
 * without a kink. The uniform points stay; the drop point, the worst shortfall and the capture
 * speed are taken over the added points too, so they may fall between them.
 */
import type { AxisField } from './types';

export interface GridPoint {
  zM: number;
  idealT: number;
  at: { BT: number; dBdzTPerM: number };
}

/** `ideal` undefined: the field checked is the ideal one, evaluated once per point. */
export function checkGrid(field: AxisField, ideal: ((zM: number) => number) | undefined, lengthM: number, intervals: number, tol: number, maxDepth = 6): GridPoint[] {
  const point = (zM: number): GridPoint => {
    const at = field(zM);
    return { zM, idealT: ideal ? ideal(zM) : at.BT, at };
  };
  const off = (a: number, m: number, b: number): number => Math.abs(m - (a + b) / 2);
  const out: GridPoint[] = [point(0)];
  const refine = (p0: GridPoint, p1: GridPoint, depth: number): void => {
    if (depth < maxDepth && tol > 0) {
      const m = point((p0.zM + p1.zM) / 2);
      const bent = off(p0.idealT, m.idealT, p1.idealT) > tol || off(p0.at.BT, m.at.BT, p1.at.BT) > tol;
      if (bent && Number.isFinite(m.idealT) && Number.isFinite(m.at.BT)) {
        refine(p0, m, depth + 1);
        refine(m, p1, depth + 1);
        return;
      }
    }
    out.push(p1);
  };
  // The last point is the exit itself: (L·n)/n can fall one unit in the last place short of L.
  for (let i = 1; i <= intervals; i++) refine(out[out.length - 1]!, point(i === intervals ? lengthM : (lengthM * i) / intervals), 0);
  return out;
}
