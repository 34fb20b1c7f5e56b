/**
 * What an observer sees of each Zeeman component, looking along or across the field through an
 * optional analyser. The weights are the dipole radiation pattern (textbook, e.g. Corney,
 * "Atomic and Laser Spectroscopy", ch. 5; the same as `emissionWeight` in transitions/):
 *   along the field (θ = 0): σ± seen as circular light of weight 1, π not at all;
 *   across it (θ = 90°): π as linear light ∥ B of weight 1, σ± as linear light ⊥ B of weight ½.
 * Across the field σ+ and σ− have the same linear polarisation, so no analyser separates them.
 */
import { emissionWeight } from '../transitions/emissionPattern';
import type { Polarization } from '../transitions/types';

export type ViewDirection = 'along' | 'across';
/** `all`: no analyser; `pi`/`sigma`: a linear polariser ∥/⊥ B (across) or a circular analyser (along: `sigma+`, `sigma-`, or `sigma` for both). */
export type Analyser = 'all' | 'pi' | 'sigma' | 'sigma+' | 'sigma-';

export function viewAngleRad(direction: ViewDirection): number {
  return direction === 'along' ? 0 : Math.PI / 2;
}

export function passesAnalyser(polarization: Polarization, analyser: Analyser): boolean {
  switch (analyser) {
    case 'all':
      return true;
    case 'pi':
      return polarization === 'π';
    case 'sigma':
      return polarization !== 'π';
    case 'sigma+':
      return polarization === 'σ+';
    case 'sigma-':
      return polarization === 'σ−';
  }
}

/** Relative intensity of a component of unit strength. */
export function observedWeight(polarization: Polarization, direction: ViewDirection, analyser: Analyser): number {
  if (!passesAnalyser(polarization, analyser)) return 0;
  // emissionWeight leaves cos²(π/2) ≈ 4e-33 for π along… exact zeros read better.
  const w = emissionWeight(polarization, viewAngleRad(direction));
  return Math.abs(w) < 1e-15 ? 0 : w;
}

/** Why an analyser setting shows nothing or cannot work from that direction; undefined when it is fine. */
export function analyserProblem(direction: ViewDirection, analyser: Analyser): string | undefined {
  if (direction === 'along' && analyser === 'pi') return 'π light is not emitted along the field, so looking along it through a π analyser shows nothing; look across the field, or choose sigma';
  if (direction === 'across' && (analyser === 'sigma+' || analyser === 'sigma-')) {
    return 'across the field σ+ and σ− light are both linearly polarised perpendicular to the field, so no analyser separates them; use sigma for both, or look along the field';
  }
  return undefined;
}
