/**
 * The diagram panel page in a real browser: the page script is bundled with esbuild, the
 * HTML comes from panelHtml with a real nonce, and everything is served from a localhost
 * server so the Content-Security-Policy applies as it does in a VS Code webview. A stub
 * `acquireVsCodeApi` (its own nonce'd script file) records what the page posts and keeps the
 * webview state in sessionStorage so a reload can restore it.
 */
import { existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import * as esbuild from 'esbuild';
import { chromium, type Browser, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeNonce } from '../../client/src/panel/nonce';
import { panelHtml } from '../../client/src/panel/panelHtml';
import { levelsCsv, renderLevels, renderPattern } from '../../server/src/render';
import { levelsFixture, patternFixture } from '../render/fixtures';

const CHROMIUM = '/usr/bin/chromium';
const HAVE_CHROMIUM = existsSync(CHROMIUM);
if (!HAVE_CHROMIUM) {
  console.warn(`\n*** PANEL BROWSER TEST SKIPPED: ${CHROMIUM} is missing. Install Debian's chromium to run it. ***\n`);
}
const TITLE = HAVE_CHROMIUM
  ? 'panel page shows, hovers, exports, restores state and enforces its CSP'
  : `SKIPPED — ${CHROMIUM} IS MISSING: panel page browser test did not run`;

// A plausible dark theme's variables, standing in for what VS Code injects into webviews.
const THEME_CSS = `:root {
  --vscode-editor-background: #1f2124; --vscode-editor-foreground: #d8dadf;
  --vscode-descriptionForeground: #a0a4ab; --vscode-editorIndentGuide-background1: #3a3d42;
  --vscode-editorLineNumber-foreground: #7d828a; --vscode-charts-red: #f0745a; --vscode-charts-blue: #5aa5f0;
  --vscode-charts-purple: #c39bea; --vscode-charts-orange: #e9a44a; --vscode-charts-green: #7cc98a;
  --vscode-charts-yellow: #d8c24a; --vscode-font-family: system-ui, sans-serif; --vscode-font-size: 13px;
  --vscode-button-background: #2f6fb0; --vscode-button-foreground: #ffffff; --vscode-focusBorder: #4a9ff0;
  --vscode-button-secondaryBackground: #34373c; --vscode-button-secondaryForeground: #d8dadf;
  --vscode-editorHoverWidget-background: #2a2c30; --vscode-editorHoverWidget-border: #4a4d52;
  --vscode-panel-border: #3a3d42;
}`;

const STUB_JS = `(() => {
  window.__posted = [];
  window.__violations = [];
  document.addEventListener('securitypolicyviolation', (e) => window.__violations.push(e.violatedDirective));
  window.acquireVsCodeApi = () => ({
    postMessage: (m) => window.__posted.push(JSON.parse(JSON.stringify(m))),
    getState: () => { const s = sessionStorage.getItem('webview-state'); return s ? JSON.parse(s) : undefined; },
    setState: (s) => sessionStorage.setItem('webview-state', JSON.stringify(s)),
  });
})();`;

interface Served {
  url: string;
  close: () => Promise<void>;
}

function serve(files: Record<string, { type: string; body: string | Buffer }>): Promise<Served> {
  const server = http.createServer((req, res) => {
    const file = files[(req.url ?? '/').split('?')[0]];
    if (req.url === '/favicon.ico') {
      res.writeHead(204).end();
      return;
    }
    if (!file) {
      res.writeHead(404).end();
      return;
    }
    res.writeHead(200, { 'content-type': file.type, 'cache-control': 'no-store' }).end(file.body);
  });
  return new Promise((resolve) => {
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as AddressInfo;
      resolve({ url: `http://127.0.0.1:${port}`, close: () => new Promise((r) => server.close(() => r())) });
    });
  });
}

describe('diagram panel page (browser)', () => {
  let dir = '';
  let browser: Browser | undefined;
  let served: Served | undefined;
  const files: Record<string, { type: string; body: string | Buffer }> = {};

  beforeAll(async () => {
    if (!HAVE_CHROMIUM) return;
    dir = mkdtempSync(path.join(os.tmpdir(), 'sublevel-panel-'));
    // The bundle is kept in memory and served; `dir` only anchors esbuild's output paths.
    const built = await esbuild.build({
      entryPoints: [path.resolve(__dirname, '../../client/src/panel/page.ts')],
      bundle: true,
      format: 'iife',
      platform: 'browser',
      target: 'chrome110',
      write: false,
      outfile: path.join(dir, 'page.js'),
      logLevel: 'silent',
    });
    files['/page.js'] = { type: 'text/javascript', body: Buffer.from(built.outputFiles[0].contents) };
    files['/panel.css'] = { type: 'text/css', body: readFileSync(path.resolve(__dirname, '../../client/src/panel/panel.css')) };
    files['/theme.css'] = { type: 'text/css', body: THEME_CSS };
    files['/stub.js'] = { type: 'text/javascript', body: STUB_JS };
    served = await serve(files);

    const nonce = makeNonce();
    const html = panelHtml({ cspSource: served.url, nonce, scriptUri: '/page.js', styleUri: '/panel.css' })
      .replace('</head>', '  <link rel="stylesheet" href="/theme.css">\n</head>')
      .replace('<script nonce=', `<script nonce="${nonce}" src="/stub.js"></script>\n  <script nonce=`);
    files['/index.html'] = { type: 'text/html', body: html };
    // Second load: the same page with markup an attacker might manage to inject.
    files['/injected.html'] = {
      type: 'text/html',
      body: html.replace(
        '</body>',
        '<script>window.__injected = true;</script>\n<script nonce="not-the-nonce">window.__injectedWithWrongNonce = true;</script>\n</body>',
      ),
    };
    browser = await chromium.launch({
      executablePath: CHROMIUM,
      headless: true,
      args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
    });
  }, 120_000);

  afterAll(async () => {
    await browser?.close();
    await served?.close();
    if (dir) rmSync(dir, { recursive: true, force: true });
  });

  async function posted(page: Page): Promise<unknown[]> {
    return page.evaluate(() => (window as unknown as { __posted: unknown[] }).__posted);
  }

  it.skipIf(!HAVE_CHROMIUM)(TITLE, async () => {
    const b = browser as Browser;
    const base = (served as Served).url;
    // Playwright's newContext gives a fresh, throw-away profile for this run.
    const context = await b.newContext({ viewport: { width: 900, height: 620 } });
    const page = await context.newPage();
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(String(e)));
    page.on('console', (m) => {
      if (m.type() === 'error') errors.push(m.text());
      if (process.env.PANEL_DEBUG) console.log('[console]', m.type(), m.text(), m.location());
    });

    await page.goto(`${base}/index.html`);
    await page.waitForFunction(() => (window as unknown as { __posted: unknown[] }).__posted.length > 0);
    expect(await posted(page)).toEqual([{ type: 'ready', view: 'levels' }]);

    // A recorded 'show' message with the renderer's panel SVG.
    const data = levelsFixture();
    const show = { type: 'show', view: 'levels', svg: renderLevels(data, { kind: 'panel' }), csv: levelsCsv(data), title: data.title };
    await page.evaluate((m) => window.postMessage(m, '*'), show);
    await page.waitForSelector('#sl-host svg[data-view="levels"]');
    expect(await page.locator('#sl-host [data-kind="curve"]').count()).toBe(data.curves.length);
    expect(await page.title()).toBe(data.title);
    expect(await page.locator('button[data-export="csv"]').isDisabled()).toBe(false);

    // Before the user picks a unit, the unit control follows the field axis, which echoes the
    // file's unit: a file that writes gauss starts at G (it used to start at mT whatever the file wrote).
    expect(await page.inputValue('#sl-unit')).toBe('mT');
    const inGauss = { ...data, fieldUnit: 'G' as const };
    await page.evaluate((m) => window.postMessage(m, '*'), { ...show, svg: renderLevels(inGauss, { kind: 'panel' }) });
    await page.waitForSelector('#sl-host svg[data-x-unit="G"]');
    expect(await page.inputValue('#sl-unit')).toBe('G');
    // A magnetometer's axis in µT: the control offers it and follows (it offered G, mT and T only).
    await page.evaluate((m) => window.postMessage(m, '*'), { ...show, svg: renderLevels({ ...data, fieldUnit: 'µT' as const }, { kind: 'panel' }) });
    await page.waitForSelector('#sl-host svg[data-x-unit="µT"]');
    expect(await page.inputValue('#sl-unit')).toBe('µT');
    await page.evaluate((m) => window.postMessage(m, '*'), show);
    await page.waitForSelector('#sl-host svg[data-x-unit="mT"]');
    expect(await page.inputValue('#sl-unit')).toBe('mT');

    // Hover a point 70% along the top curve: the read-out names that state.
    const point = await page.evaluate(() => {
      const p = document.querySelector('[data-kind="curve"][data-id="F2m4"] path') as SVGPathElement;
      const at = p.getPointAtLength(p.getTotalLength() * 0.7);
      const s = new DOMPoint(at.x, at.y).matrixTransform(p.getScreenCTM() as DOMMatrix);
      return { x: s.x, y: s.y };
    });
    await page.mouse.move(point.x, point.y);
    const readout = page.locator('#sl-readout');
    await readout.waitFor({ state: 'visible' });
    const readoutText = await readout.innerText();
    expect(readoutText).toContain('F=2, m_F=2 → m_J=+1/2, m_I=3/2');
    expect(readoutText).toContain('seeks low field');
    expect(readoutText).toMatch(/B = 2\d\d(\.\d+)? mT/); // pointer position on the field axis

    const shot = path.join(os.tmpdir(), 'sublevel-panel-screenshots', 'panel.png');
    mkdirSync(path.dirname(shot), { recursive: true });
    await page.screenshot({ path: shot });
    console.log(`panel screenshot: ${shot}`);

    // Moving off the diagram hides the read-out.
    await page.mouse.move(5, 5);
    await readout.waitFor({ state: 'hidden' });

    // Export buttons post to the extension.
    await page.click('button[data-export="svg"]');
    await page.click('button[data-export="csv"]');
    expect((await posted(page)).slice(-2)).toEqual([
      { type: 'export', format: 'svg', view: 'levels' },
      { type: 'export', format: 'csv', view: 'levels' },
    ]);

    // PNG: the button asks the extension, which sends the export SVG back to be drawn on a canvas
    // (a data: image, allowed by the CSP); the page answers with the PNG at 3 pixels per unit.
    await page.click('button[data-export="png"]');
    expect((await posted(page)).at(-1)).toEqual({ type: 'export', format: 'png', view: 'levels' });
    const exportSvg = renderLevels(data, { kind: 'export' });
    await page.evaluate((svg) => window.postMessage({ type: 'rasterise', view: 'levels', svg, scale: 3 }, '*'), exportSvg);
    await page.waitForFunction(() => (window as unknown as { __posted: { type: string }[] }).__posted.some((m) => m.type === 'png'));
    const png = (await posted(page)).find((m) => (m as { type: string }).type === 'png') as { view: string; data: string };
    expect(png.view).toBe('levels');
    const bytes = Buffer.from(png.data, 'base64');
    expect(bytes.subarray(1, 4).toString('latin1')).toBe('PNG');
    const svgWidth = Number(/width="(\d+)"/.exec(exportSvg)![1]);
    expect(bytes.readUInt32BE(16)).toBe(svgWidth * 3);

    // Field and range choices: the named fields the extension sent are offered; Apply posts the choice.
    await page.evaluate((m) => window.postMessage(m, '*'), { ...show, fields: ['trap', 'probe'] });
    await page.waitForFunction(() => document.querySelectorAll('#sl-field option').length === 3);
    await page.selectOption('#sl-field', 'probe');
    await page.fill('#sl-from', '0');
    await page.fill('#sl-to', '150');
    await page.selectOption('#sl-unit', 'G');
    await page.click('#sl-options button[type="submit"]');
    expect((await posted(page)).at(-1)).toEqual({ type: 'options', view: 'levels', field: 'probe', from: 0, to: 150, unit: 'G' });

    expect(errors).toEqual([]);

    // Untrusted messages: wrong shapes are ignored; hostile SVG content is stripped. (Parsing it
    // still makes the CSP report the handler attributes before they are removed: expected.)
    await page.evaluate(() => {
      window.postMessage({ type: 'show', view: 'bogus', svg: '<svg xmlns="http://www.w3.org/2000/svg"/>', title: 'x' }, '*');
      window.postMessage({ type: 'show', view: 'levels', svg: 42, title: 'x' }, '*');
    });
    await page.waitForTimeout(100);
    expect(await page.locator('#sl-host [data-kind="curve"]').count()).toBe(data.curves.length);
    const hostile =
      '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 10 10" onload="window.__pwned=1">' +
      '<script>window.__pwned=2</script><rect width="5" height="5" onclick="window.__pwned=3"/>' +
      '<foreignObject><div xmlns="http://www.w3.org/1999/xhtml">x</div></foreignObject>' +
      '<use href="https://example.invalid/x.svg#a"/></svg>';
    await page.evaluate((svg) => window.postMessage({ type: 'show', view: 'levels', svg, title: 'hostile' }, '*'), hostile);
    await page.waitForFunction(() => document.querySelector('#sl-host svg rect') !== null);
    const cleaned = await page.evaluate(() => ({
      html: (document.querySelector('#sl-host') as HTMLElement).innerHTML,
      pwned: (window as unknown as { __pwned?: number }).__pwned,
    }));
    expect(cleaned.pwned).toBeUndefined();
    expect(cleaned.html).not.toMatch(/script|onload|onclick|foreignObject|example\.invalid/);
    await page.evaluate(() => window.postMessage({ type: 'show', view: 'levels', svg: '<div>not svg', title: 'bad' }, '*'));
    await page.waitForFunction(() => document.querySelector('#sl-host svg') === null);
    expect(await page.locator('#sl-host').innerText()).toContain('could not be displayed');

    // Switching view tells the extension, shows that view's diagram, and is remembered.
    await page.click('#sl-tab-pattern');
    expect((await posted(page)).at(-1)).toEqual({ type: 'view', view: 'pattern' });
    expect(await page.locator('#sl-tab-pattern').getAttribute('aria-selected')).toBe('true');
    expect(await page.locator('button[data-export="svg"]').isDisabled()).toBe(true);
    const pattern = patternFixture();
    await page.evaluate((m) => window.postMessage(m, '*'), { type: 'show', view: 'pattern', svg: renderPattern(pattern, { kind: 'panel' }), title: pattern.title });
    await page.waitForSelector('#sl-host svg[data-view="pattern"]');
    expect(await page.locator('button[data-export="csv"]').isDisabled()).toBe(true); // no CSV sent
    await page.reload();
    await page.waitForFunction(() => (window as unknown as { __posted: unknown[] }).__posted.length > 0);
    // The view and the field and range choices are restored and sent again.
    expect(await posted(page)).toEqual([
      { type: 'ready', view: 'pattern' },
      { type: 'options', view: 'pattern', field: 'probe', from: 0, to: 150, unit: 'G' },
    ]);
    expect(await page.locator('#sl-tab-pattern').getAttribute('aria-selected')).toBe('true');
    expect(await page.inputValue('#sl-to')).toBe('150');
    expect(errors.filter((e) => !/Content Security Policy/.test(e))).toEqual([]);

    // The CSP blocks scripts without the nonce.
    await page.goto(`${base}/injected.html`);
    await page.waitForFunction(() => (window as unknown as { __posted: unknown[] }).__posted.length > 0);
    const csp = await page.evaluate(() => {
      const w = window as unknown as { __injected?: boolean; __injectedWithWrongNonce?: boolean; __violations: string[] };
      return { injected: w.__injected, wrongNonce: w.__injectedWithWrongNonce, violations: w.__violations };
    });
    expect(csp.injected).toBeUndefined();
    expect(csp.wrongNonce).toBeUndefined();
    expect(csp.violations.filter((v) => v.startsWith('script-src')).length).toBe(2);
    await context.close();
  }, 120_000);
});
