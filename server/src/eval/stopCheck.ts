/**
 * Cooperative stopping: the caller may pass a check that says the evaluation is no longer
 * wanted; the evaluation asks it between its pieces of work (stages, levels, beams, lines) and
 * then gives up by throwing `EvaluationStopped`. No editor or thread imports here: the check is
 * a plain function.
 */

/** True once the evaluation should give up. Called often: keep it cheap. */
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
