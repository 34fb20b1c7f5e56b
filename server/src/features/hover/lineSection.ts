/**
 * A line: the line centre with its vacuum wavelength first, then its two levels (term, J, g_J),
 * ΔJ, the effective Landé factor, and the Zeeman components at each working field (strongest
 * first; fields of equal value share one table), labelled as each level's regime at that field says.
 */
import type { EvaluationResult, LevelResult, LineResult } from '../../eval/resultTypes';
import { frequencyText, trimNumber, withUncertainty } from '../../eval/quantityText';
import { polarizationSymbol } from '../../eval/polarizationName';
import { lineWavelengthText } from '../../eval/wavelengthText';
import { fieldInUnit, workingFieldUnit } from '../../eval/writtenUnit';
import type { LineModel } from '../../model/types';
import { md, mdTable, mdTitle } from '../shared/markdown';
import { sameFieldGroups, sourcesText } from './sameField';
import { levelResult } from '../shared/results';
import { type LabelScheme, labelsAt, schemeWords } from './regimeLabels';

function levelLine(role: string, name: string | undefined, r: LevelResult | undefined): string {
  if (!name) return `${role}: not resolved`;
  if (!r) return `${role}: ${md(name)} (no valid J level yet)`;
  const parity = r.designation.parity ? `, ${r.designation.parity}` : '';
  const shown = [r.designation.configuration, r.designation.unicode].filter((x) => x).join(' ');
  return `${role}: ${md(r.level)} — ${md(shown)} (J = ${r.J_text}${parity}), g_J = ${trimNumber(r.g_J.used, 6)}`;
}

/**
 * The line frequency and its standard uncertainty when an uncertain energy reaches it: from the
 * evaluation's line centre, else from the two level energies (the wavelength: eval/wavelengthText.ts).
 */
export function lineFrequency(
  line: LineResult | undefined,
  lower: LevelResult | undefined,
  upper: LevelResult | undefined,
): { hz: number; unc?: number } | undefined {
  const fromLevels = lower?.energy_Hz && upper?.energy_Hz ? Math.abs(upper.energy_Hz.value - lower.energy_Hz.value) : undefined;
  const hz = line?.line_centre_Hz ?? fromLevels;
  if (hz === undefined || !(Math.abs(hz) > 0)) return undefined;
  // Without the evaluation's propagated value, the two energies' uncertainties taken as independent.
  const unc = line?.line_centre_Hz !== undefined ? line.line_centre_Hz_unc : Math.hypot(lower?.energy_Hz?.uncertainty ?? 0, upper?.energy_Hz?.uncertainty ?? 0) || undefined;
  return { hz, ...(unc !== undefined ? { unc } : {}) };
}

/** Which labels the table uses, said only when they are not the low-field ones everywhere. */
function labelNote(lower: { name: string; scheme: LabelScheme }, upper: { name: string; scheme: LabelScheme }): string {
  if (lower.scheme === 'low' && upper.scheme === 'low') return '';
  if (lower.scheme === upper.scheme) return `labels: ${schemeWords(lower.scheme)}`;
  return `labels: ${md(lower.name)} ${schemeWords(lower.scheme)}; ${md(upper.name)} ${schemeWords(upper.scheme)}`;
}

function componentsSection(r: LineResult, lower: LevelResult | undefined, upper: LevelResult | undefined, maxRows: number, result: EvaluationResult | undefined): string[] {
  const out: string[] = [];
  for (const group of sameFieldGroups(r.at_fields, (at) => at.components.length)) {
    const at = group[0]!;
    const lo = labelsAt(lower, at.source);
    const up = labelsAt(upper, at.source);
    const sorted = [...at.components].sort((a, b) => b.strength - a.strength);
    const rows = sorted.slice(0, maxRows).map((c) => [md(polarizationSymbol(c.polarization)), `${md(lo.label(c.lower_label))} → ${md(up.label(c.upper_label))}`, withUncertainty(c.offset_Hz, c.offset_Hz_unc, (v) => frequencyText(v)), trimNumber(c.strength, 3)]);
    const more = sorted.length - rows.length;
    const count = `${sorted.length} component${sorted.length === 1 ? '' : 's'}`;
    const note = labelNote({ name: lower?.level ?? 'lower', scheme: lo.scheme }, { name: upper?.level ?? 'upper', scheme: up.scheme });
    const labels = note ? `  \n${note}` : '';
    out.push(
      `${mdTitle(count)} at ${sourcesText(group, md)} (${fieldInUnit(at.field_T, { unit: result && workingFieldUnit(result, at.source) })}), strongest first${labels}`,
      mdTable(['pol.', 'lower → upper', 'offset from centre', 'strength'], rows) + (more > 0 ? `\n\n… and ${more} more` : ''),
    );
  }
  return out;
}

export function lineSection(line: LineModel, result: EvaluationResult | undefined, maxRows = 24): string {
  const lower = line.lower ? levelResult(result, line.lower.species.name, line.lower.name) : undefined;
  const upper = line.upper ? levelResult(result, line.upper.species.name, line.upper.name) : undefined;
  const r = result?.lines.find((l) => l.name === line.name);
  const species = line.lower?.species.name ?? line.upper?.species.name;
  // The answer first: where the line is, then how it is made.
  const f = lineFrequency(r, lower, upper);
  const title = `${mdTitle(`line ${md(line.name)}`)}${species ? ` in ${md(species)}` : ''}`;
  const lines = [f ? `${title} — ν = ${withUncertainty(f.hz, f.unc, (v) => frequencyText(v, 9))}, ${lineWavelengthText(f.hz, f.unc, 8)}` : title];
  lines.push(levelLine('lower', line.lower?.name, lower), levelLine('upper', line.upper?.name, upper));
  if (lower && upper) {
    const dTwoJ = Math.round(2 * upper.J) - Math.round(2 * lower.J);
    const dJ = dTwoJ === 0 ? '0' : `${dTwoJ > 0 ? '+' : '−'}${Math.abs(dTwoJ) % 2 === 0 ? Math.abs(dTwoJ) / 2 : `${Math.abs(dTwoJ)}/2`}`;
    lines.push(`ΔJ = ${dJ}`);
  }
  if (r?.g_eff !== undefined) lines.push(`effective Landé factor g_eff = ${trimNumber(r.g_eff, 6)}`);
  return [lines.join('  \n'), ...(r ? componentsSection(r, lower, upper, maxRows, result) : [])].join('\n\n');
}
