/**
 * Fixes for missing punctuation and a missing J: `=` (or a `:` written instead of it),
 * the `:` after a level or line name, the `->` of a line, and J appended to a term.
 */
import type { CodeAction } from 'vscode-languageserver-types';
import { halfText } from '../../eval/halves';
import { lineText } from '../../format/positions';
import { parseLevelDesignation } from '../../physics/configuration';
import { allowedJ, formatJ } from '../../physics/termSymbol';
import { locate } from '../shared/locate';
import { type FixContext, quickFix } from './types';

export function missingEqualsFix(ctx: FixContext): CodeAction[] {
  const r = ctx.problem.range;
  if (r.start.line !== r.end.line) return [];
  if (ctx.problem.data?.replacement === '=') return [quickFix(ctx, "Write '=' instead of ':'", [{ range: r, newText: '=' }], true)];
  const t = locate(ctx.analysis.doc, r.start);
  if (t?.kind === 'key') return [quickFix(ctx, "Add '=' after the key", [{ range: { start: r.end, end: r.end }, newText: ' =' }], true)];
  return [quickFix(ctx, "Add '=' before the value", [{ range: { start: r.start, end: r.start }, newText: '= ' }], true)];
}

export function missingColonFix(ctx: FixContext): CodeAction[] {
  const r = ctx.problem.range;
  const text = lineText(ctx.analysis.doc, r.start.line);
  let at = Math.min(r.start.character, text.length);
  while (at > 0 && /\s/.test(text[at - 1]!)) at--;
  if (at === 0) return [];
  return [quickFix(ctx, "Add ':' after the name", [{ range: { start: { line: r.start.line, character: at }, end: { line: r.start.line, character: at } }, newText: ':' }], true)];
}

export function missingArrowFix(ctx: FixContext): CodeAction[] {
  const r = ctx.problem.range;
  if (r.start.line !== r.end.line) return [];
  // A wrong arrow (`=>`) is replaced; a missing one goes into the gap between the levels.
  const wrong = r.end.character > r.start.character && lineText(ctx.analysis.doc, r.start.line).slice(r.start.character, r.end.character).trim() !== '';
  return [quickFix(ctx, wrong ? "Write '->'" : "Add '->' between the levels", [{ range: r, newText: wrong ? '->' : ' -> ' }], true)];
}

/** `level-needs-j`: the term has no J; offer each J its S and L allow. */
export function addJFix(ctx: FixContext): CodeAction[] {
  const r = ctx.problem.range;
  if (r.start.line !== r.end.line) return [];
  const text = lineText(ctx.analysis.doc, r.start.line).slice(r.start.character, r.end.character);
  const { term } = parseLevelDesignation(text);
  if (!term || term.twoJ !== null) return [];
  const style = /[⁰¹²³⁴⁵⁶⁷⁸⁹]/.test(text) ? 'unicode' : 'ascii';
  const js = allowedJ(term.twoS, term.L);
  return js.map((j) => quickFix(ctx, `Add J = ${halfText(j)}`, [{ range: { start: r.end, end: r.end }, newText: formatJ(j, style) }], js.length === 1));
}
