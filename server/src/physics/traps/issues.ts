/** A trap problem as a value; codes are listed in physics/issueCodes.ts. */
import type { SublevelFinding, TrapIssue } from './types';

export function issue(severity: TrapIssue['severity'], code: string, message: string, sublevel?: string): TrapIssue {
  return sublevel === undefined ? { severity, code, message } : { severity, code, message, sublevel };
}

/** A per-sublevel finding: no text, the evaluation words it once per trap (eval/trapSublevelFindings.ts). */
export function finding(severity: SublevelFinding['severity'], code: SublevelFinding['code'], sublevel: string, figures: Pick<SublevelFinding, 'majoranaRateHz' | 'depthJ'> = {}): SublevelFinding {
  return { severity, code, sublevel, ...figures };
}
