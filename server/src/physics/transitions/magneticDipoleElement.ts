/**
 * Magnetic-dipole matrix elements inside one level: the operator
 *   M_q = Σ_k g_k X^(k)_q        (hyperfine: g_J J + g_I I;  fine: g_L L + g_S S + g_I I)
 * in spherical components, X_0 = X_z and X_±1 = ∓(X_x ± iX_y)/√2 = ∓X_±/√2, so that
 * <m+1| X_+1 |m> = −sqrt(j(j+1) − m(m+1))/√2. The magnetic moment is μ = −μ_B M; its
 * phase does not matter for |<u|M_q|l>|².
 */
import type { LevelSpec, SublevelState } from '../engine';
import { basisIndex, keyOf, projectionsOf } from './basisLookup';

/** Twice the magnitude and the g-factor of each angular momentum, in the order of `projectionsOf`. */
export interface MomentParts {
  twoJ: number[];
  g: number[];
}

export function momentParts(spec: LevelSpec): MomentParts {
  if (spec.kind === 'hyperfine') return { twoJ: [spec.twoJ, spec.twoI], g: [spec.gJ, spec.gI] };
  const twoI = spec.twoI ?? 0;
  return { twoJ: [2 * spec.L, spec.twoS, twoI], g: [spec.gL, spec.gS, twoI === 0 ? 0 : (spec.gI ?? 0)] };
}

/** sqrt(j(j+1) − m(m+1)) for j = twoJ/2, m = twoM/2 (0 outside the multiplet). */
function ladder(twoJ: number, twoM: number): number {
  const v = (twoJ * (twoJ + 2) - twoM * (twoM + 2)) / 4;
  return v > 0 ? Math.sqrt(v) : 0;
}

/** <upper| M_q |lower> with q = m_upper − m_lower ∈ {−1, 0, 1}; 0 otherwise. */
export function magneticAmplitude(lower: SublevelState, upper: SublevelState, parts: MomentParts): number {
  const twoQ = upper.twoM - lower.twoM;
  if (Math.abs(twoQ) > 2) return 0;
  const upIndex = basisIndex(upper.basis);
  let amp = 0;
  for (let k = 0; k < lower.basis.length; k++) {
    const cl = lower.vector[k];
    if (cl === 0) continue;
    const ms = projectionsOf(lower.basis[k]);
    if (twoQ === 0) {
      const at = upIndex.get(keyOf(ms));
      if (at === undefined) continue;
      let diag = 0;
      for (let p = 0; p < ms.length; p++) diag += (parts.g[p] * ms[p]) / 2;
      amp += cl * upper.vector[at] * diag;
      continue;
    }
    const sign = twoQ > 0 ? 1 : -1;
    for (let p = 0; p < ms.length; p++) {
      if (parts.g[p] === 0) continue;
      const moved = ms.slice();
      moved[p] += twoQ;
      const at = upIndex.get(keyOf(moved));
      if (at === undefined) continue;
      // Raising: <m+1|X_+1|m> = −ladder(m)/√2; lowering: <m−1|X_−1|m> = +ladder(m−1)/√2.
      const coef = sign > 0 ? -ladder(parts.twoJ[p], ms[p]) : ladder(parts.twoJ[p], ms[p] - 2);
      amp += (cl * upper.vector[at] * parts.g[p] * coef) / Math.SQRT2;
    }
  }
  return amp;
}
