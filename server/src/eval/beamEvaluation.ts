/**
 * Beam results: deflection of every sublevel, the detector pattern's peaks, a resolvability
 * verdict per neighbouring pair, and — when peaks merge — the smallest gradient that separates them.
 */
import type { GJLookup } from './gJLookup';
import {
  beamCautions,
  DEFAULT_DIP_CRITERION,
  detectorPattern,
  smallestResolvingDrift,
  smallestResolvingGradient,
  smallestResolvingMagnetLength,
  type DetectorPattern,
} from '../physics/beam';
import { BOHR_MAGNETON } from '../physics/constants';
import type { BeamModel } from '../model/types';
import { beamInputs } from './beamInput';
import { resolvingAdvice } from './resolvingAdvice';
import type { BeamResult } from './resultTypes';

/** The inverse solvers look for a resolving value up to this many times the file's value. */
const SEARCH_FACTOR = 100;

export interface BeamEvaluation {
  result: BeamResult;
  pattern?: DetectorPattern;
  /** Problems the beam engine reported, in plain words. */
  issues: { severity: 'error' | 'warning' | 'info'; code: string; message: string }[];
}

/**
 * `searchResolving` runs the inverse solvers when peaks merge (dozens of patterns); drawing or
 * exporting the pattern does not need them.
 */
export function evaluateBeam(beam: BeamModel, gJOf: GJLookup, searchResolving = true): BeamEvaluation {
  const base: BeamResult = {
    name: beam.name,
    ...(beam.species ? { species: beam.species.name } : {}),
    ...(beam.level ? { level: beam.level.name } : {}),
    ...(beam.magnet ? { magnet: beam.magnet.name } : {}),
    computed: false,
    criterion_dip_ratio: DEFAULT_DIP_CRITERION,
    sublevels: [],
    peaks: [],
    pairs: [],
    cautions: beamCautions({
      ...(beam.magnet?.fieldT ? { magnetFieldT: beam.magnet.fieldT.value } : {}),
      ...(beam.source?.value.kind === 'oven' ? { ovenTemperatureK: beam.source.value.temperatureK } : {}),
      ...(beam.species?.builtin ? { element: beam.species.builtin.element } : {}),
    }),
  };
  const inputs = beamInputs(beam, gJOf);
  if (!inputs) return { result: base, issues: [] };
  const pattern = detectorPattern(inputs.input);
  const issues = pattern.issues.map((i) => ({ ...i }));
  if (issues.some((i) => i.severity === 'error')) return { result: base, issues };

  const result: BeamResult = {
    ...base,
    computed: true,
    speeds: pattern.speed
      ? {
          mean_m_per_s: pattern.speed.meanSpeed,
          most_probable_m_per_s: pattern.speed.mostProbableSpeed,
          rms_spread_m_per_s: pattern.speed.rmsSpread,
          mean_inverse_square_s2_per_m2: pattern.speed.meanInverseSquare,
        }
      : undefined,
    sublevels: pattern.sublevels.map((s, i) => ({
      label: s.label,
      high_label: inputs.highLabels[i] ?? '',
      moment_J_per_T: inputs.input.sublevels[i]!.momentJT,
      moment_bohr: inputs.input.sublevels[i]!.momentJT / BOHR_MAGNETON,
      population: s.weight,
      mean_deflection_m: s.meanDeflectionM,
      // An unpopulated sublevel sends no atoms, so it has no peak.
      peak_m: Number.isFinite(s.peakM) ? s.peakM : null,
    })),
    peaks: pattern.peaks.map((p) => ({ position_m: p.positionM, fwhm_m: p.fwhmM, height_per_m: p.height, members: p.members })),
    pairs: pattern.pairs.map((p) => ({ left: p.left, right: p.right, dip_ratio: p.dipRatio, resolved: p.resolved })),
    all_resolved: pattern.allResolved,
    off_grid_fraction: pattern.offGridFraction,
  };
  if (pattern.detectorFraction !== undefined) result.detector_fraction = pattern.detectorFraction;
  if (searchResolving && !pattern.allResolved && pattern.peaks.length > 1) {
    const geo = inputs.input.geometry;
    const g = smallestResolvingGradient(inputs.input, { upperBound: Math.abs(geo.gradientTPerM) * SEARCH_FACTOR });
    result.resolving_gradient_T_per_m = g.value ?? null;
    const l = smallestResolvingMagnetLength(inputs.input, { upperBound: geo.magnetLengthM * SEARCH_FACTOR });
    result.resolving_magnet_length_m = l.value ?? null;
    const d = smallestResolvingDrift(inputs.input, { upperBound: Math.max(geo.driftM, geo.magnetLengthM) * SEARCH_FACTOR, lowerBound: 0 });
    result.resolving_drift_m = d.value ?? null;
    const advice = resolvingAdvice(result);
    if (advice) result.resolving_advice = advice;
  }
  return { result, pattern, issues };
}
