/** Rubidium-85 and -87: 5s ground level and the 5p D-line levels. */
import { energy, GROUND_ENERGY, mhz, ns, sourced } from './build-helpers';
import { IAEA_MOMENTS, NIST_MASSES, STECK_RB85, STECK_RB87 } from './sources';
import { FROM_MEMORY } from './sources';
import { RB_D1_HYPERFINE_2016 } from './measurements';
import type { BuiltinSpecies } from './types';

export const RUBIDIUM_85: BuiltinSpecies = {
  id: 'Rb85',
  aliases: ['85Rb', 'Rb-85', '⁸⁵Rb', 'rubidium-85'],
  element: 'Rb',
  Z: 37,
  massNumber: 85,
  massU: sourced(84.9117897379, NIST_MASSES),
  twoI: sourced(5, STECK_RB85),
  muI: sourced(1.3530562, IAEA_MOMENTS),
  // Uncertainties as the compilation's tables print them (rev. 2.1.6, Tables 5 and 6).
  gI: sourced(-0.00029364, STECK_RB85, 6.0e-10),
  levels: [
    {
      key: 'ground',
      designation: '5s 2S1/2',
      A: mhz(1011.910813, STECK_RB85, 0.000002),
      gJ: sourced(2.00233113, STECK_RB85, 0.0000002),
      energyHz: GROUND_ENERGY,
    },
    {
      key: 'P1/2',
      designation: '5p 2P°1/2',
      A: mhz(120.527, STECK_RB85, 0.056),
      gJ: sourced(0.666, STECK_RB85),
      ...energy(377.10738569, 'THz', STECK_RB85, 0.000000046, FROM_MEMORY),
      vacuumWavelengthNm: sourced(794.979014933, STECK_RB85),
      lifetimeS: ns(27.679, STECK_RB85),
    },
    {
      key: 'P3/2',
      designation: '5p 2P°3/2',
      // Held to the ⁸⁷Rb values scaled by the nuclear moments (tests/physics/species.test.ts).
      A: mhz(25.002, STECK_RB85, 0.0099),
      B: mhz(25.79, STECK_RB85, 0.093),
      gJ: sourced(1.3362, STECK_RB85, 0.0013),
      ...energy(384.230406373, 'THz', STECK_RB85, 0.000000014, FROM_MEMORY),
      vacuumWavelengthNm: sourced(780.241368271, STECK_RB85),
      lifetimeS: ns(26.2348, STECK_RB85),
    },
  ],
  notes: 'Ground splitting check value 3 035 732 440(3) Hz (1976 measurement, public hyperfine-splitting table).',
};

export const RUBIDIUM_87: BuiltinSpecies = {
  id: 'Rb87',
  aliases: ['87Rb', 'Rb-87', '⁸⁷Rb', 'rubidium-87'],
  element: 'Rb',
  Z: 37,
  massNumber: 87,
  massU: sourced(86.909180531, NIST_MASSES),
  twoI: sourced(3, STECK_RB87),
  muI: sourced(2.751292, IAEA_MOMENTS),
  // Uncertainties marked FROM_MEMORY (fourth argument) were recalled from the compilation, not read.
  gI: sourced(-0.0009951414, STECK_RB87, 1.0e-9, FROM_MEMORY),
  // Uncertainties of A and B as the cited compilation's hyperfine-constant table gives them (its
  // revision 2.3); the values carry the same digits as here. To be confirmed against the
  // compilation itself (docs/species-data.md).
  levels: [
    {
      key: 'ground',
      designation: '5s 2S1/2',
      A: mhz(3417.341305452145, STECK_RB87, 0.000000000045),
      gJ: sourced(2.00233113, STECK_RB87, 2.0e-7, FROM_MEMORY),
      energyHz: GROUND_ENERGY,
    },
    {
      key: 'P1/2',
      designation: '5p 2P°1/2',
      // The read measurement replaces the recalled 408.328(15) MHz (0.5σ away), an older value of the same laboratory.
      A: mhz(408.34, RB_D1_HYPERFINE_2016, 0.019),
      gJ: sourced(0.666, STECK_RB87),
      ...energy(377.10746338, 'THz', STECK_RB87, 0.000000011, FROM_MEMORY),
      vacuumWavelengthNm: sourced(794.978851156, 'derived: λ = c/ν from the D1 frequency above and the exact SI c, to its 12 digits'),
      lifetimeS: ns(27.679, STECK_RB87),
    },
    {
      key: 'P3/2',
      designation: '5p 2P°3/2',
      A: mhz(84.7185, STECK_RB87, 0.002),
      B: mhz(12.4965, STECK_RB87, 0.0037),
      gJ: sourced(1.3362, STECK_RB87, 0.0013, FROM_MEMORY),
      ...energy(384.2304844685, 'THz', STECK_RB87, 0.0000000062, FROM_MEMORY),
      vacuumWavelengthNm: sourced(780.241209686, STECK_RB87),
      lifetimeS: ns(26.2348, STECK_RB87),
    },
  ],
  notes: 'Ground splitting check value 6 834 682 610.904 Hz (2003 fountain measurement, public hyperfine-splitting table).',
};
