/**
 * Formatting that only ever changes whitespace, as minimal edits:
 *   - block contents indented by two spaces, block headers and `use` lines at the left margin; a comment line
 *     takes the indentation of the next statement;
 *   - one space on each side of `=`;
 *   - no trailing whitespace (and no blanks on empty lines, except one space on a blank line
 *     between a lone CR and an LF, which would otherwise merge into one CRLF line break).
 * A trailing comment keeps its column when the code before it shrinks or grows, so aligned
 * comments stay aligned. Comments and values are never moved across each other, rewritten or
 * dropped, and formatting a formatted text changes nothing.
 */
import type { Range, TextEdit } from 'vscode-languageserver-types';
import type { Analysis } from '../eval/analyze';
import type { SetupDocument } from '../format/ast';
import { lineEndOffset, lineText } from '../format/positions';
import { isBlockWord } from '../format/schema';
import { scanLine } from '../format/scanner';

export const INDENT = '  ';

interface Item {
  start: number;
  end: number;
  kind: 'atom' | 'equals' | 'colon' | 'comma' | 'arrow' | 'string' | 'comment';
}

interface ScannedLineItems {
  text: string;
  items: Item[];
}

function scan(doc: SetupDocument, line: number): ScannedLineItems {
  const text = lineText(doc, line);
  const s = scanLine(text, line, 0, text.length);
  const items: Item[] = s.tokens.map((t) => ({ start: t.start, end: t.end, kind: t.kind }));
  if (s.comment) items.push({ start: s.comment.start, end: s.comment.start + s.comment.text.trimEnd().length, kind: 'comment' });
  return { text, items };
}

/** Lines that open a block, including a misspelt block word the parser reported as such. */
function headerLines(analysis: Analysis): Set<number> {
  const lines = new Set(analysis.doc.blocks.map((b) => b.headerRange.start.line));
  for (const p of analysis.problems) {
    const s = p.data?.suggestions;
    if (p.code === 'syntax-unknown-statement' && Array.isArray(s) && typeof s[0] === 'string' && isBlockWord(s[0])) lines.add(p.range.start.line);
  }
  return lines;
}

/** Wanted indentation (in spaces) of every line that has something on it; -1 for empty lines. */
function indentation(analysis: Analysis, scanned: ScannedLineItems[]): number[] {
  const headers = headerLines(analysis);
  // A `use` statement sits at the margin and ends the block before it.
  const uses = new Set(analysis.doc.uses.map((u) => u.range.start.line));
  const out = new Array<number>(scanned.length).fill(-1);
  let inBody = false;
  const codeIndent = new Array<number>(scanned.length).fill(-1);
  scanned.forEach((s, n) => {
    const code = s.items.some((i) => i.kind !== 'comment');
    if (!code) return;
    if (headers.has(n)) {
      codeIndent[n] = 0;
      inBody = true;
    } else if (uses.has(n)) {
      codeIndent[n] = 0;
      inBody = false;
    } else codeIndent[n] = inBody ? INDENT.length : 0;
  });
  let next = 0;
  for (let n = scanned.length - 1; n >= 0; n--) {
    if (codeIndent[n]! >= 0) {
      next = codeIndent[n]!;
      out[n] = next;
    } else if (scanned[n]!.items.length > 0) out[n] = next;
  }
  return out;
}

/**
 * True when emptying this line would join its line breaks into one: it follows a lone CR and
 * ends with LF, so `\r` + `\n` would become a single CRLF and two lines would merge.
 */
function emptyingMergesBreaks(doc: SetupDocument, line: number): boolean {
  if (line === 0) return false;
  const start = doc.lineStarts[line]!;
  return doc.text.charCodeAt(start - 1) === 13 && doc.text.charCodeAt(lineEndOffset(doc, line)) === 10;
}

/** Edits for one line: each whitespace run that should differ is replaced on its own. */
function lineEdits(line: number, s: ScannedLineItems, indent: number, keepOneBlank: boolean, out: TextEdit[]): void {
  const { text, items } = s;
  const edit = (from: number, to: number, newText: string): void => {
    if (text.slice(from, to) !== newText) out.push({ range: { start: { line, character: from }, end: { line, character: to } }, newText });
  };
  if (items.length === 0) {
    // A blank line between a lone CR and an LF keeps one space, so that it stays a line.
    if (text.length > 0) edit(0, text.length, keepOneBlank ? ' ' : '');
    return;
  }
  const first = items[0]!;
  edit(0, first.start, ' '.repeat(indent));
  // Where the code now ends, relative to where it ended, so a trailing comment can keep its column.
  let shift = indent - first.start;
  for (let i = 1; i < items.length; i++) {
    const prev = items[i - 1]!;
    const cur = items[i]!;
    const gap = text.slice(prev.end, cur.start);
    let wanted = gap;
    if (cur.kind === 'equals' || prev.kind === 'equals') wanted = ' ';
    else if (cur.kind === 'comment' && gap.length > 0 && shift !== 0) wanted = ' '.repeat(Math.max(1, gap.length - shift));
    edit(prev.end, cur.start, wanted);
    shift += wanted.length - gap.length;
  }
  const last = items[items.length - 1]!;
  edit(last.end, text.length, '');
}

export function formatting(analysis: Analysis, range?: Range): TextEdit[] {
  const doc = analysis.doc;
  const lineCount = doc.lineStarts.length;
  const scanned = Array.from({ length: lineCount }, (_, n) => scan(doc, n));
  const indents = indentation(analysis, scanned);
  // The language service makes a client's range sound (service/requestPositions.ts); the bounds
  // only keep a direct caller's range outside the text from reading outside the scanned lines.
  const from = range ? Math.max(0, range.start.line) : 0;
  const to = range ? Math.min(lineCount - 1, range.end.line) : lineCount - 1;
  const out: TextEdit[] = [];
  for (let n = from; n <= to; n++) lineEdits(n, scanned[n]!, Math.max(0, indents[n]!), emptyingMergesBreaks(doc, n), out);
  return out;
}
