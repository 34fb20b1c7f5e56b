// Starts and stops code-server for the end-to-end tests: loopback only, a port the kernel
// picks, no authentication, telemetry and update checks off, an empty extension gallery, and
// every file it writes (user data, extensions, logs, sockets, XDG folders) under `dir`.
import { spawn } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

const START_TIMEOUT_MS = 60_000;
const STOP_TIMEOUT_MS = 10_000;
/** stop() of every host still running, for the runner's watchdog and signal handlers. */
const running = new Set();

export async function stopAllHosts() {
  await Promise.all([...running].map((stop) => stop()));
}

/** Settings for a quiet window: no welcome page, no chat side bar, no tips, no network. */
const USER_SETTINGS = {
  'workbench.startupEditor': 'none',
  'workbench.secondarySideBar.defaultVisibility': 'hidden',
  'workbench.tips.enabled': false,
  'workbench.enableExperiments': false,
  'chat.disableAIFeatures': true,
  'telemetry.telemetryLevel': 'off',
  'update.mode': 'none',
  'extensions.autoCheckUpdates': false,
  'extensions.autoUpdate': false,
  'security.workspace.trust.enabled': false,
  'git.enabled': false,
  'editor.hover.delay': 150,
};

function hostDirs(dir) {
  const d = { userData: join(dir, 'user-data'), extensions: join(dir, 'extensions'), xdg: join(dir, 'xdg'), tmp: join(dir, 'tmp') };
  for (const p of Object.values(d)) mkdirSync(p, { recursive: true });
  mkdirSync(join(d.userData, 'User'), { recursive: true });
  writeFileSync(join(d.userData, 'User', 'settings.json'), JSON.stringify(USER_SETTINGS, null, 2));
  return d;
}

function hostEnv(d, extra) {
  return {
    ...process.env,
    XDG_DATA_HOME: d.xdg,
    XDG_CONFIG_HOME: d.xdg,
    XDG_CACHE_HOME: d.xdg,
    TMPDIR: d.tmp,
    EXTENSIONS_GALLERY: JSON.stringify({ serviceUrl: '' }),
    ...extra,
  };
}

function commonArgs(d) {
  return ['--config', '/dev/null', '--user-data-dir', d.userData, '--extensions-dir', d.extensions];
}

/** `code-server --install-extension <vsix>` into this host's extensions folder. */
export function installExtension(codeServer, dir, vsix) {
  const d = hostDirs(dir);
  return new Promise((resolve, reject) => {
    const p = spawn(codeServer, [...commonArgs(d), '--install-extension', vsix, '--force'], { env: hostEnv(d, {}), stdio: ['ignore', 'pipe', 'pipe'] });
    let out = '';
    p.stdout.on('data', (b) => (out += b));
    p.stderr.on('data', (b) => (out += b));
    p.on('error', reject);
    p.on('exit', (code) => (code === 0 && /successfully installed/i.test(out) ? resolve(out.trim()) : reject(new Error(`installing ${vsix} failed (exit ${code}):\n${out}`))));
  });
}

/**
 * Starts code-server in its own process group (so stop() ends the extension host and the
 * language server with it) and resolves once it listens. `env` is added to its environment,
 * which the extension host inherits.
 */
export function startHost(codeServer, dir, { smokeTestDriver = false, env = {} } = {}) {
  const d = hostDirs(dir);
  const args = [
    ...commonArgs(d),
    '--bind-addr', '127.0.0.1:0',
    '--auth', 'none',
    '--disable-telemetry',
    '--disable-update-check',
    '--disable-workspace-trust',
    '--disable-getting-started-override',
    ...(smokeTestDriver ? ['--vscode-option', 'enable-smoke-test-driver'] : []),
  ];
  const child = spawn(codeServer, args, { env: hostEnv(d, env), detached: true, stdio: ['ignore', 'pipe', 'pipe'] });
  let log = '';
  const exited = new Promise((resolve) => child.on('exit', (code, signal) => resolve({ code, signal })));

  const stop = async () => {
    running.delete(stop);
    if (child.exitCode !== null || child.signalCode !== null) return;
    const signalGroup = (sig) => {
      try {
        process.kill(-child.pid, sig);
      } catch {
        // the group is already gone
      }
    };
    signalGroup('SIGTERM');
    const timer = new Promise((resolve) => setTimeout(resolve, STOP_TIMEOUT_MS, 'timeout'));
    if ((await Promise.race([exited, timer])) === 'timeout') signalGroup('SIGKILL');
    // Children of the group (extension host, language server) may outlive the leader briefly.
    signalGroup('SIGKILL');
  };

  running.add(stop);
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => {
      void stop();
      reject(new Error(`code-server did not start within ${START_TIMEOUT_MS} ms:\n${log}`));
    }, START_TIMEOUT_MS);
    const onData = (b) => {
      log += b;
      const m = /HTTP server listening on (http:\/\/127\.0\.0\.1:\d+)/.exec(log);
      if (m) {
        clearTimeout(timer);
        resolve({ origin: m[1], authority: new URL(m[1]).host, stop, log: () => log, dirs: d });
      }
    };
    child.stdout.on('data', onData);
    child.stderr.on('data', (b) => (log += b));
    child.on('error', (e) => {
      clearTimeout(timer);
      reject(e);
    });
    void exited.then(({ code, signal }) => {
      clearTimeout(timer);
      reject(new Error(`code-server exited (${code ?? signal}) before listening:\n${log}`));
    });
  });
}
