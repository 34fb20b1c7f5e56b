// What the figure scripts share: each bundles one scenario against two checkouts and runs it in
// a fresh process per round, the two trees alternated so a drift in load falls on both alike.
import { spawnSync } from 'node:child_process';
import { loadavg } from 'node:os';
import path from 'node:path';
import * as esbuild from 'esbuild';

/** The server's Node flags (client/src/extension.ts; the worker's 192 MB young generation), as bench/editor.bench.ts uses them. */
export const SERVER_NODE_FLAGS = ['--max-semi-space-size=64'];

/** Bundles `source` (TypeScript importing from the tree's root) into the tree's dist as `<name>.js`. */
function bundleScenario(tree, name, source) {
  const out = path.join(tree, 'dist', `${name}.js`);
  esbuild.buildSync({ stdin: { contents: source, resolveDir: tree, loader: 'ts' }, bundle: true, platform: 'node', format: 'cjs', outfile: out, logLevel: 'warning' });
  return out;
}

/** The given checkouts (missing ones dropped), each with its bundled scenario. */
export function treesWithScenario(dirs, name, source) {
  return dirs.filter(Boolean).map((d) => {
    const tree = path.resolve(d);
    return { tree, name: path.basename(tree), script: bundleScenario(tree, name, source) };
  });
}

/** The trees in pass `p`'s order: as given in even passes, reversed in odd ones. */
export function inTurn(trees, p) {
  return p % 2 === 0 ? trees : [...trees].reverse();
}

/** The one-minute load average, as the figures print it. */
export const loadNow = () => loadavg()[0].toFixed(1);

/** Calls `round(tree, pass, load)` for each tree in each of `pairs` passes, in turn. */
export function alternate(trees, pairs, round) {
  for (let p = 0; p < Number(pairs); p++) for (const t of inTurn(trees, p)) round(t, p, loadNow());
}

/** Runs a tree's scenario with `args` (Node flags first in `flags`) and returns the JSON of its last line. */
export function runScenario(t, args, flags = []) {
  const r = spawnSync(process.execPath, [...flags, t.script, ...args.map(String)], { cwd: t.tree, encoding: 'utf8' });
  return JSON.parse(r.stdout.trim().split('\n').pop());
}
