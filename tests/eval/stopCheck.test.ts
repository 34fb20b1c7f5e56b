/**
 * Cooperative stopping (format/stopCheck.ts): the evaluation asks the stop check between its pieces
 * of work and gives up with `EvaluationStopped`; a check that never says stop changes nothing.
 */
import { readFileSync } from 'fs';
import path from 'path';
import { describe, expect, it } from 'vitest';
import { generateSetup } from '../../bench/generatedSetup';
import { EvaluationStopped } from '../../server/src/format/stopCheck';
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
});
