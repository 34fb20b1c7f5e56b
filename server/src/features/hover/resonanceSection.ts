/**
 * A resonance block: the RF/microwave transitions of its level at each working field (with
 * their field sensitivity), the field-insensitive points of the chosen pair, and the fields
 * where the given frequency is resonant.
 */
import type { MagneticTransitionResult, ResonanceResult } from '../../eval/resultTypes';
import { fieldText, frequencyText, trimNumber } from '../../eval/quantityText';
import { md, mdTable, mdTitle } from '../shared/markdown';

const KIND: Record<string, string> = { pi: 'π', 'sigma+': 'σ+', 'sigma-': 'σ−', 'two-photon': '2-photon' };

/** A field sensitivity per gauss, in Hz/G, kHz/G or MHz/G so that the number stays short. */
export function sensitivityText(hzPerT: number): string {
  const perGauss = hzPerT * 1e-4;
  const a = Math.abs(perGauss);
  if (a >= 1e6) return `${trimNumber(perGauss / 1e6, 5)} MHz/G`;
  if (a >= 1e3) return `${trimNumber(perGauss / 1e3, 5)} kHz/G`;
  return `${trimNumber(perGauss, 5)} Hz/G`;
}

function transitionRow(t: MagneticTransitionResult): string[] {
  return [KIND[t.kind] ?? md(t.kind), `${md(t.lower_label)} → ${md(t.upper_label)}`, frequencyText(t.frequency_Hz, 10), sensitivityText(t.df_dB_Hz_per_T)];
}

export function resonanceSection(r: ResonanceResult, maxRows: number): string {
  const parts = [`${mdTitle(`resonance ${md(r.name)}`)}${r.level ? ` of ${md(r.species ?? '')} ${md(r.level)}` : ''} — searched ${fieldText(r.range_T[0])} to ${fieldText(r.range_T[1])}`];
  for (const p of r.field_insensitive ?? []) {
    parts.push(`field-insensitive point: ${fieldText(p.field_T)} at ${frequencyText(p.frequency_Hz, 10)} (curvature ${trimNumber(p.d2f_dB2_Hz_per_T2 * 1e-8, 5)} Hz/G²)`);
  }
  for (const x of r.resonances ?? []) {
    parts.push(`resonant at ${fieldText(x.field_T)}: ${md(x.transition.lower_label)} → ${md(x.transition.upper_label)}`);
  }
  for (const at of r.at_fields) {
    if (at.transitions.length === 0) continue;
    const rows = at.transitions.slice(0, maxRows).map(transitionRow);
    const more = at.transitions.length - rows.length;
    parts.push(
      `${mdTitle(`${at.transitions.length} transitions`)} at ${md(at.source.kind)} ${md(at.source.name)} (${fieldText(at.field_T)})`,
      mdTable(['kind', 'lower → upper', 'frequency', 'df/dB'], rows) + (more > 0 ? `\n\n… and ${more} more` : ''),
    );
  }
  return parts.join('\n\n');
}
