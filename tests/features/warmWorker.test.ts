/**
 * A superseded job in the built server's worker stops at a check point (format/stopCheck.ts) and
 * the same worker, warm, serves the next job with the same outcome as the evaluation here.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { generateSetup } from '../../bench/generatedSetup';
import { evaluateText, SUPERSEDED } from '../../server/src/service/evaluator';
import { WorkerEvaluator } from '../../server/src/service/workerEvaluator';
import { ensureBuilt, SERVER } from '../protocol/lspClient';

let worker: WorkerEvaluator;
beforeAll(() => {
  ensureBuilt();
  worker = new WorkerEvaluator(SERVER, () => undefined);
}, 120_000);
afterAll(() => worker.dispose());

describe('the evaluation worker stays warm when a job is superseded', () => {
  it('stops the superseded job at a check point and answers the next one from the same thread', async () => {
    const long = generateSetup(6000);
    const small = generateSetup(60);
    await worker.evaluate(small);
    const thread = worker.threadId;
    expect(thread).toBeDefined();
    const abort = new AbortController();
    const old = worker.evaluate(long, abort.signal);
    await new Promise((r) => setTimeout(r, 100));
    abort.abort();
    const next = worker.evaluate(small);
    await expect(old).rejects.toThrow(SUPERSEDED);
    const outcome = await next;
    expect(worker.threadId).toBe(thread);
    expect(JSON.stringify(outcome)).toBe(JSON.stringify(evaluateText(small)));
  }, 60_000);

  it('stops a job asked to stop during its parse at a check point inside the parse; the same thread serves the next job', async () => {
    const huge = generateSetup(20000); // its parse alone is 0.4–0.6 s of CPU in a worker not yet warm for it
    const small = generateSetup(60);
    await worker.evaluate(small);
    const thread = worker.threadId;
    const abort = new AbortController();
    const old = worker.evaluate(huge, abort.signal);
    await new Promise((r) => setTimeout(r, 30)); // the worker is scanning or reading lines now
    const asked = Date.now();
    abort.abort();
    const next = worker.evaluate(small);
    await expect(old).rejects.toThrow(SUPERSEDED);
    const freedAfter = Date.now() - asked;
    const outcome = await next;
    expect(worker.threadId).toBe(thread); // not stopped with its worker after the 1 s grace
    expect(freedAfter).toBeLessThan(1000);
    expect(JSON.stringify(outcome)).toBe(JSON.stringify(evaluateText(small)));
  }, 60_000);
});
