/**
 * Shapes shared by the field sources (coils, solenoids, wires, magnetised blocks) and by
 * everything that uses their field: magnets built from sources, traps, slowers.
 * SI throughout: positions in m, fields in T, gradients in T/m, currents in A.
 * The lab frame is right-handed; gravity points along −z unless a trap says otherwise.
 */
import type { FieldIssue } from './issues';

export type Vec3 = readonly [number, number, number];

/** Rows i, columns j: gradient[i][j] = ∂B_i/∂x_j (T/m); symmetric and traceless in free space. */
export type Mat3 = readonly [Vec3, Vec3, Vec3];

/** The field at one point, and its first derivatives. */
export interface FieldSample {
  B: Vec3;
  gradient: Mat3;
  /**
   * Parts of a sum (sumField) left out at this point because it lies on their conductor; absent
   * when none was. B and the gradient are then those of the other parts only.
   */
  leftOut?: readonly FieldIssue[];
}

/** A circular current loop of N turns (`ampereTurns` = N·I; the sign follows the right-hand rule about `axis`). */
export interface LoopSpec {
  kind: 'loop';
  centre: Vec3;
  /** Unit vector. */
  axis: Vec3;
  radiusM: number;
  ampereTurns: number;
}

/** A finite solenoid: a uniform current sheet of N turns over `lengthM`, centred on `centre`. */
export interface SolenoidSpec {
  kind: 'solenoid';
  centre: Vec3;
  axis: Vec3;
  radiusM: number;
  lengthM: number;
  ampereTurns: number;
}

/** A straight wire through `point` along the unit vector `direction`; infinite unless `lengthM` (a segment centred on `point`). */
export interface WireSpec {
  kind: 'wire';
  point: Vec3;
  direction: Vec3;
  currentA: number;
  lengthM?: number;
}

/** A uniformly magnetised rectangular block with edges along x, y, z; `magnetisationT` is μ0·M. */
export interface SlabSpec {
  kind: 'slab';
  centre: Vec3;
  sizeM: Vec3;
  magnetisationT: Vec3;
}

/** One exact part of the field; a coil pair or a wire with its return is two parts. */
export type FieldSourceSpec = LoopSpec | SolenoidSpec | WireSpec | SlabSpec;

/** The summed field of some sources: B and its gradient at a point. Never NaN; `leftOut` names the parts a point lies on. */
export type FieldFunction = (point: Vec3) => FieldSample;
