/** The worker-thread side of the worker evaluator: answers `{ id, text, sources }` with the full pipeline's outcome. */
import { parentPort } from 'worker_threads';
import type { SourceSnapshot } from '../model/sources';
import { evaluateText } from './evaluator';

export interface EvaluationRequest {
  id: number;
  text: string;
  /** The document's location and the texts of the files it uses, as the fast analysis read them. */
  sources?: SourceSnapshot;
}

export type EvaluationReply = { id: number; ok: true; outcome: ReturnType<typeof evaluateText> } | { id: number; ok: false; error: string };

export function serveEvaluations(): void {
  parentPort?.on('message', (req: EvaluationRequest) => {
    let reply: EvaluationReply;
    try {
      reply = { id: req.id, ok: true, outcome: evaluateText(req.text, req.sources) };
    } catch (e) {
      reply = { id: req.id, ok: false, error: e instanceof Error ? (e.stack ?? e.message) : String(e) };
    }
    parentPort?.postMessage(reply);
  });
}
