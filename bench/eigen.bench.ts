/**
 * Eigen-solver choice: own cyclic Jacobi against ml-matrix's
 * EigenvalueDecomposition (Householder + QL) on random symmetric matrices of
 * the orders the engine meets. Prints time per decomposition and the worst
 * residual ‖A v − λ v‖ / ‖A‖ so speed is never bought with accuracy.
 */
import { spawnSync } from 'node:child_process';
import { symmetricEigen } from '../server/src/physics/engine';
import { SIMD_MIN_ORDER } from '../server/src/physics/engine/symmetricEigen';
import { makeWorkspace } from '../server/src/physics/engine/blockSolver';
import { makeAnchors, sweepBlockBySeries, sweepBlockPerField } from '../server/src/physics/engine/blockSweep';
import { buildLevelModel } from '../server/src/physics/engine/buildModel';
import { householderInverseIterationInPlace } from '../server/src/physics/engine/householderInverseIteration';
import { householderQlInPlace } from '../server/src/physics/engine/householderQl';
import { simdEigenpairs, simdKernelsAvailable } from '../server/src/physics/engine/simdEigen';
import { jacobiInPlace } from '../server/src/physics/engine/jacobiEigen';
import { libraryEigenInPlace } from './mlMatrixEigen';
import { steadyAgainstLapack } from './eigenSteady';

type Solver = (a: Float64Array, n: number, v: Float64Array) => boolean;

function lcg(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296 - 0.5;
  };
}

function randomSymmetric(n: number, rnd: () => number): Float64Array {
  const a = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = i; j < n; j++) {
      const v = i === j ? 10 * rnd() : rnd();
      a[i * n + j] = v;
      a[j * n + i] = v;
    }
  }
  return a;
}

/** (B + Bᵀ)/2 for B with entries uniform in ±0.5 (the matrices of bench/eigen_numpy.py's own timing). */
function plainSymmetric(n: number, rnd: () => number): Float64Array {
  const a = new Float64Array(n * n);
  for (let i = 0; i < n; i++) a[i * n + i] = rnd();
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const v = (rnd() + rnd()) / 2;
      a[i * n + j] = v;
      a[j * n + i] = v;
    }
  }
  return a;
}

function residual(a0: Float64Array, d: Float64Array, v: Float64Array, n: number): number {
  let norm = 0;
  for (const x of a0) norm += x * x;
  norm = Math.sqrt(norm);
  let worst = 0;
  for (let k = 0; k < n; k++) {
    const lam = d[k * n + k];
    let r2 = 0;
    for (let i = 0; i < n; i++) {
      let s = -lam * v[i * n + k];
      for (let j = 0; j < n; j++) s += a0[i * n + j] * v[j * n + k];
      r2 += s * s;
    }
    worst = Math.max(worst, Math.sqrt(r2) / norm);
  }
  return worst;
}

function timeSolver(solver: Solver, mats: Float64Array[], n: number): { usPer: number; worstResidual: number } {
  const work = new Float64Array(n * n);
  const vec = new Float64Array(n * n);
  let worst = 0;
  // warm-up and accuracy pass
  for (const m of mats) {
    work.set(m);
    solver(work, n, vec);
    worst = Math.max(worst, residual(m, work, vec, n));
  }
  const reps = Math.max(1, Math.round(20000 / (n * n * n)));
  const t0 = process.hrtime.bigint();
  for (let r = 0; r < reps; r++) {
    for (const m of mats) {
      work.set(m);
      solver(work, n, vec);
    }
  }
  const ns = Number(process.hrtime.bigint() - t0);
  return { usPer: ns / 1000 / (reps * mats.length), worstResidual: worst };
}

/** Own Householder + QR-sweep solver behind the same (a, n, vectors) interface; eigenvalues go back on the diagonal. */
function ownTridiagonalSolver(): Solver {
  const cap = 256;
  const d = new Float64Array(cap);
  const e = new Float64Array(cap);
  const w1 = new Float64Array(cap);
  const w2 = new Float64Array(cap);
  return (a, n, v) => {
    const ok = householderQlInPlace(a, n, d, v, e, w1, w2);
    for (let i = 0; i < n; i++) a[i * n + i] = d[i];
    return ok;
  };
}

/** Block matrices H0 + B·Z of one level at `fields` evenly spaced fields up to `maxT`, grouped by order. */
function physicalBlocks(spec: Parameters<typeof buildLevelModel>[0], fields: number, maxT: number): Map<number, Float64Array[]> {
  const { model } = buildLevelModel(spec);
  const out = new Map<number, Float64Array[]>();
  if (!model) return out;
  for (const b of model.blocks) {
    if (b.size < 2) continue;
    for (let p = 0; p < fields; p++) {
      const a = b.h0.slice();
      for (let i = 0; i < b.size; i++) a[i * b.size + i] += ((maxT * p) / (fields - 1)) * b.zeeman[i];
      out.set(b.size, [...(out.get(b.size) ?? []), a]);
    }
  }
  return out;
}

const LAPACK_ORDERS = [16, 32, 64, 128, 160, 192, 256];

/** CPU microseconds per call of `solve` on `mats` (median and best of 5 rounds). */
function cpuPerCall(solve: (m: Float64Array) => void, mats: Float64Array[], n: number): { median: number; best: number } {
  const reps = Math.max(1, Math.round(20000 / (n * n)));
  for (const m of mats) solve(m); // warm-up
  const rounds: number[] = [];
  for (let r = 0; r < 5; r++) {
    const c0 = process.cpuUsage();
    for (let q = 0; q < reps; q++) for (const m of mats) solve(m);
    const c = process.cpuUsage(c0);
    rounds.push((c.user + c.system) / (reps * mats.length));
  }
  rounds.sort((a, b) => a - b);
  return { median: rounds[2], best: rounds[0] };
}

/**
 * The engine's solver on large orders against LAPACK through numpy.linalg.eigh (values and
 * vectors, one BLAS thread) in the same run. OPENBLAS_CORETYPE and OPENBLAS_L2_SIZE are
 * unset for the NumPy process only, so that it runs the kernel OpenBLAS picks for this
 * processor (the fair, faster reference); the script prints which.
 */
function againstLapack(): void {
  const env: NodeJS.ProcessEnv = { ...process.env, OMP_NUM_THREADS: '1', OPENBLAS_NUM_THREADS: '1', MKL_NUM_THREADS: '1' };
  delete env.OPENBLAS_CORETYPE;
  delete env.OPENBLAS_L2_SIZE;
  const py = spawnSync('python3', ['bench/eigen_numpy.py', '--orders', LAPACK_ORDERS.join(',')], { encoding: 'utf8', env });
  if (py.status !== 0) {
    console.log(`\nLAPACK comparison skipped (python3 failed): ${py.stderr.trim().split('\n').pop() ?? ''}`);
    return;
  }
  const np = JSON.parse(py.stdout.trim().split('\n').pop() as string) as {
    numpy: string;
    core: string | null;
    orders: Record<string, { cpuMedian: number; cpuBest: number }>;
  };
  console.log(`\nsymmetricEigen vs numpy.linalg.eigh ${np.numpy} (LAPACK via OpenBLAS, core ${np.core ?? '?'}), values + vectors, CPU µs per call (medians of 5):`);
  console.log(`engine: the dispatcher (WebAssembly kernels from order ${SIMD_MIN_ORDER}: ${simdKernelsAvailable() ? 'available' : 'NOT available'}); JS: the JavaScript route alone`);
  console.log('order | engine | JS route | LAPACK | JS ÷ engine | LAPACK ÷ engine (≥ 1: engine at least as fast)');
  for (const n of LAPACK_ORDERS) {
    const rnd = lcg(99 + n);
    const mats = Array.from({ length: Math.max(4, Math.round(2000 / n)) }, () => randomSymmetric(n, rnd));
    const work = new Float64Array(n * n);
    const values = new Float64Array(n);
    const vectors = new Float64Array(n * n);
    const ours = cpuPerCall(
      (m) => {
        work.set(m);
        symmetricEigen(work, n, values, vectors);
      },
      mats,
      n,
    );
    const js = cpuPerCall(
      (m) => {
        work.set(m);
        householderInverseIterationInPlace(work, n, values, vectors);
      },
      mats,
      n,
    );
    const ref = np.orders[String(n)];
    console.log(
      `${String(n).padStart(5)} | ${ours.median.toFixed(1).padStart(6)} | ${js.median.toFixed(1).padStart(8)} | ${ref.cpuMedian.toFixed(1).padStart(6)} | ${(js.median / ours.median).toFixed(2).padStart(11)} | ${(ref.cpuMedian / ours.median).toFixed(2)}`,
    );
  }
}

/**
 * Where the WebAssembly route starts to pay (SIMD_MIN_ORDER): Householder + QR with the rotations
 * accumulated (the route below INVERSE_ITERATION_MIN_ORDER and the engine's from
 * JACOBI_MAX_ORDER + 1 up to SIMD_MIN_ORDER), the JavaScript inverse-iteration route and the
 * WebAssembly route (kernels plus divide and conquer) on the same matrices, CPU µs per call.
 * (The WebAssembly route with inverse iteration, which divide and conquer beat 1.4–2.2× at every
 * order from 12 to 96, is gone: docs/engine.md.)
 */
function simdCrossover(): void {
  if (!simdKernelsAvailable()) return;
  console.log(`\ncrossover (engine: WebAssembly from order ${SIMD_MIN_ORDER}), CPU µs per call (medians of 5): order | QR, rotations accumulated | JS inverse iteration | WebAssembly kernels, divide and conquer | QR ÷ WebAssembly`);
  for (const n of [9, 10, 12, 14, 16, 20, 24, 28, 32, 40, 48, 64, 96]) {
    const rnd = lcg(7 + n);
    const mats = Array.from({ length: Math.max(4, Math.round(2000 / n)) }, () => randomSymmetric(n, rnd));
    const work = new Float64Array(n * n);
    const values = new Float64Array(n);
    const vectors = new Float64Array(n * n);
    const scratch = [new Float64Array(n), new Float64Array(n), new Float64Array(n)];
    const qr = cpuPerCall((m) => {
      work.set(m);
      householderQlInPlace(work, n, values, vectors, scratch[0], scratch[1], scratch[2]);
    }, mats, n);
    const js = cpuPerCall((m) => {
      work.set(m);
      householderInverseIterationInPlace(work, n, values, vectors);
    }, mats, n);
    const simd = cpuPerCall((m) => simdEigenpairs(m, n, values, vectors), mats, n);
    console.log(`${String(n).padStart(5)} | ${qr.median.toFixed(1).padStart(8)} | ${js.median.toFixed(1).padStart(8)} | ${simd.median.toFixed(1).padStart(8)} | ${(qr.median / simd.median).toFixed(2)}`);
  }
}

/**
 * The sweep's route per block order: an exact solve at every field against anchors and
 * their perturbation series (blockSweep.ts), µs per block and field over 2001 fields. The
 * smallest order where the series wins is SERIES_MIN_ORDER in sweepLevel.ts.
 */
function sweepRoutes(levels: { name: string; spec: Parameters<typeof buildLevelModel>[0] }[]): void {
  for (const toT of [0.1, 1]) {
    const fields = Float64Array.from({ length: 2001 }, (_, p) => (toT * p) / 2000);
    console.log(`\nsweep route per block order, 2001 fields 0–${toT} T, µs per block and field (best of runs):`);
    console.log('order | every field | series | ratio');
    const seen = new Set<number>();
    for (const lv of levels) {
      const { model } = buildLevelModel(lv.spec);
      for (const block of model?.blocks ?? []) {
        const n = block.size;
        if (n < 2 || seen.has(n)) continue;
        seen.add(n);
        const out = { store: new Float64Array(2 * 2001 * n), base: 0, stride: 2 * 2001, points: 2001, curvature: false, curv: new Float64Array(n) };
        const ws = makeWorkspace(n);
        const anchors = makeAnchors(n);
        let perField = Number.POSITIVE_INFINITY;
        let series = Number.POSITIVE_INFINITY;
        for (let r = 0; r < (n > 8 ? 3 : 11); r++) {
          let t0 = process.hrtime.bigint();
          sweepBlockPerField(block, fields, ws, out);
          perField = Math.min(perField, Number(process.hrtime.bigint() - t0) / 1e3 / 2001);
          t0 = process.hrtime.bigint();
          sweepBlockBySeries(block, fields, anchors, out);
          series = Math.min(series, Number(process.hrtime.bigint() - t0) / 1e3 / 2001);
        }
        console.log(`${String(n).padStart(5)} | ${perField.toFixed(3).padStart(11)} | ${series.toFixed(3).padStart(6)} | ${(perField / series).toFixed(2)}`);
      }
    }
  }
}

/** The alternating protocol at the orders of the goal (eigenSteady.ts), on two families of random matrices. */
async function steady(): Promise<void> {
  const count = (name: string, fallback: number) => Math.max(1, Number(process.env[name]) || fallback);
  const lines = await steadyAgainstLapack({
    orders: [160, 192],
    rounds: count('EIGEN_ROUNDS', 20),
    timings: count('EIGEN_TIMINGS', 7),
    pin: process.env.EIGEN_PIN !== '0',
    families: [
      {
        // As the one-shot comparison's engine side: entries uniform in ±0.5, the diagonal ten times wider.
        name: 'wide diagonal',
        matrices: (n) => {
          const rnd = lcg(99 + n);
          return Array.from({ length: Math.max(4, Math.round(2000 / n)) }, () => randomSymmetric(n, rnd));
        },
      },
      {
        // As eigen_numpy.py's own: (B + Bᵀ)/2 for B uniform in ±0.5, the diagonal no wider.
        name: 'plain',
        matrices: (n) => {
          const rnd = lcg(7 + n);
          return Array.from({ length: Math.max(4, Math.round(2000 / n)) }, () => plainSymmetric(n, rnd));
        },
      },
    ],
  });
  for (const line of lines) console.log(line);
}

async function main(): Promise<void> {
  // EIGEN_BENCH=steady: only the alternating protocol at 160 and 192 (the goal's verdict);
  // EIGEN_BENCH=large: the crossover, the LAPACK comparison and the protocol.
  if (process.env.EIGEN_BENCH === 'steady') {
    await steady();
    return;
  }
  if (process.env.EIGEN_BENCH === 'large') {
    simdCrossover();
    againstLapack();
    await steady();
    return;
  }
  const orders = [2, 3, 4, 6, 8, 12, 16, 24, 32, 48, 64, 96, 128];
  const own = ownTridiagonalSolver();
  console.log('order | Jacobi µs | own Householder+QR µs | ml-matrix µs | Jacobi resid | own resid | ml-matrix resid');
  for (const n of orders) {
    const rnd = lcg(1234 + n);
    const count = Math.max(4, Math.round(2000 / n));
    const mats = Array.from({ length: count }, () => randomSymmetric(n, rnd));
    const j = timeSolver(jacobiInPlace, mats, n);
    const h = timeSolver(own, mats, n);
    const l = timeSolver(libraryEigenInPlace, mats, n);
    console.log(
      `${String(n).padStart(5)} | ${j.usPer.toFixed(2).padStart(9)} | ${h.usPer.toFixed(2).padStart(21)} | ${l.usPer
        .toFixed(2)
        .padStart(12)} | ${j.worstResidual.toExponential(1)} | ${h.worstResidual.toExponential(1)} | ${l.worstResidual.toExponential(1)}`,
    );
  }
  // The matrices the engine really meets: m blocks of two levels between 0 and 1 T.
  const levels = [
    { name: 'Cs 6P3/2 (J=3/2, I=7/2)', spec: { kind: 'hyperfine' as const, twoJ: 3, twoI: 7, gJ: 1.334, gI: -0.000399, A: 50.28827e6, B: -0.4934e6 } },
    { name: 'J=7/2, I=9/2 with B', spec: { kind: 'hyperfine' as const, twoJ: 7, twoI: 9, gJ: 1.14, gI: 0.0003, A: -200e6, B: 30e6 } },
    { name: 'J=15/2, I=15/2 with B and C', spec: { kind: 'hyperfine' as const, twoJ: 15, twoI: 15, gJ: 1.2, gI: 0.0002, A: 300e6, B: -50e6, C: 1e5 } },
  ];
  for (const lv of levels) {
    console.log(`\n${lv.name}, blocks at 201 fields from 0 to 1 T:`);
    console.log('order | Jacobi µs | own Householder+QR µs | ml-matrix µs');
    for (const [n, mats] of [...physicalBlocks(lv.spec, 201, 1).entries()].sort((x, y) => x[0] - y[0])) {
      const j = timeSolver(jacobiInPlace, mats, n);
      const h = timeSolver(own, mats, n);
      const l = timeSolver(libraryEigenInPlace, mats, n);
      console.log(`${String(n).padStart(5)} | ${j.usPer.toFixed(2).padStart(9)} | ${h.usPer.toFixed(2).padStart(21)} | ${l.usPer.toFixed(2).padStart(12)}`);
    }
  }
  sweepRoutes(levels);
  simdCrossover();
  againstLapack();
  await steady();
}

void main();
