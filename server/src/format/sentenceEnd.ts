/**
 * Every finding reads as a sentence and ends like one, whatever its last word is (a quoted text the
 * user wrote, a unit, a number). Applied where format and model problems are made
 * (`makeProblem`, the model's `ProblemList`) and where the evaluation gathers its own, so a message
 * written without the stop gets it there.
 */

/** The message with a closing full stop, unless it already ends a sentence (". ? !"). */
export function endSentence(message: string): string {
  return /[.?!]$/.test(message) ? message : `${message}.`;
}

/** The message without one closing full stop: for a phrase set inside another sentence or after a colon. */
export function withoutStop(message: string): string {
  return message.replace(/\.$/, '');
}
