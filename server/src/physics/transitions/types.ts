/**
 * Public shapes of the transitions module: electric-dipole (E1) Zeeman components of an
 * optical line, magnetic-dipole (M1) RF/microwave transitions inside one level, selection
 * rules, field-insensitive points and resonance fields. Frequencies in Hz, fields in tesla,
 * angular momenta as twice their value. See docs/transitions.md.
 */
import type { Parity } from '../termSymbol';
import type { EngineIssue, HighFieldLabel, HyperfineLevelSpec, LowFieldLabel, SolveResult } from '../engine';

/** Problems come back as values with the engine's shape (severity, stable code, plain words). */
export type TransitionIssue = EngineIssue;

/** Light polarisation of a one-photon component, by q = m_upper − m_lower. */
export type Polarization = 'π' | 'σ+' | 'σ−';

/** One sublevel as it enters a transition (a snapshot of the engine state at the field). */
export interface SublevelTag {
  /** Rank by energy inside its level at this field (0 = lowest). */
  index: number;
  /** Twice the total magnetic quantum number. */
  twoM: number;
  energyHz: number;
  low: LowFieldLabel;
  high: HighFieldLabel;
}

// ------------------------------------------------------------------------------------------
// Electric-dipole lines
// ------------------------------------------------------------------------------------------

/** One Zeeman component of an E1 line. */
export interface DipoleComponent {
  lower: SublevelTag;
  upper: SublevelTag;
  polarization: Polarization;
  /** q = m_upper − m_lower (−1, 0 or +1). */
  q: -1 | 0 | 1;
  /** E_upper − E_lower relative to the zero-field, hyperfine-free line centre, Hz. */
  offsetHz: number;
  /** Line centre + offset, when both level energies were given; otherwise null. */
  absoluteHz: number | null;
  /**
   * (2J_u + 1)|<l|d_q|u>|² / |<J_l||d||J_u>|²: the components out of one upper sublevel
   * sum to 1 (its branching fractions), see docs/transitions.md.
   */
  strength: number;
  /** Relative intensity seen along the field (σ only, weight 1). */
  alongField: number;
  /** Relative intensity seen across the field (π weight 1, σ weight 1/2). */
  acrossField: number;
}

export interface EffectiveLande {
  /** ½(g_u + g_l) + ¼(g_u − g_l)[J_u(J_u+1) − J_l(J_l+1)]. */
  formula: number;
  /** From the strength-weighted centroids of the σ± components, (c₊ − c₋)/(2 μ_B B/h); null without σ components. */
  fromCentroid: number | null;
  /** Field at which the centroid was taken, T. */
  centroidFieldT: number;
}

export interface DipoleLineOptions {
  /** Level energies above a common origin (hyperfine-free), Hz; give both to get absolute frequencies. */
  lowerEnergyHz?: number;
  upperEnergyHz?: number;
  /** Term data for the selection-rule check; its issues are added to the result. */
  terms?: { lower: LineTerm; upper: LineTerm };
  /** Components weaker than this fraction of the strongest are dropped (default 1e-12). */
  dropBelow?: number;
  /**
   * Solves a level at a field (default: the engine's `solveLevel`). A caller that has already
   * solved the levels passes its solutions here; they are only read.
   */
  solve?: (spec: HyperfineLevelSpec, fieldT: number) => SolveResult;
}

export interface DipoleLineResult {
  fieldT: number;
  /** Sorted by offset, then polarisation. */
  components: DipoleComponent[];
  gEff: EffectiveLande | null;
  /** upperEnergyHz − lowerEnergyHz when both were given, else null. */
  lineCentreHz: number | null;
  /** Largest |Σ strengths − 1| over the upper sublevels (an invariant; ~1e-15 expected). */
  sumRuleDeviation: number;
  issues: TransitionIssue[];
}

/** One row of a stick spectrum, ready for plotting or export. */
export interface StickRow {
  offsetHz: number;
  strength: number;
  polarization: Polarization;
  lowerLabel: string;
  upperLabel: string;
  alongField: number;
  acrossField: number;
}

// ------------------------------------------------------------------------------------------
// Selection rules
// ------------------------------------------------------------------------------------------

/** A level as term data: 2S, L, 2J and parity (or a configuration to take the parity from). */
export interface LineTerm {
  twoS: number;
  L: number;
  twoJ: number;
  parity?: Parity;
  /** e.g. '3d6 4s 4p'; its parity is used (and compared with `parity` when both are given). */
  configuration?: string;
}

// ------------------------------------------------------------------------------------------
// Magnetic-dipole transitions inside one level
// ------------------------------------------------------------------------------------------

export type MagneticKind = Polarization | 'two-photon';

export interface MagneticTransition {
  /** The sublevel lower in energy at this field (by rank when degenerate). */
  lower: SublevelTag;
  upper: SublevelTag;
  kind: MagneticKind;
  /** m_upper − m_lower: −1, 0, +1, or ±2 for two-photon. */
  q: number;
  /** E_upper − E_lower ≥ 0, Hz. */
  frequencyHz: number;
  /** d f/dB from the Hellmann–Feynman moments, Hz/T. */
  dfdB: number;
  /** d² f/dB² from the engine curvatures, Hz/T². */
  d2fdB2: number;
  /** |<u| g_J J_q + g_I I_q |l>|² (spherical q, dimensionless, in μ_B² units); null for two-photon. */
  strength: number | null;
  /**
   * Rabi frequency Ω/2π per tesla of a linearly polarised RF field (amplitude b, H = −μ·b cos ωt):
   * b ∥ B for π, b ⊥ B for σ. Hz/T; null for two-photon (it depends on the intermediate detuning).
   */
  rabiHzPerT: number | null;
}

export interface MagneticOptions {
  /** Also list Δm = ±2 pairs between sublevels of different F (or J) as two-photon transitions. */
  twoPhoton?: boolean;
  /** One-photon transitions weaker than this fraction of the strongest are dropped (default 1e-12). */
  dropBelow?: number;
}

export interface MagneticResult {
  fieldT: number;
  /** Sorted by frequency. */
  transitions: MagneticTransition[];
  issues: TransitionIssue[];
}

/** A sublevel named by its low-field label: |F, m_F> (hyperfine) or |J, m_J(, m_I)> (fine). */
export type SublevelRef = { twoF: number; twoMF: number } | { twoJ: number; twoMJ: number; twoMI?: number | null };

export interface SublevelPair {
  lower: SublevelRef;
  upper: SublevelRef;
}

/** A field interval for root searches: scanned at `points` equally spaced fields (default 401). */
export interface FieldRange {
  fromT: number;
  toT: number;
  points?: number;
}

export interface InsensitivePoint {
  fieldT: number;
  /** E_upper − E_lower of the pair as given (may be negative if the pair is given upside down), Hz. */
  frequencyHz: number;
  /** d² f/dB² there, Hz/T². */
  d2fdB2: number;
}

export interface InsensitiveResult {
  points: InsensitivePoint[];
  issues: TransitionIssue[];
}

export interface ResonanceOptions {
  /** Only this pair (by low-field labels). */
  pair?: SublevelPair;
  twoPhoton?: boolean;
  dropBelow?: number;
}

export interface Resonance {
  fieldT: number;
  /** The transition at the resonant field (lower/upper by energy there). */
  transition: MagneticTransition;
}

export interface ResonanceResult {
  resonances: Resonance[];
  issues: TransitionIssue[];
}
