/**
 * Editor features on a setup that uses another file: definition and references across files,
 * the hover's origin, rename refusals, diagnostics pointing into the other file, completion of
 * `use` paths, semantic tokens, formatting, and the language service re-checking a document
 * when a file it uses changes.
 */
import type { Hover, Location } from 'vscode-languageserver-types';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { codeActions } from '../../server/src/features/codeActions';
import { completion } from '../../server/src/features/completion';
import { definition } from '../../server/src/features/definition';
import { diagnostics } from '../../server/src/features/diagnostics';
import { formatting } from '../../server/src/features/formatting';
import { hover } from '../../server/src/features/hover';
import { references } from '../../server/src/features/references';
import { prepareRename, rename } from '../../server/src/features/rename';
import { semanticTokens } from '../../server/src/features/semanticTokens';
import { SEMANTIC_TOKENS_LEGEND } from '../../server/src/features/semanticTokensLegend';
import { computeLineStarts } from '../../server/src/format/positions';
import { memorySources } from '../../server/src/model/sources';
import { LanguageService } from '../../server/src/service/languageService';
import type { WorkspaceFiles } from '../../server/src/service/workspaceFiles';
import { applyEdits, hoverText, plain } from './helpers';

const MAIN = 'file:///ws/main.sublevel';
const SHARED = 'file:///ws/atoms/alkalis.sublevel';
const SHARED_TEXT = ['# shared levels', 'species K39', '  level ground: 4s 2S1/2', '  level p12:    4p 2P°1/2', ''].join('\n');
const FILES: Record<string, string> = { [SHARED]: SHARED_TEXT, 'file:///ws/atoms/other.sublevel': 'species Na23\n', 'file:///ws/atoms/readme.txt': '' };

/** The analysis of main.sublevel (a `|` marks the cursor) beside the shared file. */
function at(marked: string, files: Record<string, string> = FILES) {
  const offset = marked.indexOf('|');
  const text = marked.slice(0, offset) + marked.slice(offset + 1);
  const starts = computeLineStarts(text);
  let line = 0;
  while (line + 1 < starts.length && starts[line + 1]! <= offset) line++;
  return { text, position: { line, character: offset - starts[line]! }, analysis: analyze(text, memorySources(MAIN, files)) };
}

const SETUP = ['use "atoms/alkalis.sublevel"', 'field bias = 1 G', 'line D1: K39.ground -> p12', ''].join('\n');
const mark = (line: number, word: string, offset = 1): string => {
  const lines = SETUP.split('\n');
  const i = lines[line]!.indexOf(word) + offset;
  lines[line] = lines[line]!.slice(0, i) + '|' + lines[line]!.slice(i);
  return lines.join('\n');
};

describe('navigation across files', () => {
  it.each([
    ['a level name', mark(2, 'p12'), { uri: SHARED, range: { start: { line: 3, character: 8 }, end: { line: 3, character: 11 } } }],
    ['a species qualifier', mark(2, 'K39'), { uri: SHARED, range: { start: { line: 1, character: 8 }, end: { line: 1, character: 11 } } }],
    ['a qualified level', mark(2, 'ground'), { uri: SHARED, range: { start: { line: 2, character: 8 }, end: { line: 2, character: 14 } } }],
    ['the use path (the file itself)', mark(0, 'atoms'), { uri: SHARED, range: { start: { line: 0, character: 0 }, end: { line: 0, character: 0 } } }],
    ['a name of this file', mark(2, 'D1'), { uri: MAIN, range: { start: { line: 2, character: 5 }, end: { line: 2, character: 7 } } }],
  ])('definition of %s', (_name, marked, expected: Location) => {
    const { analysis, position } = at(marked);
    expect(definition(analysis, MAIN, position)).toEqual(expected);
  });

  it('has no definition for a use path that leads nowhere', () => {
    const { analysis, position } = at('use "atoms/none.sub|level"\n');
    expect(definition(analysis, MAIN, position)).toBeNull();
  });

  it('lists references here and the declaration there', () => {
    const text = [...SETUP.split('\n').slice(0, 3), 'line D0: K39.ground -> K39.p|12', ''].join('\n');
    const { analysis, position } = at(text);
    const refs = references(analysis, MAIN, position, true).map((l) => `${l.uri}#${l.range.start.line}:${l.range.start.character}`);
    expect(refs).toEqual([`${SHARED}#3:8`, `${MAIN}#2:23`, `${MAIN}#3:27`]);
    expect(references(analysis, MAIN, position, false)).toHaveLength(2);
  });

  it('does not rename a name declared in the used file, and says where it is', () => {
    const { analysis, position } = at(mark(2, 'p12'));
    expect(prepareRename(analysis, position)).toEqual({ error: "'p12' is declared in atoms/alkalis.sublevel: rename it there" });
    expect(rename(analysis, MAIN, position, 'p_half')).toEqual({ error: "'p12' is declared in atoms/alkalis.sublevel: rename it there" });
  });

  it('does not rename a species of this file to the name of a used one', () => {
    const files = { [SHARED]: `${SHARED_TEXT}species Lab2\n  mass = 40 u\n` };
    const { analysis, position } = at(`${SETUP}species Lab|1\n  mass = 41 u\n`, files);
    expect(rename(analysis, MAIN, position, 'Lab2')).toEqual({ error: "there is already a species named 'Lab2'" });
    expect(rename(analysis, MAIN, position, 'Lab3')).toMatchObject({ changes: { [MAIN]: [{ newText: 'Lab3' }] } });
  });
});

describe('hover on used species and levels', () => {
  const text = (h: Hover | null): string => plain(hoverText(h));

  it('says where a level is defined', () => {
    const { analysis, position } = at(mark(2, 'p12'));
    const h = text(hover(analysis, position));
    expect(h).toContain('level p12 of K39* — defined in atoms/alkalis.sublevel');
    // The evaluated numbers of the used level are there: 4p 2P1/2 has Landé g_J = 2/3 with g_s = 2.
    expect(h).toContain('2/3');
  });

  it('says where a species is defined', () => {
    const { analysis, position } = at(mark(2, 'K39'));
    expect(text(hover(analysis, position))).toContain('species K39 — defined in atoms/alkalis.sublevel, built-in data (K39)');
  });

  it('lists what a use statement brings in', () => {
    const { analysis, position } = at(mark(0, 'use'));
    const h = hover(analysis, position)!;
    expect(text(h)).toContain('use atoms/alkalis.sublevel — species (and their levels) from another setup file');
    expect(text(h)).toContain('species K39: ground, p12');
    expect(h.range).toEqual({ start: { line: 0, character: 0 }, end: { line: 0, character: 28 } });
  });
});

describe('diagnostics that point into the used file', () => {
  it('give the other file’s URI in their related information', () => {
    const { text, analysis } = at(`${SETUP}species K39\n|`);
    const d = diagnostics(analysis, MAIN).find((x) => x.code === 'name-duplicate')!;
    expect(d.range.start.line).toBe(3);
    expect(d.relatedInformation).toEqual([
      { location: { uri: SHARED, range: { start: { line: 1, character: 8 }, end: { line: 1, character: 11 } } }, message: "'K39' is declared in atoms/alkalis.sublevel" },
    ]);
    expect(text).toContain('species K39');
  });
});

describe('quick fixes on a use line', () => {
  it.each([
    ['a misspelt file name', 'use "atoms/alkali.sublevel"|', "Change to 'atoms/alkalis.sublevel'", 'use "atoms/alkalis.sublevel"'],
    ['a path without quotes', 'use atoms/alkalis.sublevel|', 'Write "atoms/alkalis.sublevel"', 'use "atoms/alkalis.sublevel"'],
    ['a path without its closing quote', 'use "atoms/alkalis.sublevel|', 'Write "atoms/alkalis.sublevel"', 'use "atoms/alkalis.sublevel"'],
  ])('%s', (_name, marked, title, fixed) => {
    const { text, analysis } = at(marked);
    const d = diagnostics(analysis, MAIN).find((x) => x.code === 'use-file-missing' || x.code === 'syntax-use-path')!;
    const fix = codeActions(analysis, MAIN, { range: d.range, diagnostics: [d] }).find((a) => a.title === title)!;
    expect(applyEdits(text, fix.edit!.changes![MAIN]!)).toBe(fixed);
  });
});

describe('completion with use', () => {
  const labels = (marked: string, withFolder = true): string[] => {
    const { analysis, position } = at(marked);
    const folder = withFolder ? { uri: MAIN, listFolder: memorySources(MAIN, FILES).listFolder! } : undefined;
    return completion(analysis, position, folder).map((c) => c.label);
  };

  it.each([
    ['the setup files of a folder', 'use "atoms/|', ['alkalis.sublevel', 'other.sublevel']],
    ['narrowed by the editor, not here: the whole folder while typing a name', 'use "atoms/al|', ['alkalis.sublevel', 'other.sublevel']],
    ['the folders are not listed, only setup files', 'use "|', []],
    ['nothing once the quote is closed', 'use "atoms/alkalis.sublevel"|', []],
  ])('%s', (_name, marked, expected) => {
    expect(labels(marked)).toEqual(expected);
  });

  it('replaces only the file name being typed', () => {
    const { analysis, position } = at('use "atoms/al|');
    const items = completion(analysis, position, { uri: MAIN, listFolder: memorySources(MAIN, FILES).listFolder! });
    const edit = items[0]!.textEdit as { range: unknown; newText: string };
    expect(applyEdits('use "atoms/al', [{ range: edit.range as never, newText: edit.newText }])).toBe('use "atoms/alkalis.sublevel');
  });

  it('offers no block keys after a use line has ended the block', () => {
    expect(labels('magnet m\nuse "atoms/alkalis.sublevel"\n  |', false)).not.toContain('gradient');
    expect(labels('magnet m\n  |\nuse "atoms/alkalis.sublevel"', false)).toContain('gradient');
  });

  it('offers the levels of used species in a line', () => {
    expect(labels(`${SETUP}line D2: |`, false)).toEqual(['ground', 'p12']);
  });
});

describe('tokens and formatting of a use line', () => {
  it('colours `use` as a keyword and its path as a string', () => {
    const { data } = semanticTokens(at(`${SETUP}|`).analysis);
    const first = data.slice(0, 10);
    expect(first).toEqual([0, 0, 3, SEMANTIC_TOKENS_LEGEND.tokenTypes.indexOf('keyword'), 0, 0, 4, 24, SEMANTIC_TOKENS_LEGEND.tokenTypes.indexOf('string'), 0]);
  });

  it('puts a use line at the margin and ends the block above it', () => {
    const text = 'species Na23\n  level g: 3s 2S1/2\n   use   "a b.sublevel"\n# c\nfield f = 1 G\n';
    const { analysis } = at(`${text}|`);
    expect(applyEdits(text, formatting(analysis))).toBe('species Na23\n  level g: 3s 2S1/2\nuse   "a b.sublevel"\n# c\nfield f = 1 G\n');
  });
});

describe('the language service re-checks a document when a file it uses changes', () => {
  function workspace(files: Record<string, string>): WorkspaceFiles {
    const reader = memorySources(MAIN, files);
    return { readFile: (l) => reader.readFile!(l), listFolder: (l) => reader.listFolder!(l) as string[] | undefined };
  }
  const main = { uri: MAIN, version: 1, getText: () => SETUP };

  it('analyses the same version again, with a new revision, and evaluates with the new text', async () => {
    const files: Record<string, string> = { [SHARED]: SHARED_TEXT };
    const svc = new LanguageService(() => undefined, undefined, workspace(files));
    expect(svc.diagnostics(main).items.map((d) => d.code)).toEqual([]);
    expect(svc.revision(main)).toBe(0);
    expect(svc.filesChanged(['file:///ws/unrelated.sublevel'])).toEqual([]);
    files[SHARED] = SHARED_TEXT.replace('p12', 'p_half');
    expect(svc.filesChanged([SHARED])).toEqual([MAIN]);
    expect(svc.isAnalysed(main)).toBe(false);
    expect(svc.diagnostics(main).items.map((d) => d.code)).toEqual(['name-unknown']);
    expect(svc.revision(main)).toBe(1);
    await svc.evaluate(main);
    const full = svc.diagnostics(main);
    expect(full.complete).toBe(true);
    expect(full.items.map((d) => d.code).filter((c) => c !== 'zeeman-not-linear')).toEqual(['name-unknown']);
  });

  it('notices a missing file that appears', () => {
    const files: Record<string, string> = {};
    const svc = new LanguageService(() => undefined, undefined, workspace(files));
    expect(svc.diagnostics(main).items.map((d) => d.code)).toContain('use-file-missing');
    files[SHARED] = SHARED_TEXT;
    expect(svc.filesChanged([SHARED])).toEqual([MAIN]);
    expect(svc.diagnostics(main).items.map((d) => d.code)).toEqual([]);
  });

  it('follows a used file to the definition through the service', () => {
    const svc = new LanguageService(() => undefined, undefined, workspace({ [SHARED]: SHARED_TEXT }));
    expect(svc.definition(main, { line: 2, character: 24 })?.uri).toBe(SHARED);
  });
});
