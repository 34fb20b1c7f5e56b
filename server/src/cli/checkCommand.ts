/**
 * `sublevel check <files or folders…>`: diagnostics for CI. Exit 1 when any error is found.
 * Each file is checked with the files its `use` statements name; a used file's errors are
 * reported once, in that file: when it is checked in the same run, the warning at the `use`
 * line that summarises them is left out. A path that cannot be read or searched is a problem
 * of that path, and the run goes on.
 */
import * as path from 'path';
import type { Problem } from '../format/ast';
import { analyze } from '../eval/analyze';
import { toDiagnosticResult } from '../eval/evaluate';
import { diskSources } from '../service/workspaceFiles';
import { type CommandSpec, type ParsedArgs, stringOption, UsageError } from './args';
import { withReaderProblems } from './analyzeFile';
import { jsonText } from './escape';
import { diagnosticLine } from './fileProblems';
import { findSetupFiles, FOLDERS_ROOT_OPTION, type FoundPath, rootOption } from './files';
import type { CliContext } from './io';
import { readSetup } from './readSetup';
import { sarifReport } from './sarif/sarifReport';
import { atOrAbove, FAIL_ON_OPTION, failOnOption, QUIET_OPTION } from './severityThreshold';

const FORMATS = ['text', 'json', 'sarif'] as const;

export const checkSpec: CommandSpec = {
  name: 'check',
  operands: '<files or folders...>',
  summary: 'report every problem in setup files (folders are searched recursively for *.sublevel); exit 1 if any error',
  options: {
    format: { value: 'FORMAT', choices: FORMATS, help: 'text: one file:line:col line per problem (default); json: one document; sarif: SARIF 2.1.0 for CI (docs/ci.md)' },
    ...FAIL_ON_OPTION,
    ...QUIET_OPTION,
    ...FOLDERS_ROOT_OPTION,
  },
  notes: [
    'SARIF paths are relative to --root if given, else to the git work tree holding the current folder, else to the current folder.',
    'Symbolic links to files and folders are followed; each file and folder is visited once (loops end with a note).',
    'A path that cannot be read or searched is reported as an error of that path; the other paths are still checked.',
  ],
};

/** A `use-has-errors` warning about a file that this run reports itself. */
function reportedElsewhere(p: Problem, checked: ReadonlySet<string>): boolean {
  const location = p.data?.['location'];
  return p.code === 'use-has-errors' && typeof location === 'string' && checked.has(path.resolve(location));
}

function problemsOf(file: string, root: string | undefined, ctx: CliContext, checked: ReadonlySet<string>): { problems: Problem[]; read: boolean } {
  const read = readSetup(file, ctx.fsys);
  if (!read.ok) return { problems: [read.problem], read: false };
  const a = withReaderProblems(analyze(read.text, diskSources(file, root)), read.problems);
  return { problems: a.problems.filter((p) => !reportedElsewhere(p, checked)), read: true };
}

export function runCheck(args: ParsedArgs, ctx: CliContext): number {
  const format = stringOption(args, 'format', FORMATS) ?? 'text';
  const failOn = failOnOption(args);
  const quiet = args.options.has('quiet');
  if (args.positionals.length === 0) throw new UsageError('check needs at least one file or folder');
  const root = rootOption(stringOption(args, 'root'), ctx.fsys);
  const found = findSetupFiles(args.positionals, ctx.fsys);
  // `use` reads below --root, else below the folder named on the command line, else the file's own folder.
  const rootOf = (f: FoundPath): string | undefined => root ?? (f.input === f.path ? undefined : f.input);
  const checked = new Set(found.filter((f) => !f.problem).map((f) => path.resolve(f.path)));
  let failing = 0;
  let errors = 0;
  let files = 0;
  const checkedFiles: { file: string; problems: Problem[] }[] = [];
  for (const f of found) {
    const { problems, read } = f.problem ? { problems: [f.problem], read: false } : problemsOf(f.path, rootOf(f), ctx, checked);
    if (read) files++;
    errors += problems.filter((p) => p.severity === 'error').length;
    failing += problems.filter((p) => atOrAbove(p.severity, failOn)).length;
    const shown = quiet ? problems.filter((p) => atOrAbove(p.severity, failOn)) : problems;
    checkedFiles.push({ file: f.path, problems: shown });
    if (format === 'text') for (const p of shown) ctx.io.out(diagnosticLine(f.path, p));
  }
  if (format === 'json') {
    const report = checkedFiles.map((r) => ({ file: r.file, diagnostics: r.problems.map(toDiagnosticResult) }));
    ctx.io.out(jsonText({ format: 'sublevel-check', version: 1, files: report }));
  } else if (format === 'sarif') ctx.io.out(jsonText(sarifReport(checkedFiles, root)));
  else if (!quiet) {
    const total = checkedFiles.reduce((n, r) => n + r.problems.length, 0);
    const unread = checkedFiles.length - files;
    const notRead = unread > 0 ? ` (${unread} other path${unread === 1 ? '' : 's'} not read)` : '';
    ctx.io.err(`${files} file${files === 1 ? '' : 's'} checked${notRead}: ${errors} error${errors === 1 ? '' : 's'}, ${total - errors} other finding${total - errors === 1 ? '' : 's'}`);
  }
  return failing > 0 ? 1 : 0;
}
