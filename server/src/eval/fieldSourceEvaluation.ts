/**
 * Field source → its evaluation entry: the exact parts, B and the gradient tensor at its centre
 * (exact cancellations such as the centre of an opposed pair cleaned to 0), the copper winding's
 * numbers when a `conductor` is given, the cautions, and the problems the winding raises.
 * The field is the physics core's (cleanField over sumField).
 */
import type { Problem, Range } from '../format/ast';
import { loopWireLength, windingPower, type WindingPower } from '../physics/fields/coilPower';
import { sourceCautions } from './fieldSourceCautions';
import type { FieldSourceSpec, Vec3 } from '../physics/fields/types';
import { axialDerivative, cleanField } from './cleanField';
import type { FieldSourcePartResult, FieldSourceResult, WindingResult } from './fieldSourceResultTypes';
import { EVAL_RULES } from './evalCodes';
import { windingNumbersText } from './windingText';
import type { FieldSourceModel } from '../model/types';

/** The model's source block as the evaluation reads it. */
export function sourceEvalInput(m: FieldSourceModel, fieldUnit: string | undefined): SourceEvalInput {
  return {
    name: m.name,
    kind: m.kind,
    nameRange: m.nameRange,
    parts: m.parts,
    ...(m.turns ? { turns: m.turns.value } : {}),
    ...(m.currentA ? { currentA: m.currentA.value } : {}),
    ...(m.radiusM ? { radiusM: m.radiusM.value } : {}),
    ...(m.conductorM ? { conductorM: m.conductorM.value, ...(m.conductorM.range ? { conductorRange: m.conductorM.range } : {}) } : {}),
    ...(m.spacingM ? { spacingM: m.spacingM.value } : {}),
    ...(m.sense ? { sense: m.sense.value } : {}),
    ...(fieldUnit ? { fieldUnit } : {}),
    ...(m.magnetisationT?.unit ? { magnetisationUnit: m.magnetisationT.unit } : {}),
  };
}

/** What the evaluation needs of a source block (the model's FieldSourceModel, adapted). */
export interface SourceEvalInput {
  name: string;
  kind: FieldSourceResult['kind'];
  nameRange: Range;
  parts: readonly FieldSourceSpec[];
  /** Turns per coil, current, radius, and the conductor's bare diameter and where it is written. */
  turns?: number;
  currentA?: number;
  radiusM?: number;
  conductorM?: number;
  conductorRange?: Range;
  /** A coil pair: spacing and sense. */
  spacingM?: number;
  sense?: 'same' | 'opposite';
  /** The unit the file writes fields in elsewhere (a `field` block or a magnet), for reports. */
  fieldUnit?: string;
  /** A slab: the unit its magnetisation was written in. */
  magnetisationUnit?: string;
}

export function evaluateFieldSource(s: SourceEvalInput, problems: Problem[]): FieldSourceResult {
  const parts = s.parts.map(partResult);
  const out: FieldSourceResult = { name: s.name, kind: s.kind, parts, cautions: [] };
  if (s.fieldUnit) out.field_unit = s.fieldUnit;
  if (s.magnetisationUnit) out.magnetisation_unit = s.magnetisationUnit;
  if (s.parts.length === 0) return out;
  if (s.kind === 'coil' && s.spacingM !== undefined && s.radiusM) {
    out.pair = { sense: s.sense ?? 'same', spacing_m: s.spacingM, spacing_over_radius: s.spacingM / s.radiusM };
  }
  const centre = probePoint(s.parts);
  const probed = centre && cleanField(s.parts)(centre);
  if (centre && probed && 'sample' in probed) {
    const { sample, floor } = probed;
    const G = sample.gradient;
    out.centre_m = [...centre];
    out.field_T = [...sample.B];
    out.field_abs_T = Math.hypot(...sample.B);
    out.gradient_T_per_m = G.map((r) => [...r]);
    const axial = s.parts[0];
    // Zeroed within the rounding the cleaned tensor carries at the centre, as its entries are.
    if (axial && (axial.kind === 'loop' || axial.kind === 'solenoid')) out.axial_gradient_T_per_m = axialDerivative(G, axial.axis, floor.gradient);
  }
  const w = winding(s);
  if (w) {
    out.winding = windingResult(w, s.conductorM!);
    windingProblems(s, w, problems);
  }
  const slab = s.parts.find((p) => p.kind === 'slab');
  out.cautions = sourceCautions({
    kind: s.kind,
    ...(w ? { winding: { ...w, conductorM: s.conductorM! } } : {}),
    ...(out.field_abs_T !== undefined ? { fieldT: out.field_abs_T } : {}),
    ...(slab?.kind === 'slab' ? { magnetisationT: Math.hypot(...slab.magnetisationT), ...(s.magnetisationUnit ? { magnetisationUnit: s.magnetisationUnit } : {}) } : {}),
    ...(s.fieldUnit ? { fieldUnit: s.fieldUnit } : {}),
  });
  return out;
}

/** The centre of the block; for a wire with its return, midway between the two; none for a lone wire. */
export function probePoint(parts: readonly FieldSourceSpec[]): Vec3 | undefined {
  const first = parts[0];
  if (!first) return undefined;
  if (first.kind === 'wire') {
    const second = parts[1];
    if (second?.kind !== 'wire') return undefined;
    return [(first.point[0] + second.point[0]) / 2, (first.point[1] + second.point[1]) / 2, (first.point[2] + second.point[2]) / 2];
  }
  if (parts.length === 2 && parts[1]!.kind !== 'wire') {
    const c0 = first.centre;
    const c1 = (parts[1] as Exclude<FieldSourceSpec, { kind: 'wire' }>).centre;
    return [(c0[0] + c1[0]) / 2, (c0[1] + c1[1]) / 2, (c0[2] + c1[2]) / 2];
  }
  return first.centre;
}

/** The winding's numbers: coils and solenoids that give a conductor (turns × 2πR per coil). */
export function winding(s: SourceEvalInput): WindingPower | undefined {
  if (s.conductorM === undefined || s.currentA === undefined) return undefined;
  if (s.kind !== 'coil' && s.kind !== 'solenoid') return undefined;
  if (s.turns === undefined || s.radiusM === undefined) return undefined;
  const coils = s.kind === 'coil' && s.spacingM !== undefined ? 2 : 1;
  return windingPower({ wireLengthM: coils * loopWireLength(s.turns, s.radiusM), diameterM: s.conductorM, currentA: s.currentA });
}

function windingResult(w: WindingPower, conductorM: number): WindingResult {
  return {
    wire_length_m: w.wireLengthM,
    conductor_m: conductorM,
    resistance_ohm: w.resistanceOhm,
    current_density_A_per_m2: w.currentDensityAPerM2,
    power_W: w.powerW,
    voltage_V: w.voltageV,
    temperature_C: w.temperatureC,
    cooling: w.cooling,
  };
}

function windingProblems(s: SourceEvalInput, w: WindingPower, problems: Problem[]): void {
  if (w.cooling === 'air') return;
  const range = s.conductorRange ?? s.nameRange;
  const n = windingNumbersText({ ...w, conductorM: s.conductorM! });
  const numbers = `${n.currentDensity} in ${n.conductor} copper, ${n.power}`;
  if (w.cooling === 'water') {
    const code = 'coil-needs-cooling';
    problems.push({ code, severity: EVAL_RULES[code].severity, range, message: `${s.kind} '${s.name}' carries ${numbers}: more than air-cooled windings carry continuously (about 3 A/mm², common practice); plan water cooling or a thicker conductor.` });
  } else {
    const code = 'coil-overheats';
    problems.push({ code, severity: EVAL_RULES[code].severity, range, message: `${s.kind} '${s.name}' carries ${numbers}: beyond what even water-cooled conductors carry continuously (about 20 A/mm², common practice); use a thicker conductor, less current, or short pulses.` });
  }
}

function partResult(p: FieldSourceSpec): FieldSourcePartResult {
  switch (p.kind) {
    case 'loop':
      return { kind: 'loop', centre_m: [...p.centre], axis: [...p.axis], radius_m: p.radiusM, ampere_turns: p.ampereTurns };
    case 'solenoid':
      return { kind: 'solenoid', centre_m: [...p.centre], axis: [...p.axis], radius_m: p.radiusM, length_m: p.lengthM, ampere_turns: p.ampereTurns };
    case 'wire':
      return { kind: 'wire', point_m: [...p.point], direction: [...p.direction], current_A: p.currentA, ...(p.lengthM !== undefined ? { length_m: p.lengthM } : {}) };
    case 'slab':
      return { kind: 'slab', centre_m: [...p.centre], size_m: [...p.sizeM], magnetisation_T: [...p.magnetisationT] };
  }
}
