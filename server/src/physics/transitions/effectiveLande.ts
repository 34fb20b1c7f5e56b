/**
 * Effective Landé factor of a line between levels (J_l, g_l) and (J_u, g_u):
 *   g_eff = ½(g_u + g_l) + ¼(g_u − g_l)[J_u(J_u+1) − J_l(J_l+1)]
 * (standard textbook formula for the shift of the σ-component centroid), and the same
 * number measured from a list of components:
 *   g_eff = (c₊ − c₋) / (2 μ_B B/h),   c± = strength-weighted mean offset of the σ± components.
 * The centroid form is exact at any field inside this model (traces of the hyperfine
 * operators over m_I vanish; see docs/transitions.md), so for I ≠ 0 it agrees too.
 */
import { BOHR_MAGNETON_HZ_PER_T } from '../constants';
import type { DipoleComponent } from './types';

export interface LandeLevel {
  twoJ: number;
  gJ: number;
}

/** NaN when an input is not a finite number or twoJ is not a whole number ≥ 0. */
export function effectiveLandeFactor(lower: LandeLevel, upper: LandeLevel): number {
  const ok = (l: LandeLevel): boolean =>
    l !== null && typeof l === 'object' && Number.isInteger(l.twoJ) && l.twoJ >= 0 && Number.isFinite(l.gJ);
  if (!ok(lower) || !ok(upper)) return Number.NaN;
  const jj = (two: number): number => (two * (two + 2)) / 4;
  return 0.5 * (upper.gJ + lower.gJ) + 0.25 * (upper.gJ - lower.gJ) * (jj(upper.twoJ) - jj(lower.twoJ));
}

/** Raw σ sums needed for the centroid; kept separate so dropped weak components still count. */
export interface CentroidSums {
  plusWeight: number;
  plusMoment: number;
  minusWeight: number;
  minusMoment: number;
}

export function emptyCentroidSums(): CentroidSums {
  return { plusWeight: 0, plusMoment: 0, minusWeight: 0, minusMoment: 0 };
}

export function addToCentroid(sums: CentroidSums, q: number, strength: number, offsetHz: number): void {
  if (q > 0) {
    sums.plusWeight += strength;
    sums.plusMoment += strength * offsetHz;
  } else if (q < 0) {
    sums.minusWeight += strength;
    sums.minusMoment += strength * offsetHz;
  }
}

/** g_eff from σ centroids at `fieldT`; null without σ components or at zero field. */
export function landeFromSums(sums: CentroidSums, fieldT: number): number | null {
  if (sums.plusWeight <= 0 || sums.minusWeight <= 0 || fieldT === 0) return null;
  const plus = sums.plusMoment / sums.plusWeight;
  const minus = sums.minusMoment / sums.minusWeight;
  return (plus - minus) / (2 * BOHR_MAGNETON_HZ_PER_T * fieldT);
}

/** g_eff from an already computed component list (e.g. after dropping weak components). */
export function landeFromComponents(components: readonly DipoleComponent[], fieldT: number): number | null {
  const sums = emptyCentroidSums();
  for (const c of components) addToCentroid(sums, c.q, c.strength, c.offsetHz);
  return landeFromSums(sums, fieldT);
}
