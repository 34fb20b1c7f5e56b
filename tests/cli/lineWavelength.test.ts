/**
 * A line's wavelength reads the same in the text report and the hover, also when the line centre
 * is negative (the level written as upper lies below the one written as lower): both print the
 * wavelength of |ν| and say why. λ = c/|ν| with c = 299 792 458 m/s (SI, exact).
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { textReport } from '../../server/src/cli/textReport';
import { lineSection } from '../../server/src/features/hover/lineSection';
import { lineWavelengthText } from '../../server/src/eval/wavelengthText';

// Invented levels 400 THz apart (no uncertainty), so λ = c / 400 THz = 749.48111 nm.
const SETUP = `species Rb87
  level ground: 5s 2S1/2
  level upper: 5p 2P°3/2
    energy = 400 THz
line L: ground -> upper
`;

function withCentre(sign: 1 | -1) {
  const a = analyze(SETUP);
  const line = a.result!.lines.find((l) => l.name === 'L')!;
  expect(line.line_centre_Hz).toBe(400e12);
  line.line_centre_Hz = sign * 400e12;
  const model = a.model!.lines.find((l) => l.name === 'L')!;
  return { report: textReport('t.sublevel', a.result!).join('\n'), hover: lineSection(model, a.result) };
}

describe('a line wavelength in the report and the hover', () => {
  it('prints c/ν for a positive centre in both', () => {
    const { report, hover } = withCentre(1);
    expect((299792458 / 400e12) * 1e9).toBeCloseTo(749.481145, 6);
    expect(report).toContain('(vacuum wavelength 749.481145 nm)');
    // 8 digits of 749.481145 nm (exactly half way: the last digit may round either way in binary).
    expect(hover).toMatch(/vacuum wavelength 749\.4811[45] nm {2}$/m);
    expect(hover).not.toContain('|ν|');
  });

  it('prints the wavelength of |ν| for a negative centre in both, and says the levels are the other way round', () => {
    const { report, hover } = withCentre(-1);
    const why = 'of |ν| (ν < 0: the upper level as written lies below the lower)';
    expect(report).toContain(`(vacuum wavelength 749.481145 nm ${why})`);
    expect(hover).toMatch(/vacuum wavelength 749\.4811[45] nm of \|ν\| \(ν < 0: the upper level as written lies below the lower\)/);
    expect(report).toContain(why);
  });

  it('words it once for both (lineWavelengthText)', () => {
    expect(lineWavelengthText(-400e12, undefined, 6)).toBe('vacuum wavelength 749.481 nm of |ν| (ν < 0: the upper level as written lies below the lower)');
  });
});
