/** One setup file read from the disk and analysed, for the commands that work on a single file. */
import type { Problem } from '../format/ast';
import { analyze, type Analysis, sortProblems } from '../eval/analyze';
import { toDiagnosticResult } from '../eval/evaluate';
import { diskSources } from '../service/workspaceFiles';
import { diagnosticLine, FileProblemError } from './fileProblems';
import type { CliContext } from './io';
import { readSetup } from './readSetup';

/**
 * The analysis of a file; a file that cannot be read is a FileProblemError (exit 1). `use` may
 * read setup files below `root` (default: the file's own folder).
 */
export function analyzeFile(file: string, ctx: CliContext, root?: string): Analysis {
  const read = readSetup(file, ctx.fsys);
  if (!read.ok) throw new FileProblemError(file, [read.problem]);
  return withReaderProblems(analyze(read.text, diskSources(file, root)), read.problems);
}

/** Adds what the reader found (invalid UTF-8) to every place the analysis reports problems. */
export function withReaderProblems(a: Analysis, extra: Problem[]): Analysis {
  if (extra.length === 0) return a;
  const problems = sortProblems([...extra, ...a.problems]);
  const result = a.result ? { ...a.result, diagnostics: problems.map(toDiagnosticResult) } : undefined;
  return { ...a, problems, ...(result ? { result } : {}) };
}

/**
 * For commands whose output is data (CSV, SVG): the file's errors on stderr as file:line:col
 * lines, so exit 1 is explained. Returns how many there are.
 */
export function reportErrors(file: string, a: Analysis, ctx: CliContext): number {
  const errors = a.problems.filter((p) => p.severity === 'error');
  for (const p of errors) ctx.io.err(diagnosticLine(file, p));
  return errors.length;
}

/** Before a "cannot compute" problem: the file's errors, and the words that point to them. */
export function listErrorsFirst(file: string, a: Analysis, ctx: CliContext): string {
  return reportErrors(file, a, ctx) > 0 ? ' (the errors are listed above)' : '';
}
