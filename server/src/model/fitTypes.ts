/** The model of measured data (`data` blocks, inline or from a CSV file) and fit requests (`fit` blocks). */
import type { BlockNode, Range } from '../format/ast';
import type { BeamModel, LevelModel, SublevelName } from './types';

export type DataKind = 'resonance' | 'interval' | 'profile';

/** Where a point was written: its text in this file, or a line of the CSV file. */
export interface PointPlace {
  range: Range;
  /** 1-based line in the data file, when it came from one. */
  csvLine?: number;
}

/** A measured frequency of the block's pair (resonance or interval), at a known field or the fit's free field. */
export interface SpectralDatum extends PointPlace {
  frequencyHz: number;
  uncertaintyHz?: number;
  fieldT?: number;
  /** The unit the frequency was written in (`MHz`), so reports show each point back in its own unit. */
  unit?: string;
}

/** One detector reading: counts at a position, with an optional standard uncertainty. */
export interface ProfileDatum extends PointPlace {
  positionM: number;
  counts: number;
  error?: number;
}

export interface DataModel {
  name: string;
  node: BlockNode;
  nameRange: Range;
  kind: DataKind;
  level?: LevelModel;
  lower?: SublevelName;
  upper?: SublevelName;
  beam?: BeamModel;
  spectral: SpectralDatum[];
  profile: ProfileDatum[];
  /** The CSV file named by `file`, as written and where it leads. */
  file?: { written: string; location?: string; range: Range };
  /** Units the points were written in, to show results back in them. */
  units: { frequency?: string; field?: string; position?: string };
}

export const SPECTRAL_PARAMETERS = ['field', 'g_J', 'A', 'B'] as const;
export const PROFILE_PARAMETERS = ['gradient', 'temperature', 'offset', 'width', 'field', 'populations', 'background', 'source_scale'] as const;
/** Every parameter name a fit knows, spectral first, each once. */
export const FIT_PARAMETERS: readonly FitParameterName[] = [...new Set<FitParameterName>([...SPECTRAL_PARAMETERS, ...PROFILE_PARAMETERS])];
export type FitParameterName = (typeof SPECTRAL_PARAMETERS)[number] | (typeof PROFILE_PARAMETERS)[number];

export interface FitRequestModel {
  name: string;
  node: BlockNode;
  nameRange: Range;
  data: DataModel[];
  free: { name: FitParameterName; range: Range }[];
  /** Starting values in SI, with the unit written (to show results back in it). */
  starts: { name: FitParameterName; value: number; unit?: string; range: Range }[];
  /** Field range a one-point calibration searches. */
  rangeT: { fromT: number; toT: number; range?: Range; fromUnit?: string; toUnit?: string };
}
