// Bundles the extension client, the language server and the CLI into dist/.
// The physics core is shared: each bundle pulls it in from server/src.
import * as esbuild from 'esbuild';
import { writeUnitTable } from './scripts/unitTable/write.mjs';

const common = {
  bundle: true,
  platform: 'node',
  target: 'node20',
  format: 'cjs',
  sourcemap: true,
  logLevel: 'warning',
};

// The unit table comes from mathjs at build time, so no bundle loads mathjs (docs/speed.md).
await writeUnitTable();

await Promise.all([
  esbuild.build({ ...common, entryPoints: ['client/src/extension.ts'], outfile: 'dist/client.js', external: ['vscode'] }),
  // The server is two bundles: a thin protocol layer that answers `initialize` at once, and the
  // analysis (parser, model, physics) that it requires from beside itself afterwards.
  esbuild.build({ ...common, entryPoints: ['server/src/server.ts'], outfile: 'dist/server.js' }),
  esbuild.build({ ...common, entryPoints: ['server/src/service/serviceEntry.ts'], outfile: 'dist/service.js' }),
  esbuild.build({
    ...common,
    entryPoints: ['server/src/cli/main.ts'],
    outfile: 'dist/cli.js',
    banner: { js: '#!/usr/bin/env node' },
  }),
  // The diagram panel's page script and stylesheet, loaded by the webview (no Node APIs there).
  esbuild.build({
    entryPoints: ['client/src/panel/page.ts'],
    bundle: true,
    platform: 'browser',
    format: 'iife',
    target: 'chrome114',
    sourcemap: true,
    outfile: 'dist/panel/page.js',
    logLevel: 'warning',
  }),
  esbuild.build({ entryPoints: ['client/src/panel/panel.css'], bundle: true, outfile: 'dist/panel/panel.css', logLevel: 'warning' }),
]);
