/** Conversion of Sublevel problems to LSP diagnostics (protocol types only, no connection). */
import { type Diagnostic, DiagnosticSeverity, DiagnosticTag } from 'vscode-languageserver';
import type { Problem } from '../format/ast';

const SEVERITY: Record<Problem['severity'], DiagnosticSeverity> = {
  error: DiagnosticSeverity.Error,
  warning: DiagnosticSeverity.Warning,
  info: DiagnosticSeverity.Information,
  hint: DiagnosticSeverity.Hint,
};

export function toLspDiagnostic(p: Problem, uri: string): Diagnostic {
  const d: Diagnostic = {
    range: p.range,
    severity: SEVERITY[p.severity],
    code: p.code,
    source: 'sublevel',
    message: p.message,
  };
  if (p.related) d.relatedInformation = p.related.map((r) => ({ location: { uri, range: r.range }, message: r.message }));
  if (p.data) d.data = p.data;
  if (p.code.endsWith('-cannot-act') || p.code === 'hyperfine-without-nucleus' || p.code === 'value-extra') d.tags = [DiagnosticTag.Unnecessary];
  return d;
}
