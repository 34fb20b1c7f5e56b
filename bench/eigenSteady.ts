/**
 * The steady protocol for "symmetricEigen at least at LAPACK's speed" (docs/speed.md): the engine
 * and numpy.linalg.eigh (one BLAS thread) solve the same matrices in one run, in alternating
 * rounds — a block of timings of one, then of the other — so that a change of the machine's load
 * falls on both. Each round pins both processes to one CPU, the CPUs in turn (this virtual
 * machine's vCPUs run at one of two speeds 1.2–1.45× apart at a time, and the slow one moves), and
 * gives a CPU-time median per side. Each side's round is then called fast or slow against that
 * side's best round (eigenStates.ts); the verdict is the median LAPACK ÷ engine of the rounds where
 * both were fast, with its quartiles and count, both-slow rounds shown apart, and the same per CPU.
 * The load average is printed at the start and the end, and the output says when it exceeded
 * LOAD_LIMIT (the ratio is then not a verdict).
 *   EIGEN_BENCH=steady node bench/run.mjs eigen    (EIGEN_ROUNDS, EIGEN_TIMINGS to change the
 *   counts; EIGEN_PIN=0 for unpinned rounds)
 */
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import path from 'node:path';
import { createInterface } from 'node:readline';
import { symmetricEigen } from '../server/src/physics/engine';
import { cpuNumbers, pinToCpu, unpin } from './cpuPinning';
import { classifyRounds, type ClassifiedRound, FAST_WITHIN, type GroupSummary, groupText, MIN_VERDICT_ROUNDS, type Round, sameStateVerdict } from './eigenStates';
import { median } from './timing';

/** Above this one-minute load average on this 2-core machine a round's ratio is not a verdict. */
const LOAD_LIMIT = 1.5;

export interface SteadyOptions {
  orders: number[];
  rounds: number;
  /** Timings per side and round; each timing solves every matrix once. */
  timings: number;
  /** Both processes on one CPU per round, the CPUs in turn (bench/cpuPinning.ts); false: unpinned. */
  pin: boolean;
  /** Families of random symmetric matrices: each makes its matrices of order n (row-major, n × n each). */
  families: { name: string; matrices: (n: number) => Float64Array[] }[];
}

/** A line-by-line conversation with `python3 bench/eigen_numpy.py --serve`. */
function startReference(): { pid: number; ask: (line: string) => Promise<string>; close: () => void } {
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
    pid: py.pid ?? -1,
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

/** One order and family: its classified rounds (eigenStates.ts). */
interface Case {
  n: number;
  family: string;
  rounds: ClassifiedRound[];
}

/** The printed tables of a run: summary per case, then per CPU, then every round. */
function caseLines(cases: readonly Case[], wide: number, cpuList: readonly (number | null)[]): string[] {
  const label = (c: Case) => `${String(c.n).padStart(5)} | ${c.family.padEnd(wide)}`;
  const out: string[] = [
    'order | matrices | best round engine | LAPACK (CPU µs per call) | both fast: LAPACK ÷ engine; both sides\' medians | both slow: the same | mixed rounds (left out) | all rounds: median ratio',
  ];
  // A group's verdict with both sides' medians over its rounds, to compare with their known speeds.
  const cell = (g: GroupSummary) => (g.engine === null ? groupText(g) : `${groupText(g)}; engine ${f(g.engine)}, LAPACK ${f(g.lapack!)} µs`);
  for (const c of cases) {
    const v = sameStateVerdict(c.rounds);
    const best = (side: 'engine' | 'lapack') => f(Math.min(...c.rounds.map((r) => r[side])));
    out.push(
      `${label(c)} | ${best('engine').padStart(6)} | ${best('lapack').padStart(6)} | ${cell(v.bothFast)} | ${cell(v.bothSlow)} | ${v.mixed} | ${median(c.rounds.map((r) => r.ratio)).toFixed(3)}`,
    );
  }
  if (cpuList.some((cpu) => cpu !== null)) {
    out.push('per CPU (both processes pinned to it): rounds where each side was fast, each side\'s median, the both-fast verdict');
    for (const c of cases) {
      for (const cpu of cpuList) {
        const on = c.rounds.filter((r) => r.cpu === cpu);
        if (on.length === 0) continue;
        const fastCount = (side: 'engineSpeed' | 'lapackSpeed') => on.filter((r) => r[side] === 'fast').length;
        const v = sameStateVerdict(on);
        out.push(
          `${label(c)} | CPU ${cpu}: engine fast in ${fastCount('engineSpeed')}/${on.length} (median ${f(median(on.map((r) => r.engine)))} µs), LAPACK fast in ${fastCount('lapackSpeed')}/${on.length} (median ${f(median(on.map((r) => r.lapack)))} µs); both fast: ${groupText(v.bothFast)}`,
        );
      }
    }
  }
  out.push('each round: CPU (c0, c1; c- not pinned), engine µs and speed (f fast, s slow), LAPACK µs and speed, LAPACK ÷ engine:');
  for (const c of cases) {
    const tokens = c.rounds.map((r) => `c${r.cpu ?? '-'} ${f(r.engine)}${r.engineSpeed[0]} ${f(r.lapack)}${r.lapackSpeed[0]} ${r.ratio.toFixed(2)}`);
    for (let i = 0; i < tokens.length; i += 8) out.push(`${i === 0 ? label(c) : ' '.repeat(label(c).length)} | ${tokens.slice(i, i + 8).join(' · ')}`);
  }
  return out;
}

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
  // Both processes on one CPU per round, the CPUs in turn; without taskset, unpinned rounds.
  const pinning = o.pin && pinToCpu(process.pid, 0) && pinToCpu(ref.pid, 0);
  if (o.pin && !pinning) unpin(process.pid);
  const cpuList: (number | null)[] = pinning ? cpuNumbers() : [null];
  const pinNote = o.pin && cpuList[0] === null ? ' (asked for, but taskset failed)' : '';
  const dir = mkdtempSync(path.join(tmpdir(), 'eigen-steady-'));
  const cases: Case[] = [];
  const wide = Math.max(...o.families.map((x) => x.name.length));
  try {
    for (const n of o.orders) for (const family of o.families) {
      const mats = family.matrices(n);
      const file = path.join(dir, `order-${n}-${cases.length}.f64`);
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
      const rounds: Round[] = [];
      for (let r = 0; r < o.rounds; r++) {
        const asked = cpuList[r % cpuList.length]!;
        // A round whose pinning failed is labelled unpinned (null), not with a CPU it may not have run on.
        const cpu = asked !== null && pinToCpu(process.pid, asked) && pinToCpu(ref.pid, asked) ? asked : null;
        // The first side swaps every round when unpinned, every turn through the CPUs when pinned,
        // so that each CPU sees both orders.
        const engineFirst = Math.floor(r / cpuList.length) % 2 === 0;
        let e = 0;
        let l = 0;
        for (const side of engineFirst ? ['engine', 'lapack'] : ['lapack', 'engine']) {
          if (side === 'engine') e = median(engineBlock(mats, n, o.timings, work, values, vectors));
          else l = median((JSON.parse(await ref.ask(request)) as { cpu: number[] }).cpu);
        }
        rounds.push({ cpu, engine: e, lapack: l });
        loadHigh = Math.max(loadHigh, loadavg()[0]);
      }
      cases.push({ n, family: family.name, rounds: classifyRounds(rounds) });
    }
  } catch (e) {
    return [`steady protocol stopped (the reference process failed): ${String(e)}`];
  } finally {
    ref.close();
    if (cpuList[0] !== null) unpin(process.pid);
    rmSync(dir, { recursive: true, force: true });
  }
  const loadEnd = loadavg()[0];
  loadHigh = Math.max(loadHigh, loadEnd);
  const pinned = cpuList[0] !== null;
  lines.push(
    `\nsteady protocol: symmetricEigen vs numpy.linalg.eigh ${head.numpy} (LAPACK dsyevd via OpenBLAS, core ${head.core ?? '?'}, one thread), the same matrices;`,
    `${o.rounds} rounds, each a block of ${o.timings} timings of one side then of the other; ` +
      (pinned
        ? `both processes pinned to one CPU per round, CPUs ${cpuList.join(' and ')} in turn (the first side swapping every turn)`
        : `not pinned${pinNote} (the first side swapping every round)`) +
      '; CPU µs per call',
    `load average (1 min): ${loadStart.toFixed(2)} at the start, ${loadEnd.toFixed(2)} at the end, ${loadHigh.toFixed(2)} the highest seen between rounds`,
    `a side's round is fast when its median is within ${FAST_WITHIN}× of that side's best round of the same order and matrices, slow otherwise;`,
    `the verdict is the median LAPACK ÷ engine of the rounds where both sides were fast (≥ 1: engine at least as fast), from ${MIN_VERDICT_ROUNDS} such rounds on; both slow shown apart`,
    ...caseLines(cases, wide, cpuList),
  );
  lines.push(
    loadHigh > LOAD_LIMIT
      ? `LOAD ABOVE ${LOAD_LIMIT} (highest ${loadHigh.toFixed(2)}): other work shared the cores; these ratios are not a verdict.`
      : `load stayed at or below ${LOAD_LIMIT}: the both-fast median ratio is the verdict.`,
  );
  return lines;
}
