/**
 * `sublevel profile` on examples/lithium-beam.sublevel: computing the detector pattern (beam
 * evaluation + pattern view, 4,096 positions × 8 sublevels) against writing it as CSV, in CPU
 * time of this process (less disturbed by other load than wall time), medians of alternated
 * runs. Also the per-cell way the CSV was written before (one String() per cell), and the
 * platform's number-to-text conversion of the same numbers alone, the floor for any writer.
 * Goal: writing < computing.
 */
import { readFileSync } from 'node:fs';
import { csvNumber } from '../server/src/eval/machineText';
import { analyze } from '../server/src/eval/analyze';
import { evaluateBeam } from '../server/src/eval/beamEvaluation';
import { gJLookup } from '../server/src/eval/gJLookup';
import { patternCsv } from '../server/src/render';
import { patternView } from '../server/src/views/patternView';

const RUNS = 31;

function cpuMs(f: () => unknown): number {
  const t0 = process.cpuUsage();
  f();
  const d = process.cpuUsage(t0);
  return (d.user + d.system) / 1000;
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[s.length >> 1]!;
}

export function runProfileCsvBench(): { name: string; lines: string[] } {
  const a = analyze(readFileSync('examples/lithium-beam.sublevel', 'utf8'));
  const beam = a.model!.beams[0]!;
  const levels = gJLookup(a.result!.levels);
  const compute = () => patternView(beam.name, evaluateBeam(beam, levels, false))!;
  const view = compute();
  const perCell = (): string => {
    const rows: string[] = [];
    for (let k = 0; k < view.positionsM.length; k++) rows.push([view.positionsM[k], view.total[k], ...view.parts.map((p) => p.values[k])].map(csvNumber).join(','));
    return rows.join('\n');
  };
  const table = Array.from(view.positionsM, (x, k) => [x, view.total[k]!, ...view.parts.map((p) => p.values[k]!)]);
  const times = { compute: [] as number[], csv: [] as number[], perCell: [] as number[], stringify: [] as number[] };
  for (let i = 0; i < RUNS; i++) {
    times.compute.push(cpuMs(compute));
    times.csv.push(cpuMs(() => patternCsv(view, [['file', 'lithium-beam.sublevel']], 'profile')));
    times.perCell.push(cpuMs(perCell));
    times.stringify.push(cpuMs(() => JSON.stringify(table)));
  }
  const c = median(times.compute);
  const row = (what: string, xs: number[]): string => `${what.padEnd(40)} ${median(xs).toFixed(1).padStart(6)} ms  ${(median(xs) / c).toFixed(2)}× computing`;
  return {
    name: `profile CSV: ${view.positionsM.length} positions × ${view.parts.length} sublevels, CPU time, median of ${RUNS}`,
    lines: [
      `${'computing the pattern'.padEnd(40)} ${c.toFixed(1).padStart(6)} ms`,
      row('writing the CSV (patternCsv)', times.csv),
      row('one String() per cell (the way before)', times.perCell),
      row('JSON.stringify of the numbers alone', times.stringify),
      'goal: writing < computing',
    ],
  };
}
