/**
 * Fields where a transition's frequency is stationary, df/dB = 0 ("field-insensitive" or
 * "magic" points, e.g. the m = 0 ↔ 0 clock line at B = 0 or the Δm = 2 two-photon pair of a
 * J = 1/2 ground level at a few gauss). df/dB comes from the engine's Hellmann–Feynman
 * moments on a scan; sign changes are refined on the exact engine.
 */
import { sweepLevel } from '../engine';
import type { LevelSpec } from '../engine';
import { PLANCK_H } from '../constants';
import { issue } from './issueValues';
import { slopeHzPerT } from './magneticTransitions';
import { pairKeys, solvePair } from './pairStates';
import { checkRange, rootsOnGrid } from './rootScan';
import { lowKey } from './sublevelTag';
import type { FieldRange, InsensitiveResult, SublevelPair, TransitionIssue } from './types';

export function fieldInsensitivePoints(spec: LevelSpec, pair: SublevelPair, range: FieldRange): InsensitiveResult {
  const issues: TransitionIssue[] = [];
  const keys = pairKeys(pair, issues);
  const grid = checkRange(range, issues);
  if (!keys || !grid) return { points: [], issues };

  const sweep = sweepLevel(spec, grid.fromT, grid.toT, grid.points, { crossings: false });
  issues.push(...sweep.issues);
  if (sweep.states.length === 0) return { points: [], issues };
  const lower = sweep.states.find((s) => lowKey(s.low) === keys.lower);
  const upper = sweep.states.find((s) => lowKey(s.low) === keys.upper);
  if (!lower || !upper) {
    issues.push(issue('error', 'pair-not-found', 'The level has no sublevel with one of these labels.'));
    return { points: [], issues };
  }

  // df/dB = dE_u/dB − dE_l/dB, with dE/dB = −μ/h.
  const ys = new Float64Array(grid.points);
  let scale = 0;
  for (let i = 0; i < grid.points; i++) {
    ys[i] = -(upper.momentJT[i] - lower.momentJT[i]) / PLANCK_H;
    scale = Math.max(scale, Math.abs(ys[i]));
  }
  const slopeAt = (b: number): number => {
    const p = solvePair(spec, b, keys);
    return p ? slopeHzPerT(p.upper) - slopeHzPerT(p.lower) : Number.NaN;
  };
  const roots = rootsOnGrid(sweep.fieldsT, ys, slopeAt, 1e-13 * scale, 1e-15 * scale);
  const points = [];
  for (const fieldT of roots) {
    const p = solvePair(spec, fieldT, keys);
    if (!p) continue;
    points.push({ fieldT, frequencyHz: p.upper.energyHz - p.lower.energyHz, d2fdB2: p.upper.d2EdB2 - p.lower.d2EdB2 });
  }
  if (points.length === 0) {
    issues.push(
      issue('info', 'no-insensitive-point', 'df/dB does not change sign in this range (a touching zero or two zeros within one scan step would be missed; use more points).'),
    );
  }
  return { points, issues };
}
