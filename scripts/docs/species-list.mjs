// Writes the docs made from the species table: the list of built-in species in docs/format.md
// (between the species-list markers) and the Tables section of docs/species-data.md.
import { build } from 'esbuild';
import { readFileSync, writeFileSync } from 'node:fs';

const bundled = await build({
  stdin: {
    contents: [
      "export { speciesListMarkdown, withSpeciesList } from './scripts/docs/speciesListMarkdown';",
      "export { speciesTablesMarkdown, withSpeciesTables } from './scripts/docs/speciesDataMarkdown';",
      "export { BUILTIN_SPECIES } from './server/src/physics/species';",
    ].join('\n'),
    resolveDir: process.cwd(),
    loader: 'ts',
  },
  bundle: true,
  format: 'esm',
  platform: 'node',
  write: false,
});
const mod = await import(`data:text/javascript;base64,${Buffer.from(bundled.outputFiles[0].text).toString('base64')}`);
function update(path, replace) {
  const doc = readFileSync(path, 'utf8');
  const next = replace(doc);
  if (next === undefined) {
    console.error(`${path}: the generated section's markers are missing`);
    process.exit(1);
  }
  if (next !== doc) writeFileSync(path, next);
  console.log(next === doc ? `${path}: up to date` : `${path}: written`);
}

update('docs/format.md', (doc) => mod.withSpeciesList(doc, mod.speciesListMarkdown(mod.BUILTIN_SPECIES)));
update('docs/species-data.md', (doc) => mod.withSpeciesTables(doc, mod.speciesTablesMarkdown(mod.BUILTIN_SPECIES)));
