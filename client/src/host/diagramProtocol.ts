import type { FieldUnit } from '../../../server/src/render/fieldUnits';

/** The custom request the panel uses to get a diagram from the language server. */
export const DIAGRAM_REQUEST = 'sublevel/diagram';

export interface DiagramParams {
  uri: string;
  view: 'levels' | 'pattern' | 'lines' | 'resonance' | 'residuals' | 'fieldmap' | 'slower';
  /** 0-based cursor line, to pick the level, beam or line being edited. */
  line?: number;
  theme: 'panel' | 'export';
  /** The panel's choices: the named field to draw at, and the levels view's range (tesla) and axis unit. */
  field?: string;
  fromT?: number;
  toT?: number;
  unit?: FieldUnit;
}

export type DiagramResult = { ok: true; title: string; svg: string; csv: string; fields?: string[] } | { ok: false; message: string };
