/**
 * Engine benchmark: 2001-point sweeps of Cs 6P3/2 (32 states, energies + moments,
 * labels) over 0–0.1 T and 0–1 T against bench/engine_numpy.py computing the same
 * outputs at the same fields with numpy.linalg.eigh with vectors, three ways (a loop
 * over fields of the full 32 × 32 matrix, a loop over fields and m blocks, and the
 * blocked batched call). The two sides alternate round by round (NumPy as a child process
 * answering one timed run per request), each round timing one NumPy call and a window of
 * engine sweeps about as long, so that both see the same load over the same length of time.
 * Prints the round-by-round CPU-time ratios (median and quartiles), the ratio of each side's
 * CPU medians and of the best runs, the cost of the crossing search and of curvatures
 * relative to the plain sweep, and the largest disagreement of the energies; writes
 * .bench-tmp/engine-bench.json.
 */
import { spawn } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import { createInterface } from 'node:readline';
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
/** Alternated rounds against the blocked NumPy call (about 25 ms each), and against each loop (150–450 ms). */
const ROUNDS = 31;
const LOOP_ROUNDS = 5;

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

/** One timed NumPy run, ms. */
interface NumpyRun {
  cpuMs: number;
  wallMs: number;
}

/**
 * The NumPy side in its own process (`engine_numpy.py --serve`), single-threaded BLAS (tiny
 * matrices: threads only add contention; the engine is single-threaded too): `run(variant)`
 * asks for one timed run of a variant and resolves with its times.
 */
interface NumpyServer {
  info: { numpy: string; states: number };
  run(variant: string): Promise<NumpyRun>;
  close(): void;
}

function startNumpy(fromT: number, toT: number, binFile: string): Promise<NumpyServer> {
  const env: NodeJS.ProcessEnv = { ...process.env, OMP_NUM_THREADS: '1', OPENBLAS_NUM_THREADS: '1', MKL_NUM_THREADS: '1' };
  const args = ['bench/engine_numpy.py', '--points', String(POINTS), '--from-t', String(fromT), '--to-t', String(toT), '--out', binFile, '--serve'];
  const child = spawn('python3', args, { env, stdio: ['pipe', 'pipe', 'pipe'] });
  let stderr = '';
  child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
  const waiting: { resolve: (line: string) => void; reject: (e: Error) => void }[] = [];
  const failAll = (why: string): void => {
    for (const w of waiting.splice(0)) w.reject(new Error(why));
  };
  createInterface({ input: child.stdout }).on('line', (line) => waiting.shift()?.resolve(line));
  child.on('error', (e) => failAll(e.message));
  child.on('exit', () => failAll(stderr.trim().split('\n').pop() || 'python3 exited'));
  const next = (): Promise<string> => new Promise((resolve, reject) => waiting.push({ resolve, reject }));
  return next().then((first) => ({
    info: JSON.parse(first) as NumpyServer['info'],
    run(variant: string): Promise<NumpyRun> {
      const answer = next();
      child.stdin.write(`${variant}\n`);
      return answer.then((line) => JSON.parse(line) as NumpyRun);
    },
    close(): void {
      child.stdin.end('\n');
    },
  }));
}

/** CPU and wall time per sweep of a window of `count` sweeps, ms. */
function engineWindow(runEngine: () => void, count: number): NumpyRun {
  const c0 = process.cpuUsage();
  const t0 = process.hrtime.bigint();
  for (let i = 0; i < count; i++) runEngine();
  const wallMs = Number(process.hrtime.bigint() - t0) / 1e6 / count;
  const c = process.cpuUsage(c0);
  return { cpuMs: (c.user + c.system) / 1e3 / count, wallMs };
}

function quartilesOf(xs: number[]): [number, number, number] {
  const s = [...xs].sort((a, b) => a - b);
  return [s[Math.floor(s.length / 4)], s[Math.floor(s.length / 2)], s[Math.floor((3 * s.length) / 4)]];
}

interface Alternated {
  engineCpu: number[];
  numpyCpu: number[];
  ratios: number[];
  wallRatios: number[];
  windowSweeps: number;
}

/**
 * `rounds` rounds of one NumPy run of `variant` and a window of engine sweeps about as long
 * (from a first NumPy run), the side that goes first alternating from round to round.
 */
async function alternate(np: NumpyServer, variant: string, runEngine: () => void, engineMs: number, rounds: number): Promise<Alternated> {
  const first = await np.run(variant);
  const windowSweeps = Math.max(1, Math.round(first.cpuMs / engineMs));
  const out: Alternated = { engineCpu: [], numpyCpu: [], ratios: [], wallRatios: [], windowSweeps };
  for (let r = 0; r < rounds; r++) {
    let ours: NumpyRun;
    let theirs: NumpyRun;
    if (r % 2 === 0) {
      ours = engineWindow(runEngine, windowSweeps);
      theirs = await np.run(variant);
    } else {
      theirs = await np.run(variant);
      ours = engineWindow(runEngine, windowSweeps);
    }
    out.engineCpu.push(ours.cpuMs);
    out.numpyCpu.push(theirs.cpuMs);
    out.ratios.push(theirs.cpuMs / ours.cpuMs);
    out.wallRatios.push(theirs.wallMs / ours.wallMs);
  }
  return out;
}

async function benchRange(fromT: number, toT: number): Promise<Record<string, unknown>> {
  const label = `${fromT}–${toT} T`;
  const engineTimes: Samples = { wall: [], cpu: [] };
  const runEngine = (): void => void sweepLevel(CS_6P32, fromT, toT, POINTS, { crossings: false });
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
  const binFile = `.bench-tmp/engine_numpy_${toT}.bin`;
  let np: NumpyServer;
  try {
    np = await startNumpy(fromT, toT, binFile);
  } catch (e) {
    console.log(`  NumPy side skipped (python3 failed): ${(e as Error).message}`);
    return result;
  }
  const raw = readFileSync(binFile);
  const all = new Float64Array(raw.buffer, raw.byteOffset, raw.byteLength / 8);
  const n = np.info.states;
  const ours = sortedTable(POINTS, sweep.states.map((s) => s.energyHz));
  console.log(
    `  NumPy ${np.info.numpy}, eigh with vectors, same fields and outputs, alternating with the engine round by round (each round one NumPy call`,
  );
  console.log('  and engine sweeps for about as long, CPU time per sweep); engine faster by:');
  try {
    for (const [v, [key, what]] of NUMPY_VARIANTS.entries()) {
      const rounds = key === 'blocked' ? ROUNDS : LOOP_ROUNDS;
      const alt = await alternate(np, key, runEngine, plain.cpuMedian, rounds);
      const d = disagreement(ours, all.subarray(v * POINTS * n, (v + 1) * POINTS * n), n);
      const [low, mid, high] = quartilesOf(alt.ratios);
      const ofMedians = median(alt.numpyCpu) / median(alt.engineCpu);
      const ofBest = Math.min(...alt.numpyCpu) / Math.min(...alt.engineCpu);
      const wall = median(alt.wallRatios);
      const goal = key === 'blocked' ? ` (goal ≥ ${GOAL_VS_BLOCKED}× round by round)` : '';
      console.log(`    ${what} (CPU median ${median(alt.numpyCpu).toFixed(1)} ms; engine ${median(alt.engineCpu).toFixed(2)} ms a sweep, ${alt.windowSweeps} sweeps a round):`);
      console.log(
        `      round by round ${mid.toFixed(1)}× (quartiles ${low.toFixed(1)}–${high.toFixed(1)}×, ${rounds} rounds)${goal}; CPU medians ${ofMedians.toFixed(1)}×, best ${ofBest.toFixed(1)}×, wall round by round ${wall.toFixed(1)}×`,
      );
      console.log(`      energies agree to ${d.maxRel.toExponential(2)} relative, ${d.maxAbsHz.toExponential(2)} Hz`);
      result[key] = { roundRatio: mid, roundQuartiles: [low, high], ratioOfCpuMedians: ofMedians, ratioOfBest: ofBest, wallRatio: wall, numpyCpuMedianMs: median(alt.numpyCpu), engineCpuMedianMs: median(alt.engineCpu), windowSweeps: alt.windowSweeps, rounds, disagreement: d };
    }
  } finally {
    np.close();
  }
  return result;
}

async function main(): Promise<void> {
  const results: Record<string, unknown>[] = [];
  for (const [from, to] of RANGES) results.push(await benchRange(from, to));
  writeFileSync('.bench-tmp/engine-bench.json', JSON.stringify(results, null, 2));
}

void main();
