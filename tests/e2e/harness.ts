/**
 * A small test runner with mocha's `describe`/`it` shape, shared by the suite that runs inside
 * the extension host and the UI suite that drives the page. Tests run in the order they were
 * registered and share the editor's state; a failing test does not stop the ones after it.
 * When mocha is installed, `useMocha` hands the same registrations to mocha instead.
 */
export type TestBody = () => Promise<void> | void;

export interface Outcome {
  title: string;
  ok: boolean;
  ms: number;
  error?: string;
}

/** The part of mocha's BDD interface (installed on a context by its `pre-require`) used here. */
export interface MochaBdd {
  describe(title: string, body: () => void): unknown;
  it(title: string, fn: (this: { timeout(ms: number): void }) => Promise<void> | void): unknown;
}

/** A test's deadline: at load 36 on the 2-core machine single in-host tests took up to 40 s, so 60 s was too close. */
const DEFAULT_TIMEOUT_MS = 180_000;

interface Registered {
  title: string;
  body: TestBody;
  timeoutMs: number;
}

const registered: Registered[] = [];
const groupTitles: string[] = [];
let mocha: MochaBdd | undefined;

/** Sends later `describe`/`it` calls to mocha's BDD functions. */
export function useMocha(bdd: MochaBdd): void {
  mocha = bdd;
}

export function describe(title: string, body: () => void): void {
  if (mocha) {
    mocha.describe(title, body);
    return;
  }
  groupTitles.push(title);
  try {
    body();
  } finally {
    groupTitles.pop();
  }
}

export function it(title: string, body: TestBody, timeoutMs = DEFAULT_TIMEOUT_MS): void {
  if (mocha) {
    mocha.it(title, function () {
      this.timeout(timeoutMs);
      return body();
    });
    return;
  }
  registered.push({ title: [...groupTitles, title].join(' › '), body, timeoutMs });
}

export function describeError(e: unknown): string {
  return e instanceof Error ? (e.stack ?? e.message) : String(e);
}

/**
 * Runs every registered test once, reporting each outcome as soon as it is known;
 * `onFailure` runs after a failed test (e.g. to take a screenshot) before the next one starts.
 */
export async function runRegistered(report: (o: Outcome) => void, onFailure?: (o: Outcome, index: number) => Promise<void>): Promise<Outcome[]> {
  const outcomes: Outcome[] = [];
  for (const t of registered) {
    const start = Date.now();
    let timer: NodeJS.Timeout | undefined;
    const deadline = new Promise<never>((_, reject) => {
      timer = setTimeout(() => reject(new Error(`timed out after ${t.timeoutMs} ms`)), t.timeoutMs);
    });
    let outcome: Outcome;
    try {
      await Promise.race([Promise.resolve().then(t.body), deadline]);
      outcome = { title: t.title, ok: true, ms: Date.now() - start };
    } catch (e) {
      outcome = { title: t.title, ok: false, ms: Date.now() - start, error: describeError(e) };
    } finally {
      clearTimeout(timer);
    }
    if (!outcome.ok && onFailure) await onFailure(outcome, outcomes.length + 1).catch(() => undefined);
    report(outcome);
    outcomes.push(outcome);
  }
  return outcomes;
}
