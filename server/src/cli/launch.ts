/**
 * The `sublevel` command's first file (dist/cli.js): runs the CLI bundle beside it (dist/cli-main.js)
 * from V8's code cache when the build left one for this bundle, which saves compiling it at every
 * start (docs/speed.md). The cache is made by the build, never at run time, so a read-only install
 * works as well; one made by another Node (or with other V8 flags) is rejected by V8, and then the
 * bundle is compiled as usual. Its name carries the bundle's content hash, fixed at build time, so a
 * rebuilt bundle never meets the cache of an older one.
 */
import { readFileSync, writeFileSync } from 'fs';
import Module from 'module';
import * as path from 'path';
import { Script } from 'vm';

declare const CLI_BUNDLE_HASH: string;

const bundle = path.join(__dirname, 'cli-main.js');
const cacheFile = path.join(__dirname, `cli-main.${CLI_BUNDLE_HASH}.cache`);
/** Set by the build's one training run (esbuild.mjs), which writes the cache on exit. */
const WRITE_CACHE = 'SUBLEVEL_WRITE_CODE_CACHE';

function cached(): Buffer | undefined {
  if (process.env[WRITE_CACHE]) return undefined;
  try {
    return readFileSync(cacheFile);
  } catch {
    return undefined; // no cache: compile as usual
  }
}

const script = new Script(Module.wrap(readFileSync(bundle, 'utf8')), { filename: bundle, cachedData: cached() });
if (process.env[WRITE_CACHE]) {
  // After the run, so the functions it compiled (the analysis of a file) are in the cache too.
  process.on('exit', () => writeFileSync(cacheFile, script.createCachedData()));
}
// As this module: `require.main === module` holds in the bundle, and batch workers start from this file.
(script.runInThisContext() as (...args: unknown[]) => void)(module.exports, require, module, __filename, __dirname);
