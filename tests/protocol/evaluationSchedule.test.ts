/**
 * The server's evaluation schedule: one evaluation per version after the pause, and every failure
 * (a throw in the timer, a rejected evaluation, a throw in what follows it) ends in the log while
 * the next document is evaluated as usual.
 */
import { describe, expect, it, vi } from 'vitest';
import { evaluationSchedule, type EvaluationScheduleHooks } from '../../server/src/evaluationSchedule';

const sleep = (ms: number): Promise<void> => new Promise((r) => setTimeout(r, ms));

interface Doc {
  uri: string;
  version: number;
  getText(): string;
}

const docOf = (uri: string, version: number, text = ''): Doc => ({ uri, version, getText: () => text });

/** A schedule over one map of open documents, recording what it evaluated, sent and logged. */
function harness(overrides: Partial<EvaluationScheduleHooks<Doc>> = {}) {
  const open = new Map<string, Doc>();
  const evaluated: string[] = [];
  const sent: string[] = [];
  const logged: string[] = [];
  const schedule = evaluationSchedule<Doc>({
    delayMs: 5,
    current: (uri) => open.get(uri),
    evaluate: (d) => (evaluated.push(`${d.uri}@${d.version}`), Promise.resolve()),
    evaluated: (d) => sent.push(`${d.uri}@${d.version}`),
    log: (m) => logged.push(m),
    ...overrides,
  });
  const put = (uri: string, version: number, text = ''): Doc => {
    const d = docOf(uri, version, text);
    open.set(uri, d);
    return d;
  };
  return { open, evaluated, sent, logged, schedule, put };
}

describe('the evaluation schedule', () => {
  it('evaluates only the version still open after the pause, once however often it is asked', async () => {
    const h = harness();
    h.schedule.schedule(h.put('a', 1));
    h.schedule.schedule(h.put('a', 2));
    h.schedule.schedule(h.open.get('a')!);
    h.schedule.schedule(h.open.get('a')!);
    await sleep(40);
    expect(h.evaluated).toEqual(['a@2']);
    expect(h.sent).toEqual(['a@2']);
  });

  it('sends nothing for a version edited while it was evaluated, and nothing after a cancel', async () => {
    let finish: () => void = () => undefined;
    const h = harness({ evaluate: () => new Promise<void>((r) => (finish = r)) });
    h.schedule.schedule(h.put('a', 1));
    await sleep(20);
    h.put('a', 2);
    finish();
    h.schedule.schedule(h.put('b', 1));
    h.schedule.cancel('b');
    await sleep(30);
    expect(h.sent).toEqual([]);
  });

  const failures: [string, Partial<EvaluationScheduleHooks<Doc>>, string][] = [
    ['an evaluation that throws', { evaluate: (d) => (d.uri === 'bad' ? fail('thrown at once') : Promise.resolve()) }, 'thrown at once'],
    ['an evaluation that rejects', { evaluate: (d) => (d.uri === 'bad' ? Promise.reject(new Error('rejected later')) : Promise.resolve()) }, 'rejected later'],
    ['a document lookup that throws', { current: (uri) => (uri === 'bad' ? fail('lookup broke') : docOf(uri, 1)) }, 'lookup broke'],
  ];
  for (const [name, hooks, message] of failures) {
    it(`logs ${name} and evaluates the next document as usual`, async () => {
      const h = harness(hooks);
      h.schedule.schedule(h.put('bad', 1));
      await sleep(30);
      h.schedule.schedule(h.put('good', 1));
      await sleep(30);
      expect(h.logged).toHaveLength(1);
      expect(h.logged[0]).toContain('sublevel: evaluating bad (version 1) failed: Error: ' + message);
      expect(h.sent).toEqual(['good@1']);
    });
  }

  it('does not try a failed version again, but does its next version', async () => {
    let tries = 0;
    const h = harness({ evaluate: () => (tries++, Promise.reject(new Error('always'))) });
    const v1 = h.put('a', 1);
    h.schedule.schedule(v1);
    await sleep(30);
    h.schedule.schedule(v1); // a pull of the same version's diagnostics
    await sleep(30);
    expect([tries, h.logged.length]).toEqual([1, 1]);
    h.schedule.schedule(h.put('a', 2));
    await sleep(30);
    expect([tries, h.logged.length]).toEqual([2, 2]);
  });

  it('takes a version number sent again with another text as a new version after a failure', async () => {
    const tried: string[] = [];
    const h = harness({
      evaluate: (d) => (tried.push(`${d.version}:${d.getText()}`), d.getText() === 'old' ? Promise.reject(new Error('bad text')) : Promise.resolve()),
    });
    h.schedule.schedule(h.put('a', 1, 'old'));
    await sleep(30);
    // Before, the failure at version 1 shut out every text sent as version 1.
    h.schedule.schedule(h.put('a', 1, 'new'));
    await sleep(30);
    expect(tried).toEqual(['1:old', '1:new']);
    expect(h.sent).toEqual(['a@1']);
  });

  it('puts the evaluation off again for a version number sent again with another text while it waits', () => {
    vi.useFakeTimers();
    try {
      const h = harness({ delayMs: 100 });
      h.schedule.schedule(h.put('a', 2, 'first'));
      vi.advanceTimersByTime(60);
      h.schedule.schedule(h.put('a', 2, 'second'));
      // Before, the second text was taken for the waiting version: the evaluation ran 100 ms after the first.
      vi.advanceTimersByTime(90);
      expect(h.evaluated).toEqual([]);
      vi.advanceTimersByTime(10);
      expect(h.evaluated).toEqual(['a@2']);
    } finally {
      vi.useRealTimers();
    }
  });

  it('logs a failure in sending the diagnostics after the evaluation, and goes on', async () => {
    const h = harness({
      evaluated: (d) => {
        if (d.uri === 'bad') throw new Error('send broke');
      },
    });
    h.schedule.schedule(h.put('bad', 1));
    h.schedule.schedule(h.put('good', 1));
    await sleep(30);
    expect(h.logged.map((m) => m.split('\n')[0])).toEqual(['sublevel: evaluating bad (version 1) failed: Error: send broke']);
  });
});

function fail(message: string): never {
  throw new Error(message);
}
