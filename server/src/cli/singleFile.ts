/**
 * The frame the single-file data commands (spectrum, fit, profile) share: one setup file and
 * `--root`/`--out` read the same way, a missing subject said the same way, the output written to
 * --out (with a line on stderr) or printed, and the file's errors listed so exit 1 is explained.
 */
import type { Range } from '../format/ast';
import type { Analysis } from '../eval/analyze';
import type { SetupModel } from '../model/types';
import { type ParsedArgs, stringOption, UsageError } from './args';
import { analyzeFile, reportErrors } from './analyzeFile';
import { rootOption } from './files';
import { cliProblem, FileProblemError } from './fileProblems';
import type { CliContext } from './io';
import { writeOutputFile } from './output';
import { csvTablePieces } from './csvTablePieces';
import { csvNumberTableText, type CsvNumberTable } from '../render/csv';

export interface OpenedFile {
  file: string;
  /** The --out target, when given. */
  out?: string;
  analysis: Analysis;
  model: SetupModel;
}

/** The one setup file of `command`, analysed; a file without a model is a FileProblemError. */
export function openSetupFile(command: string, args: ParsedArgs, ctx: CliContext): OpenedFile {
  if (args.positionals.length !== 1) throw new UsageError(`${command} needs exactly one setup file`);
  const file = args.positionals[0]!;
  const out = stringOption(args, 'out');
  const analysis = analyzeFile(file, ctx, rootOption(stringOption(args, 'root'), ctx.fsys));
  const model = analysis.model;
  if (!model) throw new FileProblemError(file, analysis.problems);
  return { file, ...(out !== undefined ? { out } : {}), analysis, model };
}

/** The file has nothing the command can compute: exit 1 with `message` at `range`. */
export function nothingToCompute(file: string, message: string, range?: Range): never {
  throw new FileProblemError(file, [cliProblem('nothing-to-compute', message, range)]);
}

/**
 * Writes the output to --out (ending in one newline; `wrote` says what on stderr) or prints it;
 * 1 when the file has errors. A table of numbers goes to the file as its text (which ends in a
 * newline), in pieces: csvTablePieces never makes it one string.
 */
export function emitOutput(opened: OpenedFile, output: string | CsvNumberTable, ctx: CliContext, wrote: () => string): number {
  if (opened.out) {
    writeOutputFile(opened.out, typeof output === 'string' ? `${output.trimEnd()}\n` : csvTablePieces(output), ctx.fsys);
    ctx.io.err(`wrote ${wrote()} to ${opened.out}`);
  } else ctx.io.out((typeof output === 'string' ? output : csvNumberTableText(output)).trimEnd());
  return reportErrors(opened.file, opened.analysis, ctx) > 0 ? 1 : 0;
}
