/**
 * Positions and ranges as the protocol promises them (non-negative whole numbers inside the
 * document), made from what a client actually sent: fractions floored, a line past the end read
 * as the end of the document, a character past its line's end as that end, a negative number as
 * 0. What cannot be read as a position at all (a missing or non-numeric line or character, a
 * range whose end comes before its start) is nonsense: the request gets its empty answer.
 * Every request that takes a position or range passes it through here (languageService.ts), so
 * features only ever see positions inside the text.
 */
import type { Position, Range } from 'vscode-languageserver-types';
import { lineEndOffset, type LineIndex } from '../format/positions';

/** Far past any text Sublevel analyses (a million characters at most, model/limits.ts). */
const MAX_COORDINATE = 2 ** 31 - 1;

/** A coordinate as a whole number, or undefined when it is no number (null, NaN, a string). */
function whole(v: unknown): number | undefined {
  if (typeof v !== 'number' || Number.isNaN(v)) return undefined;
  // Capped so that no later sum overflows into Infinity (JSON's 1e999 parses as Infinity); clamped to the text later.
  return Math.min(MAX_COORDINATE, Math.max(0, Math.floor(v)));
}

/** Both coordinates as whole numbers, not yet clamped to the text. */
function wholePosition(p: unknown): Position | undefined {
  if (typeof p !== 'object' || p === null) return undefined;
  const { line, character } = p as { line?: unknown; character?: unknown };
  const l = whole(line);
  const c = whole(character);
  return l === undefined || c === undefined ? undefined : { line: l, character: c };
}

function clamp(index: LineIndex, p: Position): Position {
  const last = index.lineStarts.length - 1;
  if (p.line > last) return { line: last, character: lineEndOffset(index, last) - index.lineStarts[last]! };
  const length = lineEndOffset(index, p.line) - index.lineStarts[p.line]!;
  return { line: p.line, character: Math.min(p.character, length) };
}

/** The position inside `index` that `p` means, or undefined when `p` is nonsense. */
export function requestPosition(index: LineIndex, p: unknown): Position | undefined {
  const w = wholePosition(p);
  return w && clamp(index, w);
}

/**
 * A range with both positions as whole numbers, in the order sent and not yet clamped to a text;
 * undefined when either position is nonsense. (An edit's range in `didChange` goes on from here
 * to the text library's own rules, documentSync.ts.)
 */
export function wholeRange(r: unknown): Range | undefined {
  if (typeof r !== 'object' || r === null) return undefined;
  const start = wholePosition((r as { start?: unknown }).start);
  const end = wholePosition((r as { end?: unknown }).end);
  return start && end ? { start, end } : undefined;
}

/** The range inside `index` that `r` means, or undefined when it is nonsense (end before start included). */
export function requestRange(index: LineIndex, r: unknown): Range | undefined {
  const w = wholeRange(r);
  if (!w) return undefined;
  const { start, end } = w;
  if (end.line < start.line || (end.line === start.line && end.character < start.character)) return undefined;
  return { start: clamp(index, start), end: clamp(index, end) };
}
