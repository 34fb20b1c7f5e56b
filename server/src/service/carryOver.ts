/**
 * Moves the evaluation's problems of an earlier version onto a new version while the new
 * evaluation runs, so that they do not blink out at every keystroke. Lines before the first
 * changed line keep their number, lines after the last changed line shift by the change in
 * line count, and problems on changed lines are dropped. A problem that does not move is
 * passed on as the same object, so a keystroke that keeps the line count copies nothing.
 */
import type { Problem } from '../format/ast';

export function splitLines(text: string): string[] {
  return text.split(/\r\n|\r|\n/);
}

export function carryOver(before: readonly string[], after: readonly string[], problems: readonly Problem[]): Problem[] {
  const min = Math.min(before.length, after.length);
  let prefix = 0;
  while (prefix < min && before[prefix] === after[prefix]) prefix++;
  let suffix = 0;
  while (suffix < min - prefix && before[before.length - 1 - suffix] === after[after.length - 1 - suffix]) suffix++;
  const shift = after.length - before.length;
  const firstSuffixLine = before.length - suffix;
  const map = (line: number): number | undefined => (line < prefix ? line : line >= firstSuffixLine ? line + shift : undefined);
  const out: Problem[] = [];
  for (const p of problems) {
    const start = map(p.range.start.line);
    const end = map(p.range.end.line);
    if (start === undefined || end === undefined || end - start !== p.range.end.line - p.range.start.line) continue;
    // Related places in another file (r.uri) do not move with this file's lines.
    const stays = (r: NonNullable<Problem['related']>[number]): boolean => r.uri !== undefined || (map(r.range.start.line) === r.range.start.line && map(r.range.end.line) === r.range.end.line);
    if (start === p.range.start.line && (p.related ?? []).every(stays)) {
      out.push(p);
      continue;
    }
    const moved: Problem = {
      ...p,
      range: { start: { line: start, character: p.range.start.character }, end: { line: end, character: p.range.end.character } },
    };
    if (p.related) {
      const related = p.related.flatMap((r) => {
        if (r.uri !== undefined) return [r];
        const s = map(r.range.start.line);
        const e = map(r.range.end.line);
        return s === undefined || e === undefined ? [] : [{ ...r, range: { start: { ...r.range.start, line: s }, end: { ...r.range.end, line: e } } }];
      });
      if (related.length > 0) moved.related = related;
      else delete moved.related;
    }
    out.push(moved);
  }
  return out;
}
