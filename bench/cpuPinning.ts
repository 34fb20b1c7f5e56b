/**
 * Pinning processes to one CPU with util-linux's `taskset`, so that two processes timed against
 * each other run on the same CPU (on this virtual machine one vCPU can run slower than the other
 * for minutes; docs/speed.md, "The steady protocol"). Linux only; every call says whether it worked.
 */
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { cpus } from 'node:os';

/** Moves every thread of process `pid` to the CPUs in `list` ("0", "1", "0-1"); false if it failed. */
function setAffinity(pid: number, list: string): boolean {
  const r = spawnSync('taskset', ['-a', '-p', '-c', list, String(pid)], { stdio: 'ignore' });
  return r.status === 0;
}

/** Pins process `pid` (all its threads) to CPU `cpu`. */
export function pinToCpu(pid: number, cpu: number): boolean {
  return setAffinity(pid, String(cpu));
}

/** Lets process `pid` run on every CPU this process may use again. */
export function unpin(pid: number): boolean {
  return setAffinity(pid, cpuNumbers().join(','));
}

/**
 * The CPUs this process may run on, read once when this module loads, before any pinning narrows
 * them (the allowed list in /proc/self/status, which a container's cpuset narrows; the machine's
 * CPU numbers where that cannot be read).
 */
const ALLOWED_CPUS = allowedCpus();

export function cpuNumbers(): number[] {
  return [...ALLOWED_CPUS];
}

function allowedCpus(): number[] {
  try {
    const line = /^Cpus_allowed_list:\s*(.+)$/m.exec(readFileSync('/proc/self/status', 'utf8'))?.[1];
    if (line) {
      const out: number[] = [];
      for (const part of line.trim().split(',')) {
        const [a, b] = part.split('-').map(Number);
        for (let c = a!; c <= (b ?? a!); c++) out.push(c);
      }
      if (out.length > 0 && out.every(Number.isInteger)) return out;
    }
  } catch {
    // not Linux: fall back on the machine's count
  }
  return cpus().map((_, i) => i);
}
