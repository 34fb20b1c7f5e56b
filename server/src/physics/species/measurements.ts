/**
 * Citations of single measurements (and one constants evaluation) whose abstract or table was read
 * with the search tool. Each names the journal, volume, page or article number and year, then the
 * value with its uncertainty as printed, and where it was read; never the authors.
 * docs/species-data.md lists them; tests/physics/speciesReadValues.test.ts holds the stored values to them.
 */

/** ¹H ground splitting: maser measurement, quoted with its reference; the same number printed in a later abstract. */
export const H_GROUND_MASER =
  'hydrogen maser, IEEE Trans. Instrum. Meas. 19, 200 (1970): 1 420 405 751.768 ± 0.002 Hz (reference and value as quoted ' +
  'in a time-and-frequency mailing-list note, mail-archive.com); the same value and uncertainty against TAI in the abstract ' +
  'of a later maser wall-shift determination (scilit.com)';

export const H_2S_INTERVAL = 'arXiv:0812.3509 (2009), abstract: 2S hyperfine interval 177 556 834.3(6.7) Hz';

export const HE4_METASTABLE_LIFETIME = 'Phys. Rev. Lett. 103, 053002 (2009), abstract (PubMed): 2³S1 lifetime 7870(510) s';

export const HE3_METASTABLE_SPLITTING =
  'Phys. Rev. A 1, 571 (1970), as quoted in the abstract of arXiv:2304.12274 (2023): 2³S hyperfine splitting ' +
  '−6 739 701 177(16) Hz; A = ΔW/(3/2)';

/** Bare (unshielded) helion moment: μ_I here is the bare-nucleus moment, as for every other species. */
export const CODATA_2022_HELION =
  'CODATA 2022 helion g-factor g_h = −4.255 250 699 5(34) (mp-units CODATA 2022 constants reference, docs); ' +
  'μ_h/μ_N = g_h·I = g_h/2, the bare helion (not the shielded value, which includes the atom\'s diamagnetism)';

/** 2018 doctoral dissertation (National Tsing Hua University), abstract: 2P1/2 intervals and the D1 isotope shift. */
const LI_D1_DISSERTATION = 'doctoral dissertation, National Tsing Hua University (2018), abstract (etd.lib.nthu.edu.tw)';
export const LI7_2P12_INTERVAL = `${LI_D1_DISSERTATION}: ⁷Li 2P1/2 interval 91.873(5) MHz; A = interval/2`;
export const LI6_2P12_INTERVAL = `${LI_D1_DISSERTATION}: ⁶Li 2P1/2 interval 26.108(9) MHz`;
export const LI_D1_ISOTOPE_SHIFT = `${LI_D1_DISSERTATION}: ⁷Li − ⁶Li D1 isotope shift 10 533.800(15) MHz`;

/**
 * What the comb measurements of the lithium D lines claim for their absolute frequencies (the frequencies themselves
 * are not printed in any stored page): it bounds how well the recalled ⁷Li D1 anchor could be known, not the anchor.
 */
export const LI_D_LINES_COMB =
  'arXiv:1212.2220 (2012), abstract (ar5iv, arcxiv, tomesphere; the NIST publication page of the same work): absolute ⁶,⁷Li ' +
  'D-line frequencies with an uncertainty of ≤ 25 kHz; line centres move by up to 1 MHz when quantum interference ' +
  'between the 2P hyperfine levels is left out of the line shape';

/** 2009 critical review of the lithium fine-structure and isotope-shift measurements (abstract). */
export const LI_FINE_STRUCTURE_REVIEW =
  'critical review of ⁶,⁷Li isotope-shift and fine-structure measurements (2009), abstract in the York University ' +
  'laser-spectroscopy publication list (yorku.ca/wlaser): 2P fine structure 10,052.954 ± 0.049 MHz (⁶Li) and ' +
  '10,053.154 ± 0.040 MHz (⁷Li)';

export const SR88_INTERCOMBINATION = 'Phys. Rev. Lett. 91, 243002 (2003), abstract: ⁸⁸Sr 1S0–3P1 434 829 121 311(10) kHz';

/** The clock line's isotope shift; the table takes it for the 689 nm line too (docs/species-data.md). */
export const SR_CLOCK_ISOTOPE_SHIFT =
  'arXiv:1706.02905 (2017), abstract (tomesphere): ⁸⁸Sr − ⁸⁷Sr isotope shift of the 1S0–3P0 clock line 62 188 134.004(10) Hz';

export const SR87_CLOCK = 'arXiv:2008.00723 (2020), abstract: ⁸⁷Sr 1S0–3P0 429 228 004 229 873.082(76) Hz';

/** Supersedes the same laboratory's earlier D1 values, which the abstract says it is at variance with. */
export const RB_D1_HYPERFINE_2016 =
  'arXiv:1611.02406 (2016), abstract (arcxiv): 5P1/2 A = 120.510(26) MHz (⁸⁵Rb) and 408.340(19) MHz (⁸⁷Rb)';

export const CS_D1_1999 = 'Phys. Rev. Lett. 82, 3568 (1999), abstract: D1 hyperfine centroid 335 116 048 807(41) kHz';

export const CS_6P32_GJ = 'arXiv:2208.00077 (2022), abstract: g_J(6²P3/2) = 1.334 087 49(52)';

/**
 * Abstracts read whose pages print title, method and numbers but no journal, volume or year: cited by title and the
 * page's address, so a reader can find them again (they used to stay "from memory" for want of a journal).
 */
export const CR53_GROUND_BEAM =
  'atomic-beam magnetic resonance, "Hyperfine structure measurements in ⁷⁵As, ³¹P and ⁵³Cr", abstract ' +
  '(scilit.net/publications/88a8e553f5e179f58e5797b5791d4c8b; no journal, volume or year printed there): ⁵³Cr ground ' +
  'A = −82.5994(16) MHz, B = +0.008(12) MHz (printed in Mc/s)';

/**
 * The page prints A = 212.765(1) MHz without a sign, but the intervals it prints need A and B of opposite sign: with
 * Casimir's formula 6.5 A + 0.5417 B = ±1346.56 MHz for opposite signs, 1419.38 MHz for equal ones; and μ_I < 0 with
 * Q > 0 (the same abstract) makes A negative and B positive. The site drops minus signs elsewhere too (docs/species-data.md).
 */
export const SR87_3P2_BEAM =
  'atomic-beam magnetic resonance, "Hyperfine structure of ⁸⁷Sr in the ³P2 metastable state", abstract ' +
  '(scilit.net/publications/f1f0fe343b2ff8b5e777010232542f8a; no journal, volume or year printed there): ' +
  'A = 212.765(1) MHz as printed, negative by the printed F = 13/2–11/2 and 11/2–9/2 intervals 1346.497(6) and ' +
  '1170.208(6) MHz (they need A and B of opposite sign), B = 67.215(15) MHz, Q = 0.335(20) b';
