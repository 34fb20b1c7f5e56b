import { describe, expect, it } from 'vitest';
import { definition } from '../../server/src/features/definition';
import { documentSymbols } from '../../server/src/features/documentSymbols';
import { foldingRanges } from '../../server/src/features/foldingRanges';
import { references } from '../../server/src/features/references';
import { prepareRename, rename } from '../../server/src/features/rename';
import { applyEdits, atCursor, editsOf, analysisOf, URI } from './helpers';

const SETUP = [
  'species Na23',
  '  level ground: 3s 2S1/2',
  '  level upper: 3p 2P°3/2',
  'species K39',
  '  level ground: 4s 2S1/2',
  'magnet sel',
  '  field = 1 T',
  'beam b',
  '  species = Na23',
  '  level = Na23.ground',
  '  magnet = sel',
  'line D2: Na23.ground -> upper',
  '',
].join('\n');

function marked(line: number, word: string, offset = 1): string {
  const lines = SETUP.split('\n');
  const at = lines[line]!.indexOf(word) + offset;
  lines[line] = lines[line]!.slice(0, at) + '|' + lines[line]!.slice(at);
  return lines.join('\n');
}

describe('definition and references', () => {
  it('goes from a reference to its declaration', () => {
    const { analysis, position } = atCursor(marked(11, 'upper'));
    expect(definition(analysis, URI, position)?.range).toEqual({ start: { line: 2, character: 8 }, end: { line: 2, character: 13 } });
  });

  it('tells apart two levels of the same name in two species', () => {
    const { analysis, position } = atCursor(marked(9, 'ground'));
    expect(definition(analysis, URI, position)?.range.start.line).toBe(1);
    const refs = references(analysis, URI, position, true).map((l) => l.range.start.line);
    expect(refs).toEqual([1, 9, 11]);
  });

  it('finds references of a magnet without its declaration when asked', () => {
    const { analysis, position } = atCursor(marked(5, 'sel'));
    expect(references(analysis, URI, position, false).map((l) => l.range.start.line)).toEqual([10]);
    expect(references(analysis, URI, position, true).map((l) => l.range.start.line)).toEqual([5, 10]);
  });

  it('finds the species through a qualified level name', () => {
    const { analysis, position } = atCursor(marked(11, 'Na23'));
    expect(references(analysis, URI, position, true).map((l) => `${l.range.start.line}:${l.range.start.character}`)).toEqual(['0:8', '8:12', '9:10', '11:9']);
  });

  it('gives nothing away from names', () => {
    const { analysis, position } = atCursor(marked(6, 'field'));
    expect(definition(analysis, URI, position)).toBeNull();
    expect(references(analysis, URI, position, true)).toEqual([]);
  });
});

describe('rename', () => {
  it('renames a level and every reference to it, and nothing of the same name elsewhere', () => {
    const { text, analysis, position } = atCursor(marked(1, 'ground'));
    expect(prepareRename(analysis, position)).toEqual({ range: { start: { line: 1, character: 8 }, end: { line: 1, character: 14 } }, placeholder: 'ground' });
    const out = applyEdits(text, editsOf(rename(analysis, URI, position, 'lower') as never));
    expect(out.split('\n')).toEqual([
      'species Na23',
      '  level lower: 3s 2S1/2',
      '  level upper: 3p 2P°3/2',
      'species K39',
      '  level ground: 4s 2S1/2',
      'magnet sel',
      '  field = 1 T',
      'beam b',
      '  species = Na23',
      '  level = Na23.lower',
      '  magnet = sel',
      'line D2: Na23.lower -> upper',
      '',
    ]);
  });

  it('renames a magnet from a reference', () => {
    const { text, analysis, position } = atCursor(marked(10, 'sel'));
    const out = applyEdits(text, editsOf(rename(analysis, URI, position, 'sorter') as never));
    expect(out).toContain('magnet sorter\n');
    expect(out).toContain('  magnet = sorter\n');
  });

  it('refuses what would change the physics or not read back', () => {
    const { analysis, position } = atCursor(marked(1, 'ground'));
    expect(rename(analysis, URI, position, 'upper')).toEqual({ error: "Na23 already has a level named 'upper'" });
    expect(rename(analysis, URI, position, 'two words')).toHaveProperty('error');
    expect(rename(analysis, URI, position, 'a.b')).toHaveProperty('error');
    expect(rename(analysis, URI, position, '3x')).toHaveProperty('error');
    expect(rename(analysis, URI, position, 'magnet')).toHaveProperty('error');
    const species = atCursor(marked(0, 'Na23'));
    expect(prepareRename(species.analysis, species.position)).toEqual({ error: "'Na23' is a built-in species: renaming it would drop its built-in data" });
    const handmade = atCursor('species Mine\n  mass = 40 u\nbeam b\n  species = Mi|ne\n');
    expect(rename(handmade.analysis, URI, handmade.position, 'Rb87')).toHaveProperty('error');
    expect(applyEdits(handmade.text, editsOf(rename(handmade.analysis, URI, handmade.position, 'Other') as never))).toBe(
      'species Other\n  mass = 40 u\nbeam b\n  species = Other\n',
    );
  });

  it('cannot rename an unresolved reference', () => {
    const { analysis, position } = atCursor('line x: ab|c -> d\n');
    expect(prepareRename(analysis, position)).toHaveProperty('error');
  });
});

describe('outline and folding', () => {
  it('lists blocks with levels and settings as children', () => {
    const symbols = documentSymbols(analysisOf(SETUP));
    expect(symbols.map((s) => `${s.name}:${s.kind}`)).toEqual(['Na23:3', 'K39:3', 'sel:19', 'b:23', 'D2:24']);
    expect(symbols[0]!.children!.map((c) => `${c.name} ${c.detail}`)).toEqual(['ground 3s 2S1/2', 'upper 3p 2P°3/2']);
    expect(symbols[3]!.children!.map((c) => c.name)).toEqual(['species', 'level', 'magnet']);
    expect(symbols[4]!.detail).toBe('Na23.ground -> upper');
    for (const s of symbols) {
      expect(s.range.start.line <= s.selectionRange.start.line && s.selectionRange.end.line <= s.range.end.line).toBe(true);
    }
  });

  it('folds blocks, multi-line levels and comment runs', () => {
    const text = '# one\n# two\nspecies Na23\n  level g: 3s 2S1/2\n    A = 885 MHz\n# lone\nfield f = 1 G\n';
    expect(foldingRanges(analysisOf(text))).toEqual([
      { startLine: 0, endLine: 1, kind: 'comment' },
      { startLine: 2, endLine: 4 },
      { startLine: 3, endLine: 4 },
    ]);
  });
});
