/// <reference lib="dom" />
/**
 * The diagram panel's page script (bundled for the browser). It shows the SVG the extension
 * sends, switches views, exports through the extension, and shows hover read-outs built from
 * the diagram's data-* attributes. Incoming messages are untrusted and validated; no string
 * ever reaches innerHTML.
 */
import { FIELD_UNITS, isView, parseHostMessage, type FieldUnitName, type PageMessage, type ShowMessage, type View, type ViewOptions } from './messages';
import { pointerValue, readoutFor, scaleAt, type DataRecord } from './readout';
import { importSvg } from './svgImport';

interface VsCodeApi {
  postMessage(message: PageMessage): void;
  getState(): unknown;
  setState(state: unknown): void;
}
declare function acquireVsCodeApi(): VsCodeApi;

interface SavedState {
  view: View;
  options?: ViewOptions;
}

const vscode = acquireVsCodeApi();
const host = document.getElementById('sl-host') as HTMLElement;
const readout = document.getElementById('sl-readout') as HTMLElement;
const tabs = Array.from(document.querySelectorAll<HTMLButtonElement>('button[data-view]'));
const exportButtons = Array.from(document.querySelectorAll<HTMLButtonElement>('button[data-export]'));
const latest = new Map<View, ShowMessage>();
const optionsForm = document.getElementById('sl-options') as HTMLFormElement;
const fieldSelect = document.getElementById('sl-field') as HTMLSelectElement;
const rangeBox = document.getElementById('sl-range') as HTMLElement;
const fromInput = document.getElementById('sl-from') as HTMLInputElement;
const toInput = document.getElementById('sl-to') as HTMLInputElement;
const unitSelect = document.getElementById('sl-unit') as HTMLSelectElement;

const saved = vscode.getState() as Partial<SavedState> | undefined;
let current: View = saved && isView(saved.view) ? saved.view : 'levels';
let options: ViewOptions = saved?.options && typeof saved.options === 'object' ? saved.options : {};

function placeholder(textContent: string): HTMLElement {
  const p = document.createElement('p');
  p.className = 'sl-placeholder';
  p.textContent = textContent;
  return p;
}

function showCurrent(): void {
  hideReadout();
  const msg = latest.get(current);
  const svg = msg ? importSvg(document, msg.svg) : undefined;
  if (msg && svg) {
    svg.classList.add('sl-svg');
    host.replaceChildren(svg);
    document.title = msg.title;
  } else if (msg) {
    host.replaceChildren(placeholder('This diagram could not be displayed (the drawing was not valid SVG).'));
  } else {
    host.replaceChildren(placeholder('Waiting for the diagram…'));
  }
  for (const b of exportButtons) {
    b.disabled = !svg || (b.dataset.export === 'csv' && !msg?.csv);
  }
  showFieldChoices(msg?.fields ?? []);
  if (svg) followAxisUnit(svg);
  // The range applies to the energy diagram; the resonance view takes its range from the file.
  rangeBox.hidden = current !== 'levels';
}

/**
 * Until the user picks a unit, the unit control shows the field axis's unit, which echoes the
 * unit the file wrote (`5 G` → G), so From/to are typed in the unit the figure shows.
 */
function followAxisUnit(svg: Element): void {
  if (options.unit !== undefined || svg.getAttribute('data-x-name') !== 'B') return;
  const unit = svg.getAttribute('data-x-unit');
  if (unit !== null && (FIELD_UNITS as readonly string[]).includes(unit)) unitSelect.value = unit;
}

function showFieldChoices(names: string[]): void {
  const first = fieldSelect.options[0]!;
  const choices = names.map((n) => {
    const o = document.createElement('option');
    o.value = n;
    o.textContent = n;
    return o;
  });
  fieldSelect.replaceChildren(first, ...choices);
  fieldSelect.value = options.field && names.includes(options.field) ? options.field : '';
}

function readOptions(): ViewOptions {
  const o: ViewOptions = {};
  if (fieldSelect.value) o.field = fieldSelect.value;
  const from = fromInput.value === '' ? NaN : Number(fromInput.value);
  const to = toInput.value === '' ? NaN : Number(toInput.value);
  if (Number.isFinite(from)) o.from = from;
  if (Number.isFinite(to)) o.to = to;
  const unit = unitSelect.value;
  if ((FIELD_UNITS as readonly string[]).includes(unit)) o.unit = unit as FieldUnitName;
  return o;
}

/** Draws the export SVG on a canvas (an image from a data: URL, which the CSP allows) and returns PNG as base64. */
function rasterise(svgText: string, scale: number): Promise<string> {
  return new Promise((resolve, reject) => {
    const size = /<svg\b[^>]*\swidth="([\d.]+)"[^>]*\sheight="([\d.]+)"/.exec(svgText);
    const width = Number(size?.[1]);
    const height = Number(size?.[2]);
    if (!(width > 0 && height > 0)) return reject(new Error('no size'));
    const img = new Image();
    img.onload = () => {
      const canvas = document.createElement('canvas');
      canvas.width = Math.round(width * scale);
      canvas.height = Math.round(height * scale);
      const ctx = canvas.getContext('2d');
      if (!ctx) return reject(new Error('no canvas'));
      ctx.scale(scale, scale);
      ctx.drawImage(img, 0, 0, width, height);
      resolve(canvas.toDataURL('image/png').replace(/^data:image\/png;base64,/, ''));
    };
    img.onerror = () => reject(new Error('the SVG could not be drawn'));
    img.src = `data:image/svg+xml;charset=utf-8,${encodeURIComponent(svgText)}`;
  });
}

function selectView(view: View, announce: boolean): void {
  current = view;
  for (const t of tabs) {
    const on = t.dataset.view === view;
    t.setAttribute('aria-selected', String(on));
    t.tabIndex = on ? 0 : -1;
    if (on) host.setAttribute('aria-labelledby', t.id);
  }
  vscode.setState({ view, options } satisfies SavedState);
  showCurrent();
  if (announce) vscode.postMessage({ type: 'view', view });
}

// --- hover and focus read-outs -------------------------------------------------------

function hideReadout(): void {
  readout.hidden = true;
  readout.replaceChildren();
}

function fillReadout(target: Element | null, pointerText: string | undefined): boolean {
  const data = target instanceof SVGElement || target instanceof HTMLElement ? (target.dataset as DataRecord) : undefined;
  const r = data ? readoutFor(data) : undefined;
  if (!r && !pointerText) return false;
  const nodes: HTMLElement[] = [];
  if (r && r.heading) {
    const h = document.createElement('strong');
    h.className = 'sl-readout-heading';
    h.textContent = r.heading;
    nodes.push(h);
  }
  for (const line of r?.lines ?? []) {
    const d = document.createElement('div');
    d.textContent = line;
    nodes.push(d);
  }
  if (pointerText) {
    const d = document.createElement('div');
    d.className = 'sl-readout-pointer';
    d.textContent = pointerText;
    nodes.push(d);
  }
  readout.replaceChildren(...nodes);
  readout.hidden = false;
  return true;
}

function placeReadout(clientX: number, clientY: number): void {
  const pad = 14;
  const w = readout.offsetWidth;
  const h = readout.offsetHeight;
  const left = clientX + pad + w > window.innerWidth ? Math.max(0, clientX - pad - w) : clientX + pad;
  const top = clientY + pad + h > window.innerHeight ? Math.max(0, clientY - pad - h) : clientY + pad;
  // CSSOM property writes are not inline style markup, so the CSP allows them.
  readout.style.left = `${left}px`;
  readout.style.top = `${top}px`;
}

function userX(svg: SVGSVGElement, clientX: number, clientY: number): number {
  const ctm = svg.getScreenCTM();
  return ctm ? new DOMPoint(clientX, clientY).matrixTransform(ctm.inverse()).x : NaN;
}

host.addEventListener('pointermove', (e) => {
  const svg = host.querySelector('svg');
  const target = e.target instanceof Element ? e.target.closest('[data-kind]') : null;
  const ux = svg ? userX(svg, e.clientX, e.clientY) : NaN;
  const segments = svg ? Array.from(svg.querySelectorAll<SVGGElement>('.sl-segment'), (g) => g.dataset as DataRecord) : [];
  const pointerText = svg ? pointerValue(scaleAt(svg.dataset as DataRecord, segments, ux), ux) : undefined;
  if (!target && !pointerText) return hideReadout();
  if (fillReadout(target, pointerText)) placeReadout(e.clientX, e.clientY);
});
host.addEventListener('pointerleave', hideReadout);
host.addEventListener('focusin', (e) => {
  const target = e.target instanceof Element ? e.target.closest('[data-kind]') : null;
  if (!target) return;
  const box = target.getBoundingClientRect();
  if (fillReadout(target, undefined)) placeReadout(box.right, box.bottom);
});
host.addEventListener('focusout', hideReadout);

// --- controls ---------------------------------------------------------------------------

for (const t of tabs) {
  t.addEventListener('click', () => {
    const v = t.dataset.view;
    if (isView(v) && v !== current) selectView(v, true);
  });
  t.addEventListener('keydown', (e) => {
    const step = e.key === 'ArrowRight' ? 1 : e.key === 'ArrowLeft' ? -1 : 0;
    if (step === 0) return;
    const next = tabs[(tabs.indexOf(t) + step + tabs.length) % tabs.length];
    next.focus();
    const v = next.dataset.view;
    if (isView(v)) selectView(v, true);
  });
}

for (const b of exportButtons) {
  b.addEventListener('click', () => {
    const format = b.dataset.export;
    if (format === 'svg' || format === 'csv' || format === 'png') vscode.postMessage({ type: 'export', format, view: current });
  });
}

optionsForm.addEventListener('submit', (e) => {
  e.preventDefault();
  options = readOptions();
  vscode.setState({ view: current, options } satisfies SavedState);
  vscode.postMessage({ type: 'options', view: current, ...options });
});

window.addEventListener('message', (e: MessageEvent<unknown>) => {
  const msg = parseHostMessage(e.data);
  if (!msg) return;
  if (msg.type === 'rasterise') {
    rasterise(msg.svg, msg.scale).then(
      (data) => vscode.postMessage({ type: 'png', view: msg.view, data }),
      () => undefined,
    );
    return;
  }
  latest.set(msg.view, msg);
  if (msg.view === current) showCurrent();
});

if (options.field) fieldSelect.value = options.field;
if (options.from !== undefined) fromInput.value = String(options.from);
if (options.to !== undefined) toInput.value = String(options.to);
if (options.unit) unitSelect.value = options.unit;
selectView(current, false);
vscode.postMessage({ type: 'ready', view: current });
if (Object.keys(options).length > 0) vscode.postMessage({ type: 'options', view: current, ...options });
