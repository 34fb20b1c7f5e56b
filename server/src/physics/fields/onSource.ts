/**
 * Points where a thin-conductor or surface model has no field: on a loop's wire, on a solenoid's
 * current sheet, on a wire, on a magnetised block's surface. "On" means within a billionth of the
 * source's size (1 nm for an infinite wire), well below any real conductor's thickness.
 */
import { toCylinder } from './axisymmetric';
import { issue, type FieldIssue } from './issues';
import type { FieldSourceSpec, Vec3 } from './types';
import { dot, sub } from './vec3';

const RELATIVE = 1e-9;
const INFINITE_WIRE_M = 1e-9;

export function onLoopWire(rho: number, z: number, radius: number): boolean {
  const dr = rho - radius;
  const tol = RELATIVE * radius;
  return dr * dr + z * z <= tol * tol;
}

export function onWinding(rho: number, z: number, radius: number, length: number): boolean {
  const tol = RELATIVE * Math.max(radius, length);
  return Math.abs(rho - radius) <= tol && Math.abs(z) <= length / 2 + tol;
}

/** One entry of the table below: the issue, its message made from the conductor in words, why the model has no field there, and what is left out. */
function entry(made: (message: string) => FieldIssue, conductor: string, why: string, leftOut: string): { issue: FieldIssue; conductor: string } {
  return { issue: made(`The point lies on ${conductor}, where ${why}; ${leftOut} is left out there.`), conductor };
}

/** Per kind of part, the one table of on-conductor findings (the issue makers keep their codes literal for the rule catalogue's scan). */
const ON_SOURCE: Record<FieldSourceSpec['kind'], { issue: FieldIssue; conductor: string }> = {
  loop: entry((m) => issue('warning', 'source-point-on-loop', m), 'the wire of a loop', 'a thin loop has no field', 'that loop'),
  solenoid: entry((m) => issue('warning', 'source-point-on-winding', m), 'the winding of a solenoid', 'the field jumps', 'that solenoid'),
  wire: entry((m) => issue('warning', 'source-point-on-wire', m), 'a wire', 'a thin wire has no field', 'that wire'),
  slab: entry((m) => issue('warning', 'source-point-on-block', m), 'the surface of a magnetised block', 'the field jumps', 'that block'),
};

/** The issue for a point on (or, where the field overflows, next to) a part's conductor. */
export function onSourceIssue(kind: FieldSourceSpec['kind'], partIndex?: number): FieldIssue {
  const { severity, code, message } = ON_SOURCE[kind].issue;
  return issue(severity, code, message, partIndex);
}

/** The conductor an on-source issue is about, in words ("a wire"), for other layers' messages. */
export function conductorOf(i: FieldIssue): string {
  return Object.values(ON_SOURCE).find((t) => t.issue.code === i.code)?.conductor ?? 'a conductor';
}

export function pointOnSource(spec: FieldSourceSpec, point: Vec3, partIndex?: number): FieldIssue | undefined {
  switch (spec.kind) {
    case 'loop': {
      const { rho, z } = toCylinder(point, spec.centre, spec.axis);
      if (onLoopWire(rho, z, spec.radiusM)) return onSourceIssue('loop', partIndex);
      return undefined;
    }
    case 'solenoid': {
      const { rho, z } = toCylinder(point, spec.centre, spec.axis);
      if (onWinding(rho, z, spec.radiusM, spec.lengthM)) return onSourceIssue('solenoid', partIndex);
      return undefined;
    }
    case 'wire': {
      const d = sub(point, spec.point);
      const u = dot(d, spec.direction);
      const rho = Math.hypot(d[0] - u * spec.direction[0], d[1] - u * spec.direction[1], d[2] - u * spec.direction[2]);
      const tol = spec.lengthM === undefined ? INFINITE_WIRE_M : RELATIVE * spec.lengthM;
      const within = spec.lengthM === undefined || Math.abs(u) <= spec.lengthM / 2 + tol;
      if (rho <= tol && within) return onSourceIssue('wire', partIndex);
      return undefined;
    }
    case 'slab': {
      const tol = RELATIVE * Math.max(...spec.sizeM);
      let onFace = false;
      for (let k = 0; k < 3; k++) {
        const off = Math.abs(point[k] - spec.centre[k]) - spec.sizeM[k] / 2;
        if (off > tol) return undefined;
        if (off >= -tol) onFace = true;
      }
      if (onFace) return onSourceIssue('slab', partIndex);
      return undefined;
    }
  }
}
