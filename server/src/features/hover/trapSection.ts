/** Hover of a `trap` block: its summary and the per-sublevel verdicts (docs/traps.md). */
import { depthText, gaussPerCmText, shapeText, sublevelVerdict, trapSummaryLines } from '../../eval/trapText';
import type { TrapResult } from '../../eval/trapResultTypes';
import { md } from '../shared/markdown';

export function trapSection(t: TrapResult): string {
  const [title, ...rest] = trapSummaryLines(t);
  const lines = [`*${md(title!)}*`, '', ...rest.map((l) => `${md(l)}  `)];
  if (t.computed) {
    lines.push('', '| sublevel | verdict | levitation | depth | shape |', '|---|---|---|---|---|');
    for (const s of t.sublevels) {
      const lev = s.levitation_T_per_m !== undefined ? gaussPerCmText(s.levitation_T_per_m) : '—';
      lines.push(`| ${md(`|${s.label}⟩`)} | ${md(sublevelVerdict(s))} | ${lev} | ${s.trapped ? md(depthText(s)) : '—'} | ${s.trapped ? md(shapeText(s)) : '—'} |`);
    }
  }
  return lines.join('\n');
}
