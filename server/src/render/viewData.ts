/**
 * Plain input shapes for the three diagrams. They hold numbers and strings only, so the
 * renderer knows nothing of the engines; the evaluation layer adapts its results to them.
 * Energies are E/h in Hz, fields in tesla, positions in metres, moments in J/T.
 */

export type FieldUnit = 'T' | 'G' | 'mT';

export interface LevelCurve {
  id: string;
  /** Name of the state at the low-field end (e.g. "F=2, m_F=1"). */
  lowLabel: string;
  /** Name of the state at the high-field end (e.g. "m_J=1/2, m_I=1/2"). */
  highLabel: string;
  /** E/h in Hz at each entry of `fieldsT`. */
  energyHz: ArrayLike<number>;
  /** Magnetic moment −∂E/∂B in J/T at each entry of `fieldsT`, when known. */
  momentJT?: ArrayLike<number>;
}

export interface LevelCrossing {
  fieldT: number;
  energyHz: number;
  a: string;
  b: string;
}

export interface LevelsViewData {
  title: string;
  fieldUnit: FieldUnit;
  /** Sweep fields in tesla, ascending. */
  fieldsT: ArrayLike<number>;
  /** Unit of the energy axis in Hz (1e9 draws GHz); chosen from the data when absent. */
  energyUnitHz?: number;
  curves: LevelCurve[];
  /** The working field of the setup file, drawn as a vertical rule. */
  markerT?: number;
  markerLabel?: string;
  crossings?: LevelCrossing[];
}

export interface PatternPart {
  id: string;
  label: string;
  /** Contribution of one sublevel at each entry of `positionsM` (same scale as `total`). */
  values: ArrayLike<number>;
}

export interface PatternPeak {
  positionM: number;
  height: number;
  /** Labels of the sublevels that land in this peak. */
  members: string[];
}

export interface PatternViewData {
  title: string;
  /** Positions across the detector plane in metres, ascending. */
  positionsM: ArrayLike<number>;
  total: ArrayLike<number>;
  parts: PatternPart[];
  peaks: PatternPeak[];
  verdict: { resolved: boolean; text: string };
}

export type Polarization = 'pi' | 'sigma+' | 'sigma-';

export interface LineComponent {
  /** Frequency offset from the zero-field line in Hz. */
  offsetHz: number;
  /** Relative strength (any positive scale; drawn as stick height). */
  strength: number;
  polarization: Polarization;
  label: string;
}

export interface LinesViewData {
  title: string;
  components: LineComponent[];
  /** Unit of the offset axis in Hz (1e6 draws MHz); chosen from the data when absent. */
  unitHz?: number;
}

/** `panel`: colours follow the editor theme through CSS variables; `export`: fixed light palette for files. */
export type RenderTheme = { kind: 'panel' } | { kind: 'export' };
