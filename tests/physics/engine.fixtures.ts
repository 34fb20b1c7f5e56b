/**
 * Level data shared by the engine tests. Sources beside each value; "from
 * memory" marks values recalled rather than read during this work.
 * Convention everywhere: H_Z = +μ_B B (g_J J_z + g_I I_z), g_I in units of μ_B.
 */
import type { HyperfineLevelSpec } from '../../server/src/physics/engine';

/** 1H 1S1/2. A: hydrogen ground-state hyperfine frequency 1 420 405 751.768 Hz (published maser measurement).
 *  g_J = g_e(1 − α²/3) = 2.0022838 (bound-electron correction, textbook; from memory).
 *  g_I = −2 μ_p/μ_B = −0.0030420642 (CODATA 2022 μ_p/μ_B = 1.521 032 202 30e-3). */
export const H_1S: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 1, twoI: 1, gJ: 2.0022838, gI: -0.0030420644046, A: 1420405751.768 };

/** 7Li 2S1/2 (lithium D-line data compilation; from memory): A = 401.7520433 MHz, g_J = 2.0023010, g_I = −0.0011822130. */
export const LI7_2S: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 1, twoI: 3, gJ: 2.002301, gI: -0.001182213, A: 401.7520433e6 };

/** 23Na 3S1/2 (sodium D-line data compilation; from memory): A = 885.8130644 MHz, g_J = 2.00229600, g_I = −0.00080461080. */
export const NA23_3S: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 1, twoI: 3, gJ: 2.002296, gI: -0.0008046108, A: 885.8130644e6 };

/** 87Rb 5S1/2 (rubidium-87 D-line data compilation): A = 3 417 341 305.452 Hz, g_J = 2.00233113, g_I = −0.0009951414. */
export const RB87_5S: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 1, twoI: 3, gJ: 2.00233113, gI: -0.0009951414, A: 3417341305.452 };

/** 133Cs 6S1/2: A = 2 298 157 942.5 Hz so that 4A = 9 192 631 770 Hz (SI definition of the second);
 *  g_J = 2.00254032, g_I = −0.00039885395 (caesium D-line data compilation). */
export const CS133_6S: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 1, twoI: 7, gJ: 2.00254032, gI: -0.00039885395, A: 2298157942.5 };

/** 133Cs 6P3/2 (caesium D-line data compilation): A = 50.28827 MHz, B = −0.4934 MHz, g_J = 1.3340;
 *  octupole C = 0.56 kHz (published atomic-beam measurement of the 6P3/2 hyperfine structure). */
export const CS133_6P32: HyperfineLevelSpec = {
  kind: 'hyperfine',
  twoJ: 3,
  twoI: 7,
  gJ: 1.334,
  gI: -0.00039885395,
  A: 50.28827e6,
  B: -0.4934e6,
};

export const GROUND_LEVELS: [string, HyperfineLevelSpec][] = [
  ['1H 1S1/2', H_1S],
  ['7Li 2S1/2', LI7_2S],
  ['23Na 3S1/2', NA23_3S],
  ['87Rb 5S1/2', RB87_5S],
  ['133Cs 6S1/2', CS133_6S],
];

/** Relative difference with a floor for values near zero. */
export function relDiff(a: number, b: number, floor = 1e-3): number {
  return Math.abs(a - b) / Math.max(Math.abs(b), floor);
}
