/** Range helpers for the model layer. */
import type { Position, Range, Spanned } from '../format/ast';

/** The sub-range [start, end) of a single-line span, by UTF-16 offsets into its text. */
export function subRange(span: Spanned, start: number, end: number): Range {
  const line = span.range.start.line;
  const base = span.range.start.character;
  const clamp = (n: number): number => Math.max(0, Math.min(span.text.length, n));
  const s: Position = { line, character: base + clamp(start) };
  const e: Position = { line, character: base + clamp(Math.max(start, end)) };
  return { start: s, end: e };
}
