// `npm run package`: bundles with esbuild, packs the extension into one .vsix with vsce (no
// node_modules: everything the extension runs is in dist/), then checks what went in.
//
//   node scripts/package.mjs [--out FILE.vsix] [--no-build]
//
// Prints the .vsix path as its last line.
import { spawnSync } from 'node:child_process';
import { readFileSync, statSync } from 'node:fs';
import { resolve } from 'node:path';
import { zipEntries } from './package/zipEntries.mjs';

const root = resolve(import.meta.dirname, '..');
const manifest = JSON.parse(readFileSync(resolve(root, 'package.json'), 'utf8'));
const args = process.argv.slice(2);
const outAt = args.indexOf('--out');
const out = resolve(root, outAt >= 0 ? args[outAt + 1] : `${manifest.name}-${manifest.version}.vsix`);

/** Files a working extension cannot do without (paths inside the .vsix). */
const REQUIRED = [
  'extension/package.json',
  'extension/readme.md',
  'extension/changelog.md',
  'extension/LICENSE.txt',
  'extension/dist/client.js',
  'extension/dist/server.js',
  'extension/dist/service.js',
  'extension/dist/panel/page.js',
  'extension/dist/panel/panel.css',
  'extension/language-configuration.json',
  'extension/syntaxes/sublevel.tmLanguage.json',
  'extension/images/icon.png',
];
/** Nothing of these belongs in the package: sources, tests, source maps, dependencies. */
const FORBIDDEN = [/\/node_modules\//, /\.ts$/, /\.map$/, /^extension\/(tests|server|client|scripts|bench|examples)\//];
/** Well above today's ~1.5 MB; a jump past it means something unbundled slipped in. */
const MAX_BYTES = 8 * 1024 * 1024;

function run(cmd, cmdArgs) {
  const r = spawnSync(cmd, cmdArgs, { cwd: root, stdio: ['ignore', 'inherit', 'inherit'] });
  if (r.status !== 0) {
    console.error(`package: ${cmd} ${cmdArgs.join(' ')} failed (exit ${r.status ?? r.signal})`);
    process.exit(1);
  }
}

if (!args.includes('--no-build')) run(process.execPath, ['esbuild.mjs']);

const vsceArgs = ['--no', '--', 'vsce', 'package', '--no-dependencies', '--out', out];
if (!manifest.repository) {
  // vsce turns the README's relative links into repository links; without a repository
  // they stay relative and point at the copies of those pages packed beside the README.
  console.warn('package: package.json has no "repository"; README links are left relative.');
  vsceArgs.push('--allow-missing-repository', '--no-rewrite-relative-links');
}
run('npx', vsceArgs);

const entries = zipEntries(out);
const names = new Set(entries.map((e) => e.name));
const problems = [
  ...REQUIRED.filter((f) => !names.has(f)).map((f) => `missing ${f}`),
  ...entries.filter((e) => FORBIDDEN.some((re) => re.test(e.name))).map((e) => `should not contain ${e.name}`),
];
// README links stay relative when there is no repository, so their pages must be packed too.
const readme = readFileSync(resolve(root, 'README.md'), 'utf8');
for (const [, target] of readme.matchAll(/\]\(([^)\s]+)\)/g)) {
  if (/^[a-z][a-z0-9+.-]*:|^#/i.test(target)) continue;
  const file = `extension/${target.replace(/^\.\//, '').replace(/#.*$/, '')}`;
  if (!names.has(file)) problems.push(`lacks ${file}, which README.md links to (add it to .vscodeignore)`);
}
const bytes = statSync(out).size;
if (bytes > MAX_BYTES) problems.push(`is ${bytes} bytes, more than the ${MAX_BYTES} allowed`);
if (problems.length) {
  for (const p of problems) console.error(`package: ${out} ${p}`);
  process.exit(1);
}
console.log(`package: ${entries.length} files, ${(bytes / 1024).toFixed(0)} KiB, contents checked`);
console.log(out);
