/**
 * The mistakes planted in examples/mistakes.sublevel that must reach the user as errors and
 * warnings (1-based lines, as the Problems view shows them). The same list as the CLI test in
 * tests/cli/examples.test.ts; notes (infos) are not listed.
 */
export interface PlantedProblem {
  line: number;
  column: number;
  code: string;
  severity: 'error' | 'warning';
}

export const PLANTED: readonly PlantedProblem[] = [
  { line: 5, column: 31, code: 'quadrupole-cannot-act', severity: 'warning' },
  { line: 6, column: 23, code: 'term-j-out-of-range', severity: 'error' },
  { line: 7, column: 19, code: 'term-j-parity-of-spin', severity: 'error' },
  { line: 12, column: 17, code: 'unit-wrong-dimension', severity: 'error' },
  { line: 15, column: 1, code: 'syntax-unknown-statement', severity: 'error' },
  { line: 17, column: 20, code: 'name-unknown', severity: 'error' },
  { line: 18, column: 9, code: 'line-parity-unchanged', severity: 'error' },
  { line: 18, column: 9, code: 'line-l-zero-zero', severity: 'warning' },
  { line: 22, column: 13, code: 'source-turns-not-whole', severity: 'error' },
  { line: 24, column: 3, code: 'source-sense-without-spacing', severity: 'warning' },
  { line: 27, column: 19, code: 'term-blank-inside', severity: 'warning' },
];
