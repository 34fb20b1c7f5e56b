/** The built-in species table and what the docs say about it. */
import { readFileSync } from 'fs';
import { describe, expect, it } from 'vitest';
import { BUILTIN_SPECIES } from '../../server/src/physics/species';
import { formatConfiguration, parseLevelDesignation } from '../../server/src/physics/configuration';
import { LIST_END, LIST_START, speciesListMarkdown } from '../../scripts/docs/speciesListMarkdown';
import { speciesTablesMarkdown, TABLES_HEADING } from '../../scripts/docs/speciesDataMarkdown';

describe('docs/format.md lists every built-in species', () => {
  it('the generated list in the docs matches the table (run node scripts/docs/species-list.mjs)', () => {
    const doc = readFileSync('docs/format.md', 'utf8');
    const start = doc.indexOf(LIST_START);
    const end = doc.indexOf(LIST_END);
    expect(start).toBeGreaterThan(0);
    expect(doc.slice(start, end + LIST_END.length)).toBe(speciesListMarkdown(BUILTIN_SPECIES));
  });

  it('names each species once', () => {
    const list = speciesListMarkdown(BUILTIN_SPECIES);
    for (const s of BUILTIN_SPECIES) expect(list.split(`| \`${s.id}\` |`).length - 1).toBe(1);
  });
});

describe('built-in designations are written as outputs write them', () => {
  const all = BUILTIN_SPECIES.flatMap((s) => s.levels.map((l) => [`${s.id} ${l.key}`, l.designation] as const));
  it.each(all)('%s: %s reads without issues and its configuration is space-separated', (_id, designation) => {
    const parsed = parseLevelDesignation(designation);
    expect(parsed.issues).toEqual([]);
    expect(parsed.configuration).not.toBeNull();
    expect(designation.startsWith(`${formatConfiguration(parsed.configuration!, 'ascii')} `)).toBe(true);
    expect(designation).not.toMatch(/\d[A-Z]o/);
  });
});

/** Every { value, source } in the table, with its path. */
function sourcedItems(v: unknown, path: string): { path: string; source: string }[] {
  if (!v || typeof v !== 'object') return [];
  const here = typeof (v as { source?: unknown }).source === 'string' && 'value' in (v as object) ? [{ path, source: (v as { source: string }).source }] : [];
  return [...here, ...Object.entries(v).flatMap(([k, x]) => sourcedItems(x, `${path}.${k}`))];
}

describe('docs/species-data.md and the sources of the table', () => {
  const items = BUILTIN_SPECIES.flatMap((s) => sourcedItems(s, s.id));

  it('the Tables section is the one generated from the table (run node scripts/docs/species-list.mjs)', () => {
    const doc = readFileSync('docs/species-data.md', 'utf8');
    expect(doc.slice(doc.indexOf(`\n${TABLES_HEADING}\n`) + 1)).toBe(speciesTablesMarkdown(BUILTIN_SPECIES));
  });

  it('every value has a source', () => {
    expect(items.length).toBeGreaterThan(100);
    for (const { path, source } of items) expect(source.trim(), path).not.toBe('');
  });

  it('a recalled value says "from memory" and nothing more; a derived one says from what', () => {
    for (const { path, source } of items) {
      if (/memory|recalled/i.test(source)) expect(source === 'from memory' || source.startsWith('derived:'), `${path}: ${source}`).toBe(true);
    }
  });

  /** A source citing a single measurement: a journal, an e-print number or a dissertation. */
  const MEASUREMENT = /Phys\. Rev\.|IEEE Trans\.|arXiv:|dissertation|critical review/;

  it('no source names authors', () => {
    // "et al." and initials followed by a surname ("A. Name", "A.B. Name") mark personal names. The compilations
    // cited by their authors' names (alkali D-line data, potassium and 6Li properties, the 1977 review) are the
    // only exceptions, and none of them cites a single measurement.
    for (const { path, source } of items) {
      expect(source, path).not.toMatch(/et al\.|\b(?:[A-Z]\.\s?){1,3}(?!Phys|Rev|Lett|Instrum)[A-Z][a-z]+/);
      if (MEASUREMENT.test(source)) expect(source, path).not.toMatch(/Steck|Tiecke|Gehm|Arimondo/);
    }
  });

  it('a single measurement is cited by journal, volume, page or number and year, with its value and uncertainty as printed', () => {
    const cited = items.filter(({ source }) => MEASUREMENT.test(source));
    expect(cited.length).toBeGreaterThanOrEqual(10);
    for (const { path, source } of cited) {
      expect(source, path).toMatch(/\((?:19|20)\d\d\)/); // the year
      expect(source, path).toMatch(/\d\(\d+(?:\.\d+)?\)|± ?\d/); // a value printed with its uncertainty
      expect(source, path).toMatch(/Phys\. Rev\.(?: Lett\.| A)? \d+, \d+|IEEE Trans\. [A-Za-z. ]+ \d+, \d+|arXiv:\d{4}\.\d{4,5}|dissertation, [A-Z]|critical review/);
    }
  });

  it('no source cites a personal web page', () => {
    for (const { path, source } of items) expect(source, path).not.toMatch(/~|dyndns|personal/);
  });
});
