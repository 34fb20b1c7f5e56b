/** The TextMate grammar colours every block word the parser knows as a block word. */
import { readFileSync } from 'fs';
import { describe, expect, it } from 'vitest';
import { BLOCK_WORDS } from '../../server/src/format/schema';

interface Pattern {
  match?: string;
  captures?: Record<string, { name: string }>;
}

const grammar = JSON.parse(readFileSync('syntaxes/sublevel.tmLanguage.json', 'utf8')) as { repository: Record<string, { patterns?: Pattern[] }> };
const headerPatterns = (grammar.repository['block-header']?.patterns ?? []).filter((p) => p.match && p.captures?.['1']?.name === 'keyword.control.block.sublevel');

/** The scope the grammar gives the first word of `line`, if a block-header pattern matches it. */
function blockScope(line: string): string | undefined {
  for (const p of headerPatterns) {
    // These patterns use only syntax that Oniguruma and JavaScript read alike.
    const m = new RegExp(p.match!).exec(line);
    if (m && m[1] === line.trim().split(/\s+/)[0]) return p.captures!['1']!.name;
  }
  return undefined;
}

describe('TextMate grammar', () => {
  const headers: Record<string, string> = { line: 'line D2: ground -> upper', settings: 'settings' };
  it.each(BLOCK_WORDS.map((w) => [w, headers[w] ?? `${w} main`]))('colours %s as a block word', (_word, line) => {
    expect(blockScope(line)).toBe('keyword.control.block.sublevel');
  });

  it('does not colour a setting key that happens to be a block word', () => {
    expect(blockScope('  field = 0.45 T')).toBeUndefined();
  });
});
