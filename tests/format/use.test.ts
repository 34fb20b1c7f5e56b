/**
 * The `use` statement and the quoted string token it needs: table tests of the tree (the
 * path as written, its range inside the quotes) and of the problems (code + 0-based range).
 */
import { describe, expect, it } from 'vitest';
import type { SetupDocument } from '../../server/src/format/ast';
import { parseSetup } from '../../server/src/format/parser';
import { formatRange } from '../../server/src/format/positions';
import { scanLine } from '../../server/src/format/scanner';
import { problemSummary, treeSummary } from './summary';

const lines = (...l: string[]): string => l.join('\n');

/** `use <path> @range` per statement (`use ? @range` when there is no path). */
function usesOf(doc: SetupDocument): string[] {
  return doc.uses.map((u) => (u.path ? `use ${u.path.text} @${formatRange(u.path.range)}` : `use ? @${formatRange(u.range)}`));
}

interface Case {
  name: string;
  text: string;
  uses: string[];
  tree?: string[];
  problems: string[];
}

const CASES: Case[] = [
  {
    name: 'a relative path in quotes',
    text: 'use "atoms/alkalis.sublevel"',
    uses: ['use atoms/alkalis.sublevel @0:5-0:27'],
    tree: [],
    problems: [],
  },
  {
    name: 'a path with blanks and # inside the quotes, and a comment after',
    text: 'use  "my atoms/#1.sublevel"   # the shared ones',
    uses: ['use my atoms/#1.sublevel @0:6-0:26'],
    problems: [],
  },
  {
    name: 'several uses anywhere at the top level; each ends the block before it',
    text: lines('use "a.sublevel"', 'species Na23', '  level g: 3s 2S1/2', 'use "b.sublevel"', 'field bias = 3 G'),
    uses: ['use a.sublevel @0:5-0:15', 'use b.sublevel @3:5-3:15'],
    tree: ['species Na23', '  level g: 3s 2S1/2', 'field bias = q:3|G'],
    problems: [],
  },
  {
    name: 'a setting after a use belongs to no block',
    text: lines('magnet m', 'use "a.sublevel"', '  length = 8 cm'),
    uses: ['use a.sublevel @1:5-1:15'],
    tree: ['magnet m'],
    problems: ['syntax-outside-block 2:2-2:8'],
  },
  {
    name: 'an unquoted path: kept, with a fix that adds the quotes',
    text: 'use atoms/x.sublevel',
    uses: ['use atoms/x.sublevel @0:4-0:20'],
    problems: ['syntax-use-path 0:4-0:20'],
  },
  {
    name: 'no closing quote: the path runs to the comment',
    text: 'use "atoms/x.sublevel   # note',
    uses: ['use atoms/x.sublevel @0:5-0:21'],
    problems: ['syntax-use-path 0:4-0:21'],
  },
  {
    name: 'no path at all',
    text: 'use',
    uses: ['use ? @0:0-0:3'],
    problems: ['syntax-use-path 0:0-0:3'],
  },
  {
    name: 'an empty path',
    text: 'use ""',
    uses: ['use ? @0:0-0:6'],
    problems: ['syntax-use-path 0:4-0:6'],
  },
  {
    name: 'text after the path',
    text: 'use "a.sublevel" and more',
    uses: ['use a.sublevel @0:5-0:15'],
    problems: ['syntax-unexpected-text 0:17-0:25'],
  },
  {
    name: '`use = …` is a setting, as before: not a use statement',
    text: lines('magnet m', '  use = 3'),
    uses: [],
    tree: ['magnet m'],
    problems: ['syntax-unknown-key 1:2-1:5'],
  },
  {
    name: 'a misspelt use before a quoted path gets a suggestion',
    text: 'uses "a.sublevel"',
    uses: [],
    problems: ['syntax-unknown-statement 0:0-0:4'],
  },
];

describe('the `use` statement', () => {
  for (const c of CASES) {
    it(c.name, () => {
      const doc = parseSetup(c.text);
      expect(usesOf(doc)).toEqual(c.uses);
      if (c.tree) expect(treeSummary(doc)).toEqual(c.tree);
      expect(problemSummary(doc)).toEqual(c.problems);
    });
  }

  it('offers the quick-fix text for an unquoted or unclosed path, and suggests `use` for a misspelling', () => {
    expect(parseSetup('use atoms/x.sublevel').problems[0]!.data?.suggestions).toEqual(['"atoms/x.sublevel"']);
    expect(parseSetup('use "x.sublevel').problems[0]!.data?.suggestions).toEqual(['"x.sublevel"']);
    expect(parseSetup('uses "a.sublevel"').problems[0]!.data?.suggestions).toEqual(['use']);
  });
});

describe('quoted strings in the scanner', () => {
  const tokens = (text: string): string[] => scanLine(text, 0, 0, text.length).tokens.map((t) => `${t.kind}:${t.text}`);

  it.each([
    ['use "a b.sublevel"', ['atom:use', 'string:"a b.sublevel"']],
    ['x = "a=b, c" d', ['atom:x', 'equals:=', 'string:"a=b, c"', 'atom:d']],
    ['"open to the end   ', ['string:"open to the end']],
    ['"open # comment', ['string:"open']],
    ['a"b"', ['atom:a"b"']],
    ['""', ['string:""']],
  ])('%j', (text, expected) => {
    expect(tokens(text)).toEqual(expected);
  });

  it('keeps a quoted value a single word, as an unquoted one was', () => {
    const doc = parseSetup('beam b\n  source = "oven" 450 K\n');
    expect(treeSummary(doc)).toEqual(['beam b', '  source=w:"oven" q:450|K']);
  });
});
