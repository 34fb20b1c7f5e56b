/**
 * Traps as one CSV table (docs/traps.md): one row per trap and sublevel, values in SI (the unit
 * is in each column name), 15 significant digits, empty cells where a value does not apply.
 */
import type { TrapResult } from '../eval/trapResultTypes';
import { csvNumber as numCell } from '../eval/machineText';
import { csvCommentLine, textCell } from './csv';

const HEADER = [
  'trap', 'sublevel', 'two_m', 'low_field_seeking', 'trapped', 'levitation_T_per_m', 'turning_field_T',
  'minimum_x_m', 'minimum_y_m', 'minimum_z_m', 'field_at_minimum_T', 'sag_m',
  'depth_J', 'depth_K', 'depth_Hz', 'depth_limit', 'shape',
  'frequency_1_Hz', 'frequency_2_Hz', 'frequency_3_Hz', 'gradient_1_T_per_m', 'gradient_2_T_per_m', 'gradient_3_T_per_m',
  'larmor_Hz', 'rf_cut_field_T', 'rf_cut_Hz', 'rf_cut_linear_Hz', 'majorana_per_s',
].join(',');

export function trapCsv(traps: readonly TrapResult[], file: string): string {
  const rows: string[] = [csvCommentLine({ kind: 'trap', about: [['file', file]] }), HEADER];
  for (const t of traps) {
    for (const s of t.sublevels) {
      const cells: (string | number | undefined)[] = [
        t.name, s.label, s.two_m, String(s.low_field_seeking), String(s.trapped), s.levitation_T_per_m, s.turning_field_T,
        s.minimum_m?.[0], s.minimum_m?.[1], s.minimum_m?.[2], s.field_at_minimum_T, s.sag_m,
        s.depth_J, s.depth_K, s.depth_Hz, s.depth_limit, s.shape,
        s.frequencies_Hz?.[0], s.frequencies_Hz?.[1], s.frequencies_Hz?.[2], s.gradients_T_per_m?.[0], s.gradients_T_per_m?.[1], s.gradients_T_per_m?.[2],
        s.larmor_Hz, s.rf_cut?.field_T, s.rf_cut?.frequency_Hz, s.rf_cut?.linear_Hz, s.majorana?.rate_per_s,
      ];
      rows.push(cells.map((c) => (typeof c === 'number' ? numCell(c) : c === undefined ? '' : textCell(c))).join(','));
    }
  }
  return `${rows.join('\n')}\n`;
}
