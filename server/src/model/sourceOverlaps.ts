/**
 * Sources that sit on top of each other: two equal loops at one place (same centre, radius and
 * axis), a wire through a loop's wire, two wires on one line. The thin-conductor field is then
 * infinite somewhere on the sources and the setup is almost surely a slip (a pasted block).
 * Checked pair by pair over the parts, up to a cap so that a huge file stays quick.
 */
import type { LoopSpec, Vec3, WireSpec } from '../physics/fields/types';
import { dot, norm as len, sub } from '../physics/fields/vec3';
import type { ProblemList } from './problems';
import type { FieldSourceModel } from './types';

const RELATIVE = 1e-9;
/** Beyond this many parts the pairwise check is skipped (it is quadratic). */
export const OVERLAP_CHECK_MAX_PARTS = 400;


function sameLoop(a: LoopSpec, b: LoopSpec): boolean {
  const tol = RELATIVE * Math.max(a.radiusM, b.radiusM);
  return len(sub(a.centre, b.centre)) <= tol && Math.abs(a.radiusM - b.radiusM) <= tol && Math.abs(dot(a.axis, b.axis)) >= 1 - 1e-12;
}

/** Does the wire's line (or segment) pass through the loop's circle? */
function wireThroughLoop(w: WireSpec, l: LoopSpec): boolean {
  const tol = RELATIVE * l.radiusM;
  const within = (s: number): boolean => w.lengthM === undefined || Math.abs(s) <= w.lengthM / 2 + tol;
  const denom = dot(w.direction, l.axis);
  const toCentre = sub(l.centre, w.point);
  if (Math.abs(denom) > 1e-12) {
    // The one point where the line meets the loop's plane.
    const s = dot(toCentre, l.axis) / denom;
    const p: Vec3 = [w.point[0] + s * w.direction[0], w.point[1] + s * w.direction[1], w.point[2] + s * w.direction[2]];
    return within(s) && Math.abs(len(sub(p, l.centre)) - l.radiusM) <= tol;
  }
  // Parallel to the plane: it crosses the circle when it lies in the plane within a radius of the centre.
  if (Math.abs(dot(toCentre, l.axis)) > tol) return false;
  const s = dot(toCentre, w.direction);
  const closest = len([toCentre[0] - s * w.direction[0], toCentre[1] - s * w.direction[1], toCentre[2] - s * w.direction[2]]);
  if (closest > l.radiusM + tol) return false;
  const half = Math.sqrt(Math.max(0, l.radiusM * l.radiusM - closest * closest));
  return within(s - half) || within(s + half);
}

function sameLine(a: WireSpec, b: WireSpec): boolean {
  if (Math.abs(dot(a.direction, b.direction)) < 1 - 1e-12) return false;
  const d = sub(b.point, a.point);
  const s = dot(d, a.direction);
  const off = len([d[0] - s * a.direction[0], d[1] - s * a.direction[1], d[2] - s * a.direction[2]]);
  const scale = Math.max(a.lengthM ?? 1, b.lengthM ?? 1);
  if (off > RELATIVE * scale) return false;
  if (a.lengthM === undefined || b.lengthM === undefined) return true;
  return Math.abs(s) < (a.lengthM + b.lengthM) / 2;
}

function describe(a: FieldSourceModel, b: FieldSourceModel, kindA: string, kindB: string): string | undefined {
  if (kindA === 'loop' && kindB === 'loop') return `${a.kind} '${a.name}' has a loop on top of one of ${b.kind} '${b.name}' (same centre, radius and axis)`;
  if (kindA === 'wire' && kindB === 'wire') return `wire '${a.name}' runs along the same line as wire '${b.name}'`;
  return `${a.kind} '${a.name}' and ${b.kind} '${b.name}' touch: a wire passes through a loop's wire`;
}

export function checkSourceOverlaps(sources: readonly FieldSourceModel[], problems: ProblemList): void {
  const parts = sources.flatMap((s) => s.parts.map((p) => ({ s, p })));
  if (parts.length > OVERLAP_CHECK_MAX_PARTS) return;
  const reported = new Set<string>();
  for (let j = 1; j < parts.length; j++) {
    for (let i = 0; i < j; i++) {
      const a = parts[i]!;
      const b = parts[j]!;
      if (a.s === b.s) continue;
      const pa = a.p;
      const pb = b.p;
      const hit =
        (pa.kind === 'loop' && pb.kind === 'loop' && sameLoop(pa, pb)) ||
        (pa.kind === 'wire' && pb.kind === 'loop' && wireThroughLoop(pa, pb)) ||
        (pa.kind === 'loop' && pb.kind === 'wire' && wireThroughLoop(pb, pa)) ||
        (pa.kind === 'wire' && pb.kind === 'wire' && sameLine(pa, pb));
      const key = `${sources.indexOf(a.s)}:${sources.indexOf(b.s)}`;
      if (!hit || reported.has(key)) continue;
      reported.add(key);
      problems.add('source-overlap', `${describe(b.s, a.s, pb.kind, pa.kind)}; the field on it is infinite, so one of them is probably misplaced`, b.s.nameRange, {
        related: [{ message: `${a.s.kind} '${a.s.name}' is here`, range: a.s.nameRange }],
      });
    }
  }
}
