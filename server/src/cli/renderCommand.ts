/**
 * `sublevel render <file> --view levels|pattern [--level NAME] [--field NAME] [--beam NAME] [--out FILE.svg]`:
 * the same diagrams the editor panel shows, as standalone SVG for reports (light palette).
 */
import { writeOutputFile } from './output';
import { analyze } from '../eval/analyze';
import { evaluateBeam } from '../eval/beamEvaluation';
import { renderLevels, renderPattern } from '../render';
import { levelsView } from '../views/levelsView';
import { patternView } from '../views/patternView';
import { type ParsedArgs, rejectUnknownOptions, stringOption, UsageError } from './args';
import { readSetupFile } from './files';
import type { CliIO } from './io';
import { gJLookup, selectBeam, selectField, selectLevel } from './selectors';

export const RENDER_VIEWS = ['levels', 'pattern'] as const;

export function runRender(args: ParsedArgs, io: CliIO): number {
  rejectUnknownOptions(args, ['view', 'level', 'field', 'beam', 'out']);
  if (args.positionals.length !== 1) throw new UsageError('render needs exactly one setup file');
  const file = args.positionals[0]!;
  const view = stringOption(args, 'view', RENDER_VIEWS) ?? 'levels';
  const analysis = analyze(readSetupFile(file));
  const model = analysis.model;
  if (!model) throw new UsageError(`${file} could not be read`);
  const gJOf = gJLookup(analysis);
  let svg: string;
  if (view === 'levels') {
    const firstBeamLevel = model.beams.find((b) => b.level)?.level;
    const level = selectLevel(model, stringOption(args, 'level'), stringOption(args, 'level') ? undefined : firstBeamLevel ?? model.species[0]?.levels[0]);
    const v = levelsView(level, gJOf(level), model.settings, selectField(model, stringOption(args, 'field')));
    if (!v) throw new UsageError(`level '${level.name}' has problems to fix first (run: sublevel check ${file})`);
    svg = renderLevels(v.data, { kind: 'export' });
  } else {
    const beam = selectBeam(model, stringOption(args, 'beam'));
    const v = patternView(beam.name, evaluateBeam(beam, gJOf));
    if (!v) throw new UsageError(`beam '${beam.name}' cannot be computed yet (run: sublevel check ${file})`);
    svg = renderPattern(v, { kind: 'export' });
  }
  const out = stringOption(args, 'out');
  if (out) {
    writeOutputFile(out, svg);
    io.err(`wrote the ${view} diagram to ${out}`);
  } else io.out(svg);
  return 0;
}
