/**
 * A line: its two levels (term, J, g_J), ΔJ and the parities, and — when both levels have an
 * energy — the line frequency and vacuum wavelength. Line components join here when the
 * evaluation carries them.
 */
import type { EvaluationResult, LevelResult } from '../../eval/resultTypes';
import { frequencyText, trimNumber } from '../../eval/quantityText';
import type { LineModel } from '../../model/types';
import { SPEED_OF_LIGHT } from '../../physics/constants';
import { md, mdTitle } from '../shared/markdown';
import { levelResult } from '../shared/results';

function levelLine(role: string, name: string | undefined, r: LevelResult | undefined): string {
  if (!name) return `${role}: not resolved`;
  if (!r) return `${role}: ${md(name)} (no valid term yet)`;
  const parity = r.designation.parity ? `, ${r.designation.parity}` : '';
  return `${role}: ${md(r.level)} — ${md(r.designation.text)} (J = ${r.J_text}${parity}), g_J = ${trimNumber(r.g_J.used, 6)}`;
}

/** ν = (E_upper − E_lower)/h and λ = c/ν, or undefined without both energies. */
export function lineFrequency(lower: LevelResult | undefined, upper: LevelResult | undefined): { hz: number; vacuumNm: number } | undefined {
  if (!lower?.energy_Hz || !upper?.energy_Hz) return undefined;
  const hz = upper.energy_Hz.value - lower.energy_Hz.value;
  if (!(Math.abs(hz) > 0)) return undefined;
  return { hz, vacuumNm: (SPEED_OF_LIGHT / Math.abs(hz)) * 1e9 };
}

export function lineSection(line: LineModel, result: EvaluationResult | undefined): string {
  const lower = line.lower ? levelResult(result, line.lower.species.name, line.lower.name) : undefined;
  const upper = line.upper ? levelResult(result, line.upper.species.name, line.upper.name) : undefined;
  const species = line.lower?.species.name ?? line.upper?.species.name;
  const lines = [`${mdTitle(`line ${md(line.name)}`)}${species ? ` in ${md(species)}` : ''}`];
  lines.push(levelLine('lower', line.lower?.name, lower), levelLine('upper', line.upper?.name, upper));
  if (lower && upper) {
    const dTwoJ = Math.round(2 * upper.J) - Math.round(2 * lower.J);
    const dJ = dTwoJ === 0 ? '0' : `${dTwoJ > 0 ? '+' : '−'}${Math.abs(dTwoJ) % 2 === 0 ? Math.abs(dTwoJ) / 2 : `${Math.abs(dTwoJ)}/2`}`;
    lines.push(`ΔJ = ${dJ}`);
  }
  const f = lineFrequency(lower, upper);
  if (f) lines.push(`ν = ${frequencyText(f.hz, 9)}, vacuum wavelength ${trimNumber(f.vacuumNm, 8)} nm (from the two level energies)`);
  return lines.join('  \n');
}
