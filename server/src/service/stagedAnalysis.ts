/**
 * The same pipeline as `eval/analyze.ts`, but with the evaluation deferred until a feature
 * reads `analysis.result`. Diagnostics need only the parse and the model, so a keystroke in a
 * long file never waits for the physics; hovers and inlay hints pay for it once per version.
 * A test (tests/features/stagedAnalysis.test.ts) keeps this equal to `analyze`.
 */
import type { Problem, SetupDocument } from '../format/ast';
import { analyze, sortProblems, type Analysis } from '../eval/analyze';
import { evaluate } from '../eval/evaluate';
import type { EvaluationResult } from '../eval/resultTypes';
import { parseSetup } from '../format/parser';
import { buildModel } from '../model/buildModel';
import type { SetupModel } from '../model/types';

export type ErrorLog = (message: string) => void;

export function analyzeStaged(text: string, log: ErrorLog = () => undefined): Analysis {
  let doc: SetupDocument;
  let model: SetupModel;
  try {
    doc = parseSetup(text);
    model = buildModel(doc);
  } catch {
    // Rare by design: let the full pipeline turn the failure into its `internal-error` problem.
    return analyze(text);
  }
  const problems: Problem[] = sortProblems([...doc.problems, ...model.problems]);
  let evaluated = false;
  let result: EvaluationResult | undefined;
  const analysis: Analysis = { doc, model, problems };
  Object.defineProperty(analysis, 'result', {
    enumerable: true,
    get(): EvaluationResult | undefined {
      if (!evaluated) {
        evaluated = true;
        try {
          result = evaluate(model, problems).result;
        } catch (e) {
          log(`sublevel: evaluation failed: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}`);
        }
      }
      return result;
    },
  });
  return analysis;
}
