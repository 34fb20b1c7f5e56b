/** Caesium-133: 6s ground level (defines the SI second) and the 6p D-line levels. */
import { CAESIUM_HYPERFINE_HZ } from '../constants';
import { energy, GROUND_ENERGY, mhz, ns, sourced } from './build-helpers';
import { CS_6P32_GJ, CS_D1_1999 } from './measurements';
import { FROM_MEMORY, NIST_MASSES, SI_SECOND, STECK_CS } from './sources';
import type { BuiltinSpecies } from './types';

export const CAESIUM_133: BuiltinSpecies = {
  id: 'Cs133',
  aliases: ['133Cs', 'Cs-133', '¹³³Cs', 'cesium-133', 'caesium-133', 'Cs', 'cesium', 'caesium'],
  element: 'Cs',
  Z: 55,
  massNumber: 133,
  massU: sourced(132.905451961, NIST_MASSES),
  twoI: sourced(7, STECK_CS),
  muI: sourced(2.5778, FROM_MEMORY),
  // Uncertainties marked FROM_MEMORY (fourth argument) were recalled from the compilation, not read.
  gI: sourced(-0.00039885395, STECK_CS, 5.2e-13, FROM_MEMORY),
  // Uncertainties of the 6p constants as the cited compilation's hyperfine-constant table gives
  // them (its revision 2.3); the values carry the same digits as here. To be confirmed against the
  // compilation itself (docs/species-data.md).
  levels: [
    {
      key: 'ground',
      designation: '6s 2S1/2',
      // ΔW = A(I + 1/2) = 4A is exact by definition of the second.
      A: sourced(CAESIUM_HYPERFINE_HZ / 4, `derived: A = ΔW/4 from the ${SI_SECOND}`),
      gJ: sourced(2.00254032, STECK_CS, 2.0e-7, FROM_MEMORY),
      energyHz: GROUND_ENERGY,
    },
    {
      key: 'P1/2',
      designation: '6p 2P°1/2',
      A: mhz(291.9201, STECK_CS, 0.0075),
      gJ: sourced(0.6659, STECK_CS, 0.00009, FROM_MEMORY),
      // Value and uncertainty are those of a 1999 comb measurement (read); a 2006 comb measurement is
      // 1.4σ lower (tests/physics/speciesReadValues.test.ts, docs/species-data.md).
      ...energy(335.116048807, 'THz', STECK_CS, 0.000000041, CS_D1_1999),
      vacuumWavelengthNm: sourced(894.59295986, STECK_CS),
      lifetimeS: ns(34.894, STECK_CS),
    },
    {
      key: 'P3/2',
      designation: '6p 2P°3/2',
      A: mhz(50.28827, STECK_CS, 0.00023),
      B: mhz(-0.4934, STECK_CS, 0.0017),
      C: sourced(560, STECK_CS, 70),
      gJ: sourced(1.33408749, CS_6P32_GJ, 5.2e-7),
      ...energy(351.7257185, 'THz', STECK_CS, 0.00000011, FROM_MEMORY),
      vacuumWavelengthNm: sourced(852.34727582, STECK_CS),
      lifetimeS: ns(30.473, STECK_CS),
    },
  ],
};
