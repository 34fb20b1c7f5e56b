/**
 * How the server keeps the text of an open document from `didOpen` and `didChange`. A change's
 * range is taken as every request's is (service/requestPositions.ts: fractions floored, negatives
 * read as 0, a missing or non-numeric coordinate is nonsense) and then by the text library's own
 * rules (a line past the end is the end, a character past its line's end is that end, an end
 * before the start swaps with it). The library applies a sound edit itself; it keeps its line
 * table by arithmetic that assumes one, so an edit it would have to clamp or swap is applied here,
 * as a whole new text. A change that names no text or a nonsense range is left out and logged,
 * as a client defect. Versions are taken as sent (a client's own business), even going backwards.
 */
import { TextDocument } from 'vscode-languageserver-textdocument';
import type { TextDocumentContentChangeEvent } from 'vscode-languageserver-protocol';
import { wholeRange } from './service/requestPositions';

export type Warn = (message: string) => void;

function isWholeNumber(v: unknown): boolean {
  return typeof v === 'number' && Number.isInteger(v) && v >= 0;
}

/**
 * One change as the edit to make: the library's own (`edit`) when it is sound, else the whole new
 * text; or why it is left out.
 */
export function soundChange(doc: TextDocument, change: unknown): { edit: TextDocumentContentChangeEvent } | { why: string } {
  if (typeof change !== 'object' || change === null || typeof (change as { text?: unknown }).text !== 'string') return { why: 'it has no text' };
  const { text, range } = change as { text: string; range?: unknown };
  if (range === undefined) return { edit: { text } };
  const whole = wholeRange(range);
  if (!whole) return { why: 'its range is not two positions of whole numbers' };
  const reversed = whole.end.line < whole.start.line || (whole.end.line === whole.start.line && whole.end.character < whole.start.character);
  const [start, end] = reversed ? [whole.end, whole.start] : [whole.start, whole.end];
  const from = doc.offsetAt(start);
  const to = doc.offsetAt(end);
  const raw = range as { start: { line: unknown; character: unknown }; end: { line: unknown; character: unknown } };
  const exact = [raw.start.line, raw.start.character, raw.end.line, raw.end.character].every(isWholeNumber);
  // Sound: as sent, in order, and inside the text (each position is where its offset is).
  if (exact && !reversed && samePosition(doc.positionAt(from), start) && samePosition(doc.positionAt(to), end)) return { edit: { range: { start, end }, text } };
  const old = doc.getText();
  return { edit: { text: old.slice(0, from) + text + old.slice(to) } };
}

function samePosition(a: { line: number; character: number }, b: { line: number; character: number }): boolean {
  return a.line === b.line && a.character === b.character;
}

/** The `create` and `update` that `TextDocuments` takes, with the rules above. */
export function documentSync(warn: Warn): {
  create(uri: string, languageId: string, version: number, content: string): TextDocument;
  update(doc: TextDocument, changes: TextDocumentContentChangeEvent[], version: number): TextDocument;
} {
  return {
    create: (uri, languageId, version, content) => TextDocument.create(uri, languageId, version, typeof content === 'string' ? content : ''),
    update(doc, changes, version) {
      const list: unknown[] = Array.isArray(changes) ? changes : [];
      for (const change of list) {
        const next = soundChange(doc, change);
        if ('why' in next) warn(`sublevel: a change to ${doc.uri} (version ${String(version)}) was left out: ${next.why}.`);
        else TextDocument.update(doc, [next.edit], version);
      }
      return TextDocument.update(doc, [], version);
    },
  };
}
