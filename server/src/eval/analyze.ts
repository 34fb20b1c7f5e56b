/**
 * The whole pipeline for one document: parse → model → evaluate. Never throws: an internal
 * failure becomes an `internal-error` problem so that the editor and CLI keep working.
 */
import type { Problem, SetupDocument } from '../format/ast';
import { parseSetup } from '../format/parser';
import type { BlockMemo } from '../model/blockMemo';
import { buildModel } from '../model/buildModel';
import { recordSources, type SetupSources, type SourceSnapshot } from '../model/sources';
import type { SetupModel } from '../model/types';
import { evaluate, sortProblems } from './evaluate';
import { overCap, unparsedDocument } from './inputLimits';
import { EvaluationStopped, stopIfAsked, type StopCheck } from '../format/stopCheck';

export { sortProblems };
import type { EvaluationResult } from './resultTypes';

/**
 * Where the text lives and how to read the files its `use` statements name (see
 * model/sources.ts). Without it, `use` statements cannot be followed and say so.
 */
export type AnalyzeOptions = SetupSources;

export interface Analysis {
  doc: SetupDocument;
  model?: SetupModel;
  result?: EvaluationResult;
  /** Every problem from every stage, in document order. */
  problems: Problem[];
  /** The document's location and every file read for its `use` statements, when a reader was given. */
  sources?: SourceSnapshot;
  /** Set when the text is over a cap (model/limits.ts) and was not analysed: `problems` says why. */
  refused?: true;
}

/** The analysis of a text over a document cap, or undefined when it is within them. */
export function refusedAnalysis(text: string): Analysis | undefined {
  const p = overCap(text);
  return p ? { doc: unparsedDocument(text), problems: [p], refused: true } : undefined;
}

/**
 * `stop`: see `evaluate`; it is also asked inside the parse and the model building (every few
 * hundred lines or few dozen blocks) and after each, and `EvaluationStopped` is passed on, not reported.
 */
export function analyze(text: string, options?: AnalyzeOptions, stop?: StopCheck): Analysis {
  const refused = refusedAnalysis(text);
  if (refused) return refused;
  let doc: SetupDocument;
  try {
    doc = parseSetup(text, stop);
  } catch (e) {
    if (e instanceof EvaluationStopped) throw e;
    return { doc: unparsedDocument(text), problems: [internalError(e)] };
  }
  stopIfAsked(stop);
  return analyzeParsed(doc, options, stop);
}

/**
 * `analyze` for a text already parsed (`doc`, as `parseSetup` gives it; the caller has checked
 * the caps with `refusedAnalysis`): the model and the evaluation, with the same outcome. `memo`:
 * the model builders' memo, when the caller keeps one from an earlier version (model/blockMemo.ts).
 */
export function analyzeParsed(doc: SetupDocument, options?: AnalyzeOptions, stop?: StopCheck, memo?: BlockMemo): Analysis {
  const recording = options ? recordSources(options) : undefined;
  const withSources = <T extends object>(a: T): T & { sources?: SourceSnapshot } => (recording ? { ...a, sources: recording.snapshot() } : a);
  try {
    const model = buildModel(doc, recording?.sources, undefined, memo, stop);
    stopIfAsked(stop);
    const { result, problems } = evaluate(model, [...doc.problems, ...model.problems], stop);
    return withSources({ doc, model, result, problems });
  } catch (e) {
    if (e instanceof EvaluationStopped) throw e;
    return withSources({ doc, problems: sortProblems([...doc.problems, internalError(e)]) });
  }
}

/** The one wording of a failure inside Sublevel (also the fast analysis's, service/fastAnalysis.ts). */
export function internalError(e: unknown): Problem {
  const detail = e instanceof Error ? e.message : String(e);
  return {
    code: 'internal-error',
    severity: 'error',
    message: `Sublevel failed on this file (${detail}); please report it with the file attached.`,
    range: { start: { line: 0, character: 0 }, end: { line: 0, character: 0 } },
  };
}
