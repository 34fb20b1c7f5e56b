/**
 * Beam results: deflection of every sublevel, the detector pattern's peaks, a resolvability
 * verdict per neighbouring pair, and — when peaks merge — the changes computed to separate them.
 */
import type { GJLookup } from './gJLookup';
import {
  beamCautions,
  DEFAULT_DIP_CRITERION,
  detectorPattern,
  resolvingOptions,
  type AdviceParameter,
  type DetectorPattern,
} from '../physics/beam';
import { BOHR_MAGNETON } from '../physics/constants';
import type { BeamModel } from '../model/types';
import { beamInputs } from './beamInput';
import { resolvingAdvice } from './resolvingAdvice';
import type { BeamResult, ResolvingChange } from './resultTypes';

const CHANGE_NAME: Record<AdviceParameter, ResolvingChange> = {
  gradient: 'gradient',
  magnetLength: 'magnet_length',
  drift: 'drift',
  slits: 'slits',
  detector: 'detector',
  speedSpread: 'speed_spread',
};

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
    const found = resolvingOptions(inputs.input, pattern);
    const options = found.options.map((o) => ({ change: CHANGE_NAME[o.parameter], value: o.value, worst_dip_ratio: o.worstDipRatio, resolves_all: o.resolvesAll }));
    const resolving = (change: ResolvingChange): number | null => options.find((o) => o.change === change && o.resolves_all)?.value ?? null;
    result.resolving_gradient_T_per_m = resolving('gradient');
    result.resolving_magnet_length_m = resolving('magnet_length');
    result.resolving_drift_m = resolving('drift');
    result.worst_dip_ratio = found.presentWorstDipRatio;
    result.resolving_options = options;
    const advice = resolvingAdvice(result, inputs.input.geometry);
    if (advice) result.resolving_advice = advice;
  }
  return { result, pattern, issues };
}
