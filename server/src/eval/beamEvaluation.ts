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
import { ADIABATIC_LIMIT, fieldMapPattern, type FieldMapBeam } from '../physics/beam/trajectory';
import type { BeamModel } from '../model/types';
import { beamInputs, type UnmatchedPopulation } from './beamInput';
import { magnetFieldMap } from './magnetFieldMap';
import { resolvingAdvice } from './resolvingAdvice';
import type { BeamResult, BeamSublevelResult, ResolvingChange } from './resultTypes';
import { magnetFieldText } from './writtenUnit';

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
  /** `populations` entries that name no sublevel of the level. */
  unmatchedPopulations?: UnmatchedPopulation[];
  /** The advice searched every change up to its reach and none helps (physics/beam/resolvingOptions.ts): the findings are information. */
  nothingWithinReach?: boolean;
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
      ...(beam.magnet?.fieldT ? { magnetFieldT: beam.magnet.fieldT.value, magnetFieldText: magnetFieldText(beam.magnet.fieldT.value, beam.magnet.fieldT.uncertainty, beam.magnet.fieldT.unit) } : {}),
      ...(beam.source?.value.kind === 'oven' ? { ovenTemperatureK: beam.source.value.temperatureK } : {}),
      ...(beam.species?.builtin ? { element: beam.species.builtin.element } : {}),
    }),
  };
  const inputs = beamInputs(beam, gJOf);
  if (!inputs) return { result: base, issues: [] };
  const unmatched = inputs.unmatchedPopulations.length > 0 ? { unmatchedPopulations: inputs.unmatchedPopulations } : {};
  // A magnet built from sources: every sublevel flies through the real field (physics/beam/trajectory/).
  const map = magnetFieldMap(beam.magnet);
  let patternInput = inputs.input;
  let fieldMap: FieldMapBeam | undefined;
  if (map) {
    const mapped = fieldMapPattern({ pattern: inputs.input, field: map.field, centre: map.centre, obstacles: map.obstacles, spec: inputs.spec, labels: inputs.input.sublevels.map((s) => s.label) });
    patternInput = mapped.pattern;
    fieldMap = mapped.fieldMap;
    base.deflection_model = 'field-map';
    if (fieldMap?.issues.some((i) => i.severity === 'error')) return { result: base, issues: fieldMap.issues.map((i) => ({ ...i })), ...unmatched };
    if (fieldMap) base.field_map = fieldMapSummary(fieldMap, mapped.referenceSpeed, mapped.speeds);
  }
  const pattern = detectorPattern(patternInput);
  const issues = [...(fieldMap?.issues ?? []), ...pattern.issues].map((i) => ({ ...i }));
  if (issues.some((i) => i.severity === 'error')) return { result: base, issues, ...unmatched };

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
      ...(fieldMap ? { field_map: sublevelFlight(fieldMap, i) } : {}),
    })),
    peaks: pattern.peaks.map((p) => ({ position_m: p.positionM, fwhm_m: p.fwhmM, height_per_m: p.height, members: p.members })),
    pairs: pattern.pairs.map((p) => ({ left: p.left, right: p.right, dip_ratio: p.dipRatio, resolved: p.resolved })),
    all_resolved: pattern.allResolved,
    off_grid_fraction: pattern.offGridFraction,
  };
  if (pattern.detectorFraction !== undefined) result.detector_fraction = pattern.detectorFraction;
  if (searchResolving && !pattern.allResolved && pattern.peaks.length > 0) {
    // A field-map magnet's deflections come from its flights: only changes that leave them alone are tried.
    const found = resolvingOptions(patternInput, pattern, fieldMap ? ['slits', 'detector', 'speedSpread'] : undefined);
    const options = found.options.map((o) => ({ change: CHANGE_NAME[o.parameter], value: o.value, worst_dip_ratio: o.worstDipRatio, resolves_all: o.resolvesAll }));
    const resolving = (change: ResolvingChange): number | null => options.find((o) => o.change === change && o.resolves_all)?.value ?? null;
    if (!fieldMap) {
      result.resolving_gradient_T_per_m = resolving('gradient');
      result.resolving_magnet_length_m = resolving('magnet_length');
      result.resolving_drift_m = resolving('drift');
    }
    result.worst_dip_ratio = found.presentWorstDipRatio;
    result.resolving_options = options;
    const advice = resolvingAdvice(result, patternInput.geometry, found.reach);
    if (advice) result.resolving_advice = advice;
    if (found.nothingWithinReach) return { result, pattern, issues, ...unmatched, nothingWithinReach: true };
  }
  return { result, pattern, issues, ...unmatched };
}

/** The flights behind a field-map beam's peaks, for the JSON document and the report. */
function fieldMapSummary(m: FieldMapBeam, referenceSpeed: number | undefined, speeds: number[] | undefined): NonNullable<BeamResult['field_map']> {
  return {
    integrator: 'dormand-prince-5(4), constant forward speed, adiabatic sublevels',
    reference_speed_m_per_s: referenceSpeed ?? 0,
    speeds_m_per_s: speeds ?? [],
    flights: m.sublevels.reduce((n, s) => n + s.flights.length, 0),
    steps: m.steps,
    field_on_line_min_T: m.survey.minFieldT,
    field_on_line_max_T: m.survey.maxOnLineT,
    mean_gradient_T_per_m: m.survey.meanGradientTPerM.on,
    gradient_variation: m.survey.gradientVariation,
    // Infinity (a field through zero) would not survive JSON: say it with null. Below 1e-12 the
    // ratio is round-off of a field direction that does not turn: 0.
    worst_adiabaticity: !Number.isFinite(m.adiabaticity) ? null : m.adiabaticity < 1e-12 ? 0 : m.adiabaticity,
    adiabatic_limit: ADIABATIC_LIMIT,
    forward_energy_fraction: m.forwardEnergyFraction,
    moment_table_max_T: m.tableMaxFieldT,
    moment_table_error_J_per_T: m.tableErrorJT,
  };
}

function sublevelFlight(m: FieldMapBeam, i: number): NonNullable<BeamSublevelResult['field_map']> {
  const s = m.sublevels[i];
  const ref = s?.flights[0];
  return {
    coefficient_m3_per_s2: s?.coefficientM3PerS2 ?? 0,
    inverse_square_departure: s?.coefficientSpread ?? 0,
    exit_angle_rad: ref?.flight.exit.angleZ ?? 0,
    detector_z_m: ref?.flight.detector.zM ?? 0,
    detector_y_m: ref?.flight.detector.yM ?? 0,
  };
}
