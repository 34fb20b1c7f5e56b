/** The field sampled along a straight segment and on a flat rectangular grid (for maps and plots). */
import { issue, type FieldIssue } from './issues';
import type { FieldFunction, FieldSample, Vec3 } from './types';

/** Caps a sampling request so that one call stays well under a second. */
export const MAX_SAMPLES = 1_000_000;

export interface PointSample extends FieldSample {
  point: Vec3;
  magnitude: number;
}

export interface SegmentSamples {
  /** Distance from `from`, m. */
  s: number[];
  samples: PointSample[];
  issues: FieldIssue[];
}

function at(field: FieldFunction, point: Vec3): PointSample {
  const f = field(point);
  return { point, B: f.B, gradient: f.gradient, magnitude: Math.hypot(f.B[0], f.B[1], f.B[2]) };
}

function badCount(n: number, what: string): FieldIssue[] {
  return Number.isInteger(n) && n >= 2 && n <= MAX_SAMPLES ? [] : [issue('error', 'source-bad-sampling', `${what} must be a whole number from 2 to ${MAX_SAMPLES}.`)];
}

/** `count` points from `from` to `to`, both ends included. */
export function sampleSegment(field: FieldFunction, from: Vec3, to: Vec3, count: number): SegmentSamples {
  const issues = badCount(count, 'The number of points along a line');
  if (issues.length > 0) return { s: [], samples: [], issues };
  const length = Math.hypot(to[0] - from[0], to[1] - from[1], to[2] - from[2]);
  const s: number[] = [];
  const samples: PointSample[] = [];
  for (let i = 0; i < count; i++) {
    const f = i / (count - 1);
    s.push(f * length);
    samples.push(at(field, [from[0] + f * (to[0] - from[0]), from[1] + f * (to[1] - from[1]), from[2] + f * (to[2] - from[2])]));
  }
  return { s, samples, issues };
}

export interface GridRequest {
  centre: Vec3;
  /** The two in-plane directions (need not be unit; their lengths are the half-widths, m). */
  uHalf: Vec3;
  vHalf: Vec3;
  nu: number;
  nv: number;
}

export interface GridSamples {
  /** Offsets along u and v, from −1 to 1 in units of the half-widths. */
  u: number[];
  v: number[];
  /** rows[j][i]: v index j, u index i. */
  rows: PointSample[][];
  issues: FieldIssue[];
}

export function sampleGrid(field: FieldFunction, req: GridRequest): GridSamples {
  const issues = [...badCount(req.nu, 'The number of grid points along u'), ...badCount(req.nv, 'The number of grid points along v')];
  if (issues.length === 0 && req.nu * req.nv > MAX_SAMPLES) issues.push(issue('error', 'source-bad-sampling', `A grid of more than ${MAX_SAMPLES} points.`));
  if (issues.length > 0) return { u: [], v: [], rows: [], issues };
  const u = Array.from({ length: req.nu }, (_, i) => -1 + (2 * i) / (req.nu - 1));
  const v = Array.from({ length: req.nv }, (_, j) => -1 + (2 * j) / (req.nv - 1));
  const rows = v.map((fv) =>
    u.map((fu) => at(field, [req.centre[0] + fu * req.uHalf[0] + fv * req.vHalf[0], req.centre[1] + fu * req.uHalf[1] + fv * req.vHalf[1], req.centre[2] + fu * req.uHalf[2] + fv * req.vHalf[2]])),
  );
  return { u, v, rows, issues };
}
