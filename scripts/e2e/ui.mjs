// Part (b): the packaged .vsix installed into a fresh code-server, and the UI suite
// (out/e2e/ui.js) driving the page in chromium as a person would.
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { installExtension, startHost } from './host.mjs';
import { copyExamples } from './workspace.mjs';

const WORKBENCH_TIMEOUT_MS = 90_000;

export async function runUiSuite({ codeServer, root, vsix, uiBundle, workDir, shotsDir, browser, report }) {
  const folder = copyExamples(root, join(workDir, 'workspace'));
  const hostDir = join(workDir, 'host');
  await installExtension(codeServer, hostDir, vsix);
  const host = await startHost(codeServer, hostDir);
  const page = await browser.newPage({ viewport: { width: 1400, height: 900 } });
  try {
    // The workbench page is large: on a loaded machine its first load takes longer than playwright's 30 s default.
    await page.goto(`${host.origin}/?folder=${encodeURIComponent(folder)}`, { timeout: WORKBENCH_TIMEOUT_MS });
    await page.locator('.monaco-workbench .explorer-folders-view').waitFor({ timeout: WORKBENCH_TIMEOUT_MS });
    const { runUi } = createRequire(import.meta.url)(uiBundle);
    await runUi(page, shotsDir, report);
  } catch (e) {
    await page.screenshot({ path: join(shotsDir, 'ui-setup-failure.png') }).catch(() => undefined);
    throw e;
  } finally {
    await page.close().catch(() => undefined);
    await host.stop();
  }
}
