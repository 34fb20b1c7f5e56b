/**
 * trap-gravity-too-strong reads its gradients in the trap's own unit, as the trap report does:
 * T/m once the trap's fields reach 0.1 T, G/cm below (1 G/cm = 0.01 T/m, SI definition of the gauss).
 * The physics core gives the numbers; the wording is the trap text's.
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { trapReport } from '../../server/src/cli/trapReport';

// An invented same-sense pair at 100 A: about 0.22 T at the centre and almost no gradient within 3 mm.
const STRONG = `species Rb87
  level ground: 5s 2S1/2
coil bias
  radius  = 4 cm
  turns   = 100
  current = 100 A
  spacing = 4 cm
  sense   = same
trap q
  sources = bias
  level   = ground
  region  = 3 mm
`;

describe('the gravity finding of a tesla trap', () => {
  const r = analyze(STRONG);
  const msgs = r.problems.filter((p) => p.code === 'trap-gravity-too-strong').map((p) => p.message);

  it('words the gradients in T/m, like the report of the same trap', () => {
    expect(msgs.length).toBeGreaterThan(0);
    for (const m of msgs) {
      expect(m).toMatch(/needs ≥ [\d.]+ [mµ]?T\/m along gravity \(has [\d.]+ [mµ]?T\/m\)\.$/);
      expect(m).not.toContain('G/cm');
    }
    const report = trapReport(r.result!.traps![0]!).join('\n');
    expect(report).toContain('T/m');
    expect(report).not.toContain('G/cm');
  });

  it('needs m g / μ for the stretched |2,+2⟩: 0.153 T/m, written 153 mT/m (tesla family, prefixed)', () => {
    // μ = (g_J/2 + 3 g_I/2) μB for the stretched state at any field (g_J = 2.00233, g_I = −0.000995, from memory);
    // m = 86.909 u (from memory), g = 9.80665 m/s² (standard gravity, SI), μB = 9.2740101e-24 J/T (CODATA 2018).
    const need = (86.909 * 1.66053907e-27 * 9.80665) / ((2.00233 / 2 - (3 * 0.000995) / 2) * 9.2740101e-24);
    expect(need.toPrecision(3)).toBe('0.153');
    expect(msgs.find((m) => m.includes('m_F=+2'))).toContain('it needs ≥ 153 mT/m along gravity (has ');
  });
});
