// Rasterises images/icon.svg to the 128×128 images/icon.png the extension manifest names,
// with Debian's headless chromium (no browser download). Run after editing the SVG.
import { join, resolve } from 'node:path';
import { chromium } from 'playwright-core';

const root = resolve(import.meta.dirname, '..');
const browser = await chromium.launch({
  executablePath: '/usr/bin/chromium',
  args: ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  // playwright starts chromium with a fresh temporary profile of its own.
});
try {
  const page = await browser.newPage({ viewport: { width: 128, height: 128 } });
  await page.goto(`file://${join(root, 'images', 'icon.svg')}`);
  await page.screenshot({ path: join(root, 'images', 'icon.png'), omitBackground: true, clip: { x: 0, y: 0, width: 128, height: 128 } });
} finally {
  await browser.close();
}
console.log('images/icon.png written');
