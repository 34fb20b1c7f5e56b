/** A species: built-in or by hand, mass, nuclear spin, g_I, and its levels, each number with its source. */
import { levelDesignationText } from '../../eval/designationText';
import { halfText } from '../../eval/halves';
import { trimNumber } from '../../eval/quantityText';
import type { SpeciesModel } from '../../model/types';
import type { EvaluationResult } from '../../eval/resultTypes';
import { fieldScopeLine } from '../../eval/fieldScopeText';
import { ATOMIC_MASS_UNIT } from '../../physics/constants';
import { md, mdTitle } from '../shared/markdown';

/** `result`: the evaluation, for the working fields the species is evaluated at when they are not all. */
export function speciesSection(s: SpeciesModel, result?: EvaluationResult): string {
  const data = s.builtin ? `built-in data (${md(s.builtin.id)})` : undefined;
  const where = s.origin ? `defined in ${md(s.origin.path)}${data ? `, ${data}` : ''}` : (data ?? 'defined in this file');
  const lines = [`${mdTitle(`species ${md(s.name)}`)} — ${where}`];
  if (s.massKg) lines.push(`mass = ${trimNumber(s.massKg.value / ATOMIC_MASS_UNIT, 10)} u (${md(s.massKg.source)})`);
  else lines.push('mass: not given');
  lines.push(`I = ${halfText(s.twoI.value)} (${md(s.twoI.source)})`);
  if (s.twoI.value > 0) lines.push(`g_I = ${trimNumber(s.gI.value, 8)} in units of μ_B (${md(s.gI.source)})`);
  if (s.builtin?.muI) lines.push(`μ_I = ${trimNumber(s.builtin.muI.value, 8)} μ_N (${md(s.builtin.muI.source)})`);
  if (s.levels.length > 0) lines.push(`levels here: ${s.levels.map((l) => `${md(l.name)} (${md(levelDesignationText(l))})`).join(', ')}`);
  if (s.builtin && s.builtin.levels.length > 0) {
    lines.push(`built-in levels: ${s.builtin.levels.map((l) => md(l.designation)).join(', ')}`);
  }
  const evaluated = result?.species.find((x) => x.name === s.name);
  const scope = evaluated ? fieldScopeLine(result!, evaluated) : undefined;
  if (scope) lines.push(md(scope.trim()));
  return lines.join('  \n');
}
