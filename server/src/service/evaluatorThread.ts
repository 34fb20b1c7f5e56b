/** The worker-thread side of the worker evaluator: answers `{ id, text, sources }` with the full pipeline's outcome. */
import { parentPort, workerData } from 'worker_threads';
import { EvaluationStopped, stopIfAsked } from '../format/stopCheck';
import type { Problem } from '../format/ast';
import type { SourceSnapshot } from '../model/sources';
import { evaluateText, SUPERSEDED } from './evaluator';
import { KeptVersionEvaluator } from './evaluatorKeptVersion';
import { packResult } from './resultHandOff';
import type { PackedValue } from './packedValue';

export interface EvaluationRequest {
  id: number;
  text: string;
  /** The document's location and the texts of the files it uses, as the fast analysis read them. */
  sources?: SourceSnapshot;
  /** A warm-up round (workerEvaluator.ts): evaluated whole, so the worker keeps no version of the built-in set-up. */
  warmUp?: true;
}

/**
 * `outcome` as it is (a structured clone), or `packed`: the result packed (service/resultHandOff.ts)
 * beside the problems, its typed arrays transferred rather than copied.
 */
export type EvaluationReply =
  | { id: number; ok: true; outcome: ReturnType<typeof evaluateText> }
  | { id: number; ok: true; packed: PackedValue; problems: Problem[] }
  | { id: number; ok: false; error: string };

/**
 * `workerData.stopFlag` (a one-element Int32Array on a SharedArrayBuffer): the editor thread
 * writes the id of a job it no longer wants there. Messages cannot reach a worker that is busy
 * computing, shared memory can; the evaluation reads the flag at its check points, gives up, and
 * this worker stays warm for the next job. The worker keeps the last version it read, so a job
 * after a small edit parses and models only what changed (service/evaluatorKeptVersion.ts).
 */
export function serveEvaluations(): void {
  const flag = (workerData as { stopFlag?: Int32Array } | null)?.stopFlag;
  const kept = new KeptVersionEvaluator();
  parentPort?.on('message', (req: EvaluationRequest) => {
    let reply: EvaluationReply;
    try {
      const stop = flag ? (): boolean => Atomics.load(flag, 0) === req.id : undefined;
      const outcome = req.warmUp ? evaluateText(req.text, req.sources, stop) : kept.evaluate(req.text, req.sources, stop);
      // Packing the 20,000-line file's result takes 0.4 s: not for a job no longer wanted.
      stopIfAsked(stop);
      const packed = outcome.result ? packResult(outcome.result) : undefined;
      reply = packed ? { id: req.id, ok: true, packed, problems: outcome.problems } : { id: req.id, ok: true, outcome };
    } catch (e) {
      const error = e instanceof EvaluationStopped ? SUPERSEDED : e instanceof Error ? (e.stack ?? e.message) : String(e);
      reply = { id: req.id, ok: false, error };
    }
    parentPort?.postMessage(reply, 'packed' in reply ? [reply.packed.ops.buffer as ArrayBuffer, reply.packed.numbers.buffer as ArrayBuffer] : []);
  });
}
