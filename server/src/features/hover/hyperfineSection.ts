/** A level's zero-field hyperfine structure: F levels with their energy and g_F, and the splittings. */
import type { LevelResult, SourcedNumber } from '../../eval/resultTypes';
import { halfText } from '../../eval/halves';
import { frequencyText, trimNumber, withUncertainty } from '../../eval/quantityText';
import { sourcedFrequencyText } from '../../eval/writtenUnit';
import { md, mdTable, mdTitle } from '../shared/markdown';

function constantText(name: string, c: SourcedNumber | undefined): string | undefined {
  if (!c) return undefined;
  return `${name} = ${sourcedFrequencyText(c, 7)} (${md(c.source)})`;
}

export function hyperfineSection(r: LevelResult): string | undefined {
  const twoI = Math.round(2 * r.I);
  if (twoI === 0) return undefined;
  const hf = r.hyperfine;
  if (!hf) {
    const split = r.J === 0 ? `its ${twoI + 1} sublevels m_I are split only by the nuclear Zeeman term g_I m_I μ_B B` : `in a field each m_J sublevel splits into ${twoI + 1} by the nuclear Zeeman term g_I m_I μ_B B`;
    return `${mdTitle('Hyperfine structure')}  \nno hyperfine constants for this level (I = ${halfText(twoI)}), so J and I stay uncoupled: ${split}`;
  }
  const constants = [constantText('A', hf.A_Hz), constantText('B', hf.B_Hz), constantText('C', hf.C_Hz)].filter((x): x is string => !!x);
  const table = mdTable(
    ['F', 'E/h at zero field', 'g_F'],
    hf.levels.map((l) => [l.F_text, withUncertainty(l.shift_Hz, l.shift_Hz_unc, (v) => frequencyText(v)), withUncertainty(l.g_F, l.g_F_unc, (v) => trimNumber(v, 6))]),
  );
  const splits = hf.intervals.map((i) => `F = ${halfText(Math.round(2 * i.F_lower))} ↔ ${halfText(Math.round(2 * i.F_upper))}: ${withUncertainty(i.interval_Hz, i.interval_Hz_unc, (v) => frequencyText(v))}`);
  return [
    `${mdTitle('Hyperfine structure')} (I = ${halfText(twoI)}, J = ${r.J_text})  \n${constants.join('  \n')}`,
    table,
    splits.length > 0 ? `Splittings: ${splits.join('; ')}` : '',
  ]
    .filter((s) => s !== '')
    .join('\n\n');
}
