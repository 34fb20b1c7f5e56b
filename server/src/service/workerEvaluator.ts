/**
 * Runs evaluations in a worker thread, one at a time. A job that takes longer than the time
 * limit stops the worker (its job fails); the next job starts a fresh one. A job that is no
 * longer wanted is dropped from the queue, or, when it is running, asked to stop through a
 * shared flag (the evaluation gives up at its next check point and the worker, warm, takes the
 * next job). A running job that has not stopped STOP_GRACE_MS after the ask is stopped with
 * its worker, so nothing can hold up the new version. A worker that cannot start makes the evaluator fall back to this thread.
 */
import { Worker } from 'worker_threads';
import { EVALUATION_TIME_LIMIT_MS } from '../model/limits';
import type { SourceSnapshot } from '../model/sources';
import { type EvaluationOutcome, type Evaluator, evaluateText, SUPERSEDED } from './evaluator';
import type { EvaluationReply, EvaluationRequest } from './evaluatorThread';
import { unpackResult } from './resultHandOff';

/** `workerData.role` that tells a bundle started as a worker to serve evaluations. */
export const EVALUATOR_ROLE = 'sublevel-evaluator';

/**
 * How long a superseded job gets to reach a check point after it was asked to stop; past this the
 * worker is stopped. Check points come after the parse, the model and every level, beam and line;
 * the longest stretch between two is the parse: 0.2–0.6 s warm on the 20,000-line file at load 9
 * on 2 cores (0.2 s at load 1), and a cold worker costs ~4 s of CPU more than a warm one.
 */
const STOP_GRACE_MS = 1000;

interface Job {
  id: number;
  text: string;
  sources?: SourceSnapshot;
  resolve: (o: EvaluationOutcome) => void;
  reject: (e: Error) => void;
}

export class WorkerEvaluator implements Evaluator {
  private worker: Worker | undefined;
  private readonly queue: Job[] = [];
  private current: Job | undefined;
  private timer: NodeJS.Timeout | undefined;
  private abandonTimer: NodeJS.Timeout | undefined;
  private nextId = 1;
  private broken = false;
  /** Shared with every worker this evaluator starts: the id of the running job that is no longer wanted. */
  private readonly stopFlag = new Int32Array(new SharedArrayBuffer(4));

  constructor(
    /** The script to run in the worker: the server bundle itself. */
    private readonly script: string,
    private readonly log: (message: string) => void,
    private readonly timeLimitMs = EVALUATION_TIME_LIMIT_MS,
  ) {}

  evaluate(text: string, signal?: AbortSignal, sources?: SourceSnapshot): Promise<EvaluationOutcome> {
    if (this.broken) return new Promise((resolve) => resolve(evaluateText(text, sources)));
    return new Promise((resolve, reject) => {
      const job: Job = { id: this.nextId++, text, ...(sources ? { sources } : {}), resolve, reject };
      signal?.addEventListener('abort', () => this.supersede(job), { once: true });
      this.queue.push(job);
      this.pump();
    });
  }

  /** The running worker's thread id (undefined before the first job and after a stop): tells a warm worker from a fresh one. */
  get threadId(): number | undefined {
    return this.worker?.threadId;
  }

  private supersede(job: Job): void {
    const queued = this.queue.indexOf(job);
    if (queued >= 0) {
      this.queue.splice(queued, 1);
      job.reject(new Error(SUPERSEDED));
      return;
    }
    if (this.current !== job) return;
    // Ask first: the worker gives up at its next check point and answers SUPERSEDED, staying warm.
    Atomics.store(this.stopFlag, 0, job.id);
    // The hard stop stays as the fallback, for a job that does not reach a check point in time
    // (the timer is the bound, not only this moment: otherwise it could run to the time limit).
    clearTimeout(this.abandonTimer);
    this.abandonTimer = setTimeout(() => {
      if (this.current === job) this.stop(this.worker, SUPERSEDED, false);
    }, STOP_GRACE_MS);
  }

  dispose(): void {
    clearTimeout(this.timer);
    clearTimeout(this.abandonTimer);
    void this.worker?.terminate();
    this.worker = undefined;
    for (const job of [...(this.current ? [this.current] : []), ...this.queue.splice(0)]) job.reject(new Error('evaluator stopped'));
    this.current = undefined;
  }

  private start(): Worker | undefined {
    try {
      // Young generation of 3 × 64 MB semi-spaces, as the server process gets (client/src/extension.ts):
      // the evaluation allocates many short-lived objects.
      const w = new Worker(this.script, { workerData: { role: EVALUATOR_ROLE, stopFlag: this.stopFlag }, resourceLimits: { maxYoungGenerationSizeMb: 192 } });
      w.on('message', (reply: EvaluationReply) => this.finish(reply));
      w.on('error', (e) => this.fail(w, `the evaluation worker failed: ${e.stack ?? e.message}`));
      w.on('exit', (code) => {
        if (this.worker === w) this.fail(w, `the evaluation worker stopped (exit code ${code})`);
      });
      w.unref();
      return w;
    } catch (e) {
      this.log(`sublevel: cannot start the evaluation worker, evaluating in the server thread instead: ${String(e)}`);
      this.broken = true;
      return undefined;
    }
  }

  private pump(): void {
    if (this.current || this.queue.length === 0) return;
    this.worker ??= this.start();
    if (!this.worker) {
      for (const job of this.queue.splice(0)) job.resolve(evaluateText(job.text, job.sources));
      return;
    }
    const job = this.queue.shift()!;
    this.current = job;
    const request: EvaluationRequest = { id: job.id, text: job.text, ...(job.sources ? { sources: job.sources } : {}) };
    this.worker.postMessage(request);
    this.timer = setTimeout(() => this.fail(this.worker, `an evaluation took longer than ${this.timeLimitMs / 1000} s and was stopped`), this.timeLimitMs);
  }

  private finish(reply: EvaluationReply): void {
    const job = this.current;
    if (!job || job.id !== reply.id) return;
    clearTimeout(this.timer);
    clearTimeout(this.abandonTimer);
    this.current = undefined;
    if (!reply.ok) job.reject(new Error(reply.error));
    else if ('packed' in reply) {
      try {
        job.resolve({ result: unpackResult(reply.packed), problems: reply.problems });
      } catch (e) {
        job.reject(new Error(`the evaluation's result could not be unpacked: ${e instanceof Error ? e.message : String(e)}`));
      }
    } else job.resolve(reply.outcome);
    this.pump();
  }

  /** Stops a worker that failed or overran; its job fails, later jobs go to a new worker. */
  private fail(w: Worker | undefined, message: string): void {
    this.stop(w, message, true);
  }

  private stop(w: Worker | undefined, message: string, report: boolean): void {
    if (!w || this.worker !== w) return;
    clearTimeout(this.timer);
    clearTimeout(this.abandonTimer);
    this.worker = undefined;
    void w.terminate();
    if (report) this.log(`sublevel: ${message}`);
    const job = this.current;
    this.current = undefined;
    job?.reject(new Error(message));
    this.pump();
  }
}
