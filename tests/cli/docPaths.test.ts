/**
 * The files, pages and benchmarks the docs send a reader to exist: repository paths in backticks,
 * links between pages, and the names given to `node bench/run.mjs`.
 */
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

const PAGES = ['README.md', 'DEVELOPERS.md', ...readdirSync('docs').filter((f) => f.endsWith('.md')).map((f) => `docs/${f}`)];
const text = (page: string): string => readFileSync(page, 'utf8');

describe('what the docs point to exists', () => {
  it.each(PAGES)('%s', (page) => {
    const t = text(page);
    const repoPaths = [...t.matchAll(/`((?:server|tests|scripts|bench|client|examples|docs|syntaxes)\/[\w./-]+\.(?:ts|mjs|py|json|sublevel|md|js|csv))`/g)].map((m) => m[1]!);
    // Paths written from server/src (`physics/slower/zGrid.ts`).
    const serverPaths = [...t.matchAll(/`((?:physics|eval|render|views|features|format|model|cli|service|diff)\/[\w./-]+\.ts)`/g)].map((m) => `server/src/${m[1]!}`);
    const links = [...t.matchAll(/\]\(([\w./-]+\.md)(?:#[\w-]+)?\)/g)].map((m) => (page.startsWith('docs/') && !m[1]!.startsWith('docs/') ? `docs/${m[1]!}` : m[1]!));
    expect([...repoPaths, ...serverPaths, ...links].filter((p) => !existsSync(p))).toEqual([]);
  });

  it('every benchmark the docs name is one bench/run.mjs knows', () => {
    const known = new Set([...text('bench/run.mjs').matchAll(/name: '([\w-]+)'/g)].map((m) => m[1]!));
    expect(known.size).toBeGreaterThan(5);
    const named = PAGES.flatMap((p) => [...text(p).matchAll(/bench\/run\.mjs ([a-z][\w-]*)/g)].map((m) => m[1]!));
    expect(named.length).toBeGreaterThan(5);
    expect(named.filter((n) => !known.has(n))).toEqual([]);
  });
});
