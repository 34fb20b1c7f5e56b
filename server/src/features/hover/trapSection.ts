/**
 * Hover of a `trap` block: its summary, the per-sublevel verdicts, what each held sublevel's RF cut
 * and Majorana estimate come to, and the cautions in one line (docs/traps.md).
 */
import { depthText, shallowDepthNote, shapeText, sublevelVerdict, trappedSublevelNotes, trapFieldUnit, trapSummaryLines } from '../../eval/trapText';
import { gradientText } from '../../eval/quantityText';
import type { TrapResult } from '../../eval/trapResultTypes';
import { md } from '../shared/markdown';
import { cautionLine } from './cautionLine';

export function trapSection(t: TrapResult): string {
  const [title, ...rest] = trapSummaryLines(t);
  const lines = [`*${md(title!)}*`, '', ...rest.map((l) => `${md(l)}  `)];
  if (t.computed) {
    const unit = trapFieldUnit(t);
    lines.push('', '| sublevel | verdict | levitation | depth | shape |', '|---|---|---|---|---|');
    for (const s of t.sublevels) {
      const lev = s.levitation_T_per_m !== undefined ? gradientText(s.levitation_T_per_m, 4, undefined, unit) : '—';
      lines.push(`| ${md(`|${s.label}⟩`)} | ${md(sublevelVerdict(s, unit))} | ${lev} | ${s.trapped ? md(depthText(s)) : '—'} | ${s.trapped ? md(shapeText(s, unit)) : '—'} |`);
    }
    const notes = trappedSublevelNotes(t);
    const shallow = shallowDepthNote(t);
    if (notes.length > 0 || shallow) lines.push('', ...notes.map((l) => `${md(l)}  `), ...(shallow ? [md(`note: ${shallow}`)] : []));
  }
  const caution = cautionLine(t.cautions);
  if (caution) lines.push('', caution);
  return lines.join('\n');
}
