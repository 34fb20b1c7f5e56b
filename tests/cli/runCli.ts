/** Runs the CLI in-process (optionally on an injected file system) or as the bundled dist/cli.js, and captures its output, for tests. */
import { spawnSync } from 'child_process';
import type { CliFileSystem } from '../../server/src/cli/fileSystem';
import { runCli } from '../../server/src/cli/main';

export function cli(...argv: string[]): { code: number; out: string; err: string } {
  return cliOn(undefined, ...argv);
}

export function cliOn(fsys: CliFileSystem | undefined, ...argv: string[]): { code: number; out: string; err: string } {
  const out: string[] = [];
  const err: string[] = [];
  const code = runCli(argv, { out: (l) => out.push(l), err: (l) => err.push(l) }, fsys);
  return { code, out: out.join('\n'), err: err.join('\n') };
}

/** The bundled command as a user runs it (run `node esbuild.mjs` first). */
export function builtCli(...argv: string[]): { code: number; out: string; err: string } {
  const r = spawnSync(process.execPath, ['dist/cli.js', ...argv], { encoding: 'utf8' });
  return { code: r.status ?? -1, out: r.stdout.trimEnd(), err: r.stderr.trimEnd() };
}
