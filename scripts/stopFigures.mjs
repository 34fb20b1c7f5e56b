// How soon a superseded job frees the worker: the editor bench's generated file (20,000 lines)
// evaluated once (the worker warm, as while typing), then the same text with an edit posted again
// and asked to stop ASK ms after it was posted (during the parse, the model or the first levels),
// through two trees' worker evaluators. Prints the time from the ask to the worker being free (the
// job's rejection) and whether the same worker thread was kept (otherwise it was stopped after the
// grace and a fresh one will serve the next job). Trees alternate, one process per run.
//   node scripts/stopFigures.mjs TREE_A TREE_B [PAIRS=3] [ASKS=50,200,400,700] [LINES=20000]
// Each tree needs its own dist/server.js (node esbuild.mjs) and node_modules.
import { SERVER_NODE_FLAGS, alternate, runScenario, treesWithScenario } from './lib/twoTrees.mjs';

const [a, b, pairs = '3', asks = '50,200,400,700', lines = '20000'] = process.argv.slice(2);
if (!a || !b) {
  console.error('usage: node scripts/stopFigures.mjs TREE_A TREE_B [PAIRS] [ASKS_MS] [LINES]');
  process.exit(2);
}

const SCENARIO = `
import { WorkerEvaluator } from './server/src/service/workerEvaluator';
import { generateSetup } from './bench/generatedSetup';
async function main(): Promise<void> {
  const [lines, ...asks] = process.argv.slice(2).map(Number);
  const text = generateSetup(lines);
  const ev = new WorkerEvaluator(require('path').resolve('dist/server.js'), () => undefined, 10 * 60_000);
  await ev.evaluate(text);
  const out = [];
  for (const [k, ask] of asks.entries()) {
    const thread = (ev as any).worker?.threadId; // the field, not a getter: the tree before has none
    const abort = new AbortController();
    const job = ev.evaluate(text + '\\n# edit ' + k, abort.signal).then(() => 'finished', () => 'stopped');
    await new Promise((r) => setTimeout(r, ask));
    const t0 = performance.now();
    abort.abort();
    const how = await job;
    const freed = performance.now() - t0;
    out.push({ ask, freed, how, kept: (ev as any).worker?.threadId === thread });
    await ev.evaluate(text + '\\n# settle ' + k); // warm again (or afresh) before the next ask
  }
  console.log(JSON.stringify(out));
  ev.dispose();
}
void main();
`;

const trees = treesWithScenario([a, b], 'stopScenario', SCENARIO);
alternate(trees, pairs, (t, _p, load) => {
  const figs = runScenario(t, [lines, ...asks.split(',')], SERVER_NODE_FLAGS);
  const said = figs.map((f) => `ask at ${f.ask} ms: ${f.how === 'stopped' ? `free ${f.freed.toFixed(0)} ms later, ${f.kept ? 'same worker' : 'worker replaced'}` : 'had finished'}`);
  console.log(`${t.name} (load ${load}): ${said.join('; ')}`);
});
