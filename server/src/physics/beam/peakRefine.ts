/**
 * Peak positions off the grid: the binned profile puts a peak only to ~1e-4 of its FWHM, so
 * the position is refined on the exact profile of the peak's sublevels,
 *   P(x) = Σ_i w_i (ρ_i ⊗ box_a ⊗ box_b ⊗ box_w)(x),
 * ρ_i the density of the deflection z = k_i/v². Each box turns a function into a divided
 * difference of its antiderivative, so with H(e) = ∫_{−∞}^{e} P(z ≤ u) du = e P(z ≤ e) − E[z; z ≤ e]
 * (both from the speed law's cumulative integrals, exact for the oven)
 *   P_i(x) = (1/(a b w)) Σ_{s,t = ±1} s t ∫_{x + sa/2 + tb/2 − w/2}^{x + sa/2 + tb/2 + w/2} H(z) dz,
 * and (1/(a b)) Σ s t H(x + sa/2 + tb/2) for a point detector (w = 0). The integrals are
 * Gauss–Legendre over spans of the detector width, where H is smooth. The slope needs no
 * antiderivative: with c = x + sa/2 + tb/2,
 *   P_i'(x) = (1/(a b w)) Σ s t [H(c + w/2) − H(c − w/2)],  and (1/(a b)) Σ s t P(z ≤ c) for w = 0,
 * (the bracket computed as ∫ P(z ≤ u) du over the detector width, Gauss–Legendre), and the mode is
 * its zero, found by bisection around the grid's estimate. A search on the values
 * settled a flat top only to ~√ε of the width (mirror-image peaks then differed by 2e-6 of their
 * position); the slope's sign settles it to its round-off (docs/beam.md §4 gives the measured accuracy).
 */
import { cumulativeAt } from './depositDeflections';
import { gaussLegendre } from './gaussLegendre';
import type { SlitImage } from './slitImage';
import type { SpeedLaw } from './speedLaw';
import { bracketedRoot } from '../bracketedRoot';
import { mirrorSymmetric } from '../mirrorSymmetry';

export interface RefineMember {
  /** k in z = k/v², m³/s². */
  k: number;
  /** Population weight. */
  weight: number;
}

/** Gauss–Legendre nodes per detector width (H is smooth on that scale: its scale is the deflection spread). */
const NODES = 8;
const at = new Float64Array(2);

/** ∫_{−∞}^{e} P(z ≤ u) du for one sublevel. */
function antiderivative(e: number, k: number, law: SpeedLaw): number {
  if (k === 0) return Math.max(e, 0);
  cumulativeAt(e, k, law, at);
  return e * at[0] - at[1];
}

/** ∫_lo^hi f(z) dz by Gauss–Legendre, split at 0 where an undeflected part has its kink. */
function gaussIntegral(f: (e: number, k: number, law: SpeedLaw) => number, lo: number, hi: number, k: number, law: SpeedLaw): number {
  if (lo < 0 && hi > 0) return gaussIntegral(f, lo, 0, k, law) + gaussIntegral(f, 0, hi, k, law);
  const { nodes, weights } = gaussLegendre(NODES);
  const mid = 0.5 * (lo + hi);
  const half = 0.5 * (hi - lo);
  let s = 0;
  for (let j = 0; j < NODES; j++) s += weights[j] * f(mid + half * nodes[j], k, law);
  return s * half;
}

/** ∫_lo^hi H(z) dz. */
function integral(lo: number, hi: number, k: number, law: SpeedLaw): number {
  return gaussIntegral(antiderivative, lo, hi, k, law);
}

/** P(z ≤ e) for one sublevel: the slope of its antiderivative H. */
function cumulative(e: number, k: number, law: SpeedLaw): number {
  if (k === 0) return e >= 0 ? 1 : 0;
  cumulativeAt(e, k, law, at);
  return at[0];
}

/**
 * ∫_lo^hi P(z ≤ u) du = H(hi) − H(lo), by Gauss–Legendre like `integral`: the difference of H itself
 * cancels to the detector width's share of values of the size of the deflection, and left the slope
 * zero's position 1e-9 of itself in round-off; the integral keeps the full digits of P.
 */
function cumulativeIntegral(lo: number, hi: number, k: number, law: SpeedLaw): number {
  if (k === 0) return Math.max(hi, 0) - Math.max(lo, 0);
  return gaussIntegral(cumulative, lo, hi, k, law);
}

/**
 * Σ_members w/(a b) Σ_{s,t = ±1} s t g(c), c = x + s a/2 + t b/2, with g the detector's average of
 * `span` over its width, or `point` at c for a point detector: the box form both the profile and
 * its slope take.
 */
function boxSum(
  x: number,
  members: readonly RefineMember[],
  law: SpeedLaw,
  image: SlitImage,
  point: (e: number, k: number, law: SpeedLaw) => number,
  span: (lo: number, hi: number, k: number, law: SpeedLaw) => number,
): number {
  const a = image.boxAM;
  const b = image.boxBM;
  const w = image.detectorM;
  let total = 0;
  for (const m of members) {
    let sum = 0;
    for (const s of [-1, 1]) {
      for (const t of [-1, 1]) {
        const c = x + (s * a) / 2 + (t * b) / 2;
        sum += s * t * (w > 0 ? span(c - w / 2, c + w / 2, m.k, law) / w : point(c, m.k, law));
      }
    }
    total += (m.weight * sum) / (a * b);
  }
  return total;
}

/** The exact profile's slope dP/dx at x, per square metre: no quadrature beyond the detector width's. */
export function exactProfileSlope(x: number, members: readonly RefineMember[], law: SpeedLaw, image: SlitImage): number {
  return boxSum(x, members, law, image, cumulative, cumulativeIntegral);
}

/** The exact (unbinned) profile of the members at x, per metre, weights as given. */
export function exactProfile(x: number, members: readonly RefineMember[], law: SpeedLaw, image: SlitImage): number {
  return boxSum(x, members, law, image, antiderivative, integral);
}

/**
 * The mode of the members' exact profile within about `guessM` ± 1.5 `stepM` (the grid's estimate and
 * about one bin): the zero of its slope, bisected down to neighbouring doubles. The guess itself
 * when the refinement cannot improve on it (a single-speed beam's flat top has no unique mode;
 * slits of zero width have no box form; a slope of one sign across the bracket means the guess
 * was not at the top).
 */
export function refinePeak(guessM: number, stepM: number, members: readonly RefineMember[], law: SpeedLaw, image: SlitImage): number {
  // Members that pair off as ±k with equal weights (a merged σ pair of a J = 1/2 level), or all undeflected,
  // make a profile symmetric about the axis: its top is at 0 exactly, not at the grid's round-off of 0.
  if (mirrorSymmetric(members, (m) => m.k, (m) => m.weight)) return 0;
  if (law.singleSpeed !== undefined || !(image.boxAM > 0 && image.boxBM > 0) || !(stepM > 0)) return guessM;
  // The kernel is symmetric: a peak deflected to −z is the mirror image of one at +z, computed the same way.
  if (members.every((m) => m.k <= 0)) return -refinePeak(-guessM, stepM, members.map((m) => ({ k: -m.k, weight: m.weight })), law, image);
  // The bracket is cut from a lattice of multiples of a power of two (h ≥ 1.5 bins): the bisection then
  // visits the same points whatever the guess, so the answer inside the slope's round-off band does not
  // depend on it (mirror-image peaks of a grid that is not symmetric come out exact negatives).
  const h = 2 ** Math.ceil(Math.log2(1.5 * stepM));
  const j = Math.floor(guessM / h);
  const slope = (x: number): number => exactProfileSlope(x, members, law, image);
  // A maximum needs the slope rising into it and falling after it. The cells tried: the guess's own,
  // then its nearer neighbour, then the other (two tops of a merged peak within a bin keep the grid's);
  // none turning down means the guess was not at a top, and it is kept.
  const slopes = [slope((j - 1) * h), slope(j * h), slope((j + 1) * h), slope((j + 2) * h)];
  const nearerLeft = guessM - j * h < h / 2;
  for (const i of nearerLeft ? [j, j - 1, j + 1] : [j, j + 1, j - 1]) {
    const before = slopes[i - j + 1]!;
    const after = slopes[i - j + 2]!;
    if (before === 0 && after < 0) return i * h;
    if (before > 0 && after <= 0) {
      const x = after === 0 ? (i + 1) * h : bracketedRoot(slope, i * h, (i + 1) * h);
      return Number.isFinite(x) ? x : guessM;
    }
  }
  return guessM;
}
