/**
 * The field of several sources added up. Parts that fail validation are left out (the model
 * reports them); at a point on a part (see onSource.ts) that part adds nothing, and the sample's
 * `leftOut` says so: every caller reads that one decision. A part whose contribution overflows
 * (an absurd current just off its conductor) is left out the same way, so the
 * sum is never NaN or infinite.
 */
import { accToSample, newFieldAcc, type FieldAcc } from './axisymmetric';
import type { FieldIssue } from './issues';
import { addLoopField, loopField } from './loopField';
import { onSourceIssue, pointOnSource } from './onSource';
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

/** The parts the formulas can use, with their place in the list given (for `leftOut`). */
function usable(parts: readonly FieldSourceSpec[]): { part: FieldSourceSpec; index: number }[] {
  return parts.flatMap((part, index) => (validateFieldSource(part).length === 0 ? [{ part, index }] : []));
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
    let missed = false;
    for (const g of good) if (!addPart(acc, g.part, point, scratch)) missed = true;
    if (!missed && finiteAcc(acc)) return accToSample(acc);
    // On a conductor, or so near one that its field overflows: part by part, leaving that part
    // out and saying so (rather than print Infinity).
    acc.fill(0);
    const leftOut: FieldIssue[] = [];
    for (const g of good) {
      one.fill(0);
      if (addPart(one, g.part, point, scratch) && finiteAcc(one)) for (let i = 0; i < 12; i++) acc[i] += one[i];
      else leftOut.push(onSourceIssue(g.part.kind, g.index));
    }
    const sample = accToSample(acc);
    if (leftOut.length > 0) sample.leftOut = leftOut;
    return sample;
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
