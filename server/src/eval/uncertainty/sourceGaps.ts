/**
 * Nothing silent: a source input whose uncertainty cannot reach a magnet's field, gradient and
 * the beams flown through it (sourceInputs.ts) gets `uncertainty-undefined` at the number the
 * file wrote, once, naming every magnet built from that source.
 */
import type { Problem } from '../../format/ast';
import type { MagnetModel } from '../../model/types';
import { reachesWritten, type SetupInputs } from './inputs';
import type { SourceGap, SourceGapReason } from './sourceInputs';

const WHY: Record<SourceGapReason, string> = {
  'onto-conductor': "moving it by its uncertainty puts a conductor on the beam line's centre, where the field has no value",
};

export function sourceGapProblems(magnets: readonly MagnetModel[], inp: SetupInputs): Problem[] {
  const byInput = new Map<string, { gap: SourceGap; magnets: string[] }>();
  for (const m of magnets) {
    for (const gap of inp.sourceGaps.get(m.name) ?? []) {
      const seen = byInput.get(gap.input.id);
      if (seen) seen.magnets.push(m.name);
      else byInput.set(gap.input.id, { gap, magnets: [m.name] });
    }
  }
  const problems: Problem[] = [];
  for (const { gap, magnets: names } of byInput.values()) {
    const range = gap.input.range ?? magnets.find((m) => m.name === names[0])?.nameRange;
    if (!range) continue;
    const which = names.map((n) => `'${n}'`).join(', ');
    problems.push({
      code: 'uncertainty-undefined',
      severity: reachesWritten(gap.input.sens, inp.table) ? 'warning' : 'info',
      message: `${gap.input.label}: ${WHY[gap.why]}; the uncertainties of magnet${names.length > 1 ? 's' : ''} ${which} (field and gradient at the beam line) and of the beams through ${names.length > 1 ? 'them' : 'it'} leave it out`,
      range,
    });
  }
  return problems;
}
