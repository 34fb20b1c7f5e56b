/**
 * The text the server keeps for an open document (server/src/documentSync.ts) after hostile
 * changes equals the reference (referenceEdits.ts), and its line table agrees with one made
 * afresh from that text, so the next edit lands where the client meant. Nonsense changes are
 * left out with a warning; nothing throws.
 */
import fc from 'fast-check';
import { TextDocument } from 'vscode-languageserver-textdocument';
import { describe, expect, it } from 'vitest';
import { documentSync } from '../../server/src/documentSync';
import { hostileChange, referenceText } from './referenceEdits';

const RUNS = Number(process.env.FUZZ_RUNS ?? '') || 300;

const START = fc.constantFrom('', 'species Li7\n  level upper: 2p 2P°3/2\nfield bias = 5 G\n', 'a\r\nb\rc\n\nd', 'x');

describe('the text kept from didChange', () => {
  it('equals the reference after hostile changes, and its line table is the one a fresh document makes', () => {
    fc.assert(
      fc.property(START, fc.array(fc.array(hostileChange(6, 30), { minLength: 1, maxLength: 3 }), { maxLength: 8 }), (start, batches) => {
        const warnings: string[] = [];
        const sync = documentSync((m) => warnings.push(m));
        const doc = sync.create('file:///kept', 'sublevel', 1, start);
        let expected: string = start;
        batches.forEach((changes, i) => {
          sync.update(doc, changes as never, i + 2);
          expected = referenceText(expected, changes);
          expect(doc.getText()).toBe(expected);
          expect(doc.version).toBe(i + 2);
        });
        const fresh = TextDocument.create('file:///fresh', 'sublevel', 0, expected);
        expect(doc.lineCount).toBe(fresh.lineCount);
        for (let line = 0; line <= fresh.lineCount; line++) expect(doc.offsetAt({ line, character: 0 })).toBe(fresh.offsetAt({ line, character: 0 }));
        const nonsense = batches.flat().filter((c) => c.range && [c.range.start.line, c.range.start.character, c.range.end.line, c.range.end.character].includes(null));
        expect(warnings).toHaveLength(nonsense.length);
      }),
      { numRuns: RUNS },
    );
  });

  it('takes versions as sent, backwards too, and a change with no text or a broken range is left out and said', () => {
    const warnings: string[] = [];
    const sync = documentSync((m) => warnings.push(m));
    const doc = sync.create('file:///kept', 'sublevel', 5, 'ab\ncd');
    sync.update(doc, [{ range: { start: { line: 1, character: 0 }, end: { line: 0, character: 1 } }, text: '-' }], 3);
    expect([doc.getText(), doc.version]).toEqual(['a-cd', 3]);
    sync.update(doc, [{ text: 7 }, { range: { start: { line: null, character: 0 }, end: { line: 0, character: 0 } }, text: 'z' }] as never, 2);
    expect([doc.getText(), doc.version]).toEqual(['a-cd', 2]);
    expect(warnings).toEqual([
      'sublevel: a change to file:///kept (version 2) was left out: it has no text.',
      'sublevel: a change to file:///kept (version 2) was left out: its range is not two positions of whole numbers.',
    ]);
  });

  it('without the rules, the library alone goes wrong on a fractional line (why they exist)', () => {
    const plain = TextDocument.create('file:///plain', 'sublevel', 1, 'ab\ncd\n');
    TextDocument.update(plain, [{ range: { start: { line: 0.5, character: 0 }, end: { line: 0.5, character: 0 } }, text: 'X' }], 2);
    expect(plain.getText()).not.toBe(referenceText('ab\ncd\n', [{ range: { start: { line: 0.5, character: 0 }, end: { line: 0.5, character: 0 } }, text: 'X' }]));
  });
});
