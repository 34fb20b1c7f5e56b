/**
 * PNG from the same export SVG, for notebooks and slides: the system's Chromium draws the SVG
 * headless at three device pixels per SVG unit (a 760-unit figure becomes 2280 px wide, about
 * 300 dpi at 19 cm). No browser is downloaded; without one, the command says so.
 */
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { UsageError } from './args';
import { lazyBuiltin } from './lazyBuiltin';

export const PNG_SCALE = 3;

function browserPath(): string | undefined {
  const given = process.env.SUBLEVEL_CHROMIUM;
  for (const p of [given, '/usr/bin/chromium', '/usr/bin/chromium-browser', '/usr/bin/google-chrome']) if (p && existsSync(p)) return p;
  return undefined;
}

function svgSize(svg: string): { width: number; height: number } {
  const root = /<svg\b[^>]*>/.exec(svg)?.[0] ?? '';
  const num = (name: string): number => Number(new RegExp(`\\s${name}="([\\d.]+)"`).exec(root)?.[1]);
  const width = num('width');
  const height = num('height');
  if (!(width > 0 && height > 0)) throw new UsageError('the diagram has no size to rasterise');
  return { width: Math.ceil(width), height: Math.ceil(height) };
}

export function svgToPng(svg: string, scale = PNG_SCALE): Uint8Array {
  const chromium = browserPath();
  if (!chromium) throw new UsageError('--format png needs Chromium (/usr/bin/chromium, or set SUBLEVEL_CHROMIUM); write SVG instead with --format svg');
  const { width, height } = svgSize(svg);
  const dir = mkdtempSync(path.join(lazyBuiltin<typeof import('os')>('os').tmpdir(), 'sublevel-png-'));
  try {
    const page = path.join(dir, 'figure.html');
    const out = path.join(dir, 'figure.png');
    writeFileSync(page, `<!doctype html><html><head><meta charset="utf-8"><style>html,body{margin:0;padding:0;background:#fff}svg{display:block}</style></head><body>${svg}</body></html>`);
    const r = lazyBuiltin<typeof import('child_process')>('child_process').spawnSync(
      chromium,
      ['--headless', '--no-sandbox', '--disable-gpu', '--hide-scrollbars', '--no-first-run', `--user-data-dir=${path.join(dir, 'profile')}`,
        `--force-device-scale-factor=${scale}`, `--window-size=${width},${height}`, `--screenshot=${out}`, `file://${page}`],
      { encoding: 'utf8', timeout: 120_000 },
    );
    if (!existsSync(out)) throw new UsageError(`Chromium could not draw the PNG${r.error ? `: ${r.error.message}` : ''}`);
    return readFileSync(out);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
