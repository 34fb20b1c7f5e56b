/**
 * `sublevel profile` on examples/lithium-beam.sublevel: computing the detector pattern (beam
 * evaluation + pattern view, 4,096 positions × 8 sublevels) against writing it as CSV, in CPU
 * time of this process (less disturbed by other load than wall time), medians of alternated
 * runs. Beside it: the same text flattened to one string (what encoding it for a file does
 * first), the writer before this one (one JSON.stringify of the table, shortest round-trip
 * digits, brackets turned into line ends), one csvNumber and one String() per cell, and the
 * platform's own number-to-text conversions of the same numbers alone. Last, writing the file
 * as `profile --out` does, the rows as the writer's bytes (csvTablePieces) against the text
 * flattened and encoded first (before), into a temporary file with fsync left out (its wait is
 * the disk's, not this process's CPU).
 * Goal: writing < computing.
 */
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { csvTablePieces } from '../server/src/cli/csvTablePieces';
import { nodeFileSystem } from '../server/src/cli/fileSystem';
import { writeOutputFile } from '../server/src/cli/output';
import { csvNumber } from '../server/src/eval/machineText';
import { analyze } from '../server/src/eval/analyze';
import { evaluateBeam } from '../server/src/eval/beamEvaluation';
import { gJLookup } from '../server/src/eval/gJLookup';
import { patternCsv, patternTable } from '../server/src/render';
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

let sink = 0;

export function runProfileCsvBench(): { name: string; lines: string[] } {
  const a = analyze(readFileSync('examples/lithium-beam.sublevel', 'utf8'));
  const beam = a.model!.beams[0]!;
  const levels = gJLookup(a.result!.levels);
  const compute = () => patternView(beam.name, evaluateBeam(beam, levels, false))!;
  const view = compute();
  const about: [string, string][] = [['file', 'lithium-beam.sublevel']];
  const table = Array.from(view.positionsM, (x, k) => [x, view.total[k]!, ...view.parts.map((p) => p.values[k]!)]);
  const cells = table.flat();
  const header = ['position_m', 'total_per_m', ...view.parts.map((p) => `share_per_m[${p.label}]`)].join(',');
  const perCell = (format: (x: number) => string) => (): string => table.map((r) => r.map(format).join(',')).join('\n');
  // Groups, each alternated with the computation and set against its own median of it: the
  // comparisons leave much garbage, and a collector thread's CPU time counts to whatever runs then.
  const flattened = (f: () => string) => (): void => {
    const text = f();
    sink += text.charCodeAt(text.length >> 1); // reading a character flattens a joined string
  };
  const before = (): string => `# sublevel profile: file=lithium-beam.sublevel\n${header}\n${JSON.stringify(table).slice(2, -2).replace(/\],\[/g, '\n')}\n`;
  const groups: [string, () => unknown][][] = [
    [['writing the CSV (patternCsv)', () => patternCsv(view, about, 'profile')]],
    [['the writer before (JSON.stringify table)', before]],
    [
      ['patternCsv, flattened to one string', flattened(() => patternCsv(view, about, 'profile'))],
      ['the writer before, flattened', flattened(before)],
    ],
    [
      ['one csvNumber per cell', perCell(csvNumber)],
      ['one String() per cell (the first writer)', perCell((x) => (x === 0 ? '0' : String(x)))],
      ['JSON.stringify of the numbers alone', () => JSON.stringify(table)],
      ['toPrecision(15) of the numbers alone', () => {
        for (const x of cells) sink += x.toPrecision(15).length;
      }],
    ],
  ];
  const dir = mkdtempSync(path.join(tmpdir(), 'sublevel-bench-csv-'));
  const target = path.join(dir, 'pattern.csv');
  const noSync = { ...nodeFileSystem, fsyncSync: () => undefined };
  groups.push([
    ['to a file: rows as bytes (profile --out)', () => writeOutputFile(target, csvTablePieces(patternTable(view, about, 'profile')), noSync)],
    ['to a file: text flattened, encoded (before)', () => writeOutputFile(target, `${patternCsv(view, about, 'profile').trimEnd()}\n`, noSync)],
  ]);
  const lines: string[] = [];
  for (let i = 0; i < 15; i++) for (const f of [compute, ...groups.flat().map(([, g]) => g)]) f(); // warm-up: every case compiled
  for (const cases of groups) {
    const computeTimes: number[] = [];
    const times = cases.map(() => [] as number[]);
    for (let i = 0; i < RUNS; i++) {
      computeTimes.push(cpuMs(compute));
      cases.forEach(([, f], j) => times[j]!.push(cpuMs(f)));
    }
    const c = median(computeTimes);
    lines.push(`${'computing the pattern'.padEnd(42)} ${c.toFixed(1).padStart(6)} ms`);
    cases.forEach(([what], j) => lines.push(`${what.padEnd(42)} ${median(times[j]!).toFixed(1).padStart(6)} ms  ${(median(times[j]!) / c).toFixed(2)}× computing`));
  }
  rmSync(dir, { recursive: true, force: true });
  return {
    name: `profile CSV: ${view.positionsM.length} positions × ${view.parts.length} sublevels, CPU time, median of ${RUNS}`,
    lines: [...lines, 'goal: writing < computing'],
  };
}
