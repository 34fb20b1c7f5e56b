/**
 * Shapes of the built-in species table. Every number a user may rely on is wrapped
 * in `Sourced` so that its published origin travels with it into hovers and exports.
 */

/** A value together with a short citation naming where it was published. */
export interface Sourced<T> {
  readonly value: T;
  /** Short citation; contains "from memory" when the value was recalled rather than read. */
  readonly source: string;
  /** Standard uncertainty in the value's unit, only where the cited source publishes one. */
  readonly uncertainty?: number;
  /**
   * Where the uncertainty comes from when not from `source`: "from memory" for one recalled
   * (from the same compilation) but not read while the table was written.
   */
  readonly uncertaintySource?: string;
  /**
   * For a value built as a sum of separately measured pieces, some shared with other built-in values (one
   * absolute frequency under several lines): the pieces, whose uncertainties make up `uncertainty` in
   * quadrature. Each piece is one uncertain input wherever it recurs, so a difference of two such values
   * loses the shared part instead of counting it twice.
   */
  readonly parts?: readonly UncertainPart[];
}

/** One independently uncertain piece of a built-in value (see `Sourced.parts`). */
export interface UncertainPart {
  /** Stable key, the same in every value the piece enters ('Li7.D1' for the lithium anchor). */
  readonly key: string;
  /** What a reader calls it. */
  readonly label: string;
  /** The piece's own value and standard uncertainty, in the unit of the value it enters. */
  readonly value: number;
  readonly u: number;
  /** ∂value/∂piece: the piece is added (+1) or subtracted (−1). */
  readonly sign: 1 | -1;
}

/** Units in which level energies are published before conversion to Hz. */
export type PublishedEnergyUnit = 'Hz' | 'kHz' | 'MHz' | 'THz' | 'cm-1';

/** An energy exactly as the source printed it (kept so the conversion can be audited). */
export interface PublishedEnergy {
  readonly value: number;
  readonly unit: PublishedEnergyUnit;
  readonly source: string;
}

/** One fine-structure level of a built-in species. Frequencies are E/h in Hz. */
export interface BuiltinLevel {
  /** Short handle used in setup files: 'ground', 'P1/2', 'P3/2', 'metastable', '3P1' … */
  readonly key: string;
  /** Configuration and term symbol, e.g. '5p 2P°3/2' (° marks odd parity). */
  readonly designation: string;
  /** Magnetic-dipole hyperfine constant A, Hz. */
  readonly A?: Sourced<number>;
  /** Electric-quadrupole hyperfine constant B, Hz. */
  readonly B?: Sourced<number>;
  /** Magnetic-octupole hyperfine constant C, Hz. */
  readonly C?: Sourced<number>;
  /** Measured (or precisely calculated) electronic g-factor, |g| convention (≈ 2 for S1/2). */
  readonly gJ?: Sourced<number>;
  /** Level energy above the species' ground level, Hz. */
  readonly energyHz?: Sourced<number>;
  /** The energy as published (wavenumber or frequency) from which `energyHz` was converted. */
  readonly energyPublished?: PublishedEnergy;
  /** Published vacuum wavelength of the line from the ground level to this level, nm. */
  readonly vacuumWavelengthNm?: Sourced<number>;
  /** Radiative lifetime, s. */
  readonly lifetimeS?: Sourced<number>;
  readonly notes?: string;
}

/** One isotope with the data needed for Zeeman and beam calculations. */
export interface BuiltinSpecies {
  /** Canonical id, element symbol followed by mass number ('Rb87'); 'H' and 'D' for hydrogen. */
  readonly id: string;
  /** Display forms a user may type; matching ignores case, spaces, hyphens and superscripts. */
  readonly aliases: readonly string[];
  readonly element: string;
  readonly Z: number;
  readonly massNumber: number;
  /** Atomic (not nuclear) mass in unified atomic mass units. */
  readonly massU: Sourced<number>;
  /** Twice the nuclear spin (exact integer). */
  readonly twoI: Sourced<number>;
  /** Nuclear magnetic moment in nuclear magnetons (bare nucleus, diamagnetism-corrected). */
  readonly muI?: Sourced<number>;
  /**
   * Nuclear g-factor in units of μ_B for H_Z = μ_B B (g_J J_z + g_I I_z): negative when μ_I > 0.
   * Where an atomic compilation lists g_I it is stored as listed (it includes the diamagnetic
   * shielding of the nucleus by the atom's electrons, which is what a free-atom Breit–Rabi fit sees);
   * otherwise it is derived from μ_I without shielding and its source says "derived".
   */
  readonly gI?: Sourced<number>;
  readonly levels: readonly BuiltinLevel[];
  readonly notes?: string;
}
