/**
 * The detector pattern of a beam whose magnet is built from field sources: the uniform-gradient
 * pattern code (z = k/v² spread over the speed law, the slit image, the aperture) is fed each
 * sublevel's coefficient k from its integrated flight instead of μ G (L1²/2 + L1 L2)/M. It does
 * so through an effective moment μ_eff = k M / (G_ref (L1²/2 + L1 L2)), with G_ref the gradient
 * of |B| at the beam-line centre (1 T/m when that is 0), so everything downstream is unchanged.
 * Because μ_eff stands for the whole flight, only changes that leave the flight alone (slits,
 * detector, speed spread) are valid resolving advice for such a beam.
 */
import type { LevelSpec } from '../../engine';
import type { FieldFunction, FieldSourceSpec, Vec3 } from '../../fields/types';
import { leverArmM2 } from '../deflection';
import type { PatternInput } from '../detectorPattern';
import { speedAtSlowerFraction } from '../speedLaw';
import { speedLawFor } from '../speedLawFor';
import { hasBeamError } from '../types';
import { validateGeometry } from '../validateGeometry';
import { validateSource } from '../validateSource';
import { fieldMapBeam, type FieldMapBeam } from './fieldMapBeam';
import type { FlightOptions } from './flight';

export interface FieldMapPatternInput {
  /** The pattern input as the uniform model would have it (geometry.gradientTPerM is replaced). */
  pattern: PatternInput;
  field: FieldFunction;
  centre: Vec3;
  spec: LevelSpec;
  /** Engine low-field label of each of pattern.sublevels, same order. */
  labels: readonly string[];
  /** The named parts of the field, which the beam line must keep clear of. */
  obstacles?: readonly { name: string; spec: FieldSourceSpec }[];
  options?: FlightOptions;
}

/** The slow and fast ends of the speed law flown besides the reference speed (flux fractions). */
export const END_FRACTIONS = [0.05, 0.95] as const;

export function fieldMapPattern(input: FieldMapPatternInput): { pattern: PatternInput; fieldMap?: FieldMapBeam; referenceSpeed?: number; speeds?: number[] } {
  const { pattern } = input;
  const geo = pattern.geometry;
  // Invalid geometry or source: leave it to the pattern code to say so.
  if (hasBeamError([...validateGeometry(geo), ...validateSource(pattern.source, pattern.massKg)])) return { pattern };
  const law = speedLawFor(pattern.source, pattern.massKg);
  const reference = 1 / Math.sqrt(law.meanInverseSquare);
  const speeds = law.singleSpeed !== undefined ? [law.singleSpeed] : [reference, ...END_FRACTIONS.map((p) => speedAtSlowerFraction(law, p))];
  // The beam's half height at the magnet exit: half the second slit plus the collimator's spread over the magnet.
  const halfAngle = (geo.slit1M + geo.slit2M) / (2 * geo.slitSeparationM);
  const halfHeightM = geo.slit2M / 2 + halfAngle * geo.magnetLengthM;
  const fieldMap = fieldMapBeam({
    field: input.field,
    centre: input.centre,
    magnetLengthM: geo.magnetLengthM,
    driftM: geo.driftM,
    massKg: pattern.massKg,
    spec: input.spec,
    labels: input.labels,
    speeds,
    halfHeightM,
    ...(input.obstacles ? { obstacles: input.obstacles } : {}),
    ...(input.options ? { options: input.options } : {}),
  });
  const g = fieldMap.survey.gradientTPerM;
  const gRef = g !== 0 && Number.isFinite(g) ? g : 1;
  const lever = leverArmM2({ ...geo, gradientTPerM: gRef });
  const sublevels = pattern.sublevels.map((s, i) => {
    const k = fieldMap.sublevels[i]?.coefficientM3PerS2 ?? 0;
    return { ...s, momentJT: effectiveMomentJT(k, pattern.massKg, gRef * lever) };
  });
  return { pattern: { ...pattern, geometry: { ...geo, gradientTPerM: gRef }, sublevels }, fieldMap, referenceSpeed: reference, speeds };
}

/**
 * The moment that gives deflection coefficient k = z·v² in the uniform-gradient model with
 * gradient × lever arm `gradientLever` (T·m): k·M / (G·lever); 0 where that product is 0 or not finite.
 */
export function effectiveMomentJT(k: number, massKg: number, gradientLever: number): number {
  return gradientLever !== 0 && Number.isFinite(gradientLever) ? (k * massKg) / gradientLever : 0;
}
