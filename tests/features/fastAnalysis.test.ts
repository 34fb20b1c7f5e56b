import { readdirSync, readFileSync } from 'fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { RULES } from '../../server/src/format/codes';
import { MODEL_RULES } from '../../server/src/model/modelCodes';
import { analyzeFast } from '../../server/src/service/fastAnalysis';

/** Codes the parser and the model raise (term and configuration codes come from the physics parsers via the model). */
function isParseOrModelCode(code: string): boolean {
  return code in RULES || code in MODEL_RULES || /^(term|level|config|configuration)-/.test(code);
}

describe('the fast analysis a keystroke pays for', () => {
  const files = readdirSync('examples').filter((f) => f.endsWith('.sublevel'));

  it('has example files to compare', () => expect(files.length).toBeGreaterThanOrEqual(4));

  for (const f of files) {
    it(`has the full pipeline's problems less the evaluation's on ${f}`, () => {
      const text = readFileSync(`examples/${f}`, 'utf8');
      const full = analyze(text);
      const fast = analyzeFast(text);
      expect(fast.result).toBeUndefined();
      const key = (p: { code: string; message: string }): string => `${p.code}|${p.message}`;
      const fastKeys = fast.problems.map(key);
      // Every fast problem is in the full list, in the same order.
      expect(full.problems.map(key).filter((k) => fastKeys.includes(k))).toEqual(fastKeys);
      // What only the full pipeline reports comes from the evaluation.
      for (const p of full.problems.filter((x) => !fastKeys.includes(key(x)))) expect(isParseOrModelCode(p.code), p.code).toBe(false);
    });
  }
});
