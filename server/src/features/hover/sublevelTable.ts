/**
 * The sublevels of one level at one field as a Markdown table, lowest energy first: the exact
 * energy from diagonalisation, the weak-field (linear) value beside it while that formula holds,
 * and the magnetic moment; states carry the labels of the regime the level is in at that field.
 * Falls back to the linear energies when the evaluation has no exact ones.
 */
import { fieldText, frequencyText, trimNumber, withUncertainty } from '../../eval/quantityText';
import { md, mdTable } from '../shared/markdown';
import type { SublevelsAtField } from '../shared/results';
import { labelScheme, stateHeader, stateLabel } from './regimeLabels';

export function regimeLine(point: SublevelsAtField): string | undefined {
  const r = point.regime;
  if (!r) return undefined;
  const limits: string[] = [];
  if (r.linear_limit_T !== null) limits.push(`linear formula within ${trimNumber(r.fraction * 100, 3)} % below ${fieldText(r.linear_limit_T, 3)}`);
  if (r.strong_limit_T !== null) limits.push(`strong-field formula within it above ${fieldText(r.strong_limit_T, 3)}`);
  return `regime: ${md(r.verdict)}${limits.length > 0 ? ` — ${limits.join('; ')}` : ''}`;
}

/** Significant digits the hover normally gives an energy. */
const ENERGY_DIGITS = 7;
/** Never more than this: past it the engine's own precision (and the reader's patience) ends. */
const MAX_ENERGY_DIGITS = 11;

/**
 * Enough significant digits that neighbouring sublevels read apart: at 1 nT the m_F of one F level
 * lie ~10 Hz apart on a GHz offset, and seven digits would print them all the same.
 */
export function separatingDigits(energiesHz: readonly number[]): number {
  const e = energiesHz.filter(Number.isFinite).sort((a, b) => a - b);
  const largest = Math.max(0, ...e.map(Math.abs));
  let gap = Infinity;
  for (let i = 1; i < e.length; i++) if (e[i]! - e[i - 1]! > largest * 1e-12) gap = Math.min(gap, e[i]! - e[i - 1]!);
  if (!(largest > 0) || !Number.isFinite(gap)) return ENERGY_DIGITS;
  // Two digits past the one where the closest pair first differs.
  return Math.min(MAX_ENERGY_DIGITS, Math.max(ENERGY_DIGITS, Math.ceil(Math.log10(largest / gap)) + 2));
}

export function sublevelTable(point: SublevelsAtField, maxRows: number): string {
  const rows = Math.max(0, maxRows);
  let table = '';
  let total = 0;
  if (point.exact.length > 0) {
    total = point.exact.length;
    const scheme = labelScheme(point.regime);
    // The linear formula is only shown where it holds (within the regime's fraction); past the
    // weak-field regime it can be off by more than the splitting itself.
    const linear = scheme === 'low';
    const shown = point.exact.slice(0, rows);
    const digits = separatingDigits(point.exact.map((s) => s.energy_Hz));
    table =
      scheme === 'both'
        ? mdTable(
            ['low-field label', 'strong-field label', 'E/h exact', 'μ/μ_B'],
            shown.map((s) => [md(s.low_label), md(s.high_label), withUncertainty(s.energy_Hz, s.energy_Hz_unc, (v) => frequencyText(v, digits)), withUncertainty(s.moment_bohr, s.moment_bohr_unc, (v) => trimNumber(v, 4))]),
          )
        : mdTable(
            [stateHeader(scheme), 'E/h exact', ...(linear ? ['E/h linear formula'] : []), 'μ/μ_B'],
            shown.map((s) => [
              md(stateLabel({ low: s.low_label, high: s.high_label }, scheme)),
              withUncertainty(s.energy_Hz, s.energy_Hz_unc, (v) => frequencyText(v, digits)),
              ...(linear ? [s.linear_energy_Hz !== undefined ? frequencyText(s.linear_energy_Hz, digits) : '—'] : []),
              withUncertainty(s.moment_bohr, s.moment_bohr_unc, (v) => trimNumber(v, 4)),
            ]),
          );
  } else if (point.linear && point.linear.length > 0) {
    total = point.linear.length;
    table = mdTable(['sublevel', 'E/h (linear formula)'], point.linear.slice(0, rows).map((s) => [md(s.label), frequencyText(s.energy_Hz)]));
  }
  const more = total - Math.min(rows, total);
  const regime = regimeLine(point);
  return [regime ?? '', rows > 0 ? table : '', more > 0 ? `… and ${more} more sublevel${more === 1 ? '' : 's'}` : '']
    .filter((s) => s !== '')
    .join('\n\n');
}
