// What the user feels when a large file is the first thing the editor opens: two trees' built
// servers (dist/server.js --stdio, with the extension's Node flags) are started, initialised, and
// DELAY ms later the editor bench's generated 20,000-line file is opened; the server pushes the
// parse and model diagnostics at once, then again when the evaluation is in. Prints the wall clock
// from the open to each push and the server process's CPU (all its threads, from /proc) from the
// open to the second push. Trees alternate, one server per run. Linux only (/proc).
//   node scripts/openFigures.mjs TREE_A TREE_B [PAIRS=3] [DELAYS=0,1000,3000] [LINES=20000]
// Each tree needs its own dist/server.js (node esbuild.mjs) and node_modules.
import { spawn } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { loadavg } from 'node:os';
import path from 'node:path';
import * as esbuild from 'esbuild';

const [a, b, pairs = '3', delays = '0,1000,3000', lines = '20000'] = process.argv.slice(2);
if (!a || !b) {
  console.error('usage: node scripts/openFigures.mjs TREE_A TREE_B [PAIRS] [DELAYS_MS] [LINES]');
  process.exit(2);
}

// The generated file, from tree A's bench (the same generator in both trees).
const gen = esbuild.buildSync({ entryPoints: [path.join(a, 'bench/generatedSetup.ts')], bundle: true, platform: 'node', format: 'cjs', write: false, logLevel: 'warning' });
const mod = { exports: {} };
new Function('module', 'exports', gen.outputFiles[0].text)(mod, mod.exports);
const text = mod.exports.generateSetup(Number(lines));

/** CPU seconds of a process, all threads (utime + stime from /proc). */
function cpuOf(pid) {
  const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1].split(' ');
  return (Number(fields[11]) + Number(fields[12])) / 100;
}

const rpc = createRequire(path.join(path.resolve(a), 'package.json'))('vscode-jsonrpc/node');

async function run(tree, delay) {
  const child = spawn(process.execPath, ['--max-semi-space-size=64', path.join(tree, 'dist/server.js'), '--stdio'], { stdio: ['pipe', 'pipe', 'ignore'] });
  const conn = rpc.createMessageConnection(new rpc.StreamMessageReader(child.stdout), new rpc.StreamMessageWriter(child.stdin));
  const pushes = [];
  let onPush = () => undefined;
  conn.onNotification('textDocument/publishDiagnostics', (p) => {
    pushes.push({ at: performance.now(), cpu: cpuOf(child.pid), count: p.diagnostics.length });
    onPush();
  });
  conn.onNotification('window/logMessage', () => undefined);
  conn.onRequest(() => null);
  conn.listen();
  await conn.sendRequest('initialize', { processId: process.pid, rootUri: null, capabilities: { textDocument: { publishDiagnostics: {} } }, workspaceFolders: null });
  await conn.sendNotification('initialized', {});
  await new Promise((r) => setTimeout(r, delay));
  const t0 = performance.now();
  const c0 = cpuOf(child.pid);
  const second = new Promise((r) => (onPush = () => pushes.length >= 2 && r()));
  await conn.sendNotification('textDocument/didOpen', { textDocument: { uri: 'file:///bench/generated.sublevel', languageId: 'sublevel', version: 1, text } });
  await second;
  const rss = Number(readFileSync(`/proc/${child.pid}/status`, 'utf8').match(/VmRSS:\s+(\d+)/)[1]) / 1024;
  child.kill();
  conn.dispose();
  return { first: pushes[0].at - t0, second: pushes[1].at - t0, cpu: pushes[1].cpu - c0, rss };
}

const trees = [a, b].map((t) => path.resolve(t));
for (let p = 0; p < Number(pairs); p++) {
  for (const delay of delays.split(',').map(Number)) {
    for (const tree of p % 2 === 0 ? trees : [...trees].reverse()) {
      const load = loadavg()[0].toFixed(1);
      const f = await run(tree, delay);
      console.log(`${path.basename(tree)} opened ${delay} ms after start: parse+model diagnostics ${(f.first / 1000).toFixed(2)} s, evaluated ${(f.second / 1000).toFixed(2)} s wall, server CPU ${f.cpu.toFixed(2)} s, ${f.rss.toFixed(0)} MB (load ${load})`);
    }
  }
}
