/** Lithium-6 and lithium-7: 2s ground level and the 2p D-line levels. */
import { energyFromParts, GROUND_ENERGY, mhz, ns, sourced } from './build-helpers';
import { LI7_2P12_INTERVAL, LI_D1_ISOTOPE_SHIFT, LI_D_LINES_COMB, LI_FINE_STRUCTURE_REVIEW } from './measurements';
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
/**
 * Standard uncertainty given to the recalled anchor, MHz: 40 times what the comb measurements claim, so that a
 * misremembered kHz digit or a line-shape model that left out quantum interference (up to 1 MHz) stays inside it.
 */
const LI7_D1_U_MHZ = 1;
const LI7_D1_U_SOURCE =
  `from memory, chosen generously: 40 times the comb measurements' stated ≤ 25 kHz, and as large as the line-centre ` +
  `shifts their line-shape analysis corrects; ${LI_D_LINES_COMB}`;
const LI_D1_ISOTOPE_SHIFT_MHZ = 10533.8;
const LI6_FINE_STRUCTURE_MHZ = 10052.954;
const LI7_FINE_STRUCTURE_MHZ = 10053.154;
/** Published standard uncertainties of the three read differences, MHz (measurements.ts). */
const LI_D1_ISOTOPE_SHIFT_U_MHZ = 0.015;
const LI6_FINE_STRUCTURE_U_MHZ = 0.049;
const LI7_FINE_STRUCTURE_U_MHZ = 0.04;
/** Sum rounded to the kHz, the last digit of the recalled anchor, so no binary noise reaches the published value. */
const kHzSum = (a: number, b: number): number => Math.round((a + b) * 1e3) / 1e3;
/**
 * The independently uncertain pieces the four lines are built from, MHz. Each is one uncertain input wherever it
 * enters: the anchor's 1 MHz is common to all four lines and cancels in any difference of two of them (an isotope
 * shift, a fine structure), which is then known to the read 15–50 kHz, not to √2 MHz.
 */
const PART = {
  anchor: { key: 'Li7.D1', label: '⁷Li D1 frequency, the anchor of the built-in lithium D lines', value: LI7_D1_MHZ, u: LI7_D1_U_MHZ, sign: 1 },
  isotopeShift: { key: 'Li.D1-isotope-shift', label: '⁷Li − ⁶Li D1 isotope shift (built-in)', value: LI_D1_ISOTOPE_SHIFT_MHZ, u: LI_D1_ISOTOPE_SHIFT_U_MHZ, sign: -1 },
  li7Fine: { key: 'Li7.2P-fine-structure', label: '⁷Li 2P fine structure (built-in)', value: LI7_FINE_STRUCTURE_MHZ, u: LI7_FINE_STRUCTURE_U_MHZ, sign: 1 },
  li6Fine: { key: 'Li6.2P-fine-structure', label: '⁶Li 2P fine structure (built-in)', value: LI6_FINE_STRUCTURE_MHZ, u: LI6_FINE_STRUCTURE_U_MHZ, sign: 1 },
} as const;
const SHARED_ANCHOR =
  'common to all four built-in lithium lines: one input wherever it enters, so it cancels in a difference of two of them';
const combinedSource = (what: string): string =>
  `the ⁷Li D1 anchor's ${LI7_D1_U_MHZ} MHz (from memory, generous; ${SHARED_ANCHOR}) and ${what} (read), in quadrature`;
const LI6_D1_MHZ = kHzSum(LI7_D1_MHZ, -LI_D1_ISOTOPE_SHIFT_MHZ);
const LI_LINES = {
  li7D1: energyFromParts(LI7_D1_MHZ, 'MHz', FROM_MEMORY, `${LI7_D1_U_SOURCE}; ${SHARED_ANCHOR}`, [PART.anchor]),
  li7D2: energyFromParts(
    kHzSum(LI7_D1_MHZ, LI7_FINE_STRUCTURE_MHZ),
    'MHz',
    `derived: ⁷Li D1 (from memory) plus the ⁷Li 2P fine structure; ${LI_FINE_STRUCTURE_REVIEW}`,
    combinedSource(`the ⁷Li fine structure's ${LI7_FINE_STRUCTURE_U_MHZ} MHz`),
    [PART.anchor, PART.li7Fine],
  ),
  li6D1: energyFromParts(
    LI6_D1_MHZ,
    'MHz',
    `derived: ⁷Li D1 (from memory) minus the D1 isotope shift; ${LI_D1_ISOTOPE_SHIFT}`,
    combinedSource(`the isotope shift's ${LI_D1_ISOTOPE_SHIFT_U_MHZ} MHz`),
    [PART.anchor, PART.isotopeShift],
  ),
  li6D2: energyFromParts(
    kHzSum(LI6_D1_MHZ, LI6_FINE_STRUCTURE_MHZ),
    'MHz',
    `derived: ⁶Li D1 (derived above) plus the ⁶Li 2P fine structure; ${LI_FINE_STRUCTURE_REVIEW}`,
    combinedSource(`the isotope shift's ${LI_D1_ISOTOPE_SHIFT_U_MHZ} MHz and the ⁶Li fine structure's ${LI6_FINE_STRUCTURE_U_MHZ} MHz`),
    [PART.anchor, PART.isotopeShift, PART.li6Fine],
  ),
};

// Uncertainties marked FROM_MEMORY (fourth argument) were recalled from the cited compilation,
// not read while this was written; docs/species-data.md lists them.
const LI_GJ_GROUND = sourced(2.0023010, ARIMONDO, 7e-7, FROM_MEMORY);
const LI_GJ_P12 = sourced(0.6668, FROM_MEMORY);
const LI_GJ_P32 = sourced(1.335, FROM_MEMORY);
const LI7_2P12_SPREAD =
  'half the distance to the saturated-absorption value A = 46.047(3) MHz, arXiv:1008.3228 (2010), abstract, rounded ' +
  'up, so that both read measurements lie within twice the combined uncertainty';
/**
 * The ⁷Li 2P lifetime is the ⁶Li measurement's: no ⁷Li (or both-isotope) measurement could be read. τ ∝ 1/(ω³|d|²),
 * so the isotope moves it by 3·Δν/ν = 7.1e-5 (the read D1 isotope shift over the line), partly undone by the reduced-mass
 * scaling of |d|², about 2.6e-5: under 1e-4, i.e. under 3 ps against the measurement's 9 ps
 * (tests/physics/speciesReadValues.test.ts).
 */
const LI7_TAU_2P = ns(
  27.102,
  `derived: the ⁶Li 2P lifetime of ${GEHM_LI6}, taken for ⁷Li: the isotope changes it by under 1e-4 (3Δν/ν = 7.1e-5 from ` +
    'ω³ with the read D1 isotope shift, partly undone by the reduced-mass scaling of the dipole matrix element, ≈ 2.6e-5), ' +
    "under 3 ps against the measurement's 9 ps (from memory)",
);

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
