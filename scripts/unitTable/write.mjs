// Rewrites server/src/format/unitTable.ts from mathjs (see unitTableSource.ts); prints whether it changed.
// Run by esbuild.mjs before bundling, and by hand: `node scripts/unitTable/write.mjs`.
import { existsSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import * as esbuild from 'esbuild';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

export async function writeUnitTable() {
  const outfile = path.join(root, '.unit-table-tmp.cjs');
  await esbuild.build({
    entryPoints: [path.join(root, 'scripts/unitTable/unitTableSource.ts')],
    outfile,
    bundle: true,
    platform: 'node',
    format: 'cjs',
    logLevel: 'warning',
  });
  try {
    const { unitTableSource, UNIT_TABLE_FILE } = (await import(pathToFileURL(outfile).href)).default;
    const target = path.join(root, UNIT_TABLE_FILE);
    const text = unitTableSource();
    const old = existsSync(target) ? readFileSync(target, 'utf8') : undefined;
    if (old !== text) {
      writeFileSync(target, text);
      console.log(`${UNIT_TABLE_FILE} regenerated`);
    }
  } finally {
    rmSync(outfile, { force: true });
  }
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) await writeUnitTable();
