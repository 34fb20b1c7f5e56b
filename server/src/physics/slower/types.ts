/**
 * Shapes of the slower physics. SI throughout: speeds in m/s, lengths in m, fields in T,
 * frequencies in Hz (not rad/s). The atoms fly along +z from the oven; the slowing laser comes
 * the other way. B is the field component along +z: for stretched states on the laser's axis the
 * transition's Zeeman shift is linear in that signed component.
 */

/** How |B| runs along the slower. */
export type SlowerDesign = 'decreasing' | 'increasing' | 'spin_flip';

/** A problem reported as a value (never a throw); codes are listed in physics/issueCodes.ts. */
export interface SlowerIssue {
  code: string;
  severity: 'error' | 'warning' | 'info';
  message: string;
}

/** What the profile needs from the cycling transition and the atom. */
export interface SlowerTransition {
  /** Vacuum wavelength of the line, m. */
  wavelengthM: number;
  /** Radiative lifetime of the upper level, s (Γ = 1/τ). */
  lifetimeS: number;
  /** Atomic mass, kg. */
  massKg: number;
  /**
   * Zeeman shift rate of the driven pair, Hz/T: (μ_lower − μ_upper)/h for the σ+ pair of
   * stretched states. Positive for the usual J → J+1 line where g_u J_u > g_l J_l.
   */
  rateHzPerT: number;
}

export interface SlowerRequest {
  captureMPerS: number;
  finalMPerS: number;
  /** Safety factor η on a_max (0 < η ≤ 1). */
  safety: number;
  design: SlowerDesign;
  /** B_bias of B(z) = B_bias ± ΔB √(1 − z/L0), T; the design's default when absent. */
  biasT?: number;
  /** Saturation parameter s0 = I/I_sat of the slowing beam (for the simulation and the reachable deceleration). */
  saturation: number;
}

/** The ideal constant-deceleration profile and the numbers that define it. */
export interface IdealProfile {
  /** a_max = ħkΓ/2m, m/s². */
  maxDecelerationMPerS2: number;
  /** η a_max, m/s². */
  designDecelerationMPerS2: number;
  /** Length from capture to final speed: (v0² − vf²)/(2 η a_max), m. */
  lengthM: number;
  /** Length to stop from the capture speed: v0²/(2 η a_max), m (L0 of the √ form). */
  stopLengthM: number;
  /** ΔB = h v0 / (λ h·rate) = v0/(λ rate), T (> 0). */
  deltaBT: number;
  biasT: number;
  /** +1: B = B_bias + ΔB √…; −1: B = B_bias − ΔB √… (the increasing design drives σ− on the same pair). */
  sign: 1 | -1;
  /** Laser frequency minus the zero-field line frequency, Hz (negative: red of the line). */
  detuningHz: number;
  entryFieldT: number;
  exitFieldT: number;
  /** Where B(z) = 0 inside the slower, m (spin-flip designs). */
  zeroCrossingM?: number;
  /** Capture and final speed (echo). */
  captureMPerS: number;
  finalMPerS: number;
}

/** B and dB/dz along the slower axis at z (m from the entrance). */
export type AxisField = (zM: number) => { BT: number; dBdzTPerM: number };

/** One sample of a design check. */
export interface CheckSample {
  zM: number;
  idealT: number;
  fieldT: number;
  /** The speed resonant with the laser at this field, m/s. */
  resonantMPerS: number;
  /** Deceleration an atom needs to stay at that speed: −v dv/dz, m/s². */
  neededMPerS2: number;
}

export interface DesignCheck {
  samples: CheckSample[];
  /** Largest needed deceleration over the slower, over η a_max. */
  worstOverDesign: number;
  /** First z where the needed deceleration exceeds what the light can give (a_max s0/(1+s0)); absent when none. */
  dropAtM?: number;
  /** The largest resonant speed along the field: faster atoms never meet the resonance, m/s. */
  captureMPerS: number;
  /** The reachable deceleration used for `dropAtM`, m/s². */
  reachableMPerS2: number;
}

/** The 1-D motion of one atom through a field profile with the scattering force. */
export interface SimulationResult {
  /** Speed where the atom leaves the simulated stretch, m/s (0 when it stops inside). */
  finalMPerS: number;
  /** Where the atom stopped and turned back, m; absent when it got through. */
  stoppedAtM?: number;
  /** Time of flight through the stretch, s. */
  timeS: number;
  /** v(z) samples for the profile view and CSV. */
  path: { zM: number; vMPerS: number }[];
  steps: number;
}
