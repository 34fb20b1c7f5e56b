/** `sublevel profile <file> [--beam NAME] [--out FILE.csv]`: the predicted detector pattern as CSV. */
import { evaluateBeam } from '../eval/beamEvaluation';
import { gJLookup } from '../eval/gJLookup';
import { patternTable } from '../render';
import { beamAbout } from '../views/diagram';
import { patternView } from '../views/patternView';
import { type CommandSpec, type ParsedArgs, stringOption } from './args';
import { OUT_OPTION, ROOT_OPTION } from './files';
import { listErrorsFirst } from './analyzeFile';
import type { CliContext } from './io';
import { selectBeam } from './selectors';
import { emitOutput, nothingToCompute, openSetupFile } from './singleFile';

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
  const opened = openSetupFile('profile', args, ctx);
  const { file, analysis, model } = opened;
  if (model.beams.length === 0) nothingToCompute(file, 'the file has no beam; profile needs a `beam` block with level, source, slits, magnet and drift');
  const beam = selectBeam(model, stringOption(args, 'beam'));
  const v = patternView(beam.name, evaluateBeam(beam, gJLookup(analysis.result?.levels ?? []), false));
  if (!v) {
    const listed = listErrorsFirst(file, analysis, ctx);
    return nothingToCompute(file, `beam '${beam.name}' cannot be computed: it lacks a setting or has an error${listed}`, beam.nameRange);
  }
  return emitOutput(opened, patternTable(v, beamAbout(beam, file), 'profile'), ctx, () => `the detector pattern (${v.positionsM.length} positions)`);
}
