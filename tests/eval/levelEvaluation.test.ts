import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { halfText, signedHalfText } from '../../server/src/eval/halves';
import { hyperfineLabel } from '../../server/src/eval/levelTables';
import type { LevelResult } from '../../server/src/eval/resultTypes';

function level(text: string, name: string): LevelResult {
  const r = analyze(text).result!;
  const l = r.levels.find((x) => x.level === name);
  if (!l) throw new Error(`no level ${name}`);
  return l;
}

describe('level evaluation against published values', () => {
  it('Cs ground: 4A is the SI definition of the second, 9 192 631 770 Hz', () => {
    const l = level('species Cs133\n  level g: 6s 2S1/2\n', 'g');
    expect(l.hyperfine!.intervals[0]!.interval_Hz).toBe(9192631770);
    expect(l.sublevel_count).toBe(16);
  });

  it('hydrogen ground: the 21-cm line, 1 420 405 751.768 Hz (published measurement)', () => {
    const l = level('species H\n  level g: 1s 2S1/2\n', 'g');
    expect(l.hyperfine!.intervals[0]!.interval_Hz).toBeCloseTo(1420405751.768, 3);
  });

  it('87Rb 5P3/2 hyperfine intervals from A and B: 72.2, 156.9, 266.7 MHz (alkali D-line data compilation, from memory)', () => {
    const l = level('species Rb87\n  level p: 5p 2P°3/2\n', 'p');
    const iv = l.hyperfine!.intervals.map((i) => i.interval_Hz / 1e6);
    expect(iv[0]).toBeCloseTo(72.218, 1);
    expect(iv[1]).toBeCloseTo(156.947, 1);
    expect(iv[2]).toBeCloseTo(266.650, 1);
  });

  it('textbook Landé fractions with g_s = 2 (standard textbook values)', () => {
    const text = 'settings\n  g_s = 2\nspecies X\n  mass = 10 u\n  level a: 2P3/2\n  level b: 2D5/2\n  level c: 5D4\n  level d: 7D1\n';
    expect(level(text, 'a').g_J.lande_fraction).toBe('4/3');
    expect(level(text, 'a').g_J.lande).toBe(4 / 3);
    expect(level(text, 'b').g_J.lande_fraction).toBe('6/5');
    expect(level(text, 'c').g_J.lande_fraction).toBe('3/2');
    expect(level(text, 'd').g_J.lande_fraction).toBe('3');
  });

  it('uses |g_e| (CODATA 2022) by default: 2S1/2 g_J = 2.00231930436092', () => {
    const l = level('species X\n  mass = 10 u\n  level a: 2S1/2\n', 'a');
    expect(l.g_J.lande).toBeCloseTo(2.00231930436092, 14);
    expect(l.g_J.used).toBe(l.g_J.lande);
  });

  it('a measured g_J overrides the Landé value and both are reported', () => {
    const l = level('species X\n  mass = 10 u\n  level a: 2P3/2  g_J = 1.3341\n', 'a');
    expect(l.g_J.used).toBe(1.3341);
    expect(l.g_J.measured?.source).toBe('this file');
    expect(l.g_J.lande).toBeCloseTo(1.3341064, 6); // (2 + g_s)/3·… = 1 + (g_s−1)/3 for 2P3/2 with g_L = 1
  });

  it('linear J sublevels: m_J g_J μ_B B/h with μ_B/h = 13 996 244 917.1 Hz/T (CODATA 2022)', () => {
    const l = level('species X\n  mass = 10 u\n  level a: 2S1/2\nfield f = 1 T\n', 'a');
    const top = l.at_fields[0]!.linear.at(-1)!;
    expect(top.label).toBe('m_J=+1/2');
    expect(top.energy_Hz / (0.5 * 2.00231930436092 * 13996244917.1)).toBeCloseTo(1, 10);
  });
});

describe('linear-state labels of a level with a nucleus (hyperfineLabel, cached by 2F and 2m)', () => {
  it('every (F, m_F) up to F = 8 gets its own label, "F=3/2, m_F=-1/2", the same from the cache', () => {
    const seen = new Set<string>();
    for (let twoF = 0; twoF <= 16; twoF++) {
      for (let twoM = -twoF; twoM <= twoF; twoM += 2) {
        const want = `F=${halfText(twoF)}, m_F=${signedHalfText(twoM)}`;
        expect(hyperfineLabel(twoF, twoM)).toBe(want);
        expect(hyperfineLabel(twoF, twoM)).toBe(want);
        seen.add(want);
      }
    }
    expect(seen.size).toBe(((16 + 1) * (16 + 2)) / 2);
    expect(hyperfineLabel(3, -1)).toBe('F=3/2, m_F=-1/2');
  });

  it('the labels of a level read as before: 87Rb ground at a weak field', () => {
    const l = level('species Rb87\n  level g: 5s 2S1/2\n  field b: 1 G\n', 'g');
    const labels = l.at_fields?.[0]?.linear.map((s) => s.label) ?? [];
    expect([...labels].sort()).toEqual(['F=1, m_F=+1', 'F=1, m_F=-1', 'F=1, m_F=0', 'F=2, m_F=+1', 'F=2, m_F=+2', 'F=2, m_F=-1', 'F=2, m_F=-2', 'F=2, m_F=0'].sort());
  });
});
