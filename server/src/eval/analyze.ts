/**
 * The whole pipeline for one document: parse → model → evaluate. Never throws: an internal
 * failure becomes an `internal-error` problem so that the editor and CLI keep working.
 */
import type { Problem, SetupDocument } from '../format/ast';
import { parseSetup } from '../format/parser';
import { buildModel } from '../model/buildModel';
import type { SetupModel } from '../model/types';
import { evaluate, sortProblems } from './evaluate';

export { sortProblems };
import type { EvaluationResult } from './resultTypes';

export interface Analysis {
  doc: SetupDocument;
  model?: SetupModel;
  result?: EvaluationResult;
  /** Every problem from every stage, in document order. */
  problems: Problem[];
}

export function analyze(text: string): Analysis {
  let doc: SetupDocument;
  try {
    doc = parseSetup(text);
  } catch (e) {
    const empty: SetupDocument = { text, lineStarts: [0], blocks: [], comments: [], problems: [] };
    return { doc: empty, problems: [internalError(e)] };
  }
  try {
    const model = buildModel(doc);
    const { result, problems } = evaluate(model, [...doc.problems, ...model.problems]);
    return { doc, model, result, problems };
  } catch (e) {
    return { doc, problems: sortProblems([...doc.problems, internalError(e)]) };
  }
}

function internalError(e: unknown): Problem {
  const detail = e instanceof Error ? e.message : String(e);
  return {
    code: 'internal-error',
    severity: 'error',
    message: `Sublevel failed on this file (${detail}); please report it with the file attached`,
    range: { start: { line: 0, character: 0 }, end: { line: 0, character: 0 } },
  };
}
