// Shared loader for tests/reference/beam_reference.json, written by
// scripts/reference/beam_reference.py (SciPy 1.17 quad/optimize, NumPy 2.4 leggauss and a seeded Monte-Carlo).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { BeamGeometry, SpeedDistribution } from '../../server/src/physics/beam';

export interface OvenLawRef {
  mass_u: number;
  temperature_K: number;
  mean_inverse_square: number;
  mean_speed: number;
  rms_spread: number;
  most_probable_speed: number;
  slower_fraction: [number, number][];
}
export interface JetLawRef {
  mean_speed_in: number;
  relative_spread_in: number;
  speed_ratio: number;
  stream_speed: number;
  alpha: number;
  mean_inverse_square: number;
  mean_speed: number;
  rms_spread: number;
  most_probable_speed: number;
  slower_fraction: [number, number][];
}
export interface MonteCarloRef {
  seed: number;
  samples: number;
  span_m: [number, number];
  fraction_inside: number;
  fraction_inside_se: number;
  mean_inside_m: number;
  mean_inside_se_m: number;
  quantile_levels: number[];
  quantiles_m: number[];
  quantiles_se_m: number[];
}
export interface PatternRef {
  name: string;
  geometry: BeamGeometry;
  mass_u: number;
  moment_JT: number;
  source: SpeedDistribution;
  coefficient_m3_per_s2: number;
  image_a_m: number;
  image_b_m: number;
  peak_position_m: number;
  peak_height_per_m: number;
  fwhm_m: number;
  samples: [number, number][];
  monte_carlo: MonteCarloRef;
}
export interface BeamReference {
  scipy_version: string;
  numpy_version: string;
  oven_laws: OvenLawRef[];
  jet_laws: JetLawRef[];
  gauss_legendre: Record<string, { nodes: number[]; weights: number[] }>;
  kernels: { a: number; b: number; w: number; samples: [number, number][] }[];
  patterns: PatternRef[];
}

export const beamRef = JSON.parse(
  readFileSync(join(__dirname, '..', 'reference', 'beam_reference.json'), 'utf8'),
) as BeamReference;
