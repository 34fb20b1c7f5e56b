/**
 * Who runs the evaluation (the slow, physics part of the pipeline) for the language service:
 * in this thread (tests, and the fallback) or in a worker thread (the server, so that a long
 * evaluation never holds up a keystroke and a runaway one can be stopped).
 */
import type { Problem } from '../format/ast';
import { analyze, type Analysis } from '../eval/analyze';
import type { EvaluationResult } from '../eval/resultTypes';
import { replaySources, type SourceSnapshot } from '../model/sources';
import type { StopCheck } from '../format/stopCheck';

/** What the full pipeline gives for a text: its result and every problem of every stage. */
export interface EvaluationOutcome {
  result?: EvaluationResult;
  problems: Problem[];
}

export interface Evaluator {
  /**
   * `signal` says the result is no longer wanted (a newer version came); an evaluator may then
   * give up early. `sources` are the document's location and the used files' texts as the fast
   * analysis read them, so that both see the same files.
   */
  evaluate(text: string, signal?: AbortSignal, sources?: SourceSnapshot): Promise<EvaluationOutcome>;
  dispose(): void;
}

/** The rejection of an evaluation given up because a newer version superseded it. */
export const SUPERSEDED = 'superseded by a newer version';

/** `stop`: asked at the evaluation's check points; when it says stop, `EvaluationStopped` is thrown (format/stopCheck.ts). */
export function evaluateText(text: string, sources?: SourceSnapshot, stop?: StopCheck): EvaluationOutcome {
  return outcomeOf(analyze(text, sources ? replaySources(sources) : undefined, stop));
}

/** What an evaluator hands on of an analysis: its result and problems. */
export function outcomeOf(a: Analysis): EvaluationOutcome {
  return { ...(a.result ? { result: a.result } : {}), problems: a.problems };
}

export function inProcessEvaluator(): Evaluator {
  return {
    evaluate: (text, _signal, sources) => new Promise((resolve) => resolve(evaluateText(text, sources))),
    dispose: () => undefined,
  };
}
