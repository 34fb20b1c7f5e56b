// End-to-end tests of the extension in a real VS Code host (code-server, offline):
//   1. build (esbuild) and package the .vsix (scripts/package.mjs),
//   2. install code-server in its own folder if needed (install-code-server.sh),
//   3. (a) the suite inside the extension host, (b) the UI suite in chromium on the .vsix,
// then prints `E2E: N passed, N failed` and exits non-zero on any failure.
//
//   node scripts/e2e/run.mjs [--only inhost|ui] [--keep]
//
// Everything the hosts write goes under one temporary folder; its screenshots are kept (the
// path is printed), the rest is removed unless --keep or a failure.
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { launchChromium } from './browser.mjs';
import { buildE2e } from './build.mjs';
import { stopAllHosts } from './host.mjs';
import { runInHostSuite } from './inHost.mjs';
import { runUiSuite } from './ui.mjs';

const WATCHDOG_MS = 25 * 60_000;
const root = resolve(import.meta.dirname, '..', '..');
const args = process.argv.slice(2);
const only = args.includes('--only') ? args[args.indexOf('--only') + 1] : undefined;
const keep = args.includes('--keep');

const work = mkdtempSync(join(tmpdir(), 'sublevel-e2e-'));
const shots = join(work, 'shots');
mkdirSync(shots);
const outcomes = [];
const timings = [];
const started = Date.now();

function report(o) {
  outcomes.push(o);
  console.log(`  ${o.ok ? 'ok  ' : 'FAIL'} ${o.title} (${o.ms} ms)`);
  if (!o.ok && o.error) console.log(o.error.replace(/^/gm, '       '));
}

async function stage(name, work) {
  const t = Date.now();
  console.log(`e2e: ${name}…`);
  try {
    return await work();
  } catch (e) {
    report({ title: `setup: ${name}`, ok: false, ms: Date.now() - t, error: e instanceof Error ? (e.stack ?? e.message) : String(e) });
    return undefined;
  } finally {
    timings.push(`${name} ${((Date.now() - t) / 1000).toFixed(1)} s`);
  }
}

function command(cmd, cmdArgs) {
  const r = spawnSync(cmd, cmdArgs, { cwd: root, encoding: 'utf8', stdio: ['ignore', 'pipe', 'inherit'], maxBuffer: 64 * 1024 * 1024 });
  if (r.status !== 0) throw new Error(`${cmd} ${cmdArgs.join(' ')} failed (exit ${r.status ?? r.signal})\n${r.stdout}`);
  return r.stdout.trim().split('\n').pop();
}

function finish(code) {
  const passed = outcomes.filter((o) => o.ok).length;
  const failed = outcomes.length - passed;
  console.log(`e2e: timings: ${timings.join(', ')}; total ${((Date.now() - started) / 1000).toFixed(1)} s`);
  const failedRun = failed > 0 || passed === 0 || code !== 0;
  if (keep || failedRun) console.log(`e2e: host files kept in ${work}`);
  else for (const entry of readdirSync(work)) if (entry !== 'shots') rmSync(join(work, entry), { recursive: true, force: true });
  console.log(`e2e: screenshots in ${shots}`);
  console.log(`E2E: ${passed} passed, ${failed} failed`);
  process.exit(failedRun ? 1 : 0);
}

let browser;
async function shutdown() {
  await browser?.close().catch(() => undefined);
  await stopAllHosts();
}
setTimeout(async () => {
  report({ title: 'whole run', ok: false, ms: WATCHDOG_MS, error: `stopped by the watchdog after ${WATCHDOG_MS / 60_000} minutes` });
  await shutdown();
  finish(1);
}, WATCHDOG_MS).unref();
for (const sig of ['SIGINT', 'SIGTERM']) process.on(sig, async () => {
  await shutdown();
  finish(1);
});

await stage('build', () => command(process.execPath, ['esbuild.mjs']));
const vsix = await stage('package', () => command(process.execPath, ['scripts/package.mjs', '--no-build', '--out', join(work, 'sublevel.vsix')]));
const codeServer = await stage('install code-server', () => command('bash', ['scripts/e2e/install-code-server.sh']));
const bundles = await stage('bundle tests', () => buildE2e());
if (codeServer && bundles) {
  // Debian's chromium, installed by apt-get where it is missing (as `npm test` does).
  await stage('chromium', () => command(process.execPath, ['scripts/ensure-browser.mjs']));
  browser = await stage('start chromium', () => launchChromium());
}

if (browser && only !== 'ui') {
  await stage('(a) in-host suite', () => runInHostSuite({ codeServer, root, suite: bundles.suite, workDir: join(work, 'inhost'), browser, report }));
}
if (browser && vsix && only !== 'inhost') {
  await stage('(b) UI suite on the .vsix', () => runUiSuite({ codeServer, root, vsix, uiBundle: bundles.ui, workDir: join(work, 'ui'), shotsDir: shots, browser, report }));
}
await shutdown();
finish(0);
