/** Potassium-39, -40, -41: 4s ground level and the 4p D-line levels. */
import { energy, GROUND_ENERGY, mhz, ns, sourced } from './build-helpers';
import { CHEMLIN_K40, FROM_MEMORY, IAEA_MOMENTS, NIST_MASSES, TIECKE_K } from './sources';
import type { BuiltinLevel, BuiltinSpecies } from './types';

// Uncertainties: the compilation's values as recalled, not read while this was written (the
// fourth argument says so; docs/species-data.md lists them). Its P-level g_J are Landé values
// without an uncertainty, so none is stored.
const K_GJ_GROUND = sourced(2.00229421, TIECKE_K, 2.4e-7, FROM_MEMORY);
const TAU_D1 = ns(26.72, TIECKE_K);
const TAU_D2 = ns(26.37, TIECKE_K);

/** A value and its standard uncertainty, MHz. */
type WithU = readonly [number, number];

interface KLevelData {
  aGround: WithU;
  aP12: WithU;
  aP32: WithU;
  bP32: WithU;
  d1THz: number;
  d2THz: number;
  /** Uncertainties of the D-line frequencies, THz (from memory), where known. */
  d1U?: number;
  d2U?: number;
  d1Nm?: number;
  d2Nm?: number;
}

/** The three isotopes share designations, g_J and lifetimes; only hyperfine data and lines differ. */
function potassiumLevels(d: KLevelData): BuiltinLevel[] {
  return [
    { key: 'ground', designation: '4s 2S1/2', A: mhz(d.aGround[0], TIECKE_K, d.aGround[1], FROM_MEMORY), gJ: K_GJ_GROUND, energyHz: GROUND_ENERGY },
    {
      key: 'P1/2',
      designation: '4p 2P°1/2',
      A: mhz(d.aP12[0], TIECKE_K, d.aP12[1], FROM_MEMORY),
      ...energy(d.d1THz, 'THz', TIECKE_K, d.d1U, d.d1U === undefined ? undefined : FROM_MEMORY),
      ...(d.d1Nm === undefined ? {} : { vacuumWavelengthNm: sourced(d.d1Nm, TIECKE_K) }),
      lifetimeS: TAU_D1,
    },
    {
      key: 'P3/2',
      designation: '4p 2P°3/2',
      A: mhz(d.aP32[0], TIECKE_K, d.aP32[1], FROM_MEMORY),
      B: mhz(d.bP32[0], TIECKE_K, d.bP32[1], FROM_MEMORY),
      ...energy(d.d2THz, 'THz', TIECKE_K, d.d2U, d.d2U === undefined ? undefined : FROM_MEMORY),
      ...(d.d2Nm === undefined ? {} : { vacuumWavelengthNm: sourced(d.d2Nm, TIECKE_K) }),
      lifetimeS: TAU_D2,
    },
  ];
}

export const POTASSIUM_39: BuiltinSpecies = {
  id: 'K39',
  aliases: ['39K', 'K-39', '³⁹K', 'potassium-39'],
  element: 'K',
  Z: 19,
  massNumber: 39,
  massU: sourced(38.9637064864, NIST_MASSES),
  twoI: sourced(3, TIECKE_K),
  muI: sourced(0.3914699, IAEA_MOMENTS),
  gI: sourced(-0.00014193489, TIECKE_K, 1.2e-13, FROM_MEMORY),
  levels: potassiumLevels({
    aGround: [230.8598601, 0.0000003],
    aP12: [27.775, 0.042],
    aP32: [6.093, 0.025],
    bP32: [2.786, 0.071],
    d1THz: 389.286058716,
    d2THz: 391.01617003,
    d1U: 0.000000062,
    d2U: 0.00000012,
    d1Nm: 770.108385049,
    d2Nm: 766.700921822,
  }),
  notes: 'Ground splitting check value 461.7197202(14) MHz (public hyperfine-splitting table).',
};

export const POTASSIUM_40: BuiltinSpecies = {
  id: 'K40',
  aliases: ['40K', 'K-40', '⁴⁰K', 'potassium-40'],
  element: 'K',
  Z: 19,
  massNumber: 40,
  massU: sourced(39.963998166, NIST_MASSES),
  twoI: sourced(8, TIECKE_K),
  // Read value; the recalled −1.2981 it replaces was 4σ away (docs/species-data.md).
  muI: sourced(-1.29797, CHEMLIN_K40, 0.00003),
  gI: sourced(0.00017649, TIECKE_K, 3.4e-8, FROM_MEMORY),
  levels: potassiumLevels({
    aGround: [-285.7308, 0.0024],
    aP12: [-34.523, 0.025],
    aP32: [-7.585, 0.010],
    bP32: [-3.445, 0.090],
    d1THz: 389.286184353,
    d2THz: 391.01629605,
    d1Nm: 770.108136507,
    d2Nm: 766.700674872,
  }),
  notes: 'Negative nuclear moment: the ground hyperfine structure is inverted (F = 9/2 lowest).',
};

export const POTASSIUM_41: BuiltinSpecies = {
  id: 'K41',
  aliases: ['41K', 'K-41', '⁴¹K', 'potassium-41'],
  element: 'K',
  Z: 19,
  massNumber: 41,
  massU: sourced(40.9618252579, NIST_MASSES),
  twoI: sourced(3, TIECKE_K),
  muI: sourced(0.2148722, IAEA_MOMENTS),
  gI: sourced(-0.000077906, TIECKE_K, 8e-14, FROM_MEMORY),
  levels: potassiumLevels({
    aGround: [127.0069352, 0.0000006],
    aP12: [15.245, 0.042],
    aP32: [3.363, 0.025],
    bP32: [3.351, 0.071],
    d1THz: 389.286294205,
    d2THz: 391.01640621,
    d2Nm: 766.7004587,
  }),
  notes: 'Ground splitting check value 254.0138720(20) MHz (public hyperfine-splitting table).',
};
