/** `sublevel eval <file>`: every computed quantity, as a readable report or the versioned JSON document. */
import { type CommandSpec, type ParsedArgs, stringOption, UsageError } from './args';
import { ROOT_OPTION, rootOption } from './files';
import { analyzeFile } from './analyzeFile';
import { jsonText } from './escape';
import { diagnosticLine } from './fileProblems';
import type { CliContext } from './io';
import { textReport } from './textReport';
import { atOrAbove, FAIL_ON_OPTION, failOnOption } from './severityThreshold';

const FORMATS = ['text', 'json'] as const;

export const evalSpec: CommandSpec = {
  name: 'eval',
  operands: '<file>',
  summary: 'every computed quantity of one setup file: g-factors, sublevels, beams, lines, resonances',
  options: { format: { value: 'FORMAT', choices: FORMATS, help: 'text: a readable report (default); json: the versioned document (docs/schema)' }, ...FAIL_ON_OPTION, ...ROOT_OPTION },
};

export function runEval(args: ParsedArgs, ctx: CliContext): number {
  const format = stringOption(args, 'format', FORMATS) ?? 'text';
  const failOn = failOnOption(args);
  if (args.positionals.length !== 1) throw new UsageError('eval needs exactly one setup file');
  const file = args.positionals[0]!;
  const analysis = analyzeFile(file, ctx, rootOption(stringOption(args, 'root'), ctx.fsys));
  if (!analysis.result) {
    for (const p of analysis.problems) ctx.io.err(diagnosticLine(file, p));
    return 1;
  }
  if (format === 'json') ctx.io.out(jsonText(analysis.result));
  else for (const line of textReport(file, analysis.result)) ctx.io.out(line);
  return analysis.problems.some((p) => atOrAbove(p.severity, failOn)) ? 1 : 0;
}
