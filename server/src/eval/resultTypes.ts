/**
 * The evaluation result. It is also the CLI's JSON document (`sublevel eval --format json`),
 * so names carry SI units (`energy_Hz`, `field_T`) and the shape is versioned:
 * docs/schema/evaluation.schema.json describes it. Bump EVALUATION_VERSION on any breaking change.
 */
import type { FitResult } from './fitResultTypes';
import type { FieldSourceResult } from './fieldSourceResultTypes';
import type { SlowerResult } from './slowerResultTypes';
import type { TrapResult } from './trapResultTypes';
import type { Problem } from '../format/ast';

export const EVALUATION_FORMAT = 'sublevel-evaluation';
/** 2: `*_unc` standard uncertainties and `uncertainty_inputs` (docs/uncertainty.md); every v1 field kept. */
export const EVALUATION_VERSION = 2;

export interface SourcedNumber {
  value: number;
  source: string;
  uncertainty?: number;
  /** The unit the file wrote the value in (`MHz` in `B = -0.221 MHz`); reports show it back in that unit. */
  written_unit?: string;
}

export interface GFactorResult {
  /** The g_J used for sublevel energies: the measured one if known, otherwise the LS (Landé) value. */
  used: number;
  /** Standard uncertainty (k = 1) of `used`, when it has an uncertain input. Every `*_unc` field below: the same, in the value's unit. */
  used_unc?: number;
  used_source: string;
  /** Landé g_J with the file's g_s choice (default CODATA |g_e|) and g_L. */
  lande: number;
  /** Landé g_J with g_s = 2 and g_L = 1, exactly, as a fraction "4/3". */
  lande_fraction: string;
  g_s: number;
  g_L: number;
  measured?: SourcedNumber;
}

export interface HyperfineLevelResult {
  F: number;
  F_text: string;
  /** Zero-field energy of the F level relative to the level's centre of gravity. */
  shift_Hz: number;
  g_F: number;
  shift_Hz_unc?: number;
  g_F_unc?: number;
}

export interface HyperfineResult {
  A_Hz: SourcedNumber;
  B_Hz?: SourcedNumber;
  C_Hz?: SourcedNumber;
  levels: HyperfineLevelResult[];
  /** Adjacent F intervals, E(F_upper) − E(F_lower), in order of F. */
  intervals: { F_lower: number; F_upper: number; interval_Hz: number; interval_Hz_unc?: number }[];
}

export interface SublevelResult {
  /** Label in the low-field basis, e.g. "F=2, m_F=+1" or "m_J=-1/2". */
  label: string;
  F?: number;
  J?: number;
  m: number;
  /** m_I of a level whose nucleus has no hyperfine coupling (labels |J, m_J, m_I>). */
  m_I?: number;
  m_text: string;
  /** Energy relative to the level's centre of gravity, E/h. */
  energy_Hz: number;
}

/** One eigenstate of the level at the field, from exact diagonalisation. */
export interface ExactSublevelResult {
  /** Adiabatic low-field label, e.g. "|F=2, m_F=+1>". */
  low_label: string;
  /** Adiabatic high-field label, e.g. "|m_J=+1/2, m_I=+1/2>". */
  high_label: string;
  /** F (or J) of the low-field label. */
  F?: number;
  J?: number;
  /** Total magnetic quantum number (the only good one at every field). */
  m: number;
  /** m_I of a level whose nucleus has no hyperfine coupling (then m_J and m_I are both good). */
  m_I?: number;
  m_text: string;
  energy_Hz: number;
  /** μ = −∂E/∂B (Hellmann–Feynman), J/T. */
  moment_J_per_T: number;
  moment_bohr: number;
  energy_Hz_unc?: number;
  moment_J_per_T_unc?: number;
  moment_bohr_unc?: number;
  /** ∂²(E/h)/∂B², Hz/T². */
  d2E_dB2_Hz_per_T2: number;
  /** The weak-field (linear) energy of the state with the same low-field label, for comparison. */
  linear_energy_Hz?: number;
}

export interface RegimeResultJson {
  /** Zeeman energy over zero-field structure (see docs/engine.md); null when the level has no zero-field structure. */
  x: number | null;
  verdict: string;
  /** Field above which the linear formula misses some sublevel by more than `fraction` of the Zeeman spread. */
  linear_limit_T: number | null;
  /** Field above which the strong-field formula is within `fraction` of the zero-field spread. */
  strong_limit_T: number | null;
  fraction: number;
}

export interface FieldPointResult {
  /** The field block or magnet this field comes from. */
  source: { kind: 'field' | 'magnet'; name: string };
  field_T: number;
  field_T_unc?: number;
  /** Weak-field (linear) energies: zero-field hyperfine shift + g m μ_B B. */
  linear: SublevelResult[];
  /** Exact energies at this field, sorted by energy. */
  exact: ExactSublevelResult[];
  regime?: RegimeResultJson;
}

export interface LevelResult {
  species: string;
  level: string;
  designation: { text: string; ascii: string; unicode: string; configuration: string | null; parity: 'even' | 'odd' | null };
  S: number;
  L: number;
  J: number;
  J_text: string;
  /** J values allowed by L and S, as text. */
  allowed_J: string[];
  I: number;
  g_I: SourcedNumber;
  g_J: GFactorResult;
  hyperfine?: HyperfineResult;
  sublevel_count: number;
  energy_Hz?: SourcedNumber;
  at_fields: FieldPointResult[];
}

/** A whole LS term with its fine structure (a level written without J, with zeta). */
export interface TermResult {
  species: string;
  level: string;
  designation: { text: string; unicode: string; configuration: string | null };
  S: number;
  L: number;
  /** Absent when the file gives the J-level energies E_J instead. */
  zeta_Hz?: SourcedNumber;
  g_s: number;
  g_L: number;
  /** J levels at zero field (E_J = ζ/2 [J(J+1) − L(L+1) − S(S+1)], or the given E_J), relative to the term's centre of gravity. */
  fine_levels: { J: number; J_text: string; shift_Hz: number; shift_Hz_unc?: number; g_J: number }[];
  /** The term's hyperfine structure, when A_J / B_J are given (whole-term engine mode). */
  hyperfine?: TermHyperfineResult;
  /** The diamagnetic term, when `r2` is given: ⟨r²⟩ (m²) and e²⟨r²⟩/(8mₑh) (Hz/T², times ⟨sin²θ⟩_{m_L} B²). */
  diamagnetic?: { r2_m2: number; Hz_per_T2: number };
  at_fields: { source: { kind: 'field' | 'magnet'; name: string }; field_T: number; field_T_unc?: number; exact: ExactSublevelResult[]; regime?: RegimeResultJson }[];
}

/** Radial parameters of a whole term's hyperfine Hamiltonian and the J-level constants they give (docs/engine.md). */
export interface TermHyperfineResult {
  /** 'level-constants' (solved exactly or by least squares) or 'level-constants, a_L = a_SD' (the stated assumption). */
  source: string;
  a_orbital_Hz: number;
  a_spin_dipolar_Hz: number;
  a_contact_Hz: number;
  b_orbital_Hz: number;
  levels: { J: number; J_text: string; A_Hz: number; B_Hz: number }[];
}

export interface SpeciesResult {
  name: string;
  builtin: boolean;
  mass_kg?: SourcedNumber;
  I: number;
  g_I: SourcedNumber;
  levels: string[];
  /** The file that declares it, when it comes through `use` (relative to the evaluated file). */
  defined_in?: string;
  /**
   * Set only when the species' levels, lines and resonances are evaluated at some of the file's
   * working fields, not all: the ones they are evaluated at, in order (docs/format.md).
   */
  evaluated_at?: { kind: 'field' | 'magnet'; name: string }[];
}

export interface MagnetResult {
  name: string;
  /**
   * The beams that fly through it and the species each carries (its level's species): the
   * species it acts on (docs/format.md). Absent: no beam does, and it acts on every species.
   */
  beams?: { name: string; species: string }[];
  field_T?: number;
  gradient_T_per_m?: number;
  length_m?: number;
  field_T_unc?: number;
  gradient_T_per_m_unc?: number;
  length_m_unc?: number;
  /** The units the file wrote the settings in (reports show them back in these units). */
  field_unit?: string;
  gradient_unit?: string;
  length_unit?: string;
  /** A magnet built from sources: their names; field_T and gradient_T_per_m are then |B| and ∂|B|/∂z at `at_m` (docs/beam.md §7). */
  sources?: string[];
  /** Where the beam line (along +x) passes the magnet's centre, m. */
  at_m?: [number, number, number];
}

export interface BeamSublevelResult {
  /** Low-field label of the state at the magnet's field. */
  label: string;
  high_label: string;
  /** μ = −∂E/∂B at the magnet's field (exact), J/T. */
  moment_J_per_T: number;
  moment_J_per_T_unc?: number;
  moment_bohr: number;
  moment_bohr_unc?: number;
  /** Population, normalised over the sublevels. */
  population: number;
  /** Flux-averaged deflection at the detector, m (positive along +z for a positive moment and gradient). */
  mean_deflection_m: number;
  mean_deflection_m_unc?: number;
  /** Maximum of this sublevel's own profile; null when it has no atoms (population 0). */
  peak_m: number | null;
  peak_m_unc?: number;
  /** A magnet built from sources: this sublevel's flight at the reference speed (docs/beam.md). */
  field_map?: {
    /** k in z = k/v² at the reference speed (z at the detector × v²), m³/s². */
    coefficient_m3_per_s2: number;
    /** Largest |k(v)/k(v_ref) − 1| at the slow and fast ends of the speed law. */
    inverse_square_departure: number;
    /** dz/dx at the magnet exit, rad. */
    exit_angle_rad: number;
    /** Position at the detector plane from the beam line, m (z: the deflection axis; y: sideways). */
    detector_z_m: number;
    detector_y_m: number;
  };
}

export type ResolvingChange = 'gradient' | 'magnet_length' | 'drift' | 'slits' | 'detector' | 'speed_spread';

export interface BeamResult {
  name: string;
  species?: string;
  level?: string;
  magnet?: string;
  /** False when the beam lacks something it needs; the diagnostics say what. */
  computed: boolean;
  speeds?: { mean_m_per_s: number; most_probable_m_per_s: number; rms_spread_m_per_s: number; mean_inverse_square_s2_per_m2: number };
  sublevels: BeamSublevelResult[];
  peaks: { position_m: number; position_m_unc?: number; fwhm_m: number | null; height_per_m: number; members: string[] }[];
  /** Neighbouring peaks: resolved when the minimum between them is at most `criterion_dip_ratio` of the smaller peak. */
  pairs: { left: number; right: number; dip_ratio: number; resolved: boolean }[];
  criterion_dip_ratio: number;
  /**
   * Every pair passes. One peak: false when its sublevels deflect differently (merged), true when
   * they deflect alike or one sublevel has atoms (nothing to resolve; physics/beam/deflectAlike.ts).
   */
  all_resolved?: boolean;
  /** Smallest gradient that resolves every pair (null: none within the search's reach, physics/beam/resolvingOptions.ts); only when unresolved. */
  resolving_gradient_T_per_m?: number | null;
  /** Smallest magnet length (same gradient) that resolves every pair; null: none within the search's reach. */
  resolving_magnet_length_m?: number | null;
  /** Smallest drift that resolves every pair; null: none within the search's reach. */
  resolving_drift_m?: number | null;
  /** Worst dip ratio of the setup as it is (only when unresolved; 1 for one merged peak: no dip). */
  worst_dip_ratio?: number;
  /**
   * Changes computed to deepen the worst dip, each with the dip it gives (only those that improve it).
   * `value`: T/m for the gradient, m for magnet length and drift, the factor on both slit widths or
   * the detector width, the relative rms spread of a velocity-selected source at the same mean speed.
   */
  resolving_options?: { change: ResolvingChange; value: number; worst_dip_ratio: number; resolves_all: boolean }[];
  /** What would resolve the merged peaks, in words: the same sentence as the beam-unresolved (or beam-one-peak) diagnostic. */
  resolving_advice?: string;
  /** Fraction of the atoms entering a detector placed at the file's offset (`detector = w at x`). */
  detector_fraction?: number;
  /** Flux fraction that falls outside the computed pattern (slow tail). */
  off_grid_fraction?: number;
  /** 'field-map' when the magnet is built from sources and the peaks come from integrated flights; absent: the uniform-gradient model. */
  deflection_model?: 'field-map';
  /** How the field-map flights were made (only with deflection_model 'field-map'). */
  field_map?: {
    integrator: string;
    /** v_ref = ⟨1/v²⟩^(−1/2), m/s; the peaks use each sublevel's k at this speed. */
    reference_speed_m_per_s: number;
    /** Every speed flown (the reference first, then the 5 % and 95 % flux points), m/s. */
    speeds_m_per_s: number[];
    flights: number;
    steps: number;
    /** |B| along the beam line through the magnet, T. */
    field_on_line_min_T: number;
    field_on_line_max_T: number;
    /** ∂|B|/∂z averaged along the magnet's length of the beam line (centred on its `at`), T/m; the magnet's gradient_T_per_m is the value at that centre only. */
    mean_gradient_T_per_m: number;
    /** Largest relative change of that average at ± the beam's half height. */
    gradient_variation: number;
    /** Largest (field-direction turning rate)/(Larmor angular frequency) met; null: the field passes through zero. */
    worst_adiabaticity: number | null;
    adiabatic_limit: number;
    /** Largest span of a sublevel's energy along its path over ½Mv² (the constant-forward-speed approximation). */
    forward_energy_fraction: number;
    /** Field range of the tabulated sublevel moments, T, and the table's largest moment error at its interval midpoints, J/T. */
    moment_table_max_T: number;
    moment_table_error_J_per_T: number;
  };
  cautions: string[];
}

export interface LineComponentResult {
  /** E_upper − E_lower relative to the zero-field, hyperfine-free line centre, Hz. */
  offset_Hz: number;
  offset_Hz_unc?: number;
  /** Absolute frequency, when both levels' energies are known. */
  absolute_Hz?: number;
  absolute_Hz_unc?: number;
  /** Branching fraction of the upper sublevel into this lower sublevel (they sum to 1 per upper sublevel). */
  strength: number;
  /** π: Δm = 0; σ+: m_upper = m_lower + 1; σ−: m_upper = m_lower − 1. */
  polarization: 'pi' | 'sigma+' | 'sigma-';
  lower_label: string;
  upper_label: string;
  /** Relative intensity seen along the field (σ only). */
  along_field: number;
  /** Relative intensity seen across the field (π 1, σ 1/2). */
  across_field: number;
  /** Lines with a whole term: the uncoupled (high-field) labels |m_L, m_S, m_I> or |m_J, m_I> of both ends. */
  lower_high_label?: string;
  upper_high_label?: string;
}

/** A synthesized spectrum of a line at one field (docs/spectra.md); the samples are in the CSV export. */
export interface SpectrumResult {
  direction: 'along' | 'across';
  light: 'all' | 'pi' | 'sigma' | 'sigma+' | 'sigma-';
  /** Radiative lifetime of the upper level, s, and where it comes from. */
  lifetime_s?: number;
  lifetime_source?: string;
  /** Natural FWHM Γ/2π = 1/(2πτ), Hz. */
  natural_fwhm_Hz?: number;
  temperature_K?: number;
  /** Or the beam whose transverse speed spread gives the Doppler width, and that rms speed, m/s. */
  beam?: string;
  transverse_rms_speed_m_per_s?: number;
  /** Doppler FWHM ν₀/c √(8 ln2 k_B T/m), Hz. */
  doppler_fwhm_Hz?: number;
  instrument_fwhm_Hz?: number;
  /** The Voigt profile used: Lorentzian half width γ and Gaussian standard deviation σ, Hz. */
  gamma_Hz: number;
  sigma_Hz: number;
  /** FWHM of that profile (Olivero–Longbothum approximation, 2e-4), Hz. */
  voigt_fwhm_Hz: number;
  /** The window on the offset axis of the components, Hz, and its number of samples. */
  window_Hz: [number, number];
  points: number;
  /** Observed weight of each component (strength × angular factor; 0 when not seen), in the order of `components`. */
  weights: number[];
  /** The highest sample: its offset (Hz) and height (per Hz of a unit-strength component). */
  peak_offset_Hz: number;
  peak_per_Hz: number;
}

export interface LineResult {
  name: string;
  species?: string;
  lower?: string;
  upper?: string;
  /** ½(g_u + g_l) + ¼(g_u − g_l)[J_u(J_u+1) − J_l(J_l+1)]. */
  g_eff?: number;
  /** The file writes the upper level first (an emission line); `lower`/`upper` are the levels by energy. */
  written_as_emission?: boolean;
  /** Upper minus lower level energy (always > 0), when both are known and differ. */
  line_centre_Hz?: number;
  line_centre_Hz_unc?: number;
  /**
   * 'L' for a line with a whole term at one end or both: strengths are (2L_u+1)|<l|d_q|u>|²/|<L_u||d||L_l>|²
   * (out of each upper sublevel they sum to 1 when the lower end is a whole term). Absent: per J, as above.
   */
  strengths_reduced_in?: 'L';
  /** Components at each working field (at zero field when the file has none); `g_eff_centroid` from the σ± centroids (lines with a whole term). */
  at_fields: { source: { kind: 'field' | 'magnet'; name: string }; field_T: number; field_T_unc?: number; g_eff_centroid?: number; components: LineComponentResult[]; spectrum?: SpectrumResult }[];
}

export interface MagneticTransitionResult {
  lower_label: string;
  upper_label: string;
  /** pi: Δm = 0; sigma±: Δm = ±1 (RF field perpendicular to B); two-photon: Δm = ±2. */
  kind: 'pi' | 'sigma+' | 'sigma-' | 'two-photon';
  frequency_Hz: number;
  df_dB_Hz_per_T: number;
  frequency_Hz_unc?: number;
  df_dB_Hz_per_T_unc?: number;
  d2f_dB2_Hz_per_T2: number;
  /** |<u| g_J J_q + g_I I_q |l>|²; null for two-photon transitions. */
  strength: number | null;
  /** Rabi frequency per tesla of RF amplitude; null for two-photon transitions. */
  rabi_Hz_per_T: number | null;
}

export interface ResonanceResult {
  name: string;
  species?: string;
  level?: string;
  /** The field range searched for resonances and field-insensitive points. */
  range_T: [number, number];
  /** The units the file wrote the range in. */
  range_units?: [string, string];
  at_fields: { source: { kind: 'field' | 'magnet'; name: string }; field_T: number; field_T_unc?: number; transitions: MagneticTransitionResult[] }[];
  /** Fields where df/dB = 0 for the chosen pair. */
  field_insensitive?: { field_T: number; field_T_unc?: number; frequency_Hz: number; frequency_Hz_unc?: number; d2f_dB2_Hz_per_T2: number }[];
  /** Fields where a transition (of the chosen pair, if any) is at the given frequency. */
  resonances?: { field_T: number; field_T_unc?: number; transition: MagneticTransitionResult }[];
}

export type { FitResult } from './fitResultTypes';
export type { FieldSourceResult, FieldSourcePartResult, WindingResult } from './fieldSourceResultTypes';
export type { SlowerResult, SlowerSample, SlowerFlight } from './slowerResultTypes';

export interface DiagnosticResult {
  code: string;
  severity: Problem['severity'];
  message: string;
  /** 1-based line and column, as editors show them. */
  line: number;
  column: number;
  end_line: number;
  end_column: number;
}

export interface EvaluationResult {
  format: typeof EVALUATION_FORMAT;
  version: typeof EVALUATION_VERSION;
  constants: string;
  conventions: { energy: string; g_I: string; energy_zero: string };
  settings: { g_s: 'exact' | 2; reduced_mass: boolean };
  species: SpeciesResult[];
  levels: LevelResult[];
  terms: TermResult[];
  /** `field_unit`: the unit the file wrote the field in (reports show it back in that unit). */
  /** `species`: the species the field acts on, when its block lists them (otherwise every species). */
  fields: { name: string; field_T?: number; field_T_unc?: number; field_unit?: string; species?: string[] }[];
  magnets: MagnetResult[];
  beams: BeamResult[];
  lines: LineResult[];
  resonances: ResonanceResult[];
  /** The `fit` blocks' results (docs/fit.md); absent when the file has none. */
  fits?: FitResult[];
  /** The field sources (`coil`, `solenoid`, `wire`, `slab`; docs/fields.md); absent when the file has none. */
  fieldSources?: FieldSourceResult[];
  /** The `slower` blocks' results (docs/slower.md); absent when the file has none. */
  slowers?: SlowerResult[];
  /** The `trap` blocks' summaries (docs/traps.md); absent when the file has none. */
  traps?: TrapResult[];
  diagnostics: DiagnosticResult[];
  /** The independent uncertain inputs (standard uncertainties `u`, k = 1); absent when there are none. */
  uncertainty_inputs?: { id: string; label: string; value: number; u: number }[];
}
