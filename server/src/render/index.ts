/** Diagram rendering: plain view data in, SVG (or CSV) text out. No DOM, no I/O. */
export type {
  FieldUnit,
  NamedFieldMark,
  LevelCrossing,
  LevelCurve,
  LevelLanes,
  LevelsViewData,
  LineComponent,
  LinesViewData,
  PatternPart,
  PatternPeak,
  PatternViewData,
  Polarization,
  ResonanceViewData,
  RenderTheme,
} from './viewData';
export { renderLevels } from './levels';
export { levelBands, type LevelBand } from './levelBands';
export { renderPattern } from './pattern';
export { renderLines } from './lines';
export { renderResonance } from './resonance';
export { renderResiduals, type ResidualsViewData } from './residuals';
export { fitCsv } from './fitCsv';
export { residualsCsv } from './residualsCsv';
export { slowerCsv } from './slowerCsv';
export { renderSlower, type SlowerViewData } from './slower';
export { csvNumberTableText, levelsCsv, linesCsv, patternCsv, patternTable, resonanceCsv, spectrumCsv, type CsvNumberTable, type SpectrumColumns } from './csv';
export { escapeXml } from './svgText';
export { fieldMapCsv, renderFieldMap, type FieldMapViewData } from './fieldMap';
export { trapCsv } from './trapCsv';
