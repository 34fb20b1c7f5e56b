/**
 * The evaluation worker's memory of the document between jobs: the incremental parse and the
 * model builders' memo of the version it last read, so that a job after a small edit parses and
 * models only the segments and blocks the edit touched (the same `parseIncrementally` and
 * `BlockMemo` the editor thread uses; docs/editor.md). The outcome is the one `evaluateText`
 * gives for the same text and sources (a property test checks this, with jobs stopped midway).
 *
 * One version is kept. A job stopped midway leaves no half-updated base: the parse is taken only
 * once it is complete (a stopped parse leaves the previous one untouched), and the memo only once
 * the whole job is complete; a job stopped after its parse keeps the previous memo, whose entries
 * are those of completed builds, keyed by block nodes the new parse reuses or not at all.
 */
import { analyzeParsed, refusedAnalysis, type Analysis } from '../eval/analyze';
import { parseIncrementally, type IncrementalParse } from '../format/incrementalParse';
import type { StopCheck } from '../format/stopCheck';
import { BlockMemo } from '../model/blockMemo';
import { replaySources, type SourceSnapshot } from '../model/sources';
import { outcomeOf, type EvaluationOutcome } from './evaluator';

export class KeptVersionEvaluator {
  private parse: IncrementalParse | undefined;
  private memo: BlockMemo | undefined;

  /** `evaluateText(text, sources, stop)`, reading again only what changed since the last job. */
  evaluate(text: string, sources?: SourceSnapshot, stop?: StopCheck): EvaluationOutcome {
    return outcomeOf(this.analyze(text, sources, stop));
  }

  /**
   * The analysis behind `evaluate`. Its tree and model are shared with the next job, which moves
   * their positions in place when lines come or go above them: read it before the next job.
   */
  analyze(text: string, sources?: SourceSnapshot, stop?: StopCheck): Analysis {
    const refused = refusedAnalysis(text);
    if (refused) return refused;
    // The parse moves the previous one's nodes in place: from here on only the new one is a base.
    this.parse = parseIncrementally(text, this.parse, stop);
    const memo = new BlockMemo(this.memo);
    const analysis = analyzeParsed(this.parse.doc, sources ? replaySources(sources) : undefined, stop, memo);
    this.memo = memo;
    return analysis;
  }
}
