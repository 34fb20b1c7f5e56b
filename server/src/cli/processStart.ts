/**
 * What a CLI bundle does when Node loads it: serve batch evaluations when it was started as a
 * batch worker, else run the process's command line with the bundle's commands.
 */
import { isBatchWorker, serveBatchJobs } from './batchWorker';
import { startCommandLine } from './commandLine';
import type { Command } from './commandTypes';
import { processIO } from './io';

/** `bundleFile` is the running bundle, which batch eval starts again as its worker threads. */
export function startProcess(commands: readonly Command[], bundleFile: string): void {
  if (isBatchWorker()) {
    serveBatchJobs();
    return;
  }
  // A closed pipe (`sublevel profile f | head`) is a normal way to stop reading, not an error.
  process.stdout.on('error', (e: NodeJS.ErrnoException) => {
    if (e.code === 'EPIPE') process.exit(process.exitCode ?? 0);
    throw e;
  });
  void startCommandLine(process.argv.slice(2), processIO, { progress: process.stderr, workerScript: bundleFile }, commands).then((code) => {
    process.exitCode = code;
  });
}
