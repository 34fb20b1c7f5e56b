/** What every quick-fix builder gets: the analysis, the document's URI and the problem to fix. */
import type { CodeAction, Diagnostic, TextEdit } from 'vscode-languageserver-types';
import { CodeActionKind } from 'vscode-languageserver-types';
import type { Analysis } from '../../eval/analyze';
import type { Problem } from '../../format/ast';

export interface FixContext {
  analysis: Analysis;
  uri: string;
  /** The diagnostic as the client sent it (attached to the action). */
  diagnostic: Diagnostic;
  /** The same problem as this analysis knows it (its data is authoritative). */
  problem: Problem;
}

export type FixBuilder = (ctx: FixContext) => CodeAction[];

export function quickFix(ctx: FixContext, title: string, edits: TextEdit[], preferred = false): CodeAction {
  return {
    title,
    kind: CodeActionKind.QuickFix,
    diagnostics: [ctx.diagnostic],
    ...(preferred ? { isPreferred: true } : {}),
    edit: { changes: { [ctx.uri]: edits } },
  };
}
