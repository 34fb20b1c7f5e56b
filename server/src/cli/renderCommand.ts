/**
 * `sublevel render <file> [--view levels|pattern|lines|resonance|residuals|fieldmap] [selectors…] [--from B] [--to B] [--unit G|mT|uT|nT|T] [--format svg|csv|png] [--out FILE]`:
 * the same diagrams the editor panel shows, as standalone SVG for reports (light palette), as PNG at print resolution,
 * or the numbers behind them as CSV.
 */
import { DIAGRAM_VIEWS, diagramFor, type DiagramRequest, type DiagramView } from '../views/diagram';
import { type CommandSpec, type ParsedArgs, stringOption, UsageError } from './args';
import { OUT_OPTION, ROOT_OPTION, rootOption } from './files';
import { analyzeFile, listErrorsFirst, reportErrors } from './analyzeFile';
import { cliProblem, FileProblemError } from './fileProblems';
import type { CliContext } from './io';
import { writeOutputFile } from './output';
import { PNG_SCALE, svgToPng } from './pngExport';
import { readFieldOption } from './fieldOption';
import { FIELD_UNIT_CHOICES, fieldUnitOf } from '../render/fieldUnits';
import { selectBeam, selectField, selectLevel, selectName, selectSources } from './selectors';
import { refuseOptionsOfOtherViews } from './renderViewOptions';

export const RENDER_VIEWS = DIAGRAM_VIEWS;
const FORMATS = ['svg', 'csv', 'png'] as const;

export const renderSpec: CommandSpec = {
  name: 'render',
  operands: '<file>',
  summary: 'a diagram as SVG (light palette, for reports) or PNG (print resolution), or the numbers behind it as CSV',
  options: {
    ...ROOT_OPTION,
    view: { value: 'VIEW', choices: RENDER_VIEWS, help: 'levels: sublevel energies against field (default); pattern: detector pattern; lines: line components; resonance: a transition frequency against field; residuals: a fit\'s data, model and residuals; fieldmap: |B| along a line through the field sources, the sources drawn beside it; slower: a slower\'s field profile and speeds along it' },
    level: { value: 'NAME', help: 'the level to draw (levels view); default: the first beam\'s level, else the first level' },
    field: { value: 'NAME', help: 'the field or magnet to mark (levels view) or to compute the line at (lines view); default: the first one' },
    beam: { value: 'NAME', help: 'the beam (pattern view), when the file has more than one' },
    line: { value: 'NAME', help: 'the line (lines view); default: the first one' },
    resonance: { value: 'NAME', help: 'the resonance (resonance view); default: the first one' },
    fit: { value: 'NAME', help: 'the fit (residuals view); default: the first fit with residuals (a one-resonance calibration has none)' },
    source: { value: 'NAMES', help: 'the field sources to draw (fieldmap view), comma-separated; default: all' },
    scale: { value: 'SCALE', choices: ['auto', 'linear', 'log'], help: 'the |B| axis of the fieldmap view: log when the field spans orders of magnitude (auto, the default), or as asked' },
    slower: { value: 'NAME', help: 'the slower (slower view); default: the first one' },
    from: { value: 'FIELD', help: 'start of the field axis (levels view), e.g. 0 or 10G; the resonance view spans the block\'s own `range`' },
    to: { value: 'FIELD', help: 'end of the field axis (levels view), e.g. 50G or 0.1T' },
    unit: { value: 'UNIT', choices: FIELD_UNIT_CHOICES, help: 'unit of the field axis (levels view) or of |B| (fieldmap view): G, mT, uT (or µT), nT or T' },
    format: { value: 'FORMAT', choices: FORMATS, help: 'svg (default), csv, or png (needs --out and the system Chromium)' },
    ...OUT_OPTION,
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
  const req: DiagramRequest = { view, theme: 'export', source: file };
  const fromText = stringOption(args, 'from');
  const toText = stringOption(args, 'to');
  refuseOptionsOfOtherViews(view, args);
  if (fromText !== undefined) req.fromT = readFieldOption('from', fromText);
  if (toText !== undefined) req.toT = readFieldOption('to', toText);
  if (req.fromT !== undefined && req.toT !== undefined && !(req.toT > req.fromT)) throw new UsageError('--to must be a larger field than --from');
  const unit = stringOption(args, 'unit', FIELD_UNIT_CHOICES);
  if (unit !== undefined) req.fieldUnit = fieldUnitOf(unit); // uT → µT
  if (format === 'png' && !out) throw new UsageError('--format png writes a file: add --out FILE.png');
  const level = stringOption(args, 'level');
  if (level !== undefined) req.level = selectLevel(model, level);
  const field = selectField(model, stringOption(args, 'field'));
  if (field) req.marker = field;
  if (view === 'pattern') {
    if (model.beams.length === 0) throw new FileProblemError(file, [cliProblem('nothing-to-compute', 'No beam to draw: add a `beam` block with level, source, slits, magnet and drift')]);
    req.beam = selectBeam(model, stringOption(args, 'beam'));
  }
  const line = selectName('line', model.lines.map((l) => l.name), stringOption(args, 'line'));
  if (line !== undefined) req.lineName = line;
  const resonance = selectName('resonance', model.resonances.map((r) => r.name), stringOption(args, 'resonance'));
  if (resonance !== undefined) req.resonanceName = resonance;
  const fit = selectName('fit', model.fits.map((f) => f.name), stringOption(args, 'fit'));
  if (fit !== undefined) req.fitName = fit;
  const sources = stringOption(args, 'source');
  if (sources !== undefined) req.sourceNames = selectSources(model, sources);
  const scale = stringOption(args, 'scale', ['auto', 'linear', 'log']);
  if (scale !== undefined) req.fieldScale = scale as 'auto' | 'linear' | 'log';
  const slower = selectName('slower', model.slowers.map((s) => s.name), stringOption(args, 'slower'));
  if (slower !== undefined) req.slowerName = slower;
  const d = diagramFor(analysis, req);
  if (!d.ok) {
    const listed = listErrorsFirst(file, analysis, ctx);
    throw new FileProblemError(file, [cliProblem('nothing-to-compute', `${commandLineWording(d.message)}${listed}`)]);
  }
  if (format === 'png') {
    writeOutputFile(out!, svgToPng(d.svg), ctx.fsys);
    ctx.io.err(`wrote the ${view} diagram to ${out} (${PNG_SCALE}× scale)`);
    return reportErrors(file, analysis, ctx) > 0 ? 1 : 0;
  }
  const text = format === 'svg' ? d.svg : d.csv;
  if (out) {
    writeOutputFile(out, text, ctx.fsys);
    ctx.io.err(`wrote the ${view} diagram${format === 'csv' ? ' data' : ''} to ${out}`);
  } else ctx.io.out(text);
  return reportErrors(file, analysis, ctx) > 0 ? 1 : 0;
}
