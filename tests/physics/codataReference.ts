/**
 * Reads tests/reference/codata.json (written by scripts/reference/codata.py from
 * scipy.constants, SciPy 1.17 = CODATA 2022) for tests that compare derived numbers with
 * CODATA values that constants.ts does not store.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';

export interface CodataEntry {
  key: string;
  value: number;
  unit: string;
  uncertainty: number;
}

export const codataReference = JSON.parse(readFileSync(join(__dirname, '..', 'reference', 'codata.json'), 'utf8')) as {
  scipy_version: string;
  constants: Record<string, CodataEntry>;
  extra: Record<string, CodataEntry>;
};
