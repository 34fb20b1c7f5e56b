/** `sublevel trap <file> [--trap NAME] [--format text|json|csv]`: the summary of each trap, per sublevel (docs/traps.md). */
import { EVALUATION_VERSION } from '../eval/resultTypes';
import { trapCsv } from '../render';
import { type CommandSpec, type ParsedArgs, stringOption, UsageError } from './args';
import { analyzeFile, reportErrors } from './analyzeFile';
import { jsonText } from './escape';
import { OUT_OPTION, ROOT_OPTION, rootOption } from './files';
import { cliProblem, FileProblemError } from './fileProblems';
import type { CliContext } from './io';
import { writeOutputFile } from './output';
import { selectName } from './selectors';
import { trapReport } from './trapReport';

const FORMATS = ['text', 'json', 'csv'] as const;

export const TRAP_FORMAT = 'sublevel-trap';
export const TRAP_VERSION = 1;

export const trapSpec: CommandSpec = {
  name: 'trap',
  operands: '<file>',
  summary: 'magnetic traps: which sublevels are held, levitation gradient, depth, frequencies, sag, RF cut and Majorana loss',
  options: {
    trap: { value: 'NAME', help: 'only this trap; default: every trap of the file' },
    format: { value: 'FORMAT', choices: FORMATS, help: 'text: a readable report (default); json: the sublevel-trap document; csv: one row per trap and sublevel' },
    ...ROOT_OPTION,
    ...OUT_OPTION,
  },
};

export function runTrap(args: ParsedArgs, ctx: CliContext): number {
  const format = stringOption(args, 'format', FORMATS) ?? 'text';
  if (args.positionals.length !== 1) throw new UsageError('trap needs exactly one setup file');
  const file = args.positionals[0]!;
  const out = stringOption(args, 'out');
  const analysis = analyzeFile(file, ctx, rootOption(stringOption(args, 'root'), ctx.fsys));
  const model = analysis.model;
  if (!model) throw new FileProblemError(file, analysis.problems);
  if (model.traps.length === 0) {
    throw new FileProblemError(file, [cliProblem('nothing-to-compute', 'the file has no trap; write a `trap` block with its sources and level (docs/traps.md)')]);
  }
  const wanted = stringOption(args, 'trap');
  const name = wanted !== undefined ? selectName('trap', model.traps.map((t) => t.name), wanted) : undefined;
  const traps = (analysis.result?.traps ?? []).filter((t) => name === undefined || t.name === name);
  const text =
    format === 'json'
      ? jsonText({
          format: TRAP_FORMAT,
          version: TRAP_VERSION,
          evaluation_version: EVALUATION_VERSION,
          file,
          traps,
          diagnostics: analysis.result?.diagnostics.filter((d) => d.code.startsWith('trap-')) ?? [],
        })
      : format === 'csv'
        ? trapCsv(traps, file).trimEnd()
        : [`Sublevel traps of ${file}`, ...traps.flatMap(trapReport)].join('\n');
  if (out) {
    writeOutputFile(out, `${text}\n`, ctx.fsys);
    ctx.io.err(`wrote ${traps.length} trap${traps.length === 1 ? '' : 's'} to ${out}`);
  } else ctx.io.out(text);
  return reportErrors(file, analysis, ctx) > 0 ? 1 : 0;
}
