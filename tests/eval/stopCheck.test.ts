/**
 * Cooperative stopping (format/stopCheck.ts): the parser, the model builder and the evaluation ask
 * the stop check between their pieces of work and give up with `EvaluationStopped`; a check that
 * never says stop changes nothing.
 */
import { readFileSync } from 'fs';
import path from 'path';
import { describe, expect, it } from 'vitest';
import { generateSetup } from '../../bench/generatedSetup';
import { BLOCKS_PER_STOP_CHECK, EvaluationStopped, LINES_PER_STOP_CHECK } from '../../server/src/format/stopCheck';
import { parseSetup } from '../../server/src/format/parser';
import { buildModel } from '../../server/src/model/buildModel';
import { analyze } from '../../server/src/eval/analyze';
import { evaluateText } from '../../server/src/service/evaluator';

const text = generateSetup(400);
const example = readFileSync(path.resolve('examples/lithium-beam.sublevel'), 'utf8');

describe('stopping an evaluation at its check points', () => {
  it('gives the same outcome, to the last bit, when the check never says stop', () => {
    for (const t of [text, example]) {
      let asked = 0;
      const withCheck = evaluateText(t, undefined, () => (asked++, false));
      expect(JSON.stringify(withCheck)).toBe(JSON.stringify(evaluateText(t)));
      expect(asked).toBeGreaterThan(0);
    }
  });

  it('asks at least once per level, beam and line, besides the stages', () => {
    const a = analyze(text);
    const items = a.model!.species.reduce((n, s) => n + s.levels.length, 0) + a.model!.beams.length + a.model!.lines.length;
    let asked = 0;
    evaluateText(text, undefined, () => (asked++, false));
    expect(items).toBeGreaterThan(10);
    expect(asked).toBeGreaterThanOrEqual(items + 2);
  });

  it('throws EvaluationStopped (not an internal-error problem) at the first check point that says stop', () => {
    for (const after of [0, 1, 5, 20]) {
      let asked = 0;
      expect(() => evaluateText(text, undefined, () => ++asked > after)).toThrow(EvaluationStopped);
      expect(asked).toBe(after + 1); // it gave up at once
    }
  });

  it('asks inside the parse, every few hundred lines while scanning and while reading, and the parse is the same', () => {
    const big = generateSetup(4000);
    let asked = 0;
    const doc = parseSetup(big, () => (asked++, false));
    // Scanning and reading each ask at lines 0, 512, 1024, …
    expect(asked).toBe(2 * Math.ceil(4000 / LINES_PER_STOP_CHECK));
    expect(JSON.stringify(doc)).toBe(JSON.stringify(parseSetup(big)));
  });

  it('gives up inside the parse, not after it, when the check says stop', () => {
    const big = generateSetup(4000);
    for (const after of [0, 3, 9]) {
      let asked = 0;
      let thrown: unknown;
      try {
        parseSetup(big, () => ++asked > after);
      } catch (e) {
        thrown = e;
      }
      expect(thrown).toBeInstanceOf(EvaluationStopped); // passed on, not made an internal-error problem
      expect(asked).toBe(after + 1);
    }
    // Through analyze: the parse's own check points, before the one after the parse.
    let asked = 0;
    expect(() => analyze(big, undefined, () => ++asked > 2)).toThrow(EvaluationStopped);
    expect(asked).toBe(3);
  });

  it('asks inside the model building, every few dozen blocks, and gives up there when told', () => {
    const big = generateSetup(4000);
    const doc = parseSetup(big);
    let asked = 0;
    const model = buildModel(doc, {}, undefined, undefined, () => (asked++, false));
    // Declarations and references each walk the blocks; the level checks walk the species.
    const expected = 2 * Math.ceil(doc.blocks.length / BLOCKS_PER_STOP_CHECK) + Math.ceil(model.species.length / BLOCKS_PER_STOP_CHECK);
    expect(asked).toBe(expected);
    expect(model.species.length).toBeGreaterThan(BLOCKS_PER_STOP_CHECK);
    let told = 0;
    expect(() => buildModel(doc, {}, undefined, undefined, () => ++told > 4)).toThrow(EvaluationStopped);
    expect(told).toBe(5);
  });
});
