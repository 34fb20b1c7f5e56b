/**
 * Runs evaluations in a worker thread, one at a time. A job that takes longer than the time
 * limit stops the worker (its job fails); the next job starts a fresh one. A job that is no
 * longer wanted is dropped from the queue, or, when it is running, asked to stop through a
 * shared flag (the evaluation gives up at its next check point and the worker, warm, takes the
 * next job). A running job that has not stopped STOP_GRACE_MS after the ask is stopped with
 * its worker, so nothing can hold up the new version. A worker that cannot start makes the evaluator fall back to this thread.
 * `warmUp` gives a fresh worker a built-in set-up to evaluate while it has nothing else to do, so
 * that the first real job finds the engine's code compiled; any real job supersedes it.
 */
import { Worker } from 'worker_threads';
import { EVALUATION_TIME_LIMIT_MS } from '../model/limits';
import type { SourceSnapshot } from '../model/sources';
import { type EvaluationOutcome, type Evaluator, evaluateText, SUPERSEDED } from './evaluator';
import type { EvaluationReply, EvaluationRequest } from './evaluatorThread';
import { unpackResult } from './resultHandOff';
import { warmUpSetup } from './warmUpSetup';

/** `workerData.role` that tells a bundle started as a worker to serve evaluations. */
export const EVALUATOR_ROLE = 'sublevel-evaluator';

/**
 * How long a superseded job gets to reach a check point after it was asked to stop; past this the
 * worker is stopped. Check points come every 512 lines of the parse, every 64 blocks of the model,
 * before every level, beam and line, and before packing (format/stopCheck.ts); the longest stretch
 * between two is a cold beam (≈ 0.3 s of CPU), and a cold worker costs ~4 s of CPU more than a warm one.
 */
const STOP_GRACE_MS = 1000;

/**
 * Times the warm-up set-up is evaluated (each a job of its own, so a real job waits for one check
 * point at most): the engine optimises a function after many calls, and the beams, the slowest
 * code to warm, keep gaining for a few dozen evaluations. The 20,000-line file in one process at
 * load 10–13 (evaluation, packing and unpacking, CPU): 4.3–4.4 s cold; after 1, 2 and 3 rounds
 * 3.7–3.8, 3.3–3.5 and 3.4–3.5 s, the rounds costing 1.4–1.5, 2.1–2.2 and 2.3–2.4 s together.
 */
export const WARM_UP_ROUNDS = 4;

interface Job {
  id: number;
  text: string;
  sources?: SourceSnapshot;
  resolve: (o: EvaluationOutcome) => void;
  reject: (e: Error) => void;
  /** A round of the warm-up: its outcome goes nowhere, and a real job supersedes it. */
  warmUp?: true;
}

/** What the warm-up did so far (for tests and benches). */
export interface WarmUpCounts {
  /** Rounds evaluated to the end. */
  done: number;
  /** Rounds given up because a real job came. */
  superseded: number;
}

export class WorkerEvaluator implements Evaluator {
  private worker: Worker | undefined;
  private readonly queue: Job[] = [];
  private current: Job | undefined;
  private timer: NodeJS.Timeout | undefined;
  private abandonTimer: NodeJS.Timeout | undefined;
  private nextId = 1;
  private broken = false;
  /** Warm-up rounds still to run while the worker has nothing else to do. */
  private warmUpLeft = 0;
  private warmUpText = '';
  private realJobSeen = false;
  private readonly warmUpCounts: WarmUpCounts = { done: 0, superseded: 0 };
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
    // Real work warms the worker from now on.
    this.warmUpLeft = 0;
    this.realJobSeen = true;
    return new Promise((resolve, reject) => {
      const job: Job = { id: this.nextId++, text, ...(sources ? { sources } : {}), resolve, reject };
      signal?.addEventListener('abort', () => this.supersede(job), { once: true });
      this.queue.push(job);
      this.pump();
    });
  }

  /**
   * Starts the worker now and has it evaluate `text` (the built-in set-up) `rounds` times while no
   * real job is waiting. Nothing of it reaches the caller: its results are dropped, and only a
   * failure of the worker itself is logged. A real job asks the running round to stop at its next
   * check point (the same shared flag as a superseded job) and ends the warm-up. Does nothing once
   * a real job was asked for.
   */
  warmUp(rounds = WARM_UP_ROUNDS, text = warmUpSetup()): void {
    // After a real job the worker is warm, or warms on real work: nothing to add.
    if (this.broken || this.realJobSeen) return;
    this.warmUpLeft = rounds;
    this.warmUpText = text;
    this.pump();
  }

  /** Rounds of the warm-up done and given up so far. */
  get warmUpProgress(): WarmUpCounts {
    return { ...this.warmUpCounts };
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
    // Not for the warm-up: its set-up is small and always reaches a check point soon, and a fresh
    // worker would cost the real job far more than that wait.
    if (job.warmUp) return;
    clearTimeout(this.abandonTimer);
    this.abandonTimer = setTimeout(() => {
      if (this.current === job) this.stop(this.worker, SUPERSEDED, false);
    }, STOP_GRACE_MS);
  }

  /** A warm-up round as a job: its outcome is dropped (an evaluation error is logged in `finish`, a stopped worker in `stop`). */
  private warmUpJob(): Job {
    return {
      id: this.nextId++,
      text: this.warmUpText,
      warmUp: true,
      resolve: () => this.warmUpCounts.done++,
      reject: (e) => {
        if (e.message === SUPERSEDED) this.warmUpCounts.superseded++;
      },
    };
  }

  dispose(): void {
    this.warmUpLeft = 0;
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
    if (this.current) {
      // A real job waits behind a warm-up round: the round gives up at its next check point.
      if (this.current.warmUp && this.queue.length > 0) this.supersede(this.current);
      return;
    }
    if (this.queue.length === 0 && this.warmUpLeft > 0) {
      this.warmUpLeft--;
      this.queue.push(this.warmUpJob());
    }
    if (this.queue.length === 0) return;
    this.worker ??= this.start();
    if (!this.worker) {
      for (const job of this.queue.splice(0)) if (!job.warmUp) job.resolve(evaluateText(job.text, job.sources));
      return;
    }
    const job = this.queue.shift()!;
    this.current = job;
    const request: EvaluationRequest = { id: job.id, text: job.text, ...(job.sources ? { sources: job.sources } : {}), ...(job.warmUp ? { warmUp: true as const } : {}) };
    this.worker.postMessage(request);
    this.timer = setTimeout(() => this.fail(this.worker, `an evaluation took longer than ${this.timeLimitMs / 1000} s and was stopped`), this.timeLimitMs);
  }

  private finish(reply: EvaluationReply): void {
    const job = this.current;
    if (!job || job.id !== reply.id) return;
    clearTimeout(this.timer);
    clearTimeout(this.abandonTimer);
    this.current = undefined;
    if (!reply.ok) {
      // The warm-up set-up is built in: an error there is a defect, said in the server's log.
      if (job.warmUp && reply.error !== SUPERSEDED) this.log(`sublevel: the evaluation worker's warm-up failed: ${reply.error}`);
      job.reject(new Error(reply.error));
    } else if ('packed' in reply) {
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
