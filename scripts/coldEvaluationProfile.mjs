// A fresh worker's first evaluation, in one thread: bundles a scenario that evaluates the editor
// bench's generated file (LINES lines) once and packs the result as the worker does, then runs it in
// fresh processes alternating between trees, printing the process's CPU time (and, with --prof DIR,
// writing a V8 CPU profile per run into DIR).
//   node scripts/coldEvaluationProfile.mjs TREE_A [TREE_B] [PAIRS=3] [LINES=20000] [--prof DIR]
// Each tree needs its node_modules; the scenario is bundled from each tree's sources.
import path from 'node:path';
import { SERVER_NODE_FLAGS, alternate, runScenario, treesWithScenario } from './lib/twoTrees.mjs';

const args = process.argv.slice(2);
const profAt = args.indexOf('--prof');
const profDir = profAt >= 0 ? path.resolve(args.splice(profAt, 2)[1]) : undefined;
const [a, b, pairs = '3', lines = '20000'] = args;
if (!a) {
  console.error('usage: node scripts/coldEvaluationProfile.mjs TREE_A [TREE_B] [PAIRS] [LINES] [--prof DIR]');
  process.exit(2);
}

const SCENARIO = `
import { evaluateText } from './server/src/service/evaluator';
import { packResult } from './server/src/service/resultHandOff';
import { generateSetup } from './bench/generatedSetup';
const text = generateSetup(Number(process.argv[2]));
const c0 = process.cpuUsage();
const t0 = performance.now();
const outcome = evaluateText(text);
const c1 = process.cpuUsage(c0);
const packed = outcome.result ? packResult(outcome.result) : undefined;
const c2 = process.cpuUsage(c0);
const wall = performance.now() - t0;
const ms = (c: NodeJS.CpuUsage): number => (c.user + c.system) / 1000;
console.log(JSON.stringify({ evaluate: ms(c1), total: ms(c2), wall, problems: outcome.problems.length, packed: packed !== undefined }));
`;

const trees = treesWithScenario([a, b], 'coldEvaluationScenario', SCENARIO);
alternate(trees, pairs, (t, p, load) => {
  const prof = profDir ? ['--cpu-prof', '--cpu-prof-dir', profDir, '--cpu-prof-name', `${t.name}-${p}.cpuprofile`] : [];
  const fig = runScenario(t, [lines], [...SERVER_NODE_FLAGS, ...prof]);
  console.log(`${t.name}: evaluate ${(fig.evaluate / 1000).toFixed(2)} s CPU, with packing ${(fig.total / 1000).toFixed(2)} s CPU, ${(fig.wall / 1000).toFixed(2)} s wall, ${fig.problems} problems (load ${load})`);
});
