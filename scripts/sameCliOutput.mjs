// Proves that a start-up change leaves every result alone: runs `check` (text, json, sarif) and
// `eval` (text, json) of every .sublevel file in examples/ and tests/fixtures/ with two builds of
// the CLI and compares stdout, stderr and the exit code byte for byte.
//   node scripts/sameCliOutput.mjs BEFORE_DIST [AFTER_DIST]   (AFTER_DIST defaults to dist)
// Exits 1 and names every differing run if any differ.
import { spawn } from 'node:child_process';
import { readdirSync, statSync } from 'node:fs';
import path from 'node:path';

const [before, after = 'dist'] = process.argv.slice(2);
if (!before) {
  console.error('usage: node scripts/sameCliOutput.mjs BEFORE_DIST [AFTER_DIST]');
  process.exit(2);
}

function sublevelFiles(dir) {
  const found = [];
  for (const name of readdirSync(dir).sort()) {
    const p = path.join(dir, name);
    if (statSync(p).isDirectory()) found.push(...sublevelFiles(p));
    else if (name.endsWith('.sublevel')) found.push(p);
  }
  return found;
}

const MODES = [
  ['check'],
  ['check', '--format', 'json'],
  ['check', '--format', 'sarif'],
  ['eval'],
  ['eval', '--format', 'json'],
];

function run(dist, args) {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, [path.resolve(dist, 'cli.js'), ...args]);
    const out = [];
    const err = [];
    child.stdout.on('data', (b) => out.push(b));
    child.stderr.on('data', (b) => err.push(b));
    child.on('close', (code) => resolve({ code, stdout: Buffer.concat(out), stderr: Buffer.concat(err) }));
  });
}

const jobs = [];
for (const file of [...sublevelFiles('examples'), ...sublevelFiles('tests/fixtures')]) {
  for (const mode of MODES) jobs.push([mode[0], file, ...mode.slice(1)]);
}

const differing = [];
let next = 0;
async function worker() {
  while (next < jobs.length) {
    const args = jobs[next++];
    const [a, b] = await Promise.all([run(before, args), run(after, args)]);
    if (a.code !== b.code || !a.stdout.equals(b.stdout) || !a.stderr.equals(b.stderr)) differing.push(args.join(' '));
  }
}
await Promise.all([worker(), worker()]);

console.log(`${jobs.length} runs compared (${before} against ${after}): ${differing.length} differ`);
for (const d of differing) console.log(`  differs: ${d}`);
process.exit(differing.length > 0 ? 1 : 0);
