/**
 * A preferred fix is the one an editor applies without asking ("fix all", one keystroke), so it
 * must be right: it is kept preferred only when re-reading the edited text (parse + model, as on
 * a keystroke) shows its problem gone, no new error, and no new problem on other lines. `6s7 6p` → `6s2 6p` would trade one
 * error for another (3P cannot arise from 6s2 6p), so that fix stays offered but not preferred.
 */
import type { CodeAction, TextEdit } from 'vscode-languageserver-types';
import type { Problem, SetupDocument } from '../../format/ast';
import { parseSetup } from '../../format/parser';
import { positionToOffset } from '../../format/positions';
import { buildModel } from '../../model/buildModel';

/** Edits applied as LSP defines them (ranges in the original text); undefined if they overlap. */
function applied(doc: SetupDocument, edits: readonly TextEdit[]): string | undefined {
  const spans = edits
    .map((e) => ({ start: positionToOffset(doc, e.range.start), end: positionToOffset(doc, e.range.end), text: e.newText }))
    .sort((a, b) => b.start - a.start);
  let out = doc.text;
  for (let i = 0; i < spans.length; i++) {
    const s = spans[i]!;
    if (i > 0 && s.end > spans[i - 1]!.start) return undefined;
    out = out.slice(0, s.start) + s.text + out.slice(s.end);
  }
  return out;
}

function problemsOf(text: string): Problem[] | undefined {
  try {
    const doc = parseSetup(text);
    return [...doc.problems, ...buildModel(doc).problems];
  } catch {
    return undefined;
  }
}

/** The document's own problems, read once per document however many fixes are checked. */
const cache = new WeakMap<SetupDocument, Problem[] | undefined>();
function problemsBefore(doc: SetupDocument): Problem[] | undefined {
  if (!cache.has(doc)) cache.set(doc, problemsOf(doc.text));
  return cache.get(doc);
}

function count(problems: readonly Problem[], pick: (p: Problem) => boolean): Map<string, number> {
  const out = new Map<string, number>();
  for (const p of problems) if (pick(p)) out.set(p.code, (out.get(p.code) ?? 0) + 1);
  return out;
}

/** Does applying `fix` remove one `problem.code`, add no error, and add no problem on other lines? */
export function fixHolds(doc: SetupDocument, problem: Problem, fix: CodeAction): boolean {
  const edits = fix.edit?.changes ? Object.values(fix.edit.changes).flat() : [];
  const text = applied(doc, edits);
  if (text === undefined) return false;
  const before = problemsBefore(doc);
  const after = problemsOf(text);
  if (!before || !after) return false;
  const sameCode = (p: Problem): boolean => p.code === problem.code;
  if ((count(after, sameCode).get(problem.code) ?? 0) >= (count(before, sameCode).get(problem.code) ?? 0)) return false;
  const errorsBefore = count(before, (p) => p.severity === 'error');
  for (const [code, n] of count(after, (p) => p.severity === 'error')) if (n > (errorsBefore.get(code) ?? 0)) return false;
  // Off the repaired line nothing may multiply ('selectort' → 'detector' where a detector is
  // already set would add a duplicate); on it, text read for the first time may bring a warning.
  const line = problem.range.start.line;
  const offLine = (list: readonly Problem[]): number => list.filter((p) => p.range.start.line !== line).length;
  if (offLine(after) > offLine(before)) return false;
  // Nor may the text the fix wrote carry a problem it did not have ('lenght' → a second 'length').
  const seen = new Set(before.map((p) => `${p.code}\u0000${p.message}`));
  return !after.some((p) => !seen.has(`${p.code}\u0000${p.message}`) && edits.some((e) => touchesWritten(p, e)));
}

/** Does a problem of the edited text start inside what a one-line edit wrote? */
function touchesWritten(p: Problem, e: TextEdit): boolean {
  if (e.newText.includes('\n') || p.range.start.line !== e.range.start.line) return false;
  const from = e.range.start.character;
  const to = from + e.newText.length;
  return p.range.start.character < to && p.range.end.character > from;
}

/** The same fixes, with `isPreferred` dropped from any that does not hold. */
export function verifiedPreference(doc: SetupDocument, problem: Problem, fixes: CodeAction[]): CodeAction[] {
  return fixes.map((f) => {
    if (!f.isPreferred || fixHolds(doc, problem, f)) return f;
    const { isPreferred: _dropped, ...rest } = f;
    return rest;
  });
}
