/**
 * A frequency the data wrote in Hz reads in Hz while the number stays short, and in GHz/MHz with
 * the measured digits once Hz would need exponent form: report and hover (residuals are differences,
 * printed at 4 digits with a prefix by frequencyText, and never reach exponent form).
 * Demo data: the ⁸⁷Rb clock-pair numbers of examples/fit-rubidium.sublevel, written in Hz.
 */
import { describe, expect, it } from 'vitest';
import { fitReportLines } from '../../server/src/cli/fitReport';
import { fittedText, measuredText } from '../../server/src/eval/fitText';
import { hover } from '../../server/src/features/hover';
import { analysisOf, hoverText, plain } from './helpers';

const TEXT = `species Rb87
  level ground: 5s 2S1/2
data clock
  level = ground
  lower = 1 -1
  upper = 2 1
  point = 6834678613.6(50) Hz
fit bias: clock -> field
  range = 0 G, 10 G
data pi_lines
  level = ground
  lower = 1 0
  upper = 2 0
  point = 6834696976(300) Hz at 0.5 mT
  point = 6857650357(300) Hz at 20 mT
fit constants
  data  = pi_lines
  free  = A
  start = A 3417000000 Hz
`;

describe('fit frequencies in Hz as written', () => {
  const analysis = analysisOf(TEXT);
  const report = fitReportLines('x', analysis.result!.fits!).join('\n');

  it('the report: measured values in GHz with every measured digit, no exponent form', () => {
    expect(report).toContain('measured 6.8346786136(50) GHz');
    expect(report).toContain('6.834696976 GHz');
    expect(report).toContain('(start 3.417 GHz)');
    expect(report).not.toMatch(/\de\d/);
  });

  it('the hover of the fit: the start value in GHz', () => {
    const text = plain(hoverText(hover(analysis, { line: 15, character: 1 })));
    expect(text).toContain('| A | 3.41734');
    expect(text).toContain('| 3.417 GHz |');
    expect(text).not.toMatch(/\de\d/);
  });

  it('the written unit stays while the number is short (kHz, and Hz below 10⁹)', () => {
    expect(measuredText(6834696.976e3, 'Hz', 'kHz')).toBe('6834696.976 kHz');
    expect(measuredText(123456789, 'Hz', 'Hz')).toBe('123456789 Hz');
  });

  it('past 10⁹ Hz a prefix, with every digit written (up to a double\'s 15) and a fitted value\'s uncertainty', () => {
    expect(measuredText(6834696976.123, 'Hz', 'Hz')).toBe('6.834696976123 GHz');
    expect(measuredText(6834678613.6, 'Hz', 'Hz')).toBe('6.8346786136 GHz');
    expect(fittedText(6834678613.6, 5, 'Hz', 'Hz')).toBe('6.8346786136(50) GHz');
  });
});
