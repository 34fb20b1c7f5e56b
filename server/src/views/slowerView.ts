/**
 * A slower's result → the profile view's data (render/slower.ts). The evaluation's samples are
 * already dense where a field bends (physics/slower/zGrid.ts), so every curve is drawn through them.
 */
import type { SlowerResult } from '../eval/slowerResultTypes';
import type { SlowerViewData } from '../render/slower';

export function slowerView(s: SlowerResult): SlowerViewData | undefined {
  const samples = s.samples;
  if (!s.computed || !samples || samples.length < 2) return undefined;
  const coils = samples.every((x) => x.B_coils_T !== undefined);
  return {
    title: `Slower ${s.name}${s.line ? ` on ${s.line}` : ''}: ${s.design.replace('_', '-')} field profile`,
    zM: samples.map((x) => x.z_m),
    idealT: samples.map((x) => x.B_ideal_T),
    ...(coils ? { coilsT: samples.map((x) => x.B_coils_T!) } : {}),
    resonantMPerS: samples.map((x) => x.resonant_speed_m_per_s),
    ...(coils && samples.every((x) => x.ideal_resonant_speed_m_per_s !== undefined) ? { idealResonantMPerS: samples.map((x) => x.ideal_resonant_speed_m_per_s!) } : {}),
    ...(s.bias_unit !== undefined ? { fieldWrittenUnit: s.bias_unit } : {}),
    flightMPerS: samples.map((x) => x.flight_speed_m_per_s ?? NaN),
    ...(s.coils?.drop_at_m !== undefined ? { dropAtM: s.coils.drop_at_m } : {}),
    ...(s.zero_crossing_m !== undefined ? { zeroCrossingM: s.zero_crossing_m } : {}),
  };
}
