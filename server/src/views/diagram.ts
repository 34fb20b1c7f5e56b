/**
 * One diagram of an analysed document, as SVG and CSV: what the editor panel shows and what
 * `sublevel render` writes. The level or beam is the one the cursor is in, else the first one.
 */
import type { Analysis } from '../eval/analyze';
import { evaluateBeam } from '../eval/beamEvaluation';
import { gJLookup } from '../eval/gJLookup';
import { csvNumber } from '../eval/machineText';
import { workingFields } from '../eval/evaluate';
import { lineAtField } from '../eval/lineAtField';
import type { BeamModel, LevelModel, SetupModel } from '../model/types';
import type { WorkingField } from '../eval/levelEvaluation';
import { residualsCsv, levelsCsv, linesCsv, patternCsv, renderLevels, renderLines, renderPattern, renderResiduals, renderResonance, resonanceCsv, renderSlower, slowerCsv, type FieldUnit, type RenderTheme } from '../render';
import { residualsView } from './residualsView';
import { slowerView } from './slowerView';
import { resonanceView } from './resonanceView';
import { lineFieldIndex, linesView } from './linesView';
import { levelsView } from './levelsView';
import { patternView } from './patternView';
import { fieldMapFor } from './fieldMapDiagram';

export const DIAGRAM_VIEWS = ['levels', 'pattern', 'lines', 'resonance', 'residuals', 'fieldmap', 'slower'] as const;
export type DiagramView = (typeof DIAGRAM_VIEWS)[number];

export function isDiagramView(v: unknown): v is DiagramView {
  return typeof v === 'string' && (DIAGRAM_VIEWS as readonly string[]).includes(v);
}

export interface DiagramRequest {
  view: DiagramView;
  /** 0-based line of the cursor, to pick the level, beam or line being edited. */
  line?: number;
  theme: RenderTheme['kind'];
  /** Explicit choices (the CLI's --level, --field, --beam, --line); they win over the cursor. */
  level?: LevelModel;
  marker?: WorkingField;
  beam?: BeamModel;
  lineName?: string;
  resonanceName?: string;
  fitName?: string;
  slowerName?: string;
  /** Levels view: field range and axis unit chosen by the user (CLI --from/--to/--unit, panel range control). */
  fromT?: number;
  toT?: number;
  fieldUnit?: FieldUnit;
  /** A named field chosen in the panel (the CLI resolves --field itself and passes `marker`). */
  fieldName?: string;
  /** The setup file's name, for the CSV header line. */
  source?: string;
  /** Field map: only these sources (the CLI's --source), and the |B| axis scale. */
  sourceNames?: string[];
  fieldScale?: 'auto' | 'linear' | 'log';
}

export type DiagramAnswer = { ok: true; title: string; svg: string; csv: string; fields?: string[] } | { ok: false; message: string };

export function diagramFor(analysis: Analysis, request: DiagramRequest): DiagramAnswer {
  const model = analysis.model;
  if (!model) return { ok: false, message: 'The file could not be read; see the Problems view.' };
  const named = workingFields(model);
  const req: DiagramRequest = { ...request, marker: request.marker ?? named.find((f) => f.source.name === request.fieldName) };
  const answer = drawn(analysis, model, req);
  return answer.ok ? { ...answer, fields: named.map((f) => f.source.name) } : answer;
}

function drawn(analysis: Analysis, model: SetupModel, req: DiagramRequest): DiagramAnswer {
  const theme: RenderTheme = { kind: req.theme };
  const gJOf = gJLookup(analysis.result?.levels ?? []);
  if (req.view === 'levels') {
    const level = req.level ?? levelAt(model, req.line);
    if (!level) return { ok: false, message: 'No level to draw: add a species with a level, e.g. `level ground: 2S1/2`.' };
    const fields = workingFields(model);
    const marker = req.marker ?? fields[0];
    const v = levelsView(level, gJOf(level), model.settings, marker, { fromT: req.fromT, toT: req.toT, fieldUnit: req.fieldUnit, fieldMarks: fields });
    if (!v) return { ok: false, message: `Level '${level.name}' has problems to fix before it can be drawn (or the field range is empty).` };
    const about: [string, string][] = [['file', req.source ?? ''], ['level', `${level.species.name}.${level.name}`]];
    return { ok: true, title: v.data.title, svg: renderLevels(v.data, theme), csv: levelsCsv(v.data, about) };
  }
  if (req.view === 'pattern') {
    const beam = req.beam ?? beamAt(model, req.line);
    if (!beam) return { ok: false, message: 'No beam to draw: add a `beam` block with level, source, slits, magnet and drift.' };
    const v = patternView(beam.name, evaluateBeam(beam, gJOf, false));
    if (!v) return { ok: false, message: `Beam '${beam.name}' cannot be computed yet; see the Problems view.` };
    return { ok: true, title: v.title, svg: renderPattern(v, theme), csv: patternCsv(v, beamAbout(beam, req.source)) };
  }
  if (req.view === 'resonance') {
    const models = model.resonances;
    const r = models.find((m) => m.name === req.resonanceName) ?? models.find((m) => contains(m.node.range, req.line)) ?? models[0];
    const result = r && analysis.result?.resonances.find((x) => x.name === r.name);
    if (!r || !result) return { ok: false, message: 'No resonance to draw: add one, e.g. `resonance clock` with level, lower, upper and range.' };
    const v = resonanceView(r, result, r.level ? gJOf(r.level) : undefined, model.settings, workingFields(model));
    if ('problem' in v) return { ok: false, message: v.problem };
    const about: [string, string][] = [['file', req.source ?? ''], ['resonance', r.name]];
    return { ok: true, title: v.title, svg: renderResonance(v, theme), csv: resonanceCsv(v, about) };
  }
  if (req.view === 'fieldmap') return fieldMapFor(model, req, theme);
  if (req.view === 'slower') {
    const all = analysis.result?.slowers ?? [];
    const s = all.find((x) => x.name === req.slowerName) ?? all.find((x) => contains(model.slowers.find((m) => m.name === x.name)?.node.range ?? NOWHERE, req.line)) ?? all[0];
    if (!s) return { ok: false, message: 'No slower to draw: add a `slower` block with line, capture and final (see docs/slower.md).' };
    const v = slowerView(s);
    if (!v) return { ok: false, message: `Slower '${s.name}' cannot be computed yet; see the Problems view.` };
    return { ok: true, title: v.title, svg: renderSlower(v, theme), csv: slowerCsv(s, req.source ?? '') };
  }
  if (req.view === 'residuals') {
    const fits = analysis.result?.fits ?? [];
    const f = fits.find((x) => x.name === req.fitName) ?? fits.find((x) => contains(model.fits.find((m) => m.name === x.name)?.node.range ?? NOWHERE, req.line)) ?? fits.find((x) => x.kind !== 'calibration') ?? fits[0];
    if (!f) return { ok: false, message: 'No fit to draw: add a `data` block and a `fit` block (see docs/fit.md).' };
    const v = residualsView(f);
    if (!v) return { ok: false, message: f.kind === 'calibration' ? `Fit '${f.name}' is a one-resonance calibration: its fields are in the hover, there are no residuals.` : `Fit '${f.name}' has no fitted points; see the Problems view.` };
    return { ok: true, title: v.title, svg: renderResiduals(v, theme), csv: residualsCsv(f, req.source ?? '') };
  }
  const lines = analysis.result?.lines ?? [];
  const evaluated = lines.find((l) => l.name === req.lineName) ?? lines.find((l) => contains(model.lines.find((m) => m.name === l.name)?.node.range ?? NOWHERE, req.line)) ?? lines[0];
  if (!evaluated) return { ok: false, message: 'No line to draw: add one, e.g. `line D2: ground -> upper`.' };
  const fieldName = req.marker?.source.name;
  // A field that concerns another species is left out of the evaluation: the line is computed there now.
  const missing = req.marker && !evaluated.at_fields.some((f) => f.source.kind === req.marker!.source.kind && f.source.name === fieldName);
  const line = missing ? (lineAtField(model, evaluated.name, req.marker!, gJOf) ?? evaluated) : evaluated;
  if (fieldName !== undefined && !line.at_fields.some((f) => f.source.name === fieldName)) {
    return { ok: false, message: `Line '${line.name}' was not computed at field '${fieldName}'.` };
  }
  const index = lineFieldIndex(line, fieldName);
  const written = workingFields(model).find((f) => f.source.name === line.at_fields[index]?.source.name)?.unit;
  const v = linesView(line, index, written);
  if (!v) return { ok: false, message: `Line '${line.name}' has no components to draw; see the Problems view.` };
  return { ok: true, title: v.title, svg: renderLines(v, theme), csv: linesCsv(v, [['file', req.source ?? ''], ['line', line.name]]) };
}

/** The CSV header facts of a beam: which beam, level and magnet (with its field). */
export function beamAbout(beam: BeamModel, source: string | undefined): [string, string][] {
  const about: [string, string][] = [['file', source ?? ''], ['beam', beam.name]];
  if (beam.level) about.push(['level', `${beam.level.species.name}.${beam.level.name}`]);
  if (beam.magnet) about.push(['field', `magnet ${beam.magnet.name}${beam.magnet.fieldT ? ` ${csvNumber(beam.magnet.fieldT.value)} T` : ''}`]);
  return about;
}

const NOWHERE = { start: { line: -1 }, end: { line: -1 } };

function contains(range: { start: { line: number }; end: { line: number } }, line: number | undefined): boolean {
  return line !== undefined && range.start.line <= line && line <= range.end.line;
}

function levelAt(model: SetupModel, line: number | undefined): LevelModel | undefined {
  const all = model.species.flatMap((s) => s.levels);
  // A level from a used file has its range in that file, so only this file's levels can be under the cursor.
  return all.find((l) => !l.species.origin && contains(l.node.range, line)) ?? model.beams.find((b) => contains(b.node.range, line))?.level ?? model.beams[0]?.level ?? all[0];
}

function beamAt(model: SetupModel, line: number | undefined): BeamModel | undefined {
  return model.beams.find((b) => contains(b.node.range, line)) ?? model.beams[0];
}
