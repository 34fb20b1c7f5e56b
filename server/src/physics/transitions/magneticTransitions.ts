/**
 * Magnetic-dipole (RF/microwave) transitions between the sublevels of one level at one
 * field: frequency, df/dB, d²f/dB², strength and Rabi frequency per tesla of drive.
 * Derivatives come from the engine, not from finite differences:
 *   dE/dB (Hz/T) = −momentJT / h   (momentJT = −∂E/∂B in J/T, Hellmann–Feynman)
 *   d²E/dB² (Hz/T²) = d2EdB2
 * so df/dB = −(μ_u − μ_l)/h and d²f/dB² = E_u'' − E_l''.
 */
import { BOHR_MAGNETON_HZ_PER_T, PLANCK_H } from '../constants';
import { solveLevel } from '../engine';
import type { LevelSpec, SublevelState } from '../engine';
import { polarizationOf } from './emissionPattern';
import { magneticAmplitude, momentParts, type MomentParts } from './magneticDipoleElement';
import { coupledMomentum, tagOf } from './sublevelTag';
import type { MagneticOptions, MagneticResult, MagneticTransition } from './types';

/** dE/dB of one state in Hz/T. */
export function slopeHzPerT(s: SublevelState): number {
  return -s.momentJT / PLANCK_H;
}

/** Is (lower, upper) a two-photon Δm = ±2 pair between different F (or J) manifolds? */
function isTwoPhotonPair(lower: SublevelState, upper: SublevelState): boolean {
  return Math.abs(upper.twoM - lower.twoM) === 4 && coupledMomentum(lower.low) !== coupledMomentum(upper.low);
}

/**
 * The transition record of one pair (lower below upper in energy), or null when the pair
 * has no M1 element by symmetry (|Δm| > 1) and is not a requested two-photon pair.
 */
export function transitionOf(
  lower: SublevelState,
  upper: SublevelState,
  parts: MomentParts,
  twoPhoton: boolean,
): MagneticTransition | null {
  const twoQ = upper.twoM - lower.twoM;
  const base = {
    lower: tagOf(lower),
    upper: tagOf(upper),
    q: twoQ / 2,
    frequencyHz: upper.energyHz - lower.energyHz,
    dfdB: slopeHzPerT(upper) - slopeHzPerT(lower),
    d2fdB2: upper.d2EdB2 - lower.d2EdB2,
  };
  if (Math.abs(twoQ) <= 2) {
    const amp = magneticAmplitude(lower, upper, parts);
    // π is driven by b ∥ B (element of M_z); σ by linear b ⊥ B, whose M_x element is |M_±1|/√2.
    const drive = twoQ === 0 ? Math.abs(amp) : Math.abs(amp) / Math.SQRT2;
    return { ...base, kind: polarizationOf(twoQ), strength: amp * amp, rabiHzPerT: BOHR_MAGNETON_HZ_PER_T * drive };
  }
  if (twoPhoton && isTwoPhotonPair(lower, upper)) return { ...base, kind: 'two-photon', strength: null, rabiHzPerT: null };
  return null;
}

/** All transitions among already solved states (sorted by energy), weak one-photon ones dropped. */
export function transitionsAmong(
  states: readonly SublevelState[],
  spec: LevelSpec,
  opts: MagneticOptions = {},
): MagneticTransition[] {
  const parts = momentParts(spec);
  const twoPhoton = opts.twoPhoton === true;
  const dropBelow = Number.isFinite(opts.dropBelow) && (opts.dropBelow as number) >= 0 ? (opts.dropBelow as number) : 1e-12;
  const found: MagneticTransition[] = [];
  for (let i = 0; i < states.length; i++) {
    for (let j = i + 1; j < states.length; j++) {
      const t = transitionOf(states[i], states[j], parts, twoPhoton);
      if (t) found.push(t);
    }
  }
  const largest = found.reduce((m, t) => Math.max(m, t.strength ?? 0), 0);
  const kept = found.filter((t) => t.strength === null || (t.strength > 0 && t.strength >= dropBelow * largest));
  kept.sort((a, b) => a.frequencyHz - b.frequencyHz || a.lower.index - b.lower.index || a.upper.index - b.upper.index);
  return kept;
}

export function magneticTransitions(spec: LevelSpec, fieldT: number, opts: MagneticOptions = {}): MagneticResult {
  const solved = solveLevel(spec, fieldT);
  const issues = [...solved.issues];
  if (solved.states.length === 0) return { fieldT, transitions: [], issues };
  return { fieldT, transitions: transitionsAmong(solved.states, spec, opts), issues };
}
