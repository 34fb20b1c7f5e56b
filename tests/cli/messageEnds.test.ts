/**
 * Findings read like sentences: every rule summary of the catalogue ends with a full stop, and so
 * do the evaluation's sentence-style notes met in the bundled examples (the whole-term hyperfine
 * assumption of the lithium example among them).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { ruleCatalogue } from '../../server/src/cli/sarif/ruleCatalogue';

describe('message endings', () => {
  it('ends every rule summary with a full stop', () => {
    expect(ruleCatalogue().filter((r) => !r.summary.endsWith('.')).map((r) => r.id)).toEqual([]);
  });

  it('ends the whole-term hyperfine note with a full stop, like the other notes of the lithium example', () => {
    const problems = analyze(readFileSync('examples/lithium-whole-term.sublevel', 'utf8')).problems;
    const note = problems.find((p) => p.code === 'hyperfine-between-levels-assumed');
    expect(note?.message).toMatch(/would replace it\.$/);
  });
});
