/** Problems the field sources report as values (codes listed in physics/issueCodes.ts). */
export interface FieldIssue {
  severity: 'error' | 'warning' | 'info';
  code: string;
  message: string;
  /** Index of the part (in the list given) the issue is about, when it is about one. */
  partIndex?: number;
}

export function issue(severity: FieldIssue['severity'], code: string, message: string, partIndex?: number): FieldIssue {
  return partIndex === undefined ? { severity, code, message } : { severity, code, message, partIndex };
}
