/**
 * The worker side of `sublevel eval` on many files: the CLI bundle, started as a worker thread
 * with this role, evaluates the files it is sent one at a time and posts back what each prints.
 */
import { type EvalJob, type EvalOutcome, evaluateForOutput, internalErrorOutcome } from './evalFile';
import { nodeFileSystem } from './fileSystem';
import { lazyBuiltin } from './lazyBuiltin';

/**
 * The argument that tells the CLI bundle, started as a worker, to serve batch evaluations (an
 * argument rather than workerData, so an ordinary run need not load worker_threads to tell).
 */
export const BATCH_WORKER_ARG = '--sublevel-eval-batch-worker';

/** True in a batch worker: started with the argument, and a worker thread indeed. */
export function isBatchWorker(): boolean {
  return process.argv.includes(BATCH_WORKER_ARG) && !lazyBuiltin<typeof import('worker_threads')>('worker_threads').isMainThread;
}

export interface BatchRequest {
  index: number;
  job: EvalJob;
}

export interface BatchReply {
  index: number;
  outcome: EvalOutcome;
}

export function serveBatchJobs(): void {
  const port = lazyBuiltin<typeof import('worker_threads')>('worker_threads').parentPort;
  if (!port) return;
  port.on('message', ({ index, job }: BatchRequest) => {
    let outcome: EvalOutcome;
    try {
      outcome = evaluateForOutput(job, nodeFileSystem);
    } catch (e) {
      outcome = internalErrorOutcome(job, (e as Error).stack ?? String(e));
    }
    port.postMessage({ index, outcome } satisfies BatchReply);
  });
}
