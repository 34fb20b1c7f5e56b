// Times whole simdEigenpairs calls of two versions of the engine's eigen files in one process,
// alternating, CPU time: server/src/physics/engine at a git revision against the working tree's.
//   node scripts/wasm/compare-eigen-calls.mjs [revision=HEAD] [orders=160,192] [rounds=61] [calls=16]
// Each round times a block of calls of one version, then of the other (the first of the two
// swapping every round) on the same matrices (random symmetric, entries uniform in ±0.5, a ten
// times wider diagonal); it prints per order both medians over rounds, the median, quartiles and
// range of the rounds' old ÷ new ratios, the load at start and end, and whether the two
// versions' values and vectors are the same bits (or their largest difference).
import { execSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import path from 'node:path';
import * as esbuild from 'esbuild';

const revision = process.argv[2] ?? 'HEAD';
const orders = (process.argv[3] ?? '160,192').split(',').map(Number);
const rounds = Number(process.argv[4] ?? 61);
const calls = Number(process.argv[5] ?? 16);
const dir = mkdtempSync(path.join(tmpdir(), 'eigen-calls-'));
execSync(`git archive ${revision} server/src/physics/engine | tar -x -C ${dir}`);
const entry = path.join(dir, 'entry.ts');
const engine = 'server/src/physics/engine/simdEigen.ts';
writeFileSync(entry, `export { simdEigenpairs as before } from ${JSON.stringify(path.join(dir, engine))};
export { simdEigenpairs as after } from ${JSON.stringify(path.resolve(engine))};`);
const outfile = path.join(dir, 'entry.cjs');
await esbuild.build({ entryPoints: [entry], outfile, bundle: true, platform: 'node', format: 'cjs', logLevel: 'warning' });
const { createRequire } = await import('node:module');
const { before, after } = createRequire(import.meta.url)(outfile);
const versions = [before, after];

function lcg(seed) {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296 - 0.5;
  };
}
const median = (xs) => [...xs].sort((a, b) => a - b)[xs.length >> 1];
const quartiles = (xs) => { const s = [...xs].sort((a, b) => a - b); return [s[Math.floor(s.length / 4)], s[Math.floor((3 * s.length) / 4)]]; };

console.log(`${revision} → working tree, load ${loadavg()[0].toFixed(2)} at start`);
for (const n of orders) {
  const rnd = lcg(11 + n);
  const mats = Array.from({ length: 8 }, () => {
    const a = new Float64Array(n * n);
    for (let i = 0; i < n; i++)
      for (let j = 0; j <= i; j++) a[i * n + j] = a[j * n + i] = i === j ? 10 * rnd() : rnd();
    return a;
  });
  const out = versions.map(() => ({ values: new Float64Array(n), vectors: new Float64Array(n * n) }));
  let same = true;
  let diff = 0;
  for (const a of mats) {
    versions.forEach((f, q) => f(a, n, out[q].values, out[q].vectors));
    for (const key of ['values', 'vectors'])
      out[0][key].forEach((x, i) => {
        const y = out[1][key][i];
        if (!Object.is(x, y)) same = false;
        diff = Math.max(diff, Math.abs(x - y));
      });
  }
  const time = (q) => {
    const c = process.cpuUsage();
    for (let r = 0; r < calls; r++) versions[q](mats[r & 7], n, out[q].values, out[q].vectors);
    const d = process.cpuUsage(c);
    return (d.user + d.system) / calls;
  };
  time(0); time(1);
  const times = [[], []];
  const ratios = [];
  for (let round = 0; round < rounds; round++) {
    const t = [0, 0];
    for (const q of round % 2 ? [1, 0] : [0, 1]) t[q] = time(q);
    times[0].push(t[0]);
    times[1].push(t[1]);
    ratios.push(t[0] / t[1]);
  }
  const [lo, hi] = quartiles(ratios);
  console.log(`${String(n).padStart(4)}: ${median(times[0]).toFixed(0)} → ${median(times[1]).toFixed(0)} µs, old ÷ new ${median(ratios).toFixed(3)} (quartiles ${lo.toFixed(3)}–${hi.toFixed(3)}, range ${Math.min(...ratios).toFixed(3)}–${Math.max(...ratios).toFixed(3)}), ${same ? 'same bits' : `largest difference ${diff.toExponential(1)}`}`);
}
console.log(`load ${loadavg()[0].toFixed(2)} at end`);
