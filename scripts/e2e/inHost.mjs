// Part (a): the mocha-style suite inside code-server's extension host. The page URL's payload
// names the extension under development (the repository, with its dist/ bundles) and the
// suite; with the smoke-test driver enabled the workbench honours that payload and, when the
// suite's run() settles and the extension host exits, calls window.codeAutomationExit(code),
// which this page exposes.
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { startHost } from './host.mjs';
import { copyExamples } from './workspace.mjs';

// At load 36 on the 2-core machine this stage took 5 min 57 s (host start and page load included).
const SUITE_TIMEOUT_MS = 12 * 60_000;
const PAGE_LOAD_TIMEOUT_MS = 120_000;

export async function runInHostSuite({ codeServer, root, suite, workDir, browser, report }) {
  const folder = copyExamples(root, join(workDir, 'workspace'));
  const resultsFile = join(workDir, 'results.json');
  const host = await startHost(codeServer, join(workDir, 'host'), { smokeTestDriver: true, env: { SUBLEVEL_E2E_RESULTS: resultsFile } });
  const page = await browser.newPage({ viewport: { width: 1400, height: 900 } });
  try {
    let exited;
    const exit = new Promise((resolve) => (exited = resolve));
    await page.exposeFunction('codeAutomationExit', (code) => exited(code));
    // The extension host's console reaches the page's; kept for the report when no results come.
    const consoleLines = [];
    page.on('console', (m) => consoleLines.push(m.text()));
    const remote = (path) => `vscode-remote://${host.authority}${path}`;
    const payload = [
      ['extensionDevelopmentPath', remote(root)],
      ['extensionTestsPath', remote(suite)],
    ];
    // The workbench page is large: on a loaded machine its first load takes longer than playwright's 30 s default.
    await page.goto(`${host.origin}/?folder=${encodeURIComponent(folder)}&payload=${encodeURIComponent(JSON.stringify(payload))}`, { timeout: PAGE_LOAD_TIMEOUT_MS });
    const watchdog = new Promise((resolve) => setTimeout(resolve, SUITE_TIMEOUT_MS, 'timeout').unref());
    const code = await Promise.race([exit, watchdog]);
    if (existsSync(resultsFile)) {
      const { outcomes } = JSON.parse(readFileSync(resultsFile, 'utf8'));
      outcomes.forEach(report);
      if (code !== 0 && outcomes.every((o) => o.ok)) report({ title: 'in-host suite exit code', ok: false, ms: 0, error: `extension host exited with ${code}` });
      return;
    }
    report({ title: 'in-host suite', ok: false, ms: 0, error: `no results (exit: ${code}); page console:\n${consoleLines.slice(-40).join('\n')}\ncode-server log:\n${host.log().slice(-4000)}` });
  } finally {
    await page.close().catch(() => undefined);
    await host.stop();
  }
}
