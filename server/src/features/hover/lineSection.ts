/**
 * A line: its two levels (term, J, g_J), ΔJ, the effective Landé factor, the line centre with
 * its vacuum wavelength, and the Zeeman components at each working field (strongest first).
 */
import type { EvaluationResult, LevelResult, LineResult } from '../../eval/resultTypes';
import { frequencyText, trimNumber } from '../../eval/quantityText';
import { polarizationSymbol } from '../../eval/polarizationName';
import { fieldInUnit, workingFieldUnit } from '../../eval/writtenUnit';
import type { LineModel } from '../../model/types';
import { SPEED_OF_LIGHT } from '../../physics/constants';
import { md, mdTable, mdTitle } from '../shared/markdown';
import { levelResult } from '../shared/results';

function levelLine(role: string, name: string | undefined, r: LevelResult | undefined): string {
  if (!name) return `${role}: not resolved`;
  if (!r) return `${role}: ${md(name)} (no valid J level yet)`;
  const parity = r.designation.parity ? `, ${r.designation.parity}` : '';
  const shown = [r.designation.configuration, r.designation.unicode].filter((x) => x).join(' ');
  return `${role}: ${md(r.level)} — ${md(shown)} (J = ${r.J_text}${parity}), g_J = ${trimNumber(r.g_J.used, 6)}`;
}

/** The line frequency and vacuum wavelength: from the evaluation's line centre, else from the two level energies. */
export function lineFrequency(
  line: LineResult | undefined,
  lower: LevelResult | undefined,
  upper: LevelResult | undefined,
): { hz: number; vacuumNm: number } | undefined {
  const fromLevels = lower?.energy_Hz && upper?.energy_Hz ? Math.abs(upper.energy_Hz.value - lower.energy_Hz.value) : undefined;
  const hz = line?.line_centre_Hz ?? fromLevels;
  if (hz === undefined || !(Math.abs(hz) > 0)) return undefined;
  return { hz, vacuumNm: (SPEED_OF_LIGHT / Math.abs(hz)) * 1e9 };
}

function componentsSection(r: LineResult, maxRows: number, result: EvaluationResult | undefined): string[] {
  const out: string[] = [];
  for (const at of r.at_fields) {
    if (at.components.length === 0) continue;
    const sorted = [...at.components].sort((a, b) => b.strength - a.strength);
    const rows = sorted.slice(0, maxRows).map((c) => [md(polarizationSymbol(c.polarization)), `${md(c.lower_label)} → ${md(c.upper_label)}`, frequencyText(c.offset_Hz), trimNumber(c.strength, 3)]);
    const more = sorted.length - rows.length;
    out.push(
      `${mdTitle(`${sorted.length} components`)} at ${md(at.source.kind)} ${md(at.source.name)} (${fieldInUnit(at.field_T, { unit: result && workingFieldUnit(result, at.source) })}), strongest first`,
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
  const lines = [`${mdTitle(`line ${md(line.name)}`)}${species ? ` in ${md(species)}` : ''}`];
  lines.push(levelLine('lower', line.lower?.name, lower), levelLine('upper', line.upper?.name, upper));
  if (lower && upper) {
    const dTwoJ = Math.round(2 * upper.J) - Math.round(2 * lower.J);
    const dJ = dTwoJ === 0 ? '0' : `${dTwoJ > 0 ? '+' : '−'}${Math.abs(dTwoJ) % 2 === 0 ? Math.abs(dTwoJ) / 2 : `${Math.abs(dTwoJ)}/2`}`;
    lines.push(`ΔJ = ${dJ}`);
  }
  if (r?.g_eff !== undefined) lines.push(`effective Landé factor g_eff = ${trimNumber(r.g_eff, 6)}`);
  const f = lineFrequency(r, lower, upper);
  if (f) lines.push(`ν = ${frequencyText(f.hz, 9)}, vacuum wavelength ${trimNumber(f.vacuumNm, 8)} nm`);
  return [lines.join('  \n'), ...(r ? componentsSection(r, maxRows, result) : [])].join('\n\n');
}
