import type { EngineIssue, IssueSeverity } from './types';

export function issue(severity: IssueSeverity, code: string, message: string): EngineIssue {
  return { severity, code, message };
}

export function hasError(issues: readonly EngineIssue[]): boolean {
  return issues.some((i) => i.severity === 'error');
}
