/** Snapshot of an engine state as it enters a transition, and a stable identity for it. */
import type { LowFieldLabel, SublevelState } from '../engine';
import type { SublevelRef, SublevelTag } from './types';

export function tagOf(s: SublevelState): SublevelTag {
  return { index: s.index, twoM: s.twoM, energyHz: s.energyHz, low: s.low, high: s.high };
}

/**
 * Identity of a sublevel across fields: its low-field (adiabatic) label. Within a block
 * these follow the no-crossing rule and are continuous through B = 0 for generic constants
 * (see docs/engine.md), so the same key names the same state at every field.
 */
export function lowKey(low: LowFieldLabel): string {
  // A whole term has one |F, m_F> per J level: its J keeps them apart.
  if (low.scheme === 'F') return `F:${low.twoF}:${low.twoMF}${low.twoJ === undefined ? '' : `:J${low.twoJ}`}`;
  return `J:${low.twoJ}:${low.twoMJ}:${low.twoMI ?? 'x'}`;
}

/** Key of a user reference, or null when it names nothing sensible. */
export function refKey(ref: SublevelRef): string | null {
  if (ref === null || typeof ref !== 'object') return null;
  if ('twoF' in ref) {
    return Number.isInteger(ref.twoF) && Number.isInteger(ref.twoMF) ? `F:${ref.twoF}:${ref.twoMF}` : null;
  }
  if (!Number.isInteger(ref.twoJ) || !Number.isInteger(ref.twoMJ)) return null;
  const mi = ref.twoMI;
  if (mi !== undefined && mi !== null && !Number.isInteger(mi)) return null;
  return `J:${ref.twoJ}:${ref.twoMJ}:${mi ?? 'x'}`;
}

/** Total angular momentum of the low-field label (F or J), twice the value. */
export function coupledMomentum(low: LowFieldLabel): number {
  return low.scheme === 'F' ? low.twoF : low.twoJ;
}
