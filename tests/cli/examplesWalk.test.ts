/**
 * Every bundled example, listed from the folder (so a new one is covered at once), as a new user
 * meets it: its opening comment says what it shows and that its numbers are invented; `check` finds
 * no error (but in the file of planted mistakes) and `eval` prints no NaN, Infinity or undefined.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { cli } from './runCli';

const EXAMPLES = readdirSync('examples').filter((f) => f.endsWith('.sublevel')).sort();

describe('the bundled examples, walked as a new user would', () => {
  it('there are examples to walk', () => {
    expect(EXAMPLES.length).toBeGreaterThanOrEqual(12);
  });

  it.each(EXAMPLES)('%s', (file) => {
    const path = `examples/${file}`;
    const lines = readFileSync(path, 'utf8').split('\n');
    const opening = lines.slice(0, lines.findIndex((l) => !l.startsWith('#')));
    expect(opening.length, 'an opening comment of two lines or more').toBeGreaterThanOrEqual(2);
    expect(opening.join(' '), 'says which numbers are invented').toMatch(/invented/i);
    const check = cli('check', path);
    const errors = check.out.split('\n').filter((l) => / error /.test(l));
    if (file === 'mistakes.sublevel') expect(errors.length).toBeGreaterThan(0);
    else expect(errors).toEqual([]);
    const report = cli('eval', path).out;
    expect(report).toMatch(/^Sublevel evaluation of /);
    expect(report).not.toMatch(/NaN|Infinity|undefined/);
  });
});
