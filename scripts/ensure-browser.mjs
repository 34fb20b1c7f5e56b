// Part of `npm test`: the browser tests need Debian's chromium. Install it when it is missing
// and we may (root with apt-get, as on CI and fresh project machines); otherwise say why the
// browser tests will be skipped. Never downloads a browser build of its own.
import { existsSync } from 'node:fs';
import { spawnSync } from 'node:child_process';

const CHROMIUM = '/usr/bin/chromium';
if (existsSync(CHROMIUM)) process.exit(0);

const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
const hasApt = existsSync('/usr/bin/apt-get');
if (!isRoot || !hasApt) {
  console.warn(`ensure-browser: ${CHROMIUM} is missing and cannot be installed here (needs root and apt-get); browser tests will be skipped.`);
  process.exit(0);
}
console.log('ensure-browser: installing Debian chromium for the browser tests (apt-get)…');
const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
const run = (args) => spawnSync('apt-get', args, { stdio: 'inherit', env }).status === 0;
if (!(run(['update', '-qq']) && run(['install', '-y', '-qq', '--no-install-recommends', 'chromium']))) {
  console.error('ensure-browser: apt-get could not install chromium; browser tests will be skipped.');
}
