/**
 * Every finding the physics layer reports reaches the diagnostics (check, eval, JSON, editor):
 * all severities, each distinct message once however many fields repeat it.
 */
import type { Problem, Range } from '../format/ast';

export interface PhysicsIssue {
  severity: 'error' | 'warning' | 'info';
  code: string;
  message: string;
}

/** A reporter for one block: `report(issues)` adds the ones not yet seen, prefixed with `who`. */
export function forwardIssues(who: string, range: Range, problems: Problem[], skip: readonly string[] = []): (issues: readonly PhysicsIssue[]) => void {
  const seen = new Set<string>();
  return (issues) => {
    for (const i of issues) {
      const key = `${i.code}\u0000${i.message}`;
      if (skip.includes(i.code) || seen.has(key)) continue;
      seen.add(key);
      problems.push({ code: i.code, severity: i.severity, message: `${who}: ${i.message}`, range });
    }
  };
}
