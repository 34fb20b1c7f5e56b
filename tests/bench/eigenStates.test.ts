// The steady eigen protocol's speed states and same-state verdict (bench/eigenStates.ts), on
// invented round timings (CPU µs per call) shaped like the two speeds measured on this machine.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { classifyRounds, FAST_WITHIN, groupText, MIN_VERDICT_ROUNDS, type Round, sameStateVerdict } from '../../bench/eigenStates';

const round = (engine: number, lapack: number, cpu: number | null = null): Round => ({ cpu, engine, lapack });

describe('classifyRounds', () => {
  it('calls a round fast within FAST_WITHIN of that side’s best round, slow beyond', () => {
    const c = classifyRounds([round(1400, 1405), round(1400 * 1.1, 1405 * 1.13), round(1975, 1800)]);
    expect(c.map((r) => r.engineSpeed)).toEqual(['fast', 'fast', 'slow']);
    expect(c.map((r) => r.lapackSpeed)).toEqual(['fast', 'slow', 'slow']);
    expect(c[0]!.ratio).toBeCloseTo(1405 / 1400, 12);
    expect(c[2]!.ratio).toBeCloseTo(1800 / 1975, 12);
  });

  it('takes each side’s best separately: a side that is slow in every round is fast against itself', () => {
    const c = classifyRounds([round(1975, 1405), round(1990, 1410), round(1980, 1400)]);
    expect(c.every((r) => r.engineSpeed === 'fast' && r.lapackSpeed === 'fast')).toBe(true);
  });

  it('has a threshold between the rounds’ spread in one state and the smallest gap between the two states', () => {
    expect(FAST_WITHIN).toBeGreaterThan(1.07);
    expect(FAST_WITHIN).toBeLessThan(1800 / 1405);
  });

  it('keeps the CPU of each round and returns nothing for no rounds', () => {
    expect(classifyRounds([round(1, 1, 0), round(1, 1, 1)]).map((r) => r.cpu)).toEqual([0, 1]);
    expect(classifyRounds([])).toEqual([]);
  });
});

describe('sameStateVerdict', () => {
  it('gives the verdict from the rounds where both sides were fast (both fast in every round)', () => {
    const ratios = [0.98, 0.99, 0.99, 1.0, 1.0, 1.01, 1.02];
    const v = sameStateVerdict(classifyRounds(ratios.map((q) => round(1400, 1400 * q))));
    expect(v.bothFast.count).toBe(7);
    expect(v.bothFast.ratio!.median).toBeCloseTo(1.0, 12);
    expect(v.bothFast.ratio!.low).toBeCloseTo(0.99, 12);
    expect(v.bothFast.ratio!.high).toBeCloseTo(1.01, 12);
    expect(v.bothFast.engine).toBe(1400);
    expect(v.bothSlow).toEqual({ count: 0, ratio: null, engine: null, lapack: null });
    expect(v.mixed).toBe(0);
  });

  it('leaves out rounds where one side was slow, and shows both-slow rounds apart', () => {
    const rounds = [
      // Both fast, ratio 0.99.
      ...Array.from({ length: 6 }, () => round(1400, 1386)),
      // The engine slow, LAPACK fast: 0.71, a ratio that says nothing about the code.
      ...Array.from({ length: 4 }, () => round(1975, 1405)),
      // LAPACK slow, the engine fast: 1.29.
      ...Array.from({ length: 3 }, () => round(1400, 1800)),
      // Both slow: 0.91.
      ...Array.from({ length: 5 }, () => round(1975, 1800)),
    ];
    const v = sameStateVerdict(classifyRounds(rounds));
    expect(v.mixed).toBe(7);
    expect(v.bothFast.count).toBe(6);
    expect(v.bothFast.ratio!.median).toBeCloseTo(0.99, 12);
    expect(v.bothSlow.count).toBe(5);
    expect(v.bothSlow.ratio!.median).toBeCloseTo(1800 / 1975, 12);
    expect(v.bothSlow.lapack).toBe(1800);
  });

  it('gives no verdict from fewer than MIN_VERDICT_ROUNDS same-state rounds', () => {
    expect(MIN_VERDICT_ROUNDS).toBe(5);
    const rounds = [...Array.from({ length: 4 }, () => round(1400, 1400)), ...Array.from({ length: 8 }, () => round(1975, 1405))];
    const v = sameStateVerdict(classifyRounds(rounds));
    expect(v.bothFast.count).toBe(4);
    expect(v.bothFast.ratio).toBeNull();
    expect(groupText(v.bothFast)).toBe('no verdict (4 rounds, fewer than 5)');
    expect(v.mixed).toBe(8);
  });

  it('gives a verdict per CPU when handed one CPU’s rounds, classified against the whole run', () => {
    // CPU 1 slow for both sides throughout, CPU 0 fast: the slow CPU's rounds are both slow.
    const rounds = Array.from({ length: 12 }, (_, r) => (r % 2 === 0 ? round(1400, 1414, 0) : round(1975, 1800, 1)));
    const all = classifyRounds(rounds);
    const onSlowCpu = sameStateVerdict(all.filter((r) => r.cpu === 1));
    expect(onSlowCpu.bothFast.count).toBe(0);
    expect(onSlowCpu.bothSlow.count).toBe(6);
    const onFastCpu = sameStateVerdict(all.filter((r) => r.cpu === 0));
    expect(onFastCpu.bothFast.ratio!.median).toBeCloseTo(1.01, 12);
  });

  it('prints a verdict as median, count and quartiles', () => {
    const v = sameStateVerdict(classifyRounds([0.95, 1.0, 1.0, 1.0, 1.05].map((q) => round(1000, 1000 * q))));
    expect(groupText(v.bothFast)).toBe('1.000 over 5 rounds (quartiles 1.000–1.000)');
    expect(groupText(sameStateVerdict(classifyRounds([round(1, 1)])).bothFast)).toBe('no verdict (1 round, fewer than 5)');
  });
});

describe('classification properties', () => {
  const rounds = fc.array(
    fc.record({ cpu: fc.constantFrom(0, 1, null), engine: fc.double({ min: 100, max: 10_000, noNaN: true }), lapack: fc.double({ min: 100, max: 10_000, noNaN: true }) }),
    { minLength: 1, maxLength: 40 },
  );

  it('sorts every round into exactly one group, each side’s best round always fast', () => {
    fc.assert(
      fc.property(rounds, (rs) => {
        const c = classifyRounds(rs);
        const v = sameStateVerdict(c);
        expect(v.bothFast.count + v.bothSlow.count + v.mixed).toBe(rs.length);
        const bestEngine = c.reduce((a, r) => (r.engine < a.engine ? r : a));
        expect(bestEngine.engineSpeed).toBe('fast');
        expect(v.bothFast.ratio === null).toBe(v.bothFast.count < MIN_VERDICT_ROUNDS);
      }),
    );
  });

  it('does not change when a side’s times are all scaled alike (a uniformly faster machine)', () => {
    fc.assert(
      fc.property(rounds, fc.double({ min: 0.25, max: 4, noNaN: true }), (rs, k) => {
        const before = classifyRounds(rs).map((r) => [r.engineSpeed, r.lapackSpeed]);
        const after = classifyRounds(rs.map((r) => ({ ...r, engine: r.engine * k }))).map((r) => [r.engineSpeed, r.lapackSpeed]);
        // Rounds within round-off of the threshold may flip; none lies there in practice.
        const edge = (r: Round, best: number) => Math.abs(r.engine / best - FAST_WITHIN) < 1e-9;
        const best = Math.min(...rs.map((r) => r.engine));
        rs.forEach((r, i) => {
          if (!edge(r, best)) expect(after[i]).toEqual(before[i]);
        });
      }),
    );
  });
});
