/** Sodium-23: 3s ground level and the 3p D-line levels. */
import { energy, GROUND_ENERGY, mhz, ns, sourced } from './build-helpers';
import { FROM_MEMORY, IAEA_MOMENTS, NIST_MASSES, STECK_NA } from './sources';
import type { BuiltinSpecies } from './types';

export const SODIUM_23: BuiltinSpecies = {
  id: 'Na23',
  aliases: ['23Na', 'Na-23', '²³Na', 'sodium-23', 'Na', 'sodium'],
  element: 'Na',
  Z: 11,
  massNumber: 23,
  massU: sourced(22.989769282, NIST_MASSES),
  twoI: sourced(3, STECK_NA),
  muI: sourced(2.2174982, IAEA_MOMENTS),
  // Uncertainties: the values of the compilation's property tables as recalled, not read while
  // this was written (the fourth argument says so; docs/species-data.md lists them).
  gI: sourced(-0.0008046108, STECK_NA, 8.0e-10, FROM_MEMORY),
  levels: [
    {
      key: 'ground',
      designation: '3s 2S1/2',
      A: mhz(885.8130644, STECK_NA, 0.0000005, FROM_MEMORY),
      gJ: sourced(2.002296, STECK_NA, 8.0e-7, FROM_MEMORY),
      energyHz: GROUND_ENERGY,
    },
    {
      key: 'P1/2',
      designation: '3p 2P°1/2',
      A: mhz(94.44, STECK_NA, 0.13, FROM_MEMORY),
      gJ: sourced(0.66581, STECK_NA, 0.00012, FROM_MEMORY),
      ...energy(508.3331958, 'THz', STECK_NA, 0.0000013, FROM_MEMORY),
      vacuumWavelengthNm: sourced(589.7558147, STECK_NA),
      lifetimeS: ns(16.299, STECK_NA),
    },
    {
      key: 'P3/2',
      designation: '3p 2P°3/2',
      A: mhz(18.534, STECK_NA, 0.015, FROM_MEMORY),
      B: mhz(2.724, STECK_NA, 0.030, FROM_MEMORY),
      gJ: sourced(1.3342, STECK_NA),
      ...energy(508.8487162, 'THz', STECK_NA, 0.0000013, FROM_MEMORY),
      vacuumWavelengthNm: sourced(589.1583264, STECK_NA),
      lifetimeS: ns(16.2492, STECK_NA),
    },
  ],
  notes: 'Ground splitting check value 1 771 626 128.8(1.0) Hz (2003 measurement, public hyperfine-splitting table).',
};
