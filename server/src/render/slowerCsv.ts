/**
 * A slower's profile as CSV (docs/slower.md, docs/csv.md): one row per sample along the slower,
 * z from the entrance; the coils' column only when the slower names coils.
 */
import type { SlowerResult } from '../eval/slowerResultTypes';
import { csvNumber as numCell } from '../eval/machineText';
import { csvTable } from './csv';

export function slowerCsv(s: SlowerResult, file: string): string {
  const samples = s.samples ?? [];
  const coils = samples.some((x) => x.B_coils_T !== undefined);
  const header = ['z_m', 'B_ideal_T', ...(coils ? ['B_coils_T'] : []), 'resonant_speed_m_per_s', 'needed_deceleration_m_per_s2', 'flight_speed_m_per_s'];
  const body = samples.map((x) => [
    numCell(x.z_m),
    numCell(x.B_ideal_T), // round-off already zeroed by the evaluation
    ...(coils ? [numCell(x.B_coils_T)] : []),
    numCell(x.resonant_speed_m_per_s),
    numCell(x.needed_deceleration_m_per_s2),
    numCell(x.flight_speed_m_per_s),
  ]);
  return csvTable(
    {
      kind: 'slower',
      about: [
        ['file', file],
        ['slower', s.name],
        ['line', s.line],
        ['design', s.design],
        ['detuning_Hz', s.detuning_Hz !== undefined ? String(s.detuning_Hz) : undefined],
        ['a_max_m_per_s2', s.a_max_m_per_s2 !== undefined ? String(s.a_max_m_per_s2) : undefined],
        ['coils', s.coils?.sources.join(' ')],
      ],
    },
    header,
    body,
  );
}
