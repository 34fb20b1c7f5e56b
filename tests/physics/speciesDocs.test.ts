/** The built-in species table and what the docs say about it. */
import { readFileSync } from 'fs';
import { describe, expect, it } from 'vitest';
import { BUILTIN_SPECIES } from '../../server/src/physics/species';
import { formatConfiguration, parseLevelDesignation } from '../../server/src/physics/configuration';
import { LIST_END, LIST_START, speciesListMarkdown } from '../../scripts/docs/speciesListMarkdown';

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
