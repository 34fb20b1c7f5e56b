/** `sublevel spectrum <file> [--line NAME] [--field NAME] [--out FILE.csv]`: a line's synthesized spectrum as CSV. */
import { spectrumSamples } from '../eval/spectrumSamples';
import { spectrumWidthsText } from '../eval/spectrumEvaluation';
import { spectrumCsv } from '../render';
import { lineFieldIndex } from '../views/linesView';
import { type CommandSpec, type ParsedArgs, stringOption, UsageError } from './args';
import { analyzeFile, listErrorsFirst, reportErrors } from './analyzeFile';
import { OUT_OPTION, ROOT_OPTION, rootOption } from './files';
import { cliProblem, FileProblemError } from './fileProblems';
import type { CliContext } from './io';
import { writeOutputFile } from './output';
import { selectName } from './selectors';

export const spectrumSpec: CommandSpec = {
  name: 'spectrum',
  operands: '<file>',
  summary: "a line's synthesized spectrum (Voigt line shapes) as CSV: offset, frequency, wavelengths in vacuum and air, intensity",
  options: {
    ...ROOT_OPTION,
    line: { value: 'NAME', help: 'the line; default: the first line with `spectrum = …`' },
    field: { value: 'NAME', help: 'the field or magnet; default: the first one' },
    ...OUT_OPTION,
  },
};

export function runSpectrum(args: ParsedArgs, ctx: CliContext): number {
  if (args.positionals.length !== 1) throw new UsageError('spectrum needs exactly one setup file');
  const file = args.positionals[0]!;
  const out = stringOption(args, 'out');
  const analysis = analyzeFile(file, ctx, rootOption(stringOption(args, 'root'), ctx.fsys));
  const model = analysis.model;
  if (!model) throw new FileProblemError(file, analysis.problems);
  const asked = model.lines.filter((l) => l.spectrum);
  if (asked.length === 0) {
    throw new FileProblemError(file, [cliProblem('nothing-to-compute', 'the file has no line with a spectrum; add `spectrum = across` (or along) under a `line`')]);
  }
  const name = selectName('line', model.lines.map((l) => l.name), stringOption(args, 'line')) ?? asked[0]!.name;
  const line = analysis.result?.lines.find((l) => l.name === name);
  const at = line?.at_fields[lineFieldIndex(line, stringOption(args, 'field'))];
  if (!line || !at?.spectrum) {
    const listed = listErrorsFirst(file, analysis, ctx);
    const lm = model.lines.find((l) => l.name === name);
    const why = lm?.spectrum ? 'cannot be computed: it lacks data or has an error' : 'asks for no spectrum (add `spectrum = across` or along)';
    throw new FileProblemError(file, [cliProblem('nothing-to-compute', `line '${name}' ${why}${listed}`, lm?.nameRange)]);
  }
  const s = at.spectrum;
  const samples = spectrumSamples(s, at.components, line.line_centre_Hz);
  const csv = spectrumCsv(samples, [
    ['file', file],
    ['line', name],
    ['field', `${at.source.kind} ${at.source.name} ${at.field_T} T`],
    ['view', `${s.direction} the field, ${s.light} light`],
    ['widths', spectrumWidthsText(s)],
    ['intensity', 'per Hz, components of unit strength times the angular factor'],
  ]);
  if (out) {
    writeOutputFile(out, csv, ctx.fsys);
    ctx.io.err(`wrote the spectrum of line ${name} (${s.points} samples) to ${out}`);
  } else ctx.io.out(csv.trimEnd());
  return reportErrors(file, analysis, ctx) > 0 ? 1 : 0;
}
