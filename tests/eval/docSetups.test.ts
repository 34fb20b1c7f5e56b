/**
 * The complete setups the docs show a reader (README's short example, the example at the top of the
 * format reference and of the spectra page) are clean: no error and no warning, as a reader copying
 * them would expect.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';

/** The first fenced block after `heading` (or the first of the page) that starts with a `species` line or a comment. */
function firstSetup(page: string, heading?: string): string {
  const text = readFileSync(page, 'utf8');
  const from = heading ? text.indexOf(heading) : 0;
  expect(from, heading).toBeGreaterThanOrEqual(0);
  const m = /```\n((?:#|species)[\s\S]*?)```/.exec(text.slice(from));
  expect(m, page).not.toBeNull();
  return m![1]!;
}

describe('the setups the docs show are clean', () => {
  it.each([
    ['README.md', '## The setup format'],
    ['docs/format.md', undefined],
    ['docs/spectra.md', undefined],
    ['docs/slower.md', undefined],
  ])('%s', (page, heading) => {
    const setup = firstSetup(page, heading);
    // The slower page's coils are not shown: its `sources` line is the one thing left out.
    const text = page.endsWith('slower.md') ? setup.replace(/^\s*sources\s*=.*$/m, '') : setup;
    const findings = analyze(text).problems.filter((p) => p.severity === 'error' || p.severity === 'warning');
    expect(findings.map((p) => `${p.code}: ${p.message}`)).toEqual([]);
  });
});
