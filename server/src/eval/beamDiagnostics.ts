/** Diagnostics from a beam's evaluation: engine problems and unresolvable peaks (with the gradient that would resolve them). */
import type { Problem } from '../format/ast';
import type { BeamModel } from '../model/types';
import type { BeamEvaluation } from './beamEvaluation';
import { EVAL_RULES } from './evalCodes';
import { trimNumber } from './quantityText';

export function beamDiagnostics(beam: BeamModel, e: BeamEvaluation): Problem[] {
  const out: Problem[] = [];
  const where = beam.slits?.range ?? beam.nameRange;
  for (const i of e.issues) {
    if (i.severity === 'info') continue;
    out.push({ code: 'beam-geometry', severity: i.severity, message: `beam '${beam.name}': ${i.message}`, range: where, data: { engineCode: i.code } });
  }
  const r = e.result;
  if (!r.computed || r.all_resolved !== false) return out;
  const merged = r.pairs.filter((p) => !p.resolved);
  const names = merged.map((p) => `${peakName(r.peaks[p.left]?.members)} and ${peakName(r.peaks[p.right]?.members)}`);
  const gradient = beam.magnet?.gradientTPerM;
  const fix = r.resolving_gradient_T_per_m;
  const advice =
    typeof fix === 'number'
      ? ` A gradient of at least ${trimNumber(Math.abs(fix), 3)} T/m would resolve them.`
      : ' No gradient up to 100 times the present one resolves them; change the slits, the source or the drift.';
  const related = [{ message: `beam '${beam.name}' uses this magnet`, range: beam.nameRange }];
  out.push({
    code: 'beam-unresolved',
    severity: EVAL_RULES['beam-unresolved'].severity,
    message: `beam '${beam.name}': ${merged.length} neighbouring peak pair${merged.length === 1 ? '' : 's'} will not be resolved on the detector (${names.join('; ')}).${advice}`,
    range: gradient?.range ?? beam.nameRange,
    related,
    ...(typeof fix === 'number' ? { data: { resolvingGradientTPerM: Math.abs(fix) } } : {}),
  });
  return out;
}

function peakName(members: string[] | undefined): string {
  if (!members || members.length === 0) return '?';
  return members.length === 1 ? members[0]! : `${members[0]} (+${members.length - 1})`;
}
