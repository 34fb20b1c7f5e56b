/**
 * Written quantities become SI numbers without binary noise: the written decimal and the unit's
 * exact SI factor are multiplied as decimals and rounded to a double once (format/exactDecimal.ts),
 * so `0.1 mT` is 1e-4 T, not 1.0000000000000002e-4. Factors: SI prefixes and the gauss (1 G = 1e-4 T),
 * c = 299792458 m/s, h = 6.62607015e-34 J s, k_B = 1.380649e-23 J/K, e = 1.602176634e-19 C, all
 * exact (SI Brochure, 9th ed., 2019). Quotients by h were computed with Python's fractions.Fraction
 * and float() (correctly rounded): `python3 -c "from fractions import Fraction as F; print(float(F('1e-30')/F('6.62607015e-34')))"`.
 */
import { describe, expect, it } from 'vitest';
import type { ValuePart } from '../../server/src/format/ast';
import { parseSetup } from '../../server/src/format/parser';
import { converterToSI, convertSI, readQuantity, type Dimension } from '../../server/src/format/units';
import { readQuantityArgument } from '../../server/src/format/quantityArgument';
import { BOLTZMANN_K, PLANCK_H } from '../../server/src/physics/constants';

function part(value: string): ValuePart {
  const p = parseSetup(`beam\n  source = ${value}`).blocks[0]?.settings[0]?.groups[0]?.[0];
  if (!p) throw new Error(`no part in ${value}`);
  return p;
}

function si(value: string, d: Dimension, scale?: number): number {
  const r = readQuantity(part(value), d, undefined, scale);
  if (r.problem) throw new Error(r.problem.message);
  return r.si!;
}

describe('a written quantity reads as the double nearest its exact SI value', () => {
  it.each([
    // Where the product of doubles read otherwise, it is in the comment; the rest were clean by luck and stay so.
    ['0.1 mT', 'flux-density', 1e-4],
    ['0.3 mT', 'flux-density', 3e-4],
    ['3 G', 'flux-density', 3e-4], // 3.0000000000000003e-4
    ['250 mG', 'flux-density', 2.5e-5],
    ['5 mK', 'temperature', 5e-3],
    ['7 uK', 'temperature', 7e-6],
    ['20 degC', 'temperature', 293.15],
    ['12 kHz', 'frequency-like', 12000],
    ['2.2 cm^-1', 'frequency-like', 65954340760], // 65954340760.00001
    ['2.2 cm', 'length', 0.022], // 0.022000000000000002
    ['3 G/cm', 'gradient', 0.03],
    ['1e-30 J', 'frequency-like', 1509.1901796421519], // 1509.190179642152, an ulp off
    ['0.7 ueV', 'frequency-like', 169259246.94594428], // 169259246.94594425, an ulp off
  ] as const)('%s', (text, d, expected) => {
    expect(si(text, d)).toBe(expected);
  });

  it('an uncertainty converts the same way: 0.35(2) mT is 3.5e-4 ± 2e-5 T', () => {
    const r = readQuantity(part('0.35(2) mT'), 'flux-density');
    expect(r.si).toBe(3.5e-4);
    expect(r.siUncertainty).toBe(2e-5);
  });

  it('a quantity read straight into joules (a trap cut) is one conversion: 3e-30 J stays 3e-30 J, 3 mK is 3e-3 × k_B exactly', () => {
    expect(si('3e-30 J', 'frequency-like', PLANCK_H)).toBe(3e-30); // through Hz and back: 3.0000000000000003e-30
    expect(si('1e-30 J', 'frequency-like', PLANCK_H)).toBe(1e-30);
    expect(si('3 mK', 'temperature', BOLTZMANN_K)).toBe(4.141947e-26); // 4.1419470000000005e-26
    expect(si('12 kHz', 'frequency-like', PLANCK_H)).toBe(7.95128418e-30);
  });

  it('a command-line quantity reads as the file does: --to 0.3 mT is 3e-4 T', () => {
    expect(readQuantityArgument('0.3 mT', 'flux-density', '--to').si).toBe(3e-4);
  });

  it('a data file column converts each cell once: 0.3 in mT is 3e-4 T', () => {
    const toT = converterToSI('flux-density', 'mT')!;
    expect([0.1, 0.3, 0.7].map(toT)).toEqual([1e-4, 3e-4, 7e-4]);
    expect(converterToSI('flux-density', 'cm')).toBeUndefined();
  });
});

describe('an SI value echoed in the written unit reads back as written', () => {
  it.each([
    [3e-4, 'flux-density', 'mT', 0.3],
    [1e-4, 'flux-density', 'mT', 0.1],
    [0.022, 'length', 'cm', 2.2], // 2.1999999999999997
    [293.15, 'temperature', 'degC', 20],
    [65954340760, 'frequency-like', 'cm^-1', 2.2],
    [6834696976, 'frequency-like', 'kHz', 6834696.976],
  ] as const)('%s in %s → %s', (value, d, unit, expected) => {
    expect(convertSI(value, d, unit)).toBe(expected);
  });

  it('what is not finite stays so (never a thrown error)', () => {
    expect(convertSI(Number.POSITIVE_INFINITY, 'flux-density', 'mT')).toBe(Number.POSITIVE_INFINITY);
    expect(Number.isNaN(convertSI(Number.NaN, 'temperature', 'degC'))).toBe(true);
  });
});

describe('the quick path never leaves the correctly rounded value', () => {
  it('a prefix is a shift of the written digits: n digits × 10^k read as the text `…e(k)` reads (ECMAScript Number is correctly rounded)', async () => {
    const { convertExactly, decimalOf, exactFactor } = await import('../../server/src/format/exactDecimal');
    // A fixed linear congruential sequence (Numerical Recipes' constants), so a failure replays.
    let seed = 12345;
    const next = (): number => (seed = (seed * 1664525 + 1013904223) % 4294967296) / 4294967296;
    const shifted = (v: number, k: number): number => {
      const [m, e = '0'] = String(v).split('e');
      return Number(`${m}e${Number(e) + k}`);
    };
    let checked = 0;
    for (const k of [-6, -4, -3, -2, 2, 3, 9]) {
      const f = exactFactor(decimalOf(Number(`1e${k}`)));
      for (let i = 0; i < 4000; i++) {
        // 1 to 17 significant digits over 40 decades, either sign: 16- and 17-digit values take the exact path.
        const v = (next() < 0.5 ? -1 : 1) * Number((next() * 10 ** Math.floor(next() * 40 - 20)).toPrecision(1 + Math.floor(next() * 17)));
        if (v === 0) continue;
        expect(convertExactly(v, f)).toBe(shifted(v, k));
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(27000);
  });
});
