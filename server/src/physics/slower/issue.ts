import type { SlowerIssue } from './types';

/** A slower problem as a value (codes listed in physics/issueCodes.ts). */
export function issue(severity: SlowerIssue['severity'], code: string, message: string): SlowerIssue {
  return { code, severity, message };
}
