/**
 * Which sublevel labels describe the states at a field: the low-field |F, m_F> labels in the
 * weak-field (linear) regime, the decoupled |m_J, m_I> labels in the strong-field regime, both in
 * between (the evaluation's regime verdict decides; no verdict means no zero-field structure, where
 * the two label sets name the same states).
 */
import type { LevelResult, RegimeResultJson } from '../../eval/resultTypes';
import { levelAtField } from '../shared/results';

export type LabelScheme = 'low' | 'high' | 'both';

export function labelScheme(regime: Pick<RegimeResultJson, 'verdict'> | undefined): LabelScheme {
  if (!regime || regime.verdict.startsWith('weak')) return 'low';
  return regime.verdict.startsWith('strong') ? 'high' : 'both';
}

/** One state's label in a scheme; `both` joins them as "low / high". */
export function stateLabel(state: { low: string; high: string | undefined }, scheme: LabelScheme): string {
  if (scheme === 'low' || state.high === undefined || state.high === state.low) return state.low;
  return scheme === 'high' ? state.high : `${state.low} / ${state.high}`;
}

/** Column header for states labelled in a scheme. */
export function stateHeader(scheme: LabelScheme): string {
  if (scheme === 'low') return 'state (low-field label)';
  return scheme === 'high' ? 'state (strong-field label)' : 'state (low-field / strong-field label)';
}

/** The labels in words, for a note above a table: 'strong-field |m_J, m_I>'. */
export function schemeWords(scheme: LabelScheme): string {
  if (scheme === 'low') return 'low-field |F, m_F>';
  return scheme === 'high' ? 'strong-field |m_J, m_I>' : 'low-field / strong-field (intermediate field)';
}

/** A level's label scheme at a working field, and its low-field label → the label in that scheme. */
export function labelsAt(
  level: LevelResult | undefined,
  source: { kind: 'field' | 'magnet'; name: string },
): { scheme: LabelScheme; label: (low: string) => string } {
  const point = level ? levelAtField(level, source) : undefined;
  const scheme = labelScheme(point?.regime);
  const high = new Map((point?.exact ?? []).map((s) => [s.low_label, s.high_label]));
  return { scheme, label: (low) => stateLabel({ low, high: high.get(low) }, scheme) };
}
