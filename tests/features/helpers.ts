/**
 * Helpers for the language-service tables: a `|` marks the cursor in a test text, edits are
 * applied the way an editor applies them, and hover contents come back as plain strings.
 */
import type { Hover, Position, TextEdit, WorkspaceEdit } from 'vscode-languageserver-types';
import { analyze, type Analysis } from '../../server/src/eval/analyze';
import { computeLineStarts, positionToOffset } from '../../server/src/format/positions';

export const URI = 'file:///test.sublevel';

/** The text without its `|` marker, the marker's position, and the full analysis of the text. */
export function atCursor(marked: string): { text: string; position: Position; analysis: Analysis } {
  const at = marked.indexOf('|');
  if (at < 0) throw new Error(`no | cursor marker in ${JSON.stringify(marked)}`);
  const text = marked.slice(0, at) + marked.slice(at + 1);
  const lineStarts = computeLineStarts(text);
  let line = 0;
  while (line + 1 < lineStarts.length && lineStarts[line + 1]! <= at) line++;
  return { text, position: { line, character: at - lineStarts[line]! }, analysis: analyze(text) };
}

/** The full pipeline's analysis (parse, model, evaluation), as features see it once evaluated. */
export function analysisOf(text: string): Analysis {
  return analyze(text);
}

export { analyze };

/** Applies edits as LSP says: all ranges refer to the original text; they must not overlap. */
export function applyEdits(text: string, edits: readonly TextEdit[]): string {
  const index = { text, lineStarts: computeLineStarts(text) };
  const spans = edits
    .map((e) => ({ start: positionToOffset(index, e.range.start), end: positionToOffset(index, e.range.end), newText: e.newText }))
    .sort((a, b) => a.start - b.start || a.end - b.end);
  for (let i = 1; i < spans.length; i++) {
    if (spans[i]!.start < spans[i - 1]!.end) throw new Error(`overlapping edits at offsets ${spans[i - 1]!.start}-${spans[i - 1]!.end} and ${spans[i]!.start}-${spans[i]!.end}`);
  }
  let out = text;
  for (const s of [...spans].reverse()) out = out.slice(0, s.start) + s.newText + out.slice(s.end);
  return out;
}

/** Edits of a workspace edit for the test document. */
export function editsOf(edit: WorkspaceEdit | undefined): TextEdit[] {
  return edit?.changes?.[URI] ?? [];
}

export function hoverText(h: Hover | null): string {
  if (!h) return '';
  const c = h.contents;
  if (typeof c === 'string') return c;
  if (Array.isArray(c)) return c.map((x) => (typeof x === 'string' ? x : x.value)).join('\n');
  return c.value;
}

/** Hover Markdown with the escapes removed, for comparing with plain expected text. */
export function plain(markdown: string): string {
  return markdown.replace(/\\([\\`*_{}[\]()#+\-.!|<>~&$:"'=^])/g, '$1').replace(/\*\*/g, '');
}
