/**
 * Convolution of binned masses with a unit-area box of width w, in O(n) by prefix
 * sums. Bin j receives the part of each box that overlaps it, so taps are h/w over
 * the fully covered bins plus two partial end taps; mass and the mean are kept
 * exactly (away from the grid edges), the variance gains w²/12 (+ h²/12 from binning).
 */
export function convolveBox(masses: Float64Array, binM: number, widthM: number, out: Float64Array, prefix: Float64Array): void {
  const n = masses.length;
  const ratio = widthM / binM;
  if (!(ratio >= 1)) {
    // A box narrower than a bin lies inside the central bin: identity at this resolution.
    out.set(masses);
    return;
  }
  const full = Math.floor((ratio - 1) / 2); // bins ±full are covered entirely
  const partial = ratio / 2 - (full + 0.5); // overlap of the end taps, in bins, in [0, 1)
  const tapFull = 1 / ratio;
  const tapEnd = partial / ratio;
  prefix[0] = 0;
  for (let i = 0; i < n; i++) prefix[i + 1] = prefix[i] + masses[i];
  for (let j = 0; j < n; j++) {
    const a = Math.max(0, j - full);
    const b = Math.min(n, j + full + 1);
    let v = tapFull * (prefix[b] - prefix[a]);
    const l = j - full - 1;
    const r = j + full + 1;
    if (l >= 0) v += tapEnd * masses[l];
    if (r < n) v += tapEnd * masses[r];
    out[j] = v;
  }
}
