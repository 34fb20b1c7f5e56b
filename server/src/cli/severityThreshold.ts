/**
 * `--fail-on error|warning|info` and `--quiet`: which findings fail the run (exit 1) and, with
 * --quiet, which are printed. The default, error, is the exit rule the commands always had.
 */
import type { ProblemSeverity } from '../format/ast';
import { type ParsedArgs, stringOption } from './args';

export const FAIL_ON_LEVELS = ['error', 'warning', 'info'] as const;
export type FailOn = (typeof FAIL_ON_LEVELS)[number];

const RANK: Readonly<Record<ProblemSeverity, number>> = { error: 3, warning: 2, info: 1, hint: 0 };

export const FAIL_ON_OPTION = {
  'fail-on': { value: 'LEVEL', choices: FAIL_ON_LEVELS, help: 'exit 1 when a finding of this severity or worse is found (default: error)' },
} as const;

export const QUIET_OPTION = {
  quiet: { help: 'print only the findings at or above the --fail-on severity, and no summary line' },
} as const;

export function failOnOption(args: ParsedArgs): FailOn {
  return (stringOption(args, 'fail-on', FAIL_ON_LEVELS) as FailOn | undefined) ?? 'error';
}

export function atOrAbove(severity: ProblemSeverity, threshold: FailOn): boolean {
  return RANK[severity] >= RANK[threshold];
}
