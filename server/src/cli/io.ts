/** Output sinks and file system for the CLI, so commands can be tested without a process. */
import { escapeControls } from './escape';
import { type CliFileSystem, nodeFileSystem } from './fileSystem';

export interface CliIO {
  out(line: string): void;
  err(line: string): void;
}

/** What a command works with: where it prints and the file system it reads and writes. */
export interface CliContext {
  io: CliIO;
  fsys: CliFileSystem;
}

export const processIO: CliIO = {
  out: (line) => process.stdout.write(line + '\n'),
  err: (line) => process.stderr.write(line + '\n'),
};

/** Every line printed goes through here: control and bidi characters from files become visible escapes. */
export function terminalSafe(io: CliIO): CliIO {
  return { out: (line) => io.out(escapeControls(line)), err: (line) => io.err(escapeControls(line)) };
}

export function cliContext(io: CliIO, fsys: CliFileSystem = nodeFileSystem): CliContext {
  return { io: terminalSafe(io), fsys };
}
