/** The `sublevel` command with every command, run in-process (tests, embedding) or as a process (commandLine.ts has the rules). */
import { failure, runCommandLine, startCommandLine } from './commandLine';
import { ALL_COMMANDS } from './commands';
import type { CliFileSystem } from './fileSystem';
import { cliContext, type CliIO, type ProcessExtras } from './io';

/** In-process runs (tests, embedding): no worker threads, so every command finishes before this returns. */
export function runCli(argv: string[], io: CliIO, fsys?: CliFileSystem): number {
  const ctx = cliContext(io, fsys);
  const code = runCommandLine(argv, ctx, ALL_COMMANDS);
  return typeof code === 'number' ? code : failure(new Error('a command went asynchronous without worker threads'), argv, ctx, ALL_COMMANDS);
}

/** The process's run: commands may use worker threads and draw progress on stderr. */
export function startCli(argv: string[], io: CliIO, extras: ProcessExtras): Promise<number> {
  return startCommandLine(argv, io, extras, ALL_COMMANDS);
}
