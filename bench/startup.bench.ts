/**
 * CLI start-up: the whole process of `sublevel check` on one small file against a bare
 * `node -e 0`, run alternately so both see the same machine load; the median of each and their
 * ratio are printed (goal ≤ 2×). Also `sublevel --version` (start-up with no analysis at all).
 * Needs dist/cli.js (`npm run bench` builds it).
 */
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import path from 'node:path';

const RUNS = 15;
const CLI = path.resolve('dist/cli.js');
const SMALL_FILE = path.resolve('examples/handmade-species.sublevel');

function wallMs(args: string[]): number {
  const t0 = process.hrtime.bigint();
  const r = spawnSync(process.execPath, args, { stdio: ['ignore', 'ignore', 'ignore'] });
  const ms = Number(process.hrtime.bigint() - t0) / 1e6;
  if (r.status !== 0) throw new Error(`node ${args.join(' ')} exited with ${r.status}`);
  return ms;
}

export function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const mid = s.length >> 1;
  return s.length % 2 ? s[mid]! : (s[mid - 1]! + s[mid]!) / 2;
}

export function runStartupBench(): { name: string; lines: string[] } {
  if (!existsSync(CLI)) return { name: 'startup', lines: ['dist/cli.js is missing: run `node esbuild.mjs` first'] };
  const bare: number[] = [];
  const check: number[] = [];
  const version: number[] = [];
  wallMs(['-e', '0']); // warm the file cache once
  wallMs([CLI, 'check', SMALL_FILE]);
  for (let i = 0; i < RUNS; i++) {
    bare.push(wallMs(['-e', '0']));
    check.push(wallMs([CLI, 'check', SMALL_FILE]));
    version.push(wallMs([CLI, '--version']));
  }
  const b = median(bare);
  const row = (what: string, xs: number[]): string => `${what.padEnd(44)} ${median(xs).toFixed(0).padStart(5)} ms  ${(median(xs) / b).toFixed(2)}× bare node`;
  return {
    name: `startup (median of ${RUNS} runs each, alternating)`,
    lines: [
      `${'node -e 0'.padEnd(44)} ${b.toFixed(0).padStart(5)} ms`,
      row('sublevel --version', version),
      row(`sublevel check ${path.basename(SMALL_FILE)}`, check),
      'goal: check ≤ 2× bare node',
    ],
  };
}
