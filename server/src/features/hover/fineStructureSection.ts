/** A whole LS term written with its spin–orbit constant ζ: its J levels at zero field, their g_J and intervals. */
import type { TermResult } from '../../eval/resultTypes';
import { frequencyText, trimNumber, withUncertainty } from '../../eval/quantityText';
import { halfText } from '../../eval/halves';
import { sourcedFrequencyText, ZETA_DIGITS } from '../../eval/writtenUnit';
import { md, mdTable, mdTitle } from '../shared/markdown';
import { BOHR_RADIUS } from '../../physics/constants';

export function fineStructureSection(t: TermResult): string {
  const head = `${mdTitle(`${md(t.designation.unicode)} term`)}${t.designation.configuration ? ` — ${md(t.designation.configuration)}` : ''} (S = ${halfText(Math.round(2 * t.S))}, L = ${t.L})  \n${t.zeta_Hz ? `ζ = ${sourcedFrequencyText(t.zeta_Hz, ZETA_DIGITS)} (${md(t.zeta_Hz.source)})` : 'J-level energies from the file'}; every J level is computed together${t.hyperfine ? ', with the hyperfine coupling inside and between them' : ''}${t.diamagnetic ? `; diamagnetic term on (⟨r²⟩ = ${trimNumber(t.diamagnetic.r2_m2 / BOHR_RADIUS ** 2, 6)} a₀²)` : ''}`;
  const table = mdTable(
    ['J', 'E/h at zero field', 'g_J (Landé)'],
    t.fine_levels.map((l) => [l.J_text, withUncertainty(l.shift_Hz, l.shift_Hz_unc, (v) => frequencyText(v)), trimNumber(l.g_J, 7)]),
  );
  const intervals = t.fine_levels.slice(1).map((u, i) => `J = ${t.fine_levels[i]!.J_text} ↔ ${u.J_text}: ${frequencyText(u.shift_Hz - t.fine_levels[i]!.shift_Hz)}`);
  return [head, table, intervals.length > 0 ? `Intervals: ${intervals.join('; ')}` : ''].filter((s) => s !== '').join('\n\n');
}
