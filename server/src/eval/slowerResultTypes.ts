/** The `slowers` part of the evaluation result (docs/slower.md). SI units in the names. */

/** One sample along the slower, z from the entrance. */
export interface SlowerSample {
  z_m: number;
  B_ideal_T: number;
  /** The coils' field along the axis, when the slower names `sources`. */
  B_coils_T?: number;
  /** The speed resonant with the laser there (in the coils' field when there are coils, else the ideal), m/s. */
  resonant_speed_m_per_s: number;
  /** With coils only: the speed the ideal (designed) field is resonant with there, v0 √(1 − z/L0), m/s. */
  ideal_resonant_speed_m_per_s?: number;
  /** −v dv/dz along that resonance, m/s². */
  needed_deceleration_m_per_s2: number;
  /** The simulated atom's speed there (ideal field; the coils' field when there are coils), m/s; absent past where it stopped. */
  flight_speed_m_per_s?: number;
}

export interface SlowerFlight {
  /** Speed at the exit, m/s; 0 when the atom stops inside. */
  final_m_per_s: number;
  stopped_at_m?: number;
  time_s: number;
}

export interface SlowerResult {
  name: string;
  species?: string;
  line?: string;
  design: 'decreasing' | 'increasing' | 'spin_flip';
  /** False when something the profile needs is missing; the diagnostics say what. */
  computed: boolean;
  wavelength_m?: number;
  wavelength_m_unc?: number;
  lifetime_s?: number;
  lifetime_source?: string;
  /** Γ/2π = 1/(2πτ), Hz. */
  natural_linewidth_Hz?: number;
  mass_kg?: number;
  capture_m_per_s?: number;
  final_m_per_s?: number;
  safety: number;
  saturation: number;
  /** ħkΓ/2m, m/s². */
  a_max_m_per_s2?: number;
  /** η a_max, m/s². */
  design_deceleration_m_per_s2?: number;
  /** a_max s0/(1+s0): the most the light gives at this saturation, m/s². */
  reachable_deceleration_m_per_s2?: number;
  length_m?: number;
  /** v0²/(2 η a_max), the L0 of the √ form, m. */
  stop_length_m?: number;
  delta_B_T?: number;
  bias_T?: number;
  /** The unit the file wrote the bias in. */
  bias_unit?: string;
  entry_field_T?: number;
  exit_field_T?: number;
  zero_crossing_m?: number;
  /** Laser frequency minus the zero-field line frequency, Hz (negative: red). */
  detuning_Hz?: number;
  /** Circular polarisation relative to the atoms' direction of flight (+z). */
  polarisation?: 'sigma+' | 'sigma-';
  driven_pair?: { lower: string; upper: string; cycling: boolean; rate_Hz_per_T: number; rate_spread: number };
  samples?: SlowerSample[];
  /** One atom at the capture speed through the ideal field. */
  flight?: SlowerFlight;
  /** The check of the coils named by `sources`. */
  coils?: {
    sources: string[];
    /** Largest needed deceleration over η a_max. */
    worst_over_design: number;
    /** The largest speed resonant anywhere in the coils' field: faster atoms are not caught, m/s. */
    capture_m_per_s: number;
    /** First z where the needed deceleration passes the reachable one: atoms leave the resonance. */
    drop_at_m?: number;
    flight?: SlowerFlight;
  };
  cautions: string[];
}
