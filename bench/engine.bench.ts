/**
 * Engine benchmark: a 2001-point sweep of Cs 6P3/2 (32 states, labels and
 * moments) against bench/engine_numpy.py doing the same physics with
 * numpy.linalg.eigh, once as a plain per-field loop over the full 32 × 32
 * matrix and once blocked and batched. Prints both time ratios and the
 * largest disagreement of the energies; writes .bench-tmp/engine-bench.json.
 */
import { spawnSync } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import { sweepLevel } from '../server/src/physics/engine';
import type { HyperfineLevelSpec } from '../server/src/physics/engine';

// Alkali D-line data compilation, 133Cs 6P3/2 (same numbers as bench/engine_numpy.py).
const CS_6P32: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 3, twoI: 7, gJ: 1.334, gI: -0.00039885395, A: 50.28827e6, B: -0.4934e6 };
const POINTS = 2001;
const FROM_T = 0;
const TO_T = 1;
const RUNS = 21;

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

function timeRuns(fn: () => void, runs: number, into: number[] = []): { median: number; min: number } {
  for (let i = 0; i < 5; i++) fn(); // JIT warm-up
  for (let i = 0; i < runs; i++) {
    const t0 = process.hrtime.bigint();
    fn();
    into.push(Number(process.hrtime.bigint() - t0) / 1e6);
  }
  return { median: median(into), min: Math.min(...into) };
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

function main(): void {
  // The engine is timed before and after the NumPy run and the median taken over both
  // halves, so a burst of load on a shared machine does not favour either side.
  const engineTimes: number[] = [];
  const runEngine = (): void => void sweepLevel(CS_6P32, FROM_T, TO_T, POINTS, { crossings: false });
  timeRuns(runEngine, RUNS, engineTimes);
  const withCrossings = timeRuns(() => sweepLevel(CS_6P32, FROM_T, TO_T, POINTS), 7);
  const withCurvature = timeRuns(() => sweepLevel(CS_6P32, FROM_T, TO_T, POINTS, { crossings: false, curvature: true }), 7);
  const sweep = sweepLevel(CS_6P32, FROM_T, TO_T, POINTS);

  // Single-threaded BLAS: the matrices are tiny, threads only add contention, and the engine is single-threaded too.
  const binFile = '.bench-tmp/engine_numpy.bin';
  const py = spawnSync(
    'python3',
    ['bench/engine_numpy.py', '--points', String(POINTS), '--from-t', String(FROM_T), '--to-t', String(TO_T), '--out', binFile],
    { encoding: 'utf8', env: { ...process.env, OMP_NUM_THREADS: '1', OPENBLAS_NUM_THREADS: '1', MKL_NUM_THREADS: '1' } },
  );
  const plain = timeRuns(runEngine, RUNS, engineTimes);
  console.log(`TypeScript engine, ${POINTS} points × ${sweep.states.length} states (labels + moments):`);
  console.log(`  median ${plain.median.toFixed(2)} ms, best ${plain.min.toFixed(2)} ms over ${engineTimes.length} runs`);
  console.log(`  with crossing search: median ${withCrossings.median.toFixed(2)} ms (${sweep.crossings.length} crossings)`);
  console.log(`  with curvature d²E/dB²: median ${withCurvature.median.toFixed(2)} ms`);

  if (py.status !== 0) {
    console.log(`NumPy side skipped (python3 failed): ${py.stderr.trim().split('\n').pop() ?? ''}`);
    return;
  }
  const np = JSON.parse(py.stdout.trim().split('\n').pop() as string) as { numpy: string; loopMs: number; blockedMs: number; states: number };
  const raw = readFileSync(binFile);
  const all = new Float64Array(raw.buffer, raw.byteOffset, raw.byteLength / 8);
  const n = np.states;
  const loopE = all.subarray(0, POINTS * n);
  const blockedE = all.subarray(POINTS * n, 2 * POINTS * n);
  const ours = sortedTable(POINTS, sweep.states.map((s) => s.energyHz));
  const dLoop = disagreement(ours, loopE, n);
  const dBlocked = disagreement(ours, blockedE, n);
  const loopRatio = np.loopMs / plain.median;
  const blockedRatio = np.blockedMs / plain.median;
  console.log(`NumPy ${np.numpy} (median of 5):`);
  console.log(`  loop of eigh over the full 32×32 matrix: ${np.loopMs.toFixed(2)} ms  → engine is ${loopRatio.toFixed(1)}× faster (goal ≥ 10×)`);
  console.log(`  blocked, batched eigh:                   ${np.blockedMs.toFixed(2)} ms  → engine is ${blockedRatio.toFixed(1)}× faster (goal ≥ 2×)`);
  console.log(`  largest energy disagreement vs loop:    ${dLoop.maxRel.toExponential(2)} relative, ${dLoop.maxAbsHz.toExponential(2)} Hz`);
  console.log(`  largest energy disagreement vs blocked: ${dBlocked.maxRel.toExponential(2)} relative, ${dBlocked.maxAbsHz.toExponential(2)} Hz (goal ≤ 1e-9)`);
  writeFileSync(
    '.bench-tmp/engine-bench.json',
    JSON.stringify({ points: POINTS, engineMs: plain, withCrossings, withCurvature, numpy: np, loopRatio, blockedRatio, dLoop, dBlocked }, null, 2),
  );
}

main();
