import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { linearShiftPerTesla, linearSublevels } from '../../server/src/physics/linearZeeman';
import { landeGJ } from '../../server/src/physics/gFactors';
import { codataReference } from './codataReference';

describe('linear Zeeman sublevels', () => {
  it('free-electron-like 2S1/2 at 1 T: the m = ±1/2 splitting is the CODATA electron gyromagnetic ratio', () => {
    // CODATA 2022 (scipy.constants): γ_e/2π = 28 024.951 3861(87) MHz/T
    const subs = linearSublevels(landeGJ(1, 0, 1), 1, 1);
    expect(subs.map((s) => s.twoM)).toEqual([-1, 1]);
    const splitMHz = (subs[1].energyHz - subs[0].energyHz) / 1e6;
    const ref = codataReference.extra.ELECTRON_GYROMAGNETIC_MHZ_PER_T;
    expect(Math.abs(splitMHz - ref.value)).toBeLessThan(2 * ref.uncertainty);
  });
  it('2F+1 sublevels, ascending m, antisymmetric in m, zero at zero field (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 20 }), fc.double({ min: -3, max: 3, noNaN: true }), fc.double({ min: 0, max: 10, noNaN: true }), (twoF, g, B) => {
        const subs = linearSublevels(g, twoF, B);
        if (subs.length !== twoF + 1) return false;
        for (let k = 0; k < subs.length; k++) {
          if (subs[k].twoM !== -twoF + 2 * k) return false;
          if (Math.abs(subs[k].energyHz + subs[subs.length - 1 - k].energyHz) > 1e-6 * Math.abs(subs[k].energyHz)) return false;
        }
        return linearSublevels(g, twoF, 0).every((s) => s.energyHz === 0);
      }),
    );
  });
  it('87Rb F = 2, g_F ≈ 1/2: adjacent sublevels 0.70 MHz apart at 1 G (Steck, from memory)', () => {
    const subs = linearSublevels(0.5, 4, 1e-4);
    expect((subs[4].energyHz - subs[3].energyHz) / 1e6).toBeCloseTo(0.7, 2);
    expect(linearShiftPerTesla(0.5, 2)).toBeCloseTo(subs[3].energyHz / 1e-4, 6);
  });
  it('bad F gives no sublevels rather than throwing', () => {
    expect(linearSublevels(1, -2, 1)).toEqual([]);
    expect(linearSublevels(1, 1.5, 1)).toEqual([]);
  });
});
