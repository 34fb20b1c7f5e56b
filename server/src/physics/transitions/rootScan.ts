/**
 * Roots of a function sampled on a field grid: every sign change between neighbouring
 * samples is refined on the exact function (Illinois regula falsi with bisection fallback,
 * the engine's `bracketedRoot`); samples within `zeroTol` of zero count as roots themselves.
 * Two roots inside one grid step, or a touching without a sign change, are not seen —
 * the caller says "use more points".
 */
import { bracketedRoot } from '../engine/bracketedRoot';
import { issue } from './issueValues';
import type { FieldRange, TransitionIssue } from './types';

export const DEFAULT_SCAN_POINTS = 401;
export const MAX_SCAN_POINTS = 100_001;
/** Largest points × pairs examined by one resonance scan. */
export const MAX_SCAN_WORK = 5e7;

export interface CheckedRange {
  fromT: number;
  toT: number;
  points: number;
}

export function checkRange(range: FieldRange, issues: TransitionIssue[]): CheckedRange | null {
  if (range === null || typeof range !== 'object' || !Number.isFinite(range.fromT) || !Number.isFinite(range.toT)) {
    issues.push(issue('error', 'scan-bad-range', 'The field range needs finite fromT and toT in tesla.'));
    return null;
  }
  if (range.fromT === range.toT) {
    issues.push(issue('error', 'scan-bad-range', 'The field range is empty (fromT = toT).'));
    return null;
  }
  const points = range.points ?? DEFAULT_SCAN_POINTS;
  if (!Number.isInteger(points) || points < 3 || points > MAX_SCAN_POINTS) {
    issues.push(issue('error', 'scan-bad-points', `The scan needs a whole number of points from 3 to ${MAX_SCAN_POINTS}.`));
    return null;
  }
  return { fromT: Math.min(range.fromT, range.toT), toT: Math.max(range.fromT, range.toT), points };
}

/**
 * Roots of `f` given its samples `ys` at `xs` (ascending). `f` is evaluated only to refine.
 * Roots closer than 1e-12 of the range are merged.
 */
export function rootsOnGrid(
  xs: ArrayLike<number>,
  ys: ArrayLike<number>,
  f: (x: number) => number,
  zeroTol: number,
  fTol: number,
): number[] {
  const n = xs.length;
  const roots: number[] = [];
  const isZero = (y: number): boolean => Math.abs(y) <= zeroTol;
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(ys[i])) continue;
    if (isZero(ys[i])) {
      roots.push(xs[i]);
      continue;
    }
    if (i + 1 >= n || !Number.isFinite(ys[i + 1]) || isZero(ys[i + 1])) continue;
    if (Math.sign(ys[i]) !== Math.sign(ys[i + 1])) {
      const r = bracketedRoot(f, xs[i], xs[i + 1], ys[i], ys[i + 1], fTol);
      if (Number.isFinite(r)) roots.push(r);
    }
  }
  roots.sort((a, b) => a - b);
  const span = Math.abs(xs[n - 1] - xs[0]);
  return roots.filter((r, i) => i === 0 || r - roots[i - 1] > 1e-12 * span);
}
