/**
 * Offset <-> LSP position conversion. Offsets are UTF-16 code-unit indexes into the text
 * (what JavaScript strings use), so a position's `character` is the same unit the protocol uses.
 * Line breaks are `\r\n`, `\n` or a lone `\r`, as in the protocol.
 */
import type { Position, Range } from './ast';

/** Anything that carries the text and its line starts, e.g. a `SetupDocument`. */
export interface LineIndex {
  text: string;
  lineStarts: number[];
}

/** Offsets at which each line starts; always at least one entry (0). */
export function computeLineStarts(text: string): number[] {
  const starts = [0];
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 13 /* \r */) {
      if (text.charCodeAt(i + 1) === 10) i++;
      starts.push(i + 1);
    } else if (c === 10 /* \n */) {
      starts.push(i + 1);
    }
  }
  return starts;
}

/** True when a line starts at `offset`: after `\n`, or after a `\r` that no `\n` follows (as `computeLineStarts` counts). */
function startsLine(text: string, offset: number): boolean {
  const before = text.charCodeAt(offset - 1);
  return before === 10 || (before === 13 && text.charCodeAt(offset) !== 10);
}

/**
 * The line starts of `text`, an edit of a text whose line starts were `before`: the two texts
 * share their first `prefix` and last `suffix` characters. Only the changed part is scanned; the
 * starts before it are kept and those after it moved by the change in length. (Whether an offset
 * starts a line depends on the character before it and the one at it, hence the one-character
 * margins.)
 */
export function lineStartsAfterEdit(before: readonly number[], oldLength: number, text: string, prefix: number, suffix: number): number[] {
  const starts: number[] = [0];
  let i = 1;
  while (i < before.length && before[i]! <= prefix - 1) starts.push(before[i++]!);
  const newEnd = text.length - suffix;
  for (let o = Math.max(1, prefix); o <= newEnd; o++) if (startsLine(text, o)) starts.push(o);
  const oldEnd = oldLength - suffix;
  const shift = text.length - oldLength;
  while (i < before.length && before[i]! <= oldEnd) i++;
  for (; i < before.length; i++) starts.push(before[i]! + shift);
  return starts;
}

/** Offset just past the last character of `line`, before its line break. */
export function lineEndOffset(index: LineIndex, line: number): number {
  const { text, lineStarts } = index;
  if (line < 0) return 0;
  if (line >= lineStarts.length - 1) return text.length;
  let end = lineStarts[line + 1]!;
  if (end > 0 && text.charCodeAt(end - 1) === 10) end--;
  if (end > lineStarts[line]! && text.charCodeAt(end - 1) === 13) end--;
  return end;
}

/** The text of one line without its line break ('' for a line number out of range). */
export function lineText(index: LineIndex, line: number): string {
  if (line < 0 || line >= index.lineStarts.length) return '';
  return index.text.slice(index.lineStarts[line], lineEndOffset(index, line));
}

/** Position of an offset; offsets outside the text are clamped to its ends. */
export function offsetToPosition(index: LineIndex, offset: number): Position {
  const { lineStarts } = index;
  const o = Math.max(0, Math.min(index.text.length, Math.floor(offset)));
  let lo = 0;
  let hi = lineStarts.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (lineStarts[mid]! <= o) lo = mid;
    else hi = mid - 1;
  }
  return { line: lo, character: o - lineStarts[lo]! };
}

/** Offset of a position; a character past the line's end is clamped to the end of that line. */
export function positionToOffset(index: LineIndex, pos: Position): number {
  const { lineStarts } = index;
  if (pos.line < 0) return 0;
  if (pos.line >= lineStarts.length) return index.text.length;
  const start = lineStarts[pos.line]!;
  const end = lineEndOffset(index, pos.line);
  return Math.max(start, Math.min(end, start + Math.max(0, pos.character)));
}

export function rangeFromOffsets(index: LineIndex, start: number, end: number): Range {
  return { start: offsetToPosition(index, start), end: offsetToPosition(index, end) };
}

/** Negative when a is before b, zero when equal, positive when after. */
export function comparePositions(a: Position, b: Position): number {
  return a.line !== b.line ? a.line - b.line : a.character - b.character;
}

/** True when pos lies in [start, end] (both ends included, which suits hovers at a word's end). */
export function rangeContains(range: Range, pos: Position): boolean {
  return comparePositions(range.start, pos) <= 0 && comparePositions(pos, range.end) <= 0;
}

/** `line:character-line:character`, 0-based, for messages and tests. */
export function formatRange(range: Range): string {
  return `${range.start.line}:${range.start.character}-${range.end.line}:${range.end.character}`;
}
