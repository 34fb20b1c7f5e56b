/**
 * Citation strings shared by the data files. A value read in a published compilation cites
 * that compilation; a value that was recalled, or whose source could not be confirmed as a
 * named compilation, says FROM_MEMORY and nothing more.
 */

export const FROM_MEMORY = 'from memory';

export const SI_SECOND = 'SI definition of the second: Cs ground hyperfine splitting 9 192 631 770 Hz exactly';
export const NIST_MASSES =
  'NIST Atomic Weights and Isotopic Compositions (relative atomic masses from the AME2016 evaluation)';
export const IAEA_MOMENTS = 'IAEA nuclear moments table INDC(NDS)-0794 (Stone 2019)';
export const IAEA_MOMENTS_MEMORY = FROM_MEMORY;
export const ARIMONDO = 'Arimondo, Inguscio & Violino, Rev. Mod. Phys. 49, 31 (1977)';
export const ARIMONDO_MEMORY = FROM_MEMORY;
export const NIST_ASD_MEMORY = FROM_MEMORY;

export const STECK_NA = 'Steck, "Sodium D Line Data" (alkali D-line data compilation, rev. 2.x)';
export const STECK_RB85 = 'Steck, "Rubidium 85 D Line Data" (alkali D-line data compilation, rev. 2.1.6)';
export const STECK_RB87 = 'Steck, "Rubidium 87 D Line Data" (alkali D-line data compilation, rev. 2.1.x)';
export const STECK_CS = 'Steck, "Cesium D Line Data" (alkali D-line data compilation, rev. 2.1.x)';
export const TIECKE_K = 'Tiecke, "Properties of Potassium" (v1.02, 2011)';
export const GEHM_LI6 = 'Gehm, "Properties of 6Li" (2003)';
