/**
 * Characters a setup file should not hold: invalid UTF-8 (found by the decoder the CLI uses)
 * and NUL, control and bidirectional control characters (found by the parser, so the editor
 * reports them too).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { RULES } from '../../server/src/format/codes';
import { MAX_REPORTED_LINES } from '../../server/src/format/controlCharacters';
import { parseSetup } from '../../server/src/format/parser';
import { decodeSetupBytes, firstInvalidUtf8 } from '../../server/src/format/textDecoding';
import { analyze } from '../../server/src/eval/analyze';

const CLEAN = 'species X\n  mass = 40 u\n  level g: 2S1/2\n';

function found(text: string): string[] {
  return parseSetup(text)
    .problems.filter((p) => p.code.startsWith('text-'))
    .map((p) => `${p.range.start.line}:${p.range.start.character} ${p.severity} ${p.code}`);
}

describe('invalid UTF-8', () => {
  it.each([
    // RFC 3629 section 3/10 examples of ill-formed sequences
    ['a lone continuation byte', [0x61, 0x80], 1],
    ['an overlong two-byte form of "/" (C0 AF)', [0x61, 0x62, 0xc0, 0xaf], 2],
    ['an encoded UTF-16 surrogate (ED A0 80)', [0xed, 0xa0, 0x80], 0],
    ['a code point above U+10FFFF (F4 90 80 80)', [0x20, 0xf4, 0x90, 0x80, 0x80], 1],
    ['a sequence cut off at the end', [0x41, 0xe2, 0x82], 1],
    ['a byte that never occurs (FF)', [0xff], 0],
  ])('finds %s', (_what, bytes, at) => {
    expect(firstInvalidUtf8(new Uint8Array(bytes))).toBe(at);
  });

  it('accepts what is valid: ASCII, ° (C2 B0), → (E2 86 92), U+10FFFF (F4 8F BF BF)', () => {
    expect(firstInvalidUtf8(new TextEncoder().encode('2P° → ²P₃/₂ \u{10FFFF}'))).toBe(-1);
  });

  it('agrees with the platform\'s WHATWG decoder on which byte strings are valid (random bytes)', () => {
    const fatal = new TextDecoder('utf-8', { fatal: true });
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 24 }), (bytes) => {
        let valid = true;
        try {
          fatal.decode(bytes);
        } catch {
          valid = false;
        }
        expect(firstInvalidUtf8(bytes) === -1).toBe(valid);
      }),
      { numRuns: 2000 },
    );
  });

  it('reports the first invalid byte at its line and column, and keeps the rest of the text', () => {
    const bytes = Buffer.concat([Buffer.from('species X\n  mass = 40 u # 40 '), Buffer.from([0xb0]), Buffer.from('C\n  level g: 2S1/2\n')]);
    const { text, problems } = decodeSetupBytes(bytes);
    expect(text).toBe('species X\n  mass = 40 u # 40 \uFFFDC\n  level g: 2S1/2\n');
    expect(problems.map((p) => [p.code, p.severity, p.range.start, p.range.end])).toEqual([
      ['text-invalid-encoding', 'error', { line: 1, character: 19 }, { line: 1, character: 20 }],
    ]);
    expect(problems[0]!.message).toContain('byte 0xb0 at byte offset 29');
    expect(analyze(text).result!.levels).toHaveLength(1);
  });

  it('drops a leading BOM as editors do, so columns match the editor', () => {
    const { text, problems } = decodeSetupBytes(Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from('a\n\xff'.replace('\xff', ''), 'utf8'), Buffer.from([0xff])]));
    expect(text).toBe('a\n\uFFFD');
    expect(problems[0]!.range.start).toEqual({ line: 1, character: 0 });
  });
});

describe('control and bidirectional characters', () => {
  it('NUL is an error, an escape code a warning, a bidi override a warning; each at its first character', () => {
    expect(found(CLEAN + 'field b\u0000x = 1 T\n')).toEqual(['3:7 error text-nul-character']);
    expect(found(CLEAN + 'field \u001b[2Kb = 1 T\n')).toEqual(['3:6 warning text-control-character']);
    expect(found(CLEAN + '# note \u202Eevil\u202C\n')).toEqual(['3:7 warning text-bidi-control']);
    expect(found(CLEAN + 'field b = 1 T \u0085\n')).toEqual(['3:14 warning text-control-character']);
  });

  it('tab, CR, LF and CRLF are not reported', () => {
    expect(found('species X\r\n\tmass = 40 u\r  level g: 2S1/2\n')).toEqual([]);
  });

  it('one problem per line and kind, with the count in the message', () => {
    const doc = parseSetup(CLEAN + '\u0007\u0007 \u0000\u0001\n');
    expect(doc.problems.filter((p) => p.code.startsWith('text-')).map((p) => [p.code, p.range.start.character, p.message])).toEqual([
      ['text-control-character', 0, 'an invisible control character U+0007 (3 such characters on this line), e.g. part of a terminal escape code; delete it.'],
      ['text-nul-character', 3, 'a NUL character: the file looks binary or damaged; delete it.'],
    ]);
  });

  it(`a binary file gives problems on its first ${MAX_REPORTED_LINES} lines only, the last saying how many lines are left out`, () => {
    const text = Array.from({ length: 250 }, () => '\u0000\u0001').join('\n');
    const problems = parseSetup(text).problems.filter((p) => p.code.startsWith('text-'));
    expect(problems).toHaveLength(2 * MAX_REPORTED_LINES);
    expect(new Set(problems.map((p) => p.range.start.line)).size).toBe(MAX_REPORTED_LINES);
    expect(problems.at(-1)!.message).toMatch(/; 150 more lines have invisible characters and are not listed\.$/);
  });

  it('the new codes are registered', () => {
    for (const c of ['text-invalid-encoding', 'text-nul-character', 'text-control-character', 'text-bidi-control']) expect(RULES[c], c).toBeDefined();
  });

  it('reach the evaluation result (what eval --format json and the editor show)', () => {
    expect(analyze(CLEAN + 'field b\u0000 = 1 T\n').result!.diagnostics.map((d) => d.code)).toContain('text-nul-character');
  });
});
