/**
 * `sublevel render <file> [--view levels|pattern|lines|resonance] [--level NAME] [--field NAME] [--beam NAME] [--line NAME] [--resonance NAME]
 *  [--from B] [--to B] [--unit G|mT|T] [--format svg|csv|png] [--out FILE]`:
 * the same diagrams the editor panel shows, as standalone SVG for reports (light palette), as PNG at print resolution,
 * or the numbers behind them as CSV.
 */
import { analyze } from '../eval/analyze';
import { suggestNames } from '../format/didYouMean';
import { diagramFor, type DiagramRequest, type DiagramView } from '../views/diagram';
import type { FieldUnit } from '../render';
import { readQuantityArgument } from '../format/quantityArgument';
import { type ParsedArgs, rejectUnknownOptions, stringOption, UsageError } from './args';
import { readSetupFile } from './files';
import { diskSources } from '../service/workspaceFiles';
import type { CliIO } from './io';
import { writeOutputFile } from './output';
import { PNG_SCALE, svgToPng } from './pngExport';
import { selectBeam, selectField, selectLevel } from './selectors';

export const RENDER_VIEWS = ['levels', 'pattern', 'lines', 'resonance'] as const;

export function runRender(args: ParsedArgs, io: CliIO): number {
  rejectUnknownOptions(args, ['view', 'level', 'field', 'beam', 'line', 'resonance', 'from', 'to', 'unit', 'format', 'out']);
  if (args.positionals.length !== 1) throw new UsageError('render needs exactly one setup file');
  const file = args.positionals[0]!;
  const view = (stringOption(args, 'view', RENDER_VIEWS) ?? 'levels') as DiagramView;
  const format = stringOption(args, 'format', ['svg', 'csv', 'png']) ?? 'svg';
  const analysis = analyze(readSetupFile(file), diskSources(file));
  const model = analysis.model;
  if (!model) throw new UsageError(`${file} could not be read`);
  const req: DiagramRequest = { view, theme: 'export', source: file };
  const fromText = stringOption(args, 'from');
  const toText = stringOption(args, 'to');
  if (fromText !== undefined) req.fromT = fieldArgument(fromText, 'from');
  if (toText !== undefined) req.toT = fieldArgument(toText, 'to');
  if (req.fromT !== undefined && req.toT !== undefined && !(req.toT > req.fromT)) throw new UsageError('--to must be a larger field than --from');
  const unit = stringOption(args, 'unit', ['G', 'mT', 'T']);
  if (unit !== undefined) req.fieldUnit = unit as FieldUnit;
  const level = stringOption(args, 'level');
  if (level !== undefined) req.level = selectLevel(model, level);
  const field = selectField(model, stringOption(args, 'field'));
  if (field) req.marker = field;
  if (view === 'pattern') req.beam = selectBeam(model, stringOption(args, 'beam'));
  const line = stringOption(args, 'line');
  if (line !== undefined) {
    const names = model.lines.map((l) => l.name);
    if (!names.includes(line)) {
      const hint = suggestNames(line, names);
      throw new UsageError(`no line named '${line}'${hint.length ? ` — did you mean ${hint.map((h) => `'${h}'`).join(' or ')}?` : ''}`);
    }
    req.lineName = line;
  }
  const resonance = stringOption(args, 'resonance');
  if (resonance !== undefined) {
    const names = model.resonances.map((r) => r.name);
    if (!names.includes(resonance)) {
      const hint = suggestNames(resonance, names);
      throw new UsageError(`no resonance named '${resonance}'${hint.length ? ` — did you mean ${hint.map((h) => `'${h}'`).join(' or ')}?` : ''}`);
    }
    req.resonanceName = resonance;
  }
  const d = diagramFor(analysis, req);
  if (!d.ok) throw new UsageError(d.message);
  const out = stringOption(args, 'out');
  if (format === 'png') {
    if (!out) throw new UsageError('--format png writes a file: add --out FILE.png');
    writeOutputFile(out, svgToPng(d.svg));
    io.err(`wrote the ${view} diagram to ${out} (${PNG_SCALE}× scale)`);
    return 0;
  }
  const text = format === 'svg' ? d.svg : d.csv;
  if (out) {
    writeOutputFile(out, text);
    io.err(`wrote the ${view} diagram${format === 'csv' ? ' data' : ''} to ${out}`);
  } else io.out(text);
  return 0;
}

function fieldArgument(text: string, name: string): number {
  const r = readQuantityArgument(text, 'flux-density', `--${name}`);
  if (r.si === undefined) throw new UsageError(r.message ?? `--${name}: cannot read '${text}'`);
  return r.si;
}
