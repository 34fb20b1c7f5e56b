/**
 * A trap's region reads in one length unit: its radius and its centre share the unit of the
 * larger (1 m = 100 cm = 1000 mm, SI prefixes), never "5.091 cm about (0, 0, 0) m".
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { regionText, trapSummaryLines } from '../../server/src/eval/trapText';
import { quadrupoleTrapSetup } from './quadrupoleTrapSetup';

describe('regionText', () => {
  it('puts a centre at the origin in the radius unit', () => {
    expect(regionText(0.05091, [0, 0, 0])).toBe('region 5.091 cm about (0, 0, 0) cm');
  });
  it('takes the unit of the larger of radius and centre: 2 cm about 1.5 m reads in m', () => {
    expect(regionText(0.02, [0, 0, 1.5])).toBe('region 0.02 m about (0, 0, 1.5) m');
  });
  it('keeps cm for 2 cm about 0.5 m (the largest unit in which 0.5 m is at least 1)', () => {
    expect(regionText(0.02, [0, 0, 0.5])).toBe('region 2 cm about (0, 0, 50) cm');
  });
  it('reads in the unit the file wrote, radius and centre alike (a quantity echoes as written)', () => {
    expect(regionText(0.06, [0, 0, 0], 'mm')).toBe('region 60 mm about (0, 0, 0) mm');
    expect(regionText(0.02, [0, 0, 1.5], 'cm')).toBe('region 2 cm about (0, 0, 150) cm');
  });
  it('reads a millimetre region in mm', () => {
    expect(regionText(0.003, [0.001, 0, -0.002])).toBe('region 3 mm about (1, 0, -2) mm');
  });
});

describe('the trap summary line', () => {
  it('names the default region in one unit (an invented quadrupole pair, 4 cm radius, 8 cm apart)', () => {
    const t = analyze(quadrupoleTrapSetup()).result!.traps![0]!;
    const line = trapSummaryLines(t)[1]!;
    // 0.9 × √(4² + 4²) cm = 5.091 cm (the region stops 90 % of the way to the windings).
    expect(line).toContain('region 5.091 cm about (0, 0, 0) cm');
  });
});
