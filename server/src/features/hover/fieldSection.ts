/**
 * A working field (a `field` block or a magnet's field): its value in other units, the
 * Zeeman scale μ_B·B/h, and each level's sublevels at that field.
 */
import type { EvaluationResult } from '../../eval/resultTypes';
import { frequencyText } from '../../eval/quantityText';
import { BOHR_MAGNETON_HZ_PER_T } from '../../physics/constants';
import { md, mdTitle } from '../shared/markdown';
import { levelAtField } from '../shared/results';
import { valueInUnits } from '../shared/units';
import type { HoverOptions } from './context';
import { sublevelTable } from './sublevelTable';

/** μ_B·B/h: the frequency by which a g·m = 1 sublevel moves at this field. */
export function zeemanScaleHz(tesla: number): number {
  return BOHR_MAGNETON_HZ_PER_T * tesla;
}

/** The field in the unit the file wrote (`unit`) and in the other unit family, and its Zeeman scale. */
export function fieldValueLines(tesla: number, unit?: string): string[] {
  return [`= ${valueInUnits(tesla, 'flux-density', unit).join(' = ')}`, `Zeeman scale μ_B·B/h = ${frequencyText(zeemanScaleHz(tesla))}`];
}

/** Tables of every evaluated level at the field from `source`, up to the options' limits. */
export function levelsAtFieldSection(
  result: EvaluationResult | undefined,
  source: { kind: 'field' | 'magnet'; name: string },
  options: HoverOptions,
): string | undefined {
  if (!result) return undefined;
  const parts: string[] = [];
  let shown = 0;
  let hidden = 0;
  const entries = [...result.levels, ...(result.terms ?? [])];
  for (const level of entries) {
    const point = levelAtField(level, source);
    if (!point) continue;
    if (shown >= options.levelTables) {
      hidden++;
      continue;
    }
    shown++;
    parts.push(`${mdTitle(`${md(level.species)} ${md(level.level)}`)} (${md(level.designation.unicode)}) at this field`, sublevelTable(point, options.sublevelRows));
  }
  if (hidden > 0) parts.push(`… and ${hidden} more level${hidden === 1 ? '' : 's'} (hover a level for its own tables)`);
  return parts.length > 0 ? parts.join('\n\n') : undefined;
}

export function fieldSection(
  name: string,
  tesla: number | undefined,
  ctx: { result: EvaluationResult | undefined; options: HoverOptions },
  unit?: string,
  species?: readonly string[],
): string {
  const head = `${mdTitle(`field ${md(name)}`)}`;
  // A field that lists species acts on those only: their levels are the ones evaluated at it.
  const actsOn = species ? [species.length > 0 ? `acts on ${species.map(md).join(', ')} (its species list)` : 'acts on no species (none of its list is known)'] : [];
  if (tesla === undefined) return [head, ...actsOn, 'no valid value yet'].join('  \n');
  const body = [[head, ...fieldValueLines(tesla, unit), ...actsOn].join('  \n')];
  const tables = levelsAtFieldSection(ctx.result, { kind: 'field', name }, ctx.options);
  if (tables) body.push(tables);
  return body.join('\n\n');
}
