import { DiagnosticSeverity, DiagnosticTag } from 'vscode-languageserver-types';
import { describe, expect, it } from 'vitest';
import { diagnostics } from '../../server/src/features/diagnostics';
import { analysisOf, URI } from './helpers';

describe('diagnostics', () => {
  it('carry the stable code, severity, message, range, data and source', () => {
    const text = [
      'species Na23',
      '  level ground: 3s 2S1/2  B = 2 MHz',
      '  level upper:  3p 2P°5/2',
      'magnet m',
      '  field = 0.2 T',
      '  gradient = 50 T',
      '  length = 5 cm',
      'magent spare',
      '',
    ].join('\n');
    const ds = diagnostics(analysisOf(text), URI);
    expect(ds.map((d) => `${d.range.start.line + 1}:${d.range.start.character + 1} ${String(d.code)}`)).toEqual([
      '2:9 zeeman-not-linear',
      '2:31 quadrupole-cannot-act',
      '3:23 term-j-out-of-range',
      '6:17 unit-wrong-dimension',
      '8:1 syntax-unknown-statement',
    ]);
    const [regime, quadrupole, j] = ds;
    expect(quadrupole!.severity).toBe(DiagnosticSeverity.Warning);
    expect(quadrupole!.tags).toEqual([DiagnosticTag.Unnecessary]);
    expect(quadrupole!.data).toEqual({ removeSetting: 'B' });
    expect(j!.severity).toBe(DiagnosticSeverity.Error);
    expect(j!.message).toContain('J = 5/2 is impossible');
    expect(j!.data).toEqual({ suggestions: ['1/2', '3/2'] });
    expect(regime!.severity).toBe(DiagnosticSeverity.Information);
    // The field that puts the level past the linear regime is pointed at.
    expect(regime!.relatedInformation?.map((r) => r.location.range.start.line + 1)).toEqual([5]);
    for (const d of ds) expect(d.source).toBe('sublevel');
  });

  it('point related places at the same document', () => {
    const ds = diagnostics(analysisOf('magnet a\nmagnet a\n'), URI);
    const dup = ds.find((d) => d.code === 'name-duplicate')!;
    expect(dup.relatedInformation).toEqual([
      { location: { uri: URI, range: { start: { line: 0, character: 7 }, end: { line: 0, character: 8 } } }, message: "first magnet 'a' is here" },
    ]);
  });

  it('are empty for a clean file', () => {
    expect(diagnostics(analysisOf('species Rb87\n  level ground: 5s 2S1/2\nfield trap = 1 mG\n'), URI)).toEqual([]);
  });
});
