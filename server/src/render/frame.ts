/**
 * The outer SVG document shared by all diagrams: viewBox, accessible title and description,
 * background, visible heading, and the root data a hover read-out needs to turn a pointer
 * position into an axis value.
 */
import type { Palette } from './palette';
import { el, text, type Attrs } from './svgText';

export const CHAR_WIDTH_11 = 6.3; // rough advance of an 11-unit sans-serif glyph, for layout only

export function estimateTextWidth(s: string, fontSize = 11): number {
  return Array.from(s).length * CHAR_WIDTH_11 * (fontSize / 11);
}

/** The note in lines no wider than `width`, broken at spaces (a comma stays with its word), as estimateTextWidth measures it. */
export function wrapNote(note: string, width: number): string[] {
  const words = note.split(' ');
  const lines: string[] = [];
  let line = '';
  for (const w of words) {
    const tried = line ? `${line} ${w}` : w;
    if (line && estimateTextWidth(tried) > width) {
      lines.push(line);
      line = w;
    } else line = tried;
  }
  if (line) lines.push(line);
  return lines;
}

export interface FrameSpec {
  view: 'levels' | 'pattern' | 'lines' | 'resonance' | 'residuals' | 'fieldmap' | 'slower';
  idBase: string;
  width: number;
  height: number;
  title: string;
  desc: string;
  pal: Palette;
  rootData?: Attrs;
}

export function svgDocument(spec: FrameSpec, body: string[]): string {
  const { pal } = spec;
  const head = [
    el('title', { id: `${spec.idBase}-t` }, text(spec.title)),
    el('desc', { id: `${spec.idBase}-d` }, text(spec.desc)),
  ];
  if (pal.background !== 'none') {
    head.push(el('rect', { class: 'sl-bg', width: spec.width, height: spec.height, fill: pal.background }));
  }
  head.push(
    el('text', { class: 'sl-heading', x: 16, y: 24, 'font-size': 15, 'font-weight': 600, fill: pal.text }, text(spec.title)),
  );
  return el(
    'svg',
    {
      xmlns: 'http://www.w3.org/2000/svg',
      viewBox: `0 0 ${spec.width} ${spec.height}`,
      width: spec.width,
      height: spec.height,
      role: 'img',
      'aria-labelledby': `${spec.idBase}-t ${spec.idBase}-d`,
      class: `sl-diagram sl-view-${spec.view}`,
      'data-view': spec.view,
      'font-family': pal.fontFamily,
      'font-size': 12,
      ...spec.rootData,
    },
    [...head, ...body],
  );
}

/** A diagram with nothing to plot: heading plus a plain explanation, never an exception. */
export function emptyDiagram(view: FrameSpec['view'], idBase: string, title: string, message: string, pal: Palette): string {
  return svgDocument(
    { view, idBase, width: 760, height: 160, title, desc: message, pal },
    [el('text', { class: 'sl-empty', x: 16, y: 70, fill: pal.muted }, text(message))],
  );
}
