// Typing into the editor bench's generated 20,000-line file, through two trees' worker evaluators:
// one full evaluation (the file opens), then KEYS edits INTERVAL ms apart, each superseding the one
// before, then the final job after the last edit. Prints the final job's wall clock and the CPU of
// the whole process (worker and this thread) while it ran, and whether the worker was replaced.
// Trees alternate, one process per run, so that each starts alike.
//   node scripts/typingFigures.mjs TREE_A TREE_B [PAIRS=3] [KEYS=6] [INTERVAL=300] [LINES=20000]
// Each tree needs its own dist/server.js (node esbuild.mjs) and node_modules.
import { alternate, runScenario, treesWithScenario } from './lib/twoTrees.mjs';

const [a, b, pairs = '3', keys = '6', interval = '300', lines = '20000'] = process.argv.slice(2);
if (!a || !b) {
  console.error('usage: node scripts/typingFigures.mjs TREE_A TREE_B [PAIRS] [KEYS] [INTERVAL_MS] [LINES]');
  process.exit(2);
}

const SCENARIO = `
import { WorkerEvaluator } from './server/src/service/workerEvaluator';
import { generateSetup } from './bench/generatedSetup';
async function main(): Promise<void> {
  const [keys, interval, lines] = process.argv.slice(2).map(Number);
  const ev = new WorkerEvaluator(require('path').resolve('dist/server.js'), () => undefined, 10 * 60_000);
  const text = generateSetup(lines);
  await ev.evaluate(text);
  const thread = (ev as any).worker?.threadId; // the field, not a getter: the tree before has none
  let abort: AbortController | undefined;
  for (let k = 0; k < keys; k++) {
    abort?.abort();
    abort = new AbortController();
    ev.evaluate(text + '\\n# edit ' + k, abort.signal).catch(() => undefined);
    await new Promise((r) => setTimeout(r, interval));
  }
  abort?.abort();
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  await ev.evaluate(text + '\\n# final');
  const wall = performance.now() - t0;
  const c = process.cpuUsage(c0);
  console.log(JSON.stringify({ wall, cpu: (c.user + c.system) / 1000, warm: (ev as any).worker?.threadId === thread }));
  ev.dispose();
}
void main();
`;

const trees = treesWithScenario([a, b], 'typingScenario', SCENARIO);
alternate(trees, pairs, (t, _p, load) => {
  const fig = runScenario(t, [keys, interval, lines]);
  console.log(`${t.name}: final job ${(fig.wall / 1000).toFixed(2)} s wall, ${(fig.cpu / 1000).toFixed(2)} s CPU, worker ${fig.warm ? 'kept warm' : 'replaced'} (load ${load})`);
});
