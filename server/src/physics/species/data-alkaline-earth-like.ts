/**
 * Two-electron clock species: 87Sr and 88Sr, 171Yb and 174Yb, 40Ca. Ground 1S0 plus the
 * clock (3P0) and intercombination (3P1) levels; 87Sr also its metastable 3P2.
 */
import { derivedNuclearG, energy, energyFromParts, GROUND_ENERGY, mhz, sourced } from './build-helpers';
import { SR87_3P2_BEAM, SR87_CLOCK, SR88_INTERCOMBINATION, SR_CLOCK_ISOTOPE_SHIFT } from './measurements';
import {
  CHEMLIN_SR87,
  CHEMLIN_YB171_SPIN,
  FROM_MEMORY,
  IAEA_MOMENTS_MEMORY,
  NIST_ASD_MEMORY,
  NIST_MASSES,
} from './sources';
import type { BuiltinSpecies } from './types';

// 88Sr 1S0–3P1 frequency (10 kHz).
const SR_3P1_KHZ = 434829121311;
/**
 * ⁸⁷Sr 1S0–3P1 (hyperfine centroid): the ⁸⁸Sr line minus the ⁸⁸Sr − ⁸⁷Sr isotope shift of the clock line, 62 188.134004 kHz.
 * No readable page prints the 689 nm line's own shift; both lines go from 5s² to the same 5s5p ³P term, so their mass and
 * field shifts differ only through the J-dependence of the ³P wavefunction. Rounded to the Hz, the sum's last digit.
 */
const SR87_3P1_KHZ = Math.round((SR_3P1_KHZ - 62188.134004) * 1e3) / 1e3;
/** Bounds the difference between the 689 nm and clock-line isotope shifts. */
const SR87_3P1_SHIFT_BOUND_KHZ = 1000;
const SR87_3P1_SHIFT_BOUND =
  'from memory: the 689 nm and 698 nm lines\' ⁸⁸Sr − ⁸⁷Sr isotope shifts agree to far better than 1 MHz (same 5s² → 5s5p ³P term); ' +
  'in quadrature with the ⁸⁸Sr line\'s 10 kHz (read), which the ⁸⁸Sr 3P1 level shares as one input; the clock shift\'s own 10 mHz is left out';
/**
 * The pieces of the two 3P1 energies, kHz: the ⁸⁸Sr line enters both, so a ⁸⁸Sr − ⁸⁷Sr difference of the built-in lines
 * carries only the 1 MHz bound. The clock shift's 10 mHz (1e-8 of the bound) is not a piece.
 */
const SR_3P1_PART = {
  sr88Line: { key: 'Sr88.3P1', label: '⁸⁸Sr 1S0–3P1 frequency (built-in)', value: SR_3P1_KHZ, u: 10, sign: 1 },
  shift: {
    key: 'Sr87.3P1-isotope-shift',
    label: '⁸⁸Sr − ⁸⁷Sr isotope shift of the 689 nm line, taken from the clock line (built-in)',
    value: 62188.134004,
    u: SR87_3P1_SHIFT_BOUND_KHZ,
    sign: -1,
  },
} as const;
const CIPM_2009 = 'CIPM Recommendation 2 (2009), recommended standard frequencies';
const SR87_3P1_MEMORY = FROM_MEMORY;
const TAU_SR_3P1 = sourced(21.28e-6, FROM_MEMORY);
// Read value; the recalled −1.093603 it replaces was 4σ away (docs/species-data.md).
const SR87_MU = sourced(-1.09316, CHEMLIN_SR87, 0.00011);
const YB171_MU = sourced(0.49367, IAEA_MOMENTS_MEMORY);
const YB_3P1_CM = 17992.007;

export const STRONTIUM_87: BuiltinSpecies = {
  id: 'Sr87',
  aliases: ['87Sr', 'Sr-87', '⁸⁷Sr', 'strontium-87'],
  element: 'Sr',
  Z: 38,
  massNumber: 87,
  massU: sourced(86.9088775, NIST_MASSES),
  twoI: sourced(9, CHEMLIN_SR87),
  muI: SR87_MU,
  gI: derivedNuclearG(SR87_MU, 9),
  levels: [
    { key: 'ground', designation: '5s2 1S0', energyHz: GROUND_ENERGY },
    { key: '3P0', designation: '5s 5p 3P°0', ...energy(429228004229873.082, 'Hz', SR87_CLOCK, 0.076) },
    {
      key: '3P1',
      designation: '5s 5p 3P°1',
      A: mhz(-260.084, SR87_3P1_MEMORY),
      B: mhz(-35.658, SR87_3P1_MEMORY),
      // The ⁸⁸Sr line shifted by the clock line's isotope shift; the stored 1 MHz bounds how far the 689 nm line's own shift may differ.
      ...energyFromParts(
        SR87_3P1_KHZ,
        'kHz',
        `derived: ⁸⁸Sr 1S0–3P1 minus the clock line's ⁸⁸Sr − ⁸⁷Sr isotope shift; ${SR88_INTERCOMBINATION}; ${SR_CLOCK_ISOTOPE_SHIFT}`,
        SR87_3P1_SHIFT_BOUND,
        [SR_3P1_PART.sr88Line, SR_3P1_PART.shift],
      ),
      lifetimeS: TAU_SR_3P1,
    },
    {
      key: '3P2',
      designation: '5s 5p 3P°2',
      // Negative: the page drops the sign, the intervals it prints need it (measurements.ts).
      A: mhz(-212.765, SR87_3P2_BEAM, 0.001),
      B: mhz(67.215, SR87_3P2_BEAM, 0.015),
      ...energy(14898.545, 'cm-1', NIST_ASD_MEMORY),
    },
  ],
  notes: 'Clock isotope with I = 9/2; the 1S0 ground level has only the nuclear Zeeman effect. The 3P1 energy is the 88Sr value minus the clock line\'s 62.188 MHz isotope shift (±1 MHz for the difference between the two lines\' shifts).',
};

export const STRONTIUM_88: BuiltinSpecies = {
  id: 'Sr88',
  aliases: ['88Sr', 'Sr-88', '⁸⁸Sr', 'strontium-88'],
  element: 'Sr',
  Z: 38,
  massNumber: 88,
  massU: sourced(87.9056125, NIST_MASSES),
  twoI: sourced(0, 'even–even nucleus, I = 0 (IAEA nuclear moments table lists no moment)'),
  levels: [
    { key: 'ground', designation: '5s2 1S0', energyHz: GROUND_ENERGY },
    { key: '3P0', designation: '5s 5p 3P°0', ...energy(429228066418012, 'Hz', `${CIPM_2009}: 88Sr 1S0–3P0`) },
    { key: '3P1', designation: '5s 5p 3P°1', ...energyFromParts(SR_3P1_KHZ, 'kHz', SR88_INTERCOMBINATION, undefined, [SR_3P1_PART.sr88Line]), lifetimeS: TAU_SR_3P1 },
  ],
};

export const YTTERBIUM_171: BuiltinSpecies = {
  id: 'Yb171',
  aliases: ['171Yb', 'Yb-171', '¹⁷¹Yb', 'ytterbium-171'],
  element: 'Yb',
  Z: 70,
  massNumber: 171,
  massU: sourced(170.9363302, 'AME2016/AME2020 relative atomic mass, as in current isotopic-composition tables'),
  twoI: sourced(1, CHEMLIN_YB171_SPIN),
  muI: YB171_MU,
  gI: derivedNuclearG(YB171_MU, 1),
  levels: [
    { key: 'ground', designation: '4f14 6s2 1S0', energyHz: GROUND_ENERGY },
    { key: '3P0', designation: '4f14 6s 6p 3P°0', ...energy(518295836590864, 'Hz', `${CIPM_2009}: 171Yb 1S0–3P0`) },
    {
      key: '3P1',
      designation: '4f14 6s 6p 3P°1',
      A: mhz(3957.19, FROM_MEMORY),
      ...energy(YB_3P1_CM, 'cm-1', NIST_ASD_MEMORY),
      lifetimeS: sourced(870e-9, FROM_MEMORY),
    },
  ],
  notes: 'Clock and qubit isotope with I = 1/2; no quadrupole structure.',
};

export const YTTERBIUM_174: BuiltinSpecies = {
  id: 'Yb174',
  aliases: ['174Yb', 'Yb-174', '¹⁷⁴Yb', 'ytterbium-174'],
  element: 'Yb',
  Z: 70,
  massNumber: 174,
  massU: sourced(173.9388664, 'AME2016/AME2020 relative atomic mass, as in current isotopic-composition tables'),
  twoI: sourced(0, 'even–even nucleus, I = 0 (IAEA nuclear moments table lists no moment)'),
  levels: [
    { key: 'ground', designation: '4f14 6s2 1S0', energyHz: GROUND_ENERGY },
    { key: '3P1', designation: '4f14 6s 6p 3P°1', ...energy(YB_3P1_CM, 'cm-1', NIST_ASD_MEMORY), lifetimeS: sourced(870e-9, FROM_MEMORY) },
  ],
};

export const CALCIUM_40: BuiltinSpecies = {
  id: 'Ca40',
  aliases: ['40Ca', 'Ca-40', '⁴⁰Ca', 'calcium-40'],
  element: 'Ca',
  Z: 20,
  massNumber: 40,
  massU: sourced(39.962590863, NIST_MASSES),
  twoI: sourced(0, 'even–even nucleus, I = 0 (IAEA nuclear moments table lists no moment)'),
  levels: [
    { key: 'ground', designation: '4s2 1S0', energyHz: GROUND_ENERGY },
    {
      key: '3P1',
      designation: '4s 4p 3P°1',
      ...energy(455986240494.15, 'kHz', FROM_MEMORY),
      // Natural width of the 657 nm intercombination line Γ/2π ≈ 374 Hz, so τ = 1/(2π·374 Hz).
      lifetimeS: sourced(1 / (2 * Math.PI * 374), FROM_MEMORY),
    },
  ],
};
