/**
 * Sort eigenpairs by ascending value: values[k] = diag[k], column k of
 * `vectors` follows. Selection sort, so at most n column swaps (n is small).
 */
export function sortEigenPairs(values: Float64Array, vectors: Float64Array, n: number): void {
  for (let i = 0; i < n - 1; i++) {
    let best = i;
    for (let j = i + 1; j < n; j++) if (values[j] < values[best]) best = j;
    if (best === i) continue;
    const tv = values[i];
    values[i] = values[best];
    values[best] = tv;
    for (let r = 0; r < n; r++) {
      const t = vectors[r * n + i];
      vectors[r * n + i] = vectors[r * n + best];
      vectors[r * n + best] = t;
    }
  }
}
