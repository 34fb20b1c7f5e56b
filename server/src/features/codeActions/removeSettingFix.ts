/**
 * Removes a setting that cannot act (a quadrupole or octupole constant, a hyperfine constant
 * without a nucleus) or text a setting does not use. Only the setting and the blanks before it
 * go; a line left empty goes too, a comment on it stays.
 */
import type { CodeAction, Range, TextEdit } from 'vscode-languageserver-types';
import type { SettingNode, SetupDocument } from '../../format/ast';
import { lineText, positionToOffset } from '../../format/positions';
import { blockAt } from '../shared/locate';
import { containsRange } from '../shared/names';
import { type FixContext, quickFix } from './types';

/**
 * Edit that removes [from, to) on one line: with the blanks before it when something precedes
 * it, with the blanks after it when it starts the line, and the whole line when nothing else is on it.
 */
export function removeOnLine(doc: SetupDocument, line: number, from: number, to: number): TextEdit {
  const text = lineText(doc, line);
  const before = text.slice(0, from);
  const after = text.slice(to);
  const at = (character: number): { line: number; character: number } => ({ line, character });
  if (before.trim() === '' && after.trim() === '') {
    if (line + 1 < doc.lineStarts.length) return { range: { start: at(0), end: { line: line + 1, character: 0 } }, newText: '' };
    return { range: { start: at(0), end: at(text.length) }, newText: '' };
  }
  if (before.trim() === '') return { range: { start: at(from), end: at(to + (after.length - after.trimStart().length)) }, newText: '' };
  return { range: { start: at(before.trimEnd().length), end: at(to) }, newText: '' };
}

function settingFor(doc: SetupDocument, range: Range, key: string): SettingNode | undefined {
  const block = blockAt(doc, range.start);
  if (!block) return undefined;
  const all = [...block.settings, ...block.levels.flatMap((l) => l.settings)];
  return all.find((s) => s.key.text === key && containsRange(s.range, range));
}

export function removeSettingFix(ctx: FixContext): CodeAction[] {
  const key = ctx.problem.data?.removeSetting;
  if (typeof key !== 'string') return [];
  const doc = ctx.analysis.doc;
  const s = settingFor(doc, ctx.problem.range, key);
  if (!s || s.range.start.line !== s.range.end.line) return [];
  const edit = removeOnLine(doc, s.range.start.line, s.range.start.character, s.range.end.character);
  const cannotAct = ctx.problem.code.endsWith('-cannot-act') || ctx.problem.code === 'hyperfine-without-nucleus';
  return [quickFix(ctx, cannotAct ? `Remove ${key} (it cannot act here)` : `Remove ${key}`, [edit], true)];
}

/** `value-extra`: drop the part of the value the setting does not use. */
export function removeExtraValueFix(ctx: FixContext): CodeAction[] {
  const r = ctx.problem.range;
  if (r.start.line !== r.end.line) return [];
  const doc = ctx.analysis.doc;
  // Only text the problem covers goes; positionToOffset clamps a stale range to the line.
  const written = positionToOffset(doc, r.start) - doc.lineStarts[r.start.line]!;
  const to = positionToOffset(doc, r.end) - doc.lineStarts[r.start.line]!;
  if (to <= written) return [];
  // The comma before an unused list item goes with it (`turns = 40, 5` → `turns = 40`, not `40,`).
  const before = lineText(doc, r.start.line).slice(0, written).trimEnd();
  const from = before.endsWith(',') ? before.length - 1 : written;
  return [quickFix(ctx, 'Remove the unused rest of the value', [removeOnLine(doc, r.start.line, from, to)])];
}
