/**
 * The CLI as three files (esbuild.mjs): the launcher dist/cli.js sends `check`, `eval` and the
 * version to dist/cli-core.js and everything else to dist/cli-full.js; ml-matrix is a file of its
 * own that only a fit loads. Each command line must print the same bytes whichever bundle
 * answers it, as the in-process CLI with every command does. Needs `node esbuild.mjs` first.
 */
import { spawnSync } from 'child_process';
import { copyFileSync, mkdtempSync, rmSync } from 'fs';
import os from 'os';
import path from 'path';
import { describe, expect, it } from 'vitest';
import { bundleFor } from '../../server/src/cli/bundleRoute';
import { ALL_COMMANDS } from '../../server/src/cli/commands';
import { CORE_COMMANDS } from '../../server/src/cli/coreCommands';
import { builtCli, cli } from './runCli';

const SMALL = 'examples/handmade-species.sublevel';
const FIT = 'examples/fit-rubidium.sublevel';

/**
 * The launcher as a user runs it, watched: the dist/ files the main thread loaded, the scripts it
 * started worker threads with (file names), and what it printed without the watch's own line.
 */
function watchedRun(...argv: string[]): { loaded: string[]; workers: string[]; code: number | null; out: string; err: string } {
  const probe = `const wt = require('worker_threads'); const Started = wt.Worker; const workers = [];
    wt.Worker = class extends Started { constructor(file, options) { workers.push(require('path').basename(String(file))); super(file, options); } };
    process.on('exit', () => process.stderr.write('\\nWATCHED ' + JSON.stringify({ workers, loaded: Object.keys(require.cache).map((f) => require('path').basename(f)) })));`;
  const r = spawnSync(process.execPath, ['-e', `${probe} process.argv.splice(1, 0, 'dist/cli.js'); require('./dist/cli.js')`, '--', ...argv], { encoding: 'utf8' });
  const [err, watched] = r.stderr.split('\nWATCHED ');
  const { workers, loaded } = JSON.parse(watched!) as { workers: string[]; loaded: string[] };
  return { loaded: loaded.filter((f) => f.startsWith('cli')), workers, code: r.status, out: r.stdout.trimEnd(), err: err!.trimEnd() };
}

describe('which bundle answers', () => {
  it('check, eval and the version go to the core bundle; every other first word to the full one', () => {
    expect(['check', 'eval', '--version', '-V'].map(bundleFor)).toEqual(['core', 'core', 'core', 'core']);
    expect(['sweep', 'render', 'fit', '--help', '-h', 'help', 'chek', '--format', '', undefined].map(bundleFor)).toEqual(Array(10).fill('full'));
  });

  it('the core bundle has exactly the commands routed to it, in the full list\'s order', () => {
    expect(CORE_COMMANDS.map((c) => c.spec.name)).toEqual(ALL_COMMANDS.filter((c) => bundleFor(c.spec.name) === 'core').map((c) => c.spec.name));
    expect(ALL_COMMANDS.slice(0, CORE_COMMANDS.length)).toEqual(CORE_COMMANDS);
  });

  it('a check loads the launcher and the core bundle only; a fit loads the full bundle and ml-matrix', () => {
    expect(watchedRun('check', SMALL).loaded).toEqual(['cli.js', 'cli-core.js']);
    expect(watchedRun('fit', FIT).loaded).toEqual(['cli.js', 'cli-full.js', 'cli-ml-matrix.js']);
  });
});

describe('eval --jobs through the launcher', () => {
  it('routes `eval --jobs 2 <folder>` to the core bundle, whose workers are the core bundle too, with the one-process output', () => {
    // A folder of three self-contained examples, one with errors: small enough to run twice.
    const folder = mkdtempSync(path.join(os.tmpdir(), 'sublevel-jobs-'));
    for (const name of ['coils-and-wires.sublevel', 'handmade-species.sublevel', 'mistakes.sublevel']) copyFileSync(path.join('examples', name), path.join(folder, name));
    const argv = ['eval', folder, '--jobs', '2'];
    const run = watchedRun(...argv);
    const oneProcess = cli(...argv);
    rmSync(folder, { recursive: true });
    expect(run.loaded).toEqual(['cli.js', 'cli-core.js']);
    expect(run.workers).toEqual(['cli-core.js', 'cli-core.js']);
    // In-process there is no bundle to start as a worker, so `oneProcess` is the one-thread run.
    expect(oneProcess.err).toBe('3 files evaluated: 1 with errors or not read');
    expect(oneProcess.out.match(/^Sublevel evaluation of .*$/gm)).toHaveLength(3);
    expect({ code: run.code, out: run.out, err: run.err }).toEqual({ code: oneProcess.code, out: oneProcess.out.trimEnd(), err: oneProcess.err });
  });
});

describe('the same output from either bundle', () => {
  it.each([
    [['check', SMALL]],
    [['check', 'examples/mistakes.sublevel', '--format', 'sarif']],
    [['check', 'examples/mistakes.sublevel', '--format', 'json']],
    [['eval', FIT, '--format', 'json']],
    [['check', '--help']],
    [['check']],
    [['eval', SMALL, '--fromat', 'json']],
    [['-V', 'x']],
    [['fit', FIT]],
    [['sweep', 'examples/rubidium-bias.sublevel', '--level', 'ground', '--to', '0.1T', '--points', '5']],
    [['chek', SMALL]],
    [[]],
  ])('%j', (argv) => {
    const inProcess = cli(...argv);
    const built = builtCli(...argv);
    expect(built).toEqual({ code: inProcess.code, out: inProcess.out.trimEnd(), err: inProcess.err.trimEnd() });
  });
});
