/** Hydrogen and deuterium: ground hyperfine masers/beams and the n = 2 levels. */
import { derivedNuclearG, energy, GROUND_ENERGY, ns, sourced } from './build-helpers';
import { H_2S_INTERVAL, H_GROUND_MASER } from './measurements';
import { FROM_MEMORY, IAEA_MOMENTS, NIST_ASD_MEMORY, NIST_MASSES } from './sources';
import type { BuiltinSpecies } from './types';

const H_MU = sourced(2.792847351, IAEA_MOMENTS);
const D_MU = sourced(0.857438231, IAEA_MOMENTS);
/** Bound-electron g of H(1s), g_e(1 − α²/3); the same to 7 decimals for D (tests hold both). */
const H_GJ = sourced(2.0022838, FROM_MEMORY);

export const HYDROGEN: BuiltinSpecies = {
  id: 'H',
  aliases: ['1H', 'H1', 'H-1', '¹H', 'hydrogen', 'hydrogen-1', 'protium'],
  element: 'H',
  Z: 1,
  massNumber: 1,
  massU: sourced(1.00782503223, NIST_MASSES),
  twoI: sourced(1, IAEA_MOMENTS),
  muI: H_MU,
  gI: derivedNuclearG(H_MU, 1),
  levels: [
    {
      key: 'ground',
      designation: '1s 2S1/2',
      // J = I = 1/2: the splitting (I + 1/2)A is A itself.
      A: sourced(1420405751.768, H_GROUND_MASER, 0.002),
      gJ: H_GJ,
      energyHz: GROUND_ENERGY,
    },
    {
      key: 'metastable',
      designation: '2s 2S1/2',
      A: sourced(177556834.3, H_2S_INTERVAL, 6.7),
      ...energy(82258.9543992821, 'cm-1', NIST_ASD_MEMORY),
    },
    {
      key: 'P1/2',
      designation: '2p 2P°1/2',
      ...energy(82258.9191133, 'cm-1', NIST_ASD_MEMORY),
      lifetimeS: ns(1.596, FROM_MEMORY),
    },
    {
      key: 'P3/2',
      designation: '2p 2P°3/2',
      ...energy(82259.2850014, 'cm-1', NIST_ASD_MEMORY),
      lifetimeS: ns(1.596, FROM_MEMORY),
    },
  ],
  notes:
    'g_I derived from the free-proton moment; the 1.8e-5 shielding in the atom is not applied. ' +
    'n = 2 energies are as listed by NIST ASD (recalled); whether they refer to hyperfine centroids or to F = 1 ' +
    'components was not checked, which matters at the 0.3 GHz (1.3e-7) level only.',
};

export const DEUTERIUM: BuiltinSpecies = {
  id: 'D',
  aliases: ['2H', 'H-2', '²H', 'deuterium', 'hydrogen-2'],
  element: 'H',
  Z: 1,
  massNumber: 2,
  massU: sourced(2.01410177812, NIST_MASSES),
  twoI: sourced(2, IAEA_MOMENTS),
  muI: D_MU,
  gI: derivedNuclearG(D_MU, 2),
  levels: [
    {
      key: 'ground',
      designation: '1s 2S1/2',
      // The splitting ΔW = A(I + 1/2) = 3A/2 is what was measured: 327 384 352.5222(17) Hz, a 1972 maser value
      // recalled with its uncertainty; no readable page prints it (docs/species-data.md).
      A: sourced(327384352.5222 / 1.5, FROM_MEMORY, 0.0017 / 1.5),
      gJ: H_GJ,
      energyHz: GROUND_ENERGY,
    },
  ],
  notes: 'Only the ground level is tabulated; g_I is derived from μ_d without shielding.',
};
