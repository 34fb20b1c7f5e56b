/**
 * The semantic model: the syntax tree with names resolved, units converted to SI,
 * term symbols interpreted and built-in species data merged in.
 * Every value remembers where it came from (the file or a published source).
 */
import type { BlockNode, LevelNode, Problem, Range, SettingNode, SetupDocument, UseNode } from '../format/ast';
import type { Configuration } from '../physics/configuration';
import type { TermSymbol } from '../physics/termSymbol';
import type { BuiltinSpecies, UncertainPart } from '../physics/species';
import type { FieldSourceSpec, Vec3 } from '../physics/fields/types';
import type { DataModel, FitRequestModel } from './fitTypes';
import type { TrapModel } from './trapTypes';

/** A value and its origin: `file` (with the setting's range) or a citation of a published source. */
export interface Valued<T> {
  value: T;
  source: string;
  /** Where the file sets it; absent for built-in values. */
  range?: Range;
  /** Standard uncertainty, when the file wrote e.g. `0.35(2)`. */
  uncertainty?: number;
  /** A point or size written with uncertainties on its components (`0, 0, 1.5(1) mm`): each one's, m (undefined where exact). */
  componentUncertainty?: readonly [number | undefined, number | undefined, number | undefined];
  /** The unit the file wrote (`mT` in `25 mT`), so reports can show the value back in it. */
  unit?: string;
  /** A built-in value summed from pieces shared with other built-in values: each piece is its own uncertain input. */
  parts?: readonly UncertainPart[];
}

/**
 * Where a species brought in by `use` is declared. Its `node`, `nameRange` and every range of
 * its levels and values are ranges in that file, not in the file being analysed.
 */
export interface SpeciesOrigin {
  /** The file that declares it: a URI or a path, of the same kind as the analysed file's own `uri`. */
  uri: string;
  /** That file as the analysed file reaches it: the path its `use` statement writes, or relative to its folder when it comes through another used file. */
  path: string;
  /** The path of the `use` statement in the analysed file that brings it in. */
  useRange: Range;
}

export interface SpeciesModel {
  name: string;
  node: BlockNode;
  nameRange: Range;
  /** Set when the species comes from another file through `use`. */
  origin?: SpeciesOrigin;
  builtin?: BuiltinSpecies;
  massKg?: Valued<number>;
  /** Twice the nuclear spin. */
  twoI: Valued<number>;
  /** The file's `I` was rejected (its own problem says why): I is unknown, not 0. */
  spinRejected?: boolean;
  /** Nuclear g-factor in units of μ_B (H = μ_B B (g_J J_z + g_I I_z)). */
  gI: Valued<number>;
  levels: LevelModel[];
}

/** One value of a whole term's J level (`A_J = 3/2 -3.06 MHz`): twice J, the SI value, and where it is written. */
export interface PerLevelValue {
  twoJ: number;
  value: number;
  /** The whole `J value` group. */
  range: Range;
  valueRange: Range;
}

export interface LevelModel {
  name: string;
  node: LevelNode;
  nameRange: Range;
  species: SpeciesModel;
  designationText: string;
  configuration: Configuration | null;
  term: TermSymbol | null;
  /**
   * `level`: a J level (term symbol with J). `term`: a whole LS term without J whose fine
   * structure is part of the problem (needs `zeta` or the J-level energies `E_J`), with its
   * hyperfine structure when `A_J` / `B_J` are given.
   */
  kind: 'level' | 'term';
  /** Set when the designation is usable: a valid J level, or a term with its ζ. */
  valid: boolean;
  /** Spin–orbit constant ζ of a term (E_J = ζ/2 [J(J+1) − L(L+1) − S(S+1)]), Hz. */
  zeta?: Valued<number>;
  /** A whole term's J-level hyperfine constants and J-level energies (`A_J`, `B_J`, `E_J`), Hz. */
  levelA?: PerLevelValue[];
  levelB?: PerLevelValue[];
  levelEnergies?: PerLevelValue[];
  /** ⟨r²⟩ of the valence electron, m² (`r2`): turns the diamagnetic term on for a whole term. */
  r2?: Valued<number>;
  A?: Valued<number>;
  B?: Valued<number>;
  C?: Valued<number>;
  gJMeasured?: Valued<number>;
  energyHz?: Valued<number>;
  /** Radiative lifetime τ, s: from `lifetime`, from `linewidth` (τ = 1/(2π·FWHM)), or built in. */
  lifetimeS?: Valued<number>;
  /** Set when the lifetime came from the file's `linewidth` (the natural FWHM Γ/2π, Hz). */
  linewidthHz?: Valued<number>;
  /** The built-in level whose data were merged in, if any. */
  builtinKey?: string;
}

export interface FieldModel {
  name: string;
  node: BlockNode;
  nameRange: Range;
  tesla?: Valued<number>;
  /** The species the field acts on (`species = …`); undefined: every species (docs/format.md). */
  species?: SpeciesModel[];
}

/**
 * A field source block (`coil`, `solenoid`, `wire`, `slab`; docs/fields.md) with its values in SI
 * as written, and the exact parts the physics sums: a coil pair or a wire with its return is two.
 * `parts` is empty when the block cannot be used (its problems say why).
 */
export interface FieldSourceModel {
  name: string;
  node: BlockNode;
  nameRange: Range;
  kind: 'coil' | 'solenoid' | 'wire' | 'slab';
  parts: FieldSourceSpec[];
  /** coil, solenoid: loop or winding radius, m. */
  radiusM?: Valued<number>;
  /** coil, solenoid: turns (of each loop of a pair). */
  turns?: Valued<number>;
  /** coil, solenoid, wire: current, A (its sign as written). */
  currentA?: Valued<number>;
  /** coil, solenoid, slab: centre, m (default the origin, without a range). */
  centre?: Valued<Vec3>;
  /** coil, solenoid: unit axis (default +z, without a range). */
  axis?: Valued<Vec3>;
  /** coil: distance between the loops of a pair, m, and whether their currents run the same way. */
  spacingM?: Valued<number>;
  sense?: Valued<'same' | 'opposite'>;
  /** coil, solenoid: copper wire diameter, m (for current density, resistance, power). */
  conductorM?: Valued<number>;
  /** solenoid: winding length; wire: segment length (absent: infinite), m. */
  lengthM?: Valued<number>;
  /** wire: a point on it, the unit direction of the current, and a point on the return wire. */
  through?: Valued<Vec3>;
  direction?: Valued<Vec3>;
  returnThrough?: Valued<Vec3>;
  /** slab: edge lengths along x, y, z, m, and μ0·M, T. */
  sizeM?: Valued<Vec3>;
  magnetisationT?: Valued<Vec3>;
  /** slab: the unit direction written after `along` (μ0·M of 0 keeps none, and its uncertainty is set along this). */
  magnetisationAlong?: Vec3;
}

export interface MagnetModel {
  name: string;
  node: BlockNode;
  nameRange: Range;
  /** Written, or with `sources` |B| at the beam line's centre taken from them (source 'sources …'). */
  fieldT?: Valued<number>;
  /** Written, or with `sources` ∂|B|/∂z at the beam line's centre. */
  gradientTPerM?: Valued<number>;
  lengthM?: Valued<number>;
  /** The field sources the magnet is built from (`sources = …`); the beam then flies through their field (docs/beam.md §7). */
  sources?: FieldSourceModel[];
  /** Where the beam line (along +x) passes the middle of the magnet (`at`), m; default the origin. */
  atM?: Valued<Vec3>;
}

export type BeamSource =
  | { kind: 'oven'; temperatureK: number }
  | { kind: 'jet'; speedMPerS: number; spreadFraction: number }
  | { kind: 'speed'; speedMPerS: number };

export interface BeamModel {
  name: string;
  node: BlockNode;
  nameRange: Range;
  species?: SpeciesModel;
  level?: LevelModel;
  magnet?: MagnetModel;
  source?: Valued<BeamSource>;
  slits?: Valued<{ firstM: number; secondM: number; separationM: number }>;
  /** The oven temperature and the slit dimensions as written, each with its uncertainty (for propagation). */
  ovenTemperatureK?: Valued<number>;
  slitParts?: { firstM: Valued<number>; secondM: Valued<number>; separationM: Valued<number> };
  driftM?: Valued<number>;
  detectorM?: Valued<number>;
  /** Centre of a fixed detector from the undeflected axis (`detector = 25 um at 1.2 mm`). */
  detectorOffsetM?: Valued<number>;
  /**
   * Relative populations by low-field label (`populations = 2 +2 1, 2 +1 0.2`: F, m_F, weight;
   * `2 1` gives every m_F of F = 2 the weight 1). Sublevels not listed get 0. Absent: all equal.
   */
  populations?: { twoF: number; twoM?: number; weight: number; range: Range }[];
}

export interface LineModel {
  name: string;
  node: BlockNode;
  nameRange: Range;
  /** The lower and upper level by energy (when both energies are known), whatever order the file writes. */
  lower?: LevelModel;
  upper?: LevelModel;
  /** The file writes the upper level first (an emission line); lower/upper above are already swapped. */
  emission?: boolean;
  /** A synthesized spectrum asked for with `spectrum = along | across`. */
  spectrum?: SpectrumRequest;
}

/** How to draw a line's spectrum (docs/spectra.md). */
export interface SpectrumRequest {
  /** The `spectrum` setting: where diagnostics about the spectrum as a whole go. */
  range: Range;
  /** Looking along or across the field. */
  direction: 'along' | 'across';
  /** Analyser in front of the detector (`light`); `all` when not given. */
  light: 'all' | 'pi' | 'sigma' | 'sigma+' | 'sigma-';
  lightRange?: Range;
  /** Gas temperature for the Doppler width (`doppler = 350 K`), K. */
  dopplerK?: Valued<number>;
  /** Or a beam whose transverse speed spread sets the Doppler width (`doppler = beam NAME`); resolved in the evaluation. */
  dopplerBeam?: { name: string; range: Range };
  /** Gaussian instrument width, FWHM in Hz (`instrument`). */
  instrumentHz?: Valued<number>;
  /** Total width of the frequency window (`span`), Hz; chosen from the widths when absent. */
  spanHz?: Valued<number>;
  /** Number of samples (`points`); when absent, enough for five samples per line width (at least 2001, at most the cap). */
  points?: Valued<number>;
}

/** A sublevel named by its low-field quantum numbers: F and m_F (or J and m_J for a term), twice their values. */
export interface SublevelName {
  twoF: number;
  twoM: number;
  range: Range;
}

/** Questions about RF/microwave (magnetic-dipole) transitions within one level. */
export interface ResonanceModel {
  name: string;
  node: BlockNode;
  nameRange: Range;
  level?: LevelModel;
  lower?: SublevelName;
  upper?: SublevelName;
  frequencyHz?: Valued<number>;
  /** Field range for resonance and field-insensitive searches. */
  rangeT: { fromT: number; toT: number; range?: Range; fromUnit?: string; toUnit?: string };
  twoPhoton: boolean;
}

/** A Zeeman slower on a cycling line (docs/slower.md). Speeds in m/s, fields in T. */
export interface SlowerModel {
  name: string;
  node: BlockNode;
  nameRange: Range;
  line?: LineModel;
  /** Where the `line` setting is written (diagnostics about the line go there). */
  lineRange?: Range;
  captureMPerS?: Valued<number>;
  finalMPerS?: Valued<number>;
  /** η on a_max = ħkΓ/2m; 0.5 when absent. */
  safety: Valued<number>;
  design: 'decreasing' | 'increasing' | 'spin_flip';
  designRange?: Range;
  /** B_bias of the profile; the design's default when absent. */
  biasT?: Valued<number>;
  /** s0 = I/I_sat; 2 when absent. */
  saturation: Valued<number>;
  /** `repump = on`: the file accepts a line that does not cycle (its warning becomes a note). */
  repump: boolean;
  /** Coils whose field along the slower is checked against the ideal (`sources`). */
  sources?: FieldSourceModel[];
  /** Where the slower begins (z = 0) in the sources' coordinates, m (`start`; default the origin). */
  start?: Valued<Vec3>;
  /** Unit vector of the atoms' flight (`axis`; default +z). */
  axis?: Valued<Vec3>;
}

export interface SettingsModel {
  /** Electron spin g-factor for Landé formulas: CODATA |g_e| or exactly 2. */
  gS: 'exact' | 2;
  reducedMass: boolean;
}

/** A place in the file that names something, for go-to-definition, references and rename. */
export interface NameUse {
  kind: 'species' | 'level' | 'field' | 'magnet' | 'beam' | 'line' | 'resonance' | 'data' | 'fit' | 'source' | 'slower' | 'trap';
  name: string;
  range: Range;
  /** The declaration it resolves to, if any; `uri` is set when it is declared in another file (through `use`). */
  target?: { kind: NameUse['kind']; name: string; range: Range; uri?: string };
  isDeclaration: boolean;
}

/** One `use` statement and what it brought in. */
export interface UsedFileModel {
  node: UseNode;
  /** Where the path leads (a URI or a path), when it could be worked out. */
  location?: string;
  /** True when the file was read and parsed. */
  loaded: boolean;
  /** The species it made available here (a species also declared here, or by an earlier `use`, is left out). */
  species: SpeciesModel[];
}

export interface SetupModel {
  doc: SetupDocument;
  /** The `use` statements, in order, with what each brought in. */
  uses: UsedFileModel[];
  species: SpeciesModel[];
  fields: FieldModel[];
  /** Coils, solenoids, wires and magnetised blocks (docs/fields.md). */
  sources: FieldSourceModel[];
  magnets: MagnetModel[];
  beams: BeamModel[];
  lines: LineModel[];
  resonances: ResonanceModel[];
  /** Measured points (`data` blocks) and the fits asked of them (`fit` blocks); see docs/fit.md. */
  data: DataModel[];
  fits: FitRequestModel[];
  /** The `slower` blocks (docs/slower.md). */
  slowers: SlowerModel[];
  /** Magnetic traps (`trap` blocks; docs/traps.md). */
  traps: TrapModel[];
  settings: SettingsModel;
  names: NameUse[];
  /** Problems found while building the model (the parser's own are in doc.problems). */
  problems: Problem[];
}

export type { BlockNode, LevelNode, SettingNode };
