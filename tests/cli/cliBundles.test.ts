/**
 * The CLI as three files (esbuild.mjs): the launcher dist/cli.js sends `check`, `eval` and the
 * version to dist/cli-core.js and everything else to dist/cli-full.js; ml-matrix is a file of its
 * own that only a fit loads. Each command line must print the same bytes whichever bundle
 * answers it, as the in-process CLI with every command does. Needs `node esbuild.mjs` first.
 */
import { spawnSync } from 'child_process';
import { describe, expect, it } from 'vitest';
import { bundleFor } from '../../server/src/cli/bundleRoute';
import { ALL_COMMANDS } from '../../server/src/cli/commands';
import { CORE_COMMANDS } from '../../server/src/cli/coreCommands';
import { builtCli, cli } from './runCli';

const SMALL = 'examples/handmade-species.sublevel';
const FIT = 'examples/fit-rubidium.sublevel';

/** The bundle as Node runs it, with the modules it loaded (which files of dist/ were read). */
function loadedFiles(...argv: string[]): string[] {
  const probe = `process.on('exit', () => process.stderr.write('\\nLOADED ' + JSON.stringify(Object.keys(require.cache).map((f) => require('path').basename(f)))));`;
  const r = spawnSync(process.execPath, ['-e', `${probe} process.argv.splice(1, 0, 'dist/cli.js'); require('./dist/cli.js')`, '--', ...argv], { encoding: 'utf8' });
  const line = r.stderr.split('\n').find((l) => l.startsWith('LOADED '));
  return JSON.parse(line!.slice('LOADED '.length)) as string[];
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
    expect(loadedFiles('check', SMALL).filter((f) => f.startsWith('cli'))).toEqual(['cli.js', 'cli-core.js']);
    expect(loadedFiles('fit', FIT).filter((f) => f.startsWith('cli'))).toEqual(['cli.js', 'cli-full.js', 'cli-ml-matrix.js']);
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
