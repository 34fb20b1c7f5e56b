/** A slower's result in words and numbers, for the eval report, `sublevel slower` and the hover. */
import { MISSING, frequencyText, lengthText, speedText, trimNumber, withUncertainty } from './quantityText';
import type { SlowerResult } from './slowerResultTypes';
import { fieldInUnit } from './writtenUnit';

const DESIGN_WORDS: Record<SlowerResult['design'], string> = {
  decreasing: 'decreasing field',
  increasing: 'increasing field',
  spin_flip: 'spin-flip (field through zero)',
};

/** Fields in the unit family of the bias the file wrote, else in gauss (the lab habit for slowers); below ΔB × 1e-9 they are 0. */
function fieldOf(s: SlowerResult): (t: number | undefined) => string {
  const noise = { scale: (s.delta_B_T ?? 1) * 1e4 };
  return (t) => (s.bias_unit ? fieldInUnit(t, { family: s.bias_unit }) : t === undefined || !Number.isFinite(t) ? MISSING : `${trimNumber(t * 1e4, 5, noise)} G`);
}

/** The one-line summary: length, field span, detuning. */
export function slowerSummary(s: SlowerResult): string {
  if (!s.computed) return `slower ${s.name}: not computed (see diagnostics)`;
  const f = fieldOf(s);
  return `${DESIGN_WORDS[s.design]} slower, ${lengthText(s.length_m)} long, B from ${f(s.entry_field_T)} to ${f(s.exit_field_T)}, laser ${frequencyText(s.detuning_Hz, 5)} from the line`;
}

/** The inlay hint after the slower's header: length, field from entrance to exit, detuning. */
export function slowerHint(s: SlowerResult): string | undefined {
  if (!s.computed) return undefined;
  const f = fieldOf(s);
  return `${lengthText(s.length_m)}, ${f(s.entry_field_T)} → ${f(s.exit_field_T)}, laser ${frequencyText(s.detuning_Hz, 5)}`;
}

export function slowerReport(s: SlowerResult): string[] {
  const out = [`slower ${s.name}${s.line ? ` on line ${s.line}` : ''} (${DESIGN_WORDS[s.design]})`];
  if (!s.computed) {
    out.push('  not computed: the slower lacks something it needs (see diagnostics)');
    return out;
  }
  const f = fieldOf(s);
  const gammaMHz = s.natural_linewidth_Hz !== undefined ? frequencyText(s.natural_linewidth_Hz, 4) : '—';
  out.push(`  line: λ = ${withUncertainty(s.wavelength_m, s.wavelength_m_unc, (v) => lengthText(v, 9))} (vacuum), Γ/2π = ${gammaMHz} (τ = ${trimNumber((s.lifetime_s ?? NaN) * 1e9, 6)} ns) [${s.lifetime_source ?? '—'}]`);
  if (s.driven_pair) {
    const p = s.driven_pair;
    out.push(`  driven pair: ${p.lower} → ${p.upper} by ${s.polarisation === 'sigma-' ? 'σ−' : 'σ+'} light (relative to the atoms' direction), ${p.cycling ? 'stretched: cycles' : 'NOT cycling'}; Zeeman shift ${frequencyText(p.rate_Hz_per_T * 1e-4, 6)}/G`);
  }
  out.push(`  speeds: capture ${speedText(s.capture_m_per_s)} → final ${speedText(s.final_m_per_s)}`);
  out.push(`  deceleration: a_max = ħkΓ/2m = ${trimNumber(s.a_max_m_per_s2, 5)} m/s², design η a_max = ${trimNumber(s.design_deceleration_m_per_s2, 5)} m/s² (η = ${s.safety}), light gives at most ${trimNumber(s.reachable_deceleration_m_per_s2, 5)} m/s² at s0 = ${s.saturation}`);
  out.push(`  length ${lengthText(s.length_m)} (to stop: ${lengthText(s.stop_length_m)})`);
  out.push(`  profile B(z) = B_bias ${s.design === 'increasing' ? '−' : '+'} ΔB √(1 − z/L0): B_bias = ${f(s.bias_T)}, ΔB = ${f(s.delta_B_T)}, L0 = ${lengthText(s.stop_length_m)}`);
  out.push(`  field at the entrance ${f(s.entry_field_T)}, at the exit ${f(s.exit_field_T)}${s.zero_crossing_m !== undefined ? `, through zero at z = ${lengthText(s.zero_crossing_m)}` : ''}`);
  out.push(`  laser detuning from the zero-field line: ${frequencyText(s.detuning_Hz, 6)}${(s.detuning_Hz ?? 0) < 0 ? ' (red)' : ''}`);
  if (s.flight) {
    out.push(
      `  an atom at the capture speed in the ideal field: ${s.flight.stopped_at_m !== undefined ? `stops at ${lengthText(s.flight.stopped_at_m)}` : `leaves at ${speedText(s.flight.final_m_per_s)}`} after ${trimNumber(s.flight.time_s * 1e3, 4)} ms`,
    );
  }
  if (s.coils) {
    const c = s.coils;
    out.push(`  coils (${c.sources.join(', ')}): catch atoms up to ${speedText(c.capture_m_per_s)}, need up to ${trimNumber(c.worst_over_design, 4)} × η a_max; ${c.drop_at_m !== undefined ? `atoms DROPPED at z = ${lengthText(c.drop_at_m)}` : 'no atoms dropped'}`);
    if (c.flight) out.push(`    an atom at the capture speed in the coils' field: ${c.flight.stopped_at_m !== undefined ? `stops at ${lengthText(c.flight.stopped_at_m)}` : `leaves at ${speedText(c.flight.final_m_per_s)}`}`);
  }
  out.push('  cautions:');
  for (const c of s.cautions) out.push(`    - ${c}`);
  return out;
}
