/**
 * CLI start-up: the whole process of `sublevel check` on one small file against a bare
 * `node -e 0`, run alternately so both see the same machine load; the median of each and their
 * ratio are printed (goal ≤ 2×), as wall time and as CPU time. Also `sublevel --version`
 * (start-up with no analysis at all). CPU time is the process's own (every thread), read by a
 * one-line probe that each run, bare node included, loads with --require and that reports
 * process.cpuUsage() on a spare pipe as the process exits.
 * Needs dist/cli.js (`npm run bench` builds it).
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import path from 'node:path';

const RUNS = 15;
const CLI = path.resolve('dist/cli.js');
const SMALL_FILE = path.resolve('examples/handmade-species.sublevel');

interface Run {
  wall: number;
  cpu: number;
}

function timed(probe: string, args: string[]): Run {
  const t0 = process.hrtime.bigint();
  const r = spawnSync(process.execPath, ['--require', probe, ...args], { stdio: ['ignore', 'ignore', 'ignore', 'pipe'] });
  const wall = Number(process.hrtime.bigint() - t0) / 1e6;
  if (r.status !== 0) throw new Error(`node ${args.join(' ')} exited with ${r.status}`);
  const { user, system } = JSON.parse(String(r.output[3])) as { user: number; system: number };
  return { wall, cpu: (user + system) / 1000 };
}

export function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const mid = s.length >> 1;
  return s.length % 2 ? s[mid]! : (s[mid - 1]! + s[mid]!) / 2;
}

export function runStartupBench(): { name: string; lines: string[] } {
  if (!existsSync(CLI)) return { name: 'startup', lines: ['dist/cli.js is missing: run `node esbuild.mjs` first'] };
  const dir = mkdtempSync(path.join(tmpdir(), 'sublevel-startup-'));
  const probe = path.join(dir, 'cpuProbe.js');
  writeFileSync(probe, "process.on('exit', () => require('fs').writeSync(3, JSON.stringify(process.cpuUsage())));\n");
  const bare: Run[] = [];
  const check: Run[] = [];
  const version: Run[] = [];
  const load = loadavg()[0]!;
  try {
    timed(probe, ['-e', '0']); // warm the file cache once
    timed(probe, [CLI, 'check', SMALL_FILE]);
    for (let i = 0; i < RUNS; i++) {
      bare.push(timed(probe, ['-e', '0']));
      check.push(timed(probe, [CLI, 'check', SMALL_FILE]));
      version.push(timed(probe, [CLI, '--version']));
    }
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
  const bw = median(bare.map((r) => r.wall));
  const bc = median(bare.map((r) => r.cpu));
  const row = (what: string, rs: Run[]): string => {
    const w = median(rs.map((r) => r.wall));
    const c = median(rs.map((r) => r.cpu));
    return `${what.padEnd(44)} ${w.toFixed(0).padStart(5)} ms ${(w / bw).toFixed(2)}×   ${c.toFixed(0).padStart(5)} ms ${(c / bc).toFixed(2)}×`;
  };
  return {
    name: `startup (median of ${RUNS} runs each, alternating; load average ${load.toFixed(1)} before, ${loadavg()[0]!.toFixed(1)} after)`,
    lines: [
      `${''.padEnd(44)} ${'wall'.padStart(5)}    vs bare   ${'CPU'.padStart(5)}    vs bare`,
      `${'node -e 0'.padEnd(44)} ${bw.toFixed(0).padStart(5)} ms ${''.padEnd(5)}   ${bc.toFixed(0).padStart(5)} ms`,
      row('sublevel --version', version),
      row(`sublevel check ${path.basename(SMALL_FILE)}`, check),
      'goal: check ≤ 2× bare node',
    ],
  };
}
