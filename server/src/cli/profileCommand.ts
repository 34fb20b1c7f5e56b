/** `sublevel profile <file> [--beam NAME] [--out FILE.csv]`: the predicted detector pattern as CSV. */
import { evaluateBeam } from '../eval/beamEvaluation';
import { gJLookup } from '../eval/gJLookup';
import { patternCsv } from '../render';
import { beamAbout } from '../views/diagram';
import { patternView } from '../views/patternView';
import { type CommandSpec, type ParsedArgs, stringOption, UsageError } from './args';
import { OUT_OPTION, ROOT_OPTION, rootOption } from './files';
import { analyzeFile, listErrorsFirst, reportErrors } from './analyzeFile';
import { cliProblem, FileProblemError } from './fileProblems';
import type { CliContext } from './io';
import { writeOutputFile } from './output';
import { selectBeam } from './selectors';

export const profileSpec: CommandSpec = {
  name: 'profile',
  operands: '<file>',
  summary: 'the predicted detector pattern as CSV: position, total, one column per sublevel',
  options: {
    ...ROOT_OPTION,
    beam: { value: 'NAME', help: 'the beam, when the file has more than one' },
    ...OUT_OPTION,
  },
};

export function runProfile(args: ParsedArgs, ctx: CliContext): number {
  if (args.positionals.length !== 1) throw new UsageError('profile needs exactly one setup file');
  const file = args.positionals[0]!;
  const wanted = stringOption(args, 'beam');
  const out = stringOption(args, 'out');
  const analysis = analyzeFile(file, ctx, rootOption(stringOption(args, 'root'), ctx.fsys));
  const model = analysis.model;
  if (!model) throw new FileProblemError(file, analysis.problems);
  if (model.beams.length === 0) {
    throw new FileProblemError(file, [cliProblem('nothing-to-compute', 'the file has no beam; profile needs a `beam` block with level, source, slits, magnet and drift')]);
  }
  const beam = selectBeam(model, wanted);
  const v = patternView(beam.name, evaluateBeam(beam, gJLookup(analysis.result?.levels ?? []), false));
  if (!v) {
    const listed = listErrorsFirst(file, analysis, ctx);
    throw new FileProblemError(file, [cliProblem('nothing-to-compute', `beam '${beam.name}' cannot be computed: it lacks a setting or has an error${listed}`, beam.nameRange)]);
  }
  const csv = patternCsv(v, beamAbout(beam, file), 'profile');
  if (out) {
    writeOutputFile(out, csv, ctx.fsys);
    ctx.io.err(`wrote the detector pattern (${v.positionsM.length} positions) to ${out}`);
  } else ctx.io.out(csv.trimEnd());
  return reportErrors(file, analysis, ctx) > 0 ? 1 : 0;
}
