import { describe, expect, it } from 'vitest';
import { formatting } from '../../server/src/features/formatting';
import { applyEdits, analysisOf } from './helpers';

function format(text: string): string {
  return applyEdits(text, formatting(analysisOf(text)));
}

const CASES: { name: string; input: string; output: string }[] = [
  {
    name: 'indents block contents by two spaces and headers not at all',
    input: '   species Na23\nlevel g: 3s 2S1/2\n\t\tA = 885 MHz\n    field f = 1 G\n',
    output: 'species Na23\n  level g: 3s 2S1/2\n  A = 885 MHz\nfield f = 1 G\n',
  },
  {
    name: 'one space around = and nowhere else touched',
    input: 'magnet m\n  field=0.45   T\n  gradient    =    180 T/m\n',
    output: 'magnet m\n  field = 0.45   T\n  gradient = 180 T/m\n',
  },
  {
    name: 'trailing whitespace and blank-only lines',
    input: 'magnet m   \n  field = 1 T\t\n   \n',
    output: 'magnet m\n  field = 1 T\n\n',
  },
  {
    name: 'a trailing comment keeps its column when the code shrinks',
    input: 'magnet m\n  field    = 0.45 T       # at the beam\n  gradient = 180 T/m      # across it\n',
    output: 'magnet m\n  field = 0.45 T          # at the beam\n  gradient = 180 T/m      # across it\n',
  },
  {
    name: 'a comment line takes the indentation of the next statement',
    input: '# top\nspecies Na23\n# about the level\n      level g: 3s 2S1/2\n  # before the next block\nfield f = 1 G\n',
    output: '# top\nspecies Na23\n  # about the level\n  level g: 3s 2S1/2\n# before the next block\nfield f = 1 G\n',
  },
  {
    name: 'a misspelt block word stays at the margin',
    input: 'magnet m\n  field = 1 T\n  magent spare\n  field = 2 T\n',
    output: 'magnet m\n  field = 1 T\nmagent spare\n  field = 2 T\n',
  },
  {
    name: 'CRLF line ends are kept',
    input: 'magnet m  \r\n field=1 T\r\n',
    output: 'magnet m\r\n  field = 1 T\r\n',
  },
  {
    name: 'a blank line after a lone CR and before an LF keeps one space, so the two line breaks do not merge into one CRLF',
    input: 'magnet m\r   \n  field = 1 T\n',
    output: 'magnet m\r \n  field = 1 T\n',
  },
  {
    name: 'lone CR line ends are kept, blank lines between them emptied',
    input: 'magnet m \r   \r field=1 T\r',
    output: 'magnet m\r\r  field = 1 T\r',
  },
  {
    name: 'mixed line ends are kept line by line',
    input: 'magnet m\r\n  \r field=1 T \n\t\r\n length=8 cm\r',
    output: 'magnet m\r\n\r  field = 1 T\n\r\n  length = 8 cm\r',
  },
  {
    name: 'several settings on a level line: each = gets one space, the gaps between them stay',
    input: 'species Li7\n  level u:  2p 2P°3/2  A=-3.06 MHz  B  = -0.22 MHz\n',
    output: 'species Li7\n  level u:  2p 2P°3/2  A = -3.06 MHz  B = -0.22 MHz\n',
  },
];

describe('formatting', () => {
  for (const c of CASES) {
    it(c.name, () => {
      expect(format(c.input)).toBe(c.output);
      expect(formatting(analysisOf(c.output))).toEqual([]);
    });
  }

  it('returns one small edit per whitespace run, not a whole-document replacement', () => {
    const edits = formatting(analysisOf('magnet m\n  field=1 T\n'));
    expect(edits).toEqual([
      { range: { start: { line: 1, character: 7 }, end: { line: 1, character: 7 } }, newText: ' ' },
      { range: { start: { line: 1, character: 8 }, end: { line: 1, character: 8 } }, newText: ' ' },
    ]);
  });

  it('formats only the lines of a range request', () => {
    const text = 'magnet m\n field=1 T\n length=8 cm\n';
    const edits = formatting(analysisOf(text), { start: { line: 2, character: 0 }, end: { line: 2, character: 3 } });
    expect(applyEdits(text, edits)).toBe('magnet m\n field=1 T\n  length = 8 cm\n');
  });

  it('leaves an already tidy level line with an aligned comment alone', () => {
    const text = 'species Na23\n  level ground: 3s 2S1/2  B = 2 MHz          # a quadrupole cannot act on J = 1/2\n';
    expect(format(text)).toBe(text);
  });
});
