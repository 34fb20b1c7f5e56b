/**
 * Code actions: quick fixes chosen by the problem's stable code (never by its message), and
 * the "convert to another unit" refactoring for the quantity at the cursor. The problem's
 * data is taken from this analysis, so a client that drops `Diagnostic.data` still gets fixes.
 */
import { type CodeAction, CodeActionKind, type Diagnostic, type Range } from 'vscode-languageserver-types';
import type { Analysis } from '../eval/analyze';
import type { Problem } from '../format/ast';
import { convertUnitActions } from './codeActions/convertUnit';
import { addJFix, missingArrowFix, missingColonFix, missingEqualsFix } from './codeActions/punctuationFixes';
import { removeExtraValueFix, removeSettingFix } from './codeActions/removeSettingFix';
import { resolvingGradientFix } from './codeActions/resolvingGradientFix';
import { suggestionFixes } from './codeActions/suggestionFixes';
import type { FixBuilder, FixContext } from './codeActions/types';
import { verifiedPreference } from './codeActions/verifyPreferred';
import { sameRange } from './shared/names';

/**
 * Fix builders per problem code. Codes not listed get a removal when their data names a
 * setting to remove (`data.removeSetting`), else fixes from `data.suggestions` if they have any.
 */
const FIXES: Readonly<Record<string, FixBuilder>> = {
  'quadrupole-cannot-act': removeSettingFix,
  'octupole-cannot-act': removeSettingFix,
  'hyperfine-without-nucleus': removeSettingFix,
  'value-extra': removeExtraValueFix,
  'syntax-missing-equals': missingEqualsFix,
  'syntax-missing-colon': missingColonFix,
  'syntax-missing-arrow': missingArrowFix,
  'level-needs-j': addJFix,
  'beam-unresolved': resolvingGradientFix,
  'beam-one-peak': resolvingGradientFix,
};

export interface CodeActionRequest {
  range: Range;
  diagnostics: Diagnostic[];
  /** Kinds the client asked for (e.g. only quick fixes); all when absent. */
  only?: string[];
}

function wants(only: string[] | undefined, kind: string): boolean {
  return !only || only.some((k) => kind === k || kind.startsWith(`${k}.`));
}

/** The analysis's own problem for a diagnostic the client sent back. */
function problemFor(analysis: Analysis, d: Diagnostic): Problem | undefined {
  return analysis.problems.find((p) => p.code === d.code && sameRange(p.range, d.range));
}

export function codeActions(analysis: Analysis, uri: string, request: CodeActionRequest): CodeAction[] {
  const out: CodeAction[] = [];
  if (wants(request.only, CodeActionKind.QuickFix)) {
    for (const diagnostic of request.diagnostics) {
      if (diagnostic.source !== undefined && diagnostic.source !== 'sublevel') continue;
      const problem = problemFor(analysis, diagnostic);
      if (!problem) continue;
      const ctx: FixContext = { analysis, uri, diagnostic, problem };
      const builder = FIXES[problem.code] ?? (typeof problem.data?.removeSetting === 'string' ? removeSettingFix : suggestionFixes);
      out.push(...verifiedPreference(analysis.doc, problem, builder(ctx)));
    }
  }
  if (wants(request.only, CodeActionKind.RefactorRewrite)) out.push(...convertUnitActions(analysis, uri, request.range));
  return out;
}
