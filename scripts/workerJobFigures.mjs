// The evaluation worker's job after a one-line edit of the editor bench's generated 20,000-line
// file, through two trees' worker evaluators: the file is evaluated once (it opens), then JOBS
// jobs, each after one edit mid-file (a number changed in a species, and a comment line inserted,
// in turn), each awaited. Prints, per edit kind, the median wall clock and CPU of the whole process
// (worker and this thread) per job, and the process's resident memory after the last job.
// Trees alternate, one process per run, so that each starts alike.
//   node scripts/workerJobFigures.mjs TREE_A TREE_B [PAIRS=3] [JOBS=8] [LINES=20000]
// Each tree needs its own dist/server.js (node esbuild.mjs) and node_modules.
import { alternate, runScenario, treesWithScenario } from './lib/twoTrees.mjs';

const [a, b, pairs = '3', jobs = '8', lines = '20000'] = process.argv.slice(2);
if (!a || !b) {
  console.error('usage: node scripts/workerJobFigures.mjs TREE_A TREE_B [PAIRS] [JOBS] [LINES]');
  process.exit(2);
}

const SCENARIO = `
import { WorkerEvaluator } from './server/src/service/workerEvaluator';
import { generateSetup } from './bench/generatedSetup';
const median = (xs: number[]): number => [...xs].sort((p, q) => p - q)[Math.floor(xs.length / 2)]!;
async function main(): Promise<void> {
  const [jobs, lines] = process.argv.slice(2).map(Number);
  const ev = new WorkerEvaluator(require('path').resolve('dist/server.js'), () => undefined, 10 * 60_000);
  let text = generateSetup(lines);
  const mid = 'species Demo' + Math.floor(lines / 17) + ' ';
  await ev.evaluate(text);
  const figures: Record<string, { wall: number[]; cpu: number[] }> = { number: { wall: [], cpu: [] }, line: { wall: [], cpu: [] } };
  for (let k = 0; k < jobs; k++) {
    const kind = k % 2 === 0 ? 'number' : 'line';
    const at = text.indexOf(mid);
    if (kind === 'line') text = text.slice(0, at) + '# note ' + k + '\\n' + text.slice(at);
    else text = text.slice(0, at) + text.slice(at).replace(/A = [0-9.]+ MHz/, 'A = ' + (3000 + k).toFixed(2) + ' MHz');
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    await ev.evaluate(text);
    figures[kind]!.wall.push(performance.now() - t0);
    const c = process.cpuUsage(c0);
    figures[kind]!.cpu.push((c.user + c.system) / 1000);
  }
  const out = Object.fromEntries(Object.entries(figures).map(([k, f]) => [k, { wall: median(f.wall), cpu: median(f.cpu) }]));
  console.log(JSON.stringify({ ...out, rss: process.memoryUsage().rss / 2 ** 20 }));
  ev.dispose();
}
void main();
`;

const s = (ms) => (ms / 1000).toFixed(2);
const trees = treesWithScenario([a, b], 'workerJobScenario', SCENARIO);
alternate(trees, pairs, (t, _p, load) => {
  const fig = runScenario(t, [jobs, lines]);
  console.log(
    `${t.name}: number edited ${s(fig.number.cpu)} s CPU (${s(fig.number.wall)} s wall), line inserted ${s(fig.line.cpu)} s CPU (${s(fig.line.wall)} s wall), ` +
      `medians of ${Math.ceil(Number(jobs) / 2)} jobs; ${fig.rss.toFixed(0)} MB resident (load ${load})`,
  );
});
