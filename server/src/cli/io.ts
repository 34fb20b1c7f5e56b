/** Output sinks and file system for the CLI, so commands can be tested without a process. */
import { escapeControls } from './escape';
import { type CliFileSystem, nodeFileSystem } from './fileSystem';
import type { ProgressStream } from './progress';

export interface CliIO {
  out(line: string): void;
  err(line: string): void;
}

/** What a command works with: where it prints and the file system it reads and writes. */
export interface CliContext {
  io: CliIO;
  fsys: CliFileSystem;
  /** Where a progress bar may be drawn (stderr; it draws only on a terminal). */
  progress?: ProgressStream;
  /** The CLI bundle, which batch commands can start as worker threads; absent in-process. */
  workerScript?: string;
}

/** What only the real process has: its stderr stream and its own bundle. */
export type ProcessExtras = Pick<CliContext, 'progress' | 'workerScript'>;

export const processIO: CliIO = {
  out: (line) => process.stdout.write(line + '\n'),
  err: (line) => process.stderr.write(line + '\n'),
};

/** Every line printed goes through here: control and bidi characters from files become visible escapes. */
export function terminalSafe(io: CliIO): CliIO {
  return { out: (line) => io.out(escapeControls(line)), err: (line) => io.err(escapeControls(line)) };
}

export function cliContext(io: CliIO, fsys: CliFileSystem = nodeFileSystem, extras: ProcessExtras = {}): CliContext {
  return { io: terminalSafe(io), fsys, ...extras };
}
