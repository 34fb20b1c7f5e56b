/** What every hover section gets: the analysis (its result is computed on first read) and the user's options. */
import type { Analysis } from '../../eval/analyze';

export interface HoverOptions {
  /** Most sublevel rows shown per table. */
  sublevelRows: number;
  /** Most levels shown with a table in a field or magnet hover. */
  levelTables: number;
}

export const DEFAULT_HOVER_OPTIONS: HoverOptions = { sublevelRows: 24, levelTables: 4 };

export interface HoverContext {
  analysis: Analysis;
  options: HoverOptions;
}
