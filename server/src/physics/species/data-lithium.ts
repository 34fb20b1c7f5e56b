/** Lithium-6 and lithium-7: 2s ground level and the 2p D-line levels. */
import { energy, GROUND_ENERGY, mhz, ns, sourced } from './build-helpers';
import { LI7_2P12_INTERVAL, LI_D1_ISOTOPE_SHIFT, LI_FINE_STRUCTURE_REVIEW } from './measurements';
import { ARIMONDO, FROM_MEMORY, GEHM_LI6, IAEA_MOMENTS, NIST_MASSES, READ_IN_MEASUREMENT } from './sources';
import type { BuiltinSpecies } from './types';

/**
 * The four D-line centroids (MHz) as one consistent set: one absolute frequency, the ⁷Li D1 line (recalled;
 * no page printing an absolute lithium frequency could be read), and the read differences: the D1 isotope
 * shift and the two 2P fine-structure intervals. The compilation's ⁶Li lines (446.789634 and 446.799677 THz)
 * are not used: their difference, 10 043 MHz, is 10 MHz from the measured ⁶Li fine structure, and the ⁶Li D1
 * sits 38 MHz above ⁷Li D1 minus the measured isotope shift (docs/species-data.md).
 */
const LI7_D1_MHZ = 446800129.853;
const LI_D1_ISOTOPE_SHIFT_MHZ = 10533.8;
const LI6_FINE_STRUCTURE_MHZ = 10052.954;
const LI7_FINE_STRUCTURE_MHZ = 10053.154;
/** Sum rounded to the kHz, the last digit of the recalled anchor, so no binary noise reaches the published value. */
const kHzSum = (a: number, b: number): number => Math.round((a + b) * 1e3) / 1e3;
const LI6_D1_MHZ = kHzSum(LI7_D1_MHZ, -LI_D1_ISOTOPE_SHIFT_MHZ);
const LI_LINES = {
  li7D1: energy(LI7_D1_MHZ, 'MHz', FROM_MEMORY),
  li7D2: energy(kHzSum(LI7_D1_MHZ, LI7_FINE_STRUCTURE_MHZ), 'MHz', `derived: ⁷Li D1 (from memory) plus the ⁷Li 2P fine structure; ${LI_FINE_STRUCTURE_REVIEW}`),
  li6D1: energy(LI6_D1_MHZ, 'MHz', `derived: ⁷Li D1 (from memory) minus the D1 isotope shift; ${LI_D1_ISOTOPE_SHIFT}`),
  li6D2: energy(kHzSum(LI6_D1_MHZ, LI6_FINE_STRUCTURE_MHZ), 'MHz', `derived: ⁶Li D1 (derived above) plus the ⁶Li 2P fine structure; ${LI_FINE_STRUCTURE_REVIEW}`),
};

// Uncertainties marked FROM_MEMORY (fourth argument) were recalled from the cited compilation,
// not read while this was written; docs/species-data.md lists them.
const LI_GJ_GROUND = sourced(2.0023010, ARIMONDO, 7e-7, FROM_MEMORY);
const LI_GJ_P12 = sourced(0.6668, FROM_MEMORY);
const LI_GJ_P32 = sourced(1.335, FROM_MEMORY);
const LI7_2P12_SPREAD =
  'half the distance to the saturated-absorption value A = 46.047(3) MHz, arXiv:1008.3228 (2010), abstract, rounded ' +
  'up, so that both read measurements lie within twice the combined uncertainty';
// Measured on 6Li; the isotope changes the 2P lifetime by far less than its 9 ps uncertainty.
const LI7_TAU_2P = sourced(27.102e-9, `${GEHM_LI6}, 6Li value (isotope difference negligible)`);

export const LITHIUM_6: BuiltinSpecies = {
  id: 'Li6',
  aliases: ['6Li', 'Li-6', '⁶Li', 'lithium-6'],
  element: 'Li',
  Z: 3,
  massNumber: 6,
  massU: sourced(6.0151228874, NIST_MASSES),
  twoI: sourced(2, GEHM_LI6),
  muI: sourced(0.8220428, IAEA_MOMENTS),
  gI: sourced(-0.00044765403, ARIMONDO, 3e-10, FROM_MEMORY),
  levels: [
    {
      key: 'ground',
      designation: '2s 2S1/2',
      A: mhz(152.1368407, GEHM_LI6, 0.000002, FROM_MEMORY),
      gJ: LI_GJ_GROUND,
      energyHz: GROUND_ENERGY,
    },
    {
      key: 'P1/2',
      designation: '2p 2P°1/2',
      A: mhz(17.386, GEHM_LI6, 0.031, FROM_MEMORY),
      gJ: LI_GJ_P12,
      ...LI_LINES.li6D1,
      lifetimeS: ns(27.102, GEHM_LI6),
    },
    {
      key: 'P3/2',
      designation: '2p 2P°3/2',
      A: mhz(-1.155, GEHM_LI6, 0.008, FROM_MEMORY),
      B: mhz(-0.10, GEHM_LI6, 0.14, FROM_MEMORY),
      gJ: LI_GJ_P32,
      ...LI_LINES.li6D2,
      lifetimeS: ns(27.102, GEHM_LI6),
    },
  ],
  notes: 'Ground splitting check value 228.2052590(30) MHz (from memory).',
};

export const LITHIUM_7: BuiltinSpecies = {
  id: 'Li7',
  aliases: ['7Li', 'Li-7', '⁷Li', 'lithium-7'],
  element: 'Li',
  Z: 3,
  massNumber: 7,
  massU: sourced(7.0160034366, NIST_MASSES),
  twoI: sourced(3, IAEA_MOMENTS),
  muI: sourced(3.256407, IAEA_MOMENTS),
  gI: sourced(-0.0011822136, ARIMONDO),
  levels: [
    {
      key: 'ground',
      designation: '2s 2S1/2',
      A: mhz(401.7520433, ARIMONDO, 0.0000005, FROM_MEMORY),
      gJ: LI_GJ_GROUND,
      energyHz: GROUND_ENERGY,
    },
    {
      key: 'P1/2',
      designation: '2p 2P°1/2',
      // Interval F=2–F=1 equals 2A for I = 3/2, J = 1/2. The interval's own 5 kHz is not the uncertainty stored:
      // another measurement, 46.047(3) MHz, lies 0.1105 MHz away, and 0.056 MHz puts both within 2u.
      A: mhz(91.873 / 2, LI7_2P12_INTERVAL, 0.056, LI7_2P12_SPREAD),
      gJ: LI_GJ_P12,
      ...LI_LINES.li7D1,
      lifetimeS: LI7_TAU_2P,
    },
    {
      key: 'P3/2',
      designation: '2p 2P°3/2',
      A: mhz(-3.055, FROM_MEMORY, 0.014, READ_IN_MEASUREMENT),
      B: mhz(-0.221, FROM_MEMORY, 0.029, READ_IN_MEASUREMENT),
      gJ: LI_GJ_P32,
      ...LI_LINES.li7D2,
      lifetimeS: LI7_TAU_2P,
    },
  ],
  notes: 'Ground splitting check value 803.5040866(10) MHz (from memory).',
};
