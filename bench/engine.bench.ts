/**
 * Engine benchmark: 2001-point sweeps of Cs 6P3/2 (32 states, energies + moments,
 * labels) over 0–0.1 T and 0–1 T against bench/engine_numpy.py computing the same
 * outputs at the same fields with numpy.linalg.eigh with vectors, three ways (a loop
 * over fields of the full 32 × 32 matrix, a loop over fields and m blocks, and the
 * blocked batched call). Prints time ratios (medians and best runs), the cost of the
 * crossing search and of curvatures relative to the plain sweep, and the largest
 * disagreement of the energies; writes .bench-tmp/engine-bench.json.
 */
import { spawnSync } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import { sweepLevel } from '../server/src/physics/engine';
import type { HyperfineLevelSpec } from '../server/src/physics/engine';

// Alkali D-line data compilation, 133Cs 6P3/2 (same numbers as bench/engine_numpy.py).
const CS_6P32: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 3, twoI: 7, gJ: 1.334, gI: -0.00039885395, A: 50.28827e6, B: -0.4934e6 };
const POINTS = 2001;
const RANGES: [number, number][] = [
  [0, 0.1],
  [0, 1],
];
const RUNS = 21;
const NUMPY_VARIANTS = [
  ['loopFull', 'loop over fields, full 32×32 eigh'],
  ['loopBlocks', 'loop over fields and m blocks, eigh'],
  ['blocked', 'blocked, batched eigh'],
] as const;
const GOAL_VS_BLOCKED = 5;

/** Wall and CPU time of this process, ms. Under load from other processes the CPU time is the steadier one. */
interface Timing {
  median: number;
  min: number;
  cpuMedian: number;
  cpuMin: number;
}

interface Samples {
  wall: number[];
  cpu: number[];
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

function timeRuns(fn: () => void, runs: number, into: Samples = { wall: [], cpu: [] }, warmUp = 5): Timing {
  for (let i = 0; i < warmUp; i++) fn(); // JIT warm-up
  for (let i = 0; i < runs; i++) {
    const c0 = process.cpuUsage();
    const t0 = process.hrtime.bigint();
    fn();
    into.wall.push(Number(process.hrtime.bigint() - t0) / 1e6);
    const c = process.cpuUsage(c0);
    into.cpu.push((c.user + c.system) / 1e3);
  }
  return { median: median(into.wall), min: Math.min(...into.wall), cpuMedian: median(into.cpu), cpuMin: Math.min(...into.cpu) };
}

/** Energies sorted per field, row-major points × states. */
function sortedTable(points: number, columns: Float64Array[]): Float64Array {
  const out = new Float64Array(points * columns.length);
  const row = new Float64Array(columns.length);
  for (let p = 0; p < points; p++) {
    for (let s = 0; s < columns.length; s++) row[s] = columns[s][p];
    row.sort();
    out.set(row, p * columns.length);
  }
  return out;
}

function disagreement(a: Float64Array, b: Float64Array, states: number): { maxRel: number; maxAbsHz: number } {
  let maxRel = 0;
  let maxAbs = 0;
  for (let p = 0; p < a.length / states; p++) {
    let scale = 0;
    for (let s = 0; s < states; s++) scale = Math.max(scale, Math.abs(b[p * states + s]));
    for (let s = 0; s < states; s++) {
      const i = p * states + s;
      const d = Math.abs(a[i] - b[i]);
      maxAbs = Math.max(maxAbs, d);
      // relative to the value, but never to less than 1e-6 of the field's energy scale (values crossing zero)
      maxRel = Math.max(maxRel, d / Math.max(Math.abs(b[i]), 1e-6 * scale));
    }
  }
  return { maxRel, maxAbsHz: maxAbs };
}

/** The NumPy side in its own process, single-threaded BLAS (tiny matrices: threads only add contention; the engine is single-threaded too). */
function runNumpy(fromT: number, toT: number, binFile: string): { status: number | null; stdout: string; stderr: string } {
  const env: NodeJS.ProcessEnv = { ...process.env, OMP_NUM_THREADS: '1', OPENBLAS_NUM_THREADS: '1', MKL_NUM_THREADS: '1' };
  const args = ['bench/engine_numpy.py', '--points', String(POINTS), '--from-t', String(fromT), '--to-t', String(toT), '--out', binFile];
  return spawnSync('python3', args, { encoding: 'utf8', env });
}

function benchRange(fromT: number, toT: number): Record<string, unknown> {
  const label = `${fromT}–${toT} T`;
  // The engine is timed before and after the NumPy run and the median taken over both
  // halves, so a burst of load on a shared machine does not favour either side.
  const engineTimes: Samples = { wall: [], cpu: [] };
  const runEngine = (): void => void sweepLevel(CS_6P32, fromT, toT, POINTS, { crossings: false });
  timeRuns(runEngine, RUNS, engineTimes);
  const binFile = `.bench-tmp/engine_numpy_${toT}.bin`;
  const py = runNumpy(fromT, toT, binFile);
  const plain = timeRuns(runEngine, RUNS, engineTimes);
  // Crossing search and curvature, interleaved with the plain sweep so that their ratios see the same load.
  const plainAgain: Samples = { wall: [], cpu: [] };
  const crossingTimes: Samples = { wall: [], cpu: [] };
  const curvatureTimes: Samples = { wall: [], cpu: [] };
  for (let i = 0; i < 15; i++) {
    timeRuns(runEngine, 1, plainAgain, i === 0 ? 5 : 0);
    timeRuns(() => sweepLevel(CS_6P32, fromT, toT, POINTS), 1, crossingTimes, i === 0 ? 5 : 0);
    timeRuns(() => sweepLevel(CS_6P32, fromT, toT, POINTS, { crossings: false, curvature: true }), 1, curvatureTimes, i === 0 ? 5 : 0);
  }
  const sweep = sweepLevel(CS_6P32, fromT, toT, POINTS);
  const crossingRatio = median(crossingTimes.cpu) / median(plainAgain.cpu);
  const curvatureRatio = median(curvatureTimes.cpu) / median(plainAgain.cpu);
  const bestOf = (xs: Samples): number => Math.min(...xs.wall);
  const crossingBest = bestOf(crossingTimes) / bestOf(plainAgain);
  const curvatureBest = bestOf(curvatureTimes) / bestOf(plainAgain);
  console.log(`\nCs 6P3/2, ${POINTS} fields ${label}, ${sweep.states.length} states, energies + moments + labels:`);
  console.log(
    `  engine: wall median ${plain.median.toFixed(2)} ms (best ${plain.min.toFixed(2)}), CPU median ${plain.cpuMedian.toFixed(2)} ms (best ${plain.cpuMin.toFixed(2)}) over ${engineTimes.wall.length} runs`,
  );
  console.log(
    `  with crossing search: ${crossingRatio.toFixed(2)}× the sweep (CPU medians), ${crossingBest.toFixed(2)}× (best runs) (${sweep.crossings.length} crossings; goal ≤ 1.3×)`,
  );
  console.log(`  with curvature d²E/dB²: ${curvatureRatio.toFixed(2)}× the sweep (CPU medians), ${curvatureBest.toFixed(2)}× (best runs)`);
  const result: Record<string, unknown> = {
    fromT,
    toT,
    points: POINTS,
    engineMs: plain,
    crossingRatio,
    crossingBest,
    curvatureRatio,
    curvatureBest,
    crossings: sweep.crossings.length,
  };
  if (py.status !== 0) {
    console.log(`  NumPy side skipped (python3 failed): ${py.stderr.trim().split('\n').pop() ?? ''}`);
    return result;
  }
  const np = JSON.parse(py.stdout.trim().split('\n').pop() as string) as Record<string, { medianMs: number; bestMs: number; cpuMedianMs: number; cpuBestMs: number }> & {
    numpy: string;
    states: number;
  };
  const raw = readFileSync(binFile);
  const all = new Float64Array(raw.buffer, raw.byteOffset, raw.byteLength / 8);
  const n = np.states;
  const ours = sortedTable(POINTS, sweep.states.map((s) => s.energyHz));
  console.log(`  NumPy ${np.numpy}, eigh with vectors, same fields and outputs (${np.repeats} runs); engine faster by (CPU medians, CPU best, wall medians):`);
  NUMPY_VARIANTS.forEach(([key, what], v) => {
    const t = np[key];
    const d = disagreement(ours, all.subarray(v * POINTS * n, (v + 1) * POINTS * n), n);
    const ratio = t.cpuMedianMs / plain.cpuMedian;
    const best = t.cpuBestMs / plain.cpuMin;
    const wall = t.medianMs / plain.median;
    const goal = key === 'blocked' ? ` (goal ≥ ${GOAL_VS_BLOCKED}×)` : '';
    console.log(`    ${what.padEnd(38)} CPU ${t.cpuMedianMs.toFixed(1).padStart(7)} ms → ${ratio.toFixed(1)}×, ${best.toFixed(1)}×, ${wall.toFixed(1)}×${goal}`);
    console.log(`    ${''.padEnd(38)} energies agree to ${d.maxRel.toExponential(2)} relative, ${d.maxAbsHz.toExponential(2)} Hz`);
    result[key] = { ...t, ratio, bestRatio: best, wallRatio: wall, disagreement: d };
  });
  return result;
}

function main(): void {
  const results = RANGES.map(([from, to]) => benchRange(from, to));
  writeFileSync('.bench-tmp/engine-bench.json', JSON.stringify(results, null, 2));
}

main();
