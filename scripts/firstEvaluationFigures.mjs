// The first evaluation a user waits for: the editor bench's generated file (20,000 lines) opened
// DELAY ms after the evaluator was made (the server makes it when it starts), or once its warm-up
// has done N rounds (a delay written rN: what the warm-up buys in CPU, whatever the load; a tree
// without a warm-up then opens at once), through two trees'
// worker evaluators. A tree whose evaluator can warm up (`warmUp`) is asked to, as the server does.
// Prints the job's wall clock and the CPU of the whole process (worker and this thread) from the
// request to the result in hand, the resident memory with the result held, and what the warm-up did.
// Trees alternate, one process per run, so that each starts alike.
//   node scripts/firstEvaluationFigures.mjs TREE_A TREE_B [PAIRS=3] [DELAYS=0,1000,3000] [LINES=20000]
// Each tree needs its own dist/server.js (node esbuild.mjs) and node_modules.
import { SERVER_NODE_FLAGS, inTurn, loadNow, runScenario, treesWithScenario } from './lib/twoTrees.mjs';

const [a, b, pairs = '3', delays = '0,1000,3000', lines = '20000'] = process.argv.slice(2);
if (!a || !b) {
  console.error('usage: node scripts/firstEvaluationFigures.mjs TREE_A TREE_B [PAIRS] [DELAYS_MS] [LINES]');
  process.exit(2);
}

const SCENARIO = `
import { WorkerEvaluator } from './server/src/service/workerEvaluator';
import { generateSetup } from './bench/generatedSetup';
async function main(): Promise<void> {
  const [delay, lines] = process.argv.slice(2);
  const text = generateSetup(Number(lines));
  const ev = new WorkerEvaluator(require('path').resolve('dist/server.js'), () => undefined, 10 * 60_000);
  (ev as any).warmUp?.(); // the tree before has none
  if (delay.startsWith('r')) {
    while ((ev as any).warmUp && (ev as any).warmUpProgress.done < Number(delay.slice(1))) await new Promise((r) => setTimeout(r, 20));
  } else await new Promise((r) => setTimeout(r, Number(delay)));
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  await ev.evaluate(text);
  const wall = performance.now() - t0;
  const c = process.cpuUsage(c0);
  const rss = process.memoryUsage().rss / 1e6;
  console.log(JSON.stringify({ wall, cpu: (c.user + c.system) / 1000, rss, warmUp: (ev as any).warmUpProgress ?? null }));
  ev.dispose();
}
void main();
`;

const trees = treesWithScenario([a, b], 'firstEvaluationScenario', SCENARIO);
for (let p = 0; p < Number(pairs); p++) {
  for (const delay of delays.split(',')) {
    for (const t of inTurn(trees, p)) {
      const load = loadNow();
      const fig = runScenario(t, [delay, lines], SERVER_NODE_FLAGS);
      const warm = fig.warmUp ? `warm-up rounds done ${fig.warmUp.done}, given up ${fig.warmUp.superseded}` : 'no warm-up';
      console.log(`${t.name} opened at ${delay.startsWith('r') ? `warm-up round ${delay.slice(1)}` : `${delay} ms`}: ${(fig.cpu / 1000).toFixed(2)} s CPU, ${(fig.wall / 1000).toFixed(2)} s wall, ${fig.rss.toFixed(0)} MB, ${warm} (load ${load})`);
    }
  }
}
