import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';

function diags(text: string): string[] {
  return analyze(text).result!.diagnostics.map((d) => `${d.line}:${d.column} ${d.severity} ${d.code}`);
}

describe('absurd input is named once, where it is written', () => {
  it('a field beyond any that exists is refused at its value, not blamed on the solver', () => {
    const d = diags('species Na23\n  level g: 3s 2S1/2\nfield f = 1e308 T\nfield h = 1 G\n');
    expect(d).toEqual(['3:11 error field-beyond-physical']);
    const m = diags('magnet m\n  field = 2e5 T\n  gradient = 1 T/m\n  length = 1 cm\n');
    expect(m).toEqual(['2:11 error field-beyond-physical']);
  });

  it('the strongest accepted field, 1e5 T (the bound shared with the command line), still evaluates', () => {
    const r = analyze('species Na23\n  level g: 3s 2S1/2\nfield f = 1e5 T\n').result!;
    expect(r.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    for (const s of r.levels[0]!.at_fields[0]!.exact) expect(Number.isFinite(s.energy_Hz)).toBe(true);
  });

  it('a rejected nuclear spin gives its own error and no "I = 0" warnings', () => {
    const text = 'species X\n  mass = 10 u\n  I = 99/2\n  g_I = 0.001\n  level a: 2P3/2 A = 100 MHz B = 1 MHz\n';
    expect(diags(text)).toEqual(['3:7 error spin-too-large']);
  });
});
