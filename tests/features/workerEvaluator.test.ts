import { mkdtempSync, writeFileSync } from 'fs';
import { tmpdir } from 'os';
import path from 'path';
import { afterAll, describe, expect, it } from 'vitest';
import { SUPERSEDED } from '../../server/src/service/evaluator';
import { WorkerEvaluator } from '../../server/src/service/workerEvaluator';

/** Tiny worker scripts standing in for the server bundle: one answers, one never does, one dies. */
const dir = mkdtempSync(path.join(tmpdir(), 'sublevel-worker-'));
function script(name: string, body: string): string {
  const file = path.join(dir, name);
  writeFileSync(file, `const { parentPort } = require('worker_threads');\n${body}\n`);
  return file;
}
const echo = script('echo.js', "parentPort.on('message', (m) => parentPort.postMessage({ id: m.id, ok: true, outcome: { problems: [{ code: 'echo', severity: 'info', message: m.text, range: { start: { line: 0, character: 0 }, end: { line: 0, character: 0 } } }] } }));");
const hang = script('hang.js', "parentPort.on('message', () => { for (;;) {} });");
const slow = script(
  'slow.js',
  "parentPort.on('message', (m) => { Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, Number(m.text)); parentPort.postMessage({ id: m.id, ok: true, outcome: { problems: [] } }); });",
);
// Computes until its job's id appears in the shared stop flag (or 5 s pass), then gives up as the real worker does.
const polite = script(
  'polite.js',
  "const { workerData, threadId } = require('worker_threads');\n" +
    "parentPort.on('message', (m) => { const end = Date.now() + Number(m.text); while (Date.now() < end) if (Atomics.load(workerData.stopFlag, 0) === m.id) return parentPort.postMessage({ id: m.id, ok: false, error: 'superseded by a newer version' }); parentPort.postMessage({ id: m.id, ok: true, outcome: { problems: [{ code: 'thread', severity: 'info', message: String(threadId), range: { start: { line: 0, character: 0 }, end: { line: 0, character: 0 } } }] } }); });",
);
// Loops without ever looking at the stop flag on 'loop'; otherwise answers with its thread id.
const stubborn = script(
  'stubborn.js',
  "const { threadId } = require('worker_threads');\n" +
    "parentPort.on('message', (m) => { if (m.text === 'loop') for (;;) {} parentPort.postMessage({ id: m.id, ok: true, outcome: { problems: [{ code: 'thread', severity: 'info', message: String(threadId), range: { start: { line: 0, character: 0 }, end: { line: 0, character: 0 } } }] } }); });",
);
// Computes for the job's text in ms without looking at the stop flag, then looks once: a check point that comes late.
const late = script(
  'late.js',
  "const { workerData, threadId } = require('worker_threads');\n" +
    "parentPort.on('message', (m) => { const end = Date.now() + Number(m.text); while (Date.now() < end) {} if (Atomics.load(workerData.stopFlag, 0) === m.id) return parentPort.postMessage({ id: m.id, ok: false, error: 'superseded by a newer version' }); parentPort.postMessage({ id: m.id, ok: true, outcome: { problems: [{ code: 'thread', severity: 'info', message: String(threadId), range: { start: { line: 0, character: 0 }, end: { line: 0, character: 0 } } }] } }); });",
);
const failing = script('failing.js', "parentPort.on('message', (m) => parentPort.postMessage({ id: m.id, ok: false, error: 'no physics today' }));");

const evaluators: WorkerEvaluator[] = [];
function make(file: string, limitMs = 30_000): { ev: WorkerEvaluator; logged: string[] } {
  const logged: string[] = [];
  const ev = new WorkerEvaluator(file, (m) => logged.push(m), limitMs);
  evaluators.push(ev);
  return { ev, logged };
}
afterAll(() => evaluators.forEach((e) => e.dispose()));

describe('the worker evaluator', () => {
  it('runs jobs in a worker, one after another, each with its own answer', async () => {
    const { ev } = make(echo);
    const [a, b] = await Promise.all([ev.evaluate('first'), ev.evaluate('second')]);
    expect(a.problems[0]!.message).toBe('first');
    expect(b.problems[0]!.message).toBe('second');
  });

  it('stops a job that overruns its time limit and carries on with a fresh worker', async () => {
    const { ev, logged } = make(hang, 300);
    await expect(ev.evaluate('x')).rejects.toThrow('longer than 0.3 s');
    expect(logged.join('\n')).toContain('was stopped');
    await expect(ev.evaluate('y')).rejects.toThrow('longer than 0.3 s'); // a new worker took the job
  });

  it('passes a failed evaluation on as a rejection', async () => {
    const { ev } = make(failing);
    await expect(ev.evaluate('x')).rejects.toThrow('no physics today');
  });

  it('drops a queued job that is no longer wanted', async () => {
    const { ev } = make(slow);
    const first = ev.evaluate('300');
    const abort = new AbortController();
    const second = ev.evaluate('300', abort.signal);
    abort.abort();
    await expect(second).rejects.toThrow(SUPERSEDED);
    await expect(first).resolves.toEqual({ problems: [] });
  });

  it('stops a long job that is no longer wanted, and the next job gets a fresh worker', async () => {
    const { ev, logged } = make(slow);
    const abort = new AbortController();
    const started = Date.now();
    const old = ev.evaluate('5000', abort.signal);
    await new Promise((r) => setTimeout(r, 600));
    abort.abort();
    await expect(old).rejects.toThrow(SUPERSEDED);
    expect(Date.now() - started).toBeLessThan(3000);
    await expect(ev.evaluate('10')).resolves.toEqual({ problems: [] });
    expect(logged).toEqual([]); // giving up on an old version is not worth a log line
  });

  it('stops a job superseded in its first moments too, so the newest version is not held up', async () => {
    const { ev } = make(slow);
    const abort = new AbortController();
    const started = Date.now();
    const old = ev.evaluate('5000', abort.signal);
    await new Promise((r) => setTimeout(r, 50));
    abort.abort();
    const newest = ev.evaluate('10');
    await expect(old).rejects.toThrow(SUPERSEDED);
    await expect(newest).resolves.toEqual({ problems: [] });
    // Up to 1 s of grace after the ask plus a fresh worker's start, far from the old job's 5 s.
    expect(Date.now() - started).toBeLessThan(2500);
  });

  it('asks a superseded job to stop; it gives up at a check point and the same worker takes the next job', async () => {
    const { ev, logged } = make(polite);
    const warmUp = await ev.evaluate('0');
    const thread = ev.threadId;
    expect(warmUp.problems[0]!.message).toBe(String(thread));
    const abort = new AbortController();
    const started = Date.now();
    const old = ev.evaluate('5000', abort.signal);
    await new Promise((r) => setTimeout(r, 600)); // past 0.4 s, when a superseded job used to be stopped with its worker
    abort.abort();
    const next = ev.evaluate('0');
    await expect(old).rejects.toThrow(SUPERSEDED);
    expect((await next).problems[0]!.message).toBe(String(thread)); // answered by the same, warm thread
    expect(ev.threadId).toBe(thread);
    expect(Date.now() - started).toBeLessThan(3000);
    expect(logged).toEqual([]);
  });

  it('still stops a superseded job that never reaches a check point, with its worker', async () => {
    const { ev, logged } = make(stubborn, 60_000);
    const abort = new AbortController();
    const started = Date.now();
    const old = ev.evaluate('loop', abort.signal);
    const thread = ev.threadId;
    expect(thread).toBeDefined();
    await new Promise((r) => setTimeout(r, 600));
    abort.abort();
    const next = ev.evaluate('answer');
    await expect(old).rejects.toThrow(SUPERSEDED);
    // 1 s of grace after the ask, then the worker is stopped: far from the 60 s time limit.
    expect(Date.now() - started).toBeLessThan(3000);
    const answer = await next;
    expect(answer.problems[0]!.message).not.toBe(String(thread)); // a fresh worker answered
    expect(ev.threadId).not.toBe(thread);
    expect(logged).toEqual([]);
  });

  it('runs the warm-up rounds while nothing else is asked, and drops their outcomes', async () => {
    const { ev, logged } = make(polite);
    ev.warmUp(3, '20');
    for (let t = 0; t < 100 && ev.warmUpProgress.done < 3; t++) await new Promise((r) => setTimeout(r, 50));
    expect(ev.warmUpProgress).toEqual({ done: 3, superseded: 0 });
    expect(logged).toEqual([]);
  });

  it('asks a running warm-up round to stop when a real job comes, and ends the warm-up', async () => {
    const { ev, logged } = make(polite);
    ev.warmUp(5, '5000'); // each round computes 5 s unless asked to stop
    await new Promise((r) => setTimeout(r, 300));
    const thread = ev.threadId;
    expect(thread).toBeDefined();
    const started = Date.now();
    const answer = await ev.evaluate('0');
    expect(Date.now() - started).toBeLessThan(2000); // far from the round's 5 s
    expect(answer.problems[0]!.message).toBe(String(thread)); // the same, warmed thread
    expect(ev.warmUpProgress).toEqual({ done: 0, superseded: 1 });
    await new Promise((r) => setTimeout(r, 200));
    expect(ev.warmUpProgress).toEqual({ done: 0, superseded: 1 }); // no round after the real job
    expect(logged).toEqual([]);
  });

  it('never hard-stops a warm-up round: the real job waits for its next check point, past the grace, in the same worker', async () => {
    const { ev, logged } = make(late);
    ev.warmUp(1, '1800'); // its only check point comes 1.8 s after it starts
    await new Promise((r) => setTimeout(r, 200));
    const thread = ev.threadId;
    expect(thread).toBeDefined();
    const answer = await ev.evaluate('0');
    expect(answer.problems[0]!.message).toBe(String(thread)); // a real job would have lost its worker after 1 s
    expect(ev.threadId).toBe(thread);
    expect(ev.warmUpProgress).toEqual({ done: 0, superseded: 1 });
    expect(logged).toEqual([]);
  });

  it('does not warm up once a real job was asked for', async () => {
    const { ev } = make(polite);
    await ev.evaluate('0');
    ev.warmUp(3, '20');
    await new Promise((r) => setTimeout(r, 300));
    expect(ev.warmUpProgress).toEqual({ done: 0, superseded: 0 });
  });

  it('logs a warm-up round that fails, and nothing else of it', async () => {
    const { ev, logged } = make(failing);
    ev.warmUp(1, 'x');
    for (let t = 0; t < 100 && logged.length === 0; t++) await new Promise((r) => setTimeout(r, 20));
    expect(logged).toEqual(["sublevel: the evaluation worker's warm-up failed: no physics today"]);
    expect(ev.warmUpProgress).toEqual({ done: 0, superseded: 0 });
  });

  it('rejects pending jobs when disposed', async () => {
    const { ev } = make(hang, 10_000);
    const job = ev.evaluate('x');
    ev.dispose();
    await expect(job).rejects.toThrow('evaluator stopped');
  });
});
