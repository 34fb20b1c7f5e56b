/** The custom request the panel uses to get a diagram from the language server. */
export const DIAGRAM_REQUEST = 'sublevel/diagram';

export interface DiagramParams {
  uri: string;
  view: 'levels' | 'pattern' | 'lines';
  /** 0-based cursor line, to pick the level, beam or line being edited. */
  line?: number;
  theme: 'panel' | 'export';
}

export type DiagramResult = { ok: true; title: string; svg: string; csv: string } | { ok: false; message: string };
