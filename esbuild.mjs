// Bundles the extension client, the language server and the CLI into dist/.
// The physics core is shared: each bundle pulls it in from server/src.
import * as esbuild from 'esbuild';

const common = {
  bundle: true,
  platform: 'node',
  target: 'node20',
  format: 'cjs',
  sourcemap: true,
  logLevel: 'warning',
};

await Promise.all([
  esbuild.build({ ...common, entryPoints: ['client/src/extension.ts'], outfile: 'dist/client.js', external: ['vscode'] }),
  esbuild.build({ ...common, entryPoints: ['server/src/server.ts'], outfile: 'dist/server.js' }),
  esbuild.build({
    ...common,
    entryPoints: ['server/src/cli/main.ts'],
    outfile: 'dist/cli.js',
    banner: { js: '#!/usr/bin/env node' },
  }),
]);
