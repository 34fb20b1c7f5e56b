/**
 * Field sources in the evaluation result (`EvaluationResult.fieldSources`, the JSON document's
 * `fieldSources`): each coil, solenoid, wire or magnetised block with the exact parts its field is
 * summed from, its field and gradient at its centre, and its winding's numbers and cautions.
 * SI names like the rest of the document (docs/schema/evaluation.schema.json).
 */

export type FieldSourcePartResult =
  | { kind: 'loop'; centre_m: number[]; axis: number[]; radius_m: number; ampere_turns: number }
  | { kind: 'solenoid'; centre_m: number[]; axis: number[]; radius_m: number; length_m: number; ampere_turns: number }
  | { kind: 'wire'; point_m: number[]; direction: number[]; current_A: number; length_m?: number }
  | { kind: 'slab'; centre_m: number[]; size_m: number[]; magnetisation_T: number[] };

export interface WindingResult {
  /** Conductor length of all turns (both coils of a pair; a wire and its return), m. */
  wire_length_m: number;
  /** Bare diameter of the copper conductor (`conductor`), m. */
  conductor_m: number;
  resistance_ohm: number;
  current_density_A_per_m2: number;
  power_W: number;
  voltage_V: number;
  /** Copper temperature the resistance is for, °C. */
  temperature_C: number;
  /** 'air': within what air-cooled windings carry (~3 A/mm²); 'water': needs water cooling (to ~20 A/mm²); 'beyond' (common practice). */
  cooling: 'air' | 'water' | 'beyond';
}

export interface FieldSourceResult {
  name: string;
  kind: 'coil' | 'solenoid' | 'wire' | 'slab';
  /** The exact parts, empty when the block has problems that stop its field being computed. */
  parts: FieldSourcePartResult[];
  /** Where the values below are taken: the block's centre (a wire with a return: midway between the two). Absent for a lone wire. */
  centre_m?: number[];
  /** B at the centre, T, and |B|. */
  field_T?: number[];
  field_abs_T?: number;
  /** ∂B_i/∂x_j at the centre (rows i, columns j), T/m. */
  gradient_T_per_m?: number[][];
  /** The derivative of the axial field along the axis at the centre (coils and solenoids), T/m: the anti-Helmholtz number. */
  axial_gradient_T_per_m?: number;
  /** A coil with `spacing`: how the pair is wound and which number describes it. */
  pair?: { sense: 'same' | 'opposite'; spacing_m: number; spacing_over_radius: number };
  /** The unit the file writes fields in (a `field` block or a magnet), for reports; absent: by size. */
  field_unit?: string;
  /** A slab: the unit the file wrote its magnetisation in (`mT`, `A/m`), which its report line and caution echo. */
  magnetisation_unit?: string;
  /** The copper winding, when the block gives a `conductor`. */
  winding?: WindingResult;
  cautions: string[];
}
