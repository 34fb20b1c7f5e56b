/**
 * The preferred quick fix of every diagnostic is the one an editor applies on "fix all" or a
 * single keystroke: applying it must remove its diagnostic and must not bring a new kind of
 * problem (checked on the mistakes example and on documents with planted mistakes).
 */
import fc from 'fast-check';
import { readdirSync, readFileSync } from 'fs';
import { type CodeAction, type Diagnostic, DiagnosticSeverity } from 'vscode-languageserver-types';
import { describe, expect, it } from 'vitest';
import { codeActions } from '../../server/src/features/codeActions';
import { diagnostics } from '../../server/src/features/diagnostics';
import { analyzeFast } from '../../server/src/service/fastAnalysis';
import { applyEdits, editsOf, URI } from './helpers';
import { mutatedText } from '../mutatedExamples';
import { NEWER_BLOCKS } from './newerBlockMistakes';

const RUNS = Number(process.env.FUZZ_RUNS ?? 60);

/** Problems found on the keystroke (parse + model): the ones quick fixes are for. */
function diagnosticsOf(text: string): { analysis: ReturnType<typeof analyzeFast>; list: Diagnostic[] } {
  const analysis = analyzeFast(text);
  return { analysis, list: diagnostics(analysis, URI) };
}

function preferredFix(text: string, d: Diagnostic): CodeAction | undefined {
  const { analysis } = diagnosticsOf(text);
  const fixes = codeActions(analysis, URI, { range: d.range, diagnostics: [d], only: ['quickfix'] });
  const preferred = fixes.filter((f) => f.isPreferred);
  expect(preferred.length, `at most one preferred fix for ${String(d.code)}`).toBeLessThanOrEqual(1);
  return preferred[0];
}

function codeCounts(list: readonly Diagnostic[]): Map<string, number> {
  const out = new Map<string, number>();
  for (const d of list) out.set(String(d.code), (out.get(String(d.code)) ?? 0) + 1);
  return out;
}

/**
 * Failures of "the fix removes its diagnostic and adds none", as readable lines. No new error may
 * appear anywhere, nor any new problem on the text the fix wrote. A warning may appear elsewhere on
 * the repaired line, where text that could not be read is read now (a block word repaired to
 * `magnet` makes an empty magnet, whose name is then reported incomplete).
 */
function checkEveryPreferredFix(text: string): string[] {
  const before = diagnosticsOf(text).list;
  const failures: string[] = [];
  for (const d of before) {
    const fix = preferredFix(text, d);
    if (!fix) continue;
    const after = diagnosticsOf(applyEdits(text, editsOf(fix.edit))).list;
    const was = codeCounts(before);
    const code = String(d.code);
    if ((codeCounts(after).get(code) ?? 0) >= (was.get(code) ?? 0)) failures.push(`'${fix.title}' left ${code} (${d.message})`);
    const errors = codeCounts(before.filter((x) => x.severity === DiagnosticSeverity.Error));
    for (const [c, n] of codeCounts(after.filter((x) => x.severity === DiagnosticSeverity.Error))) {
      if (c !== code && n > (errors.get(c) ?? 0)) failures.push(`'${fix.title}' for ${code} added the error ${c}: ${after.find((x) => x.code === c)?.message}`);
    }
    // Elsewhere a problem may change its words (a species repaired: B that could not act for want of
    // a nucleus now cannot act for J = 1/2) but not multiply.
    const elsewhereBefore = before.filter((x) => x.range.start.line !== d.range.start.line).length;
    const elsewhereAfter = after.filter((x) => x.range.start.line !== d.range.start.line);
    if (elsewhereAfter.length > elsewhereBefore) failures.push(`'${fix.title}' for ${code} added problems on other lines: ${elsewhereAfter.map((x) => x.code).join(', ')}`);
    // What the fix wrote must not itself be a new problem (a key renamed into a duplicate).
    const old = new Set(before.map((x) => `${String(x.code)} ${x.message}`));
    for (const e of editsOf(fix.edit)) {
      if (e.newText.includes('\n')) continue;
      const from = e.range.start.character;
      const to = from + e.newText.length;
      const onIt = after.filter((x) => x.range.start.line === e.range.start.line && x.range.start.character < to && x.range.end.character > from);
      for (const x of onIt) if (!old.has(`${String(x.code)} ${x.message}`)) failures.push(`'${fix.title}' wrote text with a new problem: ${String(x.code)} ${x.message}`);
    }
  }
  return failures;
}

/** A clean setup (no problems) in which mistakes are planted. */
const CLEAN = [
  'species Rb87',
  '  level ground: 5s 2S1/2',
  '  level upper: 5p 2P°3/2',
  'species Yb174',
  '  level meta: 4f14 6s 6p 3P°1',
  'field bias = 3.2 G',
  'magnet selector',
  '  field = 0.2 T',
  '  gradient = 180 T/m',
  '  length = 5 cm',
  'line D2: ground -> upper',
  '',
].join('\n');

/** Mistakes a user makes, as replacements of one piece of the clean text. */
const PLANTS: readonly [from: string, to: string][] = [
  ['Rb87', 'Rubidum87'],
  ['Rb87', 'Rb78'],
  ['5p 2P°3/2', '5p 2P°5/2'],
  ['5p 2P°3/2', '5p 2P°3/2 A = 25 Mhz'],
  ['5s 2S1/2', '5s 2S1/2  B = 2 MHz'],
  ['4f14 6s 6p', '4f14 6s7 6p'],
  ['4f14 6s 6p', '4f146s 6p'],
  ['3.2 G', '3.2 Gs'],
  ['3.2 G', '3.2'],
  ['180 T/m', '180 T'],
  ['180 T/m', '180 mT'],
  ['5 cm', '5 ms'],
  ['0.2 T', '0.2 Ts'],
  ['magnet selector', 'magent selector'],
  ['  gradient =', '  gradiant ='],
  ['  length = 5', '  length 5'],
  ['ground -> upper', 'ground -> uper'],
  ['line D2: ground', 'line D2 ground'],
];

describe('preferred quick fixes', () => {
  it('the clean setup has no problems (so every problem below is planted)', () => {
    expect(diagnosticsOf(CLEAN).list.map((d) => d.message)).toEqual([]);
  });

  it.each(PLANTS)('planted %s → %s: its preferred fix removes it and adds nothing', (from, to) => {
    const text = CLEAN.replace(from, to);
    const planted = diagnosticsOf(text).list;
    expect(planted.length, 'the plant raises a problem').toBeGreaterThan(0);
    expect(checkEveryPreferredFix(text)).toEqual([]);
  });

  it('on the mistakes example', () => {
    const text = readFileSync('examples/mistakes.sublevel', 'utf8');
    expect(checkEveryPreferredFix(text)).toEqual([]);
  });

  it('on the other examples (no problems to fix, none invented)', () => {
    for (const name of readdirSync('examples').filter((f) => f.endsWith('.sublevel'))) {
      expect(checkEveryPreferredFix(readFileSync(`examples/${name}`, 'utf8')), name).toEqual([]);
    }
  });

  it('on documents with several planted mistakes at once', () => {
    fc.assert(
      fc.property(fc.uniqueArray(fc.nat(PLANTS.length - 1), { minLength: 1, maxLength: 4 }), (picks) => {
        let text = CLEAN;
        for (const k of picks) text = text.replace(PLANTS[k]![0], PLANTS[k]![1]);
        expect(checkEveryPreferredFix(text)).toEqual([]);
      }),
      { numRuns: RUNS },
    );
  });

  it('on example files with the random edits a typing user makes', () => {
    const examples = readdirSync('examples')
      .filter((f) => f.endsWith('.sublevel'))
      .map((f) => readFileSync(`examples/${f}`, 'utf8'));
    fc.assert(
      fc.property(mutatedText([...examples, ...NEWER_BLOCKS.map((c) => c.text)], 3), (text) => {
        expect(checkEveryPreferredFix(text)).toEqual([]);
      }),
      { numRuns: RUNS },
    );
  });
});
