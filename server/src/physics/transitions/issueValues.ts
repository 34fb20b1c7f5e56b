import type { IssueSeverity } from '../engine';
import type { TransitionIssue } from './types';

export function issue(severity: IssueSeverity, code: string, message: string): TransitionIssue {
  return { severity, code, message };
}

export function hasError(issues: readonly TransitionIssue[]): boolean {
  return issues.some((i) => i.severity === 'error');
}

/** Engine issues of one level, with the level named in the message. */
export function fromLevel(which: string, issues: readonly TransitionIssue[]): TransitionIssue[] {
  return issues.map((i) => ({ ...i, message: `${which}: ${i.message}` }));
}
