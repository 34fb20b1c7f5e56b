import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';

describe('resonance blocks', () => {
  it('87Rb |1,−1⟩ ↔ |2,+1⟩: field-insensitive at 3.228917 G (published measurement, Phys. Rev. A 66, 053616)', () => {
    const r = analyze('species Rb87\n  level g: 5s 2S1/2\nresonance c\n  level = g\n  lower = 1 -1\n  upper = 2 +1\n  range = 0 G, 10 G\n');
    const fi = r.result!.resonances[0]!.field_insensitive!;
    expect(fi).toHaveLength(1);
    expect(fi[0]!.field_T * 1e4).toBeCloseTo(3.228917, 5);
  });

  it('87Rb clock transition |1,0⟩ ↔ |2,0⟩: quadratic shift 575.15 Hz/G² (alkali D-line data compilation)', () => {
    const r = analyze('species Rb87\n  level g: 5s 2S1/2\nfield f = 1 mG\nresonance c\n  level = g\n  lower = 1 0\n  upper = 2 0\n');
    const t = r.result!.resonances[0]!.at_fields[0]!.transitions[0]!;
    expect(t.kind).toBe('pi');
    expect(t.d2f_dB2_Hz_per_T2 / 2 / 1e8).toBeCloseTo(575.15, 1);
  });

  it('free electron: 9.5 GHz is resonant near 0.339 T for g = 2.0023 (common practice)', () => {
    const r = analyze('species e\n  mass = 1 u\n  level s: 2S1/2\nresonance esr\n  level = s\n  frequency = 9.5 GHz\n');
    const fields = r.result!.resonances[0]!.resonances!.map((x) => x.field_T);
    expect(fields).toHaveLength(1);
    expect(fields[0]).toBeCloseTo(0.339, 3);
  });

  it('says so when no transition reaches the frequency, or the pair has no transition', () => {
    const base = 'species Rb87\n  level g: 5s 2S1/2\nresonance c\n  level = g\n';
    const codes = (t: string) => analyze(t).problems.map((p) => p.code);
    expect(codes(base + '  frequency = 2 GHz\n  range = 0 G, 10 G\n')).toContain('resonance-unreachable');
    expect(codes(base + '  lower = 1 -1\n  upper = 2 +2\n')).toContain('resonance-no-such-pair');
    expect(codes(base + '  lower = 1 2\n  upper = 2 0\n')).toContain('resonance-sublevel-malformed');
    expect(codes(base + '  lower = 1 0\n')).toContain('resonance-incomplete');
    expect(codes(base + '  range = 1 G\n')).toContain('resonance-range-malformed');
  });
});
