/**
 * Shared shapes for the beam-deflection model. Lengths in metres, speeds in m/s,
 * masses in kg, magnetic moments in J/T, gradients in T/m (see docs/beam.md).
 */

/** Straight-line apparatus: slit 1, slit 2 at the magnet entrance, magnet, drift, detector. */
export interface BeamGeometry {
  /** Width of the first (source-side) slit. */
  slit1M: number;
  /** Width of the second slit, placed at the magnet entrance. */
  slit2M: number;
  /** Distance from slit 1 to slit 2. */
  slitSeparationM: number;
  /** Length of the gradient region. */
  magnetLengthM: number;
  /** Field-free flight from the magnet exit to the detector plane. */
  driftM: number;
  /** Width of the detector aperture (its resolution); 0 means an ideal point detector. */
  detectorWidthM: number;
  /** Transverse field gradient ∂B/∂z inside the magnet. */
  gradientTPerM: number;
  /** Optional centre of a fixed detector, measured from the undeflected beam axis. */
  detectorOffsetM?: number;
}

/**
 * Speed law of the atoms that reach the detector (flux-weighted).
 * - effusive: thin-walled oven, flux ∝ v³ exp(−Mv²/2kT).
 * - jet: flux ∝ v³ exp(−(v−u)²/α²); given by its flux-weighted mean speed and the
 *   relative rms spread σ_v/⟨v⟩ (must lie below the effusive value 0.3630).
 * - single: every atom has the same speed.
 */
export type SpeedDistribution =
  | { kind: 'effusive'; temperatureK: number }
  | { kind: 'jet'; meanSpeed: number; relativeSpread: number }
  | { kind: 'single'; speed: number };

/** One sublevel as the Zeeman engine hands it over. */
export interface BeamSublevel {
  label: string;
  /** μ = −∂E/∂B at the magnet's field, J/T. Positive μ is pushed towards +z when ∂B/∂z > 0. */
  momentJT: number;
  /** Relative population; normalised over all sublevels. */
  population: number;
}

export type BeamIssueSeverity = 'error' | 'warning' | 'info';

/** A problem reported as a value; nothing in this folder throws on user input. */
export interface BeamIssue {
  severity: BeamIssueSeverity;
  code: string;
  message: string;
}

export function beamIssue(severity: BeamIssueSeverity, code: string, message: string): BeamIssue {
  return { severity, code, message };
}

export function hasBeamError(issues: readonly BeamIssue[]): boolean {
  return issues.some((i) => i.severity === 'error');
}
