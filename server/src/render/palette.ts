/**
 * Colours and line styles. The panel palette names VS Code theme variables (each with a
 * fallback) so the diagram follows the editor's colour theme; the export palette is a fixed
 * light scheme for files. Every series also differs by dash pattern or marker shape, so the
 * diagrams stay readable in greyscale and for colour-blind readers.
 */
import type { Polarization, RenderTheme } from './viewData';

export interface Palette {
  /** Page fill behind the plot; 'none' lets the panel background show through. */
  background: string;
  /** Colour used for halos behind text drawn over lines. */
  halo: string;
  text: string;
  muted: string;
  grid: string;
  axis: string;
  marker: string;
  /** Energy rises with field (moment opposes the field): the state seeks low field. */
  rising: string;
  /** Energy falls with field: the state seeks high field. */
  falling: string;
  flat: string;
  total: string;
  totalFill: string;
  series: readonly string[];
  polarization: Record<Polarization, string>;
  good: string;
  bad: string;
  fontFamily: string;
}

// Fixed colours chosen for contrast on a light background and for mutual distinctness
// under the common forms of colour blindness (blue/orange/reddish-purple/bluish-green axis).
const INK = '#1d232b';
const GREY = '#5e6670';
const BLUE = '#2166ac';
const ORANGE = '#d7832a';
const VERMILION = '#c0461d';
const TEAL = '#23917a';
const PURPLE = '#7b4fa6';
const MAGENTA = '#b03a8c';
const OLIVE = '#8c7d12';

const EXPORT: Palette = {
  background: '#fbfbf8',
  halo: '#fbfbf8',
  text: INK,
  muted: GREY,
  grid: '#dfe2e6',
  axis: '#6d747c',
  marker: PURPLE,
  rising: VERMILION,
  falling: BLUE,
  flat: GREY,
  total: INK,
  totalFill: BLUE,
  series: [BLUE, ORANGE, TEAL, MAGENTA, OLIVE, VERMILION, PURPLE, GREY],
  polarization: { pi: BLUE, 'sigma+': ORANGE, 'sigma-': MAGENTA },
  good: '#2d7a3e',
  bad: VERMILION,
  fontFamily: 'system-ui, sans-serif',
};

const v = (name: string, fallback: string): string => `var(--vscode-${name}, ${fallback})`;

const PANEL: Palette = {
  background: 'none',
  halo: v('editor-background', EXPORT.background),
  text: v('editor-foreground', INK),
  muted: v('descriptionForeground', GREY),
  grid: v('editorIndentGuide-background1', EXPORT.grid),
  axis: v('editorLineNumber-foreground', EXPORT.axis),
  marker: v('charts-purple', PURPLE),
  rising: v('charts-red', VERMILION),
  falling: v('charts-blue', BLUE),
  flat: v('descriptionForeground', GREY),
  total: v('editor-foreground', INK),
  totalFill: v('charts-blue', BLUE),
  series: [
    v('charts-blue', BLUE),
    v('charts-orange', ORANGE),
    v('charts-green', TEAL),
    v('charts-purple', MAGENTA),
    v('charts-yellow', OLIVE),
    v('charts-red', VERMILION),
    v('terminal-ansiMagenta', PURPLE),
    v('descriptionForeground', GREY),
  ],
  polarization: {
    pi: v('charts-blue', BLUE),
    'sigma+': v('charts-orange', ORANGE),
    'sigma-': v('charts-purple', MAGENTA),
  },
  good: v('testing-iconPassed', EXPORT.good),
  bad: v('errorForeground', VERMILION),
  fontFamily: v('font-family', EXPORT.fontFamily),
};

export function paletteFor(theme: RenderTheme): Palette {
  return theme.kind === 'panel' ? PANEL : EXPORT;
}

/** Dash patterns cycled together with colours; index 0 is solid. */
export const SERIES_DASHES: readonly (string | undefined)[] = [undefined, '6 3', '1.6 2.4', '9 3 2 3'];

/** The line style of each polarisation: solid, dashed, dotted — distinct without colour. */
export const POLARIZATION_DASH: Record<Polarization, string | undefined> = {
  pi: undefined,
  'sigma+': '6 3',
  'sigma-': '1.6 2.6',
};

/** Human names in the trade's notation. */
export const POLARIZATION_NAME: Record<Polarization, string> = { pi: 'π', 'sigma+': 'σ+', 'sigma-': 'σ−' };

/** Falling curves are dashed so low- and high-field seekers differ in greyscale too. */
export const FALLING_DASH = '7 3';
