/**
 * The steady protocol for "symmetricEigen at least at LAPACK's speed" (docs/speed.md): the engine
 * and numpy.linalg.eigh (one BLAS thread) solve the same matrices in one run, in alternating
 * rounds — a block of timings of one, then of the other, the first of the two swapping every round
 * — so that a change of the machine's load falls on both. Each round gives a CPU-time median per
 * side and their ratio; the verdict is the median of the rounds' ratios, with their spread. The
 * load average is printed at the start and the end, and the output says when it exceeded
 * LOAD_LIMIT (the ratio is then not a verdict).
 *   EIGEN_BENCH=steady node bench/run.mjs eigen    (EIGEN_ROUNDS, EIGEN_TIMINGS to change the counts)
 */
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import path from 'node:path';
import { createInterface } from 'node:readline';
import { symmetricEigen } from '../server/src/physics/engine';
import { median, quartiles } from './timing';

/** Above this one-minute load average on this 2-core machine a round's ratio is not a verdict. */
const LOAD_LIMIT = 1.5;

export interface SteadyOptions {
  orders: number[];
  rounds: number;
  /** Timings per side and round; each timing solves every matrix once. */
  timings: number;
  /** Families of random symmetric matrices: each makes its matrices of order n (row-major, n × n each). */
  families: { name: string; matrices: (n: number) => Float64Array[] }[];
}

/** A line-by-line conversation with `python3 bench/eigen_numpy.py --serve`. */
function startReference(): { ask: (line: string) => Promise<string>; close: () => void } {
  const env: NodeJS.ProcessEnv = { ...process.env, OMP_NUM_THREADS: '1', OPENBLAS_NUM_THREADS: '1', MKL_NUM_THREADS: '1' };
  // As the one-shot comparison: OpenBLAS picks its kernel for this processor.
  delete env.OPENBLAS_CORETYPE;
  delete env.OPENBLAS_L2_SIZE;
  const py = spawn('python3', ['bench/eigen_numpy.py', '--serve'], { env, stdio: ['pipe', 'pipe', 'inherit'] });
  const lines = createInterface({ input: py.stdout });
  const waiting: ((line: string) => void)[] = [];
  const ready: string[] = [];
  lines.on('line', (line) => {
    const w = waiting.shift();
    if (w) w(line);
    else ready.push(line);
  });
  let failed: Error | null = null;
  // A failed start or an early exit answers every pending question with an error.
  const fail = (e: Error) => {
    failed = e;
    for (const w of waiting.splice(0)) w('');
  };
  py.on('error', fail);
  py.on('exit', (code) => fail(new Error(`python3 exited with status ${code}`)));
  return {
    ask(line) {
      if (line) py.stdin.write(`${line}\n`);
      return new Promise((resolve, reject) => {
        const take = (l: string) => (l === '' && failed !== null ? reject(failed) : resolve(l));
        const r = ready.shift();
        if (r !== undefined) take(r);
        else if (failed) reject(failed);
        else waiting.push(take);
      });
    },
    close() {
      py.stdin.end();
    },
  };
}

/** CPU µs per call of `timings` timings, each one solve of every matrix. */
function engineBlock(mats: Float64Array[], n: number, timings: number, work: Float64Array, values: Float64Array, vectors: Float64Array): number[] {
  const out: number[] = [];
  for (let t = 0; t < timings; t++) {
    const c0 = process.cpuUsage();
    for (const m of mats) {
      work.set(m);
      symmetricEigen(work, n, values, vectors);
    }
    const c = process.cpuUsage(c0);
    out.push((c.user + c.system) / mats.length);
  }
  return out;
}

const f = (x: number, digits = 0) => x.toFixed(digits).replace(/\B(?=(\d{3})+(?!\d))/g, ' ');

/** Runs the protocol and returns its printed lines. */
export async function steadyAgainstLapack(o: SteadyOptions): Promise<string[]> {
  const lines: string[] = [];
  const loadStart = loadavg()[0];
  let loadHigh = loadStart;
  let ref: ReturnType<typeof startReference>;
  let head: { numpy: string; core: string | null };
  try {
    ref = startReference();
    head = JSON.parse(await ref.ask('')) as typeof head;
  } catch (e) {
    return [`steady protocol skipped (python3 failed): ${String(e)}`];
  }
  const dir = mkdtempSync(path.join(tmpdir(), 'eigen-steady-'));
  const rows: string[] = [];
  const perRound: string[] = [];
  const wide = Math.max(...o.families.map((x) => x.name.length));
  try {
    for (const n of o.orders) for (const family of o.families) {
      const mats = family.matrices(n);
      const file = path.join(dir, `order-${n}-${rows.length}.f64`);
      const all = new Float64Array(mats.length * n * n);
      mats.forEach((m, i) => all.set(m, i * n * n));
      writeFileSync(file, all);
      const work = new Float64Array(n * n);
      const values = new Float64Array(n);
      const vectors = new Float64Array(n * n);
      const request = `${file} ${n} ${mats.length} ${o.timings}`;
      // Warm-up of both sides (JIT, caches, the reference's first call).
      engineBlock(mats, n, 2, work, values, vectors);
      await ref.ask(request);
      const ours: number[] = [];
      const theirs: number[] = [];
      for (let r = 0; r < o.rounds; r++) {
        let e = 0;
        let l = 0;
        for (const side of r % 2 === 0 ? ['engine', 'lapack'] : ['lapack', 'engine']) {
          if (side === 'engine') e = median(engineBlock(mats, n, o.timings, work, values, vectors));
          else l = median((JSON.parse(await ref.ask(request)) as { cpu: number[] }).cpu);
        }
        ours.push(e);
        theirs.push(l);
        loadHigh = Math.max(loadHigh, loadavg()[0]);
      }
      const ratios = ours.map((e, r) => theirs[r]! / e);
      const q = quartiles(ratios);
      rows.push(
        `${String(n).padStart(5)} | ${family.name.padEnd(wide)} | ${f(median(ours)).padStart(6)} | ${f(median(theirs)).padStart(6)} | ${q.median.toFixed(3)} | ${q.low.toFixed(3)}–${q.high.toFixed(3)} | ${Math.min(...ratios).toFixed(3)}–${Math.max(...ratios).toFixed(3)}`,
      );
      perRound.push(`${String(n).padStart(5)} ${family.name.padEnd(wide)}: ${ratios.map((x) => x.toFixed(2)).join(' ')}`);
    }
  } catch (e) {
    return [`steady protocol stopped (the reference process failed): ${String(e)}`];
  } finally {
    ref.close();
    rmSync(dir, { recursive: true, force: true });
  }
  const loadEnd = loadavg()[0];
  loadHigh = Math.max(loadHigh, loadEnd);
  lines.push(
    `\nsteady protocol: symmetricEigen vs numpy.linalg.eigh ${head.numpy} (LAPACK dsyevd via OpenBLAS, core ${head.core ?? '?'}, one thread), the same matrices;`,
    `${o.rounds} rounds, each a block of ${o.timings} timings of one side then of the other (the first swapping every round); CPU µs per call`,
    `load average (1 min): ${loadStart.toFixed(2)} at the start, ${loadEnd.toFixed(2)} at the end, ${loadHigh.toFixed(2)} the highest seen between rounds`,
    'order | matrices | engine (median of the rounds) | LAPACK | LAPACK ÷ engine: median of the rounds | quartiles | lowest–highest (≥ 1: engine at least as fast)',
    ...rows,
    'LAPACK ÷ engine of each round:',
    ...perRound,
  );
  lines.push(
    loadHigh > LOAD_LIMIT
      ? `LOAD ABOVE ${LOAD_LIMIT} (highest ${loadHigh.toFixed(2)}): other work shared the cores; these ratios are not a verdict.`
      : `load stayed at or below ${LOAD_LIMIT}: the median ratio is the verdict.`,
  );
  return lines;
}
