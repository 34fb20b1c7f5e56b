/** Optical lines and RF/microwave resonances: centres, components, spectra, transition frequencies, resonance fields. */
import type { LineResult, MagneticTransitionResult, ResonanceResult, SpectrumResult } from '../eval/resultTypes';
import { ChangeList, pairByKey } from './changeList';
import type { DiffThresholds } from './diffTypes';
import { field, frequency, gFactor, strength } from './writers';

const atName = (p: { source: { kind: string; name: string } }): string => `${p.source.kind} ${p.source.name}`;
const transitionKey = (x: { lower_label: string; upper_label: string; kind?: string; polarization?: string }): string =>
  `${x.lower_label} → ${x.upper_label} (${x.kind ?? x.polarization})`;

export function compareLine(a: LineResult, b: LineResult, t: DiffThresholds): ChangeList {
  const list = new ChangeList();
  list.value('lower level', a.lower, b.lower);
  list.value('upper level', a.upper, b.upper);
  list.value('written as emission', a.written_as_emission ?? false, b.written_as_emission ?? false);
  list.number('g_eff', a.g_eff, b.g_eff, t.g, gFactor, '');
  list.number('line centre', a.line_centre_Hz, b.line_centre_Hz, t.frequency_Hz, frequency, 'Hz');
  const points = pairByKey(a.at_fields, b.at_fields, atName);
  list.presence('working field', points.oldKeys, points.newKeys);
  for (const [pa, pb] of points.pairs) {
    const at = atName(pa);
    const comps = pairByKey(pa.components, pb.components, transitionKey);
    list.presence('component', comps.oldKeys, comps.newKeys, { at });
    for (const [ca, cb] of comps.pairs) {
      const subject = transitionKey(ca);
      list.number('offset', ca.offset_Hz, cb.offset_Hz, t.frequency_Hz, frequency, 'Hz', { subject, at });
      list.number('strength', ca.strength, cb.strength, t.strength, strength, '', { subject, at });
    }
    compareSpectrum(list, pa.spectrum, pb.spectrum, at, t);
  }
  return list;
}

/** A line's synthesized spectrum: how it is viewed, where its highest peak is and how wide its line shape. */
function compareSpectrum(list: ChangeList, a: SpectrumResult | undefined, b: SpectrumResult | undefined, at: string, t: DiffThresholds): void {
  list.presence('spectrum', a ? ['spectrum'] : [], b ? ['spectrum'] : [], { at });
  if (!a || !b) return;
  const where = { at };
  list.value('spectrum viewed', a.direction, b.direction, where);
  list.value('spectrum light', a.light, b.light, where);
  list.number('spectrum peak offset', a.peak_offset_Hz, b.peak_offset_Hz, t.frequency_Hz, frequency, 'Hz', where);
  list.number('Voigt FWHM', a.voigt_fwhm_Hz, b.voigt_fwhm_Hz, t.frequency_Hz, frequency, 'Hz', where);
  list.number('Doppler FWHM', a.doppler_fwhm_Hz, b.doppler_fwhm_Hz, t.frequency_Hz, frequency, 'Hz', where);
  list.number('natural FWHM', a.natural_fwhm_Hz, b.natural_fwhm_Hz, t.frequency_Hz, frequency, 'Hz', where);
  list.number('instrument FWHM', a.instrument_fwhm_Hz, b.instrument_fwhm_Hz, t.frequency_Hz, frequency, 'Hz', where);
}

function compareTransitions(list: ChangeList, a: readonly MagneticTransitionResult[], b: readonly MagneticTransitionResult[], at: string, t: DiffThresholds): void {
  const pairs = pairByKey(a, b, transitionKey);
  list.presence('transition', pairs.oldKeys, pairs.newKeys, { at });
  for (const [ta, tb] of pairs.pairs) list.number('frequency', ta.frequency_Hz, tb.frequency_Hz, t.frequency_Hz, frequency, 'Hz', { subject: transitionKey(ta), at });
}

export function compareResonance(a: ResonanceResult, b: ResonanceResult, t: DiffThresholds): ChangeList {
  const list = new ChangeList();
  const family = b.range_units?.[0] ?? a.range_units?.[0];
  const writeField = field({ family });
  list.value('level', a.level, b.level);
  list.number('range from', a.range_T[0], b.range_T[0], t.field_T, field({ unit: b.range_units?.[0] }), 'T');
  list.number('range to', a.range_T[1], b.range_T[1], t.field_T, field({ unit: b.range_units?.[1] }), 'T');
  const points = pairByKey(a.at_fields, b.at_fields, atName);
  list.presence('working field', points.oldKeys, points.newKeys);
  for (const [pa, pb] of points.pairs) compareTransitions(list, pa.transitions, pb.transitions, atName(pa), t);
  // Resonances and field-insensitive points are found by a scan: several may share a transition, so they are paired in order.
  const numbered = <T>(xs: readonly T[] | undefined, key: (x: T) => string): { x: T; key: string }[] => {
    const seen = new Map<string, number>();
    return (xs ?? []).map((x) => {
      const k = key(x);
      const n = (seen.get(k) ?? 0) + 1;
      seen.set(k, n);
      return { x, key: n === 1 ? k : `${k} #${n}` };
    });
  };
  const res = pairByKey(numbered(a.resonances, (r) => transitionKey(r.transition)), numbered(b.resonances, (r) => transitionKey(r.transition)), (r) => r.key);
  list.presence('resonance', res.oldKeys, res.newKeys);
  for (const [ra, rb] of res.pairs) list.number('resonance field', ra.x.field_T, rb.x.field_T, t.field_T, writeField, 'T', { subject: ra.key });
  const flat = pairByKey(numbered(a.field_insensitive, () => 'field-insensitive point'), numbered(b.field_insensitive, () => 'field-insensitive point'), (p) => p.key);
  list.presence('field-insensitive point', flat.oldKeys, flat.newKeys);
  for (const [fa, fb] of flat.pairs) {
    list.number('field', fa.x.field_T, fb.x.field_T, t.field_T, writeField, 'T', { subject: fa.key });
    list.number('frequency', fa.x.frequency_Hz, fb.x.frequency_Hz, t.frequency_Hz, frequency, 'Hz', { subject: fa.key });
  }
  return list;
}
