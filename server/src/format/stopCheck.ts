/**
 * Cooperative stopping: the caller may pass a check that says the work is no longer wanted; the
 * parser, the model builder and the evaluation ask it between their pieces of work (runs of lines,
 * blocks, levels, beams, lines) and then give up by throwing `EvaluationStopped`. It lives in the
 * lowest layer that asks it. No editor or thread imports here: the check is a plain function.
 */

/** True once the work should give up. Called often: keep it cheap. */
export type StopCheck = () => boolean;

/** Thrown at a check point when the stop check says so; not an internal error. */
export class EvaluationStopped extends Error {
  constructor() {
    super('evaluation stopped: no longer wanted');
    this.name = 'EvaluationStopped';
  }
}

/** Throws `EvaluationStopped` when a check is given and says stop. */
export function stopIfAsked(stop: StopCheck | undefined): void {
  if (stop?.()) throw new EvaluationStopped();
}

/**
 * Lines scanned or read between two asks in the parser: a few milliseconds of parsing (20,000
 * lines take 0.4–0.6 s cold), so one `Atomics.load` in the worker costs nothing measurable.
 */
export const LINES_PER_STOP_CHECK = 512;

/** Blocks built between two asks in the model builder (a species block builds its levels: ≈ 10 µs–0.1 ms each). */
export const BLOCKS_PER_STOP_CHECK = 64;

/**
 * For loops over many small items (lines, blocks): asks the check at every `every`-th item only,
 * `index` being the item's position in the loop. `every` must be a power of two.
 */
export function stopEvery(stop: StopCheck | undefined, index: number, every: number): void {
  if (stop !== undefined && (index & (every - 1)) === 0 && stop()) throw new EvaluationStopped();
}
