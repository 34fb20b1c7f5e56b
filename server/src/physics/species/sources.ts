/**
 * Citation strings shared by the data files. A value read in a published compilation cites
 * that compilation; a value read in a single measurement cites it (measurements.ts); a value
 * that was recalled, or whose source could not be read, says FROM_MEMORY and nothing more.
 */

export const FROM_MEMORY = 'from memory';

export const SI_SECOND = 'SI definition of the second: Cs ground hyperfine splitting 9 192 631 770 Hz exactly';
export const NIST_MASSES =
  'NIST Atomic Weights and Isotopic Compositions (relative atomic masses from the AME2016 evaluation)';
export const IAEA_MOMENTS = 'IAEA nuclear moments table INDC(NDS)-0794 (Stone 2019)';
export const IAEA_MOMENTS_MEMORY = FROM_MEMORY;
export const ARIMONDO = 'Arimondo, Inguscio & Violino, Rev. Mod. Phys. 49, 31 (1977)';
export const NIST_ASD_MEMORY = FROM_MEMORY;

export const STECK_NA = 'Steck, "Sodium D Line Data" (alkali D-line data compilation, rev. 2.x)';
export const STECK_RB85 = 'Steck, "Rubidium 85 D Line Data" (alkali D-line data compilation, rev. 2.1.6)';
export const STECK_RB87 = 'Steck, "Rubidium 87 D Line Data" (alkali D-line data compilation, rev. 2.1.x)';
export const STECK_CS = 'Steck, "Cesium D Line Data" (alkali D-line data compilation, rev. 2.1.x)';
export const TIECKE_K = 'Tiecke, "Properties of Potassium" (v1.02, 2011)';
export const GEHM_LI6 = 'Gehm, "Properties of 6Li" (2003)';

// Compilations and isotope tables read in their published pages (value and, where printed, uncertainty).
export const CHEMLIN_K40 = 'ChemLin isotope data (chemlin.org), potassium-40: μ/μ_N = −1.29797(3)';
export const CHEMLIN_SR87 = 'ChemLin isotope data (chemlin.org), strontium-87: spin 9/2+, μ/μ_N = −1.09316(11)';
export const CHEMLIN_YB171_SPIN = 'ChemLin isotope data (chemlin.org), ytterbium isotopes: ¹⁷¹Yb spin 1/2−';
export const WEBELEMENTS_CR53 = 'WebElements chromium isotopes table: ⁵³Cr I = 3/2, μ/μ_N = −0.47454 (no uncertainty printed)';

/**
 * Uncertainty of a value that stays "from memory": its measurement's abstract was read, but the page
 * printed no journal, volume, page and year to cite it by (or could not be found again);
 * docs/species-data.md names the measurement and tests/physics/speciesReadValues.test.ts holds the value to it.
 */
export const READ_IN_MEASUREMENT = 'read in the abstract of a single measurement that confirms the value (docs/species-data.md)';
