/**
 * The part of the pipeline a keystroke needs: parse and model, no evaluation. The problems
 * are those of the parser and the model; the evaluation adds its own later (see
 * languageService.ts). Never throws: a failure becomes an `internal-error` problem, as in
 * `eval/analyze.ts`.
 */
import type { SetupDocument } from '../format/ast';
import { internalError, refusedAnalysis, sortProblems, type Analysis, type AnalyzeOptions } from '../eval/analyze';
import { parseIncrementally, type IncrementalParse } from '../format/incrementalParse';
import { computeLineStarts } from '../format/positions';
import { BlockMemo } from '../model/blockMemo';
import { buildModel } from '../model/buildModel';
import { recordSources } from '../model/sources';

/** `options` as for `analyze`: the document's location and a reader for the files it uses. */
export function analyzeFast(text: string, options?: AnalyzeOptions): Analysis {
  return analyzeFastAfter(text, options).analysis;
}

/** What one version's fast analysis leaves for the next: its parse in segments and its model's blocks. */
export interface FastState {
  parse: IncrementalParse;
  memo: BlockMemo;
}

/**
 * The same, reusing what the analysis of an earlier version of the document (`previous`) made of
 * the lines and blocks an edit did not touch; gives what to pass on to the next version.
 */
export function analyzeFastAfter(text: string, options?: AnalyzeOptions, previous?: FastState): { analysis: Analysis; state?: FastState } {
  const refused = refusedAnalysis(text);
  if (refused) return { analysis: refused };
  let parse: IncrementalParse;
  try {
    parse = parseIncrementally(text, previous?.parse);
  } catch (e) {
    return { analysis: { doc: { text, lineStarts: computeLineStarts(text), blocks: [], uses: [], comments: [], problems: [] }, problems: [internalError(e)] } };
  }
  const doc: SetupDocument = parse.doc;
  const recording = options ? recordSources(options) : undefined;
  const withSources = (a: Analysis): Analysis => (recording ? { ...a, sources: recording.snapshot() } : a);
  const memo = new BlockMemo(previous?.memo);
  const state = { parse, memo };
  try {
    const model = buildModel(doc, recording?.sources, undefined, memo);
    return { analysis: withSources({ doc, model, problems: sortProblems([...doc.problems, ...model.problems]) }), state };
  } catch (e) {
    return { analysis: withSources({ doc, problems: sortProblems([...doc.problems, internalError(e)]) }), state };
  }
}
