/** `sublevel fit <file> [--format text|json|csv]`: the file's fits, their best values with uncertainties and the residuals. */
import { EVALUATION_VERSION } from '../eval/resultTypes';
import { fitCsv } from '../render/fitCsv';
import { type CommandSpec, type ParsedArgs, stringOption } from './args';
import { OUT_OPTION, ROOT_OPTION } from './files';
import { jsonText } from './escape';
import { fitReportLines } from './fitReport';
import type { CliContext } from './io';
import { emitOutput, nothingToCompute, openSetupFile } from './singleFile';

const FORMATS = ['text', 'json', 'csv'] as const;

export const FIT_FORMAT = 'sublevel-fit';
export const FIT_VERSION = 1;

export const fitSpec: CommandSpec = {
  name: 'fit',
  operands: '<file>',
  summary: "the file's fits: best values with standard uncertainties, χ², correlations and residuals",
  options: {
    format: { value: 'FORMAT', choices: FORMATS, help: 'text: a readable report (default); json: the sublevel-fit document; csv: one row per parameter, root and point' },
    ...ROOT_OPTION,
    ...OUT_OPTION,
  },
};

export function runFit(args: ParsedArgs, ctx: CliContext): number {
  const format = stringOption(args, 'format', FORMATS) ?? 'text';
  const opened = openSetupFile('fit', args, ctx);
  const { file, analysis, model } = opened;
  if (model.fits.length === 0) nothingToCompute(file, 'the file has no fit; write a `data` block and a `fit` block (docs/fit.md)');
  const fits = analysis.result?.fits ?? [];
  const text =
    format === 'json'
      ? jsonText({ format: FIT_FORMAT, version: FIT_VERSION, evaluation_version: EVALUATION_VERSION, file, fits, diagnostics: analysis.result?.diagnostics.filter((d) => d.code.startsWith('fit-') || d.code.startsWith('data-')) ?? [] })
      : format === 'csv'
        ? fitCsv(fits, file)
        : fitReportLines(file, fits).join('\n');
  return emitOutput(opened, text, ctx, () => `${fits.length} fit${fits.length === 1 ? '' : 's'}`);
}
