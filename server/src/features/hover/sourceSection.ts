/**
 * A field source (`coil`, `solenoid`, `wire`, `slab`): what it is, its field and gradient at the
 * centre, its winding's power and current density, and its cautions in one line — the same
 * lines the eval report prints.
 */
import type { FieldSourceResult } from '../../eval/fieldSourceResultTypes';
import { sourceHeadline, sourceLines } from '../../eval/fieldSourceText';
import { md, mdTitle } from '../shared/markdown';
import { cautionLine } from './cautionLine';

export function sourceSection(r: FieldSourceResult): string {
  const lines = [mdTitle(md(sourceHeadline(r))), ...sourceLines(r).map(md)];
  const caution = cautionLine(r.cautions);
  return [lines.join('  \n'), ...(caution ? [caution] : [])].join('\n\n');
}
