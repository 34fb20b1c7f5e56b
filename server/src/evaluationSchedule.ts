/**
 * When the server evaluates a document: after a pause in typing, only the version still open
 * then, and once per version however often its diagnostics are pulled meanwhile. Every path ends
 * in the log when something throws or rejects (in the timer, the evaluation or what follows it),
 * so a failure never goes unhandled and the server keeps serving; the document keeps the
 * diagnostics it last got (the language service adds an `internal-error` to them when the
 * failure is its own), and a version that failed is not tried again (its next edit is). A version
 * is its number and its text: a client may send a number again with another text.
 */

export interface ScheduledDocument {
  readonly uri: string;
  readonly version: number;
  getText(): string;
}

/** One version of a document as the schedule keeps it (the text is the open document's own string, so comparing it is quick). */
interface Version {
  version: number;
  text: string;
}

function same(kept: Version | undefined, doc: ScheduledDocument): boolean {
  return kept !== undefined && kept.version === doc.version && kept.text === doc.getText();
}

export interface EvaluationScheduleHooks<D extends ScheduledDocument> {
  /** Pause after the last schedule before the evaluation starts. */
  delayMs: number;
  /** The open document with this URI now, if any. */
  current(uri: string): D | undefined;
  /** Evaluates it; undefined when there is nothing to evaluate with yet (the service is loading). */
  evaluate(doc: D): Promise<unknown> | undefined;
  /** The evaluation of `doc` is in and it is still the open version: send its diagnostics. */
  evaluated(doc: D): void;
  log(message: string): void;
}

export interface EvaluationSchedule<D extends ScheduledDocument> {
  /** Evaluates this version after the pause (a repeated call for the same version does not put it off). */
  schedule(doc: D): void;
  /** The document closed: nothing more for it. */
  cancel(uri: string): void;
}

function describe(e: unknown): string {
  return e instanceof Error ? (e.stack ?? e.message) : String(e);
}

export function evaluationSchedule<D extends ScheduledDocument>(hooks: EvaluationScheduleHooks<D>): EvaluationSchedule<D> {
  const timers = new Map<string, NodeJS.Timeout>();
  /** Versions waiting for the pause, by document. */
  const pending = new Map<string, Version>();
  /** The version whose evaluation failed, by document: asking again (a pull of its diagnostics) would only fail again. */
  const failedVersion = new Map<string, Version>();

  const failed = (uri: string, kept: Version) => (e: unknown): void => {
    failedVersion.set(uri, kept);
    try {
      hooks.log(`sublevel: evaluating ${uri} (version ${kept.version}) failed: ${describe(e)}`);
    } catch {
      // Nowhere left to say it; the server goes on.
    }
  };

  function start(uri: string, kept: Version): void {
    timers.delete(uri);
    pending.delete(uri);
    const doc = hooks.current(uri);
    if (!doc || !same(kept, doc)) return;
    const running = hooks.evaluate(doc);
    if (!running) return;
    running
      .then(() => {
        const now = hooks.current(uri);
        if (now && same(kept, now)) hooks.evaluated(now);
      })
      .catch(failed(uri, kept));
  }

  return {
    schedule(doc) {
      const { uri } = doc;
      if (same(pending.get(uri), doc) || same(failedVersion.get(uri), doc)) return;
      failedVersion.delete(uri);
      clearTimeout(timers.get(uri));
      const kept: Version = { version: doc.version, text: doc.getText() };
      pending.set(uri, kept);
      timers.set(
        uri,
        setTimeout(() => {
          try {
            start(uri, kept);
          } catch (e) {
            failed(uri, kept)(e);
          }
        }, hooks.delayMs),
      );
    },
    cancel(uri) {
      failedVersion.delete(uri);
      clearTimeout(timers.get(uri));
      timers.delete(uri);
      pending.delete(uri);
    },
  };
}
