/**
 * The four lithium D-line centroids stored in the species table, held to the measured differences between
 * them: the ⁷Li − ⁶Li isotope shift of the D1 line and the 2P fine structure of each isotope. Each check names
 * where the number was read (search tool, abstracts); agreement is within twice the combined uncertainty.
 * The table is derived from these very differences (data-lithium.ts), so the first two checks guard the
 * derivation (a typo, a changed anchor or sign), not the sources; the last one is independent of them.
 */
import { describe, expect, it } from 'vitest';
import { vacuumWavelengthNmText } from '../../server/src/eval/wavelengthText';
import { level, num } from '../fixtures/builtinLookup';

const MHZ = 1e6;
const line = (id: string, key: string): number => num(level(id, key).energyHz, `${id} ${key}`) / MHZ;

const isotopeShiftD1 = (): number => line('Li7', 'P1/2') - line('Li6', 'P1/2');
const isotopeShiftD2 = (): number => line('Li7', 'P3/2') - line('Li6', 'P3/2');
const fineStructure = (id: string): number => line(id, 'P3/2') - line(id, 'P1/2');

/** |implied − published| ≤ 2σ, σ the published uncertainty (the stored differences carry none of their own). */
function within2Sigma(implied: number, published: number, sigma: number): void {
  expect(Math.abs(implied - published)).toBeLessThanOrEqual(2 * sigma);
}

describe('lithium D lines: the differences implied by the table', () => {
  it('D1 isotope shift 10 533.800(15) MHz (doctoral dissertation, National Tsing Hua University, 2018, abstract)', () => {
    within2Sigma(isotopeShiftD1(), 10533.8, 0.015);
  });

  it.each([
    // Critical review of the lithium fine-structure data (2009), abstract (yorku.ca/wlaser publication list).
    ['Li6', 10052.954, 0.049],
    ['Li7', 10053.154, 0.04],
  ] as const)('%s 2P fine structure %s ± %s MHz (2009 critical review, abstract)', (id, published, sigma) => {
    within2Sigma(fineStructure(id), published, sigma);
  });

  it('the isotope shifts of both lines agree with the calculation of Phys. Rev. A 61, 022504 (2000)', () => {
    // Abstract (scholar.uwindsor.ca): 10 534.31(61) MHz (D1) and 10 534.70(61) MHz (D2), with the nuclear charge
    // radii of electron scattering; independent of the measurements the table is built from.
    const measuredU = Math.hypot(0.015, 0.049, 0.04);
    expect(Math.abs(isotopeShiftD1() - 10534.31)).toBeLessThanOrEqual(2 * Math.hypot(0.61, 0.015));
    expect(Math.abs(isotopeShiftD2() - 10534.7)).toBeLessThanOrEqual(2 * Math.hypot(0.61, measuredU));
  });

  it('no longer pairs the recalled ⁷Li D1 with the compilation ⁶Li lines, which miss both differences', () => {
    // The 6Li compilation (2003) prints 446.789634 and 446.799677 THz: their difference, 10 043 MHz, is ~200σ from
    // the reviewed ⁶Li fine structure, and 446.789634 THz sits 38 MHz above ⁷Li D1 − the measured isotope shift.
    expect(Math.abs(line('Li6', 'P1/2') - 446789634)).toBeGreaterThan(30);
    expect(Math.abs(line('Li6', 'P3/2') - 446799677)).toBeGreaterThan(20);
  });

  it('the recalled anchor carries a stated, generous 1 MHz; the derived lines add their read differences in quadrature', () => {
    // No page printing an absolute lithium D-line frequency could be read. arXiv:1212.2220 (2012), abstract, states
    // absolute frequencies to ≤ 25 kHz and line-centre shifts of up to 1 MHz from the line-shape model: the anchor's
    // 1 MHz (from memory, generous) is 40 times the former and covers the latter.
    const u = (id: string, key: string): number => (level(id, key).energyHz?.uncertainty ?? Number.NaN) / MHZ;
    expect(u('Li7', 'P1/2')).toBe(1);
    expect(level('Li7', 'P1/2').energyHz?.uncertaintySource).toMatch(/^from memory, chosen generously: .*arXiv:1212\.2220 \(2012\)/);
    expect(u('Li7', 'P1/2') / 0.025).toBeGreaterThanOrEqual(40);
    expect(u('Li7', 'P3/2')).toBeCloseTo(Math.hypot(1, 0.04), 12);
    expect(u('Li6', 'P1/2')).toBeCloseTo(Math.hypot(1, 0.015), 12);
    expect(u('Li6', 'P3/2')).toBeCloseTo(Math.hypot(1, 0.015, 0.049), 12);
    for (const [id, key] of [['Li7', 'P3/2'], ['Li6', 'P1/2'], ['Li6', 'P3/2']] as const) {
      expect(level(id, key).energyHz?.uncertaintySource, `${id} ${key}`).toMatch(/^the ⁷Li D1 anchor's 1 MHz \(from memory, generous; common to all four built-in lithium lines: .*\) and .* \(read\), in quadrature$/);
    }
  });

  it('a wavelength computed from a lithium line prints the line uncertainty (it printed 670.961561 nm bare before)', () => {
    const e = level('Li7', 'P3/2').energyHz;
    // λ = c/ν = 670.96156 nm, u(λ) = λ u(ν)/ν = 1.5e-6 nm.
    expect(vacuumWavelengthNmText(num(e, 'Li7 D2'), e?.uncertainty, 9)).toBe('670.9615613(15) nm');
  });

  it('keeps the ⁷Li D1 line the table is anchored on (recalled) and derives the other three from it', () => {
    expect(line('Li7', 'P1/2')).toBeCloseTo(446800129.853, 3);
    expect(level('Li7', 'P1/2').energyHz?.source).toBe('from memory');
    for (const [id, key] of [['Li7', 'P3/2'], ['Li6', 'P1/2'], ['Li6', 'P3/2']] as const) {
      expect(level(id, key).energyHz?.source, `${id} ${key}`).toMatch(/^derived: .*\((?:19|20)\d\d\)/);
    }
  });
});
