/** Potassium-39, -40, -41: 4s ground level and the 4p D-line levels. */
import { energy, GROUND_ENERGY, mhz, ns, sourced } from './build-helpers';
import { IAEA_MOMENTS, IAEA_MOMENTS_MEMORY, NIST_MASSES, TIECKE_K } from './sources';
import type { BuiltinLevel, BuiltinSpecies } from './types';

const K_GJ_GROUND = sourced(2.00229421, TIECKE_K);
const TAU_D1 = ns(26.72, TIECKE_K);
const TAU_D2 = ns(26.37, TIECKE_K);

interface KLevelData {
  aGround: number;
  aP12: number;
  aP32: number;
  bP32: number;
  d1THz: number;
  d2THz: number;
  d1Nm?: number;
  d2Nm?: number;
}

/** The three isotopes share designations, g_J and lifetimes; only hyperfine data and lines differ. */
function potassiumLevels(d: KLevelData): BuiltinLevel[] {
  return [
    { key: 'ground', designation: '4s 2S1/2', A: mhz(d.aGround, TIECKE_K), gJ: K_GJ_GROUND, energyHz: GROUND_ENERGY },
    {
      key: 'P1/2',
      designation: '4p 2P°1/2',
      A: mhz(d.aP12, TIECKE_K),
      ...energy(d.d1THz, 'THz', TIECKE_K),
      ...(d.d1Nm === undefined ? {} : { vacuumWavelengthNm: sourced(d.d1Nm, TIECKE_K) }),
      lifetimeS: TAU_D1,
    },
    {
      key: 'P3/2',
      designation: '4p 2P°3/2',
      A: mhz(d.aP32, TIECKE_K),
      B: mhz(d.bP32, TIECKE_K),
      ...energy(d.d2THz, 'THz', TIECKE_K),
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
  gI: sourced(-0.00014193489, TIECKE_K),
  levels: potassiumLevels({
    aGround: 230.8598601,
    aP12: 27.775,
    aP32: 6.093,
    bP32: 2.786,
    d1THz: 389.286058716,
    d2THz: 391.01617003,
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
  muI: sourced(-1.2981, IAEA_MOMENTS_MEMORY),
  gI: sourced(0.00017649, TIECKE_K),
  levels: potassiumLevels({
    aGround: -285.7308,
    aP12: -34.523,
    aP32: -7.585,
    bP32: -3.445,
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
  gI: sourced(-0.000077906, TIECKE_K),
  levels: potassiumLevels({
    aGround: 127.0069352,
    aP12: 15.245,
    aP32: 3.363,
    bP32: 3.351,
    d1THz: 389.286294205,
    d2THz: 391.01640621,
    d2Nm: 766.7004587,
  }),
  notes: 'Ground splitting check value 254.0138720(20) MHz (public hyperfine-splitting table).',
};
