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
import { slabField, slabFieldWithRoundOff, type SlabFieldWithRoundOff } from './slabField';
import { addSolenoidField, solenoidField } from './solenoidField';
import type { FieldFunction, FieldSample, FieldSourceSpec, SlabSpec, Vec3 } from './types';
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

/** Adds one part into `acc` unless the point is on it, or a block's closed form overflows there (then false). */
function addPart(acc: FieldAcc, part: FieldSourceSpec, point: Vec3, scratch: FieldAcc): boolean {
  switch (part.kind) {
    case 'loop':
      return addLoopField(acc, part, point);
    case 'solenoid':
      return addSolenoidField(acc, part, point);
    case 'slab': {
      const r = slabAt(part, point);
      if (!r) return false;
      addSample(acc, r.sample, scratch);
      return true;
    }
    case 'wire': {
      if (pointOnSource(part, point) !== undefined) return false;
      addSample(acc, wireField(part, point), scratch);
      return true;
    }
  }
}

function addSample(acc: FieldAcc, s: FieldSample, scratch: FieldAcc): void {
  scratch[0] = s.B[0];
  scratch[1] = s.B[1];
  scratch[2] = s.B[2];
  for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) scratch[3 + 3 * i + j] = s.gradient[i][j];
  for (let i = 0; i < 12; i++) acc[i] += scratch[i];
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

/**
 * A block at the point under the sum's rules: nothing where the point is on its surface, or where
 * its closed form overflows. A round-off bound that overflows counts as an overflow: the block is
 * left out (not kept with no cleaning), because its terms are then beyond ~1e154 and the rounding
 * of its value cannot be stated; a bound of Infinity would also zero every component of a sum.
 */
function slabAt(spec: SlabSpec, point: Vec3): SlabFieldWithRoundOff | undefined {
  if (pointOnSource(spec, point) !== undefined) return undefined;
  const r = slabFieldWithRoundOff(spec, point);
  const { B, gradient: g } = r.sample;
  const total = B[0] + B[1] + B[2] + g[0][0] + g[0][1] + g[0][2] + g[1][0] + g[1][1] + g[1][2] + g[2][0] + g[2][1] + g[2][2];
  return Number.isFinite(total + r.roundOff.B + r.roundOff.gradient) ? r : undefined;
}

const NO_ROUND_OFF = Object.freeze({ B: 0, gradient: 0 });

/**
 * One block's field as sumField([block]) gives it (nothing when it fails validation, left out on
 * its surface or where it overflows) together with the rounding its closed form leaves at the
 * point, from one evaluation: a report that cleans a sum needs both. The rules are sumField's (slabAt).
 */
export function slabPartWithRoundOff(spec: SlabSpec): (point: Vec3) => SlabFieldWithRoundOff {
  const zero: Vec3 = [0, 0, 0];
  const nothing = (leftOut?: FieldIssue): SlabFieldWithRoundOff => ({
    sample: { B: zero, gradient: [zero, zero, zero], ...(leftOut ? { leftOut: [leftOut] } : {}) },
    roundOff: NO_ROUND_OFF,
  });
  if (usable([spec]).length === 0) return () => nothing();
  return (point) => slabAt(spec, point) ?? nothing(onSourceIssue('slab', 0));
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
