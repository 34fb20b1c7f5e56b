/**
 * The language service after an evaluation fails outside the evaluator: the failure is shown once
 * for its version, and the next version is evaluated as usual.
 */
import { describe, expect, it } from 'vitest';
import { type Evaluator, inProcessEvaluator } from '../../server/src/service/evaluator';
import { LanguageService } from '../../server/src/service/languageService';

function doc(text: string, version: number) {
  return { uri: 'file:///a.sublevel', version, getText: () => text };
}

const report = (detail: string): string => `Sublevel failed on this file (${detail}); please report it with the file attached.`;

describe('a failed evaluation', () => {
  it('does not hold up the next version when reporting the failure threw too, and is reported once', async () => {
    // The first evaluation rejects, and the first log line throws inside the store's own catch.
    const logged: string[] = [];
    let logBroken = true;
    const log = (m: string): void => {
      if (logBroken) {
        logBroken = false;
        throw new Error('log closed');
      }
      logged.push(m);
    };
    const evaluated: string[] = [];
    const inner = inProcessEvaluator();
    const evaluator: Evaluator = {
      evaluate: (text, signal, sources) => {
        evaluated.push(text);
        return evaluated.length === 1 ? Promise.reject(new Error('worker gone')) : inner.evaluate(text, signal, sources);
      },
      dispose: () => undefined,
    };
    const svc = new LanguageService(log, evaluator);
    const v1 = doc('field f = 1 G\n', 1);
    expect((await svc.evaluate(v1)).problems.map((p) => [p.code, p.message])).toEqual([['internal-error', report('log closed')]]);
    // Asked again (a pull of the same version): the same answer, not logged a second time.
    expect((await svc.evaluate(v1)).problems.map((p) => p.code)).toEqual(['internal-error']);
    expect(logged.filter((m) => m.includes('evaluation failed'))).toHaveLength(1);
    // Before, every later version waited on the rejected evaluation and got the old internal-error.
    const v2 = await svc.evaluate(doc('field f = 2 G\n', 2));
    expect(evaluated).toEqual(['field f = 1 G\n', 'field f = 2 G\n']);
    expect(v2.problems).toEqual([]);
    expect(svc.diagnostics(doc('field f = 2 G\n', 2))).toEqual({ items: [], complete: true });
  });

  it('keeps a failure on the version that failed when the snapshot moved on meanwhile', async () => {
    // The server's documents are live: by the time an evaluation fails, the same object may hold a newer version.
    const live = { uri: 'file:///a.sublevel', version: 1, text: 'field f = 1 G\n', getText: () => live.text };
    let rejectFirst: (e: Error) => void = () => undefined;
    const evaluated: string[] = [];
    const inner = inProcessEvaluator();
    const evaluator: Evaluator = {
      evaluate: (text, signal, sources) => {
        evaluated.push(text);
        return evaluated.length === 1 ? new Promise((_, reject) => (rejectFirst = reject)) : inner.evaluate(text, signal, sources);
      },
      dispose: () => undefined,
    };
    let logBroken = true;
    const svc = new LanguageService((): void => {
      if (logBroken) {
        logBroken = false;
        throw new Error('log closed');
      }
    }, evaluator);
    const first = svc.evaluate(live);
    while (evaluated.length === 0) await Promise.resolve(); // the evaluation of version 1 has started
    Object.assign(live, { version: 2, text: 'field f = 2 G\n' });
    rejectFirst(new Error('worker gone'));
    expect((await first).problems.map((p) => p.code)).toEqual(['internal-error']);
    // Before, the failure of version 1 was written onto version 2, which then was never evaluated.
    expect((await svc.evaluate(live)).problems).toEqual([]);
    expect(evaluated).toEqual(['field f = 1 G\n', 'field f = 2 G\n']);
  });

  it('shows a failure the store could not record in the diagnostics of that version only', async () => {
    // A snapshot whose text cannot be read twice (the store's evaluate and its record of the failure), then can.
    let reads = 0;
    const flaky = {
      uri: 'file:///a.sublevel',
      version: 4,
      getText: (): string => {
        reads++;
        if (reads <= 2) throw new Error(`read ${reads} failed`);
        return 'field f = 1 G\n';
      },
    };
    const logged: string[] = [];
    const svc = new LanguageService((m) => logged.push(m));
    expect((await svc.evaluate(flaky)).problems.map((p) => p.message)).toEqual([report('read 1 failed')]);
    // Before, the failure went only to the log: the diagnostics were the fast analysis's, incomplete (so evaluated again).
    const shown = svc.diagnostics(flaky);
    expect(shown.complete).toBe(true);
    expect(shown.items.map((d) => [d.code, d.message])).toEqual([['internal-error', report('read 1 failed')]]);
    expect(logged.map((m) => m.split('\n')[0])).toEqual(['sublevel: evaluation failed on file:///a.sublevel (version 4): Error: read 1 failed']);
    // The next version starts clean, and the kept failure is dropped with it.
    expect(svc.diagnostics(doc('field f = 1 G\n', 5))).toEqual({ items: [], complete: false });
    expect(svc.diagnostics(flaky).complete).toBe(false);
  });

  it('resolves with the failure when the log is gone too', async () => {
    const svc = new LanguageService(() => {
      throw new Error('log closed');
    });
    const broken = { uri: 'file:///b.sublevel', version: 1, getText: (): string => { throw new Error('disk on fire'); } };
    // Before, the throwing log line made the evaluation reject and the diagnostics throw (each logs the failure first).
    expect((await svc.evaluate(broken)).problems.map((p) => p.message)).toEqual([report('disk on fire')]);
    expect(svc.diagnostics(broken).items.map((d) => d.message)).toEqual([report('disk on fire')]);
  });
});
