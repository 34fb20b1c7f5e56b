/**
 * The JSON shape of a fit (`fits` in the evaluation document, and `sublevel fit --format json`).
 * Values in SI (`unit` names it); `written_unit` is the unit the file used, for display.
 */
export interface FitParameterResult {
  name: string;
  value: number;
  /** Standard uncertainty from the covariance; absent when the data do not determine it. */
  uncertainty?: number;
  start: number;
  /** SI unit of value, uncertainty and start ('' for plain numbers). */
  unit: string;
  written_unit?: string;
}

export interface FitPointResult {
  data: string;
  /** 0-based line of the setup where the point is written (the `file` line for CSV points). */
  line: number;
  /** 1-based line of the CSV file, for points read from one. */
  csv_line?: number;
  /** Field of a resonance or interval point (absent: the fitted field), or position of a profile point. */
  field_T?: number;
  position_m?: number;
  measured: number;
  /** The unit this point's value was written in, when it differs from the data's first (for display). */
  written_unit?: string;
  uncertainty?: number;
  model?: number;
  /** measured − model. */
  residual?: number;
}

export interface CalibrationRootResult {
  field_T: number;
  uncertainty_T?: number;
  df_dB_Hz_per_T: number;
}

export interface FitResult {
  name: string;
  /** spectral: resonances/intervals; profile: detector counts; calibration: one resonance → every field. */
  kind: 'spectral' | 'profile' | 'calibration';
  /** converged; not-converged (values are where it stopped); failed (no values). */
  status: 'converged' | 'not-converged' | 'failed';
  /** The unit of `measured`, `model` and `residual` ('Hz' or 'counts'). */
  measured_unit: string;
  /** The unit the data were written in, for display. */
  measured_written_unit?: string;
  /** The unit the points' fields (spectral) or detector positions (profile) were written in, for display. */
  at_written_unit?: string;
  parameters: FitParameterResult[];
  covariance?: number[][];
  correlation?: number[][];
  chi2?: number;
  /** Degrees of freedom (points − free parameters); null when the fit did not run. */
  dof: number | null;
  reduced_chi2?: number;
  /** data: from the points' own uncertainties; scatter: scaled by χ²/dof (the points carry none). */
  uncertainty_basis: 'data' | 'scatter';
  iterations: number;
  points: FitPointResult[];
  roots?: CalibrationRootResult[];
}
