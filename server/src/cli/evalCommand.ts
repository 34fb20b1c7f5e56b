/** `sublevel eval <file>`: every computed quantity, as a readable report or the versioned JSON document. */
import { analyze } from '../eval/analyze';
import { type ParsedArgs, rejectUnknownOptions, stringOption, UsageError } from './args';
import { readSetupFile, rootOption } from './files';
import { diskSources } from '../service/workspaceFiles';
import type { CliIO } from './io';
import { textReport } from './textReport';

export function runEval(args: ParsedArgs, io: CliIO): number {
  rejectUnknownOptions(args, ['format', 'root']);
  const format = stringOption(args, 'format', ['text', 'json']) ?? 'text';
  if (args.positionals.length !== 1) throw new UsageError('eval needs exactly one setup file');
  const file = args.positionals[0]!;
  const analysis = analyze(readSetupFile(file), diskSources(file, rootOption(stringOption(args, 'root'))));
  const errors = analysis.problems.filter((p) => p.severity === 'error').length;
  if (!analysis.result) {
    for (const p of analysis.problems) io.err(`${file}:${p.range.start.line + 1}:${p.range.start.character + 1} ${p.severity} ${p.code} ${p.message}`);
    return 1;
  }
  if (format === 'json') io.out(JSON.stringify(analysis.result, null, 2));
  else for (const line of textReport(file, analysis.result)) io.out(line);
  return errors > 0 ? 1 : 0;
}
