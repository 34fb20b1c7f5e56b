/**
 * Plain input shapes for the three diagrams. They hold numbers and strings only, so the
 * renderer knows nothing of the engines; the evaluation layer adapts its results to them.
 * Energies are E/h in Hz, fields in tesla, positions in metres, moments in J/T.
 */

import type { FieldUnit } from './fieldUnits';
import type { LevelBand } from './levelBands';
/** Units a field axis reads in (the one list: fieldUnits.ts). */
export type { FieldUnit };

/** A named field of the file on a field axis. */
export interface NamedFieldMark {
  fieldT: number;
  label: string;
  /** The value as the file wrote it (`250 mT`), so the label echoes the user's unit; else the axis unit. */
  valueText?: string;
}

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
  /** Index into `curves` of the first state that crosses (the diamond sits on its energy scale, shared with the other). */
  curveA: number;
  /** Their names, for the crossing's title and data attributes. */
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
  /** The chosen working field of the setup file: a vertical rule with a dot on every curve. */
  markerT?: number;
  markerLabel?: string;
  /** The chosen field as the file wrote it (`1 nT`), for its label; else it is written in the axis unit. */
  markerText?: string;
  /** Every named field and magnet field of the file, each drawn as a labelled rule when inside the sweep. */
  fieldMarks?: NamedFieldMark[];
  crossings?: LevelCrossing[];
  /**
   * The energy bands of a broken axis, low to high (levelBands.ts, worked out once by the view).
   * Fewer than two, or absent: one energy axis.
   */
  bands?: LevelBand[];
  /**
   * What the label lanes name: `low` and `high` are the bases of the low- and high-field names
   * ("F, m_F" and "m_J, m_I"); `ends` is the regime where the range ends (the engine's regime
   * limits), `strongLimitT` the field from which it is strong, when known. The right lane gives the
   * high-field name only when the range ends past the change of regime (x ≥ 1) or in the strong
   * field; else the low-field name, followed along the curve. Each lane's header says which. Absent: high-field names, no headers.
   */
  lanes?: LevelLanes;
}

export interface LevelLanes {
  low: string;
  high: string;
  /** Where the range ends: 'uncoupling' is the intermediate field past the change of regime (x ≥ 1). */
  ends: 'weak' | 'intermediate' | 'uncoupling' | 'strong';
  strongLimitT?: number;
  /** The regime number x at the range's end, when the range ends past the change of regime but short of the strong field. */
  endX?: number;
}

export interface PatternPart {
  id: string;
  label: string;
  /** Contribution of one sublevel at each entry of `positionsM` (same scale as `total`). */
  values: ArrayLike<number>;
}

export interface PatternPeak {
  positionM: number;
  /** The summed profile at the peak, same scale as `total`. */
  height: number;
  /** Full width at half maximum of the peak's own profile, m, when known (it sets how much of the axis the peak needs). */
  fwhmM?: number | null;
  /** Labels of the sublevels that land in this peak. */
  members: string[];
}

export interface PatternViewData {
  title: string;
  /** Positions across the detector plane in metres, ascending: the whole computed grid, never trimmed. */
  positionsM: ArrayLike<number>;
  /** Summed profile: fraction of all atoms per metre of detector position (it integrates to 1 less what falls off the grid). */
  total: ArrayLike<number>;
  parts: PatternPart[];
  /** The peaks the beam report counts, in order of position; the figure marks every one. */
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
  /**
   * With a spectrum: the strength times the angular factor of its viewing direction and analyser
   * (what the curve counts). The stick is drawn at this height; 0 (π along the field) is not drawn.
   */
  observed?: number;
}

export interface LinesViewData {
  title: string;
  components: LineComponent[];
  /** The field the components were computed at, and its name in the file. */
  fieldT?: number;
  fieldName?: string;
  /** The field as the file wrote it (`3.23 G`), for the figure's notes. */
  fieldText?: string;
  /** Unit of the offset axis in Hz (1e6 draws MHz); chosen from the data when absent. */
  unitHz?: number;
  /** A synthesized spectrum drawn over the sticks (its window sets the axis). */
  spectrum?: LineSpectrumCurve;
}

export interface LineSpectrumCurve {
  offsetHz: ArrayLike<number>;
  /** Intensity per Hz; drawn with its highest sample at the height of the strongest stick unless `unitPeak` is given. */
  intensity: ArrayLike<number>;
  /**
   * The intensity at the centre of one isolated component of unit weight (the line shape's peak):
   * the curve is then drawn in stick units, so an isolated peak meets its stick and a blend of
   * components stands above them, as the spectrum counts it.
   */
  unitPeak?: number;
  /** What the curve is, for the legend: "spectrum across the field, all light, Voigt FWHM ≈ 523.4 MHz". */
  caption: string;
  /**
   * Where the curve stands above `floor` × its peak (offsets, Hz, ascending and apart): the figure
   * frames these, not the whole sample window. Found from the samples when absent.
   */
  stretches?: [number, number][];
  /** That fraction of the peak (render/spectrumFrame.ts CURVE_FLOOR when absent). */
  floor?: number;
  /** The report's sample window and sample count, for the figure's note. */
  windowHz?: [number, number];
  points?: number;
  /** Extra exact samples over the stretches when the report's step over the peaks; drawn with the others. */
  fine?: { offsetHz: ArrayLike<number>; intensity: ArrayLike<number> };
  /** The report's sample step, when `fine` is given, and the line's width (Voigt FWHM). */
  reportStepHz?: number;
  widthHz?: number;
}

/** `panel`: colours follow the editor theme through CSS variables; `export`: fixed light palette for files. */
export type RenderTheme = { kind: 'panel' } | { kind: 'export' };

/** One RF/microwave transition of a level against field: what a resonance or clock experiment tunes. */
export interface ResonanceViewData {
  title: string;
  fieldUnit: FieldUnit;
  /** Fields in tesla, ascending. */
  fieldsT: ArrayLike<number>;
  /** Transition frequency f = (E_upper − E_lower)/h at each field, Hz. */
  frequencyHz: ArrayLike<number>;
  /** df/dB at each field, Hz/T (from the exact moments of both states). */
  slopeHzPerT: ArrayLike<number>;
  /** "F=1, m_F=-1 → F=2, m_F=+1". */
  pairLabel: string;
  /** Fields where df/dB = 0, as the evaluation found them. */
  insensitive: { fieldT: number; frequencyHz: number }[];
  /** Fields where the transition is at the file's frequency. */
  resonances: { fieldT: number; frequencyHz: number }[];
  /** The file's frequency, when it gives one: a figure with no resonance in range says it is not reached. */
  soughtHz?: number;
  /** Named fields of the file, drawn as rules when inside the range. */
  fieldMarks: NamedFieldMark[];
}
