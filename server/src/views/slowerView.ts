/** A slower's result → the profile view's data (render/slower.ts). */
import type { SlowerResult } from '../eval/slowerResultTypes';
import type { SlowerViewData } from '../render/slower';
import { adaptiveSamples } from '../render/sampled';
import { designSign, idealField } from '../physics/slower/idealProfile';

/** The curves are smooth to this fraction of their span (well under a pixel on the figure). */
const SMOOTH = 1e-3;

/**
 * The ideal B(z) = B_bias ± ΔB √(1 − z/L0) (and, on it, the resonant speed v0 √(1 − z/L0)) from
 * the slower's own numbers, sampled densely where the root steepens toward z = L0.
 */
function idealCurves(s: SlowerResult, coils: boolean): Pick<SlowerViewData, 'idealFine' | 'resonantFine'> {
  const { stop_length_m: l0, delta_B_T: dB, bias_T: bias, length_m: len } = s;
  if (!(l0! > 0) || !(len! > 0) || !Number.isFinite(dB) || !Number.isFinite(bias) || !(s.capture_m_per_s! > 0)) return {};
  const profile = { lengthM: len!, stopLengthM: l0!, biasT: bias!, deltaBT: dB!, sign: designSign(s.design) };
  const root = (z: number): number => Math.sqrt(Math.max(0, 1 - z / l0!));
  const b = adaptiveSamples((z) => idealField(profile, z).BT, 0, len!, SMOOTH * Math.abs(dB!));
  if (coils) return { idealFine: { zM: b.x, values: b.y } };
  // Without coils the atom is resonant with the ideal field itself.
  const v0 = s.capture_m_per_s!;
  const v = adaptiveSamples((z) => v0 * root(z), 0, len!, SMOOTH * v0);
  return { idealFine: { zM: b.x, values: b.y }, resonantFine: { zM: v.x, values: v.y } };
}

export function slowerView(s: SlowerResult): SlowerViewData | undefined {
  const samples = s.samples;
  if (!s.computed || !samples || samples.length < 2) return undefined;
  const coils = samples.every((x) => x.B_coils_T !== undefined);
  return {
    title: `Slower ${s.name}${s.line ? ` on ${s.line}` : ''}: ${s.design.replace('_', '-')} field profile`,
    zM: samples.map((x) => x.z_m),
    idealT: samples.map((x) => x.B_ideal_T),
    ...idealCurves(s, coils),
    ...(coils ? { coilsT: samples.map((x) => x.B_coils_T!) } : {}),
    resonantMPerS: samples.map((x) => x.resonant_speed_m_per_s),
    flightMPerS: samples.map((x) => x.flight_speed_m_per_s ?? NaN),
    ...(s.coils?.drop_at_m !== undefined ? { dropAtM: s.coils.drop_at_m } : {}),
    ...(s.zero_crossing_m !== undefined ? { zeroCrossingM: s.zero_crossing_m } : {}),
  };
}
