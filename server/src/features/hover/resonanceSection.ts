/**
 * A resonance block: first the answer (the field-insensitive points of the chosen pair, the
 * fields where the given frequency is resonant, or that the searched range has none), then the
 * RF/microwave transitions of its level at each working field with their field sensitivity
 * (equal fields share one table; labels follow the level's regime there).
 */
import type { EvaluationResult, MagneticTransitionResult, ResonanceResult } from '../../eval/resultTypes';
import { curvatureText, frequencyText, sensitivityText, withUncertainty } from '../../eval/quantityText';
import { SENSITIVITY_NOISE } from '../../eval/noiseFloors';
import { polarizationSymbol } from '../../eval/polarizationName';
import { fieldInUnit, workingFieldUnit } from '../../eval/writtenUnit';
import { md, mdTable, mdTitle } from '../shared/markdown';
import { sameFieldGroups, sourcesText } from './sameField';
import { levelResult } from '../shared/results';
import { labelsAt, schemeWords } from './regimeLabels';

function transitionRow(t: MagneticTransitionResult, label: (low: string) => string): string[] {
  return [md(polarizationSymbol(t.kind)), `${md(label(t.lower_label))} → ${md(label(t.upper_label))}`, withUncertainty(t.frequency_Hz, t.frequency_Hz_unc, (v) => frequencyText(v, 10)), withUncertainty(t.df_dB_Hz_per_T, t.df_dB_Hz_per_T_unc, (v) => sensitivityText(v, 5, SENSITIVITY_NOISE))];
}

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

export function resonanceSection(r: ResonanceResult, maxRows: number, result?: Pick<EvaluationResult, 'fields' | 'magnets' | 'levels'>): string {
  const [fromUnit, toUnit] = r.range_units ?? [];
  // Fields found in the range are shown in the unit family the range was written in.
  const found = (t: number, u?: number): string => withUncertainty(t, u, (v) => fieldInUnit(v, { family: toUnit }));
  const searched = `searched ${fieldInUnit(r.range_T[0], { unit: fromUnit })} to ${fieldInUnit(r.range_T[1], { unit: toUnit })}`;
  // The answer first: the field-insensitive points and resonances, or that there are none in the range.
  const answers: string[] = [];
  if (r.field_insensitive) {
    if (r.field_insensitive.length === 0) answers.push('no field-insensitive point in the range');
    for (const p of r.field_insensitive) {
      answers.push(`field-insensitive point: ${found(p.field_T, p.field_T_unc)} at ${withUncertainty(p.frequency_Hz, p.frequency_Hz_unc, (v) => frequencyText(v, 10))} (curvature ${curvatureText(p.d2f_dB2_Hz_per_T2, 5)})`);
    }
  }
  if (r.resonances) {
    if (r.resonances.length === 0) answers.push('not resonant anywhere in the range');
    for (const x of r.resonances) answers.push(`resonant at ${found(x.field_T, x.field_T_unc)}: ${md(x.transition.lower_label)} → ${md(x.transition.upper_label)}`);
  }
  const title = `${mdTitle(`resonance ${md(r.name)}`)}${r.level ? ` of ${md(r.species ?? '')} ${md(r.level)}` : ''}`;
  const parts = [[title, ...answers, searched].join('  \n')];
  const level = r.species && r.level ? levelResult(result, r.species, r.level) : undefined;
  for (const group of sameFieldGroups(r.at_fields, (at) => at.transitions.length)) {
    const at = group[0]!;
    const { scheme, label } = labelsAt(level, at.source);
    const rows = at.transitions.slice(0, maxRows).map((t) => transitionRow(t, label));
    const more = at.transitions.length - rows.length;
    const where = sourcesText(group, md);
    parts.push(
      `${mdTitle(plural(at.transitions.length, 'transition'))} at ${where} (${fieldInUnit(at.field_T, { unit: result && workingFieldUnit(result, at.source) })})${scheme === 'low' ? '' : `  \nlabels: ${schemeWords(scheme)}`}`,
      mdTable(['kind', 'lower → upper', 'frequency', 'df/dB'], rows) + (more > 0 ? `\n\n… and ${more} more` : ''),
    );
  }
  return parts.join('\n\n');
}
