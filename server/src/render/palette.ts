/**
 * Colours and line styles, all in this one file. Series colours are the project's own, the
 * same in the panel and in exported files; the panel takes text, grid and background from
 * VS Code theme variables (each with a fallback) so it follows the editor's theme. Every
 * series also differs by dash pattern or marker shape, so the diagrams stay readable in
 * greyscale and for colour-blind readers.
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

// Sublevel's own hues, designed by scripts/palette/design_palette.py: every one has at least
// 3:1 contrast against both light and dark editor backgrounds (so one set serves every theme),
// and they stay apart under simulated protanopia, deuteranopia and tritanopia
// (tests/render/palette.test.ts re-checks both). Neutrals are plain greys.
const INK = '#1d232b';
const GREY = '#5e6670';
/** Mid grey for field-insensitive curves: ≥ 3:1 on light and dark backgrounds alike. */
const MID_GREY = '#868b92';
const SKY = '#2295de';
const AMBER = '#d9731b';
const SAGE = '#8a935d';
const FUCHSIA = '#cd03ac';
const IRIS = '#784ff2';
const SCARLET = '#d92132';
const MAUVE = '#9a5d7b';
const ORCHID = '#d959ac';
const LEAF = '#3b9150';

/** Every hue of the palette by role, for the checks in the tests. */
export const HUES = { SKY, AMBER, SAGE, FUCHSIA, IRIS, SCARLET, MAUVE, ORCHID, LEAF, MID_GREY } as const;

const SERIES = [SKY, AMBER, SAGE, FUCHSIA, IRIS, SCARLET, MAUVE, ORCHID] as const;

const EXPORT: Palette = {
  background: '#fbfbf8',
  halo: '#fbfbf8',
  text: INK,
  muted: GREY,
  grid: '#dfe2e6',
  axis: '#6d747c',
  marker: IRIS,
  rising: AMBER,
  falling: SKY,
  flat: MID_GREY,
  total: INK,
  totalFill: SKY,
  series: SERIES,
  polarization: { pi: SKY, 'sigma+': AMBER, 'sigma-': FUCHSIA },
  good: LEAF,
  bad: SCARLET,
  fontFamily: 'system-ui, sans-serif',
};

const v = (name: string, fallback: string): string => `var(--vscode-${name}, ${fallback})`;

/** The panel keeps the series hues (they read on light and dark themes) and takes text and rules from the editor theme. */
const PANEL: Palette = {
  ...EXPORT,
  background: 'none',
  halo: v('editor-background', EXPORT.background),
  text: v('editor-foreground', INK),
  muted: v('descriptionForeground', GREY),
  grid: v('editorIndentGuide-background1', EXPORT.grid),
  axis: v('editorLineNumber-foreground', EXPORT.axis),
  total: v('editor-foreground', INK),
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
