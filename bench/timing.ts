/**
 * Timing and statistics shared by the benches: CPU time of this process (less disturbed by
 * other load than the wall clock on a shared machine), wall and CPU time of one call, the best
 * of a few runs, medians and quartiles. Speed goals are ratios against a baseline timed in the
 * same run with these same helpers.
 */

/** CPU time (user + system) of this process while `f` runs, ms. */
export function cpuMs(f: () => unknown): number {
  const t0 = process.cpuUsage();
  f();
  const d = process.cpuUsage(t0);
  return (d.user + d.system) / 1000;
}

/** Wall-clock and CPU time of one call of `f`, ms. */
export function wallAndCpuMs(f: () => unknown): { wall: number; cpu: number } {
  const c0 = process.cpuUsage();
  const t0 = process.hrtime.bigint();
  f();
  const wall = Number(process.hrtime.bigint() - t0) / 1e6;
  const c1 = process.cpuUsage(c0);
  return { wall, cpu: (c1.user + c1.system) / 1000 };
}

/** The shortest wall-clock time of `runs` calls after one warm-up call, ms. */
export function bestMs(f: () => void, runs = 7): number {
  f();
  let best = Infinity;
  for (let r = 0; r < runs; r++) {
    const t0 = performance.now();
    f();
    best = Math.min(best, performance.now() - t0);
  }
  return best;
}

/** The value below which a fraction `q` of `xs` lies (the element at ⌊q·n⌋ of the sorted list). */
export function quantile(xs: readonly number[], q: number): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(q * s.length))]!;
}

/** The median (for an even count, the upper of the two middle values). */
export function median(xs: readonly number[]): number {
  return quantile(xs, 0.5);
}

/** Median and quartiles: the spread under the machine's load. */
export function quartiles(xs: readonly number[]): { median: number; low: number; high: number } {
  return { median: quantile(xs, 0.5), low: quantile(xs, 0.25), high: quantile(xs, 0.75) };
}
