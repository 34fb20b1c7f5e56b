/** Problems about a file as the CLI prints them: `file:line:col severity code message`, one line each. */
import type { Problem, Range } from '../format/ast';
import { CLI_RULES, type CliCode } from './cliCodes';

const START: Range = { start: { line: 0, character: 0 }, end: { line: 0, character: 0 } };

export function cliProblem(code: CliCode, message: string, range: Range = START): Problem {
  return { code, severity: CLI_RULES[code].severity, message, range };
}

export function diagnosticLine(file: string, p: Problem): string {
  return `${file}:${p.range.start.line + 1}:${p.range.start.character + 1} ${p.severity} ${p.code} ${p.message}`;
}

/**
 * A file the command cannot work on (unreadable, or without what the command needs): exit 1
 * with the problems as file:line:col lines, not a usage error.
 */
export class FileProblemError extends Error {
  constructor(
    readonly file: string,
    readonly problems: Problem[],
  ) {
    super(problems.map((p) => p.message).join('; '));
  }
}
