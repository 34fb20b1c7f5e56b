/**
 * An optical (electric-dipole) line between two levels: selection rules, the effective Landé
 * factor, and every Zeeman component at each working field from the exact eigenstates.
 */
import type { GJLookup } from './gJLookup';
import type { Problem } from '../format/ast';
import { electricDipoleLineChecks, selectionRules, type LineTerm } from '../physics/transitions';
import { defineLineComponents } from './lineComponentsRecipe';
import type { LevelModel, LineModel, SettingsModel } from '../model/types';
import { evaluateTermLine } from './termLineEvaluation';
import type { WorkingField } from './levelEvaluation';
import { forwardIssues } from './forwardIssues';
import { lineLevelsRange } from '../model/lineBuilder';
import { hyperfineSpec } from './levelSpec';
import { solvedAtField } from './exactAtField';
import type { LineResult } from './resultTypes';

export function evaluateLine(
  line: LineModel,
  fields: WorkingField[],
  gJOf: GJLookup,
  problems: Problem[],
  settings: SettingsModel = { gS: 'exact', reducedMass: false },
): LineResult {
  const { lower, upper } = line;
  const result: LineResult = {
    name: line.name,
    ...(lower ? { species: lower.species.name, lower: lower.name } : {}),
    ...(upper ? { upper: upper.name } : {}),
    ...(line.emission ? { written_as_emission: true } : {}),
    at_fields: [],
  };
  if (!lower || !upper || lower.species !== upper.species || lower === upper) return result;
  if (lower.kind === 'term' || upper.kind === 'term') {
    if (lower.valid && upper.valid) evaluateTermLine(line, lower, upper, fields, gJOf, settings, forwardIssues(`line '${line.name}'`, lineLevelsRange(line.node), problems), result);
    return result;
  }
  const lt = lineTerm(lower);
  const ut = lineTerm(upper);
  if (!lt || !ut) return result;
  const report = forwardIssues(`line '${line.name}'`, lineLevelsRange(line.node), problems);
  const rules = selectionRules(lt, ut);
  report(rules);
  if (rules.some((i) => i.severity === 'error')) return result;
  const gl = gJOf(lower);
  const gu = gJOf(upper);
  const ls = gl !== undefined ? hyperfineSpec(lower, gl) : undefined;
  const us = gu !== undefined ? hyperfineSpec(upper, gu) : undefined;
  if (!ls || !us || ls.twoI !== us.twoI) return result;
  // Equal energies give no centre (the model says so); the offsets are still meaningful.
  const energies =
    lower.energyHz && upper.energyHz && upper.energyHz.value !== lower.energyHz.value
      ? { lowerEnergyHz: lower.energyHz.value, upperEnergyHz: upper.energyHz.value }
      : {};
  const at = fields.length > 0 ? fields : [{ source: { kind: 'field' as const, name: 'zero' }, tesla: 0, range: line.nameRange }];
  for (const f of at) {
    // Checked here (issues, sum rule); the components themselves are built when first read.
    const r = electricDipoleLineChecks(ls, us, f.tesla, { ...energies, solve: solvedAtField });
    report(r.issues);
    if (r.issues.some((i) => i.severity === 'error')) continue;
    if (result.g_eff === undefined && r.gEff) result.g_eff = r.gEff.formula;
    if (r.lineCentreHz !== null) result.line_centre_Hz = r.lineCentreHz;
    const point = { source: f.source, field_T: f.tesla };
    defineLineComponents(point, { kind: 'components', lower: ls, upper: us, fieldT: f.tesla, energies });
    result.at_fields.push(point as LineResult['at_fields'][number]);
  }
  return result;
}

function lineTerm(level: LevelModel): LineTerm | undefined {
  const t = level.term;
  if (!level.valid || level.kind !== 'level' || !t || t.twoJ === null) return undefined;
  const parity = level.configuration?.parity ?? t.parityMark ?? undefined;
  return { twoS: t.twoS, L: t.L, twoJ: t.twoJ, ...(parity ? { parity } : {}) };
}
