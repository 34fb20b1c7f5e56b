/**
 * `sublevel check <files or folders…>`: diagnostics for CI. Exit 1 when any error is found.
 * Each file is checked with the files its `use` statements name; a used file's errors are
 * reported once, in that file: when it is checked in the same run, the warning at the `use`
 * line that summarises them is left out.
 */
import * as path from 'path';
import type { Problem } from '../format/ast';
import { analyze } from '../eval/analyze';
import { toDiagnosticResult } from '../eval/evaluate';
import { diskSources } from '../service/workspaceFiles';
import { type ParsedArgs, rejectUnknownOptions, stringOption, UsageError } from './args';
import { collectSetupFiles, readSetupFile, rootOption } from './files';
import type { CliIO } from './io';

/** A `use-has-errors` warning about a file that this run reports itself. */
function reportedElsewhere(p: Problem, checked: ReadonlySet<string>): boolean {
  const location = p.data?.['location'];
  return p.code === 'use-has-errors' && typeof location === 'string' && checked.has(path.resolve(location));
}

export function runCheck(args: ParsedArgs, io: CliIO): number {
  rejectUnknownOptions(args, ['format', 'root']);
  const format = stringOption(args, 'format', ['text', 'json']) ?? 'text';
  if (args.positionals.length === 0) throw new UsageError('check needs at least one file or folder');
  const root = rootOption(stringOption(args, 'root'));
  // `use` reads below --root, else below the folder given (for a folder) or the file's own folder.
  const rootOf = new Map<string, string | undefined>();
  for (const input of args.positionals) {
    for (const f of collectSetupFiles([input])) if (!rootOf.has(f)) rootOf.set(f, root ?? (f === input ? undefined : input));
  }
  const files = [...rootOf.keys()];
  const checked = new Set(files.map((f) => path.resolve(f)));
  let errors = 0;
  const report: { file: string; diagnostics: ReturnType<typeof toDiagnosticResult>[] }[] = [];
  for (const file of files) {
    const problems = analyze(readSetupFile(file), diskSources(file, rootOf.get(file))).problems.filter((p) => !reportedElsewhere(p, checked));
    errors += problems.filter((p) => p.severity === 'error').length;
    const diagnostics = problems.map(toDiagnosticResult);
    report.push({ file, diagnostics });
    if (format === 'text') {
      for (const d of diagnostics) io.out(`${file}:${d.line}:${d.column} ${d.severity} ${d.code} ${d.message}`);
    }
  }
  if (format === 'json') io.out(JSON.stringify({ format: 'sublevel-check', version: 1, files: report }, null, 2));
  else {
    const total = report.reduce((n, r) => n + r.diagnostics.length, 0);
    io.err(`${files.length} file${files.length === 1 ? '' : 's'} checked: ${errors} error${errors === 1 ? '' : 's'}, ${total - errors} other finding${total - errors === 1 ? '' : 's'}`);
  }
  return errors > 0 ? 1 : 0;
}
