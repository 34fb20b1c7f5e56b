/**
 * Registry of problem codes. Codes are stable ids (quick fixes and tests switch on them):
 * add new ones, never rename. `stage` says which step reports the problem.
 *
 * Division of labour with the model: the parser reports text it has to skip or could not place
 * (unknown statements, keys a block does not take, duplicates, a missing `=`, `:` or `->`). Parts
 * the tree simply leaves out (a block or level without a name, a setting with an empty value, a
 * level without a term, a line without both ends) are reported by the model, which knows what
 * is needed.
 */
import { endSentence } from './sentenceEnd';
import type { Problem, ProblemSeverity, Range } from './ast';

export interface RuleInfo {
  severity: ProblemSeverity;
  summary: string;
  stage: 'syntax' | 'unit' | 'model' | 'physics';
}

export const RULES: Record<string, RuleInfo> = {
  // Syntax: the parser.
  'syntax-unknown-statement': {
    severity: 'error',
    summary: 'A line starts with a word that is not a block word, `level` or a setting.',
    stage: 'syntax',
  },
  'syntax-outside-block': { severity: 'error', summary: 'A setting before the first block.', stage: 'syntax' },
  'syntax-level-outside-species': {
    severity: 'error',
    summary: 'A `level` statement outside a `species` block.',
    stage: 'syntax',
  },
  'syntax-unknown-key': { severity: 'error', summary: 'A setting key the block or level does not take.', stage: 'syntax' },
  'syntax-duplicate-setting': {
    severity: 'warning',
    summary: 'A key set twice in one block or level; the later value is ignored.',
    stage: 'syntax',
  },
  'syntax-missing-equals': { severity: 'error', summary: 'A setting without `=` between key and value.', stage: 'syntax' },
  'syntax-missing-colon': { severity: 'error', summary: 'A level or line without `:` after its name.', stage: 'syntax' },
  'syntax-missing-arrow': { severity: 'error', summary: 'A line without `->` between its two levels.', stage: 'syntax' },
  'syntax-unexpected-text': { severity: 'error', summary: 'Text that does not fit the statement; it is ignored.', stage: 'syntax' },
  'syntax-empty-item': { severity: 'error', summary: 'An empty item in a comma-separated list.', stage: 'syntax' },
  'syntax-bad-number': {
    severity: 'error',
    summary: 'A number that cannot be used (division by zero, out of range).',
    stage: 'syntax',
  },
  'syntax-use-path': {
    severity: 'error',
    summary: 'A `use` statement without a path in double quotes.',
    stage: 'syntax',
  },
  'syntax-internal-error': {
    severity: 'error',
    summary: 'The parser failed; never expected, tested against random input.',
    stage: 'syntax',
  },

  // Characters: the decoder (invalid UTF-8, from the CLI's reader) and the parser (control characters).
  'text-invalid-encoding': {
    severity: 'error',
    summary: 'Bytes that are not valid UTF-8; they are read as U+FFFD and the first one is reported.',
    stage: 'syntax',
  },
  'text-nul-character': {
    severity: 'error',
    summary: 'A NUL character: the file looks binary or damaged. One report per line.',
    stage: 'syntax',
  },
  'text-control-character': {
    severity: 'warning',
    summary: 'A control character other than tab and line breaks (e.g. an escape code). One report per line.',
    stage: 'syntax',
  },
  'text-bidi-control': {
    severity: 'warning',
    summary: 'A bidirectional control character: the line may display in a different order than it is read.',
    stage: 'syntax',
  },

  // Units: the unit reader (called by the model for each value it reads).
  'unit-missing': { severity: 'error', summary: 'A bare number where a quantity with a unit is needed.', stage: 'unit' },
  'unit-unknown': { severity: 'error', summary: 'A unit name Sublevel does not know.', stage: 'unit' },
  'unit-malformed': { severity: 'error', summary: 'A unit that does not follow the unit grammar.', stage: 'unit' },
  'unit-wrong-dimension': { severity: 'error', summary: 'A quantity of the wrong kind, e.g. T where T/m is needed.', stage: 'unit' },
  'unit-not-a-quantity': { severity: 'error', summary: 'A word where a number with a unit is needed.', stage: 'unit' },
};

/** A problem with the rule's default severity, its message ending as a sentence. Unknown codes are reported as errors. */
export function makeProblem(code: string, message: string, range: Range, extra?: Partial<Problem>): Problem {
  return { code, severity: RULES[code]?.severity ?? 'error', message: endSentence(message), range, ...extra };
}
