// A fresh worker's first evaluation, in one thread: bundles a scenario that evaluates the editor
// bench's generated file (LINES lines) once and packs the result as the worker does, then runs it in
// fresh processes alternating between trees, printing the process's CPU time (and, with --prof DIR,
// writing a V8 CPU profile per run into DIR).
//   node scripts/coldEvaluationProfile.mjs TREE_A [TREE_B] [PAIRS=3] [LINES=20000] [--prof DIR]
// Each tree needs its node_modules; the scenario is bundled from each tree's sources.
import { spawnSync } from 'node:child_process';
import { loadavg } from 'node:os';
import path from 'node:path';
import * as esbuild from 'esbuild';

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

function bundle(tree) {
  const out = path.join(tree, 'dist', 'coldEvaluationScenario.js');
  esbuild.buildSync({ stdin: { contents: SCENARIO, resolveDir: tree, loader: 'ts' }, bundle: true, platform: 'node', format: 'cjs', outfile: out, logLevel: 'warning' });
  return out;
}

// The worker's young generation (service/workerEvaluator.ts: maxYoungGenerationSizeMb 192 → 64 MB semi-spaces).
const FLAGS = ['--max-semi-space-size=64'];
const trees = [a, b].filter(Boolean).map((t) => ({ tree: path.resolve(t), script: bundle(path.resolve(t)) }));
for (let p = 0; p < Number(pairs); p++) {
  for (const t of p % 2 === 0 ? trees : [...trees].reverse()) {
    const load = loadavg()[0].toFixed(1);
    const prof = profDir ? ['--cpu-prof', '--cpu-prof-dir', profDir, '--cpu-prof-name', `${path.basename(t.tree)}-${p}.cpuprofile`] : [];
    const r = spawnSync(process.execPath, [...FLAGS, ...prof, t.script, lines], { cwd: t.tree, encoding: 'utf8' });
    const fig = JSON.parse(r.stdout.trim().split('\n').pop());
    console.log(`${path.basename(t.tree)}: evaluate ${(fig.evaluate / 1000).toFixed(2)} s CPU, with packing ${(fig.total / 1000).toFixed(2)} s CPU, ${(fig.wall / 1000).toFixed(2)} s wall, ${fig.problems} problems (load ${load})`);
  }
}
