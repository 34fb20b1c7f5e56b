/** Chromium-52 (bosonic, I = 0) and chromium-53 (I = 3/2): 7S3 ground level and the 425 nm 7P°4 level. */
import { derivedNuclearG, energy, GROUND_ENERGY, mhz, sourced } from './build-helpers';
import { CR53_GROUND_BEAM } from './measurements';
import { FROM_MEMORY, NIST_ASD_MEMORY, NIST_MASSES, WEBELEMENTS_CR53 } from './sources';
import type { BuiltinSpecies } from './types';

const CR53_MU = sourced(-0.47454, WEBELEMENTS_CR53);

export const CHROMIUM_52: BuiltinSpecies = {
  id: 'Cr52',
  aliases: ['52Cr', 'Cr-52', '⁵²Cr', 'chromium-52'],
  element: 'Cr',
  Z: 24,
  massNumber: 52,
  massU: sourced(51.94050623, NIST_MASSES),
  twoI: sourced(0, 'even–even nucleus, I = 0 (IAEA nuclear moments table lists no moment)'),
  levels: [
    { key: 'ground', designation: '3d5 4s 7S3', energyHz: GROUND_ENERGY },
    // 425.6 nm cooling line: Γ/2π ≈ 5.0 MHz, τ ≈ 31.8 ns.
    { key: 'P4', designation: '3d5 4p 7P°4', ...energy(23498.84, 'cm-1', NIST_ASD_MEMORY), lifetimeS: sourced(31.8e-9, FROM_MEMORY) },
  ],
  notes: 'Ground g_J not tabulated (no published value found); the LS value with the exact g_e is close to 2.0023.',
};

export const CHROMIUM_53: BuiltinSpecies = {
  id: 'Cr53',
  aliases: ['53Cr', 'Cr-53', '⁵³Cr', 'chromium-53'],
  element: 'Cr',
  Z: 24,
  massNumber: 53,
  massU: sourced(52.94064815, NIST_MASSES),
  twoI: sourced(3, WEBELEMENTS_CR53),
  muI: CR53_MU,
  gI: derivedNuclearG(CR53_MU, 3),
  levels: [
    {
      key: 'ground',
      designation: '3d5 4s 7S3',
      A: mhz(-82.5994, CR53_GROUND_BEAM, 0.0016),
      B: mhz(0.008, CR53_GROUND_BEAM, 0.012),
      energyHz: GROUND_ENERGY,
    },
  ],
};
