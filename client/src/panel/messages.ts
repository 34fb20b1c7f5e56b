/**
 * The messages between the diagram panel page and the extension host. Anything arriving over
 * postMessage is untrusted: `parseHostMessage` / `parsePageMessage` accept only the exact
 * shapes below and return undefined for everything else. No DOM, so both sides can use it.
 */
import { FIELD_UNITS, type FieldUnit as FieldUnitName } from '../../../server/src/render/fieldUnits';

export const VIEWS = ['levels', 'pattern', 'lines', 'resonance', 'residuals', 'fieldmap', 'slower'] as const;
export type View = (typeof VIEWS)[number];
export type ExportFormat = 'svg' | 'csv' | 'png';

/** The figures' own list of field units (G, mT, µT, nT, T): the control offers every unit an axis reads in. */
export { FIELD_UNITS, type FieldUnitName };

/** Extension → page: draw this diagram (SVG text from the shared renderer). */
export interface ShowMessage {
  type: 'show';
  view: View;
  svg: string;
  csv?: string;
  title: string;
  /** Named fields of the file, for the field chooser. */
  fields?: string[];
}

/** Extension → page: draw this export SVG on a canvas at `scale` and send it back as PNG. */
export interface RasteriseMessage {
  type: 'rasterise';
  view: View;
  svg: string;
  scale: number;
}

/** What the user chose in the panel's controls: the field to draw at and the levels view's range. */
export interface ViewOptions {
  field?: string;
  from?: number;
  to?: number;
  unit?: FieldUnitName;
}

/** Page → extension. */
export type PageMessage =
  | { type: 'ready'; view: View }
  | { type: 'view'; view: View }
  | { type: 'export'; format: ExportFormat; view: View }
  | ({ type: 'options'; view: View } & ViewOptions)
  | { type: 'png'; view: View; data: string };

export const MAX_SVG_CHARS = 8_000_000;
export const MAX_CSV_CHARS = 32_000_000;
export const MAX_TITLE_CHARS = 400;
export const MAX_PNG_BASE64_CHARS = 60_000_000;
const MAX_FIELDS = 64;
const MAX_NAME_CHARS = 100;

export function isView(v: unknown): v is View {
  return typeof v === 'string' && (VIEWS as readonly string[]).includes(v);
}

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

export function parseHostMessage(data: unknown): ShowMessage | RasteriseMessage | undefined {
  if (isRecord(data) && data.type === 'rasterise' && isView(data.view)) {
    if (typeof data.svg !== 'string' || data.svg.length > MAX_SVG_CHARS) return undefined;
    const scale = typeof data.scale === 'number' && data.scale >= 1 && data.scale <= 4 ? data.scale : undefined;
    return scale ? { type: 'rasterise', view: data.view, svg: data.svg, scale } : undefined;
  }
  if (!isRecord(data) || data.type !== 'show' || !isView(data.view)) return undefined;
  if (typeof data.svg !== 'string' || data.svg.length > MAX_SVG_CHARS) return undefined;
  if (typeof data.title !== 'string') return undefined;
  if (data.csv !== undefined && (typeof data.csv !== 'string' || data.csv.length > MAX_CSV_CHARS)) return undefined;
  const msg: ShowMessage = { type: 'show', view: data.view, svg: data.svg, title: data.title.slice(0, MAX_TITLE_CHARS) };
  if (typeof data.csv === 'string') msg.csv = data.csv;
  if (Array.isArray(data.fields)) msg.fields = data.fields.filter((f): f is string => typeof f === 'string').slice(0, MAX_FIELDS).map((f) => f.slice(0, MAX_NAME_CHARS));
  return msg;
}

function finite(v: unknown): number | undefined {
  return typeof v === 'number' && Number.isFinite(v) ? v : undefined;
}

function parseOptions(data: Record<string, unknown>): ViewOptions {
  const o: ViewOptions = {};
  if (typeof data.field === 'string' && data.field.length <= MAX_NAME_CHARS) o.field = data.field;
  const from = finite(data.from);
  const to = finite(data.to);
  if (from !== undefined) o.from = from;
  if (to !== undefined) o.to = to;
  if ((FIELD_UNITS as readonly unknown[]).includes(data.unit)) o.unit = data.unit as FieldUnitName;
  return o;
}

/** For the extension host: the page runs in a sandbox but its messages are still checked. */
export function parsePageMessage(data: unknown): PageMessage | undefined {
  if (!isRecord(data) || !isView(data.view)) return undefined;
  if (data.type === 'ready' || data.type === 'view') return { type: data.type, view: data.view };
  if (data.type === 'export' && (data.format === 'svg' || data.format === 'csv' || data.format === 'png')) {
    return { type: 'export', format: data.format, view: data.view };
  }
  if (data.type === 'options') return { type: 'options', view: data.view, ...parseOptions(data) };
  if (data.type === 'png' && typeof data.data === 'string' && data.data.length <= MAX_PNG_BASE64_CHARS && /^[A-Za-z0-9+/]*={0,2}$/.test(data.data)) {
    return { type: 'png', view: data.view, data: data.data };
  }
  return undefined;
}
