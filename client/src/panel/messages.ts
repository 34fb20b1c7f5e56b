/**
 * The messages between the diagram panel page and the extension host. Anything arriving over
 * postMessage is untrusted: `parseHostMessage` / `parsePageMessage` accept only the exact
 * shapes below and return undefined for everything else. No DOM, so both sides can use it.
 */

export const VIEWS = ['levels', 'pattern', 'lines'] as const;
export type View = (typeof VIEWS)[number];
export type ExportFormat = 'svg' | 'csv';

/** Extension → page: draw this diagram (SVG text from the shared renderer). */
export interface ShowMessage {
  type: 'show';
  view: View;
  svg: string;
  csv?: string;
  title: string;
}

/** Page → extension. */
export type PageMessage =
  | { type: 'ready'; view: View }
  | { type: 'view'; view: View }
  | { type: 'export'; format: ExportFormat; view: View };

export const MAX_SVG_CHARS = 8_000_000;
export const MAX_CSV_CHARS = 32_000_000;
export const MAX_TITLE_CHARS = 400;

export function isView(v: unknown): v is View {
  return typeof v === 'string' && (VIEWS as readonly string[]).includes(v);
}

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

export function parseHostMessage(data: unknown): ShowMessage | undefined {
  if (!isRecord(data) || data.type !== 'show' || !isView(data.view)) return undefined;
  if (typeof data.svg !== 'string' || data.svg.length > MAX_SVG_CHARS) return undefined;
  if (typeof data.title !== 'string') return undefined;
  if (data.csv !== undefined && (typeof data.csv !== 'string' || data.csv.length > MAX_CSV_CHARS)) return undefined;
  const msg: ShowMessage = { type: 'show', view: data.view, svg: data.svg, title: data.title.slice(0, MAX_TITLE_CHARS) };
  if (typeof data.csv === 'string') msg.csv = data.csv;
  return msg;
}

/** For the extension host: the page runs in a sandbox but its messages are still checked. */
export function parsePageMessage(data: unknown): PageMessage | undefined {
  if (!isRecord(data) || !isView(data.view)) return undefined;
  if (data.type === 'ready' || data.type === 'view') return { type: data.type, view: data.view };
  if (data.type === 'export' && (data.format === 'svg' || data.format === 'csv')) {
    return { type: 'export', format: data.format, view: data.view };
  }
  return undefined;
}
