/**
 * Runs the in-host suite (out/e2e/suite.js) under desktop VS Code with @vscode/test-electron,
 * where downloading VS Code is possible (it is not on the offline CI machine, which uses
 * code-server instead: scripts/e2e/run.mjs). Needs `@vscode/test-electron` installed.
 *
 *   node scripts/e2e/build.mjs && node out/e2e/electron.js
 */
import { cpSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';

interface TestElectron {
  runTests(options: {
    extensionDevelopmentPath: string;
    extensionTestsPath: string;
    launchArgs: string[];
    extensionTestsEnv: Record<string, string>;
  }): Promise<number>;
}

async function main(): Promise<number> {
  const root = resolve(__dirname, '..', '..'); // this file is bundled to out/e2e/electron.js
  const work = mkdtempSync(join(tmpdir(), 'sublevel-e2e-electron-'));
  const folder = join(work, 'examples');
  const results = join(work, 'results.json');
  cpSync(join(root, 'examples'), folder, { recursive: true });
  // A variable keeps tsc and esbuild from resolving the package: it is optional here.
  const launcher = '@vscode/test-electron';
  try {
    const { runTests } = (await import(launcher)) as TestElectron;
    await runTests({
      extensionDevelopmentPath: root,
      extensionTestsPath: join(root, 'out', 'e2e', 'suite.js'),
      launchArgs: [folder, '--disable-extensions', '--disable-workspace-trust', `--user-data-dir=${join(work, 'user')}`, `--extensions-dir=${join(work, 'extensions')}`],
      extensionTestsEnv: { SUBLEVEL_E2E_RESULTS: results },
    });
    return 0;
  } catch (e) {
    console.error(`electron: ${e instanceof Error ? e.message : String(e)}`);
    return 1;
  } finally {
    try {
      const { outcomes } = JSON.parse(readFileSync(results, 'utf8')) as { outcomes: { ok: boolean }[] };
      const passed = outcomes.filter((o) => o.ok).length;
      console.log(`E2E: ${passed} passed, ${outcomes.length - passed} failed`);
    } catch {
      console.log('E2E: 0 passed, 1 failed');
    }
    rmSync(work, { recursive: true, force: true });
  }
}

void main().then((code) => process.exit(code));
