/**
 * `sublevel render <file> [--view levels|pattern|lines] [--level NAME] [--field NAME] [--beam NAME] [--line NAME] [--format svg|csv] [--out FILE]`:
 * the same diagrams the editor panel shows, as standalone SVG for reports (light palette), or the numbers behind them as CSV.
 */
import { suggestNames } from '../format/didYouMean';
import { diagramFor, type DiagramRequest, type DiagramView } from '../views/diagram';
import { type CommandSpec, type ParsedArgs, stringOption, UsageError } from './args';
import { ROOT_OPTION, rootOption } from './files';
import { analyzeFile, listErrorsFirst, reportErrors } from './analyzeFile';
import { cliProblem, FileProblemError } from './fileProblems';
import type { CliContext } from './io';
import { writeOutputFile } from './output';
import { selectBeam, selectField, selectLevel } from './selectors';

export const RENDER_VIEWS = ['levels', 'pattern', 'lines'] as const;
const FORMATS = ['svg', 'csv'] as const;

export const renderSpec: CommandSpec = {
  name: 'render',
  operands: '<file>',
  summary: 'a diagram as SVG (light palette, for reports), or the numbers behind it as CSV',
  options: {
    ...ROOT_OPTION,
    view: { value: 'VIEW', choices: RENDER_VIEWS, help: 'levels: sublevel energies against field (default); pattern: detector pattern; lines: line components' },
    level: { value: 'NAME', help: 'the level to draw (levels view); default: the first beam\'s level, else the first level' },
    field: { value: 'NAME', help: 'the field or magnet to mark; default: the first one' },
    beam: { value: 'NAME', help: 'the beam (pattern view), when the file has more than one' },
    line: { value: 'NAME', help: 'the line (lines view); default: the first one' },
    format: { value: 'FORMAT', choices: FORMATS, help: 'svg (default) or csv' },
    out: { value: 'FILE', help: 'write to FILE (atomically: the old file stays if writing fails) instead of stdout' },
  },
};

/** The panel's wording points at the editor; on the command line the file's errors are printed instead. */
function commandLineWording(message: string): string {
  return message.replace(/;? ?see the Problems view\.?$/, '').replace(/\.$/, '');
}

export function runRender(args: ParsedArgs, ctx: CliContext): number {
  if (args.positionals.length !== 1) throw new UsageError('render needs exactly one setup file');
  const file = args.positionals[0]!;
  const view = (stringOption(args, 'view', RENDER_VIEWS) ?? 'levels') as DiagramView;
  const format = stringOption(args, 'format', FORMATS) ?? 'svg';
  const out = stringOption(args, 'out');
  const analysis = analyzeFile(file, ctx, rootOption(stringOption(args, 'root'), ctx.fsys));
  const model = analysis.model;
  if (!model) throw new FileProblemError(file, analysis.problems);
  const req: DiagramRequest = { view, theme: 'export' };
  const level = stringOption(args, 'level');
  if (level !== undefined) req.level = selectLevel(model, level);
  const field = selectField(model, stringOption(args, 'field'));
  if (field) req.marker = field;
  if (view === 'pattern') {
    if (model.beams.length === 0) throw new FileProblemError(file, [cliProblem('nothing-to-compute', 'No beam to draw: add a `beam` block with level, source, slits, magnet and drift')]);
    req.beam = selectBeam(model, stringOption(args, 'beam'));
  }
  const line = stringOption(args, 'line');
  if (line !== undefined) {
    const names = model.lines.map((l) => l.name);
    if (!names.includes(line)) {
      const hint = suggestNames(line, names);
      throw new UsageError(`no line named '${line}'${hint.length ? ` — did you mean ${hint.map((h) => `'${h}'`).join(' or ')}?` : ''}`);
    }
    req.lineName = line;
  }
  const d = diagramFor(analysis, req);
  if (!d.ok) {
    const listed = listErrorsFirst(file, analysis, ctx);
    throw new FileProblemError(file, [cliProblem('nothing-to-compute', `${commandLineWording(d.message)}${listed}`)]);
  }
  const text = format === 'svg' ? d.svg : d.csv;
  if (out) {
    writeOutputFile(out, text, ctx.fsys);
    ctx.io.err(`wrote the ${view} diagram${format === 'csv' ? ' data' : ''} to ${out}`);
  } else ctx.io.out(text);
  return reportErrors(file, analysis, ctx) > 0 ? 1 : 0;
}
