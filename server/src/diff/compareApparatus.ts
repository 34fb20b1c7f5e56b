/** Fields, magnets and beams: the settings as written, the peaks on the detector and whether they are resolved. */
import type { BeamResult, MagnetResult } from '../eval/resultTypes';
import { ChangeList, pairByKey } from './changeList';
import type { DiffThresholds } from './diffTypes';
import { field, gradient, length, writtenLength } from './writers';

/** A setting the user wrote changes when its value does at all (beyond rounding in the last digits). */
const WRITTEN = (x: number | undefined, y: number | undefined): number => Math.max(Math.abs(x ?? 0), Math.abs(y ?? 0)) * 1e-12;

export function compareField(a: { field_T?: number; field_unit?: string }, b: { field_T?: number; field_unit?: string }): ChangeList {
  const list = new ChangeList();
  list.number('field', a.field_T, b.field_T, WRITTEN(a.field_T, b.field_T), field({ unit: b.field_unit ?? a.field_unit }), 'T');
  return list;
}

export function compareMagnet(a: MagnetResult, b: MagnetResult): ChangeList {
  const list = new ChangeList();
  list.number('field', a.field_T, b.field_T, WRITTEN(a.field_T, b.field_T), field({ unit: b.field_unit ?? a.field_unit }), 'T');
  list.number('gradient', a.gradient_T_per_m, b.gradient_T_per_m, WRITTEN(a.gradient_T_per_m, b.gradient_T_per_m), gradient(b.gradient_unit ?? a.gradient_unit), 'T/m');
  list.number('length', a.length_m, b.length_m, WRITTEN(a.length_m, b.length_m), writtenLength(b.length_unit ?? a.length_unit), 'm');
  return list;
}

const peakKey = (p: { members: string[] }): string => p.members.join(' + ');

export function compareBeam(a: BeamResult, b: BeamResult, t: DiffThresholds): ChangeList {
  const list = new ChangeList();
  list.value('species', a.species, b.species);
  list.value('level', a.level, b.level);
  list.value('magnet', a.magnet, b.magnet);
  list.value('computed', a.computed, b.computed);
  list.value('all peaks resolved', a.all_resolved, b.all_resolved);
  const peaks = pairByKey(a.peaks, b.peaks, peakKey);
  list.presence('peak', peaks.oldKeys, peaks.newKeys);
  for (const [pa, pb] of peaks.pairs) list.number('peak position', pa.position_m, pb.position_m, t.length_m, length, 'm', { subject: peakKey(pa) });
  const pairName = (r: BeamResult, p: { left: number; right: number }): string => `${peakKey(r.peaks[p.left]!)} | ${peakKey(r.peaks[p.right]!)}`;
  const verdicts = pairByKey(
    a.pairs.map((p) => ({ name: pairName(a, p), resolved: p.resolved })),
    b.pairs.map((p) => ({ name: pairName(b, p), resolved: p.resolved })),
    (p) => p.name,
  );
  for (const [pa, pb] of verdicts.pairs) list.value('resolved', pa.resolved, pb.resolved, { subject: pa.name });
  return list;
}
