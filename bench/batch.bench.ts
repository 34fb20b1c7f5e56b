/**
 * Batch evaluation: 2,000 generated setup files in a temporary folder (invented scenarios:
 * hand-made species, fields, a line and a resonance each), timed as whole processes:
 * `sublevel check <folder>` against `sublevel eval <folder> --format jsonl` with one worker per
 * core and with `--jobs 1`. Goal: eval ≤ 2× check. Needs dist/cli.js (`npm run bench` builds it).
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';

const FILES = Number(process.env['BATCH_FILES'] ?? 2000);
const CLI = path.resolve('dist/cli.js');

/** A small, valid setup; `i` varies its numbers so no two files are alike. */
export function generatedSetup(i: number): string {
  return [
    `# Generated for the batch benchmark (invented numbers), file ${i}.`,
    `species Bench${i}`,
    `  mass = ${(20 + (i % 180) + 0.5).toFixed(1)} u`,
    '  I    = 3/2',
    `  mu_I = ${(1 + (i % 7) * 0.1).toFixed(2)} muN`,
    `  level g: 3s 2S1/2  A = ${(800 + (i % 97)).toFixed(0)} MHz`,
    '  level p: 3p 2P°3/2  A = 19 MHz  B = 3 MHz  energy = 16973 cm^-1',
    '',
    `field bias = ${(1 + (i % 50)).toFixed(0)} G`,
    '',
    'line probe: g -> p',
    '',
    'resonance rf',
    '  level = g',
    `  frequency = ${(1 + (i % 5) * 0.2).toFixed(1)} MHz`,
    '  range = 0 G, 5 G',
    '',
  ].join('\n');
}

function wallMs(args: string[]): { ms: number; status: number | null } {
  const t0 = process.hrtime.bigint();
  const r = spawnSync(process.execPath, [CLI, ...args], { stdio: ['ignore', 'ignore', 'ignore'] });
  return { ms: Number(process.hrtime.bigint() - t0) / 1e6, status: r.status };
}

export function runBatchBench(): { name: string; lines: string[] } {
  if (!existsSync(CLI)) return { name: 'batch', lines: ['dist/cli.js is missing: run `node esbuild.mjs` first'] };
  const dir = mkdtempSync(path.join(os.tmpdir(), 'sublevel-batch-bench-'));
  try {
    for (let i = 0; i < FILES; i++) writeFileSync(path.join(dir, `setup-${String(i).padStart(4, '0')}.sublevel`), generatedSetup(i));
    const check = wallMs(['check', dir]);
    const pooled = wallMs(['eval', dir, '--format', 'jsonl']);
    const single = wallMs(['eval', dir, '--format', 'jsonl', '--jobs', '1']);
    const oneFile = wallMs(['eval', path.join(dir, 'setup-0000.sublevel'), '--format', 'json']);
    const row = (what: string, r: { ms: number; status: number | null }): string =>
      `${what.padEnd(40)} ${(r.ms / 1000).toFixed(2).padStart(7)} s  ${(r.ms / check.ms).toFixed(2)}× check  (exit ${r.status})`;
    return {
      name: `batch: ${FILES} generated files, whole processes, ${os.availableParallelism()} cores`,
      lines: [
        row('check <folder>', check),
        row('eval <folder> --format jsonl', pooled),
        row('eval <folder> --format jsonl --jobs 1', single),
        `one process per file (estimated from one)  ${((oneFile.ms * FILES) / 1000).toFixed(0).padStart(5)} s  ${((oneFile.ms * FILES) / check.ms).toFixed(1)}× check`,
        'goal: eval ≤ 2× check',
      ],
    };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
