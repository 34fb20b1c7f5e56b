/**
 * The part of the pipeline a keystroke needs: parse and model, no evaluation. The problems
 * are those of the parser and the model; the evaluation adds its own later (see
 * languageService.ts). Never throws: a failure becomes an `internal-error` problem, as in
 * `eval/analyze.ts`.
 */
import type { Problem, SetupDocument } from '../format/ast';
import { sortProblems, type Analysis } from '../eval/analyze';
import { parseSetup } from '../format/parser';
import { computeLineStarts } from '../format/positions';
import { buildModel } from '../model/buildModel';

function internalError(e: unknown): Problem {
  const detail = e instanceof Error ? e.message : String(e);
  const at = { line: 0, character: 0 };
  return {
    code: 'internal-error',
    severity: 'error',
    message: `Sublevel failed on this file (${detail}); please report it with the file attached`,
    range: { start: at, end: at },
  };
}

export function analyzeFast(text: string): Analysis {
  let doc: SetupDocument;
  try {
    doc = parseSetup(text);
  } catch (e) {
    return { doc: { text, lineStarts: computeLineStarts(text), blocks: [], comments: [], problems: [] }, problems: [internalError(e)] };
  }
  try {
    const model = buildModel(doc);
    return { doc, model, problems: sortProblems([...doc.problems, ...model.problems]) };
  } catch (e) {
    return { doc, problems: sortProblems([...doc.problems, internalError(e)]) };
  }
}
