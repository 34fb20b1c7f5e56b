/**
 * An optical line with a whole term at one end or both: the term's engine spec (whole-term
 * mode with its nucleus when A_J / B_J are given, else the fine mode with the nucleus
 * uncoupled), the selection rules that do not need J, and the components at every field.
 */
import type { LevelSpec } from '../physics/engine';
import { selectionRules, termDipoleLine, type LineTerm, type TermLineEnd } from '../physics/transitions';
import { lineComponentRows } from './lineComponents';
import type { GJLookup } from './gJLookup';
import type { LevelModel, LineModel, SettingsModel } from '../model/types';
import type { PhysicsIssue } from './forwardIssues';
import { fineSpec, hyperfineSpec, wholeTermSpec } from './levelSpec';
import type { WorkingField } from './levelEvaluation';
import type { LineResult } from './resultTypes';

/** The engine spec of a line's end; a term keeps the species' nucleus so both ends share it. */
function endSpec(level: LevelModel, gJOf: GJLookup, settings: SettingsModel): LevelSpec | undefined {
  if (level.kind !== 'term') {
    const gJ = gJOf(level);
    return gJ !== undefined ? hyperfineSpec(level, gJ) : undefined;
  }
  const whole = wholeTermSpec(level, settings);
  // E_J without hyperfine data on a species with a nucleus: no nucleus to share (the model says so).
  if (whole) return whole.twoI > 0 || level.species.twoI.value === 0 ? whole : undefined;
  const fine = fineSpec(level, settings);
  const twoI = level.species.twoI.value;
  return fine && twoI > 0 ? { ...fine, twoI, gI: level.species.gI.value } : fine;
}

/** For the J-free rules (parity, ΔS, ΔL): a term stands in with the J nearest to `near`. */
function ruleTerm(level: LevelModel, near: number): LineTerm | undefined {
  const t = level.term;
  if (!t) return undefined;
  let twoJ = t.twoJ;
  if (twoJ === null) {
    const lo = Math.abs(2 * t.L - t.twoS);
    twoJ = Math.min(2 * t.L + t.twoS, Math.max(lo, near - ((near - lo) % 2)));
  }
  const parity = level.configuration?.parity ?? t.parityMark ?? undefined;
  return { twoS: t.twoS, L: t.L, twoJ, ...(parity ? { parity } : {}) };
}

/** Codes of the rules that are about J, which a whole term does not have. */
const J_RULES = ['line-delta-j', 'line-j-zero-zero'];

export function evaluateTermLine(
  line: LineModel,
  lower: LevelModel,
  upper: LevelModel,
  fields: WorkingField[],
  gJOf: GJLookup,
  settings: SettingsModel,
  report: (issues: readonly PhysicsIssue[]) => void,
  result: LineResult,
): void {
  const lt = lower.term;
  const ut = upper.term;
  if (!lt || !ut) return;
  const lJ = ruleTerm(lower, ut.twoJ ?? 2 * ut.L + ut.twoS);
  const uJ = ruleTerm(upper, lJ?.twoJ ?? 0);
  if (!lJ || !uJ) return;
  const rules = selectionRules(lJ, uJ).filter((i) => !J_RULES.includes(i.code));
  report(rules);
  if (rules.some((i) => i.severity === 'error')) return;
  const ls = endSpec(lower, gJOf, settings);
  const us = endSpec(upper, gJOf, settings);
  if (!ls || !us) return;
  const end = (level: LevelModel, spec: LevelSpec, other: LevelModel): TermLineEnd => ({
    spec,
    twoS: level.term!.twoS,
    L: level.term!.L,
    // Absolute frequencies need both energies, and they must differ (the model says so otherwise).
    ...(level.energyHz && other.energyHz && level.energyHz.value !== other.energyHz.value ? { energyHz: level.energyHz.value } : {}),
  });
  const at = fields.length > 0 ? fields : [{ source: { kind: 'field' as const, name: 'zero' }, tesla: 0, range: line.nameRange }];
  result.strengths_reduced_in = 'L';
  for (const f of at) {
    const r = termDipoleLine(end(lower, ls, upper), end(upper, us, lower), f.tesla);
    report(r.issues);
    if (r.issues.some((i) => i.severity === 'error')) continue;
    if (r.lineCentreHz !== null) result.line_centre_Hz = r.lineCentreHz;
    result.at_fields.push({
      source: f.source,
      field_T: f.tesla,
      ...(r.gEffCentroid !== null ? { g_eff_centroid: r.gEffCentroid } : {}),
      components: lineComponentRows(r.components, true),
    });
  }
}

