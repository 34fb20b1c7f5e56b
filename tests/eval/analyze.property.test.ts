import fc from 'fast-check';
import { readFileSync } from 'fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';

const RUNS = Number(process.env.FUZZ_RUNS ?? 200);
const seeds = ['lithium-beam', 'rubidium-bias', 'handmade-species', 'mistakes'].map((f) => readFileSync(`examples/${f}.sublevel`, 'utf8'));

/** Mutations that a typing user makes: insert, delete, duplicate or swap pieces. */
const mutated = fc
  .tuple(fc.constantFrom(...seeds), fc.array(fc.tuple(fc.nat(), fc.nat(12), fc.string({ maxLength: 6 }), fc.nat(3)), { maxLength: 8 }))
  .map(([seed, edits]) => {
    let t = seed;
    for (const [pos, len, ins, kind] of edits) {
      const p = pos % (t.length + 1);
      if (kind === 0) t = t.slice(0, p) + ins + t.slice(p);
      else if (kind === 1) t = t.slice(0, p) + t.slice(p + len);
      else if (kind === 2) t = t.slice(0, p) + t.slice(p, p + len) + t.slice(p);
      else t = t.slice(0, p) + ins.replace(/./g, (c) => String.fromCharCode((c.charCodeAt(0) * 7) % 0x3000)) + t.slice(p + len);
    }
    return t;
  });

describe('the whole pipeline never throws', () => {
  it('on mutated example files', () => {
    fc.assert(
      fc.property(mutated, (text) => {
        const a = analyze(text);
        expect(a.problems.filter((p) => p.code === 'internal-error')).toEqual([]);
        for (const p of a.problems) {
          expect(p.range.start.line).toBeGreaterThanOrEqual(0);
          expect(p.message.length).toBeGreaterThan(0);
        }
      }),
      { numRuns: RUNS },
    );
  });

  it('on arbitrary unicode text', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 400 }), (text) => {
        expect(analyze(text).problems.filter((p) => p.code === 'internal-error')).toEqual([]);
      }),
      { numRuns: RUNS },
    );
  });
});
