/** A trap problem as a value; codes are listed in physics/issueCodes.ts. */
import type { FigureTrapIssue, SublevelFinding, TrapFigures, TrapIssue, WordedTrapIssue } from './types';

export function issue(severity: WordedTrapIssue['severity'], code: string, message: string, sublevel?: string): WordedTrapIssue {
  return sublevel === undefined ? { severity, code, message } : { severity, code, message, sublevel };
}

/** A problem with quantities in it: its figures only, worded by the evaluation (eval/trapIssueText.ts). */
export function figureIssue(severity: FigureTrapIssue['severity'], figures: TrapFigures, sublevel?: string): FigureTrapIssue {
  return sublevel === undefined ? { severity, ...figures } : { severity, ...figures, sublevel };
}

/** A per-sublevel finding: no text, the evaluation words it once per trap (eval/trapSublevelFindings.ts). */
export function finding(severity: SublevelFinding['severity'], code: SublevelFinding['code'], sublevel: string, figures: Pick<SublevelFinding, 'majoranaRateHz' | 'depthJ'> = {}): SublevelFinding {
  return { severity, code, sublevel, ...figures };
}

/** True for a problem the evaluation words from its figures. */
export function hasFigures(i: TrapIssue): i is FigureTrapIssue {
  return !('message' in i);
}
