/** A setup diff as plain text (terminal, git diff driver) and as Markdown (a review comment). */
import type { DiagnosticResult } from '../eval/resultTypes';
import type { QuantityChange, SetupDiff, ThingDiff } from './diffTypes';

function label(c: QuantityChange): string {
  return `${c.quantity}${c.subject !== undefined ? ` ${c.subject}` : ''}${c.at !== undefined ? ` at ${c.at}` : ''}`;
}

function thingTitle(t: ThingDiff): string {
  const name = t.kind === 'file' ? 'the file as a whole' : `${t.kind} ${t.name}`;
  return t.status === 'changed' ? name : `${name} (${t.status === 'added' ? 'new' : 'gone'})`;
}

function diagnosticText(d: DiagnosticResult): string {
  return `${d.severity} ${d.code} (line ${d.line}): ${d.message}`;
}

function summary(diff: SetupDiff): string {
  const n = diff.things.length;
  return n === 0 ? 'No physical change.' : `${n} thing${n === 1 ? '' : 's'} changed.`;
}

export function diffText(diff: SetupDiff): string[] {
  const out = [`--- ${diff.old}`, `+++ ${diff.new}`];
  for (const t of diff.things) {
    out.push(thingTitle(t));
    for (const c of t.changes) out.push(`  ${label(c)}: ${c.old} → ${c.new}${c.change !== undefined ? ` (${c.change})` : ''}`);
    for (const d of t.new_diagnostics) out.push(`  + ${diagnosticText(d)}`);
    for (const d of t.gone_diagnostics) out.push(`  - ${diagnosticText(d)}`);
  }
  out.push(summary(diff));
  return out;
}

/** Text safe in a Markdown table cell or list item: sublevel labels hold `|` and `>`. */
function md(text: string): string {
  return text.replace(/[\\|*`<]/g, (c) => (c === '<' ? '&lt;' : `\\${c}`));
}

export function diffMarkdown(diff: SetupDiff): string[] {
  const out = [`### Physics diff: \`${diff.old}\` → \`${diff.new}\``, '', summary(diff)];
  for (const t of diff.things) {
    out.push('', `**${md(thingTitle(t))}**`);
    if (t.changes.length) {
      out.push('', '| quantity | old | new | change |', '|---|---|---|---|');
      for (const c of t.changes) out.push(`| ${md(label(c))} | ${md(c.old)} | ${md(c.new)} | ${md(c.change ?? '')} |`);
    }
    if (t.new_diagnostics.length || t.gone_diagnostics.length) out.push('');
    for (const d of t.new_diagnostics) out.push(`- new: ${md(diagnosticText(d))}`);
    for (const d of t.gone_diagnostics) out.push(`- gone: ${md(diagnosticText(d))}`);
  }
  return out;
}
