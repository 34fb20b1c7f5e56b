/**
 * A working field written with an uncertainty (`field bias = 5.000(30) G` in the invented fixture
 * tests/fixtures/uncertain.sublevel) reads the same in every section of the report: the levels
 * wrote `5.000(30) G`, the line and the resonance `5 G`, because only the levels' JSON carried
 * `field_T_unc`.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { textReport } from '../../server/src/cli/textReport';

describe('a working field with its uncertainty, everywhere it is named', () => {
  const r = analyze(readFileSync('tests/fixtures/uncertain.sublevel', 'utf8')).result!;

  it('levels, lines and resonances carry field_T_unc alike (JSON)', () => {
    const bias = (fps: readonly { source: { name: string }; field_T_unc?: number }[]) => fps.find((f) => f.source.name === 'bias')!.field_T_unc;
    expect(bias(r.levels[0]!.at_fields)).toBeCloseTo(3e-6, 15); // 0.030 G
    expect(bias(r.lines[0]!.at_fields)).toBeCloseTo(3e-6, 15);
    expect(bias(r.resonances[0]!.at_fields)).toBeCloseTo(3e-6, 15);
  });

  it('the text report writes 5.000(30) G in every section', () => {
    const report = textReport('x.sublevel', r).join('\n');
    expect(report).toContain('68 Zeeman components at field bias = 5.000(30) G (');
    expect(report).toContain('  at field bias = 5.000(30) G:\n');
    expect(report).toContain('  at magnet selector = 0.4500(50) T:\n');
    expect(report).not.toMatch(/field bias = 5 G/);
  });
});
