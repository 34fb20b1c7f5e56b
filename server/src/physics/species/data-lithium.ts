/** Lithium-6 and lithium-7: 2s ground level and the 2p D-line levels. */
import { energy, GROUND_ENERGY, mhz, ns, sourced } from './build-helpers';
import { ARIMONDO, FROM_MEMORY, GEHM_LI6, IAEA_MOMENTS, NIST_MASSES, READ_IN_MEASUREMENT } from './sources';
import type { BuiltinSpecies } from './types';

// Uncertainties marked FROM_MEMORY (fourth argument) were recalled from the cited compilation,
// not read while this was written; docs/species-data.md lists them.
const LI_GJ_GROUND = sourced(2.0023010, ARIMONDO, 7e-7, FROM_MEMORY);
const LI_GJ_P12 = sourced(0.6668, FROM_MEMORY);
const LI_GJ_P32 = sourced(1.335, FROM_MEMORY);
// Measured on 6Li; the isotope changes the 2P lifetime by far less than its 9 ps uncertainty.
const LI7_TAU_2P = sourced(27.102e-9, `${GEHM_LI6}, 6Li value (isotope difference negligible)`);
const LI7_LINES =
  FROM_MEMORY;

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
      ...energy(446.789634, 'THz', GEHM_LI6),
      vacuumWavelengthNm: sourced(670.992421, GEHM_LI6),
      lifetimeS: ns(27.102, GEHM_LI6),
    },
    {
      key: 'P3/2',
      designation: '2p 2P°3/2',
      A: mhz(-1.155, GEHM_LI6, 0.008, FROM_MEMORY),
      B: mhz(-0.10, GEHM_LI6, 0.14, FROM_MEMORY),
      gJ: LI_GJ_P32,
      ...energy(446.799677, 'THz', GEHM_LI6),
      vacuumWavelengthNm: sourced(670.977338, GEHM_LI6),
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
      // Interval F=2–F=1 equals 2A for I = 3/2, J = 1/2.
      A: mhz(91.873 / 2, FROM_MEMORY, 0.005 / 2, READ_IN_MEASUREMENT),
      gJ: LI_GJ_P12,
      ...energy(446.800132, 'THz', LI7_LINES),
      lifetimeS: LI7_TAU_2P,
    },
    {
      key: 'P3/2',
      designation: '2p 2P°3/2',
      A: mhz(-3.055, FROM_MEMORY, 0.014, READ_IN_MEASUREMENT),
      B: mhz(-0.221, FROM_MEMORY, 0.029, READ_IN_MEASUREMENT),
      gJ: LI_GJ_P32,
      ...energy(446.810184, 'THz', LI7_LINES),
      lifetimeS: LI7_TAU_2P,
    },
  ],
  notes: 'Ground splitting check value 803.5040866(10) MHz (from memory).',
};
