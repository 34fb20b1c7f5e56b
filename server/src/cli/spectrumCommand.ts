/** `sublevel spectrum <file> [--line NAME] [--field NAME] [--out FILE.csv]`: a line's synthesized spectrum as CSV. */
import { spectrumSamples } from '../eval/spectrumSamples';
import { spectrumWidthsText } from '../eval/spectrumEvaluation';
import { spectrumCsv } from '../render';
import { lineFieldIndex } from '../views/linesView';
import { type CommandSpec, type ParsedArgs, stringOption } from './args';
import { listErrorsFirst } from './analyzeFile';
import { OUT_OPTION, ROOT_OPTION } from './files';
import type { CliContext } from './io';
import { selectField, selectName } from './selectors';
import { lineAtField } from '../eval/lineAtField';
import { gJLookup } from '../eval/gJLookup';
import { emitOutput, nothingToCompute, openSetupFile } from './singleFile';
import { csvNumber } from '../eval/machineText';
import { vacuumWavelengthOf } from '../eval/wavelengthText';

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
  const opened = openSetupFile('spectrum', args, ctx);
  const { file, analysis, model } = opened;
  const asked = model.lines.filter((l) => l.spectrum);
  if (asked.length === 0) nothingToCompute(file, 'the file has no line with a spectrum; add `spectrum = across` (or along) under a `line`');
  const name = selectName('line', model.lines.map((l) => l.name), stringOption(args, 'line')) ?? asked[0]!.name;
  const wanted = stringOption(args, 'field');
  const field = wanted !== undefined ? selectField(model, wanted) : undefined;
  const evaluated = analysis.result?.lines.find((l) => l.name === name);
  // A field that concerns another species is left out of the evaluation: the line is computed there now.
  const missing = evaluated && field && !evaluated.at_fields.some((f) => f.source.kind === field.source.kind && f.source.name === field.source.name);
  const line = missing ? (lineAtField(model, name, field, gJLookup(analysis.result?.levels ?? [])) ?? evaluated) : evaluated;
  const at = line?.at_fields[lineFieldIndex(line, wanted)];
  if (!line || !at?.spectrum) {
    const listed = listErrorsFirst(file, analysis, ctx);
    const lm = model.lines.find((l) => l.name === name);
    const why = lm?.spectrum ? 'cannot be computed: it lacks data or has an error' : 'asks for no spectrum (add `spectrum = across` or along)';
    return nothingToCompute(file, `line '${name}' ${why}${listed}`, lm?.nameRange);
  }
  const s = at.spectrum;
  const samples = spectrumSamples(s, at.components, line.line_centre_Hz);
  const csv = spectrumCsv(samples, [
    ['file', file],
    ['line', name],
    ['field', `${at.source.kind} ${at.source.name} ${csvNumber(at.field_T)} T`],
    ['view', `${s.direction} the field, ${s.light} light`],
    ['widths', spectrumWidthsText(s)],
    ['intensity', 'per Hz, components of unit strength times the angular factor'],
    ...centreUncertainty(line.line_centre_Hz, line.line_centre_Hz_unc),
  ]);
  return emitOutput(opened, csv, ctx, () => `the spectrum of line ${name} (${s.points} samples)`);
}

/**
 * The line centre's standard uncertainty, which every frequency and wavelength cell shares (the
 * offsets do not): said once in the comment line rather than as a column of equal numbers.
 */
function centreUncertainty(hz: number | undefined, unc: number | undefined): [string, string][] {
  // A line written upper → lower has a negative centre; its wavelength is that of |ν|, as the hover says.
  const w = hz !== undefined ? vacuumWavelengthOf(Math.abs(hz), unc) : undefined;
  if (hz === undefined || !w || w.unc === undefined) return [];
  return [['centre', `${csvNumber(hz)} Hz ± ${csvNumber(unc)} Hz, vacuum ${csvNumber(w.m)} m ± ${csvNumber(w.unc)} m (standard uncertainty shared by every frequency and wavelength cell)`]];
}
