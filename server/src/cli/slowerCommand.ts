/**
 * `sublevel slower <file> [--slower NAME] [--format text|json|csv] [--out FILE]`: a slower's ideal
 * field profile, length, laser detuning, one atom's flight and the check of its coils (docs/slower.md).
 */
import { EVALUATION_FORMAT } from '../eval/resultTypes';
import { slowerReport } from '../eval/slowerText';
import { slowerCsv } from '../render';
import { type CommandSpec, type ParsedArgs, stringOption, UsageError } from './args';
import { analyzeFile, listErrorsFirst, reportErrors } from './analyzeFile';
import { escapeControls, jsonText } from './escape';
import { OUT_OPTION, ROOT_OPTION, rootOption } from './files';
import { cliProblem, FileProblemError } from './fileProblems';
import type { CliContext } from './io';
import { writeOutputFile } from './output';
import { selectName } from './selectors';

const FORMATS = ['text', 'json', 'csv'] as const;

export const slowerSpec: CommandSpec = {
  name: 'slower',
  operands: '<file>',
  summary: "a slower's ideal field profile, length, laser detuning and coil check",
  options: {
    ...ROOT_OPTION,
    slower: { value: 'NAME', help: 'the slower; default: the first one' },
    format: { value: 'FORMAT', choices: FORMATS, help: 'text (default); json: the slower\u2019s result; csv: z_m, B_ideal_T, B_coils_T (when the slower lists sources), resonant_speed_m_per_s, needed_deceleration_m_per_s2, flight_speed_m_per_s' },
    ...OUT_OPTION,
  },
};

export function runSlower(args: ParsedArgs, ctx: CliContext): number {
  if (args.positionals.length !== 1) throw new UsageError('slower needs exactly one setup file');
  const file = args.positionals[0]!;
  const format = stringOption(args, 'format', FORMATS) ?? 'text';
  const out = stringOption(args, 'out');
  const analysis = analyzeFile(file, ctx, rootOption(stringOption(args, 'root'), ctx.fsys));
  const model = analysis.model;
  if (!model) throw new FileProblemError(file, analysis.problems);
  if (model.slowers.length === 0) {
    throw new FileProblemError(file, [cliProblem('nothing-to-compute', 'the file has no slower; add a `slower` block with line, capture and final (docs/slower.md)')]);
  }
  const name = selectName('slower', model.slowers.map((s) => s.name), stringOption(args, 'slower')) ?? model.slowers[0]!.name;
  const result = analysis.result?.slowers?.find((s) => s.name === name);
  if (!result?.computed && format !== 'json') {
    const listed = listErrorsFirst(file, analysis, ctx);
    throw new FileProblemError(file, [cliProblem('nothing-to-compute', `slower '${name}' cannot be computed: it lacks data or has an error${listed}`, model.slowers.find((s) => s.name === name)?.nameRange)]);
  }
  const diagnostics = analysis.result?.diagnostics ?? [];
  const text =
    format === 'csv'
      ? slowerCsv(result!, file).trimEnd()
      : format === 'json'
        ? jsonText({ format: EVALUATION_FORMAT, file, slower: result, diagnostics }, 1)
        : escapeControls([...slowerReport(result!), ...diagnostics.filter((d) => d.code.startsWith('slower-')).map((d) => `  ${d.line}:${d.column} ${d.severity} ${d.code} ${d.message}`)].join('\n'));
  if (out) {
    writeOutputFile(out, text + '\n', ctx.fsys);
    ctx.io.err(`wrote slower ${name} (${format}) to ${out}`);
  } else ctx.io.out(text);
  return reportErrors(file, analysis, ctx) > 0 ? 1 : 0;
}
