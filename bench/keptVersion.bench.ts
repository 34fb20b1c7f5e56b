/**
 * The evaluation worker's job after a one-line edit of the generated 20,000-line file, in this
 * thread (the worker's hand-off, the same for both, is left out): a fresh `evaluateText` (what
 * the worker did before) against the evaluator that keeps the last version
 * (service/evaluatorKeptVersion.ts), alternating which goes first. Two edits: a number changed
 * in a species mid-file (the line count stays), and a comment line inserted mid-file (every
 * block below moves). CPU time of this process per job, median and quartiles, and the ratio.
 */
import { evaluateText } from '../server/src/service/evaluator';
import { KeptVersionEvaluator } from '../server/src/service/evaluatorKeptVersion';
import { generateSetup } from './generatedSetup';
import { quartiles, wallAndCpuMs } from './timing';

const LINES = 20000;
const ROUNDS = Number(process.env.INCR_ROUNDS ?? '') || 6;

type Edit = (text: string, round: number) => string;

/** The hyperfine constant A of the species in the middle of the file, changed to another value each round. */
const numberEdited: Edit = (text, round) => text.replace(/(species Demo1100 [^\n]*\n(?:.*\n){3}  level g1100: 5s 2S1\/2  A = )[0-9.]+/, `$1${(3000 + round).toFixed(2)}`);

/** A comment line inserted in the middle of the file. */
const lineInserted: Edit = (text, round) => {
  const at = text.indexOf('species Demo1100 ');
  return `${text.slice(0, at)}# note ${round}\n${text.slice(at)}`;
};

function figure(xs: number[]): string {
  const q = quartiles(xs);
  return `${(q.median / 1000).toFixed(2)} s (quartiles ${(q.low / 1000).toFixed(2)}–${(q.high / 1000).toFixed(2)})`;
}

export function runKeptVersionBench(): { name: string; lines: string[] } {
  const lines: string[] = [];
  for (const [name, edit] of [['a number edited', numberEdited], ['a line inserted', lineInserted]] as const) {
    let text = generateSetup(LINES);
    const kept = new KeptVersionEvaluator();
    kept.evaluate(text);
    evaluateText(text); // both warm
    const fresh: number[] = [];
    const keptCpu: number[] = [];
    for (let r = 0; r < ROUNDS; r++) {
      const next = edit(text, r);
      if (next === text) throw new Error(`the edit "${name}" changed nothing`);
      text = next;
      const runFresh = (): void => void fresh.push(wallAndCpuMs(() => evaluateText(text)).cpu);
      const runKept = (): void => void keptCpu.push(wallAndCpuMs(() => kept.evaluate(text)).cpu);
      if (r % 2 === 0) (runFresh(), runKept());
      else (runKept(), runFresh());
    }
    const ratios = fresh.map((f, i) => f / keptCpu[i]!);
    lines.push(
      `${LINES} lines, ${name} (${ROUNDS} jobs each, CPU): fresh evaluation ${figure(fresh)}, kept version ${figure(keptCpu)}; ` +
        `fresh ÷ kept per round ${Math.min(...ratios).toFixed(2)}–${Math.max(...ratios).toFixed(2)}`,
    );
  }
  return { name: 'evaluation worker job after a one-line edit: fresh vs kept version', lines };
}
