import { describe, expect, it } from 'vitest';
import { semanticTokens } from '../../server/src/features/semanticTokens';
import { SEMANTIC_TOKENS_LEGEND } from '../../server/src/features/semanticTokensLegend';
import { analysisOf } from './helpers';

/** Decodes the relative encoding into `line:char text type[+modifiers]` strings. */
function decode(text: string, range?: Parameters<typeof semanticTokens>[1]): string[] {
  const { data } = semanticTokens(analysisOf(text), range);
  const lines = text.split('\n');
  const out: string[] = [];
  let line = 0;
  let char = 0;
  for (let i = 0; i < data.length; i += 5) {
    const [dl, dc, len, type, mods] = data.slice(i, i + 5) as [number, number, number, number, number];
    line += dl;
    char = dl === 0 ? char + dc : dc;
    const modNames = SEMANTIC_TOKENS_LEGEND.tokenModifiers.filter((_, k) => mods & (1 << k));
    out.push(`${line}:${char} ${lines[line]!.slice(char, char + len)} ${SEMANTIC_TOKENS_LEGEND.tokenTypes[type]}${modNames.map((m) => `+${m}`).join('')}`);
  }
  return out;
}

const TEXT = 'species Na23  # data\n  level g: 3s 2S1/2  A = 885 MHz\nmagnet m\n  field = 0.5T\nbeam b\n  level = Na23.g\n  source = oven 400 K\nline D: g -> g\n';

describe('semantic tokens', () => {
  it('classifies every part of a setup', () => {
    expect(decode(TEXT)).toEqual([
      '0:0 species keyword',
      '0:8 Na23 namespace+declaration+defaultLibrary',
      '0:14 # data comment',
      '1:2 level keyword',
      '1:8 g enumMember+declaration',
      '1:11 3s 2S1/2 string',
      '1:21 A property',
      '1:23 = operator',
      '1:25 885 number',
      '1:29 MHz type',
      '2:0 magnet keyword',
      '2:7 m variable+declaration',
      '3:2 field property',
      '3:8 = operator',
      '3:10 0.5 number',
      '3:13 T type',
      '4:0 beam keyword',
      '4:5 b variable+declaration',
      '5:2 level property',
      '5:8 = operator',
      '5:10 Na23 namespace',
      '5:15 g enumMember',
      '6:2 source property',
      '6:9 = operator',
      '6:11 oven keyword',
      '6:16 400 number',
      '6:20 K type',
      '7:0 line keyword',
      '7:5 D variable+declaration',
      '7:8 g enumMember',
      '7:10 -> operator',
      '7:13 g enumMember',
    ]);
  });

  it('encodes only the lines of a range request', () => {
    expect(decode(TEXT, { start: { line: 2, character: 0 }, end: { line: 3, character: 0 } })).toEqual([
      '2:0 magnet keyword',
      '2:7 m variable+declaration',
      '3:2 field property',
      '3:8 = operator',
      '3:10 0.5 number',
      '3:13 T type',
    ]);
  });
});
