/**
 * One file of `sublevel eval`, evaluated to the text it prints: the same function runs in the
 * command's own thread and in a batch worker (batchWorker.ts), so both give the same bytes.
 */
import { analyze } from '../eval/analyze';
import { toDiagnosticResult } from '../eval/evaluate';
import { diskSources } from '../service/workspaceFiles';
import { withReaderProblems } from './analyzeFile';
import { jsonText } from './escape';
import { diagnosticLine } from './fileProblems';
import type { CliFileSystem } from './fileSystem';
import { readSetup } from './readSetup';
import { textReport } from './textReport';
import { atOrAbove, type FailOn } from './severityThreshold';

export const EVAL_FORMATS = ['text', 'json', 'jsonl'] as const;
export type EvalFormat = (typeof EVAL_FORMATS)[number];

export interface EvalJob {
  file: string;
  /** The folder `use` may read below (undefined: the file's own folder). */
  root?: string;
  format: EvalFormat;
  /** The least severe finding that fails the file (exit 1); default error. */
  failOn?: FailOn;
}

/** What one file prints, and its exit code (0 no errors, 1 errors or not readable, 3 internal error). */
export interface EvalOutcome {
  out: string[];
  err: string[];
  code: number;
}

/** One line of `--format jsonl`: the file, its error count, and its document or (not read) its problems. */
export interface EvalLine {
  file: string;
  errors: number;
  result?: unknown;
  diagnostics?: unknown[];
  internal_error?: string;
}

export function evaluateForOutput(job: EvalJob, fsys: CliFileSystem): EvalOutcome {
  const { file, format } = job;
  const read = readSetup(file, fsys);
  if (!read.ok) {
    if (format === 'jsonl') return { out: [jsonLine({ file, errors: 1, diagnostics: [toDiagnosticResult(read.problem)] })], err: [], code: 1 };
    return { out: [], err: [diagnosticLine(file, read.problem)], code: 1 };
  }
  const analysis = withReaderProblems(analyze(read.text, diskSources(file, job.root)), read.problems);
  const errors = analysis.problems.filter((p) => p.severity === 'error').length;
  const code = analysis.problems.some((p) => atOrAbove(p.severity, job.failOn ?? 'error')) ? 1 : 0;
  if (!analysis.result) {
    if (format === 'jsonl') return { out: [jsonLine({ file, errors, diagnostics: analysis.problems.map(toDiagnosticResult) })], err: [], code: 1 };
    return { out: [], err: analysis.problems.map((p) => diagnosticLine(file, p)), code: 1 };
  }
  if (format === 'jsonl') return { out: [jsonLine({ file, errors, result: analysis.result })], err: [], code };
  if (format === 'json') return { out: [jsonText(analysis.result)], err: [], code };
  return { out: textReport(file, analysis.result), err: [], code };
}

/** A file whose evaluation failed unexpectedly (a worker that died): reported in its place, exit 3. */
export function internalErrorOutcome(job: EvalJob, message: string): EvalOutcome {
  if (job.format === 'jsonl') return { out: [jsonLine({ file: job.file, errors: 0, internal_error: message })], err: [], code: 3 };
  return { out: [], err: [`${job.file}: internal error (please report it with the file): ${message}`], code: 3 };
}

export function jsonLine(line: EvalLine): string {
  return jsonText(line, 0);
}
