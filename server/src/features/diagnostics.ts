/**
 * Problems → LSP diagnostics: the stable code, the plain message, the exact range, related
 * places (in this document, or in a used file), and the problem's `data` so that quick fixes can use it.
 */
import { type Diagnostic, DiagnosticSeverity, DiagnosticTag } from 'vscode-languageserver-types';
import type { Analysis } from '../eval/analyze';
import type { Problem } from '../format/ast';

const SEVERITY: Record<Problem['severity'], DiagnosticSeverity> = {
  error: DiagnosticSeverity.Error,
  warning: DiagnosticSeverity.Warning,
  info: DiagnosticSeverity.Information,
  hint: DiagnosticSeverity.Hint,
};

/** Codes whose text has no effect; editors fade it out. */
function isUnnecessary(code: string): boolean {
  return code.endsWith('-cannot-act') || code === 'hyperfine-without-nucleus' || code === 'value-extra' || code === 'syntax-duplicate-setting';
}

/** Conversions already made, per problem object: a problem carried over unchanged keeps its diagnostic. */
const converted = new WeakMap<Problem, { uri: string; diagnostic: Diagnostic }>();

export function toDiagnostic(p: Problem, uri: string): Diagnostic {
  const hit = converted.get(p);
  if (hit && hit.uri === uri) return hit.diagnostic;
  const d = convert(p, uri);
  converted.set(p, { uri, diagnostic: d });
  return d;
}

function convert(p: Problem, uri: string): Diagnostic {
  const d: Diagnostic = {
    range: p.range,
    severity: SEVERITY[p.severity] ?? DiagnosticSeverity.Error,
    code: p.code,
    source: 'sublevel',
    message: p.message,
  };
  if (p.related && p.related.length > 0) {
    d.relatedInformation = p.related.map((r) => ({ location: { uri: r.uri ?? uri, range: r.range }, message: r.message }));
  }
  if (p.data) d.data = p.data;
  if (isUnnecessary(p.code)) d.tags = [DiagnosticTag.Unnecessary];
  return d;
}

export function diagnostics(analysis: Analysis, uri: string): Diagnostic[] {
  return analysis.problems.map((p) => toDiagnostic(p, uri));
}
