/**
 * A resonance block: the RF/microwave transitions of its level at each working field (with
 * their field sensitivity), the field-insensitive points of the chosen pair, and the fields
 * where the given frequency is resonant.
 */
import type { EvaluationResult, MagneticTransitionResult, ResonanceResult } from '../../eval/resultTypes';
import { curvatureText, frequencyText, sensitivityText } from '../../eval/quantityText';
import { SENSITIVITY_NOISE } from '../../eval/noiseFloors';
import { polarizationSymbol } from '../../eval/polarizationName';
import { fieldInUnit, workingFieldUnit } from '../../eval/writtenUnit';
import { md, mdTable, mdTitle } from '../shared/markdown';

function transitionRow(t: MagneticTransitionResult): string[] {
  return [md(polarizationSymbol(t.kind)), `${md(t.lower_label)} → ${md(t.upper_label)}`, frequencyText(t.frequency_Hz, 10), sensitivityText(t.df_dB_Hz_per_T, 5, SENSITIVITY_NOISE)];
}

export function resonanceSection(r: ResonanceResult, maxRows: number, result?: Pick<EvaluationResult, 'fields' | 'magnets'>): string {
  const [fromUnit, toUnit] = r.range_units ?? [];
  // Fields found in the range are shown in the unit family the range was written in.
  const found = (t: number): string => fieldInUnit(t, { family: toUnit });
  const parts = [`${mdTitle(`resonance ${md(r.name)}`)}${r.level ? ` of ${md(r.species ?? '')} ${md(r.level)}` : ''} — searched ${fieldInUnit(r.range_T[0], { unit: fromUnit })} to ${fieldInUnit(r.range_T[1], { unit: toUnit })}`];
  for (const p of r.field_insensitive ?? []) {
    parts.push(`field-insensitive point: ${found(p.field_T)} at ${frequencyText(p.frequency_Hz, 10)} (curvature ${curvatureText(p.d2f_dB2_Hz_per_T2, 5)})`);
  }
  for (const x of r.resonances ?? []) {
    parts.push(`resonant at ${found(x.field_T)}: ${md(x.transition.lower_label)} → ${md(x.transition.upper_label)}`);
  }
  for (const at of r.at_fields) {
    if (at.transitions.length === 0) continue;
    const rows = at.transitions.slice(0, maxRows).map(transitionRow);
    const more = at.transitions.length - rows.length;
    parts.push(
      `${mdTitle(`${at.transitions.length} transitions`)} at ${md(at.source.kind)} ${md(at.source.name)} (${fieldInUnit(at.field_T, { unit: result && workingFieldUnit(result, at.source) })})`,
      mdTable(['kind', 'lower → upper', 'frequency', 'df/dB'], rows) + (more > 0 ? `\n\n… and ${more} more` : ''),
    );
  }
  return parts.join('\n\n');
}
