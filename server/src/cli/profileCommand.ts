/** `sublevel profile <file> [--beam NAME] [--out FILE.csv]`: the predicted detector pattern as CSV. */
import { writeOutputFile } from './output';
import { analyze } from '../eval/analyze';
import { evaluateBeam } from '../eval/beamEvaluation';
import { patternCsv } from '../render';
import { patternView } from '../views/patternView';
import { beamAbout } from '../views/diagram';
import { type ParsedArgs, rejectUnknownOptions, stringOption, UsageError } from './args';
import { readSetupFile } from './files';
import { diskSources } from '../service/workspaceFiles';
import type { CliIO } from './io';
import { selectBeam } from './selectors';
import { gJLookup } from '../eval/gJLookup';

export function runProfile(args: ParsedArgs, io: CliIO): number {
  rejectUnknownOptions(args, ['beam', 'out']);
  if (args.positionals.length !== 1) throw new UsageError('profile needs exactly one setup file');
  const file = args.positionals[0]!;
  const analysis = analyze(readSetupFile(file), diskSources(file));
  if (!analysis.model) throw new UsageError(`${file} could not be read`);
  const beam = selectBeam(analysis.model, stringOption(args, 'beam'));
  const v = patternView(beam.name, evaluateBeam(beam, gJLookup(analysis.result?.levels ?? []), false));
  if (!v) throw new UsageError(`beam '${beam.name}' cannot be computed yet (run: sublevel check ${file})`);
  const csv = patternCsv(v, beamAbout(beam, file), 'profile');
  const out = stringOption(args, 'out');
  if (out) {
    writeOutputFile(out, csv);
    io.err(`wrote the detector pattern (${v.positionsM.length} positions) to ${out}`);
  } else io.out(csv.trimEnd());
  return 0;
}
