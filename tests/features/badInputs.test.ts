/**
 * Half-written and mistyped setups as a user types them (invented numbers): each mistake gets
 * one diagnostic at its own text, in plain words, and only quick fixes that fix it.
 */
import { describe, expect, it } from 'vitest';
import { codeActions } from '../../server/src/features/codeActions';
import { diagnostics } from '../../server/src/features/diagnostics';
import { analysisOf, applyEdits, editsOf, URI } from './helpers';

interface Case {
  name: string;
  text: string;
  /** Errors and warnings (notes left out): `line:col-col code [the text it covers]`, 1-based. */
  findings: string[];
  /** Every quick fix offered for the findings: `code: title → the changed line`. */
  fixes?: string[];
  /** Words the messages must hold. */
  says?: string[];
}

const CASES: Case[] = [
  {
    name: 'a number too large, with its unit apart or glued: one error each, and no fix that drops the unit',
    text: 'field huge = 1e400 T\nfield glued = 1e400T\nmagnet m\n  field = 1/0 T\n  gradient = 10 T/m\n  length = 5 cm\n',
    findings: ['1:14-19 syntax-bad-number [1e400]', '2:15-21 syntax-bad-number [1e400T]', '4:11-14 syntax-bad-number [1/0]'],
    fixes: [],
    says: ['too large to represent', 'check the exponent', 'divides by zero'],
  },
  {
    name: 'NaN and inf where a number goes: one error each',
    text: 'field a = NaN T\nfield b = -inf G\n',
    findings: ['1:11-14 syntax-bad-number [NaN]', '2:11-15 syntax-bad-number [-inf]'],
    fixes: [],
    says: ["'NaN' is not a number", 'write the value in digits'],
  },
  {
    name: 'the U+2212 minus of a pasted value reads as a minus',
    text: 'species Na23\n  level p: 3p 2P°3/2  A = \u221218.53 MHz\nfield bias = \u22123.2 G\n',
    findings: [],
  },
  {
    // Term symbols are written without blanks (²ˢ⁺¹L_J, textbook notation). Read apart, `2P` was taken
    // for a subshell, with three errors and a fix that lower-cased the term's letter.
    name: 'a term symbol typed with a blank inside: one warning, read as meant, and the fix that joins it',
    text: 'species Na23\n  level a: 3p 2P 3/2\n  level b: 3p 2P°3 /2  # kept\n  level c: 2 S1/2\n',
    findings: ['2:15-21 term-blank-inside [2P 3/2]', '3:15-22 term-blank-inside [2P°3 /2]', '4:12-18 term-blank-inside [2 S1/2]'],
    fixes: [
      "term-blank-inside: Replace with '2P3/2' →   level a: 3p 2P3/2",
      "term-blank-inside: Replace with '2P°3/2' →   level b: 3p 2P°3/2  # kept",
      "term-blank-inside: Replace with '2S1/2' →   level c: 2S1/2",
    ],
    says: ['read as 2P3/2'],
  },
];

function describeFindings(text: string): { findings: string[]; fixes: string[]; messages: string[] } {
  const lines = text.split(/\r\n|\r|\n/);
  const analysis = analysisOf(text);
  const ds = diagnostics(analysis, URI).filter((d) => d.severity !== undefined && d.severity <= 2);
  const fixes: string[] = [];
  for (const d of ds) {
    for (const a of codeActions(analysis, URI, { range: d.range, diagnostics: [d], only: ['quickfix'] })) {
      const after = applyEdits(text, editsOf(a.edit)).split(/\r\n|\r|\n/);
      fixes.push(`${String(d.code)}: ${a.title} → ${after[d.range.start.line]}`);
    }
  }
  const findings = ds.map((d) => {
    const { start, end } = d.range;
    const covered = start.line === end.line ? lines[start.line]!.slice(start.character, end.character) : '…';
    return `${start.line + 1}:${start.character + 1}-${end.character + 1} ${String(d.code)} [${covered}]`;
  });
  return { findings, fixes, messages: ds.map((d) => (typeof d.message === 'string' ? d.message : d.message.value)) };
}

describe('bad inputs', () => {
  for (const c of CASES) {
    it(c.name, () => {
      const got = describeFindings(c.text);
      expect(got.findings).toEqual(c.findings);
      if (c.fixes) expect(got.fixes).toEqual(c.fixes);
      for (const words of c.says ?? []) expect(got.messages.join('\n')).toContain(words);
    });
  }
});
