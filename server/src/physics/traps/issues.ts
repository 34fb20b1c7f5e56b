/** A trap problem as a value; codes are listed in physics/issueCodes.ts. */
import type { TrapIssue } from './types';

export function issue(severity: TrapIssue['severity'], code: string, message: string, sublevel?: string): TrapIssue {
  return sublevel === undefined ? { severity, code, message } : { severity, code, message, sublevel };
}
