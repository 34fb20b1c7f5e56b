/** The sublevels of one level at one field, as a Markdown table (lowest energy first). */
import type { FieldPointResult } from '../../eval/resultTypes';
import { frequencyText } from '../../eval/quantityText';
import { mdTable } from '../shared/markdown';

export function sublevelTable(point: FieldPointResult, maxRows: number): string {
  const rows = point.linear.slice(0, Math.max(0, maxRows)).map((s) => [s.label.replace(/_/g, '\\_'), frequencyText(s.energy_Hz)]);
  const more = point.linear.length - rows.length;
  const table = rows.length > 0 ? mdTable(['sublevel', 'E/h (weak-field formula)'], rows) : '';
  return [table, more > 0 ? `… and ${more} more sublevel${more === 1 ? '' : 's'}` : ''].filter((s) => s !== '').join('\n\n');
}
