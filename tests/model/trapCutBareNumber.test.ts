/**
 * A trap's cut written as a bare number (`cut = 3e-30`) is not read as joules, nor echoed: it is
 * refused with the units a cut takes (no degC: a cut is an energy above the bottom), and the fixes
 * keep the number. An invented trap, as in examples/quadrupole-trap.sublevel.
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { quadrupoleTrapSetup } from '../eval/quadrupoleTrapSetup';

const TRAP = quadrupoleTrapSetup();

describe('a bare number as the cut', () => {
  it('is refused with the units a cut takes, and nothing is echoed', () => {
    const a = analyze(`${TRAP}  cut     = 3e-30\n`);
    const cut = a.problems.filter((p) => p.code === 'unit-missing');
    expect(cut.map((p) => [p.message, p.range.start.line, p.range.start.character, p.range.end.character])).toEqual([
      ["cut needs a unit: write the knife's energy as a temperature (mK, uK, K), a frequency (e.g. 20 MHz), a wavenumber (cm^-1) or an energy (J, eV); a bare number is not read.", 11, 12, 17],
    ]);
    expect(cut[0]!.data?.suggestions).toEqual(['3e-30 mK', '3e-30 uK', '3e-30 K', '3e-30 MHz', '3e-30 J']);
    expect(a.result!.traps![0]!.cut_J).toBeUndefined();
  });

  it('a cut with a unit is read and echoed in it', () => {
    const a = analyze(`${TRAP}  cut     = 3 mK\n`);
    expect(a.problems.filter((p) => p.severity === 'error')).toEqual([]);
    // 3 mK × k_B (exact in the SI: 1.380649e-23 J/K) = 4.141947e-26 J exactly; the product of the
    // doubles, 4.1419470000000005e-26, was conversion noise.
    expect(a.result!.traps![0]).toMatchObject({ cut_J: 4.141947e-26, cut_unit: 'mK' });
  });
});
