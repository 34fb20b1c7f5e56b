/**
 * Every view drawn for the demo and for worst cases, in a real browser: the figures are
 * screenshotted (to SUBLEVEL_SHOTS_DIR when set, for a person to look at) and checked for what a
 * reader must see — every counted peak marked inside the plot, every named field with a rule,
 * no two labels overlapping, no text outside the frame. Measured with the browser's own text
 * layout (bounding boxes in the page, the SVG drawn at 1:1), not with the renderer's width estimate.
 */
import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { chromium, type Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { diagramFor, type DiagramRequest } from '../../server/src/views/diagram';
import { selectField } from '../../server/src/cli/selectors';
import { wideSlitBeam } from '../fixtures/ovenBeam';

const CHROMIUM = '/usr/bin/chromium';
const HAVE_CHROMIUM = existsSync(CHROMIUM);
const SHOTS = process.env.SUBLEVEL_SHOTS_DIR;

const example = (name: string): string => readFileSync(path.resolve(__dirname, '../../examples', name), 'utf8');

const beam = wideSlitBeam;
const K41 = 'species K41\n  level ground: 4s 2S1/2\nfield guide = 20 G\nfield bias = 60 G\nfield probe = 62 G\n';
const D_LINES = 'species Rb87\n  level ground: 5s 2S1/2\n  level p32: 5p 2P°3/2\nfield low = 0.1 G\nfield high = 1 T\nline D2: ground -> p32\n';
// Invented magnetometer setups: the level diagram breaks its energy axis into one band per F.
const RB_20UT = 'species Rb87\n  level ground: 5s 2S1/2\nfield bias = 20 uT\n';
const FORTY_BANDS = 'species Demo40\n  mass = 90 u\n  I = 9/2\n  mu_I = -1.3 muN\n  level upper: 5p 2P°3/2  A = -12 MHz  B = 3 MHz\nfield bias = 100 uT\n';
const SR_TINY = 'species Sr87\n  level p2: 5s 5p 3P°2\nfield tiny = 1 nT\n';
const FORTY = 'species Ya\n  mass = 100 u\n  I = 3/2\n  g_I = -0.0003\n  level ground: 4G9/2  A = 300 MHz\nfield lab = 50 G\n';

interface Case {
  name: string;
  text: string;
  req: Omit<DiagramRequest, 'theme'>;
  field?: string;
  peaks?: number;
  fieldMarks?: number;
  panels?: number;
}

const CASES: Case[] = [
  { name: 'pattern-demo', text: example('lithium-beam.sublevel'), req: { view: 'pattern' }, peaks: 2 },
  { name: 'pattern-j1-broad-low', text: beam('3P1', '40 T/m'), req: { view: 'pattern' }, peaks: 3 },
  { name: 'pattern-j2-five', text: beam('3P2', '400 T/m'), req: { view: 'pattern' }, peaks: 5 },
  { name: 'levels-demo', text: example('rubidium-bias.sublevel'), req: { view: 'levels' }, fieldMarks: 2 },
  { name: 'levels-k41-turnover', text: K41, req: { view: 'levels', toT: 0.012, fieldUnit: 'G' }, field: 'bias', fieldMarks: 3 },
  { name: 'levels-forty', text: FORTY, req: { view: 'levels' }, fieldMarks: 1 },
  { name: 'levels-bands-rb-50uT', text: RB_20UT, req: { view: 'levels', toT: 50e-6 }, fieldMarks: 1 },
  { name: 'levels-bands-forty-200uT', text: FORTY_BANDS, req: { view: 'levels', toT: 200e-6 }, fieldMarks: 1 },
  { name: 'levels-bands-fifty-1uT', text: SR_TINY, req: { view: 'levels', toT: 1e-6 }, fieldMarks: 1 },
  // Groups whose every component is under the lines figure's visibility floor (1e-4 of the strongest) get no panel:
  // at 0.1 G both ΔF = 2 groups; at 3.23 G the field mixes one of them above the floor.
  { name: 'lines-demo-3.23G', text: example('rubidium-bias.sublevel'), req: { view: 'lines' }, panels: 7 },
  { name: 'lines-0.1G', text: D_LINES, req: { view: 'lines' }, field: 'low', panels: 6 },
  { name: 'lines-1T', text: D_LINES, req: { view: 'lines' }, field: 'high', panels: 1 },
  { name: 'resonance-clock', text: example('rubidium-bias.sublevel'), req: { view: 'resonance', resonanceName: 'clock' } },
  { name: 'resonance-microwave', text: example('rubidium-bias.sublevel'), req: { view: 'resonance', resonanceName: 'microwave' } },
];

interface Measured {
  width: number;
  height: number;
  texts: { text: string; x: number; y: number; w: number; h: number; group: string }[];
  peaks: { x: number; y: number }[];
  plot: { left: number; right: number; top: number; bottom: number } | null;
  markers: number;
  panels: string | null;
}

describe.skipIf(!HAVE_CHROMIUM)('figures in the browser (demo and worst cases)', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await chromium.launch({ executablePath: CHROMIUM, headless: true, args: ['--no-sandbox', '--disable-gpu', '--no-first-run'] });
    if (SHOTS) mkdirSync(SHOTS, { recursive: true });
  }, 120_000);
  afterAll(async () => {
    await browser?.close();
  });

  it.each(CASES.map((c) => [c.name, c] as const))('%s', async (_name, c) => {
    const analysis = analyze(c.text);
    const req: DiagramRequest = { ...c.req, theme: 'export' };
    if (c.field) req.marker = selectField(analysis.model!, c.field);
    const d = diagramFor(analysis, req);
    if (!d.ok) throw new Error(d.message);
    const page = await browser.newPage({ viewport: { width: 800, height: 900 } });
    await page.setContent(`<!doctype html><html><body style="margin:0">${d.svg}</body></html>`);
    if (SHOTS) await page.locator('svg').first().screenshot({ path: path.join(SHOTS, `${c.name}.png`) });
    const m: Measured = await page.evaluate(() => {
      const svg = document.querySelector('svg')!;
      const num = (s: string | null) => (s ?? '').split(',').map(Number);
      const [left, right] = num(svg.getAttribute('data-x-range'));
      const [bottom, top] = num(svg.getAttribute('data-y-range'));
      return {
        width: Number(svg.getAttribute('width')),
        height: Number(svg.getAttribute('height')),
        texts: Array.from(svg.querySelectorAll('text'))
          .filter((t) => (t.textContent ?? '').trim() !== '')
          .map((t) => {
            const b = t.getBoundingClientRect();
            const g = t.closest('[data-kind], .sl-axis, .sl-legend, .sl-peak-table, .sl-panel-heading');
            return { text: t.textContent ?? '', x: b.x, y: b.y, w: b.width, h: b.height, group: g?.getAttribute('class') ?? '' };
          }),
        peaks: Array.from(svg.querySelectorAll('[data-kind="peak"] .sl-peak-mark')).map((p) => {
          const b = p.getBoundingClientRect();
          return { x: b.x + b.width / 2, y: b.y + b.height };
        }),
        plot: Number.isFinite(left) && Number.isFinite(top) ? { left, right, top, bottom } : null,
        markers: svg.querySelectorAll('[data-kind="marker"]').length,
        panels: svg.getAttribute('data-panels'),
      };
    });
    await page.close();

    // No text outside the frame.
    for (const t of m.texts) {
      expect(t.x, `"${t.text}" left edge`).toBeGreaterThanOrEqual(-0.5);
      expect(t.y, `"${t.text}" top edge`).toBeGreaterThanOrEqual(-0.5);
      expect(t.x + t.w, `"${t.text}" right edge`).toBeLessThanOrEqual(m.width + 0.5);
      expect(t.y + t.h, `"${t.text}" bottom edge`).toBeLessThanOrEqual(m.height + 0.5);
    }
    // No two labels overlap (1 px of slack for glyph boxes that touch).
    const overlaps: string[] = [];
    for (let i = 0; i < m.texts.length; i++) {
      for (let j = i + 1; j < m.texts.length; j++) {
        const a = m.texts[i];
        const b = m.texts[j];
        const ox = Math.min(a.x + a.w, b.x + b.w) - Math.max(a.x, b.x);
        const oy = Math.min(a.y + a.h, b.y + b.h) - Math.max(a.y, b.y);
        if (ox > 1 && oy > 1) overlaps.push(`"${a.text}" × "${b.text}"`);
      }
    }
    expect(overlaps).toEqual([]);
    if (c.peaks !== undefined) {
      // The figure marks exactly the peaks the beam report counts.
      expect(analysis.result!.beams[0]!.peaks).toHaveLength(c.peaks);
      expect(m.peaks).toHaveLength(c.peaks);
      for (const p of m.peaks) {
        expect(p.x).toBeGreaterThanOrEqual(m.plot!.left);
        expect(p.x).toBeLessThanOrEqual(m.plot!.right);
        expect(p.y).toBeGreaterThanOrEqual(m.plot!.top - 14);
        expect(p.y).toBeLessThanOrEqual(m.plot!.bottom);
      }
    }
    if (c.fieldMarks !== undefined) expect(m.markers).toBe(c.fieldMarks);
    if (c.panels !== undefined) expect(m.panels).toBe(String(c.panels));
  }, 60_000);
});
