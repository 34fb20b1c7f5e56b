/**
 * Runs the `fit` blocks: sets up the model on the exact engine (resonances and intervals of one
 * level, or a beam's detector profile), fits by weighted least squares and turns the outcome
 * and its diagnostics into the JSON shape and problems at the right places. A one-point fit of
 * the field alone is a calibration: every field in the range is listed. Never throws.
 */
import type { Problem, Range } from '../format/ast';
import type { DataModel, FitRequestModel, SpectralDatum } from '../model/fitTypes';
import { solveLevel, type HyperfineLevelSpec } from '../physics/engine';
import {
  calibrateField,
  fitCurve,
  isSizeParameter,
  pairExists,
  profileModel,
  spectralModel,
  type FitOutcome,
  type ProfileParameter,
  type ProfileSetup,
  type SpectralParameter,
  type SpectralPoint,
} from '../physics/fit';
import { beamInputs } from './beamInput';
import { EVAL_RULES } from './evalCodes';
import { fittedText } from './fitText';
import { listWords } from '../physics/listWords';
import type { FitParameterResult, FitPointResult, FitResult } from './fitResultTypes';
import type { GJLookup } from './gJLookup';
import { hyperfineSpec } from './levelSpec';
import { sourceFlights } from './sourceFlights';

type Report = (code: keyof typeof EVAL_RULES, message: string, range: Range, severity?: Problem['severity']) => void;

const SI_UNIT: Record<string, string> = { source_scale: '', field: 'T', g_J: '', A: 'Hz', B: 'Hz', gradient: 'T/m', temperature: 'K', offset: 'm', width: 'm', background: 'counts', amplitude: 'counts·m' };

export function evaluateFit(f: FitRequestModel, gJOf: GJLookup, problems: Problem[]): FitResult {
  const report: Report = (code, message, range, severity) =>
    problems.push({ code, severity: severity ?? EVAL_RULES[code].severity, message: `fit '${f.name}': ${message}`, range });
  const failed = (kind: FitResult['kind'], unit: string): FitResult => ({
    name: f.name,
    kind,
    status: 'failed',
    measured_unit: unit,
    parameters: [],
    dof: null,
    uncertainty_basis: 'data',
    iterations: 0,
    points: [],
  });
  if (f.data.length === 0 || f.free.length === 0) return failed('spectral', 'Hz');
  if (f.data.some((d) => d.kind === 'profile')) return f.data.every((d) => d.kind === 'profile') ? fitProfile(f, gJOf, report, failed) : failed('profile', 'counts');
  return fitSpectral(f, gJOf, report, failed);
}

// ---- resonances and intervals ------------------------------------------------------------

interface SpectralRow {
  data: DataModel;
  datum: SpectralDatum;
  point: SpectralPoint;
}

function fitSpectral(f: FitRequestModel, gJOf: GJLookup, report: Report, failed: (k: FitResult['kind'], u: string) => FitResult): FitResult {
  const out = failed('spectral', 'Hz');
  const level = f.data[0]!.level;
  if (!level || f.data.some((d) => d.level !== level || !d.lower || !d.upper)) {
    if (f.data.some((d) => d.level && d.level !== level)) report('fit-not-possible', 'every data block of one fit must belong to one level', f.nameRange);
    return out;
  }
  const gJ = gJOf(level);
  const spec = gJ !== undefined && level.kind === 'level' ? hyperfineSpec(level, gJ) : undefined;
  if (!spec) {
    report('fit-not-possible', `level ${level.name} cannot be fitted (a whole term written without J, or a level that is not computed)`, f.nameRange);
    return out;
  }
  const rows: SpectralRow[] = [];
  for (const d of f.data) {
    const point = { lower: { twoF: d.lower!.twoF, twoMF: d.lower!.twoM }, upper: { twoF: d.upper!.twoF, twoMF: d.upper!.twoM } };
    if (d.lower!.twoF === d.upper!.twoF && d.lower!.twoM === d.upper!.twoM) {
      report('fit-pair-not-found', `lower and upper name one sublevel, F = ${half(d.lower!.twoF)}, m = ${half(d.lower!.twoM)}: a resonance or interval joins two different sublevels`, d.upper!.range);
      return out;
    }
    if (!pairExists(spec, point)) {
      report('fit-pair-not-found', `level ${level.name} has no sublevel pair F = ${half(d.lower!.twoF)}, m = ${half(d.lower!.twoM)} and F = ${half(d.upper!.twoF)}, m = ${half(d.upper!.twoM)}`, d.lower!.range);
      return out;
    }
    if (d.kind === 'resonance' && Math.abs(d.lower!.twoM - d.upper!.twoM) > 4) {
      report('fit-pair-not-found', `m changes by more than 2 between these sublevels: no magnetic-dipole or two-photon resonance joins them (write kind = interval for a measured level interval)`, d.lower!.range);
      return out;
    }
    for (const datum of d.spectral) rows.push({ data: d, datum, point: { ...point, ...(datum.fieldT !== undefined ? { fieldT: datum.fieldT } : {}) } });
  }
  const free = f.free.map((p) => p.name as SpectralParameter);
  const withoutField = rows.filter((r) => r.datum.fieldT === undefined);
  if (withoutField.length > 0 && !free.includes('field')) {
    report('fit-not-possible', 'a point has no field: write `at <field>` on it, or free the field', withoutField[0]!.datum.range);
    return out;
  }
  const freeField = f.free.find((p) => p.name === 'field');
  if (freeField && rows.length > 0 && withoutField.length === 0) {
    // Else the fit ran and said only that a combination of parameters has no effect.
    report('fit-not-possible', 'every point gives its own field (`at <field>`), so the free field acts on none of them: free other parameters, or leave `at` off the points taken at the unknown field', freeField.range);
    return out;
  }
  const withSigma = rows.filter((r) => r.datum.uncertaintyHz !== undefined).length;
  if (withSigma > 0 && withSigma < rows.length) {
    const first = rows.find((r) => r.datum.uncertaintyHz === undefined)!;
    report('fit-not-possible', 'some points have an uncertainty and some do not; give every point one (e.g. 6834.678(5) MHz) or none', first.datum.range);
    return out;
  }
  const startOf = (name: string): number | undefined => f.starts.find((s) => s.name === name)?.value;
  const startSpec: HyperfineLevelSpec = { ...spec, gJ: startOf('g_J') ?? spec.gJ, A: startOf('A') ?? spec.A, ...(startOf('B') !== undefined ? { B: startOf('B')! } : {}) };
  const unit = f.data[0]!.units.frequency;
  out.measured_written_unit = unit;
  const calibration = free.length === 1 && free[0] === 'field' && rows.length === 1 && withoutField.length === 1;
  if (calibration) return calibrate(f, startSpec, rows[0]!, report, out);

  let fieldStart = startOf('field');
  if (fieldStart === undefined && withoutField.length > 0) {
    // The first field where the first such point is resonant is a good start.
    const r0 = withoutField[0]!;
    fieldStart = calibrateField(startSpec, r0.point, r0.datum.frequencyHz, undefined, f.rangeT).roots[0]?.fieldT ?? 1e-4;
  }
  const model = spectralModel(startSpec, rows.map((r) => r.point), free, fieldStart ?? 0);
  const outcome = fitCurve({
    names: free,
    start: model.start,
    scale: model.scale,
    y: Float64Array.from(rows, (r) => r.datum.frequencyHz),
    ...(withSigma > 0 ? { sigma: Float64Array.from(rows, (r) => r.datum.uncertaintyHz!) } : {}),
    model: model.model,
  });
  return fromOutcome(f, outcome, free, model.start, 'spectral', 'Hz', unit, report, (i) => ({
    data: rows[i]!.data.name,
    line: rows[i]!.datum.range.start.line,
    ...(rows[i]!.datum.csvLine !== undefined ? { csv_line: rows[i]!.datum.csvLine } : {}),
    ...(rows[i]!.datum.fieldT !== undefined ? { field_T: rows[i]!.datum.fieldT } : {}),
    measured: rows[i]!.datum.frequencyHz,
    ...(rows[i]!.datum.unit !== undefined && rows[i]!.datum.unit !== unit ? { written_unit: rows[i]!.datum.unit } : {}),
    ...(rows[i]!.datum.uncertaintyHz !== undefined ? { uncertainty: rows[i]!.datum.uncertaintyHz } : {}),
  }));
}

function calibrate(f: FitRequestModel, spec: HyperfineLevelSpec, row: SpectralRow, report: Report, out: FitResult): FitResult {
  const cal = calibrateField(spec, row.point, row.datum.frequencyHz, row.datum.uncertaintyHz, f.rangeT);
  const result: FitResult = {
    ...out,
    kind: 'calibration',
    status: cal.roots.length > 0 ? 'converged' : 'failed',
    dof: 0,
    uncertainty_basis: 'data',
    points: [
      {
        data: row.data.name,
        line: row.datum.range.start.line,
        measured: row.datum.frequencyHz,
        ...(row.datum.uncertaintyHz !== undefined ? { uncertainty: row.datum.uncertaintyHz } : {}),
        ...(row.datum.unit !== undefined && row.datum.unit !== out.measured_written_unit ? { written_unit: row.datum.unit } : {}),
      },
    ],
    roots: cal.roots.map((r) => ({ field_T: r.fieldT, ...(r.uncertaintyT !== null ? { uncertainty_T: r.uncertaintyT } : {}), df_dB_Hz_per_T: r.dfdBHzPerT })),
  };
  const first = cal.roots[0];
  if (first) {
    result.parameters = [{ name: 'field', value: first.fieldT, ...(first.uncertaintyT !== null ? { uncertainty: first.uncertaintyT } : {}), start: first.fieldT, unit: 'T', ...(f.rangeT.toUnit ? { written_unit: f.rangeT.toUnit } : {}) }];
    result.points[0]!.field_T = first.fieldT;
  } else {
    report('fit-no-root', 'the pair is not resonant at this frequency anywhere in the field range (widen it with range = <from>, <to>)', row.datum.range);
  }
  if (cal.roots.length > 1) {
    // The fields themselves, as `sublevel fit` prints them: the report and the editor show this finding where no root list is.
    const fields = cal.roots.map((r) => fittedText(r.fieldT, r.uncertaintyT, 'T', f.rangeT.toUnit));
    report('fit-several-roots', `${cal.roots.length} fields in the range are resonant at this frequency, ${listWords(fields, 'and')}; the fit's value is the lowest, ${fields[0]}`, f.nameRange);
  }
  return result;
}

// ---- detector profiles -------------------------------------------------------------------

function fitProfile(f: FitRequestModel, gJOf: GJLookup, report: Report, failed: (k: FitResult['kind'], u: string) => FitResult): FitResult {
  const out = failed('profile', 'counts');
  const d = f.data[0]!;
  if (f.data.length > 1) report('fit-not-possible', 'one detector profile per fit: only the first data block is fitted', f.nameRange, 'warning');
  const inputs = d.beam ? beamInputs(d.beam, gJOf) : undefined;
  const level = d.beam?.level;
  const spec = level && gJOf(level) !== undefined ? hyperfineSpec(level, gJOf(level)!) : undefined;
  const magnetField = d.beam?.magnet?.fieldT?.value;
  if (!inputs || !spec || magnetField === undefined) {
    if (d.beam) report('fit-not-possible', `beam '${d.beam.name}' is not complete enough to predict a pattern (see its own problems)`, f.nameRange);
    return out;
  }
  const free = f.free.map((p) => p.name as ProfileParameter);
  const rangeOf = (name: string) => f.free.find((p) => p.name === name)?.range ?? f.nameRange;
  const magnet = d.beam!.magnet!;
  let flights: ProfileSetup['flights'];
  let patternInput = inputs.input;
  if (magnet.sources) {
    const misplaced = free.find((p) => p === 'gradient' || p === 'field');
    if (misplaced) {
      report('fit-not-possible', `magnet '${magnet.name}' is built from sources, which set its ${misplaced}; free source_scale (every source's current and magnetisation times one factor) instead`, rangeOf(misplaced));
      return out;
    }
    const flown = sourceFlights(inputs, spec, magnet);
    if (!flown) {
      report('fit-not-possible', `the atoms cannot be flown through the field of magnet '${magnet.name}' (see the beam's own problems), so its profile cannot be fitted`, f.nameRange);
      return out;
    }
    ({ flights, patternInput } = flown);
  } else if (free.includes('source_scale')) {
    report('fit-not-possible', `source_scale scales the sources a magnet is built from; magnet '${magnet.name}' is given by its field and gradient: free gradient instead`, rangeOf('source_scale'));
    return out;
  }
  if (free.includes('temperature') && inputs.input.source.kind !== 'effusive') {
    report('fit-not-possible', 'temperature can be fitted only for an oven source', f.free.find((p) => p.name === 'temperature')!.range);
    return out;
  }
  const twoF = solveLevel(spec, magnetField).states.map((s) => (s.low.scheme === 'F' ? s.low.twoF : s.low.twoJ));
  const withErrors = d.profile.filter((p) => p.error !== undefined).length;
  const startOf = (name: string): number | undefined => f.starts.find((s) => s.name === name)?.value;
  const input = { ...patternInput, geometry: { ...patternInput.geometry } };
  if (startOf('gradient') !== undefined) input.geometry.gradientTPerM = startOf('gradient')!;
  if (startOf('width') !== undefined) input.geometry.detectorWidthM = startOf('width')!;
  if (startOf('temperature') !== undefined && input.source.kind === 'effusive') input.source = { kind: 'effusive', temperatureK: startOf('temperature')! };
  const positions = Float64Array.from(d.profile, (p) => p.positionM);
  const counts = Float64Array.from(d.profile, (p) => p.counts);
  const model = profileModel({ input, spec, magnetFieldT: startOf('field') ?? magnetField, twoF, ...(flights ? { flights } : {}) }, positions, counts, free, startOf('offset') ?? 0);
  const start = model.start.map((v, j) => (model.names[j] === 'background' || model.names[j] === 'source_scale' ? startOf(model.names[j]!) ?? v : v));
  // Counts without errors: Poisson, σ² = max(counts, 1) (common practice for counting data).
  const sigma = Float64Array.from(d.profile, (p) => (withErrors === d.profile.length ? p.error! : Math.sqrt(Math.max(p.counts, 1))));
  const fitted = fitCurve({ names: model.names, start, scale: model.scale, y: counts, sigma, model: model.model, modelJacobian: model.jacobian });
  const outcome = { ...fitted, params: fitted.params.map((v, j) => (isSizeParameter(model.names[j]!) ? Math.abs(v) : v)) };
  const result = fromOutcome(f, outcome, model.names, start, 'profile', 'counts', undefined, report, (i) => ({
    data: d.name,
    line: d.profile[i]!.range.start.line,
    ...(d.profile[i]!.csvLine !== undefined ? { csv_line: d.profile[i]!.csvLine } : {}),
    position_m: d.profile[i]!.positionM,
    measured: d.profile[i]!.counts,
    uncertainty: sigma[i]!,
  }));
  if (withErrors > 0 && withErrors < d.profile.length) report('fit-not-possible', 'some points have an error and some do not: all are weighted as Poisson counts (σ² = counts)', d.nameRange, 'warning');
  return result;
}

// ---- shared ------------------------------------------------------------------------------

function fromOutcome(
  f: FitRequestModel,
  o: FitOutcome,
  names: readonly string[],
  start: readonly number[],
  kind: FitResult['kind'],
  unit: string,
  writtenUnit: string | undefined,
  report: Report,
  point: (i: number) => FitPointResult,
): FitResult {
  for (const dgn of o.diagnostics) {
    const at = dgn.params?.map((j) => f.free.find((p) => names[j]!.startsWith(p.name))?.range).find((r) => r !== undefined) ?? f.nameRange;
    report(dgn.code, dgn.message, at, dgn.severity);
  }
  const written = (name: string): string | undefined => f.starts.find((s) => s.name === name)?.unit ?? (name === 'field' ? f.data[0]?.units.field : undefined);
  const parameters: FitParameterResult[] = o.ok
    ? names.map((name, j) => ({
        name,
        value: o.params[j]!,
        ...(o.errors[j] !== null && Number.isFinite(o.errors[j]!) ? { uncertainty: o.errors[j]! } : {}),
        start: start[j]!,
        unit: SI_UNIT[name] ?? '',
        ...(written(name) ? { written_unit: written(name)! } : {}),
      }))
    : [];
  const atUnit = kind === 'profile' ? f.data[0]?.units.position : f.data[0]?.units.field;
  const n = o.model.length;
  const points = Array.from({ length: o.ok ? n : 0 }, (_, i) => {
    const p = point(i);
    return Number.isFinite(o.model[i]!) ? { ...p, model: o.model[i]!, residual: o.residuals[i]! } : p;
  });
  return {
    name: f.name,
    kind,
    status: !o.ok ? 'failed' : o.diagnostics.some((x) => x.code === 'fit-not-converged') ? 'not-converged' : 'converged',
    measured_unit: unit,
    ...(writtenUnit ? { measured_written_unit: writtenUnit } : {}),
    ...(atUnit ? { at_written_unit: atUnit } : {}),
    parameters,
    ...(o.covariance && allFinite(o.covariance) ? { covariance: o.covariance } : {}),
    ...(o.correlation && allFinite(o.correlation) ? { correlation: o.correlation } : {}),
    ...(Number.isFinite(o.chi2) ? { chi2: o.chi2 } : {}),
    // A fit that did not run has no degrees of freedom (not points − parameters, which may be < 0).
    dof: o.ok ? o.dof : null,
    ...(o.reducedChi2 !== null && Number.isFinite(o.reducedChi2) ? { reduced_chi2: o.reducedChi2 } : {}),
    uncertainty_basis: o.scaledByResidual ? 'scatter' : 'data',
    iterations: o.iterations,
    points,
  };
}

/** No NaN or Infinity reaches the JSON: a matrix with one is left out. */
function allFinite(m: number[][]): boolean {
  return m.every((row) => row.every(Number.isFinite));
}

function half(twice: number): string {
  return twice % 2 === 0 ? String(twice / 2) : `${twice}/2`;
}
