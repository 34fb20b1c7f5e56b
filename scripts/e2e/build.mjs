// Bundles the end-to-end tests into out/e2e/: suite.js (loaded by the extension host as
// extensionTestsPath), ui.js (drives the page) and electron.js (desktop launcher).
import { resolve } from 'node:path';
import * as esbuild from 'esbuild';

const root = resolve(import.meta.dirname, '..', '..');
const common = { bundle: true, platform: 'node', target: 'node20', format: 'cjs', logLevel: 'warning', absWorkingDir: root };

export async function buildE2e() {
  await Promise.all([
    // mocha stays outside the bundle: the suite requires it at run time when it is installed.
    esbuild.build({ ...common, entryPoints: ['tests/e2e/suite/index.ts'], outfile: 'out/e2e/suite.js', external: ['vscode', 'mocha'] }),
    esbuild.build({ ...common, entryPoints: ['tests/e2e/ui/index.ts'], outfile: 'out/e2e/ui.js', external: ['playwright-core'] }),
    esbuild.build({ ...common, entryPoints: ['tests/e2e/electron.ts'], outfile: 'out/e2e/electron.js', external: ['@vscode/test-electron'] }),
  ]);
  return { suite: resolve(root, 'out/e2e/suite.js'), ui: resolve(root, 'out/e2e/ui.js'), electron: resolve(root, 'out/e2e/electron.js') };
}

if (import.meta.url === `file://${process.argv[1]}`) await buildE2e();
