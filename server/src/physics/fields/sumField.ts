/**
 * The field of several sources added up. Parts that fail validation are left out (the model
 * reports them); at a point on a part (see onSource.ts) that part adds nothing, and
 * `fieldIssuesAt` says so. A part whose contribution overflows adds nothing either, so the sum is
 * never NaN or infinite.
 */
import { accToSample, newFieldAcc, type FieldAcc } from './axisymmetric';
import type { FieldIssue } from './issues';
import { addLoopField, loopField } from './loopField';
import { pointOnSource } from './onSource';
import { slabField } from './slabField';
import { addSolenoidField, solenoidField } from './solenoidField';
import type { FieldFunction, FieldSample, FieldSourceSpec, Vec3 } from './types';
import { validateFieldSource } from './validateSource';
import { wireField } from './wireField';

export function partField(spec: FieldSourceSpec, point: Vec3): FieldSample {
  switch (spec.kind) {
    case 'loop':
      return loopField(spec, point);
    case 'solenoid':
      return solenoidField(spec, point);
    case 'wire':
      return wireField(spec, point);
    case 'slab':
      return slabField(spec, point);
  }
}

function usable(parts: readonly FieldSourceSpec[]): FieldSourceSpec[] {
  return parts.filter((p) => validateFieldSource(p).length === 0);
}

/** Adds one part into `acc` unless the point is on it (then false). */
function addPart(acc: FieldAcc, part: FieldSourceSpec, point: Vec3, scratch: FieldAcc): boolean {
  switch (part.kind) {
    case 'loop':
      return addLoopField(acc, part, point);
    case 'solenoid':
      return addSolenoidField(acc, part, point);
    default: {
      if (pointOnSource(part, point) !== undefined) return false;
      const s = partField(part, point);
      scratch[0] = s.B[0];
      scratch[1] = s.B[1];
      scratch[2] = s.B[2];
      for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) scratch[3 + 3 * i + j] = s.gradient[i][j];
      for (let i = 0; i < 12; i++) acc[i] += scratch[i];
      return true;
    }
  }
}

export function sumField(parts: readonly FieldSourceSpec[]): FieldFunction {
  const good = usable(parts);
  const acc = newFieldAcc();
  const one = newFieldAcc();
  const scratch = newFieldAcc();
  return (point: Vec3): FieldSample => {
    acc.fill(0);
    for (const part of good) addPart(acc, part, point, scratch);
    if (!finiteAcc(acc)) {
      // Overflow right next to a conductor: leave that part out rather than print Infinity.
      acc.fill(0);
      for (const part of good) {
        one.fill(0);
        addPart(one, part, point, scratch);
        if (finiteAcc(one)) for (let i = 0; i < 12; i++) acc[i] += one[i];
      }
    }
    return accToSample(acc);
  };
}

function finiteAcc(acc: FieldAcc): boolean {
  let total = 0;
  for (let i = 0; i < 12; i++) total += acc[i];
  return Number.isFinite(total);
}

/** What is wrong with evaluating the sum at `point`: invalid parts, and parts the point lies on. */
export function fieldIssuesAt(parts: readonly FieldSourceSpec[], point: Vec3): FieldIssue[] {
  const out: FieldIssue[] = [];
  parts.forEach((part, i) => {
    const invalid = validateFieldSource(part, i);
    if (invalid.length > 0) {
      out.push(...invalid);
      return;
    }
    const on = pointOnSource(part, point, i);
    if (on) out.push(on);
  });
  return out;
}
