/** The `traps` part of the evaluation result (docs/traps.md; JSON schema $defs/trap). SI units in the keys. */

export interface TrapSublevelResult {
  /** Low-field label, e.g. "F=2, m_F=+2". */
  label: string;
  /** Twice the total m. */
  two_m: number;
  low_field_seeking: boolean;
  trapped: boolean;
  /** The engine's moment −dE/dB at the field of the minimum (negative for a low-field seeker), J/T. */
  moment_J_per_T: number;
  levitation_T_per_m?: number;
  turning_field_T?: number;
  minimum_m?: [number, number, number];
  field_at_minimum_T?: number;
  sag_m?: number;
  depth_J?: number;
  depth_K?: number;
  depth_Hz?: number;
  depth_limit?: 'edge' | 'turning';
  shape?: 'harmonic' | 'linear';
  /** Harmonic: frequencies ascending, with their axes (unit vectors). */
  frequencies_Hz?: [number, number, number];
  /** Linear: the |B| gradients along the field's principal axes, strongest first. */
  gradients_T_per_m?: [number, number, number];
  axes?: [[number, number, number], [number, number, number], [number, number, number]];
  cloud_sizes_m?: [number, number, number];
  larmor_Hz?: number;
  rf_cut?: { field_T: number; frequency_Hz: number; linear_Hz: number; to: string };
  majorana?: { rate_per_s: number; gradient_T_per_m: number; source: string };
}

export interface TrapResult {
  name: string;
  species?: string;
  level?: string;
  sources: string[];
  /** False when the trap lacks its sources, its level, or a usable region (the diagnostics say why). */
  computed: boolean;
  /** Unit vector along gravity, or "off". */
  gravity: [number, number, number] | 'off';
  /** `unit`: the length unit the file wrote the region (else its centre) in; the report reads both in it. */
  region?: { centre_m: [number, number, number]; radius_m: number; from: 'file' | 'sources'; unit?: string };
  temperature_K?: number;
  temperature_unit?: string;
  cut_J?: number;
  cut_unit?: string;
  /** The unit the file writes fields in elsewhere (its first field or magnet with a unit), for reports. */
  field_unit?: string;
  field_centre_m?: [number, number, number];
  field_at_centre_T?: number;
  field_max_T?: number;
  gravity_gradient_T_per_m?: number;
  sublevels: TrapSublevelResult[];
  cautions: string[];
}
