import { readdirSync, readFileSync } from 'fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { analyzeStaged } from '../../server/src/service/stagedAnalysis';

describe('the staged analysis the server uses', () => {
  const files = readdirSync('examples').filter((f) => f.endsWith('.sublevel'));

  it('has example files to compare', () => expect(files.length).toBeGreaterThanOrEqual(4));

  for (const f of files) {
    it(`equals the full pipeline on ${f}`, () => {
      const text = readFileSync(`examples/${f}`, 'utf8');
      const full = analyze(text);
      const lazy = analyzeStaged(text);
      expect(lazy.problems).toEqual(full.problems);
      expect(JSON.stringify(lazy.result)).toBe(JSON.stringify(full.result));
    });
  }

  it('evaluates only when the result is read, and only once', () => {
    const a = analyzeStaged('species Na23\n  level g: 3s 2S1/2\n');
    const first = a.result;
    expect(first?.levels[0]?.level).toBe('g');
    expect(a.result).toBe(first);
  });
});
