/**
 * Resonance diagram data: the chosen pair's transition frequency and df/dB over the resonance's
 * field range, from one exact sweep (both states found by their low-field labels), with the
 * field-insensitive points and resonance fields exactly as the evaluation reports them.
 */
import { sweepLevel } from '../physics/engine';
import { PLANCK_H } from '../physics/constants';
import { lowKey, refKey } from '../physics/transitions/sublevelTag';
import type { ResonanceModel, SettingsModel } from '../model/types';
import type { ResonanceResult } from '../eval/resultTypes';
import type { WorkingField } from '../eval/levelEvaluation';
import { engineSpec } from '../eval/levelSpec';
import type { ResonanceViewData } from '../render';
import { namedFieldMark } from './levelsView';
import { fieldAxisUnit } from '../render/fieldAxisUnit';

export const RESONANCE_VIEW_POINTS = 401;

export function resonanceView(
  r: ResonanceModel,
  result: ResonanceResult,
  gJ: number | undefined,
  settings: SettingsModel,
  fields: WorkingField[],
): ResonanceViewData | { problem: string } {
  const level = r.level;
  const spec = level ? engineSpec(level, gJ, settings) : undefined;
  if (!level || !spec) return { problem: `Resonance '${r.name}' needs a level without problems.` };
  const { fromT, toT } = r.rangeT;
  if (!(toT > fromT)) return { problem: `Resonance '${r.name}' needs a field range, e.g. \`range = 0 G, 10 G\`.` };
  // The figure draws one transition's frequency: the crossing search would be work thrown away.
  const sweep = sweepLevel(spec, fromT, toT, RESONANCE_VIEW_POINTS, { crossings: false });
  if (sweep.issues.some((i) => i.severity === 'error')) return { problem: `Level '${level.name}' could not be swept.` };
  const term = level.kind === 'term';
  const key = (n: { twoF: number; twoM: number }): string | null => refKey(term ? { twoJ: n.twoF, twoMJ: n.twoM } : { twoF: n.twoF, twoMF: n.twoM });
  // The pair the file names; else the transition of the first resonance found.
  let lowerKey = r.lower ? key(r.lower) : null;
  let upperKey = r.upper ? key(r.upper) : null;
  if ((!lowerKey || !upperKey) && result.resonances?.[0]) {
    const t = result.resonances[0].transition;
    const keyOfLabel = (label: string): string | null => {
      const s = sweep.states.find((x) => x.low.text === label);
      return s ? lowKey(s.low) : null;
    };
    lowerKey = keyOfLabel(t.lower_label);
    upperKey = keyOfLabel(t.upper_label);
  }
  const lower = sweep.states.find((s) => lowKey(s.low) === lowerKey);
  const upper = sweep.states.find((s) => lowKey(s.low) === upperKey);
  if (!lower || !upper) return { problem: `Resonance '${r.name}' names no pair of sublevels to draw (give lower and upper, or a frequency that is reached).` };
  const n = sweep.fieldsT.length;
  const frequencyHz = new Float64Array(n);
  const slopeHzPerT = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    frequencyHz[k] = upper.energyHz[k]! - lower.energyHz[k]!;
    // dE/dB = −μ, so d(E_u − E_l)/dB /h = (μ_l − μ_u)/h.
    slopeHzPerT[k] = (lower.momentJT[k]! - upper.momentJT[k]!) / PLANCK_H;
  }
  const sign = Math.sign(frequencyHz[0]!) || 1;
  return {
    title: `resonance ${r.name}: ${level.species.name} ${level.name}, ${lower.low.text} → ${upper.low.text}`,
    fieldUnit: fieldAxisUnit(toT, r.rangeT.toUnit ?? r.rangeT.fromUnit),
    fieldsT: sweep.fieldsT,
    frequencyHz,
    slopeHzPerT,
    pairLabel: `${lower.low.text} → ${upper.low.text}`,
    insensitive: (result.field_insensitive ?? []).map((p) => ({ fieldT: p.field_T, frequencyHz: sign * p.frequency_Hz })),
    resonances: (result.resonances ?? [])
      .filter((x) => [x.transition.lower_label, x.transition.upper_label].sort().join('|') === [lower.low.text, upper.low.text].sort().join('|'))
      .map((x) => ({ fieldT: x.field_T, frequencyHz: sign * Math.abs(x.transition.frequency_Hz) })),
    fieldMarks: fields.map(namedFieldMark),
    ...(r.frequencyHz ? { soughtHz: r.frequencyHz.value } : {}),
  };
}
