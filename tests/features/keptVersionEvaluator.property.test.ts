/**
 * Property test: the evaluation worker's evaluator, which keeps the last version it read
 * (service/evaluatorKeptVersion.ts), gives for every job exactly the outcome (result and
 * problems, compared as JSON as the worker tests compare them) of a fresh `evaluateText` on the
 * same text and sources, over random edit sequences on the examples and a generated 400-line
 * setup; some jobs are stopped midway (in the parse, the model or the evaluation) as a superseded
 * job is, and the used file's text changes between jobs. FUZZ_RUNS raises the case count.
 */
import fc from 'fast-check';
import { readFileSync } from 'fs';
import { describe, expect, it } from 'vitest';
import { EvaluationStopped } from '../../server/src/format/stopCheck';
import type { SourceSnapshot } from '../../server/src/model/sources';
import { evaluateText, outcomeOf } from '../../server/src/service/evaluator';
import { generateSetup } from '../../bench/generatedSetup';
import { KeptVersionEvaluator } from '../../server/src/service/evaluatorKeptVersion';
import { applyTextEdit, editSequence, textEdit } from '../editSequences';

const RUNS = Number(process.env.FUZZ_RUNS ?? '') || 40;
const TIME_LIMIT = Math.max(300_000, RUNS * 5000); // generous: a loaded 2-core machine runs it 5–10× slower

const USE_LINE = 'use "shared/alkali-levels.sublevel"\n';
const USED = 'file:///ws/examples/shared/alkali-levels.sublevel';
const SHARED = readFileSync('examples/shared/alkali-levels.sublevel', 'utf8');
/** The used file as it is, with a level gone, with a misspelt term, and missing. */
const USED_VERSIONS: (string | null)[] = [SHARED, SHARED.replace(/^ {2}level p32:.*$/m, ''), SHARED.replace('2S1/2', '2X1/2'), null];

function snapshot(version: number): SourceSnapshot {
  return { uri: 'file:///ws/examples/setup.sublevel', files: { [USED]: USED_VERSIONS[version]! }, folders: {} };
}

/** A stop check that says stop from its (n+1)-th ask on: 0 stops at the first check point (in the parse). */
function stopAfter(n: number): () => boolean {
  let asked = 0;
  return () => asked++ >= n;
}

const job = fc.record({
  edit: textEdit,
  /** Stopped after this many asks, or run to the end. */
  stop: fc.option(fc.oneof(fc.constant(0), fc.nat(3), fc.nat(60), fc.nat(400)), { nil: undefined }),
  used: fc.nat(USED_VERSIONS.length - 1),
});

const sequence = fc.tuple(editSequence, fc.boolean(), fc.array(job, { minLength: 1, maxLength: 10 }));

describe('the worker evaluator that keeps the last version', () => {
  it('gives every job the outcome of a fresh evaluation, with jobs stopped midway and the used file changing', { timeout: TIME_LIMIT }, () => {
    let stopped = 0;
    let finished = 0;
    fc.assert(
      fc.property(sequence, ([[seed], withUse, jobs]) => {
        const kept = new KeptVersionEvaluator();
        let text = withUse ? USE_LINE + seed : seed;
        expect(JSON.stringify(kept.evaluate(text, snapshot(0)))).toBe(JSON.stringify(evaluateText(text, snapshot(0))));
        jobs.forEach((j, k) => {
          text = applyTextEdit(text, j.edit);
          const sources = snapshot(j.used);
          const last = k === jobs.length - 1;
          let outcome: string;
          try {
            outcome = JSON.stringify(kept.evaluate(text, sources, last || j.stop === undefined ? undefined : stopAfter(j.stop)));
          } catch (e) {
            if (!(e instanceof EvaluationStopped)) throw e;
            stopped++;
            return; // superseded: the next job takes the newer text
          }
          finished++;
          expect(outcome).toBe(JSON.stringify(evaluateText(text, sources)));
        });
      }),
      { numRuns: RUNS },
    );
    // The draws reach both kinds of job (a check that the property tests what it says).
    expect(stopped).toBeGreaterThan(0);
    expect(finished).toBeGreaterThan(RUNS);
  });

  it('models again only the blocks an edit touched, also after a job stopped midway', () => {
    const kept = new KeptVersionEvaluator();
    const text = generateSetup(400);
    const first = kept.analyze(text);
    const species = first.model!.species;
    expect(species.length).toBeGreaterThan(10);
    // A comment line inserted above the fourth species block: the lines read again run from the
    // line before it to the fourth block's header (one line of margin), so the fourth species is
    // built again; those above keep their model, those below too (moved in place).
    const at = first.doc.blocks.filter((b) => b.kind === 'species')[3]!.range.start.line;
    const lines = text.split('\n');
    const edited = [...lines.slice(0, at), '# a comment line', ...lines.slice(at)].join('\n');
    // Stopped in the model (asks: the scan of the touched lines, the model's 1st and 65th block).
    expect(() => kept.analyze(edited, undefined, stopAfter(2))).toThrow(EvaluationStopped);
    const again = edited.replace('# a comment line', '# a comment line, longer');
    const second = kept.analyze(again);
    expect(JSON.stringify(outcomeOf(second))).toBe(JSON.stringify(evaluateText(again)));
    const same = second.model!.species.map((s, i) => s === species[i]);
    expect(same.filter((x) => !x).length).toBe(1);
    expect(same.indexOf(false)).toBe(3);
  });

  it('keeps its base whole when a job is stopped inside the parse: the next job still reuses every untouched block', () => {
    const kept = new KeptVersionEvaluator();
    const text = generateSetup(2000);
    const species = kept.analyze(text).model!.species;
    // An edit at both ends makes the whole file be read again, with a change of line count: the
    // scan asks at lines 0, 512, 1024 and 1536, the reading of the lines every 512 lines after.
    const both = `# top\n${text}\n# end`;
    for (const asks of [0, 2, 4, 5, 6]) expect(() => kept.analyze(both, undefined, stopAfter(asks))).toThrow(EvaluationStopped);
    const at = text.indexOf('species Demo100 ');
    const edited = `${text.slice(0, at)}# a comment line\n${text.slice(at)}`;
    const next = kept.analyze(edited);
    expect(JSON.stringify(outcomeOf(next))).toBe(JSON.stringify(evaluateText(edited)));
    const rebuilt = next.model!.species.filter((s, i) => s !== species[i]).map((s) => s.name);
    expect(rebuilt).toEqual(['Demo100']);
  });
});
