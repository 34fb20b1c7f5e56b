/**
 * Compact text summaries of a parsed document, so table tests can state the expected tree and
 * problems in a few readable lines.
 */
import type { SettingNode, SetupDocument, ValuePart } from '../../server/src/format/ast';
import { formatRange } from '../../server/src/format/positions';

/** `n:3/2`, `q:0.45|T`, `w:oven` */
export function partSummary(p: ValuePart): string {
  if (p.kind === 'number') return `n:${p.text}`;
  if (p.kind === 'word') return `w:${p.text}`;
  const numberText = p.text.slice(0, p.text.length - p.unit.text.length).trim();
  return `q:${numberText}|${p.unit.text}`;
}

/** `key=part part, part` (`key~…` when the `=` is missing) */
export function settingSummary(s: SettingNode): string {
  const groups = s.groups.map((g) => g.map(partSummary).join(' ')).join(', ');
  return `${s.key.text}${s.equals ? '=' : '~'}${groups}`;
}

/** One line per block, level and setting, indented like the source. */
export function treeSummary(doc: SetupDocument): string[] {
  const out: string[] = [];
  for (const b of doc.blocks) {
    let head = b.kind + (b.name ? ` ${b.name.text}` : '');
    if (b.headerSetting) head += ` = ${settingSummary(b.headerSetting).replace(/^[^=~]*[=~]/, '')}`;
    if (b.link) head += `: ${b.link.from?.text ?? '?'} ${b.link.arrow ? '->' : '?'} ${b.link.to?.text ?? '?'}`;
    out.push(head);
    for (const l of b.levels) {
      const settings = l.settings.map(settingSummary).join(' ');
      out.push(`  level ${l.name?.text ?? '?'}: ${l.designation?.text ?? '?'}${settings ? ` {${settings}}` : ''}`);
    }
    for (const s of b.settings) out.push(`  ${settingSummary(s)}`);
  }
  return out;
}

/** `code line:col-line:col` for each problem, in document order. */
export function problemSummary(doc: SetupDocument): string[] {
  return doc.problems.map((p) => `${p.code} ${formatRange(p.range)}`);
}
