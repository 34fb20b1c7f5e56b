/**
 * The diagram panel's HTML. Everything dynamic is added later by the page script; this
 * template holds only static structure, one stylesheet and one nonce'd script, under a
 * Content-Security-Policy that forbids inline code, inline styles and any remote content.
 */
import { FIELD_UNITS, VIEWS, type View } from './messages';

export interface PanelHtmlOptions {
  /** The webview's `cspSource` (origin allowed for the style sheet and images). */
  cspSource: string;
  /** Per-load nonce from `makeNonce()`. */
  nonce: string;
  scriptUri: string;
  styleUri: string;
}

const VIEW_NAMES: Record<View, string> = {
  levels: 'Energies vs field',
  pattern: 'Detector pattern',
  lines: 'Line components',
  resonance: 'Resonance vs field',
  residuals: 'Fit residuals',
  fieldmap: 'Field map',
  slower: 'Slower',
};

function escapeHtml(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');
}

/**
 * Keeps only origin-like source expressions (scheme://host…) from the webview's cspSource, so
 * it can neither open a new directive nor widen the policy with `*` or keywords.
 */
function cspSources(s: string): string {
  const kept = s.split(/\s+/).filter((t) => /^[a-z][a-z0-9+.-]*:\/\/[^\s;,'"<>]+$/i.test(t));
  return kept.length > 0 ? kept.join(' ') : "'none'";
}

export function contentSecurityPolicy(cspSource: string, nonce: string): string {
  const src = cspSources(cspSource);
  const n = nonce.replace(/[^A-Za-z0-9+/=_-]/g, '');
  return `default-src 'none'; img-src ${src} data:; style-src ${src}; script-src 'nonce-${n}';`;
}

export function panelHtml(opts: PanelHtmlOptions): string {
  const nonce = opts.nonce.replace(/[^A-Za-z0-9+/=_-]/g, '');
  const tabs = VIEWS.map(
    (v, i) =>
      `      <button type="button" role="tab" id="sl-tab-${v}" data-view="${v}" aria-controls="sl-host" ` +
      `aria-selected="${i === 0}" tabindex="${i === 0 ? 0 : -1}">${VIEW_NAMES[v]}</button>`,
  ).join('\n');
  // mT until the first diagram arrives; then the control follows the figure's field axis (page.ts).
  const unitOptions = FIELD_UNITS.map((u) => `<option${u === 'mT' ? ' selected' : ''}>${escapeHtml(u)}</option>`).join('');
  return `<!DOCTYPE html>
<html lang="en">
<head>
  <meta charset="utf-8">
  <meta http-equiv="Content-Security-Policy" content="${escapeHtml(contentSecurityPolicy(opts.cspSource, opts.nonce))}">
  <meta name="viewport" content="width=device-width, initial-scale=1">
  <link rel="stylesheet" href="${escapeHtml(opts.styleUri)}">
  <title>Sublevel diagrams</title>
</head>
<body>
  <header class="sl-toolbar">
    <div class="sl-tabs" role="tablist" aria-label="Diagram">
${tabs}
    </div>
    <div class="sl-actions" role="group" aria-label="Export">
      <button type="button" data-export="svg" disabled>Save SVG</button>
      <button type="button" data-export="csv" disabled>Save CSV</button>
      <button type="button" data-export="png" disabled>Save PNG</button>
    </div>
  </header>
  <form class="sl-options" id="sl-options" aria-label="Field and range">
    <label>Field <select id="sl-field"><option value="">first named field</option></select></label>
    <span class="sl-range" id="sl-range">
      <label>From <input id="sl-from" type="number" step="any" inputmode="decimal" size="6"></label>
      <label>to <input id="sl-to" type="number" step="any" inputmode="decimal" size="6"></label>
      <label>unit <select id="sl-unit">${unitOptions}</select></label>
    </span>
    <button type="submit">Apply</button>
  </form>
  <main>
    <div id="sl-host" class="sl-host" role="tabpanel" aria-labelledby="sl-tab-levels" aria-live="polite">
      <p class="sl-placeholder">Waiting for a .sublevel file…</p>
    </div>
    <div id="sl-readout" class="sl-readout" role="status" hidden></div>
  </main>
  <script nonce="${escapeHtml(nonce)}" src="${escapeHtml(opts.scriptUri)}"></script>
</body>
</html>
`;
}
