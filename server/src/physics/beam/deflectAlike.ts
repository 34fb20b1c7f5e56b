/**
 * Whether the sublevels of one peak deflect alike (one sublevel, J = 0, equal moments): then no
 * gradient, magnet, drift or slit can ever separate them, and a lone peak of them has nothing to
 * resolve. Otherwise a lone peak is merged, not resolved (docs/beam.md, "Resolvability").
 *
 * Their coefficients k (z = k/v²) count as alike when they differ by at most ALIKE_TOLERANCE of
 * the larger of their largest |k| and the k that moves the mean deflection by one image width
 * (kernel FWHM / ⟨1/v²⟩: the floor for moments that are zero but for round-off). 1e-9 is our
 * choice: well above the round-off of the moments (the engine's exact solve, about 1e-12 of the
 * level's Zeeman scale) and of a field-map magnet's flights (relative tolerance 1e-10), and far
 * below any separation a pattern can show.
 */
export const ALIKE_TOLERANCE = 1e-9;

export function deflectAlike(ks: readonly number[], members: readonly number[], imageCoefficient: number): boolean {
  let lo = Infinity;
  let hi = -Infinity;
  let largest = 0;
  for (const i of members) {
    lo = Math.min(lo, ks[i]!);
    hi = Math.max(hi, ks[i]!);
    largest = Math.max(largest, Math.abs(ks[i]!));
  }
  return !(hi - lo > ALIKE_TOLERANCE * Math.max(largest, Math.abs(imageCoefficient)));
}
