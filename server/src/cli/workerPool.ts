/**
 * A pool of worker threads for `sublevel eval` on many files. Each worker has one file at a
 * time and gets the next when it answers, so a slow file holds up only its own worker. A worker
 * that dies takes only its current file with it (reported as an internal error of that file);
 * a new worker carries on with the rest.
 */
import type { BatchReply, BatchRequest } from './batchWorker';
import { BATCH_WORKER_ARG } from './batchWorker';
import { type EvalJob, type EvalOutcome, internalErrorOutcome } from './evalFile';
import { lazyBuiltin } from './lazyBuiltin';

/** Runs every job in `threads` workers started from `script`; `onOutcome` sees each as it finishes (any order). */
export function runInWorkers(script: string, jobs: readonly EvalJob[], threads: number, onOutcome: (index: number, outcome: EvalOutcome) => void): Promise<void> {
  return new Promise((resolve) => {
    let next = 0;
    let finished = 0;
    let running = 0;
    if (jobs.length === 0) {
      resolve();
      return;
    }
    const settle = (index: number, outcome: EvalOutcome): void => {
      finished++;
      onOutcome(index, outcome);
      if (finished === jobs.length) resolve();
    };
    const start = (): void => {
      if (next >= jobs.length) return;
      running++;
      const worker = new (lazyBuiltin<typeof import('worker_threads')>('worker_threads').Worker)(script, { argv: [BATCH_WORKER_ARG] });
      let current: number | undefined;
      const feed = (): void => {
        if (next >= jobs.length) {
          current = undefined;
          void worker.terminate();
          return;
        }
        current = next++;
        worker.postMessage({ index: current, job: jobs[current]! } satisfies BatchRequest);
      };
      worker.on('message', ({ index, outcome }: BatchReply) => {
        current = undefined;
        settle(index, outcome);
        feed();
      });
      const lost = (why: string): void => {
        if (current !== undefined) {
          const index = current;
          current = undefined;
          settle(index, internalErrorOutcome(jobs[index]!, `the worker evaluating it stopped: ${why}`));
        }
      };
      worker.on('error', (e) => lost(e.stack ?? String(e)));
      worker.on('exit', (code) => {
        running--;
        lost(`exit code ${code}`);
        // A worker lost mid-run is replaced while files remain.
        if (next < jobs.length && running < threads) start();
      });
      feed();
    };
    for (let t = 0; t < Math.min(threads, jobs.length); t++) start();
  });
}
