/**
 * The field of sources seen along the slower: the component along the atoms' direction of flight
 * and its derivative along it (from the exact gradient tensor, n·G·n), and the transverse part.
 */
import type { FieldFunction, Vec3 } from '../fields/types';
import type { AxisField } from './types';

export interface SlowerAxis {
  /** Where z = 0 (the entrance), m. */
  start: Vec3;
  /** Unit vector of the atoms' flight. */
  direction: Vec3;
}

export function pointOnAxis(axis: SlowerAxis, zM: number): Vec3 {
  const { start: s, direction: n } = axis;
  return [s[0] + zM * n[0], s[1] + zM * n[1], s[2] + zM * n[2]];
}

export function axisField(field: FieldFunction, axis: SlowerAxis): AxisField {
  const n = axis.direction;
  return (zM) => {
    const { B, gradient: g } = field(pointOnAxis(axis, zM));
    let d = 0;
    for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) d += n[i]! * g[i]![j]! * n[j]!;
    return { BT: B[0] * n[0] + B[1] * n[1] + B[2] * n[2], dBdzTPerM: d };
  };
}

/** Largest |B_transverse| over |B_axial| + ΔB·1e-3 on the samples (a measure of how axial the coils' field is). */
export function transverseFraction(field: FieldFunction, axis: SlowerAxis, zs: readonly number[], scaleT: number): number {
  const n = axis.direction;
  let worst = 0;
  for (const z of zs) {
    const { B } = field(pointOnAxis(axis, z));
    const along = B[0] * n[0] + B[1] * n[1] + B[2] * n[2];
    const t = Math.hypot(B[0] - along * n[0], B[1] - along * n[1], B[2] - along * n[2]);
    worst = Math.max(worst, t / (Math.abs(along) + 1e-3 * scaleT));
  }
  return worst;
}
