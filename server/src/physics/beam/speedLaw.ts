/**
 * What the pattern code needs to know about a flux-weighted speed law.
 * Every quantity is per unit flux (the law is normalised to 1).
 */
export interface SpeedLaw {
  /** Fraction of the flux slower than v (0 at v = 0, → 1 as v → ∞). */
  slowerFraction(v: number): number;
  /** ∫₀^v f(u)/u² du: the part of ⟨1/v²⟩ contributed by atoms slower than v, s²/m². */
  inverseSquareBelow(v: number): number;
  /**
   * Both of the above at one speed: into[0] = slowerFraction(v), into[1] =
   * inverseSquareBelow(v), the same values. For the pattern's per-bin-edge loop: one
   * call, shared work, and no boxed doubles (a double returned from a call that the
   * optimiser does not inline is a small garbage object).
   */
  cumulativeBelow(v: number, into: Float64Array): void;
  /** ⟨1/v²⟩ over the whole flux, s²/m²; deflection = (coefficient) × this on average. */
  meanInverseSquare: number;
  /** Flux-weighted mean speed ⟨v⟩, m/s. */
  meanSpeed: number;
  /** Flux-weighted rms spread √(⟨v²⟩ − ⟨v⟩²), m/s. */
  rmsSpread: number;
  /** Speed at the maximum of the flux density, m/s. */
  mostProbableSpeed: number;
  /** A speed above which the flux fraction is below 1e-15 (grid sizing), m/s. */
  fastestSpeed: number;
  /** Set when every atom has this one speed (a delta law). */
  singleSpeed?: number;
}

/** Speed v with slowerFraction(v) = p, by bisection (p in (0, 1)). */
export function speedAtSlowerFraction(law: SpeedLaw, p: number): number {
  if (law.singleSpeed !== undefined) return law.singleSpeed;
  let lo = 0;
  let hi = law.fastestSpeed;
  for (let i = 0; i < 200 && hi - lo > 1e-13 * hi; i++) {
    const mid = 0.5 * (lo + hi);
    if (law.slowerFraction(mid) < p) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}
