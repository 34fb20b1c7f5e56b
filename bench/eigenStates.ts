/**
 * Which speed each side of the steady eigen protocol (eigenSteady.ts) ran at, round by round, and
 * the verdict from the rounds where both sides ran at the same speed. This 2-vCPU virtual machine
 * runs a process in one of two speeds about 1.2–1.45× apart for many rounds at a time
 * (docs/speed.md, "A quiet machine's two speeds"), so a round where one side was slow and the
 * other fast says nothing about the code. Pure: round timings in, classification and summaries out.
 */
import { quartiles } from './timing';

/** A round's median CPU µs per call of each side, and the CPU both were pinned to (null: not pinned). */
export interface Round {
  cpu: number | null;
  engine: number;
  lapack: number;
}

export type Speed = 'fast' | 'slow';

export interface ClassifiedRound extends Round {
  engineSpeed: Speed;
  lapackSpeed: Speed;
  /** LAPACK ÷ engine (≥ 1: the engine at least as fast). */
  ratio: number;
}

/**
 * A round is fast when its median is within this factor of that side's best round. The two speeds
 * measured apart are 1.41–1.44× (engine) and 1.21–1.28× (LAPACK); rounds in one state stay within
 * 1.09–1.10× of that side's best round (load 0.8–27). 1.12 lies above that spread and below the
 * smallest gap; a LAPACK round at 1.11–1.14× under heavy load is a toss-up.
 */
export const FAST_WITHIN = 1.12;

/** Fewer same-state rounds than this give no verdict. */
export const MIN_VERDICT_ROUNDS = 5;

/** Each round's speeds against each side's best (lowest) round of `rounds`. */
export function classifyRounds(rounds: readonly Round[], within = FAST_WITHIN): ClassifiedRound[] {
  if (rounds.length === 0) return [];
  const bestEngine = Math.min(...rounds.map((r) => r.engine));
  const bestLapack = Math.min(...rounds.map((r) => r.lapack));
  return rounds.map((r) => ({
    ...r,
    engineSpeed: r.engine <= bestEngine * within ? 'fast' : 'slow',
    lapackSpeed: r.lapack <= bestLapack * within ? 'fast' : 'slow',
    ratio: r.lapack / r.engine,
  }));
}

/** The rounds of one group and, from MIN_VERDICT_ROUNDS on, their ratios' median and quartiles. */
export interface GroupSummary {
  count: number;
  /** null: fewer than `minRounds` rounds, no verdict. */
  ratio: { median: number; low: number; high: number } | null;
  /** Medians of the group's rounds' own times, CPU µs per call (null when the group is empty). */
  engine: number | null;
  lapack: number | null;
}

export interface SameStateVerdict {
  bothFast: GroupSummary;
  bothSlow: GroupSummary;
  /** Rounds where one side was fast and the other slow: left out of every verdict. */
  mixed: number;
}

function summarise(group: readonly ClassifiedRound[], minRounds: number): GroupSummary {
  const mid = (xs: number[]) => (xs.length === 0 ? null : quartiles(xs).median);
  return {
    count: group.length,
    ratio: group.length >= minRounds ? quartiles(group.map((r) => r.ratio)) : null,
    engine: mid(group.map((r) => r.engine)),
    lapack: mid(group.map((r) => r.lapack)),
  };
}

/** Splits classified rounds (all of a run, or one CPU's) into both fast, both slow and mixed. */
export function sameStateVerdict(rounds: readonly ClassifiedRound[], minRounds = MIN_VERDICT_ROUNDS): SameStateVerdict {
  const fast = rounds.filter((r) => r.engineSpeed === 'fast' && r.lapackSpeed === 'fast');
  const slow = rounds.filter((r) => r.engineSpeed === 'slow' && r.lapackSpeed === 'slow');
  return { bothFast: summarise(fast, minRounds), bothSlow: summarise(slow, minRounds), mixed: rounds.length - fast.length - slow.length };
}

/** "0.990 over 12 rounds (quartiles 0.985–0.995)", or "no verdict (3 rounds, fewer than 5)". */
export function groupText(g: GroupSummary, minRounds = MIN_VERDICT_ROUNDS): string {
  if (g.ratio === null) return `no verdict (${g.count} round${g.count === 1 ? '' : 's'}, fewer than ${minRounds})`;
  return `${g.ratio.median.toFixed(3)} over ${g.count} rounds (quartiles ${g.ratio.low.toFixed(3)}–${g.ratio.high.toFixed(3)})`;
}
