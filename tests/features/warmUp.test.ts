/**
 * The evaluation worker's warm-up (workerEvaluator.ts `warmUp`, service/warmUpSetup.ts) in the
 * built server: it exercises the real paths (its set-up reads without errors and has every kind
 * of item), a real job supersedes it and gets exactly the outcome of an evaluation here, and
 * nothing of it reaches the user: no diagnostics for anything but the open document, no log line.
 * It runs only with the setting `sublevel.evaluation.warmUp` on (off by default).
 */
import { readdirSync, readFileSync } from 'fs';
import path from 'path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PublishDiagnosticsParams } from 'vscode-languageserver-protocol';
import { generateSetup } from '../../bench/generatedSetup';
import { evaluateText } from '../../server/src/service/evaluator';
import { warmUpSetup } from '../../server/src/service/warmUpSetup';
import { WorkerEvaluator } from '../../server/src/service/workerEvaluator';
import { ensureBuilt, SERVER, startClient } from '../protocol/lspClient';

const evaluators: WorkerEvaluator[] = [];
beforeAll(() => ensureBuilt(), 120_000);
afterAll(() => evaluators.forEach((e) => e.dispose()));

async function until(ok: () => boolean, timeoutMs: number): Promise<void> {
  for (const end = Date.now() + timeoutMs; !ok(); ) {
    if (Date.now() > end) throw new Error('timed out');
    await new Promise((r) => setTimeout(r, 25));
  }
}

describe('the warm-up set-up', () => {
  it('reads without errors and has every kind of item the evaluation computes', () => {
    const { result, problems } = evaluateText(warmUpSetup());
    expect(problems.filter((p) => p.severity === 'error')).toEqual([]);
    expect(result!.levels.length).toBeGreaterThanOrEqual(50);
    expect(result!.terms.length).toBe(1);
    expect(result!.beams.length).toBe(16);
    expect(result!.lines.length).toBe(19);
    expect(result!.lines.filter((l) => l.at_fields.some((f) => f.spectrum !== undefined)).length).toBe(1);
    expect(result!.resonances.length).toBe(1);
    expect(result!.fits?.length).toBe(1);
    expect(result!.fieldSources?.length).toBe(7);
    expect(result!.slowers?.length).toBe(1);
    expect(result!.traps?.length).toBe(1);
  });
});

/** The editor's answer with `sublevel.evaluation.warmUp` on (package.json; off by default). */
const WARM_UP_ON = { 'workspace/configuration': (p: unknown) => (p as { items: unknown[] }).items.map(() => ({ evaluation: { warmUp: true } })) };

/** Threads of a process (Linux: /proc): the evaluation worker is one more. */
function threadsOf(pid: number): number {
  return readdirSync(`/proc/${pid}/task`).length;
}

describe('the warm-up in the built server worker', () => {
  it('is superseded by a real job, which gets the same outcome as here from the warmed thread, and logs nothing', async () => {
    const logged: string[] = [];
    const ev = new WorkerEvaluator(SERVER, (m) => logged.push(m));
    evaluators.push(ev);
    ev.warmUp(1000); // more rounds than can run: one is running whenever the job comes
    await until(() => ev.warmUpProgress.done >= 1, 60_000);
    const thread = ev.threadId;
    const text = generateSetup(400);
    const outcome = await ev.evaluate(text);
    expect(ev.warmUpProgress.superseded).toBe(1);
    const done = ev.warmUpProgress.done;
    expect(ev.threadId).toBe(thread);
    expect(JSON.stringify(outcome)).toBe(JSON.stringify(evaluateText(text)));
    // The example files too, after a warm-up: the worker's memos change nothing.
    for (const f of ['lithium-beam', 'fit-rubidium', 'sodium-slower', 'quadrupole-trap', 'rubidium-spectrum']) {
      const example = readFileSync(path.resolve(`examples/${f}.sublevel`), 'utf8');
      expect(JSON.stringify(await ev.evaluate(example))).toBe(JSON.stringify(evaluateText(example)));
    }
    await new Promise((r) => setTimeout(r, 300));
    expect(ev.warmUpProgress).toEqual({ done, superseded: 1 }); // the warm-up ended with the first real job
    expect(logged).toEqual([]);
  }, 120_000);

  it('publishes nothing: the server pushes only the open document, and says nothing in its log', async () => {
    const client = await startClient({ textDocument: { publishDiagnostics: {} }, workspace: { configuration: true } }, WARM_UP_ON);
    const logs: string[] = [];
    const pushedUris = new Set<string>();
    const pushes: PublishDiagnosticsParams[] = [];
    client.connection.onNotification('window/logMessage', (p: { message: string }) => {
      logs.push(p.message);
    });
    client.connection.onNotification('textDocument/publishDiagnostics', (p: PublishDiagnosticsParams) => {
      pushedUris.add(p.uri);
      pushes.push(p);
    });
    try {
      // Let the warm-up run a while before the document opens.
      await new Promise((r) => setTimeout(r, 1500));
      const uri = 'file:///warm/open.sublevel';
      const text = readFileSync(path.resolve('examples/lithium-beam.sublevel'), 'utf8');
      await client.connection.sendNotification('textDocument/didOpen', { textDocument: { uri, languageId: 'sublevel', version: 1, text } });
      const expected = evaluateText(text).problems.length;
      await until(() => pushes.length > 0 && pushes[pushes.length - 1]!.diagnostics.length === expected, 60_000);
      await new Promise((r) => setTimeout(r, 500));
      expect([...pushedUris]).toEqual([uri]);
      expect(logs).toEqual([]);
      expect(client.requests).not.toContain('window/showMessage');
    } finally {
      await client.stop();
    }
  }, 120_000);

  it.skipIf(process.platform !== 'linux')('runs only with sublevel.evaluation.warmUp on: off by default, no worker is started before a document opens', async () => {
    const off = await startClient({ workspace: { configuration: true } });
    const on = await startClient({ workspace: { configuration: true } }, WARM_UP_ON);
    try {
      // Both servers asked for the settings without a document (the warm-up's), then one started its worker.
      await until(() => off.requests.includes('workspace/configuration') && on.requests.includes('workspace/configuration'), 60_000);
      await until(() => threadsOf(on.process.pid!) > threadsOf(off.process.pid!), 60_000);
      await new Promise((r) => setTimeout(r, 1000));
      expect(threadsOf(on.process.pid!)).toBeGreaterThan(threadsOf(off.process.pid!));
    } finally {
      await Promise.all([off.stop(), on.stop()]);
    }
  }, 120_000);
});
