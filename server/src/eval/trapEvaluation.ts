/**
 * Trap results: the summed field of the trap's sources, the level's exact energies, and the
 * physics core's trap summary (physics/traps), as the `traps` part of the evaluation and as
 * problems placed on the trap's settings.
 */
import type { Problem, Range } from '../format/ast';
import { BOLTZMANN_K, PLANCK_H } from '../physics/constants';
import { sumField } from '../physics/fields';
import type { FieldSourceSpec, Vec3 } from '../physics/fields/types';
import { PHYSICS_RULES } from '../physics/issueCodes';
import { defaultRegionRadius, gravityAlong, hasFigures, regionIssues, ZERO_FIELD_FRACTION, summariseTrap, trapCautions, type SublevelFinding, type SublevelTrap, type TrapIssue, type TrapSummary, type WordedTrapIssue } from '../physics/traps';
import type { FieldSourceModel, SettingsModel } from '../model/types';
import type { TrapModel } from '../model/trapTypes';
import type { GJLookup } from './gJLookup';
import { engineSpec } from './levelSpec';
import type { TrapResult, TrapSublevelResult } from './trapResultTypes';
import { mergedTrapProblem, ZERO_FIELD_CODE } from './trapSublevelFindings';
import { trapIssueText, type TrapIssueUnits } from './trapIssueText';
import { regionLengthUnit, trapFieldUnitFor } from './trapText';

export interface TrapEvaluation {
  result: TrapResult;
  summary?: TrapSummary;
  problems: Problem[];
}

/** `fieldUnit`: the unit the file writes fields in elsewhere; the trap's report reads in its family. */
export function evaluateTrap(trap: TrapModel, gJOf: GJLookup, settings: SettingsModel, fieldUnit?: string): TrapEvaluation {
  const parts: FieldSourceSpec[] = (trap.sources ?? []).flatMap((s) => s.parts);
  const result: TrapResult = {
    name: trap.name,
    ...(trap.level ? { species: trap.level.species.name, level: trap.level.name } : {}),
    sources: (trap.sources ?? []).map((s) => s.name),
    computed: false,
    gravity: trap.gravity.down ? [...trap.gravity.down] : 'off',
    ...(trap.temperatureK ? { temperature_K: trap.temperatureK.value, ...(trap.temperatureK.unit ? { temperature_unit: trap.temperatureK.unit } : {}) } : {}),
    ...(trap.cutJ ? { cut_J: trap.cutJ.value, ...(trap.cutJ.unit ? { cut_unit: trap.cutJ.unit } : {}) } : {}),
    ...(fieldUnit ? { field_unit: fieldUnit } : {}),
    sublevels: [],
    cautions: trapCautions(),
  };
  const problems: Problem[] = [];
  const level = trap.level;
  const massKg = level?.species.massKg?.value;
  const spec = level ? engineSpec(level, gJOf(level), settings) : undefined;
  // What is missing has its own problem already (trap-incomplete, name-unknown, species-needs-mass, the level's own).
  if (!level || !spec || massKg === undefined || parts.length === 0) return { result, problems };
  const centre: Vec3 = trap.regionCentre?.value ?? [0, 0, 0];
  const radius = trap.regionRadiusM?.value ?? defaultRegionRadius(centre, parts);
  if (radius === undefined) return { result, problems };
  const writtenRegionUnit = trap.regionRadiusM?.unit ?? trap.regionCentre?.unit;
  result.region = { centre_m: [...centre], radius_m: radius, from: trap.regionRadiusM ? 'file' : 'sources', ...(writtenRegionUnit ? { unit: writtenRegionUnit } : {}) };
  const regionUnit = regionLengthUnit(radius, centre, writtenRegionUnit);
  // Before the summary: a region reaching a conductor reads only lengths; the field family is not known yet.
  for (const i of regionIssues(centre, radius, parts)) problems.push(toProblem(trap, i, { field: 'G', region: regionUnit }));
  const summary = summariseTrap({
    field: sumField(parts),
    level: spec,
    massKg,
    gravity: trap.gravity.down ? gravityAlong(trap.gravity.down) : [0, 0, 0],
    region: { centre, radiusM: radius },
    ...(trap.temperatureK ? { temperatureK: trap.temperatureK.value } : {}),
    ...(trap.cutJ ? { cutJ: trap.cutJ.value } : {}),
  });
  // Findings with fields and gradients read them in the unit the trap's report uses (trapText.trapFieldUnit).
  const units: TrapIssueUnits = { field: trapFieldUnitFor(Math.max(Math.abs(summary.fieldRangeT[1]), Math.abs(summary.fieldAtCentreT)), fieldUnit), region: regionUnit };
  for (const i of summary.issues) problems.push(toProblem(trap, i, units));
  problems.push(...perTrapProblems(trap, summary.sublevelFindings));
  if (summary.sublevels.length === 0) return { result, summary, problems };
  result.computed = true;
  // Below the searches' own precision a position or a field is round-off: written as 0.
  const noise = { lengthM: SEARCH_PRECISION * radius, fieldT: ZERO_FIELD_FRACTION * summary.fieldRangeT[1] };
  result.field_centre_m = cleanVec(summary.fieldCentre, noise.lengthM);
  result.field_at_centre_T = clean(summary.fieldAtCentreT, noise.fieldT);
  result.field_max_T = summary.fieldRangeT[1];
  result.gravity_gradient_T_per_m = summary.gravityGradientTPerM;
  result.sublevels = summary.sublevels.map((s) => sublevelResult(s, noise));
  return { result, summary, problems };
}

/** Relative precision of the minimum searches (the simplex stops at 1e-11 of the region's radius; docs/traps.md). */
const SEARCH_PRECISION = 1e-9;

function clean(x: number, floor: number): number {
  return Math.abs(x) < floor ? 0 : x;
}

function cleanVec(v: readonly number[], floor: number): [number, number, number] {
  return [clean(v[0]!, floor), clean(v[1]!, floor), clean(v[2]!, floor)];
}

function sublevelResult(s: SublevelTrap, noise: { lengthM: number; fieldT: number }): TrapSublevelResult {
  const out: TrapSublevelResult = {
    label: s.low.text,
    two_m: s.twoM,
    low_field_seeking: s.lowFieldSeeking,
    trapped: s.trapped,
    moment_J_per_T: s.momentJT,
  };
  if (s.levitationTPerM !== undefined) out.levitation_T_per_m = s.levitationTPerM;
  if (s.turningFieldT !== null) out.turning_field_T = s.turningFieldT;
  if (s.minimum) {
    out.minimum_m = cleanVec(s.minimum.position, noise.lengthM);
    out.field_at_minimum_T = clean(s.minimum.fieldT, noise.fieldT);
  }
  if (s.sagM !== undefined) out.sag_m = clean(s.sagM, noise.lengthM);
  if (s.depthJ !== undefined) {
    out.depth_J = s.depthJ;
    out.depth_K = s.depthJ / BOLTZMANN_K;
    out.depth_Hz = s.depthJ / PLANCK_H;
  }
  if (s.depthLimit) out.depth_limit = s.depthLimit;
  if (s.shape?.kind === 'harmonic') {
    out.shape = 'harmonic';
    out.frequencies_Hz = [...s.shape.frequenciesHz];
    out.axes = axesOf(s.shape.axes);
  } else if (s.shape?.kind === 'linear') {
    out.shape = 'linear';
    out.gradients_T_per_m = [...s.shape.gradientsTPerM];
    out.axes = axesOf(s.shape.axes);
    if (s.shape.cloudSizesM) out.cloud_sizes_m = [...s.shape.cloudSizesM];
  }
  if (s.larmorHz !== undefined) out.larmor_Hz = s.larmorHz;
  if (s.rfCut) out.rf_cut = { field_T: s.rfCut.fieldT, frequency_Hz: s.rfCut.frequencyHz, linear_Hz: s.rfCut.linearHz, to: s.rfCut.partner.text };
  if (s.majorana) out.majorana = { rate_per_s: s.majorana.rateHz, gradient_T_per_m: s.majorana.gradientTPerM, source: s.majorana.source };
  return out;
}

/** Axes with round-off below 1e-12 set to 0 (an axis printed as 3e-16 would be noise). */
function axesOf(a: readonly [Vec3, Vec3, Vec3]): TrapSublevelResult['axes'] {
  const clean = (v: Vec3): [number, number, number] => [v[0], v[1], v[2]].map((x) => (Math.abs(x) < 1e-12 ? 0 : x)) as [number, number, number];
  return [clean(a[0]), clean(a[1]), clean(a[2])];
}

/** The core's sublevel-by-sublevel findings, one problem per code, in the order the core first meets each. */
function perTrapProblems(trap: TrapModel, findings: readonly SublevelFinding[]): Problem[] {
  const codes = [...new Set(findings.map((f) => f.code))];
  return codes.map((code) => {
    const mine = findings.filter((f) => f.code === code);
    // A temperature written but not usable (wrong unit, not above 0) has its own error; the zero-field finding points at it.
    const unusable = code === ZERO_FIELD_CODE && !trap.temperatureK ? settingRange(trap, 'temperature') : undefined;
    return mergedTrapProblem(code, mine, {
      trap,
      severity: severityOf(code, mine[0]!.severity),
      range: rangeFor(trap, code),
      ...(unusable ? { temperatureRange: unusable } : {}),
      ...(trap.cutJ?.unit ? { cutUnit: trap.cutJ.unit } : {}),
    });
  });
}

function settingRange(trap: TrapModel, key: string): Range | undefined {
  return trap.node.settings.find((s) => s.key.text === key)?.valueText.range;
}

/** Where a trap's problem belongs: the first setting it is about that the trap has, else the trap's name. */
function rangeFor(trap: TrapModel, code: string): Range {
  const byCode: Record<string, string[]> = {
    'trap-cut-outside': ['cut'],
    'trap-cut-invalid': ['cut'],
    'trap-temperature-invalid': ['temperature'],
    'trap-region-invalid': ['region'],
    'trap-region-reaches-source': ['region'],
    'trap-gravity-too-strong': ['sources'],
  };
  for (const key of byCode[code] ?? []) {
    const r = settingRange(trap, key);
    if (r) return r;
  }
  return trap.nameRange;
}

/**
 * A trap point on a conductor belongs where the user would change it: the trap's `centre` (its
 * centre on the conductor) or `region` (the region reaching it) when written, else the line that
 * places the conductor in its source; the other place is given as related.
 */
function onConductorPlace(trap: TrapModel, c: NonNullable<WordedTrapIssue['conductor']>): Pick<Problem, 'range' | 'related'> {
  const owners = (trap.sources ?? []).flatMap((s) => s.parts.map((_, j) => ({ s, j })));
  const owner = c.partIndex !== undefined ? owners[c.partIndex] : undefined;
  const placed = owner ? conductorSetting(owner.s, owner.j) : undefined;
  const mine = settingRange(trap, c.meets);
  if (mine) return { range: mine, ...(owner && placed ? { related: [{ message: `${owner.s.kind} '${owner.s.name}' is placed here`, range: placed }] } : {}) };
  if (placed) return { range: placed, related: [{ message: `trap '${trap.name}' (no \`${c.meets}\` written: ${c.meets === 'centre' ? 'its centre is the origin' : 'its region comes from the sources'})`, range: trap.nameRange }] };
  return { range: trap.nameRange };
}

/** The setting that places part j of a source: a wire's `through` or `return`, else its `centre`, else the block's name. */
function conductorSetting(s: FieldSourceModel, j: number): Range {
  if (s.kind === 'wire') return (j === 1 ? s.returnThrough?.range : s.through?.range) ?? s.nameRange;
  return s.centre?.range ?? s.nameRange;
}

function toProblem(trap: TrapModel, i: TrapIssue, units: TrapIssueUnits): Problem {
  if (hasFigures(i)) return { code: i.code, severity: severityOf(i.code, i.severity), message: `trap '${trap.name}': ${trapIssueText(i, units)}`, range: rangeFor(trap, i.code) };
  const place = i.conductor ? onConductorPlace(trap, i.conductor) : { range: rangeFor(trap, i.code) };
  return { code: i.code, severity: severityOf(i.code, i.severity), message: `trap '${trap.name}': ${i.message}`, ...place };
}

/** The catalogue's severity for a code (physics/issueCodes.ts), else the core's own. */
function severityOf(code: string, core: Problem['severity']): Problem['severity'] {
  return (PHYSICS_RULES as Record<string, { severity: Problem['severity'] }>)[code]?.severity ?? core;
}
