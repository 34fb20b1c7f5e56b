/**
 * The strong-magnet caution quotes the magnets table's cell, uncertainty included. A magnet built
 * from sources gets its uncertainty only in the uncertainty pass (uncertainty/attach.ts), after the
 * beam's cautions are made, so the caution is restated from the table once that pass has run.
 */
import { STRONG_MAGNET_START, strongMagnetCaution } from '../physics/beam/cautions';
import type { EvaluationResult } from './resultTypes';
import { magnetFieldText } from './writtenUnit';

export function quoteMagnetTable(r: Pick<EvaluationResult, 'beams' | 'magnets'>): void {
  for (const b of r.beams) {
    const m = r.magnets.find((x) => x.name === b.magnet);
    if (!m || m.field_T === undefined) continue;
    const text = strongMagnetCaution(magnetFieldText(m.field_T, m.field_T_unc, m.field_unit));
    b.cautions = b.cautions.map((c) => (c.startsWith(STRONG_MAGNET_START) ? text : c));
  }
}
