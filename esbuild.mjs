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

/** A package the bundle requires at run time from a file beside itself instead of carrying it. */
function besideTheBundle(name, file) {
  return {
    name: `beside-${name}`,
    setup(build) {
      build.onResolve({ filter: new RegExp(`^${name}$`) }, () => ({ path: file, external: true }));
    },
  };
}

// The unit table comes from mathjs at build time, so no bundle loads mathjs (docs/speed.md).
await writeUnitTable();

await Promise.all([
  esbuild.build({ ...common, entryPoints: ['client/src/extension.ts'], outfile: 'dist/client.js', external: ['vscode'] }),
  // The server is two bundles: a thin protocol layer that answers `initialize` at once, and the
  // analysis (parser, model, physics) that it requires from beside itself afterwards.
  esbuild.build({ ...common, entryPoints: ['server/src/server.ts'], outfile: 'dist/server.js' }),
  esbuild.build({ ...common, entryPoints: ['server/src/service/serviceEntry.ts'], outfile: 'dist/service.js' }),
  // The CLI is a launcher (the bin) and two bundles beside it, so `check` and `eval` do not compile
  // the other commands' code: the core bundle has those two, the full one every command
  // (server/src/cli/bundleRoute.ts). ml-matrix, needed only by a fit, is a file of its own that
  // the first fit loads (docs/speed.md, "Start-up").
  esbuild.build({
    ...common,
    entryPoints: ['server/src/cli/bundles/launcher.ts'],
    outfile: 'dist/cli.js',
    external: ['./cli-core.js', './cli-full.js'],
    banner: { js: '#!/usr/bin/env node' },
  }),
  // The core bundle without whitespace and with shorter syntax (names kept): V8 parses every byte of
  // it at each `check`, and 0.65 MB parse faster than 0.86 MB (docs/speed.md). A stack trace then points into long
  // lines; run `node --enable-source-maps dist/cli.js …` to read it against the sources (the .map beside it).
  esbuild.build({
    ...common,
    entryPoints: ['server/src/cli/bundles/core.ts'],
    outfile: 'dist/cli-core.js',
    minifyWhitespace: true,
    minifySyntax: true,
    plugins: [besideTheBundle('ml-matrix', './cli-ml-matrix.js')],
  }),
  esbuild.build({ ...common, entryPoints: ['server/src/cli/bundles/full.ts'], outfile: 'dist/cli-full.js', plugins: [besideTheBundle('ml-matrix', './cli-ml-matrix.js')] }),
  esbuild.build({ ...common, entryPoints: ['ml-matrix'], outfile: 'dist/cli-ml-matrix.js' }),
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
