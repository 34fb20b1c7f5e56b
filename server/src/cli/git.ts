/**
 * The two things the CLI asks git: the repository's top folder (SARIF artifact paths are relative
 * to it) and a file's text at a revision (`sublevel diff --git`). git is run directly with an
 * argument list, never through a shell, so no file or revision name is interpreted as a command.
 */
import type { StdioOptions } from 'child_process';
import * as path from 'path';
import { UsageError } from './args';
import { lazyBuiltin } from './lazyBuiltin';

/** child_process is loaded only when git is asked (otherwise every command pays for it at start-up). */
function childProcess(): typeof import('child_process') {
  return lazyBuiltin<typeof import('child_process')>('child_process');
}

const PIPES: StdioOptions = ['ignore', 'pipe', 'pipe'];
const MAX_BUFFER = 64 * 1024 * 1024;

/** The top folder of the git work tree holding `dir`, or undefined outside one (or without git). */
export function gitTopLevel(dir: string): string | undefined {
  try {
    const top = childProcess().execFileSync('git', ['rev-parse', '--show-toplevel'], { encoding: 'utf8', stdio: PIPES, maxBuffer: MAX_BUFFER, cwd: dir }).trim();
    return top === '' ? undefined : path.resolve(top);
  } catch {
    return undefined;
  }
}

/** A file's bytes as stored at `rev`; a revision or path git does not know is a usage error with git's words. */
export function gitShowFile(rev: string, file: string): Buffer {
  if (rev.startsWith('-')) throw new UsageError(`--git needs a revision, got '${rev}'`);
  const dir = path.dirname(path.resolve(file));
  try {
    // `rev:./name` is the path relative to the folder git runs in.
    return childProcess().execFileSync('git', ['show', `${rev}:./${path.basename(file)}`], { stdio: PIPES, cwd: dir, maxBuffer: MAX_BUFFER });
  } catch (e) {
    const stderr = String((e as { stderr?: Buffer | string }).stderr ?? '').trim().split('\n')[0];
    throw new UsageError(`git cannot show ${file} at ${rev}${stderr ? `: ${stderr}` : ''}`);
  }
}
