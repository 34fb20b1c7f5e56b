/** The panel's DOM-free parts: message validation, read-out text, the HTML template and the nonce. */
import { describe, expect, it } from 'vitest';
import { parseHostMessage, parsePageMessage } from '../../client/src/panel/messages';
import { makeNonce } from '../../client/src/panel/nonce';
import { contentSecurityPolicy, panelHtml } from '../../client/src/panel/panelHtml';
import { formatEngineering, formatScientific, pointerValue, readoutFor, scaleAt } from '../../client/src/panel/readout';

describe('message validation', () => {
  const ok = { type: 'show', view: 'levels', svg: '<svg/>', title: 't' };

  it('accepts exactly the show message shape', () => {
    expect(parseHostMessage(ok)).toEqual(ok);
    expect(parseHostMessage({ ...ok, csv: 'a,b\n', extra: 1 })).toEqual({ ...ok, csv: 'a,b\n' });
    expect((parseHostMessage({ ...ok, title: 'x'.repeat(1000) }) as { title: string }).title).toHaveLength(400);
  });

  it('rejects anything else', () => {
    for (const bad of [null, 'show', [], { ...ok, type: 'Show' }, { ...ok, view: 'spectrum' }, { ...ok, svg: 1 }, { ...ok, csv: {} }, { ...ok, title: undefined }, { ...ok, svg: 'x'.repeat(8_000_001) }]) {
      expect(parseHostMessage(bad)).toBeUndefined();
    }
  });

  it('checks page messages for the extension host', () => {
    expect(parsePageMessage({ type: 'export', format: 'csv', view: 'lines' })).toEqual({ type: 'export', format: 'csv', view: 'lines' });
    expect(parsePageMessage({ type: 'ready', view: 'pattern', junk: true })).toEqual({ type: 'ready', view: 'pattern' });
    expect(parsePageMessage({ type: 'export', format: 'png', view: 'lines' })).toEqual({ type: 'export', format: 'png', view: 'lines' });
    expect(parsePageMessage({ type: 'export', format: 'gif', view: 'lines' })).toBeUndefined();
    expect(parsePageMessage({ type: 'options', view: 'levels', field: 'bias', from: 0, to: 120, unit: 'G', junk: 1 })).toEqual({ type: 'options', view: 'levels', field: 'bias', from: 0, to: 120, unit: 'G' });
    expect(parsePageMessage({ type: 'options', view: 'levels', from: Infinity, unit: 'kG' })).toEqual({ type: 'options', view: 'levels' });
    // A magnetometer's units: the panel offers every unit a figure's field axis reads in.
    expect(parsePageMessage({ type: 'options', view: 'levels', from: 0, to: 50, unit: 'µT' })).toEqual({ type: 'options', view: 'levels', from: 0, to: 50, unit: 'µT' });
    expect(parsePageMessage({ type: 'options', view: 'levels', to: 50, unit: 'nT' })).toEqual({ type: 'options', view: 'levels', to: 50, unit: 'nT' });
    expect(parsePageMessage({ type: 'png', view: 'pattern', data: 'iVBORw0KGgo=' })).toEqual({ type: 'png', view: 'pattern', data: 'iVBORw0KGgo=' });
    expect(parsePageMessage({ type: 'png', view: 'pattern', data: '<script>' })).toBeUndefined();
    expect(parseHostMessage({ type: 'rasterise', view: 'resonance', svg: '<svg/>', scale: 3 })).toEqual({ type: 'rasterise', view: 'resonance', svg: '<svg/>', scale: 3 });
    expect(parseHostMessage({ type: 'rasterise', view: 'resonance', svg: '<svg/>', scale: 100 })).toBeUndefined();
    expect(parseHostMessage({ ...ok, fields: ['trap', 3, 'probe'] })).toEqual({ ...ok, fields: ['trap', 'probe'] });
    expect(parsePageMessage({ type: 'view' })).toBeUndefined();
  });
});

describe('read-out text', () => {
  it('formats with engineering prefixes and a true minus sign', () => {
    expect(formatEngineering(6.834682611e9, 'Hz')).toBe('6.83468 GHz');
    expect(formatEngineering(-0.00012, 'T', 4)).toBe('−120 µT');
    expect(formatEngineering(0, 'Hz')).toBe('0 Hz');
    expect(formatScientific(-9.2740100657e-24, 'J/T')).toBe('−9.274×10⁻²⁴ J/T');
    expect(formatScientific(1.5, 'J/T')).toBe('1.5 J/T');
  });

  it('builds lines from a curve element’s data attributes (dataset names)', () => {
    const r = readoutFor({
      kind: 'curve',
      label: 'F=2, m_F=2 → m_J=+1/2, m_I=3/2',
      low: 'F=2, m_F=2',
      high: 'm_J=+1/2, m_I=3/2',
      fieldT: '0.12',
      energyHz: '2806450000',
      momentJt: '-9.285e-24',
      momentMub: '-1.0011',
      trend: 'rising',
    });
    expect(r.heading).toBe('F=2, m_F=2 → m_J=+1/2, m_I=3/2');
    expect(r.lines).toEqual([
      'low field: F=2, m_F=2',
      'high field: m_J=+1/2, m_I=3/2',
      'E/h = 2.80645 GHz at B = 120 mT',
      'μ = −1.0011 μB (−9.285×10⁻²⁴ J/T)',
      'seeks low field (E rises with B)',
    ]);
  });

  it('reads components and peaks', () => {
    expect(readoutFor({ label: 'a', polarization: 'σ+', offsetHz: '42000000', strength: '1' }).lines).toEqual(['Δf = +42 MHz', 'polarisation σ+', 'strength 1']);
    expect(readoutFor({ label: 'p', positionM: '-0.0021', height: '0.8', members: 'm_F=-2' }).lines).toEqual(['z = −2.1 mm', 'height 0.8', 'states: m_F=-2']);
  });

  it('maps a pointer x to the axis value from the root description', () => {
    const root = { xName: 'B', xUnit: 'mT', xFactor: '0.001', xDomain: '0,0.3', xRange: '100,700' };
    expect(pointerValue(root, 400)).toBe('B = 150 mT');
    expect(pointerValue(root, 50)).toBeUndefined();
    expect(pointerValue({ xDomain: 'a,b' }, 10)).toBeUndefined();
    // A log field axis from 1 µT to 1 T over 0…600: the middle is 1 mT, not 0.5 T.
    const log = { xDomain: '1e-6,1', xRange: '0,600', xFactor: '1', xName: 'B', xUnit: 'T', xScale: 'log' };
    expect(pointerValue(log, 300)).toBe('B = 0.001 T');
    expect(pointerValue(log, 400)).toBe('B = 0.01 T');
  });

  it('reads a broken axis segment by segment, each as its own ticks read', () => {
    // A spectrum's broken axis: the root has no single x range; each segment describes itself.
    const root = { xName: 'Δf', xUnit: 'GHz', xFactor: '1000000000', xDomain: '-1.2e9,1.2e9' };
    const segs = [
      { xName: 'Δf + 1.05 GHz', xUnit: 'kHz', xFactor: '1000', xDomain: '-20000,20000', xRange: '64,264' },
      { xName: 'Δf', xUnit: 'kHz', xFactor: '1000', xDomain: '-20000,20000', xRange: '280,480' },
    ];
    expect(pointerValue(scaleAt(root, segs, 164), 164)).toBe('Δf + 1.05 GHz = 0 kHz');
    expect(pointerValue(scaleAt(root, segs, 480), 480)).toBe('Δf = 20 kHz');
    // In the gap between segments there is no reading.
    expect(pointerValue(scaleAt(root, segs, 272), 272)).toBeUndefined();
  });
});

describe('panel HTML', () => {
  const nonce = 'AbC123+/xyz0AbC123+/xyz0';
  const html = panelHtml({ cspSource: 'https://file+.vscode-resource.vscode-cdn.net', nonce, scriptUri: 'https://x/page.js?a=1&b=2', styleUri: 'https://x/panel.css' });

  it('carries the exact CSP', () => {
    expect(html).toContain(
      `content="default-src 'none'; img-src https://file+.vscode-resource.vscode-cdn.net data:; style-src https://file+.vscode-resource.vscode-cdn.net; script-src 'nonce-${nonce}';"`.replace(/'/g, '&#39;'),
    );
  });

  it('has no inline script, inline style or remote content', () => {
    expect(html).not.toMatch(/style=|<style/);
    const scripts = html.match(/<script[^>]*>/g) ?? [];
    expect(scripts).toEqual([`<script nonce="${nonce}" src="https://x/page.js?a=1&amp;b=2">`]);
    expect(html).not.toMatch(/\son\w+=/);
  });

  it('offers the seven views, three exports and the field and range choices', () => {
    expect(html.match(/role="tab"/g)).toHaveLength(7);
    expect(html).toContain('data-view="fieldmap"');
    expect(html).toContain('data-view="slower"');
    expect(html).toContain('data-view="resonance"');
    expect(html).toContain('data-view="residuals"');
    expect(html).toContain('data-export="svg"');
    expect(html).toContain('data-export="csv"');
    expect(html).toContain('data-export="png"');
    for (const id of ['sl-field', 'sl-from', 'sl-to', 'sl-unit']) expect(html).toContain(`id="${id}"`);
    expect(html).toContain('<select id="sl-unit"><option>G</option><option selected>mT</option><option>µT</option><option>nT</option><option>T</option></select>');
    expect(html).toContain('id="sl-host"');
    expect(html).toContain('id="sl-readout"');
  });

  it('cannot be talked into a wider policy', () => {
    const csp = contentSecurityPolicy("https://a; script-src * 'unsafe-inline'", "n'; script-src *");
    expect(csp).toBe("default-src 'none'; img-src 'none' data:; style-src 'none'; script-src 'nonce-nscript-src';");
    expect(contentSecurityPolicy('https://a.example https://b.example:8080/x', 'n')).toBe(
      "default-src 'none'; img-src https://a.example https://b.example:8080/x data:; style-src https://a.example https://b.example:8080/x; script-src 'nonce-n';",
    );
    expect(contentSecurityPolicy('*', 'n')).toBe("default-src 'none'; img-src 'none' data:; style-src 'none'; script-src 'nonce-n';");
  });
});

describe('makeNonce', () => {
  it('gives 144 fresh random bits as base64', () => {
    const a = makeNonce();
    const b = makeNonce();
    expect(a).toMatch(/^[A-Za-z0-9+/]{24}$/);
    expect(Buffer.from(a, 'base64')).toHaveLength(18);
    expect(a).not.toBe(b);
  });
});
