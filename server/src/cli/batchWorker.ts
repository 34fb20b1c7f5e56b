/**
 * The worker side of `sublevel eval` on many files: the CLI bundle, started as a worker thread
 * with this role, evaluates the files it is sent one at a time and posts back what each prints.
 */
import { parentPort } from 'worker_threads';
import { type EvalJob, type EvalOutcome, evaluateForOutput, internalErrorOutcome } from './evalFile';
import { nodeFileSystem } from './fileSystem';

/** `workerData.role` that tells the CLI bundle, started as a worker, to serve batch evaluations. */
export const BATCH_WORKER_ROLE = 'sublevel-eval-batch';

export interface BatchRequest {
  index: number;
  job: EvalJob;
}

export interface BatchReply {
  index: number;
  outcome: EvalOutcome;
}

export function serveBatchJobs(): void {
  const port = parentPort;
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
