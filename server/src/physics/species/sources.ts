/**
 * Citation strings shared by the data files. A value read from a page or data file found
 * with the project's search tool cites the publication; a recalled value adds "from memory".
 */

export const SI_SECOND = 'SI definition of the second: Cs ground hyperfine splitting 9 192 631 770 Hz exactly';
export const NIST_MASSES =
  'NIST Atomic Weights and Isotopic Compositions (relative atomic masses from the AME2016 evaluation)';
export const IAEA_MOMENTS = 'IAEA nuclear moments table INDC(NDS)-0794 (Stone 2019)';
export const IAEA_MOMENTS_MEMORY = 'IAEA nuclear moments table INDC(NDS)-0794 (Stone 2019) — from memory';
export const ARIMONDO = 'Arimondo, Inguscio & Violino, Rev. Mod. Phys. 49, 31 (1977)';
export const ARIMONDO_MEMORY = `${ARIMONDO} — from memory`;
export const NIST_ASD_MEMORY = 'NIST Atomic Spectra Database energy levels — from memory';

export const STECK_NA = 'Steck, "Sodium D Line Data" (alkali D-line data compilation, rev. 2.x)';
export const STECK_RB85 = 'Steck, "Rubidium 85 D Line Data" (alkali D-line data compilation, rev. 2.1.6)';
export const STECK_RB87 = 'Steck, "Rubidium 87 D Line Data" (alkali D-line data compilation, rev. 2.1.x)';
export const STECK_CS = 'Steck, "Cesium D Line Data" (alkali D-line data compilation, rev. 2.1.x)';
export const TIECKE_K = 'Tiecke, "Properties of Potassium" (v1.02, 2011)';
export const GEHM_LI6 = 'Gehm, "Properties of 6Li" (2003)';
export const MICROWAVE_SPLITTINGS =
  'compiled ground hyperfine splittings (H 1970, D 1972, Li, Na 2003, K, Rb 1976/2003 measurements), public hyperfine-splitting table';
