/**
 * Values zero in theory print as 0, not as round-off (a merged symmetric pair's peak, a pattern
 * wholly on the grid, a slower's field at its exit), and a genuinely small value is kept.
 * Scenarios and apparatus numbers are invented.
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { slowerCsv } from '../../server/src/render/slowerCsv';
import { cli } from '../cli/runCli';
import { mkdtempSync, writeFileSync } from 'fs';
import { tmpdir } from 'os';
import { join } from 'path';

const beam = (speed: string, drift: string) =>
  `species heavy\n  mass = 108 u\n  level ground: 5s 2S1/2\nmagnet sg\n  field    = 0.1 T\n  gradient = 10 T/m\n  length   = 3.5 cm\n` +
  `beam b\n  level    = ground\n  source   = ${speed}\n  slits    = 30 um, 30 um apart 20 cm\n  magnet   = sg\n  drift    = ${drift}\n  detector = 20 um\n`;

describe('round-off is not printed as a value', () => {
  it('single-speed beam whose two peaks merge: one peak at exactly 0, nothing off the grid', () => {
    const b = analyze(beam('speed 500 m/s', '1 mm')).result!.beams![0]!;
    expect(b.peaks.map((p) => p.position_m)).toEqual([0]);
    expect(b.off_grid_fraction).toBe(0);
  });

  it('the same beam with separate peaks keeps their positions (±8.5e-6 m, mirror images)', () => {
    const b = analyze(beam('speed 500 m/s', '10 cm')).result!.beams![0]!;
    expect(b.peaks).toHaveLength(2);
    expect(b.peaks[0]!.position_m).toBeCloseTo(-b.peaks[1]!.position_m, 12);
    expect(Math.abs(b.peaks[0]!.position_m)).toBeGreaterThan(5e-6);
  });

  it('an oven beam keeps its genuine off-grid loss (above the sum round-off)', () => {
    const b = analyze(beam('oven 1300 K', '10 cm')).result!.beams![0]!;
    expect(b.off_grid_fraction).toBeGreaterThan(1e-6);
  });

  it('slower JSON and CSV: the ideal field at the exit is 0; the samples before it are written as computed', () => {
    const dir = mkdtempSync(join(tmpdir(), 'sublevel-roundoff-'));
    const file = join(dir, 'slow.sublevel');
    writeFileSync(file, 'species Na23\n  level ground: 3s 2S1/2\n  level p32:    3p 2P°3/2\nline D2: ground -> p32\nslower s\n  line    = D2\n  capture = 500 m/s\n  final   = 30 m/s\n  safety  = 0.5\n');
    const doc = JSON.parse(cli('slower', file, '--format', 'json').out);
    const s = doc.slower;
    const last = s.samples[s.samples.length - 1];
    expect(last.B_ideal_T).toBe(0); // zero in theory: the profile gives 0, not 2.4e-17 T of round-off
    // The resonant speeds at the ends are the capture and final speeds as written (were 500.0000000000001 and 30.0000000000002).
    expect(s.samples[0].resonant_speed_m_per_s).toBe(500);
    expect(last.resonant_speed_m_per_s).toBe(30);
    const rows = slowerCsv(s, 'slow.sublevel').trimEnd().split('\n');
    expect(rows[rows.length - 1]!.split(',')[1]).toBe('0');
    expect(rows[rows.length - 1]!.split(',')[2]).toBe('30');
    expect(Number(rows[rows.length - 2]!.split(',')[1])).toBeCloseTo(s.samples[s.samples.length - 2].B_ideal_T, 15);
    expect(Number(rows[rows.length - 2]!.split(',')[1])).toBeGreaterThan(1e-3);
  });
});
