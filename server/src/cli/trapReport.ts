/** The readable report of `sublevel trap` (and the traps part of `sublevel eval`). */
import { gradientText, lengthText, MISSING } from '../eval/quantityText';
import type { TrapResult } from '../eval/trapResultTypes';
import { depthText, shapeText, shallowDepthNote, sublevelVerdict, trappedSublevelNotes, trapFieldUnit, trapSummaryLines } from '../eval/trapText';
import { table } from './table';

export function trapReport(t: TrapResult): string[] {
  const out = ['', ...trapSummaryLines(t).map((l, i) => (i === 0 ? l : `  ${l}`))];
  if (!t.computed) return out;
  const radius = t.region?.radius_m ?? 1;
  const unit = trapFieldUnit(t);
  out.push(
    ...table(
      ['sublevel', 'verdict', 'levitation', 'depth', 'sag', 'shape'],
      t.sublevels.map((s) => [
        `|${s.label}⟩`,
        sublevelVerdict(s, unit),
        s.levitation_T_per_m !== undefined ? gradientText(s.levitation_T_per_m, 4, undefined, unit) : MISSING,
        s.trapped ? depthText(s) : MISSING,
        s.sag_m !== undefined ? lengthText(s.sag_m, 3, { scale: radius }) : MISSING,
        s.trapped ? shapeText(s, unit) : MISSING,
      ]),
    ).map((l) => `  ${l}`),
  );
  for (const line of trappedSublevelNotes(t)) out.push(`  ${line}`);
  const shallow = shallowDepthNote(t);
  if (shallow) out.push(`  note: ${shallow}`);
  for (const c of t.cautions) out.push(`  caution: ${c}`);
  return out;
}
