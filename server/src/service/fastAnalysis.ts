/**
 * The part of the pipeline a keystroke needs: parse and model, no evaluation. The problems
 * are those of the parser and the model; the evaluation adds its own later (see
 * languageService.ts). Never throws: a failure becomes an `internal-error` problem, as in
 * `eval/analyze.ts`.
 */
import type { Problem, SetupDocument } from '../format/ast';
import { refusedAnalysis, sortProblems, type Analysis, type AnalyzeOptions } from '../eval/analyze';
import { parseSetup } from '../format/parser';
import { computeLineStarts } from '../format/positions';
import { buildModel } from '../model/buildModel';
import { recordSources } from '../model/sources';

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

/** `options` as for `analyze`: the document's location and a reader for the files it uses. */
export function analyzeFast(text: string, options?: AnalyzeOptions): Analysis {
  const refused = refusedAnalysis(text);
  if (refused) return refused;
  let doc: SetupDocument;
  try {
    doc = parseSetup(text);
  } catch (e) {
    return { doc: { text, lineStarts: computeLineStarts(text), blocks: [], uses: [], comments: [], problems: [] }, problems: [internalError(e)] };
  }
  const recording = options ? recordSources(options) : undefined;
  const withSources = (a: Analysis): Analysis => (recording ? { ...a, sources: recording.snapshot() } : a);
  try {
    const model = buildModel(doc, recording?.sources);
    return withSources({ doc, model, problems: sortProblems([...doc.problems, ...model.problems]) });
  } catch (e) {
    return withSources({ doc, problems: sortProblems([...doc.problems, internalError(e)]) });
  }
}
