/**
 * The evaluation worker's reply: the result packed, the problems as they are (service/resultHandOff.ts).
 * Through the built server's worker, every example file (every block kind between them) and a
 * generated file give the editor the same diagnostics, hovers, inlay hints and JSON as the
 * evaluation in this thread.
 */
import { readFileSync } from 'fs';
import path from 'path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { generateSetup } from '../../bench/generatedSetup';
import { analyze, type Analysis } from '../../server/src/eval/analyze';
import { diagnostics } from '../../server/src/features/diagnostics';
import { hover } from '../../server/src/features/hover';
import { inlayHints } from '../../server/src/features/inlayHints';
import { WorkerEvaluator } from '../../server/src/service/workerEvaluator';
import { ensureBuilt, SERVER } from '../protocol/lspClient';

const EXAMPLES = ['coils-and-wires', 'fit-rubidium', 'handmade-species', 'lithium-beam', 'lithium-whole-term', 'mistakes', 'quadrupole-trap', 'rubidium-bias', 'rubidium-spectrum', 'sodium-slower', 'two-wire-magnet'];

let worker: WorkerEvaluator;
beforeAll(() => {
  ensureBuilt();
  worker = new WorkerEvaluator(SERVER, () => undefined);
}, 120_000);
afterAll(() => worker.dispose());

/** Every position where a word or number starts: where a hover can land. */
function wordStarts(text: string): { line: number; character: number }[] {
  return text.split('\n').flatMap((l, line) => [...l.matchAll(/[\w.+-]+/g)].map((m) => ({ line, character: m.index })));
}

async function compare(text: string): Promise<void> {
  const here = analyze(text);
  const outcome = await worker.evaluate(text);
  const there: Analysis = { ...here, result: outcome.result, problems: outcome.problems };
  expect(outcome.problems).toEqual(here.problems);
  expect(diagnostics(there, 'file:///a.sublevel')).toEqual(diagnostics(here, 'file:///a.sublevel'));
  // Bit for bit: JSON writes every number with the digits that give it back exactly.
  expect(JSON.stringify(outcome.result)).toBe(JSON.stringify(here.result));
  for (const pos of wordStarts(text)) expect(hover(there, pos), `hover at ${pos.line}:${pos.character}`).toEqual(hover(here, pos));
  const all = { start: { line: 0, character: 0 }, end: { line: text.split('\n').length, character: 0 } };
  expect(inlayHints(there, all)).toEqual(inlayHints(here, all));
}

describe("the worker's packed reply", () => {
  it.each(EXAMPLES)('gives the same diagnostics, hovers, inlay hints and JSON for %s', async (name) => {
    await compare(readFileSync(path.join('examples', `${name}.sublevel`), 'utf8'));
  }, 60_000);

  it('gives the same for a generated file with many levels, lines and beams', async () => {
    await compare(generateSetup(300));
  }, 60_000);
});
