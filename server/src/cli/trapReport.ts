/** The readable report of `sublevel trap` (and the traps part of `sublevel eval`). */
import { fieldText, frequencyText, lengthText, MISSING, trimNumber } from '../eval/quantityText';
import type { TrapResult } from '../eval/trapResultTypes';
import { depthText, gaussPerCmText, shapeText, sublevelVerdict, temperatureText, trapSummaryLines } from '../eval/trapText';
import { table } from './table';

export function trapReport(t: TrapResult): string[] {
  const out = ['', ...trapSummaryLines(t).map((l, i) => (i === 0 ? l : `  ${l}`))];
  if (!t.computed) return out;
  const radius = t.region?.radius_m ?? 1;
  out.push(
    ...table(
      ['sublevel', 'verdict', 'levitation', 'depth', 'sag', 'shape'],
      t.sublevels.map((s) => [
        `|${s.label}⟩`,
        sublevelVerdict(s),
        s.levitation_T_per_m !== undefined ? gaussPerCmText(s.levitation_T_per_m) : MISSING,
        s.trapped ? depthText(s) : MISSING,
        s.sag_m !== undefined ? lengthText(s.sag_m, 3, { scale: radius }) : MISSING,
        s.trapped ? shapeText(s) : MISSING,
      ]),
    ).map((l) => `  ${l}`),
  );
  for (const s of t.sublevels.filter((x) => x.trapped)) {
    const notes: string[] = [];
    if (s.field_at_minimum_T !== undefined) notes.push(`|B| at the minimum ${fieldText(s.field_at_minimum_T, 5, { scale: t.field_max_T ?? 0, relative: 1e-6 })}`);
    if (s.turning_field_T !== undefined) notes.push(`turns high-field seeking at ${fieldText(s.turning_field_T, 5)}`);
    if (s.larmor_Hz !== undefined) notes.push(`Larmor ${frequencyText(s.larmor_Hz, 4)}`);
    if (s.cloud_sizes_m) notes.push(`cloud 1/e sizes ${s.cloud_sizes_m.map((x) => lengthText(x, 3)).join(', ')}`);
    if (s.rf_cut) notes.push(`RF cut ${frequencyText(s.rf_cut.frequency_Hz, 7)} to |${s.rf_cut.to}⟩ at ${fieldText(s.rf_cut.field_T, 5)} (linear rule ${frequencyText(s.rf_cut.linear_Hz, 7)})`);
    if (s.majorana) notes.push(`Majorana loss ≈ ${trimNumber(s.majorana.rate_per_s, 2)} /s (lifetime ${lifetime(s.majorana.rate_per_s)})`);
    if (notes.length > 0) out.push(`  |${s.label}⟩: ${notes.join('; ')}`);
  }
  if (t.temperature_K !== undefined && t.sublevels.some((s) => s.trapped && s.depth_K !== undefined && s.depth_K < 5 * t.temperature_K!)) {
    out.push(`  note: some depths are below 5 × the cloud temperature ${temperatureText(t.temperature_K)}: the hottest atoms leave (common practice: depth ≳ 5–10 k_B T)`);
  }
  for (const c of t.cautions) out.push(`  caution: ${c}`);
  return out;
}

function lifetime(rate: number): string {
  if (!(rate > 0) || !Number.isFinite(rate)) return MISSING;
  const s = 1 / rate;
  return s >= 3600 ? `${trimNumber(s / 3600, 2)} h` : s >= 1 ? `${trimNumber(s, 2)} s` : `${trimNumber(s * 1e3, 2)} ms`;
}
