/** A slower: its summary, profile numbers and the coil check, from the evaluation (docs/slower.md). */
import type { SlowerResult } from '../../eval/slowerResultTypes';
import { slowerReport, slowerSummary } from '../../eval/slowerText';
import { md, mdTitle } from '../shared/markdown';
import { cautionLine } from './cautionLine';

export function slowerSection(s: SlowerResult): string {
  const lines = [mdTitle(`slower ${md(s.name)}`), md(slowerSummary(s))];
  // The report's body without its title and cautions (the cautions go in one line, as for beams).
  const report = slowerReport(s);
  const cut = report.indexOf('  cautions:');
  for (const l of report.slice(1, cut < 0 ? undefined : cut)) lines.push(md(l.trim()));
  const caution = cautionLine(s.cautions);
  if (caution) lines.push(caution);
  return lines.join('  \n');
}
