// Writes the generated list of built-in species into docs/format.md (between the species-list markers).
import { build } from 'esbuild';
import { readFileSync, writeFileSync } from 'node:fs';

const bundled = await build({
  stdin: {
    contents: "export { speciesListMarkdown, withSpeciesList } from './scripts/docs/speciesListMarkdown';\nexport { BUILTIN_SPECIES } from './server/src/physics/species';",
    resolveDir: process.cwd(),
    loader: 'ts',
  },
  bundle: true,
  format: 'esm',
  platform: 'node',
  write: false,
});
const mod = await import(`data:text/javascript;base64,${Buffer.from(bundled.outputFiles[0].text).toString('base64')}`);
const path = 'docs/format.md';
const doc = readFileSync(path, 'utf8');
const next = mod.withSpeciesList(doc, mod.speciesListMarkdown(mod.BUILTIN_SPECIES));
if (next === undefined) {
  console.error(`${path}: the species-list markers are missing`);
  process.exit(1);
}
if (next !== doc) writeFileSync(path, next);
console.log(next === doc ? `${path}: species list up to date` : `${path}: species list written`);
