// Builds the CLI as two files plus V8's code cache (docs/speed.md, "Start-up"):
//   dist/cli-main.js            the bundle (server/src/cli/main.ts and everything it imports);
//   dist/cli.js                 the launcher (server/src/cli/launch.ts), the `sublevel` bin;
//   dist/cli-main.<hash>.cache  V8's code for the bundle after one `check` run, named by the
//                               bundle's content hash (baked into the launcher), older ones removed.
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { readdirSync, readFileSync, rmSync } from 'node:fs';
import path from 'node:path';
import * as esbuild from 'esbuild';

const common = { bundle: true, platform: 'node', target: 'node20', format: 'cjs', sourcemap: true, logLevel: 'warning' };
/** A small file whose check compiles the parser, model, engine and report (the start-up bench's file). */
const TRAINING_FILE = 'examples/handmade-species.sublevel';

export async function buildCli() {
  await esbuild.build({ ...common, entryPoints: ['server/src/cli/main.ts'], outfile: 'dist/cli-main.js' });
  const hash = createHash('sha256').update(readFileSync('dist/cli-main.js')).digest('hex').slice(0, 16);
  await esbuild.build({
    ...common,
    entryPoints: ['server/src/cli/launch.ts'],
    outfile: 'dist/cli.js',
    banner: { js: '#!/usr/bin/env node' },
    define: { CLI_BUNDLE_HASH: JSON.stringify(hash) },
  });
  for (const f of readdirSync('dist')) if (/^cli-main\.[0-9a-f]+\.cache$/.test(f)) rmSync(path.join('dist', f));
  const run = spawnSync(process.execPath, ['dist/cli.js', 'check', TRAINING_FILE], {
    env: { ...process.env, SUBLEVEL_WRITE_CODE_CACHE: '1' },
    stdio: ['ignore', 'ignore', 'pipe'],
    encoding: 'utf8',
  });
  if (run.status !== 0) throw new Error(`the CLI's training run failed (${run.status}): ${run.stderr}`);
}
