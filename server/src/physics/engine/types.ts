/**
 * Public shapes of the any-field Zeeman engine. Angular momenta that may be
 * half-integers are carried as exact integers equal to twice the value.
 * Energies are E/h in Hz, fields in tesla, moments in J/T.
 */

/** One hyperfine level |J, I>: dipole A, optional quadrupole B and octupole C (all in Hz). */
export interface HyperfineLevelSpec {
  kind: 'hyperfine';
  twoJ: number;
  twoI: number;
  /** Electronic g-factor, Zeeman term +μ_B B g_J J_z. */
  gJ: number;
  /** Nuclear g-factor in units of μ_B, same sign convention (+μ_B B g_I I_z); negative for 87Rb. */
  gI: number;
  A: number;
  B?: number;
  C?: number;
}

/** One LS term ^(2S+1)L whose fine structure ζ L·S is part of the problem (ζ in Hz). */
export interface FineTermSpec {
  kind: 'fine';
  twoS: number;
  /** Orbital angular momentum L (an integer, not doubled). */
  L: number;
  zeta: number;
  gL: number;
  gS: number;
  /** Optional nuclear spin: adds g_I I_z to the Zeeman term, without hyperfine coupling. */
  twoI?: number;
  gI?: number;
}

/**
 * A whole LS term with its nucleus: fine structure, magnetic-dipole hyperfine coupling inside
 * and between its J levels, the orbital quadrupole, and the Zeeman term (docs/engine.md).
 * Fine structure: `zeta` (ζ L·S) or `levelEnergies` (every J level, Hz, any common origin).
 * Hyperfine: `radial` parameters, or the J-level constants `levelA` / `levelB` (Hz).
 */
export interface WholeTermSpec {
  kind: 'term';
  twoS: number;
  L: number;
  twoI: number;
  gL: number;
  gS: number;
  gI: number;
  zeta?: number;
  levelEnergies?: { twoJ: number; energyHz: number }[];
  radial?: { orbital: number; spinDipolar: number; contact: number; quadrupole?: number };
  levelA?: { twoJ: number; A: number }[];
  levelB?: { twoJ: number; B: number }[];
  /** ⟨r²⟩ of the valence electron, m²: adds the diamagnetic term (diamagnetic.ts). Off when absent. */
  r2M2?: number;
}

export type LevelSpec = HyperfineLevelSpec | FineTermSpec | WholeTermSpec;

export type IssueSeverity = 'error' | 'warning' | 'info';

/** A problem reported as a value (the engine never throws on user input). */
export interface EngineIssue {
  severity: IssueSeverity;
  code: string;
  message: string;
}

/** Low-field label of a hyperfine sublevel: |F, m_F>. */
export interface CoupledFLabel {
  scheme: 'F';
  twoF: number;
  twoMF: number;
  text: string;
  /** The J level of a whole term the state belongs to at low field (|J, F, m_F>). */
  twoJ?: number;
}

/** Low-field label of a fine-structure sublevel: |J, m_J> (and m_I when a nucleus is given). */
export interface CoupledJLabel {
  scheme: 'J';
  twoJ: number;
  twoMJ: number;
  twoMI: number | null;
  text: string;
}

/** High-field (uncoupled) label of a hyperfine sublevel: |m_J, m_I>. */
export interface UncoupledJILabel {
  scheme: 'mJ,mI';
  twoMJ: number;
  twoMI: number;
  text: string;
}

/** High-field (uncoupled) label of a fine-structure sublevel: |m_L, m_S(, m_I)>. */
export interface UncoupledLSLabel {
  scheme: 'mL,mS';
  twoML: number;
  twoMS: number;
  twoMI: number | null;
  text: string;
}

export type LowFieldLabel = CoupledFLabel | CoupledJLabel;
export type HighFieldLabel = UncoupledJILabel | UncoupledLSLabel;

/** One eigenstate of the level at one field. */
export interface SublevelState {
  /** Position in the list sorted by signed energy (0 = lowest). */
  index: number;
  /** Twice the total magnetic quantum number (m_F, or m_J + m_I). */
  twoM: number;
  energyHz: number;
  /** μ = −∂E/∂B from Hellmann–Feynman, J/T. */
  momentJT: number;
  /** The same moment in Bohr magnetons. */
  momentBohr: number;
  /** ∂²(E/h)/∂B² from second-order perturbation within the block, Hz/T². */
  d2EdB2: number;
  low: LowFieldLabel;
  high: HighFieldLabel;
  /** Coefficients on `basis` (the uncoupled states of this state's block); largest component made positive. */
  vector: Float64Array;
  basis: readonly HighFieldLabel[];
}

export interface SolveResult {
  states: SublevelState[];
  issues: EngineIssue[];
}

/** One sublevel followed through a sweep. */
export interface SweptState {
  twoM: number;
  low: LowFieldLabel;
  high: HighFieldLabel;
  energyHz: Float64Array;
  momentJT: Float64Array;
  /** Present only when the sweep was asked for curvature. */
  d2EdB2?: Float64Array;
}

/** Two sublevels of different blocks that become degenerate inside the sweep. */
export interface LevelCrossing {
  /** Indices into `SweepResult.states`. */
  stateA: number;
  stateB: number;
  fieldT: number;
  energyHz: number;
}

export interface SweepOptions {
  /** Find crossings between sublevels of different blocks (default true). */
  crossings?: boolean;
  /** Also return ∂²E/∂B² per point (default false). */
  curvature?: boolean;
  /**
   * 'series' (default): exact solves at anchor fields and their perturbation series
   * between them, checked against the next exact solve; 'per-field': an exact solve at
   * every field. Both give the same numbers to round-off (docs/engine.md).
   */
  method?: 'series' | 'per-field';
  /** Called after each m block with the states swept so far and the level's total (progress of long sweeps). */
  onProgress?: (statesDone: number, statesTotal: number) => void;
}

export interface SweepResult {
  fieldsT: Float64Array;
  states: SweptState[];
  crossings: LevelCrossing[];
  issues: EngineIssue[];
}

export type RegimeVerdict =
  | 'weak field (linear)'
  | 'intermediate'
  | 'strong field (Paschen–Back / decoupled)';

export interface RegimeResult {
  /** Zeeman-to-zero-field-structure ratio, see docs/engine.md. */
  x: number;
  verdict: RegimeVerdict;
  /** Lowest field at which the linear (low-field) formula misses by more than `fraction` (see docs). */
  linearLimitT: number;
  /** Field above which the strong-field (Paschen–Back) formula is within `fraction` (see docs). */
  strongLimitT: number;
  /** Zero-field spread of the level's structure (hyperfine or fine), Hz. */
  zeroFieldSpreadHz: number;
  fraction: number;
  issues: EngineIssue[];
}
